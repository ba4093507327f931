// The match-to-match variation estimators (model/variation) against a published worked example
// and hand-worked numbers. The distributions themselves are checked against scipy in
// tests/python/variation_check.py.

#include "variation.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;

TEST_CASE("one-way ANOVA intraclass correlation reproduces a published worked example", "[variation]") {
    // Shrout P.E., Fleiss J.L. (1979), "Intraclass correlations: uses in assessing rater
    // reliability", Psychological Bulletin 86:420–428, Table 2: six targets each rated by four
    // judges. Published (their Table 3 and case 1): BMS 11.24, WMS 6.26, ICC(1,1) 0.17. The
    // data are from memory; the computation below reproduces all three published figures
    // (numpy gives BMS 11.241667, WMS 6.263889, ICC 0.165742), which a misremembered table
    // would hardly do.
    const std::vector<std::vector<double>> ratings{
        {9, 2, 5, 8}, {6, 1, 3, 2}, {8, 4, 6, 8}, {7, 1, 2, 6}, {10, 5, 6, 9}, {6, 2, 4, 7}};
    std::vector<ClusterSums> targets;
    for (const auto& r : ratings) {
        ClusterSums c;
        for (double v : r) {
            c.n += 1;
            c.sum += v;
            c.sumSquares += v * v;
        }
        targets.push_back(c);
    }
    const OneWayAnova a = oneWayAnova({targets});
    CHECK(a.dfBetween == 5);
    CHECK(a.dfWithin == 18);
    CHECK(a.n0 == Approx(4));
    CHECK(a.msBetween == Approx(11.241667).epsilon(1e-6));
    CHECK(a.msWithin == Approx(6.263889).epsilon(1e-6));
    REQUIRE(a.intraclass());
    CHECK(*a.intraclass() == Approx(0.165742).epsilon(1e-5));
}

TEST_CASE("the rate dispersion is the ANOVA estimator on the chances as 0/1 data", "[variation]") {
    // Hand-worked: matches with 1 of 4, 3 of 4 and 6 of 8 chances taken.
    //   N = 16, S = 10; Σx²/n = 1/4 + 9/4 + 36/8 = 7; SSB = 7 − 100/16 = 0.75 (2 df);
    //   SSW = 10 − 7 = 3 (13 df); n0 = (16 − 96/16)/2 = 5;
    //   MSB = 0.375, MSW = 3/13; rho = (0.375 − 3/13)/(0.375 + 4·3/13) = 0.112033...
    const TallySeries zone{{1, 4}, {3, 4}, {6, 8}};
    const OneWayAnova a = oneWayAnova({{{4, 1, 1}, {4, 3, 3}, {8, 6, 6}}});
    CHECK(a.n0 == Approx(5));
    REQUIRE(a.intraclass());
    const double rho = (0.375 - 3.0 / 13) / (0.375 + 4 * 3.0 / 13);
    CHECK(*a.intraclass() == Approx(rho));
    // No prior weight: the club's own estimate alone.
    const Dispersion d = estimateRateDispersion({zone}, 3, VariationPrior{0.02, 0.10, 0});
    CHECK(d.estimate == Approx(rho));
    CHECK(d.value == Approx(rho));
    CHECK(d.weight == 2);
    // The same 16 chances written out one by one (cluster sizes 1 are no cluster at all, so
    // expand within the three matches): the sums of squares of 0/1 data are their sums.
    std::vector<ClusterSums> expanded;
    for (const auto& t : zone) {
        ClusterSums c;
        for (long i = 0; i < t.den; ++i) {
            const double v = i < t.num ? 1 : 0;
            c.n += 1;
            c.sum += v;
            c.sumSquares += v * v;
        }
        expanded.push_back(c);
    }
    CHECK(*oneWayAnova({expanded}).intraclass() == Approx(rho));
    // With the default prior worth 10 matches: (10·0.02 + 2·rho)/12.
    CHECK(estimateRateDispersion({zone}, 3).value == Approx((10 * 0.02 + 2 * rho) / 12));
}

TEST_CASE("the ANOVA needs two clusters and spread within them", "[variation]") {
    CHECK_FALSE(oneWayAnova({{{4, 2, 2}}}).intraclass());        // one cluster: no df between
    CHECK_FALSE(oneWayAnova({{{1, 1, 1}, {1, 0, 0}}}).intraclass()); // N = k: no df within
    // Without an estimate the prior stands alone, with no weight of its own data.
    const Dispersion d = estimateRateDispersion({{{2, 4}}}, 1);
    CHECK(d.value == Approx(0.02));
    CHECK(d.weight == 0);
}
