#include "sessionclient.h"

#include "clubsession.h"
#include "logging.h"

#include <exception>

namespace pitchloop::desktop {

SessionClient::SessionClient(QObject* parent) : QObject(parent) {}

void SessionClient::setSession(ClubSession* session) {
    if (session == m_session) return;
    disconnect(m_opened);
    m_session = session;
    if (session) m_opened = connect(session, &ClubSession::opened, this, &SessionClient::update);
    emit sessionChanged();
    update();
}

void SessionClient::classBegin() { m_complete = false; }

void SessionClient::componentComplete() {
    m_complete = true;
    update();
}

void SessionClient::update() {
    if (!m_complete) return;
    QString error;
    try {
        refresh();
    } catch (const std::exception& e) {
        error = tr("Cannot compute this page: %1").arg(QString::fromUtf8(e.what()));
        qCWarning(lcDesktop).noquote() << error;
    }
    if (error == m_error) return;
    m_error = error;
    emit errorStringChanged();
}

} // namespace pitchloop::desktop
