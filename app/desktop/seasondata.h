#pragma once
// A squad's season as the app judges it: its tallies and targets, and every zone's status after
// each match, computed once on first use. Qt-free glue between the repository and the adapters.

#include "debrief.h"
#include "repository.h"
#include "status.h"

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::desktop {

/// The windows the app shows for a zone: the match alone, the club's judged window, an EWMA.
struct AppWindows {
    model::Window match{model::Window::Kind::Match, 1, 0.3};
    model::Window judged;
    model::Window ewma{model::Window::Kind::Ewma, 0, 0.3};
    /// The three without repeats (the judged window may be the match or an EWMA itself).
    std::vector<model::Window> distinct() const;
};

/// One squad's season with its statuses and debriefs, computed lazily and kept.
class SeasonData {
public:
    SeasonData(std::string squad, std::string season, model::SeasonTallies tallies,
               std::vector<model::Target> targets, std::vector<model::MetricSpec> metrics,
               model::ZoneGrid grid, model::FlagSettings settings);

    const std::string& squad() const { return m_squad; }
    const std::string& season() const { return m_season; }
    const model::SeasonTallies& tallies() const { return m_tallies; }
    const std::vector<model::Target>& targets() const { return m_targets; }
    const model::FlagSettings& settings() const { return m_settings; }
    const AppWindows& windows() const { return m_windows; }
    std::size_t size() const { return m_tallies.matchIds.size(); }
    std::optional<std::size_t> indexOf(const std::string& matchId) const;

    /// Every metric's zones (and the whole pitch) after match `focal`, in the three windows.
    /// Computed over all metrics at once so false-discovery control sees what a debrief sees.
    const std::vector<model::ZoneStatus>& statusAt(std::size_t focal) const;
    /// The debrief of match `focal`.
    const model::Debrief& debriefAt(std::size_t focal) const;
    /// One zone's status after match `focal`; nullptr when there is none.
    const model::ZoneStatus* find(std::size_t focal, const std::string& metric, int band, int lane,
                                  const model::Window& window) const;
    /// The first match of the judged window ending at `focal`.
    std::size_t judgedWindowStart(std::size_t focal) const;

private:
    std::string m_squad;
    std::string m_season;
    model::SeasonTallies m_tallies;
    std::vector<model::Target> m_targets;
    std::vector<model::MetricSpec> m_metrics;
    model::ZoneGrid m_grid;
    model::FlagSettings m_settings;
    AppWindows m_windows;
    mutable std::vector<std::optional<std::vector<model::ZoneStatus>>> m_status;
    mutable std::vector<std::optional<model::Debrief>> m_debrief;
};

} // namespace pitchloop::desktop
