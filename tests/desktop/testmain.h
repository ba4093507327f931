#pragma once
// The one main() of every desktop Qt Test: offscreen with the software renderer unless the
// environment says otherwise, British English texts, the Fusion style, QSettings under a test
// organisation (away from the user's), and every warning counted (uicheck's WarningCounter).

#include "uicheck.h"

#include <QCoreApplication>
#include <QGuiApplication>
#include <QLocale>
#include <QQuickStyle>
#include <QString>
#include <QTest>

namespace pitchloop::desktop::testing {

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
