// The metric engine: the seven built-in metrics on hand-made matches (per-zone num/den worked
// out below), agreement with the plain functions of derived.h on a large random match, and
// user-defined specs.
//
// Zones on the default grid (105 × 68 m, 6 × 5): bands of 105 / 6 = 17.5 m, lanes of
// 68 / 5 = 13.6 m; band = ⌊x / 17.5⌋ + 1, lane = ⌊y / 13.6⌋ + 1 (a boundary goes up).

#include "derived.h"
#include "metricengine.h"
#include "metricspec.h"
#include "matchreader.h"
#include "moments.h"
#include "testutil.h"
#include "zones.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <cmath>
#include <optional>
#include <random>
#include <stdexcept>
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

const MetricSpec& builtin(std::string_view id) {
    for (const auto& s : builtinMetrics())
        if (s.id == id) return s;
    throw std::logic_error("no built-in metric " + std::string(id));
}

MatchTally tallyOf(const Match& m, const MetricSpec& spec, const ZoneGrid& grid = {}) {
    const MatchFacts facts(m);
    return computeTally(facts, spec, grid);
}

MatchTally tallyOf(const Match& m, std::string_view id) { return tallyOf(m, builtin(id)); }

std::string zoneName(Zone z) {
    return "(" + std::to_string(z.band) + "," + std::to_string(z.lane) + ")";
}

/// Zones with a non-zero num or den, band-major: "(1,1) 1/1, (2,3) 0/2".
std::string cells(const MatchTally& t, const ZoneGrid& grid = {}) {
    std::string out;
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const ZoneTally& z = t.at(static_cast<std::size_t>(i));
        if (z.num == 0 && z.den == 0) continue;
        if (!out.empty()) out += ", ";
        out += zoneName(grid.zoneAt(i)) + " " + std::to_string(z.num) + "/" + std::to_string(z.den);
    }
    return out;
}

/// Zones with a non-zero num: "(2,1) 1, (3,3) 2".
std::string nums(const MatchTally& t, const ZoneGrid& grid = {}) {
    std::string out;
    for (int i = 0; i < grid.zoneCount(); ++i) {
        const ZoneTally& z = t.at(static_cast<std::size_t>(i));
        if (z.num == 0) continue;
        if (!out.empty()) out += ", ";
        out += zoneName(grid.zoneAt(i)) + " " + std::to_string(z.num);
    }
    return out;
}

bool denIsOneEverywhere(const MatchTally& t) {
    return std::all_of(t.begin(), t.end(), [](const ZoneTally& z) { return z.den == 1; });
}

long sumNum(const MatchTally& t) {
    long s = 0;
    for (const auto& z : t) s += z.num;
    return s;
}

long sumDen(const MatchTally& t) {
    long s = 0;
    for (const auto& z : t) s += z.den;
    return s;
}

Event withTo(Event e, double toX, double toY) {
    e.to = Point{toX, toY};
    return e;
}

Event withTags(Event e, std::vector<std::string> tags) {
    e.tags = std::move(tags);
    return e;
}

MetricSpec specFrom(const std::string& json) {
    const SpecResult r = parseMetricSpec(json, "test spec");
    INFO(describeAll(r.errors));
    REQUIRE(r.spec.has_value());
    return *r.spec;
}

// Eleven losses of ours, each marked with its letter. For each: loss place → zone; regain
// (W = 5 s) and shot against (W = 15 s) outcomes. Periods of 2700 s.
Match lossMatch() {
    return makeMatch({
        // A: place (10, 5) → (1,1). Regain 104 − 101 = 3 ≤ 5. No shot of theirs before 210.
        ev(Us, T::Pass, R::Fail, 100, 10, 5),
        ev(Opp, T::Interception, R::Ok, 101, 10, 5),
        ev(Us, T::Tackle, R::Ok, 104, 12, 6),
        // B: place = the carry's end (60, 40) → 60/17.5 = 3.43, 40/13.6 = 2.94 → (4,3).
        //    Shot 210 − 202 = 8 ≤ 15. Our next control event is at 230: 28 > 5, no regain.
        withTo(ev(Us, T::Carry, R::Ok, 200, 40, 30), 60, 40),
        ev(Opp, T::Tackle, R::Ok, 202, 60, 40),
        ev(Opp, T::Shot, R::Off, 210, 15, 34),
        ev(Us, T::Recovery, R::Ok, 230, 5, 34),
        // F: place (100, 2) → 5.71, 0.15 → (6,1). Their clearance takes nothing; their recovery
        //    at 303 does. Regain by their foul: 307 − 303 = 4 ≤ 5. No shot.
        ev(Us, T::Pass, R::Ok, 300, 100, 2),
        ev(Opp, T::Clearance, R::Ok, 301, 5, 66),
        ev(Opp, T::Recovery, R::Ok, 303, 20, 60),
        ev(Opp, T::Foul, R::None, 307, 25, 60),
        ev(Us, T::Pass, R::Ok, 320, 80, 8),
        // J: place (50, 10) → 2.86, 0.74 → (3,1). Their out exactly 406 − 401 = 5 ≤ 5. No shot.
        ev(Us, T::Pass, R::Fail, 400, 50, 10),
        ev(Opp, T::Interception, R::Ok, 401, 60, 20),
        ev(Opp, T::Out, R::None, 406, 70, 0),
        ev(Us, T::Pass, R::Ok, 420, 70, 0),
        // K: place (50, 10) → (3,1). Our recovery 506.1 − 501 = 5.1 > 5: no regain. No shot.
        ev(Us, T::Pass, R::Fail, 500, 50, 10),
        ev(Opp, T::Interception, R::Ok, 501, 60, 20),
        ev(Us, T::Recovery, R::Ok, 506.1, 40, 30),
        // G: place (70, 50) → 70/17.5 = 4 exactly (boundary → 5), 3.68 → (5,4). The take event
        //    is their shot: a shot after the loss (0 s). Our keeper holds 1 s later: regain.
        ev(Us, T::Pass, R::Fail, 600, 70, 50),
        ev(Opp, T::Shot, R::Saved, 601, 30, 30),
        ev(Us, T::Keeper, R::Ok, 602, 2, 34),
        // H: place (20, 40) → 1.14, 2.94 → (2,3). Their shot 716 − 701 = 15 ≤ 15. Our recovery
        //    at 720: 19 > 5, no regain.
        ev(Us, T::Pass, R::Fail, 700, 20, 40),
        ev(Opp, T::Recovery, R::Ok, 701, 25, 40),
        ev(Opp, T::Pass, R::Ok, 705, 30, 40),
        ev(Opp, T::Shot, R::Off, 716, 12, 34),
        ev(Us, T::Recovery, R::Ok, 720, 3, 34),
        // I: place (20, 40) → (2,3). Their shot 816.1 − 801 = 15.1 > 15: none. No regain (19.0 s).
        ev(Us, T::Pass, R::Fail, 800, 20, 40),
        ev(Opp, T::Recovery, R::Ok, 801, 25, 40),
        ev(Opp, T::Shot, R::Off, 816.1, 12, 34),
        ev(Us, T::Recovery, R::Ok, 820, 3, 34),
        // C: place (90, 60) → 5.14, 4.41 → (6,5). 2700 − 2692 = 8 s left: no regain and
        //    8 ≥ 5 → counts as not regained; no shot and 8 < 15 → censored.
        ev(Us, T::Pass, R::Ok, 2690, 90, 60),
        ev(Opp, T::Recovery, R::Ok, 2692, 15, 8),
        // Period 2 starts with nobody in control: their pass is no loss of ours.
        ev(Opp, T::Pass, R::Ok, 10, 50, 34, 2),
        ev(Us, T::Interception, R::Ok, 12, 50, 34, 2),
        // E: place (30, 20) → 1.71, 1.47 → (2,2). 3 s left, but our tackle 2699 − 2697 = 2 ≤ 5
        //    is a regain (found, so not censored). No shot and 3 < 15 → censored.
        ev(Us, T::Pass, R::Ok, 2680, 30, 20, 2),
        ev(Opp, T::Interception, R::Ok, 2697, 35, 20, 2),
        ev(Us, T::Tackle, R::Ok, 2699, 32, 20, 2),
        // D: place = our tackle (32, 20) → 1.83, 1.47 → (2,2). 0.5 s left, no regain, no shot:
        //    censored for both.
        ev(Opp, T::Recovery, R::Ok, 2699.5, 40, 25, 2),
    });
}

} // namespace

// ---------------------------------------------------------------------------------------------
// Built-in metrics on hand-made matches

TEST_CASE("regain_5s: regained / uncensored losses, binned at the loss place") {
    const Match m = lossMatch();
    const MatchTally t = tallyOf(m, "regain_5s");
    // (1,1) A regained                         1/1
    // (2,2) E regained, D censored (left out)  1/1
    // (2,3) H, I not regained                  0/2
    // (3,1) J regained, K not                  1/2
    // (4,3) B not regained                     0/1
    // (5,4) G regained                         1/1
    // (6,1) F regained                         1/1
    // (6,5) C not regained (8 s were left)     0/1
    CHECK(cells(t) ==
          "(1,1) 1/1, (2,2) 1/1, (2,3) 0/2, (3,1) 1/2, (4,3) 0/1, (5,4) 1/1, (6,1) 1/1, (6,5) 0/1");
    // 11 losses, 1 censored (D): den 10; regained A, E, J, G, F: num 5.
    CHECK(sumNum(t) == 5);
    CHECK(sumDen(t) == 10);
}

TEST_CASE("shot_after_loss: losses followed by their shot within 15 s / uncensored losses") {
    const Match m = lossMatch();
    const MatchTally t = tallyOf(m, "shot_after_loss");
    // (1,1) A no shot                          0/1
    // (2,2) E, D censored                      —
    // (2,3) H shot at 15 s, I at 15.1 s        1/2
    // (3,1) J, K no shot                       0/2
    // (4,3) B shot 8 s later                   1/1
    // (5,4) G the take event is a shot         1/1
    // (6,1) F no shot                          0/1
    // (6,5) C censored (8 s left < 15)         —
    CHECK(cells(t) == "(1,1) 0/1, (2,3) 1/2, (3,1) 0/2, (4,3) 1/1, (5,4) 1/1, (6,1) 0/1");
    // 11 losses, 3 censored (C, E, D): den 8; shots after B, G, H: num 3.
    CHECK(sumNum(t) == 3);
    CHECK(sumDen(t) == 8);
}

TEST_CASE("losses: every loss of ours counted per match, den 1 in every zone") {
    const Match m = lossMatch();
    const MatchTally t = tallyOf(m, "losses");
    // A (1,1); E, D (2,2); H, I (2,3); J, K (3,1); B (4,3); G (5,4); F (6,1); C (6,5).
    // Censored losses count here too: the metric looks no time past the loss.
    CHECK(nums(t) == "(1,1) 1, (2,2) 2, (2,3) 2, (3,1) 2, (4,3) 1, (5,4) 1, (6,1) 1, (6,5) 1");
    CHECK(sumNum(t) == 11);
    CHECK(denIsOneEverywhere(t));
    CHECK(t.size() == 30);
}

TEST_CASE("pre_shot_passes_for and _against: completed passes in the 15 s before a shot") {
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 50, 20, 10),        // (2,1): shot at 60, 10 s later: yes
        ev(Us, T::Pass, R::Fail, 52, 30, 10),      // not completed: no
        withTo(ev(Us, T::Pass, R::Ok, 55, 40, 30), 95, 60), // (3,3) at its start: yes, once
        ev(Us, T::Shot, R::Saved, 60, 95, 34),
        ev(Us, T::Shot, R::Off, 62, 96, 30),       // a second shot: the pass at 55 counts once
        ev(Us, T::Pass, R::Ok, 70, 80, 50),        // (5,4): the shot at 70 is the same time,
        ev(Us, T::Shot, R::Blocked, 70, 90, 40),   //   the next at 86 is 16 s later: no
        ev(Us, T::Shot, R::Off, 86, 92, 34),
        ev(Opp, T::Pass, R::Ok, 100, 60, 20),      // (4,2): their shot 14.9 s later: yes (theirs)
        ev(Opp, T::Pass, R::Ok, 101, 50, 34),      // (3,3): 13.9 s: yes (theirs)
        ev(Opp, T::Shot, R::Off, 114.9, 15, 34),
        ev(Opp, T::Pass, R::Ok, 120, 40, 34),      // followed by our shot, not theirs: no
        ev(Us, T::Interception, R::Ok, 121, 40, 34),
        ev(Us, T::Shot, R::Off, 125, 80, 34),      // (our pass before it is at 70: 55 s earlier)
        ev(Us, T::Pass, R::Ok, 2690, 90, 10),      // next shot is in period 2: no
        ev(Us, T::Shot, R::Off, 3, 90, 34, 2),
        ev(Us, T::Pass, R::Ok, 19.9, 30, 20, 2),   // 35 − 19.9 = 15.1 > 15: no
        ev(Us, T::Pass, R::Ok, 20, 35, 13.6, 2),   // (3,2) (both on boundaries): 35 − 20 = 15: yes
        ev(Us, T::Shot, R::Goal, 35, 95, 34, 2),
    });
    const MatchTally forUs = tallyOf(m, "pre_shot_passes_for");
    // (2,1) 20/17.5 = 1.14, 10/13.6 = 0.74; (3,2) 35/17.5 = 2 → 3, 13.6/13.6 = 1 → 2;
    // (3,3) 40/17.5 = 2.29, 30/13.6 = 2.21.
    CHECK(nums(forUs) == "(2,1) 1, (3,2) 1, (3,3) 1");
    CHECK(denIsOneEverywhere(forUs));
    const MatchTally against = tallyOf(m, "pre_shot_passes_against");
    // (3,3) 50/17.5 = 2.86, 34/13.6 = 2.5; (4,2) 60/17.5 = 3.43, 20/13.6 = 1.47.
    CHECK(nums(against) == "(3,3) 1, (4,2) 1");
    CHECK(denIsOneEverywhere(against));
}

TEST_CASE("press_rate: our defensive actions / their passes, each binned at its own place") {
    const Match m = makeMatch({
        ev(Opp, T::Pass, R::Ok, 10, 80, 30),          // den (5,3): 4.57, 2.21
        ev(Us, T::Tackle, R::Fail, 12, 80, 30),       // num (5,3)
        ev(Opp, T::Pass, R::Fail, 13, 82, 28),        // den (5,3): 4.69, 2.06 (any result)
        ev(Us, T::Interception, R::Ok, 14, 75, 25),   // num (5,2): 4.29, 1.84
        withTo(ev(Us, T::Pass, R::Ok, 20, 75, 25), 100, 60),
        ev(Opp, T::Recovery, R::Ok, 25, 20, 48),
        withTo(ev(Opp, T::Pass, R::Ok, 26, 20, 48), 50, 50), // den (2,4) at its start: 1.14, 3.53
        ev(Us, T::Foul, R::None, 27, 22, 47),         // num (2,4): 1.26, 3.46
        ev(Opp, T::Pass, R::Ok, 40, 20, 48),          // den (2,4)
        ev(Us, T::Block, R::Ok, 41, 18, 45),          // num (2,4): 1.03, 3.31
        ev(Us, T::Clearance, R::Ok, 42, 15, 40),      // not a defensive action
        ev(Opp, T::Pass, R::Ok, 50, 50, 60),          // den (3,5): 2.86, 4.41
        ev(Us, T::Tackle, R::Ok, 60, 10, 10),         // num (1,1), no pass of theirs there
        ev(Opp, T::Carry, R::Ok, 62, 10, 10),         // not a pass: no den
        ev(Opp, T::Tackle, R::Ok, 63, 80, 30),        // their tackle: not ours
    });
    const MatchTally t = tallyOf(m, "press_rate");
    CHECK(cells(t) == "(1,1) 1/0, (2,4) 2/2, (3,5) 0/1, (5,2) 1/0, (5,3) 1/2");
    CHECK(sumNum(t) == 5); // tackle 12, interception 14, foul 27, block 41, tackle 60
    CHECK(sumDen(t) == 5); // their passes at 10, 13, 26, 40, 50
}

TEST_CASE("pass_completion: our completed / attempted passes, binned at the origin") {
    const Match m = makeMatch({
        withTo(ev(Us, T::Pass, R::Ok, 20, 75, 25), 100, 60), // (5,2) ok, binned at its start
        ev(Us, T::Pass, R::Fail, 22, 85, 20),                 // (5,2): 4.86, 1.47 fail
        ev(Opp, T::Pass, R::Ok, 25, 85, 20),                  // theirs: ignored
        ev(Us, T::Pass, R::Ok, 61, 10, 10),                   // (1,1) ok
        ev(Us, T::Pass, R::Ok, 65, 35, 0),                    // (3,1): 35 on the 2|3 edge → 3
        ev(Us, T::Carry, R::Ok, 68, 35, 0),                   // not a pass
        ev(Us, T::Pass, R::Fail, 70, 105, 68),                // (6,5): far corner, fail
    });
    const MatchTally t = tallyOf(m, "pass_completion");
    CHECK(cells(t) == "(1,1) 1/1, (3,1) 1/1, (5,2) 1/2, (6,5) 0/1");
    CHECK(sumNum(t) == 3);
    CHECK(sumDen(t) == 5);
}

TEST_CASE("tallies follow the grid: the same losses on the markings grid") {
    const Match m = lossMatch();
    const ZoneGrid grid = ZoneGrid::markings(6);
    const MatchTally t = tallyOf(m, builtin("losses"), grid);
    // Lanes cut at 13.84, 24.84, 43.16, 54.16 (Laws of the Game, Law 1 markings on 68 m).
    // A (10, 5) → (1,1); E (30, 20), D (32, 20) → (2,2); H, I (20, 40) → 24.84 ≤ 40 < 43.16 →
    // (2,3); J, K (50, 10) → (3,1); B (60, 40) → (4,3); G (70, 50) → 43.16 ≤ 50 < 54.16 → (5,4);
    // F (100, 2) → (6,1); C (90, 60) → (6,5).
    CHECK(nums(t, grid) ==
          "(1,1) 1, (2,2) 2, (2,3) 2, (3,1) 2, (4,3) 1, (5,4) 1, (6,1) 1, (6,5) 1");
    // On a 3 × 3 grid (bands of 35 m, lanes of 22.67 m) the same losses gather differently:
    // A (1,1); E, D (1,1); H, I (1,2); J, K (2,1); B (2,2); G (3,3): 70 → 3, 50 → 3;
    // F (3,1); C (3,3): 90 → 3, 60 → 3.
    const ZoneGrid coarse = ZoneGrid::equal(3, 3);
    const MatchTally c = tallyOf(m, builtin("losses"), coarse);
    CHECK(nums(c, coarse) == "(1,1) 3, (1,2) 2, (2,1) 2, (2,2) 1, (3,1) 1, (3,3) 2");
    CHECK(c.size() == 9);
}

// ---------------------------------------------------------------------------------------------
// User-defined specs

TEST_CASE("user metric: crosses that arrive (tags_any)") {
    const MetricSpec spec = specFrom(R"({"id": "cross_completion", "better": "higher",
        "items": {"side": "us", "type": "pass", "tags_any": ["cross"]},
        "success": {"is": {"result": "ok"}}, "per": "items"})");
    const Match m = makeMatch({
        withTags(ev(Us, T::Pass, R::Ok, 10, 90, 5), {"cross"}),                // (6,1) ok
        withTags(ev(Us, T::Pass, R::Fail, 20, 92, 63), {"cross"}),             // (6,5) fail
        ev(Us, T::Pass, R::Ok, 30, 90, 5),                                     // no tag
        withTags(ev(Us, T::Pass, R::Ok, 40, 105, 0), {"corner", "cross"}),     // (6,1) ok
        withTags(ev(Opp, T::Pass, R::Ok, 50, 10, 30), {"cross"}),              // theirs
        withTags(ev(Us, T::Pass, R::Ok, 60, 90, 5), {"crossfield"}),           // another word
    });
    // (6,1): 90/17.5 = 5.14 and 105 (far edge) → band 6; 5/13.6 and 0 → lane 1: 2 of 2.
    // (6,5): 92/17.5 = 5.26, 63/13.6 = 4.63: 0 of 1.
    CHECK(cells(tallyOf(m, spec)) == "(6,1) 2/2, (6,5) 0/1");
}

TEST_CASE("user metric: completed passes binned at their end (at: end)") {
    const MetricSpec spec = specFrom(R"({"id": "pass_targets", "better": "higher",
        "items": {"side": "us", "type": "pass", "result": "ok", "at": "end"}, "per": "match"})");
    const Match m = makeMatch({
        withTo(ev(Us, T::Pass, R::Ok, 10, 10, 10), 100, 60),  // end (100, 60) → (6,5)
        withTo(ev(Us, T::Pass, R::Ok, 12, 100, 60), 52.5, 34), // end → 3 → 4, 2.5 → 3: (4,3)
        withTo(ev(Us, T::Pass, R::Fail, 14, 10, 10), 100, 60), // not completed
        ev(Us, T::Pass, R::Ok, 16, 10, 10),                    // no end: binned at its start (1,1)
    });
    const MatchTally t = tallyOf(m, spec);
    CHECK(nums(t) == "(1,1) 1, (4,3) 1, (6,5) 1");
    CHECK(denIsOneEverywhere(t));
}

TEST_CASE("user metric: same_time decides whether an event at the item's time follows it") {
    const std::string base = R"({"id": "take_on_to_shot", "better": "higher",
        "items": {"side": "us", "type": "take_on", "result": "ok"},
        "success": {"followed_by": {"side": "same", "type": "shot"}, "within_s": 3)";
    const Match m = makeMatch({
        ev(Us, T::TakeOn, R::Ok, 10, 80, 30),   // (5,3): shot at the same time, 10
        ev(Us, T::Shot, R::Off, 10, 85, 30),
        ev(Us, T::TakeOn, R::Ok, 20, 80, 30),   // (5,3): shot 2 s later
        ev(Us, T::Shot, R::Off, 22, 85, 30),
        ev(Us, T::TakeOn, R::Ok, 30, 80, 30),   // (5,3): their shot only: no
        ev(Opp, T::Shot, R::Off, 31, 20, 30),
    });
    // same_time true (default): take-ons at 10 and 20 followed: 2/3.
    CHECK(cells(tallyOf(m, specFrom(base + R"(}, "per": "items"})"))) == "(5,3) 2/3");
    // same_time false: the shot at 10 no longer follows the take-on at 10: 1/3.
    CHECK(cells(tallyOf(m, specFrom(base + R"(, "same_time": false}, "per": "items"})"))) ==
          "(5,3) 1/3");
}

TEST_CASE("user metric: censor false keeps unresolved items near the end in the denominator") {
    const std::string base = R"({"id": "regain_5s_all", "better": "higher",
        "items": {"losses_of": "us"},
        "success": {"followed_by": {"any_of": [
            {"side": "same", "gives_control": true}, {"side": "other", "type": ["foul", "out"]}]},
          "within_s": 5)";
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Ok, 2690, 90, 60),        // loss place (90, 60) → (6,5)
        ev(Opp, T::Recovery, R::Ok, 2697, 15, 8),    // loss at 2697, 3 s left, no regain
    });
    // Built-in regain_5s: censored (3 < 5) and left out: nothing at all.
    CHECK(cells(tallyOf(m, "regain_5s")).empty());
    // Same spec, censoring on (default): the same.
    CHECK(cells(tallyOf(m, specFrom(base + R"(}, "per": "items"})"))).empty());
    // censor false: the loss stays, unregained: 0/1.
    CHECK(cells(tallyOf(m, specFrom(base + R"(, "censor": false}, "per": "items"})"))) ==
          "(6,5) 0/1");
}

TEST_CASE("user metric: our failed passes followed by their shot (side other)") {
    const MetricSpec spec = specFrom(R"({"id": "bad_pass_to_shot", "better": "lower",
        "items": {"side": "us", "type": "pass", "result": "fail"},
        "success": {"followed_by": {"side": "other", "type": "shot"}, "within_s": 10},
        "per": "items"})");
    const Match m = makeMatch({
        ev(Us, T::Pass, R::Fail, 100, 40, 30),   // (3,3): their shot 108 − 100 = 8 ≤ 10: yes
        ev(Opp, T::Recovery, R::Ok, 101, 60, 30),
        ev(Opp, T::Shot, R::Off, 108, 15, 34),
        ev(Us, T::Pass, R::Fail, 200, 40, 30),   // (3,3): our own shot only: no
        ev(Us, T::Shot, R::Off, 205, 90, 34),
        ev(Us, T::Pass, R::Fail, 2695, 40, 30),  // (3,3): 5 s left < 10, no shot: censored
    });
    CHECK(cells(tallyOf(m, spec)) == "(3,3) 1/2");
}

TEST_CASE("user metric: their losses, and an exposure binned at the carry's end") {
    const Match m = lossMatch();
    // Their losses in lossMatch: our control events that follow theirs. 104 (after A's take),
    // 230, 320 (after their foul; the ball was theirs), 420, 506.1, 602, 720, 820, period 2: 12,
    // 2699. Places are their last events:
    //  104: interception 101 at (10, 5) → (1,1)       230: shot 210 at (15, 34) → (1,3)
    //  320: foul 307 at (25, 60) → (2,5)              420: out 406 at (70, 0) → (5,1)
    //  506.1: interception 501 at (60, 20) → (4,2)    602: shot 601 at (30, 30) → (2,3)
    //  720: shot 716 at (12, 34) → (1,3)              820: shot 816.1 at (12, 34) → (1,3)
    //  p2 12: pass 10 at (50, 34) → (3,3)             p2 2699: interception 2697 (35, 20) → (3,2)
    const MetricSpec theirs = specFrom(R"({"id": "their_losses", "better": "higher",
        "items": {"losses_of": "opp"}, "per": "match"})");
    CHECK(nums(tallyOf(m, theirs)) ==
          "(1,1) 1, (1,3) 3, (2,3) 1, (2,5) 1, (3,2) 1, (3,3) 1, (4,2) 1, (5,1) 1");

    const MetricSpec perCarry = specFrom(R"({"id": "tackles_per_carry", "better": "higher",
        "items": {"side": "us", "type": "tackle"},
        "per": {"side": "us", "type": "carry", "at": "end"}})");
    // Our tackles: 104 at (12, 6) → (1,1); p2 2699 at (32, 20) → (2,2). Our one carry, at 200,
    // ends at (60, 40) → (4,3).
    CHECK(cells(tallyOf(m, perCarry)) == "(1,1) 1/0, (2,2) 1/0, (4,3) 0/1");
}

// ---------------------------------------------------------------------------------------------
// Agreement with the plain functions on a large random match

namespace {

/// A valid random match: `n` events in two periods of 600 s, sorted by (period, t), with times
/// in tenths of a second (so equal times occur), a tenth of them in the last 20 s of a period
/// (so windows get censored), and some positions on zone boundaries.
Match randomMatch(unsigned seed, int n) {
    std::mt19937 rng(seed);
    constexpr double kPeriod = 600;
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    auto chance = [&](double p) { return unit(rng) < p; };
    auto pick = [&](const auto& v) { return v[static_cast<std::size_t>(unit(rng) * v.size()) % v.size()]; };

    const std::vector<EventType> types{T::Pass, T::Carry, T::TakeOn, T::Shot, T::Recovery,
                                       T::Interception, T::Tackle, T::Keeper, T::Clearance,
                                       T::Block, T::Foul, T::Out};
    std::discrete_distribution<int> typeDist({35, 14, 5, 5, 8, 6, 8, 3, 5, 4, 4, 3});
    const std::vector<double> xEdges{0, 17.5, 35, 52.5, 70, 87.5, 105};
    const std::vector<double> yEdges{0, 13.6, 27.2, 40.8, 54.4, 68, 13.84, 24.84, 43.16, 54.16};
    auto coordinate = [&](double limit, const std::vector<double>& edges) {
        if (chance(0.1)) return pick(edges);
        return std::round(unit(rng) * limit * 4) / 4;
    };

    std::vector<Event> events;
    for (int i = 0; i < n; ++i) {
        Event e;
        e.period = chance(0.5) ? 1 : 2;
        const double t = chance(0.1) ? kPeriod - 20 * unit(rng) : kPeriod * unit(rng);
        e.t = std::round(t * 10) / 10;
        e.side = chance(0.5) ? Us : Opp;
        e.type = types[static_cast<std::size_t>(typeDist(rng))];
        const auto& allowed = allowedResults(e.type);
        if (allowed.empty()) e.result = R::None;
        else if (e.type == T::Pass) e.result = chance(0.75) ? R::Ok : R::Fail;
        else e.result = pick(allowed);
        e.at = {coordinate(105, xEdges), coordinate(68, yEdges)};
        if ((e.type == T::Pass || e.type == T::Carry) && chance(0.7))
            e.to = Point{coordinate(105, xEdges), coordinate(68, yEdges)};
        if (e.type == T::Pass && chance(0.1)) e.tags = {"cross"};
        events.push_back(std::move(e));
    }
    std::stable_sort(events.begin(), events.end(), [](const Event& a, const Event& b) {
        return a.period != b.period ? a.period < b.period : a.t < b.t;
    });
    return makeMatch(std::move(events), kPeriod);
}

/// Adds one item to `tally` the way a rate counts it: num when found, den unless censored.
void addRate(MatchTally& tally, int zone, WindowOutcome outcome) {
    auto& z = tally[static_cast<std::size_t>(zone)];
    if (outcome == WindowOutcome::Found) ++z.num;
    if (outcome != WindowOutcome::Censored) ++z.den;
}

std::string firstDifference(const MatchTally& a, const MatchTally& b, const ZoneGrid& grid) {
    if (a.size() != b.size()) return "sizes differ";
    for (std::size_t i = 0; i < a.size(); ++i)
        if (!(a[i] == b[i]))
            return zoneName(grid.zoneAt(static_cast<int>(i))) + ": engine " +
                   std::to_string(a[i].num) + "/" + std::to_string(a[i].den) + ", expected " +
                   std::to_string(b[i].num) + "/" + std::to_string(b[i].den);
    return "";
}

} // namespace

TEST_CASE("engine tallies agree with derived.h on 2000 random events") {
    const Match m = randomMatch(20260808u, 2000);
    REQUIRE(m.events.size() == 2000);
    const ZoneGrid grid = GENERATE(ZoneGrid(), ZoneGrid::markings(6), ZoneGrid::equal(3, 4));
    INFO("grid " << grid.name());
    const Pitch& pitch = m.info.pitch;
    auto zone = [&](Point p) { return grid.indexOf(grid.zoneOf(p, pitch)); };
    const auto zones = static_cast<std::size_t>(grid.zoneCount());
    const MatchFacts facts(m);
    const auto losses = findLosses(m);

    MatchTally regain(zones), shot(zones), lossCount(zones, {0, 1}), preFor(zones, {0, 1}),
        preAgainst(zones, {0, 1}), press(zones), completion(zones);
    long ourLosses = 0, censoredRegains = 0, censoredShots = 0;
    for (const Loss& loss : losses) {
        if (loss.side != Us) continue;
        ++ourLosses;
        const int z = zone(loss.place);
        const auto r = regainWithin(m, loss, 5);
        const auto s = shotAfterLoss(m, loss, 15);
        censoredRegains += r == WindowOutcome::Censored;
        censoredShots += s == WindowOutcome::Censored;
        addRate(regain, z, r);
        addRate(shot, z, s);
        ++lossCount[static_cast<std::size_t>(z)].num;
    }
    for (std::size_t i : preShotPasses(m, Us, 15)) ++preFor[static_cast<std::size_t>(zone(m.events[i].at))].num;
    for (std::size_t i : preShotPasses(m, Opp, 15))
        ++preAgainst[static_cast<std::size_t>(zone(m.events[i].at))].num;
    for (const Event& e : m.events) {
        const auto z = static_cast<std::size_t>(zone(e.at));
        if (e.side == Us && isDefensiveAction(e)) ++press[z].num;
        if (e.side == Opp && e.type == T::Pass) ++press[z].den;
        if (e.side == Us && e.type == T::Pass) {
            ++completion[z].den;
            if (e.result == R::Ok) ++completion[z].num;
        }
    }

    // The random match exercises what it should: many losses, censoring of both kinds,
    // regains and shots found and not found, pre-shot passes on both sides.
    CHECK(ourLosses > 200);
    CHECK(censoredRegains > 0);
    CHECK(censoredShots > censoredRegains);
    CHECK(sumNum(regain) > 0);
    CHECK(sumNum(regain) < sumDen(regain));
    CHECK(sumNum(shot) > 0);
    CHECK(sumNum(shot) < sumDen(shot));
    CHECK(sumNum(preFor) > 20);
    CHECK(sumNum(preAgainst) > 20);

    const std::vector<std::pair<std::string, const MatchTally*>> expected{
        {"regain_5s", &regain},
        {"shot_after_loss", &shot},
        {"pre_shot_passes_for", &preFor},
        {"pre_shot_passes_against", &preAgainst},
        {"losses", &lossCount},
        {"press_rate", &press},
        {"pass_completion", &completion},
    };
    for (const auto& [id, want] : expected) {
        INFO(id);
        const MatchTally got = computeTally(facts, builtin(id), grid);
        CHECK(firstDifference(got, *want, grid) == "");
        CHECK(sumNum(got) == sumNum(*want));
        CHECK(sumDen(got) == sumDen(*want));
    }
    // Totals in plain words: the losses metric counts every loss of ours; regain_5s leaves out
    // exactly the censored ones.
    CHECK(sumNum(computeTally(facts, builtin("losses"), grid)) == ourLosses);
    CHECK(sumDen(computeTally(facts, builtin("regain_5s"), grid)) == ourLosses - censoredRegains);
    CHECK(sumDen(computeTally(facts, builtin("shot_after_loss"), grid)) ==
          ourLosses - censoredShots);
}

TEST_CASE("findLosses agrees with a direct reading of the definition on random events") {
    // Control belongs to the side of the latest control-giving event in the period; a loss of
    // A is a control-giving event of B while A had control. Read literally, quadratically.
    const Match m = randomMatch(424242u, 2000);
    const auto& events = m.events;
    std::vector<std::pair<std::size_t, std::size_t>> expected; // (take, last of the loser)
    for (std::size_t i = 0; i < events.size(); ++i) {
        if (!givesControl(events[i])) continue;
        // the latest control-giving event before i in the same period
        std::optional<std::size_t> latest;
        for (std::size_t j = i; j-- > 0 && events[j].period == events[i].period;)
            if (givesControl(events[j])) {
                latest = j;
                break;
            }
        if (!latest || events[*latest].side == events[i].side) continue;
        // the loser's last event before i (it exists: `latest` is one)
        std::size_t last = i;
        for (std::size_t j = i; j-- > 0;)
            if (events[j].side != events[i].side) {
                last = j;
                break;
            }
        expected.emplace_back(i, last);
    }
    const auto losses = findLosses(m);
    REQUIRE(expected.size() > 300);
    REQUIRE(losses.size() == expected.size());
    for (std::size_t k = 0; k < losses.size(); ++k) {
        INFO("loss " << k);
        const auto [take, last] = expected[k];
        CHECK(losses[k].takeIndex == take);
        CHECK(losses[k].lastIndex == last);
        CHECK(losses[k].side == other(events[take].side));
        CHECK(losses[k].t == events[take].t);
        CHECK(losses[k].period == events[take].period);
        CHECK(losses[k].place == lastBallPlace(events[last]));
    }
}

// ---------------------------------------------------------------------------------------------
// The moments behind a zone (model/moments.h) add up to the tallies

namespace {

/// A match's moments added up per zone the way their counts say (docs/moments.md): num the
/// successes; den the successes and the rest of a share's items, or the exposure events, or the
/// match itself for a per-match count.
MatchTally tallyFromMoments(const Match& m, const MetricSpec& spec, const ZoneGrid& grid) {
    MatchTally t(static_cast<std::size_t>(grid.zoneCount()));
    for (const Moment& mo : matchMoments(m, spec, grid, std::nullopt)) {
        ZoneTally& z = t[static_cast<std::size_t>(grid.indexOf(Zone{mo.band, mo.lane}))];
        if (mo.count == MomentCount::Success) ++z.num;
        const bool share = spec.per == MetricSpec::Per::Items;
        if (mo.count == MomentCount::Exposure || (share && mo.count != MomentCount::Censored)) ++z.den;
    }
    if (spec.per == MetricSpec::Per::Match)
        for (auto& z : t) z.den = 1;
    return t;
}

} // namespace

TEST_CASE("moments add up to the tallies of every metric, zone and grid") {
    std::vector<MetricSpec> specs = builtinMetrics();
    // The user metrics above whose counting differs from the built-in ones: censoring off, an
    // exposure binned at a carry's end, their losses.
    specs.push_back(specFrom(R"({"id": "regain_all", "better": "higher", "items": {"losses_of": "us"},
        "success": {"followed_by": {"side": "same", "gives_control": true}, "within_s": 5,
        "censor": false}, "per": "items"})"));
    specs.push_back(specFrom(R"({"id": "tackles_per_carry", "better": "higher",
        "items": {"side": "us", "type": "tackle"}, "per": {"side": "us", "type": "carry", "at": "end"}})"));
    specs.push_back(specFrom(R"({"id": "their_losses", "better": "higher",
        "items": {"losses_of": "opp"}, "per": "match"})"));
    const ZoneGrid grid = GENERATE(ZoneGrid(), ZoneGrid::markings(6), ZoneGrid::equal(3, 4));
    std::vector<Match> matches{lossMatch(), randomMatch(20261205u, 2000)};
    // ... and the demo season, every match file of the sample club.
    for (const auto& file : std::filesystem::directory_iterator(
             pitchloop::testutil::sourcePath("sample-club/matches"))) {
        auto read = readMatchFile(file.path());
        REQUIRE(read.ok());
        matches.push_back(std::move(*read.match));
    }
    REQUIRE(matches.size() >= 30);
    for (const Match& m : matches) {
        for (const MetricSpec& spec : specs) {
            INFO(spec.id << " on " << grid.name() << ", " << m.events.size() << " events");
            CHECK(firstDifference(tallyFromMoments(m, spec, grid), tallyOf(m, spec, grid), grid).empty());
        }
    }
}

TEST_CASE("moments of the hand-checked match say what happened and when") {
    const Match m = lossMatch();
    // regain_5s in (3,1): J regained by their ball out 5 s after the take at 401; K not (our
    // recovery 5.1 s after the take at 501 is too late).
    const auto moments = matchMoments(m, builtin("regain_5s"), ZoneGrid(), Zone{3, 1});
    REQUIRE(moments.size() == 2);
    CHECK(moments[0].count == MomentCount::Success);
    CHECK(moments[0].t == 401);
    CHECK(moments[0].startT == 400); // our failed pass: where the ball was lost
    REQUIRE(moments[0].answerAfterS);
    CHECK(*moments[0].answerAfterS == Approx(5.0));
    CHECK(moments[0].endT == 406);
    CHECK(moments[0].what == "we lost the ball (pass) to their interception → their ball out after 5.0 s");
    CHECK(moments[1].count == MomentCount::NoSuccess);
    CHECK(moments[1].what == "we lost the ball (pass) to their interception → nothing within 5.0 s");
    CHECK(moments[1].endT == 506);
    // G: their shot is itself the take event, so it is a shot after the loss at once.
    const auto shots = matchMoments(m, builtin("shot_after_loss"), ZoneGrid(), Zone{5, 4});
    REQUIRE(shots.size() == 1);
    CHECK(shots[0].count == MomentCount::Success);
    CHECK(*shots[0].answerAfterS == 0);
    CHECK(shots[0].what == "we lost the ball (pass) to their shot, saved (itself the answer)");
}
