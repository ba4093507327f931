#include "targetzonemodel.h"

#include "display.h"

namespace pitchloop::desktop {

TargetZoneModel::TargetZoneModel(QObject* parent) : QAbstractListModel(parent) {}

void TargetZoneModel::reset(std::vector<TargetZone> zones) {
    const bool countChange = zones.size() != m_zones.size();
    beginResetModel();
    m_zones = std::move(zones);
    endResetModel();
    if (countChange) emit countChanged();
}

int TargetZoneModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant TargetZoneModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const TargetZone& z = m_zones[static_cast<std::size_t>(index.row())];
    switch (role) {
    case BandRole: return z.band;
    case LaneRole: return z.lane;
    case Qt::DisplayRole:
    case ZoneNameRole: return z.zoneName;
    case HasTargetRole: return z.hasTarget;
    case TargetTextRole: return z.targetText;
    case HasLastSeasonRole: return z.hasLastSeason;
    case LastSeasonTextRole: return z.lastSeasonText;
    case SelectedRole: return z.selected;
    default: return {};
    }
}

QHash<int, QByteArray> TargetZoneModel::roleNames() const {
    return {{BandRole, "band"},
            {LaneRole, "lane"},
            {ZoneNameRole, "zoneName"},
            {HasTargetRole, "hasTarget"},
            {TargetTextRole, "targetText"},
            {HasLastSeasonRole, "hasLastSeason"},
            {LastSeasonTextRole, "lastSeasonText"},
            {SelectedRole, "selected"}};
}

} // namespace pitchloop::desktop
