#pragma once
// Headless checks of the user interface: the QML self-test (every page loads and draws without
// a QML warning or error) and screenshots of every page.

#include <QString>
#include <QStringList>

class QQuickWindow;

namespace pitchloop::desktop {

/// Counts warnings, criticals and fatals from any category (QML binding errors arrive as
/// warnings), passing every message on to the previous handler.
class WarningCounter {
public:
    static void install();
    static int count();
    static QStringList messages();
};

/// Shows every page of the main window in turn (the root's `currentPage`, `pageCount` and
/// `pageNames` properties), waits until it is drawn, and, when `screenshotDir` is not empty,
/// saves it there as NN-name.png. Returns the problems found (a page not drawn, a file not
/// written), empty when none.
/// (Every page is shown in both layers of words, plain first; with a folder, the numbers' shots
/// end in "-numbers".)
QStringList visitPages(QQuickWindow* window, const QString& screenshotDir);

/// Waits until what the window shows now is drawn and, when `screenshotDir` is not empty, saves
/// it as NN-name.png after the pages' own (NN = pageCount + 1 + `after`, so that several such
/// views get numbers of their own). Returns the problems found.
QStringList grabCurrent(QQuickWindow* window, const QString& screenshotDir, const QString& name, int after = 0);

} // namespace pitchloop::desktop
