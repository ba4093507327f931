// Target edits computed from stored versions: season names and days, copying a season's
// targets into the next, and undoing an edit so that inForce gives back what it gave before.
// Every target here is invented; each expected value is worked out in the comment beside it.

#include "repository.h"
#include "targetedits.h"
#include "targets.h"

#include <catch2/catch.hpp>
#include <string>
#include <vector>

using namespace pitchloop::model;

namespace {

Target version(const std::string& season, int band, int lane, double value, const std::string& from,
               const std::string& recorded, long long id, bool retired = false) {
    Target t;
    t.key = {"First team", season, "regain_5s", band, lane};
    t.direction = Direction::AtLeast;
    t.value = value;
    t.watchMargin = 0.05;
    t.minSample = 30;
    t.author = "R. Tamsin";
    t.rationale = "hold the press";
    t.effectiveFrom = from;
    t.recordedAt = recorded;
    t.retired = retired;
    t.version = id;
    return t;
}

/// The versions of one key (the key of `probe`) among `all`.
std::vector<Target> ofKey(const std::vector<Target>& all, const Target& probe) {
    std::vector<Target> out;
    for (const auto& t : all)
        if (t.key == probe.key) out.push_back(t);
    return out;
}

} // namespace

TEST_CASE("season names step back and forward, and span July to June") {
    CHECK(previousSeason("2026-27") == "2025-26");
    CHECK(nextSeason("2026-27") == "2027-28");
    CHECK(previousSeason("2000-01") == "1999-00");
    CHECK(nextSeason("1999-00") == "2000-01");
    CHECK(previousSeason("2026-28").empty()); // not a season name
    CHECK(seasonStart("2026-27") == "2026-07-01");
    CHECK(seasonEnd("2026-27") == "2027-06-30");
    CHECK(seasonEnd("junk").empty());
}

TEST_CASE("copying a season carries the targets in force on its last day") {
    const std::vector<Target> last{
        version("2025-26", 5, 1, 0.40, "2025-07-01", "2025-07-10T09:00:00Z", 1),
        version("2025-26", 5, 1, 0.45, "2026-01-01", "2025-12-20T09:00:00Z", 2), // later: wins
        version("2025-26", 4, 2, 0.30, "2025-07-01", "2025-07-10T09:00:00Z", 3),
        version("2025-26", 4, 2, 0.30, "2026-03-01", "2026-02-20T09:00:00Z", 4, true), // retired
        version("2024-25", 3, 3, 0.50, "2024-07-01", "2024-07-10T09:00:00Z", 5), // other season
    };
    const auto copies = copySeasonTargets(last, "2025-26", "2026-27", "P. Nwosu");
    // Zone (4,2) ended retired on 2026-03-01, so only (5,1) at its January value goes across.
    REQUIRE(copies.size() == 1);
    const Target& c = copies.front();
    CHECK(c.key.season == "2026-27");
    CHECK(c.key.band == 5);
    CHECK(c.key.lane == 1);
    CHECK(c.value == 0.45);
    CHECK(c.effectiveFrom == "2026-07-01");
    CHECK(c.author == "P. Nwosu");
    CHECK(c.rationale == "copied from 2025-26: hold the press");
    CHECK(c.recordedAt.empty());
    CHECK(c.version == 0);
    CHECK(copySeasonTargets(last, "2023-24", "2024-25", "P. Nwosu").empty());
}

TEST_CASE("undoing a change writes back the version that was in force on its date") {
    const Target p = version("2026-27", 5, 1, 0.40, "2026-07-01", "2026-07-10T09:00:00Z", 1);
    const Target n = version("2026-27", 5, 1, 0.55, "2026-10-01", "2026-10-02T09:00:00Z", 2);
    const std::vector<Target> before{p};
    const auto undo = revertVersions(before, {n}, "R. Tamsin", "undo", "2026-10-02T09:00:00Z");
    REQUIRE(undo.size() == 1);
    CHECK(undo[0].value == 0.40);
    CHECK_FALSE(undo[0].retired);
    CHECK(undo[0].effectiveFrom == "2026-10-01");
    CHECK(undo[0].rationale == "undo");

    // Stored after n with a higher id: every date reads as before the change.
    std::vector<Target> after{p, n, undo[0]};
    after.back().version = 3;
    for (const char* date : {"2026-08-01", "2026-10-01", "2027-05-01"})
        CHECK(inForce(after, date)->value == inForce(before, date)->value);
}

TEST_CASE("undoing a new target retires it from its date, and the undo wins a clock tie") {
    const Target n = version("2026-27", 2, 5, 0.35, "2026-09-01", "2026-09-05T09:00:00Z", 7);
    // The clock reads earlier than n's stamp: the undo takes n's stamp so it still wins.
    const auto undo = revertVersions({}, {n}, "R. Tamsin", "undo", "2026-09-01T08:00:00Z");
    REQUIRE(undo.size() == 1);
    CHECK(undo[0].retired);
    CHECK(undo[0].recordedAt == "2026-09-05T09:00:00Z");
    std::vector<Target> after{n, undo[0]};
    after.back().version = 8;
    CHECK_FALSE(inForce(after, "2026-09-01").has_value());
    CHECK_FALSE(inForce(after, "2027-01-01").has_value());
}

TEST_CASE("undoing an earlier-dated change restores the old version only where it ruled") {
    // e: from July; p: from December. n, dated October, ruled October–November only.
    const Target e = version("2026-27", 3, 3, 0.30, "2026-07-01", "2026-07-10T09:00:00Z", 1);
    const Target p = version("2026-27", 3, 3, 0.50, "2026-12-01", "2026-07-10T09:00:00Z", 2);
    const Target n = version("2026-27", 3, 3, 0.42, "2026-10-01", "2026-10-02T09:00:00Z", 3);
    const auto undo = revertVersions({e, p}, {n}, "R. Tamsin", "undo", "2026-10-02T10:00:00Z");
    REQUIRE(undo.size() == 1);
    CHECK(undo[0].value == 0.30); // e ruled on 1 Oct before the change
    std::vector<Target> after{e, p, n, undo[0]};
    after.back().version = 4;
    CHECK(inForce(ofKey(after, n), "2026-10-15")->value == 0.30);
    CHECK(inForce(ofKey(after, n), "2026-12-15")->value == 0.50); // p untouched
}

TEST_CASE("copy and undo round-trip through a club file") {
    ClubRepository repo(":memory:");
    repo.ensureSeason("First team", "2025-26");
    repo.ensureSeason("First team", "2026-27");
    repo.addTargets({version("2025-26", 5, 1, 0.45, "2025-07-01", "", 0)}, "2025-07-02T09:00:00Z");
    const auto copies = copySeasonTargets(repo.targets("First team", "2025-26"), "2025-26", "2026-27",
                                          "P. Nwosu");
    const auto before = repo.targets("First team", "2026-27");
    repo.addTargets(copies, "2026-07-01T09:00:00Z");
    const auto stored = repo.targets("First team", "2026-27");
    REQUIRE(stored.size() == 1);
    CHECK(inForce(stored, "2026-08-01")->value == 0.45);
    repo.addTargets(revertVersions(before, stored, "P. Nwosu", "undo", "2026-07-01T09:00:00Z"),
                    "2026-07-01T09:00:00Z");
    CHECK_FALSE(inForce(repo.targets("First team", "2026-27"), "2026-08-01").has_value());
}
