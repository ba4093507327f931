#pragma once
// Two sets of a season's matches compared zone by zone on one map (docs/statistics.md,
// "Comparing two sets of matches"): before and from a date, home and away, one opponent and the
// rest. Each side is pooled on its own (pooling.h); the difference map carries its own
// uncertainty, so the staff do not compare two maps by eye.

#include "pooling.h"
#include "repository.h"
#include "status.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

/// How a season's matches are split: `first` and `second` are the two sides.
struct MatchSplit {
    enum class Kind { Date, Venue, Opponent };
    Kind kind = Kind::Venue;
    std::string value; ///< Date: the second side's first day; Opponent: the opponent's name
};

/// "date:2026-10-01", "venue" (home, then away) or "opponent:NAME"; nullopt otherwise.
std::optional<MatchSplit> parseSplit(std::string_view text);

struct ZoneDifference {
    int band = 0;
    int lane = 0;
    PooledZone first;
    PooledZone second;
    double difference = std::numeric_limits<double>::quiet_NaN(); ///< second − first (pooled)
    stats::Interval interval{std::numeric_limits<double>::quiet_NaN(), std::numeric_limits<double>::quiet_NaN()};
    double probSecondHigher = std::numeric_limits<double>::quiet_NaN(); ///< P(second's true value > first's)
};

struct Comparison {
    std::string firstLabel;  ///< "home", "before 1 Oct 2026", "Duneford City"
    std::string secondLabel; ///< "away", "from 1 Oct 2026", "the rest"
    std::vector<std::string> firstMatches;
    std::vector<std::string> secondMatches;
    std::vector<ZoneDifference> zones; ///< grid order
    std::string problem;               ///< in words, when a side has no match; then no zones
};

/// Compares the matches of `season` (its matches, with `summaries` in the same order) split by
/// `split`, for one metric on `grid`. Each side's zones are summed over its matches and turned
/// into effective counts with the metric's match-to-match variation (estimated on the whole
/// season, as the flags do); each side is pooled on its own, and the difference's interval and
/// P(second higher) use the normal approximation with the two posteriors' SDs (independent
/// sides). `level` is the interval's.
Comparison compareSplit(const SeasonTallies& season, const std::vector<MatchSummary>& summaries,
                        const MetricSpec& metric, const ZoneGrid& grid, const MatchSplit& split,
                        const FlagSettings& settings);

} // namespace pitchloop::model
