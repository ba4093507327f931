import QtQuick
import QtTest
import Pitchloop

// One debrief line in both layers of words: plain words show the zone's sentence and hide the
// numbers' columns (which a hover shows); the numbers show value, target and P(miss) in columns
// and hide the sentence (which a hover shows).
TestCase {
    id: testCase

    name: "DebriefItem"
    width: 1100
    height: 200
    visible: true
    when: windowShown

    DebriefItemDelegate {
        id: line
        width: 1080
        metricId: "pre_shot_passes_against"
        metricName: "Their passes before their shots"
        band: 2
        lane: 5
        zoneText: "Our left-back area (B2·L5)"
        valueText: "6.8"
        intervalText: "4.8–9.4"
        sampleText: "5 matches"
        targetText: "≤ 2"
        certaintyText: "P(miss) > 0.999"
        zoneState: ZoneState.OffTarget
        stateText: "Off target"
        isNew: false
        changeText: ""
        section: "Off target over the last 5 matches"
        firstInSection: true
        coachText: "Their build-up before shots ran through our left-back area 6.8 times a match over the last 5 matches; we aim for at most 2. This is very unlikely to be bad luck."
        analystText: "6.8 (90% interval 4.8–9.4) · 5 matches · target ≤ 2 · P(miss) > 0.999 · off target"
    }

    function visibleTexts(item: Item): var {
        let out = []
        for (let i = 0; i < item.children.length; ++i) {
            const child = item.children[i]
            if (!child.visible) continue
            if (typeof child.text === "string" && child.text.length > 0) out.push(child.text)
            out = out.concat(visibleTexts(child))
        }
        return out
    }

    function test_plainWords() {
        line.plainWords = true
        const shown = visibleTexts(line.contentItem)
        verify(shown.indexOf(line.coachText) >= 0, "the sentence is shown")
        verify(shown.indexOf("P(miss) > 0.999") < 0, "P(miss) is not a column")
        verify(shown.indexOf("target ≤ 2") < 0, "the target is not a column")
        compare(line.hoverText, line.analystText, "the numbers are one hover away")
    }

    function test_numbers() {
        line.plainWords = false
        const shown = visibleTexts(line.contentItem)
        verify(shown.indexOf(line.coachText) < 0, "no sentence")
        verify(shown.indexOf("P(miss) > 0.999") >= 0, "P(miss) in its column")
        verify(shown.indexOf("target ≤ 2") >= 0, "the target in its column")
        compare(line.hoverText, line.coachText, "the sentence is one hover away")
        verify(line.height < 30 + 62, "a numbers line is shorter than a sentence line")
    }
}
