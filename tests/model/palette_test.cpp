// The value-suppressing uncertainty palette (model/palette.h): colour conversions, the
// colour-vision simulation of Machado, Oliveira & Fernandes (2009), and that every row's
// neighbouring steps stay apart for normal vision and under simulated deuteranopia and
// protanopia. The matrices and the distances are checked again from outside against
// python3-colorspacious (tests/python/palette_check.py).

#include "palette.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace pitchloop::model::palette;

TEST_CASE("sRGB to CIE L*a*b* and back", "[palette]") {
    // White is L* 100 with no colour; sRGB red is about L* 53.24, a* 80.09, b* 67.20 (the usual
    // published figure for D65; from memory, and checked against colorspacious' "CIELab").
    const Lab white = toLab(fromHex("#ffffff"));
    CHECK(white.l == Approx(100).margin(1e-3));
    CHECK(white.a == Approx(0).margin(1e-3));
    CHECK(white.b == Approx(0).margin(1e-3));
    const Lab red = toLab(fromHex("#ff0000"));
    CHECK(red.l == Approx(53.24).margin(0.01));
    CHECK(red.a == Approx(80.09).margin(0.01));
    CHECK(red.b == Approx(67.20).margin(0.01));
    for (const auto& hex : scaleStops()) CHECK(toHex(fromLab(toLab(fromHex(hex)))) == hex);
}

TEST_CASE("colour-vision simulation keeps greys grey and merges red with green", "[palette]") {
    // Each row of the matrices sums to 1, so a grey stays itself.
    for (const Vision v : {Vision::Deuteranopia, Vision::Protanopia}) {
        const Rgb g = simulate(fromHex("#808080"), v);
        CHECK(toHex(g) == "#808080");
        // Red and green, far apart for normal vision, come close for a dichromat.
        const double normal = deltaE(toLab(fromHex("#d62728")), toLab(fromHex("#2ca02c")));
        const double seen = deltaE(toLab(simulate(fromHex("#d62728"), v)), toLab(simulate(fromHex("#2ca02c"), v)));
        CHECK(seen < 0.6 * normal);
    }
}

TEST_CASE("rows of the palette: fewer steps and nearer the neutral as values get less certain", "[palette]") {
    CHECK(stepsAt(0) == 8);
    CHECK(stepsAt(3) == 1);
    CHECK(levelOf(0.1) == 0);
    CHECK(levelOf(0.3) == 1);
    CHECK(levelOf(0.5) == 2);
    CHECK(levelOf(1.5) == 3);
    CHECK(levelOf(std::nan("")) == 3);
    CHECK(stepOf(1.0, 0) == 7);
    CHECK(stepOf(0.49, 1) == 1);
    CHECK(toHex(colour(3, 0)) == toHex(neutral()));
    // Each row sits nearer the neutral than the row above it.
    const Lab grey = toLab(neutral());
    for (int level = 1; level < kLevels; ++level) {
        double before = 0, now = 0;
        for (int s = 0; s < stepsAt(level); ++s) {
            now += deltaE(toLab(colour(level, s)), grey) / stepsAt(level);
        }
        for (int s = 0; s < stepsAt(level - 1); ++s) before += deltaE(toLab(colour(level - 1, s)), grey) / stepsAt(level - 1);
        CHECK(now < before);
    }
}

TEST_CASE("neighbouring steps stay apart for normal, deuteranope and protanope eyes", "[palette]") {
    // The smallest CIE76 distance between neighbouring steps of a row, per vision (today: row 0
    // 20.2 normal, 9.7 deuteranope, 12.6 protanope; rows 1 and 2 at least 15.8). 8 units of
    // ΔE*ab is well past a just-noticeable difference (about 2.3) for patches the size of a
    // zone: common practice, no published source for the exact figure.
    for (int level = 0; level < kLevels - 1; ++level) {
        for (const int v : {-1, 0, 1}) {
            double least = 1e9;
            for (int s = 0; s + 1 < stepsAt(level); ++s) {
                Rgb a = colour(level, s), b = colour(level, s + 1);
                if (v >= 0) {
                    a = simulate(a, static_cast<Vision>(v));
                    b = simulate(b, static_cast<Vision>(v));
                }
                least = std::min(least, deltaE(toLab(a), toLab(b)));
            }
            INFO("row " << level << ", vision " << v << ": least ΔE " << least);
            CHECK(least >= 8);
        }
    }
}

TEST_CASE("the difference maps' diverging rows stay apart for every eye too", "[palette]") {
    // Row 0's neighbouring steps (blue … neutral … orange) for normal, deuteranope and protanope
    // eyes; the two middle steps sit either side of no difference.
    for (const int v : {-1, 0, 1}) {
        double least = 1e9;
        for (int s = 0; s + 1 < stepsAt(0); ++s) {
            Rgb a = divergingColour(0, s), b = divergingColour(0, s + 1);
            if (v >= 0) {
                a = simulate(a, static_cast<Vision>(v));
                b = simulate(b, static_cast<Vision>(v));
            }
            least = std::min(least, deltaE(toLab(a), toLab(b)));
        }
        INFO("vision " << v << ": least ΔE " << least);
        CHECK(least >= 8);
    }
    CHECK(divergingStepOf(-1, 0) == 0);
    CHECK(divergingStepOf(1, 0) == 7);
    CHECK(divergingStepOf(0.01, 0) == 4);
    CHECK(toHex(divergingColour(3, 0)) == toHex(neutral()));
}
