#pragma once
// Match-to-match variation of a metric's true value: a zone's regain rate is not one fixed
// number all season but moves with the opponent, the score and the line-up. Rates follow a
// beta-binomial model, counts a gamma-Poisson (negative binomial) one; the dispersion is
// estimated from the club's own matches, pooled over zones, and turns every window's chances
// into effective chances (a design effect) before intervals and evidence are computed.
// Definitions, estimators and their checks: docs/statistics.md "Match-to-match variation".

#include "metricengine.h"
#include "metricspec.h"

#include <optional>
#include <vector>

namespace pitchloop::model {

/// How much a metric's true value varies from match to match.
/// - Rates: the match's true rate p_m has mean μ and variance rho·μ(1 − μ) (beta-binomial;
///   rho is the intra-match correlation of two chances of the same match).
/// - Counts and exposures: the match's true rate λ_m has mean μ and variance phi·μ²
///   (gamma-Poisson; phi = 1/shape, the squared coefficient of variation).
struct Dispersion {
    double value = 0;    ///< rho for rates, phi for counts; the one the flags use
    double estimate = 0; ///< the club's own moment estimate (may be negative: pure noise)
    double weight = 0;   ///< matches' worth of data behind the estimate (matches − 1)
    double prior = 0;    ///< the documented default it is blended with
    double priorWeight = 0;
};

/// The defaults used while a club has few matches (docs/statistics.md): rho 0.02 is a
/// match-to-match SD of about 0.07 around a 45 % rate; phi 0.10 a coefficient of variation of
/// about 0.32 in a per-match count. Each counts as `priorWeight` matches' worth of data.
struct VariationPrior {
    double rho = 0.02;
    double phi = 0.10;
    double priorWeight = 10;
};

/// One zone's (or the whole pitch's) per-match tallies, in match order.
using TallySeries = std::vector<ZoneTally>;

/// One cluster of observations, summarised: its size, sum and sum of squares.
struct ClusterSums {
    double n = 0;
    double sum = 0;
    double sumSquares = 0;
};

/// The one-way random-effects analysis of variance of clustered data, groups of clusters each
/// with its own mean (sums of squares and degrees of freedom added over groups); n0 is the
/// average cluster size adjusted for unequal sizes, (N − Σn²/N)/(k − 1).
struct OneWayAnova {
    double msBetween = 0, msWithin = 0, n0 = 0, dfBetween = 0, dfWithin = 0;
    /// The intraclass correlation (MSB − MSW)/(MSB + (n0 − 1)·MSW); nullopt without degrees
    /// of freedom or when the denominator is not positive.
    std::optional<double> intraclass() const;
};
OneWayAnova oneWayAnova(const std::vector<std::vector<ClusterSums>>& groups);

/// Moment estimate of rho pooled over series, each with its own mean: the one-way analysis of
/// variance estimator for clustered binary data (matches are the clusters), summed over series,
/// then blended with the prior by weight: (w0·rho0 + w·estimate)/(w0 + w), clamped to
/// [0, 0.5]. Matches with no chances are skipped. `matches` is the number of matches the
/// series span (the weight is matches − 1).
Dispersion estimateRateDispersion(const std::vector<TallySeries>& series, int matches,
                                  const VariationPrior& prior = {});

/// Moment estimate of phi pooled over series (Pearson-type: the squared deviations from each
/// series' own rate, less what Poisson noise alone gives, over what phi multiplies), blended
/// with the prior as above and clamped to [0, 5]. den is the exposure (1 a match for counts).
Dispersion estimateCountDispersion(const std::vector<TallySeries>& series, int matches,
                                   const VariationPrior& prior = {});

/// The dispersion of one metric for its zones (pooled over every zone of the grid) and for
/// the whole pitch (its one series), from the matches 0..upTo of a season's tallies.
struct MetricVariation {
    Dispersion zones;
    Dispersion wholePitch;
};
MetricVariation estimateVariation(const std::vector<MatchTally>& tallies, std::size_t upTo,
                                  MetricKind kind, const VariationPrior& prior = {});

/// A tail of one match's count under the gamma-Poisson model with mean `mean` and dispersion
/// `phi` (negative binomial with r = 1/phi, p = r/(r + mean); Poisson when phi is 0):
/// P(X >= count) when `upper`, else P(X <= count). A mean of 0 puts all its mass at 0.
double countTail(double count, double mean, double phi, bool upper);

/// The variance inflation of one match with `den` chances (rates) or exposure (counts) over
/// pure binomial / Poisson noise: 1 + (den − 1)·rho for rates, 1 + phi·mean·den for counts.
/// Never below 1.
double designEffect(MetricKind kind, double dispersion, double den, double mean);

} // namespace pitchloop::model
