#pragma once
// The squad's season at a glance (the home page): the last match, what the debrief of that
// match says over the judged window, and how many flags chance alone would raise.

#include "sessionclient.h"

#include <QString>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

class DebriefListModel;

/// The latest stored match and its debrief over the judged window.
class SeasonOverview : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("debrieflistmodel.h")
    QML_ELEMENT
    Q_PROPERTY(bool hasMatches READ hasMatches NOTIFY changed)
    Q_PROPERTY(bool hasTargets READ hasTargets NOTIFY changed)
    Q_PROPERTY(QString squadText READ squadText NOTIFY changed)
    Q_PROPERTY(int seasonMatchCount READ seasonMatchCount NOTIFY changed)
    Q_PROPERTY(QString lastMatchId READ lastMatchId NOTIFY changed)
    Q_PROPERTY(QString lastDateText READ lastDateText NOTIFY changed)
    Q_PROPERTY(QString lastOpponent READ lastOpponent NOTIFY changed)
    Q_PROPERTY(QString lastVenue READ lastVenue NOTIFY changed)
    Q_PROPERTY(QString lastCompetition READ lastCompetition NOTIFY changed)
    Q_PROPERTY(QString lastScore READ lastScore NOTIFY changed)
    Q_PROPERTY(QString lastOutcome READ lastOutcome NOTIFY changed)
    Q_PROPERTY(QString lastOutcomeWord READ lastOutcomeWord NOTIFY changed)
    Q_PROPERTY(QString windowText READ windowText NOTIFY changed)
    Q_PROPERTY(QString windowRangeText READ windowRangeText NOTIFY changed)
    Q_PROPERTY(int judged READ judged NOTIFY changed)
    Q_PROPERTY(int tooLittleData READ tooLittleData NOTIFY changed)
    Q_PROPERTY(int slippedCount READ slippedCount NOTIFY changed)
    Q_PROPERTY(int watchCount READ watchCount NOTIFY changed)
    Q_PROPERTY(int recoveredCount READ recoveredCount NOTIFY changed)
    /// Expected off-target flags among the judged zones if every true value sat on its target.
    Q_PROPERTY(double chanceFlags READ chanceFlags NOTIFY changed)
    Q_PROPERTY(QString chanceText READ chanceText NOTIFY changed)
    /// The same in the coach's words.
    Q_PROPERTY(QString plainChanceText READ plainChanceText NOTIFY changed)
    Q_PROPERTY(pitchloop::desktop::DebriefListModel* items READ items CONSTANT)
public:
    explicit SeasonOverview(QObject* parent = nullptr);

    bool hasMatches() const { return !m_lastMatchId.isEmpty(); }
    bool hasTargets() const { return m_hasTargets; }
    QString squadText() const { return m_squadText; }
    int seasonMatchCount() const { return m_seasonMatchCount; }
    QString lastMatchId() const { return m_lastMatchId; }
    QString lastDateText() const { return m_lastDateText; }
    QString lastOpponent() const { return m_lastOpponent; }
    QString lastVenue() const { return m_lastVenue; }
    QString lastCompetition() const { return m_lastCompetition; }
    QString lastScore() const { return m_lastScore; }
    QString lastOutcome() const { return m_lastOutcome; }
    QString lastOutcomeWord() const { return m_lastOutcomeWord; }
    QString windowText() const { return m_windowText; }
    QString windowRangeText() const { return m_windowRangeText; }
    int judged() const { return m_judged; }
    int tooLittleData() const { return m_tooLittleData; }
    int slippedCount() const { return m_slipped; }
    int watchCount() const { return m_watch; }
    int recoveredCount() const { return m_recovered; }
    double chanceFlags() const { return m_chanceFlags; }
    QString chanceText() const { return m_chanceText; }
    QString plainChanceText() const { return m_plainChanceText; }
    DebriefListModel* items() const { return m_items; }

signals:
    void changed();

protected:
    void refresh() override;

private:
    void clear();

    bool m_hasTargets = false;
    QString m_squadText;
    int m_seasonMatchCount = 0;
    QString m_lastMatchId;
    QString m_lastDateText;
    QString m_lastOpponent;
    QString m_lastVenue;
    QString m_lastCompetition;
    QString m_lastScore;
    QString m_lastOutcome;
    QString m_lastOutcomeWord;
    QString m_windowText;
    QString m_windowRangeText;
    int m_judged = 0;
    int m_tooLittleData = 0;
    int m_slipped = 0;
    int m_watch = 0;
    int m_recovered = 0;
    double m_chanceFlags = 0;
    QString m_chanceText;
    QString m_plainChanceText;
    DebriefListModel* m_items;
};

} // namespace pitchloop::desktop
