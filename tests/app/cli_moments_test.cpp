// `moments` and `export clips` on the command line: the demo's off-target zone leads to its
// moments, and bad requests are named and write nothing. That the moments add up to the
// tallies for every metric and zone is checked from outside (tests/python/clips_check.py).

#include "clirun.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>

namespace fs = std::filesystem;

using pitchloop::testutil::cli;
using pitchloop::testutil::contains;
using pitchloop::testutil::demoClub;
using pitchloop::testutil::dataSnapshot;

namespace {

/// The demo's matches 1–8.
struct DemoMatches {
    std::string db = demoClub("moments-cli", 8);
    fs::path dir = fs::path(db).parent_path();
};

} // namespace

TEST_CASE("moments: the slipped zone of the demo's match 8 leads to its moments", "[cli][moments]") {
    const DemoMatches demo;
    // The debrief of match 8 flags their passes before their shots in our left-back area
    // (11 in the match, 34 over the last five: 6.8 a match).
    auto r = cli({"--db", demo.db, "moments", "KB-2026-08", "--metric", "pre_shot_passes_against",
                  "--zone", "2,5"});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(contains(r.out, "Their passes before their shots · our left-back area (B2·L5) · this match"));
    CHECK(contains(r.out, "11 moments; the number from them: 11 / 1 match = 11"));
    CHECK(contains(r.out, "KB-2026-08   2nd 28:00 (73:00)"));
    r = cli({"--db", demo.db, "moments", "KB-2026-08", "--metric", "pre_shot_passes_against",
             "--zone", "2,5", "--window", "last5", "--format", "json"});
    REQUIRE(r.code == 0);
    const auto j = nlohmann::json::parse(r.out);
    CHECK(j["num"] == 34);
    CHECK(j["den"] == 5);
    CHECK(j["matches"].size() == 5);
    CHECK(j["moments"].size() == 34);
    CHECK(j["moments"][0]["match_id"] == "KB-2026-04");
}

TEST_CASE("moments and clips: bad requests are named and write nothing", "[cli][moments]") {
    const DemoMatches demo;
    const std::string before = dataSnapshot(demo.db);
    const std::string out = (demo.dir / "clips.vtt").string();
    struct Case {
        std::vector<std::string> args;
        std::string message;
    };
    const std::vector<Case> cases{
        {{"moments", "KB-2099-01", "--metric", "regain_5s"}, "no match 'KB-2099-01' in the club file"},
        {{"moments", "KB-2026-08", "--metric", "regain_6s"}, "no metric 'regain_6s'"},
        {{"moments", "KB-2026-08", "--metric", "regain_5s", "--zone", "7,1"},
         "zone 7,1 is not on the club's grid (6 bands × 5 lanes)"},
        {{"moments", "KB-2026-08", "--metric", "regain_5s", "--zone", "left"}, "--zone 'left'"},
        {{"moments", "KB-2026-08", "--metric", "regain_5s", "--window", "ewma0.3"},
         "a weighted window counts every match"},
        {{"export", "clips", "KB-2026-08", "--metric", "regain_5s", "--window", "last5", "-o", out},
         "a clip list describes one match's video"},
        {{"export", "clips", "KB-2026-08", "--metric", "regain_5s", "--period-start", "2=47.30x",
          "-o", out},
         "--period-start '2=47.30x': expected PERIOD=[hh:]mm:ss"},
        {{"export", "clips", "KB-2026-08", "--metric", "regain_5s", "--period-start", "0=1:00",
          "-o", out},
         "--period-start '0=1:00'"},
    };
    for (const auto& c : cases) {
        std::vector<std::string> args{"--db", demo.db};
        args.insert(args.end(), c.args.begin(), c.args.end());
        const auto r = cli(args);
        INFO(c.message << "\n" << r.err);
        CHECK(r.code == 2);
        CHECK(contains(r.err, c.message));
    }
    CHECK_FALSE(fs::exists(out));
    CHECK(dataSnapshot(demo.db) == before);
}

TEST_CASE("export clips writes a WebVTT chapter file", "[cli][moments]") {
    const DemoMatches demo;
    const std::string out = (demo.dir / "clips.vtt").string();
    const auto r = cli({"--db", demo.db, "export", "clips", "KB-2026-08", "--metric",
                        "pre_shot_passes_against", "--zone", "2,5", "--lead-in", "10", "-o", out});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(contains(r.err, "of 11 moments to"));
    REQUIRE(fs::exists(out));
    CHECK(fs::file_size(out) > 200);
}

TEST_CASE("review --moments writes the baseline's and the after matches' moments side by side", "[cli][moments]") {
    const std::string db = demoClub("review-moments-cli", 16);
    const fs::path dir = fs::path(db).parent_path();
    REQUIRE(cli({"--db", db, "focus", "open", "--match", "KB-2026-08", "--metric", "pre_shot_passes_against",
                 "--zone", "2,5", "--by", "T. Test"}).code == 0);
    const std::string file = (dir / "review-moments.csv").string();
    const auto r = cli({"--db", db, "review", "1", "--format", "json", "--moments", file});
    INFO(r.err);
    REQUIRE(r.code == 0);
    const auto j = nlohmann::json::parse(r.out);
    std::ifstream in(file, std::ios::binary);
    std::string line;
    long before = 0, after = 0, rows = 0;
    while (std::getline(in, line)) {
        if (rows++ == 0) {
            CHECK(line.rfind("side,match_id,", 0) == 0);
            continue;
        }
        before += line.rfind("before,", 0) == 0;
        after += line.rfind("after,", 0) == 0;
    }
    // A per-match count: one row per pass behind the number, so the rows add up to the review's
    // own numerators.
    CHECK(before == j["before"]["num"].get<long>());
    CHECK(after == j["after"]["num"].get<long>());
    CHECK(before + after == rows - 1);
}

TEST_CASE("squad: a list imported, listed, edited; moments name our players and pick a unit", "[cli][moments][squad]") {
    const std::string db = demoClub("squad-cli", 8);
    // A bad file changes nothing and names the line and the column.
    const fs::path bad = fs::path(db).parent_path() / "bad.csv";
    {
        std::ofstream f(bad);
        f << "number,name,position\n3,N. Colterham,LB\n4,J. Weyland,XB\n";
    }
    auto r = cli({"--db", db, "squad", "import", bad.string()});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "bad.csv: line 3.position: 'XB' is not a position the list knows"));
    r = cli({"--db", db, "squad", "list"});
    CHECK(r.out.empty());
    // The demo's list.
    REQUIRE(cli({"--db", db, "squad", "import", pitchloop::testutil::sourcePath("sample-club/squad.csv").string()}).code == 0);
    r = cli({"--db", db, "squad", "list"});
    CHECK(contains(r.out, "6    DM   L. Farrant\n"));
    REQUIRE(cli({"--db", db, "squad", "add", "24", "--name", "T. Newcome", "--position", "cm"}).code == 0);
    CHECK(contains(cli({"--db", db, "squad", "list"}).out, "24   CM   T. Newcome"));
    r = cli({"--db", db, "squad", "add", "25", "--name", "X", "--position", "sweeper"});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "--position: 'SWEEPER' is not a position the list knows"));
    REQUIRE(cli({"--db", db, "squad", "remove", "24"}).code == 0);
    CHECK(cli({"--db", db, "squad", "remove", "24"}).code == 2);

    r = cli({"--db", db, "moments", "KB-2026-08", "--metric", "regain_5s", "--zone", "4,3", "--unit", "midfield"});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(contains(r.out, "6 moments; the number from them: 1 / 6 = 16.7%"));
    CHECK(contains(r.out, "of them involve our midfield"));
    CHECK(contains(r.out, "6 L. Farrant's pass"));
    r = cli({"--db", db, "moments", "KB-2026-08", "--metric", "regain_5s", "--zone", "4,3", "--unit", "wingers"});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "--unit 'wingers'"));
}

TEST_CASE("export clips remembers where the match's periods start in its video", "[cli][moments]") {
    const std::string db = demoClub("clips-clock-cli", 8);
    const std::vector<std::string> base{"--db", db, "export", "clips", "KB-2026-08", "--metric",
                                        "pre_shot_passes_against", "--zone", "2,5", "--format", "csv", "-o", "-"};
    const auto plain = cli(base);
    REQUIRE(plain.code == 0);
    auto with = base;
    with.insert(with.end(), {"--period-start", "2=47:30"});
    const auto first = cli(with);
    REQUIRE(first.code == 0);
    CHECK(first.out != plain.out); // the 2nd half's clips move
    // Given once, remembered: the same clips without the option.
    CHECK(cli(base).out == first.out);
}
