pragma Singleton
import QtQuick
import Pitchloop

// Colours, fonts and spacing of the whole app, and its two colour codes: a sequential scale for
// values (viridis: perceptually even, readable with the common colour-vision deficiencies and
// in grey) and the zone states, which always pair a colour with a shape and a word.
QtObject {
    // Surfaces and text
    readonly property color window: "#eef0f3"
    readonly property color surface: "#ffffff"
    readonly property color surfaceAlt: "#f6f7f9"
    readonly property color border: "#d5d9e0"
    readonly property color text: "#1b2230"
    readonly property color textMuted: "#586172"
    readonly property color accent: "#0a5c99"
    readonly property color accentSoft: "#dbe8f3"
    readonly property color sidebar: "#16202c"
    readonly property color sidebarText: "#c5cfdb"
    readonly property color sidebarActive: "#24364b"
    readonly property color sidebarMuted: "#7f8b9a"
    readonly property color error: "#a33a00"

    // The pitch
    readonly property color grass: "#2f5d3a"
    readonly property color line: "#ffffff"
    readonly property color lineCasing: "#0d1420"
    readonly property color noData: "#c9cdd3"
    readonly property color selection: "#ffffff"

    // Fonts
    readonly property string fontFamily: "DejaVu Sans"
    readonly property int fontSmall: 11
    readonly property int fontBody: 13
    readonly property int fontLarge: 15
    readonly property int fontTitle: 18
    readonly property int fontHeading: 24
    readonly property int fontDisplay: 40

    // Spacing
    readonly property int gapSmall: 4
    readonly property int gap: 8
    readonly property int gapLarge: 16
    readonly property int margin: 24
    readonly property int radius: 6
    readonly property int sidebarWidth: 212

    // Sequential value scale: viridis, nine evenly spaced stops from low to high.
    readonly property var scaleStops: ["#440154", "#472d7b", "#3b528b", "#2c728e", "#21918c",
                                       "#28ae80", "#5ec962", "#addc30", "#fde725"]

    function scaleColour(t: real): color {
        const n = scaleStops.length - 1
        const u = Math.max(0, Math.min(1, t)) * n
        const i = Math.min(n - 1, Math.floor(u))
        return blend(scaleStops[i], scaleStops[i + 1], u - i)
    }

    // Linear blend of two "#rrggbb" colours.
    function blend(a: string, b: string, f: real): color {
        const channel = (hex, k) => parseInt(hex.substr(1 + 2 * k, 2), 16) / 255
        return Qt.rgba(channel(a, 0) + (channel(b, 0) - channel(a, 0)) * f,
                       channel(a, 1) + (channel(b, 1) - channel(a, 1)) * f,
                       channel(a, 2) + (channel(b, 2) - channel(a, 2)) * f, 1)
    }

    // Text drawn on the scale: light on the dark two thirds, dark on the bright end.
    function textOnScale(t: real): color {
        return t < 0.62 ? "#ffffff" : "#1b2230"
    }

    // Zone states (Okabe–Ito colours); shapes are drawn by StateMarker.
    readonly property color offTarget: "#d55e00"
    readonly property color watch: "#e69f00"
    readonly property color likelyOff: "#cc79a7"
    readonly property color onTarget: "#009e73"
    readonly property color tooLittleData: "#6f7782"
    // Moments on a pitch: counted as yes (solid) and as no (dashed), light on the grass.
    readonly property color momentYes: "#ffffff"
    readonly property color momentNo: "#9ad0ff"

    function stateColour(state: int): color {
        switch (state) {
        case ZoneState.OffTarget: return offTarget
        case ZoneState.CloseToLine: return watch
        case ZoneState.LikelyOff: return likelyOff
        case ZoneState.OnTarget: return onTarget
        case ZoneState.TooLittleData: return tooLittleData
        default: return textMuted
        }
    }
}
