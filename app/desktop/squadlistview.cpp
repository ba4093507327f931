#include "squadlistview.h"

#include "clubsession.h"
#include "display.h"
#include "matchreader.h"

#include <QFile>
#include <QFileInfo>

#include <algorithm>

namespace pitchloop::desktop {

using namespace pitchloop::model;

SquadListView::SquadListView(QObject* parent) : SessionClient(parent) {}

QStringList SquadListView::positions() const {
    QStringList out;
    for (const auto p : knownPositions()) out << QString::fromLatin1(p.data(), static_cast<qsizetype>(p.size()));
    return out;
}

void SquadListView::refresh() {
    ClubSession* s = session();
    m_players.clear();
    m_playerList.clear();
    m_squad = QStringLiteral("First team");
    if (s && s->isOpen()) {
        if (!s->matchSummaries().empty()) m_squad = QString::fromStdString(s->matchSummaries().back().squad);
        m_players = s->repository()->squadList(m_squad.toStdString());
    }
    for (const Player& p : m_players)
        m_playerList.append(QVariantMap{{QStringLiteral("number"), QString::fromStdString(p.number)},
                                        {QStringLiteral("name"), QString::fromStdString(p.name)},
                                        {QStringLiteral("position"), QString::fromStdString(p.position)},
                                        {QStringLiteral("text"), QString::fromStdString(p.number + "  " + p.name + "  (" +
                                                                                         p.position + ")")}});
    emit changed();
}

void SquadListView::say(const QString& message, bool failed) {
    m_message = message;
    m_failed = failed;
    emit messageChanged();
}

bool SquadListView::store(const std::vector<Player>& players, const QString& message) {
    ClubSession* s = session();
    if (!s || !s->isOpen()) {
        say(tr("Open a club file first."), true);
        return false;
    }
    try {
        s->repository()->replaceSquadList(m_squad.toStdString(), players);
    } catch (const std::exception& e) {
        say(QString::fromStdString(e.what()), true);
        return false;
    }
    update();
    say(message, false);
    return true;
}

bool SquadListView::savePlayer(const QString& number, const QString& name, const QString& position) {
    Player p{number.trimmed().toStdString(), name.trimmed().toStdString(), position.trimmed().toUpper().toStdString()};
    std::vector<std::string> taken;
    for (const Player& q : m_players)
        if (q.number != p.number) taken.push_back(q.number);
    if (const Problems problems = checkPlayer(p, taken); !problems.empty()) {
        QStringList lines;
        for (const Problem& problem : problems)
            lines << tr("%1: %2").arg(QString::fromStdString(problem.field), plainMessage(problem.message));
        say(lines.join(QLatin1Char('\n')), true);
        return false;
    }
    std::vector<Player> players = m_players;
    std::erase_if(players, [&](const Player& q) { return q.number == p.number; });
    players.push_back(p);
    return store(players, tr("Saved %1 %2 (%3).").arg(number.trimmed(), name.trimmed(), position.trimmed().toUpper()));
}

bool SquadListView::removePlayer(const QString& number) {
    std::vector<Player> players = m_players;
    std::erase_if(players, [&](const Player& q) { return q.number == number.toStdString(); });
    if (players.size() == m_players.size()) {
        say(tr("No player %1 in the list.").arg(number), true);
        return false;
    }
    return store(players, tr("Removed %1.").arg(number));
}

bool SquadListView::importFile(const QUrl& file) {
    const QString path = localPath(file);
    QFile f(path);
    if (path.isEmpty() || !f.open(QIODevice::ReadOnly)) {
        say(tr("Cannot read %1.").arg(path), true);
        return false;
    }
    const SquadListResult read = parseSquadList(f.readAll().toStdString(), QFileInfo(path).fileName().toStdString());
    if (!read.errors.empty()) {
        QStringList lines;
        for (const Problem& p : read.errors) lines << plainMessage(p.describe());
        say(tr("Nothing was changed. %1").arg(lines.join(QLatin1Char('\n'))), true);
        return false;
    }
    return store(read.players, tr("The list now holds the file's %1 players.").arg(read.players.size()));
}

} // namespace pitchloop::desktop
