#pragma once
// A seeded simulation of seasons with match-to-match variation, judged by the model's own
// code: the calibration test (calibration_test.cpp) and the study (tests/bench/
// variation_study.cpp) share it. Invented numbers only.
//
// A board of zones on a 6 × 5 grid, one rate metric (regain_5s), every zone with a target
// "at least 0.45". In each match a zone's chances are Poisson(λ_zone) and its true rate that
// day is Beta with the zone's mean and the given SD (the match-to-match variation); successes
// are binomial at that day's rate.

#include "focus.h"
#include "metricspec.h"
#include "status.h"
#include "season_fixture.h"

#include <algorithm>
#include <cmath>
#include <random>
#include <string>
#include <vector>

namespace pitchloop::testutil::sim {

using namespace pitchloop::model;

struct Board {
    std::vector<double> chances;  ///< λ per zone (30)
    double sd = 0.08;             ///< SD of a zone's true rate from match to match
    double target = 0.45;
    int matches = 34;
    /// Mean true rate of zone z at match m (0-based): the target, or lower after a drop.
    std::vector<int> dropAt;      ///< per zone: first match at the lower rate, or −1
    double drop = 0.10;
};

inline std::vector<std::string> weeklyDates(int n) {
    std::vector<std::string> dates{"2026-08-01"};
    while (static_cast<int>(dates.size()) < n) {
        std::string d = dates.back();
        for (int k = 0; k < 7; ++k) d = dayAfter(d);
        dates.push_back(d);
    }
    return dates;
}

inline double betaDraw(std::mt19937_64& rng, double mean, double sd) {
    if (sd <= 0) return mean;
    const double k = mean * (1 - mean) / (sd * sd) - 1; // a + b
    std::gamma_distribution<double> ga(mean * k, 1.0), gb((1 - mean) * k, 1.0);
    const double a = ga(rng), b = gb(rng);
    return a / (a + b);
}

/// One simulated season of the board.
inline SeasonTallies season(const Board& b, std::mt19937_64& rng) {
    const ZoneGrid grid;
    SeasonTallies s;
    s.dates = weeklyDates(b.matches);
    auto& tallies = s.byMetric["regain_5s"];
    for (int m = 0; m < b.matches; ++m) {
        s.matchIds.push_back("M" + std::to_string(m + 1));
        MatchTally t(static_cast<std::size_t>(grid.zoneCount()));
        for (int z = 0; z < grid.zoneCount(); ++z) {
            const auto zi = static_cast<std::size_t>(z);
            const bool dropped = !b.dropAt.empty() && b.dropAt[zi] >= 0 && m >= b.dropAt[zi];
            const double mean = b.target - (dropped ? b.drop : 0);
            std::poisson_distribution<long> chances(b.chances[zi]);
            const long n = chances(rng);
            std::binomial_distribution<long> wins(n, betaDraw(rng, mean, b.sd));
            t[zi] = {n > 0 ? wins(rng) : 0, n};
        }
        tallies.push_back(std::move(t));
    }
    return s;
}

/// Targets "at least `target`" on every zone of the 6 × 5 grid (margin 0.05, minimum 30).
inline std::vector<Target> boardTargets(double value) {
    std::vector<Target> out;
    const ZoneGrid grid;
    for (int z = 0; z < grid.zoneCount(); ++z) {
        const Zone zone = grid.zoneAt(z);
        out.push_back(target("regain_5s", zone.band, zone.lane, Direction::AtLeast, value, 0.05, 30));
    }
    return out;
}

/// The first match (0-based) at which each zone is judged off target over the settings' window,
/// or −1.
inline std::vector<int> firstOff(const SeasonTallies& s, const std::vector<Target>& targets,
                                 const FlagSettings& settings, int upTo) {
    const ZoneGrid grid;
    std::vector<int> first(static_cast<std::size_t>(grid.zoneCount()), -1);
    const std::vector<MetricSpec> metrics{builtin("regain_5s")};
    for (int m = 0; m < upTo; ++m) {
        const auto st = computeStatus(s, static_cast<std::size_t>(m), metrics, targets, grid,
                                      {settings.window}, settings);
        for (const auto& z : st) {
            if (z.band == 0 || z.state != FlagState::OffTarget) continue;
            auto& f = first[static_cast<std::size_t>(grid.indexOf({z.band, z.lane}))];
            if (f < 0) f = m;
        }
    }
    return first;
}

/// A focus opened after match `opened` (0-based) on the zone that looks worst over the judged
/// window there (highest P(miss)), reviewed over the next `after` matches; true when the review
/// claims an improvement (improved, or improved by the minimal change).
inline bool reviewClaims(const SeasonTallies& s, const std::vector<Target>& targets,
                         const FlagSettings& settings, int opened, int after) {
    const ZoneGrid grid;
    const MetricSpec& metric = builtin("regain_5s");
    const auto st = computeStatus(s, static_cast<std::size_t>(opened), {metric}, targets, grid,
                                  {settings.window}, settings);
    const ZoneStatus* worst = nullptr;
    for (const auto& z : st) {
        if (z.band == 0 || std::isnan(z.pMiss)) continue;
        if (!worst || z.pMiss > worst->pMiss) worst = &z;
    }
    if (!worst) return false;
    Focus f;
    f.squad = "First team";
    f.season = "2026-27";
    f.metric = metric.id;
    f.zones = {{worst->band, worst->lane}};
    f.openedAfterMatch = s.matchIds[static_cast<std::size_t>(opened)];
    f.startDate = dayAfter(s.dates[static_cast<std::size_t>(opened)]);
    f.evidence = focusEvidence(s, static_cast<std::size_t>(opened), metric, targets, grid, settings,
                               f.zones, false, "t")
                     .json;
    const auto r = computeReview(f, metric, s, grid, 5, after);
    if (!r.review) return false;
    return r.review->finding == ReviewFinding::Improved ||
           r.review->finding == ReviewFinding::ImprovedByMinChange;
}

/// λ from 4 to 40 across the 30 zones, evenly.
inline std::vector<double> spreadChances(double low = 4, double high = 40) {
    std::vector<double> out;
    for (int z = 0; z < 30; ++z) out.push_back(low + (high - low) * z / 29.0);
    return out;
}

} // namespace pitchloop::testutil::sim
