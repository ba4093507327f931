#pragma once
// Season targets per metric and zone (or the whole pitch), kept as an effective-dated history:
// an edit never overwrites, it adds a version that takes effect on its date.

#include "metricspec.h"
#include "problem.h"

#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

enum class Direction { AtLeast, AtMost };

/// Which target: a squad's season, a metric, a zone (band 0 / lane 0 = the whole pitch).
struct TargetKey {
    std::string squad = "First team";
    std::string season; ///< e.g. "2026-27"
    std::string metric;
    int band = 0;
    int lane = 0;

    bool wholePitch() const { return band == 0 && lane == 0; }
    bool operator==(const TargetKey&) const = default;
};

/// One version of a target. `value` is in the metric's own unit: a share (0–1) for rates,
/// a number per match for counts, a number per exposure event for exposures.
struct Target {
    TargetKey key;
    Direction direction = Direction::AtLeast;
    double value = 0;
    double watchMargin = 0; ///< how far on the good side of `value` a zone is still watched
    long minSample = 0;     ///< below this denominator in a window: too little data
    std::string author;
    std::string rationale;
    std::string effectiveFrom; ///< ISO date from which this version is in force
    std::string recordedAt;    ///< when it was written down (ISO date-time, UTC)
    bool retired = false;      ///< a version that ends the target from its date
    long long version = 0;     ///< storage id; 0 before it is stored
};

/// The direction a target takes when none is given: the metric's better side.
Direction defaultDirection(const MetricSpec& metric);

/// Default watch margin and minimum sample for a metric kind (docs/statistics.md).
double defaultWatchMargin(MetricKind kind);
long defaultMinSample(MetricKind kind);

/// Whether `s` names a season under the July–June convention, e.g. "2026-27".
bool isSeasonName(const std::string& s);

std::string_view toString(Direction d);
std::optional<Direction> directionFromString(std::string_view s);

/// The version in force on `date` among versions of one key: the latest effective on or
/// before it (ties: the latest recorded); nullopt when none is, or the one in force is retired.
std::optional<Target> inForce(const std::vector<Target>& versions, const std::string& date);

/// Whether `value` is on the wrong side of a target.
bool misses(const Target& t, double value);

/// The versions of `incoming` not already stored (same key, rule, author, dates and
/// rationale): importing the same file twice adds nothing.
std::vector<Target> newVersionsOnly(const std::vector<Target>& stored,
                                    const std::vector<Target>& incoming);

/// Targets file (docs/targets.md): {"format": "pitchloop-targets", "version": 1,
/// "targets": [...]}. Metric ids are checked against `metrics`; zones against the grid size.
struct TargetFileResult {
    std::vector<Target> targets;
    Problems errors;
};
TargetFileResult parseTargetFile(std::string_view jsonText, const std::string& source,
                                 const std::vector<MetricSpec>& metrics, int bands, int lanes);
std::string writeTargetFile(const std::vector<Target>& targets);

} // namespace pitchloop::model
