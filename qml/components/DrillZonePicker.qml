pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import Pitchloop

// A small pitch to pick several zones on: a click toggles a zone. Chosen zones are outlined and
// ticked, so the choice reads without colour. With a zone map the pitch also shows each zone's
// value and state. Emits zoneToggled; never changes data itself.
Item {
    id: root

    required property PitchGeometry geometry
    property ZoneMapModel zones: null
    /// Chosen zones as [{band, lane}, ...].
    property var chosen: []

    signal zoneToggled(int band, int lane)

    implicitWidth: 320
    implicitHeight: 210

    PitchMap {
        id: map
        anchors.fill: parent
        geometry: root.geometry
        zones: root.zones
        showValues: root.zones !== null
        selectedBand: 0
        selectedLane: 0
        onZoneClicked: (band, lane) => root.zoneToggled(band, lane)
    }

    Item {
        id: overlay
        x: (map.width - root.geometry.extentLength * map.pxPerMetre) / 2
        y: (map.height - root.geometry.extentWidth * map.pxPerMetre) / 2
        width: root.geometry.extentLength * map.pxPerMetre
        height: root.geometry.extentWidth * map.pxPerMetre

        Repeater {
            model: root.chosen
            delegate: Rectangle {
                id: mark
                required property var modelData
                readonly property rect area: root.geometry.bandEdges.length > 0
                                             ? root.geometry.zoneRect(mark.modelData.band, mark.modelData.lane)
                                             : Qt.rect(0, 0, 0, 0)
                visible: area.width > 0
                x: area.x * map.pxPerMetre
                y: area.y * map.pxPerMetre
                width: area.width * map.pxPerMetre
                height: area.height * map.pxPerMetre
                color: Qt.rgba(1, 1, 1, 0.22)
                border.color: Theme.lineCasing
                border.width: 1
                Rectangle {
                    anchors.fill: parent
                    anchors.margins: 1
                    color: "transparent"
                    border.color: Theme.selection
                    border.width: 2.5
                }
                Rectangle {
                    anchors.left: parent.left
                    anchors.top: parent.top
                    anchors.margins: 3
                    width: 15
                    height: 15
                    radius: 7.5
                    color: Theme.selection
                    border.color: Theme.lineCasing
                    Label {
                        anchors.centerIn: parent
                        text: "✓"
                        color: Theme.lineCasing
                        font.pixelSize: 11
                        font.bold: true
                    }
                }
            }
        }
    }
}
