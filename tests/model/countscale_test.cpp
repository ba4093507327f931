// What a count map is read per (model/countscale.h): the window's exposure per match, a zone's
// effective counts on each scale, worked by hand; and the club file's minutes and opponent
// passes against a direct reading of the demo's match files.

#include "countscale.h"

#include "matchreader.h"
#include "ingest.h"
#include "repository.h"
#include "testutil.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;

TEST_CASE("a window's exposure per match, as windowSum weighs its matches", "[countscale]") {
    const std::vector<MatchExposure> e{{90, 400}, {96, 300}, {93, 500}};
    // The last two: (96/90 + 93/90) / 2 = 1.05 units of 90 minutes; (3 + 5) / 2 = 4 hundreds.
    CHECK(exposurePerMatch(e, 2, Window{Window::Kind::LastN, 2, 0.3}, CountScale::Per90) == Approx(1.05));
    CHECK(exposurePerMatch(e, 2, Window{Window::Kind::LastN, 2, 0.3}, CountScale::PerOpponentPasses) == Approx(4));
    CHECK(exposurePerMatch(e, 1, Window{Window::Kind::Match, 1, 0.3}, CountScale::PerOpponentPasses) == Approx(3));
    // EWMA λ 0.5 at match 3: weights 0.5, 0.25, 0.125 → (0.5·5 + 0.25·3 + 0.125·4) / 0.875 = 3.2857.
    CHECK(exposurePerMatch(e, 2, Window{Window::Kind::Ewma, 0, 0.5}, CountScale::PerOpponentPasses) ==
          Approx(3.75 / 0.875));
    CHECK(exposurePerMatch(e, 2, Window{}, CountScale::PerMatch) == 1);
}

TEST_CASE("a zone's counts on each scale", "[countscale]") {
    ZoneStatus zone, whole;
    zone.band = 2;
    zone.lane = 5;
    zone.sum.num = 34;
    zone.sum.den = 5;
    zone.sum.effNum = 17; // a design effect of 2
    zone.sum.effDen = 2.5;
    whole.sum.num = 184;
    whole.sum.den = 5;
    // Per match: the effective counts as they are (6.8 a match).
    ZoneCount c = scaledCount(zone, whole, CountScale::PerMatch, 1);
    CHECK(c.num / c.den == Approx(6.8));
    // Per 100 of their passes at 4 hundreds a match: 34 / (5 × 4) = 1.7.
    c = scaledCount(zone, whole, CountScale::PerOpponentPasses, 4);
    CHECK(c.num == 17);
    CHECK(c.den == 10);
    CHECK(c.num / c.den == Approx(1.7));
    // A share of the pitch's total: 34 of 184, both halved by the zone's design effect.
    c = scaledCount(zone, whole, CountScale::ShareOfTotal, 1);
    CHECK(c.num == 17);
    CHECK(c.den == 92);
    CHECK(scaledKind(CountScale::ShareOfTotal) == MetricKind::Rate);
    CHECK(countScaleFromString("per90") == CountScale::Per90);
    CHECK_FALSE(countScaleFromString("per minute"));
}

TEST_CASE("the club file's minutes and opponent passes are the match files'", "[countscale][repository]") {
    ClubRepository repo(":memory:");
    long passes = 0;
    double seconds = 0;
    const auto path = pitchloop::testutil::sourcePath("sample-club/matches/KB-2026-01.json");
    REQUIRE(ingestFile(repo, path.string()).ok());
    const auto read = readMatchFile(path);
    REQUIRE(read.ok());
    for (const auto& e : read.match->events) passes += e.side == Side::Opp && e.type == EventType::Pass;
    for (const auto& p : read.match->info.periods) seconds += p.lengthS;
    const auto exposures = repo.seasonExposures("First team", "2026-27");
    REQUIRE(exposures.size() == 1);
    CHECK(exposures[0].opponentPasses == passes);
    CHECK(exposures[0].minutes == Approx(seconds / 60));
    CHECK(passes > 100);
}
