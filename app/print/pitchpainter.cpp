#include "pitchpainter.h"

#include <QPainter>
#include <QPainterPath>
#include <algorithm>
#include <cmath>
#include <numbers>

namespace pitchloop::print {

using namespace pitchloop::model;

PitchFrame::PitchFrame(const Pitch& pitch, const ZoneGrid& grid, const QRectF& room)
    : m_pitch(pitch), m_grid(grid) {
    const double extentL = pitch.lengthM + 2 * kMarginM;
    const double extentW = pitch.widthM + 2 * kMarginM;
    m_scale = std::min(room.width() / extentL, room.height() / extentW);
    const QSizeF size(extentL * m_scale, extentW * m_scale);
    m_bounds = QRectF(room.center() - QPointF(size.width() / 2, size.height() / 2), size);
}

double PitchFrame::heightFor(const Pitch& pitch, double width) {
    return width * (pitch.widthM + 2 * kMarginM) / (pitch.lengthM + 2 * kMarginM);
}

QPointF PitchFrame::at(double x, double y) const {
    return {m_bounds.left() + (kMarginM + x) * m_scale,
            m_bounds.top() + (kMarginM + m_pitch.widthM - y) * m_scale};
}

QRectF PitchFrame::field() const {
    return QRectF(at(0, m_pitch.widthM), at(m_pitch.lengthM, 0));
}

QRectF PitchFrame::zoneRect(int band, int lane) const {
    if (band == 0 && lane == 0) return field();
    if (band < 1 || band > m_grid.bands() || lane < 1 || lane > m_grid.lanes()) return {};
    const auto be = m_grid.bandEdges(m_pitch);
    const auto le = m_grid.laneEdges(m_pitch);
    const auto b = static_cast<std::size_t>(band);
    const auto l = static_cast<std::size_t>(lane);
    return QRectF(at(be[b - 1], le[l]), at(be[b], le[l - 1]));
}

void PitchFrame::draw(QPainter& painter, bool gridLines) const {
    using namespace law1;
    painter.save();
    painter.setRenderHint(QPainter::Antialiasing);
    const double px = m_scale; // device units a metre
    const double L = m_pitch.lengthM, W = m_pitch.widthM, cy = W / 2;

    painter.fillRect(field(), QColor(0xEE, 0xF4, 0xEA));

    if (gridLines) {
        QPen pen(QColor(0xB8, 0xC4, 0xB4), 0.18 * px, Qt::DashLine);
        painter.setPen(pen);
        const auto be = m_grid.bandEdges(m_pitch);
        const auto le = m_grid.laneEdges(m_pitch);
        for (std::size_t i = 1; i + 1 < be.size(); ++i)
            painter.drawLine(at(be[i], 0), at(be[i], W));
        for (std::size_t i = 1; i + 1 < le.size(); ++i)
            painter.drawLine(at(0, le[i]), at(L, le[i]));
    }

    QPen line(QColor(0x4A, 0x4A, 0x4A), 0.3 * px);
    line.setJoinStyle(Qt::MiterJoin);
    painter.setPen(line);
    painter.setBrush(Qt::NoBrush);
    painter.drawRect(field());
    painter.drawLine(at(L / 2, 0), at(L / 2, W));
    const QPointF centre = at(L / 2, cy);
    painter.drawEllipse(centre, kCentreCircleRadiusM * px, kCentreCircleRadiusM * px);

    // The penalty arc is the part of the circle round the penalty mark outside the area.
    const double arcHalf = std::acos((kPenaltyAreaDepthM - kPenaltyMarkM) / kPenaltyArcRadiusM) *
                           180 / std::numbers::pi;
    for (const bool ours : {true, false}) {
        const double goal = ours ? 0 : L;
        const double in = ours ? 1 : -1; // towards the field
        const auto box = [&](double depth, double width) {
            QPainterPath p;
            p.moveTo(at(goal, cy - width / 2));
            p.lineTo(at(goal + in * depth, cy - width / 2));
            p.lineTo(at(goal + in * depth, cy + width / 2));
            p.lineTo(at(goal, cy + width / 2));
            painter.drawPath(p);
        };
        box(kPenaltyAreaDepthM, kPenaltyAreaWidthM);
        box(kGoalAreaDepthM, kGoalAreaWidthM);
        const QPointF mark = at(goal + in * kPenaltyMarkM, cy);
        const double r = kPenaltyArcRadiusM * px;
        const QRectF circle(mark.x() - r, mark.y() - r, 2 * r, 2 * r);
        // drawArc: angles in 1/16 degree, counter-clockwise from 3 o'clock.
        const double start = ours ? -arcHalf : 180 - arcHalf;
        painter.drawArc(circle, static_cast<int>(std::lround(start * 16)),
                        static_cast<int>(std::lround(2 * arcHalf * 16)));
        QPainterPath g;
        g.moveTo(at(goal, cy - kGoalWidthM / 2));
        g.lineTo(at(goal - in * kGoalDepthM, cy - kGoalWidthM / 2));
        g.lineTo(at(goal - in * kGoalDepthM, cy + kGoalWidthM / 2));
        g.lineTo(at(goal, cy + kGoalWidthM / 2));
        painter.drawPath(g);
    }
    const double rc = kCornerArcRadiusM * px;
    const auto corner = [&](double x, double y, int startDeg) {
        const QPointF c = at(x, y);
        painter.drawArc(QRectF(c.x() - rc, c.y() - rc, 2 * rc, 2 * rc), startDeg * 16, 90 * 16);
    };
    corner(0, W, 270); // top left: the quarter pointing down-right
    corner(L, W, 180); // top right
    corner(L, 0, 90);  // bottom right
    corner(0, 0, 0);   // bottom left

    painter.setPen(Qt::NoPen);
    painter.setBrush(line.color());
    const double spot = std::max(0.35 * px, line.widthF());
    for (const double x : {L / 2, kPenaltyMarkM, L - kPenaltyMarkM})
        painter.drawEllipse(at(x, cy), spot, spot);
    painter.restore();
}

void hatch(QPainter& painter, const QRectF& rect, double angleDeg, double spacing,
           const QColor& colour, double lineWidth) {
    if (rect.isEmpty() || spacing <= 0) return;
    painter.save();
    painter.setClipRect(rect, Qt::IntersectClip);
    painter.setPen(QPen(colour, lineWidth, Qt::SolidLine, Qt::FlatCap));
    const double a = angleDeg * std::numbers::pi / 180;
    const QPointF dir(std::cos(a), -std::sin(a)); // y grows downwards on the page
    const QPointF normal(-dir.y(), dir.x());
    const QPointF c = rect.center();
    const double reach = std::hypot(rect.width(), rect.height()) / 2 + spacing;
    for (double off = -reach; off <= reach; off += spacing) {
        const QPointF base = c + normal * off;
        painter.drawLine(base - dir * reach, base + dir * reach);
    }
    painter.restore();
}

} // namespace pitchloop::print
