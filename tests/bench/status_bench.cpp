// Status benchmark: every built-in metric × every zone and the whole pitch, in four windows,
// with targets and flags, at one match of a 1,000-match club file. Run on demand:
//   build/tests/bench/pitchloop_bench_status sample-club/matches sample-club/targets.json [runs]
// The club file is built once (1,000 demo matches cloned over 30 seasons) and reused.
#include "benchtime.h"
#include "ingest.h"
#include "repository.h"
#include "status.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <filesystem>
#include <iostream>
#include <map>
#include <set>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using namespace pitchloop::bench;

namespace {

/// The same date `years` later (the demo season's dates avoid 29 February).
std::string shiftYears(const std::string& date, int years) {
    return std::to_string(std::stoi(date.substr(0, 4)) + years) + date.substr(4);
}

} // namespace

int main(int argc, char** argv) {
    if (argc < 3) {
        std::cerr << "usage: " << argv[0] << " MATCH_DIR TARGETS.json [runs]\n";
        return 2;
    }
    const int runs = argc > 3 ? std::atoi(argv[3]) : 50;
    std::vector<fs::path> files;
    for (const auto& entry : fs::directory_iterator(argv[1]))
        if (entry.path().extension() == ".json") files.push_back(entry.path());
    std::sort(files.begin(), files.end());
    if (files.empty()) return 2;

    const fs::path club = fs::temp_directory_path() / "pitchloop-bench-1000.sqlite";
    constexpr int kMatches = 1000;
    const int seasons = (kMatches + static_cast<int>(files.size()) - 1) / static_cast<int>(files.size());
    int lastSeasonMatches = 0;
    {
        ClubRepository repo(club.string());
        if (repo.matches().size() != kMatches) {
            std::cerr << "building " << club << " (" << kMatches << " matches)...\n";
            for (int i = 0; i < kMatches; ++i) {
                const int season = i / static_cast<int>(files.size());
                auto doc = nlohmann::json::parse(
                    readFileBytes(files[static_cast<std::size_t>(i) % files.size()]));
                doc["match"]["id"] = "B" + std::to_string(i);
                doc["match"]["date"] = shiftYears(doc["match"]["date"], season - seasons + 1);
                const auto report = ingestBytes(repo, doc.dump(), "bench.json");
                if (!report.ok()) {
                    std::cerr << describeAll(report.errors);
                    return 1;
                }
            }
        }
        // Every season gets the demo club's targets, so the file holds a realistic history.
        const auto demo = nlohmann::json::parse(readFileBytes(argv[2]));
        nlohmann::json targets = demo;
        targets["targets"] = nlohmann::json::array();
        std::set<std::string> seasonNames;
        for (const auto& m : repo.matches()) seasonNames.insert(m.season);
        for (const auto& seasonName : seasonNames)
            for (auto t : demo["targets"]) {
                t["season"] = seasonName;
                t["effective_from"] = seasonName.substr(0, 4) + "-07-01";
                targets["targets"].push_back(t);
            }
        const ZoneGrid grid = repo.tallyGrid();
        auto parsed = parseTargetFile(targets.dump(), "targets", repo.metrics(), grid.bands(),
                                      grid.lanes());
        repo.addTargets(newVersionsOnly(repo.allTargets(), parsed.targets), "2000-01-01T00:00:00Z");
    }

    ClubRepository repo(club.string());
    // The last match of the latest full season.
    MatchSummary last;
    {
        std::map<std::string, int> perSeason;
        const auto all = repo.matches();
        for (const auto& m : all) ++perSeason[m.season];
        for (const auto& m : all)
            if (perSeason[m.season] == static_cast<int>(files.size())) last = m;
        lastSeasonMatches = perSeason[last.season];
    }
    const FlagSettings settings = repo.flagSettings();
    const std::vector<Window> windows{{Window::Kind::Match, 1, 0.3}, settings.window,
                                      {Window::Kind::Season, 0, 0.3}, {Window::Kind::Ewma, 0, 0.3}};
    std::vector<double> times, loads;
    std::size_t rows = 0;
    for (int i = 0; i < runs; ++i) {
        const auto start = Clock::now();
        const auto where = repo.seasonOfMatch(last.id);
        const SeasonTallies season = repo.seasonTallies(where->first, where->second);
        const auto targets = repo.targets(where->first, where->second);
        const auto metrics = repo.metrics();
        const ZoneGrid grid = repo.tallyGrid();
        loads.push_back(ms(Clock::now() - start));
        const auto statuses = computeStatus(season, season.matchIds.size() - 1, metrics, targets,
                                            grid, windows, settings);
        times.push_back(ms(Clock::now() - start));
        rows = statuses.size();
    }
    std::printf("  of which loading the season's tallies and targets: median %.2f ms\n",
                median(loads));
    std::printf("status at the last match of a %zu-match club file (season of %d matches, "
                "%zu zone rows incl. targets and flags): median %.2f ms, min %.2f, max %.2f "
                "(%d runs)\n",
                repo.matches().size(), lastSeasonMatches, rows, median(times),
                *std::min_element(times.begin(), times.end()),
                *std::max_element(times.begin(), times.end()), runs);
    return 0;
}
