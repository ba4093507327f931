#include "planinput.h"

#include "drills.h"
#include "focus.h"
#include "repository.h"
#include "sessions.h"
#include "status.h"

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
    }
    req.caps = fixtures.caps();
    req.drills = DrillBook(repo).list();
    return req;
}

} // namespace pitchloop::model
