// The club file: round trips, pragmas, re-ingest and replace, migrations, metric changes,
// backup and seasons. The base match is tests/data/minimal-match.json (KB-TEST-01, 17 events).

#include "ingest.h"
#include "matchreader.h"
#include "repository.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <algorithm>
#include <catch2/catch.hpp>
#include <filesystem>
#include <functional>
#include <nlohmann/json.hpp>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using nlohmann::json;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

std::string minimalBytes() {
    return readFileBytes(sourcePath("tests/data/minimal-match.json"));
}

/// minimal-match.json changed by `edit`, as file bytes.
std::string variant(const std::function<void(json&)>& edit) {
    json j = json::parse(minimalBytes());
    edit(j);
    return j.dump(2);
}

/// The first half only of minimal-match.json: events[0..12], same id KB-TEST-01.
std::string firstHalfOnly() {
    return variant([](json& j) {
        auto& events = j["events"];
        events.erase(events.begin() + 13, events.end());
    });
}

/// A second match, KB-TEST-02 a week later, whose events[7] lost its "cross" tag.
std::string secondMatch() {
    return variant([](json& j) {
        j["match"]["id"] = "KB-TEST-02";
        j["match"]["date"] = "2026-07-25";
        j["match"]["opponent"] = "Gullhaven Rovers";
        j["events"][7].erase("tags");
    });
}

struct TempClub {
    fs::path dir = freshTempDir("repository");
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

ZoneTally zone(const ClubRepository& repo, const std::string& match, const std::string& metric,
               int band, int lane) {
    const MatchTally t = repo.matchTally(match, metric);
    return t[static_cast<std::size_t>(ZoneGrid{}.indexOf({band, lane}))];
}

long totalNum(const MatchTally& t) {
    long n = 0;
    for (const auto& z : t)
        n += z.num;
    return n;
}

std::string tallyText(const std::vector<TallyRow>& rows) {
    std::string out;
    for (const auto& r : rows)
        out += r.matchId + "," + r.metricId + "," + std::to_string(r.band) + "," +
               std::to_string(r.lane) + "," + std::to_string(r.num) + "," + std::to_string(r.den) +
               "\n";
    return out;
}

const std::vector<std::string> kBuiltinIds{
    "regain_5s", "shot_after_loss", "pre_shot_passes_for", "pre_shot_passes_against",
    "losses",    "press_rate",      "pass_completion"};

} // namespace

TEST_CASE("a stored match loads back equal to the parsed one", "[repository]") {
    // Extras on every level, a score, tags and end points: everything the reader keeps.
    const std::string bytes = variant([](json& j) {
        j["match"]["kb_weather"] = "drizzle";
        j["match"]["score"] = {{"us", 2}, {"opponent", 1}};
        j["events"][7]["video_ref"] = "clip-017";
        j["events"][7]["kb_phase"] = {{"build_up", true}};
    });
    const ReadResult read = parseMatch(bytes, "roundtrip.json");
    INFO(describeAll(read.errors));
    REQUIRE(read.ok());
    const Match& parsed = *read.match;
    REQUIRE(parsed.events.size() == 17);
    REQUIRE(parsed.info.extra == R"({"kb_weather":"drizzle"})");
    REQUIRE(parsed.events[7].extra == R"({"kb_phase":{"build_up":true},"video_ref":"clip-017"})");

    TempClub club;
    const std::string file = GENERATE(as<std::string>{}, ":memory:", "file");
    ClubRepository repo(file == "file" ? club.file : file);
    repo.storeMatch(parsed, {"roundtrip.json", contentHash(bytes), "2026-07-19T10:00:00Z"},
                    "First team", false);
    const auto loaded = repo.loadMatch("KB-TEST-01");
    REQUIRE(loaded);
    CHECK(*loaded == parsed);
    // The parts compared above, spelled out so a failure says which.
    CHECK(loaded->info.periods == std::vector<Period>{{1, 2760}, {2, 2790}});
    CHECK(loaded->info.goalsUs == 2);
    CHECK(loaded->info.goalsOpp == 1);
    CHECK(loaded->info.extra == parsed.info.extra);
    CHECK(loaded->events[7].tags == std::vector<std::string>{"cross"});
    CHECK(loaded->events[7].extra == parsed.events[7].extra);
    CHECK(loaded->events[11].tags == std::vector<std::string>{"corner", "set_piece", "cross"});
    REQUIRE(loaded->events[1].to);
    CHECK(*loaded->events[1].to == Point{62.0, 15.5});
    CHECK_FALSE(loaded->events[5].to);
    // The throw-in at y = 68.9 was clamped onto the touchline before storing.
    CHECK(loaded->events[13].at == Point{30.0, 68.0});
    // Their interception at (25, 38) in their frame is (105 − 25, 68 − 38) in ours.
    CHECK(loaded->events[3].at == Point{80.0, 30.0});
    CHECK(loaded->events[10].result == Result::None);
    CHECK(loaded->info.sourceFrame == Frame::Acting);
    const auto source = repo.sourceOf("KB-TEST-01");
    REQUIRE(source);
    CHECK(source->name == "roundtrip.json");
    CHECK(source->hash == contentHash(bytes));
    CHECK(source->ingestedAt == "2026-07-19T10:00:00Z");
    CHECK_FALSE(repo.loadMatch("KB-NOPE"));
}

TEST_CASE("memory and file club files open at the current schema with built-in metrics",
          "[repository]") {
    TempClub club;
    const std::string file = GENERATE(as<std::string>{}, ":memory:", "file");
    ClubRepository repo(file == "file" ? club.file : file);
    CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
    CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
    CHECK(repo.clubName().empty());
    CHECK(repo.matches().empty());
    CHECK(repo.tallyGrid() == ZoneGrid{});
    std::vector<std::string> ids;
    for (const auto& m : repo.metrics())
        ids.push_back(m.id);
    CHECK(ids == kBuiltinIds);
    if (file == "file") CHECK(fs::exists(club.file));
}

TEST_CASE("a club file on disk is in WAL mode and enforces foreign keys", "[repository]") {
    TempClub club;
    ClubRepository repo(club.file);
    REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status == IngestStatus::Added);

    // journal_mode = WAL is stored in the file, so a second connection reads it back.
    {
        SQLite::Database raw(club.file, SQLite::OPEN_READONLY);
        CHECK(raw.execAndGet("PRAGMA journal_mode").getString() == "wal");
        SQLite::Statement check(raw, "PRAGMA foreign_key_check");
        CHECK_FALSE(check.executeStep());
    }
    CHECK(fs::exists(club.file + "-wal"));

    // foreign_keys is a setting of each connection, so it shows in what the repository's own
    // connection does: the ON DELETE CASCADE clauses only act when it is on.
    MetricSpec spec = *parseMetricSpec(R"({"id": "kb_crosses", "better": "higher",
        "items": {"side": "us", "type": "pass", "tags_any": "cross"}, "per": "match"})",
                                       "test")
                           .spec;
    repo.saveMetric(spec);
    REQUIRE(count(club.file, "SELECT count(*) FROM tally WHERE metric_id = 'kb_crosses'") == 30);
    CHECK(repo.removeMetric("kb_crosses"));
    CHECK(count(club.file, "SELECT count(*) FROM tally WHERE metric_id = 'kb_crosses'") == 0);

    IngestOptions replace;
    replace.replace = true;
    REQUIRE(ingestBytes(repo, firstHalfOnly(), "first-half.json", replace).status ==
            IngestStatus::Replaced);
    CHECK(count(club.file, "SELECT count(*) FROM event") == 13);
    CHECK(count(club.file, "SELECT count(*) FROM period") == 2);
    CHECK(count(club.file, "SELECT count(*) FROM tally WHERE match_id NOT IN "
                           "(SELECT id FROM match)") == 0);
}

TEST_CASE("re-ingesting the identical file is Unchanged and changes no data", "[repository]") {
    TempClub club;
    ClubRepository repo(club.file);
    const auto first = ingestFile(repo, sourcePath("tests/data/minimal-match.json"));
    REQUIRE(first.status == IngestStatus::Added);
    const std::string before = dataSnapshot(club.file);
    REQUIRE(before.find("KB-TEST-01") != std::string::npos);

    const auto again = ingestFile(repo, sourcePath("tests/data/minimal-match.json"));
    CHECK(again.status == IngestStatus::Unchanged);
    CHECK(again.ok());
    CHECK(again.matchId == "KB-TEST-01");
    CHECK(again.errors.empty());
    CHECK(dataSnapshot(club.file) == before);
    // The same bytes under another file name are still the same file.
    CHECK(ingestBytes(repo, minimalBytes(), "copy-of-minimal.json").status ==
          IngestStatus::Unchanged);
    CHECK(dataSnapshot(club.file) == before);
}

TEST_CASE("a different file with a stored id is refused or replaces it when asked",
          "[repository]") {
    TempClub club;
    ClubRepository repo(club.file);
    REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status == IngestStatus::Added);
    // minimal-match.json: our losses at (62, 15.5) in period 1 → zone (4, 2), and at (40, 60)
    // in period 2 → zone (3, 5) (6 × 5 grid on 105 × 68: bands every 17.5 m, lanes every
    // 13.6 m).
    REQUIRE(zone(repo, "KB-TEST-01", "losses", 4, 2) == ZoneTally{1, 1});
    REQUIRE(zone(repo, "KB-TEST-01", "losses", 3, 5) == ZoneTally{1, 1});
    const std::string before = dataSnapshot(club.file);

    SECTION("without replace: Refused, nothing changes") {
        const auto r = ingestBytes(repo, firstHalfOnly(), "first-half.json");
        CHECK(r.status == IngestStatus::Refused);
        CHECK_FALSE(r.ok());
        REQUIRE(r.errors.size() == 1);
        CHECK(r.errors[0].place == "match");
        CHECK(r.errors[0].field == "id");
        CHECK(r.errors[0].file == "first-half.json");
        CHECK(r.errors[0].message.find("minimal-match.json") != std::string::npos);
        CHECK(dataSnapshot(club.file) == before);
        CHECK(repo.loadMatch("KB-TEST-01")->events.size() == 17);
    }
    SECTION("with replace: Replaced, old events gone, tallies recomputed") {
        IngestOptions opts;
        opts.replace = true;
        const auto r = ingestBytes(repo, firstHalfOnly(), "first-half.json", opts);
        CHECK(r.status == IngestStatus::Replaced);
        CHECK(r.ok());
        CHECK(r.events == 13);
        CHECK(repo.loadMatch("KB-TEST-01")->events.size() == 13);
        CHECK(repo.matchSummary("KB-TEST-01")->eventCount == 13);
        CHECK(repo.sourceOf("KB-TEST-01")->name == "first-half.json");
        CHECK(repo.matches().size() == 1);
        CHECK(count(club.file, "SELECT count(*) FROM event") == 13);
        CHECK(count(club.file, "SELECT count(*) FROM event WHERE period = 2") == 0);
        // The period-2 loss at (3, 5) went with the second half; the first one stays.
        CHECK(zone(repo, "KB-TEST-01", "losses", 4, 2) == ZoneTally{1, 1});
        CHECK(zone(repo, "KB-TEST-01", "losses", 3, 5) == ZoneTally{0, 1});
        // Pass completion lost the two period-2 passes at (2, 5) and (3, 5): 5 of 7 → 4 of 5.
        long num = 0, den = 0;
        for (const auto& z : repo.matchTally("KB-TEST-01", "pass_completion")) {
            num += z.num;
            den += z.den;
        }
        CHECK(num == 4);
        CHECK(den == 5);
        CHECK(dataSnapshot(club.file) != before);
        // Replacing with the very same file again is Unchanged, replace or not.
        CHECK(ingestBytes(repo, firstHalfOnly(), "first-half.json", opts).status ==
              IngestStatus::Unchanged);
    }
}

TEST_CASE("a version-1 club file is migrated to version 2 and keeps its data", "[repository]") {
    TempClub club;
    {
        SQLite::Database db(club.file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        ClubRepository::migrate(db, 1);
        REQUIRE(db.execAndGet("PRAGMA user_version").getInt() == 1);
        REQUIRE_FALSE(db.tableExists("setting"));
        // The shape of version 1: no source columns on match, no setting table.
        db.exec(R"sql(
INSERT INTO club(id, name) VALUES (1, 'Kestrel Bay');
INSERT INTO squad(id, club_id, name) VALUES (1, 1, 'Reserves');
INSERT INTO season(id, squad_id, name, starts, ends)
  VALUES (1, 1, '2025-26', '2025-07-01', '2026-06-30');
INSERT INTO match(id, code, season_id, date, competition, venue, us, opponent, goals_us,
                  goals_opp, length_m, width_m, source_frame, extra)
  VALUES (1, 'KB-OLD-01', 1, '2026-03-14', 'League', 'away', 'Kestrel Bay', 'Harrowfield Town',
          1, 1, 100, 64, 'acting', '{"kb_weather":"wind"}');
INSERT INTO period(match_id, n, length_s) VALUES (1, 1, 2700), (1, 2, 2760);
INSERT INTO event(match_id, seq, file_index, period, t, side, player, type, result, x, y,
                  to_x, to_y, tags, extra) VALUES
  (1, 0, 0, 1, 10.0, 'us', '8', 'pass', 'fail', 60.0, 20.0, 75.0, 30.0, '["cross"]', NULL),
  (1, 1, 1, 1, 11.0, 'opp', '4', 'interception', 'ok', 75.0, 30.0, NULL, NULL, NULL, NULL);
INSERT INTO metric(id, spec, builtin, position) VALUES ('kb_crosses',
  '{"id":"kb_crosses","better":"higher",'
  || '"items":{"side":"us","type":"pass","tags_any":"cross"},"per":"match"}', 0, 1);
INSERT INTO tally(match_id, metric_id, band, lane, num, den) VALUES (1, 'kb_crosses', 4, 2, 3, 1);
)sql");
    }

    ClubRepository repo(club.file);
    CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
    CHECK(repo.clubName() == "Kestrel Bay");
    // The setting table came with version 2, with the default grid.
    CHECK(repo.tallyGrid() == ZoneGrid::equal(6, 5));
    CHECK(count(club.file, "SELECT count(*) FROM setting WHERE key = 'tally_grid' AND "
                           "value = 'equal:6x5'") == 1);

    const auto summary = repo.matchSummary("KB-OLD-01");
    REQUIRE(summary);
    CHECK(summary->squad == "Reserves");
    CHECK(summary->season == "2025-26");
    CHECK(summary->opponent == "Harrowfield Town");
    CHECK(summary->goalsUs == 1);
    CHECK(summary->goalsOpp == 1);
    CHECK(summary->pitch == Pitch{100, 64});
    CHECK(summary->eventCount == 2);
    // The new columns take their defaults.
    CHECK(summary->source.name.empty());
    CHECK(summary->source.hash.empty());
    CHECK(summary->source.ingestedAt.empty());

    const auto match = repo.loadMatch("KB-OLD-01");
    REQUIRE(match);
    CHECK(match->info.extra == R"({"kb_weather":"wind"})");
    REQUIRE(match->events.size() == 2);
    CHECK(match->events[0].tags == std::vector<std::string>{"cross"});
    CHECK(match->events[0].to == Point{75.0, 30.0});
    CHECK(match->events[1].type == EventType::Interception);

    // The old user metric and its tally survive as stored.
    CHECK(repo.metric("kb_crosses"));
    const auto rows = repo.tallies(std::string("KB-OLD-01"), std::string("kb_crosses"));
    REQUIRE(rows.size() == 1);
    CHECK(rows[0].band == 4);
    CHECK(rows[0].lane == 2);
    CHECK(rows[0].num == 3);
    CHECK(rows[0].den == 1);
    // The built-in metrics were added and computed for the old match: our failed pass at
    // (60, 20), taken by their interception, is a loss in zone (4, 2) of a 100 × 64 pitch
    // (bands every 16.67 m: 50 ≤ 60 < 66.7; lanes every 12.8 m: 12.8 ≤ 20 < 25.6).
    CHECK(repo.metrics().size() == 8);
    CHECK(zone(repo, "KB-OLD-01", "losses", 4, 2) == ZoneTally{1, 1});
    CHECK(totalNum(repo.matchTally("KB-OLD-01", "losses")) == 1);

    // A migrated file takes new matches, and opening it again changes nothing.
    REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status == IngestStatus::Added);
    const std::string snapshot = dataSnapshot(club.file);
    {
        ClubRepository again(club.file);
        CHECK(again.schemaVersion() == ClubRepository::kSchemaVersion);
    }
    CHECK(dataSnapshot(club.file) == snapshot);
}

TEST_CASE("a club file from a newer Pitchloop is refused", "[repository]") {
    TempClub club;
    {
        SQLite::Database db(club.file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        db.exec("CREATE TABLE future_thing(id INTEGER PRIMARY KEY, note TEXT)");
        db.exec("INSERT INTO future_thing(note) VALUES ('made by a later version')");
        db.exec("PRAGMA user_version = 99");
    }
    const std::string before = dataSnapshot(club.file);
    REQUIRE_THROWS_AS(ClubRepository(club.file), StorageError);
    try {
        ClubRepository repo(club.file);
    } catch (const StorageError& e) {
        const std::string what = e.what();
        CHECK(what.find("newer") != std::string::npos);
        CHECK(what.find("99") != std::string::npos);
    }
    CHECK(dataSnapshot(club.file) == before);
}

TEST_CASE("saving a user metric computes its tallies for every stored match", "[repository]") {
    ClubRepository repo(":memory:");
    REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status == IngestStatus::Added);
    REQUIRE(ingestBytes(repo, secondMatch(), "second.json").status == IngestStatus::Added);

    const auto parse = [](const std::string& text) {
        auto r = parseMetricSpec(text, "test");
        INFO(describeAll(r.errors));
        REQUIRE(r.spec);
        return *r.spec;
    };
    // Our passes tagged "cross" in minimal-match.json: events[7] from (78, 4) → zone (5, 1)
    // and the corner events[11] from (105, 0) → zone (6, 1) (the far edge goes to the last
    // band). In the second match events[7] has no tags, so only (6, 1).
    repo.saveMetric(parse(R"({"id": "kb_crosses", "better": "higher",
        "items": {"side": "us", "type": "pass", "tags_any": "cross"}, "per": "match"})"));
    REQUIRE(repo.metric("kb_crosses"));
    CHECK(repo.metrics().back().id == "kb_crosses");
    CHECK(zone(repo, "KB-TEST-01", "kb_crosses", 5, 1) == ZoneTally{1, 1});
    CHECK(zone(repo, "KB-TEST-01", "kb_crosses", 6, 1) == ZoneTally{1, 1});
    CHECK(totalNum(repo.matchTally("KB-TEST-01", "kb_crosses")) == 2);
    CHECK(zone(repo, "KB-TEST-02", "kb_crosses", 5, 1) == ZoneTally{0, 1});
    CHECK(zone(repo, "KB-TEST-02", "kb_crosses", 6, 1) == ZoneTally{1, 1});
    CHECK(totalNum(repo.matchTally("KB-TEST-02", "kb_crosses")) == 1);
    // A per-match count: all 30 zones of both matches have den 1.
    CHECK(repo.tallies(std::nullopt, std::string("kb_crosses")).size() == 60);

    // Redefined as set pieces: the corner events[11] (6, 1) and the throw-in events[13] from
    // (30, 68) → zone (2, 5), in both matches.
    repo.saveMetric(parse(R"({"id": "kb_crosses", "better": "higher",
        "items": {"side": "us", "type": "pass", "tags_any": "set_piece"}, "per": "match"})"));
    for (const std::string id : {"KB-TEST-01", "KB-TEST-02"}) {
        INFO(id);
        CHECK(zone(repo, id, "kb_crosses", 5, 1) == ZoneTally{0, 1});
        CHECK(zone(repo, id, "kb_crosses", 6, 1) == ZoneTally{1, 1});
        CHECK(zone(repo, id, "kb_crosses", 2, 5) == ZoneTally{1, 1});
        CHECK(totalNum(repo.matchTally(id, "kb_crosses")) == 2);
    }
    CHECK(repo.metrics().size() == 8);

    // A user metric cannot take a built-in's id with a different definition.
    CHECK_THROWS_AS(repo.saveMetric(parse(R"({"id": "losses", "better": "higher",
        "items": {"losses_of": "opp"}, "per": "match"})")),
                    StorageError);
    CHECK(totalNum(repo.matchTally("KB-TEST-01", "losses")) == 2);
}

TEST_CASE("built-in metrics cannot be removed but user metrics can", "[repository]") {
    ClubRepository repo(":memory:");
    REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status == IngestStatus::Added);
    for (const auto& id : kBuiltinIds) {
        INFO(id);
        CHECK_THROWS_AS(repo.removeMetric(id), StorageError);
        CHECK(repo.metric(id));
    }
    CHECK_FALSE(repo.removeMetric("kb_no_such_metric"));
    repo.saveMetric(*parseMetricSpec(R"({"id": "kb_shots", "better": "higher",
        "items": {"side": "us", "type": "shot"}, "per": "match"})",
                                     "test")
                         .spec);
    CHECK(repo.tallies(std::string("KB-TEST-01"), std::string("kb_shots")).size() == 30);
    CHECK(repo.removeMetric("kb_shots"));
    CHECK_FALSE(repo.metric("kb_shots"));
    CHECK(repo.tallies(std::string("KB-TEST-01"), std::string("kb_shots")).empty());
    CHECK(repo.metrics().size() == 7);
}

TEST_CASE("a backup holds the same data as the club file", "[repository]") {
    TempClub club;
    const std::string target = (club.dir / "backup.sqlite").string();
    SECTION("from a file") {
        ClubRepository repo(club.file);
        REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status ==
                IngestStatus::Added);
        REQUIRE(ingestBytes(repo, secondMatch(), "second.json").status == IngestStatus::Added);
        repo.backupTo(target);
        const std::string original = dataSnapshot(club.file);
        REQUIRE(original.find("KB-TEST-02") != std::string::npos);
        CHECK(dataSnapshot(target) == original);
    }
    SECTION("from memory") {
        ClubRepository repo(":memory:");
        REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status ==
                IngestStatus::Added);
        repo.backupTo(target);
        ClubRepository restored(target);
        CHECK(restored.schemaVersion() == ClubRepository::kSchemaVersion);
        REQUIRE(restored.loadMatch("KB-TEST-01"));
        CHECK(*restored.loadMatch("KB-TEST-01") == *repo.loadMatch("KB-TEST-01"));
        CHECK(tallyText(restored.tallies()) == tallyText(repo.tallies()));
        CHECK(restored.tallies().size() == repo.tallies().size());
    }
}

TEST_CASE("seasons run from July to June", "[repository]") {
    CHECK(seasonOf("2026-08-08") == "2026-27");
    CHECK(seasonOf("2027-03-01") == "2026-27");
    CHECK(seasonOf("2027-06-30") == "2026-27");
    CHECK(seasonOf("2027-07-01") == "2027-28");
    CHECK(seasonOf("2026-07-01") == "2026-27");
    CHECK(seasonOf("2026-06-30") == "2025-26");
    CHECK(seasonOf("2099-12-31") == "2099-00");

    // Stored matches land in the season of their date, made on the fly.
    ClubRepository repo(":memory:");
    REQUIRE(ingestBytes(repo, minimalBytes(), "minimal-match.json").status == IngestStatus::Added);
    const auto june = variant([](json& j) {
        j["match"]["id"] = "KB-TEST-00";
        j["match"]["date"] = "2026-06-30";
    });
    REQUIRE(ingestBytes(repo, june, "june.json").status == IngestStatus::Added);
    CHECK(repo.matchSummary("KB-TEST-01")->season == "2026-27");
    CHECK(repo.matchSummary("KB-TEST-00")->season == "2025-26");
    const auto all = repo.matches();
    REQUIRE(all.size() == 2);
    CHECK(all[0].id == "KB-TEST-00"); // ordered by date
}
