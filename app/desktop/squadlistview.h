#pragma once
// The squad list in Settings (model/squadlist.h): the players by number, added or changed from a
// small form, removed, or the whole list replaced from a file — each checked as the command line
// checks it, nothing saved when a check fails.

#include "sessionclient.h"
#include "squadlist.h"

#include <QString>
#include <QStringList>
#include <QUrl>
#include <QVariantList>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

class SquadListView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    QML_ELEMENT
    /// The squad whose list this is (the latest match's; "First team" without matches).
    Q_PROPERTY(QString squad READ squad NOTIFY changed)
    /// [{number, name, position, text: "7 E. Tansley (RW)"}] by number.
    Q_PROPERTY(QVariantList players READ players NOTIFY changed)
    Q_PROPERTY(QStringList positions READ positions CONSTANT)
    /// What the last change did, or what was wrong with it.
    Q_PROPERTY(QString message READ message NOTIFY messageChanged)
    Q_PROPERTY(bool failed READ failed NOTIFY messageChanged)
public:
    explicit SquadListView(QObject* parent = nullptr);

    QString squad() const { return m_squad; }
    QVariantList players() const { return m_playerList; }
    QStringList positions() const;
    QString message() const { return m_message; }
    bool failed() const { return m_failed; }

    /// Adds a player, or changes the one with the same number.
    Q_INVOKABLE bool savePlayer(const QString& number, const QString& name, const QString& position);
    Q_INVOKABLE bool removePlayer(const QString& number);
    /// Replaces the list with a file's (number, name, position columns); all or nothing.
    Q_INVOKABLE bool importFile(const QUrl& file);

signals:
    void changed();
    void messageChanged();

protected:
    void refresh() override;

private:
    void say(const QString& message, bool failed);
    bool store(const std::vector<model::Player>& players, const QString& message);

    QString m_squad;
    std::vector<model::Player> m_players;
    QVariantList m_playerList;
    QString m_message;
    bool m_failed = false;
};

} // namespace pitchloop::desktop
