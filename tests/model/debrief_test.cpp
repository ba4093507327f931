// A match judged against the season's targets (model/debrief.h), on hand-made seasons of
// pass_completion tallies. Evidence values quoted come from Debian's scipy 1.10.1
// (/usr/bin/python3, `st` is scipy.stats): P(miss) of "at least T" for x of n is
// st.beta.cdf(T, x+.5, n-x+.5), the watch line's st.beta.cdf(T+margin, x+.5, n-x+.5).

#include "debrief.h"
#include "season_fixture.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <optional>
#include <string>
#include <vector>

using namespace pitchloop::model;
using pitchloop::testutil::builtin;
using pitchloop::testutil::SeasonFixture;
using pitchloop::testutil::statusOf;
using pitchloop::testutil::target;

namespace {

const Window kLast2{Window::Kind::LastN, 2, 0.3};

/// Pure binomial noise and the fixed off threshold 0.999, which the scipy numbers below assume.
FlagSettings pure() {
    FlagSettings s;
    s.matchVariation = false;
    s.falseFlagsPerSeason = 0;
    return s;
}

std::vector<std::pair<int, int>> zones(const std::vector<DebriefItem>& items) {
    std::vector<std::pair<int, int>> out;
    for (const auto& i : items) out.push_back({i.now.band, i.now.lane});
    return out;
}

const DebriefItem* find(const std::vector<DebriefItem>& items, int band, int lane) {
    for (const auto& i : items)
        if (i.now.band == band && i.now.lane == lane) return &i;
    return nullptr;
}

/// The state before of a zone's item in a list; nullopt when the zone is not listed or has no
/// state before.
std::optional<FlagState> beforeOf(const std::vector<DebriefItem>& items, int band, int lane) {
    const DebriefItem* item = find(items, band, lane);
    return item ? item->before : std::nullopt;
}

/// Three matches a week apart, judged over the last two; pass_completion per zone (x of n):
///
///   zone   target       M1     M2     M3   | last2 at M2        | last2 at M3
///   (1,1)  ≥ 0.8        45/50  45/50  0/50 | 90/100 on target   | 45/100  off   (new slip)
///   (1,2)  ≥ 0.8        0/50   0/50   0/50 | 0/100  off         | 0/100   off   (still off)
///   (1,3)  ≥ 0.3        0/50   10/50  50/50| 10/100 off         | 60/100  on    (recovered)
///   (1,4)  ≥ 0.5        26/50  26/50  50/50| 52/100 close       | 76/100  on    (recovered)
///   (1,5)  ≥ 0.5        45/50  45/50  45/50| 90/100 on          | 90/100  on
///   (2,1)  ≥ 0.8        -      42/50  42/50| 42/50  close       | 84/100  close
///   (2,2)  ≥ 0.8, min 30  nothing at all   | too little data    | too little data
///
/// Watch margin 0.05 everywhere, min sample 30. Evidence, scipy's full values (see the file's
/// head; P(miss) = st.beta.cdf(T, x+.5, n-x+.5), the line's st.beta.cdf(T+0.05, x+.5, n-x+.5)):
///   90/100 vs 0.8: P(miss) 0.003694334670360444, line 0.07494211374358506 → on;
///   45/100 vs 0.8: 0.9999999999999946 → off;  0/100 vs 0.8: 1.0 → off;
///   10/100 vs 0.3: 0.9999992153400298 → off;  60/100 vs 0.3: 2.7126484799522144e-10 → on;
///   52/100 vs 0.5: 0.344683158378866, line 0.727358272312953 → close to the line;
///   76/100 vs 0.5: 5.028473079372215e-08 → on;  90/100 vs 0.5: 5.114057577485567e-18 → on;
///   42/50 vs 0.8: 0.2455959239683746, line 0.5957989073016254 → close to the line;
///   84/100 vs 0.8: 0.15844527150869028, line 0.6217152758128714 → close to the line.
/// (Off at P(miss) ≥ 0.999, likely off from 0.5: no zone here sits between the two.)
/// In M3 alone: (1,1) and (1,2) are 0/50 (off); (1,3) 50/50, (1,4) 50/50, (1,5) 45/50 on.
struct StorySeason {
    SeasonFixture f{ZoneGrid{}, {"2026-08-08", "2026-08-15", "2026-08-22"}};
    std::vector<Target> targets;
    FlagSettings settings = pure();

    StorySeason() {
        const std::string m = "pass_completion";
        auto put = [&](int band, int lane, std::vector<std::pair<long, long>> xs) {
            for (std::size_t i = 0; i < xs.size(); ++i)
                f.set(m, i, band, lane, xs[i].first, xs[i].second);
        };
        put(1, 1, {{45, 50}, {45, 50}, {0, 50}});
        put(1, 2, {{0, 50}, {0, 50}, {0, 50}});
        put(1, 3, {{0, 50}, {10, 50}, {50, 50}});
        put(1, 4, {{26, 50}, {26, 50}, {50, 50}});
        put(1, 5, {{45, 50}, {45, 50}, {45, 50}});
        put(2, 1, {{0, 0}, {42, 50}, {42, 50}});
        for (auto [band, lane, value] : {std::tuple{1, 1, 0.8}, std::tuple{1, 2, 0.8},
                                         std::tuple{1, 3, 0.3}, std::tuple{1, 4, 0.5},
                                         std::tuple{1, 5, 0.5}, std::tuple{2, 1, 0.8},
                                         std::tuple{2, 2, 0.8}})
            targets.push_back(target(m, band, lane, Direction::AtLeast, value, 0.05, 30));
        settings.window = kLast2;
    }

    Debrief at(std::size_t focal) const {
        return buildDebrief(f.season, focal, {builtin("pass_completion")}, targets, f.grid,
                            settings);
    }
};

} // namespace

TEST_CASE("a debrief lists slips, new slips, recoveries and watched zones", "[debrief]") {
    const StorySeason story;
    const Debrief d = story.at(2);
    CHECK(d.matchId == "M3");
    CHECK(d.previousMatchId == "M2");
    CHECK(d.window == kLast2);

    using Z = std::vector<std::pair<int, int>>;
    // Off over last2: (1,1) and (1,2); (1,2) first, as its P(miss) is 1.0 and (1,1)'s is
    // 1 − 5e-15 (scipy; the order is by how sure, then by gap).
    CHECK(zones(d.slippedInWindow) == Z{{1, 2}, {1, 1}});
    // Only (1,1) is new: at M2 it was on target over last2; (1,2) was already off.
    CHECK(zones(d.newSlips) == Z{{1, 1}});
    REQUIRE(find(d.slippedInWindow, 1, 1));
    REQUIRE(find(d.slippedInWindow, 1, 2));
    CHECK(beforeOf(d.slippedInWindow, 1, 1) == FlagState::OnTarget);
    CHECK(beforeOf(d.slippedInWindow, 1, 2) == FlagState::OffTarget);
    // Gap: how far on the wrong side, 0.8 − 0.45 = 0.35 and 0.8 − 0 = 0.8.
    CHECK(find(d.slippedInWindow, 1, 1)->gap == Approx(0.35));
    CHECK(find(d.slippedInWindow, 1, 2)->gap == Approx(0.8));

    // Recovered: (1,3) was off, (1,4) was watched; both are on target now. (1,5) was on
    // target before too, so it is not a recovery.
    const Z recovered = zones(d.recovered);
    CHECK(recovered.size() == 2);
    CHECK(std::count(recovered.begin(), recovered.end(), std::pair{1, 3}) == 1);
    CHECK(std::count(recovered.begin(), recovered.end(), std::pair{1, 4}) == 1);
    CHECK(beforeOf(d.recovered, 1, 3) == FlagState::OffTarget);
    CHECK(beforeOf(d.recovered, 1, 4) == FlagState::CloseToLine); // P(miss) 0.345 < 0.5

    // Watched now: (2,1), 84/100 within the margin of 0.8.
    CHECK(zones(d.watched) == Z{{2, 1}});
    CHECK(beforeOf(d.watched, 2, 1) == FlagState::CloseToLine);

    // In M3 alone: (1,1) and (1,2) are 0/50.
    const Z inMatch = zones(d.slippedInMatch);
    CHECK(inMatch.size() == 2);
    CHECK(std::count(inMatch.begin(), inMatch.end(), std::pair{1, 1}) == 1);
    CHECK(std::count(inMatch.begin(), inMatch.end(), std::pair{1, 2}) == 1);
    for (const auto& item : d.slippedInMatch) CHECK(item.now.window.name() == "match");
    for (const auto& item : d.slippedInWindow) CHECK(item.now.window.name() == "last2");

    // Judged: the six zones with a target and data; (2,2) has none. Zones without a target
    // (the other 23 and the whole pitch) are not counted at all.
    CHECK(d.judged == 6);
    CHECK(d.tooLittleData == 1);

    // Chance flags: the sum of chanceOff over the six judged zones of the judged window.
    const auto statuses = computeStatus(story.f.season, 2, {builtin("pass_completion")},
                                        story.targets, story.f.grid, {kLast2}, story.settings);
    double chance = 0;
    int judged = 0;
    for (const auto& s : statuses)
        if (s.target && s.state != FlagState::TooLittleData) {
            chance += s.chanceOff;
            ++judged;
        }
    CHECK(judged == 6);
    CHECK(d.chanceFlags == Approx(chance).epsilon(1e-12));
    CHECK(d.chanceFlags > 0);
}

TEST_CASE("the state before is the previous match's state in the judged window", "[debrief]") {
    const StorySeason story;
    // At M2 over last2: (1,2) off (0/100) and (1,3) off (10/100) — but at M1, over last2
    // (just M1): (1,2) 0/50 off, (1,3) 0/50 off. So neither is new at M2.
    const Debrief d2 = story.at(1);
    CHECK(d2.previousMatchId == "M1");
    CHECK(zones(d2.slippedInWindow).size() == 2);
    CHECK(d2.newSlips.empty());

    // Judged over the match alone, the previous state is that of M2 alone: (1,1) was 45/50
    // (on target) and is 0/50 now: new. (1,3) was 10/50 vs 0.3 — st.beta.cdf(0.3, 10.5, 40.5)
    // = 0.943 (not off, but ≥ 0.5: likely off) — and 50/50 now: recovered from likely off.
    StorySeason byMatch;
    byMatch.settings.window = Window{Window::Kind::Match, 1, 0.3};
    const Debrief m = byMatch.at(2);
    CHECK(m.window.name() == "match");
    const auto news = zones(m.newSlips);
    CHECK(std::count(news.begin(), news.end(), std::pair{1, 1}) == 1);
    CHECK(std::count(news.begin(), news.end(), std::pair{1, 2}) == 0);
    REQUIRE(find(m.recovered, 1, 3));
    CHECK(beforeOf(m.recovered, 1, 3) == FlagState::LikelyOff);
    // With the match as the judged window, the two off lists are the same zones.
    CHECK(zones(m.slippedInMatch) == zones(m.slippedInWindow));
}

TEST_CASE("the first match of a season has no previous match", "[debrief]") {
    const StorySeason story;
    const Debrief d = story.at(0);
    CHECK(d.matchId == "M1");
    CHECK(d.previousMatchId.empty());
    // (1,2) and (1,3) are 0/50 against 0.8 and 0.3: off, but nothing is "new" or "recovered"
    // without a previous match, and no item has a state before.
    CHECK(zones(d.slippedInWindow).size() == 2);
    CHECK(d.newSlips.empty());
    CHECK(d.recovered.empty());
    for (const auto* list : {&d.slippedInWindow, &d.slippedInMatch, &d.watched})
        for (const auto& item : *list) CHECK_FALSE(item.before);
    // (2,1) has no passes in M1: with (2,2), too little data.
    CHECK(d.tooLittleData == 2);
    CHECK(d.judged == 5);

    // Out of range: an empty debrief.
    const Debrief none = story.at(3);
    CHECK(none.matchId.empty());
    CHECK(none.judged == 0);
}

TEST_CASE("slips are ordered by P(miss), then by gap", "[debrief]") {
    // One match. Against "at least" targets:
    //   (1,1) 0/200 vs 0.5: P(miss) = 1.0 exactly in double, gap 0.5
    //   (1,2) 0/200 vs 0.3: P(miss) = 1.0, gap 0.3
    //   (1,3) 0/3 vs 0.9 (min sample 0): st.beta.cdf(0.9, 0.5, 3.5) = 0.99990 — off, and the
    //         largest gap (0.9), but the least sure: last.
    //   (1,4) 0/200 vs 0.7: P(miss) = 1.0, gap 0.7
    SeasonFixture f(ZoneGrid{}, {"2026-08-08"});
    const std::string m = "pass_completion";
    f.set(m, 0, 1, 1, 0, 200);
    f.set(m, 0, 1, 2, 0, 200);
    f.set(m, 0, 1, 3, 0, 3);
    f.set(m, 0, 1, 4, 0, 200);
    const std::vector<Target> targets{target(m, 1, 1, Direction::AtLeast, 0.5, 0.05, 30),
                                      target(m, 1, 2, Direction::AtLeast, 0.3, 0.05, 30),
                                      target(m, 1, 3, Direction::AtLeast, 0.9, 0.05, 0),
                                      target(m, 1, 4, Direction::AtLeast, 0.7, 0.05, 30)};
    const Debrief d = buildDebrief(f.season, 0, {builtin(m)}, targets, f.grid, pure());
    REQUIRE(d.slippedInWindow.size() == 4);
    // Preconditions of the order: three ties on P(miss) and one less sure.
    for (int lane = 1; lane <= 4; ++lane) REQUIRE(find(d.slippedInWindow, 1, lane));
    CHECK(find(d.slippedInWindow, 1, 1)->now.pMiss == 1.0);
    CHECK(find(d.slippedInWindow, 1, 2)->now.pMiss == 1.0);
    CHECK(find(d.slippedInWindow, 1, 4)->now.pMiss == 1.0);
    CHECK(find(d.slippedInWindow, 1, 3)->now.pMiss == Approx(0.9999041540942808).epsilon(1e-9));
    using Z = std::vector<std::pair<int, int>>;
    CHECK(zones(d.slippedInWindow) == Z{{1, 4}, {1, 1}, {1, 2}, {1, 3}});
    CHECK(zones(d.slippedInMatch) == Z{{1, 4}, {1, 1}, {1, 2}, {1, 3}});
    CHECK(d.newSlips.empty()); // first match
}

TEST_CASE("a target set between two matches makes a slip new", "[debrief]") {
    // (1,2) is 0/50 in every match; its target starts on 2026-08-20, between M2 and M3. At M2
    // it had no target, so at M3 the slip is new.
    StorySeason story;
    for (auto& t : story.targets)
        if (t.key.band == 1 && t.key.lane == 2) t.effectiveFrom = "2026-08-20";
    const Debrief d = story.at(2);
    const DebriefItem* item = find(d.newSlips, 1, 2);
    REQUIRE(item);
    CHECK(item->before == FlagState::NoTarget);
}

TEST_CASE("one match of a count target lists as unusual, not as slipped", "[debrief]") {
    // pre_shot_passes_against in band 2 lane 5, at most 2 a match: 11 in the one match. Too
    // little data to judge the target (1 match < 3), but for a team exactly on it such a match
    // has probability st.poisson.sf(10, 2) = 8.308e-06 ≤ 0.01 (pure Poisson here): unusual.
    // Band 2 lane 1 has 3 against the same target: st.poisson.sf(2, 2) = 0.3233, not unusual.
    SeasonFixture f(ZoneGrid{}, {"2026-08-01"});
    f.set("pre_shot_passes_against", 0, 2, 5, 11, 1);
    f.set("pre_shot_passes_against", 0, 2, 1, 3, 1);
    const std::vector<Target> targets{
        target("pre_shot_passes_against", 2, 5, Direction::AtMost, 2, 1, 3),
        target("pre_shot_passes_against", 2, 1, Direction::AtMost, 2, 1, 3)};
    const Debrief d = buildDebrief(f.season, 0, {builtin("pre_shot_passes_against")}, targets,
                                   f.grid, pure());
    CHECK(d.slippedInMatch.empty());
    REQUIRE(d.unusualInMatch.size() == 1);
    CHECK(d.unusualInMatch[0].now.band == 2);
    CHECK(d.unusualInMatch[0].now.lane == 5);
    CHECK(d.unusualInMatch[0].now.matchTail == Approx(8.308224368484216e-06).epsilon(1e-6));
}
