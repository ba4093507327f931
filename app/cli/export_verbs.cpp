#include "export_verbs.h"

#include "calendar.h"
#include "commands.h"
#include "exports.h"
#include "fixtures.h"
#include "focus.h"
#include "printing.h"
#include "sessions.h"
#include "verbs.h"

#include <cstdio>

namespace pitchloop::cli {

using namespace pitchloop::model;


ExportVerbs::ExportVerbs(CLI::App& app) {
    m_group = app.add_subcommand("export", "Write files to share: CSV, iCalendar, PDF "
                                           "(docs/exports.md)");
    m_group->require_subcommand(1);
    auto out = [&](CLI::App* sub, const char* what) {
        sub->add_option("-o,--out", m_out, std::string("The file to write (") + what + ")")
            ->required();
    };
    auto squad = [&](CLI::App* sub) {
        sub->add_option("--squad", m_squad, "Squad")->capture_default_str();
    };

    m_statuses = m_group->add_subcommand("statuses", "A match's zone statuses as CSV");
    m_statuses->add_option("match", m_match, "Match id")->required();
    m_statuses->add_option("--window", m_windows, "match, lastN, season or ewma[λ] (repeatable)");
    m_statuses->add_option("--metric", m_metrics, "Only this metric (repeatable)");
    out(m_statuses, "CSV; - for standard output");

    m_tallies = m_group->add_subcommand("tallies", "Stored tallies per zone as CSV");
    m_tallies->add_option("--match", m_match, "Only this match");
    m_tallies->add_option("--metric", m_metrics, "Only this metric")->expected(0, 1);
    out(m_tallies, "CSV; - for standard output");

    m_calendar = m_group->add_subcommand(
        "calendar", "Planned sessions and focus review dates as an iCalendar (.ics) file");
    m_calendar->add_option("--from", m_from, "First date, YYYY-MM-DD (default: every date)");
    m_calendar->add_option("--to", m_to, "Last date, YYYY-MM-DD");
    m_calendar->add_option("--start", m_start, "Sessions start at HH:MM local time")
        ->capture_default_str();
    squad(m_calendar);
    out(m_calendar, ".ics; - for standard output");

    m_sheet = m_group->add_subcommand("sheet", "The one-page PDF sheet of a saved session");
    m_sheet->add_option("date", m_date, "The session's date, YYYY-MM-DD")->required();
    squad(m_sheet);
    out(m_sheet, "PDF");

    m_debrief = m_group->add_subcommand("debrief", "A match debrief as PDF: the slipped targets "
                                                   "on pitch maps");
    m_debrief->add_option("match", m_match, "Match id")->required();
    out(m_debrief, "PDF");
}

int ExportVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    if (m_statuses->parsed()) return runStatuses(*repo, out, err);
    if (m_tallies->parsed()) return runTallies(*repo, out, err);
    if (m_calendar->parsed()) return runCalendar(*repo, out, err);
    if ((m_sheet->parsed() || m_debrief->parsed()) && m_out == "-") {
        err << "error: --out: a PDF needs a file name\n";
        return kExitBadInput;
    }
    if (m_sheet->parsed()) {
        if (!dayNumber(m_date)) {
            err << "error: date '" << m_date << "': expected a date YYYY-MM-DD\n";
            return kExitBadInput;
        }
        return print::exportSessionSheet(*repo, m_squad, m_date, m_out, err);
    }
    return print::exportDebrief(*repo, m_match, m_out, err);
}

int ExportVerbs::runStatuses(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const auto run = matchStatuses(repo, m_match, m_windows, m_metrics, err);
    if (!run) return kExitBadInput;
    return deliverFile(m_out, statusCsv(m_match, run->statuses),
                   std::to_string(run->statuses.size()) + " zone statuses", out, err);
}

int ExportVerbs::runTallies(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    if (!m_match.empty() && !repo.sourceOf(m_match)) {
        err << "error: no match '" << m_match << "' in the club file (see: pitchloop matches)\n";
        return kExitBadInput;
    }
    const std::string metric = m_metrics.empty() ? "" : m_metrics.front();
    if (!metric.empty() && !repo.metric(metric)) {
        err << "error: --metric: no metric '" << metric << "' (see: pitchloop metrics list)\n";
        return kExitBadInput;
    }
    const auto rows = repo.talliesOnGrid(
        repo.tallyGrid(), m_match.empty() ? std::nullopt : std::optional(m_match),
        metric.empty() ? std::nullopt : std::optional(metric));
    return deliverFile(m_out, talliesCsv(rows), std::to_string(rows.size()) + " tally rows", out, err);
}

int ExportVerbs::runCalendar(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    for (const auto* d : {&m_from, &m_to})
        if (!d->empty() && !dayNumber(*d)) {
            err << "error: " << (d == &m_from ? "--from" : "--to") << " '" << *d
                << "': expected a date YYYY-MM-DD\n";
            return kExitBadInput;
        }
    if (!isClockTime(m_start)) {
        err << "error: --start '" << m_start << "': expected a time HH:MM (00:00 to 23:59)\n";
        return kExitBadInput;
    }
    const SquadCalendar calendar = calendarFor(repo, m_squad, m_from, m_to, m_start, nowUtc());
    for (const auto& note : calendar.notes) err << "note: " << note << "\n";
    if (calendar.empty()) {
        err << "error: nothing to put in the calendar: no saved session and no open focus of "
            << m_squad << (m_from.empty() && m_to.empty() ? "" : " in those dates")
            << " (plan one with: pitchloop plan DATE ... --save)\n";
        return kExitBadInput;
    }
    return deliverFile(m_out, calendar.text,
                   std::to_string(calendar.sessions) + " sessions and " +
                       std::to_string(calendar.reviews) + " review dates",
                   out, err);
}

} // namespace pitchloop::cli
