// Clocks and clip lists of the moments behind a zone (model/moments.h). The moments adding up
// to the tallies is checked beside the engine's own tests (metricengine_test.cpp).

#include "moments.h"

#include "testutil.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;
using pitchloop::testutil::contains;
using pitchloop::testutil::ev;
using pitchloop::testutil::makeMatch;

namespace {

const MetricSpec& builtin(const std::string& id) {
    for (const auto& m : builtinMetrics())
        if (m.id == id) return m;
    throw std::runtime_error("no built-in metric " + id);
}

/// Three losses of ours in zone (3,1) of the default grid (x 35–52.5 m, y 0–13.6 m): at 61 s
/// and 65 s of the first half (won back 2 s later; not won back), and 26:04 into the second.
Match threeLosses() {
    using T = EventType;
    using R = Result;
    auto p = [](Event e, std::string player) {
        e.player = std::move(player);
        return e;
    };
    return makeMatch({
        p(ev(Side::Us, T::Pass, R::Fail, 60, 40, 10), "7"),
        p(ev(Side::Opp, T::Interception, R::Ok, 61, 45, 12), "5"),
        p(ev(Side::Us, T::Tackle, R::Ok, 63, 46, 12), "4"),
        p(ev(Side::Us, T::Pass, R::Fail, 64.5, 40, 10), "8"),
        p(ev(Side::Opp, T::Interception, R::Ok, 65, 45, 12), "6"),
        p(ev(Side::Us, T::Pass, R::Fail, 1563, 40, 10, 2), "7"),
        p(ev(Side::Opp, T::Recovery, R::Ok, 1564, 45, 12, 2), "3"),
        p(ev(Side::Opp, T::Pass, R::Ok, 1580, 60, 20, 2), "3"),
    });
}

} // namespace

TEST_CASE("the match clock reads as football reads it", "[moments]") {
    // Law 7: two halves of 45 minutes; extra time two periods of 15.
    CHECK(periodClock(0) == "00:00");
    CHECK(periodClock(26 * 60 + 4.9) == "26:04"); // a clock shows whole seconds
    CHECK(matchClock(1, 26 * 60 + 4) == "26:04");
    CHECK(matchClock(2, 26 * 60 + 4) == "71:04");
    CHECK(matchClock(1, 47 * 60 + 10) == "45+2:10"); // added time of the first half
    CHECK(matchClock(2, 45 * 60) == "90+0:00");
    CHECK(matchClock(3, 60) == "91:00");
    CHECK(matchClock(4, 14 * 60) == "119:00");
}

TEST_CASE("moments in one zone: who, what, when", "[moments]") {
    const Match m = threeLosses();
    const auto moments = matchMoments(m, builtin("regain_5s"), ZoneGrid(), Zone{3, 1});
    REQUIRE(moments.size() == 3);
    CHECK(moments[0].what == "we lost the ball (7's pass) to their interception (5) → our tackle (4) after 2.0 s");
    CHECK(moments[0].players == std::vector<std::string>{"7", "5", "4"});
    CHECK(moments[0].count == MomentCount::Success);
    CHECK(moments[1].count == MomentCount::NoSuccess);
    CHECK(moments[2].period == 2);
    CHECK(matchClock(moments[2].period, moments[2].t) == "71:04");
    // The arrow runs from where the ball was lost to where it was taken.
    CHECK(moments[0].from == Point{40, 10});
    CHECK(moments[0].to == Point{45, 12});
    // Another zone has none of them.
    CHECK(matchMoments(m, builtin("regain_5s"), ZoneGrid(), Zone{3, 2}).empty());
}

TEST_CASE("clips: lead-in and lead-out, merged where they overlap, on the video's clock", "[moments]") {
    const Match m = threeLosses();
    const auto moments = matchMoments(m, builtin("regain_5s"), ZoneGrid(), Zone{3, 1});
    VideoClock clock; // 8 s before, 4 s after; the 2nd half right after the 1st (2700 s)
    auto clips = clipsOf(m.info, moments, clock);
    // 1st: lost at 60 (last touch), won back at 63 → [52, 67]. 2nd: last touch 64.5, window to
    // 70 → [56.5, 74]: overlaps, merged into [52, 74]. 3rd: 2700 + 1563 − 8 = 4255 to
    // 2700 + 1564 + 5 + 4 = 4273.
    REQUIRE(clips.size() == 2);
    CHECK(clips[0].startS == 52);
    CHECK(clips[0].endS == 74);
    CHECK(clips[0].moments == std::vector<std::size_t>{0, 1});
    CHECK(clips[1].startS == 4255);
    CHECK(clips[1].endS == 4273);
    // A video whose 2nd half starts at 47:30 and a longer lead-in.
    clock.periodStartS[2] = 47 * 60 + 30;
    clock.leadInS = 70;
    clips = clipsOf(m.info, moments, clock);
    REQUIRE(clips.size() == 2);
    CHECK(clips[0].startS == 0); // never before the video's start
    CHECK(clips[1].startS == 2850 + 1563 - 70);
}

TEST_CASE("a WebVTT chapter list and a CSV clip list", "[moments]") {
    Match m = threeLosses();
    m.info.id = "KB-TEST";
    m.info.opponent = "Harbour <Rovers> & Co";
    const auto moments = matchMoments(m, builtin("regain_5s"), ZoneGrid(), Zone{3, 1});
    const auto clips = clipsOf(m.info, moments, VideoClock{});
    const std::string vtt = clipsWebVtt(m.info, moments, clips, "Regain within 5 s");
    CHECK(vtt.rfind("WEBVTT\n\n", 0) == 0);
    CHECK(contains(vtt, "\n1\n00:00:52.000 --> 00:01:14.000\n1st half 01:01 (01:01) · we lost the ball"));
    CHECK(contains(vtt, "\n2\n01:10:55.000 --> 01:11:13.000\n2nd half 26:04 (71:04) · "));
    CHECK(contains(vtt, "Harbour &lt;Rovers&gt; &amp; Co")); // cue text escapes
    CHECK_FALSE(contains(vtt.substr(vtt.find("-->") + 3), "<"));
    const std::string csv = clipsCsv(m.info, moments, clips);
    CHECK(csv.rfind("match_id,clip,start_s,end_s,start,end,period,period_clock,match_clock,band,lane,counts,after_s,what,players\r\n", 0) == 0);
    CHECK(contains(csv, "KB-TEST,1,52.000,74.000,00:00:52.000,00:01:14.000,1,01:01,01:01,3,1,success,2.0,"));
    CHECK(contains(csv, ",no_success,,"));
    CHECK(vttTime(3723.4567) == "01:02:03.457");
}

TEST_CASE("a clock typed by the staff", "[moments]") {
    CHECK(parseClock("47:30") == 2850);
    CHECK(parseClock("1:02:03.5") == 3723.5);
    CHECK(parseClock("95") == 95);
    CHECK_FALSE(parseClock(""));
    CHECK_FALSE(parseClock("47:"));
    CHECK_FALSE(parseClock("-1:00"));
    CHECK_FALSE(parseClock("1:2:3:4"));
    CHECK_FALSE(parseClock("4x:00"));
}
