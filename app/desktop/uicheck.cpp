#include "uicheck.h"

#include <QDir>
#include <QEventLoop>
#include <QImage>
#include <QMutex>
#include <QQmlComponent>
#include <QQuickWindow>
#include <QTimer>

namespace pitchloop::desktop {

namespace {

QtMessageHandler previousHandler = nullptr;
QMutex mutex;
QStringList recorded;

void countingHandler(QtMsgType type, const QMessageLogContext& context, const QString& message) {
    if (type == QtWarningMsg || type == QtCriticalMsg || type == QtFatalMsg) {
        const QMutexLocker lock(&mutex);
        recorded << message;
    }
    if (previousHandler) previousHandler(type, context, message);
}

/// Waits for `frames` frames of the window, or gives up after a timeout.
bool waitForFrames(QQuickWindow* window, int frames) {
    for (int i = 0; i < frames; ++i) {
        QEventLoop loop;
        QTimer timeout;
        timeout.setSingleShot(true);
        QObject::connect(&timeout, &QTimer::timeout, &loop, [&loop] { loop.exit(1); });
        QObject::connect(window, &QQuickWindow::frameSwapped, &loop, [&loop] { loop.exit(0); });
        window->update();
        timeout.start(5000);
        if (loop.exec() != 0) return false;
    }
    return true;
}

QStringList save(QQuickWindow* window, const QString& dir, int number, const QString& name) {
    const QImage image = window->grabWindow();
    const QString file = QDir(dir).filePath(QStringLiteral("%1-%2.png").arg(number, 2, 10, QLatin1Char('0')).arg(name));
    if (image.isNull() || !image.save(file)) return {QStringLiteral("cannot write %1").arg(file)};
    return {};
}

} // namespace

QStringList grabCurrent(QQuickWindow* window, const QString& screenshotDir, const QString& name, int after) {
    if (!waitForFrames(window, 3)) return {QStringLiteral("%1 was not drawn").arg(name)};
    if (screenshotDir.isEmpty()) return {};
    return save(window, screenshotDir, window->property("pageCount").toInt() + 1 + after, name);
}

void WarningCounter::install() { previousHandler = qInstallMessageHandler(countingHandler); }

int WarningCounter::count() {
    const QMutexLocker lock(&mutex);
    return static_cast<int>(recorded.size());
}

QStringList WarningCounter::messages() {
    const QMutexLocker lock(&mutex);
    return recorded;
}

QStringList visitPages(QQuickWindow* window, const QString& screenshotDir) {
    QStringList problems;
    const int pages = window->property("pageCount").toInt();
    const QStringList names = window->property("pageNames").toStringList();
    if (pages <= 0) problems << QStringLiteral("the main window lists no pages");
    if (!screenshotDir.isEmpty() && !QDir().mkpath(screenshotDir))
        problems << QStringLiteral("cannot create %1").arg(screenshotDir);
    // Every page in both layers of words: plain words ("04-debrief.png"), then the numbers
    // ("04-debrief-numbers.png"); the layer the window had is restored afterwards.
    const QVariant layer = window->property("plainWords");
    for (const bool plain : {true, false}) {
        window->setProperty("plainWords", plain);
        for (int page = 0; page < pages; ++page) {
            const QString name = page < names.size() ? names[page] : QString::number(page);
            window->setProperty("currentPage", page);
            if (window->property("currentPage").toInt() != page) {
                problems << QStringLiteral("page %1 cannot be shown").arg(name);
                continue;
            }
            // Two frames: Canvas items paint on the frame after they are first laid out.
            if (!waitForFrames(window, 2)) {
                problems << QStringLiteral("page %1 was not drawn").arg(name);
                continue;
            }
            if (screenshotDir.isEmpty()) continue;
            problems << save(window, screenshotDir, page + 1, plain ? name : name + QStringLiteral("-numbers"));
        }
    }
    if (layer.isValid()) window->setProperty("plainWords", layer);
    // A delegate that failed to compile shows only as "Component is not ready"; name it.
    for (const QQmlComponent* c : window->findChildren<QQmlComponent*>())
        if (c->isError()) problems << QStringLiteral("%1: %2").arg(c->url().toString(), c->errorString().trimmed());
    return problems;
}

} // namespace pitchloop::desktop
