#pragma once
// A pitch drawn seen from above for print: our goal on the left, we attack left to right, our
// left touchline at the top (so lane 1, at our right touchline, is at the bottom), with the
// Law 1 markings and the zone grid's lines; zones map to rectangles for shading and marks.

#include "types.h"
#include "zones.h"

#include <QColor>
#include <QPointF>
#include <QRectF>

class QPainter;

namespace pitchloop::print {

/// Law 1 (Laws of the Game) distances in metres.
namespace law1 {
inline constexpr double kCentreCircleRadiusM = 9.15;
inline constexpr double kPenaltyAreaDepthM = 16.5;
inline constexpr double kPenaltyAreaWidthM = model::kPenaltyAreaWidthM; // 40.32
inline constexpr double kGoalAreaDepthM = 5.5;
inline constexpr double kGoalAreaWidthM = model::kGoalAreaWidthM; // 18.32
inline constexpr double kPenaltyMarkM = 11.0;
inline constexpr double kPenaltyArcRadiusM = 9.15; ///< the arc outside the penalty area
inline constexpr double kCornerArcRadiusM = 1.0;
inline constexpr double kGoalWidthM = 7.32;
inline constexpr double kGoalDepthM = 1.5; ///< drawn behind the goal line; not a Law 1 marking
} // namespace law1

/// A pitch of a given size fitted into a rectangle of the page.
class PitchFrame {
  public:
    /// The largest pitch (with room around it for the goals) that fits `room`, centred.
    PitchFrame(const model::Pitch& pitch, const model::ZoneGrid& grid, const QRectF& room);

    /// Room kept around the touchlines and goal lines, in metres.
    static constexpr double kMarginM = 2.5;
    /// Height of a frame `width` device units wide.
    static double heightFor(const model::Pitch& pitch, double width);

    /// The point `x` metres from our goal line and `y` metres from our right touchline.
    QPointF at(double x, double y) const;
    double scale() const { return m_scale; } ///< device units a metre
    QRectF field() const;                    ///< the touchlines and goal lines
    QRectF bounds() const { return m_bounds; }
    /// A zone's rectangle; the whole field for band 0, lane 0.
    QRectF zoneRect(int band, int lane) const;

    /// Grass, the zone grid's lines (faint) and the Law 1 markings.
    void draw(QPainter& painter, bool gridLines = true) const;

    const model::Pitch& pitch() const { return m_pitch; }

  private:
    model::Pitch m_pitch;
    model::ZoneGrid m_grid;
    QRectF m_bounds;
    double m_scale = 1;
};

/// Parallel lines across `rect` at `angleDeg` (0: horizontal, 45: rising to the right),
/// `spacing` apart, clipped to the rectangle.
void hatch(QPainter& painter, const QRectF& rect, double angleDeg, double spacing,
           const QColor& colour, double lineWidth);

} // namespace pitchloop::print
