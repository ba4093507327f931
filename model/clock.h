#pragma once
// The day and time the tool works at. $PITCHLOOP_TODAY, when it holds a calendar date
// (YYYY-MM-DD), replays that day: the demo story, screenshots and tests use it.

#include <string>

namespace pitchloop::model {

/// Today as YYYY-MM-DD (UTC), or $PITCHLOOP_TODAY when set to a calendar date.
std::string todayIso();

/// Now as YYYY-MM-DDTHH:MM:SSZ, or noon UTC of $PITCHLOOP_TODAY when set.
std::string nowUtcIso();

/// The system clock's time as YYYY-MM-DDTHH:MM:SSZ, whatever $PITCHLOOP_TODAY says: for
/// records of when something was done to the file (e.g. a match's ingest time).
std::string systemNowUtcIso();

} // namespace pitchloop::model
