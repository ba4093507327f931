#pragma once
// Base of the page controllers: holds the club session, recomputes when it or an input
// changes, and is the catch boundary for what a page computes.

#include <QObject>
#include <QPointer>
#include <QQmlParserStatus>
#include <QString>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

class ClubSession;

/// A page's controller: set `session` (and the page's inputs), read the results.
class SessionClient : public QObject, public QQmlParserStatus {
    Q_OBJECT
    Q_MOC_INCLUDE("clubsession.h")
    Q_INTERFACES(QQmlParserStatus)
    QML_ANONYMOUS
    Q_PROPERTY(pitchloop::desktop::ClubSession* session READ session WRITE setSession NOTIFY sessionChanged)
    /// The last fault while computing, empty when all went well.
    Q_PROPERTY(QString errorString READ errorString NOTIFY errorStringChanged)
public:
    explicit SessionClient(QObject* parent = nullptr);

    ClubSession* session() const { return m_session; }
    void setSession(ClubSession* session);
    QString errorString() const { return m_error; }

    void classBegin() override;
    void componentComplete() override;

signals:
    void sessionChanged();
    void errorStringChanged();

protected:
    /// Recomputes now, or once the QML component is complete; faults land in errorString.
    void update();
    /// Computes the controller's outputs from the session and inputs. May throw.
    virtual void refresh() = 0;

private:
    QPointer<ClubSession> m_session;
    QMetaObject::Connection m_opened;
    bool m_complete = true;
    QString m_error;
};

} // namespace pitchloop::desktop
