#include "planweekmodel.h"

namespace pitchloop::desktop {

PlanWeekModel::PlanWeekModel(QObject* parent) : QAbstractListModel(parent) {}

void PlanWeekModel::reset(std::vector<PlanWeekDay> days) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(days);
    endResetModel();
    if (before != count()) emit countChanged();
}

void PlanWeekModel::select(const QString& date) {
    for (std::size_t i = 0; i < m_rows.size(); ++i) {
        const bool selected = m_rows[i].date == date;
        if (m_rows[i].selected == selected) continue;
        m_rows[i].selected = selected;
        const QModelIndex at = index(static_cast<int>(i), 0);
        emit dataChanged(at, at, {SelectedRole});
    }
}

int PlanWeekModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant PlanWeekModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const PlanWeekDay& d = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole: return d.weekday + QLatin1Char(' ') + d.dateText;
    case DateRole: return d.date;
    case WeekdayRole: return d.weekday;
    case DateTextRole: return d.dateText;
    case LabelRole: return d.label;
    case CongestedRole: return d.congested;
    case CapRole: return d.cap;
    case CapTextRole: return d.capText;
    case MatchDayRole: return d.matchDay;
    case FixtureTextRole: return d.fixtureText;
    case FixtureDetailRole: return d.fixtureDetail;
    case HasSessionRole: return d.hasSession;
    case SessionTextRole: return d.sessionText;
    case DrillLinesRole: return d.drillLines;
    case TodayRole: return d.today;
    case SelectedRole: return d.selected;
    default: return {};
    }
}

QHash<int, QByteArray> PlanWeekModel::roleNames() const {
    return {{DateRole, "date"},           {WeekdayRole, "weekday"},
            {DateTextRole, "dateText"},   {LabelRole, "label"},
            {CongestedRole, "congested"}, {CapRole, "cap"},
            {CapTextRole, "capText"},     {MatchDayRole, "matchDay"},
            {FixtureTextRole, "fixtureText"}, {FixtureDetailRole, "fixtureDetail"},
            {HasSessionRole, "hasSession"},   {SessionTextRole, "sessionText"},
            {DrillLinesRole, "drillLines"},
            {TodayRole, "today"},         {SelectedRole, "selected"}};
}

} // namespace pitchloop::desktop
