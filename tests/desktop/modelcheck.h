#pragma once
// What every desktop test does with list models: watch one under QAbstractItemModelTester, and
// read a row's value by role name as QML would.

#include <QAbstractItemModel>
#include <QAbstractItemModelTester>
#include <QByteArray>
#include <QVariant>

#include <memory>

namespace pitchloop::desktop::testing {

/// A tester that fails the running Qt Test on any broken model contract while it lives.
inline std::unique_ptr<QAbstractItemModelTester> watch(QAbstractItemModel* m) {
    return std::make_unique<QAbstractItemModelTester>(
        m, QAbstractItemModelTester::FailureReportingMode::QtTest);
}

/// Row `row`'s value of the role QML knows as `name`; invalid when there is no such role.
inline QVariant role(const QAbstractItemModel& m, int row, const QByteArray& name) {
    const auto roles = m.roleNames();
    for (auto it = roles.begin(); it != roles.end(); ++it)
        if (it.value() == name) return m.data(m.index(row, 0), it.key());
    return {};
}

} // namespace pitchloop::desktop::testing
