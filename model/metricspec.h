#pragma once
// Metric definitions as data (docs/metrics.md): what is counted, where it is binned, what
// counts as success, and what it is divided by. The built-in metrics use the same spec.

#include "problem.h"
#include "types.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

/// Side as a selector sees it: absolute, or relative to the item being judged.
enum class SideRef { Any, Us, Opp, Same, Other };

/// Which events a part of a metric looks at.
struct EventSelector {
    SideRef side = SideRef::Any;
    std::vector<EventType> types;  ///< empty: any type
    std::vector<Result> results;   ///< empty: any result
    std::optional<bool> givesControl;
    std::vector<std::string> tagsAny;
    std::vector<std::string> tagsAll;
    std::vector<std::string> tagsNone;

    /// `itemSide` resolves Same/Other; the item's own side.
    bool matches(const Event& e, Side itemSide) const;
};

/// The location that is binned into a zone.
enum class Place { Start, End, LossPlace };

/// The things a metric counts: events, or derived losses of one side.
struct ItemSpec {
    bool losses = false;
    Side lossesOf = Side::Us;      ///< when `losses`
    EventSelector select;          ///< when not `losses`
    Place at = Place::Start;
};

/// When an item counts in the numerator.
struct SuccessSpec {
    enum class Kind { Always, Is, FollowedBy };
    Kind kind = Kind::Always;
    EventSelector is;                    ///< Kind::Is: the item itself matches
    std::vector<EventSelector> anyOf;    ///< Kind::FollowedBy: a later event matches one of these
    double withinS = 0;                  ///< ... within this many seconds of the anchor
    bool sameTime = true;                ///< ... counting events at exactly the anchor's time
    bool censor = true;                  ///< drop unresolved items near a period's end
};

enum class Better { Higher, Lower };

/// How values are read: a share of items, a count per match, or a count per exposure.
enum class MetricKind { Rate, Count, Exposure };

struct MetricSpec {
    std::string id;
    std::string name;
    std::string question;
    /// The coach's sentence for one zone (optional): a template with {zone}, {value} and
    /// {window}, e.g. "we lost the ball in {zone} {value} times a match {window}"
    /// (model/wording.h). Without one the sentence is built from the name.
    std::string sentence;
    Better better = Better::Higher;
    ItemSpec items;
    SuccessSpec success;
    enum class Per { Items, Match, Events };
    Per per = Per::Items;
    ItemSpec perEvents; ///< when per == Events: the exposure events, binned at their own place
    std::string json;   ///< the spec as written (compact JSON), stored in the club file

    MetricKind kind() const;
};

struct SpecResult {
    std::optional<MetricSpec> spec;
    Problems errors;
};

/// Parses and validates one metric spec object given as JSON text. `source` names where it
/// came from in problems (a file name, or "built-in").
SpecResult parseMetricSpec(std::string_view jsonText, const std::string& source);

/// Parses a metrics file: {"format": "pitchloop-metrics", "version": 1, "metrics": [...]} or a
/// single metric object.
std::pair<std::vector<MetricSpec>, Problems> parseMetricFile(std::string_view jsonText,
                                                             const std::string& source);

/// The seven built-in metrics (model/metrics/builtin.json).
const std::vector<MetricSpec>& builtinMetrics();

std::string_view toString(MetricKind k);
std::string_view toString(Better b);

} // namespace pitchloop::model
