// model/clock: $PITCHLOOP_TODAY replays a calendar day; anything else falls back to the clock.

#include "clock.h"
#include "types.h"

#include <catch2/catch.hpp>

#include <cstdlib>

using namespace pitchloop::model;

TEST_CASE("today and now follow $PITCHLOOP_TODAY when it is a calendar date", "[clock]") {
    const char* saved = std::getenv("PITCHLOOP_TODAY");
    const std::string before = saved ? saved : "";

    ::setenv("PITCHLOOP_TODAY", "2026-09-29", 1);
    CHECK(todayIso() == "2026-09-29");
    CHECK(nowUtcIso() == "2026-09-29T12:00:00Z");
    CHECK(systemNowUtcIso() != "2026-09-29T12:00:00Z"); // the real clock, not the replayed day

    for (const char* notADay : {"2026-02-30", "29/09/2026", "tomorrow", ""}) {
        INFO(notADay);
        ::setenv("PITCHLOOP_TODAY", notADay, 1);
        CHECK(todayIso() != notADay);
        CHECK(isIsoDate(todayIso()));
        CHECK(nowUtcIso().size() == 20); // YYYY-MM-DDTHH:MM:SSZ
    }

    if (saved) ::setenv("PITCHLOOP_TODAY", before.c_str(), 1);
    else ::unsetenv("PITCHLOOP_TODAY");
}
