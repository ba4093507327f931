#include "focus_verbs.h"

#include "commands.h"
#include "focus.h"
#include "format.h"
#include "moments.h"
#include "exports.h"
#include "sessions.h"
#include "wording.h"

#include <SQLiteCpp/Column.h>
#include <SQLiteCpp/Statement.h>
#include <nlohmann/json.hpp>

#include <cmath>
#include <cstdio>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

std::string zonesText(const std::vector<Zone>& zones, const ZoneGrid& grid) {
    std::string s;
    for (const auto& z : zones) s += (s.empty() ? "" : ", ") + zoneName(z.band, z.lane, grid);
    return s;
}

} // namespace

FocusVerbs::FocusVerbs(CLI::App& app) {
    m_group = app.add_subcommand("focus", "Training focuses opened from slipped targets");
    m_group->require_subcommand(1);
    m_open = m_group->add_subcommand("open", "Open a focus from a match's flag, freezing its "
                                             "evidence");
    m_open->add_option("--match", m_match, "The match whose debrief showed the slip")->required();
    m_open->add_option("--metric", m_metric, "Metric id")->required();
    m_open->add_option("--zone", m_zones, "Zone BAND,LANE (repeatable), or 0,0 for the whole pitch")
        ->required();
    m_open->add_option("--drill", m_drills, "Drill id to work on it (repeatable)");
    m_open->add_option("--by", m_by, "Who opens it")->required();
    m_open->add_option("--start", m_start, "First day of training on it (default: the day after "
                                           "the match)");
    m_open->add_option("--review-after", m_reviewAfter, "Review after this many matches")
        ->capture_default_str()
        ->check(CLI::Range(1, 20));
    m_open->add_option("--review-on", m_reviewOn, "Or review on this date");
    m_open->add_option("--note", m_note, "A note for the staff");
    m_open->add_option("--min-change", m_minChange,
                       "The smallest improvement that would matter, in the metric's unit (a "
                       "share for rates: 0.08 is 8 points; default: the target's watch margin)")
        ->check(CLI::Range(0.0, 1000.0));

    m_link = m_group->add_subcommand("link", "Link a drill to a focus");
    m_unlink = m_group->add_subcommand("unlink", "Unlink a drill from a focus");
    for (auto* sub : {m_link, m_unlink}) {
        sub->add_option("focus", m_focus)->required();
        sub->add_option("drill", m_drill)->required();
    }
    m_list = m_group->add_subcommand("list", "Focuses with their state");
    m_list->add_option("--format", m_format)->check(CLI::IsMember({"table", "json"}));
    m_show = m_group->add_subcommand("show", "One focus with its frozen evidence and drills");
    m_show->add_option("focus", m_focus)->required();

    m_review = app.add_subcommand("review", "Did the focus move the metric? Before vs after, "
                                            "with honest statistics; record the verdict");
    m_review->add_option("focus", m_focus, "Focus id")->required();
    m_review->add_option("--before", m_before, "Matches before the start (default: the focus's "
                                               "review point)");
    m_review->add_option("--after", m_after, "Matches from the start on (default: the same)");
    m_review->add_option("--level", m_level, "Interval level")->capture_default_str()
        ->check(CLI::Range(0.5, 0.999));
    m_review->add_option("--format", m_format, "table or json")
        ->check(CLI::IsMember({"table", "json"}));
    m_review->add_option("--verdict", m_verdict, "Record: worked, partly, no_change or cant_tell "
                                                 "(closes the focus, stores the numbers)")
        ->check(CLI::IsMember({"worked", "partly", "no_change", "cant_tell"}));
    m_review->add_option("--by", m_by, "Who records the verdict");
    m_review->add_option("--note", m_note, "The coach's notes with the verdict");
    m_review->add_option("--moments", m_momentsOut,
                         "Also write the moments behind the baseline and the matches after, side by "
                         "side, as CSV to this file (docs/moments.md)");
}

int FocusVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    if (m_open->parsed()) return runOpen(*repo, out, err);
    if (m_link->parsed()) return runLink(*repo, true, err);
    if (m_unlink->parsed()) return runLink(*repo, false, err);
    if (m_list->parsed()) return runList(*repo, out);
    if (m_show->parsed()) return runShow(*repo, out, err);
    return runReview(*repo, out, err);
}

int FocusVerbs::runOpen(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const auto summary = repo.matchSummary(m_match);
    const auto where = repo.seasonOfMatch(m_match);
    if (!summary || !where) {
        err << "error: --match: no match '" << m_match << "' (see: pitchloop matches)\n";
        return kExitBadInput;
    }
    const auto metric = repo.metric(m_metric);
    if (!metric) {
        err << "error: --metric: no metric '" << m_metric << "' (see: pitchloop metrics list)\n";
        return kExitBadInput;
    }
    const ZoneGrid grid = repo.tallyGrid();
    std::vector<Zone> zones;
    for (const auto& text : m_zones) {
        auto z = text == "0,0" ? std::optional<Zone>(Zone{0, 0}) : parseZone(text);
        if (!z || z->band > grid.bands() || z->lane > grid.lanes()) {
            err << "error: --zone " << text << ": expected BAND,LANE within the " << grid.name()
                << " grid\n";
            return kExitBadInput;
        }
        zones.push_back(*z);
    }
    const bool whole = std::any_of(zones.begin(), zones.end(), [](Zone z) { return z.band == 0; });
    if (whole && zones.size() > 1) {
        err << "error: --zone 0,0 (the whole pitch) stands alone\n";
        return kExitBadInput;
    }
    if (whole) {
        zones.clear();
        for (int i = 0; i < grid.zoneCount(); ++i) zones.push_back(grid.zoneAt(i));
    }
    FocusStore store(repo);
    for (auto d : m_drills)
        if (!store.drillExists(d)) {
            err << "error: --drill " << d << ": no drill " << d << " (see: pitchloop drills list)\n";
            return kExitBadInput;
        }
    const std::string start = m_start.empty() ? dayAfter(summary->date) : m_start;
    if (!isIsoDate(start) || (!m_reviewOn.empty() && !isIsoDate(m_reviewOn))) {
        err << "error: --start and --review-on take dates YYYY-MM-DD\n";
        return kExitBadInput;
    }
    if (start <= summary->date) {
        err << "error: --start " << start << ": a focus starts after the match that opened it ("
            << summary->date << ")\n";
        return kExitBadInput;
    }
    // Freeze the evidence: the flag's numbers for these zones at that match, every window.
    const SeasonTallies season = repo.seasonTallies(where->first, where->second);
    std::size_t focal = 0;
    for (std::size_t i = 0; i < season.matchIds.size(); ++i)
        if (season.matchIds[i] == m_match) focal = i;
    const FlagSettings settings = repo.flagSettings();
    const FocusEvidence evidence =
        focusEvidence(season, focal, *metric, repo.targets(where->first, where->second), grid,
                      settings, zones, whole, nowUtc());
    const bool slipped = evidence.slipped;
    Focus f;
    f.squad = where->first;
    f.season = where->second;
    f.metric = metric->id;
    f.zones = zones;
    f.openedAfterMatch = m_match;
    f.startDate = start;
    f.reviewAfterMatches = m_reviewAfter;
    f.reviewOn = m_reviewOn;
    f.evidence = evidence.json;
    f.note = m_note;
    if (m_minChange) f.minChange = *m_minChange;
    f.openedBy = m_by;
    f.drills = m_drills;
    const auto overlapping = overlappingOpenFocuses(store.list(), f.metric, f.zones);
    const auto id = store.open(f, nowUtc());
    for (auto other : overlapping)
        err << "note: focus " << other << " on " << metric->id
            << " and the same zone is still open; their reviews will count the same matches\n";
    if (!slipped)
        err << "note: " << zonesText(whole ? std::vector<Zone>{{0, 0}} : zones, grid) << " of "
            << metric->id << " is neither off target, likely off nor close to the line over " << settings.window.name()
            << " at " << m_match << "; the focus is opened anyway\n";
    out << id << "\n";
    err << "opened focus " << id << " on " << metric->id << " ("
        << (whole ? "whole pitch" : zonesText(zones, grid)) << ") from " << start << ", review after "
        << m_reviewAfter << " matches" << (m_reviewOn.empty() ? "" : " or on " + m_reviewOn)
        << ", " << m_drills.size() << " drills linked\n";
    return kExitOk;
}

int FocusVerbs::runLink(ClubRepository& repo, bool link, std::ostream& err) {
    FocusStore store(repo);
    if (!store.get(m_focus)) {
        err << "error: no focus " << m_focus << " (see: pitchloop focus list)\n";
        return kExitBadInput;
    }
    if (link) {
        if (!store.drillExists(m_drill)) {
            err << "error: no drill " << m_drill << " (see: pitchloop drills list)\n";
            return kExitBadInput;
        }
        store.linkDrill(m_focus, m_drill, nowUtc());
        err << "linked drill " << m_drill << " to focus " << m_focus << "\n";
    } else if (!store.unlinkDrill(m_focus, m_drill)) {
        err << "error: drill " << m_drill << " is not linked to focus " << m_focus << "\n";
        return kExitBadInput;
    } else {
        err << "unlinked drill " << m_drill << " from focus " << m_focus << "\n";
    }
    return kExitOk;
}

int FocusVerbs::runList(ClubRepository& repo, std::ostream& out) {
    FocusStore store(repo);
    const std::string day = today();
    nlohmann::json list = nlohmann::json::array();
    for (const auto& f : store.list()) {
        const auto season = repo.seasonTallies(f.squad, f.season);
        const int since = matchesSince(season, f.startDate, day);
        const FocusState state = focusState(f, since, day);
        if (m_format == "json") {
            list.push_back({{"id", f.id}, {"metric", f.metric}, {"state", toString(state)},
                            {"start_date", f.startDate}, {"matches_since_start", since},
                            {"review_after_matches", f.reviewAfterMatches},
                            {"drills", f.drills}, {"verdict", f.verdict}});
            continue;
        }
        char line[400];
        std::snprintf(line, sizeof line, "%3lld  %-15s %-24s %-28s from %s  %d/%d matches  %zu drills%s\n",
                      static_cast<long long>(f.id), std::string(toString(state)).c_str(),
                      f.metric.c_str(),
                      (f.zones.size() > 3 ? std::to_string(f.zones.size()) + " zones" : zonesText(f.zones, f.grid)).c_str(),
                      f.startDate.c_str(), since, f.reviewAfterMatches, f.drills.size(),
                      f.verdict.empty() ? "" : ("  verdict: " + f.verdict).c_str());
        out << line;
    }
    if (m_format == "json") out << list.dump(2) << "\n";
    return kExitOk;
}

int FocusVerbs::runShow(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    FocusStore store(repo);
    const auto f = store.get(m_focus);
    if (!f) {
        err << "error: no focus " << m_focus << " (see: pitchloop focus list)\n";
        return kExitBadInput;
    }
    const auto season = repo.seasonTallies(f->squad, f->season);
    out << "Focus " << f->id << ": " << f->metric << " in " << zonesText(f->zones, f->grid)
        << (f->grid == repo.tallyGrid() ? "" : " of " + f->grid.name() + " (the grid it was opened on)")
        << "\n"
        << "  " << f->squad << " " << f->season << ", opened by " << f->openedBy << " after "
        << f->openedAfterMatch << ", training from " << f->startDate << "\n"
        << "  state " << toString(focusState(*f, matchesSince(season, f->startDate, today()), today()))
        << "; review after " << f->reviewAfterMatches << " matches"
        << (f->reviewOn.empty() ? "" : " or on " + f->reviewOn) << "\n";
    if (!f->note.empty()) out << "  note: " << f->note << "\n";
    out << "  drills:";
    for (auto d : f->drills) {
        SQLite::Statement q(repo.database(), "SELECT title FROM drill_version WHERE drill_id = ? "
                                             "ORDER BY id DESC LIMIT 1");
        q.bind(1, d);
        out << "\n    " << d << "  " << (q.executeStep() ? q.getColumn(0).getString() : "?");
    }
    if (f->drills.empty()) out << " none (pitchloop focus link FOCUS DRILL)";
    out << "\n  evidence frozen at opening:\n";
    const auto evidence = nlohmann::json::parse(f->evidence);
    const auto metric = repo.metric(f->metric);
    const MetricKind kind = metric ? metric->kind() : MetricKind::Rate;
    auto value = [&](const nlohmann::json& v) {
        return v.is_null() ? std::string("-") : formatValue(kind, v.get<double>());
    };
    for (const auto& z : evidence["zones"]) {
        char line[300];
        const auto state = flagStateFromString(z["state"].get<std::string>());
        const auto window = Window::parse(z["window"].get<std::string>());
        std::snprintf(line, sizeof line, "    %-44s %-18s %9s [%s]  %-18s P(miss) %s\n",
                      zoneName(z["band"], z["lane"], f->grid).c_str(),
                      window ? words::windowName(*window).c_str() : z["window"].get<std::string>().c_str(),
                      value(z["value"]).c_str(),
                      z["low"].is_null() || z["high"].is_null()
                          ? "–"
                          : words::interval(kind, {z["low"].get<double>(), z["high"].get<double>()}).c_str(),
                      state ? words::stateName(*state).c_str() : z["state"].get<std::string>().c_str(),
                      z["p_miss"].is_null() ? "–" : words::probability(z["p_miss"].get<double>()).c_str());
        out << line;
    }
    if (!f->verdict.empty())
        out << "  closed " << f->closedAt << " with verdict " << f->verdict
            << (f->verdictNote.empty() ? "" : ": " + f->verdictNote) << "\n";
    return kExitOk;
}

int FocusVerbs::runReview(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    FocusStore store(repo);
    const auto f = store.get(m_focus);
    if (!f) {
        err << "error: no focus " << m_focus << " (see: pitchloop focus list)\n";
        return kExitBadInput;
    }
    if (!f->closedAt.empty()) {
        // A closed focus shows the numbers stored with its verdict: a later data change never
        // rewrites that history.
        const auto stored = store.reviews(f->id);
        if (!m_verdict.empty()) {
            err << "error: focus " << f->id << " was closed on " << f->closedAt
                << " with verdict " << f->verdict << "\n";
            return kExitBadInput;
        }
        if (!stored.empty()) {
            if (m_format == "json") {
                out << stored.back().numbers << "\n";
            } else {
                out << "Focus " << f->id << " closed " << f->closedAt << " by " << stored.back().by
                    << ": " << stored.back().verdict
                    << (stored.back().note.empty() ? "" : " — " + stored.back().note)
                    << "\nNumbers as stored then (pitchloop review " << f->id
                    << " --format json):\n"
                    << stored.back().numbers << "\n";
            }
            return kExitOk;
        }
    }
    const auto metric = repo.metric(f->metric);
    if (!metric) {
        err << "error: focus " << f->id << " works on metric '" << f->metric
            << "', which is no longer defined\n";
        return kExitBadInput;
    }
    const int kBefore = m_before > 0 ? m_before : f->reviewAfterMatches;
    const int kAfter = m_after > 0 ? m_after : f->reviewAfterMatches;
    // A focus keeps the grid it was opened on; its review counts on that grid.
    // Only matches played by today count.
    const auto season = playedBy(repo.seasonTallies(f->squad, f->season, f->grid), today());
    const auto result = computeReview(*f, *metric, season, f->grid, kBefore, kAfter, m_level);
    if (!result.review) {
        err << "error: focus " << f->id << ": " << result.problem << "\n";
        return kExitBadInput;
    }
    Review r = *result.review;
    // Training time: the minutes sessions held gave this focus, from the start to the last
    // match reviewed (the same count the app's focus list shows up to today).
    const FocusTraining held = SessionStore(repo).trainingOnFocus(f->id, f->startDate, r.after.dates.back());
    r.trainingMinutes = held.heldMinutes;
    r.trainingNote = trainingNote(held, f->startDate, r.after.dates.back()) + " (the last match reviewed)";
    const std::string json = reviewToJson(r);
    if (!m_momentsOut.empty()) {
        const auto before = storedMomentsIn(repo, *metric, f->grid, f->zones, r.before.matchIds);
        const auto after = storedMomentsIn(repo, *metric, f->grid, f->zones, r.after.matchIds);
        try {
            writeFileAtomically(m_momentsOut, reviewMomentsCsv(before, after));
        } catch (const IoError& e) {
            err << "error: " << e.what() << "\n";
            return kExitBadInput;
        }
        err << "wrote " << before.size() << " moments before and " << after.size() << " after to "
            << m_momentsOut << "\n";
    }
    if (!m_verdict.empty()) {
        if (m_by.empty()) {
            err << "error: --verdict needs --by NAME (who records it)\n";
            return kExitBadInput;
        }
        store.close(f->id, *verdictFromString(m_verdict), m_note, m_by, json, nowUtc());
        err << "closed focus " << f->id << " with verdict " << m_verdict
            << "; the numbers are stored with it\n";
    }
    if (m_format == "json") {
        out << json << "\n";
        return kExitOk;
    }
    const MetricKind kind = r.kind;
    const std::string unit = kind == MetricKind::Count ? " a match" : "";
    auto windowLine = [&](const char* name, const ReviewWindow& w) {
        char line[300];
        std::snprintf(line, sizeof line, "%-7s %s … %s (%zu matches): %ld/%ld → %s%s [%g %% %s–%s]\n",
                      name, w.matchIds.front().c_str(), w.matchIds.back().c_str(), w.matchIds.size(),
                      w.totalNum, w.totalDen, formatValue(kind, w.value).c_str(), unit.c_str(),
                      100 * r.level, formatValue(kind, w.interval.low).c_str(),
                      formatValue(kind, w.interval.high).c_str());
        out << line;
    };
    out << "Focus " << f->id << ": " << r.metric << " in " << zonesText(r.zones, f->grid) << " ("
        << toString(kind) << ", " << toString(r.better) << " is better), training from "
        << f->startDate << "\n";
    if (r.before.matchIds.empty()) out << "before  none: " << r.baselineNote << "\n";
    else windowLine("before", r.before);
    if (!r.trigger.matchIds.empty()) windowLine("flag", r.trigger);
    windowLine("after", r.after);
    if (!r.before.matchIds.empty()) out << "        (baseline: " << r.baselineNote << ")\n";
    char line[600];
    auto amount = [&](double v) {
        char b[64];
        if (kind == MetricKind::Rate) std::snprintf(b, sizeof b, "%+.1f points", 100 * v);
        else std::snprintf(b, sizeof b, "%+.2f%s", v, unit.c_str());
        return std::string(b);
    };
    if (r.finding != ReviewFinding::NoBaseline) {
        std::snprintf(line, sizeof line,
                      "change  %s; the untrained zones moved from %s to %s, so without training "
                      "this zone would be at %s\n"
                      "effect  %s [%g %% %s to %s], after − expected (difference in differences)\n",
                      amount(r.difference).c_str(), formatValue(kind, r.controlBefore.value).c_str(),
                      formatValue(kind, r.controlAfter.value).c_str(),
                      formatValue(kind, r.expected).c_str(), amount(r.effect).c_str(),
                      100 * r.level, amount(r.effectInterval.low).c_str(),
                      amount(r.effectInterval.high).c_str());
        out << line;
        std::snprintf(line, sizeof line,
                      "belief  P(improved by at least %s) = %.3f, P(improved at all) = %.3f "
                      "(one-sided p = %.4g; match-to-match dispersion %.3g)\n",
                      amount(r.minChange).substr(1).c_str(), r.probImprovedByMinChange,
                      r.probImproved, r.pImproved, r.dispersion);
        out << line;
    }
    out << "finding " << toString(r.finding) << "\n";
    if (r.target) {
        std::snprintf(line, sizeof line, "target  %s %s: P(the after matches meet it) = %.3f\n",
                      r.target->direction == Direction::AtLeast ? "at least" : "at most",
                      formatValue(kind, r.target->value).c_str(), r.probAfterMeetsTarget);
        out << line;
    }
    out << "A few matches cannot show that the drills caused a change: opponents, line-ups and "
           "luck vary too.\n";
    out << "\nMatch by match (" << (kind == MetricKind::Rate ? "p-chart" : "u-chart")
        << ": centre and 3σ limits from the baseline, widened for match-to-match variation; "
           "chance-weighted EWMA λ "
        << r.ewmaLambda << " from the first match shown)\n";
    for (const auto& p : r.chart) {
        std::snprintf(line, sizeof line, "  %-12s %-6s %9s   limits %s–%s   ewma %s%s\n",
                      p.matchId.c_str(), p.after ? "after" : p.trigger ? "flag" : "before",
                      formatValue(kind, p.value).c_str(), formatValue(kind, p.lcl).c_str(),
                      formatValue(kind, p.ucl).c_str(), formatValue(kind, p.ewma).c_str(),
                      p.above ? "   above the upper limit" : p.below ? "   below the lower limit" : "");
        out << line;
    }
    out << "\nTraining time: " << r.trainingNote << ".\n";
    if (m_verdict.empty())
        out << "Record the staff's verdict with: pitchloop review " << f->id
            << " --verdict worked|partly|no_change|cant_tell --by NAME --note \"...\"\n";
    return kExitOk;
}

} // namespace pitchloop::cli
