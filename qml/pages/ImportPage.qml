pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Dialogs
import QtQuick.Layouts
import Pitchloop

// Loading match files into the club file: pick files or a folder, or drop them anywhere on the
// window. Files load one by one off the window's thread, each whole or not at all; the list says
// what came of each, with every problem of a failed file. Afterwards every page shows the new
// matches, and the newest one's debrief is a click away.
Page {
    id: root

    required property ClubSession session
    readonly property alias loader: loader

    signal openDebrief(string matchId)
    /// Asks the window to show this page (Ctrl+O works from every page).
    signal showRequested()

    function load(urls: var) {
        loader.loadUrls(urls)
    }

    /// Opens a table in the mapping assistant, whether or not a saved layout reads it.
    function mapTable(path: string) {
        assistant.open(path)
    }

    function chooseFiles() {
        root.showRequested()
        if (loader.canLoad && !loader.running)
            fileDialog.open()
    }

    background: Rectangle { color: Theme.window }

    ImportView {
        id: loader
        session: root.session
        onLayoutNeeded: path => assistant.open(path)
    }

    LayoutAssistant {
        id: assistant
        session: root.session
        onSaved: (path, details) => {
            loader.readLayouts()
            loader.loadWithDetails([path], details)
            assistant.close()
        }
    }

    property string layoutToEdit

    FileDialog {
        id: sampleDialog
        title: qsTr("Choose a table in the layout “%1”").arg(root.layoutToEdit)
        fileMode: FileDialog.OpenFile
        nameFilters: [qsTr("Tables (*.csv *.tsv *.txt *.jsonl *.ndjson)"), qsTr("All files (*)")]
        onAccepted: assistant.openWithLayout(selectedFile, root.layoutToEdit)
    }

    Dialog {
        id: removeDialog
        property string name
        anchors.centerIn: parent
        modal: true
        title: qsTr("Remove the layout “%1”?").arg(name)
        standardButtons: Dialog.Ok | Dialog.Cancel
        Label { text: qsTr("Matches already loaded with it stay as they are.") }
        onAccepted: loader.removeLayout(name)
    }

    FileDialog {
        id: fileDialog
        title: qsTr("Load match files")
        fileMode: FileDialog.OpenFiles
        nameFilters: [qsTr("Match files and tables (*.json *.csv *.tsv *.jsonl)"), qsTr("All files (*)")]
        onAccepted: loader.loadUrls(selectedFiles)
    }

    FileDialog {
        id: layoutDialog
        title: qsTr("Save a table layout (mapping profile)")
        fileMode: FileDialog.OpenFile
        nameFilters: [qsTr("Mapping profiles (*.json)"), qsTr("All files (*)")]
        onAccepted: loader.saveLayout(selectedFile)
    }

    FolderDialog {
        id: folderDialog
        title: qsTr("Load every match file in a folder")
        onAccepted: loader.loadUrls([selectedFolder])
    }

    Shortcut {
        sequence: "Ctrl+O"
        context: Qt.ApplicationShortcut
        onActivated: root.chooseFiles()
    }
    Shortcut {
        sequence: "Esc"
        enabled: root.visible && loader.running
        onActivated: loader.cancel()
    }

    ColumnLayout {
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gapLarge

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap
            ColumnLayout {
                spacing: 2
                Label {
                    text: qsTr("Load matches")
                    font.pixelSize: Theme.fontHeading
                    font.bold: true
                    color: Theme.text
                }
                Label {
                    Layout.maximumWidth: 520
                    text: loader.canLoad ? qsTr("Into %1").arg(loader.clubFileText)
                                         : qsTr("No club file on disk is open: nothing can be loaded.")
                    elide: Text.ElideMiddle
                    color: Theme.textMuted
                }
            }
            Item { Layout.fillWidth: true }
            CheckBox {
                text: qsTr("Replace changed matches")
                checked: loader.replace
                enabled: !loader.running
                onToggled: loader.replace = checked
                ToolTip.visible: hovered
                ToolTip.delay: 400
                ToolTip.text: qsTr("A file for a match already stored, with different content, replaces the stored match. Otherwise it is refused.")
            }
            Button {
                objectName: "saveLayout"
                text: qsTr("Save a table layout…")
                enabled: loader.canLoad && !loader.running
                ToolTip.visible: hovered
                ToolTip.text: qsTr("A mapping profile (docs/import.md): tables with its columns then load when dropped here")
                onClicked: layoutDialog.open()
            }
            Button {
                text: qsTr("Choose a folder…")
                enabled: loader.canLoad && !loader.running
                onClicked: folderDialog.open()
            }
            Button {
                text: qsTr("Choose files…  Ctrl+O")
                enabled: loader.canLoad && !loader.running
                palette.button: enabled ? Theme.accent : Theme.border
                palette.buttonText: enabled ? "#ffffff" : Theme.textMuted
                onClicked: fileDialog.open()
            }
        }

        LayoutAssistantPanel {
            Layout.fillWidth: true
            Layout.fillHeight: true
            visible: assistant.active
            assistant: assistant
            onCloseRequested: assistant.close()
        }

        // Where to drop, or how far the load has come.
        Rectangle {
            visible: !assistant.active
            Layout.fillWidth: true
            Layout.preferredHeight: 96
            radius: Theme.radius
            color: loader.running ? Theme.surface : Theme.surfaceAlt
            border.color: loader.running ? Theme.border : Theme.accent
            border.width: loader.running ? 1 : 2

            ColumnLayout {
                visible: !loader.running
                anchors.centerIn: parent
                width: parent.width - 2 * Theme.margin
                spacing: Theme.gapSmall
                Label {
                    Layout.alignment: Qt.AlignHCenter
                    text: qsTr("Drop match files or a folder of them anywhere on this window")
                    font.pixelSize: Theme.fontLarge
                    font.bold: true
                    color: Theme.accent
                }
                Label {
                    Layout.alignment: Qt.AlignHCenter
                    Layout.fillWidth: true
                    horizontalAlignment: Text.AlignHCenter
                    wrapMode: Text.WordWrap
                    text: qsTr("Match files are .json files in the Pitchloop match format; tables (.csv, .tsv, .jsonl) load with the saved layout whose columns they have, and a table in a new layout opens the mapping assistant. Each match is stored whole or not at all; a file loaded before is left as it is.")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
            }

            RowLayout {
                visible: loader.running
                anchors.fill: parent
                anchors.margins: Theme.gapLarge
                spacing: Theme.gapLarge
                ColumnLayout {
                    Layout.fillWidth: true
                    spacing: Theme.gapSmall
                    Label {
                        text: loader.progressText
                        color: Theme.text
                        font.bold: true
                    }
                    ProgressBar {
                        Layout.fillWidth: true
                        from: 0
                        to: 1
                        value: loader.progress
                    }
                    Label {
                        text: qsTr("You can keep working on the other pages meanwhile.")
                        color: Theme.textMuted
                        font.pixelSize: Theme.fontSmall
                    }
                }
                Button {
                    text: loader.cancelling ? qsTr("Cancelling…") : qsTr("Cancel  Esc")
                    enabled: !loader.cancelling
                    onClicked: loader.cancel()
                    ToolTip.visible: hovered
                    ToolTip.delay: 400
                    ToolTip.text: qsTr("Stops after the file being loaded now; the rest are not touched.")
                }
            }
        }

        RowLayout {
            Layout.fillWidth: true
            visible: loader.summaryText.length > 0 || loader.latestMatchId.length > 0
            spacing: Theme.gap
            Label {
                Layout.alignment: Qt.AlignTop
                visible: loader.hasFailures
                text: "✕"
                color: Theme.error
                font.pixelSize: Theme.fontLarge
                font.bold: true
            }
            Label {
                Layout.fillWidth: true
                Layout.alignment: Qt.AlignTop
                text: loader.summaryText
                wrapMode: Text.WordWrap
                color: Theme.text
                font.pixelSize: Theme.fontLarge
            }
            ColumnLayout {
                visible: loader.latestMatchId.length > 0 && !loader.running
                spacing: 2
                Button {
                    Layout.alignment: Qt.AlignRight
                    text: qsTr("Open the debrief of the latest match")
                    palette.button: Theme.accent
                    palette.buttonText: "#ffffff"
                    onClicked: root.openDebrief(loader.latestMatchId)
                }
                Label {
                    Layout.alignment: Qt.AlignRight
                    Layout.maximumWidth: 420
                    text: loader.latestMatchText
                    elide: Text.ElideRight
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                }
            }
        }

        SavedLayoutsCard {
            Layout.fillWidth: true
            visible: !assistant.active && loader.layouts.length > 0
            layouts: loader.layouts
            onEditRequested: name => { root.layoutToEdit = name; sampleDialog.open() }
            onDuplicateRequested: name => loader.duplicateLayout(name)
            onRemoveRequested: name => { removeDialog.name = name; removeDialog.open() }
        }

        Card {
            visible: !assistant.active
            Layout.fillWidth: true
            Layout.fillHeight: true
            title: loader.results.count > 0 ? qsTr("Files of the last load (%1)").arg(loader.results.count)
                                            : qsTr("Files of the last load")

            Label {
                visible: loader.results.count === 0
                Layout.fillWidth: true
                wrapMode: Text.WordWrap
                text: root.session.matchCount > 0
                      ? qsTr("Nothing loaded yet in this session. The club file holds %1 matches; new ones are added beside them.").arg(root.session.matchCount)
                      : qsTr("This club file holds no matches yet. Choose your match files (Ctrl+O) or drop them here to begin.")
                color: Theme.textMuted
            }

            ListView {
                id: list
                Layout.fillWidth: true
                Layout.fillHeight: true
                visible: loader.results.count > 0
                clip: true
                model: loader.results
                boundsBehavior: Flickable.StopAtBounds
                ScrollBar.vertical: ScrollBar {}
                onCountChanged: if (loader.running) positionViewAtEnd()
                delegate: ImportResultDelegate {
                    width: list.width - 12
                }
            }
            Item {
                visible: loader.results.count === 0
                Layout.fillHeight: true
            }
        }
    }
}
