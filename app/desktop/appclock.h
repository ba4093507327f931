#pragma once
// "Today" and "now" for the desktop app: model/clock, shared by the command line, with
// $PITCHLOOP_TODAY overriding the clock so demos and tests can replay a season. Computations in
// model/ take the day as a parameter; only these entry points read the clock.

#include <string>

namespace pitchloop::desktop {

/// Today's date, YYYY-MM-DD (UTC): $PITCHLOOP_TODAY when it holds a calendar date.
std::string todayIso();
/// Now as an ISO 8601 UTC date-time ("2026-12-02T09:30:00Z"); noon of $PITCHLOOP_TODAY when set.
std::string nowUtcIso();

} // namespace pitchloop::desktop
