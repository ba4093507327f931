// Changing a club's zone grid: zones compared by area between grids (checked against counting
// a fine lattice of points with ZoneGrid::zoneOf, the function that places events), target
// versions carried by the largest old zone, and a real club file moved to another grid and back.

#include "drills.h"
#include "focus.h"
#include "gridchange.h"
#include "ingest.h"
#include "repository.h"
#include "season_fixture.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <cmath>
#include <filesystem>
#include <map>
#include <random>
#include <set>
#include <tuple>

using namespace pitchloop::model;
using namespace pitchloop::testutil;
namespace fs = std::filesystem;
using Catch::Matchers::Contains;

namespace {

using Zones = std::vector<Zone>;

/// mapZones worked out again by counting lattice points: each zone of `to` is picked when at
/// least half its points lie in `zones` of `from`; a zone of `from` less than half covered by
/// the picked ones adds the zone of `to` holding most of its points. `unclear` is set when a
/// share is too near one half for the lattice to decide.
Zones latticeMap(const Zones& zones, const ZoneGrid& from, const ZoneGrid& to, bool& unclear) {
    const Pitch pitch;
    const int n = 700; // 700 × 700 cell centres
    std::vector<long> inTo(static_cast<std::size_t>(to.zoneCount())),
        insideTo(static_cast<std::size_t>(to.zoneCount()));
    std::map<std::pair<int, int>, long> pair; // (from index, to index) → points
    std::vector<long> inFrom(static_cast<std::size_t>(from.zoneCount()));
    std::set<int> wanted;
    for (const Zone& z : zones) wanted.insert(from.indexOf(z));
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j) {
            const Point p{(i + 0.5) * pitch.lengthM / n, (j + 0.5) * pitch.widthM / n};
            const int a = from.indexOf(from.zoneOf(p, pitch));
            const int b = to.indexOf(to.zoneOf(p, pitch));
            ++inTo[static_cast<std::size_t>(b)];
            ++inFrom[static_cast<std::size_t>(a)];
            ++pair[{a, b}];
            if (wanted.contains(a)) ++insideTo[static_cast<std::size_t>(b)];
        }
    unclear = false;
    std::vector<bool> picked(static_cast<std::size_t>(to.zoneCount()));
    for (int b = 0; b < to.zoneCount(); ++b) {
        const double share = double(insideTo[static_cast<std::size_t>(b)]) / inTo[static_cast<std::size_t>(b)];
        if (std::abs(share - 0.5) < 0.01) unclear = true;
        picked[static_cast<std::size_t>(b)] = share >= 0.5;
    }
    for (int a : wanted) {
        long covered = 0, best = -1;
        int bestB = 0;
        for (int b = 0; b < to.zoneCount(); ++b) {
            const long c = pair.contains({a, b}) ? pair.at({a, b}) : 0;
            if (picked[static_cast<std::size_t>(b)]) covered += c;
            if (c > best) best = c, bestB = b;
        }
        const double share = double(covered) / inFrom[static_cast<std::size_t>(a)];
        if (std::abs(share - 0.5) < 0.01) unclear = true;
        if (share < 0.5) picked[static_cast<std::size_t>(bestB)] = true;
    }
    Zones out;
    for (int b = 0; b < to.zoneCount(); ++b)
        if (picked[static_cast<std::size_t>(b)]) out.push_back(to.zoneAt(b));
    return out;
}

struct TempClub {
    fs::path dir = freshTempDir("gridchange");
    std::string file = (dir / "club.sqlite").string();
    ~TempClub() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
};

const std::string kNow = "2026-12-02T09:00:00Z";

Drill drillOn(Zones zones) {
    Drill d;
    d.title = "Counter-press box";
    d.author = "R. Tamsin";
    d.durationMin = 15;
    d.intensity = 4;
    d.playersMin = 8;
    d.playersMax = 12;
    d.metrics = {"regain_5s"};
    d.zones = std::move(zones);
    return d;
}

} // namespace

TEST_CASE("zones between grids: overlaps by area", "[gridchange]") {
    const ZoneGrid g65, g35 = ZoneGrid::equal(3, 5), g1210 = ZoneGrid::equal(12, 10);
    // Band 3 of six (35–52.5 m) is the back half of band 2 of three (35–70 m): exactly half.
    CHECK(overlapArea({3, 2}, g65, {2, 2}, g35) == Approx(17.5 * 13.6));
    CHECK(mapZones({{3, 2}}, g65, g35) == Zones{{2, 2}});
    // A finer grid: each zone splits into four.
    CHECK(mapZones({{1, 1}}, g65, g1210) == Zones{{1, 1}, {1, 2}, {2, 1}, {2, 2}});
    CHECK(mapZones(mapZones({{4, 3}, {5, 3}}, g65, g1210), g1210, g65) == Zones{{4, 3}, {5, 3}});
    // Same grid and no zones stay as they are.
    CHECK(mapZones({{2, 5}}, g65, g65) == Zones{{2, 5}});
    CHECK(mapZones({}, g65, g35).empty());
    // Lanes at the markings (Law 1 widths on 68 m): 0, 13.84, 24.84, 43.16, 54.16, 68. Equal
    // lane 2 (13.6–27.2 m) holds the whole half-space lane 2.
    const ZoneGrid marks = ZoneGrid::markings(6);
    CHECK(mapZones({{1, 2}}, g65, marks) == Zones{{1, 2}});
    // Markings lane 3 (24.84–43.16 m) against equal lane 3 (27.2–40.8 m): 13.6 of 18.32 m.
    CHECK(overlapArea({2, 3}, marks, {2, 3}, g65) == Approx(17.5 * 13.6));
    CHECK(overlapArea({2, 3}, marks, {3, 3}, g65) == 0);
    CHECK(mapZones({{2, 3}}, marks, g65) == Zones{{2, 3}});
}

TEST_CASE("mapZones agrees with counting lattice points placed by zoneOf", "[gridchange]") {
    const std::vector<ZoneGrid> grids{ZoneGrid{}, ZoneGrid::equal(3, 5), ZoneGrid::equal(4, 3),
                                      ZoneGrid::markings(6), ZoneGrid::markings(4),
                                      ZoneGrid::equal(8, 7)};
    std::mt19937 rng(20261202);
    int compared = 0;
    for (const auto& from : grids)
        for (const auto& to : grids) {
            if (from == to) continue;
            for (int trial = 0; trial < 3; ++trial) {
                Zones zones;
                std::uniform_int_distribution<int> pick(0, from.zoneCount() - 1);
                std::set<int> chosen;
                for (int k = 0; k < 1 + trial * 2; ++k) chosen.insert(pick(rng));
                for (int i : chosen) zones.push_back(from.zoneAt(i));
                bool unclear = false;
                const Zones expected = latticeMap(zones, from, to, unclear);
                if (unclear) continue; // a share within 1 % of one half: the lattice cannot tell
                INFO(from.name() << " -> " << to.name() << ", " << zones.size() << " zones");
                CHECK(mapZones(zones, from, to) == expected);
                ++compared;
            }
        }
    CHECK(compared > 60); // most of the 90 cases are clear of the one-half line
}

TEST_CASE("carrying targets: every version of the largest old zone, noted", "[gridchange]") {
    const ZoneGrid from, to = ZoneGrid::equal(3, 5);
    std::vector<Target> onFrom{
        target("regain_5s", 3, 2, Direction::AtLeast, 0.4, 0.05, 10),
        target("regain_5s", 3, 2, Direction::AtLeast, 0.45, 0.05, 10, "2026-10-01"),
        target("regain_5s", 4, 2, Direction::AtLeast, 0.3, 0.05, 10),
        target("regain_5s", 0, 0, Direction::AtLeast, 0.35, 0.05, 40), // whole pitch
    };
    onFrom[0].rationale = "back to last season's level";
    const TargetCarry c = carryTargets(onFrom, {}, from, to);
    // Band 2 of three is bands 3–4 of six: (3,2) covers as much as (4,2) and has the lower index.
    REQUIRE(c.versions.size() == 2);
    CHECK(c.zonesCarried == 1);
    CHECK(c.zonesKept == 0);
    for (const Target& t : c.versions) {
        CHECK(t.key.band == 2);
        CHECK(t.key.lane == 2);
        CHECK(t.version == 0);
        CHECK_THAT(t.rationale, Contains("[carried from right half-space in our half (B3·L2) of equal:6x5 when the grid "
                                         "became equal:3x5]"));
    }
    CHECK(c.versions[0].value == 0.4);
    CHECK_THAT(c.versions[0].rationale, Contains("back to last season's level [carried"));
    CHECK(c.versions[1].effectiveFrom == "2026-10-01");
    CHECK(c.versions[1].recordedAt == onFrom[1].recordedAt);

    // A season's metric with targets already on the new grid gets nothing carried.
    const std::vector<Target> onTo{target("regain_5s", 1, 1, Direction::AtLeast, 0.5, 0.05, 10)};
    const TargetCarry again = carryTargets(onFrom, onTo, from, to);
    CHECK(again.versions.empty());
    CHECK(again.zonesKept == 1);
}

TEST_CASE("a club file moves to another grid and back", "[gridchange]") {
    TempClub club;
    ClubRepository repo(club.file);
    std::vector<fs::path> files;
    for (const auto& e : fs::directory_iterator(sourcePath("sample-club/matches")))
        files.push_back(e.path());
    std::sort(files.begin(), files.end());
    files.resize(8);
    for (const auto& f : files) REQUIRE(ingestFile(repo, f).ok());
    const auto [squad, season] = *repo.seasonOfMatch(repo.matches().front().id);

    // Targets, a focus and a drill on the default grid.
    Target t = target("regain_5s", 2, 5, Direction::AtLeast, 0.45, 0.05, 5);
    t.key.squad = squad;
    t.key.season = season;
    Target whole = t;
    whole.key.band = whole.key.lane = 0;
    repo.addTargets({t, whole}, kNow);
    const ZoneGrid g65 = repo.tallyGrid();
    const auto before65 = repo.tallies();
    REQUIRE(before65.size() > 100);
    const auto targets65 = repo.targets(squad, season);

    Focus f;
    f.squad = squad;
    f.season = season;
    f.metric = "regain_5s";
    f.zones = {{2, 5}};
    f.openedAfterMatch = repo.matches()[3].id;
    f.startDate = dayAfter(repo.matches()[3].date);
    f.reviewAfterMatches = 4;
    f.evidence = "{}";
    f.openedBy = "R. Tamsin";
    FocusStore focuses(repo);
    const auto focusId = focuses.open(f, kNow);
    const auto spec = *repo.metric("regain_5s");
    const auto review65 =
        computeReview(*focuses.get(focusId), spec, repo.seasonTallies(squad, season), g65, 4, 4);
    REQUIRE(review65.review);

    DrillBook book(repo);
    const auto drill = book.add(drillOn({{2, 5}}), "R. Tamsin", kNow);
    REQUIRE(drill.ok());

    const ZoneGrid g35 = ZoneGrid::equal(3, 5);
    const auto expected35 = repo.talliesOnGrid(g35, std::nullopt, std::nullopt);
    const GridChangePreview preview = previewGridChange(repo, g35);
    CHECK(preview.matches == 8);
    CHECK(preview.targets.zonesCarried == 1); // band 1 lane 5 of three bands takes (2,5)
    CHECK(preview.focusesOnOtherGrids == 1);
    CHECK(preview.drillsWithZones == 1);
    CHECK_FALSE(preview.lines.empty());
    CHECK(repo.tallyGrid() == g65); // a preview writes nothing

    std::vector<int> seen;
    REQUIRE_THROWS_WITH(repo.changeGrid(g35, " ", kNow), Contains("say who changes it"));
    CHECK(repo.tallyGrid() == g65);
    CHECK(repo.changeGrid(g35, "A. Coach", kNow, [&](int done, int total) {
        CHECK(total == 8);
        seen.push_back(done);
    }) == 1);
    CHECK(seen == std::vector<int>{1, 2, 3, 4, 5, 6, 7, 8});
    CHECK(repo.tallyGrid() == g35);

    // Tallies are those counted from the events on the new grid.
    auto rows = [](const std::vector<TallyRow>& v) {
        std::set<std::tuple<std::string, std::string, int, int, long, long>> out;
        for (const auto& r : v) out.insert({r.matchId, r.metricId, r.band, r.lane, r.num, r.den});
        return out;
    };
    CHECK(repo.tallies().size() == expected35.size());
    CHECK(rows(repo.tallies()) == rows(expected35));

    // Targets: whole pitch kept, (2,5) of six bands carried to (1,5) of three.
    const auto targets35 = repo.targets(squad, season);
    REQUIRE(targets35.size() == 2);
    CHECK(targets35[0].key.band == 0);
    CHECK(targets35[1].key.band == 1);
    CHECK(targets35[1].key.lane == 5);
    CHECK(targets35[1].value == 0.45);

    // The focus keeps its grid and its review numbers.
    const Focus moved = *focuses.get(focusId);
    CHECK(moved.grid == g65);
    CHECK(moved.zones == Zones{{2, 5}});
    const auto review35 = computeReview(moved, spec, repo.seasonTallies(squad, season, moved.grid),
                                        moved.grid, 4, 4);
    REQUIRE(review35.review);
    CHECK(review35.review->before.totalNum == review65.review->before.totalNum);
    CHECK(review35.review->before.totalDen == review65.review->before.totalDen);
    CHECK(review35.review->after.totalNum == review65.review->after.totalNum);
    CHECK(review35.review->after.totalDen == review65.review->after.totalDen);

    // The drill reads on the new grid; its stored version is untouched.
    const Drill read = *book.get(drill.id);
    CHECK(read.zones == Zones{{1, 5}});
    CHECK(read.zonesGrid == "equal:6x5");
    CHECK(book.history(drill.id).size() == 1);

    // One log row; then back: the earlier targets return exactly, tallies as before.
    REQUIRE(repo.gridChanges().size() == 1);
    CHECK(repo.gridChanges()[0].by == "A. Coach");
    CHECK_THAT(repo.gridChanges()[0].summary, Contains("8 matches"));
    CHECK(repo.changeGrid(g65, "A. Coach", kNow) == 0);
    const auto back = repo.targets(squad, season);
    REQUIRE(back.size() == targets65.size());
    for (std::size_t i = 0; i < back.size(); ++i) CHECK(back[i].version == targets65[i].version);
    CHECK(rows(repo.tallies()) == rows(before65));
    CHECK(book.get(drill.id)->zones == Zones{{2, 5}});
    CHECK(book.get(drill.id)->zonesGrid.empty());
    CHECK(repo.changeGrid(g65, "A. Coach", kNow) == 0); // already there: nothing happens
    CHECK(repo.gridChanges().size() == 2);
}

TEST_CASE("a version-5 club file gets the grid of each zone record", "[gridchange]") {
    TempClub club;
    {
        SQLite::Database db(club.file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        ClubRepository::migrate(db, 5);
        db.exec(R"sql(
UPDATE setting SET value = 'markings:4' WHERE key = 'tally_grid';
INSERT INTO club(id, name) VALUES (1, 'Kestrel Bay');
INSERT INTO squad(id, club_id, name) VALUES (1, 1, 'First team');
INSERT INTO season(id, squad_id, name, starts, ends)
  VALUES (1, 1, '2026-27', '2026-07-01', '2027-06-30');
INSERT INTO target(season_id, metric_id, band, lane, direction, value, watch_margin, min_sample,
                   author, effective_from, recorded_at)
  VALUES (1, 'regain_5s', 2, 3, 'at_least', 0.4, 0.05, 10, 'R. Tamsin', '2026-07-01', 'x'),
         (1, 'regain_5s', 0, 0, 'at_least', 0.4, 0.05, 10, 'R. Tamsin', '2026-07-01', 'x');
INSERT INTO drill(id, created_at) VALUES (1, 'x');
INSERT INTO drill_version(drill_id, body, title, search_text, edited_by, edited_at)
  VALUES (1, '{}', 't', 't', 'R. Tamsin', 'x');
)sql");
    }
    ClubRepository repo(club.file);
    CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
    SQLite::Database db(club.file, SQLite::OPEN_READONLY);
    CHECK(db.execAndGet("SELECT grid FROM target WHERE band = 2").getString() == "markings:4");
    CHECK(db.execAndGet("SELECT grid FROM target WHERE band = 0").getString() == "");
    CHECK(db.execAndGet("SELECT grid FROM drill_version").getString() == "markings:4");
    CHECK(repo.targets("First team", "2026-27").size() == 2);
}
