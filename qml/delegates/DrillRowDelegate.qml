import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One drill in a list: title, length, intensity and players, what it works on, and whether it
// is deleted. An optional action button (link, pick, remove) sits on the right.
ItemDelegate {
    id: root

    required property int index
    required property var drillId
    required property string title
    required property string detailText
    required property string worksOnText
    required property bool deleted
    property bool selected: false
    property string actionText
    property bool compact: false

    signal actionClicked()

    width: ListView.view ? ListView.view.width : implicitWidth
    height: compact ? implicitHeight : 62
    leftPadding: Theme.gap
    rightPadding: compact ? 2 : Theme.gap
    topPadding: compact ? 5 : 0
    bottomPadding: compact ? 5 : 0

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

    contentItem: RowLayout {
        spacing: Theme.gap
        ColumnLayout {
            Layout.fillWidth: true
            spacing: 1
            Label {
                Layout.fillWidth: true
                text: (root.deleted ? qsTr("[deleted] ") : "") + root.title
                font.bold: !root.deleted
                font.strikeout: root.deleted
                font.pixelSize: root.compact ? Theme.fontSmall + 1 : Theme.fontBody
                color: root.deleted ? Theme.textMuted : Theme.text
                wrapMode: root.compact ? Text.WordWrap : Text.NoWrap
                maximumLineCount: 2
                elide: Text.ElideRight
            }
            Label {
                Layout.fillWidth: true
                text: root.detailText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
            Label {
                visible: !root.compact
                Layout.fillWidth: true
                text: root.worksOnText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
        }
        ToolButton {
            visible: root.actionText.length > 0
            text: root.actionText
            padding: 4
            font.pixelSize: Theme.fontSmall + 1
            onClicked: root.actionClicked()
        }
    }
}
