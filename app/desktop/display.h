#pragma once
// Model numbers turned into text and scales for people. model/ computes the numbers; this is
// the one place the desktop app rounds, words and scales them.

#include "repository.h"
#include "status.h"
#include "zones.h"

#include <QString>
#include <QStringList>
#include <QUrl>

#include <optional>
#include <vector>

namespace pitchloop::desktop {

// Words and numbers come from model/wording.h (one vocabulary for the app, the command line and
// the sheets); this file adds what only screens need.

/// "52.3%" for rates; "3" or "6.8" for counts (whole counts without decimals); "0.15" for
/// exposures; "–" when there is no value.
QString valueText(model::MetricKind kind, double value);
/// "40.1–64.2%" at the status's level.
QString intervalText(model::MetricKind kind, const model::stats::Interval& interval);
/// "90% interval" for a level of 0.90.
QString levelText(double level);
/// How much data a value rests on: "n = 44" for rates and exposures, "5 matches" for counts.
QString sampleText(model::MetricKind kind, const model::WindowSum& sum, const model::Window& w);
/// "≥ 55.0%", or an empty string without a target.
QString targetText(model::MetricKind kind, const std::optional<model::Target>& target);
/// A zone of `grid` as every screen names it: "Our left-back area (B2·L5)", or "Whole pitch"
/// for band 0, lane 0 (model/zonenames.h).
QString zoneText(int band, int lane, const model::ZoneGrid& grid);
/// A focus's verdict in words: "worked", "partly", "no change", "can't tell".
QString verdictWord(const std::string& verdict);
/// The state as a heading or cell: "Off target", "Likely off", "Close to the line", "On target",
/// "Too little data", "No target".
QString stateText(model::FlagState state);
/// How sure a flag is: "P(miss) 0.64", "P(miss) > 0.999"; empty when not judged.
QString certaintyText(double pMiss);
/// For one match of a per-match count (not judged): how rare such a match is for a team on its
/// target, "unusual match: 1 in 6,889 if on target" or "a usual match for a team on target";
/// empty when `matchTail` is NaN.
QString singleMatchText(double matchTail);
/// "Last 5 matches", "This match", "Season so far", "Recent matches, weighted (λ 0.30)".
QString windowText(const model::Window& w);
/// The same inside a sentence: "the last 5 matches", "this match", "the season so far".
QString windowPhrase(const model::Window& w);
/// "Sat 13 Mar 2027" from an ISO date; the input unchanged when it is not one.
QString dateText(const std::string& isoDate);
/// "13 Mar 2027" from an ISO date.
QString compactDateText(const std::string& isoDate);
/// "13 Mar" from an ISO date.
QString shortDateText(const std::string& isoDate);
/// "home", "away", "neutral" as "Home", "Away", "Neutral ground".
QString venueText(const std::string& venue);
/// "2–0", empty without a score.
QString scoreText(const model::MatchSummary& m);
/// "W", "D", "L" from our side, empty without a score.
QString outcomeText(const model::MatchSummary& m);
/// "Won", "Drawn", "Lost", empty without a score.
QString outcomeWord(const model::MatchSummary& m);
/// The local path of a file chosen in a dialog (a file: URL), or the text as given.
QString localPath(const QUrl& file);
/// A message of the print or model library for a screen: without "error: " / "warning: "
/// prefixes, each line starting upper-case.
QString plainMessage(const std::string& text);

/// "rate", "count a match", "per exposure event" in a sentence: "share of items" etc.
QString kindText(model::MetricKind kind);
/// "Higher is better" / "Lower is better".
QString betterText(model::Better better);

/// The value range a colour scale or axis spans, rounded outward to tidy steps so that its
/// labels read well: tenths or fifths of a share for rates; 1, 2 or 5 × 10^k for the others,
/// starting at zero.
struct ScaleDomain {
    double low = 0;
    double high = 1;
    double step = 0.25;
    /// Position of `value` on the scale, clamped to 0..1.
    double position(double value) const;
    /// Number of steps from low to high.
    int steps() const;
};
ScaleDomain scaleDomain(model::MetricKind kind, const std::vector<double>& values);
/// One label per step from low to high, evenly spaced.
QStringList scaleLabels(model::MetricKind kind, const ScaleDomain& domain);

} // namespace pitchloop::desktop
