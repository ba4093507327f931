#pragma once
// The desktop app's logging category: storage faults and other caught errors are logged here.

#include <QLoggingCategory>

Q_DECLARE_LOGGING_CATEGORY(lcDesktop)
