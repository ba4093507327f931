#pragma once
// A first mapping profile for a table nobody has mapped yet, and what a person needs to finish
// it: how the file seems to be written, each column with sample values and a guessed role, and
// every word of the side, type, result and period columns with its count and what it maps to.
// The app's mapping assistant is built on this (docs/import.md "The mapping assistant"); the
// guesses are only a start: the person confirms each.

#include "importprofile.h"
#include "matchreader.h"
#include "table.h"

#include <nlohmann/json.hpp>

#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

/// How a table's bytes seem to be written.
struct TableGuess {
    TableFormat format;
    TextEncoding encoding = TextEncoding::Utf8;
    char decimal = '.';
};

/// Sniffs the layout (a JSON array, JSON Lines, or delimited text and its delimiter: the one of
/// `,` `;` tab `|` splitting the first lines most evenly), the encoding (UTF-8 when valid, else
/// Windows-1252, which reads Latin-1's letters the same), whether the first row is a header
/// (no cell of it is a number) and a decimal comma (cells like "12,5" with another delimiter).
TableGuess guessTableFormat(std::string_view bytes);

/// One column of a table, for a person to recognise it.
struct ColumnLook {
    std::string name;
    std::vector<std::string> samples; ///< the first distinct non-empty values
    std::size_t filled = 0;           ///< rows with a value
    std::size_t distinct = 0;         ///< distinct values (counted up to 1,000)
    bool numeric = false;             ///< every value is a number
    bool clock = false;               ///< every value looks like m:ss or h:mm:ss
    double min = 0, max = 0;          ///< of the numbers, when numeric
};
std::vector<ColumnLook> lookAtColumns(const Table& table, char decimal, std::size_t samples = 3);

/// The roles a column can have: our event fields, then match details read from a column.
/// Match details are written "match.id", "match.date", "match.opponent", "match.venue".
const std::vector<std::string>& columnRoles();

/// A first profile for a table: roles from the column names and values (our own word lists,
/// docs/import.md), the time form from the values, the coordinate extent from the largest
/// x and y, the side value that is `ourName` (or reads "us"), and every type or result word
/// that is one of our own words (either format version, any case, spaces for underscores).
MappingProfile draftProfile(const Table& table, const TableGuess& guess, const std::string& ourName);

/// A zone label's pattern from one label: "B2-L5" → "B{band}-L{lane}" (the first two runs of
/// digits); empty when the label has fewer than two.
std::string guessZonePattern(const std::string& label);

/// Sets `column` to hold `role` (one of columnRoles(), or "" for none) and takes the role
/// from any other column that held it.
void assignRole(MappingProfile& profile, const std::string& column, const std::string& role);
/// The role a column holds in the profile, "" when none.
std::string roleOf(const MappingProfile& profile, const std::string& column);

/// One word of a column the profile reads words from.
struct WordUse {
    std::string field;  ///< side, type, result, period, zone or to_zone
    std::string column; ///< the table's column
    std::string word;
    int count = 0;
    std::vector<std::size_t> lines; ///< the first few lines where it appears
    /// What it maps to now: for types "pass" or "shot/scored" (type/result) or "skip"; for
    /// results ours; for sides "us" or "opp"; for periods the number; for zone labels
    /// "band,lane"; empty when unmapped.
    std::string ours;
};

/// Every word of the profile's side, type, result and period columns (periods: only words
/// that are not a number), most frequent first within each field, with what it maps to.
std::vector<WordUse> vocabulary(const Table& table, const MappingProfile& profile);

/// Maps one word of `field` to `ours` (as in WordUse::ours; "" unmaps it). Returns false when
/// `ours` is not a meaning of that field.
bool mapWord(MappingProfile& profile, const std::string& field, const std::string& word,
             const std::string& ours);

/// The choices for a type word, as WordUse::ours writes them: each of our event types, a shot
/// with each of its results, and "skip".
const std::vector<std::string>& typeChoices();

/// A draft tried on a file: what ingest would say, and a preview of what it maps so far.
struct DraftCheck {
    Problems profileErrors; ///< the draft is not yet a profile (a needed column has no role...)
    Problems errors;        ///< the file cannot be loaded with it (table terms: line, column)
    Problems warnings;      ///< sanity checks
    int matches = 0;        ///< matches the file holds with this draft
    /// The first match as far as it maps now (preview mode: placeholders for missing details,
    /// unmapped rows left out), read into our frame; nullopt when nothing maps yet.
    std::optional<Match> preview;
    bool ready() const { return profileErrors.empty() && errors.empty() && matches > 0; }
};
DraftCheck checkDraft(std::string_view bytes, const MappingProfile& profile, const MatchDetails& details,
                      const std::string& fileName);

/// The profile as the JSON document parseProfile reads (our format version 2 words).
nlohmann::json toJson(const MappingProfile& profile);

} // namespace pitchloop::model
