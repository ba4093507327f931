#pragma once
// What a count map is read per (docs/statistics.md, "Per what"): a match, 90 minutes, 100 of
// the opponent's passes, or each zone's share of the pitch's total. The flags always judge the
// per-match count against its target; a scale changes what a map shows.

#include "pooling.h"
#include "status.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

enum class CountScale { PerMatch, Per90, PerOpponentPasses, ShareOfTotal };

std::string_view toString(CountScale s);              ///< "match", "per90", "per_opponent_passes", "share"
std::optional<CountScale> countScaleFromString(std::string_view s);
/// In words after a value: "a match", "per 90 minutes", "per 100 of their passes", "of the
/// pitch's total".
std::string scaleWords(CountScale s);

/// What a match exposes a count to: the minutes played and the opponent's passes.
struct MatchExposure {
    double minutes = 0;
    long opponentPasses = 0;
};

/// A window's exposure per match in the scale's unit (90 minutes, or 100 of their passes),
/// weighted as windowSum weighs the window's matches (the EWMA's weights); 1 for PerMatch and
/// ShareOfTotal. `exposures` are the season's matches in order, `focal` the window's last.
double exposurePerMatch(const std::vector<MatchExposure>& exposures, std::size_t focal, const Window& window,
                        CountScale scale);

/// One zone's effective counts on the scale, from its per-match status and the whole pitch's
/// in the same window: per 90 and per 100 passes divide by the exposure (the den becomes
/// matches × exposure per match); a share is the zone's count of the pitch's total, each scaled
/// by the zone's design effect (effective over raw), read as a rate.
ZoneCount scaledCount(const ZoneStatus& zone, const ZoneStatus& wholePitch, CountScale scale, double exposure);
/// The kind to pool and print a scaled count as: a count, or a rate for a share.
MetricKind scaledKind(CountScale scale);

} // namespace pitchloop::model
