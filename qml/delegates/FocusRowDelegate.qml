import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One focus in the list: its state as shape and word, metric and zones, when and by whom it was
// opened, how far it is towards its review, and its training time so far.
ItemDelegate {
    id: root

    required property var focusId
    required property string title
    required property string zonesText
    required property int phase
    required property string phaseText
    required property string openedText
    required property string progressText
    required property string minutesText
    required property string drillsText
    property bool selected: false

    width: ListView.view ? ListView.view.width : implicitWidth
    height: 98
    leftPadding: Theme.gap
    rightPadding: Theme.gap

    background: Rectangle {
        color: root.selected ? Theme.accentSoft : (root.hovered ? Theme.surfaceAlt : "transparent")
        Rectangle {
            anchors.bottom: parent.bottom
            width: parent.width
            height: 1
            color: Theme.border
            opacity: 0.6
        }
    }

    contentItem: ColumnLayout {
        spacing: 1
        RowLayout {
            spacing: Theme.gap
            FocusStateMarker {
                phase: root.phase
                size: 14
            }
            Label {
                text: root.phaseText
                font.bold: true
                color: Theme.text
            }
            Item { Layout.fillWidth: true }
            Label {
                text: qsTr("Focus %1").arg(root.focusId)
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
            }
        }
        Label {
            Layout.fillWidth: true
            text: root.title + " · " + root.zonesText
            color: Theme.text
            elide: Text.ElideRight
        }
        Label {
            Layout.fillWidth: true
            text: root.openedText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            elide: Text.ElideRight
        }
        Label {
            Layout.fillWidth: true
            text: root.progressText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            elide: Text.ElideRight
        }
        Label {
            Layout.fillWidth: true
            text: root.drillsText + " · " + root.minutesText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            elide: Text.ElideRight
        }
    }
}
