#include "focus.h"
#include "storeguard.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <SQLiteCpp/Transaction.h>
#include <boost/math/distributions/normal.hpp>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <limits>

namespace pitchloop::model {

using nlohmann::json;

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

json zonesJson(const std::vector<Zone>& zones) {
    json z = json::array();
    for (const auto& zone : zones) z.push_back({zone.band, zone.lane});
    return z;
}

std::vector<Zone> zonesFrom(const std::string& text) {
    std::vector<Zone> out;
    for (const auto& z : json::parse(text)) out.push_back({z.at(0).get<int>(), z.at(1).get<int>()});
    return out;
}

json number(double v) { return std::isfinite(v) ? json(v) : json(); }

} // namespace

std::string_view toString(FocusState s) {
    switch (s) {
    case FocusState::Open: return "open";
    case FocusState::DueForReview: return "due_for_review";
    case FocusState::Closed: return "closed";
    }
    return "?";
}

std::string_view toString(Verdict v) {
    switch (v) {
    case Verdict::Worked: return "worked";
    case Verdict::Partly: return "partly";
    case Verdict::NoChange: return "no_change";
    case Verdict::CantTell: return "cant_tell";
    }
    return "?";
}

std::optional<Verdict> verdictFromString(std::string_view s) {
    for (Verdict v : {Verdict::Worked, Verdict::Partly, Verdict::NoChange, Verdict::CantTell})
        if (toString(v) == s) return v;
    return std::nullopt;
}

std::vector<std::int64_t> overlappingOpenFocuses(const std::vector<Focus>& focuses,
                                                 const std::string& metric,
                                                 const std::vector<Zone>& zones) {
    std::vector<std::int64_t> out;
    for (const auto& f : focuses) {
        if (!f.closedAt.empty() || f.metric != metric) continue;
        const bool shared = std::any_of(f.zones.begin(), f.zones.end(), [&](const Zone& a) {
            return std::any_of(zones.begin(), zones.end(), [&](const Zone& b) {
                return a == b || (a.band == 0 && a.lane == 0) || (b.band == 0 && b.lane == 0);
            });
        });
        if (shared) out.push_back(f.id);
    }
    return out;
}

FocusState focusState(const Focus& f, int matchesSinceStart, const std::string& today) {
    if (!f.closedAt.empty()) return FocusState::Closed;
    if (!f.reviewOn.empty() && today >= f.reviewOn) return FocusState::DueForReview;
    if (f.reviewOn.empty() && matchesSinceStart >= f.reviewAfterMatches)
        return FocusState::DueForReview;
    return FocusState::Open;
}

int matchesSince(const SeasonTallies& season, const std::string& startDate,
                 const std::string& until) {
    int n = 0;
    for (const auto& d : season.dates) n += d >= startDate && (until.empty() || d <= until);
    return n;
}

SeasonTallies playedBy(const SeasonTallies& season, const std::string& lastDay) {
    // Dates are in order: keep the leading run on or before lastDay.
    std::size_t n = 0;
    while (n < season.dates.size() && season.dates[n] <= lastDay) ++n;
    if (n == season.dates.size()) return season;
    SeasonTallies out;
    out.matchIds.assign(season.matchIds.begin(), season.matchIds.begin() + static_cast<std::ptrdiff_t>(n));
    out.dates.assign(season.dates.begin(), season.dates.begin() + static_cast<std::ptrdiff_t>(n));
    for (const auto& [metric, perMatch] : season.byMetric)
        out.byMetric[metric].assign(perMatch.begin(), perMatch.begin() + static_cast<std::ptrdiff_t>(n));
    return out;
}

std::string dayAfter(const std::string& iso) {
    using namespace std::chrono;
    const year_month_day d{year{std::stoi(iso.substr(0, 4))},
                           month{static_cast<unsigned>(std::stoi(iso.substr(5, 2)))},
                           day{static_cast<unsigned>(std::stoi(iso.substr(8, 2)))}};
    const year_month_day next{sys_days{d} + days{1}};
    char buf[16];
    std::snprintf(buf, sizeof buf, "%04d-%02u-%02u", static_cast<int>(next.year()),
                  static_cast<unsigned>(next.month()), static_cast<unsigned>(next.day()));
    return buf;
}

// ---- evidence --------------------------------------------------------------------------------

namespace {


double numberOr(const json& j, const char* key) {
    const auto it = j.find(key);
    return it == j.end() || it->is_null() ? kNaN : it->get<double>();
}

FlagState flagStateFrom(const std::string& s) {
    return flagStateFromString(s).value_or(FlagState::NoTarget);
}

bool isSlipOrWatch(FlagState s) {
    return s == FlagState::OffTarget || s == FlagState::LikelyOff || s == FlagState::CloseToLine;
}

} // namespace

FocusEvidence focusEvidence(const SeasonTallies& season, std::size_t focal,
                            const MetricSpec& metric, const std::vector<Target>& targets,
                            const ZoneGrid& grid, const FlagSettings& settings,
                            const std::vector<Zone>& zones, bool wholePitch,
                            const std::string& frozenAt) {
    FocusEvidence e;
    e.matchId = focal < season.matchIds.size() ? season.matchIds[focal] : std::string();
    e.date = focal < season.dates.size() ? season.dates[focal] : std::string();
    e.frozenAt = frozenAt;
    const auto statuses = computeStatus(
        season, focal, {metric}, targets, grid,
        {Window{Window::Kind::Match, 1, 0.3}, settings.window, Window{Window::Kind::Season, 0, 0.3}},
        settings);
    json j{{"match_id", e.matchId}, {"date", e.date}, {"frozen_at", frozenAt},
           {"judged_window", settings.window.name()}, {"zones", json::array()}};
    for (const auto& s : statuses) {
        const bool wanted = wholePitch ? s.band == 0
                                       : std::any_of(zones.begin(), zones.end(), [&](Zone z) {
                                             return z.band == s.band && z.lane == s.lane;
                                         });
        if (!wanted) continue;
        j["zones"].push_back(toJson(s));
        e.slipped |= s.window == settings.window && isSlipOrWatch(s.state);
    }
    e.json = j.dump();
    e.zones = readEvidence(e.json, settings.window.name()).zones;
    return e;
}

FocusEvidence readEvidence(const std::string& text, const std::string& judgedWindow) {
    const json j = json::parse(text);
    FocusEvidence e;
    e.matchId = j.value("match_id", std::string());
    e.date = j.value("date", std::string());
    e.frozenAt = j.value("frozen_at", std::string());
    e.judgedWindow = j.value("judged_window", std::string());
    e.json = text;
    for (const auto& z : j.at("zones")) {
        EvidenceZone ez;
        ez.band = z.at("band").get<int>();
        ez.lane = z.at("lane").get<int>();
        ez.window = z.at("window").get<std::string>();
        ez.num = numberOr(z, "num");
        ez.den = numberOr(z, "den");
        ez.matches = z.value("matches", 0);
        ez.value = numberOr(z, "value");
        ez.low = numberOr(z, "low");
        ez.high = numberOr(z, "high");
        ez.level = numberOr(z, "level");
        ez.state = flagStateFrom(z.value("state", std::string()));
        ez.pMiss = numberOr(z, "p_miss");
        ez.matchTail = numberOr(z, "match_tail");
        if (const auto t = z.find("target"); t != z.end() && t->is_object()) {
            Target target;
            target.key.metric = z.value("metric", std::string());
            target.key.band = ez.band;
            target.key.lane = ez.lane;
            target.direction =
                directionFromString(t->value("direction", std::string())).value_or(Direction::AtLeast);
            target.value = t->value("value", 0.0);
            target.watchMargin = t->value("watch_margin", 0.0);
            target.minSample = t->value("min_sample", 0L);
            target.author = t->value("author", std::string());
            target.effectiveFrom = t->value("effective_from", std::string());
            ez.target = target;
        }
        e.slipped |= ez.window == judgedWindow && isSlipOrWatch(ez.state);
        e.zones.push_back(std::move(ez));
    }
    return e;
}

// ---- storage ---------------------------------------------------------------------------------

bool FocusStore::drillExists(std::int64_t drill) const {
    return guarded("cannot read drills", [&] {
        SQLite::Statement q(m_repo.database(),
                            "SELECT 1 FROM drill WHERE id = ? AND deleted_at IS NULL");
        q.bind(1, drill);
        return q.executeStep();
    });
}

std::int64_t FocusStore::open(const Focus& f, const std::string& now) {
    return guarded("cannot open focus", [&] {
        auto& db = m_repo.database();
        SQLite::Transaction tx(db);
        SQLite::Statement season(db, "SELECT se.id FROM season se JOIN squad sq ON sq.id = "
                                     "se.squad_id WHERE sq.name = ? AND se.name = ?");
        season.bind(1, f.squad);
        season.bind(2, f.season);
        if (!season.executeStep())
            throw StorageError("no season " + f.season + " for squad " + f.squad);
        SQLite::Statement ins(db, "INSERT INTO focus(season_id, metric_id, zones, "
                                  "opened_after_match, start_date, review_after_matches, "
                                  "review_on, evidence, note, opened_by, opened_at, grid, min_change) "
                                  "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
        ins.bind(1, season.getColumn(0).getInt64());
        ins.bind(2, f.metric);
        ins.bind(3, zonesJson(f.zones).dump());
        ins.bind(4, f.openedAfterMatch);
        ins.bind(5, f.startDate);
        ins.bind(6, f.reviewAfterMatches);
        if (f.reviewOn.empty()) ins.bind(7);
        else ins.bind(7, f.reviewOn);
        ins.bind(8, f.evidence);
        ins.bind(9, f.note);
        ins.bind(10, f.openedBy);
        ins.bind(11, now);
        ins.bind(12, m_repo.tallyGrid().name()); // the zones were picked on the club's grid
        if (f.minChange) ins.bind(13, *f.minChange);
        else ins.bind(13);
        ins.exec();
        const std::int64_t id = db.getLastInsertRowid();
        SQLite::Statement link(db, "INSERT INTO focus_drill(focus_id, drill_id, linked_at) "
                                   "VALUES (?, ?, ?)");
        for (auto drill : f.drills) {
            link.reset();
            link.bind(1, id);
            link.bind(2, drill);
            link.bind(3, now);
            link.exec();
        }
        tx.commit();
        return id;
    });
}

namespace {
const char* kFocusSelect =
    "SELECT f.id, sq.name, se.name, f.metric_id, f.zones, f.opened_after_match, f.start_date, "
    "f.review_after_matches, f.review_on, f.evidence, f.note, f.opened_by, f.opened_at, "
    "f.closed_at, f.verdict, f.verdict_note, f.grid, f.min_change FROM focus f JOIN season se ON se.id = f.season_id "
    "JOIN squad sq ON sq.id = se.squad_id ";

std::string text(const SQLite::Column& c) { return c.isNull() ? std::string{} : c.getString(); }
} // namespace

std::vector<Focus> FocusStore::list() const {
    return guarded("cannot read focuses", [&] {
        auto& db = m_repo.database();
        const ZoneGrid clubGrid = m_repo.tallyGrid();
        std::vector<Focus> out;
        SQLite::Statement q(db, std::string(kFocusSelect) + "ORDER BY f.id");
        while (q.executeStep()) {
            Focus f;
            f.id = q.getColumn(0).getInt64();
            f.squad = q.getColumn(1).getString();
            f.season = q.getColumn(2).getString();
            f.metric = q.getColumn(3).getString();
            f.zones = zonesFrom(q.getColumn(4).getString());
            f.openedAfterMatch = q.getColumn(5).getString();
            f.startDate = q.getColumn(6).getString();
            f.reviewAfterMatches = q.getColumn(7).isNull() ? 5 : q.getColumn(7).getInt();
            f.reviewOn = text(q.getColumn(8));
            f.evidence = q.getColumn(9).getString();
            f.note = q.getColumn(10).getString();
            f.openedBy = q.getColumn(11).getString();
            f.openedAt = q.getColumn(12).getString();
            f.closedAt = text(q.getColumn(13));
            f.verdict = text(q.getColumn(14));
            f.verdictNote = text(q.getColumn(15));
            const auto grid = ZoneGrid::parse(q.getColumn(16).getString());
            f.grid = grid ? *grid : clubGrid;
            if (!q.getColumn(17).isNull()) f.minChange = q.getColumn(17).getDouble();
            out.push_back(std::move(f));
        }
        SQLite::Statement d(db, "SELECT drill_id FROM focus_drill WHERE focus_id = ? ORDER BY linked_at, drill_id");
        for (auto& f : out) {
            d.reset();
            d.bind(1, f.id);
            while (d.executeStep()) f.drills.push_back(d.getColumn(0).getInt64());
        }
        return out;
    });
}

std::optional<Focus> FocusStore::get(std::int64_t id) const {
    for (auto& f : list())
        if (f.id == id) return f;
    return std::nullopt;
}

void FocusStore::linkDrill(std::int64_t focus, std::int64_t drill, const std::string& now) {
    guarded("cannot link drill", [&] {
        SQLite::Statement q(m_repo.database(), "INSERT OR IGNORE INTO focus_drill(focus_id, "
                                               "drill_id, linked_at) VALUES (?, ?, ?)");
        q.bind(1, focus);
        q.bind(2, drill);
        q.bind(3, now);
        q.exec();
        return 0;
    });
}

bool FocusStore::unlinkDrill(std::int64_t focus, std::int64_t drill) {
    return guarded("cannot unlink drill", [&] {
        SQLite::Statement q(m_repo.database(),
                            "DELETE FROM focus_drill WHERE focus_id = ? AND drill_id = ?");
        q.bind(1, focus);
        q.bind(2, drill);
        return q.exec() > 0;
    });
}

void FocusStore::close(std::int64_t focus, Verdict verdict, const std::string& note,
                       const std::string& by, const std::string& reviewJson,
                       const std::string& now) {
    guarded("cannot close focus", [&] {
        auto& db = m_repo.database();
        SQLite::Transaction tx(db);
        SQLite::Statement r(db, "INSERT INTO review(focus_id, computed_at, numbers, verdict, note, "
                                "recorded_by) VALUES (?, ?, ?, ?, ?, ?)");
        r.bind(1, focus);
        r.bind(2, now);
        r.bind(3, reviewJson);
        r.bind(4, std::string(toString(verdict)));
        r.bind(5, note);
        r.bind(6, by);
        r.exec();
        SQLite::Statement u(db, "UPDATE focus SET closed_at = ?, verdict = ?, verdict_note = ? "
                                "WHERE id = ?");
        u.bind(1, now);
        u.bind(2, std::string(toString(verdict)));
        u.bind(3, note);
        u.bind(4, focus);
        u.exec();
        tx.commit();
        return 0;
    });
}

std::vector<FocusStore::StoredReview> FocusStore::reviews(std::int64_t focus) const {
    return guarded("cannot read reviews", [&] {
        std::vector<StoredReview> out;
        SQLite::Statement q(m_repo.database(), "SELECT computed_at, numbers, verdict, note, "
                                               "recorded_by FROM review WHERE focus_id = ? "
                                               "ORDER BY id");
        q.bind(1, focus);
        while (q.executeStep())
            out.push_back({q.getColumn(0).getString(), q.getColumn(1).getString(),
                           text(q.getColumn(2)), q.getColumn(3).getString(),
                           q.getColumn(4).getString()});
        return out;
    });
}

// ---- the review ------------------------------------------------------------------------------

std::string_view toString(ReviewFinding f) {
    switch (f) {
    case ReviewFinding::ImprovedByMinChange: return "improved_by_min_change";
    case ReviewFinding::Improved: return "improved";
    case ReviewFinding::NoClearChange: return "no_clear_change";
    case ReviewFinding::Worse: return "worse";
    case ReviewFinding::NoBaseline: return "no_baseline";
    }
    return "?";
}

namespace {

/// The number of matches of the window that raised the flag, ending at the opening match
/// `opened` (index): N for lastN, 1 for the match alone, every match so far for the season or
/// an EWMA.
std::size_t triggerLength(const std::string& window, std::size_t opened) {
    const auto w = Window::parse(window);
    if (!w) return 1;
    switch (w->kind) {
    case Window::Kind::Match: return 1;
    case Window::Kind::LastN: return std::min<std::size_t>(static_cast<std::size_t>(w->n), opened + 1);
    case Window::Kind::Season:
    case Window::Kind::Ewma: return opened + 1;
    }
    return 1;
}

/// The judged window of stored evidence: recorded since the review stopped using it as its
/// baseline; older evidence holds the match, the judged window and the season.
std::string judgedWindowOf(const std::string& evidence) {
    try {
        const json j = json::parse(evidence);
        if (auto w = j.value("judged_window", std::string()); !w.empty()) return w;
        std::string found = "match";
        for (const auto& z : j.at("zones")) {
            const auto w = z.value("window", std::string());
            if (w != "match" && w != "season") return w;
            if (w == "season") found = "season";
        }
        return found == "season" ? "match" : found;
    } catch (const json::exception&) {
        return "match";
    }
}

std::optional<Target> targetOf(const std::string& evidence) {
    try {
        const auto e = readEvidence(evidence, judgedWindowOf(evidence));
        for (const auto& z : e.zones)
            if (z.target) return z.target;
    } catch (const json::exception&) {
    }
    return std::nullopt;
}

/// Value and variance of a window's value in the metric's unit, allowing for variation:
/// Var = v(1 − v)/den_eff for rates, v/den_eff for counts, with v smoothed by half a success
/// (so a window of 0 or 1 still has a spread).
struct Estimate {
    double value = kNaN;
    double variance = kNaN;
};
Estimate estimateOf(const ReviewWindow& w, bool rate) {
    Estimate e;
    if (w.totalDen <= 0 || w.effDen <= 0) return e;
    e.value = w.value;
    const double effNum = w.value * w.effDen;
    if (rate) {
        const double p = (effNum + 0.5) / (w.effDen + 1);
        e.variance = p * (1 - p) / w.effDen;
    } else {
        e.variance = (effNum + 0.5) / (w.effDen * w.effDen);
    }
    return e;
}

double normalCdf(double z) { return boost::math::cdf(boost::math::normal_distribution<double>(), z); }
double normalQuantile(double p) {
    return boost::math::quantile(boost::math::normal_distribution<double>(), p);
}

} // namespace

ReviewResult computeReview(const Focus& f, const MetricSpec& metric, const SeasonTallies& season,
                           const ZoneGrid& grid, int kBefore, int kAfter, double level,
                           double ewmaLambda, const ReviewOptions& options) {
    ReviewResult result;
    if (kBefore < 1 || kAfter < 1) {
        result.problem = "both windows need at least one match (before " + std::to_string(kBefore) +
                         ", after " + std::to_string(kAfter) + ")";
        return result;
    }
    if (f.zones.empty()) {
        result.problem = "the focus has no zones";
        return result;
    }
    auto tallies = season.byMetric.find(metric.id);
    if (tallies == season.byMetric.end()) {
        result.problem = "no tallies of metric '" + metric.id + "' in season " + f.season;
        return result;
    }
    const std::size_t kb = static_cast<std::size_t>(kBefore), ka = static_cast<std::size_t>(kAfter);
    std::vector<std::size_t> beforeAll, afterAll;
    for (std::size_t i = 0; i < season.matchIds.size(); ++i)
        (season.dates[i] < f.startDate ? beforeAll : afterAll).push_back(i);
    if (afterAll.size() < ka) {
        result.problem = "the review needs " + std::to_string(kAfter) + " matches from the start (" +
                         f.startDate + ") on; " + std::to_string(afterAll.size()) +
                         " have been played (" + std::to_string(ka - afterAll.size()) +
                         " missing)";
        return result;
    }
    // The matches that raised the flag: the judged window ending at the opening match.
    std::vector<std::size_t> triggerIdx;
    const auto opened = std::find(season.matchIds.begin(), season.matchIds.end(), f.openedAfterMatch);
    if (opened != season.matchIds.end()) {
        const std::size_t at = static_cast<std::size_t>(opened - season.matchIds.begin());
        const std::size_t len = triggerLength(judgedWindowOf(f.evidence), at);
        for (std::size_t i = at + 1 - len; i <= at; ++i) triggerIdx.push_back(i);
    }
    auto inTrigger = [&](std::size_t i) {
        return std::find(triggerIdx.begin(), triggerIdx.end(), i) != triggerIdx.end();
    };
    std::vector<std::size_t> eligible;
    for (std::size_t i : beforeAll)
        if (!inTrigger(i)) eligible.push_back(i);
    const std::size_t nb = std::min(kb, eligible.size());
    const std::vector<std::size_t> beforeIdx(eligible.end() - static_cast<std::ptrdiff_t>(nb),
                                             eligible.end());
    std::vector<std::size_t> shownTrigger;
    for (std::size_t i : triggerIdx)
        if (season.dates[i] < f.startDate) shownTrigger.push_back(i);
    const std::vector<std::size_t> afterIdx(afterAll.begin(),
                                            afterAll.begin() + static_cast<std::ptrdiff_t>(ka));

    Review r;
    r.focusId = f.id;
    r.metric = metric.id;
    r.kind = metric.kind();
    r.better = metric.better;
    r.zones = f.zones;
    r.level = level;
    r.ewmaLambda = ewmaLambda;
    r.target = targetOf(f.evidence);
    const bool rate = r.kind == MetricKind::Rate;
    const bool count = r.kind == MetricKind::Count;
    const bool higher = r.better == Better::Higher;
    const double sign = higher ? 1 : -1;

    // Match-to-match variation from every match of the season played so far.
    MetricVariation variation;
    if (options.matchVariation)
        variation = estimateVariation(tallies->second, afterIdx.back(), r.kind, options.variationPrior);
    r.dispersion = variation.zones.value;
    r.controlDispersion = variation.wholePitch.value;

    std::vector<bool> inFocus(static_cast<std::size_t>(grid.zoneCount()), false);
    for (const Zone& z : f.zones) {
        const int idx = grid.indexOf(z);
        if (idx >= 0) inFocus[static_cast<std::size_t>(idx)] = true;
    }
    auto fill = [&](ReviewWindow& w, const std::vector<std::size_t>& idx, bool control,
                    double dispersion) {
        for (std::size_t i : idx) {
            long num = 0, den = 0;
            const MatchTally& t = tallies->second[i];
            for (std::size_t z = 0; z < t.size() && z < inFocus.size(); ++z) {
                if (inFocus[z] == control) continue;
                num += t[z].num;
                den += t[z].den;
            }
            if (count) den = 1; // a per-match count over several zones: still one match
            w.matchIds.push_back(season.matchIds[i]);
            w.dates.push_back(season.dates[i]);
            w.num.push_back(num);
            w.den.push_back(den);
            w.totalNum += num;
            w.totalDen += den;
        }
        w.value = w.totalDen > 0 ? static_cast<double>(w.totalNum) / static_cast<double>(w.totalDen) : kNaN;
        // Effective chances: (Σd)² / Σ d·D, D each match's design effect at the window's rate.
        double sumD = 0, sumDD = 0;
        const double mean = std::isnan(w.value) ? 0 : w.value;
        for (std::size_t m = 0; m < w.den.size(); ++m) {
            const double d = static_cast<double>(w.den[m]);
            sumD += d;
            sumDD += d * designEffect(r.kind, dispersion, d, mean);
        }
        w.effDen = sumDD > 0 ? sumD * sumD / sumDD : 0;
        const double effNum = std::isnan(w.value) ? 0 : w.value * w.effDen;
        w.interval = rate ? stats::wilson(effNum, w.effDen, level)
                          : (w.effDen > 0 ? stats::garwood(effNum, w.effDen, level)
                                          : stats::Interval{0, kNaN});
    };
    fill(r.before, beforeIdx, false, r.dispersion);
    fill(r.trigger, shownTrigger, false, r.dispersion);
    fill(r.after, afterIdx, false, r.dispersion);
    fill(r.controlBefore, beforeIdx, true, r.controlDispersion);
    fill(r.controlAfter, afterIdx, true, r.controlDispersion);

    // The smallest change that matters: the coach's, else the target's watch margin.
    r.minChange = f.minChange ? std::fabs(*f.minChange) : (r.target ? r.target->watchMargin : 0);

    const double z = normalQuantile(0.5 + level / 2);
    const Estimate a = estimateOf(r.after, rate), b = estimateOf(r.before, rate);
    const Estimate ca = estimateOf(r.controlAfter, rate), cb = estimateOf(r.controlBefore, rate);
    r.testName = "difference in differences against the untrained zones, allowing for "
                 "match-to-match variation (normal approximation)";
    if (beforeIdx.empty() || std::isnan(b.value) || std::isnan(a.value)) {
        r.finding = ReviewFinding::NoBaseline;
        r.difference = r.expected = r.effect = r.rateRatio = kNaN;
        r.differenceInterval = r.effectInterval = {kNaN, kNaN};
        r.pTwoSided = r.pImproved = r.probImproved = r.probImprovedByMinChange = kNaN;
    } else {
        r.difference = a.value - b.value;
        const double diffSe = std::sqrt(a.variance + b.variance);
        r.differenceInterval = {r.difference - z * diffSe, r.difference + z * diffSe};
        r.rateRatio = b.value > 0 ? a.value / b.value : kNaN;
        double expectedVar = b.variance;
        r.expected = b.value;
        if (!std::isnan(ca.value) && !std::isnan(cb.value)) {
            if (rate) {
                r.expected = b.value + (ca.value - cb.value);
                expectedVar = b.variance + ca.variance + cb.variance;
            } else if (cb.value > 0 && ca.value > 0) {
                const double ratio = ca.value / cb.value;
                r.expected = b.value * ratio;
                expectedVar = ratio * ratio * b.variance +
                              b.value * b.value * ratio * ratio *
                                  (ca.variance / (ca.value * ca.value) + cb.variance / (cb.value * cb.value));
            }
        }
        r.effect = a.value - r.expected;
        const double se = std::sqrt(a.variance + expectedVar);
        r.effectInterval = {r.effect - z * se, r.effect + z * se};
        const double improvement = sign * r.effect;
        if (se > 0) {
            r.probImproved = normalCdf(improvement / se);
            r.pImproved = 1 - r.probImproved;
            r.pTwoSided = std::min(1.0, 2 * std::min(r.probImproved, r.pImproved));
            r.probImprovedByMinChange = normalCdf((improvement - r.minChange) / se);
        } else {
            r.probImproved = improvement > 0 ? 1 : 0;
            r.pImproved = 1 - r.probImproved;
            r.pTwoSided = improvement == 0 ? 1 : 0;
            r.probImprovedByMinChange = improvement >= r.minChange ? 1 : 0;
        }
        r.finding = r.probImprovedByMinChange >= 0.95 && r.minChange > 0
                        ? ReviewFinding::ImprovedByMinChange
                    : r.probImproved >= 0.95 ? ReviewFinding::Improved
                    : r.pImproved >= 0.95    ? ReviewFinding::Worse
                                             : ReviewFinding::NoClearChange;
    }
    // Are we back at the target? The after window's posterior (Jeffreys, effective counts).
    r.probAfterMeetsTarget = kNaN;
    if (r.target && r.after.effDen > 0 && !std::isnan(r.after.value)) {
        const double effNum = r.after.value * r.after.effDen;
        const bool atLeast = r.target->direction == Direction::AtLeast;
        r.probAfterMeetsTarget =
            rate ? (atLeast ? stats::probRateAbove(effNum, r.after.effDen, r.target->value)
                            : stats::probRateBelow(effNum, r.after.effDen, r.target->value))
                 : (atLeast ? stats::probPoissonRateAbove(effNum, r.after.effDen, r.target->value)
                            : stats::probPoissonRateBelow(effNum, r.after.effDen, r.target->value));
    }
    {
        const std::size_t left = shownTrigger.size();
        std::string text;
        if (beforeIdx.empty()) {
            text = "no match before the training started lies outside the " + std::to_string(left) +
                   " that raised the flag, so there is nothing fair to compare with; the after "
                   "matches are read against the target only";
        } else {
            text = "the " + std::to_string(beforeIdx.size()) + " match" +
                   (beforeIdx.size() == 1 ? "" : "es") + " before those that raised the flag";
            if (left > 0)
                text += " (the " + std::to_string(left) + " that raised it are left out: they were "
                        "picked because they looked bad, and an unlucky run is usually followed "
                        "by better matches anyway)";
            if (beforeIdx.size() < kb)
                text += "; only " + std::to_string(beforeIdx.size()) + " of the " +
                        std::to_string(kb) + " wanted were played";
        }
        r.baselineNote = text;
    }

    // Match-by-match chart: baseline, the flag's matches, after. Centre and limits from the
    // baseline (or the target when there is none): a p-chart for rates (NIST/SEMATECH
    // e-Handbook §6.3.3.2) with the beta-binomial variance p(1 − p)·D_i/n_i, its Poisson
    // counterpart for counts with ū·D_i/e_i; the spread uses the baseline smoothed by half a
    // success so a baseline of 0 % or 100 % still has limits of some width.
    std::vector<std::pair<std::size_t, int>> points; // index, 0 before / 1 trigger / 2 after
    for (std::size_t i : beforeIdx) points.push_back({i, 0});
    for (std::size_t i : shownTrigger) points.push_back({i, 1});
    for (std::size_t i : afterIdx) points.push_back({i, 2});
    std::sort(points.begin(), points.end());
    double centre = !std::isnan(r.before.value) ? r.before.value : (r.target ? r.target->value : kNaN);
    double smooth = centre;
    if (!std::isnan(r.before.value)) {
        smooth = rate ? (static_cast<double>(r.before.totalNum) + 0.5) / (static_cast<double>(r.before.totalDen) + 1)
                      : (static_cast<double>(r.before.totalNum) + 0.5) / static_cast<double>(r.before.totalDen);
    }
    double ewNum = 0, ewDen = 0;
    for (const auto& [i, part] : points) {
        long num = 0, den = 0;
        const MatchTally& t = tallies->second[i];
        for (std::size_t zi = 0; zi < t.size() && zi < inFocus.size(); ++zi)
            if (inFocus[zi]) {
                num += t[zi].num;
                den += t[zi].den;
            }
        if (count) den = 1;
        ChartPoint p;
        p.matchId = season.matchIds[i];
        p.after = part == 2;
        p.trigger = part == 1;
        p.centre = centre;
        const double d = static_cast<double>(den);
        p.value = den > 0 ? static_cast<double>(num) / d : kNaN;
        if (den > 0 && !std::isnan(smooth)) {
            const double deff = designEffect(r.kind, r.dispersion, d, smooth);
            const double var = rate ? smooth * (1 - smooth) * deff / d : smooth * deff / d;
            const double spread = 3 * std::sqrt(std::max(0.0, var));
            p.lcl = std::max(0.0, centre - spread);
            p.ucl = rate ? std::min(1.0, centre + spread) : centre + spread;
            p.above = p.value > p.ucl;
            p.below = p.value < p.lcl;
        } else {
            p.lcl = 0;
            p.ucl = rate ? 1 : kNaN;
        }
        // EWMA of the match values weighted by their chances, from the chart's first match on
        // (no seed, no look-ahead): z_t = Σ (1 − λ)^(t − s)·x_s / Σ (1 − λ)^(t − s)·n_s.
        ewNum = (1 - ewmaLambda) * ewNum + static_cast<double>(num);
        ewDen = (1 - ewmaLambda) * ewDen + d;
        p.ewma = ewDen > 0 ? ewNum / ewDen : kNaN;
        r.chart.push_back(p);
    }
    r.trainingNote = "training sessions are not recorded yet; the week planner will report the "
                     "minutes spent on this focus's drills between the windows";
    result.review = std::move(r);
    return result;
}

std::string reviewToJson(const Review& r) {
    auto window = [](const ReviewWindow& w) {
        json matches = json::array();
        for (std::size_t i = 0; i < w.matchIds.size(); ++i)
            matches.push_back({{"match_id", w.matchIds[i]}, {"date", w.dates[i]},
                               {"num", w.num[i]}, {"den", w.den[i]}});
        return json{{"matches", matches},           {"num", w.totalNum},
                    {"den", w.totalDen},            {"value", number(w.value)},
                    {"low", number(w.interval.low)}, {"high", number(w.interval.high)},
                    {"effective_den", number(w.effDen)}};
    };
    auto totals = [](const ReviewWindow& w) {
        return json{{"num", w.totalNum}, {"den", w.totalDen}, {"value", number(w.value)},
                    {"effective_den", number(w.effDen)}};
    };
    json chart = json::array();
    for (const auto& p : r.chart)
        chart.push_back({{"match_id", p.matchId},
                         {"window", p.after ? "after" : p.trigger ? "trigger" : "before"},
                         {"value", number(p.value)}, {"centre", number(p.centre)},
                         {"lcl", number(p.lcl)}, {"ucl", number(p.ucl)}, {"above", p.above},
                         {"below", p.below}, {"ewma", number(p.ewma)}});
    json target = nullptr;
    if (r.target)
        target = {{"direction", toString(r.target->direction)}, {"value", r.target->value},
                  {"watch_margin", r.target->watchMargin}};
    json j{{"focus_id", r.focusId},
           {"metric", r.metric},
           {"kind", toString(r.kind)},
           {"better", toString(r.better)},
           {"zones", zonesJson(r.zones)},
           {"level", r.level},
           {"before", window(r.before)},
           {"trigger", window(r.trigger)},
           {"after", window(r.after)},
           {"baseline_note", r.baselineNote},
           {"control", {{"before", totals(r.controlBefore)}, {"after", totals(r.controlAfter)}}},
           {"dispersion", r.dispersion},
           {"control_dispersion", r.controlDispersion},
           {"difference", number(r.difference)},
           {"difference_low", number(r.differenceInterval.low)},
           {"difference_high", number(r.differenceInterval.high)},
           {"rate_ratio", number(r.rateRatio)},
           {"expected", number(r.expected)},
           {"effect", number(r.effect)},
           {"effect_low", number(r.effectInterval.low)},
           {"effect_high", number(r.effectInterval.high)},
           {"min_change", r.minChange},
           {"test", r.testName},
           {"p_two_sided", number(r.pTwoSided)},
           {"p_improved", number(r.pImproved)},
           {"prob_improved", number(r.probImproved)},
           {"prob_improved_by_min_change", number(r.probImprovedByMinChange)},
           {"finding", toString(r.finding)},
           {"target", target},
           {"prob_after_meets_target", number(r.probAfterMeetsTarget)},
           {"chart", {{"kind", r.kind == MetricKind::Rate ? "p" : "u"},
                      {"ewma_lambda", r.ewmaLambda},
                      {"points", chart}}},
           {"training_minutes", r.trainingMinutes ? json(*r.trainingMinutes) : json()},
           {"training_note", r.trainingNote}};
    return j.dump(2);
}

} // namespace pitchloop::model
