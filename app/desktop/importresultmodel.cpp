#include "importresultmodel.h"

#include <algorithm>

namespace pitchloop::desktop {

QString outcomeText(ImportResult::Outcome outcome) {
    switch (outcome) {
    case ImportResult::Stored: return QStringLiteral("Stored");
    case ImportResult::Replaced: return QStringLiteral("Replaced");
    case ImportResult::Unchanged: return QStringLiteral("Unchanged");
    case ImportResult::Failed: return QStringLiteral("Failed");
    case ImportResult::NotLoaded: return QStringLiteral("Not loaded");
    }
    return {};
}

ImportResultModel::ImportResultModel(QObject* parent) : QAbstractListModel(parent) {}

void ImportResultModel::append(ImportResult result) {
    const int row = count();
    beginInsertRows({}, row, row);
    m_rows.push_back(std::move(result));
    endInsertRows();
    emit countChanged();
}

void ImportResultModel::clear() {
    if (m_rows.empty()) return;
    beginResetModel();
    m_rows.clear();
    endResetModel();
    emit countChanged();
}

int ImportResultModel::countOf(ImportResult::Outcome outcome) const {
    return static_cast<int>(std::count_if(m_rows.begin(), m_rows.end(),
                                          [&](const ImportResult& r) { return r.outcome == outcome; }));
}

int ImportResultModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant ImportResultModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const ImportResult& r = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case FileNameRole: return r.fileName;
    case PathRole: return r.path;
    case OutcomeRole: return static_cast<int>(r.outcome);
    case OutcomeTextRole: return outcomeText(r.outcome);
    case MatchIdRole: return r.matchId;
    case DetailRole: return r.detail;
    case ProblemsRole: return r.problems;
    case ProblemTextRole: return r.problems.join(QLatin1Char('\n'));
    case WarningTextRole: return r.warnings.join(QLatin1Char('\n'));
    default: return {};
    }
}

QHash<int, QByteArray> ImportResultModel::roleNames() const {
    return {{FileNameRole, "fileName"},     {PathRole, "path"},
            {OutcomeRole, "outcome"},       {OutcomeTextRole, "outcomeText"},
            {MatchIdRole, "matchId"},       {DetailRole, "detail"},
            {ProblemsRole, "problems"},     {ProblemTextRole, "problemText"},
            {WarningTextRole, "warningText"}};
}

} // namespace pitchloop::desktop
