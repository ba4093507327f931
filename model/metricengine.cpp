#include "metricengine.h"

#include <algorithm>

namespace pitchloop::model {

namespace {

Point placeOf(const Event& e, Place at) {
    if (at == Place::End && e.to) return *e.to;
    return e.at;
}

/// Evaluates a followed_by test from an anchor event.
WindowOutcome followedBy(const Match& m, std::size_t anchor, bool includeAnchor, Side itemSide,
                         const SuccessSpec& s) {
    return findWithin(m, anchor, {s.withinS, includeAnchor, s.sameTime},
                      [&](const Event& e) {
                          return std::any_of(s.anyOf.begin(), s.anyOf.end(),
                                             [&](const EventSelector& sel) {
                                                 return sel.matches(e, itemSide);
                                             });
                      });
}

void addItem(MatchTally& tally, int zone, WindowOutcome outcome, const MetricSpec& spec) {
    ZoneTally& z = tally[static_cast<std::size_t>(zone)];
    const bool success = outcome == WindowOutcome::Found;
    if (success) ++z.num;
    if (spec.per == MetricSpec::Per::Items) {
        const bool censored = outcome == WindowOutcome::Censored && spec.success.censor;
        if (!censored) ++z.den;
    }
}

} // namespace

bool zonesKnownOn(const MatchInfo& info, const ZoneGrid& grid) {
    if (info.zoneOnlyGrid.empty()) return true;
    const auto own = ZoneGrid::parse(info.zoneOnlyGrid);
    return own && (*own == grid || coarsens(grid, *own, info.pitch));
}

std::string zoneOnlyNote(const MatchInfo& info, const ZoneGrid& grid) {
    if (zonesKnownOn(info, grid)) return {};
    return "positions known only to grid " + info.zoneOnlyGrid +
           "; zone values not computed on grid " + grid.name();
}

MatchTally computeTally(const MatchFacts& facts, const MetricSpec& spec, const ZoneGrid& grid) {
    const Match& m = facts.match;
    MatchTally tally(static_cast<std::size_t>(grid.zoneCount()));
    if (!zonesKnownOn(m.info, grid)) return tally;
    const ZoneLocator locate(grid, m.info.pitch);
    const SuccessSpec& success = spec.success;

    if (spec.items.losses) {
        for (const Loss& loss : facts.losses) {
            if (loss.side != spec.items.lossesOf) continue;
            // The window of a loss starts with the take event itself: a shot that wins the
            // ball *is* a shot after the loss.
            WindowOutcome outcome = WindowOutcome::Found;
            if (success.kind == SuccessSpec::Kind::FollowedBy)
                outcome = followedBy(m, loss.takeIndex, true, loss.side, success);
            addItem(tally, locate.indexOf(loss.place), outcome, spec);
        }
    } else {
        for (std::size_t i = 0; i < m.events.size(); ++i) {
            const Event& e = m.events[i];
            if (!spec.items.select.matches(e, e.side)) continue;
            WindowOutcome outcome = WindowOutcome::Found;
            if (success.kind == SuccessSpec::Kind::Is)
                outcome = success.is.matches(e, e.side) ? WindowOutcome::Found
                                                        : WindowOutcome::NotFound;
            else if (success.kind == SuccessSpec::Kind::FollowedBy)
                outcome = followedBy(m, i, false, e.side, success);
            addItem(tally, locate.indexOf(placeOf(e, spec.items.at)), outcome, spec);
        }
    }

    if (spec.per == MetricSpec::Per::Match) {
        for (auto& z : tally) z.den = 1;
    } else if (spec.per == MetricSpec::Per::Events) {
        for (const Event& e : m.events)
            if (spec.perEvents.select.matches(e, e.side))
                ++tally[static_cast<std::size_t>(locate.indexOf(placeOf(e, spec.perEvents.at)))].den;
    }
    return tally;
}

} // namespace pitchloop::model
