// Windows, intervals and target flags of a zone at one match (model/status.h), on hand-made
// seasons of tallies. Expected numbers are worked by hand in the comments or come from
// Debian's scipy 1.10.1 (/usr/bin/python3; `st` is scipy.stats), with the expression given.

#include "season_fixture.h"
#include "stats.h"
#include "status.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <string>
#include <vector>

using namespace pitchloop::model;
using pitchloop::testutil::builtin;
using pitchloop::testutil::SeasonFixture;
using pitchloop::testutil::statusOf;
using pitchloop::testutil::target;

namespace {

const Window kMatch{Window::Kind::Match, 1, 0.3};
const Window kSeason{Window::Kind::Season, 0, 0.3};
Window lastN(int n) { return {Window::Kind::LastN, n, 0.3}; }
Window ewma(double lambda) { return {Window::Kind::Ewma, 0, lambda}; }

/// Pure binomial / Poisson noise and the fixed off threshold 0.999: the hand-worked and scipy
/// numbers of the cases below assume no match-to-match variation (tested on its own further
/// down and in variation_test.cpp) and no season budget.
FlagSettings pure() {
    FlagSettings s;
    s.matchVariation = false;
    s.falseFlagsPerSeason = 0;
    return s;
}

/// Relative closeness for values computed two ways (Boost here, scipy there).
bool close(double got, double expected, double rel = 1e-9) {
    return std::fabs(got - expected) <= rel * std::fabs(expected);
}

/// One match on 2026-08-08, one zone (a 1 × 1 grid), pass_completion x of n.
SeasonFixture oneZoneRate(long x, long n) {
    SeasonFixture f(ZoneGrid::equal(1, 1), {"2026-08-08"});
    f.set("pass_completion", 0, 1, 1, x, n);
    return f;
}

std::vector<ZoneStatus> statusAt(const SeasonFixture& f, std::size_t focal,
                                 const std::vector<std::string>& metricIds,
                                 const std::vector<Target>& targets,
                                 const std::vector<Window>& windows, const FlagSettings& s = pure()) {
    std::vector<MetricSpec> metrics;
    for (const auto& id : metricIds) metrics.push_back(builtin(id));
    return computeStatus(f.season, focal, metrics, targets, f.grid, windows, s);
}

} // namespace

// ---- windows --------------------------------------------------------------------------------

TEST_CASE("Window names read back and bad names are refused", "[status]") {
    for (const char* text : {"match", "season", "last1", "last5", "last12", "last100", "ewma0.3",
                             "ewma0.25", "ewma1"}) {
        INFO(text);
        const auto w = Window::parse(text);
        REQUIRE(w);
        CHECK(w->name() == text);
        CHECK(Window::parse(w->name()) == w);
    }
    CHECK(Window::parse("match")->kind == Window::Kind::Match);
    CHECK(Window::parse("season")->kind == Window::Kind::Season);
    CHECK(Window::parse("last12")->kind == Window::Kind::LastN);
    CHECK(Window::parse("last12")->n == 12);
    CHECK(Window::parse("ewma0.25")->kind == Window::Kind::Ewma);
    CHECK(Window::parse("ewma0.25")->lambda == 0.25);
    // "ewma" alone is the default λ = 0.3.
    REQUIRE(Window::parse("ewma"));
    CHECK(Window::parse("ewma")->name() == "ewma0.3");
    CHECK(Window::parse("ewma") == ewma(0.3));
    // The settings' default window is last5.
    CHECK(FlagSettings{}.window.name() == "last5");
    CHECK(Window::parse("last5") == FlagSettings{}.window);

    for (const char* bad : {"", "Match", "seasons", "last", "last0", "last101", "last-1", "last5x",
                            "lastfive", "last5.5", "ewma0", "ewma1.5", "ewma-0.2", "ewmax",
                            "ewma0.3x", "weekly"}) {
        INFO("'" << bad << "'");
        CHECK_FALSE(Window::parse(bad));
    }
}

TEST_CASE("windowSum adds a zone's tallies over the match, the last N or the season",
          "[status]") {
    // Five matches of one zone: 3/10, 5/12, 0/0, 7/9, 4/6.
    const std::vector<ZoneTally> series{{3, 10}, {5, 12}, {0, 0}, {7, 9}, {4, 6}};
    auto check = [&](std::size_t focal, const Window& w, double num, double den, int matches) {
        INFO("focal " << focal << " window " << w.name());
        const WindowSum s = windowSum(series, focal, w);
        CHECK(s.num == num);
        CHECK(s.den == den);
        CHECK(s.matches == matches);
    };
    check(4, kMatch, 4, 6, 1);
    check(2, kMatch, 0, 0, 1);          // a match with no items: 0 of 0
    check(4, lastN(3), 0 + 7 + 4, 0 + 9 + 6, 3);
    check(4, lastN(5), 19, 37, 5);      // 3+5+0+7+4, 10+12+0+9+6
    check(4, kSeason, 19, 37, 5);
    // At the start of a season there are fewer matches than N: all of them count.
    check(1, lastN(5), 3 + 5, 10 + 12, 2);
    check(0, lastN(3), 3, 10, 1);
    // A window ends at the focal match: later matches never count.
    check(2, kSeason, 8, 22, 3);
    check(3, lastN(2), 7, 9, 2);
    // Out of range: nothing.
    check(5, kSeason, 0, 0, 0);
    CHECK(windowSum({}, 0, kSeason).matches == 0);
}

TEST_CASE("the EWMA window weighs real matches only and matches the NIST recursion", "[status]") {
    // NIST/SEMATECH e-Handbook of Statistical Methods §6.3.2.4 (REFERENCES.md): λ = 0.3,
    // EWMA_0 = 50, data 52.0 47.0 … 52.1 → EWMA 50.60 49.52 … 51.99 (recursion seeded with
    // EWMA_0). The window's EWMA has no seed (a prior is used once, in the evidence): its value
    // is Σ λ(1 − λ)^age·x / Σ λ(1 − λ)^age, which is the handbook's recursion with the seed's
    // weight (1 − λ)^t taken out: (z_t − (1 − λ)^t·z_0) / (1 − (1 − λ)^t). Tallies are whole
    // numbers, so the data enter as tenths (a per-match count of 10·x, den 1).
    const std::vector<double> data{52.0, 47.0, 53.0, 49.3, 50.1, 47.0, 51.0, 50.1, 51.2, 50.5,
                                   49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1};
    const std::vector<double> published{50.60, 49.52, 50.56, 50.18, 50.16, 49.21, 49.75,
                                        49.85, 50.26, 50.33, 50.11, 49.36, 49.52, 50.05,
                                        49.38, 49.92, 50.73, 51.23, 51.94, 51.99};
    std::vector<ZoneTally> series;
    for (double x : data) series.push_back({std::lround(10 * x), 1});
    const auto z = stats::ewmaSeries(data, 0.3, 50.0);
    for (std::size_t t = 0; t < data.size(); ++t) {
        INFO("match " << t + 1);
        CHECK(z[t] == Approx(published[t]).margin(0.005)); // the recursion itself
        const WindowSum s = windowSum(series, t, ewma(0.3));
        REQUIRE(s.den > 0);
        const double seedWeight = std::pow(0.7, static_cast<double>(t + 1));
        const double unseeded = (z[t] - seedWeight * 50.0) / (1 - seedWeight);
        CHECK(s.num / s.den / 10 == Approx(unseeded).epsilon(1e-12));
        CHECK(s.matches == static_cast<int>(t + 1));
    }
    // The first match alone is its own value: no pull towards a seed.
    const WindowSum first = windowSum(series, 0, ewma(0.3));
    CHECK(first.num / first.den == Approx(520.0).epsilon(1e-12));
}

TEST_CASE("the EWMA's effective counts follow Kish's factor", "[status]") {
    SECTION("one match is worth exactly its own chances") {
        // Σw·d = 0.3·20; Σw²·d = 0.09·20; scale = 1/0.3: the match's own 2 of 20.
        const WindowSum s = windowSum({{2, 20}}, 0, ewma(0.3));
        CHECK(s.den == Approx(20).epsilon(1e-12));
        CHECK(s.num == Approx(2).epsilon(1e-12));
        CHECK(s.effDen == Approx(20).epsilon(1e-12));
    }
    SECTION("a long per-match count series tends to (2 − λ)/λ matches") {
        // Σw → 1 and Σw² → λ²/(1 − (1 − λ)²) = λ/(2 − λ), so den = Σw/Σw² → (2 − λ)/λ:
        // 1.7/0.3 = 5.667 for λ = 0.3, 1.8/0.2 = 9 for λ = 0.2, 1 for λ = 1.
        const std::vector<ZoneTally> series(300, ZoneTally{3, 1});
        for (double lambda : {0.3, 0.2, 1.0}) {
            INFO("λ = " << lambda);
            const WindowSum s = windowSum(series, series.size() - 1, ewma(lambda));
            CHECK(s.den == Approx((2 - lambda) / lambda).epsilon(1e-9));
            CHECK(s.num / s.den == Approx(3.0).epsilon(1e-12));
        }
        // Ten matches at λ = 0.3, weights 0.3·0.7^k, k = 0..9: Σw = 1 − 0.7^10,
        // Σw² = 0.09·(1 − 0.49^10)/(1 − 0.49).
        const double sumW = 1 - std::pow(0.7, 10);
        const double sumW2 = 0.09 * (1 - std::pow(0.49, 10)) / (1 - 0.49);
        // den = Σw·d · (Σw·d / Σw²·d) = (Σw)² / Σw² for d = 1.
        CHECK(windowSum(series, 9, ewma(0.3)).den == Approx(sumW * sumW / sumW2).epsilon(1e-12));
    }
    SECTION("rates: a match with one chance weighs less than one with twenty") {
        // 1/1 then 2/20, λ = 0.5: weights 0.5 (match 2), 0.25 (match 1).
        // num = 0.5·2 + 0.25·1 = 1.25; den = 0.5·20 + 0.25·1 = 10.25 → value 0.1220, near the
        // big match's 0.10 (an average of the two ratios would say 0.55).
        // Σw²·d = 0.25·20 + 0.0625·1 = 5.0625; scale = 10.25/5.0625.
        const WindowSum s = windowSum({{1, 1}, {2, 20}}, 1, ewma(0.5));
        const double scale = 10.25 / 5.0625;
        CHECK(s.num == Approx(1.25 * scale).epsilon(1e-12));
        CHECK(s.den == Approx(10.25 * scale).epsilon(1e-12));
        CHECK(s.num / s.den == Approx(1.25 / 10.25).epsilon(1e-12));
    }
    SECTION("after one match of 2/20 the EWMA claims 20 chances, not 34, and stays at 0.10") {
        FlagSettings s = pure();
        s.window = ewma(0.3);
        SeasonFixture f(ZoneGrid::equal(1, 1), {"2026-08-08"});
        f.set("pass_completion", 0, 1, 1, 2, 20);
        const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.45, 0.05, 30);
        const auto all = computeStatus(f.season, 0, {builtin("pass_completion")}, {t}, f.grid,
                                       {ewma(0.3)}, s);
        const ZoneStatus& z = statusOf(all, "pass_completion", 1, 1, "ewma0.3");
        CHECK(z.sum.den == Approx(20).epsilon(1e-12));
        CHECK(z.value == Approx(0.10).epsilon(1e-12));
        CHECK(z.state == FlagState::TooLittleData); // 20 < the minimum of 30
    }
}

// ---- one zone against a target ----------------------------------------------------------------

TEST_CASE("a rate zone gets its value, Wilson interval and evidence against the target",
          "[status]") {
    // pass_completion at least 0.8 (margin 0.05, at least 30 passes), 20 of 40 in one match.
    const auto f = oneZoneRate(20, 40);
    const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.8, 0.05, 30);
    const auto all = statusAt(f, 0, {"pass_completion"}, {t}, {kMatch});
    REQUIRE(all.size() == 2); // the whole pitch and the one zone
    const ZoneStatus& s = statusOf(all, "pass_completion", 1, 1, "match");
    CHECK(s.sum.num == 20);
    CHECK(s.sum.den == 40);
    CHECK(s.value == 0.5);
    CHECK(s.level == 0.9);
    REQUIRE(s.target);
    CHECK(s.target->value == 0.8);

    // Wilson at 90 %: the library's own function, and scipy:
    // st.binomtest(20, 40).proportion_ci(confidence_level=0.9, method='wilson')
    //   → 0.3741494451288969, 0.6258505548711031
    const auto w = stats::wilson(20, 40, 0.9);
    CHECK(s.interval.low == w.low);
    CHECK(s.interval.high == w.high);
    CHECK(close(s.interval.low, 0.3741494451288969));
    CHECK(close(s.interval.high, 0.6258505548711031));

    // P(miss) = P(p < 0.8) under Beta(20.5, 20.5): st.beta.cdf(0.8, 20.5, 20.5)
    //   → 0.9999894330586762 ≥ 0.999: off target.
    CHECK(s.pMiss == stats::probRateBelow(20, 40, 0.8));
    CHECK(close(s.pMiss, 0.9999894330586762));
    CHECK(s.state == FlagState::OffTarget);
    // One-sided exact p-value for "at least": st.binom.cdf(20, 40, 0.8) → 2.1691893126332835e-05
    CHECK(close(s.pValue, 2.1691893126332835e-05, 1e-8));

    // The whole pitch has no target.
    const ZoneStatus& whole = statusOf(all, "pass_completion", 0, 0, "match");
    CHECK_FALSE(whole.target);
    CHECK(whole.state == FlagState::NoTarget);
    CHECK(std::isnan(whole.pMiss));
    CHECK(whole.sum.num == 20);
    CHECK(whole.sum.den == 40);
}

TEST_CASE("flag states: too little data, off, likely off, close to the line, on target", "[status]") {
    // pass_completion at least 0.8, watch margin 0.05, min sample 30; off when P(miss) ≥
    // 0.999, likely off when P(miss) ≥ 0.5, close to the line when P(p < 0.85) ≥ 0.5.
    // Evidence from scipy:
    //   x/n    st.beta.cdf(0.8, x+.5, n-x+.5)   st.beta.cdf(0.85, x+.5, n-x+.5)
    //   20/25  0.52049                           0.76861   (but 25 < 30: too little data)
    //   24/30  0.51862                           0.78606   (30 is enough: likely off)
    //   23/40  0.99944                           0.99999   off target
    //   24/40  0.99827                           0.99995   likely off (0.99827 < 0.999)
    //   33/40  0.35943                           0.68580   close to the line: inside the margin
    //   39/40  0.00050                           0.00482   on target
    const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.8, 0.05, 30);
    struct Case {
        long x, n;
        FlagState state;
        double pMiss; // scipy, or NaN when not judged
    };
    const double nan = std::nan("");
    for (const Case& c : {Case{20, 25, FlagState::TooLittleData, nan},
                          Case{24, 30, FlagState::LikelyOff, 0.5186220566454827},
                          Case{23, 40, FlagState::OffTarget, 0.9994442003088474},
                          Case{24, 40, FlagState::LikelyOff, 0.9982739863995285},
                          Case{33, 40, FlagState::CloseToLine, 0.3594314330178428},
                          Case{39, 40, FlagState::OnTarget, 0.0004982808202382745}}) {
        INFO(c.x << "/" << c.n);
        const auto all = statusAt(oneZoneRate(c.x, c.n), 0, {"pass_completion"}, {t}, {kMatch});
        const ZoneStatus& s = statusOf(all, "pass_completion", 1, 1, "match");
        CHECK(toString(s.state) == toString(c.state));
        if (std::isnan(c.pMiss)) {
            CHECK(std::isnan(s.pMiss));
            CHECK(std::isnan(s.pValue));
        } else {
            CHECK(close(s.pMiss, c.pMiss, 1e-9));
        }
    }

    SECTION("the off threshold is a setting: P(miss) ≥ threshold is off") {
        FlagSettings lower = pure();
        lower.offThreshold = 0.998; // 24/40 has P(miss) 0.99827
        const auto all = statusAt(oneZoneRate(24, 40), 0, {"pass_completion"}, {t}, {kMatch}, lower);
        CHECK(statusOf(all, "pass_completion", 1, 1, "match").state == FlagState::OffTarget);
    }
    SECTION("with no watch margin, the inside-the-margin zone is on target") {
        Target noMargin = t;
        noMargin.watchMargin = 0;
        // 33/40: P(p < 0.8) = 0.359 < 0.5.
        const auto all = statusAt(oneZoneRate(33, 40), 0, {"pass_completion"}, {noMargin}, {kMatch});
        CHECK(statusOf(all, "pass_completion", 1, 1, "match").state == FlagState::OnTarget);
    }
    SECTION("a zone with no chances at all has too little data") {
        Target none = t;
        none.minSample = 0;
        const auto all = statusAt(oneZoneRate(0, 0), 0, {"pass_completion"}, {none}, {kMatch});
        const ZoneStatus& s = statusOf(all, "pass_completion", 1, 1, "match");
        CHECK(s.state == FlagState::TooLittleData);
        CHECK(std::isnan(s.value));
        CHECK(s.interval.low == 0); // Wilson with n = 0: [0, 1]
        CHECK(s.interval.high == 1);
    }
}

TEST_CASE("the target in force on the match date is used, not a later one", "[status]") {
    // Match on 2026-08-08. A version from 2026-07-01 (0.8) and a change from 2026-08-20 (0.5):
    // on 2026-08-08 the zone is judged against 0.8.
    const auto f = oneZoneRate(20, 40);
    const Target first = target("pass_completion", 1, 1, Direction::AtLeast, 0.8, 0.05, 30);
    const Target later = target("pass_completion", 1, 1, Direction::AtLeast, 0.5, 0.05, 30,
                                "2026-08-20");
    auto s = statusOf(statusAt(f, 0, {"pass_completion"}, {first, later}, {kMatch}),
                      "pass_completion", 1, 1, "match");
    REQUIRE(s.target);
    CHECK(s.target->value == 0.8);
    CHECK(s.state == FlagState::OffTarget);

    // A target that starts only after the match is not used at all.
    s = statusOf(statusAt(f, 0, {"pass_completion"}, {later}, {kMatch}), "pass_completion", 1, 1,
                 "match");
    CHECK_FALSE(s.target);
    CHECK(s.state == FlagState::NoTarget);
    CHECK(std::isnan(s.pMiss));

    // Targets of another zone, metric or the whole pitch do not apply here.
    const Target wholePitch = target("pass_completion", 0, 0, Direction::AtLeast, 0.9, 0.05, 30);
    const Target otherMetric = target("regain_5s", 1, 1, Direction::AtLeast, 0.9, 0.05, 30);
    const auto all = statusAt(f, 0, {"pass_completion"}, {wholePitch, otherMetric}, {kMatch});
    CHECK_FALSE(statusOf(all, "pass_completion", 1, 1, "match").target);
    REQUIRE(statusOf(all, "pass_completion", 0, 0, "match").target);
    CHECK(statusOf(all, "pass_completion", 0, 0, "match").target->value == 0.9);
}

TEST_CASE("every window of a status ends at the focal match", "[status]") {
    // One zone, three matches: 30/40, 35/40, 23/40 (dates a week apart).
    SeasonFixture f(ZoneGrid::equal(1, 1), {"2026-08-08", "2026-08-15", "2026-08-22"});
    f.set("pass_completion", 0, 1, 1, 30, 40);
    f.set("pass_completion", 1, 1, 1, 35, 40);
    f.set("pass_completion", 2, 1, 1, 23, 40);
    const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.8, 0.05, 30);
    const auto at2 = statusAt(f, 2, {"pass_completion"}, {t}, {kMatch, lastN(2), kSeason});
    REQUIRE(at2.size() == 2 * 3);
    CHECK(statusOf(at2, "pass_completion", 1, 1, "match").sum.num == 23);
    CHECK(statusOf(at2, "pass_completion", 1, 1, "last2").sum.num == 35 + 23);
    CHECK(statusOf(at2, "pass_completion", 1, 1, "last2").sum.den == 80);
    CHECK(statusOf(at2, "pass_completion", 1, 1, "season").sum.num == 88);
    CHECK(statusOf(at2, "pass_completion", 1, 1, "season").value == Approx(88.0 / 120));
    const auto at1 = statusAt(f, 1, {"pass_completion"}, {t}, {kSeason});
    CHECK(statusOf(at1, "pass_completion", 1, 1, "season").sum.num == 65);
    CHECK(statusOf(at1, "pass_completion", 1, 1, "season").sum.matches == 2);
    // The EWMA is not pulled towards the target: after one match it is that match's 30/40.
    const auto e = statusAt(f, 0, {"pass_completion"}, {t}, {ewma(0.3)});
    CHECK(statusOf(e, "pass_completion", 1, 1, "ewma0.3").value == Approx(0.75).epsilon(1e-12));
    // After three: (0.3·23 + 0.21·35 + 0.147·30) / (0.3·40 + 0.21·40 + 0.147·40) = 18.66/26.28.
    const auto e2 = statusAt(f, 2, {"pass_completion"}, {t}, {ewma(0.3)});
    CHECK(statusOf(e2, "pass_completion", 1, 1, "ewma0.3").value ==
          Approx(18.66 / 26.28).epsilon(1e-12));
    // Without a target the same.
    const auto noTarget = statusAt(f, 0, {"pass_completion"}, {}, {ewma(0.3)});
    CHECK(statusOf(noTarget, "pass_completion", 1, 1, "ewma0.3").value == Approx(0.75).epsilon(1e-12));
}

TEST_CASE("per-match counts use Gamma evidence over the matches of the window", "[status]") {
    // pre_shot_passes_against on the 6 × 5 grid, three matches. Band 2 lane 5: 6, 5 and 7
    // passes (18 in 3 matches); band 3 lane 3: 1, 0, 2; every other zone 0. Each zone is one
    // match a match (den 1), as computeTally stores per-match counts.
    SeasonFixture f(ZoneGrid{}, {"2026-08-08", "2026-08-15", "2026-08-22"});
    f.addMetric("pre_shot_passes_against");
    const long leak[] = {6, 5, 7}, centre[] = {1, 0, 2};
    for (std::size_t m = 0; m < 3; ++m) {
        f.set("pre_shot_passes_against", m, 2, 5, leak[m], 1);
        f.set("pre_shot_passes_against", m, 3, 3, centre[m], 1);
    }
    // At most 2 a match in band 2 lane 5 (margin 0.5, at least 3 matches), at most 5 a match
    // over the whole pitch.
    const Target zone = target("pre_shot_passes_against", 2, 5, Direction::AtMost, 2.0, 0.5, 3);
    const Target whole = target("pre_shot_passes_against", 0, 0, Direction::AtMost, 5.0, 0.5, 3);
    const auto all = statusAt(f, 2, {"pre_shot_passes_against"}, {zone, whole}, {lastN(5), kMatch});
    REQUIRE(all.size() == 31 * 2);

    const ZoneStatus& s = statusOf(all, "pre_shot_passes_against", 2, 5, "last5");
    CHECK(s.sum.num == 18);
    CHECK(s.sum.den == 3); // matches, the exposure of a per-match count
    CHECK(s.sum.matches == 3);
    CHECK(s.value == 6.0);
    // Garwood at 90 %: st.chi2.ppf(0.05, 36)/6, st.chi2.ppf(0.95, 38)/6
    //   → 3.878101503148962, 8.897256770494893
    const auto g = stats::garwood(18, 3, 0.9);
    CHECK(s.interval.low == g.low);
    CHECK(s.interval.high == g.high);
    CHECK(close(s.interval.low, 3.878101503148962));
    CHECK(close(s.interval.high, 8.897256770494893));
    // P(λ > 2) under Gamma(18.5, rate 3): st.gamma.sf(2, 18.5, scale=1/3) → 0.9999681532817305
    CHECK(s.pMiss == stats::probPoissonRateAbove(18, 3, 2.0));
    CHECK(close(s.pMiss, 0.9999681532817305));
    CHECK(s.state == FlagState::OffTarget);
    // At most: p = P(X ≥ 18 | Poisson(6)) = st.poisson.sf(17, 6) → 5.691714042371942e-05
    CHECK(close(s.pValue, 5.691714042371942e-05, 1e-8));
    // Chance of "off" if the truth were 2 a match: counts c with
    // st.gamma.sf(2, c+.5, scale=1/3) ≥ 0.999 are c ≥ 15;
    // sum(st.poisson.pmf(c, 6) for those c) → 0.001400353833361891
    CHECK(close(s.chanceOff, 0.001400353833361891, 1e-8));

    // The whole pitch of a per-match count: 7 + 5 + 9 = 21 passes in 3 matches — den is 3
    // matches, not 30 zones × 3. P(λ > 5) = st.gamma.sf(5, 21.5, scale=1/3) → 0.9333060226718153
    // (with den 90 it would be 8.6e-161): watch, as P(λ > 4.5) = 0.97308 ≥ 0.5.
    const ZoneStatus& w = statusOf(all, "pre_shot_passes_against", 0, 0, "last5");
    CHECK(w.sum.num == 21);
    CHECK(w.sum.den == 3);
    CHECK(w.value == 7.0);
    CHECK(close(w.pMiss, 0.9333060226718153));
    CHECK(w.state == FlagState::LikelyOff);
    // In the match window alone: 9 in 1 match.
    const ZoneStatus& wm = statusOf(all, "pre_shot_passes_against", 0, 0, "match");
    CHECK(wm.sum.num == 9);
    CHECK(wm.sum.den == 1);
    CHECK(wm.state == FlagState::TooLittleData); // 1 match < 3

    SECTION("a count window with fewer matches than the minimum sample is not judged") {
        const auto early = statusAt(f, 1, {"pre_shot_passes_against"}, {zone}, {lastN(5)});
        const ZoneStatus& e = statusOf(early, "pre_shot_passes_against", 2, 5, "last5");
        CHECK(e.sum.matches == 2);
        CHECK(e.state == FlagState::TooLittleData);
    }
    SECTION("an EWMA count window counts matches for the minimum sample, not its effective den") {
        // Twelve matches of one pass each in band 2 lane 5, at most 2 a match, min 10 matches.
        // The EWMA (λ = 0.3) carries about (2 − λ)/λ = 5.67 effective matches (den), but the
        // window spans all 12 matches, which is what a count's minimum sample is measured in.
        SeasonFixture twelve(ZoneGrid{}, {"2026-08-01", "2026-08-08", "2026-08-15", "2026-08-22",
                                          "2026-08-29", "2026-09-05", "2026-09-12", "2026-09-19",
                                          "2026-09-26", "2026-10-03", "2026-10-10", "2026-10-17"});
        twelve.addMetric("pre_shot_passes_against");
        for (std::size_t m = 0; m < 12; ++m) twelve.set("pre_shot_passes_against", m, 2, 5, 1, 1);
        const Target ten = target("pre_shot_passes_against", 2, 5, Direction::AtMost, 2.0, 0.5, 10);
        const auto e = statusAt(twelve, 11, {"pre_shot_passes_against"}, {ten}, {ewma(0.3)});
        const ZoneStatus& z = statusOf(e, "pre_shot_passes_against", 2, 5, "ewma0.3");
        CHECK(z.sum.matches == 12);
        CHECK(z.sum.den < 10);
        CHECK(z.state != FlagState::TooLittleData);
        CHECK(z.state != FlagState::NoTarget);
    }
    SECTION("rates over the whole pitch add the zones' denominators") {
        f.set("pass_completion", 2, 1, 1, 8, 10);
        f.set("pass_completion", 2, 6, 5, 3, 5);
        const auto r = statusAt(f, 2, {"pass_completion"}, {}, {kMatch});
        CHECK(statusOf(r, "pass_completion", 0, 0, "match").sum.num == 11);
        CHECK(statusOf(r, "pass_completion", 0, 0, "match").sum.den == 15);
    }
}

TEST_CASE("chance of an off-target flag and p-values agree with scipy", "[status]") {
    SECTION("rate, at least: n = 40, target 0.8") {
        // The flagged x are those with st.beta.cdf(0.8, x+.5, 40-x+.5) ≥ 0.999: x = 0..23.
        // chanceOff = sum(st.binom.pmf(x, 40, 0.8) for x in 0..23) → 0.0009910190199859397.
        // It depends on n and the target only, not on the observed x.
        const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.8, 0.05, 30);
        for (long x : {20L, 33L, 39L}) {
            INFO("x = " << x);
            const auto all = statusAt(oneZoneRate(x, 40), 0, {"pass_completion"}, {t}, {kMatch});
            const ZoneStatus& s = statusOf(all, "pass_completion", 1, 1, "match");
            CHECK(close(s.chanceOff, 0.0009910190199859397, 1e-8));
        }
        // p-values: st.binom.cdf(x, 40, 0.8) for x = 33 → 0.7141086301686927,
        // x = 39 → 0.9998670772004216.
        const auto p33 = statusAt(oneZoneRate(33, 40), 0, {"pass_completion"}, {t}, {kMatch});
        CHECK(close(statusOf(p33, "pass_completion", 1, 1, "match").pValue, 0.7141086301686927, 1e-8));
        const auto p39 = statusAt(oneZoneRate(39, 40), 0, {"pass_completion"}, {t}, {kMatch});
        CHECK(close(statusOf(p39, "pass_completion", 1, 1, "match").pValue, 0.9998670772004216, 1e-8));
    }
    SECTION("rate, at most: n = 60, target 0.15") {
        // shot_after_loss (better lower), 18 of 60 losses led to a shot.
        // pMiss = st.beta.sf(0.15, 18.5, 42.5) → 0.9985341370472325 (< 0.999: not off)
        // pValue = P(X ≥ 18) = st.binom.sf(17, 60, 0.15) → 0.0023732631384098322
        // flagged x: st.beta.sf(0.15, x+.5, 60-x+.5) ≥ 0.999 for x ≥ 19;
        // chanceOff = sum(st.binom.pmf(x, 60, 0.15) for x in 19..60) → 0.0008894023558947131
        SeasonFixture f(ZoneGrid::equal(1, 1), {"2026-08-08"});
        f.set("shot_after_loss", 0, 1, 1, 18, 60);
        const Target t = target("shot_after_loss", 1, 1, Direction::AtMost, 0.15, 0.01, 30);
        const auto all = statusAt(f, 0, {"shot_after_loss"}, {t}, {kMatch});
        const ZoneStatus& s = statusOf(all, "shot_after_loss", 1, 1, "match");
        CHECK(close(s.pMiss, 0.9985341370472325));
        CHECK(s.state == FlagState::LikelyOff);
        CHECK(close(s.pValue, 0.0023732631384098322, 1e-8));
        CHECK(close(s.chanceOff, 0.0008894023558947131, 1e-8));
    }
}

TEST_CASE("with fdr on, off-target zones that Benjamini–Hochberg does not reject are likely off",
          "[status]") {
    // pass_completion at least 0.5 in all 30 zones of the 6 × 5 grid, one match, off when
    // P(miss) ≥ 0.95. Zone (1,1): 10/50; zone (1,2): 19/50; the other 28: 40/50.
    //   10/50: st.beta.cdf(0.5, 10.5, 40.5) = 0.999994, p = st.binom.cdf(10, 50, 0.5) = 1.193e-05
    //   19/50: st.beta.cdf(0.5, 19.5, 31.5) = 0.955662, p = st.binom.cdf(19, 50, 0.5) = 0.059460
    //   40/50: p = st.binom.cdf(40, 50, 0.5) = 0.999997
    // BH at q = 0.1 over m = 30 (by hand): p(1) = 1.193e-05 ≤ 0.1·1/30 = 0.00333;
    // p(2) = 0.0595 > 0.1·2/30 = 0.00667, and p(k) ≈ 1 > 0.1·k/30 for k ≥ 3: only (1,1) is
    // rejected. So with fdr on, (1,2) goes from off target to watch.
    SeasonFixture f(ZoneGrid{}, {"2026-08-08"});
    std::vector<Target> targets;
    for (int band = 1; band <= 6; ++band)
        for (int lane = 1; lane <= 5; ++lane) {
            f.set("pass_completion", 0, band, lane, 40, 50);
            targets.push_back(target("pass_completion", band, lane, Direction::AtLeast, 0.5, 0.05, 30));
        }
    f.set("pass_completion", 0, 1, 1, 10, 50);
    f.set("pass_completion", 0, 1, 2, 19, 50);
    FlagSettings s = pure();
    s.offThreshold = 0.95;
    s.fdrQ = 0.1;

    s.fdr = false;
    const auto plain = statusAt(f, 0, {"pass_completion"}, targets, {kMatch}, s);
    CHECK(statusOf(plain, "pass_completion", 1, 1, "match").state == FlagState::OffTarget);
    CHECK(statusOf(plain, "pass_completion", 1, 2, "match").state == FlagState::OffTarget);
    // bhRejected is reported either way.
    CHECK(statusOf(plain, "pass_completion", 1, 1, "match").bhRejected);
    CHECK_FALSE(statusOf(plain, "pass_completion", 1, 2, "match").bhRejected);

    s.fdr = true;
    const auto fdr = statusAt(f, 0, {"pass_completion"}, targets, {kMatch}, s);
    CHECK(statusOf(fdr, "pass_completion", 1, 1, "match").state == FlagState::OffTarget);
    CHECK(statusOf(fdr, "pass_completion", 1, 2, "match").state == FlagState::LikelyOff);
    int off = 0, rejected = 0, onTarget = 0;
    for (const auto& z : fdr) {
        off += z.state == FlagState::OffTarget;
        rejected += z.bhRejected;
        onTarget += z.state == FlagState::OnTarget;
    }
    CHECK(off == 1);
    CHECK(rejected == 1);
    CHECK(onTarget == 28);

    SECTION("a looser q rejects both and keeps both off target") {
        // q = 0.9: p(2) = 0.0595 ≤ 0.9·2/30 = 0.06.
        s.fdrQ = 0.9;
        const auto loose = statusAt(f, 0, {"pass_completion"}, targets, {kMatch}, s);
        CHECK(statusOf(loose, "pass_completion", 1, 2, "match").state == FlagState::OffTarget);
        CHECK(statusOf(loose, "pass_completion", 1, 2, "match").bhRejected);
    }
    SECTION("expected chance flags add chanceOff over the judged zones") {
        double sum = 0;
        for (const auto& z : fdr)
            if (z.target) sum += z.chanceOff;
        CHECK(expectedChanceFlags(fdr) == Approx(sum).epsilon(1e-12));
        // Every zone has n = 50 and target 0.5, so each contributes the same, and 30 of them
        // do: a positive, finite number.
        CHECK(expectedChanceFlags(fdr) ==
              Approx(30 * statusOf(fdr, "pass_completion", 3, 3, "match").chanceOff).epsilon(1e-12));
        CHECK(expectedChanceFlags(fdr) > 0);
    }
}

TEST_CASE("expectedChanceFlags counts only zones with a target and enough data", "[status]") {
    auto zone = [](bool withTarget, FlagState state, double chance) {
        ZoneStatus s;
        if (withTarget)
            s.target = target("pass_completion", 1, 1, Direction::AtLeast, 0.8, 0.05, 30);
        s.state = state;
        s.chanceOff = chance;
        return s;
    };
    const std::vector<ZoneStatus> all{zone(true, FlagState::OnTarget, 0.01),
                                      zone(true, FlagState::OffTarget, 0.02),
                                      zone(true, FlagState::CloseToLine, 0.04),
                                      zone(true, FlagState::TooLittleData, 0.5),
                                      zone(false, FlagState::NoTarget, 0.25)};
    CHECK(expectedChanceFlags(all) == Approx(0.07).epsilon(1e-12));
    CHECK(expectedChanceFlags({}) == 0);
}

// ---- edges of what a value can be -------------------------------------------------------------

TEST_CASE("targets at the edge: a perfect zone is not off target", "[status][edges]") {
    SECTION("at least 100 %: 100 of 100 is on target, one failure is off for certain") {
        const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 1.0, 0.05, 30);
        const auto perfect = statusAt(oneZoneRate(100, 100), 0, {"pass_completion"}, {t}, {kMatch});
        const ZoneStatus& p = statusOf(perfect, "pass_completion", 1, 1, "match");
        CHECK(p.state == FlagState::OnTarget);
        CHECK(p.pMiss == 0);
        CHECK(p.chanceOff == 0);
        const auto one = statusAt(oneZoneRate(99, 100), 0, {"pass_completion"}, {t}, {kMatch});
        CHECK(statusOf(one, "pass_completion", 1, 1, "match").state == FlagState::OffTarget);
        CHECK(statusOf(one, "pass_completion", 1, 1, "match").pMiss == 1);
    }
    SECTION("at most 0 a match: a match without their passes is on target") {
        SeasonFixture f(ZoneGrid{}, {"2026-08-01", "2026-08-08", "2026-08-15"});
        f.addMetric("pre_shot_passes_against");
        const Target t = target("pre_shot_passes_against", 2, 5, Direction::AtMost, 0, 1, 3);
        const auto none = statusAt(f, 2, {"pre_shot_passes_against"}, {t}, {lastN(5)});
        CHECK(statusOf(none, "pre_shot_passes_against", 2, 5, "last5").state == FlagState::OnTarget);
        f.set("pre_shot_passes_against", 1, 2, 5, 1, 1);
        const auto onePass = statusAt(f, 2, {"pre_shot_passes_against"}, {t}, {lastN(5)});
        CHECK(statusOf(onePass, "pre_shot_passes_against", 2, 5, "last5").state ==
              FlagState::OffTarget);
    }
    SECTION("at least 0 % is met whatever happens") {
        const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.0, 0.05, 30);
        const auto zero = statusAt(oneZoneRate(0, 50), 0, {"pass_completion"}, {t}, {kMatch});
        CHECK(statusOf(zero, "pass_completion", 1, 1, "match").state == FlagState::OnTarget);
    }
}

TEST_CASE("a watch line never leaves what the value can be", "[status][edges]") {
    // At least 0.97 with margin 0.05: the line is 0.97 + min(0.05, 0.03/2) = 0.985, not 1.02.
    // 49/50 = 0.98: P(p < 0.97) = st.beta.cdf(0.97, 49.5, 1.5) → 0.3869 (< 0.5);
    // P(p < 0.985) = st.beta.cdf(0.985, 49.5, 1.5) → 0.6814 ≥ 0.5: close to the line.
    // 200/200: P(p < 0.985) = st.beta.cdf(0.985, 200.5, 0.5) → 0.0139: on target (with the old
    // line at 1.02 every zone was watched whatever the data).
    const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.97, 0.05, 30);
    const auto near = statusAt(oneZoneRate(49, 50), 0, {"pass_completion"}, {t}, {kMatch});
    CHECK(statusOf(near, "pass_completion", 1, 1, "match").state == FlagState::CloseToLine);
    const auto perfect = statusAt(oneZoneRate(200, 200), 0, {"pass_completion"}, {t}, {kMatch});
    CHECK(statusOf(perfect, "pass_completion", 1, 1, "match").state == FlagState::OnTarget);
}

TEST_CASE("one match of a count says how unusual it was, not whether the target slipped",
          "[status][edges]") {
    // 11 of their passes before shots in band 2 lane 5 against at most 2 a match: one match is
    // too little data to judge the target, but for a team exactly on it such a match has
    // probability st.poisson.sf(10, 2) → 8.3e-06 (pure Poisson, no variation).
    SeasonFixture f(ZoneGrid{}, {"2026-08-01"});
    f.set("pre_shot_passes_against", 0, 2, 5, 11, 1);
    const Target t = target("pre_shot_passes_against", 2, 5, Direction::AtMost, 2, 1, 3);
    const auto all = statusAt(f, 0, {"pre_shot_passes_against"}, {t}, {kMatch});
    const ZoneStatus& s = statusOf(all, "pre_shot_passes_against", 2, 5, "match");
    CHECK(s.state == FlagState::TooLittleData);
    CHECK(close(s.matchTail, 8.3082e-06, 1e-4));
}

TEST_CASE("variation widens the evidence and the budget sets the threshold", "[status]") {
    // 10, 30 and 20 of 40 against at least 0.5: far more swing than 40 chances' noise, so with
    // variation on the interval is wider than without; the threshold follows the budget.
    SeasonFixture f(ZoneGrid::equal(1, 1), {"2026-08-01", "2026-08-08", "2026-08-15"});
    f.set("pass_completion", 0, 1, 1, 10, 40);
    f.set("pass_completion", 1, 1, 1, 30, 40);
    f.set("pass_completion", 2, 1, 1, 20, 40);
    const Target t = target("pass_completion", 1, 1, Direction::AtLeast, 0.5, 0.05, 30);
    FlagSettings with;
    const auto a = statusAt(f, 2, {"pass_completion"}, {t}, {kSeason}, with);
    const auto b = statusAt(f, 2, {"pass_completion"}, {t}, {kSeason});
    const ZoneStatus& sa = statusOf(a, "pass_completion", 1, 1, "season");
    const ZoneStatus& sb = statusOf(b, "pass_completion", 1, 1, "season");
    CHECK(sa.dispersion > 0);
    CHECK(sa.sum.effDen < sb.sum.effDen);
    CHECK(sa.interval.high - sa.interval.low > sb.interval.high - sb.interval.low);
    // One series with a target, a budget of 1: min(0.05, 1/1)/38 → 1 − 0.05/38.
    CHECK(sa.offThreshold == Approx(1 - 0.05 / 38).epsilon(1e-12));
    CHECK(offThresholdFor(with, 200) == Approx(1 - 0.005 / 38).epsilon(1e-12));
    FlagSettings fixed;
    fixed.falseFlagsPerSeason = 0;
    CHECK(offThresholdFor(fixed, 200) == 0.999);
}
