#pragma once
// Spreadsheet exports (docs/exports.md): CSV after RFC 4180 with formula cells neutralised,
// for zone statuses and stored tallies. The command line and the desktop app write the same
// bytes.

#include "repository.h"
#include "status.h"

#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

/// One CSV text field (RFC 4180): quoted when it holds a comma, a quote or a line break, with
/// "" for a quote inside. A text that a spreadsheet would run as a formula — it starts with
/// =, +, -, @, a tab or a carriage return — gets a leading apostrophe and is quoted, so it
/// shows as text (the apostrophe is the usual spreadsheet mark for "this is text").
/// Only text goes through here; numbers the program writes are written as they are.
std::string csvField(std::string_view text);

/// True when csvField would neutralise `text`.
bool looksLikeFormula(std::string_view text);

/// A number for CSV and JSON-like text: up to six significant digits ("%.6g"), "" for NaN.
std::string csvNumber(double value);

/// The header of statusCsv, one line without the line break.
inline constexpr std::string_view kStatusCsvHeader =
    "match_id,metric,band,lane,window,num,den,value,low,high,level,target,state,p_miss,"
    "direction,matches,p_value,chance_off,bh_rejected,effective_num,effective_den,dispersion,"
    "off_threshold,match_tail";

/// Zone statuses of one match as CSV: the header, then one record a status, each ended by
/// CRLF as RFC 4180 asks (docs/cli.md describes the columns).
std::string statusCsv(const std::string& matchId, const std::vector<ZoneStatus>& statuses);

inline constexpr std::string_view kTalliesCsvHeader = "match_id,metric,band,lane,num,den";

/// Stored tallies as CSV (header, then one record a row, CRLF line ends).
std::string talliesCsv(const std::vector<TallyRow>& rows);

/// The windows a match's statuses are shown and exported in when none are asked for: this
/// match, the club's judged window, the season so far and the EWMA, each once.
std::vector<Window> defaultStatusWindows(const FlagSettings& settings);

/// Writes `bytes` to `path` through a temporary file beside it and a rename, so the file is
/// either the old one or the whole new one. Throws IoError naming the path when it cannot.
void writeFileAtomically(const std::string& path, const std::string& bytes);

} // namespace pitchloop::model
