#include "variation.h"

#include <boost/math/distributions/negative_binomial.hpp>
#include <boost/math/distributions/poisson.hpp>

#include <algorithm>
#include <cmath>

namespace pitchloop::model {

namespace {

Dispersion blend(double estimate, double weight, double prior, double priorWeight, double cap) {
    Dispersion d;
    d.estimate = estimate;
    d.weight = std::max(0.0, weight);
    d.prior = prior;
    d.priorWeight = priorWeight;
    const double total = d.weight + priorWeight;
    const double mixed = total > 0 ? (priorWeight * prior + d.weight * estimate) / total : prior;
    d.value = std::clamp(mixed, 0.0, cap);
    return d;
}

} // namespace

// One-way random-effects analysis of variance over groups of clusters (each group its own mean):
//   SSB = Σ S_i²/n_i − S²/N      (k − 1 degrees of freedom)
//   SSW = Σ Q_i − Σ S_i²/n_i     (N − k)
//   n0  = (N − Σ n_i²/N)/(k − 1)
//   ICC = (MSB − MSW) / (MSB + (n0 − 1)·MSW)
// with S_i and Q_i a cluster's sum and sum of squares; the sums of squares, their degrees of
// freedom and the n0 numerators add over groups.
OneWayAnova oneWayAnova(const std::vector<std::vector<ClusterSums>>& groups) {
    double ssb = 0, ssw = 0, dfb = 0, dfw = 0, n0num = 0;
    for (const auto& g : groups) {
        double k = 0, N = 0, S = 0, between = 0, Q = 0, sumN2 = 0;
        for (const auto& c : g) {
            if (c.n <= 0) continue;
            k += 1;
            N += c.n;
            S += c.sum;
            Q += c.sumSquares;
            between += c.sum * c.sum / c.n;
            sumN2 += c.n * c.n;
        }
        if (k < 2 || N <= k) continue;
        ssb += between - S * S / N;
        ssw += Q - between;
        dfb += k - 1;
        dfw += N - k;
        n0num += N - sumN2 / N;
    }
    OneWayAnova a;
    a.dfBetween = dfb;
    a.dfWithin = dfw;
    if (dfb > 0) {
        a.msBetween = ssb / dfb;
        a.n0 = n0num / dfb;
    }
    if (dfw > 0) a.msWithin = ssw / dfw;
    return a;
}

std::optional<double> OneWayAnova::intraclass() const {
    if (dfBetween <= 0 || dfWithin <= 0) return std::nullopt;
    const double denom = msBetween + (n0 - 1) * msWithin;
    if (denom <= 0) return std::nullopt;
    return (msBetween - msWithin) / denom;
}

// Clustered binary data, one cluster per match with chances: a match's x successes of n are a
// cluster with sum x and sum of squares x (0/1 data). E[MSW] = μ(1 − μ)(1 − rho) and E[MSB] =
// μ(1 − μ)(1 + (n0 − 1)·rho) under the beta-binomial model, which is what makes the intraclass
// correlation estimate rho.
Dispersion estimateRateDispersion(const std::vector<TallySeries>& series, int matches,
                                  const VariationPrior& prior) {
    std::vector<std::vector<ClusterSums>> groups;
    groups.reserve(series.size());
    for (const auto& s : series) {
        auto& g = groups.emplace_back();
        for (const auto& t : s) {
            const double x = static_cast<double>(t.num);
            g.push_back({static_cast<double>(t.den), x, x});
        }
    }
    if (const auto icc = oneWayAnova(groups).intraclass())
        return blend(*icc, std::max(0, matches - 1), prior.rho, prior.priorWeight, 0.5);
    return blend(prior.rho, 0, prior.rho, prior.priorWeight, 0.5);
}

// For c_i ~ Poisson(e_i·λ_i), λ_i with mean μ and variance phi·μ², and μ̂ = Σc/E:
//   E[Σ (c_i − e_i μ̂)²] = μ·(E − S2/E) + phi·μ²·(S2 − 2·S3/E + S2²/E²),
// with E = Σe, S2 = Σe², S3 = Σe³ (for one match each, e = 1: (k − 1)(μ + phi·μ²), the
// negative binomial's variance). Solving the summed identity for phi with μ̂ in place of μ
// gives the estimate.
Dispersion estimateCountDispersion(const std::vector<TallySeries>& series, int matches,
                                   const VariationPrior& prior) {
    double num = 0, den = 0;
    for (const auto& s : series) {
        double k = 0, E = 0, C = 0, S2 = 0, S3 = 0;
        for (const auto& t : s) {
            if (t.den <= 0) continue;
            const double e = static_cast<double>(t.den);
            k += 1;
            E += e;
            C += static_cast<double>(t.num);
            S2 += e * e;
            S3 += e * e * e;
        }
        if (k < 2 || E <= 0) continue;
        const double mu = C / E;
        double ss = 0;
        for (const auto& t : s) {
            if (t.den <= 0) continue;
            const double d = static_cast<double>(t.num) - static_cast<double>(t.den) * mu;
            ss += d * d;
        }
        num += ss - mu * (E - S2 / E);
        den += mu * mu * (S2 - 2 * S3 / E + S2 * S2 / (E * E));
    }
    double estimate = prior.phi;
    double weight = 0;
    if (den > 0) {
        estimate = num / den;
        weight = std::max(0, matches - 1);
    }
    return blend(estimate, weight, prior.phi, prior.priorWeight, 5.0);
}

MetricVariation estimateVariation(const std::vector<MatchTally>& tallies, std::size_t upTo,
                                  MetricKind kind, const VariationPrior& prior) {
    MetricVariation v;
    const std::size_t matches = tallies.empty() ? 0 : std::min(upTo + 1, tallies.size());
    const std::size_t zones = matches > 0 ? tallies[0].size() : 0;
    std::vector<TallySeries> perZone(zones);
    TallySeries whole;
    for (std::size_t m = 0; m < matches; ++m) {
        ZoneTally sum;
        for (std::size_t z = 0; z < zones && z < tallies[m].size(); ++z) {
            perZone[z].push_back(tallies[m][z]);
            sum.num += tallies[m][z].num;
            sum.den += tallies[m][z].den;
        }
        if (kind == MetricKind::Count) sum.den = 1;
        whole.push_back(sum);
    }
    const int n = static_cast<int>(matches);
    if (kind == MetricKind::Rate) {
        v.zones = estimateRateDispersion(perZone, n, prior);
        v.wholePitch = estimateRateDispersion({whole}, n, prior);
    } else {
        v.zones = estimateCountDispersion(perZone, n, prior);
        v.wholePitch = estimateCountDispersion({whole}, n, prior);
    }
    return v;
}

double countTail(double count, double mean, double phi, bool upper) {
    const double c = std::floor(count);
    if (mean <= 0) return upper ? (c > 0 ? 0.0 : 1.0) : (c >= 0 ? 1.0 : 0.0);
    auto cdf = [&](double k) { // P(X <= k)
        if (k < 0) return 0.0;
        if (phi <= 0) return boost::math::cdf(boost::math::poisson_distribution<double>(mean), k);
        const double r = 1 / phi;
        return boost::math::cdf(
            boost::math::negative_binomial_distribution<double>(r, r / (r + mean)), k);
    };
    return upper ? 1 - cdf(c - 1) : cdf(c);
}

double designEffect(MetricKind kind, double dispersion, double den, double mean) {
    if (den <= 0 || dispersion <= 0) return 1;
    if (kind == MetricKind::Rate) return 1 + std::max(0.0, den - 1) * dispersion;
    return 1 + dispersion * std::max(0.0, mean) * den;
}

} // namespace pitchloop::model
