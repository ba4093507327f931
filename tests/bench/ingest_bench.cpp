// Ingest benchmark: one match end to end (parse, derive, tally, commit) and a 380-match
// season into a real club file, with peak memory. Run on demand:
//   build/tests/bench/pitchloop_bench_ingest sample-club/matches [runs]
// Match files are cloned under new ids so every ingest does the full work.
#include "benchtime.h"
#include "ingest.h"
#include "repository.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <filesystem>
#include <iostream>
#include <sys/resource.h>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using namespace pitchloop::bench;

namespace {

std::string withId(const nlohmann::json& match, const std::string& id) {
    nlohmann::json copy = match;
    copy["match"]["id"] = id;
    return copy.dump();
}

nlohmann::json load(const fs::path& p) { return nlohmann::json::parse(readFileBytes(p)); }

long peakRssMiB() {
    rusage r{};
    getrusage(RUSAGE_SELF, &r);
    return r.ru_maxrss / 1024;
}

} // namespace

int main(int argc, char** argv) {
    if (argc < 2) {
        std::cerr << "usage: " << argv[0] << " MATCH_DIR [runs]\n";
        return 2;
    }
    const int runs = argc > 2 ? std::atoi(argv[2]) : 50;
    // Only paths are held, so the peak memory reported is the ingest's, not the benchmark's.
    std::vector<fs::path> matches;
    std::vector<std::size_t> eventCounts;
    for (const auto& entry : fs::directory_iterator(argv[1]))
        if (entry.path().extension() == ".json") {
            matches.push_back(entry.path());
            eventCounts.push_back(load(entry.path())["events"].size());
        }
    if (matches.empty()) {
        std::cerr << "no match files in " << argv[1] << "\n";
        return 2;
    }
    // The largest match stands for "one 2,000-event match".
    const auto big = static_cast<std::size_t>(
        std::max_element(eventCounts.begin(), eventCounts.end()) - eventCounts.begin());
    const nlohmann::json biggestMatch = load(matches[big]);
    const nlohmann::json* biggest = &biggestMatch;
    const auto dir = fs::temp_directory_path() / "pitchloop-bench";
    fs::remove_all(dir);
    fs::create_directories(dir);

    {
        ClubRepository repo((dir / "one.sqlite").string());
        std::vector<double> times;
        std::size_t bytes = 0;
        for (int i = 0; i < runs; ++i) {
            const std::string text = withId(*biggest, "BENCH-" + std::to_string(i));
            bytes = text.size();
            const auto start = Clock::now();
            const auto report = ingestBytes(repo, text, "bench.json");
            times.push_back(ms(Clock::now() - start));
            if (report.status != IngestStatus::Added) {
                std::cerr << "ingest failed: " << describeAll(report.errors);
                return 1;
            }
        }
        std::printf("one match: %zu events, %.0f KB JSON, %d runs: median %.2f ms, min %.2f ms, "
                    "max %.2f ms\n",
                    (*biggest)["events"].size(), bytes / 1024.0, runs, median(times),
                    *std::min_element(times.begin(), times.end()),
                    *std::max_element(times.begin(), times.end()));
        // The parts: reading the file alone, and deriving facts plus all tallies alone.
        const std::string text = withId(*biggest, "PARTS");
        std::vector<double> parse, tally;
        const auto specs = builtinMetrics();
        for (int i = 0; i < runs; ++i) {
            auto start = Clock::now();
            const ReadResult read = parseMatch(text, "bench.json");
            parse.push_back(ms(Clock::now() - start));
            start = Clock::now();
            const MatchFacts facts(*read.match);
            for (const auto& spec : specs) (void)computeTally(facts, spec, ZoneGrid{});
            tally.push_back(ms(Clock::now() - start));
        }
        std::printf("  of which: reading and validating the JSON %.2f ms, deriving and tallying "
                    "7 metrics %.2f ms (medians)\n",
                    median(parse), median(tally));
    }
    {
        // A league season: 20 teams play 380 matches; we clone our files round-robin. Texts
        // are made one at a time (not held together) so peak memory is the ingest's own.
        ClubRepository repo((dir / "season.sqlite").string());
        std::size_t events = 0;
        Clock::duration total{};
        for (int i = 0; i < 380; ++i) {
            const auto pick = static_cast<std::size_t>(i) % matches.size();
            const std::string text = withId(load(matches[pick]), "SEASON-" + std::to_string(i));
            events += eventCounts[pick];
            const auto start = Clock::now();
            const auto report = ingestBytes(repo, text, "season.json");
            total += Clock::now() - start;
            if (report.status != IngestStatus::Added) {
                std::cerr << "ingest failed: " << describeAll(report.errors);
                return 1;
            }
        }
        std::printf("season: 380 matches, %zu events: %.2f s (%.1f ms per match)\n", events,
                    ms(total) / 1000, ms(total) / 380);
    }
    std::printf("peak memory (max RSS): %ld MiB\n", peakRssMiB());
    fs::remove_all(dir);
    return 0;
}
