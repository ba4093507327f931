import QtQuick
import QtQuick.Shapes
import Pitchloop

// The shape of a focus's state, so it reads without colour: a ring while open, a triangle when
// due for review, a square once closed. Always shown beside the state's word.
Item {
    id: root

    property int phase: FocusPhase.Open
    property real size: 16

    // Path data by FocusPhase value in a 16-unit box: Open, DueForReview, Closed.
    readonly property var paths: [
        "M 3 8 A 5 5 0 1 0 13 8 A 5 5 0 1 0 3 8 Z",
        "M 8 1.2 L 15 14.2 L 1 14.2 Z",
        "M 2.5 2.5 L 13.5 2.5 L 13.5 13.5 L 2.5 13.5 Z"
    ]
    readonly property color colour: phase === FocusPhase.DueForReview ? Theme.watch
                                    : phase === FocusPhase.Closed ? Theme.textMuted : Theme.accent
    readonly property bool ring: phase === FocusPhase.Open

    implicitWidth: size
    implicitHeight: size

    Shape {
        width: 16
        height: 16
        scale: root.size / 16
        transformOrigin: Item.TopLeft
        antialiasing: true

        ShapePath {
            strokeColor: root.ring ? root.colour : Theme.lineCasing
            strokeWidth: root.ring ? 3 : 1.2
            fillColor: root.ring ? "transparent" : root.colour
            joinStyle: ShapePath.RoundJoin
            PathSvg { path: root.paths[root.phase] ?? "" }
        }
    }
}
