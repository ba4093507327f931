#pragma once
// Zone grids (BRIEF §4): bands along the length from our goal line × lanes across from our
// right touchline, scaled to each match's pitch.

#include "types.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

/// Law 1 of the Laws of the Game: goal area 18.32 m wide, penalty area 40.32 m wide.
inline constexpr double kGoalAreaWidthM = 18.32;
inline constexpr double kPenaltyAreaWidthM = 40.32;

struct Zone {
    int band = 1; ///< 1-based, band 1 at our goal line
    int lane = 1; ///< 1-based, lane 1 at our right touchline
    bool operator==(const Zone&) const = default;
};

/// A way of cutting a pitch into zones.
class ZoneGrid {
public:
    enum class Kind {
        Equal,    ///< `bands` × `lanes` of equal size
        Markings, ///< `bands` equal bands; five lanes cut at the penalty- and goal-area lines
    };

    /// The default grid: 6 bands × 5 lanes of equal size (common practice, no published source).
    ZoneGrid() = default;
    static ZoneGrid equal(int bands, int lanes);
    static ZoneGrid markings(int bands);

    /// Parses "equal:6x5" or "markings:6"; nullopt when the text is not a grid.
    static std::optional<ZoneGrid> parse(std::string_view text);
    /// The text `parse` reads back.
    std::string name() const;

    Kind kind() const { return m_kind; }
    int bands() const { return m_bands; }
    int lanes() const { return m_lanes; }
    int zoneCount() const { return m_bands * m_lanes; }

    /// Band edges along the length (bands + 1 values from 0 to length).
    std::vector<double> bandEdges(const Pitch& pitch) const;
    /// Lane edges across the width (lanes + 1 values from 0 to width).
    std::vector<double> laneEdges(const Pitch& pitch) const;

    /// The zone holding `p`; a point on a boundary goes to the higher index, the far edge to
    /// the last. Points are expected on the pitch (the reader clamps them).
    Zone zoneOf(Point p, const Pitch& pitch) const;

    /// 0-based position of a zone in band-major order: (band − 1) × lanes + (lane − 1).
    int indexOf(Zone z) const { return (z.band - 1) * m_lanes + (z.lane - 1); }
    Zone zoneAt(int index) const { return {index / m_lanes + 1, index % m_lanes + 1}; }

    bool operator==(const ZoneGrid&) const = default;

private:
    ZoneGrid(Kind kind, int bands, int lanes) : m_kind(kind), m_bands(bands), m_lanes(lanes) {}
    Kind m_kind = Kind::Equal;
    int m_bands = 6;
    int m_lanes = 5;
};

/// A grid fitted to one pitch, with its edges computed once (for per-event lookups).
class ZoneLocator {
public:
    ZoneLocator(const ZoneGrid& grid, const Pitch& pitch);
    Zone zoneOf(Point p) const;
    int indexOf(Point p) const { return m_grid.indexOf(zoneOf(p)); }
    const ZoneGrid& grid() const { return m_grid; }

private:
    ZoneGrid m_grid;
    std::vector<double> m_bandEdges;
    std::vector<double> m_laneEdges;
};

/// Positions within this distance of a zone line count as on the line. Edges such as
/// 3 × (64 / 5) come out as 38.400000000000006 in binary; a point logged at 38.4 m is meant to
/// be on that line and so goes to the higher zone.
inline constexpr double kEdgeToleranceM = 1e-6;

/// Index of the bin holding `v`: the number of inner edges ≤ v (within kEdgeToleranceM), so a
/// value on a boundary goes up; v ≥ the last edge falls in the last bin. Returns 1-based.
int binOf(double v, const std::vector<double>& edges);

// Zone-only data ------------------------------------------------------------------------------
// A source that gives a zone label instead of a position (docs/import.md, "Zone-only data")
// puts each event at its zone's centre; where in the zone it was is not known.

/// The centre of zone `z` of `grid` on `pitch`, in our frame. Zones outside the grid are the
/// caller's error (importprofile checks labels against the grid first).
Point zoneCentre(Zone z, const ZoneGrid& grid, const Pitch& pitch);

/// Positions stored for zone-only data are centres rounded to the centimetre; a position this
/// close to a centre is that centre.
inline constexpr double kZoneCentreToleranceM = 0.011;

/// Whether every zone of `fine` lies inside one zone of `coarse` on `pitch` (every edge of
/// `coarse` is an edge of `fine`): then a zone-only position on `fine` falls in the right zone
/// of `coarse` too. True for equal grids; equal:3x5 coarsens equal:6x5, equal:6x3 does not.
bool coarsens(const ZoneGrid& coarse, const ZoneGrid& fine, const Pitch& pitch);

} // namespace pitchloop::model

namespace pitchloop::model {

// Moving between grids ------------------------------------------------------------------------
// Zones of two grids are compared by area on one pitch. Equal grids cut the pitch in fixed
// proportions, so the pitch size does not change their overlaps; markings lanes depend on the
// width, and the default Pitch{} (105 × 68 m) is used for them.

/// Area in m² of zone `a` of grid `ga` that lies inside zone `b` of grid `gb` on `pitch`.
double overlapArea(Zone a, const ZoneGrid& ga, Zone b, const ZoneGrid& gb,
                   const Pitch& pitch = Pitch{});

/// `zones` of `from` read on `to`: every zone of `to` lying at least half inside them, plus,
/// for a zone of `from` less than half covered by those, the zone of `to` holding most of it. In
/// band-major order without repeats; empty stays empty (a drill for the whole pitch).
std::vector<Zone> mapZones(const std::vector<Zone>& zones, const ZoneGrid& from,
                           const ZoneGrid& to, const Pitch& pitch = Pitch{});

/// "6 bands × 5 lanes of equal size" / "6 bands × 5 lanes cut at the area lines".
std::string describeGrid(const ZoneGrid& grid);

} // namespace pitchloop::model
