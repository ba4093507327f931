#pragma once
// Derived facts (BRIEF §3, docs/metrics.md): control, losses, regains, windows after an event.
// Plain functions over a match's ordered events; no storage, no state.

#include "types.h"

#include <functional>
#include <vector>

namespace pitchloop::model {

/// A change of control: `side` had the ball and the other side took it.
struct Loss {
    Side side = Side::Us;     ///< the side that lost the ball
    std::size_t takeIndex = 0; ///< index (in Match::events) of the other side's control event
    std::size_t lastIndex = 0; ///< index of the losing side's last event before it
    int period = 1;
    double t = 0; ///< loss time tL: the take event's time
    Point place;  ///< where the losing side last had the ball, our frame
};

/// Every loss of either side, in event order.
///
/// Why these choices: control is a per-period fact, so a period starts with nobody in control
/// and its first control event is no loss. The loss *time* is when the other side takes the
/// ball (that is when a regain clock can start), but the loss *place* is where the losing side
/// last had it: the end of a carry, otherwise its last event's position. A failed pass that is
/// intercepted 30 m away is lost where it was played, which is the zone a coach would blame.
std::vector<Loss> findLosses(const Match& match);

/// Outcome of looking for an event in the seconds after an anchor.
enum class WindowOutcome { Found, NotFound, Censored };

struct WindowQuery {
    double withinS = 5;       ///< look at most this many seconds after the anchor
    bool includeAnchor = false; ///< whether the anchor event itself may match
    bool sameTime = true;     ///< whether events at exactly the anchor's time may match
};

/// Looks for the first event after `anchor` (same period) that satisfies `match` within the
/// window. NotFound when none does and the period had at least `withinS` seconds left;
/// Censored when none does and the period ended before the window did — we cannot know what
/// would have happened, so such items leave rate denominators (BRIEF §3).
WindowOutcome findWithin(const Match& m, std::size_t anchor, const WindowQuery& query,
                         const std::function<bool(const Event&)>& matches);

/// The outcome of findWithin and, when Found, the index of the event that answered.
struct WindowHit {
    WindowOutcome outcome = WindowOutcome::NotFound;
    std::size_t index = 0; ///< in Match::events; meaningful only when Found
};
WindowHit findHitWithin(const Match& m, std::size_t anchor, const WindowQuery& query,
                        const std::function<bool(const Event&)>& matches);

/// Whether `side` won the ball back within `withinS` of `loss` (BRIEF §3 "Regain"): the first
/// later event that is the loser's control event, a foul by the taker, or a ball out by it.
WindowOutcome regainWithin(const Match& m, const Loss& loss, double withinS);

/// Whether the taker shot within `withinS` of the loss, counting a shot that is itself the
/// take event ("at or after the loss event").
WindowOutcome shotAfterLoss(const Match& m, const Loss& loss, double withinS);

/// Indices of `side`'s completed passes in the `withinS` seconds before one of its shots
/// (same period, t_shot − W ≤ t < t_shot); each pass once however many shots follow.
std::vector<std::size_t> preShotPasses(const Match& m, Side side, double withinS);

/// Where an event puts the ball last: a carry's end, otherwise its own position.
Point lastBallPlace(const Event& e);

/// Minutes played, from the period lengths.
double minutesPlayed(const MatchInfo& info);

/// Defensive actions: tackle, interception, foul and block, whatever their result.
bool isDefensiveAction(const Event& e);

} // namespace pitchloop::model
