// Tests of the moments behind a zone on the zone page (MomentsView): the list under
// QAbstractItemModelTester, its rows against model::storedMoments, the judged window, the clip
// list written to a file and read back (the same bytes as model's writer), refused clip lists
// (a bad time, a window of several matches) that write nothing, and the page loading with the
// moments tab open without a QML warning.
//
// The club: the demo season's matches 1-8, ingested into a temporary club file.

#include "modelcheck.h"
#include "clubsession.h"
#include "ingest.h"
#include "moments.h"
#include "comparison.h"
#include "display.h"
#include "comparisonview.h"
#include "momentsview.h"
#include "zonemapmodel.h"
#include "squadlistview.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QFile>
#include <QQuickItem>
#include <QQuickView>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::role;
using pitchloop::desktop::testing::watch;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);
const QString kMetric = QStringLiteral("pre_shot_passes_against");

QString demoMatch(int n) {
    return QStringLiteral("%1/sample-club/matches/KB-2026-%2.json").arg(kSource).arg(n, 2, 10, QLatin1Char('0'));
}

QByteArray slurp(const QString& path) {
    QFile f(path);
    return f.open(QIODevice::ReadOnly) ? f.readAll() : QByteArray();
}

} // namespace

class MomentsViewTest : public QObject {
    Q_OBJECT

private slots:
    void init();
    void cleanup();
    void listsTheMatchesMoments();
    void judgedWindowAddsUp();
    void savesAClipList();
    void refusedClipListsWriteNothing();
    void zonePageShowsTheMoments();
    void squadListNamesAndPicks();
    void comparisonMapIsTheModels();

private:
    std::unique_ptr<QTemporaryDir> m_dir;
    QString m_file;
    std::unique_ptr<ClubSession> m_session;
    std::unique_ptr<MomentsView> m_view;
    std::vector<std::unique_ptr<QAbstractItemModelTester>> m_testers;
};

void MomentsViewTest::init() {
    m_dir = std::make_unique<QTemporaryDir>();
    QVERIFY(m_dir->isValid());
    m_file = m_dir->filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(m_file.toStdString());
        for (int n = 1; n <= 8; ++n) QVERIFY(model::ingestFile(repo, demoMatch(n).toStdString()).ok());
    }
    m_session = std::make_unique<ClubSession>();
    QVERIFY(m_session->open(m_file));
    m_view = std::make_unique<MomentsView>();
    m_testers.clear();
    m_testers.push_back(watch(m_view->moments()));
    m_view->setSession(m_session.get());
    m_view->setMetricId(kMetric);
    m_view->setBand(2);
    m_view->setLane(5);
    m_view->setMatchId(QStringLiteral("KB-2026-08"));
    QVERIFY2(m_view->errorString().isEmpty(), qPrintable(m_view->errorString()));
}

void MomentsViewTest::cleanup() {
    m_testers.clear();
    m_view.reset();
    m_session.reset();
    m_dir.reset();
}

void MomentsViewTest::listsTheMatchesMoments() {
    // The demo's slipped zone after match 8: their build-up ran through our left-back area 11
    // times in the match (the debrief's figure).
    auto* list = m_view->moments();
    QCOMPARE(list->count(), 11);
    QCOMPARE(m_view->summaryText(), QStringLiteral("11 moments in this match: 11 a match."));
    model::MomentsRequest request;
    request.matchId = "KB-2026-08";
    request.metricId = kMetric.toStdString();
    request.zone = model::Zone{2, 5};
    const auto expected = model::storedMoments(*m_session->repository(), request);
    QCOMPARE(static_cast<std::size_t>(list->count()), expected.moments.size());
    for (int row = 0; row < list->count(); ++row) {
        const auto& m = expected.moments[static_cast<std::size_t>(row)];
        QCOMPARE(role(*list, row, "what").toString(), QString::fromStdString(m.what));
        QCOMPARE(role(*list, row, "counts").toInt(), static_cast<int>(model::MomentCount::Success));
        // Drawing metres: 2.5 m of margin, y turned so that our left touchline is at the top.
        QCOMPARE(role(*list, row, "fromX").toDouble(), 2.5 + m.from.x);
        QCOMPARE(role(*list, row, "fromY").toDouble(), 2.5 + expected.matches.back().pitch.widthM - m.from.y);
    }
    QCOMPARE(role(*list, 6, "clockText").toString(), QStringLiteral("2nd 28:00 (73:00)"));
    QVERIFY(m_view->canSaveClips());
}

void MomentsViewTest::judgedWindowAddsUp() {
    m_view->setJudgedWindow(true);
    // 34 over the last five matches: 6.8 a match, as the debrief says.
    QCOMPARE(m_view->moments()->count(), 34);
    QCOMPARE(m_view->summaryText(), QStringLiteral("34 moments in the last 5 matches: 6.8 a match."));
    QCOMPARE(role(*m_view->moments(), 0, "matchId").toString(), QStringLiteral("KB-2026-04"));
    QVERIFY(!m_view->canSaveClips()); // a clip list is one video
    QVERIFY(!m_view->saveClips(QUrl::fromLocalFile(m_dir->filePath(QStringLiteral("x.vtt"))), QStringLiteral("vtt")));
    QVERIFY(!QFile::exists(m_dir->filePath(QStringLiteral("x.vtt"))));
    // A share: regains in the centre of their half, with yes and no.
    m_view->setJudgedWindow(false);
    m_view->setMetricId(QStringLiteral("regain_5s"));
    m_view->setBand(4);
    m_view->setLane(3);
    QCOMPARE(m_view->summaryText(), QStringLiteral("6 moments in this match: 1 of 6 counted as yes, 16.7%."));
}

void MomentsViewTest::savesAClipList() {
    m_view->setProperty("leadIn", 10.0);
    m_view->setProperty("secondHalfStart", QStringLiteral("47:30"));
    const QString path = m_dir->filePath(QStringLiteral("clips.vtt"));
    QVERIFY2(m_view->saveClips(QUrl::fromLocalFile(path), QStringLiteral("vtt")), qPrintable(m_view->exportMessage()));
    QVERIFY(m_view->exportMessage().startsWith(QStringLiteral("Wrote ")));
    QVERIFY(!m_view->exportFailed());
    // The bytes model's writer gives for the same moments and video clock.
    model::MomentsRequest request;
    request.matchId = "KB-2026-08";
    request.metricId = kMetric.toStdString();
    request.zone = model::Zone{2, 5};
    const auto found = model::storedMoments(*m_session->repository(), request);
    const auto match = m_session->repository()->loadMatch("KB-2026-08");
    model::VideoClock clock;
    clock.leadInS = 10;
    clock.periodStartS[2] = 47 * 60 + 30;
    const auto clips = model::clipsOf(match->info, found.moments, clock);
    const std::string expected = model::clipsWebVtt(match->info, found.moments, clips,
                                                    "Their passes before their shots · our left-back area (B2·L5)");
    QCOMPARE(slurp(path), QByteArray::fromStdString(expected));
    const QString csvPath = m_dir->filePath(QStringLiteral("clips.csv"));
    QVERIFY(m_view->saveClips(QUrl::fromLocalFile(csvPath), QStringLiteral("csv")));
    QCOMPARE(slurp(csvPath), QByteArray::fromStdString(model::clipsCsv(match->info, found.moments, clips)));
    // The video clock is remembered for the match: a new view shows it.
    MomentsView again;
    again.setSession(m_session.get());
    again.setMetricId(kMetric);
    again.setMatchId(QStringLiteral("KB-2026-08"));
    QCOMPARE(again.property("secondHalfStart").toString(), QStringLiteral("47:30"));
}

void MomentsViewTest::refusedClipListsWriteNothing() {
    const QString path = m_dir->filePath(QStringLiteral("clips.vtt"));
    m_view->setProperty("secondHalfStart", QStringLiteral("47 min"));
    QVERIFY(!m_view->saveClips(QUrl::fromLocalFile(path), QStringLiteral("vtt")));
    QVERIFY(m_view->exportFailed());
    QCOMPARE(m_view->exportMessage(),
             QStringLiteral("2nd half starts at “47 min”: write the time in the video as mm:ss or hh:mm:ss, e.g. 47:30."));
    m_view->setProperty("secondHalfStart", QString());
    m_view->setProperty("leadOut", -1.0);
    QVERIFY(!m_view->saveClips(QUrl::fromLocalFile(path), QStringLiteral("vtt")));
    QCOMPARE(m_view->exportMessage(), QStringLiteral("Seconds before and after: 0 to 600 each."));
    QVERIFY(!QFile::exists(path));
}

void MomentsViewTest::zonePageShowsTheMoments() {
    QQuickView window;
    pitchloop::desktop::testing::loadPage(window, m_session.get(), "ZonePage");
    QCOMPARE(window.status(), QQuickView::Ready);
    window.show();
    QVERIFY(QMetaObject::invokeMethod(window.rootObject(), "showMoments", Q_ARG(QString, kMetric), Q_ARG(int, 2),
                                      Q_ARG(int, 5), Q_ARG(QString, QStringLiteral("KB-2026-08"))));
    auto* tabs = window.rootObject()->findChild<QObject*>(QStringLiteral("zoneLowerTabs"));
    QVERIFY(tabs);
    QCOMPARE(tabs->property("currentIndex").toInt(), 1);
    auto* list = window.rootObject()->findChild<QQuickItem*>(QStringLiteral("momentsList"));
    QVERIFY(list);
    QTRY_VERIFY(list->isVisible());
    QTRY_COMPARE(list->property("count").toInt(), 11);
    auto* summary = window.rootObject()->findChild<QObject*>(QStringLiteral("momentsSummary"));
    QCOMPARE(summary->property("text").toString(), QStringLiteral("11 moments in this match: 11 a match."));
    QCOMPARE(WarningCounter::count(), 0);
}

void MomentsViewTest::squadListNamesAndPicks() {
    SquadListView squad;
    squad.setSession(m_session.get());
    QCOMPARE(squad.squad(), QStringLiteral("First team"));
    QVERIFY(squad.players().isEmpty());
    // A bad player is refused and nothing is saved.
    QVERIFY(!squad.savePlayer(QStringLiteral("3"), QStringLiteral("N. Colterham"), QStringLiteral("XB")));
    QVERIFY(squad.failed());
    QVERIFY(squad.message().startsWith(QStringLiteral("position: 'XB' is not a position")));
    QVERIFY(m_session->repository()->squadList("First team").empty());
    // The demo's file, then one change typed in.
    QVERIFY2(squad.importFile(QUrl::fromLocalFile(kSource + QStringLiteral("/sample-club/squad.csv"))), qPrintable(squad.message()));
    QCOMPARE(squad.players().size(), 23);
    QVERIFY(squad.savePlayer(QStringLiteral("3"), QStringLiteral("N. Colterham"), QStringLiteral("lwb")));
    QCOMPARE(m_session->repository()->squadList("First team")[2].position, std::string("LWB"));
    QVERIFY(squad.removePlayer(QStringLiteral("23")));
    QCOMPARE(squad.players().size(), 22);

    // The moments view offers everyone, our units and our players, and names our players.
    m_view->setMetricId(QStringLiteral("regain_5s"));
    m_view->setBand(4);
    m_view->setLane(3);
    QCOMPARE(m_view->filterChoices().size(), 1 + 7 + 22);
    QVERIFY(role(*m_view->moments(), 0, "playersText").toString().startsWith(QStringLiteral("Ours: 6 L. Farrant")));
    // All six of these losses involve a midfielder (6 L. Farrant, 8 P. Hollin or 10 A. Brisco);
    // none a left-sided player.
    m_view->setFilter(QStringLiteral("unit:midfield"));
    QCOMPARE(m_view->moments()->count(), 6);
    QVERIFY(m_view->summaryText().contains(QStringLiteral("Shown: the 6 that involve our midfield.")));
    m_view->setFilter(QStringLiteral("unit:left_side"));
    QCOMPARE(m_view->moments()->count(), 0);
    m_view->setFilter(QStringLiteral("player:10"));
    QCOMPARE(m_view->moments()->count(), 2); // the two losses that 10 A. Brisco took part in
}

void MomentsViewTest::comparisonMapIsTheModels() {
    ComparisonView view;
    const auto tester = watch(view.map());
    view.setSession(m_session.get());
    view.setMetricId(kMetric);
    view.setMatchId(QStringLiteral("KB-2026-08"));
    view.setSplit(QStringLiteral("date:2026-09-01"));
    QVERIFY2(view.errorString().isEmpty(), qPrintable(view.errorString()));
    QCOMPARE(view.map()->count(), 30);
    // The same numbers as model::compareSplit on the same season.
    auto& repo = *m_session->repository();
    const auto tallies = repo.seasonTallies("First team", "2026-27");
    std::vector<model::MatchSummary> summaries = repo.matches();
    const model::MetricSpec metric = *repo.metric(kMetric.toStdString());
    const auto expected = model::compareSplit(tallies, summaries, metric, repo.tallyGrid(),
                                              *model::parseSplit("date:2026-09-01"), repo.flagSettings());
    QVERIFY(expected.problem.empty());
    const auto& left = expected.zones[static_cast<std::size_t>(model::ZoneGrid{}.indexOf({2, 5}))];
    QCOMPARE(view.map()->zone(2, 5).value(QStringLiteral("value")).toDouble(), left.difference);
    // Both sides one hover away.
    QCOMPARE(view.map()->zone(2, 5).value(QStringLiteral("rawText")).toString(),
             QStringLiteral("before 2026-09-01 %1 · from 2026-09-01 %2")
                 .arg(valueText(metric.kind(), left.first.pooled), valueText(metric.kind(), left.second.pooled)));
    QVERIFY(view.summaryText().startsWith(QStringLiteral("Their passes before their shots: from 2026-09-01")));
    QCOMPARE(view.strongest().size(), 4);
    // A split with an empty side says so and draws nothing.
    view.setSplit(QStringLiteral("opponent:Nobody FC"));
    QCOMPARE(view.summaryText(), QStringLiteral("No match is Nobody FC in this season"));
    QCOMPARE(view.map()->count(), 0);
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<MomentsViewTest>(argc, argv, "moments_view_tests");
}

#include "moments_view_test.moc"
