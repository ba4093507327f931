import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One microcycle day's intensity cap in the settings form: the day, the typed cap with its name
// (or how to fix it), and the default.
RowLayout {
    id: root

    required property int index
    required property string day
    required property string explanation
    required property string capText
    required property string capName
    required property bool valid
    required property int defaultCap

    signal edited(int row, string text)

    spacing: Theme.gap

    ColumnLayout {
        Layout.fillWidth: true
        spacing: 0
        Label {
            text: root.day
            font.bold: true
            color: Theme.text
        }
        Label {
            Layout.fillWidth: true
            text: root.explanation
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
    }
    TextField {
        Layout.preferredWidth: 52
        text: root.capText
        horizontalAlignment: TextInput.AlignHCenter
        onTextEdited: root.edited(root.index, text)
    }
    Label {
        Layout.preferredWidth: 96
        text: root.valid ? root.capName : "✕ " + root.capName
        color: root.valid ? Theme.text : Theme.error
        elide: Text.ElideRight
    }
    Label {
        Layout.preferredWidth: 56
        text: qsTr("default %1").arg(root.defaultCap)
        color: Theme.textMuted
        font.pixelSize: Theme.fontSmall
    }
}
