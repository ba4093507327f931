#pragma once
// Windows, intervals and target flags for every zone of every metric at one match: the
// numbers behind `status` and `debrief` (docs/statistics.md).

#include "metricengine.h"
#include "metricspec.h"
#include "stats.h"
#include "targets.h"
#include "zones.h"

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

/// Which matches a value is computed over, always ending at the match in question.
struct Window {
    enum class Kind { Match, LastN, Season, Ewma };
    Kind kind = Kind::LastN;
    int n = 5;           ///< LastN
    double lambda = 0.3; ///< Ewma weight of the newest match

    /// "match", "last5", "season", "ewma0.3".
    std::string name() const;
    static std::optional<Window> parse(std::string_view text);
    bool operator==(const Window&) const = default;
};

/// Numerator and denominator summed over a window (weighted for the EWMA).
struct WindowSum {
    double num = 0;
    double den = 0;
    int matches = 0;
};

/// Sums one zone's per-match tallies over the window ending at `focal` (inclusive).
/// The EWMA weighs match t by λ(1 − λ)^(focal − t) and seeds the recursion with a pseudo-match
/// at the target (`seed`, the value the EWMA starts from) whose denominator is the mean
/// denominator of the matches so far, weight (1 − λ)^(focal + 1). For per-match counts
/// (den 1 a match) this is exactly z_t = λ x_t + (1 − λ) z_{t−1} with z_0 = seed, the
/// convention of the NIST/SEMATECH e-Handbook §6.3.2.4. The EWMA's weighted sums are then
/// scaled to effective counts (Kish), so intervals and posteriors reflect how much data the
/// weights really carry; the value num/den is unchanged by the scaling.
WindowSum windowSum(const std::vector<ZoneTally>& series, std::size_t focal, const Window& w,
                    double seed);

enum class IntervalMethod { Wilson, Jeffreys };

/// Club-wide choices behind the flags; documented defaults (docs/statistics.md).
struct FlagSettings {
    double level = 0.90;                 ///< confidence of the intervals shown
    IntervalMethod rateInterval = IntervalMethod::Wilson;
    Window window{Window::Kind::LastN, 5, 0.3}; ///< the window a debrief judges
    double offThreshold = 0.999;         ///< P(wrong side of target) for "off target"
    double watchThreshold = 0.50;        ///< P(wrong side of the watch line) for "watch"
    bool fdr = false;                    ///< also require Benjamini–Hochberg rejection
    double fdrQ = 0.10;                  ///< false discovery rate for that
};

enum class FlagState { OnTarget, Watch, OffTarget, TooLittleData, NoTarget };
std::string_view toString(FlagState s);

/// A zone's value in one window, its interval, and how it stands against its target.
struct ZoneStatus {
    std::string metric;
    int band = 0; ///< 0 with lane 0: the whole pitch
    int lane = 0;
    Window window;
    WindowSum sum;
    double value = 0;
    stats::Interval interval{0, 0};
    double level = 0;
    std::optional<Target> target;
    FlagState state = FlagState::NoTarget;
    double pMiss = 0;   ///< posterior probability the true value is on the wrong side
    double pValue = 1;  ///< one-sided exact p-value against the target (for BH)
    double chanceOff = 0; ///< probability of "off target" here if the truth sat on the target
    bool bhRejected = false;
};

/// A season of one squad up to the match in question: match dates in order and, per metric,
/// one dense tally per match.
struct SeasonTallies {
    std::vector<std::string> matchIds;
    std::vector<std::string> dates;
    std::map<std::string, std::vector<MatchTally>> byMetric;
};

/// Everything `status` shows for match `focal` (index into the season): every metric, every
/// zone and the whole pitch, in each requested window. Targets are all stored versions; the
/// one in force on the match's date is used.
std::vector<ZoneStatus> computeStatus(const SeasonTallies& season, std::size_t focal,
                                      const std::vector<MetricSpec>& metrics,
                                      const std::vector<Target>& targets, const ZoneGrid& grid,
                                      const std::vector<Window>& windows,
                                      const FlagSettings& settings);

/// How many zones would be flagged off target by chance alone if every true value sat exactly
/// on its target: the sum of `chanceOff` over zones that have a target and enough data.
double expectedChanceFlags(const std::vector<ZoneStatus>& statuses);

} // namespace pitchloop::model
