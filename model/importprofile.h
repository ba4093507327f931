#pragma once
// Bringing a club's own event table in: a mapping profile (a small JSON file of our own,
// docs/import.md and docs/profile.schema.json) says which column holds each of our fields and
// how to read it; mapping a table with it gives a match in our own format, which then goes
// through the same checks and the same one-transaction ingest as a native match file.

#include "problem.h"
#include "table.h"
#include "zones.h"

#include <nlohmann/json.hpp>

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

inline constexpr std::string_view kProfileFormat = "pitchloop-profile";
inline constexpr int kProfileFormatVersion = 1;

/// What a table's word stands for: one of our event types, optionally with its result and tags
/// (a source that writes "Goal" in its type column gives shot + goal at once).
struct WordMeaning {
    std::string type;   ///< ours: pass, carry, shot, ...
    std::string result; ///< ours: ok, fail, goal, ...; empty: from the result column
    std::vector<std::string> tags;
};

struct MappingProfile {
    std::string name;
    TableFormat table;
    TextEncoding encoding = TextEncoding::Utf8;
    char decimal = '.';
    /// Our field → the table's column (a header name, or a 1-based number without a header).
    std::map<std::string, std::string> columns;
    enum class TimeForm { Seconds, Clock, Frames };
    TimeForm timeForm = TimeForm::Seconds;
    double fps = 25;
    bool timeFromKickoff = false;
    std::map<int, double> periodStarts{{1, 0}, {2, 2700}, {3, 5400}, {4, 6300}};
    std::map<std::string, int> periodWords; ///< e.g. "1st half" → 1 (else the number itself)
    // Side: the values meaning us (and, when listed, them); or home/away values with the venue.
    std::vector<std::string> usValues;
    std::vector<std::string> oppValues; ///< empty: anything not ours is theirs
    std::string homeValue, awayValue;   ///< set: the column gives home/away
    // Coordinates: the source's extent, its origin and the frame (ours: acting, us, ground).
    double width = 105, height = 68;
    std::string origin = "bottom-left"; ///< top-left, top-right, bottom-left, bottom-right, centre
    bool yUp = true;
    std::string frame = "acting";
    std::map<std::string, std::string> usAttack; ///< ground frame: period → "+x" / "-x"
    /// Zone-only data (a `zone` column instead of x and y): the grid the labels name, in the
    /// frame's own direction (band 1 at the acting or our goal line, or at x = 0 on the ground;
    /// lane 1 at that side's right touchline), and how a label names its zone: listed words
    /// first, then the pattern ("B{band}-L{lane}").
    std::optional<ZoneGrid> zoneGrid;
    std::map<std::string, Zone> zoneLabels;
    std::string zonePattern;
    std::map<std::string, WordMeaning> types;
    std::map<std::string, std::string> results;
    std::vector<std::string> skip;
    std::string tagSeparator = "|";
    std::string fileNamePattern; ///< e.g. "{date}_{opponent}.csv"
    /// Match details read from columns (id, date, opponent, venue, competition, period_lengths):
    /// a table may then hold many matches, one per id.
    std::map<std::string, std::string> matchColumns;
    std::map<std::string, std::string> venueWords; ///< the venue column's words → home/away/neutral
    nlohmann::json match = nlohmann::json::object(); ///< fixed match details
};

struct ProfileResult {
    std::optional<MappingProfile> profile;
    Problems errors;
};

/// Reads and checks a profile (errors name the profile file and the field).
ProfileResult parseProfile(std::string_view text, const std::string& fileName);
ProfileResult readProfileFile(const std::string& path);

/// Details of the match a table holds, when the table does not say them: from the command line
/// or a form; they override the profile's and the file name's.
struct MatchDetails {
    std::map<std::string, std::string> values; ///< id, date, opponent, venue, competition, us
    /// For a preview while a profile is being written (the mapping assistant): match details
    /// nobody gave yet get placeholders, and the match is built from the rows that map even
    /// when other rows do not (their problems are still listed). Never stored.
    bool preview = false;
};

/// One word of the table that the profile does not map.
struct UnmappedWord {
    std::string column; ///< the table's column
    std::string word;
    int count = 0;
    std::vector<std::size_t> lines; ///< the first few lines where it appears
};

struct MappedTable {
    nlohmann::json match;               ///< our match format, version 1
    std::vector<std::string> rowPlaces; ///< per event of `match`: "line 12" in the table
    std::vector<UnmappedWord> unmapped;
    int skipped = 0;   ///< rows the profile says to skip
    Problems errors;   ///< the table cannot be mapped (file, line, column)
    Problems warnings; ///< sanity checks that look wrong but could be right
    std::map<std::string, int> countsByType; ///< "us pass", "opp shot", ...
};

/// Maps a parsed table with a profile into our match format. `fileName` (its last part) may
/// give match details through the profile's file-name pattern; `details` override them.
MappedTable mapTable(const Table& table, const MappingProfile& profile,
                     const MatchDetails& details, const std::string& fileName);

/// Reads a file with a profile: decode, cut into a table, map. Problems name `fileName`.
MappedTable mapFile(std::string_view bytes, const MappingProfile& profile,
                    const MatchDetails& details, const std::string& fileName);

/// The same for a table that may hold several matches (the profile's match columns give each
/// row's match id): one mapped match per id, in the order they first appear. Without match
/// columns, one. Every match's problems are its own; decoding or cutting problems come back
/// as one entry with errors only.
std::vector<MappedTable> mapFileMatches(std::string_view bytes, const MappingProfile& profile,
                                        const MatchDetails& details, const std::string& fileName);

/// Rewrites problems the match reader found in mapped JSON ("events[12].x") into the table's
/// terms ("line 14", column "X").
Problems inTableTerms(const Problems& problems, const MappedTable& mapped,
                      const MappingProfile& profile);

/// The zone a label names in a zone-only profile (a listed label, else the pattern); nullopt
/// when it names none. The zone may lie outside the grid (mapping reports that).
std::optional<Zone> zoneOfLabelIn(const MappingProfile& profile, const std::string& label);

/// A number as a table writes it ("12,5" with a decimal comma); nullopt when it is not one.
std::optional<double> readTableNumber(std::string_view text, char decimal);
/// A clock ("75.4", "12:05", "1:02:05.250") in seconds; nullopt when it is not one.
std::optional<double> readTableClock(std::string_view text, char decimal);

} // namespace pitchloop::model
