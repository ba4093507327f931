// Calibration with match-to-match variation, in CI: seeded simulations of whole seasons judged
// by the model's own code (tests/model/variation_sim.h). The full study with more seasons and
// every table of docs/statistics.md is a benchmark, run on demand:
// build/tests/bench/pitchloop_variation_study.
//
// Numbers are invented (a simulated board); the aims come from docs/statistics.md.

#include "variation_sim.h"

#include <catch2/catch.hpp>

#include <cstdio>

using namespace pitchloop::model;
using namespace pitchloop::testutil::sim;

namespace {

struct Shares {
    double everOff = 0;  ///< on-target zone-seasons ever flagged off
    double claims = 0;   ///< reviews of the worst-looking zone that claim an improvement
    double detected = 0; ///< dropped zones flagged within 6 matches of the drop
};

/// On-target seasons: every zone's truth on its target all season.
double falseFlags(const std::vector<double>& chances, double sd, int seasons, std::uint64_t seed,
                  std::vector<double>* perZone = nullptr) {
    Board b;
    b.chances = chances;
    b.sd = sd;
    const auto targets = boardTargets(b.target);
    const FlagSettings settings;
    std::mt19937_64 rng(seed);
    int flagged = 0, total = 0;
    if (perZone) perZone->assign(chances.size(), 0);
    for (int k = 0; k < seasons; ++k) {
        const auto s = season(b, rng);
        const auto first = firstOff(s, targets, settings, b.matches);
        for (std::size_t z = 0; z < first.size(); ++z) {
            flagged += first[z] >= 0;
            ++total;
            if (perZone && first[z] >= 0) (*perZone)[z] += 1.0 / seasons;
        }
    }
    return static_cast<double>(flagged) / total;
}

double falseClaims(const std::vector<double>& chances, double sd, int seasons, std::uint64_t seed) {
    Board b;
    b.chances = chances;
    b.sd = sd;
    b.matches = 13;
    const auto targets = boardTargets(b.target);
    const FlagSettings settings;
    std::mt19937_64 rng(seed);
    int claims = 0;
    for (int k = 0; k < seasons; ++k) claims += reviewClaims(season(b, rng), targets, settings, 7, 5);
    return static_cast<double>(claims) / seasons;
}

/// Five of the 30 zones drop by ten points from match 12 on; the share of them flagged off at
/// one of matches 12–17.
double detection(double chances, double sd, int seasons, std::uint64_t seed) {
    Board b;
    b.chances.assign(30, chances);
    b.sd = sd;
    b.matches = 17;
    b.dropAt.assign(30, -1);
    for (int z : {2, 8, 14, 20, 26}) b.dropAt[static_cast<std::size_t>(z)] = 11;
    const auto targets = boardTargets(b.target);
    const FlagSettings settings;
    std::mt19937_64 rng(seed);
    int caught = 0, dropped = 0;
    for (int k = 0; k < seasons; ++k) {
        const auto first = firstOff(season(b, rng), targets, settings, b.matches);
        for (int z : {2, 8, 14, 20, 26}) {
            ++dropped;
            const int f = first[static_cast<std::size_t>(z)];
            caught += f >= 11 && f <= 16;
        }
    }
    return static_cast<double>(caught) / dropped;
}

} // namespace

TEST_CASE("on-target zones with match-to-match SD 0.08 are flagged in at most 5 % of seasons",
          "[calibration]") {
    // 30 zones with 4 to 40 chances a match, 34 matches, 60 seasons: 1,800 zone-seasons
    // (a share near 5 % is known to about ± 1 point).
    std::vector<double> perZone;
    const double share = falseFlags(spreadChances(), 0.08, 60, 20261204, &perZone);
    WARN("zone-seasons ever flagged off: " << share);
    CHECK(share <= 0.05);
    // Also within each third of the board (4–15, 16–28, 28–40 chances a match).
    for (int third = 0; third < 3; ++third) {
        double sum = 0;
        for (int z = third * 10; z < third * 10 + 10; ++z) sum += perZone[static_cast<std::size_t>(z)];
        INFO("third " << third << ": " << sum / 10);
        CHECK(sum / 10 <= 0.05);
    }
    // Pure noise (SD 0) is not flagged more often: the variation model does not make the rule
    // looser when there is none.
    CHECK(falseFlags(spreadChances(), 0.0, 20, 7) <= 0.05);
}

TEST_CASE("a review of the worst-looking unchanged zone claims an improvement at most 5 % of "
          "the time", "[calibration]") {
    // Truth unchanged all season; after match 8 a focus opens on the zone with the highest
    // P(miss) over the last five matches; five matches later it is reviewed. 400 seasons
    // (± 2.1 points near 5 %).
    const double claims = falseClaims(spreadChances(), 0.08, 400, 99);
    WARN("false claims: " << claims);
    CHECK(claims <= 0.05);
}

TEST_CASE("a ten-point drop at 15 chances a match is caught within six matches as often as "
          "the season budget allows", "[calibration]") {
    // 5 dropped zones × 60 seasons = 300 drops. The wish of 30 % cannot be met
    // together with at most 5 % false flags a zone-season at this sample size (docs/
    // statistics.md: even a test that knows when the drop happened and looks once, at 5 %,
    // catches about half; any rule that looks after every match must spend its 5 % over the
    // season). What this test holds: at least 5 % at 15 chances (8.0 % with this seed) and
    // 15 % at 40 (20.7 %); the issue stays open on the 30 % wish.
    const double at15 = detection(15, 0.08, 60, 5);
    const double at40 = detection(40, 0.08, 30, 6);
    WARN("caught within 6 at 15 a match: " << at15 << ", at 40: " << at40);
    CHECK(at15 >= 0.05);
    CHECK(at40 >= 0.15);
    CHECK(at40 > at15);
}
