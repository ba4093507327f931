#include "pooling.h"

#include <boost/math/distributions/gamma.hpp>

#include <algorithm>
#include <map>
#include <cmath>

namespace pitchloop::model {

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
/// The neighbourhood never weighs more than this many average zones' data (pooling.h).
constexpr double kMaxPriorZones = 4;
/// Rates' prior means stay this far inside (0, 1) so the Beta prior exists.
constexpr double kEdge = 1e-6;

/// The variance one unit of den carries at value mu: binomial for rates, Poisson for counts.
double unitVariance(MetricKind kind, double mu) {
    return kind == MetricKind::Rate ? mu * (1 - mu) : mu;
}

stats::Interval gammaInterval(double shape, double rate, double level) {
    const double tail = (1 - level) / 2;
    const boost::math::gamma_distribution<double> g(shape, 1 / rate);
    return {boost::math::quantile(g, tail), boost::math::quantile(g, 1 - tail)};
}

} // namespace

PooledMap poolZones(const std::vector<ZoneCount>& zones, const ZoneGrid& grid, MetricKind kind,
                    double level, double reference) {
    PooledMap map;
    const bool rate = kind == MetricKind::Rate;
    // Index by zone so neighbours are found in O(1).
    std::vector<int> at(static_cast<std::size_t>(grid.zoneCount()), -1);
    double sumNum = 0, sumDen = 0;
    int withData = 0;
    for (std::size_t i = 0; i < zones.size(); ++i) {
        const ZoneCount& z = zones[i];
        if (z.band < 1 || z.band > grid.bands() || z.lane < 1 || z.lane > grid.lanes()) continue;
        at[static_cast<std::size_t>(grid.indexOf(Zone{z.band, z.lane}))] = static_cast<int>(i);
        if (z.den > 0) {
            sumNum += z.num;
            sumDen += z.den;
            ++withData;
        }
    }
    PoolingFit& fit = map.fit;
    map.zones.resize(zones.size());
    for (std::size_t i = 0; i < zones.size(); ++i) {
        PooledZone& p = map.zones[i];
        p.band = zones[i].band;
        p.lane = zones[i].lane;
        p.num = zones[i].num;
        p.den = zones[i].den;
        if (p.den > 0) p.raw = p.num / p.den;
    }
    if (withData == 0) return map;
    fit.wholeValue = sumNum / sumDen;
    fit.averageDen = sumDen / withData;

    // The neighbourhood's value μ: the touching zones' pooled counts, with one average zone's
    // worth of the whole pitch mixed in (all of it for a zone with no neighbours' data).
    std::vector<double> neighbourDen;
    for (PooledZone& p : map.zones) {
        double num = fit.averageDen * fit.wholeValue, den = fit.averageDen;
        for (int db = -1; db <= 1; ++db)
            for (int dl = -1; dl <= 1; ++dl) {
                const int b = p.band + db, l = p.lane + dl;
                if ((db == 0 && dl == 0) || b < 1 || b > grid.bands() || l < 1 || l > grid.lanes()) continue;
                const int j = at[static_cast<std::size_t>(grid.indexOf(Zone{b, l}))];
                if (j < 0) continue;
                num += zones[static_cast<std::size_t>(j)].num;
                den += zones[static_cast<std::size_t>(j)].den;
            }
        p.prior = num / den;
        neighbourDen.push_back(den - fit.averageDen);
        if (rate) p.prior = std::clamp(p.prior, kEdge, 1 - kEdge);
        if (!rate) p.prior = std::max(p.prior, kEdge);
    }

    // τ² by the method of moments: E[(r − μ)²] ≈ τ² + s(μ)/den, weighted by den (a noisy zone
    // says little about the spread). The spread of μ itself is left in, which overstates τ²
    // slightly: the smoother then pools a little less than it could, never more.
    double excess = 0;
    for (const PooledZone& p : map.zones) {
        if (p.den <= 0) continue;
        excess += p.den * (p.raw - p.prior) * (p.raw - p.prior) - unitVariance(kind, p.prior);
    }
    fit.between = std::max(0.0, excess / sumDen);

    const double maxStrength = kMaxPriorZones * fit.averageDen;
    for (std::size_t i = 0; i < map.zones.size(); ++i) {
        PooledZone& p = map.zones[i];
        const double s = unitVariance(kind, p.prior);
        const double kappa = fit.between > 0 ? s / fit.between - (rate ? 1 : 0) : maxStrength;
        p.strength = std::clamp(kappa, 0.0, maxStrength);
        const double total = p.den + p.strength;
        if (total <= 0) continue;
        p.pooled = (p.num + p.strength * p.prior) / total;
        // The posterior's variance (Beta or Gamma with these counts), plus what the
        // neighbourhood's value μ is itself unsure of, weighted by the prior's share: its
        // neighbours' data carry s(μ)·N/(N + m₀)² of sampling variance (N their den, m₀ one
        // average zone). Without that term the intervals are too narrow (the study's table).
        const double m = p.pooled;
        double variance = rate ? m * (1 - m) / (total + 1) : m / total;
        const double priorShare = p.strength / total;
        const double n = neighbourDen[i], m0 = fit.averageDen;
        variance += priorShare * priorShare * s * n / ((n + m0) * (n + m0));
        p.sd = std::sqrt(variance);
        if (rate && m > 0 && m < 1 && variance > 0 && variance < m * (1 - m)) {
            const double k = m * (1 - m) / variance - 1; // a Beta with this mean and variance
            p.interval = stats::betaSummary(m * k, (1 - m) * k, level).interval;
        } else if (!rate && m > 0 && variance > 0) {
            p.interval = gammaInterval(m * m / variance, m / variance, level);
        } else if (p.den > 0) { // no prior weight and an edge count: the zone alone
            p.interval = rate ? stats::jeffreys(p.num, p.den, level) : stats::garwood(p.num, p.den, level);
        } else {
            p.interval = {m, m};
        }
        if (reference > 0) p.spread = (p.interval.high - p.interval.low) / reference;
    }
    return map;
}

void poolStatuses(std::vector<ZoneStatus>& statuses, const std::vector<MetricSpec>& metrics,
                  const ZoneGrid& grid) {
    // Group by metric and window, keeping the statuses' order.
    std::map<std::pair<std::string, std::string>, std::vector<ZoneStatus*>> groups;
    for (ZoneStatus& s : statuses)
        if (s.band > 0) groups[{s.metric, s.window.name()}].push_back(&s);
    for (auto& [key, group] : groups) {
        const auto metric = std::find_if(metrics.begin(), metrics.end(),
                                         [&](const MetricSpec& m) { return m.id == key.first; });
        if (metric == metrics.end()) continue;
        std::vector<ZoneCount> counts;
        counts.reserve(group.size());
        for (const ZoneStatus* s : group) counts.push_back({s->band, s->lane, s->sum.effNum, s->sum.effDen});
        const PooledMap map = poolZones(counts, grid, metric->kind(), group.front()->level, 1.0);
        for (std::size_t i = 0; i < group.size(); ++i) {
            group[i]->pooled = map.zones[i].pooled;
            group[i]->pooledInterval = map.zones[i].interval;
            group[i]->pooledWeight = map.zones[i].ownWeight();
        }
    }
}

} // namespace pitchloop::model
