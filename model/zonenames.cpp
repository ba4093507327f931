#include "zonenames.h"

namespace pitchloop::model {

namespace {

// Law 1 distances on the 105 × 68 m reference pitch.
constexpr double kLength = 105, kWidth = 68;
constexpr double kPenaltyAreaDepthM = 16.5;
constexpr double kPenaltyEdge = (kWidth - kPenaltyAreaWidthM) / 2; // 13.84 m from a touchline
constexpr double kGoalAreaEdge = (kWidth - kGoalAreaWidthM) / 2;   // 24.84 m

enum class Across { RightWing, RightHalfSpace, Centre, LeftHalfSpace, LeftWing };

Across across(double y) { // y from our right touchline
    if (y < kPenaltyEdge) return Across::RightWing;
    if (y < kGoalAreaEdge) return Across::RightHalfSpace;
    if (y <= kWidth - kGoalAreaEdge) return Across::Centre;
    if (y <= kWidth - kPenaltyEdge) return Across::LeftHalfSpace;
    return Across::LeftWing;
}

} // namespace

std::string zoneCode(int band, int lane) {
    if (band == 0 && lane == 0) return "whole pitch";
    return "B" + std::to_string(band) + "·L" + std::to_string(lane);
}

std::string zonePhrase(int band, int lane, const ZoneGrid& grid) {
    if (band == 0 && lane == 0) return "the whole pitch";
    const Pitch pitch{kLength, kWidth};
    const auto bands = grid.bandEdges(pitch), lanes = grid.laneEdges(pitch);
    if (band < 1 || lane < 1 || band >= static_cast<int>(bands.size()) || lane >= static_cast<int>(lanes.size()))
        return zoneCode(band, lane);
    const double x = (bands[band - 1] + bands[band]) / 2, y = (lanes[lane - 1] + lanes[lane]) / 2;
    const Across a = across(y);
    const bool inside = a != Across::RightWing && a != Across::LeftWing; // between the penalty-area lines
    const bool left = a == Across::LeftWing || a == Across::LeftHalfSpace;
    const std::string side = left ? "left" : "right";
    const bool wing = a == Across::RightWing || a == Across::LeftWing;
    const std::string boxSide = a == Across::Centre ? "" : side + " side of ";
    if (x < kPenaltyAreaDepthM && inside) return (boxSide.empty() ? "" : "the ") + boxSide + "our box";
    if (x > kLength - kPenaltyAreaDepthM && inside) return (boxSide.empty() ? "" : "the ") + boxSide + "their box";
    if (x < kLength / 3) {
        if (wing) return x < kPenaltyAreaDepthM ? "the " + side + " wing by our goal line" : "our " + side + "-back area";
        if (a == Across::Centre) return "the space in front of our box";
        return "the " + side + " half-space in our third";
    }
    if (x <= 2 * kLength / 3) {
        // A zone that spans the halfway line belongs to neither half.
        const bool spans = bands[band - 1] < kLength / 2 && bands[band] > kLength / 2;
        if (spans) {
            if (wing) return "the " + side + " wing around halfway";
            if (a == Across::Centre) return "the centre circle";
            return "the " + side + " half-space around halfway";
        }
        const std::string half = x < kLength / 2 ? "our half" : "their half";
        if (wing) return "the " + side + " wing in " + half;
        if (a == Across::Centre) return "the centre of " + half;
        return "the " + side + " half-space in " + half;
    }
    if (wing)
        return "the " + side + (x > kLength - kPenaltyAreaDepthM ? " wing by their goal line" : " wing in their third");
    if (a == Across::Centre) return "the space in front of their box";
    return "the " + side + " half-space in their third";
}

std::string zoneFootballName(int band, int lane, const ZoneGrid& grid) {
    std::string name = zonePhrase(band, lane, grid);
    for (const std::string lead : {"the space ", "the "})
        if (name.rfind(lead, 0) == 0) return name.substr(lead.size());
    return name;
}

std::string zoneLabel(int band, int lane, const ZoneGrid& grid) {
    if (band == 0 && lane == 0) return "whole pitch";
    const std::string name = zoneFootballName(band, lane, grid), code = zoneCode(band, lane);
    return name == code ? code : name + " (" + code + ")";
}

} // namespace pitchloop::model
