// Prints the zone maps' palette as JSON for tests/python/palette_check.py: every row and step
// with its colour, the colour as simulated for deuteranopes and protanopes, and CIE L*a*b* of
// the scale's stops, all from model/palette.h.

#include "palette.h"

#include <nlohmann/json.hpp>

#include <iostream>

int main() {
    using namespace pitchloop::model::palette;
    nlohmann::json out;
    for (int level = 0; level < 2 * kLevels; ++level) {
        // The sequential rows, then the difference maps' diverging rows.
        const bool diverging = level >= kLevels;
        const int row_level = level % kLevels;
        nlohmann::json row = nlohmann::json::array();
        for (int s = 0; s < stepsAt(row_level); ++s) {
            const Rgb c = diverging ? divergingColour(row_level, s) : colour(row_level, s);
            auto triple = [](Rgb x) { return nlohmann::json::array({x.r, x.g, x.b}); };
            row.push_back({{"hex", toHex(c)},
                           {"rgb", triple(c)},
                           {"deuteranopia", triple(simulate(c, Vision::Deuteranopia))},
                           {"protanopia", triple(simulate(c, Vision::Protanopia))}});
        }
        out[diverging ? "diverging_rows" : "rows"].push_back(row);
    }
    for (const auto& hex : scaleStops()) {
        const Lab lab = toLab(fromHex(hex));
        out["stops"].push_back({{"hex", hex}, {"lab", {lab.l, lab.a, lab.b}}});
    }
    std::cout << out.dump(1) << "\n";
}
