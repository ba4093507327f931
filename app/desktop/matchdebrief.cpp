#include "matchdebrief.h"

#include "clubsession.h"
#include "debrieflistmodel.h"
#include "display.h"
#include "matchlistmodel.h"
#include "metriclistmodel.h"
#include "pitchgeometry.h"
#include "zonemapmodel.h"
#include "exports.h"
#include "printing.h"
#include "zonestate.h"

#include <QFile>
#include <QLocale>
#include <QUrl>

#include <algorithm>
#include <sstream>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// The metric to show first: that of the most certain slip over the window, then in the
/// match, then on watch; else the first metric.
std::string defaultMetric(const Debrief& d, const std::vector<MetricSpec>& metrics) {
    for (const auto* list : {&d.slippedInWindow, &d.slippedInMatch, &d.watched})
        if (!list->empty()) return list->front().now.metric;
    return metrics.empty() ? std::string() : metrics.front().id;
}

} // namespace

MatchDebrief::MatchDebrief(QObject* parent)
    : SessionClient(parent),
      m_matchMap(new ZoneMapModel(this)),
      m_windowMap(new ZoneMapModel(this)),
      m_items(new DebriefListModel(this)),
      m_geometry(new PitchGeometry(this)) {}

void MatchDebrief::setMatchId(const QString& id) {
    if (id == m_matchId) return;
    m_matchId = id;
    emit matchIdChanged();
    update();
}

void MatchDebrief::setMetricId(const QString& id) {
    if (id == m_metricId) return;
    m_metricId = id;
    emit metricIdChanged();
    update();
}

void MatchDebrief::setCountScale(const QString& scale) {
    if (scale == m_countScale || !countScaleFromString(scale.toStdString())) return;
    m_countScale = scale;
    emit countScaleChanged();
    update();
}

void MatchDebrief::selectZone(int band, int lane) {
    if (band == m_selectedBand && lane == m_selectedLane) return;
    m_selectedBand = band;
    m_selectedLane = lane;
    emit selectionChanged();
}

void MatchDebrief::clear() {
    m_matchRow = m_metricRow = -1;
    m_hasTargets = false;
    m_matchTitle.clear();
    m_metricName.clear();
    m_metricQuestion.clear();
    m_betterText.clear();
    m_windowText.clear();
    m_judgedText.clear();
    m_plainJudgedText.clear();
}

void MatchDebrief::clearModels() {
    m_matchMap->clear();
    m_windowMap->clear();
    m_items->reset({});
    m_itemsSeason.reset();
}

void MatchDebrief::refresh() {
    // The models are kept until the new numbers are in, so a metric switch updates them in
    // place instead of rebuilding every delegate (docs/performance.md, "Desktop app").
    clear();
    ClubSession* s = session();
    if (!s || !s->isOpen() || s->matchSummaries().empty()) {
        clearModels();
        emit changed();
        return;
    }
    const MatchSummary* match = s->summary(m_matchId.toStdString());
    if (!match) match = s->latestPlayed();
    const auto season = s->seasonOf(match->id);
    const auto focal = season ? season->indexOf(match->id) : std::nullopt;
    if (!focal) {
        clearModels();
        emit changed();
        return;
    }
    if (const QString id = QString::fromStdString(match->id); id != m_matchId) {
        m_matchId = id;
        emit matchIdChanged();
    }
    m_geometry->setZoneGrid(s->grid());
    m_geometry->setPitch(match->pitch);

    m_hasTargets = !season->targets().empty();
    const Debrief& debriefed = season->debriefAt(*focal);
    const MetricSpec* metric = s->metricSpec(m_metricId.toStdString());
    if (!metric) metric = s->metricSpec(defaultMetric(debriefed, s->metricSpecs()));
    if (!metric) {
        clearModels();
        emit changed();
        return;
    }
    if (const QString id = QString::fromStdString(metric->id); id != m_metricId) {
        m_metricId = id;
        emit metricIdChanged();
    }
    if (const QString key = m_matchId + QLatin1Char('/') + m_metricId; key != m_selectionFor) {
        m_selectionFor = key;
        int band = 0, lane = 0;
        for (const auto* list : {&debriefed.slippedInWindow, &debriefed.slippedInMatch, &debriefed.watched}) {
            const auto it = std::find_if(list->begin(), list->end(), [&](const DebriefItem& item) {
                return item.now.metric == metric->id && item.now.band > 0;
            });
            if (it == list->end()) continue;
            band = it->now.band;
            lane = it->now.lane;
            break;
        }
        selectZone(band, lane);
    }
    m_matchRow = s->matches()->indexOf(m_matchId);
    m_metricRow = s->metrics()->indexOf(m_metricId);

    const MetricKind kind = metric->kind();
    const AppWindows& windows = season->windows();
    m_matchTitle = QStringLiteral("%1 · %2 · %3 (%4)")
                       .arg(m_matchId, dateText(match->date), QString::fromStdString(match->opponent),
                            venueText(match->venue).toLower());
    if (const QString score = scoreText(*match); !score.isEmpty())
        m_matchTitle += QStringLiteral(" · %1 %2").arg(score, outcomeWord(*match).toLower());
    m_metricName = QString::fromStdString(metric->name.empty() ? metric->id : metric->name);
    m_metricQuestion = QString::fromStdString(metric->question);
    m_betterText = desktop::betterText(metric->better);
    m_windowText = desktop::windowText(windows.judged);

    // One metric's zones in the match and over the judged window, on one shared colour scale.
    const ZoneGrid& grid = s->grid();
    std::vector<const ZoneStatus*> inMatch, inWindow;
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const Zone z = grid.zoneAt(i);
        const ZoneStatus* a = season->find(*focal, metric->id, z.band, z.lane, windows.match);
        const ZoneStatus* b = season->find(*focal, metric->id, z.band, z.lane, windows.judged);
        if (!a || !b) continue;
        inMatch.push_back(a);
        inWindow.push_back(b);
    }
    // What a count map is read per: the windows' exposures come from the season's matches.
    m_scalable = kind == MetricKind::Count;
    const CountScale scale = countScaleFromString(m_countScale.toStdString()).value_or(CountScale::PerMatch);
    MapScale matchScale, windowScale;
    if (m_scalable) {
        matchScale = m_scaler.scaleFor(scale, *s->repository(), *season, *focal, metric->id, windows.match);
        windowScale = m_scaler.scaleFor(scale, *s->repository(), *season, *focal, metric->id, windows.judged);
    }
    m_scaleText = QString::fromStdString(scaleWords(m_scalable ? scale : CountScale::PerMatch));
    // The scale spans the values the maps colour: each zone pooled toward its neighbours.
    std::vector<double> values = pooledValues(inMatch, kind, grid, matchScale);
    for (const double v : pooledValues(inWindow, kind, grid, windowScale)) values.push_back(v);
    const MetricKind shown = matchScale.appliesTo(kind) ? scaledKind(scale) : kind;
    const ScaleDomain domain = scaleDomain(shown, values);
    const QStringList labels = scaleLabels(shown, domain);
    const QString level = levelText(s->flagSettings().level);
    const auto header = [&](const QString& title, const QString& subtitle, const Window& w) {
        ZoneMapModel::Header h{title, subtitle, {}, ZoneState::NoTarget, labels, level};
        if (const ZoneStatus* whole = season->find(*focal, metric->id, 0, 0, w)) {
            h.wholePitchText = wholePitchLine(*whole, kind);
            h.wholePitchState = ZoneState::from(whole->state);
        }
        return h;
    };
    const std::size_t first = season->judgedWindowStart(*focal);
    m_matchMap->reset(header(tr("This match"),
                             QStringLiteral("%1 v %2").arg(m_matchId, QString::fromStdString(match->opponent)),
                             windows.match),
                      zoneCells(inMatch, kind, domain, grid, matchScale));
    m_windowMap->reset(header(tr("%1 — judged").arg(m_windowText),
                              QStringLiteral("%1 … %2").arg(QString::fromStdString(season->tallies().matchIds[first]),
                                                            m_matchId),
                              windows.judged),
                       zoneCells(inWindow, kind, domain, grid, windowScale));

    if (m_hasTargets) {
        const QString phrase = windowPhrase(windows.judged);
        if (season != m_itemsSeason || *focal != m_itemsFocal) {
            m_itemsSeason = season;
            m_itemsFocal = *focal;
            auto rows = debriefRows(tr("Off target over %1").arg(phrase), debriefed.slippedInWindow,
                                    s->metricsById(), grid, debriefed.previousMatchId, true);
            auto inMatchOnly = debriefRows(tr("Off target in this match alone"), debriefed.slippedInMatch,
                                           s->metricsById(), grid, debriefed.previousMatchId, false);
            auto watch = debriefRows(tr("Likely off or close to the line over %1").arg(phrase), debriefed.watched, s->metricsById(),
                                     grid, debriefed.previousMatchId, false);
            auto unusual = debriefRows(tr("Unusual in this match alone"),
                                       debriefed.unusualInMatch, s->metricsById(), grid,
                                       debriefed.previousMatchId, false);
            rows.insert(rows.end(), inMatchOnly.begin(), inMatchOnly.end());
            rows.insert(rows.end(), unusual.begin(), unusual.end());
            rows.insert(rows.end(), watch.begin(), watch.end());
            m_items->reset(std::move(rows));
        }
        m_judgedText = tr("%1 zones with targets judged over %2, %3 with too little data. A zone is "
                          "called off target only when it is almost certainly past its target (chance "
                          "%4 or more), so that about %5 false flag a season is expected across "
                          "the board; the ranges shown are %6 ranges. If every true value sat "
                          "exactly on its target, chance alone would flag at most about %7 of "
                          "these zones at some point this season. Flags are evidence for the "
                          "staff to weigh, not verdicts.")
                           .arg(debriefed.judged)
                           .arg(phrase)
                           .arg(debriefed.tooLittleData)
                           .arg(QLocale().toString(100 * debriefed.offThreshold, 'f', 2) + QStringLiteral(" %"))
                           .arg(QLocale().toString(s->flagSettings().falseFlagsPerSeason, 'g', 3))
                           .arg(QLocale().toString(100 * s->flagSettings().level, 'f', 0) + QStringLiteral(" %"))
                           .arg(QLocale().toString(debriefed.seasonChanceFlags, 'f', 1));
        const double falseFlags = s->flagSettings().falseFlagsPerSeason;
        m_plainJudgedText =
            tr("%1 zones with targets were judged over %2; %3 have too few moments yet to judge.")
                .arg(debriefed.judged)
                .arg(phrase)
                .arg(debriefed.tooLittleData) +
            QLatin1Char(' ') +
            (falseFlags > 0
                 ? tr("A zone is called off target only when bad luck is very unlikely to explain it, "
                      "so that across all the targets about %1 false alarm a season is expected.")
                       .arg(QLocale().toString(falseFlags, 'g', 3))
                 : tr("A zone is called off target only when bad luck is very unlikely to explain it.")) +
            QLatin1Char(' ') + tr("These are evidence for the staff to weigh, not verdicts. Hover a line for its numbers.");
        if (!debriefed.unusualInMatch.empty())
            m_plainJudgedText += QLatin1Char(' ') +
                                 tr("A single match cannot judge a target a match; an “unusual match” is one a team on "
                                    "its target has at most once in a hundred.");
        if (!debriefed.unusualInMatch.empty())
            m_judgedText += QLatin1Char(' ') +
                            tr("One match cannot judge a per-match count target; “unusual match” "
                               "marks one that a team on its target has at most once in a hundred.");
    } else {
        m_items->reset({});
        m_itemsSeason.reset();
    }
    emit changed();
}

void MatchDebrief::exported(const QString& message, bool failed) {
    m_exportMessage = message;
    m_exportFailed = failed;
    emit exportDone();
}

QString MatchDebrief::suggestedFileName(const QString& kind) const {
    if (kind == QLatin1String("pdf")) return QStringLiteral("debrief-%1.pdf").arg(m_matchId);
    return QStringLiteral("%1-%2.csv").arg(kind, m_matchId);
}

bool MatchDebrief::writeExport(const QUrl& file, const std::string& bytes, const QString& what) {
    const QString path = localPath(file);
    if (path.isEmpty()) {
        exported(tr("Choose a file to write %1 to.").arg(what), true);
        return false;
    }
    try {
        writeFileAtomically(QFile::encodeName(path).toStdString(), bytes);
    } catch (const std::exception& e) {
        exported(QString::fromStdString(e.what()), true);
        return false;
    }
    exported(tr("Wrote %1 to %2.").arg(what, path), false);
    return true;
}

bool MatchDebrief::exportPdf(const QUrl& file) {
    ClubSession* s = session();
    const QString path = localPath(file);
    if (!s || !s->isOpen() || m_matchId.isEmpty()) {
        exported(tr("Open a club file with a match first."), true);
        return false;
    }
    if (path.isEmpty()) {
        exported(tr("Choose a file to write the debrief to."), true);
        return false;
    }
    std::ostringstream err;
    int code = 1;
    try {
        code = print::exportDebrief(*s->repository(), m_matchId.toStdString(),
                                    QFile::encodeName(path).toStdString(), err);
    } catch (const std::exception& e) {
        err << e.what();
    }
    const QString message = plainMessage(err.str());
    if (code != 0) {
        exported(message.isEmpty() ? tr("The debrief was not written to %1.").arg(path) : message, true);
        return false;
    }
    exported(tr("Wrote the debrief of %1 to %2.").arg(m_matchId, path), false);
    return true;
}

bool MatchDebrief::exportStatusesCsv(const QUrl& file) {
    ClubSession* s = session();
    const MatchSummary* match = s && s->isOpen() ? s->summary(m_matchId.toStdString()) : nullptr;
    const auto season = match ? s->seasonOf(match->id) : nullptr;
    const auto focal = season ? season->indexOf(match->id) : std::nullopt;
    if (!focal) {
        exported(tr("Open a club file with a match first."), true);
        return false;
    }
    // The command line's windows and order, so the file is the same bytes.
    const auto statuses = computeStatus(season->tallies(), *focal, s->metricSpecs(), season->targets(), s->grid(),
                                        defaultStatusWindows(season->settings()), season->settings());
    return writeExport(file, statusCsv(match->id, statuses),
                       tr("%1 zone values of %2").arg(statuses.size()).arg(m_matchId));
}

bool MatchDebrief::exportTalliesCsv(const QUrl& file) {
    ClubSession* s = session();
    if (!s || !s->isOpen() || m_matchId.isEmpty()) {
        exported(tr("Open a club file with a match first."), true);
        return false;
    }
    try {
        const auto rows = s->repository()->talliesOnGrid(s->grid(), m_matchId.toStdString(), std::nullopt);
        return writeExport(file, talliesCsv(rows), tr("%1 tally rows of %2").arg(rows.size()).arg(m_matchId));
    } catch (const std::exception& e) {
        exported(QString::fromStdString(e.what()), true);
        return false;
    }
}

} // namespace pitchloop::desktop
