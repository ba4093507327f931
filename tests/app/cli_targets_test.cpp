// The command line's targets, status, debrief and settings verbs, run in-process through
// pitchloop::cli::run, on temp club files. The base match is tests/data/minimal-match.json
// (KB-TEST-01, 2026-07-18); the demo season is sample-club/. "Today" is fixed with
// $PITCHLOOP_TODAY. Outside values come from Debian's scipy 1.10.1 (/usr/bin/python3, `st` is
// scipy.stats), with the expression beside each.

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
    for (std::string line; std::getline(in, line);) out.push_back(line);
    return out;
}

std::string minimalPath() { return sourcePath("tests/data/minimal-match.json").string(); }
std::string sampleTargets() { return sourcePath("sample-club/targets.json").string(); }
std::string sampleMatch(int n) {
    char name[32];
    std::snprintf(name, sizeof name, "KB-2026-%02d.json", n);
    return (sourcePath("sample-club/matches") / name).string();
}

/// Sets $PITCHLOOP_TODAY for the life of the object, then puts back what was there.
struct Today {
    std::optional<std::string> before;
    explicit Today(const std::string& date) {
        if (const char* v = std::getenv("PITCHLOOP_TODAY")) before = v;
        ::setenv("PITCHLOOP_TODAY", date.c_str(), 1);
    }
    ~Today() {
        if (before) ::setenv("PITCHLOOP_TODAY", before->c_str(), 1);
        else ::unsetenv("PITCHLOOP_TODAY");
    }
};

/// A temp folder with a club file path (not yet created) and room for extra files.
struct Workspace {
    fs::path dir = freshTempDir("cli-targets");
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
    /// minimal-match.json as KB-TEST-02, a week later.
    std::string secondMatch() const {
        json j = json::parse(pitchloop::model::readFileBytes(minimalPath()));
        j["match"]["id"] = "KB-TEST-02";
        j["match"]["date"] = "2026-07-25";
        return write("second.json", j.dump());
    }
    CliRun run(std::vector<std::string> args) const {
        args.insert(args.begin(), {"--db", db});
        return cli(std::move(args));
    }
};

/// The lines of a debrief section, from its title to the blank line after it.
/// The items of one debrief section, each item's lines joined: an item starts at a line
/// indented by two spaces, its sentence and numbers follow indented by four.
std::vector<std::string> section(const std::string& debrief, const std::string& title) {
    std::vector<std::string> out;
    bool in = false;
    for (const auto& line : lines(debrief)) {
        if (!in && line.rfind(title, 0) == 0) {
            in = true;
            continue;
        }
        if (in && line.empty()) break;
        if (!in) continue;
        if (line.rfind("    ", 0) == 0 && !out.empty()) out.back() += "\n" + line;
        else out.push_back(line);
    }
    return out;
}

bool anyLineHas(const std::vector<std::string>& ls, std::initializer_list<std::string> parts) {
    return std::any_of(ls.begin(), ls.end(), [&](const std::string& l) {
        return std::all_of(parts.begin(), parts.end(), [&](const std::string& p) { return contains(l, p); });
    });
}

const std::string kTargetsHeader =
    "squad,season,metric,band,lane,direction,value,watch_margin,min_sample,author,rationale,"
    "effective_from,recorded_at,retired";

} // namespace

TEST_CASE("targets set stores a version; bad input exits 2 and stores nothing", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    REQUIRE(w.run({"ingest", minimalPath()}).code == 0);

    const auto set = w.run({"targets", "set", "--metric", "regain_5s", "--zone", "5,1", "--value",
                            "45%", "--author", "R. Tamsin", "--why", "press high"});
    INFO(set.err);
    CHECK(set.code == 0);
    CHECK(contains(set.err, "set 1 target for regain_5s in First team 2026-27 from 2026-07-20"));
    // 45% is read as the share 0.45; direction, margin and min sample are the metric's
    // defaults; the season and dates come from "today".
    const auto list = w.run({"targets", "list", "--format", "csv"});
    CHECK(list.code == 0);
    CHECK(lines(list.out) ==
          std::vector<std::string>{kTargetsHeader,
                                   "First team,2026-27,regain_5s,5,1,at_least,0.45,0.05,30,"
                                   "R. Tamsin,press high,2026-07-20,2026-07-20T12:00:00Z,0"});

    const std::string before = dataSnapshot(w.db);
    struct Bad {
        std::vector<std::string> args;
        const char* message;
    };
    const std::vector<Bad> bad{
        {{"--metric", "regain_5s", "--zone", "7,1", "--value", "0.4"},
         "error: --zone 7,1: expected BAND,LANE within the equal:6x5 grid (bands 1–6, lanes 1–5)"},
        {{"--metric", "regain_5s", "--zone", "2,6", "--value", "0.4"}, "error: --zone 2,6: "},
        {{"--metric", "regain_5s", "--zone", "2-5", "--value", "0.4"}, "error: --zone 2-5: "},
        {{"--metric", "regain_5s", "--zone", "0,3", "--value", "0.4"}, "error: --zone 0,3: "},
        {{"--metric", "kb_nope", "--zone", "2,5", "--value", "0.4"},
         "error: --metric: no metric 'kb_nope'"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "1.5"},
         "error: --value 1.5: a rate target is a share from 0 to 1 (0.45) or a percentage (45%)"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "150%"}, "error: --value 150%: "},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "lots"}, "error: --value lots: "},
        {{"--metric", "losses", "--zone", "2,5", "--value=-1"},
         "error: --value -1: expected a number ≥ 0"},
        {{"--metric", "regain_5s", "--value", "0.4"}, "error: say where"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--from", "2026-7-1"},
         "error: --from 2026-7-1: expected a date YYYY-MM-DD"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--from", "2026-13-01"},
         "error: --from 2026-13-01: expected a date YYYY-MM-DD"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--from", "2026-07-32"},
         "error: --from 2026-07-32: expected a date YYYY-MM-DD"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--season", "2026"},
         "error: --season 2026: expected a season such as 2026-27"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--season", "abcd-ef"},
         "error: --season abcd-ef: expected a season such as 2026-27"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--min-sample", "-5"},
         "error: --min-sample -5: expected a whole number ≥ 0"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--margin", "-0.1"},
         "error: --margin -0.1: expected a number ≥ 0"},
        {{"--metric", "regain_5s", "--zone", "2,5", "--value", "0.4", "--direction", "up"},
         "direction"},
    };
    for (const auto& b : bad) {
        std::vector<std::string> args{"targets", "set", "--author", "R. Tamsin"};
        args.insert(args.end(), b.args.begin(), b.args.end());
        const auto r = w.run(args);
        INFO(r.err);
        CHECK(r.code == 2);
        CHECK(contains(r.err, b.message));
        CHECK(dataSnapshot(w.db) == before);
    }

    SECTION("several zones and the whole pitch in one go") {
        const auto many = w.run({"targets", "set", "--metric", "pre_shot_passes_against", "--zone",
                                 "2,5", "--zone", "2,1", "--whole-pitch", "--value", "2",
                                 "--author", "R. Tamsin", "--from", "2026-07-01"});
        INFO(many.err);
        CHECK(many.code == 0);
        CHECK(contains(many.err, "set 3 targets for pre_shot_passes_against"));
        const auto l = lines(w.run({"targets", "list", "--format", "csv"}).out);
        REQUIRE(l.size() == 1 + 4);
        // Per-match count defaults: at most (better lower), margin 0.5, min 3 matches.
        CHECK(std::count_if(l.begin(), l.end(), [](const std::string& s) {
                  return contains(s, ",pre_shot_passes_against,") && contains(s, ",at_most,2,0.5,3,");
              }) == 3);
        CHECK(anyLineHas(l, {",pre_shot_passes_against,0,0,"}));
    }
}

TEST_CASE("targets list, history and retire follow the versions", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    const std::vector<std::string> key{"--metric", "regain_5s", "--zone", "5,1", "--author",
                                       "R. Tamsin"};
    auto set = [&](std::vector<std::string> extra) {
        std::vector<std::string> args{"targets", "set"};
        args.insert(args.end(), key.begin(), key.end());
        args.insert(args.end(), extra.begin(), extra.end());
        const auto r = w.run(args);
        INFO(r.err);
        REQUIRE(r.code == 0);
    };
    set({"--value", "0.45", "--from", "2026-07-01"});
    set({"--value", "0.5", "--from", "2026-09-01", "--why", "raised after a good August"});

    auto listOn = [&](const std::string& date) {
        return lines(w.run({"targets", "list", "--format", "csv", "--on", date}).out);
    };
    // Before the edit's date the first version is in force; from it, the edit.
    REQUIRE(listOn("2026-08-31").size() == 2);
    CHECK(contains(listOn("2026-08-31")[1], ",regain_5s,5,1,at_least,0.45,"));
    CHECK(contains(listOn("2026-08-31")[1], ",2026-07-01,"));
    REQUIRE(listOn("2026-09-01").size() == 2);
    CHECK(contains(listOn("2026-09-01")[1], ",regain_5s,5,1,at_least,0.5,"));
    CHECK(contains(listOn("2026-09-01")[1], ",raised after a good August,2026-09-01,"));
    CHECK(listOn("2026-06-30").size() == 1); // nothing yet
    // Without --on: today (2026-07-20).
    const auto todays = lines(w.run({"targets", "list", "--format", "csv"}).out);
    REQUIRE(todays.size() == 2);
    CHECK(contains(todays[1], ",0.45,"));

    // History keeps both, oldest first.
    const auto history = lines(w.run({"targets", "history", "--format", "csv"}).out);
    REQUIRE(history.size() == 3);
    CHECK(history[0] == kTargetsHeader);
    CHECK(contains(history[1], ",0.45,") );
    CHECK(contains(history[2], ",0.5,"));
    CHECK(lines(w.run({"targets", "history", "--format", "csv", "--metric", "pass_completion"}).out)
              .size() == 1);

    // The table names the zone and shows the rate as a percentage.
    const auto table = w.run({"targets", "list", "--on", "2026-08-31"});
    CHECK(table.code == 0);
    CHECK(contains(table.out, "Targets in force on 2026-08-31 — First team 2026-27"));
    CHECK(anyLineHas(lines(table.out), {"regain_5s", "(B5·L1)", "at_least", "45.0%",
                                         "from 2026-07-01", "R. Tamsin"}));

    // Retire from October: gone from the list then, still in the history.
    const auto retire = w.run({"targets", "retire", "--metric", "regain_5s", "--zone", "5,1",
                               "--author", "R. Tamsin", "--from", "2026-10-01"});
    INFO(retire.err);
    CHECK(retire.code == 0);
    CHECK(contains(retire.err, "retired 1 target for regain_5s"));
    CHECK(listOn("2026-10-01").size() == 1);
    REQUIRE(listOn("2026-09-30").size() == 2);
    CHECK(contains(listOn("2026-09-30")[1], ",0.5,"));
    const auto after = lines(w.run({"targets", "history", "--format", "csv"}).out);
    REQUIRE(after.size() == 4);
    CHECK(after[3].substr(after[3].size() - 2) == ",1"); // retired
    CHECK(contains(after[3], ",2026-10-01,"));

    // Bad --on date.
    for (const char* date : {"soon", "2026-99-99", "2026-10-00"}) {
        const auto badOn = w.run({"targets", "list", "--on", date});
        CHECK(badOn.code == 2);
        CHECK(contains(badOn.err, std::string("--on ") + date + ": expected a date YYYY-MM-DD"));
    }
    const auto badSeason = w.run({"targets", "list", "--season", "26-27"});
    CHECK(badSeason.code == 2);
    CHECK(contains(badSeason.err, "--season 26-27: expected a season such as 2026-27"));

    // JSON list is a targets file.
    const auto asJson = w.run({"targets", "list", "--format", "json", "--on", "2026-09-15"});
    const json j = json::parse(asJson.out);
    CHECK(j["format"] == "pitchloop-targets");
    REQUIRE(j["targets"].size() == 1);
    CHECK(j["targets"][0]["value"] == 0.5);
}

TEST_CASE("targets import skips repeats; export then import rebuilds the same targets",
          "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    // sample-club/targets.json holds 19 target versions.
    const auto first = w.run({"targets", "import", sampleTargets()});
    INFO(first.err);
    CHECK(first.code == 0);
    CHECK(contains(first.err, "imported 19 target versions (0 already there)"));
    const std::string afterFirst = dataSnapshot(w.db);
    const auto second = w.run({"targets", "import", sampleTargets()});
    CHECK(second.code == 0);
    CHECK(contains(second.err, "imported 0 target versions (19 already there)"));
    CHECK(dataSnapshot(w.db) == afterFirst);

    const auto history = w.run({"targets", "history", "--format", "csv", "--season", "2026-27"});
    CHECK(lines(history.out).size() == 1 + 19);
    // A whole-pitch row from the file, with its own watch margin and the count defaults.
    CHECK(anyLineHas(lines(history.out),
                     {"First team,2026-27,pre_shot_passes_against,0,0,at_most,30,3,3,"
                      "P. Nwosu (analyst),fewer of their attacks reach a shot,2026-07-01,"
                      "2026-07-20T10:00:00Z,0"}));

    // Export, then import into a fresh club: the same versions and the same list.
    const auto exported = w.run({"targets", "export"});
    CHECK(exported.code == 0);
    const std::string file = w.write("exported.json", exported.out);
    Workspace fresh;
    const auto into = fresh.run({"targets", "import", file});
    INFO(into.err);
    CHECK(into.code == 0);
    CHECK(contains(into.err, "imported 19 target versions (0 already there)"));
    for (const std::vector<std::string>& args :
         {std::vector<std::string>{"targets", "list", "--format", "csv", "--on", "2026-08-01"},
          std::vector<std::string>{"targets", "history", "--format", "csv"},
          std::vector<std::string>{"targets", "export"}}) {
        const auto a = w.run(args), b = fresh.run(args);
        CHECK(a.code == 0);
        CHECK(lines(a.out).size() > 1);
        CHECK(a.out == b.out);
    }
    // Importing the export back into the first club adds nothing.
    CHECK(contains(w.run({"targets", "import", file}).err, "imported 0 target versions"));
    // Export of a season with no targets: an empty list.
    const json none = json::parse(w.run({"targets", "export", "--season", "2030-31"}).out);
    CHECK(none["targets"].empty());

    SECTION("a bad file is refused as a whole with file, place and field") {
        json bad = json::parse(pitchloop::model::readFileBytes(sampleTargets()));
        bad["targets"][3]["metric"] = "kb_nope";
        const std::string path = fresh.write("bad.json", bad.dump());
        const std::string before = dataSnapshot(fresh.db);
        const auto r = fresh.run({"targets", "import", path});
        CHECK(r.code == 2);
        CHECK(contains(r.err, "error: " + path + ": targets[3].metric: unknown metric 'kb_nope'"));
        CHECK(contains(r.err, path + ": no target imported"));
        CHECK(dataSnapshot(fresh.db) == before);
        // A season name that is not one is bad input (exit 2) named at its place, not a
        // storage fault.
        json badSeason = json::parse(pitchloop::model::readFileBytes(sampleTargets()));
        badSeason["targets"][2]["season"] = "2026/27";
        const std::string seasonPath = fresh.write("bad-season.json", badSeason.dump());
        const auto s = fresh.run({"targets", "import", seasonPath});
        CHECK(s.code == 2);
        CHECK(contains(s.err, "error: " + seasonPath + ": targets[2].season: "));
        CHECK(dataSnapshot(fresh.db) == before);
        const auto missing = fresh.run({"targets", "import", (fresh.dir / "nope.json").string()});
        CHECK(missing.code == 2);
        CHECK(contains(missing.err, "cannot be read"));
    }
}

TEST_CASE("copy-season carries targets over with last season's achieved values", "[cli]") {
    Today today("2026-07-20");
    Workspace w;
    REQUIRE(w.run({"ingest", minimalPath()}).code == 0);
    REQUIRE(w.run({"targets", "set", "--metric", "regain_5s", "--whole-pitch", "--value", "0.4",
                   "--author", "R. Tamsin", "--from", "2026-07-01", "--why", "counter-press"})
                .code == 0);
    REQUIRE(w.run({"targets", "set", "--metric", "pass_completion", "--zone", "3,3", "--value",
                   "85%", "--author", "R. Tamsin", "--from", "2026-07-01"})
                .code == 0);

    // The hand-worked intervals below assume pure binomial noise (no match-to-match variation).
    REQUIRE(w.run({"settings", "set", "match_variation", "off"}).code == 0);
    const auto copy = w.run({"targets", "copy-season", "--from-season", "2026-27", "--to-season",
                             "2027-28", "--author", "P. Okafor"});
    INFO(copy.out);
    INFO(copy.err);
    CHECK(copy.code == 0);
    CHECK(contains(copy.out, "Copied into First team 2027-28 from 2027-07-01 (achieved: 2026-27, "
                             "1 matches)"));
    // Achieved over the 2026-27 season (the minimal match alone), 90 % Wilson intervals:
    // regain_5s over the whole pitch 1 of 2 losses won back (hand-worked in cli_test.cpp):
    //   st.binomtest(1, 2).proportion_ci(confidence_level=0.9, method='wilson')
    //   → 0.1209, 0.8791 → "50.0% (12.1%–87.9%)";
    // pass_completion in band 3 lane 3: its one pass, from (35, 34), arrived: 1 of 1 →
    //   st.binomtest(1, 1).proportion_ci(confidence_level=0.9, method='wilson')
    //   → 0.2699, 1.0 → "100.0% (27.0%–100.0%)".
    const auto out = lines(copy.out);
    CHECK(anyLineHas(out, {"regain_5s", "whole pitch", "at_least", "40.0%",
                           "last season 50.0% (12.1%–87.9%)"}));
    CHECK(anyLineHas(out, {"pass_completion", "(B3·L3)", "85.0%",
                           "last season 100.0% (27.0%–100.0%)"}));
    CHECK(contains(copy.err, "copied 2 targets"));

    const auto next = lines(w.run({"targets", "history", "--format", "csv", "--season", "2027-28"}).out);
    REQUIRE(next.size() == 3);
    CHECK(anyLineHas(next, {"First team,2027-28,regain_5s,0,0,at_least,0.4,0.05,30,P. Okafor,"
                            "copied from 2026-27: counter-press,2027-07-01,"}));
    CHECK(anyLineHas(next, {"First team,2027-28,pass_completion,3,3,at_least,0.85,",
                            ",copied from 2026-27,2027-07-01,"}));
    // The old season is unchanged.
    CHECK(lines(w.run({"targets", "history", "--format", "csv", "--season", "2026-27"}).out).size() == 3);

    const auto badSeason = w.run({"targets", "copy-season", "--from-season", "2026-27",
                                  "--to-season", "2027", "--author", "P. Okafor"});
    CHECK(badSeason.code == 2);
    CHECK(contains(badSeason.err, "--to-season 2027: expected a season such as 2027-28"));
    const auto letters = w.run({"targets", "copy-season", "--from-season", "2026-27",
                                "--to-season", "abcd-ef", "--author", "P. Okafor"});
    CHECK(letters.code == 2);
    CHECK(contains(letters.err, "--to-season abcd-ef: expected a season such as 2027-28"));
    const auto empty = w.run({"targets", "copy-season", "--from-season", "2024-25",
                              "--to-season", "2025-26", "--author", "P. Okafor"});
    CHECK(empty.code == 2);
    CHECK(contains(empty.err, "no targets in First team 2024-25 to copy"));
}

TEST_CASE("status prints every zone in csv and json; an unknown match exits 2", "[cli]") {
    Today today("2026-07-26");
    Workspace w;
    REQUIRE(w.run({"ingest", minimalPath(), w.secondMatch()}).code == 0);
    // Whole-pitch pass completion at least 90 %, judged from 5 passes.
    REQUIRE(w.run({"targets", "set", "--metric", "pass_completion", "--whole-pitch", "--value",
                   "0.9", "--min-sample", "5", "--author", "R. Tamsin", "--from", "2026-07-01"})
                .code == 0);

    // The scipy numbers below assume pure binomial noise (no match-to-match variation).
    REQUIRE(w.run({"settings", "set", "match_variation", "off"}).code == 0);
    const auto csv = w.run({"status", "KB-TEST-02", "--format", "csv"});
    INFO(csv.err);
    REQUIRE(csv.code == 0);
    const auto rows = lines(csv.out);
    REQUIRE_FALSE(rows.empty());
    CHECK(rows[0].rfind("match_id,metric,band,lane,window,num,den,value,low,high,level,target,"
                        "state,p_miss",
                        0) == 0);
    // 7 metrics × (30 zones + the whole pitch) × 4 default windows (match, last5, season,
    // ewma0.3) and the header.
    CHECK(rows.size() == 1 + 7 * 31 * 4);

    // Pass completion over the whole pitch, last5 at KB-TEST-02: 5 of 7 in each match → 10/14.
    //   P(miss) = st.beta.cdf(0.9, 10.5, 4.5) → 0.9791065226366727 (< 0.999, ≥ 0.5: likely off).
    //   Wilson 90 %: st.binomtest(10, 14).proportion_ci(confidence_level=0.9,
    //   method='wilson') → 0.4944962194951345, 0.864665996118335 (printed to 6 digits).
    const std::string prefix = "KB-TEST-02,pass_completion,0,0,last5,10,14,0.714286,0.494496,"
                               "0.864666,0.9,0.9,likely_off,0.979107,at_least,2,";
    CHECK(std::count_if(rows.begin(), rows.end(),
                        [&](const std::string& r) { return r.rfind(prefix, 0) == 0; }) == 1);

    const auto js = w.run({"status", "KB-TEST-02", "--format", "json"});
    REQUIRE(js.code == 0);
    const json j = json::parse(js.out);
    CHECK(j["match_id"] == "KB-TEST-02");
    CHECK(j["date"] == "2026-07-25");
    CHECK(j["season"] == "2026-27");
    CHECK(j["grid"] == "equal:6x5");
    REQUIRE(j["zones"].is_array());
    CHECK(j["zones"].size() == 7 * 31 * 4);
    const json* whole = nullptr;
    for (const auto& z : j["zones"])
        if (z["metric"] == "pass_completion" && z["band"] == 0 && z["window"] == "last5") whole = &z;
    REQUIRE(whole);
    CHECK((*whole)["num"] == 10);
    CHECK((*whole)["den"] == 14);
    CHECK((*whole)["state"] == "likely_off");
    CHECK((*whole)["p_miss"].get<double>() == Approx(0.9791065226366727).epsilon(1e-9));
    CHECK((*whole)["target"]["value"] == 0.9);
    CHECK((*whole)["target"]["min_sample"] == 5);

    SECTION("--window and --metric narrow the rows") {
        const auto one = w.run({"status", "KB-TEST-02", "--format", "csv", "--window", "match",
                                "--metric", "regain_5s"});
        CHECK(one.code == 0);
        CHECK(lines(one.out).size() == 1 + 31);
    }
    SECTION("bad input exits 2") {
        const auto unknown = w.run({"status", "KB-NOPE"});
        CHECK(unknown.code == 2);
        CHECK(unknown.out.empty());
        CHECK(contains(unknown.err, "no match 'KB-NOPE'"));
        const auto window = w.run({"status", "KB-TEST-02", "--window", "weekly"});
        CHECK(window.code == 2);
        CHECK(contains(window.err, "--window weekly"));
        const auto metric = w.run({"status", "KB-TEST-02", "--metric", "kb_nope"});
        CHECK(metric.code == 2);
        CHECK(contains(metric.err, "no metric 'kb_nope'"));
    }
}

TEST_CASE("settings set changes what status and debrief flag; bad settings exit 2", "[cli]") {
    Today today("2026-07-26");
    Workspace w;
    REQUIRE(w.run({"ingest", minimalPath(), w.secondMatch()}).code == 0);
    REQUIRE(w.run({"targets", "set", "--metric", "pass_completion", "--whole-pitch", "--value",
                   "0.9", "--min-sample", "5", "--author", "R. Tamsin", "--from", "2026-07-01"})
                .code == 0);

    const auto shown = w.run({"settings", "show"});
    CHECK(shown.code == 0);
    CHECK(contains(shown.out, "off_threshold    0.999   "));
    CHECK(contains(shown.out, "window           last5   "));

    CHECK(contains(shown.out, "false_flags_per_season 1   "));
    // A fixed threshold applies once the season budget is switched off (and the hand-worked
    // P(miss) below assumes pure binomial noise).
    REQUIRE(w.run({"settings", "set", "false_flags_per_season", "0"}).code == 0);
    REQUIRE(w.run({"settings", "set", "match_variation", "off"}).code == 0);
    const auto set = w.run({"settings", "set", "off_threshold", "0.9"});
    CHECK(set.code == 0);
    const auto after = w.run({"settings", "show"});
    CHECK(contains(after.out, "off_threshold    0.9   (P(miss) for off target)"));
    CHECK(contains(after.out, "match_variation  off   "));
    CHECK(contains(after.out, "level            0.9   "));

    // 10/14 against at least 90 %: P(miss) 0.97911 (scipy, above) ≥ 0.9 → now off target.
    const auto debrief = w.run({"debrief", "KB-TEST-02"});
    INFO(debrief.out);
    CHECK(debrief.code == 0);
    CHECK(contains(debrief.out, "off target when P(miss) ≥ 0.9;"));
    const auto off = section(debrief.out, "Off target over the last 5 matches");
    REQUIRE(off.size() == 1);
    CHECK(contains(off[0], "Pass completion · whole pitch"));
    CHECK(contains(off[0], "71.4%"));
    CHECK(contains(off[0], "P(miss) 0.98"));
    // Not new: at KB-TEST-01 (5/7 over last5) P(miss) = st.beta.cdf(0.9, 5.5, 2.5) = 0.934,
    // already ≥ 0.9 under the same settings.
    CHECK_FALSE(contains(off[0], "new since"));
    CHECK_FALSE(contains(off[0], "(was"));

    for (const std::vector<std::string>& more :
         {std::vector<std::string>{"window", "last3"}, {"fdr", "on"}, {"fdr_q", "0.2"},
          {"interval", "jeffreys"}, {"watch_threshold", "0.6"}, {"level", "0.95"}}) {
        const auto r = w.run({"settings", "set", more[0], more[1]});
        INFO(more[0]);
        CHECK(r.code == 0);
    }
    const auto all = w.run({"settings", "show"}).out;
    CHECK(contains(all, "window           last3   "));
    CHECK(contains(all, "fdr              on   "));
    CHECK(contains(all, "fdr_q            0.2\n"));
    CHECK(contains(all, "interval         jeffreys   "));
    CHECK(contains(all, "watch_threshold  0.6   "));
    CHECK(contains(all, "level            0.95   "));

    const std::string before = dataSnapshot(w.db);
    for (const std::vector<std::string>& bad :
         {std::vector<std::string>{"off_threshold", "1.5"}, {"off_threshold", "0"},
          {"off_threshold", "high"}, {"level", "95%x"}, {"window", "weekly"},
          {"interval", "exact"}, {"fdr", "yes"}, {"colour", "blue"},
          {"false_flags_per_season", "-1"}, {"season_matches", "0"}, {"season_matches", "3.5"},
          {"match_variation", "maybe"}}) {
        const auto r = w.run({"settings", "set", bad[0], bad[1]});
        INFO(bad[0] << " " << bad[1]);
        CHECK(r.code == 2);
        CHECK(contains(r.err, "error: settings set " + bad[0] + " " + bad[1] + ": "));
        CHECK(dataSnapshot(w.db) == before);
    }
    CHECK(contains(w.run({"settings", "set", "colour", "blue"}).err, "unknown setting"));
    CHECK(contains(w.run({"settings", "show"}).out, "off_threshold    0.9   "));
}

TEST_CASE("debrief with targets names the slipped zone", "[cli]") {
    Today today("2026-09-10");
    Workspace w;
    // The first five demo matches: their passes before their shots run through band 2 lane 5
    // (sample-club/README.md: about 6 a match in matches 1–8).
    std::vector<std::string> args{"ingest"};
    for (int n = 1; n <= 5; ++n) args.push_back(sampleMatch(n));
    REQUIRE(w.run(args).code == 0);
    const auto set = w.run({"targets", "set", "--metric", "pre_shot_passes_against", "--zone",
                            "2,5", "--value", "2", "--author", "R. Tamsin", "--from", "2026-07-01"});
    REQUIRE(set.code == 0);

    const auto d = w.run({"debrief", "KB-2026-05"});
    INFO(d.out);
    REQUIRE(d.code == 0);
    CHECK(contains(d.out, "Judged over the last 5 matches (KB-2026-01 … KB-2026-05)"));
    const auto off = section(d.out, "Off target over the last 5 matches");
    REQUIRE(off.size() == 1);
    CHECK(contains(off[0], "Their passes before their shots · our left-back area (B2·L5)"));
    CHECK(contains(off[0], "· 5 matches ·"));
    CHECK(contains(off[0], "target ≤ 2 ·"));
    CHECK(contains(off[0], "we aim for at most 2."));
    CHECK(contains(d.out, "1 zones with targets judged over the last 5 matches (0 more have too little data)"));

    // At the second match the window holds 2 matches, fewer than the 3 a count needs.
    const auto early = w.run({"debrief", "KB-2026-02"});
    CHECK(section(early.out, "Off target over the last 5 matches").at(0) == "  none");
    CHECK(contains(early.out, "0 zones with targets judged over the last 5 matches (1 more have too little data)"));

    // Without targets the debrief says so.
    Workspace bare;
    REQUIRE(bare.run({"ingest", sampleMatch(1)}).code == 0);
    CHECK(contains(bare.run({"debrief", "KB-2026-01"}).out, "No targets set for First team 2026-27"));
}

TEST_CASE("the demo season: the left-side leak is off target early and eases later", "[cli]") {
    Today today("2027-03-20");
    Workspace w;
    std::vector<std::string> args{"ingest"};
    for (int n = 1; n <= 34; ++n) args.push_back(sampleMatch(n));
    const auto ingest = w.run(args);
    INFO(ingest.err);
    REQUIRE(ingest.code == 0);
    REQUIRE(contains(ingest.err, "34 added"));
    REQUIRE(w.run({"targets", "import", sampleTargets()}).code == 0);

    // sample-club/README.md: in matches 1–8 about 6 of their pre-shot passes a match start in
    // band 2 lane 5 (target: at most 2 a match, sample-club/targets.json); from match 12 on
    // about 1.
    const auto d8 = w.run({"debrief", "KB-2026-08"});
    INFO(d8.out);
    REQUIRE(d8.code == 0);
    const auto off8 = section(d8.out, "Off target over the last 5 matches");
    CHECK(anyLineHas(off8, {"Their passes before their shots", "(B2·L5)", "· 5 matches ·"}));

    auto zoneState = [&](const std::string& match) {
        const auto r = w.run({"status", match, "--format", "json", "--window", "last5", "--metric",
                              "pre_shot_passes_against"});
        REQUIRE(r.code == 0);
        const json parsed = json::parse(r.out);
        for (const auto& z : parsed["zones"])
            if (z["band"] == 2 && z["lane"] == 5) return z;
        FAIL("no zone 2,5");
        return json();
    };
    const json at8 = zoneState("KB-2026-08");
    CHECK(at8["state"] == "off_target");
    CHECK(at8["p_miss"].get<double>() >= 0.999);
    CHECK(at8["value"].get<double>() > 2.0);

    const auto d20 = w.run({"debrief", "KB-2026-20"});
    INFO(d20.out);
    REQUIRE(d20.code == 0);
    CHECK_FALSE(anyLineHas(section(d20.out, "Off target over the last 5 matches"),
                           {"Their passes before their shots", "(B2·L5)"}));
    const json at20 = zoneState("KB-2026-20");
    CHECK(at20["state"] != "off_target");
    CHECK(at20["p_miss"].get<double>() < 0.5);
}

TEST_CASE("settings grid previews, changes and logs a grid change; bad grids exit 2", "[cli]") {
    Today today("2026-07-26");
    Workspace w;
    REQUIRE(w.run({"ingest", minimalPath(), w.secondMatch()}).code == 0);
    REQUIRE(w.run({"targets", "set", "--metric", "pass_completion", "--zone", "2,5", "--value",
                   "0.8", "--min-sample", "5", "--author", "R. Tamsin", "--from", "2026-07-01"})
                .code == 0);
    const auto shown = w.run({"settings", "grid"});
    CHECK(shown.code == 0);
    CHECK(contains(shown.out, "grid  equal:6x5   (6 bands × 5 lanes of equal size)"));

    const std::string before = dataSnapshot(w.db);
    const auto preview = w.run({"settings", "grid", "equal:3x5", "--preview"});
    INFO(preview.out << preview.err);
    CHECK(preview.code == 0);
    CHECK(contains(preview.out, "Moving from equal:6x5 to equal:3x5 would do this:"));
    CHECK(contains(preview.out, "(2 matches)"));
    CHECK(contains(preview.out, "1 zone target (season, metric and zone) takes the targets of the old zone covering most of it: 1 version,"));
    CHECK(dataSnapshot(w.db) == before);

    for (const std::vector<std::string>& bad :
         {std::vector<std::string>{"settings", "grid", "equal:6by5", "--by", "A. Coach"},
          {"settings", "grid", "markings:0", "--by", "A. Coach"},
          {"settings", "grid", "equal:3x5"}}) {
        const auto r = w.run(bad);
        INFO(bad[2]);
        CHECK(r.code == 2);
        CHECK(contains(r.err, "error: settings grid " + bad[2] + ": "));
        CHECK(dataSnapshot(w.db) == before);
    }

    const auto changed = w.run({"settings", "grid", "equal:3x5", "--by", "A. Coach"});
    CHECK(changed.code == 0);
    CHECK(contains(changed.out, "Moved from equal:6x5 to equal:3x5:"));
    CHECK(contains(w.run({"settings", "show"}).out, "grid             equal:3x5   "));
    const auto list = w.run({"targets", "list", "--season", "2026-27"});
    CHECK(contains(list.out, "(B1·L5)"));
    const auto log = w.run({"settings", "grid"});
    CHECK(contains(log.out, "equal:6x5 -> equal:3x5 by A. Coach: 2 matches counted again"));
}
