pragma ComponentBehavior: Bound
import QtQuick
import Pitchloop

// An intensity cap as five small squares, as many filled as the cap allows (none: no session).
// The count of filled squares carries the meaning, so it reads without colour; the word goes
// beside it.
Row {
    id: root

    property int cap: 0

    spacing: 2
    visible: cap >= 0

    Repeater {
        model: 5
        delegate: Rectangle {
            required property int index
            width: 9
            height: 9
            radius: 1
            color: index < root.cap ? Theme.accent : "transparent"
            border.color: index < root.cap ? Theme.accent : Theme.textMuted
            border.width: 1
        }
    }
}
