#pragma once
// The sheets' colours: greys for text and rules, and the Okabe–Ito palette (Okabe & Ito 2008,
// "Color Universal Design"), which stays distinct under the common colour-vision deficiencies.
// Meaning never rests on colour alone: every coloured mark also has a shape or a label.

#include <QColor>
#include <array>
#include <cstddef>

namespace pitchloop::print::colours {

inline const QColor kInk{0x1A, 0x1A, 0x1A};
inline const QColor kMuted{0x5A, 0x5A, 0x5A};
inline const QColor kRule{0xC4, 0xC4, 0xC4};
inline const QColor kPanel{0xF1, 0xF1, 0xF1};

inline const QColor kOrange{0xE6, 0x9F, 0x00};
inline const QColor kVermillion{0xD5, 0x5E, 0x00};
inline const QColor kBlue{0x00, 0x72, 0xB2};
inline const QColor kGreen{0x00, 0x9E, 0x73};
inline const QColor kPurple{0xCC, 0x79, 0xA7};
inline const QColor kSky{0x56, 0xB4, 0xE9};

inline const QColor kAlert = kVermillion;

/// The colour of the i-th focus on a session sheet (labels F1, F2, ... carry the meaning).
inline QColor focusColour(std::size_t i) {
    const std::array<QColor, 6> cycle{kBlue, kOrange, kGreen, kPurple, kSky, kVermillion};
    return cycle[i % cycle.size()];
}

/// The hatch direction of the i-th focus, so overlapping zones stay apart without colour.
inline double focusHatchAngle(std::size_t i) {
    constexpr std::array<double, 6> angles{45, -45, 0, 90, 22.5, -67.5};
    return angles[i % angles.size()];
}

} // namespace pitchloop::print::colours
