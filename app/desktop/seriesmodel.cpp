#include "seriesmodel.h"

#include <cmath>

namespace pitchloop::desktop {

SeriesModel::SeriesModel(QObject* parent) : QAbstractListModel(parent) {}

void SeriesModel::reset(std::vector<SeriesPoint> points, const ScaleDomain& axis, QStringList labels) {
    beginResetModel();
    m_points = std::move(points);
    m_axis = axis;
    m_axisLabels = std::move(labels);
    endResetModel();
    emit changed();
}

template <typename F>
QList<double> SeriesModel::column(F f) const {
    QList<double> out;
    out.reserve(count());
    for (const auto& p : m_points) out.append(f(p));
    return out;
}

QList<double> SeriesModel::values() const { return column([](const SeriesPoint& p) { return p.value; }); }
QList<double> SeriesModel::lows() const { return column([](const SeriesPoint& p) { return p.low; }); }
QList<double> SeriesModel::highs() const { return column([](const SeriesPoint& p) { return p.high; }); }
QList<double> SeriesModel::ewmas() const { return column([](const SeriesPoint& p) { return p.ewma; }); }
QList<double> SeriesModel::targets() const { return column([](const SeriesPoint& p) { return p.target; }); }

QVariantMap SeriesModel::point(int row) const {
    QVariantMap out;
    if (row < 0 || row >= count()) return out;
    const QModelIndex i = index(row);
    const auto roles = roleNames();
    for (auto it = roles.begin(); it != roles.end(); ++it)
        out.insert(QString::fromUtf8(it.value()), data(i, it.key()));
    return out;
}

int SeriesModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant SeriesModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const SeriesPoint& p = m_points[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole: return p.matchId;
    case MatchIdRole: return p.matchId;
    case OpponentRole: return p.opponent;
    case DateTextRole: return p.dateText;
    case ShortDateTextRole: return p.shortDateText;
    case HasValueRole: return !std::isnan(p.value);
    case ValueRole: return p.value;
    case ValueTextRole: return p.valueText;
    case SampleTextRole: return p.sampleText;
    case WindowValueRole: return p.windowValue;
    case LowRole: return p.low;
    case HighRole: return p.high;
    case WindowTextRole: return p.windowText;
    case EwmaRole: return p.ewma;
    case EwmaTextRole: return p.ewmaText;
    case HasTargetRole: return !std::isnan(p.target);
    case TargetRole: return p.target;
    case TargetTextRole: return p.targetText;
    case StateRole: return p.state;
    case StateTextRole: return p.stateText;
    case CertaintyTextRole: return p.certaintyText;
    default: return {};
    }
}

QHash<int, QByteArray> SeriesModel::roleNames() const {
    return {{MatchIdRole, "matchId"},
            {OpponentRole, "opponent"},
            {DateTextRole, "dateText"},
            {ShortDateTextRole, "shortDateText"},
            {HasValueRole, "hasValue"},
            {ValueRole, "value"},
            {ValueTextRole, "valueText"},
            {SampleTextRole, "sampleText"},
            {WindowValueRole, "windowValue"},
            {LowRole, "low"},
            {HighRole, "high"},
            {WindowTextRole, "windowText"},
            {EwmaRole, "ewma"},
            {EwmaTextRole, "ewmaText"},
            {HasTargetRole, "hasTarget"},
            {TargetRole, "target"},
            {TargetTextRole, "targetText"},
            {StateRole, "zoneState"},
            {StateTextRole, "stateText"},
            {CertaintyTextRole, "certaintyText"}};
}

} // namespace pitchloop::desktop
