#pragma once
// Focuses: a slipped target turned into training work (metric, zones, frozen evidence, drills),
// and the follow-up review that asks whether the metric moved.

#include "problem.h"
#include "repository.h"
#include "stats.h"
#include "status.h"

#include <optional>
#include <string>
#include <vector>

namespace pitchloop::model {

enum class FocusState { Open, DueForReview, Closed };
std::string_view toString(FocusState s);

/// The coach's word on a focus after its review (our own small set).
enum class Verdict { Worked, Partly, NoChange, CantTell };
std::string_view toString(Verdict v);
std::optional<Verdict> verdictFromString(std::string_view s);

struct Focus {
    std::int64_t id = 0;
    std::string squad;
    std::string season;
    std::string metric;
    std::vector<Zone> zones;
    std::string openedAfterMatch; ///< the match whose flag opened it
    std::string startDate;        ///< training on it starts; the review's "after" starts here
    int reviewAfterMatches = 5;   ///< review point: after this many matches from the start...
    std::string reviewOn;         ///< ...or on this date, when set
    std::string evidence;         ///< the flag's numbers at opening, JSON, never recomputed
    std::string note;
    std::string openedBy;
    std::string openedAt;
    std::string closedAt;         ///< empty while open
    std::string verdict;          ///< empty while open
    std::string verdictNote;
    std::vector<std::int64_t> drills;
    /// The grid `zones` are on: the club's grid when the focus was opened (FocusStore sets
    /// it). After a grid change it differs from the club's; reviews count on this one.
    ZoneGrid grid;
};

/// Open, due for review (the review point is reached), or closed.
FocusState focusState(const Focus& f, int matchesSinceStart, const std::string& today);

/// Matches of the season played on or after `startDate` and, when `until` is given, on or
/// before it (today: a match dated later has not been played). ISO dates compare as text.
int matchesSince(const SeasonTallies& season, const std::string& startDate,
                 const std::string& until = {});

/// The season's matches played on or before `lastDay` (a match dated later has not been
/// played yet: a review computed today never looks at it).
SeasonTallies playedBy(const SeasonTallies& season, const std::string& lastDay);

/// The calendar day after an ISO date (a focus's default start: the day after its match).
std::string dayAfter(const std::string& isoDate);

/// One zone's flag at the match that opened a focus, as frozen in its evidence: one entry per
/// zone (or the whole pitch, band 0 lane 0) and window.
struct EvidenceZone {
    int band = 0;
    int lane = 0;
    std::string window; ///< Window::name(): "match", "last5", "season", ...
    double num = 0;
    double den = 0;
    int matches = 0;
    double value = 0;   ///< NaN when the window had nothing to count
    double low = 0;
    double high = 0;
    double level = 0;
    FlagState state = FlagState::NoTarget;
    double pMiss = 0;   ///< NaN when not judged
    std::optional<Target> target; ///< direction, value, watch margin, author, effective date
};

/// The numbers that open a focus, frozen with it and never recomputed.
struct FocusEvidence {
    std::string matchId;
    std::string date;
    std::string frozenAt;
    std::vector<EvidenceZone> zones;
    /// Some wanted zone is off target or watched over the club's judged window. A focus may be
    /// opened without a slip; the caller says so.
    bool slipped = false;
    std::string json; ///< what Focus::evidence stores (docs/reviews.md)
};

/// Freezes the evidence of a focus on `zones` of `metric` opened after match `focal` of
/// `season`: every zone's status in the match alone, the club's judged window and the season
/// so far. With `wholePitch` the whole-pitch status is taken instead of the zones'.
FocusEvidence focusEvidence(const SeasonTallies& season, std::size_t focal,
                            const MetricSpec& metric, const std::vector<Target>& targets,
                            const ZoneGrid& grid, const FlagSettings& settings,
                            const std::vector<Zone>& zones, bool wholePitch,
                            const std::string& frozenAt);

/// Reads stored evidence back; numbers the JSON holds as null come back as NaN, and `slipped`
/// looks at the entries of `judgedWindow` (a Window::name()). Throws nlohmann::json exceptions
/// on a damaged text.
FocusEvidence readEvidence(const std::string& json, const std::string& judgedWindow);

/// Focus storage on the club file (tables focus, focus_drill, review).
class FocusStore {
public:
    explicit FocusStore(ClubRepository& repo) : m_repo(repo) {}

    /// Opens a focus, freezing `evidence` (JSON). Drill ids must exist and be live.
    std::int64_t open(const Focus& f, const std::string& now);
    std::optional<Focus> get(std::int64_t id) const;
    std::vector<Focus> list() const;
    void linkDrill(std::int64_t focus, std::int64_t drill, const std::string& now);
    bool unlinkDrill(std::int64_t focus, std::int64_t drill);
    /// Closes a focus with a verdict and stores the review numbers with it, in one transaction.
    void close(std::int64_t focus, Verdict verdict, const std::string& note, const std::string& by,
               const std::string& reviewJson, const std::string& now);
    /// Stored reviews of a focus: (computed_at, numbers JSON, verdict, note, by), oldest first.
    struct StoredReview {
        std::string computedAt;
        std::string numbers;
        std::string verdict;
        std::string note;
        std::string by;
    };
    std::vector<StoredReview> reviews(std::int64_t focus) const;
    bool drillExists(std::int64_t drill) const;

private:
    ClubRepository& m_repo;
};

/// One side (before or after) of a review: the matches and their summed tally over the zones.
struct ReviewWindow {
    std::vector<std::string> matchIds;
    std::vector<std::string> dates;
    std::vector<long> num; ///< per match, summed over the focus zones
    std::vector<long> den; ///< per match (1 per match for counts)
    long totalNum = 0;
    long totalDen = 0;
    double value = 0;
    stats::Interval interval{0, 0};
};

struct ChartPoint {
    std::string matchId;
    bool after = false;
    double value = 0;
    double centre = 0;
    double lcl = 0;
    double ucl = 0;
    bool above = false;
    bool below = false;
    double ewma = 0;
};

/// Every number of a follow-up review (docs/reviews.md).
struct Review {
    std::int64_t focusId = 0;
    std::string metric;
    MetricKind kind = MetricKind::Rate;
    Better better = Better::Higher;
    std::vector<Zone> zones;
    double level = 0.95;
    ReviewWindow before;
    ReviewWindow after;
    double difference = 0;            ///< after − before, in the metric's unit
    stats::Interval differenceInterval{0, 0}; ///< rates: Newcombe hybrid score; counts: NaN
    double rateRatio = 0;             ///< counts and exposures: after / before
    double pTwoSided = 1;             ///< Fisher (rates) or exact conditional Poisson (counts)
    double pImproved = 1;             ///< one-sided p-value in the improving direction
    double probImproved = 0;          ///< posterior P(the metric improved), Jeffreys priors
    std::string testName;
    std::vector<ChartPoint> chart;    ///< p-chart (rates) or u-chart (counts), with the EWMA
    double ewmaLambda = 0.3;
    std::optional<double> trainingMinutes; ///< minutes of the focus's drills between the windows
    std::string trainingNote;
};

/// Why a review cannot be computed yet, in plain words (empty when it can).
struct ReviewResult {
    std::optional<Review> review;
    std::string problem;
};

/// Compares the `kBefore` matches before the focus's start date with the `kAfter` matches from
/// it on (same squad and season), over the focus's zones.
ReviewResult computeReview(const Focus& f, const MetricSpec& metric, const SeasonTallies& season,
                           const ZoneGrid& grid, int kBefore, int kAfter, double level = 0.95,
                           double ewmaLambda = 0.3);

/// The review as JSON (every number; docs/reviews.md).
std::string reviewToJson(const Review& r);

} // namespace pitchloop::model
