#include "focuslistmodel.h"

namespace pitchloop::desktop {

FocusListModel::FocusListModel(QObject* parent) : QAbstractListModel(parent) {}

void FocusListModel::reset(std::vector<FocusRow> rows) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
    if (before != count()) emit countChanged();
}

const FocusRow* FocusListModel::at(int row) const {
    if (row < 0 || row >= count()) return nullptr;
    return &m_rows[static_cast<std::size_t>(row)];
}

int FocusListModel::indexOf(qint64 focusId) const {
    for (std::size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].focusId == focusId) return static_cast<int>(i);
    return -1;
}

int FocusListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant FocusListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const FocusRow& r = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case TitleRole: return r.title;
    case FocusIdRole: return r.focusId;
    case ZonesTextRole: return r.zonesText;
    case PhaseRole: return r.phase;
    case PhaseTextRole: return r.phaseText;
    case OpenedTextRole: return r.openedText;
    case ProgressTextRole: return r.progressText;
    case DrillsTextRole: return r.drillsText;
    case MinutesTextRole: return r.minutesText;
    default: return {};
    }
}

QHash<int, QByteArray> FocusListModel::roleNames() const {
    return {{FocusIdRole, "focusId"},       {TitleRole, "title"},
            {ZonesTextRole, "zonesText"},   {PhaseRole, "phase"},
            {PhaseTextRole, "phaseText"},   {OpenedTextRole, "openedText"},
            {ProgressTextRole, "progressText"}, {DrillsTextRole, "drillsText"},
            {MinutesTextRole, "minutesText"}};
}

} // namespace pitchloop::desktop
