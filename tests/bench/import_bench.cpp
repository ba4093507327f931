// Mapped import benchmark (docs/performance.md): a demo match written as a table of the
// analyst-sheet layout (sample-club/import/analyst-sheet.json), then timed: decode + cut +
// map + the match reader's checks, against the reader alone on the native file; and a full
// ingest of each into a real club file. Run on demand:
//   build/tests/bench/pitchloop_bench_import sample-club [runs]
#include "benchtime.h"
#include "importprofile.h"
#include "ingest.h"
#include "matchreader.h"
#include "repository.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <iostream>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using namespace pitchloop::bench;

namespace {

std::string comma(double v) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.4f", v);
    std::string s = buf;
    std::replace(s.begin(), s.end(), '.', ',');
    return s;
}

/// The native match (acting frame) as the analyst sheet, rows repeated until `rows` are written
/// (each copy a little later in the period so times stay in order).
std::string analystSheet(const nlohmann::json& match, std::size_t rows) {
    static const std::map<std::string, std::string> types{
        {"pass", "Pass"}, {"carry", "Run with ball"}, {"take_on", "Dribble attempt"}, {"shot", "Shot"},
        {"recovery", "Ball won"}, {"interception", "Intercept"}, {"tackle", "Tackle"}, {"keeper", "GK"},
        {"clearance", "Clear"}, {"block", "Block"}, {"foul", "Foul"}, {"out", "Out of play"}};
    static const std::map<std::string, std::string> results{
        {"ok", "Complete"}, {"fail", "Incomplete"}, {"goal", "Goal"}, {"saved", "Saved"},
        {"blocked", "Blocked"}, {"off", "Wide"}, {"post", "Woodwork"}};
    const auto& m = match["match"];
    std::string out = "Half;Clock;Team;Shirt;Action;Outcome;PosX;PosY;EndX;EndY;Labels\n";
    const auto& events = match["events"];
    for (std::size_t i = 0; i < rows; ++i) {
        const auto& e = events[i % events.size()];
        const int period = e["period"].get<int>();
        const double t = e["t"].get<double>() + (period == 2 ? 2700 : 0);
        char clock[32];
        std::snprintf(clock, sizeof clock, "%02d:%04.1f", static_cast<int>(t / 60), std::fmod(t, 60.0));
        std::string c = clock;
        std::replace(c.begin(), c.end(), '.', ',');
        out += std::string(period == 1 ? "1st half" : "2nd half") + ";" + c + ";" +
               (e["side"] == "us" ? m["us"] : m["opponent"]).get<std::string>() + ";" +
               e.value("player", "") + ";" + types.at(e["type"]) + ";" +
               (e.contains("result") ? results.at(e["result"]) : "") + ";" +
               comma(100 * e["x"].get<double>() / 105) + ";" + comma(100 * (1 - e["y"].get<double>() / 68)) + ";" +
               (e.contains("to_x") ? comma(100 * e["to_x"].get<double>() / 105) + ";" +
                                         comma(100 * (1 - e["to_y"].get<double>() / 68))
                                   : std::string(";")) +
               ";\n";
    }
    return out;
}

} // namespace

int main(int argc, char** argv) {
    if (argc < 2) {
        std::cerr << "usage: " << argv[0] << " SAMPLE_CLUB_DIR [runs]\n";
        return 2;
    }
    const fs::path club = argv[1];
    const int runs = argc > 2 ? std::atoi(argv[2]) : 30;
    const std::string nativeText = readFileBytes(club / "matches" / "KB-2026-01.json");
    const auto native = nlohmann::json::parse(nativeText);
    const auto profile = readProfileFile((club / "import" / "analyst-sheet.json").string());
    if (!profile.profile) {
        std::cerr << describeAll(profile.errors) << "\n";
        return 1;
    }
    MatchDetails details;
    details.values = {{"id", "KB-BENCH"}, {"date", "2026-08-08"}, {"venue", "home"},
                      {"opponent", "Nettleby Town"}, {"period_lengths", "2863,2851"}};
    const std::size_t events = native["events"].size();

    // 2,500 rows: map and validate.
    const std::string big = analystSheet(native, 2500);
    std::vector<double> mapTimes;
    for (int r = 0; r < runs; ++r) {
        const auto t0 = Clock::now();
        const MappedTable mapped = mapFile(big, *profile.profile, details, "bench.csv");
        const ReadResult read = parseMatchDocument(mapped.match, "bench.csv");
        mapTimes.push_back(ms(Clock::now() - t0));
        if (!mapped.errors.empty() || !read.ok()) {
            std::cerr << describeAll(mapped.errors) << describeAll(read.errors) << "\n";
            return 1;
        }
    }
    std::printf("2,500-row table (%zu bytes): decode, cut, map and the reader's checks: median %.2f ms (%d runs)\n",
                big.size(), median(mapTimes), runs);

    // One match, per event: the table against the native file, reading and full ingest.
    const std::string table = analystSheet(native, events);
    std::vector<double> nativeRead, tableRead;
    for (int r = 0; r < runs; ++r) {
        auto t0 = Clock::now();
        const ReadResult a = parseMatch(nativeText, "native.json");
        nativeRead.push_back(ms(Clock::now() - t0));
        t0 = Clock::now();
        const MappedTable mapped = mapFile(table, *profile.profile, details, "one.csv");
        const ReadResult b = parseMatchDocument(mapped.match, "one.csv");
        tableRead.push_back(ms(Clock::now() - t0));
        if (!a.ok() || !b.ok()) return 1;
    }
    std::printf("one match, %zu events: native read %.2f ms (%.2f µs an event), table read %.2f ms (%.2f µs an event)\n",
                events, median(nativeRead), 1000 * median(nativeRead) / events, median(tableRead),
                1000 * median(tableRead) / events);

    const fs::path dir = fs::temp_directory_path() / "pitchloop-bench-import";
    fs::remove_all(dir);
    fs::create_directories(dir);
    const fs::path csv = dir / "KB-BENCH.csv";
    std::ofstream(csv, std::ios::binary) << table;
    std::vector<double> nativeIngest, tableIngest;
    for (int r = 0; r < std::min(runs, 10); ++r) {
        {
            ClubRepository repo((dir / ("n" + std::to_string(r) + ".sqlite")).string());
            const auto t0 = Clock::now();
            if (!ingestBytes(repo, nativeText, "native.json").ok()) return 1;
            nativeIngest.push_back(ms(Clock::now() - t0));
        }
        {
            ClubRepository repo((dir / ("t" + std::to_string(r) + ".sqlite")).string());
            const auto t0 = Clock::now();
            if (!ingestTableFile(repo, csv, *profile.profile, details).at(0).ok()) return 1;
            tableIngest.push_back(ms(Clock::now() - t0));
        }
    }
    std::printf("full ingest into a club file: native %.1f ms, table %.1f ms (median of %zu)\n",
                median(nativeIngest), median(tableIngest), nativeIngest.size());
    fs::remove_all(dir);
    return 0;
}
