#include "planinput.h"

#include "drills.h"
#include "focus.h"
#include "repository.h"
#include "sessions.h"
#include "status.h"

#include <algorithm>
#include <optional>

namespace pitchloop::model {

std::vector<PlanFocus> openPlanFocuses(ClubRepository& repo, const std::string& squad,
                                       const std::string& season, const std::string& date,
                                       std::vector<std::string>& notes) {
    std::vector<PlanFocus> out;
    std::vector<Focus> open;
    for (auto& f : FocusStore(repo).list())
        if (f.squad == squad && f.season == season && f.closedAt.empty()) open.push_back(f);
    if (open.empty()) return out;
    const SeasonTallies tallies = repo.seasonTallies(squad, season);
    std::optional<std::size_t> focal;
    for (std::size_t i = 0; i < tallies.dates.size(); ++i)
        if (tallies.dates[i] < date) focal = i;
    if (!focal) {
        notes.push_back("no match of " + season + " before " + date +
                        ": the open focuses cannot be ranked yet and are left out");
        return out;
    }
    const FlagSettings settings = repo.flagSettings();
    const ZoneGrid grid = repo.tallyGrid();
    const auto targets = repo.targets(squad, season);
    for (const Focus& f : open) {
        const auto metric = repo.metric(f.metric);
        if (!metric) {
            notes.push_back("focus " + std::to_string(f.id) + " works on metric '" + f.metric +
                            "', which is no longer defined; left out");
            continue;
        }
        Focus onGrid = f;
        if (f.grid != grid) {
            // Opened before the club changed its grid: planned on the zones its zones fall
            // in now, as the drills' zones are read; its review still counts on its own grid.
            onGrid.zones = mapZones(f.zones, f.grid, grid);
            onGrid.grid = grid;
            notes.push_back("focus " + std::to_string(f.id) + " was opened on " + f.grid.name() +
                            "; planned on its zones read on " + grid.name());
        }
        const auto statuses =
            computeStatus(tallies, *focal, {*metric}, targets, grid, {settings.window}, settings);
        auto p = planFocus(onGrid, *metric, statuses, settings.window, grid);
        if (!p) {
            notes.push_back("focus " + std::to_string(f.id) +
                            " has no target in force in its zones; left out");
            continue;
        }
        out.push_back(std::move(*p));
    }
    return out;
}

std::vector<PlanFocus> watchedPlanFocuses(ClubRepository& repo, const std::string& squad,
                                          const std::string& season, const std::string& date,
                                          const std::vector<PlanFocus>& open, std::size_t most) {
    std::vector<PlanFocus> out;
    const SeasonTallies tallies = repo.seasonTallies(squad, season);
    std::optional<std::size_t> focal;
    for (std::size_t i = 0; i < tallies.dates.size(); ++i)
        if (tallies.dates[i] < date) focal = i;
    const auto targets = repo.targets(squad, season);
    if (!focal || targets.empty()) return out;
    const FlagSettings settings = repo.flagSettings();
    const ZoneGrid grid = repo.tallyGrid();
    const auto metrics = repo.metrics();
    const auto statuses = computeStatus(tallies, *focal, metrics, targets, grid, {settings.window}, settings);
    const auto covered = [&](const ZoneStatus& s) {
        return std::any_of(open.begin(), open.end(), [&](const PlanFocus& f) {
            if (f.metric != s.metric) return false;
            if (s.band == 0 && s.lane == 0) return static_cast<int>(f.zones.size()) == grid.zoneCount();
            return std::any_of(f.zones.begin(), f.zones.end(),
                               [&](Zone z) { return z.band == s.band && z.lane == s.lane; });
        });
    };
    for (const ZoneStatus& s : statuses) {
        if (!s.target || (s.state != FlagState::OffTarget && s.state != FlagState::LikelyOff) || covered(s))
            continue;
        const auto metric = std::find_if(metrics.begin(), metrics.end(), [&](const MetricSpec& m) { return m.id == s.metric; });
        if (metric == metrics.end()) continue;
        Focus pseudo;
        pseudo.metric = s.metric;
        pseudo.grid = grid;
        if (s.band == 0 && s.lane == 0)
            for (int i = 0; i < grid.zoneCount(); ++i) pseudo.zones.push_back(grid.zoneAt(i));
        else
            pseudo.zones = {Zone{s.band, s.lane}};
        auto p = planFocus(pseudo, *metric, {s}, settings.window, grid);
        if (!p || p->severity <= 0) continue;
        p->watched = true;
        p->severity /= 2;
        out.push_back(std::move(*p));
    }
    std::stable_sort(out.begin(), out.end(), [](const PlanFocus& a, const PlanFocus& b) { return a.severity > b.severity; });
    if (out.size() > most) out.resize(most);
    return out;
}

PlanRequest planRequestFor(ClubRepository& repo, const std::string& squad,
                           const std::string& date, int minutes, int players,
                           std::vector<std::string>& notes) {
    PlanRequest req;
    req.date = date;
    req.minutes = minutes;
    req.playersAvailable = players;
    const bool dated = dayNumber(date).has_value();
    req.season = dated ? seasonOf(date) : "";
    FixtureStore fixtures(repo);
    if (dated) {
        req.fixtures = fixtures.list(squad, req.season);
        req.yesterday = SessionStore(repo).drillsOn(squad, addDays(date, -1));
        req.focuses = openPlanFocuses(repo, squad, req.season, date, notes);
        for (auto& w : watchedPlanFocuses(repo, squad, req.season, date, req.focuses))
            req.focuses.push_back(std::move(w));
    }
    req.caps = fixtures.caps();
    req.drills = DrillBook(repo).list();
    return req;
}

} // namespace pitchloop::model
