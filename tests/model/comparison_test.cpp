// Two sets of matches compared zone by zone (model/comparison.h): the split's reading, the
// difference map's numbers against the pooled sides, and a seeded check that with no true change
// the difference's 90 % interval leaves out 0 in about one zone in ten.

#include "comparison.h"

#include "pooling_sim.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <random>

using namespace pitchloop::model;

namespace {

const MetricSpec& builtin(const std::string& id) {
    for (const auto& m : builtinMetrics())
        if (m.id == id) return m;
    throw std::runtime_error("no built-in metric " + id);
}

MatchSummary summary(std::string id, std::string date, std::string venue, std::string opponent) {
    MatchSummary s;
    s.id = std::move(id);
    s.date = std::move(date);
    s.venue = std::move(venue);
    s.opponent = std::move(opponent);
    return s;
}

} // namespace

TEST_CASE("a split of the season's matches is read from words", "[comparison]") {
    CHECK(parseSplit("venue")->kind == MatchSplit::Kind::Venue);
    CHECK(parseSplit("date:2026-10-01")->value == "2026-10-01");
    CHECK(parseSplit("opponent:Duneford City")->value == "Duneford City");
    CHECK_FALSE(parseSplit("date:2026-02-30"));
    CHECK_FALSE(parseSplit("opponent:"));
    CHECK_FALSE(parseSplit("home"));
}

TEST_CASE("home and away on one map: each side pooled, the difference with its own interval", "[comparison]") {
    // Four matches on a 3 × 1 grid, regains: home matches 1 and 3, away 2 and 4.
    const ZoneGrid grid = ZoneGrid::equal(3, 1);
    SeasonTallies season;
    season.matchIds = {"M1", "M2", "M3", "M4"};
    season.dates = {"2026-08-01", "2026-08-08", "2026-08-15", "2026-08-22"};
    season.byMetric["regain_5s"] = {
        {{2, 5}, {3, 5}, {4, 5}}, {{1, 5}, {2, 5}, {2, 5}}, {{3, 5}, {3, 5}, {4, 5}}, {{1, 5}, {1, 5}, {3, 5}}};
    const std::vector<MatchSummary> summaries{summary("M1", "2026-08-01", "home", "A"),
                                              summary("M2", "2026-08-08", "away", "B"),
                                              summary("M3", "2026-08-15", "home", "B"),
                                              summary("M4", "2026-08-22", "away", "C")};
    FlagSettings settings;
    settings.matchVariation = false; // effective counts are the counts: checkable by hand
    const Comparison c = compareSplit(season, summaries, builtin("regain_5s"), grid, *parseSplit("venue"), settings);
    REQUIRE(c.problem.empty());
    CHECK(c.firstMatches == std::vector<std::string>{"M1", "M3"});
    CHECK(c.secondMatches == std::vector<std::string>{"M2", "M4"});
    REQUIRE(c.zones.size() == 3);
    // Home sums 5/10, 6/10, 8/10; away 2/10, 3/10, 5/10: the same pooling as poolZones on them.
    const PooledMap home = poolZones({{1, 1, 5, 10}, {2, 1, 6, 10}, {3, 1, 8, 10}}, grid, MetricKind::Rate, 0.90, 1.0);
    const PooledMap away = poolZones({{1, 1, 2, 10}, {2, 1, 3, 10}, {3, 1, 5, 10}}, grid, MetricKind::Rate, 0.90, 1.0);
    for (std::size_t i = 0; i < 3; ++i) {
        const ZoneDifference& d = c.zones[i];
        CHECK(d.first.pooled == Approx(home.zones[i].pooled));
        CHECK(d.second.pooled == Approx(away.zones[i].pooled));
        CHECK(d.difference == Approx(away.zones[i].pooled - home.zones[i].pooled));
        const double sd = std::hypot(home.zones[i].sd, away.zones[i].sd);
        // 1.6448536269514722 = scipy.stats.norm.ppf(0.95); Φ by the complementary error function.
        CHECK(d.interval.high - d.difference == Approx(1.6448536269514722 * sd));
        CHECK(d.probSecondHigher == Approx(0.5 * std::erfc(-d.difference / sd / std::sqrt(2.0))));
        CHECK(d.probSecondHigher < 0.5); // fewer regains away
    }
    // A side with no match is named, and no map is drawn.
    const Comparison none = compareSplit(season, summaries, builtin("regain_5s"), grid, *parseSplit("opponent:Z"), settings);
    CHECK(none.problem == "no match is Z in this season");
    CHECK(none.zones.empty());
}

TEST_CASE("with no true change, the difference's 90 % interval leaves out 0 in at most about a tenth of zones", "[comparison]") {
    // 100 seasons of 10 matches on the default grid, every zone's truth the same in both halves
    // (a gradient plus each zone's own offset, pooling_sim.h's numbers), 15 chances a match,
    // match-to-match SD 0.08, the dispersion estimated from the season as the flags do.
    using pitchloop::testutil::pooling::betaDraw;
    std::mt19937_64 rng(20261205u);
    std::normal_distribution<double> offset(0, 0.05);
    const ZoneGrid grid;
    long zones = 0, excluded = 0;
    for (int s = 0; s < 100; ++s) {
        SeasonTallies season;
        std::vector<MatchSummary> summaries;
        std::vector<double> truth;
        for (int b = 1; b <= grid.bands(); ++b)
            for (int l = 1; l <= grid.lanes(); ++l)
                truth.push_back(std::clamp(0.35 + 0.2 * (b - 1) / 5.0 + offset(rng), 0.05, 0.95));
        auto& tallies = season.byMetric["regain_5s"];
        for (int m = 0; m < 10; ++m) {
            const std::string date = "2026-08-" + std::string(m < 9 ? "0" : "") + std::to_string(m + 1);
            season.matchIds.push_back("M" + std::to_string(m));
            season.dates.push_back(date);
            summaries.push_back(summary("M" + std::to_string(m), date, m % 2 ? "away" : "home", "X"));
            MatchTally t;
            for (const double p : truth) {
                std::poisson_distribution<int> chances(15);
                const int n = chances(rng);
                std::binomial_distribution<int> wins(n, betaDraw(rng, p, 0.08));
                t.push_back({wins(rng), n});
            }
            tallies.push_back(t);
        }
        const Comparison c = compareSplit(season, summaries, builtin("regain_5s"), grid, *parseSplit("venue"), FlagSettings{});
        for (const auto& d : c.zones) {
            if (std::isnan(d.difference)) continue;
            ++zones;
            if (d.interval.low > 0 || d.interval.high < 0) ++excluded;
        }
    }
    const double share = static_cast<double>(excluded) / static_cast<double>(zones);
    INFO(excluded << " of " << zones << " zones");
    // Today 134 of 3,000 (4.5 %): pooling each side toward its own neighbours makes the interval
    // err on the side of not calling a change. It must never claim changes more often than its
    // level, and must not be so wide it can never call one.
    CHECK(share >= 0.02);
    CHECK(share <= 0.12);
}
