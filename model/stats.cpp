// Statistics for zone values and follow-ups; every distribution from Boost.Math.
// Formulas and their sources are named beside each function; docs/statistics.md has the
// user-facing definitions.

#include "stats.h"

#include <algorithm>
#include <boost/math/distributions/beta.hpp>
#include <boost/math/distributions/binomial.hpp>
#include <boost/math/distributions/chi_squared.hpp>
#include <boost/math/distributions/gamma.hpp>
#include <boost/math/distributions/hypergeometric.hpp>
#include <boost/math/distributions/normal.hpp>
#include <boost/math/quadrature/gauss_kronrod.hpp>
#include <cmath>
#include <limits>
#include <numeric>
#include <stdexcept>
#include <string>
#include <type_traits>

namespace pitchloop::model::stats {

namespace {

namespace bm = boost::math;

// Boost's default policy evaluates double functions in long double: 10–20 times slower here,
// for accuracy we do not need (in double, results agree with scipy's to 1e-10 relative or
// better; scipy makes the same choice). Errors still throw.
using Policy = bm::policies::policy<bm::policies::promote_double<false>>;
using Beta = bm::beta_distribution<double, Policy>;
using Binomial = bm::binomial_distribution<double, Policy>;
using ChiSquared = bm::chi_squared_distribution<double, Policy>;
using Gamma = bm::gamma_distribution<double, Policy>;
using Hypergeometric = bm::hypergeometric_distribution<double, Policy>;
using Normal = bm::normal_distribution<double, Policy>;

constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

// Why 1e-7: a two-sided exact p-value sums the outcomes "no more probable than the observed
// one". Outcomes that are equally probable in exact arithmetic (a symmetric table, a binomial
// with p = ½) come out of floating point a few ulp apart, more for large tables; without a
// tolerance the p-value would depend on that rounding. 1e-7 is R's relErr in fisher.test and
// binom.test and scipy's in binomtest (scipy's fisher_exact uses 1e-14).
constexpr double kTieTolerance = 1e-7;

[[noreturn]] void fail(const std::string& what) {
    throw std::invalid_argument("stats: " + what);
}

void requireLevel(double level) {
    if (!(level > 0.0 && level < 1.0)) fail("level must lie strictly between 0 and 1");
}

void requireCounts(double x, double n) {
    if (!std::isfinite(x) || !std::isfinite(n)) fail("counts must be finite");
    if (n < 0 || x < 0) fail("counts must be non-negative");
    if (x > n) fail("successes exceed trials");
}

void requireExposure(double count, double exposure) {
    if (!std::isfinite(count) || count < 0) fail("count must be finite and non-negative");
    if (!std::isfinite(exposure) || exposure < 0.0)
        fail("exposure must be finite and non-negative");
    if (exposure == 0.0 && count > 0) fail("a positive count needs a positive exposure");
}

void requireTarget(double target) {
    if (std::isnan(target)) fail("target is NaN");
}

// Standard normal quantile z with P(|Z| <= z) = level.
double twoSidedZ(double level) {
    return bm::quantile(bm::complement(Normal(), (1.0 - level) / 2.0));
}

// P(X > t) for X ~ Beta. Why not Boost's complement alone: for tiny t (say below 1e-12) Boost
// 1.74 in double returns it up to 2e-9 off (measured for Beta(½, ½)); while the lower tail is
// below ½, 1 − lower tail is exact to an ulp.
double betaUpperTail(const Beta& dist, double t) {
    const double lower = bm::cdf(dist, t);
    return lower < 0.5 ? 1.0 - lower : bm::cdf(bm::complement(dist, t));
}

// Equal-tailed interval of a Beta(a, b) distribution.
Interval betaInterval(double a, double b, double level) {
    const Beta dist(a, b);
    const double tail = (1.0 - level) / 2.0;
    return {bm::quantile(dist, tail), bm::quantile(bm::complement(dist, tail))};
}

// A count distribution from Boost on the integers lo..hi: pmf, P(K <= k) and P(K >= k).
template <class Dist> struct CountLaw {
    const Dist& dist;
    long lo;
    long hi;

    static auto arg(long k) {
        if constexpr (std::is_same_v<Dist, Hypergeometric>)
            return static_cast<unsigned>(k);
        else
            return static_cast<double>(k);
    }
    double pmf(long k) const { return bm::pdf(dist, arg(k)); }
    double atMost(long k) const { return k >= hi ? 1.0 : bm::cdf(dist, arg(k)); }
    double atLeast(long k) const {
        return k <= lo ? 1.0 : bm::cdf(bm::complement(dist, arg(k - 1)));
    }
    long mode() const { return std::clamp(static_cast<long>(bm::mode(dist)), lo, hi); }
};

// Two-sided exact p-value: the probability of the outcomes no more probable than the observed
// one (within kTieTolerance); exactly 1 when the observed outcome is as probable as the mode.
// Why tails and a bisection rather than a sum over the support: the hypergeometric and the
// binomial are unimodal, so the qualifying outcomes are the tail beyond the observed one plus a
// tail on the far side of the mode, whose start a bisection finds. That costs about 20 pmf
// evaluations instead of one per outcome (a Boost hypergeometric pmf for a table of 100 000
// takes over a millisecond); scipy's fisher_exact and binomtest use the same scheme.
template <class Law> double twoSidedNoMoreProbable(const Law& law, long observed) {
    const double threshold = law.pmf(observed) * (1.0 + kTieTolerance);
    const long mode = law.mode();
    if (law.pmf(mode) <= threshold) return 1.0;
    if (observed < mode) {
        // The first k above the mode with pmf(k) <= threshold (hi + 1 if none).
        long tooProbable = mode;
        long first = law.hi + 1;
        while (first - tooProbable > 1) {
            const long mid = tooProbable + (first - tooProbable) / 2;
            (law.pmf(mid) <= threshold ? first : tooProbable) = mid;
        }
        return std::min(1.0, law.atMost(observed) + (first <= law.hi ? law.atLeast(first) : 0.0));
    }
    // The last k below the mode with pmf(k) <= threshold (lo − 1 if none).
    long last = law.lo - 1;
    long tooProbable = mode;
    while (tooProbable - last > 1) {
        const long mid = last + (tooProbable - last) / 2;
        (law.pmf(mid) <= threshold ? last : tooProbable) = mid;
    }
    return std::min(1.0, law.atLeast(observed) + (last >= law.lo ? law.atMost(last) : 0.0));
}

} // namespace

// ---- Single proportion -------------------------------------------------------------------

// Wilson score interval: Newcombe (1998) "Two-sided confidence intervals for the single
// proportion", method 3: (2x + z² ± z·sqrt(z² + 4x(n − x)/n)) / (2(n + z²)).
Interval wilson(double x, double n, double level) {
    requireCounts(x, n);
    requireLevel(level);
    if (n == 0) return {0.0, 1.0};
    const double z = twoSidedZ(level);
    const double xd = x;
    const double nd = n;
    const double denom = 2.0 * (nd + z * z);
    const double centre = (2.0 * xd + z * z) / denom;
    const double half = z * std::sqrt(z * z + 4.0 * xd * (nd - xd) / nd) / denom;
    return {x == 0 ? 0.0 : std::max(0.0, centre - half),
            x == n ? 1.0 : std::min(1.0, centre + half)};
}

// Wilson score interval with continuity correction: Newcombe (1998), method 4,
// L = (2np + z² − 1 − z·sqrt(z² − 2 − 1/n + 4p(nq + 1))) / (2(n + z²)),
// U = (2np + z² + 1 + z·sqrt(z² + 2 − 1/n + 4p(nq − 1))) / (2(n + z²)); L = 0 when p = 0 and
// U = 1 when p = 1.
Interval wilsonCC(long x, long n, double level) {
    requireCounts(x, n);
    requireLevel(level);
    if (n == 0) return {0.0, 1.0};
    const double z = twoSidedZ(level);
    const double nd = static_cast<double>(n);
    const double p = static_cast<double>(x) / nd;
    const double q = 1.0 - p;
    const double denom = 2.0 * (nd + z * z);
    const double centre = 2.0 * nd * p + z * z;
    double low = 0.0;
    double high = 1.0;
    if (x > 0)
        low = (centre - 1.0 - z * std::sqrt(z * z - 2.0 - 1.0 / nd + 4.0 * p * (nd * q + 1.0))) /
              denom;
    if (x < n)
        high = (centre + 1.0 + z * std::sqrt(z * z + 2.0 - 1.0 / nd + 4.0 * p * (nd * q - 1.0))) /
               denom;
    return {std::max(0.0, low), std::min(1.0, high)};
}

// Jeffreys interval with the boundary modification of Brown, Cai & DasGupta (2001),
// Statistical Science 16:101–133: equal-tailed Beta(x + ½, n − x + ½) quantiles.
Interval jeffreys(double x, double n, double level) {
    requireCounts(x, n);
    requireLevel(level);
    const Interval ci = betaInterval(x + 0.5, n - x + 0.5, level);
    return {x == 0 ? 0.0 : ci.low, x == n ? 1.0 : ci.high};
}

// Clopper & Pearson (1934): low = Beta(x, n − x + 1) quantile α/2, high = Beta(x + 1, n − x)
// quantile 1 − α/2 (the inversion of two one-sided binomial tests).
Interval clopperPearson(long x, long n, double level) {
    requireCounts(x, n);
    requireLevel(level);
    const double tail = (1.0 - level) / 2.0;
    const double xd = static_cast<double>(x);
    const double nd = static_cast<double>(n);
    double low = 0.0;
    double high = 1.0;
    if (x > 0) low = bm::quantile(Beta(xd, nd - xd + 1.0), tail);
    if (x < n) high = bm::quantile(bm::complement(Beta(xd + 1.0, nd - xd), tail));
    return {low, high};
}

// ---- Poisson rate ------------------------------------------------------------------------

// Garwood (1936), Biometrika 28:437–442: for a count k, low = χ²_{2k}(α/2)/2 and
// high = χ²_{2k+2}(1 − α/2)/2 bound the mean; divided by the exposure for a rate.
Interval garwood(double count, double exposure, double level) {
    requireExposure(count, exposure);
    requireLevel(level);
    if (exposure == 0.0) return {0.0, kInf};
    const double tail = (1.0 - level) / 2.0;
    const double k = count;
    double low = 0.0;
    if (count > 0) low = bm::quantile(ChiSquared(2.0 * k), tail) / 2.0;
    const double high = bm::quantile(bm::complement(ChiSquared(2.0 * k + 2.0), tail)) / 2.0;
    return {low / exposure, high / exposure};
}

// ---- Posterior evidence ------------------------------------------------------------------

// Jeffreys prior Beta(½, ½) + binomial likelihood → Beta(x + ½, n − x + ½) (conjugacy).
double probRateBelow(double x, double n, double target) {
    requireCounts(x, n);
    requireTarget(target);
    if (target <= 0.0) return 0.0;
    if (target >= 1.0) return 1.0;
    return bm::cdf(Beta(x + 0.5, n - x + 0.5), target);
}

// Upper tail of the same posterior.
double probRateAbove(double x, double n, double target) {
    requireCounts(x, n);
    requireTarget(target);
    if (target <= 0.0) return 1.0;
    if (target >= 1.0) return 0.0;
    return betaUpperTail(Beta(x + 0.5, n - x + 0.5), target);
}

// Jeffreys prior for a Poisson mean (∝ λ^−½) + Poisson likelihood over `exposure` →
// Gamma(shape count + ½, rate exposure); Boost takes the scale 1/exposure.
double probPoissonRateBelow(double count, double exposure, double target) {
    requireExposure(count, exposure);
    requireTarget(target);
    if (exposure == 0.0) return kNaN;
    if (target <= 0.0) return 0.0;
    if (std::isinf(target)) return 1.0;
    return bm::cdf(Gamma(count + 0.5, 1.0 / exposure), target);
}

// Upper tail of the same posterior.
double probPoissonRateAbove(double count, double exposure, double target) {
    requireExposure(count, exposure);
    requireTarget(target);
    if (exposure == 0.0) return kNaN;
    if (target <= 0.0) return 1.0;
    if (std::isinf(target)) return 0.0;
    return bm::cdf(bm::complement(Gamma(count + 0.5, 1.0 / exposure), target));
}

// Beta(a, b): mean a/(a + b), sd sqrt(ab/((a + b)²(a + b + 1))), equal-tailed quantiles.
BetaSummary betaSummary(double a, double b, double level) {
    if (!(a > 0.0 && b > 0.0 && std::isfinite(a) && std::isfinite(b)))
        fail("Beta parameters must be finite and positive");
    requireLevel(level);
    const Beta dist(a, b);
    return {bm::mean(dist), bm::standard_deviation(dist), betaInterval(a, b, level)};
}

// ---- EWMA --------------------------------------------------------------------------------

// NIST/SEMATECH e-Handbook of Statistical Methods §6.3.2.4: EWMA_t = λ Y_t + (1 − λ) EWMA_{t−1},
// EWMA_0 the target; limits EWMA_0 ± k s sqrt(λ/(2 − λ) [1 − (1 − λ)^{2t}]), whose bracket
// tends to 1 (the handbook's asymptotic limits).
std::vector<EwmaPoint> ewma(const std::vector<double>& x, double lambda, double start, double sigma,
                            double k, bool exactLimits) {
    if (!(std::isfinite(sigma) && sigma >= 0.0)) fail("EWMA sigma must be finite and non-negative");
    if (!(std::isfinite(k) && k >= 0.0)) fail("EWMA k must be finite and non-negative");
    const std::vector<double> z = ewmaSeries(x, lambda, start);
    const double asymptotic = lambda / (2.0 - lambda);
    std::vector<EwmaPoint> points;
    points.reserve(z.size());
    for (std::size_t t = 1; t <= z.size(); ++t) {
        double factor = asymptotic;
        if (exactLimits) factor *= 1.0 - std::pow(1.0 - lambda, 2.0 * static_cast<double>(t));
        const double half = k * sigma * std::sqrt(factor);
        points.push_back({z[t - 1], start - half, start + half});
    }
    return points;
}

// The recursion alone, seeded with z_0 = start.
std::vector<double> ewmaSeries(const std::vector<double>& x, double lambda, double start) {
    if (!(lambda > 0.0 && lambda <= 1.0)) fail("EWMA lambda must lie in (0, 1]");
    if (!std::isfinite(start)) fail("EWMA start must be finite");
    std::vector<double> z;
    z.reserve(x.size());
    double previous = start;
    for (double value : x) {
        if (!std::isfinite(value)) fail("EWMA values must be finite");
        previous = lambda * value + (1.0 - lambda) * previous;
        z.push_back(previous);
    }
    return z;
}

// ---- Multiple testing --------------------------------------------------------------------

namespace {

void requireProbabilities(const std::vector<double>& p) {
    for (double v : p)
        if (!(v >= 0.0 && v <= 1.0)) fail("p-values must lie in [0, 1]");
}

// Indices of p in ascending order of p (ties keep input order).
std::vector<std::size_t> ascendingOrder(const std::vector<double>& p) {
    std::vector<std::size_t> order(p.size());
    std::iota(order.begin(), order.end(), std::size_t{0});
    std::stable_sort(order.begin(), order.end(),
                     [&p](std::size_t i, std::size_t j) { return p[i] < p[j]; });
    return order;
}

} // namespace

// Benjamini & Hochberg (1995), JRSS B 57:289–300. The adjusted p-value of a hypothesis is the
// smallest FDR level at which the step-up rule rejects it: q_(i) = min_{j >= i} p_(j) m / j.
std::vector<double> benjaminiHochberg(const std::vector<double>& p) {
    requireProbabilities(p);
    const std::size_t m = p.size();
    const std::vector<std::size_t> order = ascendingOrder(p);
    std::vector<double> q(m);
    double running = 1.0;
    for (std::size_t r = m; r-- > 0;) {
        // p / (i/m) rather than p·m/i: the same rounding as statsmodels' fdrcorrection.
        const double rank = static_cast<double>(r + 1) / static_cast<double>(m);
        running = std::min(running, p[order[r]] / rank);
        q[order[r]] = running;
    }
    return q;
}

// The BH step-up rule: reject H_(1..k) for the largest k with p_(k) <= (k/m)·q.
std::vector<bool> bhReject(const std::vector<double>& p, double q) {
    requireProbabilities(p);
    if (!(q >= 0.0 && q <= 1.0)) fail("false discovery rate must lie in [0, 1]");
    const std::size_t m = p.size();
    const std::vector<std::size_t> order = ascendingOrder(p);
    std::size_t rejected = 0;
    for (std::size_t r = 0; r < m; ++r)
        if (p[order[r]] <= static_cast<double>(r + 1) / static_cast<double>(m) * q)
            rejected = r + 1;
    std::vector<bool> reject(m, false);
    for (std::size_t r = 0; r < rejected; ++r)
        reject[order[r]] = true;
    return reject;
}

// ---- Two samples -------------------------------------------------------------------------

// Newcombe (1998) "Interval estimation for the difference between independent proportions",
// method 10: with Wilson limits (l_i, u_i), δ = p1 − p2,
// low = δ − sqrt((p1 − l1)² + (u2 − p2)²), high = δ + sqrt((u1 − p1)² + (p2 − l2)²).
Interval newcombeDifference(long x1, long n1, long x2, long n2, double level) {
    requireCounts(x1, n1);
    requireCounts(x2, n2);
    requireLevel(level);
    if (n1 == 0 || n2 == 0) return {-1.0, 1.0};
    const Interval w1 = wilson(x1, n1, level);
    const Interval w2 = wilson(x2, n2, level);
    const double p1 = static_cast<double>(x1) / static_cast<double>(n1);
    const double p2 = static_cast<double>(x2) / static_cast<double>(n2);
    const double delta = p1 - p2;
    return {delta - std::hypot(p1 - w1.low, w2.high - p2),
            delta + std::hypot(w1.high - p1, p2 - w2.low)};
}

// Fisher (1935): given the margins, A (the top-left cell) is hypergeometric. One-sided
// p-values are its tails; the two-sided p-value sums every table no more probable than the
// observed one (the rule of R's fisher.test and scipy's fisher_exact), not twice a tail,
// which can exceed 1 and is not what either library reports.
FisherResult fisherExact(long a, long b, long c, long d) {
    if (a < 0 || b < 0 || c < 0 || d < 0) fail("table cells must be non-negative");
    const long row1 = a + b;
    const long col1 = a + c;
    const long total = a + b + c + d;
    if (total > static_cast<long>(std::numeric_limits<unsigned>::max()))
        fail("table total too large");
    // scipy's convention: a zero row or column total carries no information.
    if (row1 == 0 || c + d == 0 || col1 == 0 || b + d == 0) return {1.0, 1.0, 1.0, kNaN};
    const double oddsRatio = (b > 0 && c > 0)
                                 ? static_cast<double>(static_cast<long long>(a) * d) /
                                       static_cast<double>(static_cast<long long>(b) * c)
                                 : kInf;

    const Hypergeometric h(static_cast<unsigned>(col1), static_cast<unsigned>(row1),
                           static_cast<unsigned>(total));
    const CountLaw<Hypergeometric> law{h, std::max(0L, row1 + col1 - total), std::min(row1, col1)};
    return {law.atMost(a), law.atLeast(a), twoSidedNoMoreProbable(law, a), oddsRatio};
}

// Exact conditional test (Przyborowski & Wilenski 1940): under equal rates, count1 given the
// total is Binomial(total, e1/(e1 + e2)); two-sided by the same rule as fisherExact.
PoissonTwoSample poissonConditionalTest(long count1, double exposure1, long count2,
                                        double exposure2) {
    requireExposure(count1, exposure1);
    requireExposure(count2, exposure2);
    const long total = count1 + count2;
    if (total == 0 || exposure1 == 0.0 || exposure2 == 0.0) return {1.0, 1.0, 1.0};
    const Binomial bin(static_cast<double>(total), exposure1 / (exposure1 + exposure2));
    const CountLaw<Binomial> law{bin, 0, total};
    return {law.atMost(count1), law.atLeast(count1), twoSidedNoMoreProbable(law, count1)};
}

namespace {

// The distribution of 1 − p when p ~ Beta(a, b).
Beta mirrored(const Beta& dist) {
    return Beta(dist.beta(), dist.alpha());
}

// ∫_0^½ g(u) du for g = (density of one Jeffreys posterior) × (tail of another).
// Why s = sqrt(u): a Beta(x + ½, ·) density behaves like u^(x − ½) near 0, infinite for x = 0;
// in s the integrand g(s²)·2s behaves like s^(2x), smooth for every x, which Gauss–Kronrod
// handles at full accuracy.
// Why break points: a posterior from hundreds of trials is a narrow spike; an adaptive rule
// started on the whole interval can sample around it and stop early. Cutting at quantiles of
// both posteriors gives pieces on which each factor varies gently.
// Why each piece is rescaled to [0, 1]: Boost 1.74's adaptive Gauss–Kronrod compares an
// error estimate that ignores the interval length with a tolerance that includes it, so on
// short intervals it subdivides to the maximum depth.
template <class G> double integrateLowerHalf(G g, const Beta& first, const Beta& second) {
    static constexpr double kLevels[] = {1e-9, 1e-6, 1e-3, 0.02, 0.1,  0.3,
                                         0.5,  0.7,  0.9,  0.98, 0.999};
    std::vector<double> breaks{0.0, std::sqrt(0.5)};
    for (const Beta& dist : {first, second})
        for (double level : kLevels)
            if (const double u = bm::quantile(dist, level); u > 0.0 && u < 0.5)
                breaks.push_back(std::sqrt(u));
    std::sort(breaks.begin(), breaks.end());
    breaks.erase(std::unique(breaks.begin(), breaks.end()), breaks.end());
    double total = 0.0;
    for (std::size_t i = 0; i + 1 < breaks.size(); ++i) {
        const double s0 = breaks[i];
        const double width = breaks[i + 1] - s0;
        const auto piece = [&](double t) {
            const double s = s0 + width * t;
            return g(s * s) * 2.0 * s * width;
        };
        total += bm::quadrature::gauss_kronrod<double, 31>::integrate(piece, 0.0, 1.0, 10, 1e-11);
    }
    return total;
}

// P(after > before) = ∫_0^1 f_after(p) F_before(p) dp for independent Beta variables.
// Why two halves: doubles near 1 are 1.1e-16 apart, too coarse for a Beta(a, ½) density,
// whose last 1e-16 can carry 1e-8 of probability. Above ½ we integrate in u = 1 − p with the
// mirrored distributions, where tiny u is represented exactly.
double probAfterExceedsBefore(const Beta& before, const Beta& after) {
    const Beta beforeMirror = mirrored(before);
    const Beta afterMirror = mirrored(after);
    const double lower = integrateLowerHalf(
        [&](double p) { return bm::pdf(after, p) * bm::cdf(before, p); }, before, after);
    const double upper = integrateLowerHalf(
        [&](double u) { return bm::pdf(afterMirror, u) * betaUpperTail(beforeMirror, u); },
        beforeMirror, afterMirror);
    return std::clamp(lower + upper, 0.0, 1.0);
}

} // namespace

// Posterior probability of improvement with Jeffreys posteriors Beta(x + ½, n − x + ½).
// P(p2 < p1) = P(1 − p2 > 1 − p1) is the same integral for the mirrored posteriors, computed
// directly rather than as 1 − P(p2 > p1) so that a small probability keeps its accuracy.
double probRateImproved(long x1, long n1, long x2, long n2, bool higherIsBetter) {
    requireCounts(x1, n1);
    requireCounts(x2, n2);
    const Beta before(x1 + 0.5, static_cast<double>(n1 - x1) + 0.5);
    const Beta after(x2 + 0.5, static_cast<double>(n2 - x2) + 0.5);
    return higherIsBetter ? probAfterExceedsBefore(before, after)
                          : probAfterExceedsBefore(mirrored(before), mirrored(after));
}

// With G_i = e_i λ_i ~ Gamma(c_i + ½, 1) independent, W = G1/(G1 + G2) ~ Beta(c1 + ½, c2 + ½)
// and λ2 > λ1 ⇔ W < e1/(e1 + e2), so P(λ2 > λ1) = I_{e1/(e1+e2)}(c1 + ½, c2 + ½): exact, and
// no quadrature needed.
double probPoissonRateImproved(long c1, double e1, long c2, double e2, bool higherIsBetter) {
    requireExposure(c1, e1);
    requireExposure(c2, e2);
    if (e1 == 0.0 || e2 == 0.0) return kNaN;
    const Beta w(c1 + 0.5, c2 + 0.5);
    const double cut = e1 / (e1 + e2);
    return higherIsBetter ? bm::cdf(w, cut) : betaUpperTail(w, cut);
}

// ---- p-chart -----------------------------------------------------------------------------

// NIST/SEMATECH e-Handbook §6.3.3.2: p̄ from the baseline, limits p̄ ± 3 sqrt(p̄(1 − p̄)/n_i)
// per sample (varying n_i gives stepped limits), clamped to [0, 1].
std::vector<PChartPoint> pChart(const std::vector<long>& x, const std::vector<long>& n,
                                std::size_t baselineCount, double sigmas) {
    if (x.size() != n.size()) fail("p-chart needs as many counts as sample sizes");
    if (baselineCount == 0 || baselineCount > x.size())
        fail("p-chart baseline must hold between 1 and all samples");
    if (!(std::isfinite(sigmas) && sigmas > 0.0))
        fail("p-chart sigmas must be finite and positive");
    for (std::size_t i = 0; i < x.size(); ++i)
        requireCounts(x[i], n[i]);

    long long baselineX = 0;
    long long baselineN = 0;
    for (std::size_t i = 0; i < baselineCount; ++i) {
        baselineX += x[i];
        baselineN += n[i];
    }
    const double centre =
        baselineN == 0 ? kNaN : static_cast<double>(baselineX) / static_cast<double>(baselineN);

    std::vector<PChartPoint> points;
    points.reserve(x.size());
    for (std::size_t i = 0; i < x.size(); ++i) {
        PChartPoint point{kNaN, centre, kNaN, kNaN, false, false};
        if (n[i] > 0) point.p = static_cast<double>(x[i]) / static_cast<double>(n[i]);
        if (!std::isnan(centre)) {
            if (n[i] == 0) {
                point.lcl = 0.0;
                point.ucl = 1.0;
            } else {
                const double half =
                    sigmas * std::sqrt(centre * (1.0 - centre) / static_cast<double>(n[i]));
                point.lcl = std::max(0.0, centre - half);
                point.ucl = std::min(1.0, centre + half);
                point.above = point.p > point.ucl;
                point.below = point.p < point.lcl;
            }
        }
        points.push_back(point);
    }
    return points;
}

} // namespace pitchloop::model::stats
