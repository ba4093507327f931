// Tests of the import page's controller: match files loaded on the worker thread into a club
// file on disk, checked afterwards through a separate model::ClubRepository on the same file.
// A good file is stored; a bad one fails with every problem naming its file, place and field,
// and nothing of it is stored; progress counts reach the total; a repeat is unchanged; a
// changed file is refused unless replacing; cancel stops after the current file. The results
// model runs under QAbstractItemModelTester throughout.
//
// Files: the demo season's matches (sample-club/matches), some altered here on purpose.

#include "clubsession.h"
#include "importresultmodel.h"
#include "importview.h"
#include "ingest.h"
#include "profilestore.h"
#include "repository.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QDir>
#include <QFileInfo>
#include <QFile>
#include <QGuiApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QLocale>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QUrl>
#include <QtQml/qqmlextensionplugin.h>

#include <algorithm>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);

QString demoMatch(int n) {
    return QStringLiteral("%1/sample-club/matches/KB-2026-%2.json").arg(kSource).arg(n, 2, 10, QLatin1Char('0'));
}

QJsonObject readJson(const QString& path) {
    QFile f(path);
    if (!f.open(QIODevice::ReadOnly)) return {};
    return QJsonDocument::fromJson(f.readAll()).object();
}

bool writeJson(const QString& path, const QJsonObject& o) {
    QFile f(path);
    return f.open(QIODevice::WriteOnly) && f.write(QJsonDocument(o).toJson()) > 0;
}

/// A demo match with two events spoilt: events[5].side "them" and events[9].t negative.
QJsonObject spoilt(int n) {
    QJsonObject match = readJson(demoMatch(n));
    QJsonArray events = match.value(QStringLiteral("events")).toArray();
    QJsonObject e5 = events[5].toObject();
    e5[QStringLiteral("side")] = QStringLiteral("them");
    events[5] = e5;
    QJsonObject e9 = events[9].toObject();
    e9[QStringLiteral("t")] = -3;
    events[9] = e9;
    match[QStringLiteral("events")] = events;
    return match;
}

std::vector<std::string> storedIds(const QString& file) {
    model::ClubRepository repo(file.toStdString());
    std::vector<std::string> ids;
    for (const auto& m : repo.matches()) ids.push_back(m.id);
    return ids;
}

bool has(const std::vector<std::string>& ids, const std::string& id) {
    return std::find(ids.begin(), ids.end(), id) != ids.end();
}

} // namespace

class ImportViewTest : public QObject {
    Q_OBJECT

private slots:
    void init();
    void cleanup();
    void goodAndBadFile();
    void progressReachesTotal();
    void repeatIsUnchanged();
    void changedFileRefusedUnlessReplacing();
    void cancelStopsAfterCurrentFile();
    void foldersExpandToTheirMatchFiles();
    void refusesWithoutAFileOnDisk();
    void tableLoadsWithTheSavedLayout();

private:
    /// Starts a load and waits until it has finished.
    void loadAndWait(const QStringList& paths);

    std::unique_ptr<QTemporaryDir> m_dir;
    QString m_file;
    std::unique_ptr<ClubSession> m_session;
    std::unique_ptr<ImportView> m_view;
    std::unique_ptr<QAbstractItemModelTester> m_tester;
};

void ImportViewTest::init() {
    m_dir = std::make_unique<QTemporaryDir>();
    QVERIFY(m_dir->isValid());
    m_file = m_dir->filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(m_file.toStdString());
        for (int n : {1, 2}) QVERIFY(model::ingestFile(repo, demoMatch(n).toStdString()).ok());
    }
    m_session = std::make_unique<ClubSession>();
    QVERIFY(m_session->open(m_file));
    m_view = std::make_unique<ImportView>();
    m_tester = std::make_unique<QAbstractItemModelTester>(
        m_view->results(), QAbstractItemModelTester::FailureReportingMode::QtTest);
    m_view->setSession(m_session.get());
    QVERIFY(m_view->canLoad());
}

void ImportViewTest::cleanup() {
    m_tester.reset();
    m_view.reset();
    m_session.reset();
    m_dir.reset();
}

void ImportViewTest::loadAndWait(const QStringList& paths) {
    QSignalSpy finished(m_view.get(), &ImportView::finished);
    QVERIFY2(m_view->loadPaths(paths), qPrintable(m_view->summaryText()));
    QVERIFY(m_view->running());
    QVERIFY(finished.wait(60000));
    QVERIFY(!m_view->running());
}

void ImportViewTest::goodAndBadFile() {
    const QString bad = m_dir->filePath(QStringLiteral("bad.json"));
    QVERIFY(writeJson(bad, spoilt(4)));
    QSignalSpy reloaded(m_session.get(), &ClubSession::opened);
    loadAndWait({demoMatch(3), bad});

    const ImportResultModel& results = *m_view->results();
    QCOMPARE(results.count(), 2);
    const ImportResult& good = results.rows()[0];
    QCOMPARE(good.outcome, ImportResult::Stored);
    QCOMPARE(good.matchId, QStringLiteral("KB-2026-03"));
    QVERIFY(good.problems.isEmpty());

    // Every problem of the bad file names the file, the place and the field, in the model's
    // words (model::Problem::describe).
    const ImportResult& failed = results.rows()[1];
    QCOMPARE(failed.outcome, ImportResult::Failed);
    QCOMPARE(failed.fileName, QStringLiteral("bad.json"));
    QCOMPARE(failed.problems.size(), 2);
    QVERIFY2(failed.problems[0].startsWith(QStringLiteral("bad.json: events[5].side: ")), qPrintable(failed.problems[0]));
    QVERIFY2(failed.problems[0].contains(QStringLiteral("'them'")), qPrintable(failed.problems[0]));
    QVERIFY2(failed.problems[1].startsWith(QStringLiteral("bad.json: events[9].t: ")), qPrintable(failed.problems[1]));
    QVERIFY(m_view->hasFailures());
    QVERIFY(m_view->summaryText().contains(QStringLiteral("1 stored")));
    QVERIFY(m_view->summaryText().contains(QStringLiteral("1 failed")));
    // The same through the model's roles QML reads.
    const QModelIndex row1 = results.index(1);
    QCOMPARE(results.data(row1, ImportResultModel::OutcomeTextRole).toString(), QStringLiteral("Failed"));
    QCOMPARE(results.data(row1, ImportResultModel::ProblemTextRole).toString(), failed.problems.join(QLatin1Char('\n')));

    // Read back through another connection: the good match is there, nothing of the bad one.
    const auto ids = storedIds(m_file);
    QCOMPARE(ids.size(), std::size_t(3));
    QVERIFY(has(ids, "KB-2026-03"));
    QVERIFY(!has(ids, "KB-2026-04"));
    model::ClubRepository check(m_file.toStdString());
    QVERIFY(!check.sourceOf("KB-2026-04").has_value());
    QVERIFY(check.tallies(std::string("KB-2026-04")).empty());

    // The session was reloaded: every page sees the new match; the newest stored is offered.
    QVERIFY(reloaded.count() >= 1);
    QCOMPARE(m_session->matchCount(), 3);
    QCOMPARE(m_view->latestMatchId(), QStringLiteral("KB-2026-03"));
}

void ImportViewTest::progressReachesTotal() {
    QList<QPair<int, int>> seen;
    const auto watch = connect(m_view.get(), &ImportView::progressChanged, this,
                               [&] { seen << qMakePair(m_view->done(), m_view->total()); });
    loadAndWait({demoMatch(3), demoMatch(4), demoMatch(5), demoMatch(6)});
    disconnect(watch);
    QVERIFY(!seen.isEmpty());
    int last = 0;
    for (const auto& [done, total] : seen) {
        QCOMPARE(total, 4);
        QVERIFY(done >= last); // never goes back
        last = done;
    }
    QCOMPARE(last, 4);
    QCOMPARE(m_view->done(), 4);
    QCOMPARE(m_view->progress(), 1.0);
    QCOMPARE(m_view->results()->countOf(ImportResult::Stored), 4);
    QCOMPARE(m_view->latestMatchId(), QStringLiteral("KB-2026-06")); // the newest by date
    QCOMPARE(storedIds(m_file).size(), std::size_t(6));
}

void ImportViewTest::repeatIsUnchanged() {
    QSignalSpy reloaded(m_session.get(), &ClubSession::opened);
    loadAndWait({demoMatch(1)});
    QCOMPARE(m_view->results()->count(), 1);
    QCOMPARE(m_view->results()->rows()[0].outcome, ImportResult::Unchanged);
    QCOMPARE(m_view->results()->rows()[0].matchId, QStringLiteral("KB-2026-01"));
    QVERIFY(m_view->latestMatchId().isEmpty()); // nothing new stored
    QCOMPARE(reloaded.count(), 0);              // and nothing to reload
    QCOMPARE(storedIds(m_file).size(), std::size_t(2));
}

void ImportViewTest::changedFileRefusedUnlessReplacing() {
    // KB-2026-01 again with a different score: the same match id, different content.
    QJsonObject changed = readJson(demoMatch(1));
    QJsonObject match = changed.value(QStringLiteral("match")).toObject();
    match[QStringLiteral("competition")] = QStringLiteral("Friendly");
    changed[QStringLiteral("match")] = match;
    const QString path = m_dir->filePath(QStringLiteral("KB-2026-01-edited.json"));
    QVERIFY(writeJson(path, changed));

    loadAndWait({path});
    const ImportResult& refused = m_view->results()->rows()[0];
    QCOMPARE(refused.outcome, ImportResult::Failed);
    QCOMPARE(refused.problems.size(), 1);
    QVERIFY2(refused.problems[0].startsWith(QStringLiteral("KB-2026-01-edited.json: match.id: ")),
             qPrintable(refused.problems[0]));
    QCOMPARE(model::ClubRepository(m_file.toStdString()).matchSummary("KB-2026-01")->competition,
             std::string("League"));

    m_view->setReplace(true);
    loadAndWait({path});
    QCOMPARE(m_view->results()->rows()[0].outcome, ImportResult::Replaced);
    QCOMPARE(model::ClubRepository(m_file.toStdString()).matchSummary("KB-2026-01")->competition,
             std::string("Friendly"));
}

void ImportViewTest::cancelStopsAfterCurrentFile() {
    // Cancel as soon as the first file is through: the worker finishes at most the file it has
    // begun, and the rest are listed as not loaded and stay out of the club file.
    connect(m_view.get(), &ImportView::progressChanged, this, [this] {
        if (m_view->done() == 1) m_view->cancel();
    });
    QStringList paths;
    for (int n = 3; n <= 10; ++n) paths << demoMatch(n);
    loadAndWait(paths);
    const ImportResultModel& results = *m_view->results();
    QCOMPARE(results.count(), 8);
    const int done = m_view->done();
    QVERIFY2(done >= 1 && done <= 2, qPrintable(QString::number(done)));
    QCOMPARE(results.countOf(ImportResult::Stored), done);
    QCOMPARE(results.countOf(ImportResult::NotLoaded), 8 - done);
    QVERIFY(m_view->summaryText().startsWith(QStringLiteral("Cancelled after")));
    const auto ids = storedIds(m_file);
    QCOMPARE(ids.size(), std::size_t(2 + done));
    for (const ImportResult& r : results.rows())
        if (r.outcome == ImportResult::NotLoaded)
            QVERIFY(!has(ids, QFileInfo(r.path).completeBaseName().toStdString()));
}

void ImportViewTest::foldersExpandToTheirMatchFiles() {
    QDir dir(m_dir->path());
    QVERIFY(dir.mkpath(QStringLiteral("season/late")));
    for (const char* name : {"season/b.json", "season/a.json", "season/notes.txt", "season/late/c.json"}) {
        QFile f(dir.filePath(QString::fromLatin1(name)));
        QVERIFY(f.open(QIODevice::WriteOnly));
    }
    const QString season = dir.filePath(QStringLiteral("season"));
    QCOMPARE(ImportView::expandPaths({season}),
             QStringList({season + QStringLiteral("/a.json"), season + QStringLiteral("/b.json"),
                          season + QStringLiteral("/late/c.json")}));
    // Urls of a drop work the same; an empty folder starts nothing and says why.
    QVERIFY(dir.mkpath(QStringLiteral("empty")));
    QVERIFY(!m_view->loadUrls({QUrl::fromLocalFile(dir.filePath(QStringLiteral("empty")))}));
    QVERIFY(m_view->summaryText().contains(QStringLiteral("No match files")));
    QVERIFY(!m_view->running());
}

void ImportViewTest::refusesWithoutAFileOnDisk() {
    ClubSession memory;
    QVERIFY(memory.adopt(std::make_unique<model::ClubRepository>(":memory:"), QStringLiteral(":memory:")));
    ImportView view;
    view.setSession(&memory);
    QVERIFY(!view.canLoad());
    QVERIFY(!view.loadPaths({demoMatch(3)}));
    QVERIFY(!view.running());
    QVERIFY(!view.summaryText().isEmpty());
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<ImportViewTest>(argc, argv, "import_view_tests");
}

#include "import_view_test.moc"

void ImportViewTest::tableLoadsWithTheSavedLayout() {
    // The analyst-sheet layout (sample-club/import/) saved through the page; a table in it is
    // dropped with no profile to pick, and a table in no saved layout says what to do.
    const QString broken = m_dir->filePath(QStringLiteral("broken.json"));
    {
        QFile f(broken);
        QVERIFY(f.open(QIODevice::WriteOnly));
        f.write(R"({"format": "pitchloop-profile", "version": 1, "colums": {}})");
    }
    QVERIFY(!m_view->saveLayout(QUrl::fromLocalFile(broken)));
    QVERIFY2(m_view->summaryText().contains(QStringLiteral("colums")), qPrintable(m_view->summaryText()));
    QVERIFY(m_view->saveLayout(QUrl::fromLocalFile(
        QStringLiteral(PITCHLOOP_SOURCE_DIR) + QStringLiteral("/sample-club/import/analyst-sheet.json"))));
    QVERIFY(m_view->summaryText().contains(QStringLiteral("Saved the table layout")));
    {
        model::ClubRepository repo(m_file.toStdString());
        QCOMPARE(model::ProfileStore(repo).list().size(), std::size_t(1));
    }
    const QString table = m_dir->filePath(QStringLiteral("KB-T-01_2026-08-08_home_Nettleby Town.csv"));
    {
        QFile f(table);
        QVERIFY(f.open(QIODevice::WriteOnly));
        f.write("Half;Clock;Team;Shirt;Action;Outcome;PosX;PosY;EndX;EndY;Labels\n"
                "1st half;00:01,0;Kestrel Bay;9;Pass;Complete;50;50;60;40;\n"
                "1st half;00:05,0;Nettleby Town;5;Ball won;Complete;32;72;;;\n");
    }
    const QString stranger = m_dir->filePath(QStringLiteral("notes.csv"));
    {
        QFile f(stranger);
        QVERIFY(f.open(QIODevice::WriteOnly));
        f.write("a,b\n1,2\n");
    }
    // The table in no saved layout goes to the mapping assistant instead of the load.
    QSignalSpy needed(m_view.get(), &ImportView::layoutNeeded);
    loadAndWait({table, stranger});
    QCOMPARE(needed.count(), 1);
    QCOMPARE(needed.front().front().toString(), stranger);
    const ImportResultModel& results = *m_view->results();
    QCOMPARE(results.count(), 1);
    const ImportResult& loaded = results.rows()[0];
    QCOMPARE(loaded.outcome, ImportResult::Stored);
    QCOMPARE(loaded.matchId, QStringLiteral("KB-T-01"));
    QVERIFY2(loaded.detail.contains(QStringLiteral("read with the saved layout “analyst sheet (semicolons")), qPrintable(loaded.detail));
    // Alone, it starts nothing and says where to map it.
    QVERIFY(!m_view->loadPaths({stranger}));
    QCOMPARE(needed.count(), 2);
    QVERIFY2(m_view->summaryText().contains(QStringLiteral("layout not saved yet")), qPrintable(m_view->summaryText()));
    // The saved layouts are listed; a copy reads as itself; removing leaves loaded matches.
    QCOMPARE(m_view->layouts().size(), 1);
    const QString copy = m_view->duplicateLayout(m_view->layouts().front().toMap().value(QStringLiteral("name")).toString());
    QVERIFY(copy.endsWith(QStringLiteral("(copy)")));
    QCOMPARE(m_view->layouts().size(), 2);
    QVERIFY(m_view->removeLayout(copy));
    QCOMPARE(m_view->layouts().size(), 1);
    QVERIFY(has(storedIds(m_file), "KB-T-01"));
}
