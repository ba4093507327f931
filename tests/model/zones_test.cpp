// Zone grids: equal grids scaled to the pitch, grids cut at the pitch markings, boundaries,
// and the grid names the command line and the club file use.

#include "zones.h"

#include <catch2/catch.hpp>

#include <string>
#include <vector>

using namespace pitchloop::model;

namespace {

std::string text(Zone z) { return "(" + std::to_string(z.band) + "," + std::to_string(z.lane) + ")"; }

std::string zoneText(const ZoneGrid& grid, Point p, const Pitch& pitch) {
    return text(grid.zoneOf(p, pitch));
}

void checkEdges(const std::vector<double>& actual, const std::vector<double>& expected) {
    REQUIRE(actual.size() == expected.size());
    for (std::size_t i = 0; i < expected.size(); ++i) {
        INFO("edge " << i);
        CHECK(actual[i] == Approx(expected[i]).margin(1e-9));
    }
}

const Pitch kStandard{105, 68};

} // namespace

TEST_CASE("the default grid is 6 equal bands by 5 equal lanes") {
    const ZoneGrid grid;
    CHECK(grid.kind() == ZoneGrid::Kind::Equal);
    CHECK(grid.bands() == 6);
    CHECK(grid.lanes() == 5);
    CHECK(grid.zoneCount() == 30); // 6 × 5
    CHECK(grid == ZoneGrid::equal(6, 5));
    CHECK(grid.name() == "equal:6x5");
}

TEST_CASE("equal 6 × 5 edges on a 105 × 68 pitch") {
    const ZoneGrid grid;
    // Bands: 105 / 6 = 17.5 m each.
    checkEdges(grid.bandEdges(kStandard), {0, 17.5, 35, 52.5, 70, 87.5, 105});
    // Lanes: 68 / 5 = 13.6 m each.
    checkEdges(grid.laneEdges(kStandard), {0, 13.6, 27.2, 40.8, 54.4, 68});
}

TEST_CASE("equal grids scale with the pitch") {
    const ZoneGrid grid;
    SECTION("120 × 80") {
        // 120 / 6 = 20 m bands, 80 / 5 = 16 m lanes
        checkEdges(grid.bandEdges({120, 80}), {0, 20, 40, 60, 80, 100, 120});
        checkEdges(grid.laneEdges({120, 80}), {0, 16, 32, 48, 64, 80});
    }
    SECTION("100 × 64") {
        // 100 / 6 = 16.67 m bands, 64 / 5 = 12.8 m lanes
        checkEdges(grid.bandEdges({100, 64}),
                   {0, 100.0 / 6, 200.0 / 6, 50, 400.0 / 6, 500.0 / 6, 100});
        checkEdges(grid.laneEdges({100, 64}), {0, 12.8, 25.6, 38.4, 51.2, 64});
    }
    SECTION("the same point falls in different zones on different pitches") {
        // (100, 60) on 105 × 68: 100 / 17.5 = 5.71 → band 6; 60 / 13.6 = 4.41 → lane 5.
        CHECK(zoneText(grid, {100, 60}, kStandard) == "(6,5)");
        // On 120 × 80: 100 / 20 = 5 exactly → boundary, band 6; 60 / 16 = 3.75 → lane 4.
        CHECK(zoneText(grid, {100, 60}, {120, 80}) == "(6,4)");
        // (50, 30) on 105 × 68: 50 / 17.5 = 2.86 → band 3; 30 / 13.6 = 2.21 → lane 3.
        CHECK(zoneText(grid, {50, 30}, kStandard) == "(3,3)");
        // On 90 × 45: bands of 15, lanes of 9: 50 / 15 = 3.33 → band 4; 30 / 9 = 3.33 → lane 4.
        CHECK(zoneText(grid, {50, 30}, {90, 45}) == "(4,4)");
    }
    SECTION("the centre of every zone maps to that zone, on several pitches") {
        const Pitch pitch = GENERATE(Pitch{105, 68}, Pitch{120, 80}, Pitch{100, 64}, Pitch{90, 45});
        for (int band = 1; band <= 6; ++band) {
            for (int lane = 1; lane <= 5; ++lane) {
                // Centre of zone (b, l): ((b − ½)·L/6, (l − ½)·W/5)
                const Point centre{(band - 0.5) * pitch.lengthM / 6, (lane - 0.5) * pitch.widthM / 5};
                INFO("pitch " << pitch.lengthM << " x " << pitch.widthM);
                CHECK(zoneText(grid, centre, pitch) == text(Zone{band, lane}));
            }
        }
    }
}

TEST_CASE("equal grids of other sizes") {
    // 3 × 3 on 105 × 68: bands of 35 m, lanes of 22.67 m.
    const ZoneGrid grid = ZoneGrid::equal(3, 3);
    CHECK(grid.zoneCount() == 9);
    checkEdges(grid.bandEdges(kStandard), {0, 35, 70, 105});
    checkEdges(grid.laneEdges(kStandard), {0, 68.0 / 3, 136.0 / 3, 68});
    // (50, 30): 50 / 35 = 1.43 → band 2; 30 / 22.67 = 1.32 → lane 2.
    CHECK(zoneText(grid, {50, 30}, kStandard) == "(2,2)");
}

TEST_CASE("boundaries go to the higher index; far edges to the last zone") {
    const ZoneGrid grid;
    SECTION("the origin is zone (1,1)") {
        CHECK(zoneText(grid, {0, 0}, kStandard) == "(1,1)");
    }
    SECTION("points on inner boundaries go up") {
        // 17.5 is the band 1|2 edge, 13.6 the lane 1|2 edge.
        CHECK(zoneText(grid, {17.5, 13.6}, kStandard) == "(2,2)");
        CHECK(zoneText(grid, {35, 27.2}, kStandard) == "(3,3)");
        CHECK(zoneText(grid, {52.5, 40.8}, kStandard) == "(4,4)");
        CHECK(zoneText(grid, {70, 54.4}, kStandard) == "(5,5)");
        CHECK(zoneText(grid, {87.5, 0}, kStandard) == "(6,1)");
        // On 120 × 80 the edges are at multiples of 20 and 16.
        CHECK(zoneText(grid, {20, 16}, {120, 80}) == "(2,2)");
        CHECK(zoneText(grid, {100, 64}, {120, 80}) == "(6,5)");
    }
    SECTION("points just below a boundary stay down") {
        CHECK(zoneText(grid, {17.49, 13.59}, kStandard) == "(1,1)");
        CHECK(zoneText(grid, {87.49, 54.39}, kStandard) == "(5,4)");
    }
    SECTION("far edges x = L and y = W fall in the last band and lane") {
        CHECK(zoneText(grid, {105, 68}, kStandard) == "(6,5)");
        CHECK(zoneText(grid, {105, 0}, kStandard) == "(6,1)");
        CHECK(zoneText(grid, {0, 68}, kStandard) == "(1,5)");
        CHECK(zoneText(grid, {120, 80}, {120, 80}) == "(6,5)");
    }
    SECTION("ZoneLocator agrees with ZoneGrid::zoneOf") {
        const ZoneLocator locator(grid, kStandard);
        for (double x = 0; x <= 105; x += 2.5) {
            for (double y = 0; y <= 68; y += 3.4) {
                INFO("(" << x << ", " << y << ")");
                CHECK(locator.zoneOf({x, y}) == grid.zoneOf({x, y}, kStandard));
                CHECK(locator.indexOf({x, y}) == grid.indexOf(grid.zoneOf({x, y}, kStandard)));
            }
        }
    }
}

TEST_CASE("binOf counts the inner edges at or below a value") {
    const std::vector<double> edges{0, 10, 20, 30};
    CHECK(binOf(0, edges) == 1);
    CHECK(binOf(9.999, edges) == 1);
    CHECK(binOf(10, edges) == 2);  // on the 1|2 boundary: the higher bin
    CHECK(binOf(25, edges) == 3);
    CHECK(binOf(30, edges) == 3);  // the far edge: the last bin
    CHECK(binOf(-1, edges) == 1);  // off the low end (the reader clamps; still bin 1)
    CHECK(binOf(31, edges) == 3);  // off the high end: still the last bin
}

TEST_CASE("zone index is band-major") {
    const ZoneGrid grid;
    // (b − 1) × 5 + (l − 1)
    CHECK(grid.indexOf({1, 1}) == 0);
    CHECK(grid.indexOf({1, 5}) == 4);
    CHECK(grid.indexOf({2, 1}) == 5);
    CHECK(grid.indexOf({4, 3}) == 17); // 3 × 5 + 2
    CHECK(grid.indexOf({6, 5}) == 29);
    for (int i = 0; i < grid.zoneCount(); ++i) CHECK(grid.indexOf(grid.zoneAt(i)) == i);
}

TEST_CASE("lanes cut at the pitch markings") {
    // Laws of the Game, Law 1: the goal is 7.32 m wide; the goal area reaches 5.5 m either side
    // of the posts, so it is 7.32 + 2 × 5.5 = 18.32 m wide; the penalty area reaches 16.5 m either
    // side, so it is 7.32 + 2 × 16.5 = 40.32 m wide. Both are centred on the goal, so their side
    // lines are at W/2 ± 9.16 m and W/2 ± 20.16 m.
    CHECK(kGoalAreaWidthM == Approx(7.32 + 2 * 5.5));
    CHECK(kPenaltyAreaWidthM == Approx(7.32 + 2 * 16.5));

    const ZoneGrid grid = ZoneGrid::markings(6);
    CHECK(grid.kind() == ZoneGrid::Kind::Markings);
    CHECK(grid.bands() == 6);
    CHECK(grid.lanes() == 5);
    CHECK(grid.zoneCount() == 30);

    SECTION("on 105 × 68") {
        // W/2 = 34: 34 − 20.16 = 13.84, 34 − 9.16 = 24.84, 34 + 9.16 = 43.16, 34 + 20.16 = 54.16
        checkEdges(grid.laneEdges(kStandard), {0, 13.84, 24.84, 43.16, 54.16, 68});
        // Bands stay equal: 105 / 6 = 17.5
        checkEdges(grid.bandEdges(kStandard), {0, 17.5, 35, 52.5, 70, 87.5, 105});
        // Lane widths: wing 13.84, half-space 16.5 − 5.5 = 11, centre 18.32, half-space 11, wing 13.84.
        const auto e = grid.laneEdges(kStandard);
        CHECK(e[1] - e[0] == Approx(13.84));
        CHECK(e[2] - e[1] == Approx(11.0));
        CHECK(e[3] - e[2] == Approx(18.32));
        CHECK(e[4] - e[3] == Approx(11.0));
        CHECK(e[5] - e[4] == Approx(13.84));
    }
    SECTION("on 100 × 64 the lanes move with the centre line of the pitch") {
        // W/2 = 32: 32 − 20.16 = 11.84, 32 − 9.16 = 22.84, 32 + 9.16 = 41.16, 32 + 20.16 = 52.16
        checkEdges(grid.laneEdges({100, 64}), {0, 11.84, 22.84, 41.16, 52.16, 64});
        // 12 m from our right touchline is a wing on 105 × 68 (12 < 13.84) but a half-space on
        // 100 × 64 (11.84 ≤ 12 < 22.84).
        // x = 60: 60 / 17.5 = 3.43 and 60 / 16.67 = 3.6, band 4 on both pitches.
        CHECK(zoneText(grid, {60, 12}, kStandard) == "(4,1)");
        CHECK(zoneText(grid, {60, 12}, {100, 64}) == "(4,2)");
    }
    SECTION("points on and beside the marking lines (105 × 68)") {
        CHECK(zoneText(grid, {10, 0}, kStandard) == "(1,1)");
        CHECK(zoneText(grid, {10, 13.83}, kStandard) == "(1,1)");
        CHECK(zoneText(grid, {10, 13.84}, kStandard) == "(1,2)"); // penalty-area line: up
        CHECK(zoneText(grid, {10, 24.83}, kStandard) == "(1,2)");
        CHECK(zoneText(grid, {10, 24.84}, kStandard) == "(1,3)"); // goal-area line: up
        CHECK(zoneText(grid, {10, 34}, kStandard) == "(1,3)");    // the centre of the goal
        CHECK(zoneText(grid, {10, 43.16}, kStandard) == "(1,4)");
        CHECK(zoneText(grid, {10, 54.15}, kStandard) == "(1,4)");
        CHECK(zoneText(grid, {10, 54.16}, kStandard) == "(1,5)");
        CHECK(zoneText(grid, {105, 68}, kStandard) == "(6,5)");   // far corner: last zone
    }
    SECTION("other band counts") {
        const ZoneGrid four = ZoneGrid::markings(4);
        // 105 / 4 = 26.25 m bands, lanes as above
        checkEdges(four.bandEdges(kStandard), {0, 26.25, 52.5, 78.75, 105});
        CHECK(four.zoneCount() == 20);
        CHECK(zoneText(four, {52.5, 34}, kStandard) == "(3,3)");
    }
}

TEST_CASE("grid names read back with parse") {
    const std::string name = GENERATE(as<std::string>{}, "equal:6x5", "equal:3x3", "equal:1x1",
                                      "equal:20x20", "equal:4x6", "markings:6", "markings:3",
                                      "markings:1", "markings:20");
    const auto grid = ZoneGrid::parse(name);
    REQUIRE(grid.has_value());
    CHECK(grid->name() == name);
    CHECK(ZoneGrid::parse(grid->name()) == grid);
}

TEST_CASE("parse builds the grid it names") {
    CHECK(ZoneGrid::parse("equal:6x5") == ZoneGrid());
    CHECK(ZoneGrid::parse("equal:4x6") == ZoneGrid::equal(4, 6));
    CHECK(ZoneGrid::parse("markings:6") == ZoneGrid::markings(6));
    const auto g = ZoneGrid::parse("equal:4x6");
    REQUIRE(g);
    CHECK(g->bands() == 4);
    CHECK(g->lanes() == 6);
    CHECK(ZoneGrid::equal(4, 6).name() == "equal:4x6");
    CHECK(ZoneGrid::markings(3).name() == "markings:3");
}

TEST_CASE("parse rejects text that is not a grid") {
    const std::string bad = GENERATE(as<std::string>{}, "", "equal", "equal:", "equal:6",
                                     "equal:6x", "equal:x5", "equal:0x5", "equal:6x0",
                                     "equal:21x5", "equal:6x21", "equal:-1x5", "equal:+6x5",
                                     "equal: 6x5", "equal:6x5 ", "equal:6.5x5", "equal:6X5",
                                     "equal:6x5x2", "EQUAL:6x5", "markings", "markings:",
                                     "markings:0", "markings:21", "markings:6x5", "markings:six",
                                     "grid:6x5", "6x5");
    INFO("'" << bad << "'");
    CHECK_FALSE(ZoneGrid::parse(bad).has_value());
}

TEST_CASE("a position logged on a line goes to the higher zone despite binary rounding",
          "[zones]") {
    // On a 64 m wide pitch the third lane line is 3 × 12.8 = 38.4 m, which binary arithmetic
    // gives as 38.400000000000006. A point logged at y = 38.4 is on that line: lane 4.
    const ZoneGrid grid = ZoneGrid::equal(6, 5);
    const Pitch pitch{100, 64};
    REQUIRE(grid.laneEdges(pitch)[3] > 38.4); // the rounding this test is about
    CHECK(grid.zoneOf({50, 38.4}, pitch).lane == 4);
    CHECK(grid.zoneOf({50, 38.39}, pitch).lane == 3);
    // 8.3 − 3.3 style sums land a hair below a line: still the higher zone.
    CHECK(grid.zoneOf({(100.0 / 6) * 2 - 1e-9, 10}, pitch).band == 3);
}
