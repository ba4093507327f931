pragma ComponentBehavior: Bound
import QtQuick
import Pitchloop

// A pitch to pick zones on: last season's values as the colour of each zone, its target in force
// and last season's figure on it, the selection outlined. A click emits zoneClicked (Shift:
// additive), a drag across zones emits areaSelected with the zones at both corners. It never
// changes data itself.
Item {
    id: root

    required property PitchGeometry geometry
    property ZoneMapModel heat: null
    property TargetZoneModel zones: null

    signal zoneClicked(int band, int lane, bool additive)
    signal areaSelected(int band1, int lane1, int band2, int lane2, bool additive)

    readonly property real pxPerMetre: map.pxPerMetre
    readonly property real fieldX: (width - geometry.extentLength * pxPerMetre) / 2
    readonly property real fieldY: (height - geometry.extentWidth * pxPerMetre) / 2

    // The zone under a point of this item; (0, 0) off the pitch unless `clamped`, which pulls
    // the point onto the pitch first (a drag may end beyond a touchline).
    function zoneAtPoint(px: real, py: real, clamped: bool): point {
        let mx = (px - fieldX) / pxPerMetre
        let my = (py - fieldY) / pxPerMetre
        if (clamped) {
            const inset = 0.01
            mx = Math.max(geometry.margin + inset, Math.min(geometry.margin + geometry.length - inset, mx))
            my = Math.max(geometry.margin + inset, Math.min(geometry.margin + geometry.width - inset, my))
        }
        return geometry.zoneAt(mx, my)
    }

    // The centre of a zone in this item's coordinates.
    function zoneCentre(band: int, lane: int): point {
        const r = geometry.zoneRect(band, lane)
        return Qt.point(fieldX + (r.x + r.width / 2) * pxPerMetre, fieldY + (r.y + r.height / 2) * pxPerMetre)
    }

    implicitWidth: 540
    implicitHeight: 360

    PitchMap {
        id: map
        anchors.fill: parent
        geometry: root.geometry
        zones: root.heat
        showValues: false
    }

    Item {
        x: root.fieldX
        y: root.fieldY
        width: root.geometry.extentLength * root.pxPerMetre
        height: root.geometry.extentWidth * root.pxPerMetre

        Repeater {
            model: root.zones
            delegate: TargetZoneDelegate {
                geometry: root.geometry
                pxPerMetre: root.pxPerMetre
            }
        }
    }

    // The rectangle being dragged out.
    Rectangle {
        visible: picker.dragging
        x: Math.min(picker.startX, picker.endX)
        y: Math.min(picker.startY, picker.endY)
        width: Math.abs(picker.endX - picker.startX)
        height: Math.abs(picker.endY - picker.startY)
        color: Qt.rgba(1, 1, 1, 0.16)
        border.color: Theme.selection
        border.width: 2
    }

    MouseArea {
        id: picker

        property real startX: 0
        property real startY: 0
        property real endX: 0
        property real endY: 0
        property bool dragging: false

        anchors.fill: parent
        cursorShape: Qt.CrossCursor
        onPressed: mouse => {
            startX = endX = mouse.x
            startY = endY = mouse.y
            dragging = false
        }
        onPositionChanged: mouse => {
            endX = mouse.x
            endY = mouse.y
            if (!dragging && Math.abs(endX - startX) + Math.abs(endY - startY) > 8)
                dragging = true
        }
        onReleased: mouse => {
            const additive = (mouse.modifiers & Qt.ShiftModifier) !== 0
            if (!dragging) {
                const zone = root.zoneAtPoint(mouse.x, mouse.y, false)
                if (zone.x > 0)
                    root.zoneClicked(zone.x, zone.y, additive)
                return
            }
            dragging = false
            const from = root.zoneAtPoint(startX, startY, true)
            const to = root.zoneAtPoint(mouse.x, mouse.y, true)
            if (from.x > 0 && to.x > 0)
                root.areaSelected(from.x, from.y, to.x, to.y, additive)
        }
        onCanceled: dragging = false
    }
}
