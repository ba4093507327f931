pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import Pitchloop

// A zone's match-by-match series: each match's value (dots), the judged window's interval
// (shaded band), the EWMA (line) and the target in force (dashed), with the judged state of
// every match as a marker along the bottom. Hover a match for its numbers.
Item {
    id: root

    required property SeriesModel series
    property int focalRow: -1
    property string windowText
    property string ewmaText
    property string levelText
    /// Focuses on this zone: [{label, startRow, endRow (-1 while open), closed}], drawn as a
    /// line where the training started and a strip along the top while it ran.
    property var focusSpans: []

    readonly property real plotLeft: 58
    readonly property real plotRight: width - 16
    readonly property real plotTop: 10
    readonly property real plotBottom: height - 58
    readonly property real slot: series.count > 0 ? (plotRight - plotLeft) / series.count : 1
    readonly property int hoveredRow: pointer.containsMouse ? rowAt(pointer.mouseX) : -1

    implicitHeight: 320

    function xOf(i: int): real { return plotLeft + (i + 0.5) * slot }
    function yOf(v: real): real {
        const span = series.axisHigh - series.axisLow
        return plotBottom - (span > 0 ? (v - series.axisLow) / span : 0) * (plotBottom - plotTop)
    }
    function rowAt(x: real): int {
        const i = Math.floor((x - plotLeft) / slot)
        return i >= 0 && i < series.count ? i : -1
    }

    Canvas {
        id: canvas
        anchors.fill: parent
        onPaint: {
            const ctx = getContext("2d")
            ctx.reset()
            const s = root.series
            const n = s.count
            // Grid and axis labels.
            ctx.font = Theme.fontSmall + "px '" + Theme.fontFamily + "'"
            ctx.textAlign = "right"
            ctx.textBaseline = "middle"
            const labels = s.axisLabels
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
            // The focal match.
            if (root.focalRow >= 0) {
                ctx.fillStyle = Theme.accentSoft
                ctx.fillRect(root.xOf(root.focalRow) - root.slot / 2, root.plotTop, root.slot,
                             root.plotBottom - root.plotTop)
            }
            // Interval band of the judged window, in runs of matches that have one.
            const lows = s.lows, highs = s.highs
            ctx.fillStyle = Qt.rgba(0.04, 0.36, 0.6, 0.18)
            let i = 0
            while (i < n) {
                if (isNaN(lows[i]) || isNaN(highs[i])) { ++i; continue }
                let j = i
                while (j + 1 < n && !isNaN(lows[j + 1]) && !isNaN(highs[j + 1])) ++j
                ctx.beginPath()
                ctx.moveTo(root.xOf(i), root.yOf(highs[i]))
                for (let k = i + 1; k <= j; ++k) ctx.lineTo(root.xOf(k), root.yOf(highs[k]))
                for (let k = j; k >= i; --k) ctx.lineTo(root.xOf(k), root.yOf(lows[k]))
                ctx.closePath()
                ctx.fill()
                i = j + 1
            }
            // Target in force: a dashed step line.
            const targets = s.targets
            ctx.strokeStyle = Theme.text
            ctx.lineWidth = 1.5
            ctx.setLineDash([6, 4])
            for (let k = 0; k < n; ++k) {
                if (isNaN(targets[k])) continue
                ctx.beginPath()
                ctx.moveTo(root.xOf(k) - root.slot / 2, root.yOf(targets[k]))
                ctx.lineTo(root.xOf(k) + root.slot / 2, root.yOf(targets[k]))
                ctx.stroke()
            }
            ctx.setLineDash([])
            // EWMA line.
            const ewmas = s.ewmas
            ctx.strokeStyle = Theme.accent
            ctx.lineWidth = 2.5
            ctx.beginPath()
            let drawing = false
            for (let k = 0; k < n; ++k) {
                if (isNaN(ewmas[k])) { drawing = false; continue }
                if (drawing) ctx.lineTo(root.xOf(k), root.yOf(ewmas[k]))
                else ctx.moveTo(root.xOf(k), root.yOf(ewmas[k]))
                drawing = true
            }
            ctx.stroke()
            // Focuses: a line where the training started, a strip while it ran, a label.
            const spans = root.focusSpans
            for (let f = 0; f < spans.length; ++f) {
                const span = spans[f]
                const x0 = root.xOf(span.startRow) - root.slot / 2
                const x1 = span.endRow >= 0 ? root.xOf(span.endRow) + root.slot / 2 : root.plotRight
                const y = root.plotTop + f * 16
                ctx.fillStyle = Qt.rgba(0.04, 0.36, 0.6, 0.14)
                ctx.fillRect(x0, y, Math.max(1, x1 - x0), 14)
                ctx.strokeStyle = Theme.accent
                ctx.lineWidth = 1.5
                ctx.setLineDash([2, 3])
                ctx.beginPath()
                ctx.moveTo(Math.round(x0) + 0.5, root.plotTop)
                ctx.lineTo(Math.round(x0) + 0.5, root.plotBottom)
                ctx.stroke()
                ctx.setLineDash([])
                ctx.fillStyle = Theme.accent
                ctx.textAlign = "left"
                ctx.textBaseline = "middle"
                ctx.font = "bold " + Theme.fontSmall + "px '" + Theme.fontFamily + "'"
                ctx.fillText(span.label + (span.closed ? "" : " →"), x0 + 4, y + 7)
            }
            // Each match's own value.
            const values = s.values
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
    readonly property var drawn: [series.values, series.lows, series.highs, series.ewmas,
                                  series.targets, series.axisLabels, focalRow, focusSpans, width, height]
    onDrawnChanged: canvas.requestPaint()

    // The judged state after every match, and the dates below it.
    Repeater {
        model: root.series
        delegate: Item {
            id: tick
            required property int index
            required property int zoneState
            required property string shortDateText
            x: root.xOf(index) - width / 2
            y: root.plotBottom + 6
            width: root.slot
            height: 46
            StateMarker {
                anchors.horizontalCenter: parent.horizontalCenter
                zoneState: tick.zoneState
                size: Math.min(12, root.slot - 2)
            }
            Label {
                anchors.horizontalCenter: parent.horizontalCenter
                y: 18
                visible: tick.index % Math.max(1, Math.ceil(48 / root.slot)) === 0
                text: tick.shortDateText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall - 1
            }
        }
    }

    MouseArea {
        id: pointer
        x: root.plotLeft
        y: root.plotTop
        width: root.plotRight - root.plotLeft
        height: root.plotBottom - root.plotTop + 24
        hoverEnabled: true
        onPositionChanged: mouse => mouse.accepted = false
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
        readonly property var point: root.hoveredRow >= 0 ? root.series.point(root.hoveredRow) : ({})
        visible: root.hoveredRow >= 0
        delay: 150
        x: Math.min(root.width - width, pointer.x + pointer.mouseX + 14)
        y: Math.max(0, pointer.y + pointer.mouseY - height - 8)
        text: point.matchId === undefined ? ""
              : [point.matchId + " · " + point.dateText + " · " + point.opponent,
                 qsTr("This match: %1 (%2)").arg(point.valueText).arg(point.sampleText),
                 qsTr("%1: %2").arg(root.windowText).arg(point.windowText),
                 qsTr("%1: %2").arg(root.ewmaText).arg(point.ewmaText),
                 point.targetText.length > 0 ? qsTr("Target %1 · %2 %3").arg(point.targetText)
                                                .arg(point.stateText).arg(point.certaintyText)
                                             : qsTr("No target")].join("\n")
    }
}
