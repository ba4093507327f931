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

/// Computes one metric for one match on a grid.
///
/// Items are binned at their place; an item counts in the numerator when its success test
/// holds. The denominator is the items (less censored ones), 1 per zone for per-match counts,
/// or the exposure events binned at their own place.
MatchTally computeTally(const MatchFacts& facts, const MetricSpec& spec, const ZoneGrid& grid);

} // namespace pitchloop::model
