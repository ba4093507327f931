import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// A titled panel on the page background; its children go in a column below the title.
Rectangle {
    id: root

    property string title
    default property alias content: body.data

    color: Theme.surface
    radius: Theme.radius
    border.color: Theme.border
    implicitWidth: body.implicitWidth + 2 * Theme.gapLarge
    implicitHeight: heading.implicitHeight + body.implicitHeight + 2 * Theme.gapLarge + Theme.gap

    Label {
        id: heading
        x: Theme.gapLarge
        y: Theme.gapLarge - 2
        width: parent.width - 2 * Theme.gapLarge
        text: root.title
        visible: text.length > 0
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall + 1
        font.bold: true
        elide: Text.ElideRight
    }

    ColumnLayout {
        id: body
        anchors.fill: parent
        anchors.margins: Theme.gapLarge
        anchors.topMargin: heading.visible ? heading.y + heading.implicitHeight + Theme.gap : Theme.gapLarge
        spacing: Theme.gapSmall
    }
}
