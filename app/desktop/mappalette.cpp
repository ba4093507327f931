#include "mappalette.h"

#include "palette.h"

namespace pitchloop::desktop {

namespace palette = pitchloop::model::palette;

int MapPalette::rows() const { return palette::kLevels; }

QStringList MapPalette::row(int level) const {
    QStringList out;
    for (int s = 0; s < palette::stepsAt(level); ++s)
        out << QString::fromStdString(palette::toHex(palette::colour(level, s)));
    return out;
}

QStringList MapPalette::divergingRow(int level) const {
    QStringList out;
    for (int s = 0; s < palette::stepsAt(level); ++s)
        out << QString::fromStdString(palette::toHex(palette::divergingColour(level, s)));
    return out;
}

} // namespace pitchloop::desktop
