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
