#include "clubagenda.h"

#include "appclock.h"
#include "calendar.h"
#include "clubsession.h"
#include "display.h"
#include "fixtures.h"
#include "focus.h"
#include "sessions.h"

#include <algorithm>

namespace pitchloop::desktop {

using namespace pitchloop::model;

ClubAgenda::ClubAgenda(QObject* parent) : SessionClient(parent) {}

void ClubAgenda::refresh() {
    m_today = m_nextMatch = m_nextMatchDetail = m_nextSession = m_nextSessionDetail = QString();
    m_open = m_due = 0;
    m_focusLines.clear();
    ClubSession* s = session();
    ClubRepository* repo = s ? s->repository() : nullptr;
    if (!repo) {
        emit changed();
        return;
    }
    const std::string today = todayIso();
    m_today = dateText(today);
    const auto& matches = s->matchSummaries();
    const std::string squad = matches.empty() ? std::string("First team") : matches.back().squad;
    const std::string season = seasonOf(today);

    FixtureStore fixtures(*repo);
    const auto schedule = fixtures.list(squad, season);
    const MicrocycleDay day = microcycle(today, schedule);
    if (day.next) {
        const Fixture& f = *day.next;
        m_nextMatch = tr("v %1").arg(QString::fromStdString(f.opponent));
        m_nextMatchDetail =
            tr("%1 · %2%3 · today is %4")
                .arg(dateText(f.date), venueText(f.venue),
                     f.kickoff.empty() ? QString() : tr(" · %1").arg(QString::fromStdString(f.kickoff)),
                     QString::fromStdString(day.label));
    } else {
        m_nextMatch = tr("No fixture ahead");
        m_nextMatchDetail = schedule.empty() ? tr("Import the season's fixtures in the Week planner")
                                             : tr("The season's schedule has ended");
    }

    const auto sessions = SessionStore(*repo).list(squad, today, "");
    if (!sessions.empty()) {
        const SavedSession& n = sessions.front();
        int mainBlocks = 0;
        for (const auto& b : n.blocks) mainBlocks += b.role == BlockRole::Main;
        m_nextSession = dateText(n.date);
        m_nextSessionDetail = tr("%1 · %2 min · %3 main drills · %4 players")
                                  .arg(QString::fromStdString(n.dayLabel))
                                  .arg(n.minutes)
                                  .arg(mainBlocks)
                                  .arg(n.players);
    } else {
        m_nextSession = tr("Nothing planned yet");
        m_nextSessionDetail = tr("Propose the next session in the Week planner");
    }

    struct Line {
        bool due;
        QString text;
    };
    std::vector<Line> lines;
    for (const Focus& f : FocusStore(*repo).list()) {
        if (f.squad != squad || !f.closedAt.empty()) continue;
        int since = 0;
        for (const auto& m : matches)
            since += m.squad == f.squad && m.season == f.season && m.date >= f.startDate &&
                     m.date <= today; // a match dated after today has not been played
        const bool due = focusState(f, since, today) == FocusState::DueForReview;
        // The same split as the focus list: open (training on it) or due for review.
        (due ? m_due : m_open) += 1;
        const MetricSpec* metric = s->metricSpec(f.metric);
        QString zones;
        for (const auto& z : f.zones)
            zones += (zones.isEmpty() ? QString() : QStringLiteral(", ")) + zoneText(z.band, z.lane, f.grid);
        if (!zones.isEmpty() && f.grid != s->grid())
            zones += tr(" (on %1)").arg(QString::fromStdString(f.grid.name()));
        const auto dueDate = reviewDueDate(f, fixtures.list(f.squad, f.season));
        const QString when = due ? tr("review due") + (dueDate ? tr(" since %1").arg(dateText(*dueDate)) : QString())
                                 : (dueDate ? tr("review on %1").arg(dateText(*dueDate))
                                            : tr("review after %1 matches").arg(f.reviewAfterMatches));
        lines.push_back({due, tr("#%1 %2 · %3 · %4")
                                  .arg(f.id)
                                  .arg(metric ? QString::fromStdString(metric->name)
                                              : QString::fromStdString(f.metric),
                                       zones.isEmpty() ? tr("whole pitch") : zones, when)});
    }
    std::stable_sort(lines.begin(), lines.end(), [](const Line& a, const Line& b) { return a.due > b.due; });
    for (const auto& l : lines) m_focusLines << l.text;
    emit changed();
}

} // namespace pitchloop::desktop
