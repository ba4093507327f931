import QtQuick
import Pitchloop

// A pitch map alone, for the click and hover tests.
Item {
    width: 545
    height: 365

    PitchGeometry {
        id: geometry
    }

    PitchMap {
        objectName: "map"
        anchors.fill: parent
        geometry: geometry
    }
}
