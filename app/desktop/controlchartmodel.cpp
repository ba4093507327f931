#include "controlchartmodel.h"

#include "reviewreading.h"

#include <QVariantMap>

#include <algorithm>
#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

ControlChartModel::ControlChartModel(QObject* parent) : QAbstractListModel(parent) {}

void ControlChartModel::reset(const Review& review) {
    beginResetModel();
    m_points = review.chart;
    m_dates = review.before.dates;
    m_dates.insert(m_dates.end(), review.trigger.dates.begin(), review.trigger.dates.end());
    m_dates.insert(m_dates.end(), review.after.dates.begin(), review.after.dates.end());
    m_kind = review.kind;
    m_better = review.better;
    // The chart runs baseline, the flag's own matches, then after.
    m_firstAfter = static_cast<int>(std::count_if(review.chart.begin(), review.chart.end(),
                                                  [](const model::ChartPoint& p) { return !p.after; }));
    const ChartReading reading = readChart(review);
    m_axis = scaleDomain(m_kind, {reading.low, reading.high});
    m_axisLabels = scaleLabels(m_kind, m_axis);
    m_kindText = m_kind == MetricKind::Rate ? tr("p-chart") : tr("u-chart");
    endResetModel();
    emit changed();
}

void ControlChartModel::clear() {
    beginResetModel();
    m_points.clear();
    m_dates.clear();
    m_firstAfter = 0;
    m_axis = {};
    m_axisLabels.clear();
    m_kindText.clear();
    endResetModel();
    emit changed();
}

template <typename F>
QList<double> ControlChartModel::column(F f) const {
    QList<double> out;
    out.reserve(static_cast<qsizetype>(m_points.size()));
    for (const auto& p : m_points) out << f(p);
    return out;
}

QList<double> ControlChartModel::values() const { return column([](const ChartPoint& p) { return p.value; }); }
QList<double> ControlChartModel::centres() const { return column([](const ChartPoint& p) { return p.centre; }); }
QList<double> ControlChartModel::lowerLimits() const { return column([](const ChartPoint& p) { return p.lcl; }); }
QList<double> ControlChartModel::upperLimits() const { return column([](const ChartPoint& p) { return p.ucl; }); }
QList<double> ControlChartModel::ewmas() const { return column([](const ChartPoint& p) { return p.ewma; }); }

QVariantMap ControlChartModel::point(int row) const {
    QVariantMap out;
    if (row < 0 || row >= count()) return out;
    const auto roles = roleNames();
    for (auto it = roles.begin(); it != roles.end(); ++it)
        out.insert(QString::fromUtf8(it.value()), data(index(row), it.key()));
    return out;
}

int ControlChartModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant ControlChartModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const std::size_t i = static_cast<std::size_t>(index.row());
    const ChartPoint& p = m_points[i];
    const bool higher = m_better == Better::Higher;
    const int signal = p.above ? (higher ? 1 : -1) : p.below ? (higher ? -1 : 1) : 0;
    switch (role) {
    case Qt::DisplayRole:
    case MatchIdRole: return QString::fromStdString(p.matchId);
    case ShortDateTextRole: return i < m_dates.size() ? shortDateText(m_dates[i]) : QString();
    case AfterRole: return p.after;
    case ValueTextRole: return valueText(m_kind, p.value);
    case LimitsTextRole:
        return tr("limits %1").arg(intervalText(m_kind, {p.lcl, p.ucl}));
    case CentreTextRole: return valueText(m_kind, p.centre);
    case EwmaTextRole: return valueText(m_kind, p.ewma);
    case SideRole: return signal;
    case SideTextRole:
        if (p.above) return signal > 0 ? tr("above the upper limit (better)") : tr("above the upper limit (worse)");
        if (p.below) return signal > 0 ? tr("below the lower limit (better)") : tr("below the lower limit (worse)");
        return QString();
    default: return {};
    }
}

QHash<int, QByteArray> ControlChartModel::roleNames() const {
    return {{MatchIdRole, "matchId"},       {ShortDateTextRole, "shortDateText"},
            {AfterRole, "after"},           {ValueTextRole, "valueText"},
            {LimitsTextRole, "limitsText"}, {CentreTextRole, "centreText"},
            {EwmaTextRole, "ewmaText"},     {SideRole, "side"},
            {SideTextRole, "sideText"}};
}

} // namespace pitchloop::desktop
