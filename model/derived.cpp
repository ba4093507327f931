#include "derived.h"

#include <optional>

namespace pitchloop::model {

Point lastBallPlace(const Event& e) {
    if (e.type == EventType::Carry && e.to) return *e.to;
    return e.at;
}

std::vector<Loss> findLosses(const Match& match) {
    std::vector<Loss> losses;
    const auto& events = match.events;
    std::optional<Side> control;
    std::optional<std::size_t> lastOf[2];
    int period = -1;
    for (std::size_t i = 0; i < events.size(); ++i) {
        const Event& e = events[i];
        if (e.period != period) {
            period = e.period;
            control.reset();
            lastOf[0].reset();
            lastOf[1].reset();
        }
        if (givesControl(e)) {
            if (control && *control != e.side) {
                const Side loser = *control;
                // The loser had control, so it has at least one event in this period.
                const std::size_t last = *lastOf[static_cast<int>(loser)];
                losses.push_back({loser, i, last, e.period, e.t, lastBallPlace(events[last])});
            }
            control = e.side;
        }
        lastOf[static_cast<int>(e.side)] = i;
    }
    return losses;
}

namespace {
/// Times are written in decimal seconds, so two times exactly W apart may differ by a hair more
/// than W in binary (8.3 − 3.3 = 5.000000000000001). Compare with this tolerance, far below any
/// time a match file can resolve.
constexpr double kTimeToleranceS = 1e-6;
} // namespace

WindowHit findHitWithin(const Match& m, std::size_t anchor, const WindowQuery& query,
                        const std::function<bool(const Event&)>& matches) {
    const auto& events = m.events;
    const Event& a = events[anchor];
    for (std::size_t i = query.includeAnchor ? anchor : anchor + 1; i < events.size(); ++i) {
        const Event& e = events[i];
        if (e.period != a.period || e.t - a.t > query.withinS + kTimeToleranceS) break;
        if (!query.sameTime && e.t <= a.t) continue;
        if (matches(e)) return {WindowOutcome::Found, i};
    }
    const double left = m.info.periodLength(a.period) - a.t;
    return {left < query.withinS - kTimeToleranceS ? WindowOutcome::Censored : WindowOutcome::NotFound,
            0};
}

WindowOutcome findWithin(const Match& m, std::size_t anchor, const WindowQuery& query,
                         const std::function<bool(const Event&)>& matches) {
    return findHitWithin(m, anchor, query, matches).outcome;
}

WindowOutcome regainWithin(const Match& m, const Loss& loss, double withinS) {
    const Side loser = loss.side;
    return findWithin(m, loss.takeIndex, {withinS, false, true}, [loser](const Event& e) {
        if (e.side == loser) return givesControl(e);
        return e.type == EventType::Foul || e.type == EventType::Out;
    });
}

WindowOutcome shotAfterLoss(const Match& m, const Loss& loss, double withinS) {
    const Side taker = other(loss.side);
    return findWithin(m, loss.takeIndex, {withinS, true, true}, [taker](const Event& e) {
        return e.side == taker && e.type == EventType::Shot;
    });
}

std::vector<std::size_t> preShotPasses(const Match& m, Side side, double withinS) {
    std::vector<std::size_t> out;
    for (std::size_t i = 0; i < m.events.size(); ++i) {
        const Event& e = m.events[i];
        if (e.side != side || e.type != EventType::Pass || e.result != Result::Ok) continue;
        auto found = findWithin(m, i, {withinS, false, false}, [side](const Event& s) {
            return s.side == side && s.type == EventType::Shot;
        });
        if (found == WindowOutcome::Found) out.push_back(i);
    }
    return out;
}

double minutesPlayed(const MatchInfo& info) {
    double seconds = 0;
    for (const auto& p : info.periods) seconds += p.lengthS;
    return seconds / 60.0;
}

bool isDefensiveAction(const Event& e) {
    switch (e.type) {
    case EventType::Tackle:
    case EventType::Interception:
    case EventType::Foul:
    case EventType::Block: return true;
    default: return false;
    }
}

} // namespace pitchloop::model
