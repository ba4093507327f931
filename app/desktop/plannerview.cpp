#include "plannerview.h"

#include "appclock.h"
#include "calendar.h"
#include "clubsession.h"
#include "display.h"
#include "drills.h"
#include "fixtures.h"
#include "matchreader.h"
#include "planblockmodel.h"
#include "plandrillchoicemodel.h"
#include "planfocusmodel.h"
#include "planinput.h"
#include "planweekmodel.h"
#include "printing.h"
#include "sessions.h"
#include "wording.h"

#include <QDate>
#include <QFile>
#include <QFileInfo>
#include <QLocale>
#include <QRegularExpression>
#include <QSaveFile>
#include <QtConcurrent/QtConcurrentRun>

#include <algorithm>
#include <map>
#include <sstream>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

constexpr const char* kDefaultSquad = "First team";

QString qs(const std::string& s) { return QString::fromStdString(s); }

/// Monday of the week holding `isoDate` (a checked calendar date).
std::string mondayOf(const std::string& isoDate) {
    const QDate d = QDate::fromString(qs(isoDate), Qt::ISODate);
    return addDays(isoDate, -(d.dayOfWeek() - 1));
}

QString weekdayText(const std::string& isoDate) {
    return QLocale().toString(QDate::fromString(qs(isoDate), Qt::ISODate), QStringLiteral("ddd"));
}

/// "Cap 4 · high", "No session (cap 0)".
QString capText(int cap) {
    if (cap < kIntensityMin) return PlannerView::tr("No session (cap %1)").arg(cap);
    return PlannerView::tr("Cap %1 · %2").arg(cap).arg(qs(std::string(intensityName(cap))));
}

QString intensityText(int level) {
    const std::string_view name = intensityName(level);
    return name.empty() ? QString::number(level)
                        : QStringLiteral("%1 · %2").arg(level).arg(qs(std::string(name)));
}

QString roleText(BlockRole role) {
    switch (role) {
    case BlockRole::WarmUp: return PlannerView::tr("Warm-up");
    case BlockRole::CoolDown: return PlannerView::tr("Cool-down");
    case BlockRole::Main: break;
    }
    return PlannerView::tr("Main");
}

/// "Away · 15:00"
QString fixtureDetail(const Fixture& f) {
    QString text = venueText(f.venue);
    if (!f.kickoff.empty()) text += QStringLiteral(" · ") + qs(f.kickoff);
    return text;
}

/// "4 · high", "0 · no session": a week day's cap under its pips.
QString shortCapText(int cap) {
    if (cap < kIntensityMin) return PlannerView::tr("%1 · no session").arg(cap);
    return QStringLiteral("%1 · %2").arg(cap).arg(qs(std::string(intensityName(cap))));
}

/// A whole number typed in a form; nullopt when it is not one.
std::optional<int> wholeNumber(const QString& text) {
    bool ok = false;
    const int value = text.trimmed().toInt(&ok);
    return ok ? std::optional(value) : std::nullopt;
}

} // namespace

PlannerView::PlannerView(QObject* parent)
    : SessionClient(parent),
      m_watcher(new QFutureWatcher<Outcome>(this)),
      m_days(new PlanWeekModel(this)),
      m_blocks(new PlanBlockModel(this)),
      m_focusMinutes(new PlanFocusModel(this)),
      m_drillChoices(new PlanDrillChoiceModel(this)) {
    connect(m_watcher, &QFutureWatcher<Outcome>::finished, this, &PlannerView::finished);
}

PlannerView::~PlannerView() {
    // The worker holds only its own copy of the request; wait so it never outlives the page.
    m_watcher->waitForFinished();
}

QString PlannerView::caution() const { return qs(std::string(kPlanCaution)); }

QString PlannerView::planDate() const { return m_plan ? qs(m_plan->date) : QString(); }

model::ClubRepository* PlannerView::repository() const {
    ClubSession* s = session();
    return s && s->isOpen() ? s->repository() : nullptr;
}

// The week ---------------------------------------------------------------------------------

void PlannerView::setDate(const QString& date) {
    if (date == m_date) return;
    if (!date.isEmpty() && !dayNumber(date.toStdString())) {
        setDateError(tr("'%1' is not a date: type it as YYYY-MM-DD, e.g. 2026-09-29.").arg(date));
        return;
    }
    m_date = date;
    showWeekOf(date.isEmpty() ? todayIso() : date.toStdString());
}

bool PlannerView::goToDate(const QString& text) {
    const QString date = text.trimmed();
    if (!dayNumber(date.toStdString())) {
        setDateError(date.isEmpty()
                         ? tr("Type a date as YYYY-MM-DD, e.g. 2026-09-29.")
                         : tr("'%1' is not a date: type it as YYYY-MM-DD, e.g. 2026-09-29.").arg(date));
        return false;
    }
    setDateError({});
    m_date = date;
    showWeekOf(date.toStdString());
    return true;
}

void PlannerView::goToToday() {
    setDateError({});
    m_date.clear();
    showWeekOf(todayIso());
}

void PlannerView::previousWeek() {
    if (m_selected.isEmpty()) return;
    m_date = qs(addDays(m_selected.toStdString(), -7));
    showWeekOf(m_date.toStdString());
}

void PlannerView::nextWeek() {
    if (m_selected.isEmpty()) return;
    m_date = qs(addDays(m_selected.toStdString(), 7));
    showWeekOf(m_date.toStdString());
}

void PlannerView::showWeekOf(const std::string& date) {
    m_weekStart = mondayOf(date);
    if (m_selected != qs(date)) {
        m_selected = qs(date);
        if (m_plan || !m_request.date.empty()) dropPlan();
    }
    update();
}

void PlannerView::selectDay(const QString& date) {
    if (date == m_selected || !dayNumber(date.toStdString())) return;
    const std::string day = date.toStdString();
    if (day < m_weekStart || day > addDays(m_weekStart, 6)) return;
    m_selected = date;
    dropPlan();
    update();
}

void PlannerView::refresh() {
    model::ClubRepository* repo = repository();
    if (repo != m_repoSeen) {
        // Another club file: the proposal and the coach's changes belonged to the old one.
        m_repoSeen = repo;
        ++m_generation;
        dropPlan();
    }
    const ClubSession* s = session();
    m_squad = s && !s->matchSummaries().empty() ? s->matchSummaries().back().squad : kDefaultSquad;
    if (m_weekStart.empty()) {
        const std::string start = m_date.isEmpty() ? todayIso() : m_date.toStdString();
        m_weekStart = mondayOf(start);
        m_selected = qs(start);
    }
    m_weekTitle = tr("%1 to %2 · %3 · season %4")
                      .arg(shortDateText(m_weekStart), compactDateText(addDays(m_weekStart, 6)),
                           qs(m_squad), qs(seasonOf(m_selected.toStdString())));
    if (!repo) {
        m_days->reset({});
        m_drillChoices->reset({});
        m_weekNote = tr("No club file is open.");
        m_selectedDayText = dateText(m_selected.toStdString());
        m_selectedDayDetail.clear();
        m_selectedHasSession = false;
        m_selectedFixture.clear();
        m_selectedCanMark = false;
        m_selectedOutcomeText.clear();
        m_selectedSessionText.clear();
        m_selectedDrillsText.clear();
        m_selectedCap = -1;
        emit weekChanged();
        emit dayChanged();
        return;
    }
    fillWeek(*repo);
    fillDrillChoices(*repo);
    emit weekChanged();
    emit dayChanged();
    emit planChanged();
}

void PlannerView::fillWeek(model::ClubRepository& repo) {
    FixtureStore fixtureStore(repo);
    const IntensityCaps caps = fixtureStore.caps();
    std::map<std::string, std::vector<Fixture>> fixturesBySeason;
    const std::string weekEnd = addDays(m_weekStart, 6);
    const auto saved = SessionStore(repo).list(m_squad, m_weekStart, weekEnd);
    std::map<std::int64_t, std::string> titles;
    for (const Drill& drill : DrillBook(repo).list(true)) titles[drill.id] = drill.title;
    const std::string today = todayIso();
    const std::string selected = m_selected.toStdString();

    std::vector<PlanWeekDay> days;
    bool anyMicrocycle = false;
    m_selectedHasSession = false;
    m_selectedSessionText.clear();
    m_selectedDrillsText.clear();
    m_selectedCap = -1;
    m_selectedDayDetail.clear();
    for (int i = 0; i < 7; ++i) {
        const std::string date = addDays(m_weekStart, i);
        const std::string season = seasonOf(date);
        auto found = fixturesBySeason.find(season);
        if (found == fixturesBySeason.end())
            found = fixturesBySeason.emplace(season, fixtureStore.list(m_squad, season)).first;
        const MicrocycleDay day = microcycle(date, found->second);
        const auto cap = intensityCap(day, caps);

        PlanWeekDay row;
        row.date = qs(date);
        row.weekday = weekdayText(date);
        row.dateText = shortDateText(date);
        row.label = qs(day.label);
        row.congested = day.congested;
        row.cap = cap.value_or(-1);
        row.capText = cap ? shortCapText(*cap) : QString();
        row.matchDay = day.daysToNext && *day.daysToNext == 0 && day.next;
        if (row.matchDay) {
            row.fixtureText = tr("v %1").arg(qs(day.next->opponent));
            row.fixtureDetail = fixtureDetail(*day.next);
        }
        const auto session = std::find_if(saved.begin(), saved.end(),
                                          [&](const SavedSession& s) { return s.date == date; });
        if (session != saved.end()) {
            row.hasSession = true;
            row.sessionText = tr("%1 min · %2 players").arg(session->minutes).arg(session->players);
            for (const SavedBlock& b : session->blocks) {
                const auto t = titles.find(b.drillId);
                row.drillLines << tr("%1′ %2").arg(b.minutes).arg(
                    t != titles.end() ? qs(t->second) : tr("drill %1").arg(b.drillId));
            }
        }
        row.today = date == today;
        row.selected = date == selected;
        anyMicrocycle = anyMicrocycle || cap.has_value();

        if (row.selected) {
            m_selectedFixture.clear();
            if (row.matchDay)
                m_selectedFixture = {{QStringLiteral("date"), qs(day.next->date)},
                                     {QStringLiteral("kickoff"), qs(day.next->kickoff)},
                                     {QStringLiteral("opponent"), qs(day.next->opponent)},
                                     {QStringLiteral("venue"), qs(day.next->venue)},
                                     {QStringLiteral("competition"), qs(day.next->competition)}};
            m_selectedHasSession = row.hasSession;
            m_selectedCanMark = row.hasSession && date <= today;
            m_selectedOutcomeText.clear();
            if (session != saved.end()) {
                switch (session->outcome) {
                case SessionOutcome::Planned:
                    m_selectedOutcomeText = date <= today ? tr("Not yet marked held, changed or cancelled: its minutes do not count for the focuses yet.")
                                                          : tr("Planned.");
                    break;
                case SessionOutcome::Held:
                    m_selectedOutcomeText = tr("Held as planned · %1 players took part").arg(session->playersPresent.value_or(0));
                    break;
                case SessionOutcome::Changed:
                    m_selectedOutcomeText = tr("Held with changes · %1 players took part").arg(session->playersPresent.value_or(0));
                    break;
                case SessionOutcome::Cancelled: m_selectedOutcomeText = tr("Cancelled"); break;
                }
            }
            m_selectedSessionText = row.sessionText;
            m_selectedDrillsText = row.drillLines.join(QLatin1Char('\n'));
            m_selectedCap = row.cap;
            if (cap) {
                m_selectedDayDetail = row.label + (day.congested ? tr(" (congested week)") : QString()) +
                                      QStringLiteral(" · ") + capText(*cap).toLower();
                if (row.matchDay)
                    m_selectedDayDetail += QStringLiteral(" · ") + row.fixtureText +
                                           QStringLiteral(" · ") + row.fixtureDetail;
            }
            if (session != saved.end()) {
                m_suggestedMinutes = QString::number(session->minutes);
                m_suggestedPlayers = QString::number(session->players);
            }
        }
        days.push_back(std::move(row));
    }
    m_days->reset(std::move(days));
    m_selectedDayText = dateText(selected);
    if (anyMicrocycle) {
        m_weekNote.clear();
    } else {
        m_weekNote = tr("%1 has no fixtures in season %2 yet, so these days have no microcycle "
                        "and no session can be planned. Import the schedule with “Import "
                        "fixtures…” (a CSV or JSON file of dates, kick-offs and opponents).")
                         .arg(qs(m_squad), qs(seasonOf(selected)));
        m_selectedDayDetail = tr("No fixtures in this season yet.");
    }
    m_planReplacesSaved =
        m_plan && SessionStore(repo).get(m_squad, m_plan->date).has_value();
}

void PlannerView::fillDrillChoices(model::ClubRepository& repo) {
    std::vector<PlanDrillChoice> rows;
    for (const Drill& drill : DrillBook(repo).list()) {
        PlanDrillChoice c;
        c.drillId = drill.id;
        c.title = qs(drill.title);
        c.detailText = tr("%1 min · intensity %2 · %3–%4 players")
                           .arg(drill.durationMin)
                           .arg(intensityText(drill.intensity))
                           .arg(drill.playersMin)
                           .arg(drill.playersMax);
        c.aboveCap = m_selectedCap >= 0 && drill.intensity > m_selectedCap;
        c.inPlan = m_plan && std::any_of(m_plan->blocks.begin(), m_plan->blocks.end(),
                                         [&](const PlanBlock& b) { return b.drillId == drill.id; });
        c.label = tr("%1 — %2 min, intensity %3%4")
                      .arg(c.title)
                      .arg(drill.durationMin)
                      .arg(drill.intensity)
                      .arg(c.aboveCap ? tr(" (above the day's cap)")
                           : c.inPlan ? tr(" (in the plan)")
                                      : QString());
        rows.push_back(std::move(c));
    }
    m_drillChoices->reset(std::move(rows));
}

// Planning ---------------------------------------------------------------------------------

void PlannerView::dropPlan() {
    ++m_generation;
    m_request = {};
    m_pinned.clear();
    m_removed.clear();
    m_plan.reset();
    m_problem.clear();
    m_notes.clear();
    m_planSummary.clear();
    m_planNotes.clear();
    m_adjustmentsText.clear();
    m_planReplacesSaved = false;
    m_blocks->reset({});
    m_focusMinutes->reset({});
    emit planChanged();
}

bool PlannerView::propose(const QString& minutes, const QString& players) {
    if (m_busy) return false;
    const auto m = wholeNumber(minutes);
    const auto p = wholeNumber(players);
    QString bad;
    if (!m)
        bad = tr("Minutes: '%1' is not a whole number; type the session's length, e.g. 75.")
                  .arg(minutes.trimmed());
    else if (!p)
        bad = tr("Players: '%1' is not a whole number; type how many players are available, "
                 "e.g. 18.")
                  .arg(players.trimmed());
    model::ClubRepository* repo = repository();
    if (bad.isEmpty() && !repo) bad = tr("No club file is open.");
    if (!bad.isEmpty()) {
        m_plan.reset();
        m_problem = bad;
        m_blocks->reset({});
        m_focusMinutes->reset({});
        emit planChanged();
        return false;
    }
    m_suggestedMinutes = minutes.trimmed();
    m_suggestedPlayers = players.trimmed();
    std::vector<std::string> notes;
    try {
        m_request = planRequestFor(*repo, m_squad, m_selected.toStdString(), *m, *p, notes);
    } catch (const std::exception& e) {
        m_plan.reset();
        m_problem = tr("The club file could not be read for planning: %1").arg(QString::fromUtf8(e.what()));
        emit planChanged();
        return false;
    }
    m_request.pinned = m_pinned;
    m_request.removed = m_removed;
    QStringList lines;
    for (const auto& n : notes) {
        QString line = qs(n);
        if (!line.isEmpty()) line[0] = line[0].toUpper();
        lines << line + QLatin1Char('.');
    }
    m_notes = lines.join(QLatin1Char('\n'));
    return run();
}

bool PlannerView::togglePin(qint64 drillId) {
    if (m_busy || m_request.date.empty()) return false;
    if (std::find(m_pinned.begin(), m_pinned.end(), drillId) != m_pinned.end()) {
        std::erase(m_pinned, drillId);
    } else {
        m_pinned.push_back(drillId);
        std::erase(m_removed, drillId);
    }
    m_request.pinned = m_pinned;
    m_request.removed = m_removed;
    return run();
}

bool PlannerView::removeDrill(qint64 drillId) {
    if (m_busy || m_request.date.empty()) return false;
    std::erase(m_pinned, drillId);
    if (std::find(m_removed.begin(), m_removed.end(), drillId) == m_removed.end())
        m_removed.push_back(drillId);
    m_request.pinned = m_pinned;
    m_request.removed = m_removed;
    return run();
}

bool PlannerView::swapDrill(qint64 out, qint64 in) {
    if (m_busy || m_request.date.empty() || out == in || in <= 0) return false;
    m_request = model::swapDrill(std::move(m_request), out, in);
    m_pinned = m_request.pinned;
    m_removed = m_request.removed;
    return run();
}

bool PlannerView::clearAdjustments() {
    if (m_busy || m_request.date.empty()) return false;
    m_pinned.clear();
    m_removed.clear();
    m_request.pinned.clear();
    m_request.removed.clear();
    return run();
}

bool PlannerView::run() {
    m_runGeneration = m_generation;
    setBusy(true);
    m_watcher->setFuture(QtConcurrent::run([request = m_request] {
        Outcome o;
        try {
            o.result = planSession(request);
        } catch (const std::exception& e) {
            o.failure = e.what();
        }
        return o;
    }));
    return true;
}

void PlannerView::finished() {
    setBusy(false);
    if (m_runGeneration != m_generation) return; // the day or the club file changed meanwhile
    const Outcome o = m_watcher->result();
    m_plan.reset();
    m_problem.clear();
    if (!o.failure.empty()) {
        m_problem = tr("The planner failed: %1").arg(QString::fromUtf8(o.failure.c_str()));
    } else if (!o.result.plan) {
        QString why = qs(o.result.problem);
        if (!why.isEmpty()) why[0] = why[0].toUpper();
        m_problem = tr("No session planned: %1.").arg(why);
    } else {
        m_plan = o.result.plan;
    }
    showPlan();
}

void PlannerView::showPlan() {
    const ClubSession* s = session();
    std::map<std::int64_t, std::string> titles;
    for (const Drill& drill : m_request.drills) titles[drill.id] = drill.title;
    auto titleOf = [&](std::int64_t id) {
        const auto t = titles.find(id);
        return t != titles.end() ? qs(t->second) : tr("drill %1").arg(id);
    };
    auto focusTitle = [&](const PlanFocus& f) {
        const MetricSpec* metric = s ? s->metricSpec(f.metric) : nullptr;
        const QString name = metric ? qs(metric->name) : qs(f.metric);
        if (f.watched) return tr("Watched · %1").arg(name);
        return f.id ? tr("Focus %1 · %2").arg(f.id).arg(name) : name;
    };

    std::vector<PlanBlockRow> blocks;
    std::vector<PlanFocusRow> focuses;
    if (m_plan) {
        for (const PlanBlock& b : m_plan->blocks) {
            PlanBlockRow row;
            row.role = roleText(b.role);
            row.main = b.role == BlockRole::Main;
            row.drillId = b.drillId;
            row.title = qs(b.title);
            row.minutes = b.minutes;
            row.minutesText = tr("%1 min").arg(b.minutes);
            row.intensity = b.intensity;
            row.intensityText = intensityText(b.intensity);
            row.pinned = b.pinned;
            if (b.focus && *b.focus < m_request.focuses.size()) {
                const PlanFocus& f = m_request.focuses[*b.focus];
                row.focusText = focusTitle(f) + QStringLiteral(" · ") + zoneText(f.band, f.lane, session()->grid());
            }
            row.why = qs(b.why);
            blocks.push_back(std::move(row));
        }
        std::vector<FocusMinutes> ranked = m_plan->focusMinutes;
        std::stable_sort(ranked.begin(), ranked.end(), [&](const auto& a, const auto& b) {
            return m_request.focuses[a.focus].severity > m_request.focuses[b.focus].severity;
        });
        for (const FocusMinutes& fm : ranked) {
            const PlanFocus& f = m_request.focuses[fm.focus];
            PlanFocusRow row;
            row.focusId = fm.focusId;
            row.title = focusTitle(f);
            row.zoneText = zoneText(f.band, f.lane, session()->grid());
            row.severityText = f.severity > 0 ? qs(words::stateName(f.state))
                                              : tr("%1: no priority today").arg(qs(words::stateName(f.state)));
            row.minutes = fm.minutes;
            row.minutesText = tr("%1 min").arg(fm.minutes);
            row.share = m_plan->sessionMinutes > 0
                            ? std::clamp(double(fm.minutes) / m_plan->sessionMinutes, 0.0, 1.0)
                            : 0.0;
            focuses.push_back(std::move(row));
        }
        const Plan& p = *m_plan;
        m_planSummary = tr("%1 · %2 · %3 of %4 minutes · %5 players")
                            .arg(qs(p.day.label), capText(p.cap).toLower(), QString::number(p.minutesUsed),
                                 QString::number(p.sessionMinutes),
                                 QString::number(p.playersAvailable));
        QStringList planNotes;
        for (const auto& n : p.notes) planNotes << qs(n);
        m_planNotes = planNotes.join(QLatin1Char('\n'));
    } else {
        m_planSummary.clear();
        m_planNotes.clear();
    }
    m_blocks->reset(std::move(blocks));
    m_focusMinutes->reset(std::move(focuses));

    QStringList parts;
    QStringList pinned, removed;
    for (const auto id : m_pinned) pinned << titleOf(id);
    for (const auto id : m_removed) removed << titleOf(id);
    if (!pinned.isEmpty()) parts << tr("Pinned: %1").arg(pinned.join(QStringLiteral(", ")));
    if (!removed.isEmpty()) parts << tr("Left out: %1").arg(removed.join(QStringLiteral(", ")));
    m_adjustmentsText = parts.join(QStringLiteral(" · "));

    model::ClubRepository* repo = repository();
    try {
        m_planReplacesSaved = m_plan && repo && SessionStore(*repo).get(m_squad, m_plan->date);
        if (repo) fillDrillChoices(*repo);
    } catch (const std::exception& e) {
        m_problem = tr("The club file could not be read: %1").arg(QString::fromUtf8(e.what()));
    }
    emit planChanged();
}

// Saving and exports -----------------------------------------------------------------------

bool PlannerView::save(const QString& by) {
    model::ClubRepository* repo = repository();
    if (!m_plan || !repo) {
        setMessage(tr("Nothing to save: propose a session first."), true);
        return false;
    }
    if (m_busy) {
        setMessage(tr("The planner is still working; save when the session is shown."), true);
        return false;
    }
    const QString who = by.trimmed();
    if (who.isEmpty()) {
        setMessage(tr("Type who saves the session (your name) before saving."), true);
        return false;
    }
    const QString day = dateText(m_plan->date);
    SessionSave saved;
    try {
        saved = SessionStore(*repo).save(m_squad, *m_plan, who.toStdString(), nowUtcIso());
    } catch (const std::exception& e) {
        setMessage(tr("The session of %1 was not saved: %2").arg(day, QString::fromUtf8(e.what())),
                   true);
        return false;
    }
    setMessage(saved.replaced ? tr("Saved the session of %1, replacing the earlier one.").arg(day)
                              : tr("Saved the session of %1.").arg(day),
               false);
    session()->reload(); // every page sees the new session; this page refreshes its week too
    return true;
}

bool PlannerView::importFixtures(const QUrl& file) {
    model::ClubRepository* repo = repository();
    const QString path = localPath(file);
    if (!repo) {
        setMessage(tr("No club file is open."), true);
        return false;
    }
    if (path.isEmpty()) {
        setMessage(tr("Choose a fixtures file (CSV or JSON) to import."), true);
        return false;
    }
    const std::string name = QFileInfo(path).fileName().toStdString();
    auto refuse = [&](const Problems& problems) {
        QStringList lines;
        for (const auto& p : problems) lines << QString::fromStdString(p.describe());
        setMessage(tr("No fixture was imported:\n%1").arg(lines.join(QLatin1Char('\n'))), true);
        return false;
    };
    std::string text;
    try {
        text = readFileBytes(QFile::encodeName(path).toStdString());
    } catch (const std::exception&) {
        setMessage(tr("%1 cannot be read.").arg(QString::fromStdString(name)), true);
        return false;
    }
    const auto parsed = parseFixtureFile(text, name);
    if (!parsed.errors.empty()) return refuse(parsed.errors);
    FixtureImport r;
    try {
        r = FixtureStore(*repo).importFixtures(m_squad, parsed.fixtures, name);
    } catch (const std::exception& e) {
        setMessage(tr("No fixture was imported: %1").arg(QString::fromUtf8(e.what())), true);
        return false;
    }
    if (!r.errors.empty()) return refuse(r.errors);
    setMessage(tr("Fixtures imported from %1: %2 added, %3 updated, %4 unchanged.")
                   .arg(QString::fromStdString(name))
                   .arg(r.added)
                   .arg(r.updated)
                   .arg(r.unchanged),
               false);
    session()->reload(); // the week and every page see the schedule
    return true;
}

bool PlannerView::saveFixture(const QString& originalDate, const QString& date, const QString& kickoff,
                              const QString& opponent, const QString& venue, const QString& competition) {
    model::ClubRepository* repo = repository();
    if (!repo) {
        setMessage(tr("No club file is open."), true);
        return false;
    }
    Fixture f;
    f.date = date.trimmed().toStdString();
    f.kickoff = kickoff.trimmed().toStdString();
    f.opponent = opponent.trimmed().toStdString();
    f.venue = venue.trimmed().toStdString();
    f.competition = competition.trimmed().toStdString();
    // In the form's words: the field as it is labelled, and what to type.
    static const std::map<std::string, QString> labels{
        {"date", tr("Date")}, {"kickoff", tr("Kick-off")}, {"opponent", tr("Opponent")},
        {"venue", tr("Venue")}, {"competition", tr("Competition")}};
    auto refuse = [&](const Problems& problems) {
        QStringList lines;
        for (const auto& p : problems) {
            const auto label = labels.find(p.field);
            lines << (label != labels.end() ? label->second + QStringLiteral(": ") : QString()) + qs(p.message);
        }
        setMessage(tr("The fixture was not saved:\n%1").arg(lines.join(QLatin1Char('\n'))), true);
        return false;
    };
    if (const Problems problems = validateFixture(f, "the fixture form", ""); !problems.empty()) return refuse(problems);
    try {
        FixtureStore store(*repo);
        const FixtureImport r = store.importFixtures(m_squad, {f}, "the fixture form");
        if (!r.errors.empty()) return refuse(r.errors);
        const std::string before = originalDate.trimmed().toStdString();
        if (!before.empty() && before != f.date) store.remove(m_squad, before);
    } catch (const std::exception& e) {
        setMessage(tr("The fixture was not saved: %1").arg(QString::fromUtf8(e.what())), true);
        return false;
    }
    setMessage(tr("Saved the fixture v %1 on %2.").arg(qs(f.opponent), dateText(f.date)), false);
    session()->reload(); // the week, the home page and the planner see the schedule
    return true;
}

bool PlannerView::markSession(const QString& outcome, const QString& players, const QString& blockMinutes,
                              const QString& by) {
    model::ClubRepository* repo = repository();
    if (!repo) {
        setMessage(tr("No club file is open."), true);
        return false;
    }
    const auto o = sessionOutcomeFromString(outcome.toStdString());
    if (!o || *o == SessionOutcome::Planned) {
        setMessage(tr("Choose held, changed or cancelled."), true);
        return false;
    }
    if (by.trimmed().isEmpty()) {
        setMessage(tr("Type your name in “Saved by” first: the record says who marked the session."), true);
        return false;
    }
    SessionRecord how;
    how.outcome = *o;
    if (*o != SessionOutcome::Cancelled) {
        const auto n = wholeNumber(players);
        if (!n) {
            setMessage(tr("Players: type how many took part, e.g. 16."), true);
            return false;
        }
        how.playersPresent = *n;
    }
    if (*o == SessionOutcome::Changed) {
        for (const QString& part : blockMinutes.split(QRegularExpression(QStringLiteral("[\\s,;]+")), Qt::SkipEmptyParts)) {
            const auto m = wholeNumber(part);
            if (!m) {
                setMessage(tr("Minutes per block: '%1' is not a whole number; type one number per block, e.g. 10 12 0 10.").arg(part), true);
                return false;
            }
            how.blockMinutes.push_back(*m);
        }
    }
    Problems problems;
    try {
        problems = SessionStore(*repo).record(m_squad, m_selected.toStdString(), how, todayIso(), by.trimmed().toStdString(),
                                              nowUtcIso());
    } catch (const std::exception& e) {
        setMessage(tr("Nothing was recorded: %1").arg(QString::fromUtf8(e.what())), true);
        return false;
    }
    if (!problems.empty()) {
        QStringList lines;
        for (const auto& p : problems) lines << qs(p.message);
        setMessage(tr("Nothing was recorded: %1").arg(lines.join(QStringLiteral("; "))), true);
        return false;
    }
    setMessage(tr("Recorded the session of %1 as %2.").arg(dateText(m_selected.toStdString()), outcome), false);
    session()->reload(); // focus pages and reviews count the minutes held
    return true;
}

bool PlannerView::removeFixture(const QString& date) {
    model::ClubRepository* repo = repository();
    if (!repo) {
        setMessage(tr("No club file is open."), true);
        return false;
    }
    bool removed = false;
    try {
        removed = FixtureStore(*repo).remove(m_squad, date.toStdString());
    } catch (const std::exception& e) {
        setMessage(tr("The fixture was not removed: %1").arg(QString::fromUtf8(e.what())), true);
        return false;
    }
    if (!removed) {
        setMessage(tr("There is no fixture on %1 to remove.").arg(dateText(date.toStdString())), true);
        return false;
    }
    setMessage(tr("Removed the fixture on %1.").arg(dateText(date.toStdString())), false);
    session()->reload();
    return true;
}

bool PlannerView::exportSheet(const QUrl& file) {
    model::ClubRepository* repo = repository();
    const QString path = localPath(file);
    if (!repo) {
        setMessage(tr("No club file is open."), true);
        return false;
    }
    if (path.isEmpty()) {
        setMessage(tr("Choose a file to write the session sheet to."), true);
        return false;
    }
    if (!m_selectedHasSession) {
        setMessage(tr("No saved session on %1: save one before printing its sheet.")
                       .arg(dateText(m_selected.toStdString())),
                   true);
        return false;
    }
    std::ostringstream err;
    int code = 1;
    try {
        code = print::exportSessionSheet(*repo, m_squad, m_selected.toStdString(),
                                         QFile::encodeName(path).toStdString(), err);
    } catch (const std::exception& e) {
        err << "error: " << e.what() << "\n";
    }
    const QString text = plainMessage(err.str());
    if (code != 0) {
        setMessage(text.isEmpty() ? tr("The session sheet was not written to %1.").arg(path) : text,
                   true);
        return false;
    }
    setMessage(text.isEmpty() ? tr("Wrote the session sheet to %1.").arg(path) : text, false);
    return true;
}

bool PlannerView::exportCalendar(const QUrl& file, const QString& start) {
    model::ClubRepository* repo = repository();
    const QString path = localPath(file);
    if (!repo) {
        setMessage(tr("No club file is open."), true);
        return false;
    }
    if (path.isEmpty()) {
        setMessage(tr("Choose a file to write the calendar to."), true);
        return false;
    }
    const std::string startTime = start.trimmed().toStdString();
    if (!isClockTime(startTime)) {
        setMessage(tr("Start time '%1': type a time as HH:MM, e.g. 10:30.").arg(start.trimmed()),
                   true);
        return false;
    }
    const std::string weekEnd = addDays(m_weekStart, 6);
    SquadCalendar calendar;
    try {
        calendar = calendarFor(*repo, m_squad, m_weekStart, weekEnd, startTime, nowUtcIso());
    } catch (const std::exception& e) {
        setMessage(tr("The club file could not be read: %1").arg(QString::fromUtf8(e.what())), true);
        return false;
    }
    if (calendar.empty()) {
        setMessage(tr("Nothing to put in the calendar: no saved session and no focus review "
                      "falls in the week of %1.")
                       .arg(dateText(m_weekStart)),
                   true);
        return false;
    }
    // QSaveFile writes a temporary file beside the target and renames it on commit, so a
    // failed write never leaves half a calendar behind.
    QSaveFile out(path);
    if (!out.open(QIODevice::WriteOnly) ||
        out.write(calendar.text.data(), static_cast<qint64>(calendar.text.size())) !=
            static_cast<qint64>(calendar.text.size()) ||
        !out.commit()) {
        setMessage(tr("%1 was not written: %2").arg(path, out.errorString()), true);
        return false;
    }
    QString text = tr("Wrote %n saved session(s)", nullptr, calendar.sessions) +
                   tr(" and %n review date(s) to %1.", nullptr, calendar.reviews).arg(path);
    for (const auto& note : calendar.notes) {
        QString line = qs(note);
        if (!line.isEmpty()) line[0] = line[0].toUpper();
        text += QLatin1Char('\n') + line + QLatin1Char('.');
    }
    setMessage(text, false);
    return true;
}

QString PlannerView::suggestedFileName(const QString& kind) const {
    if (kind == QLatin1String("ics")) return QStringLiteral("week-%1.ics").arg(qs(m_weekStart));
    return QStringLiteral("session-%1.pdf").arg(m_selected);
}

// State ------------------------------------------------------------------------------------

void PlannerView::setBusy(bool busy) {
    if (busy == m_busy) return;
    m_busy = busy;
    emit busyChanged();
}

void PlannerView::setMessage(const QString& text, bool error) {
    m_message = text;
    m_messageIsError = error;
    emit messageChanged();
}

void PlannerView::setDateError(const QString& text) {
    if (text == m_dateError) return;
    m_dateError = text;
    emit dateErrorChanged();
}

} // namespace pitchloop::desktop
