import QtQuick
import Pitchloop

// One zone's value and state marker on a pitch map, drawn above the markings.
Item {
    id: root

    required property int band
    required property int lane
    required property bool hasValue
    required property real scaled
    required property string valueText
    required property int zoneState
    required property PitchGeometry geometry
    required property real pxPerMetre
    required property bool showValues
    required property string colour
    required property bool darkText

    readonly property rect area: geometry.bandEdges.length > 0 ? geometry.zoneRect(band, lane)
                                                               : Qt.rect(0, 0, 0, 0)

    x: area.x * pxPerMetre
    y: area.y * pxPerMetre
    width: area.width * pxPerMetre
    height: area.height * pxPerMetre

    // A chip of the cell's own colour under the value, so the pitch's lines (the centre circle,
    // the arcs, the spots) pass behind the number and never through it.
    Rectangle {
        visible: valueLabel.visible
        anchors.centerIn: valueLabel
        width: valueLabel.contentWidth + 6
        height: valueLabel.contentHeight + 2
        radius: 3
        color: root.hasValue ? root.colour : Theme.noData
    }

    Text {
        id: valueLabel
        anchors.centerIn: parent
        anchors.verticalCenterOffset: root.height > 40 ? 3 : 0
        visible: root.showValues && root.width >= 38 && root.height >= 22
        text: root.valueText
        color: root.hasValue ? (root.darkText ? Theme.text : "#ffffff") : Theme.textMuted
        font.family: Theme.fontFamily
        font.pixelSize: Math.max(9, Math.min(Theme.fontBody, root.height * 0.26, root.width * 0.19))
        font.bold: true
    }

    StateMarker {
        anchors.top: parent.top
        anchors.right: parent.right
        anchors.margins: Math.max(2, root.height * 0.06)
        size: Math.max(9, Math.min(16, root.height * 0.3))
        zoneState: root.zoneState
    }
}
