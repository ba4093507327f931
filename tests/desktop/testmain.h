#pragma once
// The one main() of every desktop Qt Test: offscreen with the software renderer unless the
// environment says otherwise, British English texts, the Fusion style, QSettings under a test
// organisation (away from the user's), and every warning counted (uicheck's WarningCounter).

#include "uicheck.h"

#include <QCoreApplication>
#include <QGuiApplication>
#include <QLocale>
#include <QQmlEngine>
#include <QQuickStyle>
#include <QQuickView>
#include <QString>
#include <QTest>
#include <QUrl>
#include <QVariant>

namespace pitchloop::desktop::testing {

/// Loads page `name` (e.g. "SettingsPage") of the Pitchloop module into `window` at 1068 × 800
/// on `session`; the caller checks window.status() and shows it.
template <typename Session>
void loadPage(QQuickView& window, Session* session, const char* name) {
    window.engine()->addImportPath(QStringLiteral("qrc:/qt/qml"));
    window.setInitialProperties({{QStringLiteral("session"), QVariant::fromValue(session)}});
    window.setResizeMode(QQuickView::SizeRootObjectToView);
    window.resize(1068, 800);
    window.setSource(QUrl(QStringLiteral("qrc:/qt/qml/Pitchloop/pages/%1.qml").arg(QString::fromLatin1(name))));
}

template <typename Test>
int runDesktopTest(int argc, char* argv[], const char* name) {
    if (!qEnvironmentVariableIsSet("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    if (!qEnvironmentVariableIsSet("QT_QUICK_BACKEND")) qputenv("QT_QUICK_BACKEND", "software");
    QGuiApplication app(argc, argv);
    QCoreApplication::setOrganizationName(QStringLiteral("PitchloopTest"));
    QCoreApplication::setApplicationName(QString::fromLatin1(name));
    QLocale::setDefault(QLocale(QLocale::English, QLocale::UnitedKingdom)); // texts are checked
    QQuickStyle::setStyle(QStringLiteral("Fusion"));
    WarningCounter::install();
    Test test;
    return QTest::qExec(&test, argc, argv);
}

} // namespace pitchloop::desktop::testing
