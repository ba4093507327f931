// The pooled zone map's study (docs/statistics.md, "Pooled maps"): on simulated maps with known
// zone truths, the mean squared error of the raw ratios and of the pooled values, and how often
// the pooled 90 % intervals hold the truth, by chances a match, the spread of true zone values
// and the match-to-match SD. Run on demand:
//   cmake --build build --target pitchloop_pooling_study && build/tests/bench/pitchloop_pooling_study

#include "pooling_sim.h"

#include <cstdio>

int main(int argc, char** argv) {
    using namespace pitchloop::testutil::pooling;
    const int maps = argc > 1 ? std::atoi(argv[1]) : 1000;
    std::printf("%d maps of 30 zones a cell, window of 5 matches, 90%% intervals\n", maps);
    std::printf("%8s %12s %9s %12s %12s %10s %9s\n", "chances", "zone spread", "match SD", "MSE raw", "MSE pooled",
                "ratio", "coverage");
    std::uint64_t seed = 1;
    for (const double chances : {4.0, 8.0, 15.0, 40.0})
        for (const double spread : {0.03, 0.05, 0.08})
            for (const double sd : {0.0, 0.08}) {
                Setup s;
                s.meanChances = chances;
                s.zoneSpread = spread;
                s.matchSd = sd;
                const Score r = simulate(s, maps, seed++);
                std::printf("%8.0f %12.2f %9.2f %12.5f %12.5f %10.2f %8.1f%%\n", chances, spread, sd, r.mseRaw(),
                            r.msePooled(), r.msePooled() / r.mseRaw(), 100 * r.coverage());
            }
}
