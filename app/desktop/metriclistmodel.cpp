#include "metriclistmodel.h"

#include "display.h"

namespace pitchloop::desktop {

MetricListModel::MetricListModel(QObject* parent) : QAbstractListModel(parent) {}

void MetricListModel::reset(const std::vector<model::MetricSpec>& metrics) {
    const int before = count();
    beginResetModel();
    m_rows = metrics;
    endResetModel();
    if (before != count()) emit countChanged();
}

int MetricListModel::indexOf(const QString& metricId) const {
    const std::string id = metricId.toStdString();
    for (std::size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].id == id) return static_cast<int>(i);
    return -1;
}

QString MetricListModel::idAt(int row) const {
    if (row < 0 || row >= count()) return {};
    return QString::fromStdString(m_rows[static_cast<std::size_t>(row)].id);
}

int MetricListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant MetricListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const auto& m = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case NameRole: return QString::fromStdString(m.name.empty() ? m.id : m.name);
    case MetricIdRole: return QString::fromStdString(m.id);
    case QuestionRole: return QString::fromStdString(m.question);
    case KindRole: return kindText(m.kind());
    case BetterRole: return betterText(m.better);
    default: return {};
    }
}

QHash<int, QByteArray> MetricListModel::roleNames() const {
    return {{MetricIdRole, "metricId"}, {NameRole, "name"}, {QuestionRole, "question"},
            {KindRole, "kind"},         {BetterRole, "better"}};
}

} // namespace pitchloop::desktop
