#pragma once
// Windows, intervals and target flags for every zone of every metric at one match: the
// numbers behind `status` and `debrief` (docs/statistics.md).

#include "metricengine.h"
#include "metricspec.h"
#include "stats.h"
#include "targets.h"
#include "variation.h"
#include "zones.h"

#include <nlohmann/json_fwd.hpp>

#include <limits>
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

/// Numerator and denominator summed over a window (weighted for the EWMA), and the same
/// window in effective chances once match-to-match variation is allowed for.
struct WindowSum {
    double num = 0;
    double den = 0;
    int matches = 0;
    /// The window's information in pure-noise units: den_eff = (Σ w·d)² / Σ w²·d·D, with D
    /// each match's design effect (variation.h), num_eff = value · den_eff. Equal to num/den
    /// for last-N, match and season windows without variation.
    double effNum = 0;
    double effDen = 0;
};

/// What the effective counts of a window allow for: the metric's kind, its dispersion
/// (rho or phi; 0 = pure binomial / Poisson noise) and, for counts, the mean rate per unit of
/// exposure the design effect is computed at.
struct WindowVariation {
    MetricKind kind = MetricKind::Rate;
    double dispersion = 0;
    double mean = 0;
};

/// The index of a window's first match when it ends at match `focal`: the match itself, the
/// last N (fewer at the season's start), or the season's first (the season and the EWMA).
std::size_t windowStart(std::size_t focal, const Window& w);

/// Sums one zone's per-match tallies over the window ending at `focal` (inclusive).
/// The EWMA weighs match t by λ(1 − λ)^(focal − t) over the real matches only (no pseudo-match
/// at the target: a prior is used once, in the evidence), so its value is Σw·x / Σw·d — a
/// match with one chance weighs less than one with thirty. Its weighted sums are then scaled to
/// effective counts (Kish: Σw·d / Σw²·d), so intervals and posteriors reflect how much data the
/// weights really carry; the value num/den is unchanged by the scaling.
WindowSum windowSum(const std::vector<ZoneTally>& series, std::size_t focal, const Window& w,
                    const WindowVariation& variation = {});

enum class IntervalMethod { Wilson, Jeffreys };

/// Club-wide choices behind the flags; documented defaults (docs/statistics.md).
struct FlagSettings {
    double level = 0.90;                 ///< confidence of the intervals shown
    IntervalMethod rateInterval = IntervalMethod::Wilson;
    Window window{Window::Kind::LastN, 5, 0.3}; ///< the window a debrief judges
    /// P(wrong side of target) for "off target" when no season budget is set
    /// (falseFlagsPerSeason 0); with a budget the threshold is derived from it.
    double offThreshold = 0.999;
    double watchThreshold = 0.50;        ///< P(short of the watch line) for "close to the line"
    bool fdr = false;                    ///< also require Benjamini–Hochberg rejection
    double fdrQ = 0.10;                  ///< false discovery rate for that
    /// The season's alarm budget: about this many false off-target flags a season across the
    /// whole board (every metric and zone with a target), each on-target zone at most 5 %.
    /// 0 switches the budget off and `offThreshold` applies as set.
    double falseFlagsPerSeason = 1;
    int seasonMatches = 38;              ///< looks a season: one per match
    bool matchVariation = true;          ///< allow for match-to-match variation (variation.h)
    VariationPrior variationPrior;
};

/// The off-target threshold in force: with a budget B over m judged series and L looks a
/// season, 1 − min(0.05, B/m) / L (a union bound over the looks; docs/statistics.md);
/// without one, `offThreshold`.
double offThresholdFor(const FlagSettings& s, int seriesWithTargets);

/// The share of one series' season allowed to be falsely flagged: min(0.05, B/m), or, with
/// no budget, (1 − offThreshold)·L.
double seriesAlarmShare(const FlagSettings& s, int seriesWithTargets);

/// The states of a zone, each with one meaning (docs/statistics.md):
/// - OnTarget: probably on the good side, with the margin;
/// - CloseToLine: probably on the good side of the target, but not of the watch line (inside
///   the margin);
/// - LikelyOff: more likely than not past the target, not yet certain enough to flag;
/// - OffTarget: past the target beyond the season's alarm budget;
/// - TooLittleData, NoTarget.
enum class FlagState { OnTarget, CloseToLine, LikelyOff, OffTarget, TooLittleData, NoTarget };
std::string_view toString(FlagState s);
std::optional<FlagState> flagStateFromString(std::string_view s);

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
    double pValue = 1;  ///< one-sided p-value against the target, on effective counts (BH)
    double chanceOff = 0; ///< probability of "off target" at this look if the truth sat on the target
    bool bhRejected = false;
    double offThreshold = 0; ///< the threshold the state was judged with
    double dispersion = 0;   ///< rho or phi the effective counts allow for (0: none)
    /// For a per-match count judged on one match (too little data to judge the target): how
    /// unusual this match alone would be for a team exactly on its target — P(a match this far
    /// past it or further), negative binomial with the dispersion. NaN otherwise.
    double matchTail = std::numeric_limits<double>::quiet_NaN();
    /// The zone's value pooled toward its neighbours and the whole pitch (pooling.h,
    /// poolStatuses), with its interval at `level` and the zone's own data's share of it; NaN
    /// until a map asks for it. Never for the whole pitch.
    double pooled = std::numeric_limits<double>::quiet_NaN();
    stats::Interval pooledInterval{std::numeric_limits<double>::quiet_NaN(),
                                   std::numeric_limits<double>::quiet_NaN()};
    double pooledWeight = std::numeric_limits<double>::quiet_NaN();
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

/// One zone's status as JSON, every number (null where it does not exist): what `status
/// --format json` prints and what a focus freezes as its evidence (docs/cli.md).
nlohmann::json toJson(const ZoneStatus& s);

/// How many zones would be flagged off target by chance alone at this look if every true value
/// sat exactly on its target: the sum of `chanceOff` over zones that have a target and enough
/// data.
double expectedChanceFlags(const std::vector<ZoneStatus>& statuses);

/// The season's figure: how many of these zones chance alone would flag off target at least
/// once in a season of `settings.seasonMatches` looks, bounded by the alarm budget (the sum
/// over judged zones of min(1, looks·chanceOff), each at most the series' alarm share).
double seasonChanceFlags(const std::vector<ZoneStatus>& statuses, const FlagSettings& settings,
                         int seriesWithTargets);

/// The number of (metric, zone) series with a target in force on `date`, across the board.
int seriesWithTargets(const std::vector<Target>& targets, const std::string& date);

} // namespace pitchloop::model
