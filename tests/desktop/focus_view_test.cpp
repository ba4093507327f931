// Tests of the focuses page's controller: every list model under QAbstractItemModelTester while
// it is filled and refilled; opening a focus from a flagged zone (evidence frozen as model/
// freezes it, drills, review point), linking drills, the review's numbers and control chart
// against model::computeReview, training minutes against model::SessionStore, and the verdict
// that closes a focus with its numbers, each written to a temporary club file and read back
// through model/ on a second connection. A refused open keeps what was typed and writes nothing.
//
// The club: the demo season's matches, targets and drill book (sample-club/), ingested into a
// temporary club file.

#include "modelcheck.h"
#include "clubsession.h"
#include "controlchartmodel.h"
#include "display.h"
#include "drilllistmodel.h"
#include "drills.h"
#include "evidencelistmodel.h"
#include "focus.h"
#include "focuslistmodel.h"
#include "focusview.h"
#include "ingest.h"
#include "reviewreading.h"
#include "sessions.h"
#include "targets.h"
#include "zonemapmodel.h"
#include "zoneseries.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QDir>
#include <QFile>
#include <QGuiApplication>
#include <QLocale>
#include <QQuickStyle>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::watch;
using pitchloop::desktop::testing::role;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);
const QString kToday = QStringLiteral("2026-12-01"); // well after the review point of the focus
const std::string kMetric = "pre_shot_passes_against";

bool sameNumber(double a, double b) { return (std::isnan(a) && std::isnan(b)) || std::abs(a - b) < 1e-12; }

/// Stored evidence without the time it was frozen, for comparing two freezes.
nlohmann::json withoutTime(const std::string& evidence) {
    auto j = nlohmann::json::parse(evidence);
    j.erase("frozen_at");
    return j;
}

} // namespace

class FocusViewTest : public QObject {
    Q_OBJECT

private slots:
    void initTestCase();
    void refusedOpenKeepsTheDraft();
    void openFromZone();
    void listAndTrainingMinutes();
    void reviewAgainstModel();
    void linkAndUnlink();
    void verdictClosesTheFocus();
    void zoneTrendShowsTheFocus();
    void emptyClub();

private:
    std::optional<model::Focus> storedFocus() {
        const auto all = model::FocusStore(*m_reference).list();
        if (all.empty()) return std::nullopt;
        return all.back();
    }

    QTemporaryDir m_dir;
    QString m_file;
    std::unique_ptr<model::ClubRepository> m_reference; ///< same file, read independently
    ClubSession m_session;
    qint64 m_focusId = 0;
};

void FocusViewTest::initTestCase() {
    QVERIFY(m_dir.isValid());
    m_file = m_dir.filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(m_file.toStdString());
        const QStringList matches = QDir(kSource + QStringLiteral("/sample-club/matches"))
                                        .entryList({QStringLiteral("*.json")}, QDir::Files, QDir::Name);
        QVERIFY(matches.size() >= 18);
        for (const QString& m : matches) {
            const auto report = model::ingestFile(
                repo, (kSource + QStringLiteral("/sample-club/matches/") + m).toStdString());
            QVERIFY2(report.ok(), report.file.c_str());
        }
        QFile targets(kSource + QStringLiteral("/sample-club/targets.json"));
        QVERIFY(targets.open(QIODevice::ReadOnly));
        const auto grid = repo.tallyGrid();
        const auto parsed = model::parseTargetFile(targets.readAll().toStdString(), "targets.json",
                                                   repo.metrics(), grid.bands(), grid.lanes());
        QVERIFY(parsed.errors.empty());
        repo.addTargets(parsed.targets, "2026-07-20T10:00:00Z");
        model::DrillBook book(repo);
        QFile drills(kSource + QStringLiteral("/sample-club/drills.json"));
        QVERIFY(drills.open(QIODevice::ReadOnly));
        const auto file = model::parseDrillFile(drills.readAll().toStdString(), "drills.json",
                                                book.metrics(), book.grid());
        QVERIFY(file.errors.empty());
        QVERIFY(book.importDrills(file.drills, "2026-07-20T10:00:00Z").errors.empty());
    }
    QVERIFY(m_session.open(m_file));
    m_reference = std::make_unique<model::ClubRepository>(m_file.toStdString());
}

void FocusViewTest::refusedOpenKeepsTheDraft() {
    FocusView view;
    const auto evidenceTester = watch(view.draftEvidence());
    const auto mapTester = watch(view.draftMap());
    view.setToday(kToday);
    view.setSession(&m_session);
    view.openFromZone(QString::fromStdString(kMetric), 2, 5, QStringLiteral("KB-2026-08"));
    QVERIFY(view.drafting());
    view.setDraftNote(QStringLiteral("their right side keeps overloading our left back"));
    view.setDraftReviewOn(QStringLiteral("next month"));
    QVERIFY(!view.confirmDraft()); // nobody named, and no date
    const QString problems = view.draftProblems().join(QLatin1Char('\n'));
    QVERIFY2(problems.contains(QStringLiteral("Opened by: say who opens the focus.")), qPrintable(problems));
    QVERIFY2(problems.contains(QStringLiteral("Review on: “next month” is not a date written YYYY-MM-DD.")),
             qPrintable(problems));
    QVERIFY(view.drafting());
    QCOMPARE(view.draftNote(), QStringLiteral("their right side keeps overloading our left back"));
    QCOMPARE(view.draftReviewOn(), QStringLiteral("next month"));
    QVERIFY(model::FocusStore(*m_reference).list().empty());

    // A review date on or before the start is refused too.
    view.setDraftBy(QStringLiteral("D. Arkwright"));
    view.setDraftReviewOn(QStringLiteral("2026-09-27"));
    QVERIFY(!view.confirmDraft());
    QVERIFY(view.draftProblems().join(QLatin1Char(' ')).contains(QStringLiteral("not after the start")));
    // No zone at all.
    view.setDraftReviewOn({});
    view.toggleDraftZone(2, 5);
    QVERIFY(view.draftZones().isEmpty());
    QVERIFY(!view.confirmDraft());
    QVERIFY(view.draftProblems().join(QLatin1Char(' ')).contains(QStringLiteral("Zones:")));
    QVERIFY(model::FocusStore(*m_reference).list().empty());
    view.cancelDraft();
    QVERIFY(!view.drafting());
}

void FocusViewTest::openFromZone() {
    FocusView view;
    const auto listTester = watch(view.focuses());
    const auto evidenceTester = watch(view.draftEvidence());
    const auto mapTester = watch(view.draftMap());
    const auto pickedTester = watch(view.draftDrills());
    const auto resultsTester = watch(view.drillResults());
    view.setToday(kToday);
    view.setSession(&m_session);
    QCOMPARE(view.focuses()->rowCount(), 0);

    view.openFromZone(QString::fromStdString(kMetric), 2, 5, QStringLiteral("KB-2026-08"));
    QVERIFY(view.drafting());
    QCOMPARE(view.draftMatchId(), QStringLiteral("KB-2026-08"));
    QCOMPARE(view.draftZonesText(), QStringLiteral("Our left-back area (B2·L5)"));
    QCOMPARE(view.draftMap()->rowCount(), m_reference->tallyGrid().zoneCount());
    QCOMPARE(view.draftEvidence()->rowCount(), 3); // the match, the judged window, the season
    // The demo story: the left-back zone slipped at match 8.
    QVERIFY(view.draftSlipped());

    // With an empty search the picker offers the drills that work on the metric (the book's
    // own metric search).
    model::DrillQuery byMetric;
    byMetric.metric = kMetric;
    const auto working = model::DrillBook(*m_reference).search(byMetric);
    QCOMPARE(view.drillResults()->rowCount(), static_cast<int>(working.size()));
    const qint64 first = view.drillResults()->idAt(0);
    const qint64 second = view.drillResults()->idAt(1);
    view.pickDraftDrill(first);
    view.pickDraftDrill(second);
    QCOMPARE(view.draftDrills()->rowCount(), 2);
    QCOMPARE(view.drillResults()->indexOf(first), -1); // a picked drill leaves the results
    view.dropDraftDrill(second);
    QCOMPARE(view.draftDrills()->rowCount(), 1);
    view.setDrillQuery(QStringLiteral("cover and balance"));
    QCOMPARE(view.drillResults()->rowCount(), 1);
    const qint64 cover = view.drillResults()->idAt(0);
    view.pickDraftDrill(cover);

    view.setDraftBy(QStringLiteral("D. Arkwright (head coach)"));
    view.setDraftNote(QStringLiteral("their right side keeps overloading our left back"));
    view.setDraftReviewAfter(5);
    QVERIFY2(view.confirmDraft(), qPrintable(view.draftProblems().join(QLatin1Char('\n'))));
    QVERIFY(!view.drafting());

    // Read back through model/.
    const auto f = storedFocus();
    QVERIFY(f);
    m_focusId = f->id;
    QCOMPARE(view.selectedId(), f->id);
    QCOMPARE(f->metric, kMetric);
    QVERIFY((f->zones == std::vector<model::Zone>{{2, 5}}));
    QCOMPARE(f->openedAfterMatch, std::string("KB-2026-08"));
    QCOMPARE(f->startDate, model::dayAfter("2026-09-26"));
    QCOMPARE(f->startDate, std::string("2026-09-27"));
    QCOMPARE(f->reviewAfterMatches, 5);
    QVERIFY(f->reviewOn.empty());
    QCOMPARE(f->openedBy, std::string("D. Arkwright (head coach)"));
    QCOMPARE(f->note, std::string("their right side keeps overloading our left back"));
    QCOMPARE(f->drills, (std::vector<std::int64_t>{first, cover}));
    // The evidence is the model's own freeze of that flag.
    const auto season = m_reference->seasonTallies("First team", "2026-27");
    const auto focal = static_cast<std::size_t>(
        std::find(season.matchIds.begin(), season.matchIds.end(), "KB-2026-08") - season.matchIds.begin());
    const auto expected = model::focusEvidence(season, focal, *m_reference->metric(kMetric),
                                               m_reference->targets("First team", "2026-27"),
                                               m_reference->tallyGrid(), m_reference->flagSettings(),
                                               {{2, 5}}, false, "t");
    QVERIFY2(withoutTime(f->evidence) == withoutTime(expected.json), f->evidence.c_str());
    QVERIFY(expected.slipped);

    // The list shows it, and the detail shows its evidence and drills.
    QCOMPARE(view.focuses()->rowCount(), 1);
    QCOMPARE(view.evidence()->rowCount(), 3);
    QCOMPARE(view.linked()->rowCount(), 2);
    QCOMPARE(role(*view.evidence(), 1, "zoneText").toString(), QStringLiteral("Our left-back area (B2·L5)"));
    // Its moments are one click away: the zone at the match that opened it.
    const QVariantMap moments = view.momentsAtOpening();
    QCOMPARE(moments.value(QStringLiteral("metricId")).toString(), QString::fromStdString(kMetric));
    QCOMPARE(moments.value(QStringLiteral("band")).toInt(), 2);
    QCOMPARE(moments.value(QStringLiteral("lane")).toInt(), 5);
    QCOMPARE(moments.value(QStringLiteral("matchId")).toString(), QStringLiteral("KB-2026-08"));
}

void FocusViewTest::listAndTrainingMinutes() {
    QVERIFY(m_focusId > 0);
    // A planned session in the focus's first week: 25 minutes of one of its drills.
    const auto f = model::FocusStore(*m_reference).get(m_focusId);
    model::Plan plan;
    plan.date = "2026-09-29";
    plan.sessionMinutes = 60;
    plan.playersAvailable = 18;
    model::PlanBlock block;
    block.drillId = f->drills.front();
    block.minutes = 25;
    block.focus = 0;
    plan.blocks.push_back(block);
    plan.focusMinutes.push_back({0, m_focusId, 25});
    model::SessionStore(*m_reference).save("First team", plan, "R. Tamsin", "2026-09-28T08:00:00Z");
    m_session.reload();

    FocusView view;
    const auto listTester = watch(view.focuses());
    view.setToday(QStringLiteral("2026-09-28")); // the day before the planned session
    view.setSession(&m_session);
    QCOMPARE(view.focuses()->rowCount(), 1);
    // The club file holds the whole demo season, but a match dated after "today" has not been
    // played: on 28 Sep none of the matches from the 27 Sep start counts yet.
    QCOMPARE(role(*view.focuses(), 0, "progressText").toString(),
             QStringLiteral("0 of 5 matches for the review played since %1").arg(compactDateText("2026-09-27")));
    QCOMPARE(role(*view.focuses(), 0, "phase").toInt(), static_cast<int>(FocusPhase::Open));
    QCOMPARE(role(*view.focuses(), 0, "minutesText").toString(),
             QStringLiteral("0 min held up to today")); // the session is after "today"

    // Training as held: a saved session counts once the staff mark it held; until then it is
    // counted apart, a cancelled one not at all, a changed one with the minutes really done.
    view.setToday(kToday);
    QCOMPARE(model::SessionStore(*m_reference).minutesOnFocus(m_focusId, f->startDate, kToday.toStdString()), 25);
    QCOMPARE(role(*view.focuses(), 0, "minutesText").toString(),
             QStringLiteral("0 min held up to today (25 planned not marked)"));
    model::SessionStore store(*m_reference);
    const auto record = [&](model::SessionOutcome outcome, std::vector<int> minutes) {
        model::SessionRecord how;
        how.outcome = outcome;
        how.playersPresent = 16;
        how.blockMinutes = std::move(minutes);
        const auto problems = store.record("First team", "2026-09-29", how, kToday.toStdString(), "R. Tamsin",
                                           "2026-09-29T12:00:00Z");
        QVERIFY(problems.empty());
        m_session.reload();
    };
    record(model::SessionOutcome::Cancelled, {});
    QCOMPARE(role(*view.focuses(), 0, "minutesText").toString(), QStringLiteral("0 min held up to today"));
    record(model::SessionOutcome::Changed, {10});
    QCOMPARE(role(*view.focuses(), 0, "minutesText").toString(), QStringLiteral("10 min held up to today"));
    record(model::SessionOutcome::Held, {});
    QCOMPARE(role(*view.focuses(), 0, "minutesText").toString(), QStringLiteral("25 min held up to today"));
    // By 1 Dec the review point is passed: the 5 the review needs, and how many in all (the
    // same count the detail's "played so far" gives).
    QCOMPARE(role(*view.focuses(), 0, "progressText").toString(),
             QStringLiteral("5 of 5 matches for the review played since %1 (10 in all)").arg(compactDateText("2026-09-27")));
    // The state is model::focusState's.
    const auto season = m_reference->seasonTallies("First team", "2026-27");
    QVERIFY(model::focusState(*f, model::matchesSince(season, f->startDate), kToday.toStdString()) ==
            model::FocusState::DueForReview);
    QCOMPARE(role(*view.focuses(), 0, "phase").toInt(), static_cast<int>(FocusPhase::DueForReview));
    QCOMPARE(role(*view.focuses(), 0, "phaseText").toString(), QStringLiteral("Due for review"));
    QCOMPARE(role(*view.focuses(), 0, "title").toString(),
             QString::fromStdString(m_reference->metric(kMetric)->name));
    QCOMPARE(view.listText(), QStringLiteral("0 open · 1 due for review · 0 closed"));

    // On the day after the start no match after it has been played: the review waits, even
    // though the club file holds later-dated matches.
    view.setToday(QStringLiteral("2026-09-28"));
    QVERIFY(view.select(m_focusId));
    QVERIFY(!view.hasReview());
    QVERIFY2(view.reviewProblem().startsWith(QStringLiteral("The review cannot be computed yet")),
             qPrintable(view.reviewProblem()));
}

void FocusViewTest::reviewAgainstModel() {
    FocusView view;
    const auto chartTester = watch(view.chart());
    const auto evidenceTester = watch(view.evidence());
    const auto linkedTester = watch(view.linked());
    view.setToday(kToday);
    view.setSession(&m_session);
    QVERIFY(view.select(m_focusId));
    QVERIFY2(view.hasReview(), qPrintable(view.reviewProblem()));

    const auto f = model::FocusStore(*m_reference).get(m_focusId);
    const auto metric = m_reference->metric(kMetric);
    const auto season = m_reference->seasonTallies("First team", "2026-27");
    const auto result = model::computeReview(*f, *metric, season, m_reference->tallyGrid(), 5, 5);
    QVERIFY(result.review);
    const model::Review& r = *result.review;
    QCOMPARE(view.beforeValueText(), valueText(r.kind, r.before.value));
    QCOMPARE(view.afterValueText(), valueText(r.kind, r.after.value));
    QVERIFY(view.beforeText().contains(QStringLiteral("%1 in %2 matches").arg(r.before.totalNum).arg(r.before.matchIds.size())));
    QVERIFY(view.beforeText().contains(QString::fromStdString(r.baselineNote)));
    QVERIFY(view.afterText().contains(QString::fromStdString(r.after.matchIds.front())));
    // The moments behind both windows, side by side: as many rows as the review's numerators
    // (a per-match count counts one pass a row).
    QVERIFY(view.canExportReviewMoments());
    QTemporaryDir dir;
    const QString csv = dir.filePath(QStringLiteral("moments.csv"));
    QVERIFY2(view.exportReviewMoments(QUrl::fromLocalFile(csv)), qPrintable(view.momentsMessage()));
    QCOMPARE(view.momentsMessage(), QStringLiteral("Wrote %1 moments before and %2 after to %3.")
                                        .arg(r.before.totalNum).arg(r.after.totalNum).arg(csv));
    QFile file(csv);
    QVERIFY(file.open(QIODevice::ReadOnly));
    const QByteArray bytes = file.readAll();
    QCOMPARE(bytes.count("\r\nbefore,"), static_cast<qsizetype>(r.before.totalNum));
    QCOMPARE(bytes.count("\r\nafter,"), static_cast<qsizetype>(r.after.totalNum));
    QVERIFY(view.caveatText().contains(QStringLiteral("cannot show that the drills caused")));
    QVERIFY(!view.testText().isEmpty());
    QVERIFY(view.beliefText().contains(QStringLiteral("Target at most")));
    QVERIFY(view.trainingText().contains(QStringLiteral("25 minutes"))); // the planned session

    // The chart: every point and limit as model/ computed them.
    QCOMPARE(view.chart()->rowCount(), static_cast<int>(r.chart.size()));
    QCOMPARE(view.chart()->firstAfter(), static_cast<int>(r.chart.size() - r.after.matchIds.size()));
    QCOMPARE(view.chart()->kindText(), QStringLiteral("u-chart")); // a count metric
    const auto values = view.chart()->values();
    const auto lcls = view.chart()->lowerLimits();
    const auto ucls = view.chart()->upperLimits();
    for (std::size_t i = 0; i < r.chart.size(); ++i) {
        const auto at = static_cast<qsizetype>(i);
        QVERIFY(sameNumber(values[at], r.chart[i].value));
        QVERIFY(sameNumber(lcls[at], r.chart[i].lcl));
        QVERIFY(sameNumber(ucls[at], r.chart[i].ucl));
        QCOMPARE(role(*view.chart(), static_cast<int>(i), "matchId").toString(),
                 QString::fromStdString(r.chart[i].matchId));
    }
    // The axis spans every drawn number.
    const auto reading = model::readChart(r);
    QVERIFY(view.chart()->axisLow() <= reading.low);
    QVERIFY(view.chart()->axisHigh() >= reading.high);
    QVERIFY(view.chartReadingText().contains(QStringLiteral("%1 of 5 matches beyond the limits on the better side")
                                                 .arg(reading.afterOnBetterSide)));
    QVERIFY(view.canRecordVerdict());
}

void FocusViewTest::linkAndUnlink() {
    FocusView view;
    const auto linkedTester = watch(view.linked());
    const auto resultsTester = watch(view.drillResults());
    view.setToday(kToday);
    view.setSession(&m_session);
    QVERIFY(view.select(m_focusId));
    const int before = view.linked()->rowCount();
    view.setDrillQuery(QStringLiteral("closing the pass lane"));
    QCOMPARE(view.drillResults()->rowCount(), 1);
    const qint64 drill = view.drillResults()->idAt(0);
    QVERIFY(view.linkDrill(drill));
    auto f = model::FocusStore(*m_reference).get(m_focusId);
    QVERIFY(std::find(f->drills.begin(), f->drills.end(), drill) != f->drills.end());
    QCOMPARE(view.linked()->rowCount(), before + 1);
    QCOMPARE(view.drillResults()->indexOf(drill), -1);

    QVERIFY(view.unlinkDrill(drill));
    f = model::FocusStore(*m_reference).get(m_focusId);
    QVERIFY(std::find(f->drills.begin(), f->drills.end(), drill) == f->drills.end());
    QCOMPARE(view.linked()->rowCount(), before);
    QVERIFY(!view.unlinkDrill(drill)); // not linked any more
    QVERIFY(!view.linkDrill(999));     // no such drill
}

void FocusViewTest::verdictClosesTheFocus() {
    FocusView view;
    const auto listTester = watch(view.focuses());
    const auto chartTester = watch(view.chart());
    view.setToday(kToday);
    view.setSession(&m_session);
    QVERIFY(view.select(m_focusId));
    const QString numbersBefore = view.beforeText();

    view.setVerdictNote(QStringLiteral("the left side holds now ✓"));
    QVERIFY(!view.recordVerdict()); // no verdict chosen, nobody named
    QVERIFY(view.verdictProblem().contains(QStringLiteral("Choose a verdict.")));
    QVERIFY(view.verdictProblem().contains(QStringLiteral("Say who records the verdict.")));
    QCOMPARE(view.verdictNote(), QStringLiteral("the left side holds now ✓"));
    QVERIFY(model::FocusStore(*m_reference).get(m_focusId)->closedAt.empty());

    view.setVerdictChoice(1); // partly
    view.setVerdictBy(QStringLiteral("D. Arkwright"));
    QVERIFY(view.recordVerdict());
    const auto f = model::FocusStore(*m_reference).get(m_focusId);
    QVERIFY(!f->closedAt.empty());
    QCOMPARE(f->verdict, std::string("partly"));
    QCOMPARE(f->verdictNote, std::string("the left side holds now ✓"));
    const auto stored = model::FocusStore(*m_reference).reviews(m_focusId);
    QCOMPARE(stored.size(), std::size_t{1});
    QCOMPARE(stored.back().by, std::string("D. Arkwright"));
    // The stored numbers are the review shown, training minutes included.
    const auto numbers = model::reviewFromJson(stored.back().numbers);
    QVERIFY(numbers);
    const auto metric = m_reference->metric(kMetric);
    const auto computed = model::computeReview(*f, *metric, m_reference->seasonTallies("First team", "2026-27"),
                                               m_reference->tallyGrid(), 5, 5);
    QCOMPARE(numbers->before.totalNum, computed.review->before.totalNum);
    QCOMPARE(numbers->after.totalNum, computed.review->after.totalNum);
    QCOMPARE(numbers->trainingMinutes.value_or(-1), 25.0);

    // Closed: shown as stored, no verdict form, drills fixed.
    QVERIFY(view.closed());
    QCOMPARE(view.phase(), static_cast<int>(FocusPhase::Closed));
    QCOMPARE(view.phaseText(), QStringLiteral("Closed · partly"));
    QCOMPARE(role(*view.focuses(), 0, "phase").toInt(), static_cast<int>(FocusPhase::Closed));
    QVERIFY(view.reviewSourceText().startsWith(QStringLiteral("As stored with the verdict")));
    QCOMPARE(view.beforeText(), numbersBefore);
    QVERIFY(!view.canRecordVerdict());
    QVERIFY(!view.recordVerdict());
    QVERIFY(!view.linkDrill(view.linked()->idAt(0)));
    QVERIFY(view.verdictNote().isEmpty()); // the form was cleared once recorded
}

void FocusViewTest::zoneTrendShowsTheFocus() {
    // The zone trend page lists the focuses its zone has had for its metric and marks on the
    // series the match where the training started and, once closed, the last one before.
    const auto f = storedFocus();
    QVERIFY(f);
    QVERIFY(!f->closedAt.empty()); // closed by the verdict test
    QVERIFY(!f->zones.empty());
    const model::Zone zone = f->zones.front();
    ZoneSeries trend;
    trend.setSession(&m_session);
    trend.select(QString::fromStdString(f->metric), zone.band, zone.lane);
    QVERIFY2(trend.errorString().isEmpty(), qPrintable(trend.errorString()));
    QCOMPARE(trend.focusLines().size(), 1);
    const QString line = trend.focusLines().front();
    QVERIFY2(line.startsWith(QStringLiteral("F1 · focus #%1 after %2").arg(f->id).arg(QString::fromStdString(f->openedAfterMatch))),
             qPrintable(line));
    QVERIFY2(line.contains(QStringLiteral("closed")), qPrintable(line));
    QCOMPARE(trend.focusSpans().size(), 1);
    const QVariantMap span = trend.focusSpans().front().toMap();
    // The first match on or after the start date, counted in the season's matches.
    const auto season = m_reference->seasonTallies(f->squad, f->season);
    int expectedStart = -1;
    for (std::size_t i = 0; i < season.dates.size() && expectedStart < 0; ++i)
        if (season.dates[i] >= f->startDate) expectedStart = static_cast<int>(i);
    QCOMPARE(span.value(QStringLiteral("startRow")).toInt(), expectedStart);
    QVERIFY(span.value(QStringLiteral("closed")).toBool());
    QVERIFY(span.value(QStringLiteral("endRow")).toInt() >= expectedStart - 1);

    // Another zone, or another metric in the same zone, had no focus.
    trend.select(QString::fromStdString(f->metric), zone.band, zone.lane == 1 ? 2 : 1);
    QVERIFY(trend.focusLines().isEmpty());
    QVERIFY(trend.focusSpans().isEmpty());
    trend.select(QString::fromStdString(f->metric == "regain_5s" ? "press_rate" : "regain_5s"), zone.band, zone.lane);
    QVERIFY(trend.focusLines().isEmpty());
}

void FocusViewTest::emptyClub() {
    ClubSession empty;
    QVERIFY(empty.open(m_dir.filePath(QStringLiteral("empty.sqlite"))));
    FocusView view;
    const auto listTester = watch(view.focuses());
    view.setSession(&empty);
    QVERIFY(view.errorString().isEmpty());
    QCOMPARE(view.focuses()->rowCount(), 0);
    QVERIFY(!view.hasMatches());
    QCOMPARE(view.listText(), QStringLiteral("No focuses yet."));
    view.beginDraft();
    QVERIFY(!view.drafting());
    QVERIFY(view.statusText().contains(QStringLiteral("load matches")));
    QVERIFY(!view.confirmDraft());
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<FocusViewTest>(argc, argv, "focus_view_tests");
}

#include "focus_view_test.moc"
