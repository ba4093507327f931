pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The last step of the mapping assistant: the match details the table does not give (or a
// file-name pattern that gives them for every later file), what is still wrong or looks wrong,
// and the name to save the layout under. Saving loads the file with it.
Card {
    id: root

    required property LayoutAssistant assistant

    title: qsTr("4 · Match, checks and save")

    GridLayout {
        Layout.fillWidth: true
        columns: 4
        columnSpacing: Theme.gap
        rowSpacing: 2
        Label { text: qsTr("Match id"); color: Theme.textMuted }
        TextField {
            objectName: "matchId"
            Layout.fillWidth: true
            text: root.assistant.matchId
            placeholderText: qsTr("e.g. KB-2026-09")
            onEditingFinished: root.assistant.matchId = text
        }
        Label { text: qsTr("Date"); color: Theme.textMuted }
        TextField {
            objectName: "matchDate"
            Layout.fillWidth: true
            text: root.assistant.matchDate
            placeholderText: qsTr("YYYY-MM-DD")
            onEditingFinished: root.assistant.matchDate = text
        }
        Label { text: qsTr("Opponent"); color: Theme.textMuted }
        TextField {
            objectName: "opponent"
            Layout.fillWidth: true
            text: root.assistant.opponent
            onEditingFinished: root.assistant.opponent = text
        }
        Label { text: qsTr("Venue"); color: Theme.textMuted }
        ComboBox {
            objectName: "venue"
            Layout.fillWidth: true
            model: ["", "home", "away", "neutral"]
            displayText: currentText.length > 0 ? currentText : qsTr("(from the table)")
            currentIndex: Math.max(0, model.indexOf(root.assistant.venue))
            onActivated: root.assistant.venue = currentText
        }
        Label { text: qsTr("File names"); color: Theme.textMuted }
        TextField {
            Layout.columnSpan: 3
            Layout.fillWidth: true
            text: root.assistant.fileNamePattern
            placeholderText: qsTr("optional, e.g. {date}_{opponent}.csv: later files give their details by name")
            onEditingFinished: root.assistant.fileNamePattern = text
        }
    }

    Label {
        Layout.fillWidth: true
        visible: root.assistant.matchText.length > 0
        text: qsTr("Will be stored as %1").arg(root.assistant.matchText)
        color: Theme.onTarget
        font.bold: true
        wrapMode: Text.WordWrap
    }

    ListView {
        id: checks
        Layout.fillWidth: true
        Layout.fillHeight: true
        Layout.minimumHeight: 40
        clip: true
        boundsBehavior: Flickable.StopAtBounds
        ScrollBar.vertical: ScrollBar {}
        model: root.assistant.problems.map(p => ({ text: p, error: true }))
               .concat(root.assistant.warnings.map(w => ({ text: w, error: false })))
        delegate: Label {
            required property var modelData
            width: checks.width - 10
            text: (modelData.error ? "✕ " : "⚠ ") + modelData.text
            color: modelData.error ? Theme.error : Theme.text
            wrapMode: Text.WordWrap
            font.pixelSize: Theme.fontSmall
            bottomPadding: 3
        }
    }
    Label {
        Layout.fillWidth: true
        visible: root.assistant.ready && root.assistant.warnings.length === 0
        text: qsTr("✓ The whole file reads with this layout, and nothing looks wrong.")
        color: Theme.onTarget
    }

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gap
        TextField {
            objectName: "layoutName"
            Layout.fillWidth: true
            text: root.assistant.layoutName
            placeholderText: qsTr("Name of this layout")
            onTextEdited: root.assistant.layoutName = text
        }
        Button {
            objectName: "saveAndLoad"
            text: qsTr("Save layout and load the file")
            enabled: root.assistant.ready && root.assistant.layoutName.length > 0
            palette.button: enabled ? Theme.accent : Theme.border
            palette.buttonText: enabled ? "#ffffff" : Theme.textMuted
            onClicked: root.assistant.save()
        }
    }
    Label {
        Layout.fillWidth: true
        visible: root.assistant.savedText.length > 0
        text: root.assistant.savedText
        wrapMode: Text.WordWrap
        color: Theme.textMuted
    }
}
