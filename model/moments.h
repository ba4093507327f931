#pragma once
// The moments behind a zone's number (docs/moments.md): the losses, passes, shots and actions a
// metric counted in a zone of a match, with the match clock, what happened and who was in them,
// and clip lists of them for a video player (WebVTT chapters, CSV).

#include "metricengine.h"
#include "repository.h"
#include "status.h"

#include <nlohmann/json.hpp>

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

/// How a moment counts in its zone's number.
enum class MomentCount {
    Success,   ///< in the numerator (and the denominator of a share)
    NoSuccess, ///< in the denominator only: the test did not hold
    Censored,  ///< in neither: the period ended before the test's window did
    Exposure,  ///< an exposure event of a per-exposure metric: the denominator
};
std::string_view toString(MomentCount c); ///< "success", "no_success", "censored", "exposure"

/// One moment of one match.
struct Moment {
    std::string matchId;
    std::string date;
    std::string opponent;
    int band = 0;
    int lane = 0;
    int period = 1;
    double t = 0;      ///< the item's time in its period: a loss's, when the ball was taken
    double startT = 0; ///< the moment's first event: a loss's, the losing side's last touch
    double endT = 0;   ///< its last: the answering event, or the end of the test's window
    MomentCount count = MomentCount::Success;
    std::optional<double> answerAfterS; ///< seconds from t to the event that answered the test
    std::string what;   ///< "we lost it (#7's pass) → our tackle (#4) after 3.2 s"
    std::vector<std::string> players; ///< the players in its events, first to last, once each
    std::vector<std::string> ours;    ///< the same, ours only
    std::vector<std::string> ourNames; ///< ours as the squad list names them ("7 A. Example"), else the id
    Point from;                       ///< the arrow: where it starts, our frame
    std::optional<Point> to;          ///< ... and where it goes, when it goes somewhere
    std::size_t event = 0;            ///< the item's event index in the match
};

/// The moments of `spec` in `match`, in time order; only those binned in `zone` when given
/// (else the whole pitch). Added up per zone they give computeTally (tested): num = Success,
/// den = Success + NoSuccess for shares, + Exposure for per-exposure metrics; a per-match
/// count's den is the match.
std::vector<Moment> matchMoments(const Match& match, const MetricSpec& spec, const ZoneGrid& grid,
                                 std::optional<Zone> zone, const std::vector<Player>& squadList = {});

/// Whether a moment involves one of our players (`number`), or a player of ours whose position in
/// `squadList` is in `unit`.
bool involves(const Moment& m, const std::string& number);
bool involves(const Moment& m, Unit unit, const std::vector<Player>& squadList);

/// The matches of a window ending at a stored match, oldest first: the match itself, the last
/// N of its season up to it, or its season so far — the matches its status adds up.
struct MomentsRequest {
    std::string matchId;
    std::string metricId;
    std::optional<Zone> zone; ///< nullopt: the whole pitch
    Window window{Window::Kind::Match, 1, 0.3};
    std::optional<std::string> player; ///< only moments involving this player of ours
    std::optional<Unit> unit;          ///< only moments involving a player of ours in this unit
};

/// What a request found: the window's matches (oldest first) and their moments in match order,
/// or a problem in words ("no match 'X'", "no metric 'Y'", a window of weights) and nothing else.
struct MomentsResult {
    std::vector<MatchSummary> matches;
    std::vector<Moment> moments; ///< those the request's player or unit filter keeps
    long allMoments = 0;         ///< before the filter (num and den below count all of them)
    std::string problem;
    /// The zone's numbers from these moments: successes, and the denominator as the tallies
    /// count it (a per-match count's: the matches).
    long num = 0;
    long den = 0;
};

/// The moments behind a zone's number in a window, read from the club file's stored events.
/// An EWMA window weighs every match, so it has no list of its own and is refused.
MomentsResult storedMoments(const ClubRepository& repo, const MomentsRequest& request);

/// The moments of `metric` in any of `zones` of `grid` over the stored matches `matchIds`, in
/// the order given (a review's baseline or its matches after the start).
std::vector<Moment> storedMomentsIn(const ClubRepository& repo, const MetricSpec& metric, const ZoneGrid& grid,
                                    const std::vector<Zone>& zones, const std::vector<std::string>& matchIds);

/// A review's moments side by side as CSV: momentsCsv's columns after a first column `side`
/// ("before" or "after").
std::string reviewMomentsCsv(const std::vector<Moment>& before, const std::vector<Moment>& after);

/// The clock in a period: "26:04" (minutes may pass 59: "61:30").
std::string periodClock(double t);
/// The match clock as football reads it (Laws of the Game, Law 7: halves of 45 minutes, extra
/// time of 2 × 15): the 2nd half starts at 45:00, extra time at 90:00 and 105:00; time past a
/// period's length is added time, "45+2:10". Periods after the 4th count on from 120:00.
std::string matchClock(int period, double t);

/// Where each period starts in a match's video, in seconds from the video's start: given
/// periods as set, the others at the end of the one before (a video with the breaks cut).
struct VideoClock {
    std::map<int, double> periodStartS;
    double leadInS = 8;
    double leadOutS = 4;

    /// Seconds from the video's start to (period, t).
    double at(const MatchInfo& info, int period, double t) const;
};

/// A clip: one moment, or several whose lead-ins and lead-outs overlap, merged.
struct Clip {
    double startS = 0;
    double endS = 0;
    std::vector<std::size_t> moments; ///< indices in the list the clips were made from
};

/// Clips of one match's moments on its video: [start − lead-in, t + lead-out], never before the
/// video's start, merged where they overlap so that a chapter list never nests.
std::vector<Clip> clipsOf(const MatchInfo& info, const std::vector<Moment>& moments,
                          const VideoClock& clock);

/// A WebVTT file of chapters (W3C WebVTT): "WEBVTT", a title note, then one cue per clip with
/// hh:mm:ss.ttt timings and the moments' clocks and words as its text.
std::string clipsWebVtt(const MatchInfo& info, const std::vector<Moment>& moments,
                        const std::vector<Clip>& clips, const std::string& title);

/// A CSV clip list, one row per moment: match, clip number, start and end in seconds and as
/// hh:mm:ss.ttt, period, clocks, what happened, players (RFC 4180).
std::string clipsCsv(const MatchInfo& info, const std::vector<Moment>& moments,
                     const std::vector<Clip>& clips);

/// The moments as CSV, one row each (RFC 4180; docs/moments.md): match, date, opponent, period,
/// clocks, zone, how it counts, seconds to the answer, what happened, players, the arrow.
std::string momentsCsv(const std::vector<Moment>& moments);

/// One moment as JSON, the same fields as the CSV.
nlohmann::json toJson(const Moment& m);

/// Reads a clock "[hh:]mm:ss[.fff]" ("47:30", "1:02:03.5", "95") in seconds; nullopt when it is
/// not one (a part missing, not a number, negative).
std::optional<double> parseClock(std::string_view text);

/// hh:mm:ss.ttt as WebVTT writes a cue time.
std::string vttTime(double seconds);

} // namespace pitchloop::model
