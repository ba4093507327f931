#pragma once
// Domain types shared by every part of model/: sides, event kinds, events and matches.

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

enum class Side { Us, Opp };

constexpr Side other(Side s) { return s == Side::Us ? Side::Opp : Side::Us; }

enum class EventType {
    Pass,
    Carry,
    TakeOn,
    Shot,
    Recovery,
    Interception,
    Tackle,
    Keeper,
    Clearance,
    Block,
    Foul,
    Out,
};

/// Result of an event; `None` for fouls and balls out, which carry no result.
enum class Result { None, Ok, Fail, Goal, Saved, Blocked, Off, Post };

/// How a match file gives its coordinates (BRIEF §2); only the reader sees this.
enum class Frame { Acting, Us, Ground };

struct Point {
    double x = 0; ///< metres from our goal line
    double y = 0; ///< metres from our right touchline (when we attack)
    bool operator==(const Point&) const = default;
};

struct Pitch {
    double lengthM = 105;
    double widthM = 68;
    bool operator==(const Pitch&) const = default;
};

struct Period {
    int n = 1;
    double lengthS = 0;
    bool operator==(const Period&) const = default;
};

/// One on-ball event, always in our frame once it leaves the reader.
struct Event {
    int period = 1;
    double t = 0; ///< seconds since the start of its period
    Side side = Side::Us;
    std::string player;
    EventType type = EventType::Pass;
    Result result = Result::None;
    Point at;
    std::optional<Point> to; ///< pass or carry end
    std::vector<std::string> tags;
    int fileIndex = 0;  ///< index in the source file's `events` array
    std::string extra;  ///< unknown fields as compact JSON text, empty when none

    bool hasTag(std::string_view tag) const;
    bool operator==(const Event&) const = default;
};

struct MatchInfo {
    std::string id;
    std::string date; ///< ISO 8601 calendar date, YYYY-MM-DD
    std::string competition;
    std::string venue; ///< home, away or neutral
    std::string us;
    std::string opponent;
    std::optional<int> goalsUs;
    std::optional<int> goalsOpp;
    Pitch pitch;
    std::vector<Period> periods;
    Frame sourceFrame = Frame::Acting;
    /// Zone-only data: the events' positions are the centres of this grid's zones (its
    /// ZoneGrid::name(), e.g. "equal:6x5"), so where they were is known only to that grid.
    /// Empty when the positions are measured.
    std::string zoneOnlyGrid;
    std::string extra; ///< unknown fields of the match object, compact JSON text

    /// Length of period `n` in seconds, 0 when the match has no such period.
    double periodLength(int n) const;
    bool operator==(const MatchInfo&) const = default;
};

/// A match in our frame with its events ordered by (period, t), ties in file order.
struct Match {
    MatchInfo info;
    std::vector<Event> events;
    bool operator==(const Match&) const = default;
};

// Names as they appear in files, the database and the command line.
std::string_view toString(Side s);
std::string_view toString(EventType t);
std::string_view toString(Result r);
std::string_view toString(Frame f);
std::optional<Side> sideFromString(std::string_view s);
std::optional<EventType> eventTypeFromString(std::string_view s);
/// The words of a match file's format version: 1 (the first words, also the program's own
/// names above) or 2 (our own: beat; lost, scored, stopped, charged_down, wide, woodwork).
std::optional<EventType> eventTypeFromWord(std::string_view s, int version);
std::optional<Result> resultFromWord(std::string_view s, int version);
std::string_view wordOf(EventType t, int version);
std::string_view wordOf(Result r, int version);
std::optional<Result> resultFromString(std::string_view s);
std::optional<Frame> frameFromString(std::string_view s);

/// All event type names, in declaration order.
const std::vector<std::string_view>& eventTypeNames();

/// Results a file may give for `type`; empty for types that take no result.
const std::vector<Result>& allowedResults(EventType type);

/// Whether `s` is a real calendar date written YYYY-MM-DD (2026-02-29 and 2026-04-31 are not;
/// 2028-02-29 is): the one date check of match files, targets and the command line.
bool isIsoDate(std::string_view s);

/// Whether the event gives its side control of the ball (BRIEF §2 table).
bool givesControl(const Event& e);

} // namespace pitchloop::model
