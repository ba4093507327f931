import QtQuick
import QtTest
import Pitchloop

// A click on the pitch map names the zone under the pointer: every zone's centre on the equal
// grid and on the markings grid, two points placed by hand (our goal on the left, lane 1 at
// the bottom), and nothing for a click beyond the lines.
TestCase {
    id: testCase

    name: "PitchMap"
    width: 600
    height: 420
    visible: true
    when: windowShown

    PitchGeometry {
        id: geometry
        length: 105
        width: 68
    }

    PitchMap {
        id: map
        anchors.fill: parent
        geometry: geometry
    }

    SignalSpy {
        id: clicks
        target: map
        signalName: "zoneClicked"
    }

    // The pitch drawing is centred in the map; a point given in drawing metres, in map pixels.
    function at(metresX: real, metresY: real): point {
        const ox = (map.width - geometry.extentLength * map.pxPerMetre) / 2
        const oy = (map.height - geometry.extentWidth * map.pxPerMetre) / 2
        return Qt.point(ox + metresX * map.pxPerMetre, oy + metresY * map.pxPerMetre)
    }

    function clickAt(p: point) {
        mouseClick(map, p.x, p.y)
    }

    function init() {
        clicks.clear()
        geometry.grid = "equal:6x5"
    }

    function checkEveryZoneCentre() {
        let expected = 0
        for (let band = 1; band <= geometry.bands; ++band) {
            for (let lane = 1; lane <= geometry.lanes; ++lane) {
                const r = geometry.zoneRect(band, lane)
                clickAt(at(r.x + r.width / 2, r.y + r.height / 2))
                ++expected
                compare(clicks.count, expected)
                compare(clicks.signalArguments[expected - 1][0], band, "band of zone " + band + "," + lane)
                compare(clicks.signalArguments[expected - 1][1], lane, "lane of zone " + band + "," + lane)
            }
        }
    }

    function test_everyZoneOfTheEqualGrid() {
        compare(geometry.bands, 6)
        compare(geometry.lanes, 5)
        checkEveryZoneCentre()
    }

    function test_everyZoneOfTheMarkingsGrid() {
        geometry.grid = "markings:6"
        compare(geometry.lanes, 5)
        checkEveryZoneCentre()
    }

    function test_pointsPlacedByHand() {
        // 10 m from our goal line, 5 m in from our right touchline (the bottom edge): band 1
        // (0–17.5 m), lane 1 (0–13.6 m).
        clickAt(at(geometry.margin + 10, geometry.margin + 68 - 5))
        // 100 m up the pitch, 60 m across from our right touchline: band 6, lane 5.
        clickAt(at(geometry.margin + 100, geometry.margin + 68 - 60))
        // Markings grid, 20 m across: past the penalty-area line (13.84 m) but short of the
        // goal-area line (24.84 m) — lane 2; 40 m up — band 3 (35–52.5 m).
        geometry.grid = "markings:6"
        clickAt(at(geometry.margin + 40, geometry.margin + 68 - 20))
        compare(clicks.count, 3)
        const zones = [0, 1, 2].map(i => [clicks.signalArguments[i][0], clicks.signalArguments[i][1]])
        compare(zones, [[1, 1], [6, 5], [3, 2]])
    }

    function test_beyondTheLinesPicksNothing() {
        clickAt(at(geometry.margin / 2, geometry.margin + 30)) // behind our goal line
        clickAt(at(geometry.margin + 50, geometry.margin / 3)) // beyond the left touchline
        compare(clicks.count, 0)
    }
}
