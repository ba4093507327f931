pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import Pitchloop

// The key to SeriesChart: what the dots, band, lines and markers mean.
Column {
    id: root

    property string windowText
    property string ewmaText
    property string levelText

    spacing: Theme.gapSmall

    component Entry: Row {
        property alias text: label.text
        default property alias swatch: holder.data
        spacing: Theme.gapSmall + 2
        Item {
            id: holder
            width: 26
            height: 14
            anchors.verticalCenter: parent.verticalCenter
        }
        Label {
            id: label
            anchors.verticalCenter: parent.verticalCenter
            color: Theme.text
            font.pixelSize: Theme.fontSmall
        }
    }

    Row {
        spacing: Theme.margin
        Entry {
            text: qsTr("each match")
            Rectangle {
                x: 9
                y: 3
                width: 8
                height: 8
                radius: 4
                color: "#3b4352"
            }
        }
        Entry {
            text: qsTr("%1, %2").arg(root.levelText).arg(root.windowText.toLowerCase())
            Rectangle {
                anchors.fill: parent
                color: Qt.rgba(0.04, 0.36, 0.6, 0.18)
            }
        }
        Entry {
            text: root.ewmaText
            Rectangle {
                y: 6
                width: 26
                height: 3
                color: Theme.accent
            }
        }
        Entry {
            text: qsTr("target")
            Row {
                y: 6
                spacing: 3
                Repeater {
                    model: 3
                    delegate: Rectangle {
                        width: 6
                        height: 2
                        color: Theme.text
                    }
                }
            }
        }
    }
    Row {
        spacing: Theme.margin
        Label {
            text: qsTr("Judged state over %1 after each match:").arg(root.windowText.toLowerCase())
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
        }
        Repeater {
            model: [
                { state: ZoneState.OffTarget, name: Words.stateName(ZoneState.OffTarget) },
                { state: ZoneState.LikelyOff, name: Words.stateName(ZoneState.LikelyOff) },
                { state: ZoneState.CloseToLine, name: Words.stateName(ZoneState.CloseToLine) },
                { state: ZoneState.OnTarget, name: Words.stateName(ZoneState.OnTarget) },
                { state: ZoneState.TooLittleData, name: Words.stateName(ZoneState.TooLittleData) }
            ]
            delegate: Entry {
                id: stateEntry
                required property var modelData
                text: modelData.name
                StateMarker {
                    x: 6
                    zoneState: stateEntry.modelData.state
                    size: 13
                }
            }
        }
    }
}
