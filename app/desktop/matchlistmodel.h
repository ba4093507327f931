#pragma once
// The club's stored matches for pickers and lists, newest first.

#include "repository.h"

#include <QAbstractListModel>
#include <QtQml/qqmlregistration.h>

#include <vector>

namespace pitchloop::desktop {

/// Stored matches, newest first: id, date, opponent, venue and score as text.
class MatchListModel : public QAbstractListModel {
    Q_OBJECT
    QML_ELEMENT
    QML_UNCREATABLE("The club session lists the matches")
    Q_PROPERTY(int count READ count NOTIFY countChanged)
public:
    enum Role {
        MatchIdRole = Qt::UserRole + 1,
        LabelRole,    ///< "KB-2026-34 · 13 Mar 2027 · Ostry Vale (away) 2–0"
        DateTextRole, ///< "Sat 13 Mar 2027"
        OpponentRole,
        VenueRole,    ///< "Home", "Away"
        CompetitionRole,
        ScoreRole,    ///< "2–0", empty without a score
        OutcomeRole,  ///< "W", "D", "L"
        SeasonRole,
        SquadRole,
    };
    Q_ENUM(Role)

    explicit MatchListModel(QObject* parent = nullptr);

    /// Replaces the rows with `matches` given in date order (oldest first).
    void reset(const std::vector<model::MatchSummary>& matches);
    int count() const { return static_cast<int>(m_rows.size()); }
    /// Row of a match id, -1 when absent.
    Q_INVOKABLE int indexOf(const QString& matchId) const;
    /// Match id at a row, empty when out of range.
    Q_INVOKABLE QString idAt(int row) const;

    int rowCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role) const override;
    QHash<int, QByteArray> roleNames() const override;

signals:
    void countChanged();

private:
    std::vector<model::MatchSummary> m_rows;
};

} // namespace pitchloop::desktop
