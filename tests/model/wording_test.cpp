// One vocabulary and one number format (model/wording.h): the words every screen, table and
// sheet takes, and the coach's sentence built from the same status as the analyst's line.

#include "wording.h"

#include "zonenames.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>

using namespace pitchloop::model;
namespace words = pitchloop::model::words;

namespace {

const MetricSpec& builtin(const std::string& id) {
    for (const auto& m : builtinMetrics())
        if (m.id == id) return m;
    throw std::runtime_error("no built-in metric " + id);
}

ZoneStatus offTargetCount() {
    ZoneStatus s;
    s.metric = "pre_shot_passes_against";
    s.band = 2;
    s.lane = 5; // our left-back area on the default grid
    s.window = Window{Window::Kind::LastN, 5, 0.3};
    s.sum.num = 34;
    s.sum.den = 5;
    s.sum.matches = 5;
    s.value = 6.8;
    s.interval = {4.8, 9.4};
    s.level = 0.90;
    s.target = Target{};
    s.target->direction = Direction::AtMost;
    s.target->value = 2;
    s.state = FlagState::OffTarget;
    s.pMiss = 0.99996;
    return s;
}

} // namespace

TEST_CASE("states and windows have one name each", "[wording]") {
    CHECK(words::stateName(FlagState::OffTarget) == "off target");
    CHECK(words::stateName(FlagState::LikelyOff) == "likely off");
    CHECK(words::stateName(FlagState::CloseToLine) == "close to the line");
    CHECK(words::stateName(FlagState::OnTarget) == "on target");
    CHECK(words::stateName(FlagState::TooLittleData) == "too little data");
    CHECK(words::stateName(FlagState::NoTarget) == "no target");
    CHECK(words::backOnTarget() == "back on target");
    CHECK(words::windowName({Window::Kind::LastN, 5, 0.3}) == "the last 5 matches");
    CHECK(words::windowName({Window::Kind::LastN, 1, 0.3}) == "the last match");
    CHECK(words::windowName({Window::Kind::Match, 5, 0.3}) == "this match");
    CHECK(words::windowName({Window::Kind::Season, 5, 0.3}) == "the season so far");
    CHECK(words::windowName({Window::Kind::Ewma, 5, 0.3}) == "recent matches, weighted (λ 0.30)");
    CHECK(words::windowTitle({Window::Kind::LastN, 5, 0.3}) == "Last 5 matches");
    CHECK(words::windowTitle({Window::Kind::Match, 5, 0.3}) == "This match");
    CHECK(words::windowTitle({Window::Kind::Ewma, 5, 0.3}) == "Recent matches, weighted (λ 0.30)");
}

TEST_CASE("one number format for values, probabilities and p-values", "[wording]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    CHECK(words::rate(0.523) == "52.3%");
    CHECK(words::rate(nan) == "–");
    CHECK(words::count(3.0) == "3");
    CHECK(words::count(6.8) == "6.8");
    CHECK(words::count(2.996) == "3");
    CHECK(words::value(MetricKind::Exposure, 0.1534) == "0.15");
    CHECK(words::grouped(6889.4) == "6,889");
    CHECK(words::grouped(1234567) == "1,234,567");
    CHECK(words::grouped(12) == "12");
    CHECK(words::interval(MetricKind::Rate, {0.401, 0.642}) == "40.1–64.2%");
    CHECK(words::interval(MetricKind::Count, {4.8, 9.4}) == "4.8–9.4");
    CHECK(words::interval(MetricKind::Count, {0, INFINITY}) == "–");
    // Probabilities: two decimals, three near the ends, never a false 1 or 0.
    CHECK(words::probability(0.643) == "0.64");
    CHECK(words::probability(0.9962) == "0.996");
    CHECK(words::probability(0.99996) == "> 0.999");
    CHECK(words::probability(1.0) == "> 0.999");
    CHECK(words::probability(0.0041) == "0.004");
    CHECK(words::probability(0.0001) == "< 0.001");
    CHECK(words::probability(nan) == "–");
    // p-values: two significant figures.
    CHECK(words::pValue(0.0008241) == "0.00082");
    CHECK(words::pValue(0.000824) == "0.00082");
    CHECK(words::pValue(0.0312) == "0.031");
    CHECK(words::pValue(0.41) == "0.41");
    CHECK(words::pValue(0.00001) == "< 0.0001");
    CHECK(words::target(Direction::AtLeast, MetricKind::Rate, 0.45) == "≥ 45.0%");
    CHECK(words::target(Direction::AtMost, MetricKind::Count, 2) == "≤ 2");
    CHECK(words::targetInWords(Direction::AtMost, MetricKind::Count, 2) == "at most 2");
}

TEST_CASE("the coach's sentence and the analyst's line say the same zone", "[wording]") {
    const ZoneGrid grid;
    const ZoneStatus s = offTargetCount();
    CHECK(words::coachSentence(builtin("pre_shot_passes_against"), s, grid) ==
          "Their build-up before shots ran through our left-back area 6.8 times a match over the "
          "last 5 matches; we aim for at most 2. This is very unlikely to be bad luck.");
    CHECK(words::analystLine(s, MetricKind::Count) ==
          "6.8 (90% interval 4.8–9.4) · 5 matches · target ≤ 2 · P(miss) > 0.999 · off target");
    CHECK(zoneLabel(s.band, s.lane, grid) == "our left-back area (B2·L5)");

    // A rate, whole pitch, close to the line.
    ZoneStatus r;
    r.metric = "regain_5s";
    r.window = Window{Window::Kind::LastN, 5, 0.3};
    r.sum.num = 41;
    r.sum.den = 90;
    r.value = 41.0 / 90;
    r.interval = {0.37, 0.54};
    r.level = 0.9;
    r.target = Target{};
    r.target->value = 0.45;
    r.state = FlagState::CloseToLine;
    r.pMiss = 0.41;
    CHECK(words::coachSentence(builtin("regain_5s"), r, grid) ==
          "After losing the ball in the whole pitch we won it back within 5 s 45.6% of the time over "
          "the last 5 matches; we aim for at least 45.0%. On the right side of the target, but only just.");
    CHECK(words::analystLine(r, MetricKind::Rate) ==
          "45.6% (90% interval 37.0–54.0%) · n = 90 · target ≥ 45.0% · P(miss) 0.41 · close to the line");

    // Without a sentence or a target: built from the name; no claim about luck.
    MetricSpec custom = builtin("losses");
    custom.sentence.clear();
    ZoneStatus c = offTargetCount();
    c.target.reset();
    c.state = FlagState::NoTarget;
    CHECK(words::coachSentence(custom, c, grid) ==
          "Ball losses in our left-back area: 6.8 a match over the last 5 matches.");
    CHECK(words::analystLine(c, MetricKind::Count) == "6.8 (90% interval 4.8–9.4) · 5 matches · no target");
}

TEST_CASE("every state has plain words, and only a missing target has none", "[wording]") {
    for (FlagState st : {FlagState::OnTarget, FlagState::CloseToLine, FlagState::LikelyOff,
                         FlagState::OffTarget, FlagState::TooLittleData}) {
        const std::string w = words::howSure(st);
        CHECK_FALSE(w.empty());
        // No statistics in the coach's layer.
        for (const char* jargon : {"P(", "interval", "posterior", "p-value", "σ", "EWMA"})
            CHECK(w.find(jargon) == std::string::npos);
    }
    CHECK(words::howSure(FlagState::NoTarget).empty());
}

TEST_CASE("a metric's sentence accepts only its three place holders", "[wording][metricspec]") {
    const std::string base =
        R"({"id": "m", "better": "lower", "items": {"side": "us", "type": "pass"}, "per": "match", )";
    auto ok = parseMetricSpec(base + R"("sentence": "we passed in {zone} {value} times {window}"})", "test");
    REQUIRE(ok.spec);
    CHECK(ok.spec->sentence == "we passed in {zone} {value} times {window}");
    auto bad = parseMetricSpec(base + R"("sentence": "in {zone}: {count}"})", "test");
    REQUIRE_FALSE(bad.spec);
    REQUIRE(bad.errors.size() == 1);
    CHECK(bad.errors[0].message.find("'{count}' is not a place holder") != std::string::npos);
    // Every built-in metric has one, and it uses its place holders.
    for (const auto& m : builtinMetrics()) {
        INFO(m.id);
        CHECK(m.sentence.find("{zone}") != std::string::npos);
        CHECK(m.sentence.find("{value}") != std::string::npos);
        CHECK(m.sentence.find("{window}") != std::string::npos);
    }
}

TEST_CASE("one match of a count target: how rare, and no claim about luck", "[wording]") {
    ZoneStatus s = offTargetCount();
    s.window = Window{Window::Kind::Match, 5, 0.3};
    s.value = 11;
    s.sum = {11, 1, 1, 11, 1};
    s.state = FlagState::TooLittleData;
    s.matchTail = 1.0 / 6889;
    CHECK(words::unusualMatchSentence(builtin("pre_shot_passes_against"), s, ZoneGrid{}) ==
          "Their build-up before shots ran through our left-back area 11 times in this match; we aim "
          "for at most 2. One match cannot judge that target, but a team on its target has a match "
          "like this only about 1 in 6,889.");
}

TEST_CASE("a metric's items have a plural noun", "[wording]") {
    // The built-in metrics of model/metrics/builtin.json, read by hand: what each counts.
    CHECK(words::itemsWord(builtin("regain_5s")) == "losses");
    CHECK(words::itemsWord(builtin("pass_completion")) == "passes");
    CHECK(words::itemsWord(builtin("press_rate")) == "defensive actions");
    MetricSpec anything;
    anything.items.select.types = {EventType::Pass, EventType::Shot};
    CHECK(words::itemsWord(anything) == "events");
}
