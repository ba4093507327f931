#pragma once
// Wrapped text for the sheets: lines broken at word boundaries to a width, with an optional
// limit on lines that ends the last one with "…" rather than running past its room.

#include <QFont>
#include <QString>
#include <QStringList>

class QPaintDevice;
class QPainter;
class QPointF;

namespace pitchloop::print {

/// Text laid out in lines of a given width (device units of the paint device it was made for).
struct Paragraph {
    QFont font;
    QStringList lines;
    double lineHeight = 0;
    double ascent = 0;
    bool elided = false; ///< text was cut to fit the line limit

    double height() const { return lines.size() * lineHeight; }
};

/// Lays `text` out in lines no wider than `width`; line breaks in the text are kept. With
/// `maxLines` > 0, text beyond that many lines is cut and the last line ends with "…".
Paragraph wrapText(const QString& text, const QFont& font, QPaintDevice* device, double width,
                   int maxLines = 0);

/// Draws the paragraph with its first line's top at `topLeft`; returns the height used.
double drawParagraph(QPainter& painter, const Paragraph& p, const QPointF& topLeft);

/// `text` shortened with "…" to fit `width` on one line.
QString elideLine(const QString& text, const QFont& font, QPaintDevice* device, double width);

/// Width of `text` on one line.
double textWidth(const QString& text, const QFont& font, QPaintDevice* device);

} // namespace pitchloop::print
