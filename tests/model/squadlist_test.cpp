// A squad's list of players (model/squadlist.h): reading a table with every problem named by
// file, line and column; positions and units; the club file's list; and the moments that name
// our players and are picked by player or unit (model/moments.h).

#include "squadlist.h"

#include "ingest.h"
#include "moments.h"
#include "repository.h"
#include "testutil.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;
using pitchloop::testutil::contains;

TEST_CASE("a squad list is read from a table, any column order", "[squadlist]") {
    const auto r = parseSquadList("Position,Number,Name\nlb,3,N. Colterham\nGK,1,R. Kestwood\n", "squad.csv");
    REQUIRE(r.errors.empty());
    REQUIRE(r.players.size() == 2);
    CHECK(r.players[0] == Player{"3", "N. Colterham", "LB"});
    // Semicolons too.
    CHECK(parseSquadList("number;name;position\n9;K. Ardeley;ST\n", "s.csv").players.size() == 1);
}

TEST_CASE("a bad squad list names the file, the line and the column, and gives no players", "[squadlist]") {
    auto r = parseSquadList("number,name\n3,N. Colterham\n", "squad.csv");
    REQUIRE(r.errors.size() == 1);
    CHECK(r.errors[0].describe() == "squad.csv: line 1.position: the header has no column 'position' "
                                    "(number, name and position are needed)");
    r = parseSquadList("number,name,position\n3,N. Colterham,LB\n3,C. Rowntree,LB\n,X,CB\n4,,XB\n", "squad.csv");
    CHECK(r.players.empty());
    REQUIRE(r.errors.size() == 4);
    CHECK(r.errors[0].place == "line 3");
    CHECK(r.errors[0].field == "number");
    CHECK(contains(r.errors[0].message, "already in the list"));
    CHECK(r.errors[1].place == "line 4");
    CHECK(r.errors[2].field == "name");
    CHECK(r.errors[3].field == "position");
    CHECK(contains(r.errors[3].message, "'XB' is not a position the list knows (GK, RB"));
}

TEST_CASE("positions belong to units by line and by side", "[squadlist]") {
    CHECK(inUnit("lb", Unit::LeftSide));
    CHECK(inUnit("LB", Unit::Defence));
    CHECK_FALSE(inUnit("LB", Unit::Midfield));
    CHECK(inUnit("RW", Unit::Attack));
    CHECK(inUnit("RW", Unit::RightSide));
    CHECK(inUnit("CM", Unit::Centre));
    CHECK(inUnit("GK", Unit::Goalkeeper));
    // Every known position is on exactly one side and in exactly one line (or the goal).
    for (const auto p : knownPositions()) {
        int sides = 0, lines = 0;
        for (const Unit u : {Unit::LeftSide, Unit::RightSide, Unit::Centre}) sides += inUnit(p, u);
        for (const Unit u : {Unit::Goalkeeper, Unit::Defence, Unit::Midfield, Unit::Attack}) lines += inUnit(p, u);
        CHECK(sides == 1);
        CHECK(lines == 1);
    }
    CHECK(unitFromString("left_side") == Unit::LeftSide);
    CHECK(unitWords(Unit::LeftSide) == "our left side");
}

TEST_CASE("the club file keeps a squad's list; moments name our players and are picked by unit", "[squadlist][moments]") {
    ClubRepository repo(":memory:");
    REQUIRE(ingestFile(repo, pitchloop::testutil::sourcePath("sample-club/matches/KB-2026-08.json").string()).ok());
    CHECK(repo.squadList("First team").empty());
    const auto list = parseSquadList(readFileBytes(pitchloop::testutil::sourcePath("sample-club/squad.csv")), "squad.csv");
    REQUIRE(list.errors.empty());
    repo.replaceSquadList("First team", list.players);
    CHECK(repo.squadList("First team") == list.players);

    // Regains in the centre of their half in match 8 (6 moments): our players named.
    MomentsRequest request;
    request.matchId = "KB-2026-08";
    request.metricId = "regain_5s";
    request.zone = Zone{4, 3};
    const auto all = storedMoments(repo, request);
    REQUIRE(all.problem.empty());
    REQUIRE(all.moments.size() == 6);
    CHECK(all.allMoments == 6);
    CHECK(contains(all.moments[0].what, "we lost the ball (6 L. Farrant's pass)"));
    CHECK(all.moments[0].ourNames.front() == "6 L. Farrant");
    // Picked by one player, and by a unit: each kept moment involves them; the number stays the zone's.
    request.player = "10";
    const auto ten = storedMoments(repo, request);
    CHECK(ten.num == all.num);
    CHECK(ten.den == all.den);
    CHECK(ten.allMoments == 6);
    CHECK(!ten.moments.empty());
    CHECK(ten.moments.size() < all.moments.size());
    for (const auto& m : ten.moments) CHECK(involves(m, "10"));
    request.player.reset();
    request.unit = Unit::Midfield;
    const auto midfield = storedMoments(repo, request);
    for (const auto& m : midfield.moments) CHECK(involves(m, Unit::Midfield, list.players));
    long kept = 0;
    for (const auto& m : all.moments) kept += involves(m, Unit::Midfield, list.players);
    CHECK(static_cast<long>(midfield.moments.size()) == kept);
    // Without a list there is nothing to pick a unit by: said, not guessed.
    repo.replaceSquadList("First team", {});
    CHECK(contains(storedMoments(repo, request).problem, "the squad list of First team is empty"));
}
