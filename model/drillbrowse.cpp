#include "drillbrowse.h"

#include <algorithm>
#include <map>

namespace pitchloop::model {

std::vector<Drill> browseDrills(const DrillBook& book, const DrillFilter& filter) {
    std::vector<Drill> found = book.search(filter.query);
    if (filter.intensity != 0)
        std::erase_if(found, [&](const Drill& d) { return d.intensity != filter.intensity; });
    return found;
}

std::vector<std::string> drillTags(const std::vector<Drill>& drills) {
    std::map<std::string, std::string> byLowered;
    for (const Drill& d : drills)
        for (const std::string& t : d.tags) byLowered.emplace(asciiLower(t), t);
    std::vector<std::string> out;
    out.reserve(byLowered.size());
    for (const auto& [lowered, tag] : byLowered) out.push_back(tag);
    return out;
}

} // namespace pitchloop::model
