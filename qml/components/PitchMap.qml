pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Shapes
import Pitchloop

// A pitch drawn to Law 1 proportions from its C++ geometry (our goal on the left, lane 1 at the
// bottom), with an optional zone overlay: each zone's value as a colour of the theme's scale,
// its state as a marker, its numbers on hover. A click emits zoneClicked; the map never
// changes data itself.
Item {
    id: root

    required property PitchGeometry geometry
    property ZoneMapModel zones: null
    property int selectedBand: 0
    property int selectedLane: 0
    property bool showValues: true
    /// Moments to draw as arrows (a MomentListModel: fromX, fromY, toX, toY in drawing metres,
    /// counts, hasArrow); null for none.
    property var arrows: null
    /// The arrow row to draw strongest (the moment chosen in a list), -1 for none.
    property int highlightedArrow: -1

    signal zoneClicked(int band, int lane)

    readonly property real pxPerMetre: Math.max(0.1, Math.min(width / geometry.extentLength,
                                                              height / geometry.extentWidth))
    readonly property point hoveredZone: pointer.containsMouse
                                         ? geometry.zoneAt(pointer.mouseX / pxPerMetre,
                                                           pointer.mouseY / pxPerMetre)
                                         : Qt.point(0, 0)
    // The zone whose numbers the caption shows: the hovered one, else the selected one.
    readonly property var shownZone: {
        if (!zones || zones.count === 0) return ({})
        if (hoveredZone.x > 0) return zones.zone(hoveredZone.x, hoveredZone.y)
        return zones.zone(selectedBand, selectedLane)
    }

    // The shown zone in one line, for a caption under the map.
    readonly property string captionText: describe(shownZone).split("\n").join("  ·  ")

    implicitWidth: 420
    implicitHeight: 280

    Item {
        id: field
        width: root.geometry.extentLength * root.pxPerMetre
        height: root.geometry.extentWidth * root.pxPerMetre
        anchors.centerIn: parent

        Rectangle {
            anchors.fill: parent
            color: Theme.grass
            radius: 3
        }

        Repeater {
            model: root.zones
            delegate: ZoneCellDelegate {
                geometry: root.geometry
                pxPerMetre: root.pxPerMetre
            }
        }

        Shape {
            anchors.fill: parent
            antialiasing: true
            ShapePath {
                strokeColor: Theme.lineCasing
                strokeWidth: 3.4
                fillColor: "transparent"
                capStyle: ShapePath.RoundCap
                joinStyle: ShapePath.RoundJoin
                PathSvg { path: root.geometry.markingsPath(root.pxPerMetre) }
            }
            ShapePath {
                strokeColor: Theme.line
                strokeWidth: 1.5
                fillColor: "transparent"
                capStyle: ShapePath.RoundCap
                joinStyle: ShapePath.RoundJoin
                PathSvg { path: root.geometry.markingsPath(root.pxPerMetre) }
            }
            ShapePath {
                strokeColor: Theme.lineCasing
                strokeWidth: 1
                fillColor: Theme.line
                PathSvg { path: root.geometry.spotsPath(root.pxPerMetre) }
            }
        }

        Repeater {
            model: root.arrows
            delegate: MomentArrowDelegate {
                pxPerMetre: root.pxPerMetre
                highlighted: index === root.highlightedArrow
            }
        }

        Repeater {
            model: root.zones
            delegate: ZoneMarkDelegate {
                geometry: root.geometry
                pxPerMetre: root.pxPerMetre
                showValues: root.showValues
            }
        }

        // The selected zone, outlined; the hovered one, lightly.
        Rectangle {
            readonly property rect area: root.geometry.bandEdges.length > 0
                                         ? root.geometry.zoneRect(root.selectedBand, root.selectedLane)
                                         : Qt.rect(0, 0, 0, 0)
            visible: area.width > 0
            x: area.x * root.pxPerMetre
            y: area.y * root.pxPerMetre
            width: area.width * root.pxPerMetre
            height: area.height * root.pxPerMetre
            color: "transparent"
            border.color: Theme.lineCasing
            border.width: 1
            Rectangle {
                anchors.fill: parent
                anchors.margins: 1
                color: "transparent"
                border.color: Theme.selection
                border.width: 2.5
            }
        }
        Rectangle {
            readonly property rect area: root.geometry.bandEdges.length > 0
                                         ? root.geometry.zoneRect(root.hoveredZone.x, root.hoveredZone.y)
                                         : Qt.rect(0, 0, 0, 0)
            visible: area.width > 0
            x: area.x * root.pxPerMetre
            y: area.y * root.pxPerMetre
            width: area.width * root.pxPerMetre
            height: area.height * root.pxPerMetre
            color: Qt.rgba(1, 1, 1, 0.12)
            border.color: Qt.rgba(1, 1, 1, 0.8)
            border.width: 1
        }

        MouseArea {
            id: pointer
            anchors.fill: parent
            hoverEnabled: true
            cursorShape: root.hoveredZone.x > 0 ? Qt.PointingHandCursor : Qt.ArrowCursor
            onClicked: mouse => {
                const zone = root.geometry.zoneAt(mouse.x / root.pxPerMetre, mouse.y / root.pxPerMetre)
                if (zone.x > 0)
                    root.zoneClicked(zone.x, zone.y)
            }
        }

        ToolTip {
            visible: root.hoveredZone.x > 0 && root.shownZone.zoneName !== undefined
            delay: 250
            x: Math.min(field.width - width, pointer.mouseX + 16)
            y: Math.min(field.height - height, pointer.mouseY + 16)
            text: root.describe(root.shownZone)
        }
    }

    // A zone's numbers in a few lines: name, value and sample, interval, target and state.
    function describe(z: var): string {
        if (!z || z.zoneName === undefined) return ""
        let lines = [z.zoneName]
        if (z.rawText.length > 0) {
            lines.push(qsTr("%1 with its neighbours (%2 %3)").arg(z.valueText).arg(root.zones.levelText).arg(z.intervalText))
            lines.push(z.rawText)
        } else {
            lines.push(z.valueText + "  ·  " + z.sampleText)
        }
        if (z.targetText.length > 0)
            lines.push(qsTr("target %1 · %2").arg(z.targetText).arg(z.stateText)
                       + (z.certaintyText.length > 0 ? " · " + z.certaintyText : ""))
        return lines.join("\n")
    }
}
