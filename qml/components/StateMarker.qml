import QtQuick
import QtQuick.Shapes
import Pitchloop

// The shape of a zone state, so that states read without colour: a diamond for slipped, a
// downward triangle for likely off, a triangle for close to the line, a disc for on target, a
// ring for too little data; nothing without a target. Drawn in a 16-unit box with a dark casing so it shows on any fill.
Item {
    id: root

    property int zoneState: ZoneState.NoTarget
    property real size: 16

    // Path data by ZoneState value: NoTarget, OnTarget, CloseToLine, Slipped, TooLittleData,
    // LikelyOff.
    readonly property var paths: [
        "",
        "M 2 8 A 6 6 0 1 0 14 8 A 6 6 0 1 0 2 8 Z",
        "M 8 1.2 L 15 14.2 L 1 14.2 Z",
        "M 8 0.8 L 15.2 8 L 8 15.2 L 0.8 8 Z",
        "M 3 8 A 5 5 0 1 0 13 8 A 5 5 0 1 0 3 8 Z",
        "M 1 1.8 L 15 1.8 L 8 14.8 Z"
    ]
    readonly property bool ring: zoneState === ZoneState.TooLittleData

    implicitWidth: size
    implicitHeight: size
    visible: zoneState !== ZoneState.NoTarget

    Shape {
        width: 16
        height: 16
        scale: root.size / 16
        transformOrigin: Item.TopLeft
        antialiasing: true

        ShapePath {
            strokeColor: Theme.lineCasing
            strokeWidth: root.ring ? 4.6 : 3.4
            fillColor: "transparent"
            joinStyle: ShapePath.RoundJoin
            PathSvg { path: root.paths[root.zoneState] ?? "" }
        }
        ShapePath {
            strokeColor: root.ring ? "#ffffff" : "#ffffff"
            strokeWidth: root.ring ? 2.6 : 1.3
            fillColor: root.ring ? "transparent" : Theme.stateColour(root.zoneState)
            joinStyle: ShapePath.RoundJoin
            PathSvg { path: root.paths[root.zoneState] ?? "" }
        }
    }
}
