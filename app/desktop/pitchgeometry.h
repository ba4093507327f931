#pragma once
// The pitch and its zone grid for drawing: Law 1 markings as path data, zone rectangles, and
// the zone under a point. Coordinates are metres on the drawn area: x from the left edge (a
// margin beyond our goal line), y from the top edge (a margin beyond our left touchline), so
// that we attack left to right and lane 1, at our right touchline, lies at the bottom.

#include "zones.h"

#include <QList>
#include <QObject>
#include <QPoint>
#include <QRectF>
#include <QString>
#include <QtQml/qqmlregistration.h>

namespace pitchloop::desktop {

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
} // namespace law1

/// A pitch of a given size cut by a zone grid, for PitchMap.
class PitchGeometry : public QObject {
    Q_OBJECT
    QML_ELEMENT
    Q_PROPERTY(double length READ length WRITE setLength NOTIFY changed)
    Q_PROPERTY(double width READ width WRITE setWidth NOTIFY changed)
    Q_PROPERTY(QString grid READ grid WRITE setGrid NOTIFY changed)
    Q_PROPERTY(int bands READ bands NOTIFY changed)
    Q_PROPERTY(int lanes READ lanes NOTIFY changed)
    Q_PROPERTY(double margin READ margin CONSTANT)
    Q_PROPERTY(double extentLength READ extentLength NOTIFY changed)
    Q_PROPERTY(double extentWidth READ extentWidth NOTIFY changed)
    /// Band edges along the length (bands + 1 values, metres from our goal line).
    Q_PROPERTY(QList<double> bandEdges READ bandEdges NOTIFY changed)
    /// Lane edges across the width (lanes + 1 values, metres from our right touchline).
    Q_PROPERTY(QList<double> laneEdges READ laneEdges NOTIFY changed)
public:
    explicit PitchGeometry(QObject* parent = nullptr);

    double length() const { return m_pitch.lengthM; }
    double width() const { return m_pitch.widthM; }
    void setLength(double metres);
    void setWidth(double metres);
    QString grid() const;
    /// "equal:6x5" or "markings:6"; an unreadable name leaves the grid unchanged.
    void setGrid(const QString& name);
    void setZoneGrid(const model::ZoneGrid& grid);
    void setPitch(const model::Pitch& pitch);
    int bands() const { return m_grid.bands(); }
    int lanes() const { return m_grid.lanes(); }
    /// Room drawn around the touchlines and goal lines, for the goals and corner arcs.
    double margin() const { return 2.5; }
    double extentLength() const { return m_pitch.lengthM + 2 * margin(); }
    double extentWidth() const { return m_pitch.widthM + 2 * margin(); }
    QList<double> bandEdges() const;
    QList<double> laneEdges() const;

    /// A zone's rectangle in drawing metres (see the file comment); empty for an unknown zone.
    Q_INVOKABLE QRectF zoneRect(int band, int lane) const;
    /// The zone at a point in drawing metres as (band, lane); (0, 0) off the pitch.
    Q_INVOKABLE QPoint zoneAt(double x, double y) const;
    /// SVG path data of every line marking, scaled by `pixelsPerMetre`: touchlines, goal lines,
    /// halfway line, centre circle, penalty and goal areas, penalty arcs, corner arcs, goals.
    Q_INVOKABLE QString markingsPath(double pixelsPerMetre) const;
    /// SVG path data of the centre mark and the penalty marks (small filled discs).
    Q_INVOKABLE QString spotsPath(double pixelsPerMetre) const;

signals:
    void changed();

private:
    model::Pitch m_pitch;
    model::ZoneGrid m_grid;
};

} // namespace pitchloop::desktop
