#include "focusview.h"
#include <QFile>
#include "exports.h"
#include "moments.h"

#include "appclock.h"
#include "clubsession.h"
#include "controlchartmodel.h"
#include "display.h"
#include "drilllistmodel.h"
#include "drills.h"
#include "evidencelistmodel.h"
#include "focus.h"
#include "focuslistmodel.h"
#include "logging.h"
#include "matchlistmodel.h"
#include "metriclistmodel.h"
#include "pitchgeometry.h"
#include "reviewreading.h"
#include "sessions.h"
#include "types.h"
#include "zonemapmodel.h"
#include "zonestate.h"

#include <QLocale>
#include <QVariantMap>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <optional>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

QString qs(const std::string& s) { return QString::fromStdString(s); }

int phaseOf(FocusState s) {
    switch (s) {
    case FocusState::Open: return FocusPhase::Open;
    case FocusState::DueForReview: return FocusPhase::DueForReview;
    case FocusState::Closed: return FocusPhase::Closed;
    }
    return FocusPhase::Open;
}

QString phaseWords(FocusState s, const std::string& verdict) {
    switch (s) {
    case FocusState::Open: return FocusView::tr("Open");
    case FocusState::DueForReview: return FocusView::tr("Due for review");
    case FocusState::Closed: return FocusView::tr("Closed · %1").arg(verdictWord(verdict));
    }
    return {};
}

/// "Whole pitch" when a focus covers every zone of the grid, else the zones.
QString focusZonesText(const std::vector<Zone>& zones, const ZoneGrid& grid) {
    if (static_cast<int>(zones.size()) == grid.zoneCount() && grid.zoneCount() > 1)
        return FocusView::tr("Whole pitch");
    return zonesText(zones, grid);
}

QString signedNumber(double v, int decimals) {
    if (std::isnan(v)) return QStringLiteral("–");
    const QString body = QLocale().toString(std::abs(v), 'f', decimals);
    return (v < 0 ? QStringLiteral("−") : QStringLiteral("+")) + body;
}

} // namespace

FocusView::FocusView(QObject* parent)
    : SessionClient(parent),
      m_focuses(new FocusListModel(this)),
      m_evidence(new EvidenceListModel(this)),
      m_linked(new DrillListModel(this)),
      m_chart(new ControlChartModel(this)),
      m_drillResults(new DrillListModel(this)),
      m_draftEvidence(new EvidenceListModel(this)),
      m_draftMap(new ZoneMapModel(this)),
      m_draftDrillModel(new DrillListModel(this)),
      m_geometry(new PitchGeometry(this)) {}

FocusView::~FocusView() = default;

ClubRepository* FocusView::repository() const {
    return session() && session()->isOpen() ? session()->repository() : nullptr;
}

QString FocusView::today() const { return m_today.isEmpty() ? qs(todayIso()) : m_today; }

void FocusView::setToday(const QString& isoDate) {
    if (isoDate == m_today) return;
    m_today = isoDate;
    update();
}

bool FocusView::hasMatches() const { return session() && !session()->matchSummaries().empty(); }

QString FocusView::metricName(const std::string& id) const {
    if (session())
        if (const MetricSpec* m = session()->metricSpec(id)) return qs(m->name.empty() ? m->id : m->name);
    return qs(id);
}

void FocusView::setStatus(const QString& text) {
    m_statusText = text;
    emit statusChanged();
}

bool FocusView::guard(const QString& what, const std::function<bool()>& action) {
    try {
        return action();
    } catch (const std::exception& e) {
        const QString message = tr("%1: %2").arg(what, QString::fromUtf8(e.what()));
        qCWarning(lcDesktop).noquote() << message;
        setStatus(message);
        return false;
    }
}

// ---- computing ------------------------------------------------------------------------------

void FocusView::refresh() {
    ClubRepository* repo = repository();
    if (repo != m_repo) {
        m_repo = repo;
        m_selectedId = 0;
        m_drafting = false;
        m_draftDrills.clear();
        m_draftProblems.clear();
        m_verdictProblem.clear();
        m_statusText.clear();
        emit draftFormChanged();
        emit verdictFormChanged();
        emit statusChanged();
    }
    refreshList();
    refreshDetail();
    refreshDraft();
    refreshDrillSearch();
}

void FocusView::refreshList() {
    ClubRepository* repo = repository();
    if (!repo) {
        m_focuses->reset({});
        m_listText = tr("No club file is open.");
        emit listChanged();
        return;
    }
    const std::vector<Focus> all = FocusStore(*repo).list();
    const SessionStore sessions(*repo);
    const std::string day = today().toStdString();
    const ZoneGrid& grid = session()->grid();
    std::vector<FocusRow> rows;
    int due = 0, open = 0;
    for (auto it = all.rbegin(); it != all.rend(); ++it) {
        const Focus& f = *it;
        const auto season = session()->seasonOf(f.openedAfterMatch);
        const SeasonTallies tallies = season ? season->tallies() : repo->seasonTallies(f.squad, f.season);
        const int since = matchesSince(tallies, f.startDate, day);
        const FocusState state = focusState(f, since, day);
        FocusRow r;
        r.focusId = f.id;
        r.title = metricName(f.metric);
        r.zonesText = focusZonesText(f.zones, f.grid);
        if (f.grid != grid) r.zonesText += tr(" (%1)").arg(qs(f.grid.name()));
        r.phase = phaseOf(state);
        r.phaseText = phaseWords(state, f.verdict);
        const MatchSummary* match = session()->summary(f.openedAfterMatch);
        r.openedText = tr("After %1 · %2 · %3")
                           .arg(qs(f.openedAfterMatch),
                                match ? compactDateText(match->date) : QString(), qs(f.openedBy));
        if (state == FocusState::Closed)
            r.progressText = tr("Closed %1").arg(compactDateText(f.closedAt.substr(0, 10)));
        else if (!f.reviewOn.empty())
            r.progressText = tr("Review on %1 · %2 matches played since %3")
                                 .arg(compactDateText(f.reviewOn))
                                 .arg(since)
                                 .arg(compactDateText(f.startDate));
        else
            r.progressText = since > f.reviewAfterMatches
                                 ? tr("%1 of %1 matches for the review played since %2 (%3 in all)")
                                       .arg(f.reviewAfterMatches)
                                       .arg(compactDateText(f.startDate))
                                       .arg(since)
                                 : tr("%1 of %2 matches for the review played since %3")
                                       .arg(since)
                                       .arg(f.reviewAfterMatches)
                                       .arg(compactDateText(f.startDate));
        r.drillsText = f.drills.size() == 1 ? tr("1 drill linked") : tr("%1 drills linked").arg(f.drills.size());
        const std::string until = state == FocusState::Closed ? f.closedAt.substr(0, 10) : day;
        const FocusTraining t = sessions.trainingOnFocus(f.id, f.startDate, until);
        r.minutesText = t.unrecordedSessions > 0
                            ? tr("%1 min held up to today (%2 planned not marked)").arg(t.heldMinutes).arg(t.unrecordedMinutes)
                            : tr("%1 min held up to today").arg(t.heldMinutes);
        due += state == FocusState::DueForReview;
        open += state == FocusState::Open;
        rows.push_back(std::move(r));
    }
    m_focuses->reset(std::move(rows));
    if (all.empty())
        m_listText = tr("No focuses yet.");
    else
        m_listText = tr("%1 open · %2 due for review · %3 closed")
                         .arg(open)
                         .arg(due)
                         .arg(static_cast<int>(all.size()) - open - due);
    if (m_selectedId == 0 || m_focuses->indexOf(m_selectedId) < 0)
        m_selectedId = m_focuses->count() > 0 ? m_focuses->at(0)->focusId : 0;
    emit listChanged();
}

void FocusView::clearDetail() {
    m_momentsAtOpening.clear();
    m_reviewBeforeIds.clear();
    m_reviewAfterIds.clear();
    m_title.clear();
    m_zonesText.clear();
    m_phase = FocusPhase::Open;
    m_phaseText.clear();
    m_openedText.clear();
    m_reviewPointText.clear();
    m_noteText.clear();
    m_minutesText.clear();
    m_verdictText.clear();
    m_closed = false;
    m_evidenceTitle.clear();
    m_evidence->reset({}, MetricKind::Rate, {}, ZoneGrid{});
    m_linked->reset({}, ZoneGrid{});
    m_linkedIds.clear();
    m_focusMetric.clear();
    m_hasReview = false;
    m_reviewProblem.clear();
    m_reviewSourceText.clear();
    m_beforeValueText.clear();
    m_afterValueText.clear();
    m_beforeText.clear();
    m_afterText.clear();
    m_changeText.clear();
    m_testText.clear();
    m_beliefText.clear();
    m_caveatText.clear();
    m_trainingText.clear();
    m_chartTitle.clear();
    m_chartBaselineMatches = 0;
    m_chartReadingText.clear();
    m_reviewJson.clear();
    m_chart->clear();
}

void FocusView::refreshDetail() {
    clearDetail();
    ClubRepository* repo = repository();
    const auto focus = repo && m_selectedId != 0 ? FocusStore(*repo).get(m_selectedId) : std::nullopt;
    if (!focus) {
        emit detailChanged();
        return;
    }
    const Focus& f = *focus;
    const std::string day = today().toStdString();
    const auto season = session()->seasonOf(f.openedAfterMatch);
    // A focus opened on an earlier grid is reviewed on its own zones, counted from the events.
    const bool ownGrid = f.grid != session()->grid();
    const SeasonTallies tallies = season && !ownGrid ? season->tallies()
                                                     : repo->seasonTallies(f.squad, f.season, f.grid);
    const int since = matchesSince(tallies, f.startDate, day);
    const FocusState state = focusState(f, since, day);
    const MetricSpec* metric = session()->metricSpec(f.metric);
    const MetricKind kind = metric ? metric->kind() : MetricKind::Rate;
    const FlagSettings& settings = session()->flagSettings();

    m_focusMetric = f.metric;
    m_title = metricName(f.metric);
    m_zonesText = focusZonesText(f.zones, f.grid);
    if (ownGrid)
        m_zonesText += tr(" (on the %1 grid it was opened on)").arg(qs(f.grid.name()));
    m_phase = phaseOf(state);
    m_phaseText = phaseWords(state, f.verdict);
    m_closed = state == FocusState::Closed;
    const MatchSummary* match = session()->summary(f.openedAfterMatch);
    m_openedText = tr("Opened by %1 after %2%3; training on it from %4.")
                       .arg(qs(f.openedBy), qs(f.openedAfterMatch),
                            match ? tr(" (%1)").arg(dateText(match->date)) : QString(),
                            dateText(f.startDate));
    m_reviewPointText =
        f.reviewOn.empty()
            ? tr("Review after %1 matches from the start: %2 played so far.").arg(f.reviewAfterMatches).arg(since)
            : tr("Review on %1 (or after %2 matches): %3 played so far.")
                  .arg(dateText(f.reviewOn))
                  .arg(f.reviewAfterMatches)
                  .arg(since);
    m_noteText = qs(f.note);
    const std::string until = m_closed ? f.closedAt.substr(0, 10) : day;
    const FocusTraining held = SessionStore(*repo).trainingOnFocus(f.id, f.startDate, until);
    m_minutesText = tr("Training held on this focus: %1 (the review counts up to its last match). Mark each session held, changed or cancelled in the Week planner.")
                        .arg(qs(trainingNote(held, f.startDate, until)));
    if (m_closed)
        m_verdictText = tr("Closed %1 with the verdict “%2”%3")
                            .arg(compactDateText(f.closedAt.substr(0, 10)), verdictWord(f.verdict),
                                 f.verdictNote.empty() ? QStringLiteral(".") : tr(": %1").arg(qs(f.verdictNote)));

    const FocusEvidence evidence = readEvidence(f.evidence, settings.window.name());
    m_evidence->reset(evidence.zones, kind, settings.window.name(), f.grid);
    if (!ownGrid && !f.zones.empty()) {
        const bool whole = static_cast<int>(f.zones.size()) == f.grid.zoneCount();
        m_momentsAtOpening = {{QStringLiteral("metricId"), qs(f.metric)},
                              {QStringLiteral("band"), whole ? 0 : f.zones.front().band},
                              {QStringLiteral("lane"), whole ? 0 : f.zones.front().lane},
                              {QStringLiteral("matchId"), qs(f.openedAfterMatch)}};
    }
    m_evidenceTitle = tr("Frozen %1 from %2 (%3); judged over %4")
                          .arg(compactDateText(evidence.frozenAt.substr(0, 10)), qs(evidence.matchId),
                               compactDateText(evidence.date), windowPhrase(settings.window));

    DrillBook book(*repo);
    std::vector<Drill> linked;
    for (auto id : f.drills)
        if (auto drill = book.get(id)) linked.push_back(std::move(*drill));
    m_linkedIds = f.drills;
    m_linked->reset(std::move(linked), session()->grid(), [this](const std::string& id) { return metricName(id); });

    // The review: the numbers stored with the verdict once closed, else computed now.
    if (m_closed) {
        const auto stored = FocusStore(*repo).reviews(f.id);
        const auto review = stored.empty() ? std::nullopt : reviewFromJson(stored.back().numbers);
        if (review) {
            showReview(*review, true);
            m_reviewSourceText = tr("As stored with the verdict on %1 by %2; later data never changes them.")
                                     .arg(compactDateText(stored.back().computedAt.substr(0, 10)),
                                          qs(stored.back().by));
        } else {
            m_reviewProblem = tr("No review numbers were stored with this verdict.");
        }
    } else if (!metric) {
        m_reviewProblem = tr("This focus works on the metric “%1”, which the club file no longer defines.")
                              .arg(qs(f.metric));
    } else {
        const int k = f.reviewAfterMatches;
        // On a review date the after window is the matches played so far (up to K).
        const int kAfter = !f.reviewOn.empty() && day >= f.reviewOn && since >= 1 ? std::min(k, since) : k;
        // Only matches played by today count (the club file may hold later-dated ones).
        const ReviewResult result = computeReview(f, *metric, playedBy(tallies, day), f.grid, k, kAfter);
        if (!result.review) {
            m_reviewProblem = tr("The review cannot be computed yet: %1.").arg(qs(result.problem));
        } else {
            Review r = *result.review;
            const FocusTraining reviewed = SessionStore(*repo).trainingOnFocus(f.id, f.startDate, r.after.dates.back());
            r.trainingMinutes = reviewed.heldMinutes;
            r.trainingNote = trainingNote(reviewed, f.startDate, r.after.dates.back()) + " (the last match reviewed)";
            m_reviewJson = reviewToJson(r);
            m_reviewBeforeIds = r.before.matchIds;
            m_reviewAfterIds = r.after.matchIds;
            showReview(r, false);
            m_reviewSourceText = state == FocusState::DueForReview
                                     ? tr("Computed now from the club file. The review point is reached: record the staff's verdict.")
                                     : tr("Computed now from the club file (the review point is not reached yet).");
        }
    }
    emit detailChanged();
}

bool FocusView::exportReviewMoments(const QUrl& file) {
    ClubRepository* repo = repository();
    const auto focus = repo && m_selectedId != 0 ? FocusStore(*repo).get(m_selectedId) : std::nullopt;
    const MetricSpec* metric = focus ? session()->metricSpec(focus->metric) : nullptr;
    const QString path = localPath(file);
    auto done = [&](const QString& message) {
        m_momentsMessage = message;
        emit momentsExported();
    };
    if (!metric || !canExportReviewMoments()) {
        done(tr("This focus has no review with matches before and after yet."));
        return false;
    }
    if (path.isEmpty()) {
        done(tr("Choose a file to write the moments to."));
        return false;
    }
    try {
        const auto before = storedMomentsIn(*repo, *metric, focus->grid, focus->zones, m_reviewBeforeIds);
        const auto after = storedMomentsIn(*repo, *metric, focus->grid, focus->zones, m_reviewAfterIds);
        writeFileAtomically(QFile::encodeName(path).toStdString(), reviewMomentsCsv(before, after));
        done(tr("Wrote %1 moments before and %2 after to %3.").arg(before.size()).arg(after.size()).arg(path));
        return true;
    } catch (const std::exception& e) {
        done(QString::fromStdString(e.what()));
        return false;
    }
}

void FocusView::showReview(const Review& r, bool stored) {
    Q_UNUSED(stored);
    const MetricKind kind = r.kind;
    const QString level = levelText(r.level);
    m_hasReview = true;
    m_beforeValueText = valueText(kind, r.before.value);
    m_afterValueText = valueText(kind, r.after.value);
    const auto window = [&](const QString& name, const ReviewWindow& w) {
        const QString span = w.matchIds.empty()
                                 ? QString()
                                 : tr("%1 – %2").arg(qs(w.matchIds.front()), qs(w.matchIds.back()));
        const QString amount =
            kind == MetricKind::Rate
                ? tr("%1 of %2").arg(w.totalNum).arg(w.totalDen)
                : kind == MetricKind::Count ? tr("%1 in %2 matches").arg(w.totalNum).arg(w.matchIds.size())
                                            : tr("%1 in %2 events").arg(w.totalNum).arg(w.totalDen);
        return tr("%1 · %2 (%3 matches): %4 → %5%6, %7 %8")
            .arg(name, span)
            .arg(w.matchIds.size())
            .arg(amount, valueText(kind, w.value),
                 kind == MetricKind::Count ? tr(" a match") : QString(), level,
                 intervalText(kind, w.interval));
    };
    m_beforeText = r.before.matchIds.empty()
                       ? tr("Before · %1.").arg(qs(r.baselineNote))
                       : window(tr("Before"), r.before) + tr(" — %1.").arg(qs(r.baselineNote));
    m_afterText = window(tr("After"), r.after);
    const bool rate = kind == MetricKind::Rate;
    auto amount = [&](double v, int decimals) {
        return rate ? tr("%1 points").arg(signedNumber(100 * v, decimals))
                    : signedNumber(v, 2) + (kind == MetricKind::Count ? tr(" a match") : QString());
    };
    if (r.finding == ReviewFinding::NoBaseline) {
        m_changeText = tr("No fair baseline, so no change can be measured.");
    } else {
        auto bare = [&](double v) { return rate ? signedNumber(100 * v, 1) : signedNumber(v, 2); };
        m_changeText = tr("Change %1. The untrained zones moved too: had this zone moved like them "
                          "it would be at %2, so the training zone's own change is %3 (%4 "
                          "%5 to %6).")
                           .arg(amount(r.difference, 1), valueText(kind, r.expected),
                                amount(r.effect, 1), level, bare(r.effectInterval.low),
                                bare(r.effectInterval.high));
    }
    // One plain sentence for what the numbers can say, then how sure.
    QString finding;
    switch (r.finding) {
    case ReviewFinding::ImprovedByMinChange:
        finding = tr("Probably improved by at least %1 more than the untrained zones.").arg(amount(r.minChange, 0).remove(QLatin1Char('+')));
        break;
    case ReviewFinding::Improved:
        finding = tr("Probably improved more than the untrained zones, but not surely by %1.").arg(amount(r.minChange, 0).remove(QLatin1Char('+')));
        break;
    case ReviewFinding::Worse: finding = tr("Probably worse than the untrained zones."); break;
    case ReviewFinding::NoClearChange: finding = tr("No clear change beyond what the untrained zones did."); break;
    case ReviewFinding::NoBaseline: finding = tr("Read against the target only."); break;
    }
    m_testText = finding;
    m_caveatText = tr("A few matches cannot show that the drills caused a change: opponents, "
                      "line-ups and luck vary too. The ranges allow for the usual swing from "
                      "match to match.");
    auto prob = [](double p) {
        return std::isnan(p) ? QStringLiteral("unknown")
               : p > 0.999   ? QStringLiteral("more than 99.9 %")
               : p < 0.001   ? QStringLiteral("less than 0.1 %")
                             : QLocale().toString(100 * p, 'f', 0) + QStringLiteral(" %");
    };
    QString belief;
    if (r.finding != ReviewFinding::NoBaseline)
        belief = tr("Chance it improved by at least %1: %2 (by anything: %3).")
                     .arg(amount(r.minChange, 0).remove(QLatin1Char('+')), prob(r.probImprovedByMinChange),
                          prob(r.probImproved));
    if (r.target)
        belief += (belief.isEmpty() ? QString() : QStringLiteral(" ")) +
                  tr("Target %1 %2: chance the after matches meet it %3.")
                      .arg(r.target->direction == Direction::AtLeast ? tr("at least") : tr("at most"),
                           valueText(kind, r.target->value), prob(r.probAfterMeetsTarget));
    m_beliefText = belief;
    // Notes from sessions as held begin with their minutes; reviews stored before say them apart.
    const bool noteHasMinutes = !r.trainingNote.empty() && std::isdigit(static_cast<unsigned char>(r.trainingNote[0]));
    m_trainingText = r.trainingMinutes && !noteHasMinutes
                         ? tr("Training: %1 %2.").arg(static_cast<int>(*r.trainingMinutes)).arg(qs(r.trainingNote))
                         : tr("Training: %1.").arg(qs(r.trainingNote));
    m_chart->reset(r);
    const ChartReading c = readChart(r);
    m_chartBaselineMatches = c.beforeMatches;
    m_chartTitle = tr("%1 · centre line and limits from the %2 baseline matches, allowing for "
                      "the usual swing from match to match (NIST/SEMATECH e-Handbook §6.3.3.2)")
                       .arg(m_chart->kindText())
                       .arg(c.beforeMatches);
    m_chartReadingText = tr("After the start: %1 of %2 matches beyond the limits on the better side, "
                            "%3 on the worse side.")
                             .arg(c.afterOnBetterSide)
                             .arg(c.afterMatches)
                             .arg(c.afterOnWorseSide);
    if (c.beforeOutside > 0)
        m_chartReadingText += QLatin1Char(' ') +
                              tr("%1 of the before matches fall outside their own limits: the "
                                 "baseline itself was unsteady.")
                                  .arg(c.beforeOutside);
}

std::vector<std::int64_t> FocusView::excludedDrills() const {
    return m_drafting ? m_draftDrills : m_linkedIds;
}

void FocusView::setDrillQuery(const QString& v) {
    if (v == m_drillQuery) return;
    m_drillQuery = v;
    guard(tr("Cannot search the drill book"), [this] {
        refreshDrillSearch();
        return true;
    });
}

void FocusView::refreshDrillSearch() {
    ClubRepository* repo = repository();
    if (!repo) {
        m_drillResults->reset({}, ZoneGrid{});
        m_drillSearchText.clear();
        emit drillSearchChanged();
        return;
    }
    DrillBook book(*repo);
    DrillQuery q;
    q.text = m_drillQuery.toStdString();
    const std::string metric = m_drafting ? m_draftMetricId.toStdString() : m_focusMetric;
    const bool typed = !m_drillQuery.trimmed().isEmpty();
    if (!typed) q.metric = metric;
    std::vector<Drill> found = book.search(q);
    bool byMetric = !typed && !metric.empty();
    if (found.empty() && byMetric) {
        q.metric.clear();
        found = book.search(q);
        byMetric = false;
    }
    const auto excluded = excludedDrills();
    std::erase_if(found, [&](const Drill& drill) {
        return std::find(excluded.begin(), excluded.end(), drill.id) != excluded.end();
    });
    if (typed)
        m_drillSearchText = found.empty() ? tr("No other drill matches “%1”.").arg(m_drillQuery.trimmed())
                                          : tr("Drills matching “%1”").arg(m_drillQuery.trimmed());
    else if (byMetric)
        m_drillSearchText = tr("Drills that work on %1").arg(metricName(metric));
    else
        m_drillSearchText = found.empty() ? tr("No other drills in the book.") : tr("Every drill in the book");
    m_drillResults->reset(std::move(found), session()->grid(), [this](const std::string& id) { return metricName(id); });
    emit drillSearchChanged();
}

QVariantList FocusView::verdictOptions() const {
    const auto item = [](const QString& text, int value) {
        return QVariantMap{{QStringLiteral("text"), text}, {QStringLiteral("value"), value}};
    };
    return {item(tr("Worked"), 0), item(tr("Partly"), 1), item(tr("No change"), 2),
            item(tr("Can't tell"), 3)};
}

void FocusView::setVerdictChoice(int v) {
    if (v == m_verdictChoice) return;
    m_verdictChoice = v;
    emit verdictFormChanged();
}

void FocusView::setVerdictNote(const QString& v) {
    if (v == m_verdictNote) return;
    m_verdictNote = v;
    emit verdictFormChanged();
}

void FocusView::setVerdictBy(const QString& v) {
    if (v == m_verdictBy) return;
    m_verdictBy = v;
    emit verdictFormChanged();
}

// ---- actions on a focus ---------------------------------------------------------------------

bool FocusView::select(qint64 focusId) {
    return guard(tr("Cannot read the focus"), [&] {
        if (m_focuses->indexOf(focusId) < 0) return false;
        m_selectedId = focusId;
        m_drafting = false;
        m_verdictProblem.clear();
        emit verdictFormChanged();
        refreshDetail();
        refreshDraft();
        refreshDrillSearch();
        return true;
    });
}

bool FocusView::linkDrill(qint64 drillId) {
    return guard(tr("Cannot link the drill"), [&] {
        ClubRepository* repo = repository();
        if (!repo || m_selectedId == 0) return false;
        if (m_closed) {
            setStatus(tr("A closed focus keeps the drills it had."));
            return false;
        }
        FocusStore store(*repo);
        if (!store.drillExists(drillId)) {
            setStatus(tr("Drill %1 is not in the drill book (or is deleted).").arg(drillId));
            return false;
        }
        store.linkDrill(m_selectedId, drillId, nowUtcIso());
        const auto drill = DrillBook(*repo).get(drillId);
        setStatus(tr("Linked “%1” to focus %2.").arg(drill ? qs(drill->title) : QString::number(drillId)).arg(m_selectedId));
        session()->reload();
        return true;
    });
}

bool FocusView::unlinkDrill(qint64 drillId) {
    return guard(tr("Cannot unlink the drill"), [&] {
        ClubRepository* repo = repository();
        if (!repo || m_selectedId == 0) return false;
        if (m_closed) {
            setStatus(tr("A closed focus keeps the drills it had."));
            return false;
        }
        if (!FocusStore(*repo).unlinkDrill(m_selectedId, drillId)) {
            setStatus(tr("Drill %1 is not linked to focus %2.").arg(drillId).arg(m_selectedId));
            return false;
        }
        const auto drill = DrillBook(*repo).get(drillId);
        setStatus(tr("Unlinked “%1” from focus %2.").arg(drill ? qs(drill->title) : QString::number(drillId)).arg(m_selectedId));
        session()->reload();
        return true;
    });
}

bool FocusView::recordVerdict() {
    return guard(tr("Cannot record the verdict"), [&] {
        ClubRepository* repo = repository();
        QStringList problems;
        if (!repo || m_selectedId == 0) problems << tr("Choose a focus first.");
        else if (m_closed) problems << tr("This focus is already closed.");
        else if (!m_hasReview || m_reviewJson.empty())
            problems << tr("The review has no numbers yet, so there is nothing to judge.");
        if (m_verdictChoice < 0 || m_verdictChoice > 3) problems << tr("Choose a verdict.");
        if (m_verdictBy.trimmed().isEmpty()) problems << tr("Say who records the verdict.");
        if (!problems.isEmpty()) {
            m_verdictProblem = problems.join(QLatin1Char(' '));
            emit verdictFormChanged();
            return false;
        }
        static constexpr Verdict kVerdicts[] = {Verdict::Worked, Verdict::Partly, Verdict::NoChange,
                                                Verdict::CantTell};
        FocusStore(*repo).close(m_selectedId, kVerdicts[m_verdictChoice], m_verdictNote.trimmed().toStdString(),
                                m_verdictBy.trimmed().toStdString(), m_reviewJson, nowUtcIso());
        setStatus(tr("Focus %1 closed; its review numbers are stored with the verdict.").arg(m_selectedId));
        m_verdictChoice = -1;
        m_verdictNote.clear();
        m_verdictProblem.clear();
        emit verdictFormChanged();
        session()->reload();
        return true;
    });
}

// ---- opening a focus ------------------------------------------------------------------------

int FocusView::draftMatchRow() const {
    return session() ? session()->matches()->indexOf(m_draftMatchId) : -1;
}

int FocusView::draftMetricRow() const {
    return session() ? session()->metrics()->indexOf(m_draftMetricId) : -1;
}

QVariantList FocusView::draftZones() const {
    QVariantList out;
    for (const Zone& z : m_draftZones)
        out << QVariantMap{{QStringLiteral("band"), z.band}, {QStringLiteral("lane"), z.lane}};
    return out;
}

void FocusView::setDraftNote(const QString& v) {
    if (v == m_draftNote) return;
    m_draftNote = v;
    emit draftFormChanged();
}

void FocusView::setDraftReviewAfter(int v) {
    if (v == m_draftReviewAfter) return;
    m_draftReviewAfter = v;
    emit draftFormChanged();
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        return true;
    });
}

void FocusView::setDraftReviewOn(const QString& v) {
    if (v == m_draftReviewOn) return;
    m_draftReviewOn = v;
    emit draftFormChanged();
}

void FocusView::setDraftBy(const QString& v) {
    if (v == m_draftBy) return;
    m_draftBy = v;
    emit draftFormChanged();
}

void FocusView::openFromZone(const QString& metricId, int band, int lane, const QString& matchId) {
    m_drafting = true;
    m_draftMatchId = matchId.isEmpty() && session() ? session()->latestMatchId() : matchId;
    m_draftMetricId = metricId;
    m_draftWhole = band == 0 && lane == 0;
    m_draftZones.clear();
    if (!m_draftWhole) m_draftZones.push_back({band, lane});
    m_draftDrills.clear();
    m_draftNote.clear();
    m_draftReviewAfter = 5;
    m_draftReviewOn.clear();
    m_draftProblems.clear();
    m_drillQuery.clear();
    emit draftFormChanged();
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        refreshDrillSearch();
        return true;
    });
}

void FocusView::beginDraft() {
    guard(tr("Cannot prepare the focus"), [this] {
        ClubSession* s = session();
        if (!s || s->matchSummaries().empty() || s->metricSpecs().empty()) {
            setStatus(tr("A focus opens from a match: load matches into the club file first."));
            return false;
        }
        const MatchSummary& match = *s->latestPlayed();
        const auto season = s->seasonOf(match.id);
        const auto focal = season ? season->indexOf(match.id) : std::nullopt;
        if (focal) {
            const Debrief& debrief = season->debriefAt(*focal);
            for (const auto* list : {&debrief.slippedInWindow, &debrief.slippedInMatch, &debrief.watched})
                if (!list->empty()) {
                    openFromZone(qs(list->front().now.metric), list->front().now.band,
                                 list->front().now.lane, qs(match.id));
                    return true;
                }
        }
        openFromZone(qs(s->metricSpecs().front().id), 0, 0, qs(match.id));
        return true;
    });
}

void FocusView::setDraftMatch(const QString& matchId) {
    if (matchId == m_draftMatchId) return;
    m_draftMatchId = matchId;
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        return true;
    });
}

void FocusView::setDraftMetric(const QString& metricId) {
    if (metricId == m_draftMetricId) return;
    m_draftMetricId = metricId;
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        refreshDrillSearch();
        return true;
    });
}

void FocusView::toggleDraftZone(int band, int lane) {
    const auto it = std::find(m_draftZones.begin(), m_draftZones.end(), Zone{band, lane});
    if (it != m_draftZones.end()) m_draftZones.erase(it);
    else m_draftZones.push_back({band, lane});
    m_draftWhole = false;
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        return true;
    });
}

void FocusView::setDraftWholePitch(bool whole) {
    if (whole == m_draftWhole) return;
    m_draftWhole = whole;
    if (whole) m_draftZones.clear();
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        return true;
    });
}

void FocusView::pickDraftDrill(qint64 drillId) {
    if (std::find(m_draftDrills.begin(), m_draftDrills.end(), drillId) != m_draftDrills.end()) return;
    m_draftDrills.push_back(drillId);
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        refreshDrillSearch();
        return true;
    });
}

void FocusView::dropDraftDrill(qint64 drillId) {
    std::erase(m_draftDrills, drillId);
    guard(tr("Cannot prepare the focus"), [this] {
        refreshDraft();
        refreshDrillSearch();
        return true;
    });
}

void FocusView::cancelDraft() {
    m_drafting = false;
    m_draftProblems.clear();
    emit draftFormChanged();
    guard(tr("Cannot read the focus"), [this] {
        refreshDraft();
        refreshDrillSearch();
        return true;
    });
}

void FocusView::refreshDraft() {
    m_draftEvidence->reset({}, MetricKind::Rate, {}, ZoneGrid{});
    m_draftMap->clear();
    m_draftStartText.clear();
    m_draftSlipText.clear();
    m_draftSlipped = false;
    m_draftMetricName.clear();
    m_draftZonesText.clear();
    ClubRepository* repo = repository();
    if (!m_drafting || !repo) {
        m_draftDrillModel->reset({}, ZoneGrid{});
        emit draftChanged();
        return;
    }
    ClubSession* s = session();
    const ZoneGrid& grid = s->grid();
    m_geometry->setZoneGrid(grid);
    m_draftZonesText = m_draftWhole ? tr("Whole pitch") : desktop::zonesText(m_draftZones, grid);
    DrillBook book(*repo);
    std::vector<Drill> picked;
    for (auto id : m_draftDrills)
        if (auto drill = book.get(id)) picked.push_back(std::move(*drill));
    m_draftDrillModel->reset(std::move(picked), grid, [this](const std::string& id) { return metricName(id); });

    const MatchSummary* match = s->summary(m_draftMatchId.toStdString());
    const MetricSpec* metric = s->metricSpec(m_draftMetricId.toStdString());
    const auto season = match ? s->seasonOf(match->id) : nullptr;
    const auto focal = season ? season->indexOf(match->id) : std::nullopt;
    if (!match || !metric || !focal) {
        m_draftSlipText = !match ? tr("Choose the match whose flag opens the focus.")
                                 : tr("Choose the metric the focus works on.");
        emit draftChanged();
        return;
    }
    m_geometry->setPitch(match->pitch);
    m_draftMetricName = metricName(metric->id);
    const MetricKind kind = metric->kind();
    const AppWindows& w = season->windows();

    // The judged window's map at that match, to pick the zones on.
    std::vector<const ZoneStatus*> zones;
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const Zone z = grid.zoneAt(i);
        if (const ZoneStatus* st = season->find(*focal, metric->id, z.band, z.lane, w.judged)) {
            zones.push_back(st);
        }
    }
    const ScaleDomain domain = scaleDomain(kind, pooledValues(zones, kind, grid));
    ZoneMapModel::Header header{windowText(w.judged), qs(match->id), {}, ZoneState::NoTarget,
                                scaleLabels(kind, domain), levelText(s->flagSettings().level)};
    if (const ZoneStatus* whole = season->find(*focal, metric->id, 0, 0, w.judged)) {
        header.wholePitchText = wholePitchLine(*whole, kind);
        header.wholePitchState = ZoneState::from(whole->state);
    }
    m_draftMap->reset(std::move(header), zoneCells(zones, kind, domain, grid));

    const std::string start = dayAfter(match->date);
    m_draftStartText = tr("Training on it starts %1, the day after the match. The review compares "
                          "the %2 matches before that day with the %2 from it on.")
                           .arg(dateText(start))
                           .arg(m_draftReviewAfter);
    if (!m_draftWhole && m_draftZones.empty()) {
        m_draftSlipText = tr("Pick at least one zone on the pitch, or the whole pitch.");
        emit draftChanged();
        return;
    }
    const FocusEvidence e = focusEvidence(season->tallies(), *focal, *metric, season->targets(), grid,
                                          s->flagSettings(), m_draftZones, m_draftWhole, {});
    m_draftEvidence->reset(e.zones, kind, s->flagSettings().window.name(), grid);
    m_draftSlipped = e.slipped;
    m_draftSlipText = e.slipped
                          ? tr("Off target or watched over %1 at %2: these numbers are frozen with the focus.")
                                .arg(windowPhrase(w.judged), qs(match->id))
                          : tr("Neither off target nor watched over %1 at %2. The focus can still be opened; "
                               "these numbers are frozen with it.")
                                .arg(windowPhrase(w.judged), qs(match->id));
    emit draftChanged();
}

bool FocusView::confirmDraft() {
    return guard(tr("Cannot open the focus"), [&] {
        ClubRepository* repo = repository();
        ClubSession* s = session();
        QStringList problems;
        const MatchSummary* match = s ? s->summary(m_draftMatchId.toStdString()) : nullptr;
        const MetricSpec* metric = s ? s->metricSpec(m_draftMetricId.toStdString()) : nullptr;
        const auto season = match ? s->seasonOf(match->id) : nullptr;
        const auto focal = season ? season->indexOf(match->id) : std::nullopt;
        if (!repo || !m_drafting) problems << tr("Start a new focus first.");
        if (!match || !focal) problems << tr("Match: choose the match whose flag opens the focus.");
        if (!metric) problems << tr("Metric: choose the metric the focus works on.");
        if (!m_draftWhole && m_draftZones.empty())
            problems << tr("Zones: pick at least one zone on the pitch, or the whole pitch.");
        if (m_draftBy.trimmed().isEmpty()) problems << tr("Opened by: say who opens the focus.");
        if (m_draftReviewAfter < 1 || m_draftReviewAfter > 20)
            problems << tr("Review after: expected 1–20 matches, found %1.").arg(m_draftReviewAfter);
        const std::string start = match ? dayAfter(match->date) : std::string();
        const std::string reviewOn = m_draftReviewOn.trimmed().toStdString();
        if (!reviewOn.empty() && !isIsoDate(reviewOn))
            problems << tr("Review on: “%1” is not a date written YYYY-MM-DD.").arg(m_draftReviewOn.trimmed());
        else if (!reviewOn.empty() && match && reviewOn <= start)
            problems << tr("Review on: %1 is not after the start of training (%2).")
                            .arg(qs(reviewOn), qs(start));
        std::optional<double> minChange;
        if (!m_draftMinChange.trimmed().isEmpty()) {
            bool ok = false;
            const double v = QLocale().toDouble(m_draftMinChange.trimmed(), &ok);
            const double alt = ok ? v : m_draftMinChange.trimmed().toDouble(&ok);
            if (!ok || alt < 0 || !std::isfinite(alt))
                problems << tr("Smallest change that matters: “%1” is not a number of zero or more.")
                                .arg(m_draftMinChange.trimmed());
            else
                minChange = metric && metric->kind() == MetricKind::Rate ? alt / 100 : alt;
        }
        if (repo) {
            FocusStore store(*repo);
            for (auto id : m_draftDrills)
                if (!store.drillExists(id))
                    problems << tr("Drill %1 is no longer in the drill book; remove it from the list.").arg(id);
        }
        if (!problems.isEmpty()) {
            m_draftProblems = problems;
            emit draftFormChanged();
            return false;
        }
        const ZoneGrid& grid = s->grid();
        Focus f;
        f.squad = season->squad();
        f.season = season->season();
        f.metric = metric->id;
        if (m_draftWhole)
            for (int i = 0; i < grid.zoneCount(); ++i) f.zones.push_back(grid.zoneAt(i));
        else
            f.zones = m_draftZones;
        f.openedAfterMatch = match->id;
        f.startDate = start;
        f.reviewAfterMatches = m_draftReviewAfter;
        f.reviewOn = reviewOn;
        const std::string now = nowUtcIso();
        f.evidence = focusEvidence(season->tallies(), *focal, *metric, season->targets(), grid,
                                   s->flagSettings(), m_draftZones, m_draftWhole, now)
                         .json;
        f.note = m_draftNote.trimmed().toStdString();
        f.openedBy = m_draftBy.trimmed().toStdString();
        f.drills = m_draftDrills;
        f.minChange = minChange;
        const auto overlapping = overlappingOpenFocuses(FocusStore(*repo).list(), f.metric, f.zones);
        const auto id = FocusStore(*repo).open(f, now);
        m_drafting = false;
        m_draftDrills.clear();
        m_draftNote.clear();
        m_draftReviewOn.clear();
        m_draftProblems.clear();
        emit draftFormChanged();
        m_selectedId = id;
        QString status = tr("Opened focus %1 on %2 (%3).").arg(id).arg(metricName(f.metric), m_draftZonesText);
        for (auto other : overlapping)
            status += QLatin1Char(' ') +
                      tr("Focus %1 on the same metric and zone is still open: both reviews will "
                         "count the same matches, and neither can tell which drills did it.")
                          .arg(other);
        m_draftMinChange.clear();
        setStatus(status);
        s->reload();
        return true;
    });
}

} // namespace pitchloop::desktop
