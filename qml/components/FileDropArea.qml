import QtQuick
import QtQuick.Controls
import Pitchloop

// Files or folders dropped anywhere on the window: a hint over everything while they are dragged
// over, and filesDropped with their urls. It takes no clicks, so the pages beneath work as usual.
DropArea {
    id: root

    signal filesDropped(var urls)

    keys: ["text/uri-list"]
    onEntered: drag => drag.accepted = drag.hasUrls
    onDropped: drop => {
        if (!drop.hasUrls)
            return
        drop.accept(Qt.CopyAction)
        root.filesDropped(drop.urls)
    }

    Rectangle {
        anchors.fill: parent
        visible: root.containsDrag
        color: Qt.rgba(0.04, 0.36, 0.6, 0.18)
        border.color: Theme.accent
        border.width: 4

        Rectangle {
            anchors.centerIn: parent
            width: hint.implicitWidth + 2 * Theme.margin
            height: hint.implicitHeight + 2 * Theme.gapLarge
            radius: Theme.radius
            color: Theme.surface
            border.color: Theme.accent
            Label {
                id: hint
                anchors.centerIn: parent
                text: qsTr("Drop to load these match files")
                font.pixelSize: Theme.fontTitle
                font.bold: true
                color: Theme.accent
            }
        }
    }
}
