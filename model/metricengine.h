#pragma once
// Interprets metric specs over one match: per-zone numerator and denominator.

#include "derived.h"
#include "metricspec.h"
#include "zones.h"

#include <vector>

namespace pitchloop::model {

struct ZoneTally {
    long num = 0;
    long den = 0;
    bool operator==(const ZoneTally&) const = default;
};

/// One match's tallies for one metric, indexed by ZoneGrid::indexOf.
using MatchTally = std::vector<ZoneTally>;

/// Facts derived once per match and shared by every metric.
struct MatchFacts {
    explicit MatchFacts(const Match& m) : match(m), losses(findLosses(m)) {}
    const Match& match;
    std::vector<Loss> losses;
};

/// Whether a match's positions can be binned on `grid`: always for measured positions; for
/// zone-only data (MatchInfo::zoneOnlyGrid) only on its own grid or one it coarsens, since a
/// zone centre says nothing about where in the zone the event was.
bool zonesKnownOn(const MatchInfo& info, const ZoneGrid& grid);

/// "positions known only to grid equal:6x5; zone values not computed on grid equal:8x5" for a
/// match whose zones `grid` cannot know; empty when it can.
std::string zoneOnlyNote(const MatchInfo& info, const ZoneGrid& grid);

/// Computes one metric for one match on a grid.
///
/// A zone-only match on a grid it cannot be binned on (zonesKnownOn) gives an empty tally
/// (every num and den 0): its zone values are not computed rather than guessed from centres.
/// Metric specs have no position test other than the zone an item is binned in (docs/metrics.md),
/// so nothing else in a metric reads a position.
///
/// Items are binned at their place; an item counts in the numerator when its success test
/// holds. The denominator is the items (less censored ones), 1 per zone for per-match counts,
/// or the exposure events binned at their own place.
MatchTally computeTally(const MatchFacts& facts, const MetricSpec& spec, const ZoneGrid& grid);

} // namespace pitchloop::model
