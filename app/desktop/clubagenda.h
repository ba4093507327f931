#pragma once
// What is coming for the squad (the home page's agenda): the next match with its microcycle
// day, the next planned session, the open focuses and the reviews that are due.

#include "sessionclient.h"

#include <QString>
#include <QStringList>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

/// The squad of the latest stored match, looked at from today ($PITCHLOOP_TODAY honoured).
class ClubAgenda : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    QML_ELEMENT
    Q_PROPERTY(QString todayText READ todayText NOTIFY changed)
    Q_PROPERTY(QString nextMatchText READ nextMatchText NOTIFY changed)
    Q_PROPERTY(QString nextMatchDetail READ nextMatchDetail NOTIFY changed)
    Q_PROPERTY(QString nextSessionText READ nextSessionText NOTIFY changed)
    Q_PROPERTY(QString nextSessionDetail READ nextSessionDetail NOTIFY changed)
    Q_PROPERTY(int openFocusCount READ openFocusCount NOTIFY changed)
    Q_PROPERTY(int dueCount READ dueCount NOTIFY changed)
    /// One line a focus that is not closed, due ones first.
    Q_PROPERTY(QStringList focusLines READ focusLines NOTIFY changed)
public:
    explicit ClubAgenda(QObject* parent = nullptr);

    QString todayText() const { return m_today; }
    QString nextMatchText() const { return m_nextMatch; }
    QString nextMatchDetail() const { return m_nextMatchDetail; }
    QString nextSessionText() const { return m_nextSession; }
    QString nextSessionDetail() const { return m_nextSessionDetail; }
    int openFocusCount() const { return m_open; }
    int dueCount() const { return m_due; }
    QStringList focusLines() const { return m_focusLines; }

signals:
    void changed();

protected:
    void refresh() override;

private:
    QString m_today;
    QString m_nextMatch;
    QString m_nextMatchDetail;
    QString m_nextSession;
    QString m_nextSessionDetail;
    int m_open = 0;
    int m_due = 0;
    QStringList m_focusLines;
};

} // namespace pitchloop::desktop
