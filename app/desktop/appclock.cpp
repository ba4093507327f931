#include "appclock.h"

#include "fixtures.h"

#include <QDateTime>
#include <QString>

namespace pitchloop::desktop {

namespace {
/// $PITCHLOOP_TODAY when it is a calendar date, else empty.
std::string replayedDay() {
    const std::string env = qEnvironmentVariable("PITCHLOOP_TODAY").toStdString();
    return model::dayNumber(env) ? env : std::string();
}
} // namespace

std::string todayIso() {
    if (auto day = replayedDay(); !day.empty()) return day;
    return QDateTime::currentDateTimeUtc().date().toString(Qt::ISODate).toStdString();
}

std::string nowUtcIso() {
    if (auto day = replayedDay(); !day.empty()) return day + "T12:00:00Z";
    return QDateTime::currentDateTimeUtc().toString(QStringLiteral("yyyy-MM-dd'T'HH:mm:ss'Z'")).toStdString();
}

} // namespace pitchloop::desktop
