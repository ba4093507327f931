#pragma once
// Statistics for honest zone values: intervals for rates and counts, posterior evidence for
// targets, EWMA and p-charts for match-by-match series, false-discovery control, and the
// before/after comparisons of a follow-up. Plain numbers in, plain structs out; every
// distribution comes from Boost.Math. Definitions and sources: docs/statistics.md.
//
// Conventions shared by every function:
// - `level` is a two-sided confidence (or credible) level in (0, 1), e.g. 0.95.
// - Counts must be >= 0, with x <= n; exposures are finite and >= 0. Intervals and posterior
//   tails for one sample take real counts, so the weighted sums of an EWMA window (effective
//   counts) use the same formulas; exact tests and the p-chart take whole counts (`long`).
// - Bad arguments throw std::invalid_argument; documented edge cases return values.

#include <cstddef>
#include <vector>

namespace pitchloop::model::stats {

/// A closed interval [low, high].
struct Interval {
    double low;
    double high;
};

// ---- Single proportion x/n ---------------------------------------------------------------

/// Wilson score interval (Wilson 1927; Newcombe 1998 method 3). n == 0 → {0, 1};
/// x == 0 → low exactly 0; x == n → high exactly 1.
Interval wilson(double x, double n, double level);

/// Wilson score interval with continuity correction (Newcombe 1998 method 4).
/// Same edge cases as `wilson`.
Interval wilsonCC(long x, long n, double level);

/// Jeffreys interval: equal-tailed quantiles of Beta(x + ½, n − x + ½), with low 0 when
/// x == 0 and high 1 when x == n (Brown, Cai & DasGupta 2001). n == 0 → {0, 1}.
Interval jeffreys(double x, double n, double level);

/// Clopper–Pearson "exact" interval from Beta quantiles. n == 0 → {0, 1}.
Interval clopperPearson(long x, long n, double level);

// ---- Poisson rate count/exposure ---------------------------------------------------------

/// Exact (Garwood 1936) interval for a Poisson rate count/exposure, from chi-square
/// quantiles. count == 0 → low 0. exposure == 0 with count == 0 → {0, +inf} (no information);
/// a positive count with zero exposure throws.
Interval garwood(double count, double exposure, double level);

// ---- Posterior evidence about a target -----------------------------------------------------

/// P(p < target | x of n) under the Jeffreys prior Beta(½, ½), i.e. the posterior
/// Beta(x + ½, n − x + ½) cdf at target. n == 0 gives the prior's probability.
/// target <= 0 → 0; target >= 1 → 1.
double probRateBelow(double x, double n, double target);
/// P(p > target | x of n) = 1 − probRateBelow, computed as an upper tail (no cancellation).
double probRateAbove(double x, double n, double target);

/// P(λ < target | count in exposure) under the Jeffreys prior for a Poisson rate
/// (density ∝ λ^−½): posterior Gamma(shape count + ½, rate exposure). target <= 0 → 0.
/// exposure == 0 (count must be 0) → NaN: the prior is improper, so there is no posterior.
double probPoissonRateBelow(double count, double exposure, double target);
/// P(λ > target | count in exposure), the upper tail of the same posterior; NaN as above.
double probPoissonRateAbove(double count, double exposure, double target);

/// Mean, standard deviation and equal-tailed interval of a Beta(a, b) distribution.
struct BetaSummary {
    double mean;
    double sd;
    Interval interval;
};
/// Summary of Beta(a, b), a > 0 and b > 0.
BetaSummary betaSummary(double a, double b, double level);

// ---- EWMA (NIST/SEMATECH e-Handbook §6.3.2.4) ---------------------------------------------

/// One EWMA statistic z_t with its control limits.
struct EwmaPoint {
    double value;
    double low;
    double high;
};

/// EWMA chart: z_0 = start, z_t = λ x_t + (1 − λ) z_{t−1} for t = 1..N (one point per x);
/// limits start ± k·sigma·sqrt(λ/(2 − λ)), or with exactLimits the time-varying
/// start ± k·sigma·sqrt(λ/(2 − λ)·(1 − (1 − λ)^{2t})). 0 < λ <= 1, sigma >= 0, k >= 0,
/// every x finite.
std::vector<EwmaPoint> ewma(const std::vector<double>& x, double lambda, double start, double sigma,
                            double k, bool exactLimits);

/// The EWMA statistics z_1..z_N alone (same recursion as `ewma`).
std::vector<double> ewmaSeries(const std::vector<double>& x, double lambda, double start);

// ---- Multiple testing (Benjamini & Hochberg 1995) -----------------------------------------

/// BH-adjusted p-values (q-values) in input order: min over j >= i of p_(j)·m/j, capped at 1.
/// Every p must lie in [0, 1]. Empty in → empty out.
std::vector<double> benjaminiHochberg(const std::vector<double>& p);

/// Hypotheses rejected by the BH step-up procedure at false discovery rate q: all with
/// p <= p_(k), k the largest i with p_(i) <= (i/m)·q. 0 <= q <= 1.
std::vector<bool> bhReject(const std::vector<double>& p, double q);

// ---- Two samples: before (1) and after (2) ------------------------------------------------

/// Interval for p1 − p2 by Newcombe's hybrid score method (Newcombe 1998, method 10), built
/// from the two Wilson intervals without continuity correction. n1 == 0 or n2 == 0 → {−1, 1}.
Interval newcombeDifference(long x1, long n1, long x2, long n2, double level);

/// Fisher's exact test of a 2×2 table.
struct FisherResult {
    double pLess;     ///< P(A <= a): evidence that the odds ratio is below 1
    double pGreater;  ///< P(A >= a): evidence that the odds ratio is above 1
    double pTwoSided; ///< sum of the table probabilities <= the observed one
    double oddsRatio; ///< sample odds ratio a·d/(b·c); +inf when b or c is 0; NaN (with all
                      ///< p-values 1) when a row or column total is 0
};
/// Fisher's exact test of [[a, b], [c, d]], conditional on the margins (hypergeometric A).
FisherResult fisherExact(long a, long b, long c, long d);

/// Exact conditional test comparing two Poisson rates.
struct PoissonTwoSample {
    double pLess;     ///< evidence that rate 1 < rate 2: P(K <= count1)
    double pGreater;  ///< evidence that rate 1 > rate 2: P(K >= count1)
    double pTwoSided; ///< sum of the probabilities <= P(K = count1)
};
/// count1 given the total ~ Binomial(count1 + count2, e1/(e1 + e2)) under equal rates.
/// A total of 0, or a zero exposure (whose count must then be 0) → all p-values 1.
PoissonTwoSample poissonConditionalTest(long count1, double exposure1, long count2,
                                        double exposure2);

/// Posterior probability that the rate improved from period 1 to period 2, with independent
/// Jeffreys posteriors Beta(x + ½, n − x + ½): P(p2 > p1) when higherIsBetter, else
/// P(p2 < p1). Computed as ∫ f2(p)·F1(p) dp by adaptive Gauss–Kronrod quadrature between
/// quantile break points of both posteriors; absolute error below 1e-9.
double probRateImproved(long x1, long n1, long x2, long n2, bool higherIsBetter);

/// The same for Poisson rates with Gamma(count + ½, rate exposure) posteriors, in closed form:
/// P(λ2 > λ1) = I_{e1/(e1+e2)}(c1 + ½, c2 + ½) (regularised incomplete beta).
/// A zero exposure on either side → NaN (improper posterior; see probPoissonRateBelow).
double probPoissonRateImproved(long c1, double e1, long c2, double e2, bool higherIsBetter);

// ---- p-chart (NIST/SEMATECH e-Handbook §6.3.3.2) ------------------------------------------

/// One sample on a p-chart.
struct PChartPoint {
    double p;      ///< x_i / n_i; NaN when n_i == 0
    double centre; ///< p̄ of the baseline
    double lcl;    ///< max(0, p̄ − sigmas·sqrt(p̄(1 − p̄)/n_i)); 0 when n_i == 0
    double ucl;    ///< min(1, p̄ + sigmas·sqrt(p̄(1 − p̄)/n_i)); 1 when n_i == 0
    bool above;    ///< p > ucl
    bool below;    ///< p < lcl
};
/// p-chart with centre p̄ = Σx/Σn over the first baselineCount samples (1 <= baselineCount
/// <= size). If the baseline holds no trials (Σn == 0) the centre and limits are NaN and
/// nothing is flagged.
std::vector<PChartPoint> pChart(const std::vector<long>& x, const std::vector<long>& n,
                                std::size_t baselineCount, double sigmas = 3);

} // namespace pitchloop::model::stats
