#include "drills.h"
#include "fixtures.h"
#include "pdfdocument.h"
#include "pitchpainter.h"
#include "sheetcolours.h"
#include "sheetformat.h"
#include "sheets.h"
#include "textblock.h"

#include <QPainter>
#include <QPdfWriter>
#include <algorithm>
#include <array>
#include <vector>

namespace pitchloop::print {

using namespace pitchloop::model;

namespace {

// Page geometry in millimetres (A4 portrait).
constexpr double kPageW = 210, kPageH = 297;
constexpr double kMargin = 13;
constexpr double kTop = 12, kBottom = kPageH - 11;
constexpr double kContentW = kPageW - 2 * kMargin;
constexpr double kRoleColW = 25; ///< the block's role and minutes
constexpr double kGap = 2;       ///< between a block's role column and its text

/// Font sizes (points) of the drill text at scale 1; shrunk together to fit the page.
constexpr double kTitlePt = 10.5, kMetaPt = 7.8, kBodyPt = 8.6, kMinutesPt = 13, kRolePt = 7.5;
constexpr std::array<double, 5> kScales{1.0, 0.95, 0.9, 0.86, 0.82};
/// The drill text's size when the blocks run onto a second page: readable on the pitch.
constexpr double kContinuedScale = 0.95;

/// Lines kept of the organisation text and of each coaching point, and how many points, when
/// even the smallest type does not fit the page: tried in order, keeping as much as fits.
struct Limits {
    int organisationLines = 0; ///< 0: all
    int pointLines = 0;
    int points = 0;
};
constexpr std::array<Limits, 14> kLimits{{{0, 0, 0},
                                          {8, 3, 0},
                                          {7, 2, 0},
                                          {6, 2, 0},
                                          {5, 2, 0},
                                          {5, 2, 4},
                                          {4, 2, 4},
                                          {4, 1, 4},
                                          {4, 1, 3},
                                          {3, 1, 3},
                                          {3, 1, 2},
                                          {2, 1, 2},
                                          {2, 1, 1},
                                          {1, 1, 1}}};

/// One block measured at a given type size.
struct BlockLayout {
    Paragraph title;
    Paragraph meta;
    Paragraph organisation;
    std::vector<Paragraph> points;
    bool metaInline = false;
    int pointsLeftOut = 0;
    Paragraph pointsNote; ///< "+ 2 more coaching points", in the role column
    double height = 0;
    int elided = 0;
};

struct Fonts {
    QFont title, meta, body, minutes, role, small;
    explicit Fonts(double s)
        : title(sheetFont(kTitlePt * s, true)), meta(sheetFont(kMetaPt * s)),
          body(sheetFont(kBodyPt * s)), minutes(sheetFont(kMinutesPt * s, true)),
          role(sheetFont(kRolePt * s, true)), small(sheetFont(6.8 * s)) {}
};

QString metaLine(const SheetBlock& b, const SessionSheetData& d) {
    QStringList parts;
    if (b.intensity > 0)
        parts << QStringLiteral("Intensity %1 (%2)")
                     .arg(b.intensity)
                     .arg(q(std::string(intensityName(b.intensity))));
    parts << QStringLiteral("drill %1").arg(b.drillId);
    if (b.focusId)
        for (const auto& f : d.focuses)
            if (f.id == *b.focusId)
                parts << QStringLiteral("works on %1 (%2)").arg(q(f.label), q(f.metricName));
    return parts.join(QStringLiteral("  ·  "));
}

constexpr double kPad = 2.0, kPointIndent = 3.2;

/// "on Sunday 27 September 2026 at 08:00 UTC" from an ISO date-time; as given when it is not one.
std::string savedWhen(const std::string& iso) {
    if (iso.size() < 16) return iso.empty() ? "" : "at " + iso;
    const std::string date = iso.substr(0, 10);
    const auto day = dayNumber(date);
    if (!day) return "at " + iso;
    return "on " + longDate(date, *day) + " at " + iso.substr(11, 5) + (iso.back() == 'Z' ? " UTC" : "");
}

BlockLayout layoutBlock(const SheetBlock& b, const SessionSheetData& d, const Fonts& f,
                        QPaintDevice* dev, const Mm& mm, const Limits& lim) {
    BlockLayout l;
    const double w = mm(kContentW - kRoleColW - kGap);
    l.title = wrapText(q(b.title), f.title, dev, w, 2);
    l.meta = wrapText(metaLine(b, d), f.meta, dev, w, 2);
    // The meta line (intensity, drill, focus) always sits under the title: one place to look.
    l.metaInline = false;
    l.organisation = wrapText(q(b.organisation), f.body, dev, w, lim.organisationLines);
    std::size_t shown = b.coachingPoints.size();
    if (lim.points > 0 && shown > static_cast<std::size_t>(lim.points))
        shown = static_cast<std::size_t>(lim.points);
    for (std::size_t i = 0; i < shown; ++i)
        l.points.push_back(
            wrapText(q(b.coachingPoints[i]), f.body, dev, w - mm(kPointIndent), lim.pointLines));
    l.pointsLeftOut = static_cast<int>(b.coachingPoints.size() - shown);
    if (l.pointsLeftOut > 0)
        l.pointsNote = wrapText(QStringLiteral("+ %1 more coaching point%2")
                                    .arg(l.pointsLeftOut)
                                    .arg(l.pointsLeftOut == 1 ? "" : "s"),
                                f.small, dev, mm(kRoleColW - 1), 2);
    l.elided = (l.title.elided ? 1 : 0) + (l.meta.elided ? 1 : 0) +
               (l.organisation.elided ? 1 : 0) + (l.pointsLeftOut > 0 ? 1 : 0);
    double h = mm(kPad) + l.title.height() + (l.metaInline ? 0 : mm(0.5) + l.meta.height());
    if (!b.organisation.empty()) h += mm(1.2) + l.organisation.height();
    if (!l.points.empty()) h += mm(1.0);
    for (const auto& p : l.points) {
        h += p.height() + mm(0.4);
        l.elided += p.elided ? 1 : 0;
    }
    h += mm(kPad);
    const double roleCol = mm(kPad) + QFontMetricsF(f.role, dev).lineSpacing() +
                           QFontMetricsF(f.minutes, dev).lineSpacing() +
                           QFontMetricsF(f.small, dev).lineSpacing() +
                           (l.pointsLeftOut > 0 ? mm(1) + l.pointsNote.height() : 0) + mm(kPad);
    l.height = std::max(h, roleCol);
    return l;
}

void drawBlock(QPainter& p, const SheetBlock& b, const BlockLayout& l, const Fonts& f, const Mm& mm,
               double top, int startMinute) {
    const double x0 = mm(kMargin);
    const double xText = mm(kMargin + kRoleColW + kGap);
    QPaintDevice* dev = p.device();

    // Role column: the role, the minutes and where they fall in the session.
    double y = top + mm(kPad);
    p.setPen(colours::kMuted);
    const Paragraph role = wrapText(q(roleText(b.role)).toUpper(), f.role, dev, mm(kRoleColW));
    y += drawParagraph(p, role, QPointF(x0, y));
    p.setPen(colours::kInk);
    y += drawParagraph(
        p, wrapText(QStringLiteral("%1 min").arg(b.minutes), f.minutes, dev, mm(kRoleColW)),
        QPointF(x0, y));
    p.setPen(colours::kMuted);
    y += drawParagraph(
        p,
        wrapText(QStringLiteral("minute %1–%2").arg(startMinute).arg(startMinute + b.minutes),
                 f.small, dev, mm(kRoleColW)),
        QPointF(x0, y));
    if (l.pointsLeftOut > 0) drawParagraph(p, l.pointsNote, QPointF(x0, y + mm(1)));
    p.setPen(QPen(colours::kRule, mm(0.25)));
    p.drawLine(QPointF(mm(kMargin + kRoleColW), top + mm(kPad)),
               QPointF(mm(kMargin + kRoleColW), top + l.height - mm(kPad)));

    y = top + mm(kPad);
    p.setPen(b.drillFound ? colours::kInk : colours::kAlert);
    if (l.metaInline) {
        drawParagraph(p, l.title, QPointF(xText, y));
        p.setPen(colours::kMuted);
        p.setFont(l.meta.font);
        const double right = mm(kMargin + kContentW);
        p.drawText(
            QPointF(right - textWidth(l.meta.lines[0], l.meta.font, dev), y + l.title.ascent),
            l.meta.lines[0]);
        y += l.title.height();
    } else {
        y += drawParagraph(p, l.title, QPointF(xText, y)) + mm(0.5);
        p.setPen(colours::kMuted);
        y += drawParagraph(p, l.meta, QPointF(xText, y));
    }
    p.setPen(colours::kInk);
    if (!b.organisation.empty()) y += mm(1.2) + drawParagraph(p, l.organisation, QPointF(xText, y));
    if (!l.points.empty()) y += mm(1.0);
    for (const auto& point : l.points) {
        p.setFont(point.font);
        p.drawText(QPointF(xText + mm(0.6), y + point.ascent), QStringLiteral("•"));
        y += drawParagraph(p, point, QPointF(xText + mm(kPointIndent), y)) + mm(0.4);
    }
}

/// Header: the club, squad and date, then the day's facts in four boxes. Returns its bottom.
double drawHeader(QPainter& p, const SessionSheetData& d, const Mm& mm) {
    QPaintDevice* dev = p.device();
    double y = mm(kTop);
    const QFont kicker = sheetFont(8, true);
    p.setPen(colours::kMuted);
    p.setFont(kicker);
    const QString label = QStringLiteral("TRAINING SESSION SHEET");
    p.drawText(QPointF(mm(kMargin), y + QFontMetricsF(kicker, dev).ascent()), label);
    y += QFontMetricsF(kicker, dev).lineSpacing() + mm(0.8);

    p.setPen(colours::kInk);
    const QString club = d.club.empty() ? QStringLiteral("Pitchloop") : q(d.club);
    const Paragraph title = wrapText(club + QStringLiteral(" · ") + q(d.squad), sheetFont(17, true),
                                     dev, mm(kContentW), 1);
    y += drawParagraph(p, title, QPointF(mm(kMargin), y));
    const Paragraph when =
        wrapText(q(longDate(d.date, d.dayNumber)) + QStringLiteral("   (") + q(d.date) +
                     QStringLiteral(", season ") + q(d.season) + QStringLiteral(")"),
                 sheetFont(11), dev, mm(kContentW), 1);
    y += drawParagraph(p, when, QPointF(mm(kMargin), y)) + mm(3);

    struct Fact {
        QString caption, value, note;
    };
    const QString capName = d.cap >= kIntensityMin ? q(std::string(intensityName(d.cap)))
                                                   : QStringLiteral("no session");
    const std::array<Fact, 4> facts{{
        {QStringLiteral("Microcycle day"), d.dayLabel.empty() ? QStringLiteral("–") : q(d.dayLabel),
         QString()},
        {QStringLiteral("Intensity cap"), QString::number(d.cap), capName},
        {QStringLiteral("Session"), QStringLiteral("%1 min").arg(d.minutes),
         QStringLiteral("%1 in blocks").arg(d.minutesInBlocks)},
        {QStringLiteral("Players"), QString::number(d.players), QStringLiteral("available")},
    }};
    const double gap = 3, boxW = (kContentW - 3 * gap) / 4, boxH = 14;
    const QFont cap = sheetFont(7), value = sheetFont(13, true), note = sheetFont(7.5);
    for (std::size_t i = 0; i < facts.size(); ++i) {
        const QRectF box(mm(kMargin + static_cast<double>(i) * (boxW + gap)), y, mm(boxW),
                         mm(boxH));
        p.setPen(Qt::NoPen);
        p.setBrush(colours::kPanel);
        p.drawRoundedRect(box, mm(1.2), mm(1.2));
        double ty = box.top() + mm(1.6);
        p.setPen(colours::kMuted);
        ty +=
            drawParagraph(p, wrapText(facts[i].caption.toUpper(), cap, dev, box.width() - mm(4), 1),
                          QPointF(box.left() + mm(2.5), ty));
        p.setPen(colours::kInk);
        const Paragraph v = wrapText(facts[i].value, value, dev, box.width() - mm(4), 1);
        drawParagraph(p, v, QPointF(box.left() + mm(2.5), ty));
        if (!facts[i].note.isEmpty()) {
            p.setPen(colours::kMuted);
            p.setFont(note);
            const double vx =
                box.left() + mm(2.5) + textWidth(v.lines.value(0), value, dev) + mm(1.8);
            const QString n = elideLine(facts[i].note, note, dev, box.right() - mm(2) - vx);
            p.drawText(QPointF(vx, ty + v.ascent), n);
        }
    }
    return y + mm(boxH);
}

/// The focuses with their minutes on the left, the pitch sketch with their zones on the right.
/// With no painter it only measures; returns the section's height either way.
double drawFocuses(QPainter* painter, const SessionSheetData& d, const Mm& mm, QPaintDevice* dev,
                   double top) {
    const QFont heading = sheetFont(10.5, true), name = sheetFont(8.6, true),
                small = sheetFont(7.2), label = sheetFont(7.5, true), body = sheetFont(8.4);
    // A sketch just large enough to read the zones: the room goes to the drill texts.
    constexpr double listW = 122, gap = 5, pitchW = kContentW - listW - gap;
    const double pitchX = kMargin + listW + gap;

    const Paragraph h =
        wrapText(QStringLiteral("Focuses this session works on"), heading, dev, mm(kContentW), 1);
    const double y = top + h.height() + mm(1.5);
    const double pitchH = PitchFrame::heightFor(d.pitch, mm(pitchW));
    const Paragraph caption = wrapText(
        QStringLiteral("Our goal on the left, we attack left to right; our left touchline at the "
                       "top. Zones: %1, band 1 at our goal line, lane 1 at our right "
                       "touchline; drawn on a %2 × %3 m pitch.")
            .arg(q(gridText(d.grid)))
            .arg(d.pitch.lengthM)
            .arg(d.pitch.widthM),
        small, dev, mm(pitchW));
    const double pitchBottom = y + pitchH + mm(1) + caption.height();

    // The list: a swatch like the zone's shading, the metric, minutes and zones.
    constexpr double sw = 9, sh = 5.5, textX = kMargin + sw + 2.5, textW = listW - sw - 2.5;
    struct Row {
        Paragraph name, detail;
        double top = 0;
    };
    std::vector<Row> rows;
    double ly = y;
    Paragraph none;
    if (d.focuses.empty()) {
        none = wrapText(QStringLiteral("No open focus got minutes in this session: the drills are "
                                       "general work."),
                        body, dev, mm(listW));
        ly += none.height() + mm(2);
    }
    for (const auto& f : d.focuses) {
        QStringList zones;
        for (const Zone& z : f.zones)
            zones << q(zoneText(z.band, z.lane, d.grid));
        Row r;
        r.top = ly;
        r.name = wrapText(q(f.metricName), name, dev, mm(textW), 2);
        r.detail = wrapText(QStringLiteral("%1 min today  ·  focus %2%3\n%4")
                                .arg(f.minutes)
                                .arg(f.id)
                                .arg(f.note.empty() ? QString() : QStringLiteral("  ·  “%1”").arg(q(f.note)))
                                .arg(zones.isEmpty() ? QStringLiteral("whole pitch")
                                                     : zones.join(QStringLiteral("; "))),
                            small, dev, mm(textW), 4);
        ly = std::max(ly + r.name.height() + r.detail.height(), ly + mm(sh)) + mm(2.2);
        rows.push_back(std::move(r));
    }
    Paragraph notMet;
    if (!d.focusesNotMet.empty()) {
        QStringList names;
        for (const auto& f : d.focusesNotMet)
            names << QStringLiteral("focus %1 (%2)").arg(f.id).arg(q(f.metricName));
        notMet = wrapText(QStringLiteral("Open but given no minutes today: ") +
                              names.join(QStringLiteral(", ")),
                          small, dev, mm(listW), 3);
        ly += notMet.height();
    }
    const double bottom = std::max(pitchBottom, ly);
    if (!painter) return bottom - top;
    QPainter& p = *painter;

    p.setPen(colours::kInk);
    drawParagraph(p, h, QPointF(mm(kMargin), top));
    const PitchFrame frame(d.pitch, d.grid, QRectF(mm(pitchX), y, mm(pitchW), pitchH));
    frame.draw(p);
    // Zones first, all focuses; their labels on top so no shading hides a label.
    auto zonesOf = [](const SheetFocus& f) {
        return f.zones.empty() ? std::vector<Zone>{Zone{0, 0}} : f.zones;
    };
    for (std::size_t i = 0; i < d.focuses.size(); ++i) {
        const QColor c = colours::focusColour(i);
        for (const Zone& z : zonesOf(d.focuses[i])) {
            const QRectF r = frame.zoneRect(z.band, z.lane);
            QColor fill = c;
            fill.setAlphaF(0.22);
            p.fillRect(r, fill);
            hatch(p, r, colours::focusHatchAngle(i), mm(1.6), c, mm(0.22));
            p.setPen(QPen(c, mm(0.5)));
            p.setBrush(Qt::NoBrush);
            p.drawRect(r);
        }
    }
    // Several focuses may share a zone: their labels sit side by side.
    std::vector<std::pair<QRectF, int>> labelled;
    for (std::size_t i = 0; i < d.focuses.size(); ++i) {
        for (const Zone& z : zonesOf(d.focuses[i])) {
            const QRectF r = frame.zoneRect(z.band, z.lane);
            int already = 0;
            for (auto& [rect, n] : labelled)
                if (rect == r) already = n++;
            if (already == 0) labelled.push_back({r, 1});
            const QString text = q(d.focuses[i].label);
            const double tw = textWidth(text, label, dev) + mm(1.6), th = mm(3.6);
            const QPointF c = r.center() + QPointF(already * (tw + mm(0.8)), 0);
            const QRectF box(c.x() - tw / 2, c.y() - th / 2, tw, th);
            p.setPen(QPen(colours::focusColour(i), mm(0.35)));
            p.setBrush(Qt::white);
            p.drawRoundedRect(box, mm(0.6), mm(0.6));
            p.setPen(colours::kInk);
            p.setFont(label);
            p.drawText(box, Qt::AlignCenter, text);
        }
    }
    p.setPen(colours::kMuted);
    drawParagraph(p, caption, QPointF(mm(pitchX), y + pitchH + mm(1)));

    if (d.focuses.empty()) drawParagraph(p, none, QPointF(mm(kMargin), y));
    for (std::size_t i = 0; i < d.focuses.size(); ++i) {
        const Row& r = rows[i];
        const QRectF swatch(mm(kMargin), r.top, mm(sw), mm(sh));
        QColor fill = colours::focusColour(i);
        fill.setAlphaF(0.22);
        p.fillRect(swatch, fill);
        hatch(p, swatch, colours::focusHatchAngle(i), mm(1.6), colours::focusColour(i), mm(0.22));
        p.setPen(QPen(colours::focusColour(i), mm(0.4)));
        p.setBrush(Qt::NoBrush);
        p.drawRect(swatch);
        p.setPen(Qt::NoPen);
        p.setBrush(Qt::white);
        const double tw = textWidth(q(d.focuses[i].label), label, dev) + mm(1.4);
        p.drawRoundedRect(
            QRectF(swatch.center().x() - tw / 2, swatch.center().y() - mm(1.7), tw, mm(3.4)),
            mm(0.5), mm(0.5));
        p.setPen(colours::kInk);
        p.setFont(label);
        p.drawText(swatch, Qt::AlignCenter, q(d.focuses[i].label));
        p.setPen(colours::kInk);
        const double ny = r.top + drawParagraph(p, r.name, QPointF(mm(textX), r.top));
        p.setPen(colours::kMuted);
        drawParagraph(p, r.detail, QPointF(mm(textX), ny));
    }
    if (!d.focusesNotMet.empty()) {
        p.setPen(colours::kMuted);
        drawParagraph(p, notMet, QPointF(mm(kMargin), ly - notMet.height()));
    }
    return bottom - top;
}

/// The top of a continued page: the sheet's name, the squad and day, the page count.
void drawContinuationHeader(QPainter& p, const SessionSheetData& d, const Mm& mm, int page, int pages) {
    QPaintDevice* dev = p.device();
    const QFont kicker = sheetFont(8, true), title = sheetFont(11, true);
    double y = mm(kTop);
    p.setPen(colours::kMuted);
    p.setFont(kicker);
    p.drawText(QPointF(mm(kMargin), y + QFontMetricsF(kicker, dev).ascent()),
               QStringLiteral("TRAINING SESSION SHEET · PAGE %1 OF %2").arg(page).arg(pages));
    y += QFontMetricsF(kicker, dev).lineSpacing() + mm(0.8);
    p.setPen(colours::kInk);
    drawParagraph(p,
                  wrapText(QStringLiteral("%1 · %2 · blocks continued")
                               .arg(q(d.squad), q(longDate(d.date, d.dayNumber))),
                           title, dev, mm(kContentW), 1),
                  QPointF(mm(kMargin), y));
}

/// The caution, boxed, above the foot line. Returns its top.
double drawCaution(QPainter& p, const SessionSheetData& d, const Mm& mm) {
    QPaintDevice* dev = p.device();
    const QFont body = sheetFont(8.6), foot = sheetFont(6.8);
    const Paragraph footLine = wrapText(
        QStringLiteral("Saved by %1 %2 · drill notes as the drill book holds them today · "
                       "printed with Pitchloop")
            .arg(d.savedBy.empty() ? QStringLiteral("–") : q(d.savedBy), q(savedWhen(d.savedAt))),
        foot, dev, mm(kContentW), 1);
    const double footTop = mm(kBottom) - footLine.height();
    p.setPen(colours::kMuted);
    drawParagraph(p, footLine, QPointF(mm(kMargin), footTop));

    const double iconW = 7;
    const Paragraph text = wrapText(q(d.caution), body, dev, mm(kContentW - iconW - 5));
    const double boxH = text.height() + mm(4);
    const QRectF box(mm(kMargin), footTop - mm(1.5) - boxH, mm(kContentW), boxH);
    p.setPen(QPen(colours::kInk, mm(0.35)));
    p.setBrush(colours::kPanel);
    p.drawRect(box);
    // A warning triangle with "!" (shape, not colour, carries the meaning).
    const QPointF c(box.left() + mm(1.5 + iconW / 2), box.center().y());
    const double s = mm(2.6);
    const QPolygonF tri({QPointF(c.x(), c.y() - s), QPointF(c.x() + s * 1.1, c.y() + s * 0.8),
                         QPointF(c.x() - s * 1.1, c.y() + s * 0.8)});
    p.setPen(QPen(colours::kInk, mm(0.35)));
    p.setBrush(Qt::NoBrush);
    p.drawPolygon(tri);
    p.setFont(sheetFont(7.5, true));
    p.drawText(QRectF(c.x() - s, c.y() - s * 0.5, 2 * s, s * 1.3), Qt::AlignCenter,
               QStringLiteral("!"));
    p.setPen(colours::kInk);
    drawParagraph(p, text, QPointF(box.left() + mm(iconW + 3), box.top() + mm(2)));
    return box.top();
}

} // namespace

DrawReport drawSessionSheet(const SessionSheetData& d, QPdfWriter& writer) {
    DrawReport report;
    writer.setResolution(600);
    writer.setPageSize(QPageSize(QPageSize::A4));
    writer.setPageOrientation(QPageLayout::Portrait);
    writer.setPageMargins(QMarginsF(0, 0, 0, 0), QPageLayout::Millimeter);
    writer.setTitle(QStringLiteral("Session %1 %2").arg(q(d.squad), q(d.date)));
    QPainter p;
    if (!p.begin(&writer)) return report;
    report.ok = true;
    const Mm mm(writer);
    QPaintDevice* dev = &writer;
    p.setRenderHint(QPainter::Antialiasing);
    p.setRenderHint(QPainter::TextAntialiasing);

    const double headerBottom = drawHeader(p, d, mm);
    const double cautionTop = drawCaution(p, d, mm);
    const double focusH = drawFocuses(nullptr, d, mm, dev, 0);
    const double focusTop = cautionTop - mm(3) - focusH;

    // Blocks: the largest type at which every text fits this page in full; when none does, the
    // texts stay whole at a readable size and the blocks run onto a second page. Only a block
    // taller than a whole page is shortened (and says so).
    const double blocksTop = headerBottom + mm(4);
    const Paragraph heading =
        wrapText(QStringLiteral("Blocks"), sheetFont(10.5, true), dev, mm(kContentW));
    // A line under the blocks is kept free for the note on continued or shortened blocks.
    const Paragraph noteLine =
        wrapText(QStringLiteral("x"), Fonts(kScales.back()).meta, dev, mm(kContentW));
    const double noteRoom = noteLine.height() + mm(1.5);
    const double avail = focusTop - mm(3) - noteRoom - blocksTop - heading.height() - mm(1);
    // On a sheet of several pages the blocks fill each page down to the caution (on every
    // page), and the focus section follows the last block.
    const double firstLimit = cautionTop - mm(3) - noteRoom;
    const double nextTop = mm(kTop) + mm(14); // under the continuation header
    const double nextLimit = firstLimit;
    const std::size_t n = d.blocks.size();
    std::vector<BlockLayout> layouts(n);
    auto layoutAll = [&](const Fonts& f) {
        double total = 0;
        for (std::size_t i = 0; i < n; ++i) {
            layouts[i] = layoutBlock(d.blocks[i], d, f, dev, mm, kLimits[0]);
            total += layouts[i].height;
        }
        return total;
    };
    double scale = kContinuedScale;
    bool onePage = false;
    for (const double s : kScales)
        if (layoutAll(Fonts(s)) <= avail) {
            scale = s;
            onePage = true;
            break;
        }
    const Fonts fonts(scale);
    if (!onePage) {
        layoutAll(fonts);
        // A block longer than a whole page keeps as much as fits one.
        for (std::size_t i = 0; i < n; ++i)
            for (std::size_t lv = 1; lv < kLimits.size() && layouts[i].height > nextLimit - nextTop; ++lv)
                layouts[i] = layoutBlock(d.blocks[i], d, fonts, dev, mm, kLimits[lv]);
    }
    report.fontScale = scale;
    // Where each block goes: page 1 under the heading, then the next pages from the top; on one
    // page the focus section sits above the caution, on several after the last block.
    std::vector<std::pair<int, double>> place(n);
    int focusPage = 1;
    double focusAt = focusTop;
    if (onePage) {
        double y = blocksTop + heading.height() + mm(1);
        for (std::size_t i = 0; i < n; ++i) {
            place[i] = {1, y};
            y += layouts[i].height;
        }
        report.pages = 1;
    } else {
        int page = 1;
        double y = blocksTop + heading.height() + mm(1);
        for (std::size_t i = 0; i < n; ++i) {
            if (y + layouts[i].height > (page == 1 ? firstLimit : nextLimit) && y > (page == 1 ? blocksTop + heading.height() + mm(1) : nextTop)) {
                ++page;
                y = nextTop;
            }
            place[i] = {page, y};
            y += layouts[i].height;
        }
        focusAt = y + noteRoom + mm(3);
        if (focusAt + focusH > cautionTop - mm(3)) {
            ++page;
            focusAt = nextTop;
        }
        focusPage = page;
        report.pages = page;
    }
    if (focusPage == 1) drawFocuses(&p, d, mm, dev, focusAt);

    p.setPen(colours::kInk);
    drawParagraph(p, heading, QPointF(mm(kMargin), blocksTop));
    int startMinute = 0, page = 1;
    double y = blocksTop + heading.height() + mm(1);
    const auto continued = [&](double at) {
        p.setPen(colours::kMuted);
        drawParagraph(p, wrapText(QStringLiteral("Continued on page %1.").arg(page + 1), fonts.meta, dev, mm(kContentW), 1),
                      QPointF(mm(kMargin), at + mm(0.8)));
    };
    for (std::size_t i = 0; i < n; ++i) {
        if (place[i].first != page) {
            p.setPen(QPen(colours::kRule, mm(0.25)));
            p.drawLine(QPointF(mm(kMargin), y), QPointF(mm(kMargin + kContentW), y));
            continued(y);
            writer.newPage();
            ++page;
            drawContinuationHeader(p, d, mm, page, report.pages);
            drawCaution(p, d, mm);
        }
        y = place[i].second;
        const BlockLayout& l = layouts[i];
        p.setPen(QPen(colours::kRule, mm(0.25)));
        p.drawLine(QPointF(mm(kMargin), y), QPointF(mm(kMargin + kContentW), y));
        drawBlock(p, d.blocks[i], l, fonts, mm, y, startMinute);
        report.elidedTexts += l.elided;
        startMinute += d.blocks[i].minutes;
        y += l.height;
    }
    p.setPen(QPen(colours::kRule, mm(0.25)));
    p.drawLine(QPointF(mm(kMargin), y), QPointF(mm(kMargin + kContentW), y));
    if (report.elidedTexts > 0) {
        p.setPen(colours::kMuted);
        drawParagraph(p, wrapText(QStringLiteral("A drill longer than a page is shortened (…); the drill book has it in full."),
                                  fonts.meta, dev, mm(kContentW), 1),
                      QPointF(mm(kMargin), y + mm(0.8)));
    }
    if (focusPage > 1) {
        while (page < focusPage) {
            writer.newPage();
            ++page;
            drawContinuationHeader(p, d, mm, page, report.pages);
            drawCaution(p, d, mm);
        }
        drawFocuses(&p, d, mm, dev, focusAt);
    }
    p.end();
    return report;
}

} // namespace pitchloop::print
