#include "comparisonview.h"

#include "clubsession.h"
#include "comparison.h"
#include "display.h"
#include "palette.h"
#include "seasondata.h"
#include "wording.h"
#include "zonemapmodel.h"
#include "zonenames.h"
#include "zonestate.h"

#include <algorithm>
#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString differenceText(MetricKind kind, double d) {
    return kind == MetricKind::Rate ? QStringLiteral("%1%2 pts").arg(d >= 0 ? QStringLiteral("+") : QString()).arg(100 * d, 0, 'f', 1)
                                    : QStringLiteral("%1%2").arg(d >= 0 ? QStringLiteral("+") : QString()).arg(d, 0, 'f', 2);
}

} // namespace

ComparisonView::ComparisonView(QObject* parent) : SessionClient(parent), m_map(new ZoneMapModel(this)) {}

void ComparisonView::setMetricId(const QString& id) {
    if (id == m_metricId) return;
    m_metricId = id;
    emit inputsChanged();
    update();
}

void ComparisonView::setMatchId(const QString& id) {
    if (id == m_matchId) return;
    m_matchId = id;
    emit inputsChanged();
    update();
}

void ComparisonView::setSplit(const QString& split) {
    if (split == m_split) return;
    m_split = split;
    emit inputsChanged();
    update();
}

void ComparisonView::refresh() {
    m_summary.clear();
    m_strongest.clear();
    m_opponents.clear();
    m_lowText.clear();
    m_highText.clear();
    ClubSession* s = session();
    const MatchSummary* match = s && s->isOpen() ? s->summary(m_matchId.toStdString()) : nullptr;
    const auto season = match ? s->seasonOf(match->id) : nullptr;
    const MetricSpec* metric = s && s->isOpen() ? s->metricSpec(m_metricId.toStdString()) : nullptr;
    if (!season || !metric) {
        m_map->clear();
        emit changed();
        return;
    }
    std::vector<MatchSummary> summaries;
    for (const MatchSummary& m : s->matchSummaries())
        if (m.squad == season->squad() && m.season == season->season()) {
            summaries.push_back(m);
            const QString opponent = QString::fromStdString(m.opponent);
            if (!m_opponents.contains(opponent)) m_opponents << opponent;
        }
    m_opponents.sort();
    const auto split = parseSplit(m_split.toStdString());
    if (!split) {
        m_summary = tr("Choose how to split the season's matches.");
        m_map->clear();
        emit changed();
        return;
    }
    const FlagSettings& settings = s->flagSettings();
    const Comparison c = compareSplit(season->tallies(), summaries, *metric, s->grid(), *split, settings);
    if (!c.problem.empty()) {
        m_summary = plainMessage(c.problem);
        m_map->clear();
        emit changed();
        return;
    }
    const MetricKind kind = metric->kind();
    const QString first = QString::fromStdString(c.firstLabel), second = QString::fromStdString(c.secondLabel);
    m_summary = tr("%1: %2 (%3 matches) against %4 (%5 matches). Each zone is %2 minus %4, each side pulled "
                   "toward its neighbours; paler where less sure. A zone is likely different only when its "
                   "interval leaves out 0; the flags are unchanged by this view.")
                    .arg(QString::fromStdString(metric->name.empty() ? metric->id : metric->name), second)
                    .arg(c.secondMatches.size())
                    .arg(first)
                    .arg(c.firstMatches.size());
    m_lowText = tr("%1 lower").arg(second);
    m_highText = tr("%1 higher").arg(second);

    // The colour scale: symmetric around 0, out to the largest difference.
    double reach = 0;
    for (const auto& zone : c.zones)
        if (!std::isnan(zone.difference)) reach = std::max(reach, std::abs(zone.difference));
    if (reach <= 0) reach = 1;
    std::vector<ZoneCell> cells;
    const ZoneGrid& grid = s->grid();
    for (const ZoneDifference& diff : c.zones) {
        ZoneCell cell;
        cell.band = diff.band;
        cell.lane = diff.lane;
        cell.zoneName = zoneText(diff.band, diff.lane, grid);
        cell.hasValue = !std::isnan(diff.difference);
        if (cell.hasValue) {
            cell.value = diff.difference;
            cell.scaled = (diff.difference / reach + 1) / 2;
            cell.certaintyRow = palette::levelOf((diff.interval.high - diff.interval.low) / (2 * reach));
            const palette::Rgb colour = palette::divergingColour(
                cell.certaintyRow, palette::divergingStepOf(diff.difference / reach, cell.certaintyRow));
            cell.colour = QString::fromStdString(palette::toHex(colour));
            cell.darkText = palette::darkTextOn(colour);
            cell.valueText = differenceText(kind, diff.difference);
            cell.intervalText = tr("%1 to %2").arg(differenceText(kind, diff.interval.low), differenceText(kind, diff.interval.high));
            cell.rawText = tr("%1 %2 · %3 %4").arg(first, valueText(kind, diff.first.pooled), second, valueText(kind, diff.second.pooled));
            cell.certaintyText = tr("P(%1 higher) %2").arg(second, QString::fromStdString(words::probability(diff.probSecondHigher)));
        } else {
            cell.colour = QStringLiteral("#c9cdd3");
        }
        cell.state = ZoneState::NoTarget;
        cells.push_back(std::move(cell));
    }
    ZoneMapModel::Header header{tr("%1 against %2").arg(second, first), m_summary, {}, ZoneState::NoTarget,
                                {differenceText(kind, -reach), differenceText(kind, 0), differenceText(kind, reach)},
                                levelText(settings.level)};
    m_map->reset(std::move(header), std::move(cells));

    // The strongest evidence first: P(second higher) furthest from an even chance.
    std::vector<const ZoneDifference*> rows;
    for (const auto& zone : c.zones)
        if (!std::isnan(zone.difference)) rows.push_back(&zone);
    std::stable_sort(rows.begin(), rows.end(), [](const ZoneDifference* a, const ZoneDifference* b) {
        return std::abs(a->probSecondHigher - 0.5) > std::abs(b->probSecondHigher - 0.5);
    });
    for (std::size_t i = 0; i < rows.size() && i < 4; ++i)
        m_strongest << tr("%1: %2 (%3 to %4), P(%5 higher) %6")
                           .arg(zoneText(rows[i]->band, rows[i]->lane, grid), differenceText(kind, rows[i]->difference),
                                differenceText(kind, rows[i]->interval.low), differenceText(kind, rows[i]->interval.high),
                                second, QString::fromStdString(words::probability(rows[i]->probSecondHigher)));
    emit changed();
}

} // namespace pitchloop::desktop
