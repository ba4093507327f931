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
    /// The smallest improvement the coach said would matter, in the metric's unit (a share for
    /// rates: 0.08 is 8 points); unset: the target's watch margin at opening.
    std::optional<double> minChange;
    /// The grid `zones` are on: the club's grid when the focus was opened (FocusStore sets
    /// it). After a grid change it differs from the club's; reviews count on this one.
    ZoneGrid grid;
};

/// Focuses not yet closed on the same metric that share a zone with `zones` (a whole-pitch
/// focus shares every zone): a second focus on the same thing splits its review and its
/// training minutes, so openers are warned.
std::vector<std::int64_t> overlappingOpenFocuses(const std::vector<Focus>& focuses,
                                                 const std::string& metric,
                                                 const std::vector<Zone>& zones);

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
    double matchTail = std::numeric_limits<double>::quiet_NaN(); ///< ZoneStatus::matchTail
    std::optional<Target> target; ///< direction, value, watch margin, author, effective date
};

/// The numbers that open a focus, frozen with it and never recomputed.
struct FocusEvidence {
    std::string matchId;
    std::string date;
    std::string frozenAt;
    /// The window that raised the flag (Window::name()); empty in evidence frozen before it
    /// was recorded.
    std::string judgedWindow;
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

/// One side (before, the matches left out, or after) of a review: the matches and their
/// summed tally over the zones.
struct ReviewWindow {
    std::vector<std::string> matchIds;
    std::vector<std::string> dates;
    std::vector<long> num; ///< per match, summed over the focus zones
    std::vector<long> den; ///< per match (1 per match for counts)
    long totalNum = 0;
    long totalDen = 0;
    double value = 0;
    stats::Interval interval{0, 0}; ///< on effective counts (match-to-match variation)
    double effDen = 0;              ///< effective chances or exposure (variation.h)
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
    bool trigger = false; ///< one of the matches that raised the flag (not in the baseline)
};

/// What a review can say, in one word each (docs/reviews.md).
enum class ReviewFinding {
    ImprovedByMinChange, ///< P(improvement ≥ the coach's minimal important change) ≥ 0.95
    Improved,            ///< P(improvement > 0) ≥ 0.95, but not surely by the minimal change
    NoClearChange,       ///< neither way with 95 % probability
    Worse,               ///< P(got worse) ≥ 0.95
    NoBaseline,          ///< no match outside the flag's own window to compare with
};
std::string_view toString(ReviewFinding f);

/// Every number of a follow-up review (docs/reviews.md).
///
/// The baseline ("before") is never the window that raised the flag: a zone is picked because
/// those matches looked bad, so comparing with them credits the drills with the regression to
/// the mean that follows any unlucky run. It is the last K matches before the training started
/// that are not in that window. The change is read against the zones nobody trained (the rest
/// of the pitch, same metric, same matches: difference in differences), so a team-wide change
/// is not credited to the drills, and every variance allows for match-to-match variation.
struct Review {
    std::int64_t focusId = 0;
    std::string metric;
    MetricKind kind = MetricKind::Rate;
    Better better = Better::Higher;
    std::vector<Zone> zones;
    double level = 0.95;
    ReviewWindow before;  ///< the baseline
    ReviewWindow trigger; ///< the matches that raised the flag, left out of the baseline
    ReviewWindow after;
    ReviewWindow controlBefore; ///< the untrained zones over the baseline's matches
    ReviewWindow controlAfter;  ///< ... and over the after matches
    std::string baselineNote;   ///< the baseline in plain words
    double dispersion = 0;        ///< rho or phi of the focus zones (0: none allowed for)
    double controlDispersion = 0; ///< of the untrained zones (the whole pitch's)
    double difference = 0;        ///< after − before, in the metric's unit
    stats::Interval differenceInterval{0, 0}; ///< of the difference, with variation
    double rateRatio = 0;         ///< after / before
    /// What the after value would have been had the focus zones moved like the untrained ones:
    /// before + (control after − control before) for rates, before × control after / control
    /// before for counts.
    double expected = 0;
    double effect = 0;            ///< after − expected (difference in differences), metric unit
    stats::Interval effectInterval{0, 0};
    double minChange = 0;         ///< the smallest improvement that matters (metric unit, ≥ 0)
    double pTwoSided = 1;         ///< of effect = 0, normal approximation
    double pImproved = 1;         ///< one-sided p-value in the improving direction
    double probImproved = 0;      ///< P(improvement > 0)
    double probImprovedByMinChange = 0; ///< P(improvement ≥ minChange)
    ReviewFinding finding = ReviewFinding::NoClearChange;
    std::optional<Target> target;   ///< the target the flag was judged against
    double probAfterMeetsTarget = 0; ///< P(the after window's true value meets the target)
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

/// Review choices beyond the windows: whether to allow for match-to-match variation (on in
/// the product; tests switch it off to check the pure-noise numbers) and its prior.
struct ReviewOptions {
    bool matchVariation = true;
    VariationPrior variationPrior;
};

/// Compares up to `kBefore` matches before the focus's start (not those of the window that
/// raised the flag) with the first `kAfter` matches from it on (same squad and season), over
/// the focus's zones, against the untrained zones.
ReviewResult computeReview(const Focus& f, const MetricSpec& metric, const SeasonTallies& season,
                           const ZoneGrid& grid, int kBefore, int kAfter, double level = 0.95,
                           double ewmaLambda = 0.3, const ReviewOptions& options = {});

/// The review as JSON (every number; docs/reviews.md).
std::string reviewToJson(const Review& r);

} // namespace pitchloop::model
