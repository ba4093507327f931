// `fixtures` and `plan` on the command line, on the first eight demo matches (the planted story:
// opponents' pre-shot passes through our band 2, lane 5). The verbs are registered on an app of
// their own here, beside the in-process `run` for ingest, targets and focuses.

#include "commands.h"
#include "drills.h"
#include "plan_verbs.h"
#include "repository.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <nlohmann/json.hpp>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;
using namespace pitchloop;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

struct Run {
    int code = -1;
    std::string out;
    std::string err;
};

std::vector<char*> argvOf(std::vector<std::string>& args) {
    std::vector<char*> argv;
    for (auto& a : args)
        argv.push_back(a.data());
    argv.push_back(nullptr);
    return argv;
}

/// The whole command line (ingest, targets, focus).
Run cli(std::vector<std::string> args) {
    args.insert(args.begin(), "pitchloop");
    auto argv = argvOf(args);
    std::ostringstream out, err;
    Run r;
    r.code = cli::run(static_cast<int>(args.size()), argv.data(), out, err);
    r.out = out.str();
    r.err = err.str();
    return r;
}

/// `fixtures` and `plan` on an app of their own, with the same --db option and error handling.
Run planCli(std::vector<std::string> args) {
    CLI::App app{"pitchloop"};
    app.require_subcommand(1);
    cli::Globals g;
    app.add_option("--db", g.db);
    cli::PlanVerbs verbs(app);
    args.insert(args.begin(), "pitchloop");
    auto argv = argvOf(args);
    std::ostringstream out, err;
    Run r;
    try {
        app.parse(static_cast<int>(args.size()), argv.data());
        REQUIRE(verbs.chosen());
        r.code = verbs.run(g, out, err);
    } catch (const CLI::ParseError& e) {
        app.exit(e, out, err);
        r.code = cli::kExitBadInput;
    } catch (const std::exception& e) {
        err << "error: " << e.what() << "\n";
        r.code = cli::kExitFault;
    }
    r.out = out.str();
    r.err = err.str();
    return r;
}

bool has(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

void write(const fs::path& file, const std::string& text) {
    std::ofstream(file, std::ios::binary) << text;
}

/// A club file with the first eight demo matches, the demo targets, a focus on band 2 lane 5
/// and a small drill book.
struct PlanClub {
    fs::path dir = freshTempDir("plan-cli");
    std::string db = (dir / "club.sqlite").string();
    std::int64_t warm = 0, cool = 0, channel = 0, possession = 0;

    PlanClub() {
        ::setenv("PITCHLOOP_TODAY", "2026-09-30", 1);
        std::vector<std::string> args{"--db", db, "ingest"};
        for (int i = 1; i <= 8; ++i) {
            char name[32];
            std::snprintf(name, sizeof name, "KB-2026-%02d.json", i);
            args.push_back(sourcePath(std::string("sample-club/matches/") + name).string());
        }
        REQUIRE(cli(args).code == 0);
        REQUIRE(
            cli({"--db", db, "targets", "import", sourcePath("sample-club/targets.json").string()})
                .code == 0);
        {
            model::ClubRepository repo(db);
            model::DrillBook book(repo);
            auto add = [&](const std::string& title, int minutes, int intensity,
                           std::vector<std::string> metrics, std::vector<model::Zone> zones,
                           std::vector<std::string> tags) {
                model::Drill d;
                d.title = title;
                d.durationMin = minutes;
                d.intensity = intensity;
                d.playersMin = 8;
                d.playersMax = 22;
                d.metrics = std::move(metrics);
                d.zones = std::move(zones);
                d.tags = std::move(tags);
                d.author = "R. Tamsin";
                const auto c = book.add(d, "R. Tamsin", "2026-09-01T08:00:00Z");
                REQUIRE(c.ok());
                return c.id;
            };
            warm = add("Rondo warm-up", 10, 2, {}, {}, {"warm_up"});
            cool = add("Walk and stretch", 10, 1, {}, {}, {"cool_down"});
            channel =
                add("Defend the left channel", 20, 4, {"pre_shot_passes_against"}, {{2, 5}}, {});
            possession = add("Possession 8v8", 20, 3, {}, {}, {});
        }
        REQUIRE(cli({"--db", db, "focus", "open", "--match", "KB-2026-08", "--metric",
                     "pre_shot_passes_against", "--zone", "2,5", "--by", "D. Arkwright"})
                    .code == 0);
        // The demo season plays on Saturdays from 2026-08-08.
        write(dir / "autumn.csv", "date,kickoff,opponent,venue,competition\n"
                                  "2026-09-26,15:00,Harbour Rovers,home,League\n"
                                  "2026-10-03,15:00,Quarry Town,away,League\n"
                                  "2026-10-10,15:00,Mill End,home,League\n");
    }
};

} // namespace

TEST_CASE("fixtures import, list, next and caps", "[cli][fixtures]") {
    PlanClub club;
    auto r = planCli({"--db", club.db, "fixtures", "import", (club.dir / "autumn.csv").string()});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(r.err == "3 added, 0 updated, 0 unchanged, 1 linked to stored matches\n"); // KB-2026-08

    r = planCli({"--db", club.db, "fixtures", "list", "--format", "json"});
    REQUIRE(r.code == 0);
    const auto j = nlohmann::json::parse(r.out);
    REQUIRE(j["fixtures"].size() == 3);
    CHECK(j["fixtures"][0]["match_id"] == "KB-2026-08");
    CHECK(j["fixtures"][1]["match_id"].is_null());

    r = planCli({"--db", club.db, "fixtures", "next", "--date", "2026-09-30"});
    REQUIRE(r.code == 0);
    CHECK(has(r.out, "2026-09-30: MD-3, intensity cap 4 (high)"));
    CHECK(has(r.out, "next:     in 3 days"));
    CHECK(has(r.out, "Quarry Town"));

    // A midweek cup tie makes the week congested.
    r = planCli({"--db", club.db, "fixtures", "add", "--date", "2026-10-07", "--opponent",
                 "Dockside", "--venue", "away", "--kickoff", "19:45", "--competition", "Cup"});
    REQUIRE(r.code == 0);
    r = planCli({"--db", club.db, "fixtures", "next", "--date", "2026-10-05"});
    CHECK(has(r.out, "2026-10-05: MD+2 / MD-2 (congested week), intensity cap 3 (moderate)"));

    r = planCli({"--db", club.db, "fixtures", "caps", "--set", R"({"md_minus": [2, 3, 3, 4]})"});
    REQUIRE(r.code == 0);
    std::istringstream lines(r.out);
    std::string line, md3;
    while (std::getline(lines, line))
        if (line.rfind("  MD-3 ", 0) == 0) md3 = line;
    CHECK(md3.ends_with(" 3 moderate"));
    r = planCli({"--db", club.db, "fixtures", "next", "--date", "2026-09-30"});
    CHECK(has(r.out, "intensity cap 3 (moderate)"));
    r = planCli({"--db", club.db, "fixtures", "caps", "--set", R"({"md": 9})"});
    CHECK(r.code == 2);
    CHECK(has(r.err, "--set: md: expected a whole number from 0 (no session) to 5"));
}

TEST_CASE("a fixtures file with a problem imports nothing", "[cli][fixtures]") {
    PlanClub club;
    write(club.dir / "bad.csv", "date,kickoff,opponent,venue,competition\n"
                                "2026-10-03,15:00,Quarry Town,away,League\n"
                                "2026-10-10,15:00,Mill End,Home,League\n");
    const std::string before = dataSnapshot(club.db);
    const auto r =
        planCli({"--db", club.db, "fixtures", "import", (club.dir / "bad.csv").string()});
    CHECK(r.code == 2);
    CHECK(has(r.err, "bad.csv: line 3.venue: 'Home' is not one of home, away, neutral"));
    CHECK(has(r.err, "no fixture imported"));
    CHECK(dataSnapshot(club.db) == before);
}

TEST_CASE("plan a session for the open focus, save it, and plan the next day", "[cli][plan]") {
    PlanClub club;
    REQUIRE(
        planCli({"--db", club.db, "fixtures", "import", (club.dir / "autumn.csv").string()}).code ==
        0);

    auto r = planCli({"--db", club.db, "plan", "2026-09-30", "--minutes", "60", "--players", "16",
                      "--save", "--by", "R. Tamsin"});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(has(r.out, "Session 2026-09-30 for First team: MD-3, cap 4 (high), 60 of 60 minutes"));
    // The focus's zone was far over its target of at most 2 a match at KB-2026-08.
    CHECK(has(r.out, "focus 1, Their passes before their shots · our left-back area (B2·L5): "));
    CHECK(has(r.out, "against at most 2 a match"));
    CHECK(has(r.out, "— this drill works on Their passes before their shots in the focus's zones"));
    CHECK(has(r.out, "This plan is advice. Load, injury and return-to-play decisions belong to "
                     "the club's qualified staff and follow local rules."));
    CHECK(has(r.err, "saved the session of 2026-09-30"));

    // Thursday (MD-2, cap 3): yesterday's main drill is left out unless pinned, and the
    // channel drill (intensity 4) is above the cap: only the warm-up and cool-down routines
    // (which may repeat) are left, and the plan says what the drill book lacks.
    r = planCli({"--db", club.db, "plan", "2026-10-01", "--minutes", "45", "--players", "16"});
    CHECK(r.code == 0);
    CHECK(has(r.out, "Note: 20 of 45 minutes planned: the drill book has no other main drill that "
                     "fits today (of its 2 other main drills: 1 above the cap of 3 for MD-2, 1 done "
                     "yesterday). A main drill of intensity 3 or less for 16 players, up to 25 "
                     "minutes long, would fill it."));
    r = planCli({"--db", club.db, "plan", "2026-10-01", "--minutes", "45", "--players", "16",
                 "--pin", std::to_string(club.warm), "--pin", std::to_string(club.cool), "--format",
                 "json"});
    REQUIRE(r.code == 0);
    const auto j = nlohmann::json::parse(r.out);
    CHECK(j["day"] == "MD-2");
    CHECK(j["cap"] == 3);
    REQUIRE(j["blocks"].size() == 2); // possession was done yesterday too
    CHECK(j["blocks"][0]["pinned"] == true);
    CHECK(j["focus_minutes"][0]["minutes"] == 0);
    CHECK(j["caution"].get<std::string>().find("qualified staff") != std::string::npos);

    // Swap on Wednesday: possession out, nothing else fits in its place (the channel drill is
    // already in); the plan is shorter.
    r = planCli({"--db", club.db, "plan", "2026-09-30", "--minutes", "60", "--players", "16",
                 "--swap", std::to_string(club.possession) + ":" + std::to_string(club.channel),
                 "--format", "json"});
    REQUIRE(r.code == 0);
    CHECK(nlohmann::json::parse(r.out)["minutes_used"] == 40);
}

TEST_CASE("plan: bad input gives a clear message and saves nothing", "[cli][plan]") {
    PlanClub club;
    REQUIRE(
        planCli({"--db", club.db, "fixtures", "import", (club.dir / "autumn.csv").string()}).code ==
        0);
    const std::string before = dataSnapshot(club.db);
    auto refused = [&](std::vector<std::string> args, const std::string& message) {
        args.insert(args.begin(), {"--db", club.db, "plan"});
        const auto r = planCli(args);
        INFO(r.err);
        CHECK(r.code == 2);
        CHECK(has(r.err, message));
        CHECK(dataSnapshot(club.db) == before);
    };
    refused({"2026-09-30", "--minutes", "15", "--players", "16", "--save", "--by", "X"},
            "a 15-minute session is shorter than the shortest warm-up (10 min");
    refused({"2026-09-30", "--minutes", "60", "--players", "0", "--save", "--by", "X"},
            "no players are available (got 0)");
    refused({"2027-09-29", "--minutes", "60", "--players", "16", "--save", "--by", "X"},
            "season 2027-28 has no fixtures");
    refused({"2026-10-03", "--minutes", "60", "--players", "16", "--save", "--by", "X"},
            "2026-10-03 is match day (away against Quarry Town)");
    refused({"2026-10-02", "--minutes", "60", "--players", "16", "--remove",
             std::to_string(club.warm), "--save", "--by", "X"},
            "no warm-up fits");
    refused({"2026-09-30", "--minutes", "60", "--players", "16", "--save"},
            "--save needs --by NAME");
    refused({"2026-09-30", "--minutes", "60", "--players", "16", "--swap", "3-4"},
            "--swap 3-4: expected OUT:IN");
    refused({"30/09/2026", "--minutes", "60", "--players", "16"},
            "'30/09/2026' is not a date YYYY-MM-DD");
}

TEST_CASE("sessions mark: held, changed and cancelled, with refusals that record nothing", "[cli][plan]") {
    PlanClub club; // today is 2026-09-30
    REQUIRE(planCli({"--db", club.db, "fixtures", "import", (club.dir / "autumn.csv").string()}).code == 0);
    REQUIRE(planCli({"--db", club.db, "plan", "2026-09-30", "--minutes", "60", "--players", "16", "--save", "--by",
                     "R. Tamsin"})
                .code == 0);
    auto r = planCli({"--db", club.db, "sessions", "mark", "2026-10-01", "--outcome", "held", "--players", "16",
                      "--by", "R. Tamsin"});
    CHECK(r.code == 2);
    CHECK(has(r.err, "no saved session of First team on 2026-10-01"));
    r = planCli({"--db", club.db, "sessions", "mark", "2026-09-30", "--outcome", "held", "--by", "R. Tamsin"});
    CHECK(r.code == 2);
    CHECK(has(r.err, "players: expected how many players took part, 1 or more (got 0)"));
    CHECK(has(r.err, "nothing recorded"));
    r = planCli({"--db", club.db, "sessions", "mark", "2026-09-30", "--outcome", "held", "--players", "15", "--by",
                 "R. Tamsin"});
    REQUIRE(r.code == 0);
    CHECK(has(r.out, "recorded the session of 2026-09-30 as held"));
    auto listed = nlohmann::json::parse(planCli({"--db", club.db, "sessions", "--format", "json"}).out);
    REQUIRE(listed.size() == 1);
    CHECK(listed[0]["outcome"] == "held");
    CHECK(listed[0]["players_present"] == 15);
    CHECK(listed[0]["recorded_by"] == "R. Tamsin");
    const std::size_t blocks = listed[0]["blocks"].size();
    std::vector<std::string> args{"--db", club.db, "sessions", "mark", "2026-09-30", "--outcome", "changed",
                                  "--players", "14", "--by", "R. Tamsin", "--minutes"};
    for (std::size_t i = 0; i < blocks; ++i) args.push_back(i == 1 ? "0" : "10");
    REQUIRE(planCli(args).code == 0);
    listed = nlohmann::json::parse(planCli({"--db", club.db, "sessions", "--format", "json"}).out);
    CHECK(listed[0]["outcome"] == "changed");
    CHECK(listed[0]["held_minutes"][1] == 0);
    r = planCli({"--db", club.db, "sessions", "mark", "2026-09-30", "--outcome", "cancelled", "--by", "R. Tamsin"});
    REQUIRE(r.code == 0);
    listed = nlohmann::json::parse(planCli({"--db", club.db, "sessions", "--format", "json"}).out);
    CHECK(listed[0]["outcome"] == "cancelled");
    CHECK(listed[0]["players_present"].is_null());
}
