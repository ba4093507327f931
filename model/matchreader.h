#pragma once
// Reads match files (format v1, docs/match-format.md) into matches in our frame.

#include "problem.h"
#include "types.h"

#include <nlohmann/json_fwd.hpp>

#include <filesystem>
#include <map>
#include <optional>
#include <string>
#include <string_view>

namespace pitchloop::model {

/// The format's name and the versions this reader understands.
inline constexpr std::string_view kMatchFormat = "pitchloop-match";
/// The newest match format version (our own event words); version 1 is read too.
inline constexpr int kMatchFormatVersion = 2;

/// Pitch sizes allowed by the Laws of the Game, Law 1 (touchline 90–120 m, goal line 45–90 m).
inline constexpr double kMinLengthM = 90, kMaxLengthM = 120;
inline constexpr double kMinWidthM = 45, kMaxWidthM = 90;

struct ReadOptions {
    /// Positions at most this far outside the lines are clamped onto the pitch.
    double clampMarginM = 3.0;
    /// User mapping of foreign event type names onto ours, e.g. {"dribble": Carry}.
    std::map<std::string, EventType, std::less<>> typeMap;
    /// Stop collecting errors after this many (the file is bad either way).
    std::size_t maxErrors = 25;
};

struct ReadResult {
    std::optional<Match> match; ///< set only when there are no errors
    Problems errors;
    Problems warnings;
    bool ok() const { return match.has_value(); }
};

/// Parses one match from JSON text; `fileName` is only used in problems.
ReadResult parseMatch(std::string_view text, const std::string& fileName,
                      const ReadOptions& options = {});

/// The same from a parsed JSON document (a mapped table, which need not be written out).
ReadResult parseMatchDocument(const nlohmann::json& root, const std::string& fileName,
                              const ReadOptions& options = {});

/// Reads and parses a file; an unreadable file is reported as a problem, not thrown.
ReadResult readMatchFile(const std::filesystem::path& path, const ReadOptions& options = {});

/// Reads a whole file into a string; throws IoError when it cannot.
std::string readFileBytes(const std::filesystem::path& path);

/// Converts a point given in `frame` for an event of `side` in `period` into our frame.
/// `usAttack` maps period numbers to +1 (we attack +x) or -1, used by the ground frame.
Point toOurFrame(Point p, Frame frame, Side side, int period, const Pitch& pitch,
                 const std::map<int, int>& usAttack);

} // namespace pitchloop::model
