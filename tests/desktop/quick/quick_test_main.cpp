// The Qt Quick Test runner for the app's QML components. The Pitchloop QML module is linked in
// statically; tests that need a club session create a `TestClub` (import PitchloopTest), whose
// session is one club file the runner builds once from the first four demo matches and the demo
// targets (sample-club/), in a temporary folder.

#include "clubsession.h"
#include "ingest.h"
#include "repository.h"
#include "targets.h"

#include <QFile>
#include <QLocale>
#include <QObject>
#include <QQmlEngine>
#include <QQuickStyle>
#include <QTemporaryDir>
#include <QtQml/qqmlextensionplugin.h>
#include <QtQuickTest/quicktest.h>

#include <memory>
#include <stdexcept>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

namespace {

std::unique_ptr<QTemporaryDir> clubDir;
std::unique_ptr<pitchloop::desktop::ClubSession> clubSession;

/// Builds the test club file; throws when the demo files cannot be read or are refused.
void buildClub() {
    using namespace pitchloop;
    const QString source = QStringLiteral(PITCHLOOP_SOURCE_DIR);
    clubDir = std::make_unique<QTemporaryDir>();
    const QString file = clubDir->filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(file.toStdString());
        for (int n = 1; n <= 4; ++n) {
            const auto report = model::ingestFile(
                repo, QStringLiteral("%1/sample-club/matches/KB-2026-%2.json").arg(source).arg(n, 2, 10, QLatin1Char('0')).toStdString());
            if (!report.ok()) throw std::runtime_error(model::describeAll(report.errors));
        }
        QFile targets(source + QStringLiteral("/sample-club/targets.json"));
        if (!targets.open(QIODevice::ReadOnly)) throw std::runtime_error("cannot read sample-club/targets.json");
        const auto grid = repo.tallyGrid();
        const auto parsed = model::parseTargetFile(targets.readAll().toStdString(), "targets.json",
                                                   repo.metrics(), grid.bands(), grid.lanes());
        if (!parsed.errors.empty()) throw std::runtime_error(model::describeAll(parsed.errors));
        repo.addTargets(parsed.targets, "2026-07-20T10:00:00Z");
    }
    clubSession = std::make_unique<desktop::ClubSession>();
    if (!clubSession->open(file)) throw std::runtime_error(clubSession->errorString().toStdString());
}

} // namespace

/// A club session for QML tests: `TestClub { id: club }` then `session: club.session`.
class TestClub : public QObject {
    Q_OBJECT
    Q_PROPERTY(pitchloop::desktop::ClubSession* session READ session CONSTANT)
public:
    using QObject::QObject;
    pitchloop::desktop::ClubSession* session() const { return clubSession.get(); }
};

class Setup : public QObject {
    Q_OBJECT
public:
    Setup() {
        // Offscreen and software-drawn when run by hand too (ctest sets the same).
        if (!qEnvironmentVariableIsSet("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
        if (!qEnvironmentVariableIsSet("QT_QUICK_BACKEND")) qputenv("QT_QUICK_BACKEND", "software");
    }

public slots:
    void applicationAvailable() {
        QLocale::setDefault(QLocale(QLocale::English, QLocale::UnitedKingdom)); // texts checked
        QQuickStyle::setStyle(QStringLiteral("Fusion"));
        buildClub();
        qmlRegisterType<TestClub>("PitchloopTest", 1, 0, "TestClub");
    }
    void qmlEngineAvailable(QQmlEngine* engine) { engine->addImportPath(QStringLiteral("qrc:/qt/qml")); }
    void cleanupTestCase() {
        clubSession.reset();
        clubDir.reset();
    }
};

QUICK_TEST_MAIN_WITH_SETUP(pitchloop_components, Setup)

#include "quick_test_main.moc"
