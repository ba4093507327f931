import QtQuick
import QtQuick.Shapes
import Pitchloop

// One moment on a pitch map: a dot where it started and an arrow to where it went. Counted as
// yes: solid; as no: dashed; left out or an exposure: a small grey dot only.
Item {
    id: root

    required property int index
    required property real fromX
    required property real fromY
    required property real toX
    required property real toY
    required property int counts
    required property bool hasArrow
    required property real pxPerMetre
    property bool highlighted: false

    readonly property bool counted: counts === 0 || counts === 1
    readonly property color ink: counts === 0 ? Theme.momentYes : counts === 1 ? Theme.momentNo : Theme.noData
    readonly property real x1: fromX * pxPerMetre
    readonly property real y1: fromY * pxPerMetre
    readonly property real x2: toX * pxPerMetre
    readonly property real y2: toY * pxPerMetre
    readonly property real angle: Math.atan2(y2 - y1, x2 - x1) * 180 / Math.PI

    anchors.fill: parent
    z: highlighted ? 2 : 1

    Shape {
        anchors.fill: parent
        visible: root.hasArrow && root.counted
        antialiasing: true
        ShapePath {
            strokeColor: Theme.lineCasing
            strokeWidth: root.highlighted ? 4.5 : 3
            fillColor: "transparent"
            capStyle: ShapePath.RoundCap
            startX: root.x1
            startY: root.y1
            PathLine { x: root.x2; y: root.y2 }
        }
        ShapePath {
            strokeColor: root.ink
            strokeWidth: root.highlighted ? 2.5 : 1.5
            strokeStyle: root.counts === 1 ? ShapePath.DashLine : ShapePath.SolidLine
            dashPattern: [3, 2]
            fillColor: "transparent"
            capStyle: ShapePath.RoundCap
            startX: root.x1
            startY: root.y1
            PathLine { x: root.x2; y: root.y2 }
        }
    }
    // The arrowhead, turned along the arrow.
    Shape {
        visible: root.hasArrow && root.counted
        x: root.x2
        y: root.y2
        rotation: root.angle
        transformOrigin: Item.TopLeft
        antialiasing: true
        ShapePath {
            strokeColor: Theme.lineCasing
            strokeWidth: 1
            fillColor: root.ink
            startX: 0
            startY: 0
            PathLine { x: -7; y: -3.5 }
            PathLine { x: -7; y: 3.5 }
            PathLine { x: 0; y: 0 }
        }
    }
    Rectangle {
        readonly property real size: root.counted ? (root.highlighted ? 9 : 6) : 4
        x: root.x1 - size / 2
        y: root.y1 - size / 2
        width: size
        height: size
        radius: size / 2
        color: root.counts === 1 ? "transparent" : root.ink
        border.color: root.counts === 1 ? root.ink : Theme.lineCasing
        border.width: root.counts === 1 ? 1.5 : 0.8
    }
}
