#pragma once
// Words and numbers as the printed sheets show them (no Qt, so tests read them directly): the
// vocabulary and number format of model/wording.h, the same as the app's and the command line's.

#include "planner.h"
#include "status.h"
#include "targets.h"
#include "zones.h"

#include <string>

namespace pitchloop::print {

/// "Tuesday 29 September 2026" for a day number (days since 1970-01-01) and its ISO date.
std::string longDate(const std::string& isoDate, long dayNumber);
/// "Warm-up", "Main", "Cool-down".
std::string roleText(model::BlockRole role);
/// "45.2%" for rates, "2.4" for counts a match, "0.15" per exposure (words::value).
std::string valueText(model::MetricKind kind, double value);
/// " a match" for counts; empty otherwise.
std::string unitText(model::MetricKind kind);
/// "≥ 80.0%" or "≤ 2".
std::string targetText(model::Direction direction, model::MetricKind kind, double value);
/// P(miss) as words::probability: "0.64", "0.996", "> 0.999", "< 0.001".
std::string probabilityText(double p);
/// "our left-back area (B2·L5)" or "whole pitch" (model/zonenames.h).
std::string zoneText(int band, int lane, const model::ZoneGrid& grid);
/// "the last 5 matches", "this match", "the season so far", "recent matches, weighted (λ 0.30)".
std::string windowText(const model::Window& window);
/// "on target", "close to the line", "likely off", "off target", "too little data", "no target".
std::string stateText(model::FlagState state);
/// "1–2 L" from our side's point of view; empty without a score.
std::string scoreText(const std::optional<int>& us, const std::optional<int>& them);
/// "6 bands × 5 lanes" (equal zones) or "6 bands × 5 lanes at the box lines" (markings).
std::string gridText(const model::ZoneGrid& grid);
/// A number with up to `decimals` decimals, trailing zeros dropped ("0.999", "90").
std::string shortNumber(double v, int decimals = 3);

} // namespace pitchloop::print
