pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import Pitchloop

// A review's control chart: each match's value (dots), the centre line and the 3σ limits from
// the before window (solid and dashed, stepped per match), the EWMA (line), and the matches
// after the start shaded. A match beyond a limit gets a shape for its side: a large disc on the
// better side, a diamond on the worse side (the zone states' shapes). Hover a match for its numbers.
Item {
    id: root

    required property ControlChartModel chart

    readonly property real plotLeft: 54
    readonly property real plotRight: width - 12
    readonly property real plotTop: 18
    readonly property real plotBottom: height - 40
    readonly property real slot: chart.count > 0 ? (plotRight - plotLeft) / chart.count : 1
    readonly property int hoveredRow: pointer.containsMouse ? rowAt(pointer.mouseX) : -1

    implicitHeight: 240

    function xOf(i: int): real { return plotLeft + (i + 0.5) * slot }
    function yOf(v: real): real {
        const span = chart.axisHigh - chart.axisLow
        const t = span > 0 ? (v - chart.axisLow) / span : 0
        return plotBottom - Math.max(0, Math.min(1, t)) * (plotBottom - plotTop)
    }
    function rowAt(x: real): int {
        const i = Math.floor((x - plotLeft) / slot)
        return i >= 0 && i < chart.count ? i : -1
    }

    Canvas {
        id: canvas
        anchors.fill: parent
        onPaint: {
            const ctx = getContext("2d")
            ctx.reset()
            const c = root.chart
            const n = c.count
            ctx.font = Theme.fontSmall + "px '" + Theme.fontFamily + "'"
            // The after window, shaded, with its name.
            if (n > 0 && c.firstAfter < n) {
                const x0 = root.xOf(c.firstAfter) - root.slot / 2
                ctx.fillStyle = Theme.accentSoft
                ctx.fillRect(x0, root.plotTop, root.plotRight - x0, root.plotBottom - root.plotTop)
                ctx.fillStyle = Theme.textMuted
                ctx.textAlign = "left"
                ctx.textBaseline = "bottom"
                ctx.fillText(qsTr("after the start"), x0 + 4, root.plotTop - 2)
                ctx.textAlign = "right"
                ctx.fillText(qsTr("before"), x0 - 4, root.plotTop - 2)
            }
            // Grid and axis labels.
            ctx.textAlign = "right"
            ctx.textBaseline = "middle"
            const labels = c.axisLabels
            for (let k = 0; k < labels.length; ++k) {
                const y = root.plotBottom - k / Math.max(1, labels.length - 1) * (root.plotBottom - root.plotTop)
                ctx.strokeStyle = k === 0 ? "#9aa3af" : "#e3e6ea"
                ctx.lineWidth = 1
                ctx.beginPath()
                ctx.moveTo(root.plotLeft, Math.round(y) + 0.5)
                ctx.lineTo(root.plotRight, Math.round(y) + 0.5)
                ctx.stroke()
                ctx.fillStyle = Theme.textMuted
                ctx.fillText(labels[k], root.plotLeft - 8, y)
            }
            if (n === 0)
                return
            // Centre line and limits, stepped per match (limits depend on each match's sample).
            const steps = (values, colour, width, dash) => {
                ctx.strokeStyle = colour
                ctx.lineWidth = width
                ctx.setLineDash(dash)
                for (let k = 0; k < n; ++k) {
                    if (isNaN(values[k])) continue
                    ctx.beginPath()
                    ctx.moveTo(root.xOf(k) - root.slot / 2, root.yOf(values[k]))
                    ctx.lineTo(root.xOf(k) + root.slot / 2, root.yOf(values[k]))
                    ctx.stroke()
                }
                ctx.setLineDash([])
            }
            steps(c.upperLimits, Theme.text, 1.3, [5, 4])
            steps(c.lowerLimits, Theme.text, 1.3, [5, 4])
            steps(c.centres, "#7c8594", 1.5, [])
            // EWMA.
            const ewmas = c.ewmas
            ctx.strokeStyle = Theme.accent
            ctx.lineWidth = 2.2
            ctx.beginPath()
            let drawing = false
            for (let k = 0; k < n; ++k) {
                if (isNaN(ewmas[k])) { drawing = false; continue }
                if (drawing) ctx.lineTo(root.xOf(k), root.yOf(ewmas[k]))
                else ctx.moveTo(root.xOf(k), root.yOf(ewmas[k]))
                drawing = true
            }
            ctx.stroke()
            // Each match's value.
            const values = c.values
            for (let k = 0; k < n; ++k) {
                if (isNaN(values[k])) continue
                ctx.beginPath()
                ctx.arc(root.xOf(k), root.yOf(values[k]), 3.6, 0, 2 * Math.PI)
                ctx.fillStyle = "#3b4352"
                ctx.fill()
                ctx.lineWidth = 1.2
                ctx.strokeStyle = "#ffffff"
                ctx.stroke()
            }
        }
    }

    // Everything the drawing reads; a change repaints.
    readonly property var drawn: [chart.values, chart.centres, chart.lowerLimits, chart.upperLimits,
                                  chart.ewmas, chart.axisLabels, chart.firstAfter, width, height]
    onDrawnChanged: canvas.requestPaint()

    // Matches beyond a limit, by side, and the match names below the plot.
    Repeater {
        model: root.chart
        delegate: Item {
            id: tick
            required property int index
            required property string matchId
            required property string shortDateText
            required property int side
            readonly property real value: root.chart.values[index] ?? NaN
            x: root.xOf(index) - width / 2
            y: 0
            width: root.slot
            height: root.height
            StateMarker {
                visible: tick.side !== 0 && !isNaN(tick.value)
                x: (tick.width - width) / 2
                y: root.yOf(tick.value) - height / 2
                zoneState: tick.side > 0 ? ZoneState.OnTarget : ZoneState.OffTarget
                size: 14
            }
            Label {
                anchors.horizontalCenter: parent.horizontalCenter
                y: root.plotBottom + 5
                visible: tick.index % Math.max(1, Math.ceil(64 / root.slot)) === 0
                text: tick.shortDateText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall - 1
            }
            Label {
                anchors.horizontalCenter: parent.horizontalCenter
                y: root.plotBottom + 19
                visible: tick.index % Math.max(1, Math.ceil(64 / root.slot)) === 0
                text: tick.matchId
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall - 2
            }
        }
    }

    MouseArea {
        id: pointer
        x: root.plotLeft
        y: root.plotTop
        width: root.plotRight - root.plotLeft
        height: root.plotBottom - root.plotTop
        hoverEnabled: true
    }

    Rectangle {
        visible: root.hoveredRow >= 0
        x: root.hoveredRow >= 0 ? root.xOf(root.hoveredRow) - root.slot / 2 : 0
        y: root.plotTop
        width: root.slot
        height: root.plotBottom - root.plotTop
        color: Qt.rgba(0, 0, 0, 0.06)
    }

    ToolTip {
        readonly property var point: root.hoveredRow >= 0 ? root.chart.point(root.hoveredRow) : ({})
        visible: root.hoveredRow >= 0
        delay: 150
        x: Math.min(root.width - width, pointer.x + pointer.mouseX + 14)
        y: Math.max(0, pointer.y + pointer.mouseY - height - 8)
        text: point.matchId === undefined ? ""
              : [point.matchId + " · " + point.shortDateText + " · " + (point.after ? qsTr("after") : qsTr("before")),
                 qsTr("Value %1 · centre %2 · %3").arg(point.valueText).arg(point.centreText).arg(point.limitsText),
                 qsTr("EWMA %1").arg(point.ewmaText),
                 point.sideText].filter(line => line.length > 0).join("\n")
    }
}
