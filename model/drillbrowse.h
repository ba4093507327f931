#pragma once
// Browsing the drill book: a search with the filters a drill list offers beyond DrillQuery
// (intensity), and the tags in use for a tag picker.

#include "drills.h"

#include <string>
#include <vector>

namespace pitchloop::model {

/// A drill book search plus an intensity filter; empty filters match everything.
struct DrillFilter {
    DrillQuery query;
    int intensity = 0; ///< kIntensityMin–kIntensityMax, or 0 for any
};

/// The drills `filter` finds, by id (DrillBook::search, then the intensity).
std::vector<Drill> browseDrills(const DrillBook& book, const DrillFilter& filter);

/// The tags the drills use, each once (ASCII case ignored, first spelling kept), sorted by
/// their lower-cased text.
std::vector<std::string> drillTags(const std::vector<Drill>& drills);

} // namespace pitchloop::model
