#include "pitchgeometry.h"

#include <cmath>
#include <numbers>

namespace pitchloop::desktop {

using namespace pitchloop::model;

namespace {

/// Builds SVG path data in pixels from drawing metres.
class PathWriter {
public:
    explicit PathWriter(double scale) : m_scale(scale) {}

    void moveTo(double x, double y) { m_out += QStringLiteral("M %1 %2 ").arg(px(x), px(y)); }
    void lineTo(double x, double y) { m_out += QStringLiteral("L %1 %2 ").arg(px(x), px(y)); }
    void close() { m_out += QStringLiteral("Z "); }
    void polyline(std::initializer_list<std::pair<double, double>> points) {
        bool first = true;
        for (const auto& [x, y] : points) {
            first ? moveTo(x, y) : lineTo(x, y);
            first = false;
        }
    }
    /// An arc of a circle from angle `from` to `to` (degrees, y pointing down, so increasing
    /// angles turn clockwise on screen).
    void arc(double cx, double cy, double r, double from, double to) {
        const auto at = [&](double deg) {
            const double a = deg * std::numbers::pi / 180;
            return std::pair{cx + r * std::cos(a), cy + r * std::sin(a)};
        };
        const auto [x0, y0] = at(from);
        const auto [x1, y1] = at(to);
        moveTo(x0, y0);
        m_out += QStringLiteral("A %1 %1 0 %2 %3 %4 %5 ")
                     .arg(px(r))
                     .arg(std::abs(to - from) > 180 ? 1 : 0)
                     .arg(to > from ? 1 : 0)
                     .arg(px(x1), px(y1));
    }
    void circle(double cx, double cy, double r) {
        arc(cx, cy, r, 0, 180);
        m_out += QStringLiteral("A %1 %1 0 0 1 %2 %3 Z ").arg(px(r), px(cx + r), px(cy));
    }
    QString text() const { return m_out.trimmed(); }

private:
    QString px(double metres) const { return QString::number(metres * m_scale, 'f', 2); }
    double m_scale;
    QString m_out;
};

} // namespace

PitchGeometry::PitchGeometry(QObject* parent) : QObject(parent) {}

void PitchGeometry::setLength(double metres) {
    if (metres <= 0 || metres == m_pitch.lengthM) return;
    m_pitch.lengthM = metres;
    emit changed();
}

void PitchGeometry::setWidth(double metres) {
    if (metres <= 0 || metres == m_pitch.widthM) return;
    m_pitch.widthM = metres;
    emit changed();
}

QString PitchGeometry::grid() const { return QString::fromStdString(m_grid.name()); }

void PitchGeometry::setGrid(const QString& name) {
    if (auto g = ZoneGrid::parse(name.toStdString())) setZoneGrid(*g);
}

void PitchGeometry::setZoneGrid(const ZoneGrid& grid) {
    if (grid == m_grid) return;
    m_grid = grid;
    emit changed();
}

void PitchGeometry::setPitch(const Pitch& pitch) {
    if (pitch == m_pitch || pitch.lengthM <= 0 || pitch.widthM <= 0) return;
    m_pitch = pitch;
    emit changed();
}

QList<double> PitchGeometry::bandEdges() const {
    const auto e = m_grid.bandEdges(m_pitch);
    return QList<double>(e.begin(), e.end());
}

QList<double> PitchGeometry::laneEdges() const {
    const auto e = m_grid.laneEdges(m_pitch);
    return QList<double>(e.begin(), e.end());
}

QRectF PitchGeometry::zoneRect(int band, int lane) const {
    if (band < 1 || band > bands() || lane < 1 || lane > lanes()) return {};
    const auto be = m_grid.bandEdges(m_pitch);
    const auto le = m_grid.laneEdges(m_pitch);
    const auto b = static_cast<std::size_t>(band);
    const auto l = static_cast<std::size_t>(lane);
    const double top = margin() + m_pitch.widthM - le[l];
    return {margin() + be[b - 1], top, be[b] - be[b - 1], le[l] - le[l - 1]};
}

QPoint PitchGeometry::zoneAt(double x, double y) const {
    const double fromGoalLine = x - margin();
    const double fromRightTouchline = m_pitch.widthM - (y - margin());
    if (fromGoalLine < 0 || fromGoalLine > m_pitch.lengthM || fromRightTouchline < 0 ||
        fromRightTouchline > m_pitch.widthM)
        return {0, 0};
    const Zone z = m_grid.zoneOf(Point{fromGoalLine, fromRightTouchline}, m_pitch);
    return {z.band, z.lane};
}

QString PitchGeometry::markingsPath(double pixelsPerMetre) const {
    using namespace law1;
    PathWriter p(pixelsPerMetre);
    const double m = margin(), L = m_pitch.lengthM, W = m_pitch.widthM;
    const double x0 = m, x1 = m + L, y0 = m, y1 = m + W, cx = m + L / 2, cy = m + W / 2;

    p.polyline({{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}});
    p.close();
    p.polyline({{cx, y0}, {cx, y1}});
    p.circle(cx, cy, kCentreCircleRadiusM);

    const double arcHalfAngle =
        std::acos((kPenaltyAreaDepthM - kPenaltyMarkM) / kPenaltyArcRadiusM) * 180 / std::numbers::pi;
    for (const double side : {1.0, -1.0}) {
        const double goalLine = side > 0 ? x0 : x1;
        const auto box = [&](double depth, double halfWidth) {
            p.polyline({{goalLine, cy - halfWidth},
                        {goalLine + side * depth, cy - halfWidth},
                        {goalLine + side * depth, cy + halfWidth},
                        {goalLine, cy + halfWidth}});
        };
        box(kPenaltyAreaDepthM, kPenaltyAreaWidthM / 2);
        box(kGoalAreaDepthM, kGoalAreaWidthM / 2);
        const double mark = goalLine + side * kPenaltyMarkM;
        if (side > 0) p.arc(mark, cy, kPenaltyArcRadiusM, -arcHalfAngle, arcHalfAngle);
        else p.arc(mark, cy, kPenaltyArcRadiusM, 180 - arcHalfAngle, 180 + arcHalfAngle);
        // The goal, drawn behind the goal line (its depth is not part of Law 1's markings).
        const double goalDepth = 1.8;
        p.polyline({{goalLine, cy - kGoalWidthM / 2},
                    {goalLine - side * goalDepth, cy - kGoalWidthM / 2},
                    {goalLine - side * goalDepth, cy + kGoalWidthM / 2},
                    {goalLine, cy + kGoalWidthM / 2}});
    }
    p.arc(x0, y0, kCornerArcRadiusM, 0, 90);
    p.arc(x1, y0, kCornerArcRadiusM, 90, 180);
    p.arc(x1, y1, kCornerArcRadiusM, 180, 270);
    p.arc(x0, y1, kCornerArcRadiusM, 270, 360);
    return p.text();
}

QString PitchGeometry::spotsPath(double pixelsPerMetre) const {
    using namespace law1;
    PathWriter p(pixelsPerMetre);
    const double m = margin(), L = m_pitch.lengthM, W = m_pitch.widthM, cy = m + W / 2;
    // The marks are about 0.2 m across; draw them at least 3 px wide so they stay visible.
    const double r = std::max(0.25, 1.5 / std::max(pixelsPerMetre, 1e-6));
    p.circle(m + L / 2, cy, r);
    p.circle(m + kPenaltyMarkM, cy, r);
    p.circle(m + L - kPenaltyMarkM, cy, r);
    return p.text();
}

} // namespace pitchloop::desktop
