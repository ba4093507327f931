#pragma once
// Turning model numbers into text for people (tables) and scripts (CSV, RFC 4180).

#include "exports.h"
#include "metricengine.h"
#include "metricspec.h"
#include "repository.h"

#include <ostream>
#include <string>
#include <vector>

namespace pitchloop::cli {

/// One CSV field (RFC 4180, formula cells neutralised): model::csvField.
using model::csvField;

/// A per-zone table of one metric for one match, drawn as the pitch seen from above with our
/// goal on the left: lanes as rows (our left touchline at the top), bands as columns.
void printZoneTable(std::ostream& out, const model::MetricSpec& spec, const model::ZoneGrid& grid,
                    const model::MatchTally& tally);

/// A table column: `s` padded with spaces to `width` code points (so "–" and "≥" keep the
/// columns), and at least one space after a longer text.
std::string padColumn(const std::string& s, std::size_t width);

/// "2–1 W" style result from our side's point of view.
std::string scoreLine(const model::MatchSummary& m);

} // namespace pitchloop::cli
