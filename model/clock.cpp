#include "clock.h"

#include "types.h"

#include <chrono>
#include <cstdlib>
#include <ctime>

namespace pitchloop::model {

namespace {

std::string formatUtc(const char* pattern) {
    const std::time_t tt = std::chrono::system_clock::to_time_t(std::chrono::system_clock::now());
    std::tm tm{};
    gmtime_r(&tt, &tm);
    char buf[40];
    std::strftime(buf, sizeof buf, pattern, &tm);
    return buf;
}

/// $PITCHLOOP_TODAY when it is a calendar date, else empty.
std::string replayedDay() {
    const char* env = std::getenv("PITCHLOOP_TODAY");
    return env && isIsoDate(env) ? std::string(env) : std::string();
}

} // namespace

std::string todayIso() {
    if (auto day = replayedDay(); !day.empty()) return day;
    return formatUtc("%Y-%m-%d");
}

std::string nowUtcIso() {
    if (auto day = replayedDay(); !day.empty()) return day + "T12:00:00Z";
    return systemNowUtcIso();
}

std::string systemNowUtcIso() { return formatUtc("%Y-%m-%dT%H:%M:%SZ"); }

} // namespace pitchloop::model
