pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The key to a heat map: the value-suppressing palette (value across, certainty down) with the
// scale's labels (evenly spaced from its low to its high end), the swatches for no data and thin
// data, and the state shapes with their names.
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
        // The two-dimensional key of the value-suppressing palette: across, the value; down,
        // how sure it is — each row keeps fewer steps and fades toward the neutral.
        RowLayout {
            spacing: Theme.gap
            Column {
                id: bar
                objectName: "paletteKey"
                Layout.preferredWidth: root.compact ? 240 : 280
                spacing: 1
                Repeater {
                    model: MapPalette.rows
                    delegate: Row {
                        id: paletteRow
                        required property int index
                        readonly property var colours: MapPalette.row(index)
                        Repeater {
                            model: paletteRow.colours
                            delegate: Rectangle {
                                required property string modelData
                                width: bar.Layout.preferredWidth / paletteRow.colours.length
                                height: 7
                                color: modelData
                            }
                        }
                    }
                }
            }
            ColumnLayout {
                spacing: 6
                Label {
                    text: qsTr("sure")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall - 1
                }
                Label {
                    text: qsTr("unsure")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall - 1
                }
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
        Label {
            objectName: "pooledNote"
            Layout.preferredWidth: bar.Layout.preferredWidth + 60
            text: qsTr("Each zone pulled toward its neighbours; hover for the zone alone.")
            color: Theme.textMuted
            font.pixelSize: Theme.fontSmall
            wrapMode: Text.WordWrap
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
