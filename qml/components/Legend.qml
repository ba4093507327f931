pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The key to a heat map: the value scale with its labels (evenly spaced from its low to its
// high end), the swatches for no data and thin data, and the state shapes with their names.
// Wide: the scale beside the key; compact: the key below the scale.
GridLayout {
    id: root

    property string title
    property var labels: []
    property bool compact: false
    property bool showSwatches: true
    property bool showStates: true

    columns: compact ? 1 : 2
    columnSpacing: Theme.margin
    rowSpacing: Theme.gap

    component Entry: Row {
        id: entry
        property alias text: label.text
        default property alias swatch: holder.data
        spacing: Theme.gapSmall + 2
        Item {
            id: holder
            width: 16
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

    ColumnLayout {
        spacing: 2
        Label {
            text: root.title
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
        }
        Rectangle {
            id: bar
            Layout.preferredWidth: root.compact ? 240 : 280
            Layout.preferredHeight: 12
            radius: 2
            border.color: Theme.border
            gradient: Gradient {
                orientation: Gradient.Horizontal
                GradientStop { position: 0 / 8; color: Theme.scaleStops[0] }
                GradientStop { position: 1 / 8; color: Theme.scaleStops[1] }
                GradientStop { position: 2 / 8; color: Theme.scaleStops[2] }
                GradientStop { position: 3 / 8; color: Theme.scaleStops[3] }
                GradientStop { position: 4 / 8; color: Theme.scaleStops[4] }
                GradientStop { position: 5 / 8; color: Theme.scaleStops[5] }
                GradientStop { position: 6 / 8; color: Theme.scaleStops[6] }
                GradientStop { position: 7 / 8; color: Theme.scaleStops[7] }
                GradientStop { position: 8 / 8; color: Theme.scaleStops[8] }
            }
        }
        Item {
            Layout.preferredWidth: bar.Layout.preferredWidth
            Layout.preferredHeight: 15
            Repeater {
                model: root.labels
                delegate: Label {
                    required property int index
                    required property string modelData
                    readonly property real at: root.labels.length > 1 ? index / (root.labels.length - 1) : 0
                    x: Math.max(0, Math.min(parent.width - width, at * parent.width - width / 2))
                    text: modelData
                    color: Theme.text
                    font.pixelSize: Theme.fontSmall
                }
            }
        }
    }

    Flow {
        Layout.fillWidth: true
        Layout.alignment: Qt.AlignVCenter
        spacing: Theme.gapLarge
        Entry {
            visible: root.showSwatches
            text: qsTr("no items")
            Rectangle {
                anchors.fill: parent
                color: Theme.noData
                border.color: Theme.border
            }
        }
        Entry {
            visible: root.showSwatches
            text: qsTr("hatched: too few items to judge")
            Rectangle {
                anchors.fill: parent
                color: Theme.scaleStops[3]
                clip: true
                Repeater {
                    model: 4
                    delegate: Rectangle {
                        required property int index
                        x: index * 5 - 3
                        y: -4
                        width: 1.2
                        height: 22
                        rotation: 45
                        color: Qt.rgba(1, 1, 1, 0.7)
                    }
                }
            }
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
                visible: root.showStates
                text: modelData.name
                StateMarker {
                    anchors.centerIn: parent
                    zoneState: stateEntry.modelData.state
                    size: 14
                }
            }
        }
        Entry {
            visible: root.showStates
            text: qsTr("no marker: no target")
        }
    }
}
