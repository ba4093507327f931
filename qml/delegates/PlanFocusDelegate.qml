import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One open focus and the minutes a proposed session gives it, with a bar of its share of the
// session and the minutes in words.
RowLayout {
    id: root

    required property string title
    required property string zoneText
    required property string severityText
    required property string minutesText
    required property real share

    spacing: Theme.gap

    ColumnLayout {
        Layout.preferredWidth: 230
        spacing: 0
        Label {
            Layout.fillWidth: true
            text: root.title
            color: Theme.text
            font.pixelSize: Theme.fontSmall
            font.bold: true
            elide: Text.ElideRight
        }
        Label {
            Layout.fillWidth: true
            text: root.zoneText + " · " + root.severityText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            elide: Text.ElideRight
        }
    }
    Rectangle {
        Layout.fillWidth: true
        Layout.preferredHeight: 10
        color: Theme.surfaceAlt
        border.color: Theme.border
        Rectangle {
            width: parent.width * root.share
            height: parent.height
            color: Theme.accent
        }
    }
    Label {
        Layout.preferredWidth: 54
        horizontalAlignment: Text.AlignRight
        text: root.minutesText
        color: Theme.text
        font.bold: true
    }
}
