#include "zonemapmodel.h"

#include "palette.h"
#include "seasondata.h"
#include "pooling.h"
#include "targets.h"
#include "zonestate.h"

#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// The zones' effective counts on the map's scale (as they are unless a count scale applies).
std::vector<ZoneCount> scaledCounts(const std::vector<const ZoneStatus*>& statuses, MetricKind kind,
                                    const MapScale& scale) {
    std::vector<ZoneCount> counts;
    counts.reserve(statuses.size());
    for (const ZoneStatus* s : statuses)
        counts.push_back(scale.appliesTo(kind) ? scaledCount(*s, scale.wholePitch ? *scale.wholePitch : *s,
                                                             scale.scale, scale.exposure)
                                               : ZoneCount{s->band, s->lane, s->sum.effNum, s->sum.effDen});
    return counts;
}

MetricKind mapKind(MetricKind kind, const MapScale& scale) {
    return scale.appliesTo(kind) ? scaledKind(scale.scale) : kind;
}

PooledMap poolStatusZones(const std::vector<const ZoneStatus*>& statuses, MetricKind kind, const ZoneGrid& grid,
                          double reference, const MapScale& scale) {
    const double level = statuses.empty() ? 0.9 : statuses.front()->level;
    return poolZones(scaledCounts(statuses, kind, scale), grid, mapKind(kind, scale), level, reference);
}

} // namespace

MapScale CountScaler::scaleFor(CountScale scale, const ClubRepository& repo, const SeasonData& season,
                               std::size_t focal, const std::string& metricId, const Window& w) {
    if (scale == CountScale::PerMatch) return {};
    if (const std::string key = season.squad() + '/' + season.season() + '/' +
                                std::to_string(season.tallies().matchIds.size());
        key != m_key) {
        m_exposures = repo.seasonExposures(season.squad(), season.season());
        m_key = key;
    }
    return {scale, exposurePerMatch(m_exposures, focal, w, scale), season.find(focal, metricId, 0, 0, w)};
}

std::vector<double> pooledValues(const std::vector<const ZoneStatus*>& statuses, MetricKind kind,
                                 const ZoneGrid& grid, const MapScale& scale) {
    std::vector<double> out;
    const PooledMap map = poolStatusZones(statuses, kind, grid, 1.0, scale);
    for (std::size_t i = 0; i < statuses.size(); ++i)
        out.push_back(std::isnan(statuses[i]->value) ? std::nan("") : map.zones[i].pooled);
    return out;
}

std::vector<ZoneCell> zoneCells(const std::vector<const ZoneStatus*>& statuses, MetricKind kind,
                                const ScaleDomain& domain, const ZoneGrid& grid, const MapScale& scale) {
    std::vector<ZoneCell> out;
    out.reserve(statuses.size());
    const long minSample = defaultMinSample(kind);
    const PooledMap pooled = poolStatusZones(statuses, kind, grid, domain.high - domain.low, scale);
    const MetricKind shown = mapKind(kind, scale);
    const QString per = scale.appliesTo(kind) ? QStringLiteral(" ") + QString::fromStdString(scaleWords(scale.scale))
                                              : QString();
    for (std::size_t i = 0; i < statuses.size(); ++i) {
        const ZoneStatus* s = statuses[i];
        const PooledZone& p = pooled.zones[i];
        ZoneCell c;
        c.band = s->band;
        c.lane = s->lane;
        c.zoneName = zoneText(s->band, s->lane, grid);
        c.hasValue = !std::isnan(s->value) && !std::isnan(p.pooled);
        c.raw = !c.hasValue ? 0 : scale.appliesTo(kind) && p.den > 0 ? p.num / p.den : s->value;
        c.value = c.hasValue ? p.pooled : 0;
        c.scaled = c.hasValue ? domain.position(p.pooled) : 0;
        c.certaintyRow = c.hasValue ? palette::levelOf(p.spread) : palette::kLevels - 1;
        const palette::Rgb colour = c.hasValue ? palette::colour(c.certaintyRow, palette::stepOf(c.scaled, c.certaintyRow))
                                               : palette::fromHex("#c9cdd3");
        c.colour = QString::fromStdString(palette::toHex(colour));
        c.darkText = palette::darkTextOn(colour);
        // Counts are per match whatever the window; shares and exposures rest on their items.
        c.thin = c.hasValue && kind != MetricKind::Count &&
                 s->sum.den < static_cast<double>(s->target ? s->target->minSample : minSample);
        c.valueText = valueText(shown, c.hasValue ? p.pooled : s->value);
        c.sampleText = sampleText(kind, s->sum, s->window);
        c.intervalText = c.hasValue ? intervalText(shown, p.interval) : QString();
        // The zone's own numbers: num/den as counted (weighted sums for the EWMA), then its value.
        const auto amount = [](double v) {
            return std::abs(v - std::round(v)) < 1e-9 ? QString::number(std::llround(v)) : QString::number(v, 'f', 1);
        };
        const QString counted = kind == MetricKind::Count
                                    ? QStringLiteral("%1 in %2").arg(amount(s->sum.num), c.sampleText)
                                    : QStringLiteral("%1 of %2").arg(amount(s->sum.num), amount(s->sum.den));
        c.rawText = c.hasValue ? QStringLiteral("This zone alone: %1 = %2%3").arg(counted, valueText(shown, c.raw), per)
                               : QString();
        c.targetText = targetText(kind, s->target);
        c.state = ZoneState::from(s->state);
        c.stateText = stateText(s->state);
        c.certaintyText = s->state == FlagState::TooLittleData && !std::isnan(s->matchTail)
                              ? singleMatchText(s->matchTail)
                              : certaintyText(s->pMiss);
        out.push_back(std::move(c));
    }
    return out;
}

QString wholePitchLine(const ZoneStatus& s, MetricKind kind) {
    QStringList parts{QStringLiteral("Whole pitch %1").arg(valueText(kind, s.value)),
                      sampleText(kind, s.sum, s.window)};
    if (s.target) {
        parts << QStringLiteral("target %1").arg(targetText(kind, s.target));
        parts << stateText(s.state);
    }
    return parts.join(QStringLiteral(" · "));
}

ZoneMapModel::ZoneMapModel(QObject* parent) : QAbstractListModel(parent) {}

void ZoneMapModel::reset(Header header, std::vector<ZoneCell> cells) {
    m_header = std::move(header);
    if (!cells.empty() && cells.size() == m_cells.size()) {
        // Same grid (a metric switch): update the cells in place, so the views keep their
        // delegates and only redraw.
        m_cells = std::move(cells);
        emit dataChanged(index(0), index(count() - 1));
    } else {
        beginResetModel();
        m_cells = std::move(cells);
        endResetModel();
    }
    emit changed();
}

void ZoneMapModel::clear() { reset({}, {}); }

QVariantMap ZoneMapModel::zone(int band, int lane) const {
    for (int row = 0; row < count(); ++row) {
        const ZoneCell& c = m_cells[static_cast<std::size_t>(row)];
        if (c.band != band || c.lane != lane) continue;
        QVariantMap out;
        const QModelIndex i = index(row);
        const auto roles = roleNames();
        for (auto it = roles.begin(); it != roles.end(); ++it)
            out.insert(QString::fromUtf8(it.value()), data(i, it.key()));
        return out;
    }
    return {};
}

int ZoneMapModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QVariant ZoneMapModel::data(const QModelIndex& index, int role) const {
    if (!checkIndex(index, CheckIndexOption::IndexIsValid | CheckIndexOption::ParentIsInvalid))
        return {};
    const ZoneCell& c = m_cells[static_cast<std::size_t>(index.row())];
    switch (role) {
    case Qt::DisplayRole:
    case ZoneNameRole: return c.zoneName;
    case BandRole: return c.band;
    case LaneRole: return c.lane;
    case HasValueRole: return c.hasValue;
    case ValueRole: return c.value;
    case ScaledRole: return c.scaled;
    case ThinRole: return c.thin;
    case ValueTextRole: return c.valueText;
    case SampleTextRole: return c.sampleText;
    case IntervalTextRole: return c.intervalText;
    case TargetTextRole: return c.targetText;
    case StateRole: return c.state;
    case StateTextRole: return c.stateText;
    case CertaintyTextRole: return c.certaintyText;
    case RawRole: return c.raw;
    case RawTextRole: return c.rawText;
    case ColourRole: return c.colour;
    case DarkTextRole: return c.darkText;
    case CertaintyRowRole: return c.certaintyRow;
    default: return {};
    }
}

QHash<int, QByteArray> ZoneMapModel::roleNames() const {
    return {{BandRole, "band"},
            {LaneRole, "lane"},
            {ZoneNameRole, "zoneName"},
            {HasValueRole, "hasValue"},
            {ValueRole, "value"},
            {ScaledRole, "scaled"},
            {ThinRole, "thin"},
            {ValueTextRole, "valueText"},
            {SampleTextRole, "sampleText"},
            {IntervalTextRole, "intervalText"},
            {TargetTextRole, "targetText"},
            {StateRole, "zoneState"},
            {StateTextRole, "stateText"},
            {CertaintyTextRole, "certaintyText"},
            {RawRole, "raw"},
            {RawTextRole, "rawText"},
            {ColourRole, "colour"},
            {DarkTextRole, "darkText"},
            {CertaintyRowRole, "certaintyRow"}};
}

} // namespace pitchloop::desktop
