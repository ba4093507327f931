pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// Picks the drill to bring into a proposed session in place of another: the live drills of the
// drill book, each with its minutes, intensity and players, drills above the day's cap marked.
Dialog {
    id: root

    property var choices: null
    property var outId: 0
    property string outTitle
    property int chosenRow: -1

    signal swapChosen(var outId, var inId)

    function ask(drillId: var, title: string) {
        outId = drillId
        outTitle = title
        chosenRow = -1
        open()
    }

    title: qsTr("Swap “%1” for…").arg(outTitle)
    modal: true
    width: 560
    height: 460
    anchors.centerIn: parent
    standardButtons: Dialog.Cancel

    onAccepted: {
        if (chosenRow >= 0)
            swapChosen(outId, choices.idAt(chosenRow))
    }

    ColumnLayout {
        anchors.fill: parent
        spacing: Theme.gap
        Label {
            Layout.fillWidth: true
            text: qsTr("The drill you pick is pinned and “%1” is left out; the planner then plans the rest again.").arg(root.outTitle)
            wrapMode: Text.WordWrap
            color: Theme.textMuted
        }
        ListView {
            id: list
            Layout.fillWidth: true
            Layout.fillHeight: true
            clip: true
            model: root.choices
            currentIndex: root.chosenRow
            ScrollBar.vertical: ScrollBar {}
            delegate: ItemDelegate {
                id: choice
                required property int index
                required property string title
                required property string detailText
                required property bool aboveCap
                required property bool inPlan
                width: ListView.view.width
                highlighted: ListView.isCurrentItem
                contentItem: ColumnLayout {
                    spacing: 0
                    Label {
                        Layout.fillWidth: true
                        text: choice.title + (choice.inPlan ? qsTr("  (already in the plan)") : "")
                        font.bold: true
                        color: Theme.text
                        elide: Text.ElideRight
                    }
                    Label {
                        Layout.fillWidth: true
                        text: choice.detailText + (choice.aboveCap ? qsTr("  ▲ above the day's cap") : "")
                        color: choice.aboveCap ? Theme.error : Theme.textMuted
                        font.pixelSize: Theme.fontSmall
                        elide: Text.ElideRight
                    }
                }
                onClicked: root.chosenRow = index
                onDoubleClicked: {
                    root.chosenRow = index
                    root.accept()
                }
            }
        }
        Button {
            Layout.alignment: Qt.AlignRight
            text: qsTr("Swap in the chosen drill")
            enabled: root.chosenRow >= 0
            highlighted: true
            onClicked: root.accept()
        }
    }
}
