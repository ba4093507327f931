#include "match_writer.h"
#include "season.h"
#include "simulator.h"

#include <CLI/CLI.hpp>
#include <algorithm>
#include <chrono>
#include <cstdint>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

namespace {

bool writeFile(const std::filesystem::path& path, const std::string& text) {
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out.write(text.data(), static_cast<std::streamsize>(text.size()));
    return static_cast<bool>(out);
}

/// Weekday of an ISO date, 0 = Sunday … 6 = Saturday.
unsigned weekdayOf(const std::string& iso) {
    using namespace std::chrono;
    const year_month_day ymd{year{std::stoi(iso.substr(0, 4))},
                             month{static_cast<unsigned>(std::stoi(iso.substr(5, 2)))},
                             day{static_cast<unsigned>(std::stoi(iso.substr(8, 2)))}};
    return weekday{sys_days{ymd}}.c_encoding();
}

/// The whole season's schedule in the fixtures CSV shape of docs/planner.md: Saturday matches
/// kick off at 15:00, the midweek ones at 19:45.
std::string fixturesCsv(const pitchloop::demo::Season& season) {
    std::string out = "date,kickoff,opponent,venue,competition\r\n";
    for (const auto& fx : season.fixtures)
        out += fx.date + ',' + (weekdayOf(fx.date) == 6 ? "15:00" : "19:45") + ',' +
               season.opponents[static_cast<std::size_t>(fx.opponent)].name + ',' +
               (fx.home ? "home" : "away") + ",League\r\n";
    return out;
}

} // namespace

int main(int argc, char** argv) {
    namespace demo = pitchloop::demo;

    CLI::App app{"Simulates the Kestrel Bay demo season and writes one match file per fixture.",
                 "pitchloop-demo-season"};
    std::uint64_t seed = 2026;
    std::string outDir;
    int matches = demo::kSeasonMatches;
    app.add_option("--seed", seed, "Seed; the same seed always gives the same bytes")
        ->capture_default_str();
    app.add_option("--out", outDir, "Directory for KB-2026-NN.json files")->required();
    std::string fixturesFile;
    app.add_option("--fixtures", fixturesFile,
                   "Also write the season's schedule as a fixtures CSV (docs/planner.md)");
    app.add_option("--matches", matches, "How many fixtures to play, from the first")
        ->check(CLI::Range(1, demo::kSeasonMatches))
        ->capture_default_str();
    CLI11_PARSE(app, argc, argv);

    std::error_code ec;
    std::filesystem::create_directories(outDir, ec);
    if (ec) {
        std::fprintf(stderr, "cannot create %s: %s\n", outDir.c_str(), ec.message().c_str());
        return 1;
    }

    const demo::Season season = demo::buildSeason(seed);
    if (!fixturesFile.empty() && !writeFile(fixturesFile, fixturesCsv(season))) {
        std::fprintf(stderr, "cannot write %s\n", fixturesFile.c_str());
        return 1;
    }
    std::array<int, 3> wdl{};
    int minEvents = 1 << 30;
    int maxEvents = 0;
    for (int n = 1; n <= matches; ++n) {
        const demo::Fixture& fx = season.fixtures[static_cast<std::size_t>(n - 1)];
        const demo::MatchRecord record = demo::simulateMatch(season, fx, seed);
        const std::filesystem::path path = std::filesystem::path(outDir) / (fx.id + ".json");
        if (!writeFile(path, demo::renderMatchFile(record, season.club.name))) {
            std::fprintf(stderr, "cannot write %s\n", path.string().c_str());
            return 1;
        }
        const demo::MatchSummary s = demo::summarize(record);
        const int us = record.score[0];
        const int them = record.score[1];
        ++wdl[us > them ? 0 : (us == them ? 1 : 2)];
        minEvents = std::min(minEvents, s.events);
        maxEvents = std::max(maxEvents, s.events);
        std::fprintf(stderr,
                     "%s %s %-4s %-21s %d-%d  events %4d  passes %3d/%3d (%2d%%/%2d%%)  shots "
                     "%2d/%2d\n",
                     fx.id.c_str(), fx.date.c_str(), fx.home ? "home" : "away",
                     record.opponentName.c_str(), us, them, s.events, s.passes[0], s.passes[1],
                     100 * s.passesOk[0] / std::max(1, s.passes[0]),
                     100 * s.passesOk[1] / std::max(1, s.passes[1]), s.shots[0], s.shots[1]);
    }
    std::fprintf(stderr, "%d matches, events %d..%d, Kestrel Bay W%d D%d L%d\n", matches, minEvents,
                 maxEvents, wdl[0], wdl[1], wdl[2]);
    return 0;
}
