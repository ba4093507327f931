#include "zones.h"

#include <algorithm>
#include <charconv>
#include <cmath>

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

Point zoneCentre(Zone z, const ZoneGrid& grid, const Pitch& pitch) {
    const auto b = grid.bandEdges(pitch);
    const auto l = grid.laneEdges(pitch);
    const auto band = static_cast<std::size_t>(z.band), lane = static_cast<std::size_t>(z.lane);
    return {(b[band - 1] + b[band]) / 2, (l[lane - 1] + l[lane]) / 2};
}

bool coarsens(const ZoneGrid& coarse, const ZoneGrid& fine, const Pitch& pitch) {
    auto within = [](const std::vector<double>& outer, const std::vector<double>& inner) {
        return std::all_of(outer.begin(), outer.end(), [&](double e) {
            return std::any_of(inner.begin(), inner.end(),
                               [&](double f) { return std::abs(e - f) <= kEdgeToleranceM; });
        });
    };
    return within(coarse.bandEdges(pitch), fine.bandEdges(pitch)) &&
           within(coarse.laneEdges(pitch), fine.laneEdges(pitch));
}

} // namespace pitchloop::model

namespace pitchloop::model {

namespace {

double overlap1d(double a0, double a1, double b0, double b1) {
    return std::max(0.0, std::min(a1, b1) - std::max(a0, b0));
}

double zoneArea(Zone z, const ZoneGrid& g, const Pitch& pitch) {
    const auto b = g.bandEdges(pitch);
    const auto l = g.laneEdges(pitch);
    return (b[static_cast<std::size_t>(z.band)] - b[static_cast<std::size_t>(z.band - 1)]) *
           (l[static_cast<std::size_t>(z.lane)] - l[static_cast<std::size_t>(z.lane - 1)]);
}

} // namespace

double overlapArea(Zone a, const ZoneGrid& ga, Zone b, const ZoneGrid& gb, const Pitch& pitch) {
    const auto ab = ga.bandEdges(pitch), al = ga.laneEdges(pitch);
    const auto bb = gb.bandEdges(pitch), bl = gb.laneEdges(pitch);
    auto at = [](const std::vector<double>& v, int i) { return v[static_cast<std::size_t>(i)]; };
    return overlap1d(at(ab, a.band - 1), at(ab, a.band), at(bb, b.band - 1), at(bb, b.band)) *
           overlap1d(at(al, a.lane - 1), at(al, a.lane), at(bl, b.lane - 1), at(bl, b.lane));
}

std::vector<Zone> mapZones(const std::vector<Zone>& zones, const ZoneGrid& from,
                           const ZoneGrid& to, const Pitch& pitch) {
    if (from == to) return zones;
    std::vector<bool> picked(static_cast<std::size_t>(to.zoneCount()), false);
    for (int i = 0; i < to.zoneCount(); ++i) {
        const Zone t = to.zoneAt(i);
        double inside = 0;
        for (const Zone& s : zones) inside += overlapArea(t, to, s, from, pitch);
        if (inside >= 0.5 * zoneArea(t, to, pitch) * (1 - 1e-9)) picked[static_cast<std::size_t>(i)] = true;
    }
    for (const Zone& s : zones) {
        double covered = 0;
        for (int i = 0; i < to.zoneCount(); ++i)
            if (picked[static_cast<std::size_t>(i)])
                covered += overlapArea(s, from, to.zoneAt(i), to, pitch);
        if (covered >= 0.5 * zoneArea(s, from, pitch) * (1 - 1e-9)) continue;
        // The zone of `to` holding most of `s`.
        int best = 0;
        double bestArea = -1;
        for (int i = 0; i < to.zoneCount(); ++i) {
            const double a = overlapArea(s, from, to.zoneAt(i), to, pitch);
            if (a > bestArea * (1 + 1e-9) + 1e-12) {
                best = i;
                bestArea = a;
            }
        }
        picked[static_cast<std::size_t>(best)] = true;
    }
    std::vector<Zone> out;
    for (int i = 0; i < to.zoneCount(); ++i)
        if (picked[static_cast<std::size_t>(i)]) out.push_back(to.zoneAt(i));
    return out;
}

std::string describeGrid(const ZoneGrid& grid) {
    const std::string size = std::to_string(grid.bands()) + " bands × " +
                             std::to_string(grid.lanes()) + " lanes";
    return grid.kind() == ZoneGrid::Kind::Markings ? size + " cut at the area lines"
                                                   : size + " of equal size";
}

} // namespace pitchloop::model
