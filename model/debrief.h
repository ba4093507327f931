#pragma once
// A match judged against the season's targets: what slipped in the match and over the window,
// what is new since the previous match and what recovered.

#include "status.h"

#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

struct DebriefItem {
    ZoneStatus now;
    std::optional<FlagState> before; ///< state in the same window after the previous match
    double gap = 0; ///< how far the value is on the wrong side of the target (metric units)
};

struct Debrief {
    std::string matchId;
    std::string previousMatchId; ///< empty for a season's first match
    Window window;               ///< the judged window
    std::vector<DebriefItem> slippedInMatch;  ///< off target on this match alone
    std::vector<DebriefItem> slippedInWindow; ///< off target over the window
    std::vector<DebriefItem> newSlips;        ///< off target over the window, not before
    std::vector<DebriefItem> recovered;       ///< off, likely off or close before; on target now
    std::vector<DebriefItem> watched;         ///< likely off or close to the line over the window
    /// Per-match count targets cannot be judged on one match (too little data), but one match
    /// can be unusual for a team on its target: those whose single-match tail (matchTail) is at
    /// most kUnusualMatchTail, most unusual first.
    std::vector<DebriefItem> unusualInMatch;
    int judged = 0;         ///< zones with a target and enough data in the window
    int tooLittleData = 0;  ///< zones with a target but too little data in the window
    double chanceFlags = 0; ///< off-target flags chance alone would give at this one look
    /// Zones chance alone would flag off at least once over the season among the judged (the
    /// figure a coach is shown; bounded by the season's alarm budget).
    double seasonChanceFlags = 0;
    double offThreshold = 0;    ///< the threshold in force (from the alarm budget)
    int seriesWithTargets = 0;  ///< (metric, zone) series with a target, across the board
};

/// A match a team exactly on its per-match target has about once in a hundred matches or less.
inline constexpr double kUnusualMatchTail = 0.01;

/// Judges match `focal` of a season. Lists are ordered by how sure (pMiss, highest first),
/// then by how large (gap).
Debrief buildDebrief(const SeasonTallies& season, std::size_t focal,
                     const std::vector<MetricSpec>& metrics, const std::vector<Target>& targets,
                     const ZoneGrid& grid, const FlagSettings& settings);

} // namespace pitchloop::model
