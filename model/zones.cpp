#include "zones.h"

#include <algorithm>
#include <charconv>

namespace pitchloop::model {

namespace {

/// Equal cuts computed as i × (length / n), the same arithmetic as numpy.linspace, so the
/// outside check with numpy.histogram2d sees bit-identical edges.
std::vector<double> equalEdges(double length, int n) {
    std::vector<double> edges(static_cast<std::size_t>(n) + 1);
    const double step = length / n;
    for (int i = 0; i < n; ++i) edges[static_cast<std::size_t>(i)] = i * step;
    edges.back() = length;
    return edges;
}

std::optional<int> parseCount(std::string_view s) {
    int v = 0;
    auto [ptr, ec] = std::from_chars(s.data(), s.data() + s.size(), v);
    if (ec != std::errc{} || ptr != s.data() + s.size() || v < 1 || v > 20) return std::nullopt;
    return v;
}

} // namespace

ZoneGrid ZoneGrid::equal(int bands, int lanes) { return {Kind::Equal, bands, lanes}; }
ZoneGrid ZoneGrid::markings(int bands) { return {Kind::Markings, bands, 5}; }

std::optional<ZoneGrid> ZoneGrid::parse(std::string_view text) {
    if (text.starts_with("equal:")) {
        auto dims = text.substr(6);
        auto x = dims.find('x');
        if (x == std::string_view::npos) return std::nullopt;
        auto bands = parseCount(dims.substr(0, x));
        auto lanes = parseCount(dims.substr(x + 1));
        if (!bands || !lanes) return std::nullopt;
        return equal(*bands, *lanes);
    }
    if (text.starts_with("markings:")) {
        auto bands = parseCount(text.substr(9));
        if (!bands) return std::nullopt;
        return markings(*bands);
    }
    return std::nullopt;
}

std::string ZoneGrid::name() const {
    if (m_kind == Kind::Markings) return "markings:" + std::to_string(m_bands);
    return "equal:" + std::to_string(m_bands) + "x" + std::to_string(m_lanes);
}

std::vector<double> ZoneGrid::bandEdges(const Pitch& pitch) const {
    return equalEdges(pitch.lengthM, m_bands);
}

std::vector<double> ZoneGrid::laneEdges(const Pitch& pitch) const {
    if (m_kind == Kind::Equal) return equalEdges(pitch.widthM, m_lanes);
    // Wing | half-space | centre | half-space | wing, cut at the side lines of the penalty
    // area and the goal area, both centred on the goal (Law 1).
    const double mid = pitch.widthM / 2;
    return {0.0,
            mid - kPenaltyAreaWidthM / 2,
            mid - kGoalAreaWidthM / 2,
            mid + kGoalAreaWidthM / 2,
            mid + kPenaltyAreaWidthM / 2,
            pitch.widthM};
}

int binOf(double v, const std::vector<double>& edges) {
    const int bins = static_cast<int>(edges.size()) - 1;
    // upper_bound over the inner edges counts how many are <= v.
    auto it = std::upper_bound(edges.begin() + 1, edges.end() - 1, v + kEdgeToleranceM);
    const int bin = static_cast<int>(it - (edges.begin() + 1)) + 1;
    return std::clamp(bin, 1, bins);
}

Zone ZoneGrid::zoneOf(Point p, const Pitch& pitch) const {
    return {binOf(p.x, bandEdges(pitch)), binOf(p.y, laneEdges(pitch))};
}

ZoneLocator::ZoneLocator(const ZoneGrid& grid, const Pitch& pitch)
    : m_grid(grid), m_bandEdges(grid.bandEdges(pitch)), m_laneEdges(grid.laneEdges(pitch)) {}

Zone ZoneLocator::zoneOf(Point p) const {
    return {binOf(p.x, m_bandEdges), binOf(p.y, m_laneEdges)};
}

} // namespace pitchloop::model
