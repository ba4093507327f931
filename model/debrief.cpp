#include "debrief.h"

#include <algorithm>
#include <cmath>
#include <map>
#include <tuple>

namespace pitchloop::model {

namespace {

using Key = std::tuple<std::string, int, int, std::string>;

Key keyOf(const ZoneStatus& s) { return {s.metric, s.band, s.lane, s.window.name()}; }

double gapOf(const ZoneStatus& s) {
    if (!s.target || std::isnan(s.value)) return 0;
    const double d = s.value - s.target->value;
    return s.target->direction == Direction::AtLeast ? -d : d;
}

void order(std::vector<DebriefItem>& items) {
    std::stable_sort(items.begin(), items.end(), [](const DebriefItem& a, const DebriefItem& b) {
        const double pa = std::isnan(a.now.pMiss) ? 0 : a.now.pMiss;
        const double pb = std::isnan(b.now.pMiss) ? 0 : b.now.pMiss;
        if (pa != pb) return pa > pb;
        return a.gap > b.gap;
    });
}

} // namespace

Debrief buildDebrief(const SeasonTallies& season, std::size_t focal,
                     const std::vector<MetricSpec>& metrics, const std::vector<Target>& targets,
                     const ZoneGrid& grid, const FlagSettings& settings) {
    Debrief d;
    d.window = settings.window;
    if (focal >= season.matchIds.size()) return d;
    d.matchId = season.matchIds[focal];
    const Window matchWindow{Window::Kind::Match, 1, 0.3};
    std::vector<Window> windows{matchWindow};
    if (!(settings.window == matchWindow)) windows.push_back(settings.window);

    const auto now = computeStatus(season, focal, metrics, targets, grid, windows, settings);
    std::map<Key, FlagState> before;
    if (focal > 0) {
        d.previousMatchId = season.matchIds[focal - 1];
        for (const auto& s : computeStatus(season, focal - 1, metrics, targets, grid,
                                           {settings.window}, settings))
            before[keyOf(s)] = s.state;
    }
    std::vector<ZoneStatus> judgedStatuses;
    for (const auto& s : now) {
        if (!s.target) continue;
        DebriefItem item{s, std::nullopt, gapOf(s)};
        if (auto it = before.find(keyOf(s)); it != before.end()) item.before = it->second;
        const bool judgedWindow = s.window == settings.window;
        if (s.window == matchWindow && s.state == FlagState::OffTarget)
            d.slippedInMatch.push_back(item);
        if (s.window == matchWindow && s.state == FlagState::TooLittleData &&
            !std::isnan(s.matchTail) && s.matchTail <= kUnusualMatchTail)
            d.unusualInMatch.push_back(item);
        if (!judgedWindow) continue;
        if (s.state == FlagState::TooLittleData) {
            ++d.tooLittleData;
            continue;
        }
        ++d.judged;
        judgedStatuses.push_back(s);
        switch (s.state) {
        case FlagState::OffTarget:
            d.slippedInWindow.push_back(item);
            if (focal > 0 && item.before != FlagState::OffTarget) d.newSlips.push_back(item);
            break;
        case FlagState::CloseToLine:
        case FlagState::LikelyOff: d.watched.push_back(item); break;
        case FlagState::OnTarget:
            if (item.before == FlagState::OffTarget || item.before == FlagState::LikelyOff ||
                item.before == FlagState::CloseToLine)
                d.recovered.push_back(item);
            break;
        default: break;
        }
    }
    d.chanceFlags = expectedChanceFlags(judgedStatuses);
    const int series = seriesWithTargets(targets, season.dates[focal]);
    d.seasonChanceFlags = seasonChanceFlags(judgedStatuses, settings, series);
    d.offThreshold = offThresholdFor(settings, series);
    d.seriesWithTargets = series;
    for (auto* list : {&d.slippedInMatch, &d.slippedInWindow, &d.newSlips, &d.recovered, &d.watched})
        order(*list);
    std::stable_sort(d.unusualInMatch.begin(), d.unusualInMatch.end(),
                     [](const DebriefItem& a, const DebriefItem& b) { return a.now.matchTail < b.now.matchTail; });
    return d;
}

} // namespace pitchloop::model
