import QtQuick
import QtTest
import Pitchloop
import PitchloopTest

// The targets page's zone picking on a real club file: a click takes one zone, Shift+click adds
// (or takes out) one, a drag takes every zone of the rectangle, clamped to the pitch; and the
// value field takes "45%" for a rate, which is stored as 45 %.
TestCase {
    id: testCase

    name: "TargetEditor"
    width: 1068
    height: 760
    visible: true
    when: windowShown

    property Item picker: null

    TestClub {
        id: club
    }

    TargetsPage {
        id: page
        anchors.fill: parent
        session: club.session
    }

    function zonePoint(band: int, lane: int): point {
        return picker.zoneCentre(band, lane)
    }

    function clickZone(band: int, lane: int, modifiers: int) {
        const p = zonePoint(band, lane)
        mouseClick(picker, p.x, p.y, Qt.LeftButton, modifiers)
    }

    function dragZones(from: point, to: point, modifiers: int) {
        mouseDrag(picker, from.x, from.y, to.x - from.x, to.y - from.y, Qt.LeftButton, modifiers)
    }

    function typeText(text: string) {
        for (const c of text)
            keyClick(c)
    }

    function initTestCase() {
        page.editor.today = "2026-11-15"
        page.editor.metricId = "regain_5s"
        picker = findChild(page, "zonePicker")
        verify(picker, "the page has a zone picker")
        tryVerify(() => picker.width > 300 && picker.geometry.bands === 6 && page.editor.zones.count === 30)
        waitForRendering(page)
    }

    function init() {
        page.editor.clearSelection()
    }

    function test_clickTakesOneZone() {
        clickZone(2, 5, Qt.NoModifier)
        compare(page.editor.selectedZones, ["2,5"])
        clickZone(3, 1, Qt.NoModifier)
        compare(page.editor.selectedZones, ["3,1"])
    }

    function test_shiftClickAddsAndTakesOut() {
        clickZone(2, 5, Qt.NoModifier)
        clickZone(3, 5, Qt.ShiftModifier)
        clickZone(4, 5, Qt.ShiftModifier)
        compare(page.editor.selectedZones, ["2,5", "3,5", "4,5"])
        clickZone(3, 5, Qt.ShiftModifier)
        compare(page.editor.selectedZones, ["2,5", "4,5"])
    }

    function test_dragTakesTheRectangle() {
        dragZones(zonePoint(2, 2), zonePoint(3, 4), Qt.NoModifier)
        compare(page.editor.selectedZones, ["2,2", "2,3", "2,4", "3,2", "3,3", "3,4"])
        // Corners the other way round: the same block.
        dragZones(zonePoint(3, 4), zonePoint(2, 2), Qt.NoModifier)
        compare(page.editor.selectedCount, 6)
    }

    function test_shiftDragAdds() {
        clickZone(6, 5, Qt.NoModifier)
        dragZones(zonePoint(1, 1), zonePoint(1, 2), Qt.ShiftModifier)
        compare(page.editor.selectedZones, ["1,1", "1,2", "6,5"])
    }

    function test_dragBeyondTheTouchlineStopsAtIt() {
        // From band 5, lane 2 down past the bottom edge (our right touchline): lanes 1 and 2.
        const from = zonePoint(5, 2)
        dragZones(from, Qt.point(from.x, picker.height - 2), Qt.NoModifier)
        compare(page.editor.selectedZones, ["5,1", "5,2"])
    }

    // The zone labels drawn on the pitch whose zone is selected.
    function markedZones(item: Item): var {
        let out = []
        for (let i = 0; i < item.children.length; ++i) {
            const child = item.children[i]
            if (child.targetText !== undefined && child.selected === true)
                out.push(child.band + "," + child.lane)
            out = out.concat(markedZones(child))
        }
        return out
    }

    function test_selectedZonesAreMarkedOnThePitch() {
        clickZone(2, 2, Qt.NoModifier)
        clickZone(2, 3, Qt.ShiftModifier)
        compare(markedZones(picker).sort(), ["2,2", "2,3"])
        clickZone(4, 4, Qt.NoModifier)
        compare(markedZones(picker), ["4,4"])
    }

    function test_valueFieldTakesAPercentage() {
        clickZone(4, 2, Qt.NoModifier)
        const value = findChild(page, "valueField")
        const author = findChild(page, "authorField")
        verify(value && author)
        value.forceActiveFocus()
        value.selectAll()
        typeText("45%")
        compare(value.text, "45%")
        compare(page.editor.valueText, "45%")
        author.forceActiveFocus()
        author.selectAll()
        typeText("Q. Tester")
        mouseClick(findChild(page, "saveButton"))
        compare(page.editor.formError, "")
        verify(page.editor.focusTargetText.startsWith("≥ 45.0%"), page.editor.focusTargetText)
        compare(value.text, "45%") // the form keeps what was typed
        // A refused value keeps its text and says why.
        value.forceActiveFocus()
        value.selectAll()
        typeText("lots")
        mouseClick(findChild(page, "saveButton"))
        verify(page.editor.formError.indexOf("Value “lots”") >= 0, page.editor.formError)
        compare(value.text, "lots")
    }
}
