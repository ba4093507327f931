import QtQuick
import QtTest
import Pitchloop

// The heat-map key shows its title and every label of its range, spread evenly from the scale's
// low end at the left to its high end at the right, and its swatches and state names only when
// asked; compact, the key sits below the scale.
TestCase {
    id: testCase

    name: "Legend"
    width: 760
    height: 220
    visible: true
    when: windowShown

    Legend {
        id: legend
        width: 740
        title: "Regains within 5 s, last 5 matches"
        labels: ["20%", "30%", "40%", "50%", "60%"]
    }

    // Every visible text under an item, with the item that shows it.
    function texts(item: Item): var {
        let out = []
        for (let i = 0; i < item.children.length; ++i) {
            const child = item.children[i]
            if (child.text !== undefined && child.visible && typeof child.text === "string" && child.text.length > 0)
                out.push(child)
            out = out.concat(texts(child))
        }
        return out
    }

    function shown(text: string): var {
        return texts(legend).find(t => t.text === text)
    }

    function init() {
        legend.compact = false
        legend.showStates = true
        legend.showSwatches = true
        legend.labels = ["20%", "30%", "40%", "50%", "60%"]
        waitForRendering(legend)
    }

    function test_titleAndEveryLabel() {
        verify(shown(legend.title), "title shown")
        for (const label of legend.labels)
            verify(shown(label), label + " shown")
    }

    function test_labelsSpanTheScaleEvenly() {
        const items = legend.labels.map(l => shown(l))
        const span = items[0].parent.width
        verify(span > 200, "the scale is drawn " + span + " px wide")
        // Low end flush left, high end flush right, the middle ones centred on their steps.
        compare(items[0].x, 0)
        fuzzyCompare(items[4].x + items[4].width, span, 1)
        for (let i = 1; i < 4; ++i)
            fuzzyCompare(items[i].x + items[i].width / 2, span * i / 4, 1)
        for (let i = 1; i < items.length; ++i)
            verify(items[i].x > items[i - 1].x, "labels in order, low to high")
    }

    function test_otherRangeRelabels() {
        legend.labels = ["0", "2", "4"]
        waitForRendering(legend)
        verify(shown("0") && shown("2") && shown("4"))
        verify(!shown("20%"), "old labels gone")
    }

    function test_statesAndSwatchesOnRequest() {
        for (const name of ["Off target", "Likely off", "Close to the line", "On target", "Too little data", "no items"])
            verify(shown(name), name + " shown")
        legend.showStates = false
        legend.showSwatches = false
        for (const name of ["Off target", "Likely off", "Close to the line", "On target", "Too little data", "no items"])
            verify(!shown(name), name + " hidden")
        verify(shown(legend.title))
    }

    function test_compactPutsTheKeyBelow() {
        const scale = shown("20%")
        const state = shown("Off target")
        verify(state.mapToItem(legend, 0, 0).x > scale.mapToItem(legend, 0, 0).x + 200, "wide: key beside")
        legend.compact = true
        waitForRendering(legend)
        verify(shown("Off target").mapToItem(legend, 0, 0).y > shown("20%").mapToItem(legend, 0, 0).y, "compact: key below")
    }
}
