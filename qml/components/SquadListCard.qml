pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import QtQuick.Dialogs
import Pitchloop

// The squad list in Settings: each player's shirt number (the id the match files give), name
// and position, so the moments behind a zone name our players and can be picked by player or
// unit. Typed one by one, or the whole list from a file; nothing is saved when a check fails.
Card {
    id: root

    required property SquadListView view

    title: qsTr("Squad list · %1").arg(root.view.squad)

    FileDialog {
        id: importDialog
        title: qsTr("Replace the squad list with a file")
        nameFilters: [qsTr("Tables (*.csv *.tsv *.txt)")]
        onAccepted: root.view.importFile(selectedFile)
    }

    Label {
        Layout.fillWidth: true
        text: root.view.players.length > 0
              ? qsTr("%1 players. Moments name them and can be picked by player or by unit.").arg(root.view.players.length)
              : qsTr("No players yet: moments show shirt numbers only. Add them below or from a file with the columns number, name and position.")
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        wrapMode: Text.WordWrap
    }
    ListView {
        objectName: "squadList"
        Layout.fillWidth: true
        Layout.preferredHeight: Math.min(150, contentHeight)
        clip: true
        model: root.view.players
        ScrollBar.vertical: ScrollBar {}
        delegate: RowLayout {
            id: playerRow
            required property var modelData
            width: ListView.view.width
            Label {
                Layout.fillWidth: true
                text: playerRow.modelData.text
                color: Theme.text
                elide: Text.ElideRight
            }
            ToolButton {
                text: qsTr("Remove")
                font.pixelSize: Theme.fontSmall
                onClicked: root.view.removePlayer(playerRow.modelData.number)
            }
        }
    }
    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gapSmall
        TextField {
            id: numberField
            objectName: "squadNumber"
            Layout.preferredWidth: 48
            placeholderText: qsTr("No.")
        }
        TextField {
            id: nameField
            objectName: "squadName"
            Layout.fillWidth: true
            placeholderText: qsTr("name")
        }
        ComboBox {
            id: positionField
            Layout.preferredWidth: 80
            model: root.view.positions
        }
        Button {
            objectName: "squadAdd"
            text: qsTr("Save")
            onClicked: {
                if (root.view.savePlayer(numberField.text, nameField.text, positionField.currentText)) {
                    numberField.text = ""
                    nameField.text = ""
                }
            }
        }
    }
    RowLayout {
        Layout.fillWidth: true
        Button {
            text: qsTr("Replace from a file…")
            onClicked: importDialog.open()
        }
        Label {
            objectName: "squadMessage"
            Layout.fillWidth: true
            text: root.view.message
            color: root.view.failed ? Theme.error : Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
    }
}
