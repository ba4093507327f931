// `focus` and `review` on the command line, on the first matches of the demo season (the
// planted story: opponents' pre-shot passes through our band 2, lane 5 in matches 1–8).

#include "clirun.h"
#include "commands.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cstdlib>
#include <filesystem>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;
using pitchloop::testutil::cli;
using pitchloop::testutil::CliRun;
using pitchloop::testutil::contains;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

/// A club file with the first `n` demo matches and the demo targets.
struct DemoClub {
    fs::path dir = freshTempDir("focus");
    std::string db = (dir / "club.sqlite").string();
    explicit DemoClub(int n) {
        ::setenv("PITCHLOOP_TODAY", "2026-12-01", 1);
        std::vector<std::string> args{"--db", db, "ingest"};
        for (int i = 1; i <= n; ++i) {
            char name[32];
            std::snprintf(name, sizeof name, "KB-2026-%02d.json", i);
            args.push_back(sourcePath(std::string("sample-club/matches/") + name).string());
        }
        REQUIRE(cli(args).code == 0);
        REQUIRE(cli({"--db", db, "targets", "import",
                     sourcePath("sample-club/targets.json").string()})
                    .code == 0);
    }
    ~DemoClub() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
};

} // namespace

TEST_CASE("a focus opened from the planted slip and reviewed after five matches", "[cli]") {
    DemoClub club(13);
    const auto open = cli({"--db", club.db, "focus", "open", "--match", "KB-2026-08", "--metric",
                           "pre_shot_passes_against", "--zone", "2,5", "--by", "D. Arkwright",
                           "--note", "rechts überladen — ⚽", "--min-change", "1.5"});
    REQUIRE(open.code == 0);
    CHECK(open.out == "1\n");
    // The zone was off target at that match, so no "opened anyway" note.
    CHECK_FALSE(contains(open.err, "opened anyway"));

    const auto show = cli({"--db", club.db, "focus", "show", "1"});
    REQUIRE(show.code == 0);
    CHECK(contains(show.out, "off target"));       // the frozen evidence
    CHECK(contains(show.out, "rechts überladen — ⚽")); // the note, byte for byte

    const auto list = cli({"--db", club.db, "focus", "list", "--format", "json"});
    const auto focuses = nlohmann::json::parse(list.out);
    REQUIRE(focuses.size() == 1);
    // Matches 9–13 are on or after 2026-09-27: five, so the review point is reached.
    CHECK(focuses[0]["matches_since_start"] == 5);
    CHECK(focuses[0]["state"] == "due_for_review");

    const auto review = cli({"--db", club.db, "review", "1", "--format", "json"});
    REQUIRE(review.code == 0);
    const auto r = nlohmann::json::parse(review.out);
    // The flag was raised over the last five matches (KB-2026-04 … 08): they are left out, and
    // the baseline is what came before them, KB-2026-01 … 03.
    CHECK(r["trigger"]["matches"].size() == 5);
    CHECK(r["trigger"]["matches"][0]["match_id"] == "KB-2026-04");
    CHECK(r["before"]["matches"].size() == 3);
    CHECK(r["before"]["matches"][0]["match_id"] == "KB-2026-01");
    CHECK(r["after"]["matches"][4]["match_id"] == "KB-2026-13");
    CHECK(contains(r["baseline_note"].get<std::string>(), "only 3 of the 5 wanted"));
    CHECK(contains(r["test"].get<std::string>(), "difference in differences"));
    // The story's slip runs from match 1 and eases from match 9 on: fewer passes after than in
    // the baseline, read against the rest of the pitch and with match-to-match variation.
    CHECK(r["after"]["num"].get<long>() < r["before"]["num"].get<long>() * 5 / 3);
    CHECK(r["dispersion"].get<double>() > 0);
    CHECK(r["prob_improved"].get<double>() > 0.5);
    CHECK(r["target"]["value"] == 2.0);
    CHECK(r["min_change"] == 1.5); // the coach's, stored with the focus
    CHECK(r["chart"]["points"].size() == 13);
    CHECK(r["training_minutes"] == 0); // no training session saved in this club file

    // Recording the verdict stores these numbers; the review then shows them as stored.
    const auto verdict = cli({"--db", club.db, "review", "1", "--verdict", "worked", "--by",
                              "D. Arkwright", "--note", "left side holds"});
    REQUIRE(verdict.code == 0);
    const auto stored = cli({"--db", club.db, "review", "1", "--format", "json"});
    CHECK(nlohmann::json::parse(stored.out) == r);
    const auto again = cli({"--db", club.db, "review", "1", "--verdict", "partly", "--by", "X"});
    CHECK(again.code == 2);
    CHECK(contains(again.err, "was closed"));
}

TEST_CASE("focus and review refuse bad input and change nothing", "[cli]") {
    DemoClub club(10);
    const std::string before = dataSnapshot(club.db);
    auto refused = [&](std::vector<std::string> args, const std::string& message) {
        args.insert(args.begin(), {"--db", club.db});
        const auto r = cli(args);
        CHECK(r.code == 2);
        CHECK(contains(r.err, message));
    };
    refused({"review", "9"}, "no focus 9");
    refused({"focus", "show", "9"}, "no focus 9");
    refused({"focus", "open", "--match", "KB-2026-99", "--metric", "losses", "--zone", "2,5",
             "--by", "X"},
            "no match 'KB-2026-99'");
    refused({"focus", "open", "--match", "KB-2026-08", "--metric", "losses", "--zone", "9,9",
             "--by", "X"},
            "--zone 9,9");
    refused({"focus", "open", "--match", "KB-2026-08", "--metric", "losses", "--zone", "2,5",
             "--drill", "42", "--by", "X"},
            "no drill 42");
    refused({"focus", "open", "--match", "KB-2026-08", "--metric", "losses", "--zone", "2,5",
             "--start", "2026-09-01", "--by", "X"},
            "starts after the match");
    CHECK(dataSnapshot(club.db) == before);

    // With 10 matches stored only two follow the start (2026-09-27): the review says how many
    // are missing, and nothing is recorded.
    REQUIRE(cli({"--db", club.db, "focus", "open", "--match", "KB-2026-08", "--metric",
                 "pre_shot_passes_against", "--zone", "2,5", "--by", "X"})
                .code == 0);
    const std::string opened = dataSnapshot(club.db);
    const auto early = cli({"--db", club.db, "review", "1", "--verdict", "worked", "--by", "X"});
    CHECK(early.code == 2);
    CHECK(contains(early.err, "2 have been played (3 missing)"));
    CHECK(dataSnapshot(club.db) == opened);
    refused({"review", "1", "--after", "3", "--before", "9"}, "2 have been played (1 missing)");
}

TEST_CASE("after a grid change a focus keeps its zones and its review's numbers", "[cli]") {
    DemoClub club(13);
    REQUIRE(cli({"--db", club.db, "focus", "open", "--match", "KB-2026-08", "--metric",
                 "pre_shot_passes_against", "--zone", "2,5", "--by", "D. Arkwright"})
                .code == 0);
    const auto before = cli({"--db", club.db, "review", "1", "--format", "json"});
    REQUIRE(before.code == 0);

    const auto moved = cli({"--db", club.db, "settings", "grid", "markings:6", "--by", "A. Coach"});
    INFO(moved.out << moved.err);
    REQUIRE(moved.code == 0);
    CHECK(contains(moved.out, "1 focus keeps the zones it was opened on"));

    // Counted from the events on the focus's own grid: the same numbers to the last digit.
    const auto after = cli({"--db", club.db, "review", "1", "--format", "json"});
    REQUIRE(after.code == 0);
    CHECK(nlohmann::json::parse(after.out) == nlohmann::json::parse(before.out));
    const auto show = cli({"--db", club.db, "focus", "show", "1"});
    CHECK(contains(show.out, "of equal:6x5 (the grid it was opened on)"));

    // The rest of the loop works on the new grid.
    const auto debrief = cli({"--db", club.db, "debrief", "KB-2026-13"});
    CHECK(debrief.code == 0);
    const auto status = cli({"--db", club.db, "status", "KB-2026-13", "--format", "csv"});
    CHECK(status.code == 0);
    CHECK(contains(status.out, "pre_shot_passes_against"));
    REQUIRE(cli({"--db", club.db, "fixtures", "import",
                 sourcePath("sample-club/fixtures.csv").string()})
                .code == 0);
    REQUIRE(cli({"--db", club.db, "drills", "import",
                 sourcePath("sample-club/drills.json").string()})
                .code == 0);
    const auto plan = cli({"--db", club.db, "plan", "2026-11-10", "--minutes", "90", "--players", "18"});
    INFO(plan.out << plan.err);
    CHECK(plan.code == 0);
    CHECK(contains(plan.out + plan.err, "was opened on equal:6x5"));
}
