// pitchloop-app: the desktop app's one composition root. Chooses and opens the club file,
// builds the club session, and starts the QML engine on the Pitchloop module's Main.qml.
//
//   pitchloop-app [--db FILE]                   the app
//   pitchloop-app --self-test [--db FILE]       load Main and every page offscreen; exit 1 on
//                                               any QML warning or error
//   pitchloop-app --screenshots DIR [--db FILE] every page at 1280 × 800 into DIR/NN-page.png

#include "clubsession.h"
#include "startup.h"
#include "uicheck.h"

#include <QCommandLineParser>
#include <QDir>
#include <QFileInfo>
#include <QGuiApplication>
#include <QQmlApplicationEngine>
#include <QQuickStyle>
#include <QQuickWindow>
#include <QSettings>
#include <QTemporaryDir>
#include <QUrl>
#include <QtQml/qqmlextensionplugin.h>

#include <cstdio>
#include <cstring>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

namespace {

using namespace pitchloop::desktop;

bool hasFlag(int argc, char* argv[], const char* flag) {
    for (int i = 1; i < argc; ++i)
        if (std::strcmp(argv[i], flag) == 0) return true;
    return false;
}

/// Headless runs draw offscreen with the software renderer (no display, no GPU needed), and
/// give Qt the private runtime folder it expects. Must run before QGuiApplication exists.
std::unique_ptr<QTemporaryDir> prepareHeadless() {
    if (!qEnvironmentVariableIsSet("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    if (!qEnvironmentVariableIsSet("QT_QUICK_BACKEND")) qputenv("QT_QUICK_BACKEND", "software");
    if (qEnvironmentVariableIsSet("XDG_RUNTIME_DIR")) return nullptr;
    auto runtime = std::make_unique<QTemporaryDir>(); // created 0700
    if (runtime->isValid()) qputenv("XDG_RUNTIME_DIR", QFile::encodeName(runtime->path()));
    return runtime;
}

} // namespace

int main(int argc, char* argv[]) {
    const bool headless = hasFlag(argc, argv, "--self-test") || hasFlag(argc, argv, "--screenshots");
    const auto runtimeDir = headless ? prepareHeadless() : nullptr;

    QGuiApplication app(argc, argv);
    QGuiApplication::setOrganizationName(QStringLiteral("Pitchloop"));
    QGuiApplication::setApplicationName(QStringLiteral("pitchloop-app"));
    QGuiApplication::setApplicationVersion(QStringLiteral(PITCHLOOP_VERSION));

    QCommandLineParser cli;
    cli.setApplicationDescription(QStringLiteral("Pitchloop: debrief matches against the season's targets"));
    cli.addHelpOption();
    cli.addVersionOption();
    const QCommandLineOption dbOption(QStringLiteral("db"),
                                      QStringLiteral("Club file (default: $PITCHLOOP_DB, else your data "
                                                     "folder's club file, else the demo club while "
                                                     "you have none)"),
                                      QStringLiteral("FILE"));
    const QCommandLineOption selfTestOption(
        QStringLiteral("self-test"),
        QStringLiteral("Load every page offscreen; exit 1 on any QML warning or error"));
    const QCommandLineOption screenshotsOption(
        QStringLiteral("screenshots"), QStringLiteral("Render every page at 1280 × 800 into DIR"),
        QStringLiteral("DIR"));
    const QCommandLineOption mapTableOption(
        QStringLiteral("map-table"),
        QStringLiteral("Open FILE (an event table) in the mapping assistant of Load matches; with "
                       "--self-test or --screenshots, check or render it too (NN-layout-assistant.png)"),
        QStringLiteral("FILE"));
    cli.addOptions({dbOption, selfTestOption, screenshotsOption, mapTableOption});
    cli.process(app);
    const bool selfTest = cli.isSet(selfTestOption);
    const QString screenshotDir = cli.value(screenshotsOption);

    // Headless runs keep their window settings away from the user's.
    QTemporaryDir settingsDir;
    if (headless) {
        WarningCounter::install();
        QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope, settingsDir.path());
    }
    QQuickStyle::setStyle(QStringLiteral("Fusion"));

    const ClubChoice choice = chooseClubFile(
        explicitClubFile(cli.value(dbOption)), userClubFile(),
        {QDir::current().filePath(QStringLiteral("sample-club/club.sqlite")),
         QStringLiteral(PITCHLOOP_SOURCE_DIR "/sample-club/club.sqlite")},
        rememberedClubFile());
    ClubSession session;
    session.open(choice.file, choice.demo);

    QQmlApplicationEngine engine;
    engine.addImportPath(QStringLiteral("qrc:/qt/qml"));
    engine.setInitialProperties({{QStringLiteral("session"), QVariant::fromValue(&session)}});
    engine.load(QUrl(QStringLiteral("qrc:/qt/qml/Pitchloop/Main.qml")));
    if (engine.rootObjects().isEmpty()) {
        std::fprintf(stderr, "pitchloop-app: the main window did not load\n");
        return 1;
    }
    auto* window = qobject_cast<QQuickWindow*>(engine.rootObjects().constFirst());
    if (!window) {
        std::fprintf(stderr, "pitchloop-app: the main QML object is not a window\n");
        return 1;
    }
    const QString tableToMap = cli.value(mapTableOption);
    auto mapTable = [&] {
        if (tableToMap.isEmpty()) return;
        QMetaObject::invokeMethod(window, "mapTable", Q_ARG(QString, QFileInfo(tableToMap).absoluteFilePath()));
    };
    if (!headless) {
        mapTable();
        return QGuiApplication::exec();
    }

    window->resize(1280, 800);
    window->show();
    QStringList problems = visitPages(window, screenshotDir);
    // The moments behind the debrief's chosen zone (a page's second view: load and draw it too).
    bool shown = false;
    QMetaObject::invokeMethod(window, "openDebriefMoments", Q_RETURN_ARG(bool, shown));
    if (shown) problems << grabCurrent(window, screenshotDir, QStringLiteral("moments"), 1);
    QMetaObject::invokeMethod(window, "openComparison");
    problems << grabCurrent(window, screenshotDir, QStringLiteral("compare"), 2);
    if (!tableToMap.isEmpty()) {
        mapTable();
        problems << grabCurrent(window, screenshotDir, QStringLiteral("layout-assistant"));
    }
    if (!session.errorString().isEmpty()) problems << session.errorString();
    if (selfTest && WarningCounter::count() > 0)
        problems << QStringLiteral("%1 QML or Qt warning(s), listed above").arg(WarningCounter::count());
    for (const QString& p : problems) std::fprintf(stderr, "pitchloop-app: %s\n", qPrintable(p));
    if (problems.isEmpty())
        std::printf("pitchloop-app: %s passed on %s\n", selfTest ? "self-test" : "screenshots",
                    qPrintable(QDir::toNativeSeparators(choice.file)));
    return problems.isEmpty() ? 0 : 1;
}
