#pragma once
// One name for a zone everywhere (app, command line, printed sheets): a football name from where
// the zone lies on the pitch — "our left-back area", "right half-space in their third", "their
// box" — with the band/lane code as the precise name, e.g. "our left-back area (B2·L5)".
// Left and right are as we attack; lane 1 lies at our right touchline. Lines from Law 1 of the
// Laws of the Game; the names themselves: docs/zones.md.

#include "zones.h"

#include <string>

namespace pitchloop::model {

/// The precise name: "B2·L5"; "whole pitch" for band 0, lane 0.
std::string zoneCode(int band, int lane);

/// The football name of a zone of `grid`, from its centre on a 105 × 68 m pitch (names follow
/// the grid, which scales with the pitch): across, the penalty-area and goal-area lines cut the
/// wings, half-spaces and centre; along, the penalty areas and thirds of the length cut our box,
/// our third, midfield, their third and their box. "whole pitch" for band 0, lane 0.
std::string zoneFootballName(int band, int lane, const ZoneGrid& grid);

/// The same name inside a sentence, with its article: "the right half-space in their third",
/// "the space in front of our box", "our left-back area", "the whole pitch".
std::string zonePhrase(int band, int lane, const ZoneGrid& grid);

/// The name used on every screen and sheet: "our left-back area (B2·L5)"; "whole pitch".
std::string zoneLabel(int band, int lane, const ZoneGrid& grid);

} // namespace pitchloop::model
