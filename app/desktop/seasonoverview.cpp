#include "seasonoverview.h"

#include "clubsession.h"
#include "debrieflistmodel.h"
#include "display.h"
#include "wording.h"

#include <QLocale>

#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

SeasonOverview::SeasonOverview(QObject* parent)
    : SessionClient(parent), m_items(new DebriefListModel(this)) {}

void SeasonOverview::clear() {
    m_hasTargets = false;
    m_squadText.clear();
    m_seasonMatchCount = 0;
    m_lastMatchId.clear();
    m_lastDateText.clear();
    m_lastOpponent.clear();
    m_lastVenue.clear();
    m_lastCompetition.clear();
    m_lastScore.clear();
    m_lastOutcome.clear();
    m_lastOutcomeWord.clear();
    m_windowText.clear();
    m_windowRangeText.clear();
    m_judged = m_tooLittleData = m_slipped = m_watch = m_recovered = 0;
    m_chanceFlags = 0;
    m_chanceText.clear();
    m_plainChanceText.clear();
    m_items->reset({});
}

void SeasonOverview::refresh() {
    clear();
    ClubSession* s = session();
    if (!s || !s->isOpen() || s->matchSummaries().empty()) {
        emit changed();
        return;
    }
    const MatchSummary& last = *s->latestPlayed(); // not a match dated after today
    m_lastMatchId = QString::fromStdString(last.id);
    m_lastDateText = dateText(last.date);
    m_lastOpponent = QString::fromStdString(last.opponent);
    m_lastVenue = venueText(last.venue);
    m_lastCompetition = QString::fromStdString(last.competition);
    m_lastScore = scoreText(last);
    m_lastOutcome = outcomeText(last);
    m_lastOutcomeWord = outcomeWord(last);

    const auto season = s->seasonOf(last.id);
    const auto focal = season ? season->indexOf(last.id) : std::nullopt;
    if (!season || !focal) {
        emit changed();
        return;
    }
    m_squadText = QStringLiteral("%1 · %2").arg(QString::fromStdString(season->squad()),
                                                 QString::fromStdString(season->season()));
    m_seasonMatchCount = static_cast<int>(season->size());
    m_hasTargets = !season->targets().empty();
    m_windowText = desktop::windowText(season->windows().judged);
    const std::size_t first = season->judgedWindowStart(*focal);
    m_windowRangeText = QStringLiteral("%1 – %2").arg(
        compactDateText(season->tallies().dates[first]), compactDateText(season->tallies().dates[*focal]));

    if (m_hasTargets) {
        const Debrief& debriefed = season->debriefAt(*focal);
        m_judged = debriefed.judged;
        m_tooLittleData = debriefed.tooLittleData;
        m_slipped = static_cast<int>(debriefed.slippedInWindow.size());
        m_watch = static_cast<int>(debriefed.watched.size());
        m_recovered = static_cast<int>(debriefed.recovered.size());
        m_chanceFlags = debriefed.seasonChanceFlags;
        m_chanceText = tr("If every true value sat exactly on its target, chance alone would flag "
                          "at most about %1 of these %2 zones at some point this season.")
                           .arg(QLocale().toString(debriefed.seasonChanceFlags, 'f', 1))
                           .arg(debriefed.judged);
        const double expected = debriefed.seasonChanceFlags;
        m_plainChanceText =
            expected < 1 ? tr("Bad luck alone would flag fewer than one of these %1 zones off target in a season.").arg(debriefed.judged)
                         : tr("Bad luck alone would flag about %1 of these %2 zones off target in a season.")
                               .arg(QString::fromStdString(words::count(std::round(expected))))
                               .arg(debriefed.judged);
        const QString window = windowPhrase(debriefed.window);
        auto rows = debriefRows(tr("Off target over %1").arg(window), debriefed.slippedInWindow,
                                s->metricsById(), s->grid(), debriefed.previousMatchId, true);
        auto watch = debriefRows(tr("Likely off or close to the line over %1").arg(window), debriefed.watched,
                                 s->metricsById(), s->grid(), debriefed.previousMatchId, false);
        auto back = debriefRows(tr("Back on target since %1").arg(QString::fromStdString(debriefed.previousMatchId)),
                                debriefed.recovered, s->metricsById(), s->grid(), debriefed.previousMatchId, false);
        rows.insert(rows.end(), watch.begin(), watch.end());
        rows.insert(rows.end(), back.begin(), back.end());
        m_items->reset(std::move(rows));
    }
    emit changed();
}

} // namespace pitchloop::desktop
