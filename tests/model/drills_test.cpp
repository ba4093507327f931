// The drill book: validation of each field, versions and history, search by each filter,
// reversible deletes, text in any script kept byte for byte, the drills file (good, bad,
// round trip), imports that add nothing twice and change nothing on error, and the demo
// drill book. Every drill here is invented.

#include "drills.h"
#include "matchreader.h"
#include "metricspec.h"
#include "repository.h"
#include "testutil.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <algorithm>
#include <catch2/catch.hpp>
#include <filesystem>
#include <functional>
#include <nlohmann/json.hpp>
#include <set>
#include <string>
#include <vector>

using namespace pitchloop::model;
using nlohmann::json;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
using pitchloop::testutil::sourcePath;

namespace {

const std::string kNow = "2026-07-20T10:00:00Z";
const std::string kLater = "2026-07-21T09:30:00Z";

Drill goodDrill() {
    Drill d;
    d.title = "Rondo 4v1";
    d.purpose = "Quick passing under light pressure";
    d.organisation = "A 15 × 15 m box.\nFour outside, one inside.";
    d.coachingPoints = {"Open body to the field", "Pass to the far foot"};
    d.durationMin = 12;
    d.intensity = 3;
    d.playersMin = 5;
    d.playersMax = 10;
    d.areaLengthM = 15;
    d.areaWidthM = 15;
    d.equipment = {"cones", "balls"};
    d.metrics = {"pass_completion"};
    d.zones = {{3, 3}};
    d.tags = {"warm_up", "rondo"};
    d.author = "L. Farrant";
    return d;
}

/// The one-line descriptions of problems, in order.
std::vector<std::string> described(const Problems& problems) {
    std::vector<std::string> out;
    for (const auto& p : problems)
        out.push_back(p.describe());
    return out;
}

std::vector<std::int64_t> ids(const std::vector<Drill>& drills) {
    std::vector<std::int64_t> out;
    for (const auto& d : drills)
        out.push_back(d.id);
    return out;
}

/// A drills file of `drills` objects.
std::string fileOf(const std::vector<json>& drills) {
    return json{{"format", "pitchloop-drills"}, {"version", 1}, {"drills", drills}}.dump(2);
}

json goodObject(const std::string& title) {
    return {{"title", title},           {"duration_min", 15},
            {"intensity", 3},           {"players", {{"min", 6}, {"max", 12}}},
            {"metrics", {"regain_5s"}}, {"zones", {{4, 3}}},
            {"author", "D. Arkwright"}};
}

DrillQuery query(const std::string& text, const std::string& tag = "",
                 const std::string& metric = "", std::optional<Zone> zone = std::nullopt,
                 bool includeDeleted = false) {
    DrillQuery q;
    q.text = text;
    q.tag = tag;
    q.metric = metric;
    q.zone = zone;
    q.includeDeleted = includeDeleted;
    return q;
}

/// A club file in a fresh temp folder.
struct ClubFile {
    std::filesystem::path dir = freshTempDir("drills");
    std::string file = (dir / "club.sqlite").string();
    ~ClubFile() {
        std::error_code ec;
        std::filesystem::remove_all(dir, ec);
    }
};

} // namespace

TEST_CASE("a drill at every limit passes validation", "[drills]") {
    const ZoneGrid grid; // 6 × 5
    Drill low = goodDrill();
    low.durationMin = 1;
    low.intensity = 1;
    low.playersMin = low.playersMax = 1;
    low.areaLengthM = low.areaWidthM = 1;
    low.zones = {{1, 1}};
    CHECK(validateDrill(low, builtinMetrics(), grid, "t").empty());

    Drill high = goodDrill();
    high.durationMin = 180;
    high.intensity = 5;
    high.playersMin = 40;
    high.playersMax = 40;
    high.areaLengthM = 120; // Law 1: a pitch is at most 120 m long and 90 m wide
    high.areaWidthM = 90;
    high.zones = {{6, 5}};
    CHECK(validateDrill(high, builtinMetrics(), grid, "t").empty());

    Drill bare = goodDrill(); // only the required fields
    bare.purpose.clear();
    bare.organisation.clear();
    bare.coachingPoints.clear();
    bare.areaLengthM = bare.areaWidthM = 0;
    bare.equipment.clear();
    bare.metrics.clear();
    bare.zones.clear();
    bare.tags.clear();
    CHECK(validateDrill(bare, builtinMetrics(), grid, "t").empty());
}

TEST_CASE("each validation rule names its field", "[drills]") {
    struct Case {
        std::function<void(Drill&)> change;
        std::string expected;
    };
    const std::vector<Case> cases = {
        {[](Drill& d) { d.title.clear(); }, "d.json: title: required"},
        {[](Drill& d) { d.title = "  \t"; }, "d.json: title: required"},
        {[](Drill& d) { d.author.clear(); }, "d.json: author: required"},
        {[](Drill& d) { d.durationMin = 0; }, "d.json: duration_min: expected 1–180, found 0"},
        {[](Drill& d) { d.durationMin = 181; }, "d.json: duration_min: expected 1–180, found 181"},
        {[](Drill& d) { d.intensity = 0; }, "d.json: intensity: expected 1–5, found 0"},
        {[](Drill& d) { d.intensity = 6; }, "d.json: intensity: expected 1–5, found 6"},
        {[](Drill& d) { d.playersMin = 0; }, "d.json: players.min: expected 1–40, found 0"},
        {[](Drill& d) { d.playersMax = 41; }, "d.json: players.max: expected 1–40, found 41"},
        {[](Drill& d) {
             d.playersMin = 14;
             d.playersMax = 8;
         },
         "d.json: players: min 14 is more than max 8"},
        {[](Drill& d) { d.areaLengthM = 121; },
         "d.json: area_m.length: expected 1–120 m, found 121"},
        {[](Drill& d) { d.areaWidthM = 90.5; },
         "d.json: area_m.width: expected 1–90 m, found 90.5"},
        {[](Drill& d) { d.areaLengthM = 0.5; },
         "d.json: area_m.length: expected 1–120 m, found 0.5"},
        {[](Drill& d) {
             d.metrics = {"regain_5s", "made_up"};
         },
         "d.json: metrics[1]: unknown metric 'made_up'"},
        {[](Drill& d) {
             d.metrics = {"losses", "losses"};
         },
         "d.json: metrics[1]: 'losses' is listed twice"},
        {[](Drill& d) {
             d.zones = {{7, 1}};
         },
         "d.json: zones[0]: band 7 lane 1 is outside the equal:6x5 grid (bands 1–6, lanes 1–5)"},
        {[](Drill& d) {
             d.zones = {{2, 5}, {2, 6}};
         },
         "d.json: zones[1]: band 2 lane 6 is outside the equal:6x5 grid (bands 1–6, lanes 1–5)"},
        {[](Drill& d) {
             d.zones = {{0, 1}};
         },
         "d.json: zones[0]: band 0 lane 1 is outside the equal:6x5 grid (bands 1–6, lanes 1–5)"},
        {[](Drill& d) {
             d.zones = {{2, 5}, {2, 5}};
         },
         "d.json: zones[1]: band 2 lane 5 is listed twice"},
        {[](Drill& d) { d.title = "Rondo \xC3"; }, "d.json: title: not valid UTF-8 text"},
        {[](Drill& d) { d.title = "Rondo\n4v1"; },
         "d.json: title: expected one line without control characters"},
        {[](Drill& d) {
             d.coachingPoints = {"", "Scan"};
         },
         "d.json: coaching_points[0]: required"},
        {[](Drill& d) {
             d.tags = {"Warm_up", "warm_up"};
         },
         "d.json: tags[1]: 'warm_up' is listed twice"},
        {[](Drill& d) { d.organisation = "bell\x07"; },
         "d.json: organisation: control characters other than line breaks and tabs"},
    };
    for (const auto& c : cases) {
        Drill d = goodDrill();
        c.change(d);
        INFO(c.expected);
        CHECK(described(validateDrill(d, builtinMetrics(), ZoneGrid(), "d.json")) ==
              std::vector<std::string>{c.expected});
    }
}

TEST_CASE("UTF-8 checks refuse malformed byte sequences", "[drills]") {
    // RFC 3629 §3–4: overlong forms, surrogates and code points past U+10FFFF are ill-formed.
    for (const std::string bad : {"\xC0\xAF", "\xE0\x80\xAF", "\xED\xA0\x80", "\xF4\x90\x80\x80",
                                  "\x80", "\xE2\x82", "\xFF"}) {
        Drill d = goodDrill();
        d.purpose = "ok " + bad;
        INFO("bytes: " << json(std::vector<int>(bad.begin(), bad.end())).dump());
        CHECK(described(validateDrill(d, builtinMetrics(), ZoneGrid(), "x")) ==
              std::vector<std::string>{"x: purpose: not valid UTF-8 text"});
    }
    Drill fine = goodDrill();
    fine.purpose = "\xF4\x8F\xBF\xBF \xEF\xBF\xBD \xC2\x80"; // U+10FFFF, U+FFFD, U+0080
    CHECK(validateDrill(fine, builtinMetrics(), ZoneGrid(), "x").empty());
}

TEST_CASE("zones are checked against the grid given", "[drills]") {
    Drill d = goodDrill();
    d.zones = {{4, 3}};
    CHECK(validateDrill(d, builtinMetrics(), ZoneGrid::equal(4, 3), "t").empty());
    d.zones = {{5, 1}, {1, 4}};
    CHECK(described(validateDrill(d, builtinMetrics(), ZoneGrid::equal(4, 3), "t")) ==
          std::vector<std::string>{
              "t: zones[0]: band 5 lane 1 is outside the equal:4x3 grid (bands 1–4, lanes 1–3)",
              "t: zones[1]: band 1 lane 4 is outside the equal:4x3 grid (bands 1–4, lanes 1–3)"});
}

TEST_CASE("text in any script is accepted and kept byte for byte", "[drills]") {
    ClubRepository repo(":memory:");
    DrillBook book(repo);
    Drill d = goodDrill();
    d.title = "Pressing ⚽🔥 Überzahl – 中文 練習";
    d.purpose = "Ganhar a bola em cinco segundos; défense à trois";
    // "é" twice: precomposed U+00E9, and "e" + combining acute U+0301 (no normalisation).
    d.organisation = "caf\xC3\xA9 / cafe\xCC\x81\n第二行 (second line)";
    d.coachingPoints = {"Körper offen 👀", "Παίξε γρήγορα", "Играй быстро"};
    d.tags = {"übung", "練習"};
    d.author = "Søren Ó Briain";
    REQUIRE(validateDrill(d, builtinMetrics(), ZoneGrid(), "t").empty());

    const DrillChange added = book.add(d, d.author, kNow);
    REQUIRE(added.ok());
    const auto back = book.get(added.id);
    REQUIRE(back);
    CHECK(back->sameContent(d));
    CHECK(back->title == d.title);
    CHECK(back->organisation == d.organisation); // both forms of é survive unchanged
    CHECK(back->editedBy == "Søren Ó Briain");

    // Through the drills file and back, into another club.
    const std::string file = writeDrillFile(book.list());
    CHECK(file.find("⚽🔥") != std::string::npos); // written as UTF-8, not \u escapes
    const auto parsed = parseDrillFile(file, "x.json", builtinMetrics(), ZoneGrid());
    REQUIRE(parsed.errors.empty());
    REQUIRE(parsed.drills.size() == 1);
    CHECK(parsed.drills[0].sameContent(d));

    // Search finds non-ASCII words when they are written the same way.
    CHECK(ids(book.search(query("überzahl"))).empty()); // Ü is not folded (ASCII only)
    CHECK(ids(book.search(query("Überzahl 練習"))) == std::vector<std::int64_t>{added.id});
    CHECK(ids(book.search(query("ΠΑΊΞΕ"))).empty());
    CHECK(ids(book.search(query("Παίξε"))) == std::vector<std::int64_t>{added.id});
    CHECK(ids(book.search(query("", "練習"))) == std::vector<std::int64_t>{added.id});
}

TEST_CASE("asciiLower lowers ASCII letters only and the stored search text uses it", "[drills]") {
    CHECK(asciiLower("ÉCOLE Überlauf ABC-xyz 09") == "École Überlauf abc-xyz 09");
    ClubRepository repo(":memory:");
    DrillBook book(repo);
    Drill d = goodDrill();
    d.title = "LEFT-BACK Cover";
    d.purpose = "";
    d.organisation = "Back Four";
    d.coachingPoints = {"Show Outside"};
    d.tags = {"Full_Back"};
    REQUIRE(book.add(d, "A", kNow).ok());
    // title, purpose, organisation, points, tags (a tag with '_' also spelled with a space)
    CHECK(repo.database().execAndGet("SELECT search_text FROM drill_version").getString() ==
          "left-back cover\n\nback four\nshow outside\nfull_back\nfull back");
    CHECK(drillSearchText(d) == "left-back cover\n\nback four\nshow outside\nfull_back\nfull back");
}

TEST_CASE("add, edit and history keep every version", "[drills]") {
    ClubRepository repo(":memory:");
    DrillBook book(repo);
    const Drill d = goodDrill();
    const DrillChange added = book.add(d, "L. Farrant", kNow);
    REQUIRE(added.ok());
    CHECK(added.changed);
    CHECK(added.id == 1);

    auto first = book.get(added.id);
    REQUIRE(first);
    CHECK(first->sameContent(d));
    CHECK(first->id == 1);
    CHECK(first->createdAt == kNow);
    CHECK(first->editedAt == kNow);
    CHECK(first->editedBy == "L. Farrant");
    CHECK(first->versionCount == 1);
    CHECK_FALSE(first->deleted);

    Drill changed = *first;
    changed.intensity = 4;
    changed.coachingPoints.push_back("Scan before receiving");
    const DrillChange edited = book.edit(added.id, changed, "D. Arkwright", kLater);
    REQUIRE(edited.ok());
    CHECK(edited.changed);

    const auto now = book.get(added.id);
    REQUIRE(now);
    CHECK(now->intensity == 4);
    CHECK(now->coachingPoints.size() == 3);
    CHECK(now->title == d.title); // untouched fields stay
    CHECK(now->createdAt == kNow);
    CHECK(now->editedAt == kLater);
    CHECK(now->editedBy == "D. Arkwright");
    CHECK(now->versionCount == 2);

    const auto history = book.history(added.id);
    REQUIRE(history.size() == 2);
    // What the second version changed, by drills-file key (alphabetical).
    CHECK(changedFields(history[0], history[1]) ==
          std::vector<std::string>{"coaching_points", "intensity"});
    CHECK(changedFields(history[1], history[1]).empty());
    CHECK(history[0].sameContent(d));
    CHECK(history[0].editedBy == "L. Farrant");
    CHECK(history[0].editedAt == kNow);
    CHECK(history[0].versionCount == 1);
    CHECK(history[1].sameContent(changed));
    CHECK(history[1].editedBy == "D. Arkwright");
    CHECK(history[1].versionCount == 2);

    SECTION("an edit that changes nothing adds no version") {
        const DrillChange same =
            book.edit(added.id, changed, "D. Arkwright", "2026-07-22T08:00:00Z");
        CHECK(same.ok());
        CHECK_FALSE(same.changed);
        CHECK(book.history(added.id).size() == 2);
    }
    SECTION("an unknown id is a clear problem") {
        const DrillChange r = book.edit(17, changed, "D. Arkwright", kLater);
        REQUIRE(r.problems.size() == 1);
        CHECK(r.problems[0].message == "no drill 17");
        CHECK(r.problems[0].file.empty());
        CHECK_FALSE(book.get(17));
        CHECK(book.history(17).empty());
    }
    SECTION("an invalid edit stores nothing") {
        Drill bad = changed;
        bad.intensity = 7;
        const DrillChange r = book.edit(added.id, bad, "D. Arkwright", kLater, "edit");
        CHECK(described(r.problems) ==
              std::vector<std::string>{"edit: intensity: expected 1–5, found 7"});
        CHECK(book.history(added.id).size() == 2);
        CHECK(book.get(added.id)->intensity == 4);
    }
    SECTION("an edit needs someone to make it") {
        Drill other = changed;
        other.durationMin = 20;
        const DrillChange r = book.edit(added.id, other, " ", kLater);
        CHECK(described(r.problems) ==
              std::vector<std::string>{"drill: edited_by: say who edits it"});
    }
    SECTION("an invalid add stores nothing") {
        Drill bad = goodDrill();
        bad.title.clear();
        bad.metrics = {"nope"};
        const DrillChange r = book.add(bad, "L. Farrant", kNow, "new");
        CHECK(described(r.problems) ==
              std::vector<std::string>{"new: title: required",
                                       "new: metrics[0]: unknown metric 'nope'"});
        CHECK(r.id == 0);
        CHECK(book.list(true).size() == 1);
    }
}

TEST_CASE("search by text, tag, metric and zone, all combined with AND", "[drills]") {
    ClubRepository repo(":memory:");
    DrillBook book(repo);
    Drill a = goodDrill(); // 1
    a.title = "Defending the left-back zone";
    a.purpose = "Stop overloads wide of our box";
    a.organisation = "Channel along our left touchline";
    a.coachingPoints = {"Left winger tracks the overlapping full-back"};
    a.metrics = {"pre_shot_passes_against", "press_rate"};
    a.zones = {{2, 5}, {1, 5}};
    a.tags = {"defending", "Full_Back"};
    Drill b = goodDrill(); // 2
    b.title = "Counter-press 6v6";
    b.purpose = "Win it back within five seconds";
    b.organisation = "Thirds; the coach counts aloud";
    b.coachingPoints = {"First player presses the ball"};
    b.metrics = {"regain_5s", "press_rate"};
    b.zones = {{4, 3}, {5, 3}};
    b.tags = {"pressing", "transition"};
    Drill c = goodDrill(); // 3
    c.title = "Cool-down jog";
    c.purpose = "Bring the heart rate down";
    c.organisation = "Easy laps";
    c.coachingPoints = {"Chatting pace"};
    c.metrics = {};
    c.zones = {};
    c.tags = {"cool_down"};
    for (const Drill& d : {a, b, c})
        REQUIRE(book.add(d, d.author, kNow).ok());
    using Ids = std::vector<std::int64_t>;

    // text: each field, any case of ASCII letters, every word must appear
    CHECK(ids(book.search(query("LEFT-BACK"))) == Ids{1});          // title
    CHECK(ids(book.search(query("five seconds"))) == Ids{2});       // purpose
    CHECK(ids(book.search(query("touchline"))) == Ids{1});          // organisation
    CHECK(ids(book.search(query("overlapping WINGER"))) == Ids{1}); // coaching point
    CHECK(ids(book.search(query("transition"))) == Ids{2});         // tag
    CHECK(ids(book.search(query("cool down"))) == Ids{3});          // tag, '_' as space
    CHECK(ids(book.search(query("press"))) == Ids{2});              // part of a word
    CHECK(ids(book.search(query("the"))) == Ids{1, 2, 3});
    CHECK(ids(book.search(query("left seconds"))).empty()); // not in one drill
    CHECK(ids(book.search(query(" "))) == Ids{1, 2, 3});    // no words: all
    CHECK(ids(book.search(query("100%_x"))).empty());       // no wildcards

    // tag (ASCII case ignored), metric, zone
    CHECK(ids(book.search(query("", "full_back"))) == Ids{1});
    CHECK(ids(book.search(query("", "COOL_DOWN"))) == Ids{3});
    CHECK(ids(book.search(query("", "full"))).empty()); // whole tags only
    CHECK(ids(book.search(query("", "", "press_rate"))) == Ids{1, 2});
    CHECK(ids(book.search(query("", "", "regain_5s"))) == Ids{2});
    CHECK(ids(book.search(query("", "", "losses"))).empty());
    CHECK(ids(book.search(query("", "", "", Zone{2, 5}))) == Ids{1});
    CHECK(ids(book.search(query("", "", "", Zone{5, 3}))) == Ids{2});
    CHECK(ids(book.search(query("", "", "", Zone{5, 2}))).empty());

    // combined
    CHECK(ids(book.search(query("the", "", "press_rate"))) == Ids{1, 2});
    CHECK(ids(book.search(query("the", "", "press_rate", Zone{4, 3}))) == Ids{2});
    CHECK(ids(book.search(query("", "defending", "regain_5s"))).empty());
    CHECK(ids(book.search(query("counter", "pressing", "regain_5s", Zone{4, 3}))) == Ids{2});

    // the latest version is searched, not earlier ones
    Drill renamed = *book.get(2);
    renamed.title = "Gegen 6v6";
    renamed.purpose = "Regain quickly";
    REQUIRE(book.edit(2, renamed, "D. Arkwright", kLater).ok());
    CHECK(ids(book.search(query("counter-press"))).empty());
    CHECK(ids(book.search(query("gegen"))) == Ids{2});
}

TEST_CASE("delete is reversible and keeps the history", "[drills]") {
    ClubRepository repo(":memory:");
    DrillBook book(repo);
    Drill other = goodDrill();
    other.title = "Another";
    REQUIRE(book.add(goodDrill(), "L. Farrant", kNow).id == 1);
    REQUIRE(book.add(other, "L. Farrant", kNow).id == 2);
    Drill v2 = goodDrill();
    v2.durationMin = 14;
    REQUIRE(book.edit(1, v2, "D. Arkwright", kNow).ok());

    const DrillChange removed = book.remove(1, kLater);
    REQUIRE(removed.ok());
    CHECK(ids(book.list()) == std::vector<std::int64_t>{2});
    CHECK(ids(book.list(true)) == std::vector<std::int64_t>{1, 2});
    CHECK(book.list(true)[0].deleted);
    CHECK(ids(book.search(query("4v1"))).empty()); // only drill 1's title says 4v1
    CHECK(ids(book.search(query("4v1", "", "", std::nullopt, true))) ==
          std::vector<std::int64_t>{1});
    const auto gone = book.get(1);
    REQUIRE(gone);
    CHECK(gone->deleted);
    CHECK(gone->versionCount == 2);
    CHECK(book.history(1).size() == 2);

    CHECK(book.remove(1, kLater).problems[0].message ==
          "drill 1 is already deleted (since " + kLater + ")");
    CHECK(book.edit(1, goodDrill(), "D. Arkwright", kLater).problems[0].message ==
          "drill 1 is deleted; restore it first");
    CHECK(book.remove(17, kLater).problems[0].message == "no drill 17");
    CHECK(book.restore(17).problems[0].message == "no drill 17");

    REQUIRE(book.restore(1).ok());
    CHECK(ids(book.list()) == std::vector<std::int64_t>{1, 2});
    CHECK_FALSE(book.get(1)->deleted);
    CHECK(book.get(1)->durationMin == 14);
    CHECK(book.restore(1).problems[0].message == "drill 1 is not deleted");
    CHECK(repo.database().execAndGet("SELECT count(*) FROM drill_version").getInt() == 3);
}

TEST_CASE("the drills file round-trips and reads its own shape", "[drills]") {
    Drill full = goodDrill();
    full.areaLengthM = 52.5;
    Drill minimal = goodDrill();
    minimal.title = "Minimal";
    minimal.purpose.clear();
    minimal.organisation.clear();
    minimal.coachingPoints.clear();
    minimal.areaLengthM = minimal.areaWidthM = 0;
    minimal.equipment.clear();
    minimal.metrics.clear();
    minimal.zones.clear();
    minimal.tags.clear();
    const std::string text = writeDrillFile({full, minimal});
    const json root = json::parse(text);
    CHECK(root["format"] == "pitchloop-drills");
    CHECK(root["version"] == 1);
    CHECK(root["drills"][0]["players"] == json{{"min", 5}, {"max", 10}});
    CHECK(root["drills"][0]["area_m"] == json{{"length", 52.5}, {"width", 15}});
    CHECK(root["drills"][0]["zones"] == json{{3, 3}});
    CHECK_FALSE(root["drills"][1].contains("area_m")); // no area given: no key
    CHECK(text.find("\"zones\": [[3, 3]]") != std::string::npos);

    const auto parsed = parseDrillFile(text, "x.json", builtinMetrics(), ZoneGrid());
    REQUIRE(parsed.errors.empty());
    REQUIRE(parsed.drills.size() == 2);
    CHECK(parsed.drills[0].sameContent(full));
    CHECK(parsed.drills[1].sameContent(minimal));
    CHECK(writeDrillFile(parsed.drills) == text);

    // Only the required keys: the rest are empty.
    const auto bare = parseDrillFile(fileOf({{{"title", "T"},
                                              {"duration_min", 5},
                                              {"intensity", 1},
                                              {"players", {{"min", 1}, {"max", 2}}},
                                              {"author", "A"}}}),
                                     "y.json", builtinMetrics(), ZoneGrid());
    REQUIRE(bare.errors.empty());
    CHECK(bare.drills[0].metrics.empty());
    CHECK_FALSE(bare.drills[0].hasArea());

    // to_json / from_json beside the type agree with the file's objects.
    const Drill back = json(full).get<Drill>();
    CHECK(back.sameContent(full));
}

TEST_CASE("problems in a drills file name file, place and field", "[drills]") {
    auto problemsOf = [](const std::string& text) {
        const auto r = parseDrillFile(text, "drills.json", builtinMetrics(), ZoneGrid());
        if (!r.errors.empty()) CHECK(r.drills.empty()); // a file with an error gives nothing
        return described(r.errors);
    };
    using Lines = std::vector<std::string>;
    std::vector<json> four = {goodObject("a"), goodObject("b"), goodObject("c"), goodObject("d")};
    four[3]["intensity"] = 7;
    CHECK(problemsOf(fileOf(four)) ==
          Lines{"drills.json: drills[3].intensity: expected 1–5, found 7"});

    json missing = goodObject("x");
    missing.erase("title");
    missing.erase("players");
    CHECK(problemsOf(fileOf({missing})) == Lines{"drills.json: drills[0].title: missing",
                                                 "drills.json: drills[0].players: missing"});

    json wrong = goodObject("x");
    wrong["intensity"] = "high";
    wrong["duration_min"] = 12.5;
    wrong["coaching_points"] = "one long text";
    wrong["zones"] = {{2}, {2, 5}};
    wrong["players"] = {{"min", 4}};
    wrong["area_m"] = {{"length", "40"}, {"width", 30}, {"depth", 2}};
    wrong["colour"] = "red";
    wrong["tags"] = {"ok", 3};
    CHECK(problemsOf(fileOf({wrong})) ==
          Lines{"drills.json: drills[0].colour: unknown key",
                "drills.json: drills[0].coaching_points: expected a list of texts, found \"one "
                "long text\"",
                "drills.json: drills[0].duration_min: expected a whole number, found 12.5",
                "drills.json: drills[0].intensity: expected a whole number, found \"high\"",
                "drills.json: drills[0].players.max: missing",
                "drills.json: drills[0].area_m.depth: unknown key",
                "drills.json: drills[0].area_m.length: expected metres, found \"40\"",
                "drills.json: drills[0].zones[0]: expected [band, lane] with whole numbers, "
                "found [2]",
                "drills.json: drills[0].tags[1]: expected text, found 3"});

    CHECK(problemsOf(fileOf({json("just text")})) ==
          Lines{"drills.json: drills[0]: expected a drill object, found \"just text\""});
    CHECK(problemsOf("{\"format\": \"pitchloop-targets\", \"version\": 1, \"drills\": []}") ==
          Lines{"drills.json: format: expected \"format\": \"pitchloop-drills\" and "
                "\"version\": 1"});
    CHECK(problemsOf("{\"format\": \"pitchloop-drills\", \"version\": 2, \"drills\": []}") ==
          Lines{"drills.json: format: expected \"format\": \"pitchloop-drills\" and "
                "\"version\": 1"});
    CHECK(problemsOf("{\"format\": \"pitchloop-drills\", \"version\": 1, \"drills\": {}}") ==
          Lines{"drills.json: drills: expected a list of drills"});
    const auto notJson = problemsOf("{\"format\": ");
    REQUIRE(notJson.size() == 1);
    CHECK(notJson[0].rfind("drills.json: not valid JSON: ", 0) == 0);
}

TEST_CASE("one drill object reads over a base, changing only its keys", "[drills]") {
    Drill base = goodDrill();
    auto r = parseDrillObject("{\"intensity\": 4, \"tags\": [\"pressing\"]}", "p.json", base, false,
                              builtinMetrics(), ZoneGrid());
    REQUIRE(r.errors.empty());
    Drill expected = base;
    expected.intensity = 4;
    expected.tags = {"pressing"};
    CHECK(r.drill.sameContent(expected));

    r = parseDrillObject("{\"intensity\": 9}", "p.json", base, false, builtinMetrics(), ZoneGrid());
    CHECK(described(r.errors) ==
          std::vector<std::string>{"p.json: intensity: expected 1–5, found 9"});

    r = parseDrillObject("{\"intensity\": 4}", "p.json", Drill{}, true, builtinMetrics(),
                         ZoneGrid());
    CHECK(described(r.errors) ==
          std::vector<std::string>{"p.json: title: missing", "p.json: author: missing",
                                   "p.json: duration_min: missing", "p.json: players: missing"});

    // A drills file holding one drill is read as that drill; with two it is refused.
    r = parseDrillObject(fileOf({goodObject("one")}), "f.json", Drill{}, true, builtinMetrics(),
                         ZoneGrid());
    REQUIRE(r.errors.empty());
    CHECK(r.drill.title == "one");
    r = parseDrillObject(fileOf({goodObject("one"), goodObject("two")}), "f.json", Drill{}, true,
                         builtinMetrics(), ZoneGrid());
    CHECK(described(r.errors) ==
          std::vector<std::string>{
              "f.json: drills: expected one drill here, found 2 (a file of several drills is imported into the drill book as a whole)"});
}

TEST_CASE("importing the same drills twice adds nothing", "[drills]") {
    ClubFile club;
    ClubRepository repo(club.file);
    DrillBook book(repo);
    // "b" appears twice in the file: the second copy is a repeat too.
    const std::string text = fileOf({goodObject("a"), goodObject("b"), goodObject("b")});
    const auto parsed = parseDrillFile(text, "d.json", book.metrics(), book.grid());
    REQUIRE(parsed.errors.empty());

    const DrillImport first = book.importDrills(parsed.drills, kNow);
    REQUIRE(first.errors.empty());
    CHECK(first.added == std::vector<std::int64_t>{1, 2});
    CHECK(first.skipped == 1);
    CHECK(book.get(1)->editedBy == "D. Arkwright"); // credited to the drill's author
    const std::string before = dataSnapshot(club.file);

    const DrillImport second = book.importDrills(parsed.drills, kLater);
    CHECK(second.errors.empty());
    CHECK(second.added.empty());
    CHECK(second.skipped == 3);
    CHECK(dataSnapshot(club.file) == before);

    // A changed drill, or one whose twin was deleted, is new.
    REQUIRE(book.remove(1, kLater).ok());
    std::vector<Drill> again = parsed.drills;
    again[1].intensity = 4;
    const DrillImport third = book.importDrills(again, kLater);
    CHECK(third.added == std::vector<std::int64_t>{3, 4});
    CHECK(third.skipped == 1);
}

TEST_CASE("a drills file with an error imports nothing and leaves the club file unchanged",
          "[drills]") {
    ClubFile club;
    ClubRepository repo(club.file);
    DrillBook book(repo);
    REQUIRE(book.add(goodDrill(), "L. Farrant", kNow).ok());
    const std::string before = dataSnapshot(club.file);

    json bad = goodObject("bad");
    bad["zones"] = {{2, 5}, {9, 9}};
    const auto parsed =
        parseDrillFile(fileOf({goodObject("fine"), bad}), "d.json", book.metrics(), book.grid());
    CHECK(described(parsed.errors) ==
          std::vector<std::string>{"d.json: drills[1].zones[1]: band 9 lane 9 is outside the "
                                   "equal:6x5 grid (bands 1–6, lanes 1–5)"});
    CHECK(parsed.drills.empty());

    // importDrills checks too: a list with one bad drill adds none of them.
    Drill fine = goodDrill();
    fine.title = "Fine";
    Drill wrong = goodDrill();
    wrong.durationMin = 200;
    const DrillImport r = book.importDrills({fine, wrong}, kLater, "list");
    CHECK(described(r.errors) ==
          std::vector<std::string>{"list: drills[1].duration_min: expected 1–180, found 200"});
    CHECK(r.added.empty());
    CHECK(dataSnapshot(club.file) == before);
    CHECK(book.list().size() == 1);
}

TEST_CASE("the demo drill book is valid and covers what the demo needs", "[drills]") {
    const std::string text = pitchloop::model::readFileBytes(sourcePath("sample-club/drills.json"));
    const auto parsed =
        parseDrillFile(text, "sample-club/drills.json", builtinMetrics(), ZoneGrid());
    INFO(describeAll(parsed.errors));
    REQUIRE(parsed.errors.empty());
    CHECK(parsed.drills.size() >= 18);
    CHECK(parsed.drills.size() <= 25);
    CHECK(writeDrillFile(parsed.drills) == text); // the file is in the form export writes

    std::set<std::string> metricsCovered, tags;
    int leftBackZone = 0;
    for (const auto& d : parsed.drills) {
        metricsCovered.insert(d.metrics.begin(), d.metrics.end());
        tags.insert(d.tags.begin(), d.tags.end());
        if (std::find(d.zones.begin(), d.zones.end(), Zone{2, 5}) != d.zones.end()) ++leftBackZone;
    }
    for (const auto& m : builtinMetrics()) {
        INFO(m.id);
        CHECK(metricsCovered.count(m.id) == 1);
    }
    CHECK(leftBackZone >= 3); // the planted leak: band 2, lane 5 (sample-club/README.md)
    CHECK(tags.count("warm_up") == 1);
    CHECK(tags.count("cool_down") == 1);

    ClubRepository repo(":memory:");
    DrillBook book(repo);
    const DrillImport r = book.importDrills(parsed.drills, kNow);
    CHECK(r.added.size() == parsed.drills.size());
    CHECK(book.search(query("", "warm_up")).size() >= 2);
    CHECK(book.search(query("", "cool_down")).size() >= 2);
    CHECK(book.search(query("", "", "pre_shot_passes_against", Zone{2, 5})).size() >= 3);
}

TEST_CASE("a drill's role is kept in the drills file, and a wrong one is named", "[drills]") {
    Drill warm = goodDrill();
    warm.title = "Rondo";
    warm.role = DrillRole::WarmUp;
    Drill plain = goodDrill(); // no role: the tags say
    const std::string text = writeDrillFile({warm, plain});
    const json root = json::parse(text);
    CHECK(root["drills"][0]["role"] == "warm_up");
    CHECK_FALSE(root["drills"][1].contains("role"));
    const auto parsed = parseDrillFile(text, "x.json", builtinMetrics(), ZoneGrid());
    REQUIRE(parsed.errors.empty());
    CHECK(parsed.drills[0].role == DrillRole::WarmUp);
    CHECK(parsed.drills[1].role == DrillRole::Any);
    CHECK(changedFields(plain, warm) == std::vector<std::string>{"role", "title"});
    json wrong = goodObject("x");
    wrong["role"] = "warm-up";
    const auto bad = parseDrillFile(fileOf({wrong}), "drills.json", builtinMetrics(), ZoneGrid());
    CHECK(described(bad.errors) ==
          std::vector<std::string>{"drills.json: drills[0].role: expected warm_up, main or cool_down, found \"warm-up\""});
}
