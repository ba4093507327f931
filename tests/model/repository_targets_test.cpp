// The club file's targets, seasons of tallies and flag settings (model/repository.h). The
// base match is tests/data/minimal-match.json (KB-TEST-01, 2026-07-18, Kestrel Bay).

#include "ingest.h"
#include "matchreader.h"
#include "repository.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <catch2/catch.hpp>
#include <filesystem>
#include <functional>
#include <nlohmann/json.hpp>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using nlohmann::json;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

struct TempClub {
    fs::path dir = freshTempDir("repository-targets");
    std::string file = (dir / "club.sqlite").string();
    ~TempClub() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
};

long long count(const std::string& file, const std::string& sql) {
    SQLite::Database db(file, SQLite::OPEN_READONLY);
    return db.execAndGet(sql).getInt64();
}

std::string minimalBytes() {
    return readFileBytes(sourcePath("tests/data/minimal-match.json"));
}

/// minimal-match.json under another id and date.
std::string matchOn(const std::string& id, const std::string& date) {
    json j = json::parse(minimalBytes());
    j["match"]["id"] = id;
    j["match"]["date"] = date;
    return j.dump();
}

Target makeTarget(const std::string& squad, const std::string& season, const std::string& metric,
                  int band, int lane, double value, const std::string& from,
                  const std::string& recorded = "") {
    Target t;
    t.key = {squad, season, metric, band, lane};
    t.direction = metric == "pre_shot_passes_against" ? Direction::AtMost : Direction::AtLeast;
    t.value = value;
    t.watchMargin = 0.05;
    t.minSample = 30;
    t.author = "R. Tamsin";
    t.rationale = "invented for a test";
    t.effectiveFrom = from;
    t.recordedAt = recorded;
    return t;
}

void checkSame(const Target& got, const Target& expected) {
    CHECK(got.key == expected.key);
    CHECK(got.direction == expected.direction);
    CHECK(got.value == expected.value);
    CHECK(got.watchMargin == expected.watchMargin);
    CHECK(got.minSample == expected.minSample);
    CHECK(got.author == expected.author);
    CHECK(got.rationale == expected.rationale);
    CHECK(got.effectiveFrom == expected.effectiveFrom);
    CHECK(got.retired == expected.retired);
}

} // namespace

TEST_CASE("stored targets read back per squad and season", "[repository]") {
    ClubRepository repo(":memory:");
    Target a = makeTarget("First team", "2026-27", "regain_5s", 5, 1, 0.55, "2026-07-01",
                          "2026-07-20T10:00:00Z");
    Target b = makeTarget("First team", "2026-27", "pre_shot_passes_against", 0, 0, 30.0,
                          "2026-07-01");
    b.watchMargin = 3.0;
    b.minSample = 3;
    b.rationale = "it's \"fewer\"; not more";
    Target c = makeTarget("Under-21s", "2026-27", "regain_5s", 5, 1, 0.4, "2026-07-01");
    Target d = makeTarget("First team", "2027-28", "regain_5s", 5, 1, 0.6, "2027-07-01");
    d.retired = true;
    const auto ids = repo.addTargets({a, b, c, d}, "2026-07-21T09:00:00Z");
    REQUIRE(ids.size() == 4);
    CHECK(ids[0] < ids[1]);
    CHECK(ids[1] < ids[2]);
    CHECK(ids[2] < ids[3]);

    const auto first = repo.targets("First team", "2026-27");
    REQUIRE(first.size() == 2);
    checkSame(first[0], a);
    checkSame(first[1], b);
    CHECK(first[0].version == ids[0]);
    CHECK(first[1].version == ids[1]);
    CHECK(first[0].recordedAt == "2026-07-20T10:00:00Z"); // kept as given
    CHECK(first[1].recordedAt == "2026-07-21T09:00:00Z"); // filled with `now`

    const auto u21 = repo.targets("Under-21s", "2026-27");
    REQUIRE(u21.size() == 1);
    checkSame(u21[0], c);
    const auto next = repo.targets("First team", "2027-28");
    REQUIRE(next.size() == 1);
    checkSame(next[0], d);
    CHECK(next[0].retired);
    CHECK(repo.targets("First team", "2025-26").empty());
    CHECK(repo.targets("Reserves", "2026-27").empty());

    const auto all = repo.allTargets();
    REQUIRE(all.size() == 4);
    for (std::size_t i = 0; i < 4; ++i) CHECK(all[i].version == ids[i]);
    CHECK(repo.seasons("First team") == std::vector<std::string>{"2026-27", "2027-28"});

    SECTION("a season name that is not one is refused and nothing is stored") {
        Target bad = a;
        bad.key.season = "2026";
        CHECK_THROWS_AS(repo.addTargets({a, bad}, "2026-07-21T09:00:00Z"), StorageError);
        CHECK(repo.allTargets().size() == 4);
        Target wrongYears = a;
        wrongYears.key.season = "2026-28";
        CHECK_THROWS_AS(repo.addTargets({wrongYears}, "2026-07-21T09:00:00Z"), StorageError);
        CHECK_THROWS_AS(repo.ensureSeason("First team", "next"), StorageError);
        CHECK(repo.allTargets().size() == 4);
    }
}

TEST_CASE("targets set before any match make the club, squad and season; the first match "
          "names the club",
          "[repository]") {
    TempClub club;
    {
        ClubRepository repo(club.file);
        repo.addTargets({makeTarget("First team", "2026-27", "regain_5s", 0, 0, 0.4, "2026-07-01")},
                        "2026-06-15T09:00:00Z");
        CHECK(repo.clubName().empty());
        CHECK(repo.matches().empty());
        CHECK(repo.seasons("First team") == std::vector<std::string>{"2026-27"});
    }
    CHECK(count(club.file, "SELECT count(*) FROM club WHERE name = ''") == 1);
    CHECK(count(club.file, "SELECT count(*) FROM squad WHERE name = 'First team'") == 1);
    // The season runs July to June.
    CHECK(count(club.file, "SELECT count(*) FROM season WHERE name = '2026-27' AND "
                           "starts = '2026-07-01' AND ends = '2027-06-30'") == 1);

    ClubRepository repo(club.file);
    const auto report = ingestBytes(repo, minimalBytes(), "minimal-match.json");
    INFO(describeAll(report.errors));
    REQUIRE(report.status == IngestStatus::Added);
    CHECK(repo.clubName() == "Kestrel Bay");
    // The match went into the season made for the targets: still one club, squad and season.
    CHECK(count(club.file, "SELECT count(*) FROM club") == 1);
    CHECK(count(club.file, "SELECT count(*) FROM squad") == 1);
    CHECK(count(club.file, "SELECT count(*) FROM season") == 1);
    const auto where = repo.seasonOfMatch("KB-TEST-01");
    REQUIRE(where);
    CHECK(where->first == "First team");
    CHECK(where->second == "2026-27");
    CHECK(repo.targets("First team", "2026-27").size() == 1);
    const auto season = repo.seasonTallies("First team", "2026-27");
    CHECK(season.matchIds == std::vector<std::string>{"KB-TEST-01"});
}

TEST_CASE("an edit adds a version and keeps the old one", "[repository]") {
    ClubRepository repo(":memory:");
    const Target v1 = makeTarget("First team", "2026-27", "pass_completion", 3, 3, 0.85,
                                 "2026-07-01", "2026-07-20T10:00:00Z");
    const auto id1 = repo.addTargets({v1}, "2026-07-20T10:00:00Z").at(0);
    Target v2 = v1;
    v2.value = 0.8;
    v2.effectiveFrom = "2026-10-01";
    v2.recordedAt = "2026-09-29T16:00:00Z";
    v2.author = "P. Okafor";
    const auto id2 = repo.addTargets({v2}, "2026-09-29T16:00:00Z").at(0);
    CHECK(id2 > id1);

    const auto versions = repo.targets("First team", "2026-27");
    REQUIRE(versions.size() == 2);
    checkSame(versions[0], v1); // unchanged
    checkSame(versions[1], v2);
    REQUIRE(inForce(versions, "2026-09-30"));
    CHECK(inForce(versions, "2026-09-30")->version == id1);
    CHECK(inForce(versions, "2026-10-01")->version == id2);
}

TEST_CASE("a schema-2 club file is migrated to the current version, keeps its data and gains "
          "targets",
          "[repository]") {
    TempClub club;
    {
        SQLite::Database db(club.file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        ClubRepository::migrate(db, 2);
        REQUIRE(db.execAndGet("PRAGMA user_version").getInt() == 2);
        REQUIRE(db.tableExists("setting"));
        REQUIRE_FALSE(db.tableExists("target"));
        db.exec(R"sql(
INSERT INTO club(id, name) VALUES (1, 'Kestrel Bay');
INSERT INTO squad(id, club_id, name) VALUES (1, 1, 'First team');
INSERT INTO season(id, squad_id, name, starts, ends)
  VALUES (1, 1, '2026-27', '2026-07-01', '2027-06-30');
INSERT INTO match(id, code, season_id, date, competition, venue, us, opponent, goals_us,
                  goals_opp, length_m, width_m, source_frame, extra, source_name, source_hash,
                  ingested_at)
  VALUES (1, 'KB-V2-01', 1, '2026-08-01', 'Friendly', 'home', 'Kestrel Bay', 'Brindle Vale',
          2, 0, 105, 68, 'acting', NULL, 'v2.json', '00000000000000aa', '2026-08-02T09:00:00Z');
INSERT INTO period(match_id, n, length_s) VALUES (1, 1, 2700), (1, 2, 2700);
INSERT INTO event(match_id, seq, file_index, period, t, side, player, type, result, x, y,
                  to_x, to_y, tags, extra) VALUES
  (1, 0, 0, 1, 10.0, 'us', '8', 'pass', 'ok', 60.0, 20.0, 75.0, 30.0, NULL, NULL);
INSERT INTO setting(key, value) VALUES ('kb_note', 'kept');
)sql");
    }

    ClubRepository repo(club.file);
    CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
    CHECK(repo.clubName() == "Kestrel Bay");
    const auto summary = repo.matchSummary("KB-V2-01");
    REQUIRE(summary);
    CHECK(summary->opponent == "Brindle Vale");
    CHECK(summary->goalsUs == 2);
    CHECK(summary->source.name == "v2.json");
    CHECK(summary->source.hash == "00000000000000aa");
    CHECK(summary->eventCount == 1);
    CHECK(count(club.file, "SELECT count(*) FROM setting WHERE key = 'kb_note' AND "
                           "value = 'kept'") == 1);
    CHECK(repo.tallyGrid() == ZoneGrid{});
    {
        SQLite::Database raw(club.file, SQLite::OPEN_READONLY);
        CHECK(raw.tableExists("target"));
    }
    // The new table is empty and takes targets for the season already there.
    CHECK(repo.allTargets().empty());
    repo.addTargets({makeTarget("First team", "2026-27", "pass_completion", 3, 3, 0.85,
                                "2026-07-01")},
                    "2026-08-03T09:00:00Z");
    CHECK(repo.targets("First team", "2026-27").size() == 1);
    CHECK(count(club.file, "SELECT count(*) FROM season") == 1);
    // The old match has tallies of the built-in metrics: one completed pass from (60, 20),
    // band 4 (52.5 ≤ 60 < 70), lane 2 (13.6 ≤ 20 < 27.2) of the 6 × 5 grid on 105 × 68.
    const MatchTally completion = repo.matchTally("KB-V2-01", "pass_completion");
    CHECK(completion[static_cast<std::size_t>(ZoneGrid{}.indexOf({4, 2}))] == ZoneTally{1, 1});
}

TEST_CASE("seasonTallies gives a season's matches in date order with dense tallies",
          "[repository]") {
    ClubRepository repo(":memory:");
    // Ingested out of date order; one match in the season before, one of another squad.
    IngestOptions u21;
    u21.squad = "Under-21s";
    for (auto [bytes, options] :
         {std::pair{minimalBytes(), IngestOptions{}},                       // 2026-07-18
          std::pair{matchOn("KB-TEST-03", "2026-08-01"), IngestOptions{}}, // 2026-08-01
          std::pair{matchOn("KB-TEST-02", "2026-07-11"), IngestOptions{}}, // 2026-07-11
          std::pair{matchOn("KB-TEST-00", "2026-05-02"), IngestOptions{}}, // season 2025-26
          std::pair{matchOn("KB-U21-01", "2026-07-25"), u21}}) {
        const auto r = ingestBytes(repo, bytes, "m.json", options);
        INFO(describeAll(r.errors));
        REQUIRE(r.status == IngestStatus::Added);
    }
    const SeasonTallies s = repo.seasonTallies("First team", "2026-27");
    CHECK(s.matchIds == std::vector<std::string>{"KB-TEST-02", "KB-TEST-01", "KB-TEST-03"});
    CHECK(s.dates == std::vector<std::string>{"2026-07-11", "2026-07-18", "2026-08-01"});
    REQUIRE(s.byMetric.size() == repo.metrics().size());
    for (const auto& metric : repo.metrics()) {
        INFO(metric.id);
        REQUIRE(s.byMetric.count(metric.id));
        const auto& perMatch = s.byMetric.at(metric.id);
        REQUIRE(perMatch.size() == 3);
        for (std::size_t i = 0; i < 3; ++i) {
            INFO(s.matchIds[i]);
            CHECK(perMatch[i].size() == 30);
            CHECK(perMatch[i] == repo.matchTally(s.matchIds[i], metric.id));
        }
    }
    // A hand-worked value (tests/app/cli_test.cpp): the minimal match's two losses are in
    // (3, 5) and (4, 2); a per-match count has den 1 in every zone, also where num is 0.
    const MatchTally& losses = s.byMetric.at("losses")[1];
    CHECK(losses[static_cast<std::size_t>(ZoneGrid{}.indexOf({3, 5}))] == ZoneTally{1, 1});
    CHECK(losses[static_cast<std::size_t>(ZoneGrid{}.indexOf({4, 2}))] == ZoneTally{1, 1});
    CHECK(losses[0] == ZoneTally{0, 1});
    // A rate zone with no items is 0 of 0.
    CHECK(s.byMetric.at("regain_5s")[1][0] == ZoneTally{0, 0});

    const SeasonTallies before = repo.seasonTallies("First team", "2025-26");
    CHECK(before.matchIds == std::vector<std::string>{"KB-TEST-00"});
    const SeasonTallies other = repo.seasonTallies("Under-21s", "2026-27");
    CHECK(other.matchIds == std::vector<std::string>{"KB-U21-01"});
    const SeasonTallies none = repo.seasonTallies("First team", "2030-31");
    CHECK(none.matchIds.empty());
    CHECK(none.dates.empty());
}

TEST_CASE("flag settings have documented defaults and are saved", "[repository]") {
    TempClub club;
    {
        ClubRepository repo(club.file);
        const FlagSettings f = repo.flagSettings();
        // Defaults of model/status.h's FlagSettings.
        CHECK(f.level == 0.90);
        CHECK(f.rateInterval == IntervalMethod::Wilson);
        CHECK(f.window == Window{Window::Kind::LastN, 5, 0.3});
        CHECK(f.offThreshold == 0.999);
        CHECK(f.watchThreshold == 0.50);
        CHECK_FALSE(f.fdr);
        CHECK(f.fdrQ == 0.10);
        CHECK(f.falseFlagsPerSeason == 1);
        CHECK(f.seasonMatches == 38);
        CHECK(f.matchVariation);

        FlagSettings changed;
        changed.level = 0.8;
        changed.rateInterval = IntervalMethod::Jeffreys;
        changed.window = Window{Window::Kind::Ewma, 0, 0.2};
        changed.offThreshold = 0.99;
        changed.watchThreshold = 0.6;
        changed.fdr = true;
        changed.fdrQ = 0.05;
        changed.falseFlagsPerSeason = 3;
        changed.seasonMatches = 30;
        changed.matchVariation = false;
        repo.saveFlagSettings(changed);
        const FlagSettings back = repo.flagSettings();
        CHECK(back.level == 0.8);
        CHECK(back.rateInterval == IntervalMethod::Jeffreys);
        CHECK(back.window == changed.window);
        CHECK(back.offThreshold == 0.99);
        CHECK(back.watchThreshold == 0.6);
        CHECK(back.fdr);
        CHECK(back.fdrQ == 0.05);
        CHECK(back.falseFlagsPerSeason == 3);
        CHECK(back.seasonMatches == 30);
        CHECK_FALSE(back.matchVariation);

        // Saved again with other values: the rows are updated, not added.
        changed.window = Window{Window::Kind::LastN, 8, 0.3};
        changed.fdr = false;
        repo.saveFlagSettings(changed);
    }
    CHECK(count(club.file, "SELECT count(*) FROM setting WHERE key LIKE 'flags.%'") == 10);
    ClubRepository reopened(club.file);
    const FlagSettings f = reopened.flagSettings();
    CHECK(f.window.name() == "last8");
    CHECK_FALSE(f.fdr);
    CHECK(f.level == 0.8);
    CHECK(f.rateInterval == IntervalMethod::Jeffreys);
    // The tally grid setting is untouched by flag settings.
    CHECK(reopened.tallyGrid() == ZoneGrid{});

    SECTION("a damaged value keeps its default") {
        {
            SQLite::Database raw(club.file, SQLite::OPEN_READWRITE);
            raw.exec("UPDATE setting SET value = 'lots' WHERE key = 'flags.level'");
            raw.exec("UPDATE setting SET value = 'weekly' WHERE key = 'flags.window'");
        }
        ClubRepository again(club.file);
        CHECK(again.flagSettings().level == 0.90);
        CHECK(again.flagSettings().window.name() == "last5");
        CHECK(again.flagSettings().offThreshold == 0.99); // the others are read as stored
    }
}
