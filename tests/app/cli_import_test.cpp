// `pitchloop profile check` and `pitchloop ingest --profile` on small tables written here: what
// the check prints, the exit codes, and that a bad table stores nothing.

#include "clirun.h"
#include "commands.h"
#include "testutil.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <string>

namespace fs = std::filesystem;
using pitchloop::testutil::cli;
using pitchloop::testutil::contains;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

struct Workspace {
    fs::path dir = freshTempDir("cli-import");
    std::string db = (dir / "club.sqlite").string();
    std::string profile = sourcePath("sample-club/import/analyst-sheet.json").string();
    ~Workspace() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
    std::string write(const std::string& name, const std::string& text) const {
        const fs::path p = dir / name;
        std::ofstream(p, std::ios::binary) << text;
        return p.string();
    }
};

// The analyst-sheet layout (sample-club/import/analyst-sheet.json): match details in the file
// name, positions 0–100 from the top-left corner, the clock from kick-off.
const char* kHeader = "Half;Clock;Team;Shirt;Action;Outcome;PosX;PosY;EndX;EndY;Labels\n";
std::string sheet(const std::string& rows) { return kHeader + rows; }
const char* kRows =
    "1st half;00:01,0;Kestrel Bay;9;Pass;Complete;50;50;60;40;kick_off\n"
    "1st half;00:04,0;Kestrel Bay;8;Pass;Incomplete;60;40;70;30;\n"
    "1st half;00:05,0;Nettleby Town;5;Ball won;Complete;32;72;;;\n"
    "1st half;00:06,0;Nettleby Town;5;Substitution;;;;;;\n"
    "2nd half;46:00,0;Kestrel Bay;10;Shot;Saved;88;45;;;\n";

} // namespace

TEST_CASE("profile check prints what it understood and stores nothing", "[cli][import]") {
    Workspace w;
    const std::string file = w.write("KB-T-01_2026-08-08_home_Nettleby Town.csv", sheet(kRows));
    const auto r = cli({"--db", w.db, "profile", "check", w.profile, file, "--period-lengths", "2800,2900"});
    INFO(r.out << r.err);
    CHECK(r.code == 0);
    CHECK(contains(r.out, "match KB-T-01  2026-08-08  Kestrel Bay v Nettleby Town (home)"));
    CHECK(contains(r.out, "4 events, 1 rows skipped"));
    CHECK(contains(r.out, "us pass"));
    CHECK(contains(r.err, "reads cleanly; nothing was stored"));
    CHECK_FALSE(fs::exists(w.db)); // the check never opens a club file
}

TEST_CASE("ingest --profile loads a table, refuses a bad one and says where", "[cli][import]") {
    Workspace w;
    const std::string good = w.write("KB-T-01_2026-08-08_home_Nettleby Town.csv", sheet(kRows));
    const std::string bad = w.write("KB-T-02_2026-08-15_away_Duneford City.csv",
                                    sheet(std::string(kRows) +
                                          "2nd half;47:10,0;Kestrel Bay;7;Header;Complete;50;50;;;\n"));
    REQUIRE(cli({"--db", w.db, "ingest", "--profile", w.profile, good}).code == 0);
    const std::string before = dataSnapshot(w.db);
    const auto r = cli({"--db", w.db, "ingest", "--profile", w.profile, bad});
    CHECK(r.code == 2);
    CHECK(contains(r.err, bad + ": line 7.Action: 'Header' is not mapped (1 time; lines 7)"));
    CHECK(contains(r.err, "not ingested; the club file is unchanged by it"));
    CHECK(dataSnapshot(w.db) == before);
    const auto matches = cli({"--db", w.db, "matches", "--format", "csv"});
    CHECK(contains(matches.out, "KB-T-01,2026-08-08,League,home,Nettleby Town"));
    // A profile with a typo is refused before any file is read.
    const std::string typo = w.write("typo.json", R"({"format": "pitchloop-profile", "version": 1,
        "colums": {}})");
    const auto t = cli({"--db", w.db, "ingest", "--profile", typo, good});
    CHECK(t.code == 2);
    CHECK(contains(t.err, "typo.json: colums: unknown key"));
}

TEST_CASE("a saved profile reads tables in its layout without --profile", "[cli][import]") {
    Workspace w;
    CHECK(cli({"--db", w.db, "profile", "save", "analyst sheet", w.profile, "--by", "R. Tamsin"}).code == 0);
    const auto list = cli({"--db", w.db, "profile", "list"});
    CHECK(contains(list.out, "analyst sheet\tanalyst sheet (semicolons"));
    const std::string file = w.write("KB-T-01_2026-08-08_home_Nettleby Town.csv", sheet(kRows));
    const auto r = cli({"--db", w.db, "ingest", file});
    INFO(r.err);
    CHECK(r.code == 0);
    CHECK(contains(r.err, "read with the saved profile 'analyst sheet'"));
    CHECK(contains(r.err, "added: KB-T-01 (4 events)"));
    // By name too.
    const std::string second = w.write("KB-T-02_2026-08-15_away_Duneford City.csv", sheet(kRows));
    CHECK(cli({"--db", w.db, "ingest", "--profile", "analyst sheet", second}).code == 0);
    // A table no saved profile reads is refused as a match file would be.
    const std::string stranger = w.write("other.csv", "a,b\n1,2\n");
    CHECK(cli({"--db", w.db, "ingest", stranger}).code == 2);
    CHECK(cli({"--db", w.db, "profile", "remove", "analyst sheet"}).code == 0);
    CHECK(cli({"--db", w.db, "profile", "remove", "analyst sheet"}).code == 2);
}

TEST_CASE("zone labels load with the shipped zone-tags layout; other grids say what they cannot know",
          "[cli][import][zones]") {
    Workspace w;
    const std::string profile = sourcePath("sample-club/import/zone-tags.json").string();
    // sample-club/import/zone-tags.json: labels B{band}-L{lane} on equal:6x5, acting frame.
    const std::string header = "Half,Secs,Side,No,Event,Outcome,Zone,ToZone,Notes\n";
    const std::string rows = "1,2.0,ours,9,pass,ok,B3-L3,B4-L2,kick_off\n"
                             "1,5.5,ours,8,pass,lost,B4-L2,,\n"
                             "1,6.0,theirs,4,interception,ok,B3-L4,,\n"
                             "2,30.0,ours,10,shot,stopped,B6-L3,,\n";
    const std::string file = w.write("tags.csv", header + rows);
    auto ingest = [&](const std::string& table, const std::string& id) {
        return cli({"--db", w.db, "ingest", "--profile", profile, table, "--match-id", id, "--date",
                    "2026-08-22", "--venue", "away", "--opponent", "Duneford City",
                    "--period-lengths", "2700,2760"});
    };
    // Without the match details: the model names what is missing, the command line how to give it.
    const auto bare = cli({"profile", "check", profile, file});
    CHECK(bare.code == 2);
    CHECK(contains(bare.err, "match.id: not given"));
    CHECK(contains(bare.err, "hint: --date, --match-id, --opponent, --venue give it on the command line"));
    const auto check = cli({"profile", "check", profile, file, "--match-id", "KB-Z-02", "--date",
                            "2026-08-22", "--venue", "away", "--opponent", "Duneford City"});
    CHECK(check.code == 0);
    // B3-L3 on 105 × 68 m: band 3 35–52.5 m (centre 43.75), lane 3 27.2–40.8 m (34).
    CHECK(contains(check.out, "frame acting, zone-only on equal:6x5 (each event at its zone's centre)"));
    CHECK(contains(check.out, "\"x\":43.75,\"y\":34.0"));
    const auto r = ingest(file, "KB-Z-02");
    INFO(r.out << r.err);
    REQUIRE(r.code == 0);
    const auto listed = cli({"--db", w.db, "matches"});
    CHECK(contains(listed.out, "zone-only: positions known only to grid equal:6x5"));
    // Our pass from B3-L3 completes: pass_completion 1/1 in band 3 lane 3, and the lost one
    // from B4-L2 is 0/1 there.
    const auto own = cli({"--db", w.db, "tallies", "--format", "csv", "--metric", "pass_completion"});
    CHECK(contains(own.out, "KB-Z-02,pass_completion,3,3,1,1"));
    CHECK(contains(own.out, "KB-Z-02,pass_completion,4,2,0,1"));
    CHECK(own.err.empty());
    const auto finer = cli({"--db", w.db, "tallies", "--format", "csv", "--grid", "equal:12x5"});
    CHECK(finer.code == 0);
    CHECK_FALSE(contains(finer.out, "KB-Z-02"));
    CHECK(contains(finer.err, "note: match KB-Z-02: positions known only to grid equal:6x5; zone "
                              "values not computed on grid equal:12x5 (no rows for it)"));
    const auto preview = cli({"--db", w.db, "settings", "grid", "equal:8x5", "--preview"});
    CHECK(contains(preview.out, "Match KB-Z-02: positions known only to grid equal:6x5; zone values "
                                "not computed on grid equal:8x5."));
    const auto tables = cli({"--db", w.db, "debrief", "KB-Z-02", "--tables", "--grid", "equal:8x5"});
    CHECK(contains(tables.out, "Zone-only match: positions known only to grid equal:6x5; zone values "
                               "not computed on grid equal:8x5.\n"));
    CHECK(cli({"--db", w.db, "settings", "grid", "equal:8x5", "--by", "R. Tamsin"}).code == 0);
    const auto debrief = cli({"--db", w.db, "debrief", "KB-Z-02"});
    CHECK(contains(debrief.out, "Zone-only match: positions known only to grid equal:6x5; zone "
                                "values not computed on grid equal:8x5; it adds nothing"));
    CHECK(cli({"--db", w.db, "settings", "grid", "equal:6x5", "--by", "R. Tamsin"}).code == 0);
    // A label the layout does not read: the file, line and column, and nothing stored.
    const std::string bad = w.write("bad.csv", header + rows + "2,40.0,ours,7,pass,ok,Z9,,\n");
    const std::string before = dataSnapshot(w.db);
    const auto refused = ingest(bad, "KB-Z-03");
    CHECK(refused.code == 2);
    CHECK(contains(refused.err, bad + ": line 6.Zone: 'Z9' is not mapped (1 time; lines 6)"));
    CHECK(dataSnapshot(w.db) == before);
}
