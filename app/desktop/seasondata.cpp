#include "seasondata.h"

#include <algorithm>
#include <utility>

namespace pitchloop::desktop {

using namespace pitchloop::model;

std::vector<Window> AppWindows::distinct() const {
    std::vector<Window> out;
    for (const Window& w : {match, judged, ewma})
        if (std::find(out.begin(), out.end(), w) == out.end()) out.push_back(w);
    return out;
}

SeasonData::SeasonData(std::string squad, std::string season, SeasonTallies tallies,
                       std::vector<Target> targets, std::vector<MetricSpec> metrics, ZoneGrid grid,
                       FlagSettings settings)
    : m_squad(std::move(squad)),
      m_season(std::move(season)),
      m_tallies(std::move(tallies)),
      m_targets(std::move(targets)),
      m_metrics(std::move(metrics)),
      m_grid(grid),
      m_settings(settings) {
    m_windows.judged = m_settings.window;
    m_status.resize(size());
    m_debrief.resize(size());
}

std::optional<std::size_t> SeasonData::indexOf(const std::string& matchId) const {
    const auto& ids = m_tallies.matchIds;
    const auto it = std::find(ids.begin(), ids.end(), matchId);
    if (it == ids.end()) return std::nullopt;
    return static_cast<std::size_t>(it - ids.begin());
}

const std::vector<ZoneStatus>& SeasonData::statusAt(std::size_t focal) const {
    auto& slot = m_status.at(focal);
    if (!slot)
        slot = computeStatus(m_tallies, focal, m_metrics, m_targets, m_grid, m_windows.distinct(),
                             m_settings);
    return *slot;
}

const Debrief& SeasonData::debriefAt(std::size_t focal) const {
    auto& slot = m_debrief.at(focal);
    if (!slot) slot = buildDebrief(m_tallies, focal, m_metrics, m_targets, m_grid, m_settings);
    return *slot;
}

const ZoneStatus* SeasonData::find(std::size_t focal, const std::string& metric, int band, int lane,
                                   const Window& window) const {
    for (const auto& s : statusAt(focal))
        if (s.band == band && s.lane == lane && s.window == window && s.metric == metric) return &s;
    return nullptr;
}

std::size_t SeasonData::judgedWindowStart(std::size_t focal) const {
    const Window& w = m_windows.judged;
    if (w.kind == Window::Kind::Match) return focal;
    if (w.kind == Window::Kind::LastN && w.n > 0 && focal + 1 > static_cast<std::size_t>(w.n))
        return focal + 1 - static_cast<std::size_t>(w.n);
    return 0;
}

} // namespace pitchloop::desktop
