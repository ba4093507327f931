#include "metricengine.h"

#include <algorithm>

namespace pitchloop::model {

namespace {

Point placeOf(const Event& e, Place at) {
    if (at == Place::End && e.to) return *e.to;
    return e.at;
}

/// Evaluates a followed_by test from an anchor event.
WindowHit followedBy(const Match& m, std::size_t anchor, bool includeAnchor, Side itemSide,
                     const SuccessSpec& s) {
    return findHitWithin(m, anchor, {s.withinS, includeAnchor, s.sameTime},
                         [&](const Event& e) {
                             return std::any_of(s.anyOf.begin(), s.anyOf.end(),
                                                [&](const EventSelector& sel) {
                                                    return sel.matches(e, itemSide);
                                                });
                         });
}

/// The one walk over a match's items that both computeTally and tallyItems take, so that a
/// list of moments can never disagree with the stored tallies. `visit` gets every item and
/// exposure event with its zone, whether it counts in num and in den, and its test's hit.
template <class Visit>
void walkItems(const MatchFacts& facts, const MetricSpec& spec, const ZoneGrid& grid, Visit&& visit) {
    const Match& m = facts.match;
    if (!zonesKnownOn(m.info, grid)) return;
    const ZoneLocator locate(grid, m.info.pitch);
    const SuccessSpec& success = spec.success;
    const bool perItems = spec.per == MetricSpec::Per::Items;
    auto item = [&](std::size_t event, std::optional<std::size_t> last, Point place, WindowHit hit) {
        const bool found = hit.outcome == WindowOutcome::Found;
        const bool censored = hit.outcome == WindowOutcome::Censored && success.censor;
        visit(TallyItem{locate.indexOf(place), false, event, last, place, hit, found,
                        perItems && !censored});
    };

    if (spec.items.losses) {
        for (const Loss& loss : facts.losses) {
            if (loss.side != spec.items.lossesOf) continue;
            // The window of a loss starts with the take event itself: a shot that wins the
            // ball *is* a shot after the loss.
            WindowHit hit{WindowOutcome::Found, loss.takeIndex};
            if (success.kind == SuccessSpec::Kind::FollowedBy)
                hit = followedBy(m, loss.takeIndex, true, loss.side, success);
            item(loss.takeIndex, loss.lastIndex, loss.place, hit);
        }
    } else {
        for (std::size_t i = 0; i < m.events.size(); ++i) {
            const Event& e = m.events[i];
            if (!spec.items.select.matches(e, e.side)) continue;
            WindowHit hit{WindowOutcome::Found, i};
            if (success.kind == SuccessSpec::Kind::Is)
                hit.outcome = success.is.matches(e, e.side) ? WindowOutcome::Found
                                                            : WindowOutcome::NotFound;
            else if (success.kind == SuccessSpec::Kind::FollowedBy)
                hit = followedBy(m, i, false, e.side, success);
            item(i, std::nullopt, placeOf(e, spec.items.at), hit);
        }
    }

    if (spec.per == MetricSpec::Per::Events) {
        for (std::size_t i = 0; i < m.events.size(); ++i) {
            const Event& e = m.events[i];
            if (!spec.perEvents.select.matches(e, e.side)) continue;
            const Point place = placeOf(e, spec.perEvents.at);
            visit(TallyItem{locate.indexOf(place), true, i, std::nullopt, place,
                            {WindowOutcome::Found, i}, false, true});
        }
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
    MatchTally tally(static_cast<std::size_t>(grid.zoneCount()));
    walkItems(facts, spec, grid, [&](const TallyItem& it) {
        ZoneTally& z = tally[static_cast<std::size_t>(it.zone)];
        if (it.inNum) ++z.num;
        if (it.inDen) ++z.den;
    });
    if (spec.per == MetricSpec::Per::Match && zonesKnownOn(facts.match.info, grid))
        for (auto& z : tally) z.den = 1;
    return tally;
}

std::vector<TallyItem> tallyItems(const MatchFacts& facts, const MetricSpec& spec, const ZoneGrid& grid) {
    std::vector<TallyItem> items;
    walkItems(facts, spec, grid, [&](const TallyItem& it) {
        const bool censored = it.hit.outcome == WindowOutcome::Censored;
        if (it.inNum || it.inDen || (censored && spec.per == MetricSpec::Per::Items))
            items.push_back(it);
    });
    return items;
}

} // namespace pitchloop::model
