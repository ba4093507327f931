// The drill book on the command line, run in-process through pitchloop::cli::run on temp club
// files: add by flags and by file, edit, show, search, history, delete/restore, unknown ids,
// bad input, import/export round trips. "Now" is fixed with $PITCHLOOP_TODAY (12:00 UTC of
// that day). Every drill here is invented.

#include "clirun.h"
#include "commands.h"
#include "matchreader.h"
#include "testutil.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <optional>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <vector>

namespace fs = std::filesystem;
using pitchloop::testutil::cli;
using pitchloop::testutil::CliRun;
using pitchloop::testutil::contains;
using nlohmann::json;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

std::vector<std::string> lines(const std::string& text) {
    std::vector<std::string> out;
    std::istringstream in(text);
    for (std::string line; std::getline(in, line);)
        out.push_back(line);
    return out;
}

/// Sets $PITCHLOOP_TODAY for the life of the object, then puts back what was there.
struct Today {
    std::optional<std::string> before;
    explicit Today(const std::string& date) {
        if (const char* v = std::getenv("PITCHLOOP_TODAY")) before = v;
        ::setenv("PITCHLOOP_TODAY", date.c_str(), 1);
    }
    ~Today() {
        if (before)
            ::setenv("PITCHLOOP_TODAY", before->c_str(), 1);
        else
            ::unsetenv("PITCHLOOP_TODAY");
    }
};

/// A temp folder with a club file path (not yet created) and room for extra files.
struct Workspace {
    fs::path dir = freshTempDir("cli-drills");
    std::string db = (dir / "club.sqlite").string();
    ~Workspace() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
    std::string write(const std::string& name, const std::string& text) const {
        const fs::path p = dir / name;
        std::ofstream(p, std::ios::binary) << text;
        return p.string();
    }
    /// Runs `drills ARGS...` on this club file.
    CliRun drills(std::vector<std::string> args) const {
        args.insert(args.begin(), {"--db", db, "drills"});
        return cli(std::move(args));
    }
};

std::string sampleDrills() {
    return sourcePath("sample-club/drills.json").string();
}

/// The left-back drill by flags; prints its id.
const std::vector<std::string> kLeftBackFlags = {"add",
                                                 "--title",
                                                 "Left-back zone: 2v1 becomes 2v2",
                                                 "--purpose",
                                                 "Stop overloads wide of our box",
                                                 "--organisation",
                                                 "Channel 35 × 25 m along our left touchline",
                                                 "--point",
                                                 "Stay goal-side",
                                                 "--point",
                                                 "Winger tracks the overlap",
                                                 "--minutes",
                                                 "18",
                                                 "--intensity",
                                                 "4",
                                                 "--players",
                                                 "8-14",
                                                 "--area",
                                                 "40x30",
                                                 "--equipment",
                                                 "cones",
                                                 "--equipment",
                                                 "full-size goal",
                                                 "--metric",
                                                 "pre_shot_passes_against",
                                                 "--metric",
                                                 "press_rate",
                                                 "--zone",
                                                 "2,5",
                                                 "--zone",
                                                 "1,5",
                                                 "--tag",
                                                 "defending",
                                                 "--tag",
                                                 "full_back",
                                                 "--author",
                                                 "D. Arkwright"};

const std::vector<std::string> kCounterPressFlags = {
    "add",       "--title",  "Counter-press 6v6", "--minutes", "16",     "--intensity", "5",
    "--players", "12",       "--metric",          "regain_5s", "--zone", "4,3",         "--tag",
    "pressing",  "--author", "L. Farrant"};

const std::vector<std::string> kCoolDownFlags = {
    "add",       "--title", "Cool-down jog", "--point",  "Chatting pace",
    "--minutes", "10",      "--intensity",   "1",        "--players",
    "1-40",      "--tag",   "cool_down",     "--author", "S. Ibekwe"};

/// Ids in the first column of a `--format csv` listing.
std::vector<std::string> csvIds(const std::string& csv) {
    std::vector<std::string> out;
    const auto rows = lines(csv);
    for (std::size_t i = 1; i < rows.size(); ++i)
        out.push_back(rows[i].substr(0, rows[i].find(',')));
    return out;
}

} // namespace

TEST_CASE("drills add by flags, then show and list it", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    const auto added = w.drills(kLeftBackFlags);
    INFO(added.err);
    REQUIRE(added.code == 0);
    CHECK(added.out == "1\n");
    CHECK(contains(added.err, "added drill 1: Left-back zone: 2v1 becomes 2v2"));

    const auto show = w.drills({"show", "1"});
    REQUIRE(show.code == 0);
    CHECK(lines(show.out) ==
          std::vector<std::string>{
              "Drill 1: Left-back zone: 2v1 becomes 2v2",
              "purpose:         Stop overloads wide of our box",
              "organisation:", "  Channel 35 × 25 m along our left touchline",
              "coaching points:", "  1. Stay goal-side", "  2. Winger tracks the overlap",
              "duration:        18 min", "intensity:       4 (high)", "players:         8–14",
              "area:            40 × 30 m", "equipment:       cones, full-size goal",
              "metrics:         pre_shot_passes_against, press_rate",
              "zones:           our left-back area (B2·L5), left wing by our goal line (B1·L5)",
              "tags:            defending, full_back", "author:          D. Arkwright",
              "created:         2026-07-20T12:00:00Z",
              "last edited:     2026-07-20T12:00:00Z by D. Arkwright", "versions:        1"});

    const auto csv = w.drills({"list", "--format", "csv"});
    CHECK(lines(csv.out) ==
          std::vector<std::string>{
              "id,title,duration_min,intensity,players_min,players_max,area_length_m,"
              "area_width_m,metrics,zones,tags,author,edited_at,versions,deleted",
              "1,Left-back zone: 2v1 becomes 2v2,18,4,8,14,40,30,"
              "pre_shot_passes_against;press_rate,\"2,5;1,5\",defending;full_back,"
              "D. Arkwright,2026-07-20T12:00:00Z,1,0"});
    const auto table = lines(w.drills({"list"}).out);
    REQUIRE(table.size() == 2);
    CHECK(contains(table[1], "   1  Left-back zone: 2v1 becomes 2v2"));
    CHECK(contains(table[1], "18  4 high"));
    CHECK(contains(table[1], "8–14"));
    CHECK(contains(table[1], "pre_shot_passes_against, press_rate"));
}

TEST_CASE("drills add from a file, and refusals that store nothing", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    const json drill = {{"title", "Rondo 5v2 ⚽ Überzahl 中文"},
                        {"coaching_points", {"Körper offen", "两脚触球"}},
                        {"duration_min", 10},
                        {"intensity", 3},
                        {"players", {{"min", 7}, {"max", 14}}},
                        {"area_m", {{"length", 12}, {"width", 12}}},
                        {"metrics", {"pass_completion", "press_rate"}},
                        {"tags", {"warm_up"}},
                        {"author", "Søren Ó Briain"}};
    const auto added = w.drills({"add", "--file", w.write("rondo.json", drill.dump())});
    INFO(added.err);
    REQUIRE(added.code == 0);
    CHECK(added.out == "1\n");
    const json shown = json::parse(w.drills({"show", "1", "--format", "json"}).out);
    CHECK(shown["title"] == "Rondo 5v2 ⚽ Überzahl 中文");
    CHECK(shown["coaching_points"] == drill["coaching_points"]);
    CHECK(shown["players"] == drill["players"]);
    CHECK(shown["edited_by"] == "Søren Ó Briain");
    CHECK(shown["versions"] == 1);
    CHECK(shown["deleted"] == false);

    const std::string before = dataSnapshot(w.db);
    SECTION("a bad file names file and field") {
        json bad = drill;
        bad["intensity"] = 7;
        const std::string file = w.write("bad.json", bad.dump());
        const auto r = w.drills({"add", "--file", file});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "error: " + file + ": intensity: expected 1–5, found 7"));
        CHECK(contains(r.err, file + ": no drill added"));
    }
    SECTION("a file that is missing") {
        const auto r = w.drills({"add", "--file", (w.dir / "nowhere.json").string()});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "nowhere.json: cannot be read"));
    }
    SECTION("--file and field flags do not mix") {
        const auto r = w.drills({"add", "--file", w.write("x.json", drill.dump()), "--title", "X"});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
    }
    SECTION("flags with bad values are named by flag") {
        auto flags = kCounterPressFlags;
        for (auto [flag, value] : {std::pair{"--intensity", "7"}, std::pair{"--players", "14-8"},
                                   std::pair{"--zone", "7,1"}}) {
            const auto at = std::find(flags.begin(), flags.end(), flag);
            REQUIRE(at != flags.end());
            *(at + 1) = value;
        }
        const auto r = w.drills(flags);
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(lines(r.err) ==
              std::vector<std::string>{"error: --intensity: expected 1–5, found 7",
                                       "error: --players: min 14 is more than max 8",
                                       "error: --zone: band 7 lane 1 is outside the equal:6x5 grid "
                                       "(bands 1–6, lanes 1–5)"});
    }
    SECTION("flags that cannot be read") {
        auto flags = kCounterPressFlags;
        flags.insert(flags.end(), {"--area", "forty by thirty"});
        const auto r = w.drills(flags);
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "error: --area forty by thirty: expected LENGTHxWIDTH"));
    }
    SECTION("required flags") {
        const auto r = w.drills({"add", "--title", "Half a drill", "--author", "L. Farrant"});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "drills add needs --minutes, --intensity, --players"));
    }
    CHECK(dataSnapshot(w.db) == before);
}

TEST_CASE("drills edit changes only the given fields and keeps the history", "[cli]") {
    Workspace w;
    {
        Today today("2026-07-20");
        REQUIRE(w.drills(kLeftBackFlags).code == 0);
    }
    Today today("2026-07-22");
    const auto edited = w.drills(
        {"edit", "1", "--intensity", "3", "--point", "Show outside", "--author", "L. Farrant"});
    INFO(edited.err);
    REQUIRE(edited.code == 0);
    CHECK(contains(edited.err, "drill 1: version 2 saved"));

    const json shown = json::parse(w.drills({"show", "1", "--format", "json"}).out);
    CHECK(shown["intensity"] == 3);
    CHECK(shown["coaching_points"] == json{"Show outside"});
    CHECK(shown["title"] == "Left-back zone: 2v1 becomes 2v2"); // not given: unchanged
    CHECK(shown["zones"] == json{{2, 5}, {1, 5}});
    CHECK(shown["author"] == "D. Arkwright"); // the drill's author stays
    CHECK(shown["edited_by"] == "L. Farrant");
    CHECK(shown["created_at"] == "2026-07-20T12:00:00Z");
    CHECK(shown["edited_at"] == "2026-07-22T12:00:00Z");
    CHECK(shown["versions"] == 2);

    // --clear empties a field; a file gives the fields to change.
    REQUIRE(w.drills({"edit", "1", "--clear", "zones", "--author", "L. Farrant"}).code == 0);
    const std::string patch = w.write("patch.json", R"({"duration_min": 25, "tags": ["shape"]})");
    REQUIRE(w.drills({"edit", "1", "--file", patch, "--author", "D. Arkwright"}).code == 0);
    const json after = json::parse(w.drills({"show", "1", "--format", "json"}).out);
    CHECK(after["zones"] == json::array());
    CHECK(after["duration_min"] == 25);
    CHECK(after["tags"] == json{"shape"});
    CHECK(after["intensity"] == 3);

    const auto history = w.drills({"history", "1"});
    REQUIRE(history.code == 0);
    CHECK(lines(history.out) ==
          std::vector<std::string>{
              "Drill 1: Left-back zone: 2v1 becomes 2v2 — every version, oldest first",
              "v1  2026-07-20T12:00:00Z  D. Arkwright                  first version",
              "v2  2026-07-22T12:00:00Z  L. Farrant                    changed: "
              "coaching_points, intensity",
              "v3  2026-07-22T12:00:00Z  L. Farrant                    changed: zones",
              "v4  2026-07-22T12:00:00Z  D. Arkwright                  changed: duration_min, "
              "tags"});
    const json versions = json::parse(w.drills({"history", "1", "--format", "json"}).out);
    REQUIRE(versions.size() == 4);
    CHECK(versions[0]["drill"]["intensity"] == 4);
    CHECK(versions[1]["drill"]["intensity"] == 3);

    const std::string before = dataSnapshot(w.db);
    SECTION("an edit needs --author") {
        CHECK(w.drills({"edit", "1", "--intensity", "2"}).code == pitchloop::cli::kExitBadInput);
    }
    SECTION("a repeatable flag takes one value each time") {
        const auto r = w.drills({"edit", "1", "--tag", "shape", "stray", "--author", "L. Farrant"});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
    }
    SECTION("an edit needs something to change") {
        const auto r = w.drills({"edit", "1", "--author", "L. Farrant"});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "nothing to change"));
    }
    SECTION("an edit to what is already there adds no version") {
        const auto r = w.drills({"edit", "1", "--minutes", "25", "--author", "L. Farrant"});
        CHECK(r.code == 0);
        CHECK(contains(r.err, "drill 1 unchanged"));
    }
    SECTION("an invalid edit stores nothing") {
        const auto r = w.drills({"edit", "1", "--minutes", "200", "--author", "L. Farrant"});
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "error: --minutes: expected 1–180, found 200"));
        const std::string bad = w.write("bad-patch.json", R"({"metrics": ["nope"]})");
        const auto f = w.drills({"edit", "1", "--file", bad, "--author", "L. Farrant"});
        CHECK(f.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(f.err, "error: " + bad + ": metrics[0]: unknown metric 'nope'"));
    }
    CHECK(dataSnapshot(w.db) == before);
}

TEST_CASE("drills search filters by text, tag, metric and zone", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    for (const auto& flags : {kLeftBackFlags, kCounterPressFlags, kCoolDownFlags})
        REQUIRE(w.drills(flags).code == 0);
    using Ids = std::vector<std::string>;
    auto search = [&](std::vector<std::string> args) {
        args.insert(args.begin(), "search");
        args.insert(args.end(), {"--format", "csv"});
        const auto r = w.drills(args);
        INFO(r.err);
        CHECK(r.code == 0);
        return csvIds(r.out);
    };
    CHECK(search({}) == Ids{"1", "2", "3"});
    CHECK(search({"WINGER", "overlap"}) == Ids{"1"}); // coaching point, words in any order
    CHECK(search({"chatting"}) == Ids{"3"});
    CHECK(search({"cool down"}) == Ids{"3"}); // title, and the tag cool_down
    CHECK(search({"--tag", "pressing"}) == Ids{"2"});
    CHECK(search({"--metric", "press_rate"}) == Ids{"1"});
    CHECK(search({"--zone", "4,3"}) == Ids{"2"});
    CHECK(search({"--zone", "2,5", "--metric", "pre_shot_passes_against"}) == Ids{"1"});
    CHECK(search({"--zone", "2,5", "--metric", "regain_5s"}).empty());
    CHECK(search({"zone", "--tag", "defending"}) == Ids{"1"});

    const json found = json::parse(w.drills({"search", "counter", "--format", "json"}).out);
    REQUIRE(found.size() == 1);
    CHECK(found[0]["id"] == 2);
    CHECK(found[0]["metrics"] == json{"regain_5s"});
    CHECK(contains(w.drills({"search", "nothing-like-this"}).out, "(no drill matches)"));

    const auto badMetric = w.drills({"search", "--metric", "made_up"});
    CHECK(badMetric.code == pitchloop::cli::kExitBadInput);
    CHECK(contains(badMetric.err, "no metric 'made_up'"));
    const auto badZone = w.drills({"search", "--zone", "9,9"});
    CHECK(badZone.code == pitchloop::cli::kExitBadInput);
    CHECK(contains(badZone.err, "--zone 9,9: expected BAND,LANE within the equal:6x5 grid"));
}

TEST_CASE("drills delete hides a drill and restore brings it back", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    REQUIRE(w.drills(kLeftBackFlags).code == 0);
    REQUIRE(w.drills(kCounterPressFlags).code == 0);

    const auto deleted = w.drills({"delete", "1"});
    REQUIRE(deleted.code == 0);
    CHECK(contains(deleted.err, "deleted drill 1 (undo: pitchloop drills restore 1)"));
    CHECK(csvIds(w.drills({"list", "--format", "csv"}).out) == std::vector<std::string>{"2"});
    CHECK(csvIds(w.drills({"search", "--zone", "2,5", "--format", "csv"}).out).empty());
    const auto all = w.drills({"list", "--include-deleted"});
    CHECK(contains(all.out, "[deleted] Left-back zone"));
    CHECK(contains(w.drills({"show", "1"}).out, "status:          deleted"));
    CHECK(w.drills({"export"}).out.find("Left-back zone") == std::string::npos);

    const auto again = w.drills({"delete", "1"});
    CHECK(again.code == pitchloop::cli::kExitBadInput);
    CHECK(contains(again.err, "error: drill 1 is already deleted (since 2026-07-20T12:00:00Z)"));
    const auto edit = w.drills({"edit", "1", "--minutes", "5", "--author", "L. Farrant"});
    CHECK(edit.code == pitchloop::cli::kExitBadInput);
    CHECK(contains(edit.err, "error: drill 1 is deleted; restore it first"));

    const auto restored = w.drills({"restore", "1"});
    REQUIRE(restored.code == 0);
    CHECK(contains(restored.err, "restored drill 1"));
    CHECK(csvIds(w.drills({"list", "--format", "csv"}).out) == std::vector<std::string>{"1", "2"});
    CHECK(w.drills({"restore", "1"}).code == pitchloop::cli::kExitBadInput);
}

TEST_CASE("an unknown drill id exits 2 with 'no drill N'", "[cli]") {
    Workspace w;
    REQUIRE(w.drills(kCoolDownFlags).code == 0);
    const std::string before = dataSnapshot(w.db);
    for (std::vector<std::string> args :
         {std::vector<std::string>{"show", "17"},
          {"history", "17"},
          {"delete", "17"},
          {"restore", "17"},
          {"edit", "17", "--minutes", "5", "--author", "L. Farrant"}}) {
        const auto r = w.drills(args);
        INFO(args[0]);
        CHECK(r.code == pitchloop::cli::kExitBadInput);
        CHECK(contains(r.err, "error: no drill 17"));
        CHECK(r.out.empty());
    }
    CHECK(w.drills({"show", "seventeen"}).code == pitchloop::cli::kExitBadInput);
    CHECK(dataSnapshot(w.db) == before);
}

TEST_CASE("drills import and export round-trip into a fresh club file", "[cli]") {
    Today today("2026-07-20");
    Workspace a;
    const std::string sample = pitchloop::model::readFileBytes(sampleDrills());
    const auto count = json::parse(sample)["drills"].size();

    const auto first = a.drills({"import", sampleDrills()});
    INFO(first.err);
    REQUIRE(first.code == 0);
    CHECK(contains(first.err, "imported " + std::to_string(count) + " drills (0 already there)"));
    const std::string before = dataSnapshot(a.db);
    const auto second = a.drills({"import", sampleDrills()});
    CHECK(second.code == 0);
    CHECK(contains(second.err, "imported 0 drills (" + std::to_string(count) + " already there)"));
    CHECK(dataSnapshot(a.db) == before);

    // The demo file is in the form export writes, so the export is the same bytes.
    CHECK(a.drills({"export"}).out == sample);

    // A drill with text in several scripts joins, then everything moves to a new club file.
    REQUIRE(
        a.drills({"add", "--title", "Überzahl ⚽ 中文 练习", "--minutes", "12", "--intensity", "2",
                  "--players", "6-10", "--point", "Körper offen 👀", "--author", "Søren Ó Briain"})
            .code == 0);
    const std::string exported = a.drills({"export"}).out;
    Workspace b;
    const auto moved = b.drills({"import", b.write("moved.json", exported)});
    REQUIRE(moved.code == 0);
    CHECK(contains(moved.err, "imported " + std::to_string(count + 1) + " drills"));
    CHECK(b.drills({"export"}).out == exported);
    CHECK(contains(b.drills({"search", "Überzahl"}).out, "Überzahl ⚽ 中文 练习"));
}

TEST_CASE("a drills file with an error imports nothing", "[cli]") {
    Workspace w;
    REQUIRE(w.drills(kCoolDownFlags).code == 0);
    const std::string before = dataSnapshot(w.db);
    json file = json::parse(pitchloop::model::readFileBytes(sampleDrills()));
    file["drills"][3]["intensity"] = 7;
    const std::string path = w.write("drills.json", file.dump(2));
    const auto r = w.drills({"import", path});
    CHECK(r.code == pitchloop::cli::kExitBadInput);
    CHECK(lines(r.err) == std::vector<std::string>{
                              "error: " + path + ": drills[3].intensity: expected 1–5, found 7",
                              path + ": no drill imported"});
    CHECK(dataSnapshot(w.db) == before);
}

TEST_CASE("the installed binary runs the drills verbs", "[cli]") {
    const std::string binary = PITCHLOOP_CLI;
    REQUIRE(fs::exists(binary));
    Workspace w;
    const auto run = [&](const std::string& args) {
        const std::string command =
            "'" + binary + "' --db '" + w.db + "' drills " + args + " >/dev/null 2>&1";
        const int status = std::system(command.c_str());
        REQUIRE(WIFEXITED(status));
        return WEXITSTATUS(status);
    };
    CHECK(run("import '" + sampleDrills() + "'") == 0);
    CHECK(run("show 1") == 0);
    CHECK(run("show 999") == 2);
}
