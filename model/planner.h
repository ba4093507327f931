#pragma once
// The session planner (docs/planner.md): picks and orders drills from the drill book for one
// training session, covering the most severe open focuses within the session's minutes, the
// microcycle day's intensity cap and the players available, as a small integer program solved
// with GLPK. Every pick is explained in one line.

#include "drills.h"
#include "fixtures.h"
#include "metricspec.h"
#include "status.h"
#include "targets.h"
#include "zones.h"

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

struct Focus;

/// The caution every plan carries.
inline constexpr std::string_view kPlanCaution =
    "This plan is advice. Load, injury and return-to-play decisions belong to the club's "
    "qualified staff and follow local rules.";

/// Minutes on one focus that earn full credit; the next as many earn half; beyond that none
/// (diminishing returns, so one session spreads over several focuses; common practice, no
/// published source).
inline constexpr int kFullCreditMinutes = 20;
inline constexpr int kHalfCreditMinutes = 20;

/// Drill tags that mark warm-ups and cool-downs (ASCII case ignored).
inline constexpr std::string_view kWarmUpTag = "warm_up";
inline constexpr std::string_view kCoolDownTag = "cool_down";

/// How far a value is on the wrong side of its target, on a 0–1 scale: the shortfall as a
/// share of the target for "at least" targets (how far from the target towards 0); for "at
/// most" rates the excess as a share of the room above the target (towards 1); for "at most"
/// counts and exposures, which have no top, the excess as a share of the value itself.
/// 0 on the right side of the target or when the value is not a number.
double normalisedGap(Direction direction, MetricKind kind, double value, double target);

/// Severity of a focus, 0–1: P(miss) × normalised gap ("how sure" × "how far off").
double severity(Direction direction, MetricKind kind, double value, double target, double pMiss);

/// A focus as the planner sees it: what it works on, and the numbers that rank it.
struct PlanFocus {
    std::int64_t id = 0; ///< the stored focus (0: not stored)
    std::string metric;
    std::string metricName; ///< as people read it ("Their passes before their shots")
    std::string zoneName;   ///< the zone below as people read it ("our left-back area (B2·L5)")
    std::vector<Zone> zones;                ///< zones a drill may work on to count for this focus
    std::vector<std::int64_t> linkedDrills; ///< drills the coach linked to the focus
    MetricKind kind = MetricKind::Rate;
    int band = 0; ///< the zone the numbers below describe (0, 0: whole pitch)
    int lane = 0;
    double value = 0; ///< current value over the judged window (metric unit)
    Direction direction = Direction::AtLeast;
    double target = 0;
    double pMiss = 0;
    double severity = 0; ///< 0–1; see severity()
    FlagState state = FlagState::NoTarget; ///< the zone's state over the window
    /// A zone off target or likely off that no open focus covers (id 0): it can earn time at
    /// half a focus's weight (docs/planner.md).
    bool watched = false;
};

/// The planner's view of a stored focus, from the statuses of the latest match: among the
/// focus's zones (the whole-pitch status when the focus covers every zone of `grid`) in
/// `window`, the one of highest severity. nullopt when none of them has a target.
std::optional<PlanFocus> planFocus(const Focus& focus, const MetricSpec& metric,
                                   const std::vector<ZoneStatus>& statuses, const Window& window,
                                   const ZoneGrid& grid);

/// Whether drill `d` works on focus `f`: the coach linked it, or it lists the focus's metric
/// and either one of the focus's zones or no zones at all (a drill for the whole pitch).
bool worksOn(const Drill& d, const PlanFocus& f);

/// Everything the planner needs for one session.
struct PlanRequest {
    std::string date;   ///< the session's date, YYYY-MM-DD
    std::string season; ///< the season it belongs to, e.g. "2026-27" (July–June)
    int minutes = 0;    ///< the session's length
    int playersAvailable = 0;
    std::vector<Fixture> fixtures; ///< the squad's schedule for the season
    IntensityCaps caps;
    std::vector<PlanFocus> focuses;      ///< open focuses (any order; ranked by severity)
    std::vector<Drill> drills;           ///< the drill book (deleted drills are ignored)
    std::vector<std::int64_t> yesterday; ///< drills of the previous day's session
    std::vector<std::int64_t> pinned;    ///< must be in the plan
    std::vector<std::int64_t> removed;   ///< must not be in the plan
};

/// The request with `out` removed and `in` pinned (a coach's swap; solve it again).
PlanRequest swapDrill(PlanRequest request, std::int64_t out, std::int64_t in);

enum class BlockRole { WarmUp, Main, CoolDown };
std::string_view toString(BlockRole r); ///< "warm_up", "main", "cool_down"

struct PlanBlock {
    BlockRole role = BlockRole::Main;
    std::int64_t drillId = 0;
    std::string title;
    int minutes = 0;
    int intensity = 0;
    bool pinned = false;
    /// The most severe focus the drill works on (index into PlanRequest::focuses).
    std::optional<std::size_t> focus;
    std::vector<std::size_t> alsoFocuses; ///< other focuses it works on, most severe first
    std::string why;                      ///< one line
};

struct FocusMinutes {
    std::size_t focus = 0; ///< index into PlanRequest::focuses
    std::int64_t focusId = 0;
    int minutes = 0; ///< minutes of chosen drills that work on the focus
};

struct Plan {
    std::string date;
    MicrocycleDay day;
    int cap = 0;            ///< the day's intensity cap
    int sessionMinutes = 0; ///< asked for
    int playersAvailable = 0;
    int minutesUsed = 0;
    std::vector<PlanBlock> blocks; ///< warm-up, main drills (intensity down, then id), cool-down
    std::vector<FocusMinutes> focusMinutes; ///< every focus of the request, in its order
    /// The integer program's value (docs/planner.md): Σ focus weight × credited minutes, plus
    /// one point a minute used.
    long objective = 0;
    /// What the coach should know about the plan: when the session is not filled, what the
    /// drill book lacks ("no main drill of intensity 3 or less for 16 players that was not done
    /// yesterday"). Empty when the session is full.
    std::vector<std::string> notes;
    std::string caution{kPlanCaution};
};

struct PlanResult {
    std::optional<Plan> plan;
    std::string problem; ///< why there is no plan, in plain words (empty with a plan)
};

/// Weight of a focus in the objective: its severity in hundredths, rounded (0–100).
int focusWeight(double severity);

/// Plans one session. Bad input and requests no plan can meet give a problem, never a plan
/// that breaks a rule.
PlanResult planSession(const PlanRequest& request);

} // namespace pitchloop::model
