// Tests of the mapping assistant's controller (app/desktop/layoutassistant) as a person uses it
// on the invented table sample-club/import/"2026-08-08 Nettleby Town.csv" (the demo's first
// match written by hand-chosen rules: semicolons, decimal comma, clock per period, team names,
// 0–100 with the origin top-left and y down, words of its own): the guesses, the words left
// to map, the checks, saving the layout and loading the file with it. The stored match must
// have the very tallies of the native file KB-2026-01.json — the outside truth here is the
// native file itself, read by the match reader with no profile.

#include "clubsession.h"
#include "importview.h"
#include "ingest.h"
#include "layoutassistant.h"
#include "profilestore.h"
#include "repository.h"
#include "testmain.h"

#include <QFile>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

namespace {

const QString kTable = QStringLiteral(PITCHLOOP_SOURCE_DIR "/sample-club/import/2026-08-08 Nettleby Town.csv");

QVariantMap column(const LayoutAssistant& a, const QString& name) {
    for (const QVariant& c : a.columns())
        if (c.toMap().value(QStringLiteral("name")).toString() == name) return c.toMap();
    return {};
}

QStringList unmapped(const LayoutAssistant& a) {
    QStringList out;
    for (const QVariant& w : a.words())
        if (w.toMap().value(QStringLiteral("ours")).toString().isEmpty())
            out << w.toMap().value(QStringLiteral("word")).toString();
    return out;
}

} // namespace

class LayoutAssistantTest : public QObject {
    Q_OBJECT
private slots:
    void init();
    void cleanup();
    void guessesAndWordsLeftToMap();
    void finishedLayoutSavesAndLoadsToTheNativeTallies();
    void zoneLabelsInsteadOfPositions();
    void unreadableFileSaysSo();

private:
    std::unique_ptr<QTemporaryDir> m_dir;
    QString m_file;
    std::unique_ptr<ClubSession> m_session;
    std::unique_ptr<LayoutAssistant> m_assistant;
};

void LayoutAssistantTest::init() {
    m_dir = std::make_unique<QTemporaryDir>();
    QVERIFY(m_dir->isValid());
    m_file = m_dir->filePath(QStringLiteral("club.sqlite"));
    {
        // One native match names the club (Kestrel Bay), so "us" can be guessed.
        model::ClubRepository repo(m_file.toStdString());
        QVERIFY(model::ingestFile(repo, PITCHLOOP_SOURCE_DIR "/sample-club/matches/KB-2026-02.json").ok());
    }
    m_session = std::make_unique<ClubSession>();
    QVERIFY(m_session->open(m_file));
    m_assistant = std::make_unique<LayoutAssistant>();
    m_assistant->setSession(m_session.get());
}

void LayoutAssistantTest::cleanup() {
    m_assistant.reset();
    m_session.reset();
    m_dir.reset();
}

void LayoutAssistantTest::guessesAndWordsLeftToMap() {
    LayoutAssistant& a = *m_assistant;
    QVERIFY(a.open(kTable));
    QVERIFY(a.active());
    QCOMPARE(a.delimiter(), QStringLiteral(";"));
    QVERIFY(a.header());
    QVERIFY(a.decimalComma());
    QVERIFY2(a.tableText().startsWith(QStringLiteral("1,709 rows · 10 columns")), qPrintable(a.tableText()));
    QCOMPARE(column(a, QStringLiteral("Match time")).value(QStringLiteral("role")).toString(), QStringLiteral("time"));
    QCOMPARE(column(a, QStringLiteral("Squad")).value(QStringLiteral("role")).toString(), QStringLiteral("side"));
    QCOMPARE(column(a, QStringLiteral("Loc X")).value(QStringLiteral("role")).toString(), QStringLiteral("x"));
    QCOMPARE(column(a, QStringLiteral("Target Y")).value(QStringLiteral("role")).toString(), QStringLiteral("to_y"));
    QCOMPARE(a.timeForm(), QStringLiteral("clock"));
    QCOMPARE(a.extentWidth(), 100.0);
    // The words that are not ours, most frequent first within their field.
    QCOMPARE(unmapped(a), QStringList({"Regain", "Dribble", "Success", "Failure", "Off target"}));
    QCOMPARE(a.unmappedCount(), 5);
    QVERIFY(!a.ready());
    QVERIFY(a.problems().join(QLatin1Char(' ')).contains(QStringLiteral("5 words of the table are not mapped yet")));
    // Missing details are asked for in the form's words, not the command line's.
    QVERIFY2(a.problems().join(QLatin1Char(' ')).contains(QStringLiteral("Match id is not given: fill it in below")),
             qPrintable(a.problems().join(QLatin1Char('\n'))));
    QVERIFY(!a.problems().join(QLatin1Char(' ')).contains(QStringLiteral("--")));
    // The preview already draws what maps.
    QVERIFY(!a.previewPoints().isEmpty());
    // A role moves: the shirt column as the player's is guessed; taking it away and back.
    a.setRole(QStringLiteral("Shirt"), QString());
    QVERIFY(column(a, QStringLiteral("Shirt")).value(QStringLiteral("role")).toString().isEmpty());
    QCOMPARE(column(a, QStringLiteral("Shirt")).value(QStringLiteral("roleIndex")).toInt(), 0);
    a.setRole(QStringLiteral("Shirt"), QStringLiteral("player"));
    QCOMPARE(column(a, QStringLiteral("Shirt")).value(QStringLiteral("role")).toString(), QStringLiteral("player"));
    // The ground frame: ends change each period, our first-half direction the person's choice.
    a.setFrame(QStringLiteral("ground"));
    QVERIFY(!a.firstHalfTowardsZero());
    QVERIFY(a.profileText().contains(QStringLiteral("\"2\": \"-x\"")));
    a.setFirstHalfTowardsZero(true);
    QVERIFY(a.firstHalfTowardsZero());
    QVERIFY(a.profileText().contains(QStringLiteral("\"1\": \"-x\"")));
    a.setFrame(QStringLiteral("acting"));
    // A save before the layout reads the file is refused.
    QVERIFY(!a.save());
    QVERIFY(a.savedText().contains(QStringLiteral("Not saved")));
}

void LayoutAssistantTest::finishedLayoutSavesAndLoadsToTheNativeTallies() {
    LayoutAssistant& a = *m_assistant;
    QVERIFY(a.open(QUrl::fromLocalFile(kTable).toString()));
    a.setWord(QStringLiteral("type"), QStringLiteral("Regain"), QStringLiteral("recovery"));
    a.setWord(QStringLiteral("type"), QStringLiteral("Dribble"), QStringLiteral("beat"));
    a.setWord(QStringLiteral("result"), QStringLiteral("Success"), QStringLiteral("ok"));
    a.setWord(QStringLiteral("result"), QStringLiteral("Failure"), QStringLiteral("lost"));
    a.setWord(QStringLiteral("result"), QStringLiteral("Off target"), QStringLiteral("wide"));
    QCOMPARE(a.unmappedCount(), 0);
    a.setOrigin(QStringLiteral("top-left"));
    QVERIFY(a.yDown());
    a.setMatchId(QStringLiteral("KB-T-01"));
    a.setMatchDate(QStringLiteral("2026-08-08"));
    a.setOpponent(QStringLiteral("Nettleby Town"));
    a.setVenue(QStringLiteral("home"));
    QVERIFY2(a.ready(), qPrintable(a.problems().join(QLatin1Char('\n'))));
    QVERIFY(a.matchText().startsWith(QStringLiteral("KB-T-01 · ")));
    a.setLayoutName(QStringLiteral("hand tagging"));
    QSignalSpy saved(&a, &LayoutAssistant::saved);
    QVERIFY2(a.save(), qPrintable(a.savedText()));
    QCOMPARE(saved.count(), 1);
    {
        model::ClubRepository repo(m_file.toStdString());
        const auto profile = model::ProfileStore(repo).get("hand tagging");
        QVERIFY(profile);
        QVERIFY(profile->text.find("\"beat\"") != std::string::npos); // our version 2 words
    }

    // The page loads the file with the details of the form.
    ImportView loader;
    loader.setSession(m_session.get());
    QSignalSpy finished(&loader, &ImportView::finished);
    QVERIFY(loader.loadWithDetails({saved.front().at(0).toString()}, saved.front().at(1).toMap()));
    QVERIFY(finished.wait(60000));
    QVERIFY2(!loader.hasFailures(), qPrintable(loader.summaryText()));

    // The same match natively, in a second club file: the tallies must be the same.
    const QString native = m_dir->filePath(QStringLiteral("native.sqlite"));
    model::ClubRepository nativeRepo(native.toStdString());
    QVERIFY(model::ingestFile(nativeRepo, PITCHLOOP_SOURCE_DIR "/sample-club/matches/KB-2026-01.json").ok());
    model::ClubRepository mapped(m_file.toStdString());
    const auto ours = mapped.tallies(std::string("KB-T-01"));
    const auto theirs = nativeRepo.tallies(std::string("KB-2026-01"));
    QVERIFY(!ours.empty());
    QCOMPARE(ours.size(), theirs.size());
    for (std::size_t i = 0; i < ours.size(); ++i) {
        QCOMPARE(ours[i].metricId, theirs[i].metricId);
        QCOMPARE(ours[i].band, theirs[i].band);
        QCOMPARE(ours[i].lane, theirs[i].lane);
        QCOMPARE(ours[i].num, theirs[i].num);
        QCOMPARE(ours[i].den, theirs[i].den);
    }
    // Now the layout is saved, a table with its columns is recognised on a plain drop (this
    // one then fails honestly: its name gives no match id, and the layout has no pattern).
    QSignalSpy needed(&loader, &ImportView::layoutNeeded);
    QVERIFY(loader.loadPaths({kTable}));
    QVERIFY(finished.wait(60000));
    QCOMPARE(needed.count(), 0);
    QVERIFY(loader.hasFailures());
}

void LayoutAssistantTest::zoneLabelsInsteadOfPositions() {
    // Invented hand tagging with zone labels and one label of the staff's own ("box").
    const QString path = m_dir->filePath(QStringLiteral("tags.csv"));
    {
        QFile f(path);
        QVERIFY(f.open(QIODevice::WriteOnly));
        f.write("Half,Secs,Side,Event,Outcome,Zone\n"
                "1,3,Kestrel Bay,pass,ok,B3-L2\n"
                "1,9,Saltmarsh,pass,ok,B5-L5\n"
                "1,20,Kestrel Bay,shot,wide,box\n");
    }
    LayoutAssistant& a = *m_assistant;
    QVERIFY(a.open(path));
    QCOMPARE(column(a, QStringLiteral("Zone")).value(QStringLiteral("role")).toString(), QStringLiteral("zone"));
    QVERIFY(a.byZone());
    QCOMPARE(a.zoneGrid(), QStringLiteral("equal:6x5"));
    QCOMPARE(a.zonePattern(), QStringLiteral("B{band}-L{lane}"));
    QCOMPARE(unmapped(a), QStringList({"box"}));
    // 6 × 5 zones to choose from, after "not mapped".
    QCOMPARE(a.wordChoices(QStringLiteral("zone")).size(), 31);
    a.setWord(QStringLiteral("zone"), QStringLiteral("box"), QStringLiteral("6,3"));
    a.setZoneGrid(QStringLiteral("no grid")); // refused: the grid stays
    QCOMPARE(a.zoneGrid(), QStringLiteral("equal:6x5"));
    a.setMatchId(QStringLiteral("KB-Z-01"));
    a.setMatchDate(QStringLiteral("2026-08-15"));
    a.setOpponent(QStringLiteral("Saltmarsh"));
    a.setVenue(QStringLiteral("away"));
    QVERIFY2(a.ready(), qPrintable(a.problems().join(QLatin1Char('\n'))));
    a.setLayoutName(QStringLiteral("zone tags"));
    QSignalSpy saved(&a, &LayoutAssistant::saved);
    QVERIFY2(a.save(), qPrintable(a.savedText()));
    ImportView loader;
    loader.setSession(m_session.get());
    QSignalSpy finished(&loader, &ImportView::finished);
    QVERIFY(loader.loadWithDetails({path}, saved.front().at(1).toMap()));
    QVERIFY(finished.wait(60000));
    QVERIFY2(!loader.hasFailures(), qPrintable(loader.summaryText()));
    model::ClubRepository repo(m_file.toStdString());
    const auto summary = repo.matchSummary("KB-Z-01");
    QVERIFY(summary);
    QCOMPARE(summary->zoneOnlyGrid, std::string("equal:6x5"));
}

void LayoutAssistantTest::unreadableFileSaysSo() {
    QVERIFY(!m_assistant->open(m_dir->filePath(QStringLiteral("no-such.csv"))));
    QVERIFY(!m_assistant->active());
    QVERIFY(m_assistant->problems().join(QLatin1Char(' ')).contains(QStringLiteral("cannot be read")));
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<LayoutAssistantTest>(argc, argv, "layout_assistant_tests");
}

#include "layout_assistant_test.moc"
