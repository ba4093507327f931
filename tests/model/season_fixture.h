#pragma once
// Hand-made seasons of tallies for the status and debrief tests: no events, no club file,
// just the numbers a season's matches would have stored.

#include "metricspec.h"
#include "status.h"
#include "targets.h"
#include "zones.h"

#include <catch2/catch.hpp>

#include <string>
#include <vector>

namespace pitchloop::testutil {

/// The built-in metric `id`.
inline const model::MetricSpec& builtin(const std::string& id) {
    for (const auto& m : model::builtinMetrics())
        if (m.id == id) return m;
    FAIL("no built-in metric " << id);
    return model::builtinMetrics().front(); // not reached: FAIL throws
}

/// A season of matches M1, M2, … on the given dates, tallied on `grid`.
struct SeasonFixture {
    model::ZoneGrid grid;
    model::SeasonTallies season;

    SeasonFixture(model::ZoneGrid g, const std::vector<std::string>& dates) : grid(g) {
        for (std::size_t i = 0; i < dates.size(); ++i) {
            season.matchIds.push_back("M" + std::to_string(i + 1));
            season.dates.push_back(dates[i]);
        }
    }

    /// Adds a metric with every zone of every match empty: 0 of 0 for rates and exposures,
    /// 0 in one match (den 1) for per-match counts, as computeTally stores them.
    void addMetric(const std::string& id) {
        const bool count = builtin(id).kind() == model::MetricKind::Count;
        model::MatchTally empty(static_cast<std::size_t>(grid.zoneCount()),
                                model::ZoneTally{0, count ? 1 : 0});
        season.byMetric[id].assign(season.matchIds.size(), empty);
    }

    /// Sets one zone of one match (0-based match index).
    void set(const std::string& metric, std::size_t match, int band, int lane, long num, long den) {
        if (!season.byMetric.count(metric)) addMetric(metric);
        season.byMetric[metric].at(match).at(static_cast<std::size_t>(grid.indexOf({band, lane}))) =
            {num, den};
    }
};

/// A target version in force from `from` (recorded the day before it).
inline model::Target target(const std::string& metric, int band, int lane, model::Direction d,
                            double value, double margin, long minSample,
                            const std::string& from = "2026-07-01") {
    model::Target t;
    t.key = {"First team", "2026-27", metric, band, lane};
    t.direction = d;
    t.value = value;
    t.watchMargin = margin;
    t.minSample = minSample;
    t.author = "R. Tamsin";
    t.effectiveFrom = from;
    t.recordedAt = from + "T08:00:00Z";
    return t;
}

/// The status of one zone in one window; fails the test when it is missing.
inline const model::ZoneStatus& statusOf(const std::vector<model::ZoneStatus>& all,
                                         const std::string& metric, int band, int lane,
                                         const std::string& window) {
    for (const auto& s : all)
        if (s.metric == metric && s.band == band && s.lane == lane && s.window.name() == window)
            return s;
    FAIL("no status for " << metric << " " << band << "," << lane << " " << window);
    return all.front(); // not reached: FAIL throws
}

} // namespace pitchloop::testutil
