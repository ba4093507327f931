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

/// One thing a metric counted in a match: an item (a loss, a pass, a defensive action ...) or,
/// for a per-exposure metric, an exposure event. A match's items added up per zone give
/// computeTally exactly: num = the items with inNum, den = those with inDen (a per-match count's
/// den is the match itself, 1 a zone, and no item carries it).
struct TallyItem {
    int zone = 0;
    bool exposure = false;                ///< an exposure event, not an item
    std::size_t event = 0;                ///< the item's event; a loss: the event that took the ball
    std::optional<std::size_t> lastEvent; ///< a loss: the losing side's last event before it
    Point place;                          ///< where it is binned
    WindowHit hit{WindowOutcome::Found, 0}; ///< the success test; Found for metrics without one
    bool inNum = false;
    bool inDen = false;
};

/// The items behind computeTally, items in event order and then the exposure events. Items
/// that count in neither part are left out (a pass that no shot followed, for "passes before
/// shots"), except the censored items of a rate, kept with inDen false so that a list can say
/// why they do not count. Empty for a zone-only match on a grid it cannot be binned on.
std::vector<TallyItem> tallyItems(const MatchFacts& facts, const MetricSpec& spec, const ZoneGrid& grid);

} // namespace pitchloop::model
