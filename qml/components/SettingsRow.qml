import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One setting: its name, the control that edits it, and below a one-line explanation with the
// documented default.
ColumnLayout {
    id: root

    property string label
    property string explanation
    property string defaultText
    default property alias control: holder.data

    spacing: 2

    RowLayout {
        Layout.fillWidth: true
        spacing: Theme.gap
        Label {
            Layout.preferredWidth: 170
            text: root.label
            color: Theme.text
            font.bold: true
        }
        RowLayout {
            id: holder
            Layout.fillWidth: true
            spacing: Theme.gap
        }
    }
    Label {
        Layout.fillWidth: true
        Layout.leftMargin: 178
        text: root.explanation + (root.defaultText.length > 0 ? "  " + root.defaultText + "." : "")
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
        wrapMode: Text.WordWrap
    }
}
