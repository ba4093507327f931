// Tests of the zone-grid card on the settings page: the choice previews what model/ would do,
// a change runs on a worker thread with progress and lands in the club file (read back through
// an independent connection), every page's session moves to the new grid, the story's focus
// keeps the grid it was opened on, an undo moves back with the earlier targets exactly, a
// change without a name writes nothing, and the page with the card draws without a warning.

#include "clubsession.h"
#include "focus.h"
#include "gridchangeview.h"
#include "plannerclub.h"
#include "repository.h"
#include "uicheck.h"
#include "testmain.h"

#include <QCoreApplication>
#include <QDir>
#include <QGuiApplication>
#include <QQmlEngine>
#include <QQuickItem>
#include <QQuickStyle>
#include <QQuickView>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <functional>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);

std::vector<long long> versionIds(const std::vector<model::Target>& targets) {
    std::vector<long long> ids;
    for (const auto& t : targets) ids.push_back(t.version);
    return ids;
}

} // namespace

class GridChangeViewTest : public QObject {
    Q_OBJECT

private slots:
    void initTestCase();
    void choiceShowsWhatWouldChange();
    void changeRunsAndUndoMovesBack();
    void changeWithoutANameWritesNothing();
    void pageDrawsTheCard();

private:
    QTemporaryDir m_dir;
    QString m_file;
    std::unique_ptr<model::ClubRepository> m_reference; ///< the same file, read independently
    ClubSession m_session;
};

void GridChangeViewTest::initTestCase() {
    QVERIFY(m_dir.isValid());
    m_file = m_dir.filePath(QStringLiteral("club.sqlite"));
    plannertest::prepareClub(kSource, m_file, 8);
    QVERIFY(m_session.open(m_file));
    m_reference = std::make_unique<model::ClubRepository>(m_file.toStdString());
}

void GridChangeViewTest::choiceShowsWhatWouldChange() {
    GridChangeView view;
    view.setSession(&m_session);
    QVERIFY2(view.errorString().isEmpty(), qPrintable(view.errorString()));
    QCOMPARE(view.currentName(), QStringLiteral("equal:6x5"));
    QCOMPARE(view.currentText(), QStringLiteral("6 bands × 5 lanes of equal size (equal:6x5)"));
    QCOMPARE(view.chosenName(), QStringLiteral("equal:6x5"));
    QVERIFY(view.previewLines().isEmpty());
    QVERIFY(!view.canChange());

    QSignalSpy choice(&view, &GridChangeView::choiceChanged);
    view.setKind(1);
    QCOMPARE(view.chosenName(), QStringLiteral("markings:6"));
    QCOMPARE(view.lanes(), 5); // lanes at the markings are always five
    QVERIFY(choice.count() >= 1);
    const QString preview = view.previewLines().join(QLatin1Char('\n'));
    QVERIFY2(preview.contains(QStringLiteral("(8 matches)")), qPrintable(preview));
    QVERIFY2(preview.contains(QStringLiteral("1 focus keeps the zones it was opened on")), qPrintable(preview));
    QVERIFY(!view.canChange()); // no name yet
    view.setBy(QStringLiteral("A. Coach"));
    QVERIFY(view.canChange());
    view.setBands(25); // clamped to the model's limit
    QCOMPARE(view.bands(), 20);
    view.resetChoice();
    QCOMPARE(view.chosenName(), QStringLiteral("equal:6x5"));
    QVERIFY(view.previewLines().isEmpty());
    QCOMPARE(m_reference->tallyGrid().name(), std::string("equal:6x5")); // nothing written
}

void GridChangeViewTest::changeRunsAndUndoMovesBack() {
    const auto targetsBefore = m_reference->targets("First team", "2026-27");
    GridChangeView view;
    view.setSession(&m_session);
    view.setKind(0);
    view.setBands(3);
    view.setLanes(5);
    view.setBy(QStringLiteral("A. Coach"));
    QSignalSpy finished(&view, &GridChangeView::finished);
    int highestTotal = 0, lastDone = 0;
    connect(&view, &GridChangeView::progressChanged, this, [&] {
        highestTotal = std::max(highestTotal, view.total());
        lastDone = std::max(lastDone, view.done());
    });
    QVERIFY(view.change());
    QVERIFY(view.running());
    QVERIFY(!view.canChange());
    QVERIFY(finished.wait(60000));
    QVERIFY(!view.running());
    QCOMPARE(highestTotal, 8);
    QCOMPARE(lastDone, 8);
    QVERIFY2(view.problems().isEmpty(), qPrintable(view.problems()));
    QVERIFY2(view.message().startsWith(QStringLiteral("Now on 3 bands × 5 lanes")), qPrintable(view.message()));

    // The club file, the session every page reads, and the card all moved.
    QCOMPARE(m_reference->tallyGrid().name(), std::string("equal:3x5"));
    QCOMPARE(m_session.grid().name(), std::string("equal:3x5"));
    QCOMPARE(view.currentName(), QStringLiteral("equal:3x5"));
    QCOMPARE(view.history().size(), 1);
    QVERIFY(view.history().front().contains(QStringLiteral("equal:6x5 → equal:3x5 by A. Coach")));
    // The story's focus stays on the grid it was opened on, zone (2,5).
    const auto focus = model::FocusStore(*m_reference).get(1);
    QVERIFY(focus);
    QCOMPARE(focus->grid.name(), std::string("equal:6x5"));
    QCOMPARE(focus->zones.front().lane, 5);
    // Targets now sit on the three-band grid.
    const auto moved = m_reference->targets("First team", "2026-27");
    QVERIFY(!moved.empty());
    for (const auto& t : moved) QVERIFY(t.key.band <= 3);

    QVERIFY(view.canUndo());
    QVERIFY(view.undoText().contains(QStringLiteral("equal:6x5")));
    QVERIFY(view.undo());
    QVERIFY(finished.wait(60000));
    QVERIFY2(view.problems().isEmpty(), qPrintable(view.problems()));
    QCOMPARE(m_reference->tallyGrid().name(), std::string("equal:6x5"));
    QCOMPARE(m_session.grid().name(), std::string("equal:6x5"));
    QVERIFY(versionIds(m_reference->targets("First team", "2026-27")) == versionIds(targetsBefore));
    QVERIFY(!view.canUndo());
    QCOMPARE(view.history().size(), 2);
    QCOMPARE(view.chosenName(), QStringLiteral("equal:6x5")); // the choice follows the undo
    QVERIFY(view.previewLines().isEmpty());
}

void GridChangeViewTest::changeWithoutANameWritesNothing() {
    GridChangeView view;
    view.setSession(&m_session);
    view.setKind(1);
    QVERIFY(!view.change());
    QVERIFY(view.problems().contains(QStringLiteral("type your name")));
    QVERIFY(!view.running());
    QCOMPARE(m_reference->tallyGrid().name(), std::string("equal:6x5"));
    view.setBy(QStringLiteral("  "));
    QVERIFY(!view.canChange());
    QVERIFY(!view.change());
}

void GridChangeViewTest::pageDrawsTheCard() {
    const int warningsBefore = WarningCounter::count();
    QQuickView window;
    pitchloop::desktop::testing::loadPage(window, &m_session, "SettingsPage");
    QCOMPARE(window.status(), QQuickView::Ready);
    window.show();
    auto* view = window.rootObject()->findChild<GridChangeView*>(QStringLiteral("gridView"));
    QVERIFY(view);
    view->setKind(1);
    view->setBy(QStringLiteral("A. Coach"));
    QTest::qWait(50);
    auto* sketch = window.rootObject()->findChild<QQuickItem*>(QStringLiteral("gridSketch"));
    QVERIFY(sketch);
    QVERIFY(sketch->width() > 100);
    // The card fits its column: nothing inside it is wider than the card.
    const QQuickItem* card = sketch;
    while (card && !QString::fromLatin1(card->metaObject()->className()).startsWith(QLatin1String("GridChangeCard")))
        card = card->parentItem();
    QVERIFY(card);
    const std::function<void(const QQuickItem*)> fits = [&](const QQuickItem* item) {
        for (const QQuickItem* child : item->childItems()) {
            if (!child->isVisible()) continue;
            const QRectF r = child->mapRectToItem(card, QRectF(0, 0, child->width(), child->height()));
            QVERIFY2(r.right() <= card->width() + 0.5,
                     qPrintable(QStringLiteral("%1 ends at %2, the card at %3")
                                    .arg(QString::fromLatin1(child->metaObject()->className()))
                                    .arg(r.right())
                                    .arg(card->width())));
            fits(child);
        }
    };
    fits(card);
    const QImage image = window.grabWindow();
    QVERIFY(!image.isNull());
    if (const QString dir = qEnvironmentVariable("PITCHLOOP_SHOT_DIR"); !dir.isEmpty())
        QVERIFY(image.save(QDir(dir).filePath(QStringLiteral("settings-grid.png"))));
    QCOMPARE(WarningCounter::count(), warningsBefore);
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<GridChangeViewTest>(argc, argv, "grid_change_view_tests");
}

#include "grid_change_view_test.moc"
