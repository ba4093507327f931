// Bad match files: each is refused with a problem naming file, place and field, and leaves the
// club file's data exactly as it was. The files in tests/data/bad/ are copies of
// tests/data/minimal-match.json with one thing broken (see each test case).

#include "ingest.h"
#include "repository.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <catch2/catch.hpp>
#include <filesystem>
#include <fstream>

namespace fs = std::filesystem;
using namespace pitchloop::model;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

fs::path goodFile() {
    return sourcePath("tests/data/minimal-match.json");
}
fs::path badFile(const std::string& name) {
    return sourcePath("tests/data/bad/" + name);
}

/// A real club file on disk that already holds minimal-match.json (KB-TEST-01, 17 events).
struct ClubWithOneMatch {
    fs::path dir = freshTempDir("badinput");
    std::string file = (dir / "club.sqlite").string();

    ClubWithOneMatch() {
        ClubRepository repo(file);
        const IngestReport r = ingestFile(repo, goodFile());
        REQUIRE(r.status == IngestStatus::Added);
        REQUIRE(r.events == 17);
    }
    ~ClubWithOneMatch() {
        std::error_code ec;
        fs::remove_all(dir, ec);
    }
    ClubWithOneMatch(const ClubWithOneMatch&) = delete;
    ClubWithOneMatch& operator=(const ClubWithOneMatch&) = delete;
};

/// Ingests tests/data/bad/`name` into a club file holding one good match and checks that the
/// club file's data is the same afterwards: once read while the repository is still open (a
/// second, read-only connection sees every committed transaction through the WAL; the case
/// "snapshots see committed data" below shows such a snapshot does change on a real write)
/// and once after it is closed (WAL checkpointed into the main file).
IngestReport ingestBad(const std::string& name) {
    ClubWithOneMatch club;
    const std::string before = dataSnapshot(club.file);
    REQUIRE(before.find("KB-TEST-01") != std::string::npos);
    IngestReport report;
    {
        ClubRepository repo(club.file);
        report = ingestFile(repo, badFile(name));
        CHECK(dataSnapshot(club.file) == before);
        REQUIRE(repo.matches().size() == 1);
    }
    CHECK(dataSnapshot(club.file) == before);
    CHECK_FALSE(report.ok());
    CHECK(report.file == badFile(name).string());
    return report;
}

/// The file's single problem; checks that it names the file, the place and the field.
const Problem& onlyProblem(const IngestReport& report, const std::string& name,
                           const std::string& place, const std::string& field) {
    INFO(describeAll(report.errors));
    REQUIRE(report.errors.size() == 1);
    const Problem& p = report.errors.front();
    CHECK(p.file == badFile(name).string());
    CHECK(p.place == place);
    CHECK(p.field == field);
    const std::string line = p.describe();
    CHECK(line.rfind(badFile(name).string() + ": ", 0) == 0);
    return p;
}

bool contains(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

} // namespace

TEST_CASE("snapshots taken while the repository is open see committed data", "[badinput]") {
    // The control for every case below: without it an unchanged snapshot could just mean the
    // read-only connection did not see the open connection's writes.
    ClubWithOneMatch club;
    const std::string before = dataSnapshot(club.file);
    ClubRepository repo(club.file);
    std::string bytes = readFileBytes(goodFile());
    const std::string id = "\"id\": \"KB-TEST-01\"";
    REQUIRE(bytes.find(id) != std::string::npos);
    bytes.replace(bytes.find(id), id.size(), "\"id\": \"KB-TEST-02\"");
    REQUIRE(ingestBytes(repo, bytes, "second.json").status == IngestStatus::Added);
    const std::string after = dataSnapshot(club.file);
    CHECK(after != before);
    CHECK(contains(after, "KB-TEST-02"));
}

TEST_CASE("malformed JSON is refused with the line and column of the fault", "[badinput]") {
    // events[0] ends on line 17 without its comma, so the '{' that opens events[1] on line 18
    // (after four spaces, column 5) is the first character that cannot follow.
    const auto report = ingestBad("malformed-json.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "malformed-json.json", "line 18, column 5", "");
    CHECK(contains(p.message, "not valid JSON"));
}

TEST_CASE("a file of another format is refused", "[badinput]") {
    const auto report = ingestBad("wrong-format-name.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "wrong-format-name.json", "", "format");
    CHECK(contains(p.message, "pitchloop-matches"));
    CHECK(contains(p.message, "pitchloop-match'"));
}

TEST_CASE("a file of an unknown format version is refused", "[badinput]") {
    const auto report = ingestBad("wrong-version.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "wrong-version.json", "", "version");
    CHECK(contains(p.message, "version 3"));
    CHECK(contains(p.message, "knows 1 and 2"));
}

TEST_CASE("an event without a required field is refused", "[badinput]") {
    // events[3], the interception, has no x.
    const auto report = ingestBad("missing-field.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "missing-field.json", "events[3]", "x");
    CHECK(contains(p.message, "missing"));
    CHECK(contains(p.describe(), "events[3].x: missing"));
}

TEST_CASE("a field of the wrong JSON type is refused", "[badinput]") {
    // events[3].t is the string "9.6".
    const auto report = ingestBad("wrongly-typed-field.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "wrongly-typed-field.json", "events[3]", "t");
    CHECK(contains(p.message, "expected a number, found a string"));
}

TEST_CASE("an unknown event type is refused", "[badinput]") {
    // events[5] is a "slide_tackle".
    const auto report = ingestBad("unknown-event-type.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "unknown-event-type.json", "events[5]", "type");
    CHECK(contains(p.message, "slide_tackle"));
}

TEST_CASE("an unknown coordinate frame is refused", "[badinput]") {
    const auto report = ingestBad("unknown-frame.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "unknown-frame.json", "match", "frame");
    CHECK(contains(p.message, "pitchside"));
}

TEST_CASE("an event in a period the header does not list is refused", "[badinput]") {
    // events[13] says period 3; the header lists periods 1 and 2.
    const auto report = ingestBad("period-not-listed.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "period-not-listed.json", "events[13]", "period");
    CHECK(contains(p.message, "period 3"));
}

TEST_CASE("a negative event time is refused", "[badinput]") {
    // events[2] at t = -1.5 s.
    const auto report = ingestBad("negative-time.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "negative-time.json", "events[2]", "t");
    CHECK(contains(p.message, "-1.5"));
}

TEST_CASE("an x more than 3 m off the pitch is refused", "[badinput]") {
    // events[4] at x = 108.5 on a 105 m pitch: 3.5 m behind the goal line (108 would be clamped).
    const auto report = ingestBad("x-off-pitch.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "x-off-pitch.json", "events[4]", "x");
    CHECK(contains(p.message, "108.5"));
    CHECK(contains(p.message, "length 105"));
}

TEST_CASE("a y more than 3 m off the pitch is refused", "[badinput]") {
    // events[6] at y = -3.5: 3.5 m outside our right touchline (-3 would be clamped).
    const auto report = ingestBad("y-off-pitch.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "y-off-pitch.json", "events[6]", "y");
    CHECK(contains(p.message, "-3.5"));
    CHECK(contains(p.message, "width 68"));
}

// Pitch sizes: the Laws of the Game (IFAB), Law 1 "The Field of Play", section 3 "Dimensions":
// the touchline is 90 m to 120 m long, the goal line 45 m to 90 m.

TEST_CASE("a pitch shorter than 90 m is refused (Law 1)", "[badinput]") {
    const auto report = ingestBad("pitch-too-short.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "pitch-too-short.json", "match.pitch", "length_m");
    CHECK(contains(p.message, "89.5"));
    CHECK(contains(p.message, "Law 1"));
}

TEST_CASE("a pitch longer than 120 m is refused (Law 1)", "[badinput]") {
    const auto report = ingestBad("pitch-too-long.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "pitch-too-long.json", "match.pitch", "length_m");
    CHECK(contains(p.message, "121"));
    CHECK(contains(p.message, "Law 1"));
}

TEST_CASE("a pitch narrower than 45 m is refused (Law 1)", "[badinput]") {
    const auto report = ingestBad("pitch-too-narrow.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "pitch-too-narrow.json", "match.pitch", "width_m");
    CHECK(contains(p.message, "44"));
    CHECK(contains(p.message, "Law 1"));
}

TEST_CASE("a pitch wider than 90 m is refused (Law 1)", "[badinput]") {
    const auto report = ingestBad("pitch-too-wide.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "pitch-too-wide.json", "match.pitch", "width_m");
    CHECK(contains(p.message, "91"));
    CHECK(contains(p.message, "Law 1"));
}

TEST_CASE("the Law 1 limits themselves are accepted", "[badinput]") {
    // The refusals above are not just "anything but 105 × 68": the four limits pass, with one
    // event that fits on the smallest pitch.
    ClubRepository repo(":memory:");
    const auto withPitch = [](double length, double width, const std::string& id) {
        return R"({"format": "pitchloop-match", "version": 1, "match": {"id": ")" + id +
               R"(", "date": "2026-07-18", "venue": "home", "us": "Kestrel Bay",
               "opponent": "Saltmarsh Athletic", "pitch": {"length_m": )" +
               std::to_string(length) + R"(, "width_m": )" + std::to_string(width) +
               R"(}, "periods": [{"n": 1, "length_s": 2760}], "frame": "acting"},
               "events": [{"period": 1, "t": 3.0, "side": "us", "type": "pass", "result": "ok",
                           "x": 35.0, "y": 30.0}]})";
    };
    const auto small = ingestBytes(repo, withPitch(90, 45, "KB-LAW1-A"), "smallest.json");
    INFO(describeAll(small.errors));
    CHECK(small.status == IngestStatus::Added);
    const auto large = ingestBytes(repo, withPitch(120, 90, "KB-LAW1-B"), "largest.json");
    INFO(describeAll(large.errors));
    CHECK(large.status == IngestStatus::Added);
}

TEST_CASE("a match without events is refused", "[badinput]") {
    const auto report = ingestBad("empty-events.json");
    CHECK(report.status == IngestStatus::Invalid);
    onlyProblem(report, "empty-events.json", "", "events");
}

TEST_CASE("a different file for a match id already stored is refused", "[badinput]") {
    // Same id KB-TEST-01 as the stored match, another opponent: without --replace it must not
    // overwrite the stored match.
    const auto report = ingestBad("duplicate-match-id.json");
    CHECK(report.status == IngestStatus::Refused);
    CHECK(report.matchId == "KB-TEST-01");
    const Problem& p = onlyProblem(report, "duplicate-match-id.json", "match", "id");
    CHECK(contains(p.message, "KB-TEST-01"));
    CHECK(contains(p.message, "already"));
    CHECK(contains(p.message, "replace"));
}

TEST_CASE("a missing file is reported as a problem and not thrown", "[badinput]") {
    ClubWithOneMatch club;
    const std::string before = dataSnapshot(club.file);
    ClubRepository repo(club.file);
    const fs::path missing = club.dir / "no-such-match.json";
    const IngestReport report = ingestFile(repo, missing);
    CHECK_FALSE(report.ok());
    REQUIRE(report.errors.size() == 1);
    CHECK(report.errors.front().file == missing.string());
    CHECK(contains(report.errors.front().message, "no such file"));
    CHECK(dataSnapshot(club.file) == before);
}

TEST_CASE("a storage fault in the middle of an ingest rolls the whole file back", "[badinput]") {
    // A trigger makes the last tally insert of the ingest fail, after the match row, its
    // periods, its 17 events and six metrics' tallies have been written in the transaction.
    ClubWithOneMatch club;
    ClubRepository repo(club.file);
    {
        SQLite::Database raw(club.file, SQLite::OPEN_READWRITE);
        raw.exec("CREATE TRIGGER simulated_fault BEFORE INSERT ON tally "
                 "WHEN NEW.metric_id = 'pass_completion' "
                 "BEGIN SELECT RAISE(ABORT, 'simulated disk fault'); END");
    }
    const std::string before = dataSnapshot(club.file);
    std::string bytes = readFileBytes(goodFile());
    const std::string id = "\"id\": \"KB-TEST-01\"";
    bytes.replace(bytes.find(id), id.size(), "\"id\": \"KB-TEST-02\"");

    REQUIRE_THROWS_AS(ingestBytes(repo, bytes, "second.json"), StorageError);
    CHECK(dataSnapshot(club.file) == before);
    CHECK_FALSE(repo.sourceOf("KB-TEST-02"));
    CHECK(repo.matches().size() == 1);

    // The connection is usable afterwards: without the fault the same file lands.
    {
        SQLite::Database raw(club.file, SQLite::OPEN_READWRITE);
        raw.exec("DROP TRIGGER simulated_fault");
    }
    CHECK(ingestBytes(repo, bytes, "second.json").status == IngestStatus::Added);
    CHECK(dataSnapshot(club.file) != before);
}

TEST_CASE("a number too large for a double names the event and the field", "[badinput]") {
    // events[2].x is 1e99999 (number-overflow.json); the JSON parser stops at it with a bare
    // "number overflow", which must become a problem of the file, not a crash or an exit 1.
    const auto report = ingestBad("number-overflow.json");
    CHECK(report.status == IngestStatus::Invalid);
    const Problem& p = onlyProblem(report, "number-overflow.json", "events[2]", "x");
    CHECK(contains(p.message, "number too large: 1e99999"));
}
