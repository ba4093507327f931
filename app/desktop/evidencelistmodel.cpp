#include "evidencelistmodel.h"

#include "display.h"
#include "zonestate.h"

#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {
/// The non-empty parts joined with " · ".
QString joinedParts(const QStringList& parts) {
    QStringList kept;
    for (const QString& p : parts)
        if (!p.isEmpty()) kept << p;
    return kept.join(QStringLiteral(" · "));
}
} // namespace

EvidenceListModel::EvidenceListModel(QObject* parent) : QAbstractListModel(parent) {}

void EvidenceListModel::reset(const std::vector<EvidenceZone>& zones, MetricKind kind,
                              const std::string& judgedWindow, const ZoneGrid& grid) {
    const int before = count();
    beginResetModel();
    m_rows.clear();
    for (const EvidenceZone& z : zones) {
        Row r;
        r.zoneText = zoneText(z.band, z.lane, grid);
        const auto window = Window::parse(z.window);
        r.windowText = window ? desktop::windowText(*window) : QString::fromStdString(z.window);
        r.judged = z.window == judgedWindow;
        r.valueText = valueText(kind, z.value);
        r.intervalText = std::isnan(z.value) ? QString()
                                             : QStringLiteral("%1 %2").arg(levelText(z.level),
                                                                           intervalText(kind, {z.low, z.high}));
        if (window) r.sampleText = sampleText(kind, {z.num, z.den, z.matches}, *window);
        r.targetText = z.target ? QStringLiteral("Target %1").arg(targetText(kind, z.target))
                                : QStringLiteral("No target");
        r.state = ZoneState::from(z.state);
        r.stateText = stateText(z.state);
        r.certaintyText = z.state == FlagState::TooLittleData && !std::isnan(z.matchTail)
                              ? singleMatchText(z.matchTail)
                              : certaintyText(z.pMiss);
        m_rows.push_back(std::move(r));
    }
    endResetModel();
    if (before != count()) emit countChanged();
}

int EvidenceListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant EvidenceListModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const Row& r = m_rows[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case ZoneTextRole: return r.zoneText;
    case WindowTextRole: return r.windowText;
    case JudgedRole: return r.judged;
    case ValueTextRole: return r.valueText;
    case IntervalTextRole: return r.intervalText;
    case SampleTextRole: return r.sampleText;
    case TargetTextRole: return r.targetText;
    case ZoneStateRole: return r.state;
    case StateTextRole: return r.stateText;
    case CertaintyTextRole: return r.certaintyText;
    case DetailTextRole: return joinedParts({r.zoneText, r.intervalText, r.sampleText});
    case JudgementTextRole: return joinedParts({r.targetText, r.stateText, r.certaintyText});
    default: return {};
    }
}

QHash<int, QByteArray> EvidenceListModel::roleNames() const {
    return {{ZoneTextRole, "zoneText"},         {WindowTextRole, "windowText"},
            {JudgedRole, "judged"},             {ValueTextRole, "valueText"},
            {IntervalTextRole, "intervalText"}, {SampleTextRole, "sampleText"},
            {TargetTextRole, "targetText"},     {ZoneStateRole, "zoneState"},
            {StateTextRole, "stateText"},       {CertaintyTextRole, "certaintyText"},
            {DetailTextRole, "detailText"},     {JudgementTextRole, "judgementText"}};
}

} // namespace pitchloop::desktop
