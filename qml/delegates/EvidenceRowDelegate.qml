import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One line of a focus's frozen evidence: zone and window, value with interval and sample, the
// target, and the flag as shape, word and P(miss). The club's judged window is in bold.
Rectangle {
    id: root

    required property string windowText
    required property bool judged
    required property string valueText
    required property string detailText
    required property string judgementText
    required property int zoneState

    implicitHeight: column.implicitHeight + 2 * Theme.gapSmall
    color: judged ? Theme.surfaceAlt : "transparent"
    radius: 3

    ColumnLayout {
        id: column
        anchors.fill: parent
        anchors.margins: Theme.gapSmall
        spacing: 1
        RowLayout {
            spacing: Theme.gap
            StateMarker {
                zoneState: root.zoneState
                size: 13
            }
            Label {
                Layout.fillWidth: true
                text: root.windowText
                font.bold: root.judged
                color: Theme.text
                elide: Text.ElideRight
            }
            Label {
                text: root.valueText
                font.bold: true
                color: Theme.text
            }
        }
        Label {
            Layout.fillWidth: true
            text: root.detailText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
        Label {
            Layout.fillWidth: true
            text: root.judgementText
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
        }
    }
}
