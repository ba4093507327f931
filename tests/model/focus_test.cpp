// Focuses and follow-up reviews: the numbers of a review on hand-made seasons, checked against
// Debian's scipy 1.10.1 and statsmodels 0.13.5 (expressions beside each value), the plain-word
// problems when a review cannot be computed, and storage of a verdict with its numbers.

#include "focus.h"
#include "season_fixture.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

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

TEST_CASE("a rate review: Newcombe difference, Fisher's test and P(improved)", "[review]") {
    // pass_completion in zone (3,3): 30, 32, 28, 30 of 40 before the start (120/160 = 0.75),
    // 36, 35, 37, 36 of 40 after it (144/160 = 0.90).
    SeasonFixture s(ZoneGrid{}, kDates);
    const long before[] = {30, 32, 28, 30}, after[] = {36, 35, 37, 36};
    for (std::size_t i = 0; i < 4; ++i) {
        s.set("pass_completion", i, 3, 3, before[i], 40);
        s.set("pass_completion", i + 4, 3, 3, after[i], 40);
    }
    const Focus f = focusOn("pass_completion", {{3, 3}}, "2026-09-01");
    const auto result = computeReview(f, builtin("pass_completion"), s.season, s.grid, 4, 4);
    REQUIRE(result.review);
    const Review& r = *result.review;
    CHECK(r.before.matchIds == std::vector<std::string>{"M1", "M2", "M3", "M4"});
    CHECK(r.after.matchIds == std::vector<std::string>{"M5", "M6", "M7", "M8"});
    CHECK(r.before.totalNum == 120);
    CHECK(r.after.totalNum == 144);
    CHECK_THAT(r.difference, WithinAbs(0.15, 1e-12));
    // statsmodels: confint_proportions_2indep(144, 160, 120, 160, method='newcomb')
    //   → (0.0672350692927778, 0.23155892952799323)
    CHECK_THAT(r.differenceInterval.low, WithinAbs(0.0672350692927778, 1e-9));
    CHECK_THAT(r.differenceInterval.high, WithinAbs(0.23155892952799323, 1e-9));
    // scipy: fisher_exact([[144, 16], [120, 40]], alternative='greater')[1] and two-sided.
    CHECK_THAT(r.pImproved, WithinRel(0.0003104420367182426, 1e-6));
    CHECK_THAT(r.pTwoSided, WithinRel(0.0006208840734364852, 1e-6));
    // scipy: quad(lambda p: beta.pdf(p, 144.5, 16.5) * beta.cdf(p, 120.5, 40.5), 0, 1)
    CHECK_THAT(r.probImproved, WithinAbs(0.9998250977526755, 1e-8));
    // p-chart from the before window: p̄ = 0.75, limits 0.75 ± 3·√(0.75·0.25/40) = ±0.2054.
    REQUIRE(r.chart.size() == 8);
    CHECK_THAT(r.chart[0].centre, WithinAbs(0.75, 1e-12));
    CHECK_THAT(r.chart[0].ucl, WithinAbs(0.75 + 3 * std::sqrt(0.75 * 0.25 / 40), 1e-12));
    CHECK(r.chart[4].after);
    CHECK_FALSE(r.chart[3].after);
    // 37/40 = 0.925 is inside 0.9554: no point is above the limit.
    for (const auto& p : r.chart) CHECK_FALSE(p.above);
    // EWMA seeded at the before value 0.75: after M1 (0.75) it stays 0.75; after M5 (0.9)
    // z = 0.3·0.9 + 0.7·z₄, z₄ = EWMA of 0.75, 0.8, 0.7, 0.75 from 0.75.
    double z = 0.75;
    for (double p : {0.75, 0.8, 0.7, 0.75, 0.9}) z = 0.3 * p + 0.7 * z;
    CHECK_THAT(r.chart[4].ewma, WithinAbs(z, 1e-12));
    CHECK_FALSE(r.trainingMinutes.has_value());
}

TEST_CASE("the windows are the K matches before the start and the K from it on", "[review]") {
    // Ten weekly matches M1..M10 with 5, 6, 4, 8, 11, 3, 4, 1, 3, 0 passes in zone (2,5).
    std::vector<std::string> dates = kDates;
    dates.push_back("2026-10-03");
    dates.push_back("2026-10-10");
    SeasonFixture s(ZoneGrid{}, dates);
    const long counts[] = {5, 6, 4, 8, 11, 3, 4, 1, 3, 0};
    for (std::size_t i = 0; i < 10; ++i) s.set("pre_shot_passes_against", i, 2, 5, counts[i], 1);
    // Start 2026-09-27: M1..M8 are before it, M9 and M10 from it on.
    const auto r = computeReview(focusOn("pre_shot_passes_against", {{2, 5}}, "2026-09-27"),
                                 builtin("pre_shot_passes_against"), s.season, s.grid, 5, 2);
    REQUIRE(r.review);
    // Before: the last five before the start, M4..M8 = 8 + 11 + 3 + 4 + 1 = 27 in 5 matches.
    CHECK(r.review->before.matchIds.front() == "M4");
    CHECK(r.review->before.totalNum == 27);
    CHECK(r.review->before.totalDen == 5);
    // After: M9, M10 = 3 + 0 = 3 in 2 matches; change 1.5 − 5.4 a match.
    CHECK(r.review->after.totalNum == 3);
    CHECK(r.review->after.totalDen == 2);
    CHECK_THAT(r.review->difference, WithinAbs(1.5 - 5.4, 1e-12));
    // Two zones of a per-match count: still one match per match (den 1), counts summed.
    s.set("pre_shot_passes_against", 8, 2, 4, 2, 1);
    const auto two = computeReview(focusOn("pre_shot_passes_against", {{2, 5}, {2, 4}}, "2026-09-27"),
                                   builtin("pre_shot_passes_against"), s.season, s.grid, 5, 2);
    REQUIRE(two.review);
    CHECK(two.review->after.totalNum == 5);
    CHECK(two.review->after.totalDen == 2);
}

TEST_CASE("a count review with 34 before and 11 after agrees with scipy", "[review]") {
    // Five matches each side: 34 in 5 before, 11 in 5 after.
    SeasonFixture s(ZoneGrid{}, {"2026-08-08", "2026-08-15", "2026-08-22", "2026-08-29",
                                 "2026-09-05", "2026-09-12", "2026-09-19", "2026-09-26",
                                 "2026-10-03", "2026-10-10"});
    const long counts[] = {5, 6, 4, 8, 11, 3, 4, 1, 3, 0};
    for (std::size_t i = 0; i < 10; ++i) s.set("pre_shot_passes_against", i, 2, 5, counts[i], 1);
    const auto result = computeReview(focusOn("pre_shot_passes_against", {{2, 5}}, "2026-09-10"),
                                      builtin("pre_shot_passes_against"), s.season, s.grid, 5, 5);
    REQUIRE(result.review);
    const Review& r = *result.review;
    REQUIRE(r.before.totalNum == 34);
    REQUIRE(r.after.totalNum == 11);
    // scipy: binom.cdf(11, 45, 0.5) = 0.00041204117979987126 (one-sided, fewer after);
    //        binomtest(11, 45, 0.5).pvalue = 0.0008240823595997425;
    //        1 − beta.cdf(0.5, 34.5, 11.5) = 0.9997711087653786 = P(λ_after < λ_before).
    CHECK_THAT(r.pImproved, WithinRel(0.00041204117979987126, 1e-6));
    CHECK_THAT(r.pTwoSided, WithinRel(0.0008240823595997425, 1e-6));
    CHECK_THAT(r.probImproved, WithinAbs(0.9997711087653786, 1e-9));
    CHECK_THAT(r.rateRatio, WithinAbs(2.2 / 6.8, 1e-12));
    // u-chart from the before window: ū = 6.8, limits 6.8 ± 3·√6.8 → lower clamped at 0.
    CHECK_THAT(r.chart[0].ucl, WithinAbs(6.8 + 3 * std::sqrt(6.8), 1e-12));
    CHECK(r.chart[0].lcl == 0.0);
    const auto json = nlohmann::json::parse(reviewToJson(r));
    CHECK(json["chart"]["points"].size() == 10);
    CHECK(json["before"]["num"] == 34);
    CHECK(json["test"] == "exact conditional test for two Poisson rates");
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
    SECTION("too few matches before it") {
        const auto r = computeReview(focusOn("pass_completion", {{3, 3}}, "2026-08-16"), m,
                                     s.season, s.grid, 5, 5);
        CHECK_FALSE(r.review);
        CHECK_THAT(r.problem, Contains("has only 2 before it (3 missing)"));
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
