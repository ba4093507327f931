// Tests of the settings page's controller and of the club file chosen at start: the form shows
// what model/ stores; a save writes through model/ (flag settings and intensity caps) and an
// undo writes the earlier values back; a bad value writes nothing and keeps what was typed;
// opening another club file remembers it, and the remembered file wins at the next start while
// it exists. The caps model runs under QAbstractItemModelTester.

#include "modelcheck.h"
#include "clubsession.h"
#include "intensitycapmodel.h"
#include "plannerclub.h"
#include "settingsview.h"
#include "startup.h"
#include "uicheck.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QCoreApplication>
#include <QDir>
#include <QFileInfo>
#include <QGuiApplication>
#include <QQmlEngine>
#include <QQuickItem>
#include <QQuickStyle>
#include <QQuickView>
#include <QSettings>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QUrl>
#include <QtQml/qqmlextensionplugin.h>

#include <functional>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::watch;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);

bool sameFlags(const model::FlagSettings& a, const model::FlagSettings& b) {
    return a.level == b.level && a.rateInterval == b.rateInterval && a.window == b.window &&
           a.offThreshold == b.offThreshold && a.watchThreshold == b.watchThreshold &&
           a.fdr == b.fdr && a.fdrQ == b.fdrQ;
}

/// Row of a microcycle day in the caps form.
int capRow(const IntensityCapModel& caps, const QString& day) {
    for (int row = 0; row < caps.rowCount(); ++row)
        if (caps.dayAt(row) == day) return row;
    return -1;
}

} // namespace

class SettingsViewTest : public QObject {
    Q_OBJECT

private slots:
    void initTestCase();
    void formShowsStoredSettings();
    void saveAndUndoRoundTrip();
    void badValuesWriteNothing();
    void typedTextSurvivesAReload();
    void capFieldsMapToTheModel();
    void pageShowsProblemsInPlace();
    void openAnotherClubFile();
    void rememberedClubFileWinsAtStart();

private:
    QTemporaryDir m_dir;
    QString m_file;
    std::unique_ptr<model::ClubRepository> m_reference; ///< the same file, read independently
    ClubSession m_session;
};

void SettingsViewTest::initTestCase() {
    QVERIFY(m_dir.isValid());
    // QSettings of this run live in the temporary folder, away from the user's.
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope, m_dir.filePath(QStringLiteral("settings")));
    m_file = m_dir.filePath(QStringLiteral("club.sqlite"));
    plannertest::prepareClub(kSource, m_file, 3);
    QVERIFY(m_session.open(m_file));
    m_reference = std::make_unique<model::ClubRepository>(m_file.toStdString());
}

void SettingsViewTest::formShowsStoredSettings() {
    SettingsView view;
    const auto tester = watch(view.caps());
    view.setSession(&m_session);
    QVERIFY2(view.errorString().isEmpty(), qPrintable(view.errorString()));
    const model::FlagSettings stored = m_reference->flagSettings();
    // A new club file holds the documented defaults (model/status.h).
    QVERIFY(sameFlags(stored, model::FlagSettings{}));
    QCOMPARE(view.levelText(), QStringLiteral("0.9"));
    QCOMPARE(view.offThresholdText(), QStringLiteral("0.999"));
    QCOMPARE(view.watchThresholdText(), QStringLiteral("0.5"));
    QCOMPARE(view.fdrQText(), QStringLiteral("0.1"));
    QCOMPARE(view.fdr(), false);
    QCOMPARE(view.windowKind(), 0); // last N
    QCOMPARE(view.windowNText(), QStringLiteral("5"));
    QCOMPARE(view.intervalMethod(), 0); // Wilson
    QVERIFY(!view.edited());
    QVERIFY(!view.canUndo());
    QCOMPARE(view.gridText(), QStringLiteral("6 bands × 5 lanes of equal size (equal:6x5)"));
    QVERIFY(view.offDefault().contains(QStringLiteral("0.999")));

    const model::IntensityCaps caps = model::FixtureStore(*m_reference).caps();
    QCOMPARE(view.caps()->rowCount(), IntensityCapModel::kDays);
    QCOMPARE(view.caps()->texts(), (QStringList{QString::number(caps.before(4)), QString::number(caps.before(3)),
                                                QString::number(caps.before(2)), QString::number(caps.before(1)),
                                                QString::number(caps.matchDay), QString::number(caps.after(1)),
                                                QString::number(caps.after(2)), QString::number(caps.otherDays)}));
    const QModelIndex md4 = view.caps()->index(capRow(*view.caps(), QStringLiteral("MD-4")), 0);
    QCOMPARE(md4.data(IntensityCapModel::NameRole).toString(), QStringLiteral("maximal")); // cap 5
    const QModelIndex md = view.caps()->index(capRow(*view.caps(), QStringLiteral("MD")), 0);
    QCOMPARE(md.data(IntensityCapModel::NameRole).toString(), QStringLiteral("no session")); // cap 0
}

void SettingsViewTest::saveAndUndoRoundTrip() {
    SettingsView view;
    const auto tester = watch(view.caps());
    view.setSession(&m_session);
    const model::FlagSettings before = m_reference->flagSettings();
    const model::IntensityCaps capsBefore = model::FixtureStore(*m_reference).caps();

    view.setLevelText(QStringLiteral("95%"));
    view.setWindowKind(2);
    view.setLambdaText(QStringLiteral("0.25"));
    view.setOffThresholdText(QStringLiteral("0.99"));
    view.setFdr(true);
    view.setFdrQText(QStringLiteral("0.05"));
    view.setIntervalMethod(1);
    QVERIFY(view.caps()->setText(capRow(*view.caps(), QStringLiteral("MD-4")), QStringLiteral("4")));
    QVERIFY(view.caps()->setText(capRow(*view.caps(), QStringLiteral("MD+1")), QStringLiteral(" 1 ")));
    QVERIFY(view.edited());

    QSignalSpy opened(&m_session, &ClubSession::opened);
    QVERIFY2(view.save(), qPrintable(view.problems()));
    QCOMPARE(opened.count(), 1); // every page recomputes with the new settings
    QVERIFY(view.problems().isEmpty());
    const model::FlagSettings after = m_reference->flagSettings();
    QCOMPARE(after.level, 0.95);
    QCOMPARE(after.window, (model::Window{model::Window::Kind::Ewma, 0, 0.25}));
    QCOMPARE(after.offThreshold, 0.99);
    QCOMPARE(after.watchThreshold, before.watchThreshold);
    QCOMPARE(after.fdr, true);
    QCOMPARE(after.fdrQ, 0.05);
    QVERIFY(after.rateInterval == model::IntervalMethod::Jeffreys);
    QVERIFY(sameFlags(m_session.flagSettings(), after)); // the session reloaded
    const model::IntensityCaps capsAfter = model::FixtureStore(*m_reference).caps();
    QCOMPARE(capsAfter.before(4), 4);
    QCOMPARE(capsAfter.after(1), 1);
    QCOMPARE(capsAfter.matchDay, capsBefore.matchDay);
    QVERIFY(!view.edited()); // the form now shows what is stored
    QCOMPARE(view.levelText(), QStringLiteral("0.95"));
    QVERIFY(view.canUndo());

    // A second save, then two undos: each writes the values before it back.
    view.setWatchThresholdText(QStringLiteral("0.6"));
    QVERIFY(view.save());
    QCOMPARE(m_reference->flagSettings().watchThreshold, 0.6);
    QVERIFY(view.undo());
    QVERIFY(sameFlags(m_reference->flagSettings(), after));
    QCOMPARE(view.watchThresholdText(), QStringLiteral("0.5"));
    QVERIFY(view.undo());
    QVERIFY(sameFlags(m_reference->flagSettings(), before));
    QVERIFY(model::FixtureStore(*m_reference).caps() == capsBefore);
    QVERIFY(sameFlags(m_session.flagSettings(), before));
    QVERIFY(!view.canUndo());
    QVERIFY(!view.undo());
    QCOMPARE(view.windowKind(), 0);

    // Saving what is stored changes nothing and offers no undo.
    QVERIFY(view.save());
    QVERIFY(!view.canUndo());
}

void SettingsViewTest::badValuesWriteNothing() {
    SettingsView view;
    const auto tester = watch(view.caps());
    view.setSession(&m_session);
    const model::FlagSettings before = m_reference->flagSettings();
    const model::IntensityCaps capsBefore = model::FixtureStore(*m_reference).caps();
    const int md3 = capRow(*view.caps(), QStringLiteral("MD-3"));
    const int md1 = capRow(*view.caps(), QStringLiteral("MD-1"));

    view.setLevelText(QStringLiteral("0.95")); // fine on its own
    view.setOffThresholdText(QStringLiteral("1.5"));
    view.setFdrQText(QStringLiteral("lots"));
    view.setWindowNText(QStringLiteral("0"));
    QVERIFY(view.caps()->setText(md3, QStringLiteral("9")));
    QVERIFY(view.caps()->setText(md1, QStringLiteral("two")));
    QCOMPARE(view.caps()->index(md3, 0).data(IntensityCapModel::ValidRole).toBool(), false);

    QSignalSpy opened(&m_session, &ClubSession::opened);
    QVERIFY(!view.save());
    QCOMPARE(opened.count(), 0);
    const QString problems = view.problems();
    QVERIFY(problems.contains(QStringLiteral("Off-target threshold: 1.5 is not between 0 and 1")));
    QVERIFY(problems.contains(QStringLiteral("FDR q: 'lots' is not a number")));
    QVERIFY(problems.contains(QStringLiteral("Judged window: '0' matches")));
    QVERIFY(problems.contains(QStringLiteral("Intensity cap MD-1: 'two' is not a whole number")));
    // Nothing stored changed, and the typed text is all still there.
    QVERIFY(sameFlags(m_reference->flagSettings(), before));
    QVERIFY(model::FixtureStore(*m_reference).caps() == capsBefore);
    QCOMPARE(view.levelText(), QStringLiteral("0.95"));
    QCOMPARE(view.offThresholdText(), QStringLiteral("1.5"));
    QCOMPARE(view.fdrQText(), QStringLiteral("lots"));
    QCOMPARE(view.windowNText(), QStringLiteral("0"));
    QCOMPARE(view.caps()->texts().at(md3), QStringLiteral("9"));
    QCOMPARE(view.caps()->texts().at(md1), QStringLiteral("two"));
    QVERIFY(!view.canUndo());

    // With the whole numbers fixed, the model's range check (parseCaps: 0 to 5) names MD-3.
    view.setOffThresholdText(QStringLiteral("0.999"));
    view.setFdrQText(QStringLiteral("0.1"));
    view.setWindowNText(QStringLiteral("6"));
    QVERIFY(view.caps()->setText(md1, QStringLiteral("2")));
    QVERIFY(!view.save());
    QVERIFY2(view.problems().startsWith(QStringLiteral("Intensity cap MD-3: expected a whole number from 0")),
             qPrintable(view.problems()));
    QVERIFY(sameFlags(m_reference->flagSettings(), before));
    QCOMPARE(view.caps()->texts().at(md3), QStringLiteral("9"));

    // An EWMA weight outside (0, 1] is refused too.
    QVERIFY(view.caps()->setText(md3, QStringLiteral("3")));
    view.setWindowKind(2);
    view.setLambdaText(QStringLiteral("1.5"));
    QVERIFY(!view.save());
    QVERIFY(view.problems().startsWith(QStringLiteral("EWMA weight λ: '1.5'")));
    view.revert();
    QVERIFY(!view.edited());
    QCOMPARE(view.lambdaText(), QStringLiteral("0.3"));
}

void SettingsViewTest::typedTextSurvivesAReload() {
    SettingsView view;
    view.setSession(&m_session);
    view.setWatchThresholdText(QStringLiteral("0.7"));
    QVERIFY(view.caps()->setText(0, QStringLiteral("3")));
    m_session.reload(); // another page saved something
    QCOMPARE(view.watchThresholdText(), QStringLiteral("0.7"));
    QCOMPARE(view.caps()->texts().at(0), QStringLiteral("3"));
    view.revert();
    QCOMPARE(view.watchThresholdText(), QStringLiteral("0.5"));
}

void SettingsViewTest::capFieldsMapToTheModel() {
    // model::parseCaps names fields md, md_plus[i] (MD+1+i), md_minus[i] (MD-1-i), other.
    IntensityCapModel caps;
    const auto tester = watch(&caps);
    caps.load(model::IntensityCaps{});
    QCOMPARE(caps.dayAt(IntensityCapModel::rowOfField("md")), QStringLiteral("MD"));
    QCOMPARE(caps.dayAt(IntensityCapModel::rowOfField("md_plus[0]")), QStringLiteral("MD+1"));
    QCOMPARE(caps.dayAt(IntensityCapModel::rowOfField("md_plus[1]")), QStringLiteral("MD+2"));
    QCOMPARE(caps.dayAt(IntensityCapModel::rowOfField("md_minus[0]")), QStringLiteral("MD-1"));
    QCOMPARE(caps.dayAt(IntensityCapModel::rowOfField("md_minus[3]")), QStringLiteral("MD-4"));
    QCOMPARE(caps.dayAt(IntensityCapModel::rowOfField("other")), QStringLiteral("Other days"));
    QCOMPARE(IntensityCapModel::rowOfField("md_plus[2]"), -1);
    // Typed texts give the caps the model would store, each in its own place.
    model::IntensityCaps expected;
    expected.beforeMatch = {1, 2, 3, 4};
    expected.afterMatch = {0, 5};
    expected.matchDay = 1;
    expected.otherDays = 2;
    caps.setTexts({QStringLiteral("4"), QStringLiteral("3"), QStringLiteral("2"), QStringLiteral("1"),
                   QStringLiteral("1"), QStringLiteral("0"), QStringLiteral("5"), QStringLiteral("2")});
    QVERIFY(caps.typedCaps(model::IntensityCaps{}) == expected);
    QCOMPARE(caps.index(5, 0).data(IntensityCapModel::NameRole).toString(), QStringLiteral("no session"));
    QCOMPARE(caps.index(6, 0).data(IntensityCapModel::NameRole).toString(), QStringLiteral("maximal"));
    QVERIFY(caps.setData(caps.index(7, 0), QStringLiteral("x"), Qt::EditRole));
    QCOMPARE(caps.index(7, 0).data(IntensityCapModel::ValidRole).toBool(), false);
    QVERIFY(caps.flags(caps.index(7, 0)) & Qt::ItemIsEditable);
    caps.load(expected); // refilled under the tester
    QCOMPARE(caps.index(7, 0).data(IntensityCapModel::TextRole).toString(), QStringLiteral("2"));
}

void SettingsViewTest::pageShowsProblemsInPlace() {
    // The page itself, offscreen: a refused save shows its problems without a QML warning and
    // the fields keep what was typed. With $PITCHLOOP_SHOT_DIR set it leaves a picture there.
    const int warningsBefore = WarningCounter::count();
    QQuickView window;
    pitchloop::desktop::testing::loadPage(window, &m_session, "SettingsPage");
    QCOMPARE(window.status(), QQuickView::Ready);
    window.show();
    auto* view = window.rootObject()->findChild<SettingsView*>();
    QVERIFY(view);
    view->setWatchThresholdText(QStringLiteral("1"));
    QVERIFY(view->caps()->setText(0, QStringLiteral("7")));
    QVERIFY(!view->save());
    QTest::qWait(50);
    // The typed texts are what the page's fields show.
    QStringList shown;
    const std::function<void(const QQuickItem*)> collect = [&](const QQuickItem* item) {
        if (item->inherits("QQuickTextInput") && item->isVisible()) shown << item->property("text").toString();
        for (const QQuickItem* child : item->childItems()) collect(child);
    };
    collect(window.rootObject());
    QVERIFY2(shown.contains(QStringLiteral("1")) && shown.contains(QStringLiteral("7")), qPrintable(shown.join(',')));
    const QImage image = window.grabWindow();
    QVERIFY(!image.isNull());
    if (const QString dir = qEnvironmentVariable("PITCHLOOP_SHOT_DIR"); !dir.isEmpty())
        QVERIFY(image.save(QDir(dir).filePath(QStringLiteral("settings-problems.png"))));
    QCOMPARE(WarningCounter::count(), warningsBefore);
}

void SettingsViewTest::openAnotherClubFile() {
    QTemporaryDir other;
    const QString otherFile = other.filePath(QStringLiteral("other.sqlite"));
    { model::ClubRepository created(otherFile.toStdString()); }
    ClubSession session;
    QVERIFY(session.open(m_file));
    SettingsView view;
    view.setSession(&session);
    view.setLevelText(QStringLiteral("0.8"));
    QVERIFY(view.save());
    QVERIFY(view.canUndo());

    QVERIFY(!view.openClubFile(QUrl::fromLocalFile(other.filePath(QStringLiteral("missing.sqlite")))));
    QVERIFY(view.problems().contains(QStringLiteral("missing.sqlite")));
    QCOMPARE(session.clubFile(), m_file); // still the same file

    QVERIFY2(view.openClubFile(QUrl::fromLocalFile(otherFile)), qPrintable(view.problems()));
    QCOMPARE(session.clubFile(), otherFile);
    QCOMPARE(rememberedClubFile(), QFileInfo(otherFile).absoluteFilePath());
    QVERIFY(!view.canUndo()); // an undo belongs to the file it was saved in
    QCOMPARE(view.levelText(), QStringLiteral("0.9")); // the new file's own settings

    QVERIFY(session.openFile(m_file)); // put the test club back as it was
    model::FlagSettings restored = m_reference->flagSettings();
    restored.level = 0.9;
    m_reference->saveFlagSettings(restored);
}

void SettingsViewTest::rememberedClubFileWinsAtStart() {
    QTemporaryDir dir;
    const QString user = dir.filePath(QStringLiteral("user/club.sqlite"));
    const QString remembered = dir.filePath(QStringLiteral("elsewhere.sqlite"));
    const QString demo = dir.filePath(QStringLiteral("demo.sqlite"));
    for (const QString& f : {remembered, demo}) {
        QFile file(f);
        QVERIFY(file.open(QIODevice::WriteOnly));
    }
    // The remembered file wins over the demo club and over the user's club file...
    auto c = chooseClubFile({}, user, {demo}, remembered);
    QCOMPARE(c.file, remembered);
    QVERIFY(!c.demo);
    QVERIFY(QDir().mkpath(dir.filePath(QStringLiteral("user"))));
    QFile userFile(user);
    QVERIFY(userFile.open(QIODevice::WriteOnly));
    userFile.close();
    QCOMPARE(chooseClubFile({}, user, {demo}, remembered).file, remembered);
    // ...but not over --db or $PITCHLOOP_DB,
    QCOMPARE(chooseClubFile(QStringLiteral("/x/named.sqlite"), user, {demo}, remembered).file,
             QStringLiteral("/x/named.sqlite"));
    // and only while it still exists.
    QVERIFY(QFile::remove(remembered));
    QCOMPARE(chooseClubFile({}, user, {demo}, remembered).file, user);
    QVERIFY(QFile::remove(user));
    c = chooseClubFile({}, user, {demo}, remembered);
    QCOMPARE(c.file, QFileInfo(demo).absoluteFilePath());
    QVERIFY(c.demo);

    // Remembering goes through QSettings and comes back absolute.
    rememberClubFile(demo);
    QCOMPARE(rememberedClubFile(), QFileInfo(demo).absoluteFilePath());
    QCOMPARE(QSettings().value(QStringLiteral("club/lastFile")).toString(), QFileInfo(demo).absoluteFilePath());
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<SettingsViewTest>(argc, argv, "settings_view_tests");
}

#include "settings_view_test.moc"
