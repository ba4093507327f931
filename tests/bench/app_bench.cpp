// Benchmark of the desktop app on a club file (docs/performance.md, "Desktop app"): time to the
// first frame, the redraw after switching the match debrief's metric, and peak memory. Drawn
// offscreen with Qt Quick's software renderer, as on a machine without a GPU. Run on demand:
//   build/tests/bench/pitchloop_bench_app --db sample-club/club.sqlite [--switches 200]

#include "clubsession.h"
#include "matchdebrief.h"

#include <QElapsedTimer>
#include <QEventLoop>
#include <QGuiApplication>
#include <QQmlApplicationEngine>
#include <QQuickStyle>
#include <QQuickWindow>
#include <QTimer>
#include <QtQml/qqmlextensionplugin.h>

#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <fstream>
#include <string>
#include <vector>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

namespace {

/// Peak resident memory of this process in MiB (VmHWM of /proc/self/status).
double peakMiB() {
    std::ifstream status("/proc/self/status");
    for (std::string line; std::getline(status, line);)
        if (line.rfind("VmHWM:", 0) == 0) return std::atof(line.c_str() + 6) / 1024.0;
    return -1;
}

/// Waits for the window's next frame; false after `timeoutMs` without one.
bool waitForFrame(QQuickWindow* window, int timeoutMs = 5000) {
    QEventLoop loop;
    bool drawn = false;
    const auto c = QObject::connect(window, &QQuickWindow::frameSwapped, &loop, [&] {
        drawn = true;
        loop.quit();
    });
    QTimer::singleShot(timeoutMs, &loop, &QEventLoop::quit);
    loop.exec();
    QObject::disconnect(c);
    return drawn;
}

double percentile(std::vector<double> v, double p) {
    std::sort(v.begin(), v.end());
    const auto i = static_cast<std::size_t>(p * static_cast<double>(v.size() - 1) + 0.5);
    return v[std::min(i, v.size() - 1)];
}

} // namespace

int main(int argc, char* argv[]) {
    QElapsedTimer sinceMain;
    sinceMain.start();
    std::string db;
    int switches = 200;
    for (int i = 1; i + 1 < argc; ++i) {
        if (std::strcmp(argv[i], "--db") == 0) db = argv[i + 1];
        if (std::strcmp(argv[i], "--switches") == 0) switches = std::atoi(argv[i + 1]);
    }
    if (db.empty()) {
        std::fprintf(stderr, "usage: pitchloop_bench_app --db CLUB.sqlite [--switches N]\n");
        return 2;
    }
    if (!qEnvironmentVariableIsSet("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    if (!qEnvironmentVariableIsSet("QT_QUICK_BACKEND")) qputenv("QT_QUICK_BACKEND", "software");
    QGuiApplication app(argc, argv);
    QGuiApplication::setOrganizationName(QStringLiteral("Pitchloop"));
    QGuiApplication::setApplicationName(QStringLiteral("pitchloop-bench"));
    QQuickStyle::setStyle(QStringLiteral("Fusion"));

    pitchloop::desktop::ClubSession session;
    if (!session.open(QString::fromStdString(db))) {
        std::fprintf(stderr, "cannot open %s\n", db.c_str());
        return 1;
    }
    QQmlApplicationEngine engine;
    engine.addImportPath(QStringLiteral("qrc:/qt/qml"));
    engine.setInitialProperties({{QStringLiteral("session"), QVariant::fromValue(&session)}});
    engine.load(QUrl(QStringLiteral("qrc:/qt/qml/Pitchloop/Main.qml")));
    if (engine.rootObjects().isEmpty()) return 1;
    auto* window = qobject_cast<QQuickWindow*>(engine.rootObjects().constFirst());
    window->setProperty("currentPage", 0);
    window->resize(1280, 800);
    window->show();
    if (!waitForFrame(window)) {
        std::fprintf(stderr, "no first frame\n");
        return 1;
    }
    const double firstFrameMs = static_cast<double>(sinceMain.nsecsElapsed()) / 1e6;

    // The match debrief page on the latest match; then switch its metric round the list.
    QMetaObject::invokeMethod(window, "showPage", Q_ARG(QString, QStringLiteral("debrief")));
    waitForFrame(window);
    auto debriefs = window->findChildren<pitchloop::desktop::MatchDebrief*>();
    if (debriefs.isEmpty()) {
        std::fprintf(stderr, "no match debrief controller in the window\n");
        return 1;
    }
    auto* debrief = debriefs.front();
    std::vector<QString> metrics;
    for (const auto& m : session.metricSpecs()) metrics.push_back(QString::fromStdString(m.id));
    std::vector<double> redrawMs;
    std::vector<double> updateMs; // the controller's recompute and the bindings it sets off
    for (int i = 0; i < switches; ++i) {
        QElapsedTimer t;
        t.start();
        debrief->setMetricId(metrics[static_cast<std::size_t>(i) % metrics.size()]);
        updateMs.push_back(static_cast<double>(t.nsecsElapsed()) / 1e6);
        window->update();
        if (!waitForFrame(window)) break;
        redrawMs.push_back(static_cast<double>(t.nsecsElapsed()) / 1e6);
    }
    if (redrawMs.empty()) return 1;
    std::printf("club file: %s (%d matches)\n", db.c_str(), session.matchCount());
    std::printf("first frame: %.0f ms after main() (open the club file, load every page, draw)\n",
                firstFrameMs);
    std::printf("debrief metric switch → frame drawn: median %.1f ms, p95 %.1f ms, max %.1f ms "
                "over %zu switches\n",
                percentile(redrawMs, 0.5), percentile(redrawMs, 0.95),
                *std::max_element(redrawMs.begin(), redrawMs.end()), redrawMs.size());
    std::printf("  of which the controller and bindings (before drawing): median %.1f ms\n",
                percentile(updateMs, 0.5));
    std::printf("peak memory (VmHWM): %.0f MiB\n", peakMiB());
    return 0;
}
