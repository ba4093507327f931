#include "pdfdocument.h"
#include "pitchpainter.h"
#include "sheetcolours.h"
#include "sheetformat.h"
#include "sheets.h"
#include "textblock.h"

#include <QPainter>
#include <QPainterPath>
#include <QPdfWriter>
#include <algorithm>
#include <array>
#include <functional>
#include <vector>

namespace pitchloop::print {

using namespace pitchloop::model;

namespace {

// Page geometry in millimetres (A4 landscape).
constexpr double kPageW = 297, kPageH = 210;
constexpr double kMargin = 12;
constexpr double kTop = 10, kBottom = kPageH - 9;
constexpr double kContentW = kPageW - 2 * kMargin;
constexpr double kColGap = 6;
constexpr double kCardW = (kContentW - kColGap) / 2;
constexpr double kCardPad = 2.0;
constexpr double kMapW = 52;

/// How a slip is marked on a map; the legend explains the same three.
enum class MarkKind {
    Window, ///< off target over the judged window: vermillion, hatched, a triangle
    Match,  ///< off target in this match alone: orange, cross-hatched, a circle
    Also,   ///< the same metric off target in another zone of the list: blue, dashed, a square
};

QColor markColour(MarkKind k) {
    switch (k) {
    case MarkKind::Window:
        return colours::kVermillion;
    case MarkKind::Match:
        return colours::kOrange;
    case MarkKind::Also:
        return colours::kBlue;
    }
    return colours::kInk;
}

/// The shape of a mark, centred on `c`, `r` its half size.
void drawSymbol(QPainter& p, MarkKind k, const QPointF& c, double r, double outline) {
    p.save();
    p.setPen(QPen(Qt::white, outline));
    p.setBrush(markColour(k));
    switch (k) {
    case MarkKind::Window:
        p.drawPolygon(
            QPolygonF({QPointF(c.x(), c.y() - r * 1.1), QPointF(c.x() + r, c.y() + r * 0.75),
                       QPointF(c.x() - r, c.y() + r * 0.75)}));
        break;
    case MarkKind::Match:
        p.drawEllipse(c, r * 0.85, r * 0.85);
        break;
    case MarkKind::Also:
        p.drawRect(QRectF(c.x() - r * 0.7, c.y() - r * 0.7, r * 1.4, r * 1.4));
        break;
    }
    p.restore();
}

/// A zone marked as `k`: shading and hatch (not for Also), outline, symbol at its centre.
void markZone(QPainter& p, MarkKind k, const QRectF& r, const Mm& mm, double symbol) {
    const QColor c = markColour(k);
    if (k != MarkKind::Also) {
        QColor fill = c;
        fill.setAlphaF(0.25);
        p.fillRect(r, fill);
        hatch(p, r, 45, mm(1.3), c, mm(0.2));
        if (k == MarkKind::Match) hatch(p, r, -45, mm(1.3), c, mm(0.2));
    }
    QPen pen(c, k == MarkKind::Also ? mm(0.45) : mm(0.6));
    if (k == MarkKind::Also) pen.setStyle(Qt::DashLine);
    pen.setJoinStyle(Qt::MiterJoin);
    p.setPen(pen);
    p.setBrush(Qt::NoBrush);
    p.drawRect(r);
    drawSymbol(p, k, r.center(), symbol, mm(0.25));
}

/// One piece of the page flow: its height and how to draw it at a given top.
struct FlowItem {
    double height = 0;
    bool keepWithNext = false;
    bool hasMap = false; ///< a page with a map carries the legend
    std::function<void(QPainter&, double)> draw;
};

class DebriefLayout {
  public:
    DebriefLayout(const DebriefSheetData& d, QPdfWriter& w) : m_d(d), m_mm(w), m_dev(&w) {}

    DrawReport draw(QPainter& p, QPdfWriter& writer);

  private:
    double header(QPainter* p, bool first) const;
    double legend(QPainter* p, double top) const;
    void footer(QPainter& p, int page, int pages) const;
    FlowItem heading(const QString& text) const;
    FlowItem paragraph(const QString& text, const QFont& font, const QColor& colour) const;
    FlowItem cardRow(const std::vector<DebriefMark>& list, std::size_t first, MarkKind kind) const;
    FlowItem tableRow(const DebriefMark* m) const; ///< nullptr: the column titles
    void table(std::vector<FlowItem>& flow, const QString& title, const QString& what,
               const std::vector<DebriefMark>& list) const;
    double cardHeight(const DebriefMark& m, std::size_t index) const;
    void drawCard(QPainter& p, const DebriefMark& m, std::size_t index, MarkKind kind,
                  const std::vector<DebriefMark>& list, const QRectF& rect) const;
    std::vector<std::pair<QString, QString>> rows(const DebriefMark& m) const;
    Paragraph cardTitle(const DebriefMark& m, std::size_t index) const;
    /// The zone in the coach's words, wrapped to the card's text column.
    Paragraph sentenceOf(const DebriefMark& m) const;

    const DebriefSheetData& m_d;
    Mm m_mm;
    QPaintDevice* m_dev;
    QFont m_body = sheetFont(8.2);
    QFont m_label = sheetFont(7.4);
    QFont m_small = sheetFont(7.2);
};

double DebriefLayout::header(QPainter* p, bool first) const {
    const Mm& mm = m_mm;
    double y = mm(kTop);
    const QString club = m_d.club.empty() ? QStringLiteral("Us") : q(m_d.club);
    const QString teams = QStringLiteral("%1 · %2 v %3").arg(q(m_d.matchId), club, q(m_d.opponent));
    if (!first) {
        const Paragraph t = wrapText(teams + QStringLiteral(" — debrief, continued"),
                                     sheetFont(10.5, true), m_dev, mm(kContentW), 1);
        if (p) {
            p->setPen(colours::kInk);
            drawParagraph(*p, t, QPointF(mm(kMargin), y));
        }
        return y + t.height() + mm(2);
    }
    const QFont kicker = sheetFont(8, true);
    const Paragraph k = wrapText(QStringLiteral("MATCH DEBRIEF"), kicker, m_dev, mm(kContentW), 1);
    const Paragraph t = wrapText(teams, sheetFont(16, true), m_dev, mm(kContentW), 1);
    QStringList facts{q(longDate(m_d.date, dayNumber(m_d.date).value_or(0)))};
    if (!m_d.venue.empty()) facts << q(m_d.venue);
    if (!m_d.competition.empty()) facts << q(m_d.competition);
    if (const auto score = scoreText(m_d.goalsUs, m_d.goalsOpp); !score.empty())
        facts << QStringLiteral("%1 (us first)").arg(q(score));
    facts << QStringLiteral("%1 %2, match %3 of %4 stored")
                 .arg(q(m_d.squad), q(m_d.season))
                 .arg(m_d.matchNumber)
                 .arg(m_d.seasonMatches);
    const Paragraph sub =
        wrapText(facts.join(QStringLiteral("  ·  ")), sheetFont(10.5), m_dev, mm(kContentW), 1);
    QString judged;
    if (m_d.hasTargets) {
        judged =
            QStringLiteral("Judged over %1 (%2 … %3): a zone is off target "
                           "when P(miss) ≥ %4%5. P(miss) is the probability, given the "
                           "data, that the true value lies on the wrong side of the target. "
                           "Intervals at %6 %.")
                .arg(q(windowText(m_d.window)), q(m_d.windowFirstMatch), q(m_d.matchId),
                     q(shortNumber(m_d.offThreshold, 4)),
                     m_d.fdr ? QStringLiteral(" and the Benjamini–Hochberg test at q = %1 agrees")
                                   .arg(q(shortNumber(m_d.fdrQ, 3)))
                             : QString(),
                     q(shortNumber(100 * m_d.level, 1)));
    }
    const Paragraph j = wrapText(judged, sheetFont(8.2), m_dev, mm(kContentW), 3);
    if (p) {
        p->setPen(colours::kMuted);
        y += drawParagraph(*p, k, QPointF(mm(kMargin), y)) + mm(0.6);
        p->setPen(colours::kInk);
        y += drawParagraph(*p, t, QPointF(mm(kMargin), y)) + mm(0.4);
        y += drawParagraph(*p, sub, QPointF(mm(kMargin), y)) + mm(1.2);
        if (!judged.isEmpty()) {
            p->setPen(colours::kMuted);
            y += drawParagraph(*p, j, QPointF(mm(kMargin), y));
        }
        return y + mm(2);
    }
    return y + k.height() + mm(0.6) + t.height() + mm(0.4) + sub.height() + mm(1.2) +
           (judged.isEmpty() ? 0 : j.height()) + mm(2);
}

double DebriefLayout::legend(QPainter* p, double top) const {
    const Mm& mm = m_mm;
    if (!m_d.hasTargets) return top;
    const double h = mm(9.5);
    if (p) {
        const QRectF box(mm(kMargin), top, mm(kContentW), h);
        p->setPen(Qt::NoPen);
        p->setBrush(colours::kPanel);
        p->drawRect(box);
        struct Entry {
            MarkKind kind;
            QString text;
        };
        const std::vector<Entry> entries{
            {MarkKind::Window, QStringLiteral("▲ hatched: the zone off target over %1")
                                   .arg(q(windowText(m_d.window)))},
            {MarkKind::Match,
             QStringLiteral("● cross-hatched: the zone off target in this match alone")},
            {MarkKind::Also, QStringLiteral("■ dashed: the same metric off target in this zone too")},
        };
        const double entryW = (kContentW - 4) / 3.0;
        for (std::size_t i = 0; i < entries.size(); ++i) {
            const double x = kMargin + 2 + static_cast<double>(i) * entryW;
            const QRectF sample(mm(x), top + mm(1.5), mm(9), mm(6.5));
            p->fillRect(sample, QColor(0xEE, 0xF4, 0xEA));
            markZone(*p, entries[i].kind, sample, mm, mm(1.5));
            p->setPen(colours::kInk);
            const Paragraph t = wrapText(entries[i].text, m_label, m_dev, mm(entryW - 13), 2);
            drawParagraph(*p, t, QPointF(mm(x + 11), top + (h - t.height()) / 2));
        }
    }
    const Paragraph note = wrapText(
        QStringLiteral("A target for the whole pitch is marked by the touchlines drawn in the "
                       "mark's colour. Maps: our goal on the left, we attack left to right, our "
                       "left touchline at the top; zones: %1, band 1 at our goal line, lane 1 "
                       "at our right touchline.")
            .arg(q(gridText(m_d.grid))),
        m_small, m_dev, mm(kContentW), 2);
    if (p) {
        p->setPen(colours::kMuted);
        drawParagraph(*p, note, QPointF(mm(kMargin), top + h + mm(0.8)));
    }
    return top + h + mm(0.8) + note.height() + mm(2.5);
}

void DebriefLayout::footer(QPainter& p, int page, int pages) const {
    const Mm& mm = m_mm;
    const QString left = QStringLiteral("%1 debrief · Slips are evidence for the staff to weigh, "
                                        "not verdicts · printed with Pitchloop")
                             .arg(q(m_d.matchId));
    const QString right = QStringLiteral("Page %1 of %2").arg(page).arg(pages);
    const QFontMetricsF fm(m_small, m_dev);
    const double base = mm(kBottom) - fm.descent();
    p.setPen(QPen(colours::kRule, mm(0.25)));
    p.drawLine(QPointF(mm(kMargin), base - fm.ascent() - mm(1.2)),
               QPointF(mm(kMargin + kContentW), base - fm.ascent() - mm(1.2)));
    p.setPen(colours::kMuted);
    p.setFont(m_small);
    p.drawText(QPointF(mm(kMargin), base), left);
    p.drawText(QPointF(mm(kMargin + kContentW) - fm.horizontalAdvance(right), base), right);
}

FlowItem DebriefLayout::heading(const QString& text) const {
    const Paragraph t = wrapText(text, sheetFont(11, true), m_dev, m_mm(kContentW), 1);
    FlowItem item;
    item.height = t.height() + m_mm(2);
    item.keepWithNext = true;
    item.draw = [t, this](QPainter& p, double top) {
        p.setPen(colours::kInk);
        drawParagraph(p, t, QPointF(m_mm(kMargin), top + m_mm(0.8)));
    };
    return item;
}

FlowItem DebriefLayout::paragraph(const QString& text, const QFont& font,
                                  const QColor& colour) const {
    const Paragraph t = wrapText(text, font, m_dev, m_mm(kContentW));
    FlowItem item;
    item.height = t.height() + m_mm(2);
    item.draw = [t, colour, this](QPainter& p, double top) {
        p.setPen(colour);
        drawParagraph(p, t, QPointF(m_mm(kMargin), top));
    };
    return item;
}

std::vector<std::pair<QString, QString>> DebriefLayout::rows(const DebriefMark& m) const {
    std::vector<std::pair<QString, QString>> out;
    out.push_back({QStringLiteral("Value"), q(valueText(m.kind, m.value) + unitText(m.kind))});
    out.push_back({QStringLiteral("Target"), q(targetText(m.direction, m.kind, m.target))});
    out.push_back({QStringLiteral("%1 % interval").arg(q(shortNumber(100 * m.level, 1))),
                   q(valueText(m.kind, m.low) + " – " + valueText(m.kind, m.high))});
    const QString matches =
        QStringLiteral("%1 match%2").arg(m.matches).arg(m.matches == 1 ? "" : "es");
    out.push_back(
        {QStringLiteral("Sample"),
         m.kind == MetricKind::Count
             ? matches
             : QStringLiteral("n = %1 over %2").arg(q(shortNumber(m.sample, 1)), matches)});
    out.push_back({QStringLiteral("Off by"),
                   q(valueText(m.kind, m.gap) + unitText(m.kind)) +
                       (m.direction == Direction::AtLeast ? QStringLiteral(" below the target")
                                                          : QStringLiteral(" above the target"))});
    out.push_back({QStringLiteral("P(miss)"), q(probabilityText(m.pMiss))});
    if (m.before && !m_d.previousMatchId.empty())
        out.push_back(
            {QStringLiteral("Before"),
             QStringLiteral("%1 after %2").arg(q(stateText(*m.before)), q(m_d.previousMatchId))});
    return out;
}

Paragraph DebriefLayout::sentenceOf(const DebriefMark& m) const {
    const double textW = kCardW - 2 * kCardPad - kMapW - 4;
    return wrapText(q(m.sentence), sheetFont(8.2, false), m_dev, m_mm(textW), 5);
}

Paragraph DebriefLayout::cardTitle(const DebriefMark& m, std::size_t index) const {
    const double textW = kCardW - 2 * kCardPad - kMapW - 4;
    return wrapText(QStringLiteral("%1. %2").arg(index + 1).arg(q(m.metricName)),
                    sheetFont(9.4, true), m_dev, m_mm(textW - (m.isNew ? 11 : 0)), 2);
}

double DebriefLayout::cardHeight(const DebriefMark& m, std::size_t index) const {
    const Mm& mm = m_mm;
    const double textW = kCardW - 2 * kCardPad - kMapW - 4;
    double text = cardTitle(m, index).height() + mm(0.5);
    text += wrapText(QStringLiteral("x"), m_small, m_dev, mm(textW)).height() + mm(1.2);
    if (!m.sentence.empty()) text += sentenceOf(m).height() + mm(1.2);
    text += static_cast<double>(rows(m).size()) * QFontMetricsF(m_body, m_dev).lineSpacing();
    const double map = PitchFrame::heightFor(m_d.pitch, mm(kMapW)) + mm(1) +
                       QFontMetricsF(m_small, m_dev).lineSpacing();
    return std::max(text, map) + 2 * mm(kCardPad);
}

void DebriefLayout::drawCard(QPainter& p, const DebriefMark& m, std::size_t index, MarkKind kind,
                             const std::vector<DebriefMark>& list, const QRectF& rect) const {
    const Mm& mm = m_mm;
    p.setPen(QPen(colours::kRule, mm(0.3)));
    p.setBrush(Qt::NoBrush);
    p.drawRoundedRect(rect, mm(1.5), mm(1.5));

    // The map: other zones of the same metric in this list first, this item's zone on top.
    const double mapH = PitchFrame::heightFor(m_d.pitch, mm(kMapW));
    const QRectF mapRect(rect.left() + mm(kCardPad), rect.top() + mm(kCardPad), mm(kMapW), mapH);
    const PitchFrame frame(m_d.pitch, m_d.grid, mapRect);
    frame.draw(p);
    for (const auto& other : list)
        if (&other != &m && other.metric == m.metric &&
            (other.band != m.band || other.lane != m.lane) && other.band > 0)
            markZone(p, MarkKind::Also, frame.zoneRect(other.band, other.lane), mm, mm(1.1));
    markZone(p, kind, frame.zoneRect(m.band, m.lane), mm, mm(1.7));
    p.setPen(colours::kMuted);
    p.setFont(m_small);
    p.drawText(
        QPointF(mapRect.left(), mapRect.bottom() + mm(1) + QFontMetricsF(m_small, m_dev).ascent()),
        QStringLiteral("%1 · %2 × %3 m")
            .arg(q(zoneText(m.band, m.lane, m_d.grid)))
            .arg(m_d.pitch.lengthM)
            .arg(m_d.pitch.widthM));

    // The numbers.
    const double x = mapRect.right() + mm(4);
    const double textW = rect.right() - mm(kCardPad) - x;
    double y = rect.top() + mm(kCardPad);
    const Paragraph title = cardTitle(m, index);
    p.setPen(colours::kInk);
    drawParagraph(p, title, QPointF(x, y));
    if (m.isNew) {
        const QFont tag = sheetFont(6.8, true);
        const QRectF box(rect.right() - mm(kCardPad) - mm(10), y + mm(0.3), mm(10), mm(3.6));
        p.setPen(QPen(colours::kInk, mm(0.3)));
        p.setBrush(Qt::white);
        p.drawRoundedRect(box, mm(0.6), mm(0.6));
        p.setFont(tag);
        p.drawText(box, Qt::AlignCenter, QStringLiteral("NEW"));
    }
    y += title.height() + mm(0.5);
    p.setPen(colours::kMuted);
    y +=
        drawParagraph(
            p, wrapText(q(zoneText(m.band, m.lane, m_d.grid)), m_small, m_dev, textW, 1),
            QPointF(x, y)) +
        mm(1.2);
    // The coach's words first, then the numbers behind them.
    if (!m.sentence.empty()) {
        p.setPen(colours::kInk);
        y += drawParagraph(p, sentenceOf(m), QPointF(x, y)) + mm(1.2);
    }
    const QFontMetricsF fm(m_body, m_dev);
    const double labelW = mm(22);
    for (const auto& [label, value] : rows(m)) {
        p.setFont(m_label);
        p.setPen(colours::kMuted);
        p.drawText(QPointF(x, y + fm.ascent()), label);
        p.setFont(m_body);
        p.setPen(colours::kInk);
        p.drawText(QPointF(x + labelW, y + fm.ascent()),
                   elideLine(value, m_body, m_dev, textW - labelW));
        y += fm.lineSpacing();
    }
}

FlowItem DebriefLayout::cardRow(const std::vector<DebriefMark>& list, std::size_t first,
                                MarkKind kind) const {
    FlowItem item;
    double h = cardHeight(list[first], first);
    if (first + 1 < list.size()) h = std::max(h, cardHeight(list[first + 1], first + 1));
    item.height = h + m_mm(3);
    item.hasMap = true;
    item.draw = [this, &list, first, kind, h](QPainter& p, double top) {
        for (std::size_t i = first; i < std::min(first + 2, list.size()); ++i) {
            const double x = kMargin + static_cast<double>(i - first) * (kCardW + kColGap);
            drawCard(p, list[i], i, kind, list, QRectF(m_mm(x), top, m_mm(kCardW), h));
        }
    };
    return item;
}

namespace {

struct Column {
    const char* title;
    double width; ///< mm
};
// The zone's name is the longest cell after the metric's ("right half-space in their half
// (B4·L2)"): it gets the room the numbers do not need.
constexpr std::array<Column, 8> kColumns{{{"Metric", 56},
                                          {"Zone", 56},
                                          {"Value", 24},
                                          {"Target", 18},
                                          {"Interval", 33},
                                          {"Sample", 33},
                                          {"P(miss)", 18},
                                          {"Before", 35}}};

} // namespace

FlowItem DebriefLayout::tableRow(const DebriefMark* m) const {
    const QFont font = m ? sheetFont(7.8) : sheetFont(7.2, true);
    const QFontMetricsF fm(font, m_dev);
    QStringList cells;
    if (!m) {
        for (const auto& c : kColumns)
            cells << QString::fromLatin1(c.title);
    } else {
        const QString matches =
            QStringLiteral("%1 match%2").arg(m->matches).arg(m->matches == 1 ? "" : "es");
        cells << q(m->metricName) << q(zoneText(m->band, m->lane, m_d.grid))
              << q(valueText(m->kind, m->value) + unitText(m->kind))
              << q(targetText(m->direction, m->kind, m->target))
              << q(valueText(m->kind, m->low) + " – " + valueText(m->kind, m->high))
              << (m->kind == MetricKind::Count
                      ? matches
                      : QStringLiteral("%1 over %2").arg(q(shortNumber(m->sample, 1)), matches))
              << q(probabilityText(m->pMiss))
              << (m->before ? q(stateText(*m->before)) : QStringLiteral("–"));
    }
    FlowItem item;
    item.height = fm.lineSpacing() + m_mm(0.9);
    item.keepWithNext = m == nullptr;
    item.draw = [this, cells, font, header = m == nullptr](QPainter& p, double top) {
        const QFontMetricsF metrics(font, m_dev);
        double x = m_mm(kMargin);
        p.setFont(font);
        p.setPen(header ? colours::kMuted : colours::kInk);
        for (int i = 0; i < cells.size(); ++i) {
            const double w = m_mm(kColumns[static_cast<std::size_t>(i)].width);
            p.drawText(QPointF(x, top + m_mm(0.4) + metrics.ascent()),
                       elideLine(cells[i], font, m_dev, w - m_mm(2)));
            x += w;
        }
        p.setPen(QPen(header ? colours::kMuted : colours::kRule, m_mm(header ? 0.3 : 0.15)));
        const double base = top + metrics.lineSpacing() + m_mm(0.9);
        p.drawLine(QPointF(m_mm(kMargin), base), QPointF(m_mm(kMargin + kContentW), base));
    };
    return item;
}

void DebriefLayout::table(std::vector<FlowItem>& flow, const QString& title, const QString& what,
                          const std::vector<DebriefMark>& list) const {
    if (list.empty()) {
        flow.push_back(heading(title + QStringLiteral(": none")));
        flow.back().keepWithNext = false;
        return;
    }
    flow.push_back(heading(QStringLiteral("%1 (%2): %3").arg(title).arg(list.size()).arg(what)));
    flow.push_back(tableRow(nullptr));
    for (const auto& m : list)
        flow.push_back(tableRow(&m));
    flow.back().height += m_mm(2);
}

DrawReport DebriefLayout::draw(QPainter& p, QPdfWriter& writer) {
    DrawReport report;
    report.ok = true;
    std::vector<FlowItem> flow;
    const QString window = q(windowText(m_d.window));
    if (!m_d.hasTargets) {
        flow.push_back(paragraph(QStringLiteral("No targets are set for %1 %2 yet, so no zone can "
                                                "be off target: set them first on the Season "
                                                "targets page.")
                                     .arg(q(m_d.squad), q(m_d.season)),
                                 sheetFont(10.5, true), colours::kInk));
    } else {
        const bool nothing = m_d.slippedInWindow.empty() && m_d.slippedInMatch.empty();
        if (nothing)
            flow.push_back(paragraph(QStringLiteral("Nothing off target over %1, nor in this match alone.")
                                         .arg(window),
                                     sheetFont(11, true), colours::kInk));
        const auto order = [](std::size_t n) {
            return n > 1 ? QStringLiteral(", most certain first") : QString();
        };
        if (!nothing) {
            const auto section = [&](const QString& title, const std::vector<DebriefMark>& list,
                                     MarkKind kind) {
                if (list.empty()) {
                    flow.push_back(heading(title + QStringLiteral(": none")));
                    flow.back().keepWithNext = false;
                    return;
                }
                flow.push_back(heading(QStringLiteral("%1 (%2)%3")
                                           .arg(title)
                                           .arg(list.size())
                                           .arg(order(list.size()))));
                for (std::size_t i = 0; i < list.size(); i += 2)
                    flow.push_back(cardRow(list, i, kind));
            };
            section(QStringLiteral("Off target over %1").arg(window), m_d.slippedInWindow,
                    MarkKind::Window);
            section(QStringLiteral("Off target in this match alone"), m_d.slippedInMatch,
                    MarkKind::Match);
        }
        QString summary =
            QStringLiteral("%1 zones with targets judged over %2 (%3 more have too little data); "
                           "if every true value sat exactly on its target, chance alone would "
                           "flag at most about %4 of them at some point this season.")
                .arg(m_d.judged)
                .arg(window)
                .arg(m_d.tooLittleData)
                .arg(m_d.chanceFlags, 0, 'f', 1);
        flow.push_back(paragraph(summary, sheetFont(8), colours::kMuted));
        if (!m_d.unusualInMatch.empty())
            table(flow, QStringLiteral("Unusual in this match alone"),
                  QStringLiteral("one match cannot judge a per-match count target; a team on its "
                                 "target has a match like this at most once in a hundred"),
                  m_d.unusualInMatch);
        table(flow, QStringLiteral("Likely off or close to the line over %1").arg(window),
              QStringLiteral("not yet certain enough to flag"), m_d.watched);
        if (!m_d.previousMatchId.empty())
            table(flow, QStringLiteral("Back on target since %1").arg(q(m_d.previousMatchId)),
                  QStringLiteral("off, likely off or close to the line then, on target now"), m_d.recovered);
    }

    // Pages: place the flow, keeping a heading with what follows it.
    const double bottom = m_mm(kBottom) - QFontMetricsF(m_small, m_dev).lineSpacing() - m_mm(3);
    std::vector<std::vector<std::pair<const FlowItem*, double>>> pages(1);
    double y = legend(nullptr, header(nullptr, true));
    const double nextTop = legend(nullptr, header(nullptr, false));
    for (std::size_t i = 0; i < flow.size(); ++i) {
        double need = flow[i].height;
        for (std::size_t k = i; flow[k].keepWithNext && k + 1 < flow.size(); ++k)
            need += flow[k + 1].height;
        if (y + need > bottom && !pages.back().empty()) {
            pages.emplace_back();
            y = nextTop;
        }
        pages.back().push_back({&flow[i], y});
        y += flow[i].height;
    }

    // A later page without maps leaves the legend out and moves up by its height.
    const double continuedTop = header(nullptr, false);
    const int count = static_cast<int>(pages.size());
    for (int page = 0; page < count; ++page) {
        const auto& items = pages[static_cast<std::size_t>(page)];
        const bool maps = std::any_of(items.begin(), items.end(),
                                      [](const auto& placed) { return placed.first->hasMap; });
        if (page > 0) writer.newPage();
        const double top = header(&p, page == 0);
        double shift = 0;
        if (page == 0 || maps)
            legend(&p, top);
        else
            shift = continuedTop - nextTop;
        for (const auto& [item, y0] : items)
            item->draw(p, y0 + shift);
        footer(p, page + 1, count);
    }
    report.pages = count;
    return report;
}

} // namespace

DrawReport drawDebriefSheet(const DebriefSheetData& d, QPdfWriter& writer) {
    writer.setResolution(600);
    writer.setPageSize(QPageSize(QPageSize::A4));
    writer.setPageOrientation(QPageLayout::Landscape);
    writer.setPageMargins(QMarginsF(0, 0, 0, 0), QPageLayout::Millimeter);
    writer.setTitle(QStringLiteral("Debrief %1").arg(q(d.matchId)));
    QPainter p;
    if (!p.begin(&writer)) return {};
    p.setRenderHint(QPainter::Antialiasing);
    p.setRenderHint(QPainter::TextAntialiasing);
    DebriefLayout layout(d, writer);
    const DrawReport report = layout.draw(p, writer);
    p.end();
    return report;
}

} // namespace pitchloop::print
