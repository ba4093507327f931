import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// A number shown large with its caption below and, for counts of a zone state, that state's
// marker beside it.
ColumnLayout {
    id: root

    property alias value: number.text
    property alias caption: label.text
    property int zoneState: ZoneState.NoTarget

    spacing: 0

    RowLayout {
        spacing: Theme.gap
        StateMarker {
            zoneState: root.zoneState
            size: 18
        }
        Label {
            id: number
            font.pixelSize: Theme.fontHeading + 4
            font.bold: true
            color: Theme.text
        }
    }
    Label {
        id: label
        color: Theme.textMuted
    }
}
