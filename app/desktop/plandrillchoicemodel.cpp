#include "plandrillchoicemodel.h"

namespace pitchloop::desktop {

PlanDrillChoiceModel::PlanDrillChoiceModel(QObject* parent) : QAbstractListModel(parent) {}

void PlanDrillChoiceModel::reset(std::vector<PlanDrillChoice> rows) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
    if (before != count()) emit countChanged();
}

qint64 PlanDrillChoiceModel::idAt(int row) const {
    if (row < 0 || row >= count()) return 0;
    return m_rows[static_cast<std::size_t>(row)].drillId;
}

int PlanDrillChoiceModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant PlanDrillChoiceModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const PlanDrillChoice& d = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case LabelRole: return d.label;
    case DrillIdRole: return d.drillId;
    case TitleRole: return d.title;
    case DetailTextRole: return d.detailText;
    case AboveCapRole: return d.aboveCap;
    case InPlanRole: return d.inPlan;
    default: return {};
    }
}

QHash<int, QByteArray> PlanDrillChoiceModel::roleNames() const {
    return {{DrillIdRole, "drillId"},       {TitleRole, "title"},
            {DetailTextRole, "detailText"}, {LabelRole, "label"},
            {AboveCapRole, "aboveCap"},     {InPlanRole, "inPlan"}};
}

} // namespace pitchloop::desktop
