// Reading match files: the three coordinate frames, clamping near the lines, event order,
// unknown fields, foreign type names and numeric player labels (docs/match-format.md).

#include "matchreader.h"
#include "metricengine.h"
#include "metricspec.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <sstream>
#include <string>
#include <vector>

using namespace pitchloop::model;
using nlohmann::json;
using pitchloop::testutil::ev;
using Catch::Matchers::Contains;

namespace {

constexpr Side Us = Side::Us;
constexpr Side Opp = Side::Opp;
using T = EventType;
using R = Result;

const Pitch kPitch{105, 68};

json headerJson(const std::string& frame) {
    return {{"id", "KB-TEST-FRAMES"},
            {"date", "2026-08-08"},
            {"competition", "Friendly"},
            {"venue", "home"},
            {"us", "Kestrel Bay"},
            {"opponent", "Saltmarsh Athletic"},
            {"pitch", {{"length_m", 105}, {"width_m", 68}}},
            {"periods", json::array({{{"n", 1}, {"length_s", 2760}}, {{"n", 2}, {"length_s", 2790}}})},
            {"frame", frame}};
}

std::string fileText(json header, json events) {
    return json{{"format", "pitchloop-match"},
                {"version", 1},
                {"match", std::move(header)},
                {"events", std::move(events)}}
        .dump(1);
}

Point mirrored(Point p) { return {kPitch.lengthM - p.x, kPitch.widthM - p.y}; }

/// An event as a file writes it, its positions mirrored when `mirror`.
json eventJson(const Event& e, bool mirror) {
    const Point at = mirror ? mirrored(e.at) : e.at;
    json j = {{"period", e.period},
              {"t", e.t},
              {"side", std::string(toString(e.side))},
              {"player", e.player},
              {"type", std::string(toString(e.type))},
              {"x", at.x},
              {"y", at.y}};
    if (e.result != R::None) j["result"] = std::string(toString(e.result));
    if (e.to) {
        const Point to = mirror ? mirrored(*e.to) : *e.to;
        j["to_x"] = to.x;
        j["to_y"] = to.y;
    }
    if (!e.tags.empty()) j["tags"] = e.tags;
    return j;
}

Event make(Side side, int period, double t, const char* player, EventType type, Result result,
           Point at, std::optional<Point> to = std::nullopt, std::vector<std::string> tags = {}) {
    Event e = ev(side, type, result, t, at.x, at.y, period);
    e.player = player;
    e.to = to;
    e.tags = std::move(tags);
    return e;
}

/// A short match in our frame. Positions are multiples of 0.25 m, so L − x and W − y are exact
/// and mirroring twice gives back the very same numbers.
std::vector<Event> ourFrameEvents() {
    std::vector<Event> events{
        make(Us, 1, 3.0, "4", T::Pass, R::Ok, {35, 34}, Point{50, 20}),
        make(Us, 1, 5.25, "8", T::Carry, R::Ok, {50, 20}, Point{62, 15.5}),
        make(Us, 1, 8.75, "8", T::Pass, R::Fail, {62, 15.5}, Point{80, 30}),
        make(Opp, 1, 9.5, "5", T::Interception, R::Ok, {80, 30}),
        make(Opp, 1, 11, "5", T::Pass, R::Ok, {80, 30}, Point{65, 8}),
        make(Us, 1, 13.5, "2", T::Tackle, R::Ok, {65, 8}),
        make(Us, 1, 15, "2", T::Pass, R::Ok, {65, 8}, Point{78, 4}),
        make(Us, 1, 17.25, "11", T::Pass, R::Ok, {78, 4}, Point{95, 30}, {"cross"}),
        make(Us, 1, 18.75, "9", T::Shot, R::Saved, {95, 30}, std::nullopt, {"header"}),
        make(Opp, 1, 20, "1", T::Keeper, R::Fail, {95, 30}),
        make(Opp, 1, 21, "1", T::Out, R::None, {105, 8}),
        make(Us, 1, 52, "7", T::Pass, R::Ok, {105, 0}, Point{98, 36},
             {"corner", "set_piece", "cross"}),
        make(Opp, 1, 53.5, "6", T::Clearance, R::Ok, {97, 35}, std::nullopt, {"header"}),
        make(Opp, 1, 60, "4", T::Foul, R::None, {70, 40}),
        make(Us, 2, 40, "3", T::Pass, R::Ok, {30, 68}, Point{40, 60}, {"throw_in", "set_piece"}),
        make(Us, 2, 42.5, "6", T::Pass, R::Fail, {40, 60}, Point{70, 50}),
        make(Opp, 2, 44, "3", T::Recovery, R::Ok, {70, 50}),
        make(Opp, 2, 46, "8", T::Pass, R::Ok, {60, 40}, Point{30, 30}),
        make(Opp, 2, 49.75, "9", T::Shot, R::Off, {17, 38}),
        make(Us, 2, 49.75, "5", T::Block, R::Ok, {16, 37}),
        make(Us, 2, 51, "1", T::Keeper, R::Ok, {2, 34}),
        make(Opp, 2, 2789.25, "10", T::Carry, R::Fail, {0, 68}, Point{0.25, 67.75}),
    };
    for (std::size_t i = 0; i < events.size(); ++i) events[i].fileIndex = static_cast<int>(i);
    return events;
}

enum class Written { UsFrame, Acting, GroundPlusFirst, GroundMinusFirst };

std::string written(const std::vector<Event>& events, Written how) {
    json header;
    switch (how) {
    case Written::UsFrame: header = headerJson("us"); break;
    case Written::Acting: header = headerJson("acting"); break;
    case Written::GroundPlusFirst:
        header = headerJson("ground");
        header["us_attack"] = {{"1", "+x"}, {"2", "-x"}};
        break;
    case Written::GroundMinusFirst:
        header = headerJson("ground");
        header["us_attack"] = {{"1", "-x"}, {"2", "+x"}};
        break;
    }
    json list = json::array();
    for (const Event& e : events) {
        bool mirror = false;
        switch (how) {
        case Written::UsFrame: mirror = false; break;
        case Written::Acting: mirror = e.side == Opp; break;        // their events in their view
        case Written::GroundPlusFirst: mirror = e.period == 2; break; // we attack −x in period 2
        case Written::GroundMinusFirst: mirror = e.period == 1; break;
        }
        list.push_back(eventJson(e, mirror));
    }
    return fileText(header, list);
}

Match parsed(const std::string& text, const ReadOptions& options = {}) {
    ReadResult r = parseMatch(text, "match.json", options);
    INFO(describeAll(r.errors));
    REQUIRE(r.ok());
    CHECK(r.errors.empty());
    return *r.match;
}

std::string describe(const Event& e) {
    std::ostringstream s;
    s.precision(17);
    s << "p" << e.period << " t=" << e.t << " " << toString(e.side) << " #" << e.player << " "
      << toString(e.type) << " " << toString(e.result) << " (" << e.at.x << ", " << e.at.y << ")";
    if (e.to) s << " -> (" << e.to->x << ", " << e.to->y << ")";
    for (const auto& tag : e.tags) s << " [" << tag << "]";
    s << " file " << e.fileIndex;
    if (!e.extra.empty()) s << " extra " << e.extra;
    return s.str();
}

std::string describe(const std::vector<Event>& events) {
    std::string out;
    for (const auto& e : events) out += describe(e) + "\n";
    return out;
}

std::string tallyText(const MatchTally& t) {
    std::string out;
    for (const auto& z : t) out += std::to_string(z.num) + "/" + std::to_string(z.den) + " ";
    return out;
}

json eventObject(int period, double t, const char* side, const char* type, double x, double y) {
    json j = {{"period", period}, {"t", t}, {"side", side}, {"type", type}, {"x", x}, {"y", y}};
    if (std::string(type) != "foul" && std::string(type) != "out") j["result"] = "ok";
    return j;
}

} // namespace

TEST_CASE("one match written in the acting, us and ground frames reads back the same") {
    const std::vector<Event> source = ourFrameEvents();
    const Match inUs = parsed(written(source, Written::UsFrame));
    const Match inActing = parsed(written(source, Written::Acting));
    const Match inGround = parsed(written(source, Written::GroundPlusFirst));
    const Match inGroundReversed = parsed(written(source, Written::GroundMinusFirst));

    // The us frame needs no conversion, so it gives back the source events exactly.
    CHECK(describe(inUs.events) == describe(source));
    CHECK(inUs.events == source);
    // The others convert to the same events.
    CHECK(describe(inActing.events) == describe(source));
    CHECK(inActing.events == source);
    CHECK(describe(inGround.events) == describe(source));
    CHECK(inGround.events == source);
    CHECK(describe(inGroundReversed.events) == describe(source));
    CHECK(inGroundReversed.events == source);

    CHECK(inUs.info.sourceFrame == Frame::Us);
    CHECK(inActing.info.sourceFrame == Frame::Acting);
    CHECK(inGround.info.sourceFrame == Frame::Ground);

    SECTION("and gives the same tallies for every built-in metric") {
        const MatchFacts usFacts(inUs), actingFacts(inActing), groundFacts(inGround),
            reversedFacts(inGroundReversed);
        const ZoneGrid grid;
        for (const auto& spec : builtinMetrics()) {
            INFO(spec.id);
            const MatchTally expected = computeTally(usFacts, spec, grid);
            // Not a comparison of empty tallies: every metric has something in this match.
            long total = 0;
            for (const auto& z : expected) total += z.num + z.den;
            CHECK(total > 0);
            CHECK(tallyText(computeTally(actingFacts, spec, grid)) == tallyText(expected));
            CHECK(tallyText(computeTally(groundFacts, spec, grid)) == tallyText(expected));
            CHECK(tallyText(computeTally(reversedFacts, spec, grid)) == tallyText(expected));
        }
    }
}

TEST_CASE("frame conversions of the worked examples in docs/match-format.md") {
    const std::map<int, int> attack{{1, +1}, {2, -1}};
    // acting: their shot at (88, 30) is (105 − 88, 68 − 30) = (17, 38) for us.
    CHECK(toOurFrame({88, 30}, Frame::Acting, Opp, 1, kPitch, {}) == Point{17, 38});
    // acting: their pass from (25, 38) to (40, 60) is from (80, 30) to (65, 8).
    CHECK(toOurFrame({25, 38}, Frame::Acting, Opp, 1, kPitch, {}) == Point{80, 30});
    CHECK(toOurFrame({40, 60}, Frame::Acting, Opp, 1, kPitch, {}) == Point{65, 8});
    // acting: ours unchanged.
    CHECK(toOurFrame({35, 34}, Frame::Acting, Us, 1, kPitch, {}) == Point{35, 34});
    // us: nothing changes, whoever acted.
    CHECK(toOurFrame({17, 38}, Frame::Us, Opp, 2, kPitch, {}) == Point{17, 38});
    // ground with {"1": "+x", "2": "-x"}: (30, 20) stays in period 1 and becomes
    // (105 − 30, 68 − 20) = (75, 48) in period 2, for either side.
    CHECK(toOurFrame({30, 20}, Frame::Ground, Us, 1, kPitch, attack) == Point{30, 20});
    CHECK(toOurFrame({30, 20}, Frame::Ground, Us, 2, kPitch, attack) == Point{75, 48});
    CHECK(toOurFrame({30, 20}, Frame::Ground, Opp, 1, kPitch, attack) == Point{30, 20});
    // Their event at (100, 60) in period 2 is (5, 8): near our goal, on our right.
    CHECK(toOurFrame({100, 60}, Frame::Ground, Opp, 2, kPitch, attack) == Point{5, 8});
    // Another pitch: 100 × 64, their shot at (88, 30) is (12, 34).
    CHECK(toOurFrame({88, 30}, Frame::Acting, Opp, 1, {100, 64}, {}) == Point{12, 34});
}

TEST_CASE("the documented example file reads as the documentation explains") {
    // tests/data/minimal-match.json is the example of docs/match-format.md (acting frame).
    const ReadResult r = readMatchFile(pitchloop::testutil::sourcePath("tests/data/minimal-match.json"));
    INFO(describeAll(r.errors));
    REQUIRE(r.ok());
    const auto& e = r.match->events;
    REQUIRE(e.size() == 17);
    CHECK(e[3].at == Point{80, 30});   // their interception (25, 38) → (105 − 25, 68 − 38)
    CHECK(e[9].at == Point{95, 30});   // their keeper's parry (10, 38) → (95, 30)
    CHECK(e[10].at == Point{105, 8});  // their out at (−0.5, 60): clamped to (0, 60), then (105, 8)
    CHECK(e[13].at == Point{30, 68});  // our throw-in at y = 68.9 → 68
    CHECK(e[16].at == Point{17, 38});  // their shot (88, 30) → (17, 38)
}

TEST_CASE("positions up to 3 m outside the lines are clamped onto the pitch") {
    json events = json::array();
    json a = eventObject(1, 1, "us", "pass", -2.5, 71);  // x −2.5 → 0; y = W + 3 = 71 → 68
    a["to_x"] = 107.9;                                   // L + 2.9 → 105
    a["to_y"] = -0.4;                                    // → 0
    events.push_back(a);
    json b = eventObject(1, 2, "us", "carry", -3, -3);   // exactly 3 m out: accepted, → (0, 0)
    b["to_x"] = 108;                                     // L + 3 → 105
    b["to_y"] = 71;                                      // W + 3 → 68
    events.push_back(b);
    events.push_back(eventObject(1, 3, "us", "take_on", 104.9, 34)); // inside: unchanged
    events.push_back(eventObject(1, 4, "opp", "out", -0.5, 60));  // acting: (0, 60) → (105, 8)

    SECTION("acting frame") {
        const Match m = parsed(fileText(headerJson("acting"), events));
        REQUIRE(m.events.size() == 4);
        CHECK(m.events[0].at == Point{0, 68});
        CHECK(m.events[0].to == Point{105, 0});
        CHECK(m.events[1].at == Point{0, 0});
        CHECK(m.events[1].to == Point{105, 68});
        CHECK(m.events[2].at == Point{104.9, 34});
        CHECK(m.events[3].at == Point{105, 8});
    }
    SECTION("the same numbers in the us frame clamp the same; their out is not mirrored") {
        const Match m = parsed(fileText(headerJson("us"), events));
        CHECK(m.events[0].at == Point{0, 68});
        CHECK(m.events[3].at == Point{0, 60});
    }
    SECTION("further out than 3 m is not clamped but refused") {
        events[0]["x"] = -3.01;
        const ReadResult r = parseMatch(fileText(headerJson("acting"), events), "match.json");
        CHECK_FALSE(r.ok());
        REQUIRE(r.errors.size() == 1);
        CHECK(r.errors[0].place == "events[0]");
        CHECK(r.errors[0].field == "x");
    }
    SECTION("clamping gives no warning") {
        const ReadResult r = parseMatch(fileText(headerJson("acting"), events), "match.json");
        REQUIRE(r.ok());
        CHECK(r.warnings.empty());
    }
}

TEST_CASE("events out of order: one warning and a stable sort by (period, t)") {
    json events = json::array();
    struct Row {
        int period;
        double t;
        const char* player;
    };
    const std::vector<Row> rows{{1, 10, "a"}, {1, 5, "b"}, {1, 5, "c"}, {2, 1, "d"},
                                {1, 20, "e"}, {1, 5, "f"}, {2, 1, "g"}, {2, 0.5, "h"}};
    for (const auto& row : rows) {
        json e = eventObject(row.period, row.t, "us", "pass", 50, 34);
        e["player"] = row.player;
        events.push_back(e);
    }
    const ReadResult r = parseMatch(fileText(headerJson("us"), events), "match.json");
    INFO(describeAll(r.errors));
    REQUIRE(r.ok());
    // Several events are out of place, yet one warning says so.
    REQUIRE(r.warnings.size() == 1);
    CHECK(r.warnings[0].place == "events[1]"); // the first event that comes too early (t 5 after t 10)
    CHECK(r.warnings[0].file == "match.json");
    CHECK_THAT(r.warnings[0].message, Contains("sorted"));
    // Period 1: t 5 (b, c, f in file order), t 10 (a), t 20 (e); period 2: t 0.5 (h), t 1 (d, g).
    std::string players;
    std::vector<int> fileIndices;
    for (const auto& e : r.match->events) {
        players += e.player;
        fileIndices.push_back(e.fileIndex);
    }
    CHECK(players == "bcfaehdg");
    // Event numbers stay positions in the file.
    CHECK(fileIndices == std::vector<int>{1, 2, 5, 0, 4, 7, 3, 6});
}

TEST_CASE("a long shuffled file: equal times keep file order after sorting") {
    // 60 events at times (7 i) mod 5 s, i = 0 … 59: twelve events at each of 0, 1, 2, 3, 4 s,
    // interleaved. Sorted by time, each time's events must appear in file order.
    json events = json::array();
    for (int i = 0; i < 60; ++i) {
        json e = eventObject(1, (7 * i) % 5, i % 3 ? "us" : "opp", "pass", 50, 34);
        e["player"] = std::to_string(i);
        events.push_back(e);
    }
    const ReadResult r = parseMatch(fileText(headerJson("us"), events), "match.json");
    REQUIRE(r.ok());
    CHECK(r.warnings.size() == 1);
    std::vector<int> expected;
    for (int t = 0; t < 5; ++t)
        for (int i = 0; i < 60; ++i)
            if ((7 * i) % 5 == t) expected.push_back(i);
    std::vector<int> got;
    for (const auto& e : r.match->events) {
        got.push_back(e.fileIndex);
        CHECK(e.player == std::to_string(e.fileIndex));
    }
    CHECK(got == expected);
}

TEST_CASE("events in order, with equal times, give no warning and keep file order") {
    json events = json::array();
    const char* players[] = {"p", "q", "r", "s"};
    const double times[] = {5, 5, 5, 6};
    for (int i = 0; i < 4; ++i) {
        json e = eventObject(1, times[i], i % 2 ? "opp" : "us", "pass", 50, 34);
        e["player"] = players[i];
        events.push_back(e);
    }
    const ReadResult r = parseMatch(fileText(headerJson("us"), events), "match.json");
    REQUIRE(r.ok());
    CHECK(r.warnings.empty());
    std::string order;
    for (const auto& e : r.match->events) order += e.player;
    CHECK(order == "pqrs");
}

TEST_CASE("unknown fields are kept in extra and otherwise ignored") {
    json header = headerJson("us");
    header["kb_weather"] = "rain";
    header["pitch"]["kb_surface"] = "grass";
    header["periods"][0]["kb_referee"] = "none";
    json events = json::array();
    json a = eventObject(1, 1, "us", "pass", 50, 34);
    a["video_ref"] = "clip-12";
    a["kb_note"] = {{"a", 1}, {"b", json::array({true, nullptr})}};
    events.push_back(a);
    events.push_back(eventObject(1, 2, "us", "pass", 50, 34));
    json root = json::parse(fileText(header, events));
    root["kb_source"] = "hand-logged";

    const Match m = parsed(root.dump());
    REQUIRE(m.events.size() == 2);
    CHECK(json::parse(m.events[0].extra) ==
          json{{"video_ref", "clip-12"}, {"kb_note", {{"a", 1}, {"b", json::array({true, nullptr})}}}});
    CHECK(m.events[1].extra.empty()); // nothing unknown: nothing kept
    CHECK(json::parse(m.info.extra) == json{{"kb_weather", "rain"}});
    // Known fields are read as usual next to unknown ones.
    CHECK(m.info.pitch == Pitch{105, 68});
    CHECK(m.info.periods.size() == 2);
    CHECK(m.events[0].type == T::Pass);
}

TEST_CASE("a foreign type name can be mapped onto one of ours") {
    json events = json::array();
    json a = eventObject(1, 1, "us", "dribble", 50, 34);
    a["to_x"] = 60;
    a["to_y"] = 30;
    events.push_back(a);
    events.push_back(eventObject(1, 2, "opp", "pass", 50, 34));
    const std::string text = fileText(headerJson("us"), events);

    SECTION("without a mapping the type is an error naming it") {
        const ReadResult r = parseMatch(text, "match.json");
        CHECK_FALSE(r.ok());
        REQUIRE(r.errors.size() == 1);
        CHECK(r.errors[0].place == "events[0]");
        CHECK(r.errors[0].field == "type");
        CHECK_THAT(r.errors[0].message, Contains("dribble"));
        // The model's words name no option (the app shows them too); the command line adds its
        // own hint (tests/app/cli_test.cpp).
        CHECK_THAT(r.errors[0].message, !Contains("--"));
    }
    SECTION("mapped, like --map-type dribble=carry") {
        ReadOptions options;
        options.typeMap.emplace("dribble", EventType::Carry);
        const Match m = parsed(text, options);
        REQUIRE(m.events.size() == 2);
        CHECK(m.events[0].type == T::Carry);
        CHECK(m.events[0].result == R::Ok);
        CHECK(m.events[0].to == Point{60, 30}); // a carry may have an end point
        CHECK(m.events[1].type == T::Pass);
        // The mapped event takes part in derived facts as a carry.
        CHECK(givesControl(m.events[0]));
    }
    SECTION("a mapping does not change our own type names") {
        ReadOptions options;
        options.typeMap.emplace("dribble", EventType::Carry);
        options.typeMap.emplace("pass", EventType::Shot);
        const Match m = parsed(text, options);
        CHECK(m.events[1].type == T::Pass);
    }
}

TEST_CASE("a player given as a number is read as its label") {
    json events = json::array();
    json a = eventObject(1, 1, "us", "pass", 50, 34);
    a["player"] = 8;
    events.push_back(a);
    json b = eventObject(1, 2, "us", "pass", 50, 34);
    b["player"] = "10";
    events.push_back(b);
    events.push_back(eventObject(1, 3, "us", "pass", 50, 34)); // no player
    const Match m = parsed(fileText(headerJson("us"), events));
    REQUIRE(m.events.size() == 3);
    CHECK(m.events[0].player == "8");
    CHECK(m.events[1].player == "10");
    CHECK(m.events[2].player.empty());
}

TEST_CASE("header fields are read") {
    const Match m = parsed(written(ourFrameEvents(), Written::UsFrame));
    CHECK(m.info.id == "KB-TEST-FRAMES");
    CHECK(m.info.date == "2026-08-08");
    CHECK(m.info.competition == "Friendly");
    CHECK(m.info.venue == "home");
    CHECK(m.info.us == "Kestrel Bay");
    CHECK(m.info.opponent == "Saltmarsh Athletic");
    REQUIRE(m.info.periods.size() == 2);
    CHECK(m.info.periodLength(1) == 2760);
    CHECK(m.info.periodLength(2) == 2790);
    CHECK(m.info.periodLength(3) == 0);
    CHECK_FALSE(m.info.goalsUs.has_value());
}

TEST_CASE("a match date must be a real calendar date") {
    for (const char* bad : {"2026-02-29", "2026-04-31", "2026-13-01", "2026-00-10", "26-08-08"}) {
        INFO(bad);
        json header = headerJson("us");
        header["date"] = bad;
        const ReadResult r = parseMatch(fileText(header, json::array()), "match.json");
        CHECK_FALSE(r.ok());
        bool named = false;
        for (const auto& p : r.errors) named |= p.place == "match" && p.field == "date";
        CHECK(named);
    }
    CHECK(isIsoDate("2028-02-29")); // a leap year
    CHECK_FALSE(isIsoDate("2100-02-29")); // a century that is not one
    CHECK(isIsoDate("2000-02-29"));
}

TEST_CASE("format version 2 says the same match in our own words", "[reader]") {
    // tests/data/minimal-match.json (version 1) with version 1's words replaced by version 2's:
    // take_on → beat; fail → lost, goal → scored, saved → stopped, blocked → charged_down,
    // off → wide, post → woodwork. The two files must read to the same events.
    const std::string v1 = pitchloop::model::readFileBytes(
        pitchloop::testutil::sourcePath("tests/data/minimal-match.json"));
    std::string v2 = v1;
    auto replaceAll = [&](const std::string& from, const std::string& to) {
        for (std::size_t at = 0; (at = v2.find(from, at)) != std::string::npos; at += to.size())
            v2.replace(at, from.size(), to);
    };
    replaceAll("\"version\": 1", "\"version\": 2");
    replaceAll("\"take_on\"", "\"beat\"");
    replaceAll("\"result\": \"fail\"", "\"result\": \"lost\"");
    replaceAll("\"result\": \"goal\"", "\"result\": \"scored\"");
    replaceAll("\"result\": \"saved\"", "\"result\": \"stopped\"");
    replaceAll("\"result\": \"blocked\"", "\"result\": \"charged_down\"");
    replaceAll("\"result\": \"off\"", "\"result\": \"wide\"");
    replaceAll("\"result\": \"post\"", "\"result\": \"woodwork\"");
    REQUIRE(v2 != v1);
    const auto a = pitchloop::model::parseMatch(v1, "v1.json");
    const auto b = pitchloop::model::parseMatch(v2, "v2.json");
    INFO(pitchloop::model::describeAll(b.errors));
    REQUIRE(a.ok());
    REQUIRE(b.ok());
    REQUIRE(a.match->events.size() == b.match->events.size());
    for (std::size_t i = 0; i < a.match->events.size(); ++i) {
        CHECK(a.match->events[i].type == b.match->events[i].type);
        CHECK(a.match->events[i].result == b.match->events[i].result);
    }
    // Each version's words belong to it alone: a version 2 file with "fail" is refused, naming
    // the words version 2 allows.
    std::string mixed = v2;
    const auto at = mixed.find("\"result\": \"lost\"");
    REQUIRE(at != std::string::npos);
    mixed.replace(at, 16, "\"result\": \"fail\"");
    const auto refused = pitchloop::model::parseMatch(mixed, "mixed.json");
    REQUIRE_FALSE(refused.ok());
    CHECK(refused.errors[0].field == "result");
    CHECK(refused.errors[0].message.find("(allowed: ok, lost)") != std::string::npos);
}
