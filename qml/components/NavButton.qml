import QtQuick
import QtQuick.Controls
import Pitchloop

// One entry of the side bar: the page's name and its keyboard shortcut.
ItemDelegate {
    id: root

    required property string title
    required property string shortcutText
    property bool current: false

    implicitHeight: 44
    focusPolicy: Qt.TabFocus

    background: Rectangle {
        color: root.current ? Theme.sidebarActive : (root.hovered ? "#1d2a39" : "transparent")
        Rectangle {
            width: 4
            height: parent.height
            color: Theme.watch
            visible: root.current
        }
    }
    contentItem: Item {
        Label {
            anchors.left: parent.left
            anchors.leftMargin: Theme.gap
            anchors.verticalCenter: parent.verticalCenter
            text: root.title
            color: root.current ? "#ffffff" : Theme.sidebarText
            font.pixelSize: Theme.fontLarge
            font.bold: root.current
        }
        Label {
            anchors.right: parent.right
            anchors.verticalCenter: parent.verticalCenter
            text: root.shortcutText
            color: Theme.sidebarMuted
            font.pixelSize: Theme.fontSmall
        }
    }
}
