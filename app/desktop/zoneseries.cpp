#include "zoneseries.h"

#include "clubsession.h"
#include "focus.h"
#include "metriclistmodel.h"
#include "pitchgeometry.h"
#include "seriesmodel.h"
#include "wording.h"
#include "zonemapmodel.h"
#include "zonestate.h"

#include <QLocale>

#include <algorithm>
#include <cmath>
#include <limits>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
}

ZoneSeries::ZoneSeries(QObject* parent)
    : SessionClient(parent),
      m_series(new SeriesModel(this)),
      m_map(new ZoneMapModel(this)),
      m_geometry(new PitchGeometry(this)) {}

void ZoneSeries::setMetricId(const QString& id) { select(id, m_band, m_lane, m_matchId); }
void ZoneSeries::setBand(int band) { select(m_metricId, band, m_lane, m_matchId); }
void ZoneSeries::setLane(int lane) { select(m_metricId, m_band, lane, m_matchId); }
void ZoneSeries::setMatchId(const QString& id) { select(m_metricId, m_band, m_lane, id); }

void ZoneSeries::select(const QString& metricId, int band, int lane, const QString& matchId) {
    if (metricId == m_metricId && band == m_band && lane == m_lane && matchId == m_matchId) return;
    m_metricId = metricId;
    m_band = band;
    m_lane = lane;
    m_matchId = matchId;
    emit selectionChanged();
    update();
}

void ZoneSeries::setCountScale(const QString& scale) {
    if (scale == m_countScale || !countScaleFromString(scale.toStdString())) return;
    m_countScale = scale;
    emit selectionChanged();
    update();
}

void ZoneSeries::clear() {
    m_metricRow = -1;
    m_hasSeries = false;
    m_zoneText.clear();
    m_metricName.clear();
    m_metricQuestion.clear();
    m_betterText.clear();
    m_seasonText.clear();
    m_windowText.clear();
    m_ewmaText.clear();
    m_levelText.clear();
    m_ruleText.clear();
    m_focalRow = -1;
    m_summaryTitle.clear();
    m_summaryValue.clear();
    m_summaryDetail.clear();
    m_summaryTarget.clear();
    m_summaryState = ZoneState::NoTarget;
    m_summaryStateText.clear();
    m_summaryCertainty.clear();
    m_summaryMatchText.clear();
    m_summaryPooledText.clear();
    m_summaryEwmaText.clear();
    m_summaryCoachText.clear();
    m_focusSpans.clear();
    m_focusLines.clear();
    m_series->reset({}, {}, {});
    m_map->clear();
}

void ZoneSeries::refresh() {
    clear();
    ClubSession* s = session();
    if (!s || !s->isOpen() || s->matchSummaries().empty() || s->metricSpecs().empty()) {
        emit changed();
        return;
    }
    const MatchSummary* match = s->summary(m_matchId.toStdString());
    if (!match) match = s->latestPlayed();
    const auto season = s->seasonOf(match->id);
    const auto focal = season ? season->indexOf(match->id) : std::nullopt;
    if (!focal) {
        emit changed();
        return;
    }
    const MetricSpec* metric = s->metricSpec(m_metricId.toStdString());
    if (!metric) {
        // Open on the latest open focus of the season, where the staff's attention is.
        const auto focuses = FocusStore(*s->repository()).list();
        for (auto it = focuses.rbegin(); it != focuses.rend() && !metric; ++it) {
            if (!it->closedAt.empty() || it->squad != season->squad() || it->season != season->season() ||
                it->zones.empty())
                continue;
            const auto zones = it->grid == s->grid() ? it->zones : mapZones(it->zones, it->grid, s->grid());
            if (zones.empty()) continue;
            metric = s->metricSpec(it->metric);
            const bool whole = static_cast<int>(it->zones.size()) == it->grid.zoneCount();
            m_band = whole ? 0 : zones.front().band;
            m_lane = whole ? 0 : zones.front().lane;
        }
    }
    if (!metric) {
        // Else on the most certain flag of the match, if any.
        const Debrief& debriefed = season->debriefAt(*focal);
        for (const auto* list : {&debriefed.slippedInWindow, &debriefed.slippedInMatch, &debriefed.watched}) {
            if (list->empty()) continue;
            metric = s->metricSpec(list->front().now.metric);
            m_band = list->front().now.band;
            m_lane = list->front().now.lane;
            break;
        }
    }
    if (!metric) {
        metric = &s->metricSpecs().front();
        m_band = m_lane = 0;
    }
    const ZoneGrid& grid = s->grid();
    const bool zoneKnown = (m_band == 0 && m_lane == 0) ||
                           (m_band >= 1 && m_band <= grid.bands() && m_lane >= 1 && m_lane <= grid.lanes());
    const QString matchId = QString::fromStdString(match->id);
    const QString metricId = QString::fromStdString(metric->id);
    if (matchId != m_matchId || metricId != m_metricId || !zoneKnown) {
        m_matchId = matchId;
        m_metricId = metricId;
        if (!zoneKnown) m_band = m_lane = 0;
        emit selectionChanged();
    }
    m_geometry->setZoneGrid(grid);
    m_geometry->setPitch(match->pitch);

    const MetricKind kind = metric->kind();
    const AppWindows& w = season->windows();
    m_metricRow = s->metrics()->indexOf(m_metricId);
    m_zoneText = desktop::zoneText(m_band, m_lane, grid);
    m_metricName = QString::fromStdString(metric->name.empty() ? metric->id : metric->name);
    m_metricQuestion = QString::fromStdString(metric->question);
    m_betterText = desktop::betterText(metric->better);
    m_seasonText = QStringLiteral("%1 · %2").arg(QString::fromStdString(season->squad()),
                                                  QString::fromStdString(season->season()));
    m_windowText = desktop::windowText(w.judged);
    m_ewmaText = desktop::windowText(w.ewma);
    m_levelText = desktop::levelText(s->flagSettings().level);
    m_ruleText = tr("Off target when the chance that the true value misses its target is at least "
                    "%1 over %2; close to the line when the chance it misses the target's watch line is at "
                    "least %3.")
                     .arg(QLocale().toString(s->flagSettings().offThreshold, 'g', 4),
                          windowPhrase(w.judged),
                          QLocale().toString(s->flagSettings().watchThreshold, 'g', 4));
    m_focalRow = static_cast<int>(*focal);

    // The series: one point per match of the season.
    std::vector<SeriesPoint> points;
    std::vector<std::string> rowDates; ///< the date of each point
    std::vector<double> axisValues;
    const auto& tallies = season->tallies();
    for (std::size_t t = 0; t < season->size(); ++t) {
        const ZoneStatus* a = season->find(t, metric->id, m_band, m_lane, w.match);
        const ZoneStatus* b = season->find(t, metric->id, m_band, m_lane, w.judged);
        const ZoneStatus* e = season->find(t, metric->id, m_band, m_lane, w.ewma);
        if (!a || !b || !e) continue;
        SeriesPoint p;
        p.matchId = QString::fromStdString(tallies.matchIds[t]);
        if (const MatchSummary* m = s->summary(tallies.matchIds[t]))
            p.opponent = QString::fromStdString(m->opponent);
        p.dateText = dateText(tallies.dates[t]);
        p.shortDateText = shortDateText(tallies.dates[t]);
        p.value = a->value;
        p.valueText = valueText(kind, a->value);
        p.sampleText = sampleText(kind, a->sum, a->window);
        const bool hasWindow = !std::isnan(b->value);
        p.windowValue = b->value;
        p.low = hasWindow ? b->interval.low : kNaN;
        p.high = hasWindow && std::isfinite(b->interval.high) ? b->interval.high : kNaN;
        p.windowText = hasWindow ? QStringLiteral("%1 (%2) · %3")
                                       .arg(valueText(kind, b->value), intervalText(kind, b->interval),
                                            sampleText(kind, b->sum, b->window))
                                 : QStringLiteral("–");
        p.ewma = e->value;
        p.ewmaText = valueText(kind, e->value);
        p.target = b->target ? b->target->value : kNaN;
        p.targetText = targetText(kind, b->target);
        p.state = ZoneState::from(b->state);
        p.stateText = stateText(b->state);
        p.certaintyText = certaintyText(b->pMiss);
        for (double v : {p.value, p.low, p.high, p.ewma, p.target}) axisValues.push_back(v);
        points.push_back(std::move(p));
        rowDates.push_back(tallies.dates[t]);
    }
    showFocuses(*metric, season->squad(), season->season(), rowDates);
    m_hasSeries = !points.empty();
    const ScaleDomain axis = scaleDomain(kind, axisValues);
    m_series->reset(std::move(points), axis, scaleLabels(kind, axis));

    // The summary: the judged window ending at the chosen match.
    if (const ZoneStatus* b = season->find(*focal, metric->id, m_band, m_lane, w.judged)) {
        m_summaryTitle = tr("%1 up to %2 (%3)")
                             .arg(m_windowText, m_matchId, compactDateText(match->date));
        m_summaryValue = valueText(kind, b->value);
        m_summaryDetail = std::isnan(b->value)
                              ? tr("no items in this zone")
                              : QStringLiteral("%1 %2 · %3")
                                    .arg(m_levelText, intervalText(kind, b->interval),
                                         sampleText(kind, b->sum, b->window));
        m_summaryTarget = b->target ? tr("Target %1").arg(targetText(kind, b->target))
                                    : tr("No target set for this zone");
        m_summaryState = ZoneState::from(b->state);
        m_summaryStateText = stateText(b->state);
        m_summaryCertainty = certaintyText(b->pMiss);
        m_summaryCoachText = QString::fromStdString(words::coachSentence(*metric, *b, grid));
    }
    if (const ZoneStatus* a = season->find(*focal, metric->id, m_band, m_lane, w.match))
        m_summaryMatchText = tr("This match alone: %1 · %2")
                                 .arg(valueText(kind, a->value), sampleText(kind, a->sum, a->window));
    if (const ZoneStatus* e = season->find(*focal, metric->id, m_band, m_lane, w.ewma))
        m_summaryEwmaText = tr("%1: %2").arg(m_ewmaText, valueText(kind, e->value));

    // The zone picker: every zone over the judged window ending at the chosen match.
    std::vector<const ZoneStatus*> zones;
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const Zone z = grid.zoneAt(i);
        if (const ZoneStatus* st = season->find(*focal, metric->id, z.band, z.lane, w.judged)) {
            zones.push_back(st);
        }
    }
    // What a count's picker map is read per (model/countscale.h), as on the debrief.
    m_scalable = kind == MetricKind::Count;
    const CountScale scale = countScaleFromString(m_countScale.toStdString()).value_or(CountScale::PerMatch);
    MapScale mapScale;
    if (m_scalable) mapScale = m_scaler.scaleFor(scale, *s->repository(), *season, *focal, metric->id, w.judged);
    m_scaleText = QString::fromStdString(scaleWords(m_scalable ? scale : CountScale::PerMatch));
    const MetricKind shown = mapScale.appliesTo(kind) ? scaledKind(scale) : kind;
    const ScaleDomain domain = scaleDomain(shown, pooledValues(zones, kind, grid, mapScale));
    ZoneMapModel::Header header{m_windowText, m_matchId, {}, ZoneState::NoTarget,
                                scaleLabels(shown, domain), m_levelText};
    if (const ZoneStatus* whole = season->find(*focal, metric->id, 0, 0, w.judged)) {
        header.wholePitchText = wholePitchLine(*whole, kind);
        header.wholePitchState = ZoneState::from(whole->state);
    }
    m_map->reset(std::move(header), zoneCells(zones, kind, domain, grid, mapScale));
    if (m_band > 0) {
        const QVariantMap cell = m_map->zone(m_band, m_lane);
        if (cell.value(QStringLiteral("hasValue")).toBool())
            m_summaryPooledText = tr("On the map, pulled toward its neighbours: %1%2")
                                      .arg(cell.value(QStringLiteral("valueText")).toString(),
                                           mapScale.appliesTo(kind) ? QLatin1Char(' ') + m_scaleText : QString());
    }
    emit changed();
}

void ZoneSeries::showFocuses(const MetricSpec& metric, const std::string& squad,
                             const std::string& seasonName, const std::vector<std::string>& rowDates) {
    ClubRepository* repo = session()->repository();
    const ZoneGrid& grid = session()->grid();
    int shown = 0;
    for (const Focus& f : FocusStore(*repo).list()) {
        if (f.squad != squad || f.season != seasonName || f.metric != metric.id) continue;
        // A focus from an earlier grid is read on the club's grid, as the planner reads it.
        const std::vector<Zone> zones = f.grid == grid ? f.zones : mapZones(f.zones, f.grid, grid);
        const bool whole = static_cast<int>(f.zones.size()) == f.grid.zoneCount() && f.grid.zoneCount() > 1;
        const bool here = (m_band == 0 && m_lane == 0)
                              ? whole
                              : !whole && std::find(zones.begin(), zones.end(), Zone{m_band, m_lane}) != zones.end();
        if (!here) continue;
        const std::string closedOn = f.closedAt.substr(0, 10);
        int startRow = -1, endRow = -1;
        for (std::size_t r = 0; r < rowDates.size(); ++r) {
            if (startRow < 0 && rowDates[r] >= f.startDate) startRow = static_cast<int>(r);
            if (!closedOn.empty() && rowDates[r] <= closedOn) endRow = static_cast<int>(r);
        }
        const QString label = QStringLiteral("F%1").arg(++shown);
        if (startRow >= 0)
            m_focusSpans.append(QVariantMap{{QStringLiteral("label"), label},
                                            {QStringLiteral("startRow"), startRow},
                                            {QStringLiteral("endRow"), closedOn.empty() ? -1 : endRow},
                                            {QStringLiteral("closed"), !closedOn.empty()}});
        const QString state = closedOn.empty()
                                  ? tr("open")
                                  : tr("closed %1: %2").arg(compactDateText(closedOn), verdictWord(f.verdict));
        m_focusLines << tr("%1 · focus #%2 after %3 by %4, trained from %5 · %6")
                            .arg(label)
                            .arg(f.id)
                            .arg(QString::fromStdString(f.openedAfterMatch), QString::fromStdString(f.openedBy),
                                 compactDateText(f.startDate), state);
    }
}

} // namespace pitchloop::desktop
