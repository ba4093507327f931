#pragma once
// "Today" and "now" for the desktop app, with $PITCHLOOP_TODAY overriding the clock as it does
// for the command line, so demos and tests can replay a season. model/ never reads the clock.

#include <string>

namespace pitchloop::desktop {

/// Today's date, YYYY-MM-DD (UTC): $PITCHLOOP_TODAY when it holds a calendar date.
std::string todayIso();
/// Now as an ISO 8601 UTC date-time ("2026-12-02T09:30:00Z"); noon of $PITCHLOOP_TODAY when set.
std::string nowUtcIso();

} // namespace pitchloop::desktop
