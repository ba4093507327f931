#include "planfocusmodel.h"

namespace pitchloop::desktop {

PlanFocusModel::PlanFocusModel(QObject* parent) : QAbstractListModel(parent) {}

void PlanFocusModel::reset(std::vector<PlanFocusRow> rows) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
    if (before != count()) emit countChanged();
}

int PlanFocusModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant PlanFocusModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const PlanFocusRow& f = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case TitleRole: return f.title;
    case FocusIdRole: return f.focusId;
    case ZoneTextRole: return f.zoneText;
    case SeverityTextRole: return f.severityText;
    case MinutesRole: return f.minutes;
    case MinutesTextRole: return f.minutesText;
    case ShareRole: return f.share;
    default: return {};
    }
}

QHash<int, QByteArray> PlanFocusModel::roleNames() const {
    return {{FocusIdRole, "focusId"},         {TitleRole, "title"},
            {ZoneTextRole, "zoneText"},       {SeverityTextRole, "severityText"},
            {MinutesRole, "minutes"},         {MinutesTextRole, "minutesText"},
            {ShareRole, "share"}};
}

} // namespace pitchloop::desktop
