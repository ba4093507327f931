#include "debrieflistmodel.h"

#include "wording.h"

#include "display.h"
#include "zonestate.h"

#include <QLocale>

#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

std::vector<DebriefRow> debriefRows(const QString& section, const std::vector<DebriefItem>& items,
                                    const std::map<std::string, MetricSpec>& metrics,
                                    const ZoneGrid& grid,
                                    const std::string& previousMatchId, bool markNew) {
    std::vector<DebriefRow> out;
    for (const auto& item : items) {
        const ZoneStatus& s = item.now;
        const auto spec = metrics.find(s.metric);
        const MetricKind kind = spec != metrics.end() ? spec->second.kind() : MetricKind::Rate;
        DebriefRow r;
        r.section = section;
        r.metricId = QString::fromStdString(s.metric);
        r.metricName = spec != metrics.end() && !spec->second.name.empty()
                           ? QString::fromStdString(spec->second.name)
                           : r.metricId;
        r.band = s.band;
        r.lane = s.lane;
        r.zoneText = zoneText(s.band, s.lane, grid);
        r.valueText = valueText(kind, s.value);
        r.intervalText = intervalText(kind, s.interval);
        r.sampleText = sampleText(kind, s.sum, s.window);
        r.targetText = targetText(kind, s.target);
        r.pMiss = s.pMiss;
        r.certaintyText = certaintyText(s.pMiss);
        r.state = ZoneState::from(s.state);
        r.stateText = stateText(s.state);
        if (s.state == FlagState::TooLittleData && !std::isnan(s.matchTail)) {
            // One match of a per-match count: not judged, but how rare such a match is.
            r.stateText = QStringLiteral("Unusual match");
            r.certaintyText = singleMatchText(s.matchTail).remove(QStringLiteral("unusual match: "));
        }
        if (spec != metrics.end()) r.coachText = QString::fromStdString(words::coachSentence(spec->second, s, grid));
        r.analystText = QString::fromStdString(words::analystLine(s, kind));
        if (s.state == FlagState::TooLittleData && !std::isnan(s.matchTail)) {
            if (spec != metrics.end())
                r.coachText = QString::fromStdString(words::unusualMatchSentence(spec->second, s, grid));
            r.analystText += QStringLiteral(" · ") + singleMatchText(s.matchTail);
        }
        r.isNew = markNew && !previousMatchId.empty() && item.before != FlagState::OffTarget;
        if (r.isNew)
            r.changeText = QStringLiteral("new since %1").arg(QString::fromStdString(previousMatchId));
        else if (item.before && *item.before != s.state)
            r.changeText = QStringLiteral("was %1").arg(stateText(*item.before).toLower());
        out.push_back(std::move(r));
    }
    return out;
}

DebriefListModel::DebriefListModel(QObject* parent) : QAbstractListModel(parent) {}

void DebriefListModel::reset(std::vector<DebriefRow> rows) {
    const int before = count();
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
    if (before != count()) emit countChanged();
}

int DebriefListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant DebriefListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const DebriefRow& r = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole: return r.metricName + QStringLiteral(" · ") + r.zoneText;
    case CoachTextRole: return r.coachText;
    case AnalystTextRole: return r.analystText;
    case SectionRole: return r.section;
    case MetricIdRole: return r.metricId;
    case MetricNameRole: return r.metricName;
    case BandRole: return r.band;
    case LaneRole: return r.lane;
    case ZoneTextRole: return r.zoneText;
    case ValueTextRole: return r.valueText;
    case IntervalTextRole: return r.intervalText;
    case SampleTextRole: return r.sampleText;
    case TargetTextRole: return r.targetText;
    case PMissRole: return r.pMiss;
    case CertaintyTextRole: return r.certaintyText;
    case StateRole: return r.state;
    case StateTextRole: return r.stateText;
    case IsNewRole: return r.isNew;
    case ChangeTextRole: return r.changeText;
    case FirstInSectionRole:
        return index.row() == 0 || m_rows[static_cast<std::size_t>(index.row() - 1)].section != r.section;
    default: return {};
    }
}

QHash<int, QByteArray> DebriefListModel::roleNames() const {
    return {{SectionRole, "section"},
            {MetricIdRole, "metricId"},
            {MetricNameRole, "metricName"},
            {BandRole, "band"},
            {LaneRole, "lane"},
            {ZoneTextRole, "zoneText"},
            {ValueTextRole, "valueText"},
            {IntervalTextRole, "intervalText"},
            {SampleTextRole, "sampleText"},
            {TargetTextRole, "targetText"},
            {PMissRole, "pMiss"},
            {CertaintyTextRole, "certaintyText"},
            {StateRole, "zoneState"},
            {StateTextRole, "stateText"},
            {IsNewRole, "isNew"},
            {CoachTextRole, "coachText"},
            {AnalystTextRole, "analystText"},
            {ChangeTextRole, "changeText"},
            {FirstInSectionRole, "firstInSection"}};
}

} // namespace pitchloop::desktop
