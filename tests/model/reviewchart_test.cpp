// A review's control chart against the published formulas, what readChart reports about it,
// stored reviews read back, and the frozen evidence of a focus. Hand-made seasons; every
// expected number is worked out in the test from the formula it names.

#include "focus.h"
#include "reviewreading.h"
#include "season_fixture.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <nlohmann/json.hpp>

using namespace pitchloop::model;
using namespace pitchloop::testutil;
using Catch::Matchers::WithinAbs;

namespace {

const std::vector<std::string> kDates{"2026-08-08", "2026-08-15", "2026-08-22", "2026-08-29",
                                      "2026-09-05", "2026-09-12", "2026-09-19"};

Focus focusOn(const std::string& metric, std::vector<Zone> zones, const std::string& start) {
    Focus f;
    f.id = 3;
    f.squad = "First team";
    f.season = "2026-27";
    f.metric = metric;
    f.zones = std::move(zones);
    f.startDate = start;
    f.openedAfterMatch = ""; // opened without a match's flag: no window to leave out
    f.openedBy = "R. Tamsin";
    return f;
}

const ReviewOptions pure{false, {}};

} // namespace

TEST_CASE("a review's p-chart follows the NIST/SEMATECH p-chart formulas", "[review][chart]") {
    // NIST/SEMATECH e-Handbook of Statistical Methods, §6.3.3.2 Proportions control charts:
    // centre p̄ = Σx/Σn over the baseline, limits p̄ ± 3·sqrt(p̃(1 − p̃)/n_i) for each sample's
    // own n_i, clipped to [0, 1] — with the spread's p̃ = (Σx + ½)/(Σn + 1), the baseline
    // smoothed by half a success so that a baseline of 0 % or 100 % still has limits of some
    // width (the handbook's p̄ when Σn is large). No match-to-match variation here (the
    // beta-binomial spread is checked in variation_test.cpp). The focus sums two zones.
    SeasonFixture s(ZoneGrid{}, kDates);
    // Before (M1–M3), zones (3,3) + (3,4): 12/20 + 8/20, 30/40 + 0/0, 5/10 + 5/10.
    s.set("pass_completion", 0, 3, 3, 12, 20);
    s.set("pass_completion", 0, 3, 4, 8, 20);
    s.set("pass_completion", 1, 3, 3, 30, 40);
    s.set("pass_completion", 2, 3, 3, 5, 10);
    s.set("pass_completion", 2, 3, 4, 5, 10);
    // After (M4–M7): 30/35, 2/10, 25/25 and 1/4.
    s.set("pass_completion", 3, 3, 3, 30, 35);
    s.set("pass_completion", 4, 3, 4, 2, 10);
    s.set("pass_completion", 5, 3, 3, 25, 25);
    s.set("pass_completion", 6, 3, 4, 1, 4);
    const auto result = computeReview(focusOn("pass_completion", {{3, 3}, {3, 4}}, "2026-08-25"),
                                      builtin("pass_completion"), s.season, s.grid, 3, 4, 0.95,
                                      0.3, pure);
    REQUIRE(result.review);
    const Review& r = *result.review;
    const double pSmooth = 60.5 / 101;
    const std::vector<long> x{20, 30, 10, 30, 2, 25, 1}, n{40, 40, 20, 35, 10, 25, 4};
    const double pBar = (20.0 + 30 + 10) / (40 + 40 + 20); // Σx/Σn of the before window = 0.6
    REQUIRE(r.chart.size() == x.size());
    for (std::size_t i = 0; i < x.size(); ++i) {
        INFO("match M" << i + 1);
        const double half = 3 * std::sqrt(pSmooth * (1 - pSmooth) / static_cast<double>(n[i]));
        const double p = static_cast<double>(x[i]) / static_cast<double>(n[i]);
        CHECK(r.chart[i].after == (i >= 3));
        CHECK_THAT(r.chart[i].value, WithinAbs(p, 1e-12));
        CHECK_THAT(r.chart[i].centre, WithinAbs(pBar, 1e-12));
        CHECK_THAT(r.chart[i].lcl, WithinAbs(std::max(0.0, pBar - half), 1e-12));
        CHECK_THAT(r.chart[i].ucl, WithinAbs(std::min(1.0, pBar + half), 1e-12));
        CHECK(r.chart[i].above == (p > std::min(1.0, pBar + half)));
        CHECK(r.chart[i].below == (p < std::max(0.0, pBar - half)));
    }
    // By hand: n = 35 → 0.6 ± 0.2485, 30/35 = 0.857 above; n = 10 → 0.6 ± 0.4650, upper
    // clipped to 1, 0.2 inside; n = 25 → ±0.2941, 1.0 above; n = 4 → ±0.7352, both clipped.
    CHECK(r.chart[3].above);
    CHECK(r.chart[4].ucl == 1.0);
    CHECK_FALSE(r.chart[4].below);
    CHECK(r.chart[5].above);
    CHECK(r.chart[6].lcl == 0.0);
    CHECK(r.chart[6].ucl == 1.0);

    // Higher is better for pass completion: two after matches above the limit, none below.
    const ChartReading c = readChart(r);
    CHECK(c.beforeMatches == 3);
    CHECK(c.afterMatches == 4);
    CHECK(c.afterOnBetterSide == 2);
    CHECK(c.afterOnWorseSide == 0);
    CHECK(c.beforeOutside == 0);
    CHECK(c.low == 0.0);  // the clipped lower limit of M7
    CHECK(c.high == 1.0); // M6's value and the clipped upper limits
}

TEST_CASE("readChart sides follow the metric's better side on a u-chart", "[review][chart]") {
    // Counts a match (lower is better): before 20, 22, 18 → ū = 20, limits 20 ± 3·√ũ with
    // ũ = 60.5/3 (smoothed as above) = [6.528, 33.472] (the Poisson counterpart of the same
    // handbook section's chart).
    SeasonFixture s(ZoneGrid{}, kDates);
    const long counts[] = {20, 22, 18, 5, 35, 20, 19};
    for (std::size_t i = 0; i < 7; ++i) s.set("pre_shot_passes_against", i, 2, 5, counts[i], 1);
    const auto result =
        computeReview(focusOn("pre_shot_passes_against", {{2, 5}}, "2026-08-25"),
                      builtin("pre_shot_passes_against"), s.season, s.grid, 3, 4, 0.95, 0.3, pure);
    REQUIRE(result.review);
    CHECK_THAT(result.review->chart[0].lcl, WithinAbs(20 - 3 * std::sqrt(60.5 / 3), 1e-12));
    const ChartReading c = readChart(*result.review);
    CHECK(c.afterOnBetterSide == 1); // 5 below the lower limit
    CHECK(c.afterOnWorseSide == 1);  // 35 above the upper limit
    CHECK_THAT(c.low, WithinAbs(5.0, 1e-12));
    CHECK_THAT(c.high, WithinAbs(35.0, 1e-12));
}

TEST_CASE("a stored review reads back with every number", "[review]") {
    SeasonFixture s(ZoneGrid{}, kDates);
    for (std::size_t i = 0; i < 7; ++i) s.set("pass_completion", i, 3, 3, 10 + static_cast<long>(i), 30);
    s.set("pass_completion", 4, 3, 3, 0, 0); // a match without chances: NaN value, null in JSON
    auto result = computeReview(focusOn("pass_completion", {{3, 3}}, "2026-08-25"),
                                builtin("pass_completion"), s.season, s.grid, 3, 4);
    REQUIRE(result.review);
    Review r = *result.review;
    r.trainingMinutes = 95;
    const auto back = reviewFromJson(reviewToJson(r));
    REQUIRE(back);
    CHECK(back->focusId == r.focusId);
    CHECK(back->kind == MetricKind::Rate);
    CHECK(back->better == Better::Higher);
    CHECK(back->zones == r.zones);
    CHECK(back->before.matchIds == r.before.matchIds);
    CHECK(back->after.num == r.after.num);
    CHECK(back->after.totalDen == r.after.totalDen);
    CHECK_THAT(back->difference, WithinAbs(r.difference, 1e-12));
    CHECK_THAT(back->pTwoSided, WithinAbs(r.pTwoSided, 1e-12));
    CHECK(back->testName == r.testName);
    REQUIRE(back->chart.size() == r.chart.size());
    CHECK(std::isnan(back->chart[4].value));
    CHECK_THAT(back->chart[5].ucl, WithinAbs(r.chart[5].ucl, 1e-12));
    CHECK(back->chart[5].after);
    CHECK(back->trainingMinutes == 95);
    CHECK_FALSE(reviewFromJson("{\"focus_id\": 1}"));
    CHECK_FALSE(reviewFromJson("not json"));
}

TEST_CASE("a focus's evidence freezes the flag in three windows", "[review][evidence]") {
    // pass_completion 20 of 40 in (3,3) every match against a target of at least 80 %:
    // off target over the last five matches; (3,4) has no target.
    SeasonFixture s(ZoneGrid{}, kDates);
    for (std::size_t i = 0; i < 7; ++i) s.set("pass_completion", i, 3, 3, 20, 40);
    const std::vector<Target> targets{
        target("pass_completion", 3, 3, Direction::AtLeast, 0.8, 0.05, 10)};
    const FlagSettings settings;
    const FocusEvidence e = focusEvidence(s.season, 5, builtin("pass_completion"), targets, s.grid,
                                          settings, {{3, 3}, {3, 4}}, false, "2026-09-13T08:00:00Z");
    CHECK(e.matchId == "M6");
    CHECK(e.date == "2026-09-12");
    CHECK(e.slipped);
    REQUIRE(e.zones.size() == 6); // two zones × (match, last5, season)
    const auto judged = std::find_if(e.zones.begin(), e.zones.end(), [](const EvidenceZone& z) {
        return z.band == 3 && z.lane == 3 && z.window == "last5";
    });
    REQUIRE(judged != e.zones.end());
    CHECK(judged->state == FlagState::OffTarget);
    CHECK_THAT(judged->value, WithinAbs(0.5, 1e-12)); // 100 of 200
    CHECK(judged->num == 100);
    REQUIRE(judged->target);
    CHECK(judged->target->value == 0.8);
    CHECK(judged->pMiss > 0.999);
    const auto bare = std::find_if(e.zones.begin(), e.zones.end(), [](const EvidenceZone& z) {
        return z.band == 3 && z.lane == 4;
    });
    CHECK(bare->state == FlagState::NoTarget);
    CHECK(std::isnan(bare->value)); // 0 of 0: stored as null, read back as NaN
    CHECK_FALSE(bare->target);

    const nlohmann::json stored = nlohmann::json::parse(e.json);
    CHECK(stored["match_id"] == "M6");
    CHECK(stored["frozen_at"] == "2026-09-13T08:00:00Z");
    CHECK(stored["zones"].size() == 6);
    CHECK(readEvidence(e.json, "last5").slipped);
    CHECK_FALSE(readEvidence(e.json, "ewma0.3").slipped);

    // The whole pitch takes the whole-pitch status, not the zones'.
    const FocusEvidence whole = focusEvidence(s.season, 5, builtin("pass_completion"), targets,
                                              s.grid, settings, {}, true, "t");
    REQUIRE(whole.zones.size() == 3);
    CHECK(whole.zones[0].band == 0);
    CHECK_FALSE(whole.slipped); // no whole-pitch target
}

TEST_CASE("a focus's dates: matches since its start and the day after its match", "[review]") {
    SeasonFixture s(ZoneGrid{}, kDates);
    CHECK(matchesSince(s.season, "2026-08-22") == 5); // 22 Aug itself counts
    CHECK(matchesSince(s.season, "2026-09-20") == 0);
    // Until today: a match dated after it has not been played yet.
    CHECK(matchesSince(s.season, "2026-08-22", "2026-08-29") == 2);
    CHECK(matchesSince(s.season, "2026-08-22", "2026-08-21") == 0);
    // The matches played by a day: the leading run of dates on or before it, every metric cut.
    s.addMetric("regain_5s");
    const SeasonTallies played = playedBy(s.season, "2026-08-29");
    CHECK(played.matchIds == std::vector<std::string>{"M1", "M2", "M3", "M4"});
    CHECK(played.byMetric.at("regain_5s").size() == 4);
    CHECK(playedBy(s.season, "2027-01-01").matchIds.size() == s.season.matchIds.size());
    CHECK(playedBy(s.season, "2026-01-01").matchIds.empty());
    CHECK(dayAfter("2026-09-26") == "2026-09-27");
    CHECK(dayAfter("2026-12-31") == "2027-01-01");
    CHECK(dayAfter("2028-02-28") == "2028-02-29"); // a leap year
    CHECK(dayAfter("2027-02-28") == "2027-03-01");
}

TEST_CASE("a baseline of 0 % still gives the chart limits of some width", "[review][chart]") {
    // Before (M1–M3): 0 of 10 each; after: 2, 0, 1, 0 of 10. The plain p-chart's limits would be
    // 0 ± 0 (every after match with a success "above"); smoothed by half a success,
    // p̃ = 0.5/31, each limit is 0 ± 3·√(p̃(1 − p̃)/10) → upper 0.1195 (hand-derived): 1 of 10
    // is inside it, 2 of 10 above.
    SeasonFixture s(ZoneGrid{}, kDates);
    const long after[] = {2, 0, 1, 0};
    for (std::size_t i = 0; i < 3; ++i) s.set("pass_completion", i, 3, 3, 0, 10);
    for (std::size_t i = 0; i < 4; ++i) s.set("pass_completion", i + 3, 3, 3, after[i], 10);
    const auto result = computeReview(focusOn("pass_completion", {{3, 3}}, "2026-08-25"),
                                      builtin("pass_completion"), s.season, s.grid, 3, 4, 0.95,
                                      0.3, pure);
    REQUIRE(result.review);
    const double pt = 0.5 / 31;
    const auto& chart = result.review->chart;
    REQUIRE(chart.size() == 7);
    for (const auto& p : chart) {
        CHECK_THAT(p.centre, WithinAbs(0.0, 1e-12));
        CHECK_THAT(p.ucl, WithinAbs(3 * std::sqrt(pt * (1 - pt) / 10), 1e-12));
        CHECK(p.ucl > 0.119);
    }
    CHECK(chart[3].above);       // 2 of 10
    CHECK_FALSE(chart[4].above); // 0 of 10
    CHECK_FALSE(chart[5].above); // 1 of 10
}
