// The pooled zone map (model/pooling.h): two small cases worked by hand (exact fractions; the
// interval quantiles from Debian's python3-scipy, beta.ppf and gamma.ppf, values beside each
// check), and a seeded simulation with known zone truths: the pooled values are closer to the
// truth than the raw ratios and their 90 % intervals cover at about their level.

#include "pooling.h"
#include "pooling_sim.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;

TEST_CASE("a share pooled toward its neighbours, worked by hand", "[pooling]") {
    // Three zones in a row (3 bands × 1 lane): 2 of 10, 5 of 10, 8 of 10; whole pitch 15/30 = 0.5,
    // one average zone = 10 chances. Every zone's neighbourhood value μ is 0.5: e.g. zone 1:
    // (10 × 0.5 + 5) / (10 + 10). τ² = (10·0.3² − 0.25 + 10·0² − 0.25 + 10·0.3² − 0.25) / 30
    // = 1.05 / 30 = 0.035; κ = 0.25 / 0.035 − 1 = 43/7 (under the cap of 4 × 10).
    const ZoneGrid grid = ZoneGrid::equal(3, 1);
    const auto map = poolZones({{1, 1, 2, 10}, {2, 1, 5, 10}, {3, 1, 8, 10}}, grid, MetricKind::Rate, 0.90, 1.0);
    CHECK(map.fit.wholeValue == Approx(0.5));
    CHECK(map.fit.between == Approx(0.035));
    REQUIRE(map.zones.size() == 3);
    CHECK(map.zones[0].prior == Approx(0.5));
    CHECK(map.zones[0].strength == Approx(43.0 / 7));
    // (2 + κ/2) / (10 + κ) = (71/14) / (113/7) = 71/226.
    CHECK(map.zones[0].pooled == Approx(71.0 / 226).epsilon(1e-12));
    CHECK(map.zones[1].pooled == Approx(0.5));
    CHECK(map.zones[2].pooled == Approx(155.0 / 226).epsilon(1e-12));
    // The interval: a Beta with the pooled mean m and variance m(1 − m)/(113/7 + 1) (the posterior
    // Beta(71/14, 155/14)'s) plus (κ share 43/113)² · 0.25 · 10/20² for μ's own noise (its one
    // neighbour's 10 chances against 10 of the whole pitch) = 0.013473712376328087; scipy.stats.
    // beta.ppf(0.05 and 0.95, m·k, (1 − m)·k), k = m(1 − m)/V − 1: 0.13816381456627283, 0.5192063270341318.
    CHECK(map.zones[0].interval.low == Approx(0.13816381456627283).epsilon(1e-9));
    CHECK(map.zones[0].interval.high == Approx(0.5192063270341318).epsilon(1e-9));
    CHECK(map.zones[0].spread == Approx(0.5192063270341318 - 0.13816381456627283).epsilon(1e-9));
    CHECK(map.zones[0].ownWeight() == Approx(10 / (10 + 43.0 / 7)));
}

TEST_CASE("counts a match pooled, with the prior capped at four average zones", "[pooling]") {
    // 2 in 2 matches, 12 in 4, 10 in 4: whole pitch 24/10 = 2.4, one average zone = 10/3 matches.
    // μ: zone 1 (8 + 12) / (10/3 + 4) = 30/11; zone 2 (8 + 2 + 10) / (10/3 + 6) = 15/7; zone 3
    // 30/11. τ² = Σ e(r − μ)² − μ over Σe = 0.1514927 (exact fractions in python3); μ/τ² is 18.0,
    // 14.1 and 18.0 matches, over the cap 4 × 10/3 = 40/3: κ = 40/3 everywhere.
    const ZoneGrid grid = ZoneGrid::equal(3, 1);
    const auto map = poolZones({{1, 1, 2, 2}, {2, 1, 12, 4}, {3, 1, 10, 4}}, grid, MetricKind::Count, 0.90, 1.0);
    CHECK(map.fit.between == Approx(0.15149266318097487).epsilon(1e-9));
    for (const auto& z : map.zones) CHECK(z.strength == Approx(40.0 / 3));
    // (2 + 40/3 · 30/11) / (2 + 40/3) = 633/253; (12 + 40/3 · 15/7) / (4 + 40/3) = 213/91.
    CHECK(map.zones[0].pooled == Approx(633.0 / 253).epsilon(1e-12));
    CHECK(map.zones[1].pooled == Approx(213.0 / 91).epsilon(1e-12));
    CHECK(map.zones[2].pooled == Approx(765.0 / 286).epsilon(1e-12));
    // The interval: a Gamma with mean m = 633/253 and variance m/(46/3) + (κ share)² · μ · 4/(4 + 10/3)²
    // = 0.3165598871749569; scipy.stats.gamma.ppf(0.05 and 0.95, m²/V, scale = V/m):
    // 1.6538135689268623, 3.493598765565588.
    CHECK(map.zones[0].interval.low == Approx(1.6538135689268623).epsilon(1e-9));
    CHECK(map.zones[0].interval.high == Approx(3.493598765565588).epsilon(1e-9));
}

TEST_CASE("a zone with no data takes its neighbourhood's value; no data at all gives none", "[pooling]") {
    const ZoneGrid grid = ZoneGrid::equal(3, 1);
    auto map = poolZones({{1, 1, 0, 0}, {2, 1, 6, 10}, {3, 1, 4, 10}}, grid, MetricKind::Rate, 0.90, 1.0);
    CHECK(std::isnan(map.zones[0].raw));
    CHECK(map.zones[0].pooled == Approx(map.zones[0].prior));
    map = poolZones({{1, 1, 0, 0}}, grid, MetricKind::Rate, 0.90, 1.0);
    CHECK(std::isnan(map.zones[0].pooled));
}

TEST_CASE("pooled maps beat the raw ratios on simulated seasons and cover at their level", "[pooling]") {
    // 200 maps of 30 zones at 8 and 15 chances a match, SD 0.08 from match to match (seeded;
    // the full table by chances a match is the study's, tests/bench/pooling_study.cpp).
    using namespace pitchloop::testutil::pooling;
    for (const double chances : {8.0, 15.0}) {
        Setup setup;
        setup.meanChances = chances;
        const Score s = simulate(setup, 200, 20261205u);
        INFO(chances << " chances a match: MSE raw " << s.mseRaw() << ", pooled " << s.msePooled()
                     << ", coverage " << s.coverage());
        CHECK(s.msePooled() < 0.8 * s.mseRaw());
        CHECK(s.coverage() >= 0.86);
        CHECK(s.coverage() <= 0.96);
    }
}
