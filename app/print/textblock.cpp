#include "textblock.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QTextLayout>

namespace pitchloop::print {

namespace {

/// The lines of one paragraph (no line breaks inside) broken to `width`.
QStringList breakLines(const QString& text, const QFont& font, QPaintDevice* device, double width) {
    QStringList out;
    if (text.isEmpty()) {
        out << QString();
        return out;
    }
    QTextLayout layout(text, font, device);
    QTextOption option;
    option.setWrapMode(QTextOption::WrapAtWordBoundaryOrAnywhere);
    layout.setTextOption(option);
    layout.beginLayout();
    for (QTextLine line = layout.createLine(); line.isValid(); line = layout.createLine()) {
        line.setLineWidth(width);
        out << text.mid(line.textStart(), line.textLength()).trimmed();
    }
    layout.endLayout();
    return out;
}

} // namespace

Paragraph wrapText(const QString& text, const QFont& font, QPaintDevice* device, double width,
                   int maxLines) {
    Paragraph p;
    p.font = font;
    const QFontMetricsF fm(font, device);
    p.lineHeight = fm.lineSpacing();
    p.ascent = fm.ascent();
    QStringList all;
    for (const QString& part : text.split(QLatin1Char('\n')))
        all << breakLines(part, font, device, width);
    while (all.size() > 1 && all.back().isEmpty())
        all.removeLast();
    if (maxLines > 0 && all.size() > maxLines) {
        p.elided = true;
        QString last = all[maxLines - 1];
        all = all.mid(0, maxLines);
        // Room for the ellipsis: drop words from the end of the last line until it fits.
        const QString ellipsis = QStringLiteral(" …");
        while (!last.isEmpty() && fm.horizontalAdvance(last + ellipsis) > width) {
            const auto cut = last.lastIndexOf(QLatin1Char(' '));
            last = cut > 0 ? last.left(cut) : fm.elidedText(last, Qt::ElideRight, width);
            if (cut <= 0) break;
        }
        all.back() = last.endsWith(QChar(0x2026)) ? last : last + ellipsis;
    }
    p.lines = all;
    return p;
}

double drawParagraph(QPainter& painter, const Paragraph& p, const QPointF& topLeft) {
    painter.setFont(p.font);
    double y = topLeft.y() + p.ascent;
    for (const QString& line : p.lines) {
        painter.drawText(QPointF(topLeft.x(), y), line);
        y += p.lineHeight;
    }
    return p.height();
}

QString elideLine(const QString& text, const QFont& font, QPaintDevice* device, double width) {
    return QFontMetricsF(font, device).elidedText(text, Qt::ElideRight, width);
}

double textWidth(const QString& text, const QFont& font, QPaintDevice* device) {
    return QFontMetricsF(font, device).horizontalAdvance(text);
}

} // namespace pitchloop::print
