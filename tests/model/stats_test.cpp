// Statistics module: published worked examples, hand-derived values and edge cases. Every
// expected number names its source; tags in brackets follow the project's reference list:
// [published] read in the source, [transcribed] from independent transcriptions of the
// source's table, reproduced by Debian's scipy 1.10.1, "from memory" recalled and unconfirmed.

#include "stats.h"

#include <boost/math/distributions/binomial.hpp>
#include <boost/math/distributions/poisson.hpp>
#include <catch2/catch.hpp>

#include <functional>
#include <cmath>
#include <limits>
#include <stdexcept>
#include <vector>

using namespace pitchloop::model::stats;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;

namespace {

// Four-decimal published values: half a unit in the last printed place.
constexpr double kTable = 5e-5;

void requireInterval(const Interval& ci, double low, double high, double tol) {
    CHECK_THAT(ci.low, WithinAbs(low, tol));
    CHECK_THAT(ci.high, WithinAbs(high, tol));
}

} // namespace

// ---- Single proportion -------------------------------------------------------------------

TEST_CASE("Wilson, Wilson with continuity correction and Clopper-Pearson match Newcombe's table",
          "[stats]") {
    // Newcombe R.G. (1998) Statistics in Medicine 17:857-872, Table II, 95 % [transcribed].
    SECTION("81/263") {
        requireInterval(wilson(81, 263, 0.95), 0.2553, 0.3662, kTable);
    }
    SECTION("15/148") {
        requireInterval(wilson(15, 148, 0.95), 0.0624, 0.1605, kTable);
        requireInterval(wilsonCC(15, 148, 0.95), 0.0598, 0.1644, kTable);
        requireInterval(clopperPearson(15, 148, 0.95), 0.0578, 0.1617, kTable);
    }
    SECTION("0/20") {
        requireInterval(wilson(0, 20, 0.95), 0.0, 0.1611, kTable);
        requireInterval(wilsonCC(0, 20, 0.95), 0.0, 0.2005, kTable);
        requireInterval(clopperPearson(0, 20, 0.95), 0.0, 0.1684, kTable);
    }
    SECTION("1/29") {
        requireInterval(wilson(1, 29, 0.95), 0.0061, 0.1718, kTable);
        requireInterval(wilsonCC(1, 29, 0.95), 0.0018, 0.1963, kTable);
        requireInterval(clopperPearson(1, 29, 0.95), 0.0009, 0.1776, kTable);
    }
}

TEST_CASE("Jeffreys interval matches R's binom package", "[stats]") {
    // Brown, Cai & DasGupta (2001); values from R's binom package as stored in statsmodels'
    // test data [published there to 6 decimals: tolerance 5e-7].
    requireInterval(jeffreys(18, 20, 0.95), 0.716147, 0.978628, 5e-7);
    requireInterval(jeffreys(4, 20, 0.95), 0.071520, 0.408226, 5e-7);
    requireInterval(jeffreys(4, 200, 0.95), 0.006788, 0.046847, 5e-7);
}

TEST_CASE("Clopper-Pearson limits are where the binomial tails equal alpha/2", "[stats]") {
    // Definition (Clopper & Pearson 1934): P(X >= x | low) = α/2 and P(X <= x | high) = α/2,
    // checked with Boost's binomial distribution rather than the Beta quantiles used inside.
    namespace bm = boost::math;
    const Interval ci = clopperPearson(7, 40, 0.9);
    CHECK_THAT(bm::cdf(bm::complement(bm::binomial_distribution<double>(40, ci.low), 6.0)),
               WithinRel(0.05, 1e-10));
    CHECK_THAT(bm::cdf(bm::binomial_distribution<double>(40, ci.high), 7.0),
               WithinRel(0.05, 1e-10));
}

TEST_CASE("single-proportion intervals: edges", "[stats]") {
    using Method = std::function<Interval(long, long, double)>;
    const std::vector<Method> methods{
        [](long x, long n, double level) { return wilson(x, n, level); }, wilsonCC,
        [](long x, long n, double level) { return jeffreys(x, n, level); }, clopperPearson};
    for (const auto& interval : methods) {
        // n = 0: no information, the whole range (documented in stats.h).
        requireInterval(interval(0, 0, 0.95), 0.0, 1.0, 0.0);
        // x = 0 → low exactly 0; x = n → high exactly 1 (stats.h).
        CHECK(interval(0, 12, 0.95).low == 0.0);
        CHECK(interval(12, 12, 0.95).high == 1.0);
        const Interval mid = interval(3, 12, 0.8);
        CHECK(0.0 < mid.low);
        CHECK(mid.low < 0.25);
        CHECK(0.25 < mid.high);
        CHECK(mid.high < 1.0);
        CHECK_THROWS_AS(interval(13, 12, 0.95), std::invalid_argument);
        CHECK_THROWS_AS(interval(-1, 12, 0.95), std::invalid_argument);
        CHECK_THROWS_AS(interval(1, -12, 0.95), std::invalid_argument);
        CHECK_THROWS_AS(interval(1, 12, 1.0), std::invalid_argument);
        CHECK_THROWS_AS(interval(1, 12, 0.0), std::invalid_argument);
        CHECK_THROWS_AS(interval(1, 12, std::nan("")), std::invalid_argument);
    }
}

// ---- Poisson -----------------------------------------------------------------------------

TEST_CASE("Garwood interval", "[stats]") {
    SECTION("count 0: high = -ln(α/2) per unit exposure") {
        // Hand-derived: χ² with 2 df has quantile −2 ln(1 − q), so high = −ln(0.025) = ln 40.
        requireInterval(garwood(0, 1.0, 0.95), 0.0, std::log(40.0), 1e-12);
        requireInterval(garwood(0, 4.0, 0.95), 0.0, std::log(40.0) / 4.0, 1e-12);
    }
    SECTION("count 1: low = -ln(1 - α/2)") {
        // Hand-derived as above: low = χ²_2(0.025)/2 = −ln(0.975).
        CHECK_THAT(garwood(1, 1.0, 0.95).low, WithinRel(-std::log(0.975), 1e-12));
    }
    SECTION("limits are where the Poisson tails equal α/2") {
        // Definition (Garwood 1936): P(X >= k | low) = α/2, P(X <= k | high) = α/2, checked with
        // Boost's Poisson distribution rather than the chi-square quantiles used inside.
        namespace bm = boost::math;
        const double exposure = 6.0;
        const Interval ci = garwood(17, exposure, 0.95);
        CHECK_THAT(
            bm::cdf(bm::complement(bm::poisson_distribution<double>(ci.low * exposure), 16.0)),
            WithinRel(0.025, 1e-10));
        CHECK_THAT(bm::cdf(bm::poisson_distribution<double>(ci.high * exposure), 17.0),
                   WithinRel(0.025, 1e-10));
    }
    SECTION("edges") {
        // Exposure 0 and count 0: no information, documented as {0, +inf}.
        const Interval none = garwood(0, 0.0, 0.95);
        CHECK(none.low == 0.0);
        CHECK(std::isinf(none.high));
        CHECK_THROWS_AS(garwood(3, 0.0, 0.95), std::invalid_argument);
        CHECK_THROWS_AS(garwood(-1, 2.0, 0.95), std::invalid_argument);
        CHECK_THROWS_AS(garwood(1, -2.0, 0.95), std::invalid_argument);
        CHECK_THROWS_AS(garwood(1, std::numeric_limits<double>::infinity(), 0.95),
                        std::invalid_argument);
    }
}

// ---- Posterior evidence ------------------------------------------------------------------

TEST_CASE("Beta posterior summary matches Gelman et al. BDA3 §2.4", "[stats]") {
    // Gelman et al., Bayesian Data Analysis 3rd ed., §2.4: 437 of 980 with a uniform prior →
    // Beta(438, 544), mean 0.446, sd 0.016, 95 % interval [0.415, 0.477] [transcribed];
    // compared to the printed precision (half a unit in the third decimal).
    const BetaSummary s = betaSummary(438, 544, 0.95);
    CHECK_THAT(s.mean, WithinAbs(0.446, 5e-4));
    CHECK_THAT(s.sd, WithinAbs(0.016, 5e-4));
    requireInterval(s.interval, 0.415, 0.477, 5e-4);
    CHECK_THROWS_AS(betaSummary(0.0, 1.0, 0.95), std::invalid_argument);
    CHECK_THROWS_AS(betaSummary(1.0, -1.0, 0.95), std::invalid_argument);
}

TEST_CASE("posterior probabilities for a rate", "[stats]") {
    // Hand-derived: with no data the posterior is the Jeffreys prior Beta(½, ½), the arcsine
    // law with cdf (2/π) arcsin(sqrt(t)); at t = ¼ that is (2/π)(π/6) = 1/3.
    CHECK_THAT(probRateBelow(0, 0, 0.25), WithinRel(1.0 / 3.0, 1e-12));
    CHECK_THAT(probRateAbove(0, 0, 0.25), WithinRel(2.0 / 3.0, 1e-12));
    // Hand-derived: Beta(x + ½, n − x + ½) is symmetric when x = n − x, so P(p < ½) = ½.
    CHECK_THAT(probRateBelow(7, 14, 0.5), WithinRel(0.5, 1e-12));
    // Edges documented in stats.h.
    CHECK(probRateBelow(3, 10, 0.0) == 0.0);
    CHECK(probRateBelow(3, 10, 1.0) == 1.0);
    CHECK(probRateAbove(3, 10, -0.5) == 1.0);
    CHECK(probRateAbove(3, 10, 1.5) == 0.0);
    CHECK_THROWS_AS(probRateBelow(11, 10, 0.5), std::invalid_argument);
    CHECK_THROWS_AS(probRateBelow(3, 10, std::nan("")), std::invalid_argument);
}

TEST_CASE("posterior probabilities for a Poisson rate", "[stats]") {
    // Hand-derived: count 0 → Gamma(½, rate e); P(λ < t) = P(χ²_1 < 2et) = erf(sqrt(e t)).
    CHECK_THAT(probPoissonRateBelow(0, 1.0, 1.0), WithinRel(std::erf(1.0), 1e-12));
    CHECK_THAT(probPoissonRateBelow(0, 2.0, 0.5), WithinRel(std::erf(1.0), 1e-12));
    CHECK_THAT(probPoissonRateAbove(0, 1.0, 1.0), WithinRel(std::erfc(1.0), 1e-12));
    // Edges documented in stats.h: exposure 0 has no posterior (NaN); target <= 0, +inf.
    CHECK(std::isnan(probPoissonRateBelow(0, 0.0, 1.0)));
    CHECK(std::isnan(probPoissonRateAbove(0, 0.0, 1.0)));
    CHECK(probPoissonRateBelow(4, 2.0, 0.0) == 0.0);
    CHECK(probPoissonRateAbove(4, 2.0, 0.0) == 1.0);
    CHECK(probPoissonRateBelow(4, 2.0, std::numeric_limits<double>::infinity()) == 1.0);
    CHECK_THROWS_AS(probPoissonRateBelow(4, 0.0, 1.0), std::invalid_argument);
    CHECK_THROWS_AS(probPoissonRateAbove(-4, 1.0, 1.0), std::invalid_argument);
}

// ---- EWMA --------------------------------------------------------------------------------

TEST_CASE("EWMA chart matches the NIST/SEMATECH e-Handbook example", "[stats]") {
    // NIST/SEMATECH e-Handbook of Statistical Methods §6.3.2.4: λ = 0.3, EWMA_0 = 50,
    // s = 2.0539, k = 3 [published]. Limits 52.5884 / 47.4115 to 1e-4 (the handbook rounds
    // the factor sqrt(λ/(2 − λ)) to 0.4201); EWMA values printed to 2 decimals.
    const std::vector<double> data{52.0, 47.0, 53.0, 49.3, 50.1, 47.0, 51.0, 50.1, 51.2, 50.5,
                                   49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1};
    const std::vector<double> expected{50.60, 49.52, 50.56, 50.18, 50.16, 49.21, 49.75,
                                       49.85, 50.26, 50.33, 50.11, 49.36, 49.52, 50.05,
                                       49.38, 49.92, 50.73, 51.23, 51.94, 51.99};
    const std::vector<EwmaPoint> chart = ewma(data, 0.3, 50.0, 2.0539, 3.0, false);
    REQUIRE(chart.size() == expected.size());
    for (std::size_t t = 0; t < chart.size(); ++t) {
        INFO("t = " << t + 1);
        CHECK_THAT(chart[t].value, WithinAbs(expected[t], 0.005));
        CHECK_THAT(chart[t].high, WithinAbs(52.5884, 1e-4));
        CHECK_THAT(chart[t].low, WithinAbs(47.4115, 1e-4));
    }
    const std::vector<double> series = ewmaSeries(data, 0.3, 50.0);
    REQUIRE(series.size() == chart.size());
    for (std::size_t t = 0; t < chart.size(); ++t)
        CHECK(series[t] == chart[t].value);
}

TEST_CASE("EWMA exact limits", "[stats]") {
    // Hand-derived: at t = 1 the exact factor is λ/(2 − λ)·(1 − (1 − λ)²) = λ², so the limits
    // are start ± k·s·λ; they widen towards the asymptotic limits.
    const std::vector<EwmaPoint> chart = ewma({52.0, 47.0, 53.0}, 0.3, 50.0, 2.0539, 3.0, true);
    CHECK_THAT(chart[0].high, WithinRel(50.0 + 3.0 * 2.0539 * 0.3, 1e-12));
    CHECK_THAT(chart[0].low, WithinRel(50.0 - 3.0 * 2.0539 * 0.3, 1e-12));
    CHECK(chart[1].high > chart[0].high);
    CHECK(chart[2].high > chart[1].high);
    CHECK(chart[2].high < 50.0 + 3.0 * 2.0539 * std::sqrt(0.3 / 1.7));
    // Hand-derived: λ = 1 is a Shewhart chart, z_t = x_t.
    CHECK(ewmaSeries({3.0, 4.0}, 1.0, 0.0) == std::vector<double>{3.0, 4.0});
}

TEST_CASE("EWMA edges", "[stats]") {
    CHECK(ewma({}, 0.3, 50.0, 1.0, 3.0, true).empty());
    CHECK_THROWS_AS(ewmaSeries({1.0}, 0.0, 0.0), std::invalid_argument);
    CHECK_THROWS_AS(ewmaSeries({1.0}, 1.5, 0.0), std::invalid_argument);
    CHECK_THROWS_AS(ewmaSeries({std::nan("")}, 0.3, 0.0), std::invalid_argument);
    CHECK_THROWS_AS(ewma({1.0}, 0.3, 0.0, -1.0, 3.0, false), std::invalid_argument);
}

// ---- Multiple testing --------------------------------------------------------------------

TEST_CASE("Benjamini-Hochberg: hand-worked examples", "[stats]") {
    SECTION("four hypotheses") {
        // Hand-worked: sorted 0.005, 0.01, 0.03, 0.04 (m = 4) → p·m/i = 0.02, 0.02, 0.04, 0.04,
        // already monotone; in input order {0.02, 0.04, 0.04, 0.02}. At q = 0.03 the
        // thresholds i·q/m are 0.0075, 0.015, 0.0225, 0.03: the first two sorted p pass.
        const std::vector<double> p{0.01, 0.04, 0.03, 0.005};
        const std::vector<double> adjusted = benjaminiHochberg(p);
        const std::vector<double> expected{0.02, 0.04, 0.04, 0.02};
        for (std::size_t i = 0; i < p.size(); ++i)
            CHECK_THAT(adjusted[i], WithinRel(expected[i], 1e-12));
        CHECK(bhReject(p, 0.03) == std::vector<bool>{true, false, false, true});
    }
    SECTION("step-up rejects a p-value above its own threshold") {
        // Hand-worked: 0.02, 0.025, 0.04 with m = 3, q = 0.05: thresholds 0.0167, 0.0333, 0.05;
        // p_(1) misses its threshold but p_(3) passes, so all three are rejected.
        // Adjusted: 0.06 → min(0.06, 0.0375) = 0.0375, 0.0375, 0.04.
        const std::vector<double> p{0.04, 0.02, 0.025};
        CHECK(bhReject(p, 0.05) == std::vector<bool>{true, true, true});
        const std::vector<double> adjusted = benjaminiHochberg(p);
        CHECK_THAT(adjusted[0], WithinRel(0.04, 1e-12));
        CHECK_THAT(adjusted[1], WithinRel(0.0375, 1e-12));
        CHECK_THAT(adjusted[2], WithinRel(0.0375, 1e-12));
    }
    SECTION("edges") {
        CHECK(benjaminiHochberg({}).empty());
        CHECK(bhReject({}, 0.05).empty());
        CHECK(benjaminiHochberg({0.7}) == std::vector<double>{0.7});
        CHECK(bhReject({1.0, 1.0}, 1.0) == std::vector<bool>{true, true});
        CHECK_THROWS_AS(benjaminiHochberg({0.2, 1.2}), std::invalid_argument);
        CHECK_THROWS_AS(benjaminiHochberg({std::nan("")}), std::invalid_argument);
        CHECK_THROWS_AS(bhReject({0.2}, -0.1), std::invalid_argument);
    }
}

// ---- Two samples -------------------------------------------------------------------------

TEST_CASE("Newcombe's hybrid score interval matches his Table II", "[stats]") {
    // Newcombe R.G. (1998) Statistics in Medicine 17:873-890, Table II, method 10, 95 %
    // [transcribed; rows 3-6 from a single transcription, all reproduced by statsmodels].
    requireInterval(newcombeDifference(56, 70, 48, 80, 0.95), 0.0524, 0.3339, kTable);
    requireInterval(newcombeDifference(9, 10, 3, 10, 0.95), 0.1705, 0.8090, kTable);
    requireInterval(newcombeDifference(6, 7, 2, 7, 0.95), 0.0582, 0.8062, kTable);
    requireInterval(newcombeDifference(5, 56, 0, 29, 0.95), -0.0381, 0.1926, kTable);
    requireInterval(newcombeDifference(0, 10, 0, 20, 0.95), -0.1611, 0.2775, kTable);
    requireInterval(newcombeDifference(10, 10, 0, 20, 0.95), 0.6791, 1.0000, kTable);
    // Edges documented in stats.h: an empty sample → the whole range.
    requireInterval(newcombeDifference(0, 0, 3, 5, 0.95), -1.0, 1.0, 0.0);
    CHECK_THROWS_AS(newcombeDifference(6, 5, 3, 5, 0.95), std::invalid_argument);
}

TEST_CASE("Fisher's exact test", "[stats]") {
    SECTION("the tea-tasting table") {
        // Fisher (1935): [[3, 1], [1, 3]], hypergeometric probabilities 1, 16, 36, 16, 1 over
        // 70: one-sided 17/70, two-sided 34/70 [published].
        const FisherResult r = fisherExact(3, 1, 1, 3);
        CHECK_THAT(r.pGreater, WithinRel(17.0 / 70.0, 1e-12));
        CHECK_THAT(r.pLess, WithinRel(69.0 / 70.0, 1e-12)); // hand-derived: 1 − 1/70
        CHECK_THAT(r.pTwoSided, WithinRel(34.0 / 70.0, 1e-12));
        CHECK_THAT(r.oddsRatio, WithinRel(9.0, 1e-15)); // hand-derived: 3·3/(1·1)
    }
    SECTION("scipy's docstring example") {
        // scipy.stats.fisher_exact docstring: [[8, 2], [1, 5]] → 0.034965034965034975 [published].
        CHECK_THAT(fisherExact(8, 2, 1, 5).pTwoSided, WithinRel(0.034965034965034975, 1e-12));
    }
    SECTION("a large table") {
        // Library reference, computed with Debian's scipy 1.10.1 (not a paper):
        // fisher_exact([[20000, 30000], [25000, 26000]]) → 4.681588724752974e-183, 'less'
        // → 2.4453823391790172e-183. Also guards the cost: the two-sided sum walks tails, not
        // the 45 000 tables of the support.
        const FisherResult r = fisherExact(20000, 30000, 25000, 26000);
        CHECK_THAT(r.pTwoSided, WithinRel(4.681588724752974e-183, 1e-9));
        CHECK_THAT(r.pLess, WithinRel(2.4453823391790172e-183, 1e-9));
        CHECK(r.pGreater == 1.0);
    }
    SECTION("the most probable table has p = 1") {
        // Hand-derived: [[2, 2], [2, 2]] is the mode, every table is no more probable.
        CHECK(fisherExact(2, 2, 2, 2).pTwoSided == 1.0);
    }
    SECTION("edges, with scipy's conventions") {
        const FisherResult empty = fisherExact(0, 0, 3, 4);
        CHECK(empty.pLess == 1.0);
        CHECK(empty.pGreater == 1.0);
        CHECK(empty.pTwoSided == 1.0);
        CHECK(std::isnan(empty.oddsRatio));
        CHECK(std::isinf(fisherExact(3, 0, 1, 4).oddsRatio));
        CHECK(std::isinf(fisherExact(3, 2, 0, 4).oddsRatio));
        CHECK(fisherExact(0, 2, 1, 4).oddsRatio == 0.0);
        CHECK_THROWS_AS(fisherExact(-1, 2, 3, 4), std::invalid_argument);
    }
}

TEST_CASE("exact conditional test of two Poisson rates", "[stats]") {
    // Hand-derived: equal exposures, 0 vs 4 → K ~ Binomial(4, ½); P(K <= 0) = 1/16, and the
    // two-sided p adds P(K = 4) = 1/16 (equally probable) → 1/8.
    const PoissonTwoSample r = poissonConditionalTest(0, 3.0, 4, 3.0);
    CHECK_THAT(r.pLess, WithinRel(1.0 / 16.0, 1e-12));
    CHECK(r.pGreater == 1.0);
    CHECK_THAT(r.pTwoSided, WithinRel(1.0 / 8.0, 1e-12));
    // Hand-derived: exposures 1 and 3 → p = ¼; 3 vs 1 gives P(K >= 3) = 4·(¼)³(¾) + (¼)⁴ = 13/256.
    CHECK_THAT(poissonConditionalTest(3, 1.0, 1, 3.0).pGreater, WithinRel(13.0 / 256.0, 1e-12));
    // Library reference, computed with Debian's scipy 1.10.1 (not a paper):
    // binomtest(30000, 62000, 0.5).pvalue → 9.838084128935592e-16.
    CHECK_THAT(poissonConditionalTest(30000, 50.0, 32000, 50.0).pTwoSided,
               WithinRel(9.838084128935592e-16, 1e-9));
    // Edges documented in stats.h.
    const PoissonTwoSample none = poissonConditionalTest(0, 2.0, 0, 5.0);
    CHECK(none.pLess == 1.0);
    CHECK(none.pGreater == 1.0);
    CHECK(none.pTwoSided == 1.0);
    CHECK(poissonConditionalTest(0, 0.0, 4, 5.0).pTwoSided == 1.0);
    CHECK_THROWS_AS(poissonConditionalTest(2, 0.0, 4, 5.0), std::invalid_argument);
}

TEST_CASE("probability that a rate improved", "[stats]") {
    // Hand-derived: identical posteriors → P(p2 > p1) = ½ by symmetry.
    CHECK_THAT(probRateImproved(5, 10, 5, 10, true), WithinAbs(0.5, 1e-9));
    CHECK_THAT(probRateImproved(0, 0, 0, 0, false), WithinAbs(0.5, 1e-9));
    CHECK_THAT(probRateImproved(437, 980, 437, 980, true), WithinAbs(0.5, 1e-9));
    // Hand-derived: the two directions are complementary (ties have probability 0).
    const double up = probRateImproved(3, 20, 9, 25, true);
    const double down = probRateImproved(3, 20, 9, 25, false);
    CHECK_THAT(up + down, WithinAbs(1.0, 1e-9));
    CHECK(up > 0.9);
    // Hand-derived: swapping the periods swaps the question.
    CHECK_THAT(probRateImproved(9, 25, 3, 20, true), WithinAbs(down, 1e-9));
    // Hand-derived: a narrow posterior (2000 trials) against a wide one (x = 0 of 3): the
    // quadrature must find the narrow spike; compare both directions again.
    CHECK_THAT(probRateImproved(0, 3, 600, 2000, true) + probRateImproved(0, 3, 600, 2000, false),
               WithinAbs(1.0, 1e-9));
    CHECK_THROWS_AS(probRateImproved(3, 2, 1, 2, true), std::invalid_argument);
}

TEST_CASE("probability that a Poisson rate improved", "[stats]") {
    // Hand-derived: identical posteriors → ½.
    CHECK_THAT(probPoissonRateImproved(4, 5.0, 4, 5.0, true), WithinAbs(0.5, 1e-12));
    // Hand-derived: c1 = c2 = 0 with exposures 1 and 3: W ~ Beta(½, ½), cut ¼ →
    // (2/π) arcsin(½) = 1/3.
    CHECK_THAT(probPoissonRateImproved(0, 1.0, 0, 3.0, true), WithinRel(1.0 / 3.0, 1e-12));
    CHECK_THAT(probPoissonRateImproved(0, 1.0, 0, 3.0, false), WithinRel(2.0 / 3.0, 1e-12));
    // Edge documented in stats.h: zero exposure → NaN.
    CHECK(std::isnan(probPoissonRateImproved(0, 0.0, 3, 2.0, true)));
    CHECK_THROWS_AS(probPoissonRateImproved(1, 0.0, 3, 2.0, true), std::invalid_argument);
}

// ---- p-chart -----------------------------------------------------------------------------

TEST_CASE("p-chart matches the NIST/SEMATECH e-Handbook example", "[stats]") {
    // The layout of the NIST/SEMATECH e-Handbook §6.3.3.2 example: 30 samples of 50. The data
    // below are recalled from the handbook (from memory: the page could not be read here), so
    // the expected numbers are hand-derived from the formula on these data, not quoted:
    //   p̄ = 347/1500 = 0.231333…, σ = √(p̄(1 − p̄)/50) = 0.0596353…,
    //   UCL = p̄ + 3σ = 0.41023911859473844, LCL = p̄ − 3σ = 0.05242754807192823
    //   (/usr/bin/python3, math.sqrt), samples 15 (22/50) and 23 (24/50) above the UCL.
    // They agree with the handbook's printed p̄ 0.2313, UCL 0.4102, LCL 0.0524 as recalled.
    const std::vector<long> defectives{12, 15, 8, 10, 4,  7,  16, 9,  14, 10, 5,  6, 17, 12, 22,
                                       8,  10, 5, 13, 11, 20, 18, 24, 15, 9,  12, 7, 13, 9,  6};
    const std::vector<long> sizes(defectives.size(), 50);
    const std::vector<PChartPoint> chart = pChart(defectives, sizes, defectives.size());
    REQUIRE(chart.size() == 30);
    for (std::size_t i = 0; i < chart.size(); ++i) {
        INFO("sample " << i + 1);
        CHECK_THAT(chart[i].centre, WithinAbs(347.0 / 1500, 1e-15));
        CHECK_THAT(chart[i].ucl, WithinAbs(0.41023911859473844, 1e-12));
        CHECK_THAT(chart[i].lcl, WithinAbs(0.05242754807192823, 1e-12));
        CHECK_THAT(chart[i].ucl, WithinAbs(0.4102, kTable)); // the printed limits, as recalled
        CHECK_THAT(chart[i].lcl, WithinAbs(0.0524, kTable));
        CHECK(chart[i].above == (i + 1 == 15 || i + 1 == 23));
        CHECK_FALSE(chart[i].below);
    }
}

TEST_CASE("p-chart: baseline, varying sizes and edges", "[stats]") {
    // Hand-derived: baseline 2 of 10 and 3 of 10 → p̄ = ¼; for n = 12 the half-width is
    // 3·sqrt(¼·¾/12) = 0.375 → limits [0, 0.625]; n = 0 → no p, limits [0, 1], no flags.
    const std::vector<PChartPoint> chart = pChart({2, 3, 9, 0}, {10, 10, 12, 0}, 2);
    CHECK_THAT(chart[2].centre, WithinRel(0.25, 1e-15));
    CHECK(chart[2].lcl == 0.0);
    CHECK_THAT(chart[2].ucl, WithinRel(0.625, 1e-12));
    CHECK(chart[2].above); // 9/12 = 0.75 > 0.625
    CHECK(std::isnan(chart[3].p));
    CHECK(chart[3].lcl == 0.0);
    CHECK(chart[3].ucl == 1.0);
    CHECK_FALSE(chart[3].above);
    CHECK_FALSE(chart[3].below);
    // A baseline without trials: centre NaN, nothing flagged (documented in stats.h).
    const std::vector<PChartPoint> blind = pChart({0, 4}, {0, 5}, 1);
    CHECK(std::isnan(blind[1].centre));
    CHECK_FALSE(blind[1].above);
    CHECK_FALSE(blind[1].below);
    CHECK_THROWS_AS(pChart({1, 2}, {5}, 1), std::invalid_argument);
    CHECK_THROWS_AS(pChart({1, 2}, {5, 5}, 0), std::invalid_argument);
    CHECK_THROWS_AS(pChart({1, 2}, {5, 5}, 3), std::invalid_argument);
    CHECK_THROWS_AS(pChart({6, 2}, {5, 5}, 1), std::invalid_argument);
}

TEST_CASE("posterior tails accept the effective (weighted) counts of an EWMA window", "[stats]") {
    // Values from Debian's scipy 1.10.1: beta.cdf(0.5, 1.2, 2.1) for x = 0.7 of n = 2.3
    // (posterior Beta(0.7 + ½, 1.6 + ½)), and gamma.sf(1.5, 4.2, scale=1/2.4) for a count of
    // 3.7 over an exposure of 2.4 (posterior Gamma(3.7 + ½, rate 2.4)).
    CHECK_THAT(probRateBelow(0.7, 2.3, 0.5), Catch::Matchers::WithinRel(0.7150886778051285, 1e-9));
    CHECK_THAT(probPoissonRateAbove(3.7, 2.4, 1.5),
               Catch::Matchers::WithinRel(0.5566828476480068, 1e-9));
    // Whole counts give the same as before: the real-valued form is the same formula.
    CHECK(wilson(3.0, 12.0, 0.9).low == wilson(3L, 12L, 0.9).low);
}
