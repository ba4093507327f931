#include "gridchange.h"

#include "drills.h"
#include "focus.h"
#include "repository.h"
#include "zonenames.h"

#include <map>
#include <set>
#include <tuple>

namespace pitchloop::model {

namespace {

using SeasonMetric = std::tuple<std::string, std::string, std::string>;

std::string zoneWords(Zone z, const ZoneGrid& grid) { return zoneLabel(z.band, z.lane, grid); }

} // namespace

TargetCarry carryTargets(const std::vector<Target>& onFrom, const std::vector<Target>& onTo,
                         const ZoneGrid& from, const ZoneGrid& to) {
    TargetCarry out;
    if (from == to) return out;
    // Versions per (squad, season, metric) and zone of `from`, in stored order.
    std::map<SeasonMetric, std::map<int, std::vector<const Target*>>> source;
    for (const Target& t : onFrom) {
        if (t.key.band == 0 && t.key.lane == 0) continue;
        if (t.key.band > from.bands() || t.key.lane > from.lanes()) continue;
        source[{t.key.squad, t.key.season, t.key.metric}][from.indexOf({t.key.band, t.key.lane})]
            .push_back(&t);
    }
    // Zones of `to` holding versions already, per (squad, season, metric).
    std::map<SeasonMetric, std::set<int>> taken;
    for (const Target& t : onTo)
        if ((t.key.band != 0 || t.key.lane != 0) && t.key.band <= to.bands() &&
            t.key.lane <= to.lanes())
            taken[{t.key.squad, t.key.season, t.key.metric}].insert(
                to.indexOf({t.key.band, t.key.lane}));
    for (const auto& [key, zones] : taken)
        if (source.contains(key)) out.zonesKept += static_cast<int>(zones.size());

    for (const auto& [key, zones] : source) {
        if (taken.contains(key)) continue; // set on `to` before: those come back as they were
        for (int i = 0; i < to.zoneCount(); ++i) {
            const Zone z = to.zoneAt(i);
            // At least half of z in zones with targets; the one covering most of it gives.
            double inside = 0, best = -1;
            Zone src;
            for (const auto& [index, versions] : zones) {
                const Zone o = from.zoneAt(index);
                const double a = overlapArea(z, to, o, from);
                inside += a;
                if (a > best * (1 + 1e-9) + 1e-12) {
                    best = a;
                    src = o;
                }
            }
            if (inside < 0.5 * overlapArea(z, to, z, to) * (1 - 1e-9)) continue;
            const auto versions = zones.find(from.indexOf(src));
            ++out.zonesCarried;
            for (const Target* v : versions->second) {
                Target c = *v;
                c.key.band = z.band;
                c.key.lane = z.lane;
                c.version = 0;
                c.rationale += (c.rationale.empty() ? "" : " ") + std::string("[carried from ") +
                               zoneWords(src, from) + " of " + from.name() + " when the grid became " +
                               to.name() + "]";
                out.versions.push_back(std::move(c));
            }
        }
    }
    return out;
}

GridChangePreview previewGridChange(ClubRepository& repo, const ZoneGrid& to) {
    GridChangePreview p;
    p.from = repo.tallyGrid();
    p.to = to;
    if (p.from == to) {
        p.lines.push_back("The club already uses " + describeGrid(to) + "; nothing changes.");
        return p;
    }
    const std::vector<MatchSummary> matches = repo.matches();
    p.matches = static_cast<int>(matches.size());
    p.targets = carryTargets(repo.allTargets(p.from), repo.allTargets(to), p.from, to);
    for (const Focus& f : FocusStore(repo).list())
        if (f.grid != to) ++p.focusesOnOtherGrids;
    for (const Drill& d : DrillBook(repo).list(true))
        if (!d.zones.empty()) ++p.drillsWithZones;

    auto count = [](int n, const char* one, const char* many) {
        return std::to_string(n) + " " + (n == 1 ? one : many);
    };
    p.lines.push_back("Every match's tallies are counted again on " + describeGrid(to) + " (" +
                      count(p.matches, "match", "matches") + ").");
    for (const MatchSummary& m : matches) {
        if (m.zoneOnlyGrid.empty()) continue;
        const std::string note = m.zoneOnlyNote(to);
        if (note.empty()) {
            if (!m.zonesKnownOn(p.from))
                p.lines.push_back("Match " + m.id + " (zone-only data on " + m.zoneOnlyGrid +
                                  ") gets its zone values back on " + to.name() + ".");
            continue;
        }
        p.zoneOnlyLeftOut.push_back(m.id);
        p.lines.push_back("Match " + m.id + ": " + note +
                          ". Its zone tallies are left out, and so is it from whole-pitch values "
                          "(they are sums over zones).");
    }
    const int carried = p.targets.zonesCarried;
    if (carried > 0)
        p.lines.push_back(count(carried, "zone target (season, metric and zone) takes",
                                "zone targets (season, metric and zone) take") +
                          " the targets of the old zone covering most of " +
                          (carried == 1 ? "it: " : "them: ") +
                          count(static_cast<int>(p.targets.versions.size()), "version", "versions") +
                          ", each noting where it came from. Check them on the targets page.");
    const int kept = p.targets.zonesKept;
    if (kept > 0)
        p.lines.push_back(count(kept, "zone target set earlier on this grid comes",
                                "zone targets set earlier on this grid come") +
                          " back as " + (kept == 1 ? "it was." : "they were."));
    if (carried == 0 && kept == 0)
        p.lines.push_back("No per-zone targets to move; whole-pitch targets stay as they are.");
    else
        p.lines.push_back("Targets set on " + p.from.name() +
                          " stay in the club file and come back if the grid is changed back.");
    if (p.focusesOnOtherGrids > 0)
        p.lines.push_back(p.focusesOnOtherGrids == 1
                              ? "1 focus keeps the zones it was opened on; its review is counted "
                                "from the match events on that grid."
                              : std::to_string(p.focusesOnOtherGrids) +
                                    " focuses keep the zones they were opened on; their reviews "
                                    "are counted from the match events on that grid.");
    if (p.drillsWithZones > 0)
        p.lines.push_back(p.drillsWithZones == 1
                              ? "1 drill note is shown on the new zones its area falls in; its "
                                "text is not changed."
                              : std::to_string(p.drillsWithZones) +
                                    " drill notes are shown on the new zones their areas fall "
                                    "in; their text is not changed.");
    return p;
}

} // namespace pitchloop::model
