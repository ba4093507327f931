// Zone grid change benchmark: moves a copy of a club file between two grids and back, timing
// each change (every match's tallies counted again, targets carried, one transaction) and the
// preview the settings page shows on every choice. Run on demand:
//   build/tests/bench/pitchloop_bench_grid CLUB.sqlite [runs]
// The club file itself is never touched: the benchmark works on a copy in the temp folder.
#include "benchtime.h"
#include "gridchange.h"
#include "repository.h"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <filesystem>
#include <iostream>
#include <vector>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using namespace pitchloop::bench;

namespace {

double quantile(std::vector<double> v, double q) {
    std::sort(v.begin(), v.end());
    return v[static_cast<std::size_t>(q * static_cast<double>(v.size() - 1) + 0.5)];
}

} // namespace

int main(int argc, char** argv) {
    if (argc < 2) {
        std::cerr << "usage: " << argv[0] << " CLUB.sqlite [runs]\n";
        return 2;
    }
    const int runs = argc > 2 ? std::max(1, std::atoi(argv[2])) : 10;
    const fs::path copy = fs::temp_directory_path() / "pitchloop-bench-grid.sqlite";
    {
        ClubRepository source(argv[1]);
        source.backupTo(copy.string());
    }
    ClubRepository repo(copy.string());
    const ZoneGrid home = repo.tallyGrid();
    const ZoneGrid away = home == ZoneGrid::markings(6) ? ZoneGrid{} : ZoneGrid::markings(6);
    std::vector<double> change, preview;
    int carried = 0;
    for (int i = 0; i < runs; ++i) {
        auto t0 = Clock::now();
        const auto p = previewGridChange(repo, away);
        preview.push_back(ms(Clock::now() - t0));
        t0 = Clock::now();
        const int n = repo.changeGrid(away, "bench", "2026-12-02T00:00:00Z");
        if (i == 0) carried = n; // later moves find the targets carried the first time
        change.push_back(ms(Clock::now() - t0));
        t0 = Clock::now();
        repo.changeGrid(home, "bench", "2026-12-02T00:00:00Z");
        change.push_back(ms(Clock::now() - t0));
        (void)p;
    }
    std::printf("club file: %s (%zu matches, %zu metrics), %s <-> %s\n", argv[1],
                repo.matches().size(), repo.metrics().size(), home.name().c_str(),
                away.name().c_str());
    std::printf("grid change (recount + carry, one transaction), %zu changes: median %.1f ms, "
                "p95 %.1f ms, max %.1f ms; %d target versions carried on the first move\n",
                change.size(), quantile(change, 0.5), quantile(change, 0.95),
                *std::max_element(change.begin(), change.end()), carried);
    std::printf("preview, %zu runs: median %.2f ms, max %.2f ms\n", preview.size(),
                quantile(preview, 0.5), *std::max_element(preview.begin(), preview.end()));
    fs::remove(copy);
    return 0;
}
