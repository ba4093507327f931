#include "focus.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <SQLiteCpp/Transaction.h>
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

template <typename F>
auto guarded(const char* what, F&& f) -> decltype(f()) {
    try {
        return f();
    } catch (const SQLite::Exception& e) {
        throw StorageError(std::string(what) + ": " + e.what());
    }
}

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

json evidenceZoneJson(const ZoneStatus& s) {
    json j{{"metric", s.metric},        {"band", s.band},
           {"lane", s.lane},            {"window", s.window.name()},
           {"num", s.sum.num},          {"den", s.sum.den},
           {"matches", s.sum.matches},  {"level", s.level},
           {"state", toString(s.state)}};
    auto put = [&](const char* key, double v) {
        j[key] = std::isnan(v) || std::isinf(v) ? json() : json(v);
    };
    put("value", s.value);
    put("low", s.interval.low);
    put("high", s.interval.high);
    put("p_miss", s.pMiss);
    put("p_value", s.pValue);
    if (s.target) {
        j["target"] = {{"direction", toString(s.target->direction)},
                       {"value", s.target->value},
                       {"watch_margin", s.target->watchMargin},
                       {"min_sample", s.target->minSample},
                       {"author", s.target->author},
                       {"effective_from", s.target->effectiveFrom}};
        j["chance_off"] = s.chanceOff;
        j["bh_rejected"] = s.bhRejected;
    } else {
        j["target"] = nullptr;
    }
    return j;
}

double numberOr(const json& j, const char* key) {
    const auto it = j.find(key);
    return it == j.end() || it->is_null() ? kNaN : it->get<double>();
}

FlagState flagStateFrom(const std::string& s) {
    for (FlagState f : {FlagState::OnTarget, FlagState::Watch, FlagState::OffTarget,
                        FlagState::TooLittleData, FlagState::NoTarget})
        if (toString(f) == s) return f;
    return FlagState::NoTarget;
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
           {"zones", json::array()}};
    for (const auto& s : statuses) {
        const bool wanted = wholePitch ? s.band == 0
                                       : std::any_of(zones.begin(), zones.end(), [&](Zone z) {
                                             return z.band == s.band && z.lane == s.lane;
                                         });
        if (!wanted) continue;
        j["zones"].push_back(evidenceZoneJson(s));
        e.slipped |= s.window == settings.window &&
                     (s.state == FlagState::OffTarget || s.state == FlagState::Watch);
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
        e.slipped |= ez.window == judgedWindow &&
                     (ez.state == FlagState::OffTarget || ez.state == FlagState::Watch);
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
                                  "review_on, evidence, note, opened_by, opened_at, grid) "
                                  "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)");
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
    "f.closed_at, f.verdict, f.verdict_note, f.grid FROM focus f JOIN season se ON se.id = f.season_id "
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

ReviewResult computeReview(const Focus& f, const MetricSpec& metric, const SeasonTallies& season,
                           const ZoneGrid& grid, int kBefore, int kAfter, double level,
                           double ewmaLambda) {
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
    std::vector<std::size_t> beforeAll, afterAll;
    for (std::size_t i = 0; i < season.matchIds.size(); ++i)
        (season.dates[i] < f.startDate ? beforeAll : afterAll).push_back(i);
    const std::size_t kb = static_cast<std::size_t>(kBefore), ka = static_cast<std::size_t>(kAfter);
    if (beforeAll.size() < kb) {
        result.problem = "the review compares " + std::to_string(kBefore) +
                         " matches before the start (" + f.startDate + ") with the ones after; " +
                         f.season + " has only " + std::to_string(beforeAll.size()) + " before it (" +
                         std::to_string(kb - beforeAll.size()) + " missing)";
        return result;
    }
    if (afterAll.size() < ka) {
        result.problem = "the review needs " + std::to_string(kAfter) + " matches from the start (" +
                         f.startDate + ") on; " + std::to_string(afterAll.size()) +
                         " have been played (" + std::to_string(ka - afterAll.size()) +
                         " missing)";
        return result;
    }
    const std::vector<std::size_t> beforeIdx(beforeAll.end() - static_cast<std::ptrdiff_t>(kb),
                                             beforeAll.end());
    const std::vector<std::size_t> afterIdx(afterAll.begin(),
                                            afterAll.begin() + static_cast<std::ptrdiff_t>(ka));
    if (beforeIdx.back() >= afterIdx.front()) {
        result.problem = "the before and after windows overlap";
        return result;
    }

    Review r;
    r.focusId = f.id;
    r.metric = metric.id;
    r.kind = metric.kind();
    r.better = metric.better;
    r.zones = f.zones;
    r.level = level;
    r.ewmaLambda = ewmaLambda;
    const bool count = r.kind == MetricKind::Count;
    auto fill = [&](ReviewWindow& w, const std::vector<std::size_t>& idx) {
        for (std::size_t i : idx) {
            long num = 0, den = 0;
            for (const Zone& z : f.zones) {
                const ZoneTally& t = tallies->second[i][static_cast<std::size_t>(grid.indexOf(z))];
                num += t.num;
                den += t.den;
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
        w.interval = r.kind == MetricKind::Rate
                         ? stats::wilson(static_cast<double>(w.totalNum), static_cast<double>(w.totalDen), level)
                         : stats::garwood(static_cast<double>(w.totalNum), static_cast<double>(w.totalDen), level);
    };
    fill(r.before, beforeIdx);
    fill(r.after, afterIdx);
    const bool higher = r.better == Better::Higher;
    r.difference = r.after.value - r.before.value;
    const long x1 = r.before.totalNum, n1 = r.before.totalDen, x2 = r.after.totalNum,
               n2 = r.after.totalDen;
    if (r.kind == MetricKind::Rate) {
        r.testName = "Fisher's exact test";
        r.differenceInterval = stats::newcombeDifference(x2, n2, x1, n1, level);
        // Rows: after, before; columns: successes, failures. An odds ratio above 1 means the
        // after window succeeds more often.
        const auto fisher = stats::fisherExact(x2, n2 - x2, x1, n1 - x1);
        r.pTwoSided = fisher.pTwoSided;
        r.pImproved = higher ? fisher.pGreater : fisher.pLess;
        r.probImproved = stats::probRateImproved(x1, n1, x2, n2, higher);
        r.rateRatio = r.before.value > 0 ? r.after.value / r.before.value : kNaN;
    } else {
        r.testName = "exact conditional test for two Poisson rates";
        r.differenceInterval = {kNaN, kNaN};
        const auto test = stats::poissonConditionalTest(x2, static_cast<double>(n2), x1,
                                                        static_cast<double>(n1));
        r.pTwoSided = test.pTwoSided;
        r.pImproved = higher ? test.pGreater : test.pLess;
        r.probImproved = stats::probPoissonRateImproved(x1, static_cast<double>(n1), x2,
                                                        static_cast<double>(n2), higher);
        r.rateRatio = r.before.value > 0 ? r.after.value / r.before.value : kNaN;
    }

    // Match-by-match chart with centre and limits from the before window: a p-chart for rates
    // (NIST/SEMATECH e-Handbook §6.3.3.2), its Poisson counterpart (u-chart, ū ± 3√(ū/e)) for
    // counts and exposures; and the EWMA seeded at the before value (NIST §6.3.2.4).
    std::vector<long> xs = r.before.num, ns = r.before.den;
    xs.insert(xs.end(), r.after.num.begin(), r.after.num.end());
    ns.insert(ns.end(), r.after.den.begin(), r.after.den.end());
    std::vector<std::string> ids = r.before.matchIds;
    ids.insert(ids.end(), r.after.matchIds.begin(), r.after.matchIds.end());
    std::vector<stats::PChartPoint> points;
    if (r.kind == MetricKind::Rate) {
        points = stats::pChart(xs, ns, kb);
    } else {
        const double centre = r.before.value;
        for (std::size_t i = 0; i < xs.size(); ++i) {
            stats::PChartPoint p{};
            p.centre = centre;
            p.p = ns[i] > 0 ? static_cast<double>(xs[i]) / static_cast<double>(ns[i]) : kNaN;
            const double spread = ns[i] > 0 ? 3 * std::sqrt(centre / static_cast<double>(ns[i])) : kNaN;
            p.lcl = ns[i] > 0 ? std::max(0.0, centre - spread) : 0;
            p.ucl = ns[i] > 0 ? centre + spread : kNaN;
            p.above = ns[i] > 0 && p.p > p.ucl;
            p.below = ns[i] > 0 && p.p < p.lcl;
            points.push_back(p);
        }
    }
    double z = r.before.value;
    for (std::size_t i = 0; i < points.size(); ++i) {
        if (!std::isnan(points[i].p)) z = ewmaLambda * points[i].p + (1 - ewmaLambda) * z;
        r.chart.push_back({ids[i], i >= kb, points[i].p, points[i].centre, points[i].lcl,
                           points[i].ucl, points[i].above, points[i].below, z});
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
        return json{{"matches", matches}, {"num", w.totalNum}, {"den", w.totalDen},
                    {"value", number(w.value)}, {"low", number(w.interval.low)},
                    {"high", number(w.interval.high)}};
    };
    json chart = json::array();
    for (const auto& p : r.chart)
        chart.push_back({{"match_id", p.matchId}, {"window", p.after ? "after" : "before"},
                         {"value", number(p.value)}, {"centre", number(p.centre)},
                         {"lcl", number(p.lcl)}, {"ucl", number(p.ucl)}, {"above", p.above},
                         {"below", p.below}, {"ewma", number(p.ewma)}});
    json j{{"focus_id", r.focusId},
           {"metric", r.metric},
           {"kind", toString(r.kind)},
           {"better", toString(r.better)},
           {"zones", zonesJson(r.zones)},
           {"level", r.level},
           {"before", window(r.before)},
           {"after", window(r.after)},
           {"difference", number(r.difference)},
           {"difference_low", number(r.differenceInterval.low)},
           {"difference_high", number(r.differenceInterval.high)},
           {"rate_ratio", number(r.rateRatio)},
           {"test", r.testName},
           {"p_two_sided", number(r.pTwoSided)},
           {"p_improved", number(r.pImproved)},
           {"prob_improved", number(r.probImproved)},
           {"chart", {{"kind", r.kind == MetricKind::Rate ? "p" : "u"},
                      {"ewma_lambda", r.ewmaLambda},
                      {"points", chart}}},
           {"training_minutes", r.trainingMinutes ? json(*r.trainingMinutes) : json()},
           {"training_note", r.trainingNote}};
    return j.dump(2);
}

} // namespace pitchloop::model
