#include "planblockmodel.h"

namespace pitchloop::desktop {

PlanBlockModel::PlanBlockModel(QObject* parent) : QAbstractListModel(parent) {}

void PlanBlockModel::reset(std::vector<PlanBlockRow> rows) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
    if (before != count()) emit countChanged();
}

int PlanBlockModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant PlanBlockModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const PlanBlockRow& b = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole: return b.title;
    case RoleTextRole: return b.role;
    case MainRole: return b.main;
    case DrillIdRole: return b.drillId;
    case TitleRole: return b.title;
    case MinutesRole: return b.minutes;
    case MinutesTextRole: return b.minutesText;
    case IntensityRole: return b.intensity;
    case IntensityTextRole: return b.intensityText;
    case PinnedRole: return b.pinned;
    case FocusTextRole: return b.focusText;
    case WhyRole: return b.why;
    default: return {};
    }
}

QHash<int, QByteArray> PlanBlockModel::roleNames() const {
    return {{RoleTextRole, "roleText"},   {MainRole, "main"},
            {DrillIdRole, "drillId"},     {TitleRole, "title"},
            {MinutesRole, "minutes"},     {MinutesTextRole, "minutesText"},
            {IntensityRole, "intensity"}, {IntensityTextRole, "intensityText"},
            {PinnedRole, "pinned"},       {FocusTextRole, "focusText"},
            {WhyRole, "why"}};
}

} // namespace pitchloop::desktop
