// `sessions` and `export` on the command line, and the demo club's planned week: on the demo
// files (matches 1–8 of the planted story, targets, drill book, fixtures, the story's focus),
// `plan` for a date in the story's week proposes a session that works on the open focus within
// the day's limits and explains itself.

#include "clirun.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <sstream>

namespace fs = std::filesystem;

using pitchloop::testutil::cli;
using pitchloop::testutil::contains;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

std::string slurp(const fs::path& file) {
    std::ifstream in(file, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

/// The demo club's own files, matches 1–8, and the story's focus opened after match 8.
struct DemoWeek {
    fs::path dir = freshTempDir("export-cli");
    std::string db = (dir / "club.sqlite").string();

    DemoWeek() {
        std::vector<std::string> args{"--db", db, "ingest"};
        for (int i = 1; i <= 8; ++i) {
            char name[48];
            std::snprintf(name, sizeof name, "sample-club/matches/KB-2026-%02d.json", i);
            args.push_back(sourcePath(name).string());
        }
        REQUIRE(cli(args).code == 0);
        for (const auto& [verb, file] :
             std::vector<std::pair<std::string, std::string>>{{"targets", "targets.json"},
                                                              {"drills", "drills.json"},
                                                              {"fixtures", "fixtures.csv"}}) {
            const auto r = cli({"--db", db, verb, "import", sourcePath("sample-club/" + file).string()});
            INFO(r.err);
            REQUIRE(r.code == 0);
        }
        const auto r = cli({"--db", db, "focus", "open", "--match", "KB-2026-08", "--metric",
                            "pre_shot_passes_against", "--zone", "2,5", "--drill", "6",
                            "--drill", "7", "--drill", "9", "--by", "D. Arkwright"});
        INFO(r.err);
        REQUIRE(r.code == 0);
    }

    nlohmann::json plan(const std::string& date, int minutes, bool save = false) {
        std::vector<std::string> args{"--db",      db,   "plan",     date,      "--minutes",
                                      std::to_string(minutes), "--players", "18", "--format",
                                      "json"};
        if (save) args.insert(args.end(), {"--save", "--by", "D. Arkwright"});
        const auto r = cli(args);
        INFO(r.err);
        REQUIRE(r.code == 0);
        return nlohmann::json::parse(r.out);
    }
};

} // namespace

TEST_CASE("demo club: a session in the story's week works on the open focus within the day's "
          "limits and explains every pick",
          "[cli][export][demo]") {
    DemoWeek w;
    // Tuesday after match 8 (Sat 26 Sep), four days before match 9: MD-4, the heaviest day.
    const auto p = w.plan("2026-09-29", 90);
    CHECK(p["day"] == "MD-4");
    const int cap = p["cap"];
    int minutes = 0;
    int onFocus = 0;
    for (const auto& b : p["blocks"]) {
        INFO(b.dump());
        CHECK(b["intensity"].get<int>() <= cap);
        CHECK_FALSE(b["why"].get<std::string>().empty());
        minutes += b["minutes"].get<int>();
        if (!b["focus_id"].is_null() && b["focus_id"] == 1) onFocus += b["minutes"].get<int>();
    }
    CHECK(minutes <= 90);
    CHECK(p["minutes_used"] == minutes);
    CHECK(onFocus >= 20); // at least one main drill on the left-back zone
    CHECK(p["blocks"].front()["role"] == "warm_up");
    CHECK(p["blocks"].back()["role"] == "cool_down");
    // The open focus, then zones off target or likely off that no focus covers (watched).
    REQUIRE(p["focus_minutes"].size() >= 2); // the demo has zones likely off that no focus covers
    CHECK(p["focus_minutes"][0]["focus_id"] == 1);
    CHECK(p["focus_minutes"][0]["watched"] == false);
    CHECK(p["focus_minutes"][0]["minutes"] == onFocus);
    for (std::size_t i = 1; i < p["focus_minutes"].size(); ++i) {
        CHECK(p["focus_minutes"][i]["watched"] == true);
        CHECK(p["focus_minutes"][i]["focus_id"] == 0);
        const std::string state = p["focus_minutes"][i]["state"];
        CHECK((state == "off_target" || state == "likely_off"));
    }
    CHECK(contains(p["caution"].get<std::string>(), "qualified staff"));
}

TEST_CASE("sessions lists saved sessions; export calendar writes them with review dates",
          "[cli][export]") {
    DemoWeek w;
    auto r = cli({"--db", w.db, "sessions", "--format", "json"});
    CHECK(r.code == 0);
    CHECK(nlohmann::json::parse(r.out).empty());
    w.plan("2026-09-29", 90, true);
    w.plan("2026-09-30", 75, true);
    r = cli({"--db", w.db, "sessions", "--format", "json"});
    const auto list = nlohmann::json::parse(r.out);
    REQUIRE(list.size() == 2);
    CHECK(list[0]["date"] == "2026-09-29");
    CHECK(list[1]["minutes"] == 75);
    r = cli({"--db", w.db, "sessions", "--from", "2026-09-30"});
    CHECK(contains(r.out, "2026-09-30  MD-3  75 min, 18 players"));
    CHECK_FALSE(contains(r.out, "2026-09-29"));

    const auto ics = w.dir / "week.ics";
    r = cli({"--db", w.db, "export", "calendar", "--out", ics.string()});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(contains(r.err, "wrote 2 sessions and 1 review dates"));
    const std::string text = slurp(ics);
    CHECK(contains(text, "DTSTART:20260929T103000\r\n"));
    CHECK(contains(text, "DTEND:20260929T120000\r\n")); // 90 minutes
    // Review after 5 matches from the focus's start (27 Sep): 3, 10, 14 (midweek), 17 and 24
    // Oct; due the day after the fifth.
    CHECK(contains(text, "DTSTART;VALUE=DATE:20261025\r\n"));
}

TEST_CASE("export statuses and tallies write the CSV the verbs print", "[cli][export]") {
    DemoWeek w;
    const auto file = w.dir / "statuses.csv";
    auto r = cli({"--db", w.db, "export", "statuses", "KB-2026-08", "--out", file.string()});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(slurp(file) == cli({"--db", w.db, "status", "KB-2026-08", "--format", "csv"}).out);
    r = cli({"--db", w.db, "export", "tallies", "--match", "KB-2026-02", "--out", "-"});
    CHECK(r.code == 0);
    CHECK(r.out ==
          cli({"--db", w.db, "tallies", "--format", "csv", "--match", "KB-2026-02"}).out);
    CHECK(r.out.rfind("match_id,metric,band,lane,num,den\r\n", 0) == 0);
}

TEST_CASE("export: bad input is named and writes nothing", "[cli][export]") {
    DemoWeek w;
    const std::string before = dataSnapshot(w.db);
    auto r = cli({"--db", w.db, "export", "statuses", "KB-NOPE", "--out", (w.dir / "x.csv").string()});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "no match 'KB-NOPE'"));
    CHECK_FALSE(fs::exists(w.dir / "x.csv"));

    r = cli({"--db", w.db, "export", "calendar", "--start", "25:00", "--out", "-"});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "--start '25:00': expected a time HH:MM"));
    r = cli({"--db", w.db, "export", "calendar", "--from", "2026-02-30", "--out", "-"});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "--from '2026-02-30': expected a date"));
    r = cli({"--db", w.db, "export", "calendar", "--squad", "Under-21s", "--out", "-"});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "nothing to put in the calendar"));

    // A folder that is not there: a clear message and no stray temporary file.
    const auto missing = w.dir / "no-such-folder" / "t.csv";
    r = cli({"--db", w.db, "export", "tallies", "--out", missing.string()});
    CHECK(r.code == 2);
    CHECK(contains(r.err, missing.string() + ": cannot be written"));
    CHECK_FALSE(fs::exists(missing.parent_path()));

    // An existing file stays as it was when the export fails.
    std::ofstream(w.dir / "keep.pdf") << "old";
    r = cli({"--db", w.db, "export", "sheet", "2026-09-29", "--out", (w.dir / "keep.pdf").string()});
    CHECK(r.code == 2); // no session saved that day
    CHECK(contains(r.err, "2026-09-29"));
    CHECK(slurp(w.dir / "keep.pdf") == "old");
    r = cli({"--db", w.db, "export", "sheet", "2026-09-29", "--out", "-"});
    CHECK(r.code == 2);
    CHECK(contains(r.err, "a PDF needs a file name"));
    CHECK(dataSnapshot(w.db) == before);
}

TEST_CASE("export sheet and debrief write PDFs", "[cli][export]") {
    DemoWeek w;
    w.plan("2026-09-29", 90, true);
    const auto sheet = w.dir / "sheet.pdf";
    auto r = cli({"--db", w.db, "export", "sheet", "2026-09-29", "--out", sheet.string()});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(slurp(sheet).rfind("%PDF-", 0) == 0);
    const auto debrief = w.dir / "debrief.pdf";
    r = cli({"--db", w.db, "export", "debrief", "KB-2026-08", "--out", debrief.string()});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(slurp(debrief).rfind("%PDF-", 0) == 0);
}
