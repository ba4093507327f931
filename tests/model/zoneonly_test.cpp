// Zone-only data (docs/import.md, "Zone-only data"): a table giving zone labels instead of
// positions, read with a profile's `zones`; events at their zone's centre, the match marked and
// stored as zone-only, its tallies exact on its own grid (and coarser unions of it) and left
// out, with a note, on any other grid. The whole-season check is tests/python/import_check.py.

#include "gridchange.h"
#include "importprofile.h"
#include "ingest.h"
#include "matchreader.h"
#include "metricengine.h"
#include "repository.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>

using namespace pitchloop::model;
using pitchloop::testutil::contains;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
namespace fs = std::filesystem;

namespace {

/// A zone-tag layout of our own: ';', seconds, KB/SA sides, labels "B{band}-L{lane}" on
/// equal:6x5 plus the listed word "spot", in the acting frame. `columns` and `zones` may be
/// replaced; `extra` is spliced into the top-level object.
std::string zoneProfileText(const std::string& extra = "",
                            const std::string& zones =
                                R"({"grid": "equal:6x5", "pattern": "B{band}-L{lane}", "labels": {"spot": [4, 3]}})",
                            const std::string& columns =
                                R"({"period": "Half", "time": "Secs", "side": "Team", "type": "Action",
                                    "result": "Outcome", "zone": "Zone", "to_zone": "End"})") {
    return R"({"format": "pitchloop-profile", "version": 1, "name": "zone test",
      "table": {"layout": "delimited", "delimiter": ";"},
      "columns": )" + columns + R"(,
      "side": {"us": ["KB"], "opp": ["SA"]},
      "coordinates": {"frame": "acting"},
      "zones": )" + zones + R"(,
      "types": {"pass": "pass", "shot": "shot", "won": "recovery", "int": "interception",
                "tackle": "tackle", "clear": "clearance"},
      "results": {"ok": "ok", "fail": "fail", "saved": "saved"},
      "match": {"us": "Kestrel Bay", "id": "KB-Z-01", "date": "2026-08-01", "venue": "home",
                "opponent": "Saltmarsh Athletic", "period_lengths": "600",
                "pitch": {"length_m": 105, "width_m": 68}})" +
           extra + "}";
}

MappingProfile zoneProfile() {
    const ProfileResult p = parseProfile(zoneProfileText(), "zones.json");
    INFO(describeAll(p.errors));
    REQUIRE(p.profile);
    return *p.profile;
}

const char* kHeader = "Half;Secs;Team;Action;Outcome;Zone;End\n";

// The same ten events twice: positions in the acting frame on 105 × 68 m (bands 17.5 m, lanes
// 13.6 m), and the labels worked out by hand from them. Their own direction for SA's events.
const char* kNative = R"({"format": "pitchloop-match", "version": 1,
  "match": {"id": "KB-Z-01", "date": "2026-08-01", "venue": "home", "us": "Kestrel Bay",
            "opponent": "Saltmarsh Athletic", "pitch": {"length_m": 105, "width_m": 68},
            "periods": [{"n": 1, "length_s": 600}], "frame": "acting"},
  "events": [
    {"period": 1, "t": 1, "side": "us", "type": "pass", "result": "ok", "x": 52.5, "y": 34, "to_x": 70, "to_y": 20},
    {"period": 1, "t": 3, "side": "us", "type": "pass", "result": "fail", "x": 80, "y": 10},
    {"period": 1, "t": 4, "side": "opp", "type": "interception", "result": "ok", "x": 30, "y": 60},
    {"period": 1, "t": 6, "side": "opp", "type": "pass", "result": "ok", "x": 40, "y": 50, "to_x": 60, "to_y": 45},
    {"period": 1, "t": 8, "side": "us", "type": "recovery", "result": "ok", "x": 90, "y": 34},
    {"period": 1, "t": 9, "side": "us", "type": "shot", "result": "saved", "x": 100, "y": 30},
    {"period": 1, "t": 12, "side": "opp", "type": "pass", "result": "ok", "x": 10, "y": 5, "to_x": 30, "to_y": 20},
    {"period": 1, "t": 14, "side": "us", "type": "tackle", "result": "ok", "x": 76, "y": 50},
    {"period": 1, "t": 20, "side": "us", "type": "pass", "result": "ok", "x": 68, "y": 30, "to_x": 105, "to_y": 67.9},
    {"period": 1, "t": 22, "side": "opp", "type": "clearance", "result": "ok", "x": 5, "y": 30}]})";
// 52.5 is the line between bands 3 and 4 and goes up (B4); 70 between 4 and 5 (B5); 105 is the
// far edge (B6); 34 is in lane 3 (27.2–40.8), 45 in lane 4 (40.8–54.4).
const char* kZoneRows =
    "1;1;KB;pass;ok;spot;B5-L2\n"
    "1;3;KB;pass;fail;B5-L1;\n"
    "1;4;SA;int;ok;B2-L5;\n"
    "1;6;SA;pass;ok;B3-L4;B4-L4\n"
    "1;8;KB;won;ok;B6-L3;\n"
    "1;9;KB;shot;saved;B6-L3;\n"
    "1;12;SA;pass;ok;B1-L1;B2-L2\n"
    "1;14;KB;tackle;ok;B5-L4;\n"
    "1;20;KB;pass;ok;B4-L3;B6-L5\n"
    "1;22;SA;clear;ok;B1-L3;\n";

MappedTable mapZones(const std::string& rows, const MappingProfile& p) {
    return mapFile(kHeader + rows, p, {}, "tags.csv");
}

/// Stores the native match or the zone table in a fresh club file on `grid`.
struct TwoClubs {
    ClubRepository native{":memory:"};
    ClubRepository zones{":memory:"};
    explicit TwoClubs(const ZoneGrid& grid = ZoneGrid{}) {
        if (grid != ZoneGrid{}) {
            native.changeGrid(grid, "test", "2026-07-01T00:00:00Z");
            zones.changeGrid(grid, "test", "2026-07-01T00:00:00Z");
        }
        const IngestReport n = ingestBytes(native, kNative, "native.json");
        INFO(describeAll(n.errors));
        REQUIRE(n.ok());
        const MappedTable mapped = mapZones(kZoneRows, zoneProfile());
        INFO(describeAll(mapped.errors));
        REQUIRE(mapped.errors.empty());
        zoneReport = ingestBytes(zones, mapped.match.dump(), "tags.csv");
        INFO(describeAll(zoneReport.errors));
        REQUIRE(zoneReport.ok());
    }
    IngestReport zoneReport;
};

std::vector<std::string> rowsOf(const std::vector<TallyRow>& rows) {
    std::vector<std::string> out;
    for (const auto& r : rows)
        out.push_back(r.metricId + " " + std::to_string(r.band) + "," + std::to_string(r.lane) + " " +
                      std::to_string(r.num) + "/" + std::to_string(r.den));
    return out;
}

} // namespace

TEST_CASE("zone labels map to their zone's centre, in each side's own direction", "[import][zones]") {
    const MappedTable m = mapZones(kZoneRows, zoneProfile());
    INFO(describeAll(m.errors));
    REQUIRE(m.errors.empty());
    CHECK(m.match["match"]["zone_only"]["grid"] == "equal:6x5");
    const auto& e = m.match["events"];
    REQUIRE(e.size() == 10);
    // "spot" is listed as [4, 3]: band 4 runs 52.5–70 m (centre 61.25), lane 3 27.2–40.8 m (34).
    CHECK(e[0]["x"] == 61.25);
    CHECK(e[0]["y"] == 34.0);
    // B5-L2: band 5 70–87.5 (78.75), lane 2 13.6–27.2 (20.4).
    CHECK(e[0]["to_x"] == 78.75);
    CHECK(e[0]["to_y"] == 20.4);
    // SA's B2-L5 in their own direction: (26.25, 61.2) in the acting frame as written.
    CHECK(e[2]["x"] == 26.25);
    CHECK(e[2]["y"] == 61.2);
    CHECK_FALSE(e[1].contains("to_x")); // an empty end zone is no end point

    const ReadResult read = parseMatchDocument(m.match, "tags.csv");
    INFO(describeAll(read.errors));
    REQUIRE(read.ok());
    CHECK(read.match->info.zoneOnlyGrid == "equal:6x5");
    // In our frame SA's B2-L5 is (105 − 26.25, 68 − 61.2) = (78.75, 6.8): our band 5, lane 1.
    const Event& interception = read.match->events[2];
    CHECK(interception.at.x == Approx(78.75));
    CHECK(interception.at.y == Approx(6.8));
    CHECK(ZoneGrid{}.zoneOf(interception.at, Pitch{}) == Zone{5, 1});
}

TEST_CASE("zone labels in the us and ground frames", "[import][zones]") {
    auto ours = [](const std::string& coordinates, const std::string& rows) {
        std::string text = zoneProfileText();
        const std::string acting = R"("coordinates": {"frame": "acting"})";
        text.replace(text.find(acting), acting.size(), coordinates);
        const ProfileResult p = parseProfile(text, "zones.json");
        INFO(describeAll(p.errors));
        REQUIRE(p.profile);
        const MappedTable m = mapZones(rows, *p.profile);
        INFO(describeAll(m.errors));
        REQUIRE(m.errors.empty());
        const ReadResult read = parseMatchDocument(m.match, "tags.csv");
        INFO(describeAll(read.errors));
        REQUIRE(read.ok());
        std::vector<Zone> zones;
        for (const Event& e : read.match->events) zones.push_back(ZoneGrid{}.zoneOf(e.at, Pitch{}));
        return zones;
    };
    // "us": every label in our direction, theirs included.
    CHECK(ours(R"("coordinates": {"frame": "us"})", "1;1;KB;pass;ok;B1-L2;\n1;2;SA;won;ok;B1-L2;\n") ==
          std::vector<Zone>{{1, 2}, {1, 2}});
    // "ground" with us attacking −x in period 2: band 1 is the ground's x = 0 end, which is our
    // goal line in period 1 and theirs in period 2 (our band 6, lane 5 + 1 − 2 = 4).
    CHECK(ours(R"("coordinates": {"frame": "ground", "us_attack": {"1": "+x", "2": "-x"}})",
               "1;1;KB;pass;ok;B1-L2;\n2;2;KB;pass;ok;B1-L2;\n") == std::vector<Zone>{{1, 2}, {6, 4}});
}

TEST_CASE("zone-only tallies equal the native match's on its grid and on a coarser union",
          "[import][zones]") {
    TwoClubs clubs;
    const auto native = rowsOf(clubs.native.tallies());
    CHECK(rowsOf(clubs.zones.tallies()) == native);
    // A hand-worked value: our passes from band 4 lane 3 are (52.5, 34) and (68, 30), both ok.
    CHECK(std::find(native.begin(), native.end(), "pass_completion 4,3 2/2") != native.end());
    CHECK(std::find(native.begin(), native.end(), "pass_completion 5,1 0/1") != native.end());
    // equal:3x5 bands are pairs of equal:6x5 bands: exact as well.
    const ZoneGrid thirds = ZoneGrid::equal(3, 5);
    CHECK(rowsOf(clubs.zones.talliesOnGrid(thirds, std::nullopt, std::nullopt)) ==
          rowsOf(clubs.native.talliesOnGrid(thirds, std::nullopt, std::nullopt)));
    // equal:12x5 is finer: the native match has rows there, the zone-only one none.
    const ZoneGrid finer = ZoneGrid::equal(12, 5);
    CHECK_FALSE(clubs.native.talliesOnGrid(finer, std::nullopt, std::nullopt).empty());
    CHECK(clubs.zones.talliesOnGrid(finer, std::nullopt, std::nullopt).empty());
    // The mark is stored and read back.
    CHECK(clubs.zones.matchSummary("KB-Z-01")->zoneOnlyGrid == "equal:6x5");
    CHECK(clubs.zones.loadMatch("KB-Z-01")->info.zoneOnlyGrid == "equal:6x5");
    CHECK(clubs.native.matchSummary("KB-Z-01")->zoneOnlyGrid.empty());
    CHECK(clubs.zoneReport.warnings.empty());
}

TEST_CASE("zone values on another grid are not computed, and said so", "[import][zones]") {
    SECTION("ingest into a club on a finer grid warns and stores no zone tallies") {
        TwoClubs clubs(ZoneGrid::equal(8, 5));
        CHECK_FALSE(clubs.native.tallies().empty());
        CHECK(clubs.zones.tallies().empty());
        REQUIRE(clubs.zoneReport.warnings.size() == 1);
        CHECK(clubs.zoneReport.warnings[0].field == "zone_only");
        CHECK(contains(clubs.zoneReport.warnings[0].message,
                       "positions known only to grid equal:6x5; zone values not computed on grid equal:8x5"));
    }
    SECTION("a grid change lists the match it would leave out, and the way back") {
        TwoClubs clubs;
        const GridChangePreview away = previewGridChange(clubs.zones, ZoneGrid::markings(6));
        REQUIRE(away.zoneOnlyLeftOut == std::vector<std::string>{"KB-Z-01"});
        CHECK(std::any_of(away.lines.begin(), away.lines.end(), [](const std::string& l) {
            return contains(l, "Match KB-Z-01: positions known only to grid equal:6x5; zone values "
                               "not computed on grid markings:6");
        }));
        CHECK(previewGridChange(clubs.native, ZoneGrid::markings(6)).zoneOnlyLeftOut.empty());
        clubs.zones.changeGrid(ZoneGrid::markings(6), "test", "2026-07-02T00:00:00Z");
        CHECK(clubs.zones.tallies().empty());
        const GridChangePreview back = previewGridChange(clubs.zones, ZoneGrid{});
        CHECK(back.zoneOnlyLeftOut.empty());
        CHECK(std::any_of(back.lines.begin(), back.lines.end(), [](const std::string& l) {
            return contains(l, "KB-Z-01 (zone-only data on equal:6x5) gets its zone values back");
        }));
        clubs.zones.changeGrid(ZoneGrid{}, "test", "2026-07-03T00:00:00Z");
        CHECK(rowsOf(clubs.zones.tallies()) == rowsOf(clubs.native.tallies()));
    }
}

TEST_CASE("which grids a zone-only match can be counted on", "[zones]") {
    const Pitch pitch;
    CHECK(coarsens(ZoneGrid::equal(3, 5), ZoneGrid::equal(6, 5), pitch));
    CHECK(coarsens(ZoneGrid::equal(6, 1), ZoneGrid::equal(6, 5), pitch));
    CHECK(coarsens(ZoneGrid::equal(6, 5), ZoneGrid::equal(6, 5), pitch));
    CHECK_FALSE(coarsens(ZoneGrid::equal(4, 5), ZoneGrid::equal(6, 5), pitch)); // 26.25 m is no edge
    CHECK_FALSE(coarsens(ZoneGrid::equal(12, 5), ZoneGrid::equal(6, 5), pitch));
    CHECK_FALSE(coarsens(ZoneGrid::markings(6), ZoneGrid::equal(6, 5), pitch)); // lane edge 13.84 m, not 13.6 m
    MatchInfo info;
    CHECK(zonesKnownOn(info, ZoneGrid::equal(12, 5))); // measured positions: any grid
    info.zoneOnlyGrid = "equal:6x5";
    CHECK(zonesKnownOn(info, ZoneGrid::equal(2, 5)));
    CHECK(zoneOnlyNote(info, ZoneGrid::equal(2, 5)).empty());
    CHECK(zoneOnlyNote(info, ZoneGrid::equal(6, 4)) ==
          "positions known only to grid equal:6x5; zone values not computed on grid equal:6x4");
    // Zone centres, by hand: band 1 of 6 on 105 m is 0–17.5 (8.75), lane 5 of 5 on 68 m 54.4–68.
    const Point centre = zoneCentre({1, 5}, ZoneGrid{}, pitch);
    CHECK(centre.x == Approx(8.75));
    CHECK(centre.y == Approx(61.2));
}

TEST_CASE("bad zone profiles are refused naming the file and the field", "[import][zones][badinput]") {
    auto firstError = [](const std::string& text) {
        const ProfileResult r = parseProfile(text, "p.json");
        REQUIRE_FALSE(r.profile);
        REQUIRE_FALSE(r.errors.empty());
        CHECK(r.errors.front().file == "p.json");
        return r.errors.front();
    };
    const std::string xy = R"({"period": "Half", "time": "Secs", "side": "Team", "type": "Action",
                               "x": "X", "y": "Y"})";
    SECTION("a grid that is not one") {
        const Problem e = firstError(zoneProfileText("", R"({"grid": "equal:6", "pattern": "B{band}-L{lane}"})"));
        CHECK(e.place == "zones");
        CHECK(e.field == "grid");
        CHECK(contains(e.message, "'equal:6' is not a zone grid"));
        CHECK(firstError(zoneProfileText("", R"({"pattern": "B{band}-L{lane}"})")).field == "grid");
    }
    SECTION("a listed label outside the grid") {
        const Problem e = firstError(zoneProfileText("", R"({"grid": "equal:6x5", "labels": {"far": [7, 1]}})"));
        CHECK(e.place == "zones.labels");
        CHECK(e.field == "far");
        CHECK(contains(e.message, "[7, 1] is outside the grid equal:6x5 (bands 1 to 6, lanes 1 to 5)"));
        CHECK(firstError(zoneProfileText("", R"({"grid": "equal:6x5", "labels": {"odd": "B1"}})")).field == "odd");
    }
    SECTION("a pattern without both numbers, or with nothing between them") {
        const Problem e = firstError(zoneProfileText("", R"({"grid": "equal:6x5", "pattern": "B{band}"})"));
        CHECK(e.place == "zones");
        CHECK(e.field == "pattern");
        CHECK(contains(firstError(zoneProfileText("", R"({"grid": "equal:6x5", "pattern": "{band}{lane}"})")).message,
                       "put a character between"));
        CHECK(firstError(zoneProfileText("", R"({"grid": "equal:6x5"})")).field == "labels");
    }
    SECTION("a zone column beside x and y, or one without the other") {
        const std::string both = R"({"time": "Secs", "side": "Team", "type": "Action", "zone": "Zone", "x": "X", "y": "Y"})";
        const Problem e = firstError(zoneProfileText("", R"({"grid": "equal:6x5", "pattern": "B{band}-L{lane}"})", both));
        CHECK(e.place == "columns");
        CHECK(e.field == "x");
        CHECK(contains(e.message, "not both"));
        // zones without a zone column
        const Problem noColumn = firstError(zoneProfileText("", R"({"grid": "equal:6x5", "pattern": "B{band}-L{lane}"})", xy));
        CHECK(noColumn.place == "columns");
        CHECK(noColumn.field == "zone");
        // a zone column without zones
        std::string text = zoneProfileText();
        const auto at = text.find("\"zones\":");
        text.erase(at, text.find("},", at) + 2 - at);
        const Problem noZones = firstError(text);
        CHECK(noZones.place == "");
        CHECK(noZones.field == "zones");
        // an end zone with coordinates
        const std::string endOnly = R"({"time": "Secs", "side": "Team", "type": "Action", "x": "X", "y": "Y", "to_zone": "End"})";
        std::string plain = parseProfile(zoneProfileText("", R"({"grid": "equal:6x5", "pattern": "B{band}-L{lane}"})", endOnly), "p.json")
                                .errors.front().field;
        CHECK(plain == "to_zone");
    }
}

TEST_CASE("bad zone tables are refused naming file, line and column, storing nothing",
          "[import][zones][badinput]") {
    const MappingProfile p = zoneProfile();
    SECTION("a label the profile does not read is an unmapped word, with its count and lines") {
        const auto m = mapZones(std::string(kZoneRows) + "1;30;KB;pass;ok;B2L5;\n1;31;KB;pass;ok;B2L5;\n", p);
        REQUIRE(m.unmapped.size() == 1);
        CHECK(m.unmapped[0].word == "B2L5");
        CHECK(m.unmapped[0].count == 2);
        REQUIRE(m.errors.size() == 1);
        CHECK(m.errors[0].file == "tags.csv");
        CHECK(m.errors[0].place == "line 12");
        CHECK(m.errors[0].field == "Zone");
        CHECK(contains(m.errors[0].message, "'B2L5' is not mapped (2 times; lines 12, 13): add it to "
                                            "the profile's zones.labels"));
    }
    SECTION("a label naming a zone outside the grid, an empty zone, an unread end zone") {
        const auto out = mapZones("1;1;KB;pass;ok;B7-L1;\n", p);
        REQUIRE(out.errors.size() == 1);
        CHECK(out.errors[0].place == "line 2");
        CHECK(out.errors[0].field == "Zone");
        CHECK(contains(out.errors[0].message, "names band 7, lane 1: outside the profile's grid equal:6x5"));
        const auto empty = mapZones("1;1;KB;pass;ok;;\n", p);
        REQUIRE(empty.errors.size() == 1);
        CHECK(empty.errors[0].field == "Zone");
        CHECK(contains(empty.errors[0].message, "no zone"));
        const auto end = mapZones("1;1;KB;pass;ok;B1-L1;B0-L2\n", p);
        REQUIRE(end.errors.size() == 1);
        CHECK(end.errors[0].field == "End");
    }
    SECTION("a shot with an end zone: the reader's problem in the table's terms") {
        const auto m = mapZones("1;1;KB;shot;saved;B6-L3;B6-L2\n", p);
        REQUIRE(m.errors.empty());
        const ReadResult read = parseMatchDocument(m.match, "tags.csv");
        REQUIRE_FALSE(read.ok());
        const Problems problems = inTableTerms(read.errors, m, p);
        CHECK(problems[0].place == "line 2");
        CHECK(problems[0].field == "End");
    }
    SECTION("ingest of a bad zone table stores nothing") {
        const fs::path dir = freshTempDir("zones");
        const std::string club = (dir / "club.sqlite").string();
        const fs::path bad = dir / "bad.csv";
        std::ofstream(bad, std::ios::binary) << kHeader << kZoneRows << "1;40;KB;pass;ok;B9-L9;\n";
        { ClubRepository repo(club); }
        const std::string before = dataSnapshot(club);
        {
            ClubRepository repo(club);
            const auto r = ingestTableFile(repo, bad, p, {});
            REQUIRE(r.size() == 1);
            CHECK(r[0].status == IngestStatus::Invalid);
            CHECK(r[0].errors.at(0).place == "line 12");
        }
        CHECK(dataSnapshot(club) == before);
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
}

TEST_CASE("a match file marked zone-only holds zone centres only", "[zones][badinput]") {
    auto marked = [](const std::string& grid) {
        std::string text = kNative;
        const std::string frame = R"("frame": "acting"})";
        text.replace(text.find(frame), frame.size(),
                     R"("frame": "acting", "zone_only": {"grid": ")" + grid + "\"}}");
        return parseMatch(text, "marked.json");
    };
    const ReadResult read = marked("equal:6x5");
    REQUIRE_FALSE(read.ok());
    // Event 0 is at (52.5, 34), a line between bands, not a centre.
    CHECK(read.errors[0].place == "events[0]");
    CHECK(read.errors[0].field == "x");
    CHECK(contains(read.errors[0].message, "(52.5, 34) is not the centre of a zone of equal:6x5"));
    const ReadResult bad = marked("lanes:5");
    REQUIRE_FALSE(bad.ok());
    CHECK(bad.errors[0].place == "match.zone_only");
    CHECK(bad.errors[0].field == "grid");
}

TEST_CASE("a version-8 club file gains the zone-only column, empty for its matches", "[repository][zones]") {
    const fs::path dir = freshTempDir("zones-migrate");
    const std::string file = (dir / "club.sqlite").string();
    {
        SQLite::Database db(file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        ClubRepository::migrate(db, 8);
        db.exec(R"sql(
INSERT INTO club(id, name) VALUES (1, 'Kestrel Bay');
INSERT INTO squad(id, club_id, name) VALUES (1, 1, 'First team');
INSERT INTO season(id, squad_id, name, starts, ends) VALUES (1, 1, '2025-26', '2025-07-01', '2026-06-30');
INSERT INTO match(id, code, season_id, date, venue, us, opponent, length_m, width_m, source_frame)
  VALUES (1, 'KB-OLD-02', 1, '2026-02-07', 'home', 'Kestrel Bay', 'Harrowfield Town', 105, 68, 'us');
INSERT INTO period(match_id, n, length_s) VALUES (1, 1, 2700);
INSERT INTO event(match_id, seq, file_index, period, t, side, type, result, x, y)
  VALUES (1, 0, 0, 1, 5.0, 'us', 'pass', 'ok', 30.0, 20.0);
)sql");
    }
    {
        ClubRepository repo(file);
        CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
        const auto summary = repo.matchSummary("KB-OLD-02");
        REQUIRE(summary);
        CHECK(summary->zoneOnlyGrid.empty());
        CHECK(repo.loadMatch("KB-OLD-02")->info.zoneOnlyGrid.empty());
        CHECK(summary->zonesKnownOn(ZoneGrid::equal(12, 5)));
    }
    std::error_code ec;
    fs::remove_all(dir, ec);
}
