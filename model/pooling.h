#pragma once
// Zone values partially pooled toward their neighbours and the whole pitch (docs/statistics.md,
// "Pooled maps"): an empirical-Bayes smoother on the same effective counts as the flags, so one
// unlucky moment in a quiet zone no longer paints it the brightest colour of the map.

#include "metricspec.h"
#include "stats.h"
#include "status.h"
#include "zones.h"

#include <limits>
#include <vector>

namespace pitchloop::model {

/// One zone's counts in one window: effective numerator and denominator (WindowSum::effNum and
/// effDen, which already allow for match-to-match variation); den 0 means no data.
struct ZoneCount {
    int band = 0;
    int lane = 0;
    double num = 0;
    double den = 0;
};

/// What the smoother learnt from the map.
struct PoolingFit {
    double wholeValue = std::numeric_limits<double>::quiet_NaN(); ///< Σnum / Σden
    /// τ²: the spread of the zones' true values around their neighbourhood's, per zone, on the
    /// value's own scale (method of moments, never below 0).
    double between = 0;
    double averageDen = 0; ///< Σden / zones with data: one average zone's worth of data
};

/// One zone after pooling.
struct PooledZone {
    int band = 0;
    int lane = 0;
    double num = 0;
    double den = 0;
    double raw = std::numeric_limits<double>::quiet_NaN();    ///< num / den; NaN without data
    double prior = std::numeric_limits<double>::quiet_NaN();  ///< μ: the neighbourhood's value
    double strength = 0;  ///< κ: what the neighbourhood counts for, in the den's units
    double pooled = std::numeric_limits<double>::quiet_NaN(); ///< (num + κμ) / (den + κ)
    stats::Interval interval{0, 0}; ///< equal-tailed, at the level asked (posterior)
    double sd = std::numeric_limits<double>::quiet_NaN(); ///< the posterior's SD (with μ's noise)
    /// How sure the pooled value is: the interval's width as a share of `reference` (the
    /// map's colour range); 0 = exact. Drives the value-suppressing palette (palette.h).
    double spread = 0;
    /// The zone's own data's share of the pooled value: den / (den + κ).
    double ownWeight() const { return den + strength > 0 ? den / (den + strength) : 0; }
};

struct PooledMap {
    PoolingFit fit;
    std::vector<PooledZone> zones; ///< in the order given
};

/// Pools every zone of one metric in one window. Rates: x of n with a Beta(κμ, κ(1 − μ)) prior;
/// counts and exposures: y over exposure e with a Gamma(κμ, κ) prior. μ for a zone is the pooled
/// value of its neighbours (the up to eight zones touching it, corners included), with one
/// average zone's worth of the whole pitch mixed in; κ = s(μ)/τ² (− 1 for rates), s(μ) = μ(1 − μ)
/// for rates and μ for counts, and never more than four average zones' worth (so a zone's own
/// data always count). `reference` is the width a spread of 1 stands for (the colour scale's).
PooledMap poolZones(const std::vector<ZoneCount>& zones, const ZoneGrid& grid, MetricKind kind,
                    double level, double reference);

/// Fills ZoneStatus::pooled, pooledInterval and pooledWeight of every zone (not the whole
/// pitch), pooling each metric's zones in each window on their effective counts — the map the
/// app draws and `status --format json` prints. `metrics` gives each status's kind.
void poolStatuses(std::vector<ZoneStatus>& statuses, const std::vector<MetricSpec>& metrics,
                  const ZoneGrid& grid);

} // namespace pitchloop::model
