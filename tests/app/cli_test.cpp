// The command line, run in-process through pitchloop::cli::run, plus two runs of the real
// binary for its exit codes. The base match is tests/data/minimal-match.json (KB-TEST-01).

#include "clirun.h"
#include "commands.h"
#include "matchreader.h"
#include "testutil.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <vector>

namespace fs = std::filesystem;
using pitchloop::testutil::cli;
using pitchloop::testutil::CliRun;
using pitchloop::testutil::contains;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

std::string minimalPath() {
    return sourcePath("tests/data/minimal-match.json").string();
}
std::string badPath(const std::string& name) {
    return sourcePath("tests/data/bad/" + name).string();
}

/// A temp folder with a club file path (not yet created) and room for extra files.
struct Workspace {
    fs::path dir = freshTempDir("cli");
    std::string db = (dir / "club.sqlite").string();
    ~Workspace() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }

    /// Writes `text` to a file in the workspace and returns its path.
    std::string write(const std::string& name, const std::string& text) const {
        const fs::path p = dir / name;
        std::ofstream(p, std::ios::binary) << text;
        return p.string();
    }

    /// minimal-match.json under another id and date: KB-TEST-02, a week later.
    std::string secondMatch() const {
        std::string text = pitchloop::model::readFileBytes(minimalPath());
        for (auto [from, to] : {std::pair<std::string, std::string>{"KB-TEST-01", "KB-TEST-02"},
                                {"2026-07-18", "2026-07-25"}}) {
            const auto at = text.find(from);
            REQUIRE(at != std::string::npos);
            text.replace(at, from.size(), to);
        }
        return write("second.json", text);
    }
};

std::vector<std::string> lines(const std::string& text) {
    std::vector<std::string> out;
    std::istringstream in(text);
    for (std::string line; std::getline(in, line);) {
        if (!line.empty() && line.back() == '\r') line.pop_back(); // CSV records end in CRLF
        out.push_back(line);
    }
    return out;
}

/// One line per zone of the default 6 × 5 grid, num 1 in `ones`, 0 elsewhere, den 1.
std::vector<std::string> countRows(const std::string& match, const std::string& metric,
                                   const std::vector<std::pair<int, int>>& ones) {
    std::vector<std::string> out;
    for (int band = 1; band <= 6; ++band)
        for (int lane = 1; lane <= 5; ++lane) {
            const bool one =
                std::find(ones.begin(), ones.end(), std::pair{band, lane}) != ones.end();
            out.push_back(match + "," + metric + "," + std::to_string(band) + "," +
                          std::to_string(lane) + "," + (one ? "1" : "0") + ",1");
        }
    return out;
}

/// The CSV tallies of minimal-match.json, worked out by hand.
///
/// Events in our frame (their events mirrored: x' = 105 − x, y' = 68 − y; y = 68.9 clamped
/// to 68). Default grid on 105 × 68: band edges 0, 17.5, 35, 52.5, 70, 87.5, 105; lane edges
/// 0, 13.6, 27.2, 40.8, 54.4, 68; a point on an edge goes to the higher zone.
///
///   [0]  P1  3.0 us  pass ok    (35, 34)   zone (3, 3)
///   [1]  P1  5.2 us  carry ok   (50, 20) → (62, 15.5)
///   [2]  P1  8.9 us  pass fail  (62, 15.5) zone (4, 2)
///   [3]  P1  9.6 opp interception ok (80, 30)   takes the ball: our loss 1
///   [4]  P1 11.0 opp pass ok    (80, 30)   zone (5, 3)
///   [5]  P1 13.5 us  tackle ok  (65, 8)    zone (4, 1)   takes it back
///   [6]  P1 15.0 us  pass ok    (65, 8)    zone (4, 1)
///   [7]  P1 17.3 us  pass ok    (78, 4)    zone (5, 1)
///   [8]  P1 18.9 us  shot saved
///   [9]  P1 20.1 opp keeper fail (no control)
///   [10] P1 21.0 opp out
///   [11] P1 52.0 us  pass ok    (105, 0)   zone (6, 1)
///   [12] P1 53.6 opp clearance ok (no control)
///   [13] P2 40.0 us  pass ok    (30, 68)   zone (2, 5)
///   [14] P2 42.5 us  pass fail  (40, 60)   zone (3, 5)
///   [15] P2 44.0 opp recovery ok           takes the ball: our loss 2
///   [16] P2 49.7 opp shot off
///
/// Our losses are placed where we last had the ball: loss 1 at [2] (62, 15.5) → (4, 2),
/// t = 9.6; loss 2 at [14] (40, 60) → (3, 5), t = 44.0.
std::vector<std::string> expectedMinimalRows() {
    const std::string m = "KB-TEST-01";
    std::vector<std::string> rows;
    // regain_5s: loss 1 is won back by our tackle [5] 3.9 s later (≤ 5 s): 1/1 at (4, 2).
    // Loss 2: nothing of ours by 49.0 s and 2746 s of the period left (not censored): 0/1.
    rows.push_back(m + ",regain_5s,3,5,0,1");
    rows.push_back(m + ",regain_5s,4,2,1,1");
    // shot_after_loss: after loss 1 no shot of theirs up to 24.6 s: 0/1 at (4, 2); after
    // loss 2 their shot [16] comes 5.7 s later: 1/1 at (3, 5).
    rows.push_back(m + ",shot_after_loss,3,5,1,1");
    rows.push_back(m + ",shot_after_loss,4,2,0,1");
    // pre_shot_passes_for: our shot [8] at 18.9 s; completed passes in [3.9, 18.9) are [6]
    // (4, 1) and [7] (5, 1); [0] at 3.0 s is 15.9 s before. Per-match count: 30 zones, den 1.
    for (auto& r : countRows(m, "pre_shot_passes_for", {{4, 1}, {5, 1}}))
        rows.push_back(r);
    // pre_shot_passes_against: their only completed pass [4] is in period 1, their only shot
    // in period 2: all 30 zones 0/1.
    for (auto& r : countRows(m, "pre_shot_passes_against", {}))
        rows.push_back(r);
    // losses: both losses, every zone den 1.
    for (auto& r : countRows(m, "losses", {{3, 5}, {4, 2}}))
        rows.push_back(r);
    // press_rate: our tackle [5] in (4, 1) but no opponent pass there (den 0, not shown);
    // their pass [4] in (5, 3) with no action of ours: 0/1.
    rows.push_back(m + ",press_rate,5,3,0,1");
    // pass_completion: our seven passes by zone, completed/attempted.
    rows.push_back(m + ",pass_completion,2,5,1,1"); // [13]
    rows.push_back(m + ",pass_completion,3,3,1,1"); // [0]
    rows.push_back(m + ",pass_completion,3,5,0,1"); // [14] failed
    rows.push_back(m + ",pass_completion,4,1,1,1"); // [6]
    rows.push_back(m + ",pass_completion,4,2,0,1"); // [2] failed
    rows.push_back(m + ",pass_completion,5,1,1,1"); // [7]
    rows.push_back(m + ",pass_completion,6,1,1,1"); // [11]
    return rows;
}

std::vector<std::string> withHeader(std::vector<std::string> rows) {
    rows.insert(rows.begin(), "match_id,metric,band,lane,num,den");
    return rows;
}

/// Rows of `csv` (header excluded) whose metric column is `metric`.
std::vector<std::string> rowsOf(const std::string& csv, const std::string& metric) {
    std::vector<std::string> out;
    for (const auto& l : lines(csv))
        if (contains(l, "," + metric + ",")) out.push_back(l);
    return out;
}

const char* kCrossesSpec = R"({"id": "kb_crosses", "name": "Our crosses", "better": "higher",
  "items": {"side": "us", "type": "pass", "tags_any": "cross"}, "per": "match"})";
const char* kSetPiecesSpec = R"({"id": "kb_crosses", "name": "Our set-piece passes",
  "better": "higher", "items": {"side": "us", "type": "pass", "tags_any": "set_piece"},
  "per": "match"})";

} // namespace

TEST_CASE("ingest of good files exits 0", "[cli]") {
    Workspace w;
    const auto r = cli({"--db", w.db, "ingest", minimalPath(), w.secondMatch()});
    INFO(r.err);
    CHECK(r.code == 0);
    CHECK(r.out.empty());
    CHECK(contains(r.err, "2 added, 0 replaced, 0 unchanged, 0 failed"));
    // The same files again are unchanged, still exit 0.
    const auto again = cli({"--db", w.db, "ingest", minimalPath()});
    CHECK(again.code == 0);
    CHECK(contains(again.err, "0 added, 0 replaced, 1 unchanged, 0 failed"));
}

TEST_CASE("ingest of a bad file exits 2 and names the file with event and field", "[cli]") {
    Workspace w;
    REQUIRE(cli({"--db", w.db, "ingest", minimalPath()}).code == 0);
    const std::string before = dataSnapshot(w.db);
    const auto r = cli({"--db", w.db, "ingest", badPath("x-off-pitch.json")});
    CHECK(r.code == 2);
    CHECK(r.out.empty());
    INFO(r.err);
    CHECK(contains(r.err, badPath("x-off-pitch.json") + ": events[4].x: 108.5 m"));
    CHECK(contains(r.err, "0 added, 0 replaced, 0 unchanged, 1 failed"));
    CHECK(dataSnapshot(w.db) == before);
}

TEST_CASE("a batch with one bad file lands the good ones and exits 2", "[cli]") {
    Workspace w;
    const auto r = cli(
        {"--db", w.db, "ingest", minimalPath(), badPath("negative-time.json"), w.secondMatch()});
    INFO(r.err);
    CHECK(r.code == 2);
    CHECK(r.out.empty());
    CHECK(contains(r.err, badPath("negative-time.json") + ": events[2].t: "));
    CHECK(contains(r.err, "2 added, 0 replaced, 0 unchanged, 1 failed"));
    const auto listed = cli({"--db", w.db, "matches", "--format", "csv"});
    CHECK(listed.code == 0);
    const auto l = lines(listed.out);
    REQUIRE(l.size() == 3);
    CHECK(l[0] ==
          "match_id,date,competition,venue,opponent,goals_us,goals_opp,squad,season,events");
    CHECK(l[1] == "KB-TEST-01,2026-07-18,Friendly,home,Saltmarsh Athletic,,,First team,2026-27,17");
    CHECK(l[2] == "KB-TEST-02,2026-07-25,Friendly,home,Saltmarsh Athletic,,,First team,2026-27,17");
}

TEST_CASE("tallies --format csv prints the hand-worked rows of the minimal match", "[cli]") {
    Workspace w;
    REQUIRE(cli({"--db", w.db, "ingest", minimalPath()}).code == 0);
    const auto r = cli({"--db", w.db, "tallies", "--format", "csv"});
    INFO(r.err);
    CHECK(r.code == 0);
    const auto got = lines(r.out);
    const auto expected = withHeader(expectedMinimalRows());
    REQUIRE(got.size() == expected.size()); // 1 + 2 + 2 + 30 + 30 + 30 + 1 + 7 = 103
    CHECK(got.size() == 103);
    for (std::size_t i = 0; i < got.size(); ++i) {
        INFO("line " << i);
        CHECK(got[i] == expected[i]);
    }

    SECTION("--match and --metric select rows") {
        const auto one = cli({"--db", w.db, "tallies", "--format", "csv", "--match", "KB-TEST-01",
                              "--metric", "losses"});
        CHECK(one.code == 0);
        CHECK(lines(one.out) == withHeader(countRows("KB-TEST-01", "losses", {{3, 5}, {4, 2}})));
    }
    SECTION("an unknown match or metric exits 2") {
        const auto noMatch = cli({"--db", w.db, "tallies", "--match", "KB-NOPE"});
        CHECK(noMatch.code == 2);
        CHECK(contains(noMatch.err, "no match 'KB-NOPE'"));
        const auto noMetric = cli({"--db", w.db, "tallies", "--metric", "kb_nope"});
        CHECK(noMetric.code == 2);
        CHECK(contains(noMetric.err, "no metric 'kb_nope'"));
    }
    SECTION("a second match follows the first, ordered by date") {
        REQUIRE(cli({"--db", w.db, "ingest", w.secondMatch()}).code == 0);
        const auto both = lines(cli({"--db", w.db, "tallies", "--format", "csv"}).out);
        REQUIRE(both.size() == 1 + 2 * 102);
        CHECK(both[1].rfind("KB-TEST-01,", 0) == 0);
        CHECK(both[103].rfind("KB-TEST-02,", 0) == 0);
    }
}

TEST_CASE("matches lists the stored matches", "[cli]") {
    Workspace w;
    const auto empty = cli({"--db", w.db, "matches"});
    CHECK(empty.code == 0);
    CHECK(contains(empty.out, "no matches yet"));
    REQUIRE(cli({"--db", w.db, "ingest", minimalPath()}).code == 0);
    const auto r = cli({"--db", w.db, "matches"});
    CHECK(r.code == 0);
    const auto l = lines(r.out);
    REQUIRE(l.size() == 1);
    CHECK(contains(l[0], "KB-TEST-01"));
    CHECK(contains(l[0], "2026-07-18"));
    CHECK(contains(l[0], "Saltmarsh Athletic"));
    CHECK(contains(l[0], "17 events"));
    CHECK(contains(l[0], "2026-27"));
}

TEST_CASE("debrief prints one table per built-in metric", "[cli]") {
    Workspace w;
    REQUIRE(cli({"--db", w.db, "ingest", minimalPath()}).code == 0);
    const auto r = cli({"--db", w.db, "debrief", "KB-TEST-01"});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(contains(r.out, "KB-TEST-01"));
    CHECK(contains(r.out, "Kestrel Bay v Saltmarsh Athletic"));
    std::size_t tables = 0;
    for (std::size_t at = r.out.find("whole pitch"); at != std::string::npos;
         at = r.out.find("whole pitch", at + 1))
        ++tables;
    CHECK(tables == 7);
    for (const char* id : {"regain_5s", "shot_after_loss", "pre_shot_passes_for",
                           "pre_shot_passes_against", "losses", "press_rate", "pass_completion"}) {
        INFO(id);
        CHECK(contains(r.out, std::string("\n") + id + " — "));
    }
    // Whole-pitch totals from the hand-worked tallies: 5 of 7 passes completed, 2 losses.
    const std::string completion = r.out.substr(r.out.find("pass_completion — "));
    CHECK(contains(completion, "whole pitch     5/7  71%"));
    const std::string losses = r.out.substr(r.out.find("losses — "));
    CHECK(contains(losses.substr(0, losses.find("press_rate")), "whole pitch     2\n"));

    const auto unknown = cli({"--db", w.db, "debrief", "KB-NOPE"});
    CHECK(unknown.code == 2);
    CHECK(unknown.out.empty());
    CHECK(contains(unknown.err, "no match 'KB-NOPE'"));
}

TEST_CASE("version and help exit 0 and an unknown subcommand exits 2", "[cli]") {
    const auto version = cli({"--version"});
    CHECK(version.code == 0);
    CHECK(contains(version.out, "pitchloop "));
    const auto help = cli({"--help"});
    CHECK(help.code == 0);
    CHECK(contains(help.out, "ingest"));
    CHECK(contains(help.out, "tallies"));
    Workspace w;
    const auto unknown = cli({"--db", w.db, "frobnicate"});
    CHECK(unknown.code == 2);
    CHECK_FALSE(unknown.err.empty());
    const auto none = cli({"--db", w.db});
    CHECK(none.code == 2);
}

TEST_CASE("metrics add refuses a bad spec and names the key", "[cli]") {
    Workspace w;
    const std::string spec = w.write("bad-metric.json", R"({"id": "kb_crosses",
        "better": "sideways", "items": {"side": "us", "type": "pass"}, "per": "match"})");
    const auto r = cli({"--db", w.db, "metrics", "add", spec});
    CHECK(r.code == 2);
    INFO(r.err);
    CHECK(contains(r.err, "better: expected higher or lower"));
    CHECK(contains(r.err, "no metric added"));
    const auto listed = cli({"--db", w.db, "metrics", "list"});
    CHECK_FALSE(contains(listed.out, "kb_crosses"));

    const std::string unknownKey = w.write("unknown-key.json", R"({"id": "kb_crosses",
        "better": "higher", "colour": "red", "items": {"side": "us"}, "per": "match"})");
    const auto u = cli({"--db", w.db, "metrics", "add", unknownKey});
    CHECK(u.code == 2);
    CHECK(contains(u.err, "colour: unknown key"));
}

TEST_CASE("a user metric added on the command line gets tallies and --replace redefines it",
          "[cli]") {
    Workspace w;
    REQUIRE(cli({"--db", w.db, "ingest", minimalPath()}).code == 0);
    const auto add = cli({"--db", w.db, "metrics", "add", w.write("crosses.json", kCrossesSpec)});
    INFO(add.err);
    REQUIRE(add.code == 0);
    // Our passes tagged cross: [7] from (78, 4) → (5, 1) and [11] from (105, 0) → (6, 1).
    const auto t = cli({"--db", w.db, "tallies", "--format", "csv", "--metric", "kb_crosses"});
    CHECK(t.code == 0);
    CHECK(lines(t.out) == withHeader(countRows("KB-TEST-01", "kb_crosses", {{5, 1}, {6, 1}})));
    // The full listing has the user metric after the built-in ones.
    const auto all = cli({"--db", w.db, "tallies", "--format", "csv"});
    auto expected = withHeader(expectedMinimalRows());
    for (auto& r : countRows("KB-TEST-01", "kb_crosses", {{5, 1}, {6, 1}}))
        expected.push_back(r);
    CHECK(lines(all.out) == expected);

    const std::string setPieces = w.write("set-pieces.json", kSetPiecesSpec);
    const auto refused = cli({"--db", w.db, "metrics", "add", setPieces});
    CHECK(refused.code == 2);
    CHECK(contains(refused.err, "--replace"));
    CHECK(rowsOf(cli({"--db", w.db, "tallies", "--format", "csv"}).out, "kb_crosses") ==
          countRows("KB-TEST-01", "kb_crosses", {{5, 1}, {6, 1}}));

    const auto replaced = cli({"--db", w.db, "metrics", "add", "--replace", setPieces});
    CHECK(replaced.code == 0);
    // Set pieces: the corner [11] → (6, 1) and the throw-in [13] from (30, 68) → (2, 5).
    const auto after = cli({"--db", w.db, "tallies", "--format", "csv", "--metric", "kb_crosses"});
    CHECK(lines(after.out) == withHeader(countRows("KB-TEST-01", "kb_crosses", {{2, 5}, {6, 1}})));

    // A built-in metric is neither redefined nor removed.
    const auto builtin = cli({"--db", w.db, "metrics", "remove", "losses"});
    CHECK(builtin.code != 0);
    CHECK(contains(builtin.err, "built-in"));
    CHECK(cli({"--db", w.db, "metrics", "remove", "kb_crosses"}).code == 0);
    CHECK(rowsOf(cli({"--db", w.db, "tallies", "--format", "csv"}).out, "kb_crosses").empty());
}

TEST_CASE("ingest with --replace replaces a stored match and without it the file is refused",
          "[cli]") {
    Workspace w;
    REQUIRE(cli({"--db", w.db, "ingest", minimalPath()}).code == 0);
    const std::string before = dataSnapshot(w.db);
    const std::string other = badPath("duplicate-match-id.json"); // KB-TEST-01 v Gullhaven Rovers

    const auto refused = cli({"--db", w.db, "ingest", other});
    CHECK(refused.code == 2);
    CHECK(refused.out.empty());
    CHECK(contains(refused.err, other + ": match.id: match 'KB-TEST-01' is already"));
    CHECK(contains(refused.err, "--replace"));
    CHECK(dataSnapshot(w.db) == before);

    const auto replaced = cli({"--db", w.db, "ingest", "--replace", other});
    INFO(replaced.err);
    CHECK(replaced.code == 0);
    CHECK(contains(replaced.err, "0 added, 1 replaced, 0 unchanged, 0 failed"));
    const auto listed = lines(cli({"--db", w.db, "matches", "--format", "csv"}).out);
    REQUIRE(listed.size() == 2);
    CHECK(contains(listed[1], "Gullhaven Rovers"));
    // Same events, so the same tallies as before.
    CHECK(lines(cli({"--db", w.db, "tallies", "--format", "csv"}).out) ==
          withHeader(expectedMinimalRows()));
}

TEST_CASE("the installed binary returns the exit codes", "[cli]") {
    const std::string binary = PITCHLOOP_CLI;
    REQUIRE(fs::exists(binary));
    Workspace w;
    const std::string out = (w.dir / "stdout.txt").string();
    const std::string err = (w.dir / "stderr.txt").string();
    const auto run = [&](const std::string& args) {
        const std::string command =
            "'" + binary + "' --db '" + w.db + "' " + args + " >'" + out + "' 2>'" + err + "'";
        const int status = std::system(command.c_str());
        REQUIRE(WIFEXITED(status));
        return WEXITSTATUS(status);
    };
    CHECK(run("ingest '" + minimalPath() + "'") == 0);
    CHECK(run("ingest '" + badPath("unknown-event-type.json") + "'") == 2);
    CHECK(fs::file_size(out) == 0);
    const std::string errText = pitchloop::model::readFileBytes(err);
    CHECK(contains(errText, "events[5].type"));
    CHECK(run("tallies --format csv") == 0);
    const auto csv = lines(pitchloop::model::readFileBytes(out));
    CHECK(csv == withHeader(expectedMinimalRows()));
}

TEST_CASE("ingest gives the command line's own hint for a foreign event type", "[cli]") {
    Workspace w;
    std::string text = pitchloop::model::readFileBytes(minimalPath());
    const auto at = text.find("\"type\": \"carry\"");
    REQUIRE(at != std::string::npos);
    text.replace(at, 15, "\"type\": \"dribble\"");
    const std::string file = w.write("foreign.json", text);
    const auto r = cli({"--db", w.db, "ingest", file});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "unknown event type 'dribble'"));
    CHECK(contains(r.err, "hint: --map-type NAME=TYPE reads a foreign event type as one of ours"));
    const auto mapped = cli({"--db", w.db, "ingest", "--map-type", "dribble=carry", file});
    INFO(mapped.err);
    CHECK(mapped.code == 0);
}
