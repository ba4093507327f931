// Zone names (model/zonenames.h): football names from where a zone's centre lies against the
// Law 1 lines (penalty area 16.5 m deep and 40.32 m wide, goal area 18.32 m wide) on a
// 105 × 68 m pitch, left and right as we attack, lane 1 at our right touchline.

#include "zonenames.h"

#include <catch2/catch.hpp>

#include <set>

using namespace pitchloop::model;

TEST_CASE("the default grid's zones have football names", "[zonenames]") {
    const ZoneGrid g; // 6 × 5: bands of 17.5 m, lanes of 13.6 m
    // Band 1 (centre 8.75 m, inside the 16.5 m box); lanes centred at 6.8, 20.4, 34, 47.6, 61.2 m:
    // 6.8 < 13.84 (penalty-area line) is the right wing; 20.4 < 24.84 (goal-area line) the right
    // half-space; 34 the centre; 47.6 ≤ 54.16 the left half-space; 61.2 the left wing.
    CHECK(zoneFootballName(1, 1, g) == "right wing by our goal line");
    CHECK(zoneFootballName(1, 2, g) == "right side of our box");
    CHECK(zoneFootballName(1, 3, g) == "our box");
    CHECK(zoneFootballName(1, 5, g) == "left wing by our goal line");
    // Band 2 (26.25 m, in our third: below 35 m, past our box).
    CHECK(zoneFootballName(2, 1, g) == "our right-back area");
    CHECK(zoneFootballName(2, 5, g) == "our left-back area");
    CHECK(zoneFootballName(2, 3, g) == "in front of our box");
    CHECK(zoneFootballName(2, 4, g) == "left half-space in our third");
    // Bands 3 and 4 (43.75 and 61.25 m) either side of halfway (52.5 m).
    CHECK(zoneFootballName(3, 5, g) == "left wing in our half");
    CHECK(zoneFootballName(4, 2, g) == "right half-space in their half");
    CHECK(zoneFootballName(4, 3, g) == "centre of their half");
    // Band 5 (78.75 m, their third) and band 6 (96.25 m, past 88.5 m: their box).
    CHECK(zoneFootballName(5, 1, g) == "right wing in their third");
    CHECK(zoneFootballName(5, 3, g) == "in front of their box");
    CHECK(zoneFootballName(6, 3, g) == "their box");
    CHECK(zoneFootballName(6, 4, g) == "left side of their box");
    CHECK(zoneFootballName(6, 5, g) == "left wing by their goal line");
    CHECK(zoneLabel(2, 5, g) == "our left-back area (B2·L5)");
    CHECK(zoneLabel(0, 0, g) == "whole pitch");
    CHECK(zoneCode(2, 5) == "B2·L5");
    // In a sentence, with the article the name needs.
    CHECK(zonePhrase(2, 3, g) == "the space in front of our box");
    CHECK(zonePhrase(5, 1, g) == "the right wing in their third");
    CHECK(zonePhrase(2, 5, g) == "our left-back area");
    CHECK(zonePhrase(1, 3, g) == "our box");
    CHECK(zonePhrase(6, 4, g) == "the left side of their box");
    CHECK(zonePhrase(0, 0, g) == "the whole pitch");
}

TEST_CASE("the markings grid's lanes are the wings, half-spaces and centre themselves", "[zonenames]") {
    const ZoneGrid g = ZoneGrid::markings(3); // lanes cut at the penalty- and goal-area lines
    const std::set<std::string> band2{zoneFootballName(2, 1, g), zoneFootballName(2, 2, g),
                                      zoneFootballName(2, 3, g), zoneFootballName(2, 4, g),
                                      zoneFootballName(2, 5, g)};
    // Band 2 runs from 35 to 70 m, across the halfway line: it belongs to neither half.
    CHECK(band2 == std::set<std::string>{"right wing around halfway", "right half-space around halfway",
                                         "centre circle", "left half-space around halfway",
                                         "left wing around halfway"});
    // Out of the grid: the code, not a guess.
    CHECK(zoneFootballName(4, 1, g) == "B4·L1");
    CHECK(zoneLabel(4, 1, g) == "B4·L1");
}
