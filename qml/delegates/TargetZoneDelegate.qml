import QtQuick
import Pitchloop

// One zone on the target editor's pitch: its target in force and last season's achieved value
// on a dark label that reads on any fill, and, when selected, a white outline with a tick.
Item {
    id: root

    required property int band
    required property int lane
    required property bool hasTarget
    required property string targetText
    required property bool hasLastSeason
    required property string lastSeasonText
    required property bool selected
    required property PitchGeometry geometry
    required property real pxPerMetre

    readonly property rect area: geometry.bandEdges.length > 0 ? geometry.zoneRect(band, lane)
                                                               : Qt.rect(0, 0, 0, 0)
    readonly property bool roomy: width >= 56 && height >= 40

    x: area.x * pxPerMetre
    y: area.y * pxPerMetre
    width: area.width * pxPerMetre
    height: area.height * pxPerMetre

    Rectangle {
        anchors.fill: parent
        visible: root.selected
        color: Qt.rgba(1, 1, 1, 0.22)
        border.color: Theme.lineCasing
        border.width: 1
        Rectangle {
            anchors.fill: parent
            anchors.margins: 1
            color: "transparent"
            border.color: Theme.selection
            border.width: 3
        }
        Text {
            anchors.left: parent.left
            anchors.top: parent.top
            anchors.margins: 5
            text: "✓"
            color: Theme.selection
            style: Text.Outline
            styleColor: Theme.lineCasing
            font.family: Theme.fontFamily
            font.pixelSize: Theme.fontBody
            font.bold: true
        }
    }

    Rectangle {
        anchors.centerIn: parent
        visible: root.roomy
        width: Math.min(root.width - 6, label.implicitWidth + 10)
        height: label.implicitHeight + 6
        radius: 3
        color: root.hasTarget || root.hasLastSeason ? Qt.rgba(0.06, 0.09, 0.13, 0.78) : Qt.rgba(0.06, 0.09, 0.13, 0.35)

        Column {
            id: label
            anchors.centerIn: parent
            Text {
                anchors.horizontalCenter: parent.horizontalCenter
                text: root.targetText
                color: root.hasTarget ? "#ffffff" : "#c5cfdb"
                font.family: Theme.fontFamily
                font.pixelSize: Theme.fontSmall + 1
                font.bold: root.hasTarget
                font.italic: !root.hasTarget
            }
            Text {
                anchors.horizontalCenter: parent.horizontalCenter
                visible: root.hasLastSeason
                text: qsTr("was %1").arg(root.lastSeasonText)
                color: "#dfe6ee"
                font.family: Theme.fontFamily
                font.pixelSize: Theme.fontSmall - 1
            }
        }
    }
}
