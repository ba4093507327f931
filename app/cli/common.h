#pragma once
// What every verb of the command line shares: the club file, "today", number parsing.

#include "repository.h"

#include <nlohmann/json_fwd.hpp>

#include <memory>
#include <optional>
#include <ostream>
#include <string>

namespace pitchloop::cli {

struct Globals {
    std::string db;
};

/// The club file when --db is not given: $PITCHLOOP_DB, else the user's data folder.
std::string defaultClubFile();

/// Opens (creating folders and file when missing) the club file.
std::unique_ptr<model::ClubRepository> openClub(const Globals& g);

/// Today's date (ISO). $PITCHLOOP_TODAY overrides the clock, so scripts and tests can replay
/// a season; the model never reads the clock itself.
std::string today();
/// Now as an ISO 8601 UTC date-time (for "recorded at").
std::string nowUtc();

/// Reads "0.45", "45%" (→ 0.45) or "2.5"; nullopt when it is not a number.
std::optional<double> parseNumber(const std::string& text);

/// Reads "B,L" into a zone; nullopt when malformed.
std::optional<model::Zone> parseZone(const std::string& text);

/// A zone of `grid` as the app and the sheets name it: "our left-back area (B2·L5)", "whole
/// pitch" (model/zonenames.h).
std::string zoneName(int band, int lane, const model::ZoneGrid& grid);

/// Writes `bytes` to `path` all at once (a temporary file beside it, renamed), or to `out` when
/// `path` is "-"; says "wrote WHAT to PATH" on `err`. The exit code: 0, or 2 naming the path when
/// it cannot be written.
int deliverFile(const std::string& path, const std::string& bytes, const std::string& what, std::ostream& out,
                std::ostream& err);

/// A value in its metric's unit for people, as everywhere (model/wording.h): "45.2%", "6.8",
/// "0.15"; "–" without one.
std::string formatValue(model::MetricKind kind, double value);

} // namespace pitchloop::cli
