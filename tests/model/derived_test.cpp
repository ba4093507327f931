// Derived facts (docs/metrics.md): control, losses, regains, censoring, shots after losses,
// pre-shot passes, minutes played and defensive actions, on hand-made event sequences.

#include "derived.h"
#include "testutil.h"

#include <catch2/catch.hpp>

#include <string>
#include <vector>

using namespace pitchloop::model;
using pitchloop::testutil::ev;
using pitchloop::testutil::makeMatch;

namespace {

constexpr Side Us = Side::Us;
constexpr Side Opp = Side::Opp;
using T = EventType;
using R = Result;

std::string name(WindowOutcome o) {
    switch (o) {
    case WindowOutcome::Found: return "Found";
    case WindowOutcome::NotFound: return "NotFound";
    case WindowOutcome::Censored: return "Censored";
    }
    return "?";
}

Event carry(Side side, Result result, double t, Point from, Point to, int period = 1) {
    Event e = ev(side, T::Carry, result, t, from.x, from.y, period);
    e.to = to;
    return e;
}

Event pass(Side side, Result result, double t, Point from, Point to, int period = 1) {
    Event e = ev(side, T::Pass, result, t, from.x, from.y, period);
    e.to = to;
    return e;
}

/// We have the ball from `tLoss − 1` and they intercept at `tLoss` (period 1): one loss of ours
/// with tL = tLoss, followed by `after`.
Match lossAt(double tLoss, std::vector<Event> after, double periodLengthS = 2700) {
    std::vector<Event> events{ev(Us, T::Pass, R::Fail, tLoss - 1, 50, 30),
                              ev(Opp, T::Interception, R::Ok, tLoss, 55, 34)};
    events.insert(events.end(), after.begin(), after.end());
    return makeMatch(std::move(events), periodLengthS);
}

/// Our first loss in `m` (the tests below build matches whose first loss is ours).
Loss firstLossOfUs(const Match& m) {
    const auto losses = findLosses(m);
    REQUIRE_FALSE(losses.empty());
    REQUIRE(losses.front().side == Us);
    return losses.front();
}

std::string regain(const Match& m, double withinS = 5) {
    return name(regainWithin(m, firstLossOfUs(m), withinS));
}

std::string shot(const Match& m, double withinS = 15) {
    return name(shotAfterLoss(m, firstLossOfUs(m), withinS));
}

} // namespace

// ---------------------------------------------------------------------------------------------
// Control and losses

TEST_CASE("control starts empty in every period, so a period's first control event is no loss") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 10, 40, 30),              // 0: first control event of period 1
        ev(Opp, T::Interception, R::Ok, 12, 60, 20),     // 1: they take it: our loss
        ev(Opp, T::Pass, R::Ok, 14, 62, 22),             // 2: they still have it at half time
        ev(Us, T::Pass, R::Ok, 2, 52.5, 34, 2),          // 3: first control event of period 2
        ev(Opp, T::Tackle, R::Ok, 5, 70, 30, 2),         // 4: they take it: our loss
        ev(Us, T::Recovery, R::Ok, 8, 30, 40, 2),        // 5: we take it: their loss
    });
    const auto losses = findLosses(m);
    // Changes of control: 0→1 (us lose), 3→4 (us lose), 4→5 (they lose). 2→3 crosses the
    // break, where control was reset, so it is not a loss.
    REQUIRE(losses.size() == 3);
    CHECK(losses[0].side == Us);
    CHECK(losses[0].takeIndex == 1);
    CHECK(losses[0].period == 1);
    CHECK(losses[1].side == Us);
    CHECK(losses[1].takeIndex == 4);
    CHECK(losses[1].period == 2);
    CHECK(losses[2].side == Opp);
    CHECK(losses[2].takeIndex == 5);
    CHECK(losses[2].lastIndex == 4);
}

TEST_CASE("a period that starts with the other side's control event has no loss at its start") {
    const Match m = makeMatch({
        ev(Us, T::Carry, R::Ok, 2690, 40, 30),           // 0: ours at the end of period 1
        ev(Opp, T::Pass, R::Ok, 1, 52.5, 34, 2),         // 1: their kick-off in period 2
    });
    // Event 1 is the first control event of period 2: nobody had control, so no loss.
    CHECK(findLosses(m).empty());
}

TEST_CASE("consecutive control events of one side are no loss") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 1, 40, 30),
        ev(Us, T::Carry, R::Ok, 3, 50, 30),
        ev(Us, T::TakeOn, R::Fail, 5, 55, 30),           // a failed take-on still shows control
        ev(Us, T::Shot, R::Saved, 7, 90, 34),
    });
    // Control stays with us throughout: 0 losses.
    CHECK(findLosses(m).empty());
}

TEST_CASE("loss time is the taker's control event; loss place is the loser's last event") {
    SECTION("the loser's last event is a carry: the place is the carry's end") {
        const Match m = makeMatch({
            ev(Us, T::Pass, R::Ok, 10, 30, 30),                  // 0
            carry(Us, R::Fail, 12, {40, 30}, {48, 25}),          // 1: dispossessed at (48, 25)
            ev(Opp, T::Tackle, R::Ok, 13.5, 49, 26),             // 2: they win it
        });
        const auto losses = findLosses(m);
        REQUIRE(losses.size() == 1);
        CHECK(losses[0].side == Us);
        CHECK(losses[0].t == 13.5);      // the tackle's time, not the carry's
        CHECK(losses[0].takeIndex == 2);
        CHECK(losses[0].lastIndex == 1);
        CHECK(losses[0].place == Point{48, 25}); // the carry's end, not its start (40, 30)
    }
    SECTION("the loser's last event is a failed pass: the place is where it was played") {
        const Match m = makeMatch({
            pass(Us, R::Fail, 8.9, {62, 15.5}, {80, 30}),        // 0
            ev(Opp, T::Interception, R::Ok, 9.6, 80, 30),        // 1: cut out 20 m away
        });
        const auto losses = findLosses(m);
        REQUIRE(losses.size() == 1);
        CHECK(losses[0].t == 9.6);                 // the interception's time
        CHECK(losses[0].place == Point{62, 15.5}); // the pass's origin, not its end (80, 30)
    }
    SECTION("a carry without an end point: the place is its start") {
        const Match m = makeMatch({
            ev(Us, T::Carry, R::Fail, 20, 33, 44),               // 0: no to_x/to_y
            ev(Opp, T::Recovery, R::Ok, 21, 34, 45),             // 1
        });
        const auto losses = findLosses(m);
        REQUIRE(losses.size() == 1);
        CHECK(losses[0].place == Point{33, 44});
    }
    SECTION("a non-control event of the loser after its control counts as its last event") {
        const Match m = makeMatch({
            ev(Us, T::Pass, R::Ok, 30, 20, 30),                  // 0: our control
            ev(Us, T::Out, R::None, 33, 60, 0),                  // 1: we put it out at (60, 0)
            ev(Opp, T::Pass, R::Ok, 45, 60, 0),                  // 2: their throw-in
        });
        const auto losses = findLosses(m);
        REQUIRE(losses.size() == 1);
        CHECK(losses[0].t == 45);                // the throw-in (their first control event)
        CHECK(losses[0].lastIndex == 1);         // our last event is the out
        CHECK(losses[0].place == Point{60, 0});
    }
    SECTION("the taker's events before its control event do not move the loss") {
        const Match m = makeMatch({
            ev(Us, T::Pass, R::Ok, 50, 40, 40),                  // 0
            ev(Opp, T::Tackle, R::Fail, 51, 41, 40),             // 1: no control
            ev(Opp, T::Block, R::Ok, 52, 42, 40),                // 2: no control
            ev(Opp, T::Recovery, R::Ok, 54, 43, 41),             // 3: control: the loss
        });
        const auto losses = findLosses(m);
        REQUIRE(losses.size() == 1);
        CHECK(losses[0].t == 54);
        CHECK(losses[0].takeIndex == 3);
        CHECK(losses[0].lastIndex == 0);
        CHECK(losses[0].place == Point{40, 40});
    }
}

namespace {
struct TakeCase {
    EventType type;
    Result result;
    bool takesControl;
};
} // namespace

TEST_CASE("which of the other side's events take the ball (and so make a loss)") {
    // Table of docs/match-format.md ("Gives control"): keeper, tackle and interception only
    // when ok; clearance, block, foul and out never.
    const TakeCase c = GENERATE(values<TakeCase>({
        {T::Pass, R::Ok, true},          {T::Pass, R::Fail, true},
        {T::Carry, R::Ok, true},         {T::Carry, R::Fail, true},
        {T::TakeOn, R::Ok, true},        {T::TakeOn, R::Fail, true},
        {T::Shot, R::Goal, true},        {T::Shot, R::Saved, true},
        {T::Shot, R::Blocked, true},     {T::Shot, R::Off, true},
        {T::Shot, R::Post, true},        {T::Recovery, R::Ok, true},
        {T::Interception, R::Ok, true},  {T::Interception, R::Fail, false},
        {T::Tackle, R::Ok, true},        {T::Tackle, R::Fail, false},
        {T::Keeper, R::Ok, true},        {T::Keeper, R::Fail, false},
        {T::Clearance, R::Ok, false},    {T::Clearance, R::Fail, false},
        {T::Block, R::Ok, false},        {T::Block, R::Fail, false},
        {T::Foul, R::None, false},       {T::Out, R::None, false},
    }));
    INFO(toString(c.type) << " " << toString(c.result));
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 10, 50, 34),      // our control
        ev(Opp, c.type, c.result, 11, 55, 30),   // their event under test
    });
    CHECK(givesControl(m.events[1]) == c.takesControl);
    // One loss exactly when their event gives them control.
    CHECK(findLosses(m).size() == (c.takesControl ? 1u : 0u));
}

TEST_CASE("events that give no control leave control where it was") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 10, 50, 34),            // 0: ours
        ev(Opp, T::Tackle, R::Fail, 11, 51, 34),       // 1
        ev(Opp, T::Interception, R::Fail, 12, 52, 34), // 2
        ev(Opp, T::Keeper, R::Fail, 13, 100, 34),      // 3
        ev(Opp, T::Clearance, R::Ok, 14, 53, 34),      // 4
        ev(Opp, T::Block, R::Ok, 15, 54, 34),          // 5
        ev(Opp, T::Foul, R::None, 16, 55, 34),         // 6
        ev(Opp, T::Out, R::None, 17, 56, 34),          // 7
        ev(Us, T::Pass, R::Ok, 20, 56, 34),            // 8: still ours: no loss either way
        ev(Opp, T::Keeper, R::Ok, 25, 104, 34),        // 9: their keeper holds: our loss
    });
    const auto losses = findLosses(m);
    // Events 1–7 give nobody control, so control is ours from 0 to 8; 9 is the only change.
    REQUIRE(losses.size() == 1);
    CHECK(losses[0].takeIndex == 9);
    CHECK(losses[0].lastIndex == 8);
    CHECK(losses[0].place == Point{56, 34});
}

// ---------------------------------------------------------------------------------------------
// Regains

TEST_CASE("regain within W: our own control event") {
    // Every case: we lose the ball at tL = 102 (their interception); W = 5 s.
    SECTION("a pass 2 s later") {
        // 104 − 102 = 2 ≤ 5
        CHECK(regain(lossAt(102, {ev(Us, T::Pass, R::Ok, 104, 55, 34)})) == "Found");
    }
    SECTION("a won tackle exactly W s later counts") {
        // 107 − 102 = 5 ≤ 5
        CHECK(regain(lossAt(102, {ev(Us, T::Tackle, R::Ok, 107, 55, 34)})) == "Found");
    }
    SECTION("W + 0.1 s later does not") {
        // 107.1 − 102 = 5.1 > 5; 2700 − 102 = 2598 s were left, so not censored either
        CHECK(regain(lossAt(102, {ev(Us, T::Recovery, R::Ok, 107.1, 55, 34)})) == "NotFound");
    }
    SECTION("our events that give no control are no regain") {
        const auto type = GENERATE(T::Tackle, T::Interception, T::Keeper);
        // Failed tackle, interception or keeper action: no control, so no regain.
        CHECK(regain(lossAt(102, {ev(Us, type, R::Fail, 103, 55, 34)})) == "NotFound");
    }
    SECTION("our clearance, block, foul or out are no regain") {
        CHECK(regain(lossAt(102, {ev(Us, T::Clearance, R::Ok, 103, 10, 34)})) == "NotFound");
        CHECK(regain(lossAt(102, {ev(Us, T::Block, R::Ok, 103, 10, 34)})) == "NotFound");
        CHECK(regain(lossAt(102, {ev(Us, T::Foul, R::None, 103, 10, 34)})) == "NotFound");
        CHECK(regain(lossAt(102, {ev(Us, T::Out, R::None, 103, 10, 0)})) == "NotFound");
    }
    SECTION("their own passes are no regain") {
        CHECK(regain(lossAt(102, {ev(Opp, T::Pass, R::Ok, 103, 40, 34),
                                  ev(Opp, T::Pass, R::Fail, 104, 30, 34)})) == "NotFound");
    }
    SECTION("a later regain outside the window does not count") {
        // Our recovery at 110: 110 − 102 = 8 > 5
        CHECK(regain(lossAt(102, {ev(Opp, T::Pass, R::Ok, 104, 40, 34),
                                  ev(Us, T::Recovery, R::Ok, 110, 40, 34)})) == "NotFound");
    }
    SECTION("a regain at the same time as the take event counts") {
        // 102 − 102 = 0 ≤ 5 (same time, later in file order)
        CHECK(regain(lossAt(102, {ev(Us, T::Tackle, R::Ok, 102, 55, 34)})) == "Found");
    }
    SECTION("a wider window W = 10 s") {
        // 110 − 102 = 8 ≤ 10
        const Match m = lossAt(102, {ev(Us, T::Recovery, R::Ok, 110, 40, 34)});
        CHECK(regain(m, 10) == "Found");
        CHECK(regain(m, 5) == "NotFound"); // 8 > 5
    }
}

TEST_CASE("regain within W: a foul or an out by the side that took the ball") {
    SECTION("their foul") {
        // 106 − 102 = 4 ≤ 5: we get a free kick
        CHECK(regain(lossAt(102, {ev(Opp, T::Foul, R::None, 106, 55, 34)})) == "Found");
    }
    SECTION("their foul exactly W s later") {
        // 107 − 102 = 5 ≤ 5
        CHECK(regain(lossAt(102, {ev(Opp, T::Foul, R::None, 107, 55, 34)})) == "Found");
    }
    SECTION("their foul W + 0.1 s later") {
        // 107.1 − 102 = 5.1 > 5
        CHECK(regain(lossAt(102, {ev(Opp, T::Foul, R::None, 107.1, 55, 34)})) == "NotFound");
    }
    SECTION("their ball out") {
        // 104.5 − 102 = 2.5 ≤ 5: our throw-in
        CHECK(regain(lossAt(102, {ev(Opp, T::Out, R::None, 104.5, 60, 68)})) == "Found");
    }
    SECTION("our foul is no regain") {
        CHECK(regain(lossAt(102, {ev(Us, T::Foul, R::None, 104, 55, 34)})) == "NotFound");
    }
    SECTION("our ball out is no regain") {
        CHECK(regain(lossAt(102, {ev(Us, T::Out, R::None, 104, 60, 68)})) == "NotFound");
    }
}

TEST_CASE("regain within W: times written with decimals, exactly W apart, count") {
    // Loss and regain times as a file gives them, in tenths of a second. In binary floating
    // point 8.3 − 3.3 evaluates to 5.000000000000001 and 12.3 − 7.3 likewise a hair above 5,
    // yet both are exactly 5 s apart as written.
    CHECK(regain(lossAt(3.3, {ev(Us, T::Pass, R::Ok, 8.3, 55, 34)})) == "Found");
    CHECK(regain(lossAt(7.3, {ev(Opp, T::Foul, R::None, 12.3, 55, 34)})) == "Found");
    // 8.4 − 3.3 = 5.1 > 5
    CHECK(regain(lossAt(3.3, {ev(Us, T::Pass, R::Ok, 8.4, 55, 34)})) == "NotFound");
}

TEST_CASE("censoring at the end of a period") {
    // Period length 2700 s; W = 5 s.
    SECTION("less than W s left and no regain: censored") {
        // 2700 − 2696 = 4 s left < 5
        CHECK(regain(lossAt(2696, {})) == "Censored");
        CHECK(regain(lossAt(2696, {ev(Opp, T::Pass, R::Ok, 2699, 40, 34)})) == "Censored");
    }
    SECTION("less than W s left but a regain: found") {
        // 2699 − 2696 = 3 ≤ 5
        CHECK(regain(lossAt(2696, {ev(Us, T::Pass, R::Ok, 2699, 55, 34)})) == "Found");
        // 2699.9 − 2699.5 = 0.4 ≤ 5, with 0.5 s left
        CHECK(regain(lossAt(2699.5, {ev(Opp, T::Out, R::None, 2699.9, 60, 0)})) == "Found");
    }
    SECTION("exactly W s left and no regain: not censored") {
        // 2700 − 2695 = 5 s left, not less than 5
        CHECK(regain(lossAt(2695, {})) == "NotFound");
    }
    SECTION("exactly W s left, written with decimals: not censored") {
        // Period 2048.14 s, loss at 2043.14: 5 s left, though 2048.14 − 2043.14 evaluates to
        // 4.999999999999773 in binary floating point.
        CHECK(regain(lossAt(2043.14, {}, 2048.14)) == "NotFound");
        // 2048.14 − 2043.15 = 4.99 s left < 5
        CHECK(regain(lossAt(2043.15, {}, 2048.14)) == "Censored");
    }
    SECTION("exactly W s left and a regain on the final whistle") {
        // 2700 − 2695 = 5 ≤ 5
        CHECK(regain(lossAt(2695, {ev(Us, T::Recovery, R::Ok, 2700, 55, 34)})) == "Found");
    }
    SECTION("a control event in the next period is no regain") {
        // Loss at 2698 in period 1 (2 s left); our pass at 1 s into period 2 is another period.
        CHECK(regain(lossAt(2698, {ev(Us, T::Pass, R::Ok, 1, 52.5, 34, 2)})) == "Censored");
    }
    SECTION("censoring follows the match's period length") {
        // With 2760 s periods, a loss at 2696 has 64 s left: not censored.
        CHECK(regain(lossAt(2696, {}, 2760)) == "NotFound");
        // A loss at 2756 has 4 s left < 5.
        CHECK(regain(lossAt(2756, {}, 2760)) == "Censored");
    }
}

// ---------------------------------------------------------------------------------------------
// Shot after loss (W = 15 s)

TEST_CASE("shot after loss") {
    SECTION("their shot 8 s after the loss") {
        // 110 − 102 = 8 ≤ 15
        CHECK(shot(lossAt(102, {ev(Opp, T::Pass, R::Ok, 105, 40, 34),
                                ev(Opp, T::Shot, R::Off, 110, 15, 34)})) == "Found");
    }
    SECTION("exactly 15 s counts") {
        // 117 − 102 = 15 ≤ 15
        CHECK(shot(lossAt(102, {ev(Opp, T::Shot, R::Saved, 117, 15, 34)})) == "Found");
    }
    SECTION("15.1 s does not") {
        // 117.1 − 102 = 15.1 > 15, and 2598 s were left
        CHECK(shot(lossAt(102, {ev(Opp, T::Shot, R::Saved, 117.1, 15, 34)})) == "NotFound");
    }
    SECTION("decimal times exactly 15 s apart count") {
        // 16.1 − 1.1 evaluates to 15.000000000000002 in binary floating point.
        CHECK(shot(lossAt(1.1, {ev(Opp, T::Shot, R::Off, 16.1, 15, 34)})) == "Found");
    }
    SECTION("our own shot is not theirs") {
        CHECK(shot(lossAt(102, {ev(Us, T::Shot, R::Off, 110, 90, 34)})) == "NotFound");
    }
    SECTION("the take event itself is a shot") {
        const Match m = makeMatch({
            ev(Us, T::Pass, R::Fail, 100, 60, 34),   // 0
            ev(Opp, T::Shot, R::Off, 101, 62, 34),   // 1: a first-time shot takes the ball
        });
        REQUIRE(firstLossOfUs(m).takeIndex == 1);
        // t_shot = tL = 101: 101 − 101 = 0 ≤ 15, "at or after the loss event"
        CHECK(shot(m) == "Found");
    }
    SECTION("a shot at the same time as the take event, after it in the file") {
        // 102 − 102 = 0 ≤ 15
        CHECK(shot(lossAt(102, {ev(Opp, T::Shot, R::Blocked, 102, 57, 34)})) == "Found");
    }
    SECTION("a shot after we regained and lost again still follows the first loss") {
        const Match m = lossAt(102, {
            ev(Us, T::Tackle, R::Ok, 104, 55, 34),   // regain
            ev(Opp, T::Recovery, R::Ok, 106, 56, 34),
            ev(Opp, T::Shot, R::Off, 110, 15, 34),   // 110 − 102 = 8 ≤ 15 after the first loss
        });
        CHECK(shot(m) == "Found");
    }
    SECTION("less than 15 s left and no shot: censored") {
        // 2700 − 2690 = 10 s left < 15
        CHECK(shot(lossAt(2690, {})) == "Censored");
    }
    SECTION("less than 15 s left and a shot: found") {
        // 2699 − 2690 = 9 ≤ 15
        CHECK(shot(lossAt(2690, {ev(Opp, T::Shot, R::Goal, 2699, 10, 34)})) == "Found");
    }
    SECTION("exactly 15 s left and no shot: not censored") {
        // 2700 − 2685 = 15, not less than 15
        CHECK(shot(lossAt(2685, {})) == "NotFound");
    }
    SECTION("a shot in the next period does not count") {
        // Loss at 2690 in period 1 (10 s left); their shot at 2 s into period 2 is another period.
        CHECK(shot(lossAt(2690, {ev(Opp, T::Shot, R::Off, 2, 15, 34, 2)})) == "Censored");
    }
}

// ---------------------------------------------------------------------------------------------
// Pre-shot passes (W = 15 s)

TEST_CASE("pre-shot passes") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 94, 30, 30),        // 0: 110 − 94 = 16 > 15 and 112 − 94 = 18: no
        ev(Us, T::Pass, R::Ok, 95, 32, 30),        // 1: 110 − 15 = 95 ≤ 95 < 110: yes
        ev(Us, T::Pass, R::Fail, 100, 40, 30),     // 2: not completed: no
        ev(Opp, T::Interception, R::Fail, 100.5, 60, 30), // 3
        ev(Us, T::Recovery, R::Ok, 101, 45, 30),   // 4: not a pass
        ev(Us, T::Pass, R::Ok, 105, 50, 30),       // 5: before shots at 110 and 112: yes, once
        ev(Us, T::Shot, R::Saved, 110, 95, 34),    // 6
        ev(Us, T::Pass, R::Ok, 112, 80, 30),       // 7: only shot after it is at 112 itself: no
        ev(Us, T::Shot, R::Off, 112, 92, 30),      // 8
        ev(Opp, T::Pass, R::Ok, 200, 60, 20),      // 9: their shot at 214.5: 14.5 ≤ 15: yes (theirs)
        ev(Us, T::Pass, R::Ok, 201, 55, 20),       // 10: a shot follows, but theirs: no
        ev(Opp, T::Recovery, R::Ok, 202, 50, 20),  // 11
        ev(Opp, T::Shot, R::Off, 214.5, 15, 34),   // 12
        ev(Opp, T::Pass, R::Ok, 300, 60, 20),      // 13: our shot follows, not theirs: no
        ev(Us, T::Interception, R::Ok, 301, 55, 20), // 14
        ev(Us, T::Shot, R::Off, 305, 90, 34),      // 15: makes no earlier pass of ours pre-shot
                                                   //     (our last pass, 10, is 104 s earlier)
        ev(Us, T::Pass, R::Ok, 2695, 70, 30),      // 16: next shot is in period 2: no
        ev(Us, T::Shot, R::Off, 3, 90, 34, 2),     // 17: 3 s into period 2
        ev(Us, T::Pass, R::Ok, 19.9, 35, 20, 2),   // 18: 35 − 19.9 = 15.1 > 15: no
        ev(Us, T::Pass, R::Ok, 20, 35, 20, 2),     // 19: 35 − 20 = 15 ≤ 15: yes
        ev(Us, T::Shot, R::Goal, 35, 95, 34, 2),   // 20
    });
    // Ours: passes 1, 5 and 19.
    CHECK(preShotPasses(m, Us, 15) == std::vector<std::size_t>{1, 5, 19});
    // Theirs: pass 9 only (13 is followed by our shot, not theirs).
    CHECK(preShotPasses(m, Opp, 15) == std::vector<std::size_t>{9});
    // A 5 s window: 110 − 5 = 105 ≤ 105 < 110 keeps pass 5 only; 95 and 20 are too early.
    CHECK(preShotPasses(m, Us, 5) == std::vector<std::size_t>{5});
}

TEST_CASE("pre-shot passes with decimal times exactly W before the shot") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 1.1, 30, 30),   // 16.1 − 15 = 1.1 ≤ 1.1 < 16.1: yes
        ev(Us, T::Shot, R::Off, 16.1, 95, 34), // (16.1 − 1.1 evaluates to 15.000000000000002)
    });
    CHECK(preShotPasses(m, Us, 15) == std::vector<std::size_t>{0});
}

// ---------------------------------------------------------------------------------------------
// The window search itself

TEST_CASE("findWithin: anchor, same time and window length") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 10, 50, 30),    // 0
        ev(Us, T::Shot, R::Off, 10, 95, 34),   // 1: same time as 0
        ev(Us, T::Shot, R::Saved, 12, 95, 34), // 2: 2 s after 0
    });
    auto isShot = [](const Event& e) { return e.type == T::Shot; };
    // Same time allowed: shot 1 (10 − 10 = 0 ≤ 5).
    CHECK(name(findWithin(m, 0, {5, false, true}, isShot)) == "Found");
    // Same time excluded: shot 2 (12 − 10 = 2 ≤ 5).
    CHECK(name(findWithin(m, 0, {5, false, false}, isShot)) == "Found");
    // Same time excluded and W = 1: shot 2 is 2 s away > 1; 2700 − 10 = 2690 s left.
    CHECK(name(findWithin(m, 0, {1, false, false}, isShot)) == "NotFound");
    // Same time allowed and W = 1: shot 1 (0 ≤ 1).
    CHECK(name(findWithin(m, 0, {1, false, true}, isShot)) == "Found");
    // The anchor itself only when asked: event 2 is the last event.
    CHECK(name(findWithin(m, 2, {5, true, true}, isShot)) == "Found");
    CHECK(name(findWithin(m, 2, {5, false, true}, isShot)) == "NotFound");
}

// ---------------------------------------------------------------------------------------------
// Small facts

TEST_CASE("lastBallPlace: a carry's end, otherwise the event's own position") {
    CHECK(lastBallPlace(carry(Us, R::Ok, 1, {10, 20}, {30, 40})) == Point{30, 40});
    CHECK(lastBallPlace(ev(Us, T::Carry, R::Ok, 1, 10, 20)) == Point{10, 20});
    // A pass's end is where the ball went, not where the passer had it.
    CHECK(lastBallPlace(pass(Us, R::Ok, 1, {10, 20}, {30, 40})) == Point{10, 20});
    CHECK(lastBallPlace(ev(Us, T::Shot, R::Off, 1, 95, 34)) == Point{95, 34});
}

TEST_CASE("minutesPlayed comes from the period lengths") {
    // makeMatch: two periods of 2700 s = 5400 s = 90 min
    CHECK(minutesPlayed(makeMatch({}).info) == Approx(90.0));
    MatchInfo info;
    info.periods = {{1, 2831}, {2, 2904}};
    // 2831 + 2904 = 5735 s; 5735 / 60 = 95.58333… min
    CHECK(minutesPlayed(info) == Approx(5735.0 / 60.0));
    info.periods = {{1, 2760}, {2, 2820}, {3, 930}, {4, 990}};
    // 2760 + 2820 + 930 + 990 = 7500 s = 125 min (extra time included)
    CHECK(minutesPlayed(info) == Approx(125.0));
    info.periods.clear();
    CHECK(minutesPlayed(info) == 0.0);
}

TEST_CASE("defensive actions are tackle, interception, foul and block, whatever the result") {
    for (const auto typeName : eventTypeNames()) {
        const EventType type = *eventTypeFromString(typeName);
        const bool expected = type == T::Tackle || type == T::Interception || type == T::Foul ||
                              type == T::Block;
        std::vector<Result> results = allowedResults(type);
        if (results.empty()) results.push_back(R::None);
        for (Result r : results) {
            INFO(typeName << " " << toString(r));
            CHECK(isDefensiveAction(ev(Us, type, r, 1, 50, 34)) == expected);
            CHECK(isDefensiveAction(ev(Opp, type, r, 1, 50, 34)) == expected);
        }
    }
}
