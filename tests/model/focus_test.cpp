// Focuses and follow-up reviews: the numbers of a review on hand-made seasons, checked against
// Debian's scipy 1.10.1 and statsmodels 0.13.5 (expressions beside each value), the plain-word
// problems when a review cannot be computed, and storage of a verdict with its numbers.

#include "focus.h"
#include "season_fixture.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cmath>

using namespace pitchloop::model;
using namespace pitchloop::testutil;
using Catch::Matchers::Contains;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;

namespace {

const std::vector<std::string> kDates{"2026-08-08", "2026-08-15", "2026-08-22", "2026-08-29",
                                      "2026-09-05", "2026-09-12", "2026-09-19", "2026-09-26"};

Focus focusOn(const std::string& metric, std::vector<Zone> zones, const std::string& start) {
    Focus f;
    f.id = 7;
    f.squad = "First team";
    f.season = "2026-27";
    f.metric = metric;
    f.zones = std::move(zones);
    f.startDate = start;
    f.openedAfterMatch = "M4";
    f.openedBy = "R. Tamsin";
    return f;
}

} // namespace

namespace {

/// The review's normal approximation, written out independently of the model: a window's
/// variance p̃(1 − p̃)/n with p̃ = (x + ½)/(n + 1) for rates, (c + ½)/e² for counts.
double rateVar(double x, double n) {
    const double p = (x + 0.5) / (n + 1);
    return p * (1 - p) / n;
}
double countVar(double c, double e) { return (c + 0.5) / (e * e); }
double phi(double z) { return 0.5 * std::erfc(-z / std::sqrt(2.0)); } // standard normal cdf

ReviewOptions pureNoise() {
    ReviewOptions o;
    o.matchVariation = false;
    return o;
}

} // namespace

TEST_CASE("a rate review leaves out the flag's matches and reads the change against the rest",
          "[review]") {
    // pass_completion in zone (3,3): 30, 32, 28, 30 of 40 in M1–M4, 36, 35, 37, 36 of 40 in
    // M5–M8. The focus was opened after M4 on its match alone (old evidence without a judged
    // window reads as the match): M4 raised the flag and is left out of the baseline.
    SeasonFixture s(ZoneGrid{}, kDates);
    const long before[] = {30, 32, 28, 30}, after[] = {36, 35, 37, 36};
    for (std::size_t i = 0; i < 4; ++i) {
        s.set("pass_completion", i, 3, 3, before[i], 40);
        s.set("pass_completion", i + 4, 3, 3, after[i], 40);
    }
    Focus f = focusOn("pass_completion", {{3, 3}}, "2026-09-01");
    f.minChange = 0.05;
    const auto result =
        computeReview(f, builtin("pass_completion"), s.season, s.grid, 4, 4, 0.95, 0.3, pureNoise());
    REQUIRE(result.review);
    const Review& r = *result.review;
    CHECK(r.before.matchIds == std::vector<std::string>{"M1", "M2", "M3"});
    CHECK(r.trigger.matchIds == std::vector<std::string>{"M4"});
    CHECK(r.after.matchIds == std::vector<std::string>{"M5", "M6", "M7", "M8"});
    CHECK(r.before.totalNum == 90);
    CHECK(r.after.totalNum == 144);
    CHECK_THAT(r.baselineNote, Contains("only 3 of the 4 wanted"));
    // No other zone has passes: nothing to read the change against, the expected value is the
    // baseline's 0.75 and the effect is the plain difference 0.90 − 0.75.
    CHECK_THAT(r.expected, WithinAbs(0.75, 1e-12));
    CHECK_THAT(r.effect, WithinAbs(0.15, 1e-12));
    const double se = std::sqrt(rateVar(144, 160) + rateVar(90, 120));
    CHECK_THAT(r.probImproved, WithinAbs(phi(0.15 / se), 1e-12));
    CHECK_THAT(r.probImprovedByMinChange, WithinAbs(phi((0.15 - 0.05) / se), 1e-12));
    CHECK_THAT(r.pImproved, WithinAbs(1 - phi(0.15 / se), 1e-12));
    // z = 1.959963985 (REFERENCES.md) for the 95 % interval of the effect.
    CHECK_THAT(r.effectInterval.low, WithinAbs(0.15 - 1.959963985 * se, 1e-8));
    CHECK(r.finding == ReviewFinding::ImprovedByMinChange); // P(≥ 5 points) = 0.9799
    // p-chart from the baseline: p̄ = 0.75, limits 0.75 ± 3·√(p̃(1 − p̃)/40), p̃ = 90.5/121.
    REQUIRE(r.chart.size() == 8);
    const double pt = 90.5 / 121;
    CHECK_THAT(r.chart[0].centre, WithinAbs(0.75, 1e-12));
    CHECK_THAT(r.chart[0].ucl, WithinAbs(0.75 + 3 * std::sqrt(pt * (1 - pt) / 40), 1e-12));
    CHECK(r.chart[3].trigger);
    CHECK(r.chart[4].after);
    CHECK_FALSE(r.chart[2].after);
    // EWMA of the match values weighted by chances, from M1 on with no seed:
    // z_t = Σ 0.7^(t−s)·x_s / Σ 0.7^(t−s)·40.
    double num = 0, den = 0;
    for (double x : {30.0, 32.0, 28.0, 30.0, 36.0}) {
        num = 0.7 * num + x;
        den = 0.7 * den + 40;
    }
    CHECK_THAT(r.chart[4].ewma, WithinAbs(num / den, 1e-12));
    CHECK_THAT(r.chart[0].ewma, WithinAbs(0.75, 1e-12)); // no pull towards any seed
    CHECK_FALSE(r.trainingMinutes.has_value());
}

TEST_CASE("a team-wide change is not credited to the drills (difference in differences)",
          "[review]") {
    // As above, but every other zone of band 3 also rose by 15 points: (3,4) had 20 of 40 in
    // each match before and 26 of 40 after. The focus zone did what the rest of the pitch did.
    SeasonFixture s(ZoneGrid{}, kDates);
    const long before[] = {30, 32, 28, 30}, after[] = {36, 35, 37, 36};
    for (std::size_t i = 0; i < 4; ++i) {
        s.set("pass_completion", i, 3, 3, before[i], 40);
        s.set("pass_completion", i + 4, 3, 3, after[i], 40);
        s.set("pass_completion", i, 3, 4, 20, 40);
        s.set("pass_completion", i + 4, 3, 4, 26, 40);
    }
    const auto result = computeReview(focusOn("pass_completion", {{3, 3}}, "2026-09-01"),
                                      builtin("pass_completion"), s.season, s.grid, 4, 4, 0.95,
                                      0.3, pureNoise());
    REQUIRE(result.review);
    const Review& r = *result.review;
    // Control: 60/120 = 0.50 before (M1–M3), 104/160 = 0.65 after.
    CHECK_THAT(r.controlBefore.value, WithinAbs(0.5, 1e-12));
    CHECK_THAT(r.controlAfter.value, WithinAbs(0.65, 1e-12));
    // Expected without training: 0.75 + 0.15 = 0.90; effect 0.90 − 0.90 = 0.
    CHECK_THAT(r.expected, WithinAbs(0.90, 1e-12));
    CHECK_THAT(r.effect, WithinAbs(0.0, 1e-12));
    CHECK_THAT(r.probImproved, WithinAbs(0.5, 1e-12));
    CHECK(r.finding == ReviewFinding::NoClearChange);
    // The raw difference is still reported: +15 points.
    CHECK_THAT(r.difference, WithinAbs(0.15, 1e-12));
}

TEST_CASE("the baseline is the K matches before the flag's own window", "[review]") {
    // Ten weekly matches M1..M10 with 5, 6, 4, 8, 11, 3, 4, 1, 3, 0 passes in zone (2,5). The
    // focus was opened after M8 on a last-2 window (M7, M8 raised the flag).
    std::vector<std::string> dates = kDates;
    dates.push_back("2026-10-03");
    dates.push_back("2026-10-10");
    SeasonFixture s(ZoneGrid{}, dates);
    const long counts[] = {5, 6, 4, 8, 11, 3, 4, 1, 3, 0};
    for (std::size_t i = 0; i < 10; ++i) s.set("pre_shot_passes_against", i, 2, 5, counts[i], 1);
    Focus f = focusOn("pre_shot_passes_against", {{2, 5}}, "2026-09-27");
    f.openedAfterMatch = "M8";
    f.evidence = R"({"judged_window": "last2", "zones": []})";
    const auto r = computeReview(f, builtin("pre_shot_passes_against"), s.season, s.grid, 5, 2,
                                 0.95, 0.3, pureNoise());
    REQUIRE(r.review);
    // Before: the last five before M7, M2..M6 = 6 + 4 + 8 + 11 + 3 = 32 in 5 matches.
    CHECK(r.review->before.matchIds ==
          std::vector<std::string>{"M2", "M3", "M4", "M5", "M6"});
    CHECK(r.review->before.totalNum == 32);
    CHECK(r.review->before.totalDen == 5);
    CHECK(r.review->trigger.matchIds == std::vector<std::string>{"M7", "M8"});
    // After: M9, M10 = 3 + 0 = 3 in 2 matches; change 1.5 − 6.4 a match.
    CHECK(r.review->after.totalNum == 3);
    CHECK(r.review->after.totalDen == 2);
    CHECK_THAT(r.review->difference, WithinAbs(1.5 - 6.4, 1e-12));
    // Counts: Var = (c + ½)/e² each side; fewer passes is better.
    const double se = std::sqrt(countVar(3, 2) + countVar(32, 5));
    CHECK_THAT(r.review->probImproved, WithinAbs(phi(4.9 / se), 1e-12));
    CHECK_THAT(r.review->rateRatio, WithinAbs(1.5 / 6.4, 1e-12));
    // Two zones of a per-match count: still one match per match (den 1), counts summed.
    s.set("pre_shot_passes_against", 8, 2, 4, 2, 1);
    f.zones = {{2, 5}, {2, 4}};
    const auto two = computeReview(f, builtin("pre_shot_passes_against"), s.season, s.grid, 5, 2);
    REQUIRE(two.review);
    CHECK(two.review->after.totalNum == 5);
    CHECK(two.review->after.totalDen == 2);
    const auto json = nlohmann::json::parse(reviewToJson(*two.review));
    CHECK(json["trigger"]["matches"].size() == 2);
    CHECK(json["chart"]["points"][5]["window"] == "trigger");
    CHECK(json["finding"] == "improved");
}

TEST_CASE("on unchanged data the review with variation is more careful than without",
          "[review]") {
    // 20 matches of one zone, swinging from match to match: 3 and 9 of 15 in turn before the
    // start (6 a match on average), 5 and 11 after it (8).
    std::vector<std::string> dates{"2026-08-01"};
    while (dates.size() < 20) {
        std::string d = dates.back();
        for (int k = 0; k < 7; ++k) d = dayAfter(d);
        dates.push_back(d);
    }
    SeasonFixture s(ZoneGrid::equal(1, 1), dates);
    for (std::size_t i = 0; i < 20; ++i)
        s.set("regain_5s", i, 1, 1, (i < 15 ? 3 : 5) + (i % 2 ? 6 : 0), 15);
    Focus f = focusOn("regain_5s", {{1, 1}}, dates[15]);
    f.openedAfterMatch = "M15";
    const auto withVar = computeReview(f, builtin("regain_5s"), s.season, s.grid, 5, 5);
    const auto without = computeReview(f, builtin("regain_5s"), s.season, s.grid, 5, 5, 0.95, 0.3,
                                       pureNoise());
    REQUIRE(withVar.review);
    REQUIRE(without.review);
    // Such swings are more than 15 chances' binomial noise: rho > 0, and 15 chances a match
    // count as 15/(1 + 14·rho).
    CHECK(withVar.review->dispersion > 0);
    CHECK(withVar.review->after.effDen < without.review->after.effDen);
    CHECK(withVar.review->probImproved < without.review->probImproved);
    CHECK(without.review->after.effDen == Approx(75));
}

TEST_CASE("a review that cannot be computed says why in plain words", "[review]") {
    SeasonFixture s(ZoneGrid{}, kDates);
    s.addMetric("pass_completion");
    const auto& m = builtin("pass_completion");
    SECTION("too few matches after the start") {
        const auto r = computeReview(focusOn("pass_completion", {{3, 3}}, "2026-09-20"), m,
                                     s.season, s.grid, 5, 5);
        CHECK_FALSE(r.review);
        // Only M8 (2026-09-26) is on or after 2026-09-20: 1 played, 4 missing.
        CHECK_THAT(r.problem, Contains("1 have been played (4 missing)"));
    }
    SECTION("no match outside the flag's window: read against the target only") {
        Focus f = focusOn("pass_completion", {{3, 3}}, "2026-08-23");
        f.openedAfterMatch = "M3";
        f.evidence = R"({"judged_window": "season", "zones": []})";
        const auto r = computeReview(f, m, s.season, s.grid, 5, 5);
        REQUIRE(r.review);
        CHECK(r.review->finding == ReviewFinding::NoBaseline);
        CHECK(r.review->before.matchIds.empty());
        CHECK(std::isnan(r.review->probImproved));
        CHECK_THAT(r.review->baselineNote, Contains("nothing fair to compare with"));
    }
    SECTION("an empty window") {
        const auto r = computeReview(focusOn("pass_completion", {{3, 3}}, "2026-09-01"), m,
                                     s.season, s.grid, 0, 4);
        CHECK_THAT(r.problem, Contains("at least one match"));
    }
}

TEST_CASE("focus states follow the review point", "[review]") {
    Focus f = focusOn("pass_completion", {{3, 3}}, "2026-09-01");
    f.reviewAfterMatches = 5;
    CHECK(focusState(f, 4, "2026-12-01") == FocusState::Open);
    CHECK(focusState(f, 5, "2026-12-01") == FocusState::DueForReview);
    f.reviewOn = "2026-10-01";
    CHECK(focusState(f, 9, "2026-09-30") == FocusState::Open);
    CHECK(focusState(f, 0, "2026-10-01") == FocusState::DueForReview);
    f.closedAt = "2026-10-02T10:00:00Z";
    CHECK(focusState(f, 9, "2026-10-05") == FocusState::Closed);
    CHECK(verdictFromString("no_change") == Verdict::NoChange);
    CHECK_FALSE(verdictFromString("fixed"));
}

TEST_CASE("a focus is stored, linked and closed with its numbers", "[review]") {
    ClubRepository repo(":memory:");
    repo.ensureSeason("First team", "2026-27");
    FocusStore store(repo);
    Focus f = focusOn("pass_completion", {{3, 3}, {3, 4}}, "2026-09-01");
    f.evidence = R"({"zones":[]})";
    f.note = "Überzahl links — 左サイド ⚽";
    const auto id = store.open(f, "2026-08-30T09:00:00Z");
    auto loaded = store.get(id);
    REQUIRE(loaded);
    CHECK(loaded->zones == f.zones);
    CHECK(loaded->note == f.note); // any Unicode is kept byte for byte
    CHECK(loaded->closedAt.empty());
    CHECK_FALSE(store.drillExists(99));
    CHECK_FALSE(store.unlinkDrill(id, 99));

    store.close(id, Verdict::Partly, "better on the left, not yet on the right ✓", "R. Tamsin",
                R"({"before":{"num":120}})", "2026-10-20T09:00:00Z");
    loaded = store.get(id);
    CHECK(loaded->verdict == "partly");
    CHECK(loaded->closedAt == "2026-10-20T09:00:00Z");
    const auto reviews = store.reviews(id);
    REQUIRE(reviews.size() == 1);
    CHECK(reviews[0].numbers == R"({"before":{"num":120}})");
    CHECK(reviews[0].note == "better on the left, not yet on the right ✓");
    CHECK_FALSE(store.get(id + 1));
}

TEST_CASE("a second focus on the same metric and zone is found before it is opened", "[review]") {
    Focus a = focusOn("pass_completion", {{3, 3}, {3, 4}}, "2026-09-01");
    a.id = 1;
    Focus b = focusOn("pass_completion", {{2, 5}}, "2026-09-01");
    b.id = 2;
    Focus whole = focusOn("regain_5s", {{0, 0}}, "2026-09-01");
    whole.id = 3;
    Focus closed = focusOn("pass_completion", {{3, 3}}, "2026-08-01");
    closed.id = 4;
    closed.closedAt = "2026-08-30T10:00:00Z";
    const std::vector<Focus> all{a, b, whole, closed};
    CHECK(overlappingOpenFocuses(all, "pass_completion", {{3, 4}}) == std::vector<std::int64_t>{1});
    CHECK(overlappingOpenFocuses(all, "pass_completion", {{1, 1}}).empty());
    CHECK(overlappingOpenFocuses(all, "regain_5s", {{4, 2}}) == std::vector<std::int64_t>{3});
    CHECK(overlappingOpenFocuses(all, "losses", {{3, 3}}).empty());
}
