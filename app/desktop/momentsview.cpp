#include "momentsview.h"

#include "clubsession.h"
#include "display.h"
#include "exports.h"
#include "wording.h"
#include "zonenames.h"

#include <QFile>

#include <algorithm>
#include <cmath>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// "unit:left_side" or "player:7" (MomentsView::filter) into the request.
void applyFilter(MomentsRequest& request, const QString& filter) {
    if (filter.startsWith(QLatin1String("unit:"))) request.unit = unitFromString(filter.mid(5).toStdString());
    if (filter.startsWith(QLatin1String("player:"))) request.player = filter.mid(7).toStdString();
}

} // namespace

MomentListModel::MomentListModel(QObject* parent) : QAbstractListModel(parent) {}

void MomentListModel::reset(const std::vector<Moment>& moments, const Pitch& pitch, double margin) {
    beginResetModel();
    m_moments = moments;
    m_pitch = pitch;
    m_margin = margin;
    endResetModel();
    emit countChanged();
}

int MomentListModel::rowCount(const QModelIndex& parent) const {
    return parent.isValid() ? 0 : count();
}

QHash<int, QByteArray> MomentListModel::roleNames() const {
    return {{MatchIdRole, "matchId"},     {ClockTextRole, "clockText"},   {WhatRole, "what"},
            {CountsRole, "counts"},       {CountsTextRole, "countsText"}, {PlayersTextRole, "playersText"},
            {FromXRole, "fromX"},         {FromYRole, "fromY"},           {ToXRole, "toX"},
            {ToYRole, "toY"},             {HasArrowRole, "hasArrow"}};
}

QVariant MomentListModel::data(const QModelIndex& index, int role) const {
    if (!index.isValid() || index.row() >= count()) return {};
    const Moment& m = m_moments[static_cast<std::size_t>(index.row())];
    // Our frame (x from our goal line, y from our right touchline) in PitchGeometry's drawing
    // metres: x from the left edge, y from the top edge beyond our left touchline.
    auto drawX = [&](double x) { return m_margin + x; };
    auto drawY = [&](double y) { return m_margin + m_pitch.widthM - y; };
    switch (role) {
    case MatchIdRole: return QString::fromStdString(m.matchId);
    case ClockTextRole:
        return QStringLiteral("%1 %2 (%3)")
            .arg(m.period == 1 ? tr("1st") : m.period == 2 ? tr("2nd") : tr("p%1").arg(m.period),
                 QString::fromStdString(periodClock(m.t)), QString::fromStdString(matchClock(m.period, m.t)));
    case WhatRole: return QString::fromStdString(m.what);
    case CountsRole: return static_cast<int>(m.count);
    case CountsTextRole:
        switch (m.count) {
        case MomentCount::Success: return tr("yes");
        case MomentCount::NoSuccess: return tr("no");
        case MomentCount::Censored: return tr("not counted");
        case MomentCount::Exposure: return tr("per");
        }
        return {};
    case PlayersTextRole: {
        QStringList ours, theirs;
        for (const auto& p : m.ourNames) ours << QString::fromStdString(p);
        for (const auto& p : m.players)
            if (std::find(m.ours.begin(), m.ours.end(), p) == m.ours.end()) theirs << QString::fromStdString(p);
        QStringList parts;
        if (!ours.isEmpty()) parts << tr("Ours: %1").arg(ours.join(QStringLiteral(", ")));
        if (!theirs.isEmpty()) parts << tr("theirs: %1").arg(theirs.join(QStringLiteral(", ")));
        return parts.join(QStringLiteral(" · "));
    }
    case FromXRole: return drawX(m.from.x);
    case FromYRole: return drawY(m.from.y);
    case ToXRole: return drawX(m.to ? m.to->x : m.from.x);
    case ToYRole: return drawY(m.to ? m.to->y : m.from.y);
    case HasArrowRole: return m.to.has_value() && !(*m.to == m.from);
    default: return {};
    }
}

MomentsView::MomentsView(QObject* parent) : SessionClient(parent), m_list(new MomentListModel(this)) {}

void MomentsView::setMetricId(const QString& id) {
    if (id == m_metricId) return;
    m_metricId = id;
    emit inputsChanged();
    update();
}

void MomentsView::setBand(int band) {
    if (band == m_band) return;
    m_band = band;
    emit inputsChanged();
    update();
}

void MomentsView::setLane(int lane) {
    if (lane == m_lane) return;
    m_lane = lane;
    emit inputsChanged();
    update();
}

void MomentsView::setMatchId(const QString& id) {
    if (id == m_matchId) return;
    m_matchId = id;
    emit inputsChanged();
    update();
}

void MomentsView::setFilter(const QString& filter) {
    if (filter == m_filter) return;
    m_filter = filter;
    emit inputsChanged();
    update();
}

void MomentsView::setJudgedWindow(bool judged) {
    if (judged == m_judgedWindow) return;
    m_judgedWindow = judged;
    emit inputsChanged();
    update();
}

QString MomentsView::matchWindowText() const {
    return QString::fromStdString(words::windowTitle(Window{Window::Kind::Match, 1, 0.3}));
}

QString MomentsView::judgedWindowText() const {
    ClubSession* s = session();
    const Window w = s && s->isOpen() ? s->flagSettings().window : FlagSettings{}.window;
    return QString::fromStdString(words::windowTitle(w.kind == Window::Kind::Ewma ? Window{} : w));
}

void MomentsView::refresh() {
    m_summary.clear();
    ClubSession* s = session();
    if (!s || !s->isOpen() || m_metricId.isEmpty() || m_matchId.isEmpty()) {
        m_list->reset({}, {}, 2.5);
        emit changed();
        return;
    }
    MomentsRequest request;
    request.matchId = m_matchId.toStdString();
    request.metricId = m_metricId.toStdString();
    if (m_band > 0 && m_lane > 0) request.zone = Zone{m_band, m_lane};
    // The match's video clock as last saved: where its 2nd half starts (mm:ss).
    if (m_clockFor != m_matchId) {
        m_clockFor = m_matchId;
        const auto starts = s->repository()->videoPeriodStarts(request.matchId);
        const auto second = starts.find(2);
        m_secondHalfStart = second == starts.end()
                                ? QString()
                                : QStringLiteral("%1:%2").arg(static_cast<int>(second->second) / 60)
                                      .arg(static_cast<int>(second->second) % 60, 2, 10, QLatin1Char('0'));
        emit clipSettingsChanged();
    }
    // Whose moments: the choices come from the match's squad list.
    m_filterChoices = {QVariantMap{{QStringLiteral("text"), tr("Everyone")}, {QStringLiteral("value"), QString()}}};
    if (const auto where = s->repository()->seasonOfMatch(request.matchId)) {
        const auto players = s->repository()->squadList(where->first);
        if (!players.empty())
            for (const Unit u : allUnits())
                m_filterChoices.append(QVariantMap{
                    {QStringLiteral("text"), QString::fromStdString(words::capitalised(unitWords(u)))},
                    {QStringLiteral("value"), QStringLiteral("unit:%1").arg(QString::fromStdString(std::string(toString(u))))}});
        for (const Player& p : players)
            m_filterChoices.append(QVariantMap{
                {QStringLiteral("text"), QString::fromStdString(p.number + " " + p.name + " (" + p.position + ")")},
                {QStringLiteral("value"), QStringLiteral("player:%1").arg(QString::fromStdString(p.number))}});
    }
    applyFilter(request, m_filter);
    const Window judged = s->flagSettings().window;
    // An EWMA judges every match a little; its list would be the season's, so take the last 5.
    request.window = !m_judgedWindow ? Window{Window::Kind::Match, 1, 0.3}
                     : judged.kind == Window::Kind::Ewma ? Window{}
                                                         : judged;
    const MomentsResult result = storedMoments(*s->repository(), request);
    if (!result.problem.empty()) {
        m_list->reset({}, {}, 2.5);
        m_summary = plainMessage(result.problem);
        emit changed();
        return;
    }
    const MetricSpec* metric = s->metricSpec(request.metricId);
    const Pitch pitch = result.matches.empty() ? Pitch{} : result.matches.back().pitch;
    m_list->reset(result.moments, pitch, 2.5);
    const QString where = QString::fromStdString(words::windowName(request.window));
    const double value = result.den > 0 ? static_cast<double>(result.num) / static_cast<double>(result.den) : NAN;
    const QString valueText = desktop::valueText(metric->kind(), value);
    const long n = result.allMoments;
    const QString momentsText = n == 1 ? tr("1 moment") : tr("%1 moments").arg(n);
    const QString whose = request.unit ? QString::fromStdString(unitWords(*request.unit))
                          : request.player ? tr("player %1").arg(QString::fromStdString(*request.player))
                                           : QString();
    switch (metric->kind()) {
    case MetricKind::Rate: {
        const long censored = std::count_if(result.moments.begin(), result.moments.end(),
                                            [](const Moment& m) { return m.count == MomentCount::Censored; });
        m_summary = tr("%1 in %2: %3 of %4 counted as yes, %5.")
                        .arg(momentsText, where)
                        .arg(result.num)
                        .arg(result.den)
                        .arg(valueText);
        if (censored > 0)
            m_summary += tr(" %1 left out: the half ended before the seconds the metric waits for.").arg(censored);
        break;
    }
    case MetricKind::Count:
        m_summary = tr("%1 in %2: %3 a match.").arg(momentsText, where, valueText);
        break;
    case MetricKind::Exposure:
        m_summary = tr("%1 counted against %2 they are per, in %3: %4.")
                        .arg(result.num).arg(result.den).arg(where, valueText);
        break;
    }
    if (!whose.isEmpty())
        m_summary += tr(" Shown: the %1 that involve %2.").arg(result.moments.size()).arg(whose);
    emit changed();
}

void MomentsView::exported(const QString& message, bool failed) {
    m_exportMessage = message;
    m_exportFailed = failed;
    emit exportDone();
}

QString MomentsView::suggestedFileName(const QString& format) const {
    const QString zone = m_band > 0 ? QStringLiteral("B%1L%2").arg(m_band).arg(m_lane) : QStringLiteral("pitch");
    return QStringLiteral("clips-%1-%2-%3.%4").arg(m_matchId, m_metricId, zone,
                                                  format == QLatin1String("csv") ? QStringLiteral("csv")
                                                                                 : QStringLiteral("vtt"));
}

bool MomentsView::saveClips(const QUrl& file, const QString& format) {
    ClubSession* s = session();
    if (!s || !s->isOpen() || m_matchId.isEmpty()) {
        exported(tr("Open a club file with a match first."), true);
        return false;
    }
    if (m_judgedWindow) {
        exported(tr("A clip list is one match's video: choose %1 first.").arg(matchWindowText().toLower()), true);
        return false;
    }
    if (!std::isfinite(m_leadIn) || !std::isfinite(m_leadOut) || m_leadIn < 0 || m_leadOut < 0 ||
        m_leadIn > 600 || m_leadOut > 600) {
        exported(tr("Seconds before and after: 0 to 600 each."), true);
        return false;
    }
    VideoClock clock;
    clock.leadInS = m_leadIn;
    clock.leadOutS = m_leadOut;
    if (!m_secondHalfStart.trimmed().isEmpty()) {
        const auto at = parseClock(m_secondHalfStart.trimmed().toStdString());
        if (!at) {
            exported(tr("2nd half starts at “%1”: write the time in the video as mm:ss or hh:mm:ss, e.g. 47:30.")
                         .arg(m_secondHalfStart),
                     true);
            return false;
        }
        clock.periodStartS[2] = *at;
    }
    const QString path = localPath(file);
    if (path.isEmpty()) {
        exported(tr("Choose a file to write the clip list to."), true);
        return false;
    }
    try {
        MomentsRequest request;
        request.matchId = m_matchId.toStdString();
        request.metricId = m_metricId.toStdString();
        if (m_band > 0 && m_lane > 0) request.zone = Zone{m_band, m_lane};
        // The clips of the moments shown: the same player or unit.
        applyFilter(request, m_filter);
        const MomentsResult result = storedMoments(*s->repository(), request);
        const auto match = s->repository()->loadMatch(request.matchId);
        if (!result.problem.empty() || !match) {
            exported(plainMessage(result.problem), true);
            return false;
        }
        const auto clips = clipsOf(match->info, result.moments, clock);
        const MetricSpec* metric = s->metricSpec(request.metricId);
        const std::string title = (metric->name.empty() ? metric->id : metric->name) + " · " +
                                  zoneLabel(m_band, m_lane, s->grid());
        const std::string bytes = format == QLatin1String("csv") ? clipsCsv(match->info, result.moments, clips)
                                                                 : clipsWebVtt(match->info, result.moments, clips, title);
        writeFileAtomically(QFile::encodeName(path).toStdString(), bytes);
        s->repository()->saveVideoPeriodStarts(request.matchId, clock.periodStartS); // remembered for the match
        const QString clipsText = clips.size() == 1 ? tr("1 clip") : tr("%1 clips").arg(clips.size());
        exported(tr("Wrote %1 to %2.").arg(clipsText, path), false);
        return true;
    } catch (const std::exception& e) {
        exported(QString::fromStdString(e.what()), true);
        return false;
    }
}

} // namespace pitchloop::desktop
