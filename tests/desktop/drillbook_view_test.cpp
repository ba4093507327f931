// Tests of the drill book page's controller: its list model under QAbstractItemModelTester while
// filters fill and refill it, each filter against model::DrillBook's own search, and every
// action (add, edit, delete, restore, undo, an earlier version) written to a temporary club
// file and read back through model/ on a second connection. A refused save leaves the form's
// text and the book as they were.
//
// The club: an empty club file with the demo club's drill book (sample-club/drills.json).

#include "modelcheck.h"
#include "clubsession.h"
#include "drillbookview.h"
#include "drillbrowse.h"
#include "drillform.h"
#include "drilllistmodel.h"
#include "repository.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QFile>
#include <QGuiApplication>
#include <QLocale>
#include <QQuickStyle>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <algorithm>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::watch;
using pitchloop::desktop::testing::role;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);

/// The ids a list model shows, in order.
std::vector<std::int64_t> shownIds(const DrillListModel& m) {
    std::vector<std::int64_t> out;
    for (int i = 0; i < m.rowCount(); ++i) out.push_back(m.idAt(i));
    return out;
}

std::vector<std::int64_t> idsOf(const std::vector<model::Drill>& drills) {
    std::vector<std::int64_t> out;
    for (const auto& d : drills) out.push_back(d.id);
    return out;
}

} // namespace

class DrillBookViewTest : public QObject {
    Q_OBJECT

private slots:
    void initTestCase();
    void listAndFilters();
    void addEditAndUndo();
    void deleteRestoreAndUndo();
    void refusedSaveKeepsTheForm();
    void earlierVersionBackInTheForm();
    void emptyClub();

private:
    /// The drill book as a second program sees it.
    model::DrillBook reference() { return model::DrillBook(*m_reference); }

    QTemporaryDir m_dir;
    QString m_file;
    std::unique_ptr<model::ClubRepository> m_reference;
    ClubSession m_session;
};

void DrillBookViewTest::initTestCase() {
    QVERIFY(m_dir.isValid());
    m_file = m_dir.filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(m_file.toStdString());
        model::DrillBook book(repo);
        QFile file(kSource + QStringLiteral("/sample-club/drills.json"));
        QVERIFY(file.open(QIODevice::ReadOnly));
        const auto parsed = model::parseDrillFile(file.readAll().toStdString(), "drills.json",
                                                  book.metrics(), book.grid());
        QVERIFY(parsed.errors.empty());
        const auto imported = book.importDrills(parsed.drills, "2026-07-20T10:00:00Z");
        QVERIFY(imported.errors.empty());
        QVERIFY(imported.added.size() >= 8);
    }
    QVERIFY(m_session.open(m_file));
    m_reference = std::make_unique<model::ClubRepository>(m_file.toStdString());
}

void DrillBookViewTest::listAndFilters() {
    DrillBookView view;
    const auto listTester = watch(view.drills());
    const auto versionTester = watch(view.versions());
    view.setSession(&m_session);
    QVERIFY(view.errorString().isEmpty());
    const auto all = reference().list();
    QCOMPARE(view.drills()->rowCount(), static_cast<int>(all.size()));
    QCOMPARE(shownIds(*view.drills()), idsOf(all));
    QCOMPARE(view.resultText(), QStringLiteral("%1 drills").arg(all.size()));
    // The first drill's roles, from its stored fields.
    const model::Drill& first = all.front();
    QCOMPARE(role(*view.drills(), 0, "title").toString(), QString::fromStdString(first.title));
    QCOMPARE(role(*view.drills(), 0, "minutesText").toString(), QStringLiteral("%1 min").arg(first.durationMin));
    QCOMPARE(role(*view.drills(), 0, "intensity").toInt(), first.intensity);
    QCOMPARE(role(*view.drills(), 0, "playersText").toString(), playersText(first.playersMin, first.playersMax));

    // Words: the book's own search.
    view.setSearchText(QStringLiteral("left back"));
    model::DrillQuery words;
    words.text = "left back";
    const auto byWords = reference().search(words);
    QVERIFY(!byWords.empty());
    QVERIFY(byWords.size() < all.size());
    QCOMPARE(shownIds(*view.drills()), idsOf(byWords));
    QCOMPARE(view.resultText(), QStringLiteral("%1 of %2 drills match").arg(byWords.size()).arg(all.size()));
    view.clearFilters();
    QCOMPARE(view.drills()->rowCount(), static_cast<int>(all.size()));

    // Metric, zone, tag and intensity, one at a time and together.
    view.setMetricFilter(QStringLiteral("pre_shot_passes_against"));
    model::DrillQuery byMetric;
    byMetric.metric = "pre_shot_passes_against";
    QCOMPARE(shownIds(*view.drills()), idsOf(reference().search(byMetric)));
    QVERIFY(view.drills()->rowCount() > 0);

    const model::ZoneGrid grid = m_reference->tallyGrid();
    const int zoneRow = grid.indexOf({2, 5}) + 1; // option 0 is "any zone"
    QCOMPARE(view.zoneOptions().at(zoneRow).toMap().value(QStringLiteral("text")).toString(),
             QStringLiteral("Our left-back area (B2·L5)"));
    view.setZoneFilter(zoneRow);
    byMetric.zone = model::Zone{2, 5};
    QCOMPARE(shownIds(*view.drills()), idsOf(reference().search(byMetric)));
    view.clearFilters();

    const QVariantList tags = view.tagOptions();
    QVERIFY(tags.size() > 2);
    const QString tag = tags.at(1).toMap().value(QStringLiteral("value")).toString();
    view.setTagFilter(tag);
    model::DrillQuery byTag;
    byTag.tag = tag.toStdString();
    QCOMPARE(shownIds(*view.drills()), idsOf(reference().search(byTag)));
    view.clearFilters();

    for (int level = 1; level <= 5; ++level) {
        view.setIntensityFilter(level);
        std::vector<std::int64_t> expected;
        for (const auto& d : all)
            if (d.intensity == level) expected.push_back(d.id); // by hand, not via browseDrills
        QCOMPARE(shownIds(*view.drills()), expected);
    }
    view.clearFilters();
    QVERIFY(!view.filtered());
}

void DrillBookViewTest::addEditAndUndo() {
    DrillBookView view;
    const auto listTester = watch(view.drills());
    const auto versionTester = watch(view.versions());
    view.setSession(&m_session);
    const std::size_t before = reference().list().size();

    view.newDrill();
    DrillForm* f = view.form();
    f->setTitle(QStringLiteral("Überzahl links: 3v2 to a mini goal ⚽"));
    f->setPurpose(QStringLiteral("Overload their right side"));
    f->setOrganisation(QStringLiteral("30 × 20 m on our left.\nThree attack two."));
    f->setCoachingPoints(QStringLiteral("Width first\n\n  Play the free player  \n"));
    f->setMinutes(QStringLiteral("14"));
    f->setIntensity(4);
    f->setPlayersMin(QStringLiteral("5"));
    f->setPlayersMax(QStringLiteral("10"));
    f->setAreaLength(QStringLiteral("30"));
    f->setAreaWidth(QStringLiteral("20"));
    f->setEquipment(QStringLiteral("cones, bibs , mini goal"));
    f->toggleMetric(QStringLiteral("pass_completion"));
    f->toggleMetric(QStringLiteral("regain_5s"));
    f->toggleMetric(QStringLiteral("pass_completion")); // chosen, then dropped again
    f->toggleZone(2, 5);
    f->toggleZone(3, 5);
    f->setTags(QStringLiteral("overload, full_back"));
    f->setRole(2); // a main drill
    f->setAuthor(QStringLiteral("L. Farrant"));
    QVERIFY(f->dirty());
    QVERIFY(view.save());
    QVERIFY2(view.problems().isEmpty(), qPrintable(view.problems().join(QLatin1Char('\n'))));
    const qint64 id = view.selectedId();
    QVERIFY(id > 0);
    QVERIFY(!f->dirty());

    // Read back on a second connection: every field as typed (lists split and trimmed).
    auto stored = reference().get(id);
    QVERIFY(stored);
    QCOMPARE(QString::fromStdString(stored->title), QStringLiteral("Überzahl links: 3v2 to a mini goal ⚽"));
    QCOMPARE(stored->organisation, std::string("30 × 20 m on our left.\nThree attack two."));
    QCOMPARE(stored->coachingPoints, (std::vector<std::string>{"Width first", "Play the free player"}));
    QCOMPARE(stored->durationMin, 14);
    QCOMPARE(stored->intensity, 4);
    QCOMPARE(stored->playersMin, 5);
    QCOMPARE(stored->playersMax, 10);
    QCOMPARE(stored->areaLengthM, 30.0);
    QCOMPARE(stored->areaWidthM, 20.0);
    QCOMPARE(stored->equipment, (std::vector<std::string>{"cones", "bibs", "mini goal"}));
    QCOMPARE(stored->metrics, std::vector<std::string>{"regain_5s"});
    QCOMPARE(stored->zones, (std::vector<model::Zone>{{2, 5}, {3, 5}}));
    QCOMPARE(stored->tags, (std::vector<std::string>{"overload", "full_back"}));
    QVERIFY(stored->role == model::DrillRole::Main);
    QCOMPARE(stored->editedBy, std::string("L. Farrant")); // no "saved by": the author
    QCOMPARE(stored->versionCount, 1);
    QCOMPARE(reference().list().size(), before + 1);
    QCOMPARE(view.drills()->rowCount(), static_cast<int>(before + 1));
    const model::Drill first = *stored;

    // An edit without a name is refused (an edit must say who makes it); with one it is a
    // new version.
    f->setMinutes(QStringLiteral("20"));
    QVERIFY(!view.save());
    QVERIFY(view.fieldErrors().contains(QStringLiteral("savedBy")));
    QCOMPARE(reference().get(id)->versionCount, 1);
    f->setSavedBy(QStringLiteral("R. Tamsin"));
    QVERIFY(view.save());
    stored = reference().get(id);
    QCOMPARE(stored->versionCount, 2);
    QCOMPARE(stored->durationMin, 20);
    QCOMPARE(stored->editedBy, std::string("R. Tamsin"));
    QCOMPARE(view.versions()->rowCount(), 2);
    QCOMPARE(role(*view.versions(), 0, "version").toInt(), 2); // newest first
    QCOMPARE(role(*view.versions(), 0, "changesText").toString(), QStringLiteral("Changed: minutes"));
    QCOMPARE(role(*view.versions(), 1, "changesText").toString(), QStringLiteral("First version"));
    QVERIFY(view.canUndo());
    QVERIFY(view.undoText().contains(QStringLiteral("edit")));

    // Undo the edit: the previous content is written back as version 3.
    QVERIFY(view.undo());
    stored = reference().get(id);
    QCOMPARE(stored->versionCount, 3);
    QVERIFY(stored->sameContent(first));
    QCOMPARE(stored->durationMin, 14);
    QCOMPARE(view.form()->minutes(), QStringLiteral("14"));
    QCOMPARE(reference().history(id).size(), std::size_t{3});

    // Undo the add: the drill is deleted (restorable), and the list no longer shows it.
    QVERIFY(view.undo());
    QVERIFY(reference().get(id)->deleted);
    QCOMPARE(reference().list().size(), before);
    QCOMPARE(view.drills()->indexOf(id), -1);
    QVERIFY(!view.canUndo());
    QVERIFY(!view.undo());
}

void DrillBookViewTest::deleteRestoreAndUndo() {
    DrillBookView view;
    const auto listTester = watch(view.drills());
    view.setSession(&m_session);
    const qint64 id = view.drills()->idAt(0);
    QVERIFY(view.selectDrill(id));
    QCOMPARE(view.form()->title(), QString::fromStdString(reference().get(id)->title));

    QVERIFY(view.deleteSelected());
    QVERIFY(reference().get(id)->deleted);
    QVERIFY(view.selectedDeleted());
    QCOMPARE(view.drills()->indexOf(id), -1); // deleted drills are hidden...
    view.setIncludeDeleted(true);
    QVERIFY(view.drills()->indexOf(id) >= 0); // ...unless asked for
    QVERIFY(role(*view.drills(), view.drills()->indexOf(id), "deleted").toBool());

    QVERIFY(view.undo()); // undo the delete: restored
    QVERIFY(!reference().get(id)->deleted);
    QVERIFY(!view.selectedDeleted());

    QVERIFY(view.deleteSelected());
    QVERIFY(view.restoreSelected());
    QVERIFY(!reference().get(id)->deleted);
    QVERIFY(view.undo()); // undo the restore: deleted again
    QVERIFY(reference().get(id)->deleted);
    QVERIFY(view.undo()); // undo that delete
    QVERIFY(!reference().get(id)->deleted);
    QVERIFY(!view.canUndo());
}

void DrillBookViewTest::refusedSaveKeepsTheForm() {
    DrillBookView view;
    view.setSession(&m_session);
    const qint64 id = view.drills()->idAt(1);
    QVERIFY(view.selectDrill(id));
    const auto before = reference().get(id);
    DrillForm* f = view.form();
    f->setTitle(QStringLiteral("   "));
    f->setMinutes(QStringLiteral("ten"));
    f->setPlayersMin(QStringLiteral("12"));
    f->setPlayersMax(QStringLiteral("8"));
    f->setAreaLength(QStringLiteral("200"));
    f->setSavedBy(QStringLiteral("R. Tamsin"));
    QSignalSpy problems(&view, &DrillBookView::problemsChanged);
    QVERIFY(!view.save());
    QVERIFY(problems.count() >= 1);

    // The form keeps every character typed.
    QCOMPARE(f->title(), QStringLiteral("   "));
    QCOMPARE(f->minutes(), QStringLiteral("ten"));
    QCOMPARE(f->playersMin(), QStringLiteral("12"));
    QCOMPARE(f->areaLength(), QStringLiteral("200"));
    QVERIFY(f->dirty());
    // Each problem in plain words, beside the field it is about.
    const QString all = view.problems().join(QLatin1Char('\n'));
    QVERIFY2(all.contains(QStringLiteral("Title is required.")), qPrintable(all));
    QVERIFY2(all.contains(QStringLiteral("Minutes: “ten” is not a whole number.")), qPrintable(all));
    QVERIFY2(all.contains(QStringLiteral("Players: min 12 is more than max 8.")), qPrintable(all));
    QVERIFY2(all.contains(QStringLiteral("Area length: expected 1–120 m, found 200.")), qPrintable(all));
    for (const char* field : {"title", "minutes", "playersMin", "areaLength"})
        QVERIFY2(view.fieldErrors().contains(QString::fromLatin1(field)), field);
    QVERIFY(view.statusText().startsWith(QStringLiteral("Not saved")));

    // The book is unchanged.
    const auto after = reference().get(id);
    QCOMPARE(after->versionCount, before->versionCount);
    QVERIFY(after->sameContent(*before));
    QVERIFY(!view.canUndo());

    // Fixing the fields saves, and clears the problems.
    f->setTitle(QString::fromStdString(before->title));
    f->setMinutes(QStringLiteral("16"));
    f->setPlayersMin(QStringLiteral("6"));
    f->setAreaLength(QStringLiteral("40"));
    QVERIFY2(view.save(), qPrintable(view.problems().join(QLatin1Char('\n'))));
    QVERIFY(view.problems().isEmpty());
    QCOMPARE(reference().get(id)->versionCount, before->versionCount + 1);
    QCOMPARE(reference().get(id)->durationMin, 16);
    QVERIFY(view.undo());
    QVERIFY(reference().get(id)->sameContent(*before));
}

void DrillBookViewTest::earlierVersionBackInTheForm() {
    DrillBookView view;
    const auto versionTester = watch(view.versions());
    view.setSession(&m_session);
    const qint64 id = view.drills()->idAt(2);
    QVERIFY(view.selectDrill(id));
    const model::Drill original = *reference().get(id);
    view.form()->setTitle(QStringLiteral("Renamed for a week"));
    view.form()->setSavedBy(QStringLiteral("R. Tamsin"));
    QVERIFY(view.save());
    const int versions = view.versions()->rowCount();
    QVERIFY(versions >= 2);
    // The oldest version is the last row; into the form, then saved as the latest.
    QVERIFY(view.loadVersion(versions - 1));
    QCOMPARE(view.loadedVersion(), 1);
    QCOMPARE(view.form()->title(), QString::fromStdString(reference().history(id).front().title));
    QVERIFY(view.save());
    const auto latest = reference().get(id);
    QCOMPARE(latest->versionCount, versions + 1);
    QVERIFY(latest->sameContent(reference().history(id).front()));
    QCOMPARE(latest->title, original.title);
    QVERIFY(!view.loadVersion(99));
}

void DrillBookViewTest::emptyClub() {
    ClubSession empty;
    QVERIFY(empty.open(m_dir.filePath(QStringLiteral("empty.sqlite"))));
    DrillBookView view;
    const auto listTester = watch(view.drills());
    view.setSession(&empty);
    QVERIFY(view.errorString().isEmpty());
    QCOMPARE(view.drills()->rowCount(), 0);
    QVERIFY(!view.hasBook());
    QCOMPARE(view.resultText(), QStringLiteral("The drill book is empty."));
    QCOMPARE(view.selectedId(), 0);
    QVERIFY(!view.selectDrill(1));
    QVERIFY(!view.undo());
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<DrillBookViewTest>(argc, argv, "drillbook_view_tests");
}

#include "drillbook_view_test.moc"
