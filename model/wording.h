#pragma once
// One vocabulary and one number format for everything a person reads: the app, the command
// line's tables and the printed sheets all take their words for states, windows and
// values from here (zones: zonenames.h), so that the same zone says the same thing everywhere. Machine formats (CSV,
// JSON) keep their documented ids (toString in status.h and friends).
//
// Two layers of words: the coach's (plain sentences, no statistics) and the analyst's (the
// numbers behind them). Both are derived from the same ZoneStatus, so they cannot disagree.

#include "metricspec.h"
#include "status.h"
#include "targets.h"
#include "zones.h"

#include <string>

namespace pitchloop::model::words {

// --- Names ----------------------------------------------------------------------------------

/// A zone's state: "on target", "close to the line", "likely off", "off target",
/// "too little data", "no target".
std::string stateName(FlagState state);
/// A zone that was off target at the previous match and is not now: "back on target".
std::string backOnTarget();
/// A window in a sentence: "this match", "the last match", "the last 5 matches", "the season so
/// far", "recent matches, weighted (λ 0.30)".
std::string windowName(const Window& window);
/// The same as a heading: "This match", "Last 5 matches", ... (first letter upper-case).
std::string windowTitle(const Window& window);
/// The first letter upper-case (ASCII), the rest unchanged: headings and table cells.
std::string capitalised(std::string text);
/// What a metric counts, in the plural: "losses", "passes", "shots", "defensive actions" (the
/// tackles, interceptions, fouls and blocks of docs/metrics.md), otherwise "events".
std::string itemsWord(const MetricSpec& metric);

// --- Numbers (one format everywhere; '.' as the decimal mark) -------------------------------

/// A share in per cent with one decimal: "52.3%"; "–" for NaN.
std::string rate(double share);
/// A count a match: whole numbers without decimals ("3"), else one decimal ("6.8"); "–" for NaN.
std::string count(double value);
/// A whole number with thousands grouped: "6,889".
std::string grouped(double v);
/// A value of a metric of `kind`: rate(), count(), or two decimals for per-exposure values.
std::string value(MetricKind kind, double v);
/// A value's interval: "40.1–64.2%", "4.8–9.4"; "–" when open or undefined.
std::string interval(MetricKind kind, const stats::Interval& i);
/// A probability: two decimals ("0.64"), three near the ends ("0.995", "0.004"), and "> 0.999" /
/// "< 0.001" beyond; "–" for NaN.
std::string probability(double p);
/// A p-value with two significant figures ("0.031", "0.00082"), "< 0.0001" below; "–" for NaN.
std::string pValue(double p);
/// A target: "≥ 45.0%", "≤ 2"; in the coach's words "at least 45.0%", "at most 2".
std::string target(Direction direction, MetricKind kind, double v);
std::string targetInWords(Direction direction, MetricKind kind, double v);

// --- The coach's layer ----------------------------------------------------------------------

/// How sure the state is, in plain words, for the state the rule gave (never a second opinion):
/// off target "This is very unlikely to be bad luck."; likely off "Probably a real slip, but bad
/// luck could still explain it; the next matches will tell."; and so on. Empty for no target.
std::string howSure(FlagState state);

/// One zone in a sentence: the metric's own sentence (its `sentence` template with {zone},
/// {value} and {window} — "over the last 5 matches", "in this match") or "<name> in <zone>:
/// <value> over <window>", then the target and how
/// sure: "Their build-up before shots ran through our left-back area 6.8 times a match over the
/// last 5 matches; we aim for at most 2. This is very unlikely to be bad luck."
std::string coachSentence(const MetricSpec& metric, const ZoneStatus& status, const ZoneGrid& grid);

/// A per-match count judged on one match (too little data to judge the target, but unusual):
/// the sentence without a claim about luck, then how rare such a match is for a team on its
/// target: "... 11 times in this match; we aim for at most 2. One match cannot judge that
/// target, but a team on its target has a match like this only about 1 in 6,889."
std::string unusualMatchSentence(const MetricSpec& metric, const ZoneStatus& status, const ZoneGrid& grid);

// --- The analyst's layer --------------------------------------------------------------------

/// The numbers behind the same zone in one line: "6.8 (90% interval 4.8–9.4) · 5 matches ·
/// target ≤ 2 · P(miss) > 0.999 · off target".
std::string analystLine(const ZoneStatus& status, MetricKind kind);

} // namespace pitchloop::model::words
