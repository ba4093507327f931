#include "matchlistmodel.h"

#include "display.h"

namespace pitchloop::desktop {

MatchListModel::MatchListModel(QObject* parent) : QAbstractListModel(parent) {}

void MatchListModel::reset(const std::vector<model::MatchSummary>& matches) {
    const int before = count();
    beginResetModel();
    m_rows.assign(matches.rbegin(), matches.rend());
    endResetModel();
    if (before != count()) emit countChanged();
}

int MatchListModel::indexOf(const QString& matchId) const {
    const std::string id = matchId.toStdString();
    for (std::size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].id == id) return static_cast<int>(i);
    return -1;
}

QString MatchListModel::idAt(int row) const {
    if (row < 0 || row >= count()) return {};
    return QString::fromStdString(m_rows[static_cast<std::size_t>(row)].id);
}

int MatchListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant MatchListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const auto& m = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case LabelRole: {
        QString label = QStringLiteral("%1 · %2 · %3 (%4)")
                            .arg(QString::fromStdString(m.id), compactDateText(m.date),
                                 QString::fromStdString(m.opponent), venueText(m.venue).toLower());
        if (const QString score = scoreText(m); !score.isEmpty())
            label += QLatin1Char(' ') + score;
        return label;
    }
    case MatchIdRole: return QString::fromStdString(m.id);
    case DateTextRole: return dateText(m.date);
    case OpponentRole: return QString::fromStdString(m.opponent);
    case VenueRole: return venueText(m.venue);
    case CompetitionRole: return QString::fromStdString(m.competition);
    case ScoreRole: return scoreText(m);
    case OutcomeRole: return outcomeText(m);
    case SeasonRole: return QString::fromStdString(m.season);
    case SquadRole: return QString::fromStdString(m.squad);
    default: return {};
    }
}

QHash<int, QByteArray> MatchListModel::roleNames() const {
    return {{MatchIdRole, "matchId"},   {LabelRole, "label"},     {DateTextRole, "dateText"},
            {OpponentRole, "opponent"}, {VenueRole, "venue"},     {CompetitionRole, "competition"},
            {ScoreRole, "score"},       {OutcomeRole, "outcome"}, {SeasonRole, "season"},
            {SquadRole, "squad"}};
}

} // namespace pitchloop::desktop
