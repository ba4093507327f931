#include "plan_verbs.h"

#include "commands.h"
#include "drills.h"
#include "fixtures.h"
#include "focus.h"
#include "matchreader.h"
#include "planinput.h"
#include "planner.h"
#include "sessions.h"
#include "status.h"
#include "wording.h"

#include <algorithm>
#include <cstdio>
#include <nlohmann/json.hpp>
#include <stdexcept>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

int reportProblems(const Problems& problems, std::ostream& err) {
    for (const auto& p : problems)
        err << "error: " << p.describe() << "\n";
    return kExitBadInput;
}

std::string fixtureLine(const Fixture& f) {
    char buf[300];
    std::snprintf(buf, sizeof buf, "%s %-5s %-7s %-28s %-16s%s", f.date.c_str(),
                  f.kickoff.empty() ? "--:--" : f.kickoff.c_str(), f.venue.c_str(),
                  f.opponent.c_str(), f.competition.c_str(),
                  f.matchId.empty() ? "" : ("  match " + f.matchId).c_str());
    std::string line = buf;
    line.erase(line.find_last_not_of(' ') + 1);
    return line + "\n";
}

nlohmann::json fixtureJson(const Fixture& f) {
    return {{"date", f.date},
            {"kickoff", f.kickoff},
            {"opponent", f.opponent},
            {"venue", f.venue},
            {"competition", f.competition},
            {"match_id", f.matchId.empty() ? nlohmann::json() : nlohmann::json(f.matchId)}};
}

} // namespace

PlanVerbs::PlanVerbs(CLI::App& app) {
    m_fixtures = app.add_subcommand("fixtures", "The squad's season schedule and the microcycle");
    m_fixtures->require_subcommand(1);
    auto squad = [&](CLI::App* sub) {
        sub->add_option("--squad", m_squad, "Squad")->capture_default_str();
    };
    m_import = m_fixtures->add_subcommand("import", "Import fixtures from a CSV or JSON file "
                                                    "(docs/planner.md); a file with a problem "
                                                    "imports nothing");
    m_import->add_option("file", m_file)->required();
    squad(m_import);

    m_add = m_fixtures->add_subcommand("add", "Enter one fixture by hand (replaces the fixture "
                                              "of that date)");
    m_add->add_option("--date", m_date, "YYYY-MM-DD")->required();
    m_add->add_option("--opponent", m_opponent)->required();
    m_add->add_option("--venue", m_venue, "home, away or neutral")->required();
    m_add->add_option("--kickoff", m_kickoff, "HH:MM (leave out while unknown)");
    m_add->add_option("--competition", m_competition);
    squad(m_add);

    m_list = m_fixtures->add_subcommand("list", "The squad's fixtures");
    m_list->add_option("--season", m_season, "Only this season, e.g. 2026-27");
    m_list->add_option("--format", m_format, "table or json")
        ->check(CLI::IsMember({"table", "json"}));
    squad(m_list);

    m_remove = m_fixtures->add_subcommand("remove", "Remove the fixture of a date");
    m_remove->add_option("date", m_date)->required();
    squad(m_remove);

    m_next = m_fixtures->add_subcommand("next", "Previous and next match and the microcycle day "
                                                "of a date (default today)");
    m_next->add_option("--date", m_date, "YYYY-MM-DD");
    m_next->add_option("--format", m_format, "table or json")
        ->check(CLI::IsMember({"table", "json"}));
    squad(m_next);

    m_caps = m_fixtures->add_subcommand("caps", "Show or set the intensity cap of each "
                                                "microcycle day (common practice, no published "
                                                "source)");
    m_caps->add_option("--set", m_setCaps,
                       "JSON, e.g. '{\"md_minus\": [2, 3, 4, 4]}' (keys left out keep the "
                       "defaults)");

    m_plan = app.add_subcommand("plan", "Plan a training session: drills for the open focuses "
                                        "within the day's cap, minutes and players");
    m_plan->add_option("date", m_date, "The session's date, YYYY-MM-DD")->required();
    m_plan->add_option("--minutes", m_minutes, "The session's length")->required();
    m_plan->add_option("--players", m_players, "Players available")->required();
    m_plan->add_option("--pin", m_pin, "Drill id that must be in the plan (repeatable)");
    m_plan->add_option("--remove", m_removeDrills, "Drill id to leave out (repeatable)");
    m_plan->add_option("--swap", m_swap,
                       "OUT:IN — leave drill OUT out and pin drill IN "
                       "(repeatable)");
    m_plan->add_flag("--save", m_save, "Save the session (replaces that date's session)");
    m_plan->add_option("--by", m_by, "Who saves it (with --save)");
    m_plan->add_option("--format", m_format, "table or json")
        ->check(CLI::IsMember({"table", "json"}));
    squad(m_plan);

    m_sessions = app.add_subcommand("sessions", "The squad's saved sessions");
    m_sessions->add_option("--from", m_from, "First date, YYYY-MM-DD");
    m_sessions->add_option("--to", m_to, "Last date, YYYY-MM-DD");
    m_sessions->add_option("--format", m_format, "table or json")
        ->check(CLI::IsMember({"table", "json"}));
    squad(m_sessions);
    m_mark = m_sessions->add_subcommand("mark", "Record how a saved session went: held, changed "
                                                "(minutes per block as done) or cancelled");
    m_mark->add_option("date", m_date, "The session's date, YYYY-MM-DD")->required();
    m_mark->add_option("--outcome", m_outcome, "held, changed or cancelled")
        ->required()
        ->check(CLI::IsMember({"held", "changed", "cancelled"}));
    m_mark->add_option("--players", m_players, "How many players took part (held or changed)");
    m_mark->add_option("--minutes", m_blockMinutes, "Changed: the minutes each block took, in order "
                                                    "(0 for one left out), e.g. --minutes 10 12 0 10");
    m_mark->add_option("--by", m_by, "Who records it")->required();
    squad(m_mark);
}

int PlanVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    if (m_import->parsed()) return runImport(*repo, err);
    if (m_add->parsed()) return runAdd(*repo, err);
    if (m_list->parsed()) return runList(*repo, out, err);
    if (m_remove->parsed()) return runRemove(*repo, err);
    if (m_next->parsed()) return runNext(*repo, out, err);
    if (m_caps->parsed()) return runCaps(*repo, out, err);
    if (m_mark->parsed()) return runMark(*repo, out, err);
    if (m_sessions->parsed()) return runSessions(*repo, out, err);
    return runPlan(*repo, out, err);
}

int PlanVerbs::runImport(ClubRepository& repo, std::ostream& err) {
    std::string text;
    try {
        text = readFileBytes(m_file);
    } catch (const IoError&) {
        err << "error: " << m_file << ": cannot be read\n";
        return kExitBadInput;
    }
    const auto parsed = parseFixtureFile(text, m_file);
    if (!parsed.errors.empty()) {
        reportProblems(parsed.errors, err);
        err << m_file << ": no fixture imported\n";
        return kExitBadInput;
    }
    const FixtureImport r = FixtureStore(repo).importFixtures(m_squad, parsed.fixtures, m_file);
    if (!r.errors.empty()) {
        reportProblems(r.errors, err);
        err << m_file << ": no fixture imported\n";
        return kExitBadInput;
    }
    err << r.added << " added, " << r.updated << " updated, " << r.unchanged << " unchanged, "
        << r.linked << " linked to stored matches\n";
    return kExitOk;
}

int PlanVerbs::runAdd(ClubRepository& repo, std::ostream& err) {
    const Fixture f{m_date, m_kickoff, m_opponent, m_venue, m_competition, ""};
    const FixtureImport r = FixtureStore(repo).importFixtures(m_squad, {f}, "fixture");
    if (!r.errors.empty()) return reportProblems(r.errors, err);
    err << (r.added     ? "added"
            : r.updated ? "updated"
                        : "unchanged:")
        << " fixture " << f.date << " against " << f.opponent
        << (r.linked ? " (linked to its match)" : "") << "\n";
    return kExitOk;
}

int PlanVerbs::runList(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const auto fixtures = FixtureStore(repo).list(m_squad, m_season);
    if (m_format == "json") {
        nlohmann::json list = nlohmann::json::array();
        for (const auto& f : fixtures)
            list.push_back(fixtureJson(f));
        out << nlohmann::json{{"format", "pitchloop-fixtures"}, {"version", 1}, {"fixtures", list}}
                   .dump(2)
            << "\n";
        return kExitOk;
    }
    for (const auto& f : fixtures)
        out << fixtureLine(f);
    if (fixtures.empty()) err << "(no fixtures yet: pitchloop fixtures import FILE)\n";
    return kExitOk;
}

int PlanVerbs::runRemove(ClubRepository& repo, std::ostream& err) {
    if (!FixtureStore(repo).remove(m_squad, m_date)) {
        err << "error: no fixture of " << m_squad << " on " << m_date << "\n";
        return kExitBadInput;
    }
    err << "removed the fixture of " << m_date << "\n";
    return kExitOk;
}

int PlanVerbs::runNext(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const std::string date = m_date.empty() ? today() : m_date;
    if (!dayNumber(date)) {
        err << "error: --date " << date << ": expected a date YYYY-MM-DD\n";
        return kExitBadInput;
    }
    FixtureStore store(repo);
    const MicrocycleDay day = microcycle(date, store.list(m_squad, seasonOf(date)));
    const auto cap = intensityCap(day, store.caps());
    if (m_format == "json") {
        out << nlohmann::json{{"date", date},
                              {"label", day.label},
                              {"congested", day.congested},
                              {"cap", cap ? nlohmann::json(*cap) : nlohmann::json()},
                              {"previous",
                               day.previous ? fixtureJson(*day.previous) : nlohmann::json()},
                              {"next", day.next ? fixtureJson(*day.next) : nlohmann::json()},
                              {"days_after_previous", day.daysAfterPrevious
                                                          ? nlohmann::json(*day.daysAfterPrevious)
                                                          : nlohmann::json()},
                              {"days_to_next",
                               day.daysToNext ? nlohmann::json(*day.daysToNext) : nlohmann::json()}}
                   .dump(2)
            << "\n";
        return kExitOk;
    }
    if (day.label.empty()) {
        err << "error: " << m_squad << " has no fixtures in season " << seasonOf(date)
            << " (pitchloop fixtures import FILE)\n";
        return kExitBadInput;
    }
    out << date << ": " << day.label << (day.congested ? " (congested week)" : "")
        << ", intensity cap " << *cap
        << (*cap >= kIntensityMin ? " (" + std::string(intensityName(*cap)) + ")" : " (no session)")
        << "\n";
    if (day.previous)
        out << "previous: " << *day.daysAfterPrevious << " days ago  "
            << fixtureLine(*day.previous);
    if (day.next)
        out << "next:     "
            << (*day.daysToNext == 0 ? "today       "
                                     : "in " + std::to_string(*day.daysToNext) + " days   ")
            << fixtureLine(*day.next);
    return kExitOk;
}

int PlanVerbs::runCaps(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    FixtureStore store(repo);
    if (!m_setCaps.empty()) {
        const CapsResult r = parseCaps(m_setCaps, "--set");
        if (!r.errors.empty()) return reportProblems(r.errors, err);
        store.saveCaps(r.caps);
        err << "saved the intensity caps\n";
    }
    const IntensityCaps caps = store.caps();
    out << "Intensity cap per microcycle day (1 recovery … 5 maximal, 0 no session; common "
           "practice, no published source)\n";
    auto line = [&](const std::string& day, int cap) {
        char buf[120];
        std::snprintf(buf, sizeof buf, "  %-32s %d %s\n", day.c_str(), cap,
                      cap >= kIntensityMin ? std::string(intensityName(cap)).c_str()
                                           : "no session");
        out << buf;
    };
    line("MD", caps.matchDay);
    for (int n = 1; n <= kRecoveryDays; ++n)
        line("MD+" + std::to_string(n), caps.after(n));
    for (int n = 4; n >= 1; --n)
        line("MD-" + std::to_string(n), caps.before(n));
    line("other days", caps.otherDays);
    out << "other days: MD-5 and earlier, and MD+3 and later after the last fixture; congested "
           "weeks take the lower cap of their two days\n";
    return kExitOk;
}

int PlanVerbs::runPlan(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    if (m_save && m_by.empty()) {
        err << "error: --save needs --by NAME (who saves it)\n";
        return kExitBadInput;
    }
    std::vector<std::string> notes;
    PlanRequest req = planRequestFor(repo, m_squad, m_date, m_minutes, m_players, notes);
    for (const auto& n : notes) err << "note: " << n << "\n";
    req.pinned = m_pin;
    req.removed = m_removeDrills;
    for (const auto& s : m_swap) {
        const auto colon = s.find(':');
        try {
            if (colon == std::string::npos) throw std::invalid_argument(s);
            req = swapDrill(std::move(req), std::stoll(s.substr(0, colon)),
                            std::stoll(s.substr(colon + 1)));
        } catch (const std::exception&) {
            err << "error: --swap " << s << ": expected OUT:IN, two drill ids\n";
            return kExitBadInput;
        }
    }

    const PlanResult result = planSession(req);
    if (!result.plan) {
        err << "error: " << result.problem << "\n";
        err << "no session planned; nothing saved\n";
        return kExitBadInput;
    }
    const Plan& p = *result.plan;
    if (m_format == "json") {
        nlohmann::json blocks = nlohmann::json::array();
        for (const auto& b : p.blocks)
            blocks.push_back({{"role", toString(b.role)},
                              {"drill_id", b.drillId},
                              {"title", b.title},
                              {"minutes", b.minutes},
                              {"intensity", b.intensity},
                              {"pinned", b.pinned},
                              {"focus_id", b.focus && req.focuses[*b.focus].id
                                               ? nlohmann::json(req.focuses[*b.focus].id)
                                               : nlohmann::json()},
                              {"why", b.why}});
        nlohmann::json focusMinutes = nlohmann::json::array();
        for (const auto& fm : p.focusMinutes) {
            const PlanFocus& f = req.focuses[fm.focus];
            focusMinutes.push_back({{"focus_id", fm.focusId},
                                    {"watched", f.watched},
                                    {"metric", f.metric},
                                    {"band", f.band},
                                    {"lane", f.lane},
                                    {"state", toString(f.state)},
                                    {"severity", f.severity},
                                    {"minutes", fm.minutes}});
        }
        out << nlohmann::json{{"date", p.date},
                              {"squad", m_squad},
                              {"day", p.day.label},
                              {"cap", p.cap},
                              {"minutes", p.sessionMinutes},
                              {"minutes_used", p.minutesUsed},
                              {"players", p.playersAvailable},
                              {"blocks", blocks},
                              {"focus_minutes", focusMinutes},
                              {"objective", p.objective},
                              {"notes", p.notes},
                              {"caution", p.caution}}
                   .dump(2)
            << "\n";
    } else {
        out << "Session " << p.date << " for " << m_squad << ": " << p.day.label << ", cap "
            << p.cap << " (" << intensityName(p.cap) << "), " << p.minutesUsed << " of "
            << p.sessionMinutes << " minutes, " << p.playersAvailable << " players\n\n";
        for (const auto& b : p.blocks) {
            const char* role = b.role == BlockRole::WarmUp     ? "warm-up"
                               : b.role == BlockRole::CoolDown ? "cool-down"
                                                               : "main";
            char line[400];
            std::snprintf(line, sizeof line, "%3d min  %-9s drill %-4lld %s (intensity %d)\n",
                          b.minutes, role, static_cast<long long>(b.drillId), b.title.c_str(),
                          b.intensity);
            out << line << "         " << b.why << "\n";
        }
        if (!p.focusMinutes.empty()) {
            out << "\nMinutes per open focus and watched zone (most severe first):\n";
            std::vector<FocusMinutes> ranked = p.focusMinutes;
            std::stable_sort(ranked.begin(), ranked.end(), [&](const auto& a, const auto& b) {
                return req.focuses[a.focus].severity > req.focuses[b.focus].severity;
            });
            for (const auto& fm : ranked) {
                const PlanFocus& f = req.focuses[fm.focus];
                const std::string who = f.watched ? std::string("watched") : "focus " + std::to_string(fm.focusId);
                const std::string what = (f.metricName.empty() ? f.metric : f.metricName) + " · " + f.zoneName;
                const std::string state =
                    words::stateName(f.state) + (f.severity > 0 ? "" : ": no priority today");
                char line[400];
                std::snprintf(line, sizeof line, "  %-10s %-70s %-32s %3d min\n", who.c_str(), what.c_str(),
                              state.c_str(), fm.minutes);
                out << line;
            }
        }
        for (const auto& n : p.notes) out << "\nNote: " << n << "\n";
        out << "\n" << p.caution << "\n";
    }
    if (m_save) {
        const SessionSave s = SessionStore(repo).save(m_squad, p, m_by, nowUtc());
        err << (s.replaced ? "saved (replacing the earlier plan of " : "saved the session of ")
            << p.date << (s.replaced ? ")" : "") << "\n";
    }
    return kExitOk;
}

int PlanVerbs::runSessions(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    for (const auto* d : {&m_from, &m_to})
        if (!d->empty() && !dayNumber(*d)) {
            err << "error: " << (d == &m_from ? "--from" : "--to") << " '" << *d
                << "': expected a date YYYY-MM-DD\n";
            return kExitBadInput;
        }
    const auto sessions = SessionStore(repo).list(m_squad, m_from, m_to);
    DrillBook book(repo);
    auto title = [&](std::int64_t id) {
        const auto d = book.get(id);
        return d ? d->title : "drill " + std::to_string(id);
    };
    if (m_format == "json") {
        nlohmann::json list = nlohmann::json::array();
        for (const auto& s : sessions) {
            nlohmann::json blocks = nlohmann::json::array();
            for (const auto& b : s.blocks)
                blocks.push_back({{"role", toString(b.role)},
                                  {"drill_id", b.drillId},
                                  {"title", title(b.drillId)},
                                  {"minutes", b.minutes},
                                  {"pinned", b.pinned}});
            nlohmann::json focus = nlohmann::json::array();
            for (const auto& [id, minutes] : s.focusMinutes)
                focus.push_back({{"focus_id", id}, {"minutes", minutes}});
            list.push_back({{"date", s.date},
                            {"squad", s.squad},
                            {"day", s.dayLabel},
                            {"minutes", s.minutes},
                            {"players", s.players},
                            {"cap", s.cap},
                            {"blocks", blocks},
                            {"focus_minutes", focus},
                            {"saved_by", s.savedBy},
                            {"saved_at", s.savedAt},
                            {"outcome", toString(s.outcome)},
                            {"players_present", s.playersPresent ? nlohmann::json(*s.playersPresent) : nlohmann::json()},
                            {"held_minutes", [&] {
                                 nlohmann::json held = nlohmann::json::array();
                                 for (const auto& m : s.heldMinutes) held.push_back(m ? nlohmann::json(*m) : nlohmann::json());
                                 return held;
                             }()},
                            {"recorded_by", s.recordedBy},
                            {"recorded_at", s.recordedAt}});
        }
        out << list.dump(2) << "\n";
        return kExitOk;
    }
    for (const auto& s : sessions) {
        out << s.date << "  " << s.dayLabel << "  " << s.minutes << " min, " << s.players
            << " players, cap " << s.cap << "  " << toString(s.outcome)
            << (s.playersPresent ? " (" + std::to_string(*s.playersPresent) + " took part)" : std::string()) << "\n";
        for (std::size_t i = 0; i < s.blocks.size(); ++i) {
            const auto& b = s.blocks[i];
            std::string done;
            if (i < s.heldMinutes.size() && s.heldMinutes[i].has_value() && s.heldMinutes[i].value() != b.minutes)
                done = "  (done: " + std::to_string(s.heldMinutes[i].value()) + " min)";
            out << "    " << b.minutes << " min  " << toString(b.role) << "  " << title(b.drillId) << done << "\n";
        }
    }
    if (sessions.empty()) err << "(no saved sessions: pitchloop plan DATE ... --save)\n";
    return kExitOk;
}

int PlanVerbs::runMark(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    SessionRecord how;
    how.outcome = *sessionOutcomeFromString(m_outcome);
    how.playersPresent = m_players;
    how.blockMinutes = m_blockMinutes;
    if (how.outcome != SessionOutcome::Changed && !m_blockMinutes.empty()) {
        err << "error: --minutes: only a changed session takes the minutes of its blocks\n";
        return kExitBadInput;
    }
    const Problems problems = SessionStore(repo).record(m_squad, m_date, how, today(), m_by, nowUtc());
    if (!problems.empty()) {
        for (const auto& p : problems) err << "error: " << p.describe() << "\n";
        err << "nothing recorded\n";
        return kExitBadInput;
    }
    out << "recorded the session of " << m_date << " as " << m_outcome << "\n";
    return kExitOk;
}

} // namespace pitchloop::cli
