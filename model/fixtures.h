#pragma once
// Fixtures: a squad's season schedule, read from a CSV or JSON file of our own shape
// (docs/planner.md), and the microcycle day of any date (MD-4 … MD-1, MD, MD+1 …) with the
// intensity cap that day carries.

#include "problem.h"

#include <array>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

// Calendar dates ---------------------------------------------------------------------------

/// Days since 1970-01-01 of an ISO date YYYY-MM-DD; nullopt when the text is not a real
/// calendar date (2026-02-29 and 2026-13-01 are rejected).
std::optional<long> dayNumber(std::string_view isoDate);
/// A 24-hour clock time "HH:MM" (00:00 to 23:59).
bool isClockTime(std::string_view text);
/// The ISO date of a day number.
std::string isoDate(long dayNumber);
/// `isoDate` moved by `days` (negative for earlier); the input must be a valid date.
std::string addDays(const std::string& isoDate, long days);

// Fixtures ---------------------------------------------------------------------------------

/// One match on the schedule.
struct Fixture {
    std::string date;    ///< YYYY-MM-DD
    std::string kickoff; ///< "HH:MM" (24-hour, local time); empty while not yet known
    std::string opponent;
    std::string venue;       ///< home, away or neutral (as in the match format)
    std::string competition; ///< may be empty
    std::string matchId;     ///< the stored match played on that date, once it is ingested

    bool operator==(const Fixture&) const = default;
};

/// Checks one fixture's fields; problems name `source`, `place` and the field.
Problems validateFixture(const Fixture& f, const std::string& source, const std::string& place);

/// A fixtures file read: every fixture, or (with any problem) none.
struct FixtureFileResult {
    std::vector<Fixture> fixtures;
    Problems errors;
};

/// CSV (RFC 4180: comma-separated, fields with commas, quotes or line breaks in double quotes,
/// "" for a quote inside) with the header `date,kickoff,opponent,venue,competition` (those
/// five names, in any order). Problems name the line the record starts on and the column.
FixtureFileResult parseFixtureCsv(std::string_view text, const std::string& source);

/// JSON: {"format": "pitchloop-fixtures", "version": 1, "fixtures": [{"date": ..., "kickoff":
/// ..., "opponent": ..., "venue": ..., "competition": ...}]}. Problems name "fixtures[i]".
FixtureFileResult parseFixtureJson(std::string_view text, const std::string& source);

/// Either, chosen by content: text whose first non-blank character is '{' is read as JSON.
FixtureFileResult parseFixtureFile(std::string_view text, const std::string& source);

// Microcycle -------------------------------------------------------------------------------

/// Days after a match labelled from it (MD+1, MD+2) before the countdown to the next match
/// (MD-4 …) takes over (common practice, no published source).
inline constexpr int kRecoveryDays = 2;
/// Two matches this many days apart or fewer make a congested week: each day between them is
/// labelled from both (common practice, no published source).
inline constexpr int kCongestedWithinDays = 4;

/// Where a date sits between matches.
struct MicrocycleDay {
    std::string date;
    std::optional<Fixture> previous;      ///< the last fixture before `date`
    std::optional<Fixture> next;          ///< the first fixture on or after `date`
    std::optional<int> daysAfterPrevious; ///< ≥ 1 when there is a previous fixture
    std::optional<int> daysToNext;        ///< 0 on match day
    bool congested = false; ///< next match within kCongestedWithinDays of the previous
    /// "MD" on match day; "MD+n" up to kRecoveryDays after a match (or after the last fixture);
    /// "MD-n" otherwise; "MD+a / MD-b" in a congested week; empty without any fixture.
    std::string label;
};

/// The microcycle day of `date` among `fixtures` (any order; one fixture a date).
MicrocycleDay microcycle(const std::string& date, const std::vector<Fixture>& fixtures);

/// The highest drill intensity (1–5, model/drills.h) planned on each microcycle day; 0 means
/// no session. Defaults are common practice, no published source: recovery after a match,
/// the heaviest day four days out, light activation the day before. A coach can edit every one.
struct IntensityCaps {
    int matchDay = 0;                                ///< MD
    std::array<int, kRecoveryDays> afterMatch{2, 3}; ///< MD+1, MD+2
    std::array<int, 4> beforeMatch{2, 3, 4, 5};      ///< MD-1, MD-2, MD-3, MD-4
    int otherDays = 4; ///< MD-5 and earlier, MD+3 and later after the last fixture

    /// The cap `n` days after a match (n ≥ 1).
    int after(int n) const;
    /// The cap `n` days before a match (n ≥ 1).
    int before(int n) const;
    bool operator==(const IntensityCaps&) const = default;
};

/// The cap of a microcycle day: the lower of the two in a congested week; nullopt without any
/// fixture.
std::optional<int> intensityCap(const MicrocycleDay& day, const IntensityCaps& caps);

/// Caps as JSON {"md": 0, "md_plus": [2, 3], "md_minus": [2, 3, 4, 5], "other": 4} and back.
std::string capsToJson(const IntensityCaps& caps);
/// Reads what capsToJson writes; keys absent keep their defaults; every value must be 0–5.
struct CapsResult {
    IntensityCaps caps;
    Problems errors;
};
CapsResult parseCaps(std::string_view json, const std::string& source);

} // namespace pitchloop::model
