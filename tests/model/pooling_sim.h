#pragma once
// Seeded simulation of pooled zone maps (docs/statistics.md, "Pooled maps"): the CI test
// (pooling_test.cpp) and the study (tests/bench/pooling_study.cpp) share it. Invented numbers.
//
// A 6 × 5 board; each zone's true rate is a gradient along the pitch (35 % at our goal to 55 %
// at theirs) plus the zone's own offset (normal, SD `zoneSpread`). A window of 5 matches: each
// match a zone has Poisson(λ) chances, λ its mean chances times a factor between 0.3 and 1.7;
// the day's true rate is Beta around the zone's with SD `matchSd`; successes are binomial.
// The window's effective counts come from model::windowSum with the true dispersion.

#include "pooling.h"
#include "status.h"

#include <algorithm>
#include <cmath>
#include <random>
#include <vector>

namespace pitchloop::testutil::pooling {

using namespace pitchloop::model;

struct Setup {
    double meanChances = 15; ///< chances a match in an average zone
    double matchSd = 0.08;   ///< SD of a zone's true rate from match to match
    double zoneSpread = 0.05; ///< SD of zones' own offsets from the gradient
    int matches = 5;
    double level = 0.90;
};

struct Score {
    double sqRaw = 0, sqPooled = 0; ///< summed squared errors against the truth
    long zones = 0;                 ///< zones with data
    long covered = 0;               ///< pooled intervals holding the truth
    double mseRaw() const { return zones ? sqRaw / static_cast<double>(zones) : 0; }
    double msePooled() const { return zones ? sqPooled / static_cast<double>(zones) : 0; }
    double coverage() const { return zones ? static_cast<double>(covered) / static_cast<double>(zones) : 0; }
};

inline double betaDraw(std::mt19937_64& rng, double mean, double sd) {
    if (sd <= 0) return mean;
    const double k = mean * (1 - mean) / (sd * sd) - 1;
    std::gamma_distribution<double> ga(mean * k, 1.0), gb((1 - mean) * k, 1.0);
    const double a = ga(rng), b = gb(rng);
    return a / (a + b);
}

/// Scores `maps` simulated maps.
inline Score simulate(const Setup& s, int maps, std::uint64_t seed) {
    std::mt19937_64 rng(seed);
    std::normal_distribution<double> offset(0, s.zoneSpread);
    std::uniform_real_distribution<double> factor(0.3, 1.7);
    const ZoneGrid grid; // 6 × 5
    Score score;
    for (int map = 0; map < maps; ++map) {
        std::vector<ZoneCount> counts;
        std::vector<double> truth;
        for (int b = 1; b <= grid.bands(); ++b)
            for (int l = 1; l <= grid.lanes(); ++l) {
                const double p = std::clamp(0.35 + 0.2 * (b - 1) / (grid.bands() - 1) + offset(rng), 0.05, 0.95);
                std::poisson_distribution<int> chances(s.meanChances * factor(rng));
                std::vector<ZoneTally> series;
                for (int m = 0; m < s.matches; ++m) {
                    const int n = chances(rng);
                    std::binomial_distribution<int> wins(n, betaDraw(rng, p, s.matchSd));
                    series.push_back({wins(rng), n});
                }
                // The flags' variation model at the true dispersion (variation.h: ρ = SD²/(p(1 − p))).
                const double rho = s.matchSd * s.matchSd / (p * (1 - p));
                const WindowSum w = windowSum(series, series.size() - 1, Window{Window::Kind::LastN, s.matches, 0.3},
                                              WindowVariation{MetricKind::Rate, rho, 0});
                counts.push_back({b, l, w.effNum, w.effDen});
                truth.push_back(p);
            }
        const PooledMap pooled = poolZones(counts, grid, MetricKind::Rate, s.level, 1.0);
        for (std::size_t i = 0; i < counts.size(); ++i) {
            const PooledZone& z = pooled.zones[i];
            if (z.den <= 0) continue;
            ++score.zones;
            score.sqRaw += (z.raw - truth[i]) * (z.raw - truth[i]);
            score.sqPooled += (z.pooled - truth[i]) * (z.pooled - truth[i]);
            if (z.interval.low <= truth[i] && truth[i] <= z.interval.high) ++score.covered;
        }
    }
    return score;
}

} // namespace pitchloop::testutil::pooling
