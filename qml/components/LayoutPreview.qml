import QtQuick
import QtQuick.Controls
import Pitchloop

// The first mapped events of a table on a pitch, in our picture (our goal on the left): ours
// as filled circles, theirs as hollow diamonds, so the two sides differ by shape as well as by
// colour. Shots are drawn larger. Points are in PitchGeometry's drawing metres.
Item {
    id: root

    property var points: []

    implicitWidth: 420
    implicitHeight: 280

    PitchGeometry {
        id: geometry
        grid: "equal:6x5"
    }

    PitchMap {
        id: map
        anchors.fill: parent
        geometry: geometry
        showValues: false
    }

    Item {
        // PitchMap centres the drawn field in its own area.
        x: (map.width - geometry.extentLength * map.pxPerMetre) / 2
        y: (map.height - geometry.extentWidth * map.pxPerMetre) / 2
        width: geometry.extentLength * map.pxPerMetre
        height: geometry.extentWidth * map.pxPerMetre

        Repeater {
            model: root.points
            delegate: Rectangle {
                required property var modelData
                readonly property real size: modelData.type === "shot" ? 11 : 7
                x: modelData.x * map.pxPerMetre - width / 2
                y: modelData.y * map.pxPerMetre - height / 2
                width: size
                height: size
                radius: modelData.us ? size / 2 : 0
                rotation: modelData.us ? 0 : 45
                color: modelData.us ? "#56b4e9" : "transparent"
                border.color: modelData.us ? Theme.lineCasing : "#f0e442"
                border.width: modelData.us ? 1 : 2
            }
        }
    }
}
