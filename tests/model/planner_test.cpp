// The session planner: severity by hand, hand-worked plans (coverage, diminishing returns,
// yesterday, pins, removals, swaps, order and explanations), every bad input with its own
// message, and a property test against brute force over every subset of small drill books.

#include "focus.h"
#include "planner.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <limits>
#include <random>
#include <set>

using namespace pitchloop::model;
using Catch::Matchers::Contains;
using Catch::Matchers::WithinAbs;

namespace {

Drill drill(std::int64_t id, const std::string& title, int minutes, int intensity,
            std::vector<std::string> metrics = {}, std::vector<Zone> zones = {},
            std::vector<std::string> tags = {}, int playersMin = 4) {
    Drill d;
    d.id = id;
    d.title = title;
    d.durationMin = minutes;
    d.intensity = intensity;
    d.playersMin = playersMin;
    d.playersMax = 24;
    d.metrics = std::move(metrics);
    d.zones = std::move(zones);
    d.tags = std::move(tags);
    d.author = "R. Tamsin";
    return d;
}

PlanFocus focusOf(std::int64_t id, const std::string& metric, std::vector<Zone> zones,
                  double severityValue) {
    PlanFocus f;
    f.id = id;
    f.metric = metric;
    f.zones = std::move(zones);
    f.band = f.zones.front().band;
    f.lane = f.zones.front().lane;
    f.severity = severityValue;
    return f;
}

/// Wednesday 2026-08-12 between Saturday matches on the 8th and the 15th: MD-3, cap 4.
PlanRequest baseRequest() {
    PlanRequest r;
    r.date = "2026-08-12";
    r.season = "2026-27";
    r.minutes = 60;
    r.playersAvailable = 14;
    r.fixtures = {{"2026-08-08", "15:00", "Harbour Rovers", "home", "League", ""},
                  {"2026-08-15", "15:00", "Quarry Town", "away", "League", ""}};
    r.drills = {drill(1, "Rondo warm-up", 10, 2, {}, {}, {"warm_up"}),
                drill(2, "Stretch and walk", 10, 1, {}, {}, {"cool_down"})};
    return r;
}

std::vector<std::int64_t> idsOf(const Plan& p) {
    std::vector<std::int64_t> ids;
    for (const auto& b : p.blocks)
        ids.push_back(b.drillId);
    return ids;
}

} // namespace

TEST_CASE("normalised gap and severity, worked by hand", "[planner][severity]") {
    // At least 60 %, at 45 %: 15 points short of 60 → 0.15 / 0.60 = 0.25.
    CHECK_THAT(normalisedGap(Direction::AtLeast, MetricKind::Rate, 0.45, 0.60),
               WithinAbs(0.25, 1e-12));
    CHECK_THAT(severity(Direction::AtLeast, MetricKind::Rate, 0.45, 0.60, 0.9),
               WithinAbs(0.225, 1e-12));
    // At most 25 %, at 40 %: 15 of the 75 points of room above the target → 0.2.
    CHECK_THAT(normalisedGap(Direction::AtMost, MetricKind::Rate, 0.40, 0.25),
               WithinAbs(0.2, 1e-12));
    // At most 2.0 a match, at 6.8: 4.8 of the 6.8 is over → 0.70588…
    CHECK_THAT(normalisedGap(Direction::AtMost, MetricKind::Count, 6.8, 2.0),
               WithinAbs(4.8 / 6.8, 1e-12));
    // At least 3 a match, at 1.5 → 0.5.
    CHECK_THAT(normalisedGap(Direction::AtLeast, MetricKind::Count, 1.5, 3.0),
               WithinAbs(0.5, 1e-12));
    // On the right side, or no number: no gap.
    CHECK(normalisedGap(Direction::AtLeast, MetricKind::Rate, 0.65, 0.60) == 0);
    CHECK(normalisedGap(Direction::AtMost, MetricKind::Count, 1.0, 2.0) == 0);
    CHECK(normalisedGap(Direction::AtLeast, MetricKind::Rate, std::nan(""), 0.60) == 0);
    CHECK(severity(Direction::AtMost, MetricKind::Count, 6.8, 2.0, std::nan("")) == 0);
    // Weights in hundredths: 0.70588 → 71, 0.225 → 23 (rounded half away from zero: 22.5).
    CHECK(focusWeight(4.8 / 6.8) == 71);
    CHECK(focusWeight(0.225) == 23);
    CHECK(focusWeight(1.0) == 100);
}

TEST_CASE("a stored focus seen by the planner: the most severe of its zones",
          "[planner][severity]") {
    const Window last5{Window::Kind::LastN, 5, 0.3};
    auto status = [&](int band, int lane, double value, double pMiss) {
        ZoneStatus s;
        s.metric = "pass_completion";
        s.band = band;
        s.lane = lane;
        s.window = last5;
        s.value = value;
        s.pMiss = pMiss;
        Target t;
        t.key.metric = "pass_completion";
        t.value = 0.8;
        t.direction = Direction::AtLeast;
        s.target = t;
        return s;
    };
    const MetricSpec* metric = nullptr;
    for (const auto& m : builtinMetrics())
        if (m.id == "pass_completion") metric = &m;
    REQUIRE(metric);
    Focus f;
    f.id = 4;
    f.metric = "pass_completion";
    f.zones = {{2, 5}, {3, 5}};
    f.drills = {17};
    // (2,5): 0.6 vs 0.8 → gap 0.25, × 0.99 = 0.2475; (3,5): 0.4 → gap 0.5, × 0.6 = 0.30;
    // (4,5) is not in the focus; the match window is not the judged one.
    std::vector<ZoneStatus> statuses{status(2, 5, 0.6, 0.99), status(3, 5, 0.4, 0.6),
                                     status(4, 5, 0.1, 1.0)};
    ZoneStatus other = status(2, 5, 0.0, 1.0);
    other.window = Window{Window::Kind::Match, 1, 0.3};
    statuses.push_back(other);
    const auto p = planFocus(f, *metric, statuses, last5, ZoneGrid{});
    REQUIRE(p);
    CHECK(p->band == 3);
    CHECK(p->lane == 5);
    CHECK_THAT(p->severity, WithinAbs(0.30, 1e-12));
    CHECK(p->linkedDrills == std::vector<std::int64_t>{17});
    CHECK(p->zones == f.zones);

    // A focus on the whole pitch (every zone of the grid) uses the whole-pitch status.
    Focus whole = f;
    whole.zones.clear();
    for (int i = 0; i < ZoneGrid{}.zoneCount(); ++i)
        whole.zones.push_back(ZoneGrid{}.zoneAt(i));
    const auto w = planFocus(whole, *metric, {status(0, 0, 0.7, 0.5), status(3, 5, 0.4, 0.6)},
                             last5, ZoneGrid{});
    REQUIRE(w);
    CHECK_THAT(w->severity, WithinAbs(0.30, 1e-12)); // (3,5) is in the focus too and worse
    const auto only = planFocus(whole, *metric, {status(0, 0, 0.7, 0.5)}, last5, ZoneGrid{});
    REQUIRE(only);
    CHECK(only->band == 0);
    CHECK_THAT(only->severity, WithinAbs(0.5 * 0.125, 1e-12)); // (0.8 − 0.7) / 0.8 = 0.125

    // No target in any zone: nothing to rank.
    ZoneStatus untargeted = status(2, 5, 0.6, 0.9);
    untargeted.target.reset();
    CHECK_FALSE(planFocus(f, *metric, {untargeted}, last5, ZoneGrid{}).has_value());
}

TEST_CASE("which drills work on a focus", "[planner]") {
    PlanFocus f = focusOf(1, "press_rate", {{4, 2}, {4, 3}}, 0.5);
    f.linkedDrills = {9};
    CHECK(worksOn(drill(1, "a", 10, 3, {"press_rate"}, {{4, 3}}), f));
    CHECK(worksOn(drill(2, "b", 10, 3, {"press_rate"}, {}), f)); // no zones: the whole pitch
    CHECK_FALSE(worksOn(drill(3, "c", 10, 3, {"press_rate"}, {{1, 3}}), f));
    CHECK_FALSE(worksOn(drill(4, "d", 10, 3, {"losses"}, {{4, 3}}), f));
    CHECK(worksOn(drill(9, "e", 10, 3, {}, {}), f)); // linked by the coach
}

TEST_CASE("a hand-worked plan: coverage, order and one line of why per pick", "[planner]") {
    PlanRequest r = baseRequest();
    r.drills.push_back(drill(3, "Pressing 6v6", 20, 4, {"pre_shot_passes_against"}, {{2, 5}}));
    r.drills.push_back(drill(4, "Box defending", 25, 5, {"pre_shot_passes_against"}, {{2, 5}}));
    r.drills.push_back(drill(5, "Finishing waves", 15, 3, {"shot_after_loss"}, {{5, 3}}));
    r.drills.push_back(drill(6, "Possession 8v8", 20, 3, {"pass_completion"}, {{3, 3}}));
    PlanFocus f1 = focusOf(11, "pre_shot_passes_against", {{2, 5}}, 0.8);
    f1.kind = MetricKind::Count;
    f1.value = 6.8;
    f1.direction = Direction::AtMost;
    f1.target = 2.0;
    f1.pMiss = 1.0;
    PlanFocus f2 = focusOf(12, "shot_after_loss", {{5, 3}}, 0.5);
    f2.kind = MetricKind::Rate;
    f2.value = 0.05;
    f2.target = 0.12;
    f2.pMiss = 0.97;
    r.focuses = {f2, f1}; // any order: ranked by severity inside
    // Warm-up and cool-down take 20 of the 60 minutes; 40 remain. Drill 4 (intensity 5) is
    // above MD-3's cap of 4. Weights: f1 80, f2 50. Points = Σ w·credit + minutes used:
    //   {3, 5}: f1 20 min → 2·20·80 = 3200; f2 15 min → 2·15·50 = 1500; 55 min → 4755
    //   {3, 6}: 3200 + 60 = 3260;   {5, 6}: 1500 + 55 = 1555
    const PlanResult res = planSession(r);
    INFO(res.problem);
    REQUIRE(res.plan);
    const Plan& p = *res.plan;
    CHECK(p.objective == 4755);
    CHECK(idsOf(p) == std::vector<std::int64_t>{1, 3, 5, 2}); // main: intensity 4 before 3
    CHECK(p.blocks[0].role == BlockRole::WarmUp);
    CHECK(p.blocks[3].role == BlockRole::CoolDown);
    CHECK(p.minutesUsed == 55);
    CHECK(p.cap == 4);
    CHECK(p.day.label == "MD-3");
    CHECK(p.caution == std::string(kPlanCaution));
    CHECK_THAT(p.caution, Contains("qualified staff") && Contains("advice"));
    CHECK(
        p.blocks[1].why ==
        "focus 11, pre_shot_passes_against · B2·L5: 6.8 a match against at most 2 a "
        "match (P(miss) > 0.999) — this drill works on pre_shot_passes_against in the focus's zones");
    CHECK(p.blocks[2].why ==
          "focus 12, shot_after_loss · B5·L3: 5.0% against at least 12.0% (P(miss) 0.97) "
          "— this drill works on shot_after_loss in the focus's zones");
    CHECK(p.blocks[0].why == "warm-up; tagged warm_up, intensity 2 within the cap of 4 for MD-3");
    CHECK(p.blocks[3].why ==
          "cool-down; tagged cool_down, intensity 1 within the cap of 4 for MD-3");
    REQUIRE(p.blocks[1].focus);
    CHECK(*p.blocks[1].focus == 1); // index of f1 in the request
    REQUIRE(p.focusMinutes.size() == 2);
    CHECK(p.focusMinutes[0].focusId == 12);
    CHECK(p.focusMinutes[0].minutes == 15);
    CHECK(p.focusMinutes[1].focusId == 11);
    CHECK(p.focusMinutes[1].minutes == 20);
}

TEST_CASE("diminishing returns spread a session over several focuses", "[planner]") {
    PlanRequest r = baseRequest();
    r.drills.push_back(drill(3, "Press A", 20, 3, {"press_rate"}, {{4, 3}}));
    r.drills.push_back(drill(4, "Press B", 20, 3, {"press_rate"}, {{4, 3}}));
    r.drills.push_back(drill(5, "Build-up", 20, 3, {"pass_completion"}, {{2, 3}}));
    r.focuses = {focusOf(1, "press_rate", {{4, 3}}, 0.8),
                 focusOf(2, "pass_completion", {{2, 3}}, 0.5)};
    // 40 minutes for main drills. {3, 4}: 40 min on press_rate → 2·20·80 + 20·80 = 4800;
    // {3, 5}: 3200 + 2·20·50 = 5200 (+ 60 minutes used in both): the second focus wins.
    const auto res = planSession(r);
    REQUIRE(res.plan);
    CHECK(res.plan->objective == 5260);
    CHECK(idsOf(*res.plan) == std::vector<std::int64_t>{1, 3, 5, 2}); // 3 before 4: lower id
}

TEST_CASE("yesterday's drills are left out unless pinned; pins, removals and swaps", "[planner]") {
    PlanRequest r = baseRequest();
    r.drills.push_back(drill(3, "Press A", 20, 3, {"press_rate"}, {{4, 3}}));
    r.drills.push_back(drill(4, "Press B", 20, 3, {"press_rate"}, {{4, 3}}));
    r.drills.push_back(drill(5, "Crossing", 20, 3, {}, {}));
    r.drills.push_back(drill(7, "Passing warm-up", 10, 2, {}, {}, {"warm_up"}));
    r.focuses = {focusOf(1, "press_rate", {{4, 3}}, 0.9)};
    r.minutes = 40; // room for one main drill
    auto plan = [](const PlanRequest& req) {
        const PlanResult res = planSession(req);
        INFO(res.problem);
        REQUIRE(res.plan);
        return *res.plan;
    };

    // 3 and 4 tie on value (and so do warm-ups 1 and 7); the smaller sum of id ranks wins.
    CHECK(idsOf(plan(r)) == std::vector<std::int64_t>{1, 3, 2});

    r.yesterday = {3, 1}; // main drill 3 is left out; warm-up 1 may repeat (a routine)
    CHECK(idsOf(plan(r)) == std::vector<std::int64_t>{1, 4, 2});

    r.pinned = {3}; // the coach wants yesterday's drill again
    Plan p = plan(r);
    CHECK(idsOf(p) == std::vector<std::int64_t>{1, 3, 2});
    CHECK(p.blocks[1].pinned);
    CHECK_THAT(p.blocks[1].why, Contains("pinned by the coach; focus 1, press_rate"));

    r.pinned.clear();
    r.removed = {4}; // 3 was done yesterday, 4 removed: only the drill on no focus is left
    p = plan(r);
    CHECK(idsOf(p) == std::vector<std::int64_t>{1, 5, 2});
    CHECK(p.blocks[1].why ==
          "uses the remaining time (works on no open focus); intensity 3 within the cap of 4 "
          "for MD-3");
    CHECK(p.focusMinutes.at(0).minutes == 0);

    // Swap: take 3 out and put 5 in, then solve again.
    r = baseRequest();
    r.drills.push_back(drill(3, "Press A", 20, 3, {"press_rate"}, {{4, 3}}));
    r.drills.push_back(drill(5, "Crossing", 20, 3, {}, {}));
    r.focuses = {focusOf(1, "press_rate", {{4, 3}}, 0.9)};
    r.minutes = 40;
    CHECK(idsOf(plan(r)) == std::vector<std::int64_t>{1, 3, 2});
    const PlanRequest swapped = swapDrill(r, 3, 5);
    CHECK(swapped.removed == std::vector<std::int64_t>{3});
    CHECK(swapped.pinned == std::vector<std::int64_t>{5});
    p = plan(swapped);
    CHECK(idsOf(p) == std::vector<std::int64_t>{1, 5, 2});
    CHECK(p.blocks[1].pinned);
    // Swapping back undoes it.
    const PlanRequest back = swapDrill(swapped, 5, 3);
    CHECK(back.removed == std::vector<std::int64_t>{5});
    CHECK(back.pinned == std::vector<std::int64_t>{3});
}

TEST_CASE("a drill linked to a focus counts for it, and the why says so", "[planner]") {
    PlanRequest r = baseRequest();
    r.drills.push_back(drill(8, "Counter-press game", 20, 4, {}, {}));
    PlanFocus f = focusOf(3, "losses", {{4, 4}}, 0.6);
    f.kind = MetricKind::Count;
    f.value = 9.2;
    f.target = 7.0;
    f.direction = Direction::AtMost;
    f.pMiss = 0.93;
    f.linkedDrills = {8};
    r.focuses = {f};
    const auto res = planSession(r);
    REQUIRE(res.plan);
    CHECK(res.plan->blocks.at(1).why ==
          "focus 3, losses · B4·L4: 9.2 a match against at most 7 a match (P(miss) 0.93) "
          "— this drill is linked to the focus");
    CHECK(res.plan->focusMinutes.at(0).minutes == 20);
}

// Bad input: each a clear message and no plan (so nothing to save). ------------------------

TEST_CASE("bad input: a session shorter than its warm-up plus cool-down", "[planner][bad]") {
    PlanRequest r = baseRequest();
    r.minutes = 15;
    const auto res = planSession(r);
    CHECK_FALSE(res.plan);
    CHECK(res.problem ==
          "a 15-minute session is shorter than the shortest warm-up (10 min, drill 1 'Rondo "
          "warm-up') plus the shortest cool-down (10 min, drill 2 'Stretch and walk') that fit "
          "the day");
}

TEST_CASE("bad input: no drill fits the day's intensity cap", "[planner][bad]") {
    PlanRequest r = baseRequest();
    r.date = "2026-08-14"; // MD-1: cap 2
    r.drills = {drill(1, "Sprint warm-up", 10, 3, {}, {}, {"warm_up"}),
                drill(2, "Jog down", 10, 3, {}, {}, {"cool_down"}),
                drill(3, "Pressing 6v6", 20, 4)};
    const auto res = planSession(r);
    CHECK_FALSE(res.plan);
    CHECK(res.problem ==
          "no drill in the book fits the cap of 2 for MD-1 (the lightest is intensity 3)");

    // Some drills fit, but no warm-up does: the message says why each tagged one is out.
    r.drills = {drill(1, "Sprint warm-up", 10, 3, {}, {}, {"warm_up"}),
                drill(4, "Big warm-up", 10, 2, {}, {}, {"warm_up"}, 20),
                drill(2, "Jog down", 10, 1, {}, {}, {"cool_down"})};
    const auto warm = planSession(r);
    CHECK_FALSE(warm.plan);
    CHECK(warm.problem == "no warm-up fits: of the 2 warm-up drills, 1 above the cap of 2 "
                          "for MD-1 and 1 need more than the 14 players available");
}

TEST_CASE("bad input: no players", "[planner][bad]") {
    PlanRequest r = baseRequest();
    r.playersAvailable = 0;
    const auto res = planSession(r);
    CHECK_FALSE(res.plan);
    CHECK(res.problem == "no players are available (got 0): a session needs at least one player");
}

TEST_CASE("bad input: a date outside the season", "[planner][bad]") {
    PlanRequest r = baseRequest();
    r.date = "2027-07-02";
    auto res = planSession(r);
    CHECK_FALSE(res.plan);
    CHECK(res.problem == "2027-07-02 is outside season 2026-27 (2026-07-01 to 2027-06-30)");
    r.date = "2026-06-30";
    CHECK(planSession(r).problem ==
          "2026-06-30 is outside season 2026-27 (2026-07-01 to 2027-06-30)");
    r.date = "2026-08-12";
    r.season = "26/27";
    CHECK(planSession(r).problem == "'26/27' is not a season name such as 2026-27");
}

TEST_CASE("bad input: not a date, no minutes, no fixtures, match day", "[planner][bad]") {
    PlanRequest r = baseRequest();
    r.date = "2026-09-31";
    CHECK(planSession(r).problem == "'2026-09-31' is not a date YYYY-MM-DD");
    r = baseRequest();
    r.minutes = 0;
    CHECK(planSession(r).problem == "a session needs a positive number of minutes (got 0)");
    r = baseRequest();
    r.fixtures.clear();
    CHECK(planSession(r).problem ==
          "season 2026-27 has no fixtures, so 2026-08-12 has no microcycle day: import the "
          "schedule or enter the fixtures first");
    r = baseRequest();
    r.date = "2026-08-15";
    CHECK(
        planSession(r).problem ==
        "2026-08-15 is match day (away against Quarry Town): no training session is planned on MD");
    r.caps.matchDay = 2; // a club that does train lightly on match day gets a plan
    CHECK(planSession(r).plan.has_value());
    r = baseRequest();
    r.caps.afterMatch[0] = 0;
    r.date = "2026-08-09";
    CHECK(planSession(r).problem ==
          "the intensity cap for MD+1 is 0: no session is planned on that day (the caps can be "
          "edited)");
}

TEST_CASE("bad input: pins that cannot be kept", "[planner][bad]") {
    PlanRequest r = baseRequest();
    r.drills.push_back(drill(3, "Pressing 6v6", 20, 4, {}, {}, {}, 12));
    r.drills.push_back(drill(4, "Box defending", 30, 5));
    r.drills.push_back(drill(5, "Long game 11v11", 45, 3, {}, {}, {}, 22));
    r.pinned = {3};
    r.removed = {3};
    CHECK(planSession(r).problem == "drill 3 is both pinned and removed");
    r.removed.clear();
    r.pinned = {99};
    CHECK(planSession(r).problem == "pinned drill 99 is not in the drill book");
    r.pinned = {4};
    CHECK(planSession(r).problem ==
          "pinned drill 4 'Box defending' is intensity 5, above the cap of 4 for MD-3");
    r.pinned = {5};
    CHECK(planSession(r).problem ==
          "pinned drill 5 'Long game 11v11' needs at least 22 players; 14 are available");
    r.drills.push_back(drill(6, "Shape walk-through", 35, 2));
    r.pinned = {3, 6};
    CHECK(planSession(r).problem ==
          "the pinned drills take 55 minutes; with a warm-up and a cool-down that makes at "
          "least 75, more than the session's 60: unpin a drill or lengthen the session");
    r.pinned = {1, 7};
    r.drills.push_back(drill(7, "Second warm-up", 10, 2, {}, {}, {"warm_up"}));
    CHECK(planSession(r).problem ==
          "no plan meets every rule: check the pinned drills (a session has one warm-up and one "
          "cool-down) and the session's minutes");
}

// The property test --------------------------------------------------------------------------

namespace {

/// What a brute-force search over every choice finds: the best value, or none.
struct BruteForce {
    std::optional<long> best;
};

bool tagged(const Drill& d, const char* tag) {
    return std::find(d.tags.begin(), d.tags.end(), tag) != d.tags.end();
}

/// The objective of docs/planner.md written out again, independently of planner.cpp: per
/// focus, weight w = round(100 × severity) earns 2w a minute for its first 20 minutes and w a
/// minute for the next 20; every minute used earns 1.
long valueOf(const PlanRequest& r, const std::vector<const Drill*>& chosen) {
    long value = 0;
    for (const Drill* d : chosen)
        value += d->durationMin;
    for (const PlanFocus& f : r.focuses) {
        int minutes = 0;
        for (const Drill* d : chosen) {
            const bool linked = std::find(f.linkedDrills.begin(), f.linkedDrills.end(), d->id) !=
                                f.linkedDrills.end();
            const bool metric =
                std::find(d->metrics.begin(), d->metrics.end(), f.metric) != d->metrics.end();
            bool zone = d->zones.empty();
            for (const Zone& z : d->zones)
                zone |= std::find(f.zones.begin(), f.zones.end(), z) != f.zones.end();
            if (linked || (metric && zone)) minutes += d->durationMin;
        }
        const long w = std::lround(100 * f.severity);
        value += w * (2 * std::min(minutes, 20) + std::clamp(minutes - 20, 0, 20));
    }
    return value;
}

bool in(const std::vector<std::int64_t>& ids, std::int64_t id) {
    return std::find(ids.begin(), ids.end(), id) != ids.end();
}

/// Every assignment of each drill to "out" or one of the roles its tags allow (warm-up,
/// cool-down, or main when it has neither tag), kept when it meets every rule.
BruteForce bruteForce(const PlanRequest& r, int cap) {
    BruteForce out;
    const std::size_t n = r.drills.size();
    std::vector<std::vector<int>> options(n); // 0 out, 1 warm-up, 2 main, 3 cool-down
    for (std::size_t i = 0; i < n; ++i) {
        const Drill& d = r.drills[i];
        options[i].push_back(0);
        if (tagged(d, "warm_up")) options[i].push_back(1);
        if (tagged(d, "cool_down")) options[i].push_back(3);
        if (!tagged(d, "warm_up") && !tagged(d, "cool_down")) options[i].push_back(2);
    }
    std::vector<std::size_t> pick(n, 0);
    while (true) {
        int warm = 0, cool = 0, minutes = 0;
        bool ok = true;
        std::vector<const Drill*> chosen;
        for (std::size_t i = 0; i < n && ok; ++i) {
            const Drill& d = r.drills[i];
            const int role = options[i][pick[i]];
            const bool pinned = in(r.pinned, d.id);
            if (role == 0) {
                ok = !pinned;
                continue;
            }
            // A warm-up or cool-down routine may repeat from yesterday; a main drill may not.
            ok = d.intensity <= cap && d.playersMin <= r.playersAvailable && !in(r.removed, d.id) &&
                 (pinned || role != 2 || !in(r.yesterday, d.id));
            warm += role == 1;
            cool += role == 3;
            minutes += d.durationMin;
            chosen.push_back(&d);
        }
        if (ok && warm == 1 && cool == 1 && minutes <= r.minutes) {
            const long v = valueOf(r, chosen);
            if (!out.best || v > *out.best) out.best = v;
        }
        std::size_t i = 0;
        while (i < n && ++pick[i] == options[i].size())
            pick[i++] = 0;
        if (i == n) break;
    }
    return out;
}

PlanRequest randomRequest(std::mt19937& rng, int& cap) {
    auto uniform = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng); };
    auto chance = [&](double p) { return std::uniform_real_distribution<double>(0, 1)(rng) < p; };
    const std::vector<std::string> metrics{"losses", "press_rate", "pass_completion"};
    auto randomZones = [&](int most) {
        std::vector<Zone> zones;
        const int k = uniform(1, most);
        for (int j = 0; j < k; ++j) {
            const Zone z{uniform(1, 2), uniform(1, 2)};
            if (std::find(zones.begin(), zones.end(), z) == zones.end()) zones.push_back(z);
        }
        return zones;
    };

    PlanRequest r;
    r.season = "2026-27";
    r.date = "2026-10-07";
    // The only fixture is three days on: MD-3, whose cap is drawn at random.
    r.fixtures = {{"2026-10-10", "15:00", "Harbour Rovers", "home", "League", ""}};
    cap = uniform(2, 5) - (chance(0.1) ? 1 : 0);
    r.caps.beforeMatch[2] = cap;
    r.minutes = uniform(15, 120);
    r.playersAvailable = chance(0.1) ? uniform(1, 6) : uniform(8, 22);

    std::vector<std::int64_t> ids(40);
    for (std::size_t i = 0; i < ids.size(); ++i)
        ids[i] = static_cast<std::int64_t>(i) + 1;
    std::shuffle(ids.begin(), ids.end(), rng);
    const int n = uniform(2, 12);
    for (int i = 0; i < n; ++i) {
        Drill d;
        d.id = ids[static_cast<std::size_t>(i)];
        d.title = "Drill " + std::to_string(d.id);
        d.durationMin = 5 * uniform(1, 6);
        d.playersMax = 24;
        const double t = std::uniform_real_distribution<double>(0, 1)(rng);
        if (t < 0.3)
            d.tags = {"warm_up"};
        else if (t < 0.6)
            d.tags = {"cool_down"};
        else if (t < 0.66)
            d.tags = {"warm_up", "cool_down"};
        else if (t < 0.72)
            d.tags = {"rondo"};
        // Warm-ups and cool-downs are mostly light and small-sided; main drills anything.
        const bool edge = t < 0.66;
        d.intensity = edge && chance(0.8) ? uniform(1, 3) : uniform(1, 5);
        d.playersMin = edge && chance(0.8) ? uniform(1, 8) : uniform(1, 16);
        for (const auto& m : metrics)
            if (chance(0.4)) d.metrics.push_back(m);
        if (!chance(0.3)) d.zones = randomZones(2);
        r.drills.push_back(std::move(d));
    }
    const int focuses = uniform(0, 3);
    for (int f = 0; f < focuses; ++f) {
        PlanFocus p;
        p.id = f + 1;
        p.metric = metrics[static_cast<std::size_t>(uniform(0, 2))];
        p.zones = randomZones(2);
        p.band = p.zones.front().band;
        p.lane = p.zones.front().lane;
        p.severity = std::uniform_real_distribution<double>(0, 1)(rng);
        for (const Drill& d : r.drills)
            if (chance(0.1)) p.linkedDrills.push_back(d.id);
        r.focuses.push_back(std::move(p));
    }
    for (const Drill& d : r.drills) {
        if (chance(0.15)) r.yesterday.push_back(d.id);
        if (chance(0.05)) r.pinned.push_back(d.id);
        if (chance(0.08)) r.removed.push_back(d.id);
    }
    return r;
}

/// Every rule, checked on a plan's blocks with nothing taken from the planner but the blocks.
void requireRulesKept(const PlanRequest& r, const Plan& p, int cap) {
    REQUIRE(p.blocks.size() >= 2);
    REQUIRE(p.blocks.front().role == BlockRole::WarmUp);
    REQUIRE(p.blocks.back().role == BlockRole::CoolDown);
    int minutes = 0;
    std::set<std::int64_t> seen;
    std::vector<const Drill*> chosen;
    for (std::size_t i = 0; i < p.blocks.size(); ++i) {
        const PlanBlock& b = p.blocks[i];
        const auto it = std::find_if(r.drills.begin(), r.drills.end(),
                                     [&](const Drill& d) { return d.id == b.drillId; });
        REQUIRE(it != r.drills.end());
        const Drill& d = *it;
        chosen.push_back(&d);
        REQUIRE(seen.insert(d.id).second);
        REQUIRE(b.minutes == d.durationMin);
        REQUIRE(d.intensity <= cap);
        REQUIRE(d.playersMin <= r.playersAvailable);
        REQUIRE_FALSE(in(r.removed, d.id));
        REQUIRE((in(r.pinned, d.id) || b.role != BlockRole::Main || !in(r.yesterday, d.id)));
        REQUIRE_FALSE(b.why.empty());
        REQUIRE(b.why.find('\n') == std::string::npos);
        if (i == 0)
            REQUIRE(tagged(d, "warm_up"));
        else if (i + 1 == p.blocks.size())
            REQUIRE(tagged(d, "cool_down"));
        else {
            REQUIRE(b.role == BlockRole::Main);
            REQUIRE_FALSE(tagged(d, "warm_up"));
            REQUIRE_FALSE(tagged(d, "cool_down"));
            if (i > 1) {
                const PlanBlock& a = p.blocks[i - 1];
                REQUIRE((a.intensity > b.intensity ||
                         (a.intensity == b.intensity && a.drillId < b.drillId)));
            }
        }
        minutes += d.durationMin;
    }
    for (std::int64_t id : r.pinned)
        REQUIRE(seen.contains(id));
    REQUIRE(minutes <= r.minutes);
    REQUIRE(p.minutesUsed == minutes);
    REQUIRE(p.objective == valueOf(r, chosen));
    REQUIRE(p.caution == std::string(kPlanCaution));
}

} // namespace

TEST_CASE("the plan is optimal and keeps every rule: GLPK against brute force on random "
          "small drill books",
          "[planner][property]") {
    std::mt19937 rng(20260812);
    int feasible = 0, infeasible = 0, withFocusMinutes = 0;
    for (int k = 0; k < 400; ++k) {
        int cap = 0;
        const PlanRequest r = randomRequest(rng, cap);
        INFO("case " << k << ": " << r.drills.size() << " drills, " << r.focuses.size()
                     << " focuses, cap " << cap << ", " << r.minutes << " min, "
                     << r.playersAvailable << " players");
        const BruteForce expected = bruteForce(r, cap);
        const PlanResult got = planSession(r);
        if (!expected.best) {
            INFO(got.problem);
            REQUIRE_FALSE(got.plan);
            REQUIRE_FALSE(got.problem.empty());
            ++infeasible;
            continue;
        }
        INFO(got.problem);
        REQUIRE(got.plan);
        REQUIRE(got.problem.empty());
        requireRulesKept(r, *got.plan, cap);
        REQUIRE(got.plan->objective == *expected.best);
        ++feasible;
        for (const auto& fm : got.plan->focusMinutes)
            withFocusMinutes += fm.minutes > 0;
    }
    // The random cases exercise both outcomes, and plans that do work on focuses.
    CHECK(feasible >= 150);
    CHECK(infeasible >= 60);
    CHECK(withFocusMinutes >= 60);
}

TEST_CASE("warm-ups and cool-downs are known by their tag however it is spelt", "[planner]") {
    PlanRequest r = baseRequest();
    r.drills = {drill(1, "Rondo warm-up", 10, 2, {}, {}, {"Warm-up"}),
                drill(2, "Stretch and walk", 10, 1, {}, {}, {"cool down"}),
                drill(3, "Press", 20, 3)};
    r.minutes = 40;
    const PlanResult res = planSession(r);
    INFO(res.problem);
    REQUIRE(res.plan);
    CHECK(idsOf(*res.plan) == std::vector<std::int64_t>{1, 3, 2});
    CHECK(res.plan->blocks.front().role == BlockRole::WarmUp);
    CHECK(res.plan->blocks.back().role == BlockRole::CoolDown);
}

TEST_CASE("a session left short says what the drill book lacks", "[planner]") {
    PlanRequest r = baseRequest(); // MD-3, cap 4, 14 players
    r.drills.push_back(drill(3, "Big game", 30, 5));                    // above the cap
    r.drills.push_back(drill(4, "Eleven a side", 30, 3, {}, {}, {}, 22)); // too many players
    r.drills.push_back(drill(5, "Press", 20, 3));
    r.yesterday = {5, 1}; // the main drill is out; the warm-up routine may repeat
    r.minutes = 60;
    const PlanResult res = planSession(r);
    INFO(res.problem);
    REQUIRE(res.plan);
    CHECK(idsOf(*res.plan) == std::vector<std::int64_t>{1, 2});
    REQUIRE(res.plan->notes.size() == 1);
    CHECK(res.plan->notes[0] ==
          "20 of 60 minutes planned: the drill book has no other main drill that fits today (of its "
          "3 other main drills: 1 above the cap of 4 for MD-3, 1 need more than the 14 players "
          "available, 1 done yesterday). A main drill of intensity 4 or less for 14 players, up to 40 "
          "minutes long, would fill it.");
    // A full session has no note.
    r.yesterday.clear();
    r.minutes = 40;
    const PlanResult full = planSession(r);
    REQUIRE(full.plan);
    CHECK(full.plan->notes.empty());
}

TEST_CASE("a focus back on target has no priority, and the why says so", "[planner]") {
    PlanRequest r = baseRequest();
    r.drills.push_back(drill(3, "Cover", 20, 3, {"losses"}, {{4, 4}}));
    PlanFocus f = focusOf(3, "losses", {{4, 4}}, 0);
    f.kind = MetricKind::Count;
    f.direction = Direction::AtMost;
    f.value = 4.2;
    f.target = 7;
    f.pMiss = 0.04;
    f.state = FlagState::OnTarget;
    r.focuses = {f};
    r.minutes = 40;
    const PlanResult res = planSession(r);
    REQUIRE(res.plan);
    CHECK(res.plan->blocks.at(1).why ==
          "focus 3, losses · B4·L4: 4.2 a match against at most 7 a match (on target, P(miss) 0.04), "
          "so it has no priority today — this drill works on losses in the focus's zones");
}

TEST_CASE("a drill's role decides its place in the session over its tags", "[planner]") {
    PlanRequest r = baseRequest();
    Drill warm = drill(5, "Passing pattern", 10, 2); // no tag, but the role
    warm.role = DrillRole::WarmUp;
    Drill main = drill(6, "Rondo into a game", 20, 3, {}, {}, {"warm_up"}); // tagged, but a main drill
    main.role = DrillRole::Main;
    r.drills = {warm, main, drill(2, "Stretch and walk", 10, 1, {}, {}, {"cool_down"})};
    r.minutes = 40;
    const PlanResult res = planSession(r);
    INFO(res.problem);
    REQUIRE(res.plan);
    CHECK(idsOf(*res.plan) == std::vector<std::int64_t>{5, 6, 2});
    CHECK(res.plan->blocks.front().why == "warm-up; its role is warm-up, intensity 2 within the cap of 4 for MD-3");
    CHECK(res.plan->blocks.at(1).role == BlockRole::Main);
}
