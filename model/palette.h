#pragma once
// The colours of the zone maps: a value-suppressing uncertainty palette (Correll, Moritz &
// Heer, "Value-Suppressing Uncertainty Palettes", CHI 2018) over the viridis scale — the less
// certain a zone's value, the fewer value steps its row of the palette keeps and the closer its
// colours sit to a neutral grey — and the colour-vision checks it passes (docs/statistics.md,
// "Pooled maps"). Colours are sRGB; no Qt here.

#include <array>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model::palette {

struct Rgb {
    double r = 0, g = 0, b = 0; ///< sRGB, 0..1
};
struct Lab {
    double l = 0, a = 0, b = 0; ///< CIE L*a*b*, D65 white
};

Rgb fromHex(std::string_view hex); ///< "#rrggbb"
std::string toHex(Rgb c);          ///< "#rrggbb", channels clamped to 0..1
Lab toLab(Rgb c);
Rgb fromLab(Lab c);
/// CIE76 colour difference: the distance in L*a*b*.
double deltaE(Lab x, Lab y);

/// Dichromat vision as simulated by Machado, Oliveira & Fernandes (2009), "A Physiologically-
/// based Model for Simulation of Color Vision Deficiency", IEEE TVCG 15(6), at severity 1.0:
/// a 3 × 3 matrix on linear RGB.
enum class Vision { Deuteranopia, Protanopia };
Rgb simulate(Rgb c, Vision v);

/// The sequential scale: viridis at nine evenly spaced stops, low to high.
const std::array<std::string_view, 9>& scaleStops();
/// The scale at t (0..1), blended between stops in sRGB.
Rgb scaleAt(double t);
/// The neutral the palette's uncertain rows fade to.
Rgb neutral();

/// The palette's rows: level 0 (most certain) keeps 8 value steps, then 4, 2 and 1 (the most
/// uncertain row is the neutral alone).
inline constexpr int kLevels = 4;
int stepsAt(int level);
/// The uncertainty row of a value whose interval spans `spread` of the colour scale's range:
/// below 0.2 → 0; 0.2 to 0.4 → 1; 0.4 to 0.8 → 2; 0.8 or more → 3.
int levelOf(double spread);
/// The value step of `scaled` (0..1) in a row.
int stepOf(double scaled, int level);
/// A cell's colour: row `level`, step `step` — the scale at the step's centre, moved toward the
/// neutral by level / (kLevels − 1) in L*a*b*.
Rgb colour(int level, int step);
/// The same for a value and its spread, as "#rrggbb".
std::string colourFor(double scaled, double spread);
/// The difference maps' diverging scale, value-suppressing in the same way: `signedScaled` in
/// −1..1 (second side lower … higher), row `level` by the difference's certainty. Row 0 keeps 8
/// steps from blue (lower) through a light neutral to orange (higher) — a pair that deuteranopes
/// and protanopes tell apart — and each row below keeps half the steps, nearer the neutral.
Rgb divergingColour(int level, int step);
int divergingStepOf(double signedScaled, int level);

/// Whether text on this colour should be dark (light cells) or light.
bool darkTextOn(Rgb c);

} // namespace pitchloop::model::palette
