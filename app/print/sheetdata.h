#pragma once
// What the printed sheets show, as plain numbers and texts taken from model/: built first and
// checked on their own, then drawn (sessionsheet.h, debriefsheet.h). No Qt here.

#include "debrief.h"
#include "planner.h"
#include "repository.h"
#include "status.h"
#include "targets.h"
#include "types.h"
#include "zones.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::print {

/// A sheet's data, or why there is none in plain words (naming the squad, date or match).
template <class T> struct SheetResult {
    std::optional<T> data;
    std::string problem;
};

/// One block of a saved session with its drill's notes.
struct SheetBlock {
    model::BlockRole role = model::BlockRole::Main;
    std::int64_t drillId = 0;
    bool drillFound = true; ///< false: the drill is no longer in the club file
    int minutes = 0;        ///< as planned for this session
    std::string title;
    int intensity = 0; ///< 1–5 (model/drills.h)
    std::string organisation;
    std::vector<std::string> coachingPoints;
    std::optional<std::int64_t> focusId; ///< the most severe focus the block works on
    std::string why;                     ///< the planner's one-line reason
};

/// A focus the session gives minutes to.
struct SheetFocus {
    std::int64_t id = 0;
    std::string label; ///< "F1", "F2", ... in the sheet's order (by focus id)
    std::string metric;
    std::string metricName;         ///< the metric's name (its id when it has none)
    std::string note;               ///< the coach's own words when opening it
    std::vector<model::Zone> zones; ///< empty: the whole pitch
    int minutes = 0;                ///< minutes of the session's drills that work on it
};

struct SessionSheetData {
    std::string club; ///< empty until a match names it
    std::string squad;
    std::string season;
    std::string date;     ///< YYYY-MM-DD
    long dayNumber = 0;   ///< days since 1970-01-01 (for the weekday)
    std::string dayLabel; ///< microcycle day, e.g. "MD-4"
    int cap = 0;          ///< the day's intensity cap
    int minutes = 0;      ///< the session's length as planned
    int minutesInBlocks = 0;
    int players = 0;
    std::string savedBy;
    std::string savedAt;
    std::vector<SheetBlock> blocks;        ///< warm-up, main drills, cool-down (the saved order)
    std::vector<SheetFocus> focuses;       ///< focuses with minutes in this session, by id
    std::vector<SheetFocus> focusesNotMet; ///< focuses of the plan given no minutes today
    model::ZoneGrid grid;
    model::Pitch pitch; ///< the pitch the sketch is drawn on (105 × 68 m)
    std::string caution{model::kPlanCaution};
};

/// The sheet of the squad's saved session on `date`; a problem when the date is not a date
/// or no session is saved that day. Storage faults throw model::StorageError.
SheetResult<SessionSheetData> sessionSheetData(model::ClubRepository& repo,
                                               const std::string& squad, const std::string& date);

/// One slipped target: a debrief item with the numbers the sheet prints.
struct DebriefMark {
    std::string metric;
    std::string metricName;
    std::string question;
    model::MetricKind kind = model::MetricKind::Rate;
    int band = 0; ///< 0 with lane 0: the whole pitch
    int lane = 0;
    double value = 0;
    double low = 0; ///< interval at `level`
    double high = 0;
    double level = 0;
    model::Direction direction = model::Direction::AtLeast;
    double target = 0;
    double pMiss = 0;
    double sample = 0; ///< the window's denominator: items, exposure events, or matches
    int matches = 0;   ///< matches in the window
    double gap = 0;    ///< how far on the wrong side of the target (metric units)
    std::optional<model::FlagState> before; ///< state after the previous match
    bool isNew = false;                     ///< off target now, not before (window slips only)
    std::string sentence; ///< the zone in the coach's words (model/wording.h)
};

struct DebriefSheetData {
    std::string club;
    std::string matchId;
    std::string date;
    std::string opponent;
    std::string venue;
    std::string competition;
    std::optional<int> goalsUs;
    std::optional<int> goalsOpp;
    std::string squad;
    std::string season;
    int matchNumber = 0; ///< 1-based position in the stored season
    int seasonMatches = 0;
    std::string previousMatchId;
    model::Window window;         ///< the judged window
    std::string windowFirstMatch; ///< the first match the window sums (EWMA: the season's first)
    double level = 0;
    double offThreshold = 0;
    bool fdr = false;
    double fdrQ = 0;
    bool hasTargets = false;
    std::vector<DebriefMark> slippedInWindow; ///< the model's order: most certain first
    std::vector<DebriefMark> slippedInMatch;
    std::vector<DebriefMark> recovered; ///< off target or watched after the previous match
    std::vector<DebriefMark> watched;   ///< likely off or close to the line over the window
    std::vector<DebriefMark> unusualInMatch; ///< per-match counts unusual for a team on target
    int judged = 0;
    int tooLittleData = 0;
    double chanceFlags = 0;
    model::ZoneGrid grid;
    model::Pitch pitch; ///< the match's pitch
};

/// The debrief of stored match `matchId`; a problem when there is no such match. Storage
/// faults throw model::StorageError.
SheetResult<DebriefSheetData> debriefSheetData(model::ClubRepository& repo,
                                               const std::string& matchId);

} // namespace pitchloop::print
