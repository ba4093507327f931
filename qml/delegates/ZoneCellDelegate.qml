import QtQuick
import QtQuick.Shapes
import Pitchloop

// One zone's fill on a pitch map: its pooled value in the value-suppressing palette (the less
// certain, the nearer the neutral; model/palette.h), grey without items, hatched when it rests
// on too few items to be judged against a target.
Item {
    id: root

    required property int band
    required property int lane
    required property bool hasValue
    required property real scaled
    required property bool thin
    required property string colour
    required property PitchGeometry geometry
    required property real pxPerMetre

    readonly property rect area: geometry.bandEdges.length > 0 ? geometry.zoneRect(band, lane)
                                                               : Qt.rect(0, 0, 0, 0)

    x: area.x * pxPerMetre
    y: area.y * pxPerMetre
    width: area.width * pxPerMetre
    height: area.height * pxPerMetre
    clip: true

    Rectangle {
        anchors.fill: parent
        color: root.hasValue ? root.colour : Theme.noData
        border.color: Qt.rgba(0, 0, 0, 0.28)
        border.width: 1
    }

    Shape {
        anchors.fill: parent
        visible: root.thin
        ShapePath {
            strokeColor: Qt.rgba(1, 1, 1, 0.4)
            strokeWidth: 1
            fillColor: "transparent"
            PathSvg { path: root.hatch(root.width, root.height, 7) }
        }
    }

    // Diagonal lines `step` pixels apart across a w × h box, cut to the box, as SVG path data.
    // Each line is X + Y = c; it enters at X = max(0, c − h) and leaves at X = min(w, c).
    function hatch(w: real, h: real, step: real): string {
        let d = ""
        for (let c = step / 2; c < w + h; c += step) {
            const x0 = Math.max(0, c - h), x1 = Math.min(w, c)
            d += "M " + x0 + " " + (c - x0) + " L " + x1 + " " + (c - x1) + " "
        }
        return d
    }
}
