// Storage of fixtures and sessions: schema version 5, fixture imports (add, update, unchanged,
// a file with a problem writes nothing), links to ingested matches, editable caps, and saved
// sessions with the minutes a focus review reads back.

#include "drills.h"
#include "focus.h"
#include "repository.h"
#include "sessions.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>

#include <tuple>

using namespace pitchloop::model;
using namespace pitchloop::testutil;
using Catch::Matchers::Contains;

namespace {

const std::string kSquad = "First team";
const std::string kNow = "2026-08-01T09:00:00Z";

Fixture fx(const std::string& date, const std::string& opponent,
           const std::string& kickoff = "15:00") {
    return Fixture{date, kickoff, opponent, "home", "League", ""};
}

Drill bookDrill(const std::string& title, int minutes, int intensity,
                std::vector<std::string> metrics, std::vector<Zone> zones,
                std::vector<std::string> tags) {
    Drill d;
    d.title = title;
    d.durationMin = minutes;
    d.intensity = intensity;
    d.playersMin = 6;
    d.playersMax = 22;
    d.metrics = std::move(metrics);
    d.zones = std::move(zones);
    d.tags = std::move(tags);
    d.author = "R. Tamsin";
    return d;
}

std::int64_t addDrill(DrillBook& book, const Drill& d) {
    const DrillChange c = book.add(d, "R. Tamsin", kNow);
    INFO(describeAll(c.problems));
    REQUIRE(c.ok());
    return c.id;
}

/// The press_rate focus on zone 4,3 both session tests train, opened after the first match.
std::int64_t openPressFocus(ClubRepository& repo) {
    Focus f;
    f.squad = kSquad;
    f.season = "2026-27";
    f.metric = "press_rate";
    f.zones = {{4, 3}};
    f.openedAfterMatch = "KB-2026-01";
    f.startDate = "2026-08-09";
    f.evidence = "{}";
    f.openedBy = "R. Tamsin";
    return FocusStore(repo).open(f, kNow);
}

} // namespace

TEST_CASE("a version-4 club file gains the fixture and session tables",
          "[sessions][storage]") {
    const auto dir = freshTempDir("sessions-migrate");
    const std::string file = (dir / "club.sqlite").string();
    {
        SQLite::Database db(file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        ClubRepository::migrate(db, 4);
        db.exec("INSERT INTO setting(key, value) VALUES ('flags.level', '0.8')");
    }
    ClubRepository repo(file); // migrates 4 → 5 → current
    CHECK(repo.schemaVersion() == ClubRepository::kSchemaVersion);
    for (const char* table : {"fixture", "session", "session_block", "session_focus"})
        CHECK(repo.database().tableExists(table));
    CHECK(repo.flagSettings().level == 0.8); // what was there before is kept
}

TEST_CASE("fixture imports: add, update, unchanged; a file with a problem writes nothing",
          "[sessions][fixtures]") {
    const auto dir = freshTempDir("sessions-fixtures");
    const std::string file = (dir / "club.sqlite").string();
    ClubRepository repo(file);
    FixtureStore store(repo);

    auto r = store.importFixtures(kSquad, {fx("2026-08-15", "Quarry Town"),
                                           fx("2026-08-08", "Harbour Rovers"),
                                           fx("2027-05-01", "Mill End")});
    REQUIRE(r.errors.empty());
    CHECK(r.added == 3);
    CHECK(r.linked == 0);
    auto list = store.list(kSquad, "2026-27");
    REQUIRE(list.size() == 3);
    CHECK(list[0].date == "2026-08-08"); // by date
    CHECK(list[2].opponent == "Mill End");
    CHECK(store.list(kSquad).size() == 3);
    CHECK(store.list(kSquad, "2027-28").empty());
    CHECK(store.list("Under-18").empty());
    CHECK(repo.seasons(kSquad) == std::vector<std::string>{"2026-27"});

    // The kick-off of one fixture moves: one update, the others unchanged.
    r = store.importFixtures(
        kSquad, {fx("2026-08-08", "Harbour Rovers", "12:30"), fx("2026-08-15", "Quarry Town")});
    REQUIRE(r.errors.empty());
    CHECK(r.added == 0);
    CHECK(r.updated == 1);
    CHECK(r.unchanged == 1);
    CHECK(store.list(kSquad)[0].kickoff == "12:30");

    // One bad fixture among good ones: nothing is written.
    const std::string before = dataSnapshot(file);
    Fixture bad = fx("2026-08-22", "Dockside");
    bad.venue = "Home";
    r = store.importFixtures(kSquad, {fx("2026-08-19", "Quarry Town"), bad, fx("2026-08-19", "X")},
                             "autumn.csv");
    CHECK(r.added == 0);
    REQUIRE(r.errors.size() == 2);
    CHECK(r.errors[0].describe() ==
          "autumn.csv: fixtures[1].venue: 'Home' is not one of home, away, neutral");
    CHECK_THAT(r.errors[1].message, Contains("a second fixture on 2026-08-19"));
    CHECK(dataSnapshot(file) == before);

    CHECK(store.remove(kSquad, "2027-05-01"));
    CHECK_FALSE(store.remove(kSquad, "2027-05-01"));
    CHECK(store.list(kSquad).size() == 2);
}

TEST_CASE("a fixture links to the match ingested for its date", "[sessions][fixtures]") {
    ClubRepository repo(":memory:");
    FixtureStore store(repo);
    REQUIRE(store
                .importFixtures(
                    kSquad, {fx("2026-08-08", "Test Opponents"), fx("2026-08-15", "Quarry Town")})
                .errors.empty());
    CHECK(store.linkMatches() == 0);                                      // nothing ingested yet
    repo.storeMatch(makeMatch({}), {"t.json", "0", kNow}, kSquad, false); // dated 2026-08-08
    CHECK(store.list(kSquad)[0].matchId == "TEST-01"); // shown before it is linked
    CHECK(store.linkMatches() == 1);
    CHECK(store.linkMatches() == 0); // already linked
    const auto list = store.list(kSquad);
    CHECK(list[0].matchId == "TEST-01");
    CHECK(list[1].matchId.empty());

    // A schedule imported after the match is linked on import.
    ClubRepository later(":memory:");
    later.storeMatch(makeMatch({}), {"t.json", "0", kNow}, kSquad, false);
    const auto r = FixtureStore(later).importFixtures(kSquad, {fx("2026-08-08", "Test Opponents")});
    CHECK(r.linked == 1);
    CHECK(FixtureStore(later).list(kSquad)[0].matchId == "TEST-01");
}

TEST_CASE("intensity caps are editable and kept in the club file", "[sessions][fixtures]") {
    ClubRepository repo(":memory:");
    FixtureStore store(repo);
    CHECK(store.caps() == IntensityCaps{});
    IntensityCaps caps;
    caps.beforeMatch[3] = 4; // this club keeps MD-4 at high, not maximal
    store.saveCaps(caps);
    CHECK(store.caps() == caps);
    CHECK(FixtureStore(repo).caps().before(4) == 4);
}

TEST_CASE("flag settings and caps are saved together or not at all", "[sessions][storage]") {
    ClubRepository repo(":memory:");
    FixtureStore store(repo);
    FlagSettings flags;
    flags.level = 0.8;
    IntensityCaps caps;
    caps.beforeMatch[3] = 3;
    repo.saveFlagSettings(flags, {FixtureStore::capsSetting(caps)});
    CHECK(repo.flagSettings().level == 0.8);
    CHECK(store.caps() == caps);

    // A fault on the caps row (a trigger stands in for a full disk) leaves the flags unsaved too.
    repo.database().exec("CREATE TRIGGER refuse BEFORE UPDATE ON setting WHEN "
                         "new.key = 'microcycle.caps' BEGIN SELECT RAISE(ABORT, 'disk full'); END");
    FlagSettings next = flags;
    next.level = 0.95;
    IntensityCaps nextCaps = caps;
    nextCaps.beforeMatch[3] = 1;
    CHECK_THROWS_AS(repo.saveFlagSettings(next, {FixtureStore::capsSetting(nextCaps)}), StorageError);
    CHECK(repo.flagSettings().level == 0.8);
    CHECK(store.caps() == caps);
}

TEST_CASE("a planned session is saved with its blocks and minutes per focus, and a review "
          "reads the minutes back",
          "[sessions][planner]") {
    const auto dir = freshTempDir("sessions-save");
    const std::string file = (dir / "club.sqlite").string();
    ClubRepository repo(file);
    repo.ensureSeason(kSquad, "2026-27");
    DrillBook book(repo);
    const auto warm = addDrill(book, bookDrill("Rondo warm-up", 10, 2, {}, {}, {"warm_up"}));
    const auto cool = addDrill(book, bookDrill("Walk and stretch", 10, 1, {}, {}, {"cool_down"}));
    const auto press =
        addDrill(book, bookDrill("Press the first pass", 20, 4, {"press_rate"}, {{4, 3}}, {}));
    const auto press2 =
        addDrill(book, bookDrill("Press in pairs", 20, 4, {"press_rate"}, {{4, 3}}, {}));
    const auto build =
        addDrill(book, bookDrill("Build-up 7v5", 15, 3, {"pass_completion"}, {{2, 3}}, {}));

    const auto focusId = openPressFocus(repo);

    FixtureStore fixtures(repo);
    REQUIRE(fixtures
                .importFixtures(
                    kSquad, {fx("2026-08-08", "Harbour Rovers"), fx("2026-08-15", "Quarry Town")})
                .errors.empty());

    SessionStore sessions(repo);
    auto request = [&](const std::string& date) {
        PlanRequest r;
        r.date = date;
        r.season = "2026-27";
        r.minutes = 45;
        r.playersAvailable = 16;
        r.fixtures = fixtures.list(kSquad, "2026-27");
        r.caps = fixtures.caps();
        PlanFocus pf;
        pf.id = focusId;
        pf.metric = "press_rate";
        pf.zones = {{4, 3}};
        pf.band = 4;
        pf.lane = 3;
        pf.severity = 0.6;
        r.focuses = {pf};
        r.drills = book.list();
        r.yesterday = sessions.drillsOn(kSquad, addDays(date, -1));
        return r;
    };

    // Tuesday MD-4 (cap 5): 25 minutes for main drills; press (20, on the focus) wins.
    const PlanResult tue = planSession(request("2026-08-11"));
    REQUIRE(tue.plan);
    CHECK(tue.plan->blocks.at(1).drillId == press);
    const SessionSave s1 = sessions.save(kSquad, *tue.plan, "R. Tamsin", kNow);
    CHECK_FALSE(s1.replaced);

    // Wednesday MD-3: yesterday's press drill is left out; the other press drill replaces it.
    // Yesterday's warm-up and cool-down are the only ones: they are pinned to repeat them.
    PlanRequest wedRequest = request("2026-08-12");
    CHECK(wedRequest.yesterday == std::vector<std::int64_t>{warm, press, cool});
    wedRequest.pinned = {warm, cool};
    const PlanResult wed = planSession(wedRequest);
    REQUIRE(wed.plan);
    CHECK(wed.plan->blocks.at(1).drillId == press2);
    sessions.save(kSquad, *wed.plan, "R. Tamsin", kNow);

    const auto saved = sessions.get(kSquad, "2026-08-11");
    REQUIRE(saved);
    CHECK(saved->season == "2026-27");
    CHECK(saved->dayLabel == "MD-4");
    CHECK(saved->cap == 5);
    CHECK(saved->minutes == 45);
    CHECK(saved->players == 16);
    CHECK(saved->objective == tue.plan->objective);
    REQUIRE(saved->blocks.size() == 3);
    CHECK(saved->blocks[0].role == BlockRole::WarmUp);
    CHECK(saved->blocks[1].drillId == press);
    CHECK(saved->blocks[1].focusId == focusId);
    CHECK_FALSE(saved->blocks[0].focusId.has_value());
    CHECK(saved->blocks[1].why == tue.plan->blocks[1].why);
    CHECK(saved->focusMinutes == std::vector<std::pair<std::int64_t, int>>{{focusId, 20}});

    // Minutes on the focus's drills between dates: 20 on Tuesday + 20 on Wednesday.
    CHECK(sessions.minutesOnDrills(kSquad, "2026-08-09", "2026-08-31", {press, press2}) == 40);
    CHECK(sessions.minutesOnDrills(kSquad, "2026-08-12", "2026-08-31", {press, press2}) == 20);
    CHECK(sessions.minutesOnDrills(kSquad, "2026-08-09", "2026-08-31", {build}) == 0);
    CHECK(sessions.minutesOnDrills(kSquad, "2026-08-09", "2026-08-31", {}) == 0);
    CHECK(sessions.minutesOnDrills("Under-18", "2026-08-09", "2026-08-31", {press}) == 0);
    CHECK(sessions.minutesOnFocus(focusId, "2026-08-09", "2026-08-31") == 40);
    CHECK(sessions.minutesOnFocus(focusId, "2026-08-01", "2026-08-11") == 20);

    // Saving Tuesday again replaces it: the minutes are not counted twice.
    const SessionSave again = sessions.save(kSquad, *tue.plan, "R. Tamsin", kNow);
    CHECK(again.replaced);
    CHECK(sessions.list(kSquad).size() == 2);
    CHECK(sessions.minutesOnDrills(kSquad, "2026-08-09", "2026-08-31", {press, press2}) == 40);

    // A plan naming a drill the club file does not have is refused and changes nothing.
    const std::string before = dataSnapshot(file);
    Plan ghost = *tue.plan;
    ghost.date = "2026-08-13";
    ghost.blocks[1].drillId = 999;
    CHECK_THROWS_AS(sessions.save(kSquad, ghost, "R. Tamsin", kNow), StorageError);
    CHECK(dataSnapshot(file) == before);

    CHECK(sessions.remove(kSquad, "2026-08-12"));
    CHECK(sessions.minutesOnFocus(focusId, "2026-08-09", "2026-08-31") == 20);
    CHECK(sessions.drillsOn(kSquad, "2026-08-12").empty());
}

TEST_CASE("training as held: a session counts for its focus once marked held, with the minutes "
          "really done when changed, and not when cancelled",
          "[sessions][planner]") {
    const auto dir = freshTempDir("sessions-held");
    const std::string file = (dir / "club.sqlite").string();
    ClubRepository repo(file);
    repo.ensureSeason(kSquad, "2026-27");
    DrillBook book(repo);
    const auto warm = addDrill(book, bookDrill("Rondo warm-up", 10, 2, {}, {}, {"warm_up"}));
    const auto press = addDrill(book, bookDrill("Press the first pass", 20, 4, {"press_rate"}, {{4, 3}}, {}));
    const auto other = addDrill(book, bookDrill("Crossing", 15, 3, {"pass_completion"}, {{5, 1}}, {}));
    const auto cool = addDrill(book, bookDrill("Walk and stretch", 10, 1, {}, {}, {"cool_down"}));
    const auto focusId = openPressFocus(repo);
    Plan plan;
    plan.date = "2026-08-11";
    plan.sessionMinutes = 55;
    plan.playersAvailable = 18;
    for (auto [id, minutes, role] : {std::tuple{warm, 10, BlockRole::WarmUp}, {press, 20, BlockRole::Main},
                                     {other, 15, BlockRole::Main}, {cool, 10, BlockRole::CoolDown}}) {
        PlanBlock b;
        b.drillId = id;
        b.minutes = minutes;
        b.role = role;
        if (id == press) b.focus = 0;
        plan.blocks.push_back(b);
    }
    plan.focusMinutes = {{0, focusId, 20}};
    SessionStore sessions(repo);
    sessions.save(kSquad, plan, "R. Tamsin", kNow);

    // Planned, not yet marked: counted apart, and said so.
    FocusTraining t = sessions.trainingOnFocus(focusId, "2026-08-09", "2026-08-31");
    CHECK(t.heldMinutes == 0);
    CHECK(t.unrecordedSessions == 1);
    CHECK(t.unrecordedMinutes == 20);
    CHECK(trainingNote(t, "2026-08-09", "2026-08-31") ==
          "0 minutes in 0 sessions held from 2026-08-09 to 2026-08-31; 1 saved session (20 min) not "
          "yet marked held or cancelled is not counted");

    // Refused, nothing changed: a future day, no players, the wrong number of blocks, no session.
    const std::string before = dataSnapshot(file);
    SessionRecord held{SessionOutcome::Held, 16, {}};
    const auto future = sessions.record(kSquad, "2026-08-11", held, "2026-08-10", "R. Tamsin", kNow);
    REQUIRE(future.size() == 1);
    CHECK(future[0].describe() == "the session of 2026-08-11: date: is after today (2026-08-10): a "
                                  "session is marked once its day has come");
    const auto nobody = sessions.record(kSquad, "2026-08-11", {SessionOutcome::Held, 0, {}}, "2026-08-31", "R. Tamsin", kNow);
    REQUIRE(nobody.size() == 1);
    CHECK(nobody[0].field == "players");
    const auto blocks = sessions.record(kSquad, "2026-08-11", {SessionOutcome::Changed, 16, {10, 5}}, "2026-08-31", "R. Tamsin", kNow);
    REQUIRE(blocks.size() == 1);
    CHECK(blocks[0].message == "expected the minutes of each of the 4 blocks (got 2)");
    CHECK(sessions.record(kSquad, "2026-08-12", held, "2026-08-31", "R. Tamsin", kNow).at(0).message ==
          "no saved session of First team on 2026-08-12");
    CHECK(dataSnapshot(file) == before);

    // Held as planned.
    REQUIRE(sessions.record(kSquad, "2026-08-11", held, "2026-08-31", "R. Tamsin", kNow).empty());
    t = sessions.trainingOnFocus(focusId, "2026-08-09", "2026-08-31");
    CHECK(t.heldMinutes == 20);
    CHECK(t.heldSessions == 1);
    CHECK(t.unrecordedSessions == 0);
    auto saved = sessions.get(kSquad, "2026-08-11");
    REQUIRE(saved);
    CHECK(saved->outcome == SessionOutcome::Held);
    CHECK(saved->playersPresent == 16);
    CHECK(saved->heldMinutes == std::vector<std::optional<int>>{10, 20, 15, 10});

    // Changed: the press drill ran 12 minutes, the crossing drill was dropped; the focus gets 12.
    REQUIRE(sessions.record(kSquad, "2026-08-11", {SessionOutcome::Changed, 14, {10, 12, 0, 10}}, "2026-08-31",
                            "R. Tamsin", kNow)
                .empty());
    CHECK(sessions.trainingOnFocus(focusId, "2026-08-09", "2026-08-31").heldMinutes == 12);
    CHECK(sessions.get(kSquad, "2026-08-11")->playersPresent == 14);

    // Cancelled: nothing counts; the planned minutes stay for what was planned.
    REQUIRE(sessions.record(kSquad, "2026-08-11", {SessionOutcome::Cancelled, 0, {}}, "2026-08-31", "R. Tamsin", kNow)
                .empty());
    t = sessions.trainingOnFocus(focusId, "2026-08-09", "2026-08-31");
    CHECK(t.heldMinutes == 0);
    CHECK(t.cancelledSessions == 1);
    CHECK(sessions.minutesOnFocus(focusId, "2026-08-09", "2026-08-31") == 20);
    CHECK(trainingNote(t, "2026-08-09", "2026-08-31") ==
          "0 minutes in 0 sessions held from 2026-08-09 to 2026-08-31; 1 session was cancelled");
    CHECK_FALSE(sessions.get(kSquad, "2026-08-11")->playersPresent.has_value());
}
