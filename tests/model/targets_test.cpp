// Season targets: which version is in force on a date, which side misses, the default
// direction, the targets file (good and bad), its round trip, and import without repeats.
// Every target here is invented.

#include "metricspec.h"
#include "targets.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <functional>
#include <nlohmann/json.hpp>
#include <string>
#include <vector>

using namespace pitchloop::model;
using nlohmann::json;

namespace {

Target version(double value, const std::string& from, const std::string& recorded, long long id,
               bool retired = false) {
    Target t;
    t.key = {"First team", "2026-27", "regain_5s", 5, 1};
    t.direction = Direction::AtLeast;
    t.value = value;
    t.watchMargin = 0.05;
    t.minSample = 30;
    t.author = "R. Tamsin";
    t.effectiveFrom = from;
    t.recordedAt = recorded;
    t.retired = retired;
    t.version = id;
    return t;
}

const MetricSpec& spec(const std::string& id) {
    for (const auto& m : builtinMetrics())
        if (m.id == id) return m;
    FAIL("no built-in metric " << id);
    return builtinMetrics().front(); // not reached: FAIL throws
}

/// A good first target, then `bad` as the second: problems of `bad` sit at targets[1].
std::string fileWith(const json& bad) {
    json good = {{"season", "2026-27"},    {"metric", "regain_5s"},
                 {"band", 5},              {"lane", 2},
                 {"value", 0.5},           {"author", "R. Tamsin"},
                 {"effective_from", "2026-07-01"}};
    return json{{"format", "pitchloop-targets"}, {"version", 1}, {"targets", {good, bad}}}.dump();
}

json baseTarget() {
    return {{"season", "2026-27"},
            {"metric", "pass_completion"},
            {"band", 3},
            {"lane", 3},
            {"value", 0.8},
            {"author", "P. Okafor"},
            {"effective_from", "2026-08-01"}};
}

TargetFileResult parse(const std::string& text) {
    return parseTargetFile(text, "club-targets.json", builtinMetrics(), 6, 5);
}

/// The problem reported for targets[1].`field`, or nullptr.
const Problem* problemAt(const TargetFileResult& r, const std::string& field) {
    for (const auto& p : r.errors)
        if (p.place == "targets[1]" && p.field == field) return &p;
    return nullptr;
}

} // namespace

TEST_CASE("inForce picks the latest version effective on or before the date", "[targets]") {
    const Target first = version(0.40, "2026-07-01", "2026-06-20T09:00:00Z", 1);
    const Target raised = version(0.50, "2026-09-01", "2026-08-25T09:00:00Z", 2);
    // Recorded later for the same effective date: a correction of `raised`.
    const Target corrected = version(0.48, "2026-09-01", "2026-08-26T09:00:00Z", 3);
    // Written down first but effective only in November: ignored until then.
    const Target future = version(0.60, "2026-11-01", "2026-06-01T09:00:00Z", 4);
    std::vector<Target> all{first, raised, corrected, future};

    for (int order = 0; order < 2; ++order) {
        INFO("order " << order);
        CHECK_FALSE(inForce(all, "2026-06-30")); // before the first version
        REQUIRE(inForce(all, "2026-07-01"));    // on its date itself
        CHECK(inForce(all, "2026-07-01")->version == 1);
        CHECK(inForce(all, "2026-08-31")->version == 1);
        CHECK(inForce(all, "2026-09-01")->version == 3); // tie on date: latest recorded
        CHECK(inForce(all, "2026-09-01")->value == 0.48);
        CHECK(inForce(all, "2026-10-31")->version == 3);
        CHECK(inForce(all, "2026-11-01")->version == 4);
        std::reverse(all.begin(), all.end()); // the answer does not depend on the order
    }
    CHECK_FALSE(inForce({}, "2026-09-01"));

    SECTION("a tie on date and recorded time goes to the later stored version") {
        const Target a = version(0.45, "2026-09-01", "2026-08-25T09:00:00Z", 7);
        const Target b = version(0.47, "2026-09-01", "2026-08-25T09:00:00Z", 8);
        CHECK(inForce({a, b}, "2026-09-02")->version == 8);
        CHECK(inForce({b, a}, "2026-09-02")->version == 8);
    }
    SECTION("a retired version ends the target until a later version") {
        const Target retired = version(0.48, "2026-10-01", "2026-09-30T09:00:00Z", 5, true);
        std::vector<Target> v{first, corrected, retired};
        CHECK(inForce(v, "2026-09-30")->version == 3);
        CHECK_FALSE(inForce(v, "2026-10-01"));
        CHECK_FALSE(inForce(v, "2027-05-01"));
        v.push_back(version(0.52, "2027-01-01", "2026-12-20T09:00:00Z", 6));
        CHECK_FALSE(inForce(v, "2026-12-31"));
        REQUIRE(inForce(v, "2027-01-01"));
        CHECK(inForce(v, "2027-01-01")->version == 6);
    }
}

TEST_CASE("misses is the wrong side of the target; on the target is no miss", "[targets]") {
    Target atLeast = version(0.5, "2026-07-01", "", 1);
    CHECK(misses(atLeast, 0.49));
    CHECK_FALSE(misses(atLeast, 0.5));
    CHECK_FALSE(misses(atLeast, 0.51));
    Target atMost = atLeast;
    atMost.direction = Direction::AtMost;
    atMost.value = 2.0;
    CHECK(misses(atMost, 2.1));
    CHECK_FALSE(misses(atMost, 2.0));
    CHECK_FALSE(misses(atMost, 0.0));
}

TEST_CASE("the default direction is the metric's better side", "[targets]") {
    // builtin.json: "better": "higher" for these four, "lower" for the other three.
    for (const char* id : {"regain_5s", "pre_shot_passes_for", "press_rate", "pass_completion"}) {
        INFO(id);
        CHECK(defaultDirection(spec(id)) == Direction::AtLeast);
    }
    for (const char* id : {"shot_after_loss", "pre_shot_passes_against", "losses"}) {
        INFO(id);
        CHECK(defaultDirection(spec(id)) == Direction::AtMost);
    }
    MetricSpec own = spec("pass_completion");
    own.better = Better::Lower;
    CHECK(defaultDirection(own) == Direction::AtMost);

    CHECK(toString(Direction::AtLeast) == "at_least");
    CHECK(toString(Direction::AtMost) == "at_most");
    CHECK(directionFromString("at_least") == Direction::AtLeast);
    CHECK(directionFromString("at_most") == Direction::AtMost);
    CHECK_FALSE(directionFromString("AtLeast"));
    CHECK_FALSE(directionFromString(""));
}

TEST_CASE("a good targets file is read with defaults from the metric", "[targets]") {
    const std::string text = R"({
      "format": "pitchloop-targets", "version": 1,
      "targets": [
        {"squad": "Under-21s", "season": "2026-27", "metric": "pre_shot_passes_against",
         "band": 2, "lane": 5, "value": 2.0, "author": "D. Vell", "rationale": "left side",
         "effective_from": "2026-07-01", "recorded_at": "2026-07-20T10:00:00Z"},
        {"season": "2026-27", "metric": "shot_after_loss", "value": 0.05,
         "author": "D. Vell", "effective_from": "2026-07-01", "watch_margin": 0.01,
         "min_sample": 40, "direction": "at_most"},
        {"season": "2026-27", "metric": "regain_5s", "band": 6, "lane": 1, "value": 0.45,
         "direction": "at_least", "author": "D. Vell", "effective_from": "2026-10-01",
         "retired": true}
      ]})";
    const auto r = parse(text);
    INFO(describeAll(r.errors));
    REQUIRE(r.errors.empty());
    REQUIRE(r.targets.size() == 3);

    const Target& a = r.targets[0];
    CHECK(a.key == TargetKey{"Under-21s", "2026-27", "pre_shot_passes_against", 2, 5});
    CHECK(a.direction == Direction::AtMost); // "better": "lower"
    CHECK(a.value == 2.0);
    CHECK(a.watchMargin == defaultWatchMargin(MetricKind::Count));
    CHECK(a.minSample == defaultMinSample(MetricKind::Count));
    CHECK(a.author == "D. Vell");
    CHECK(a.rationale == "left side");
    CHECK(a.effectiveFrom == "2026-07-01");
    CHECK(a.recordedAt == "2026-07-20T10:00:00Z");
    CHECK_FALSE(a.retired);
    CHECK(a.version == 0);

    const Target& b = r.targets[1];
    CHECK(b.key.squad == "First team"); // the default squad
    CHECK(b.key.wholePitch());
    CHECK(b.watchMargin == 0.01);
    CHECK(b.minSample == 40);
    CHECK(b.recordedAt.empty());

    const Target& c = r.targets[2];
    CHECK(c.retired);
    CHECK(c.direction == Direction::AtLeast);
    CHECK(c.watchMargin == defaultWatchMargin(MetricKind::Rate));
    CHECK(c.minSample == defaultMinSample(MetricKind::Rate));

    SECTION("a retirement needs no value") {
        json t = baseTarget();
        t.erase("value");
        t["retired"] = true;
        const auto retired = parse(fileWith(t));
        INFO(describeAll(retired.errors));
        CHECK(retired.errors.empty());
        CHECK(retired.targets.size() == 2);
    }
}

TEST_CASE("a bad targets file is refused with file, place and field", "[targets]") {
    struct Case {
        const char* what;
        std::function<void(json&)> edit;
        const char* field;
        const char* words;
    };
    const std::vector<Case> cases{
        {"unknown key", [](json& t) { t["colour"] = "red"; }, "colour", "unknown key"},
        {"unknown metric", [](json& t) { t["metric"] = "kb_nope"; }, "metric", "kb_nope"},
        {"band without lane", [](json& t) { t.erase("lane"); }, "lane", "both band and lane"},
        {"lane without band", [](json& t) { t.erase("band"); }, "band", "both band and lane"},
        {"band outside the grid", [](json& t) { t["band"] = 7; }, "band", "1 to 6"},
        {"lane outside the grid", [](json& t) { t["lane"] = 0; }, "lane", "1 to 5"},
        {"rate value above 1", [](json& t) { t["value"] = 1.5; }, "value", "share from 0 to 1"},
        {"rate given as percent", [](json& t) { t["value"] = 45; }, "value", "share from 0 to 1"},
        {"negative count value",
         [](json& t) {
             t["metric"] = "losses";
             t["value"] = -1.0;
         },
         "value", "must not be negative"},
        {"value as text", [](json& t) { t["value"] = "0.8"; }, "value", "number"},
        {"missing value", [](json& t) { t.erase("value"); }, "value", "missing"},
        {"bad date", [](json& t) { t["effective_from"] = "1/8/2026"; }, "effective_from", "YYYY-MM-DD"},
        {"short date", [](json& t) { t["effective_from"] = "2026-8-01"; }, "effective_from", "YYYY-MM-DD"},
        {"no month 13", [](json& t) { t["effective_from"] = "2026-13-01"; }, "effective_from", "YYYY-MM-DD"},
        {"no month 0", [](json& t) { t["effective_from"] = "2026-00-10"; }, "effective_from", "YYYY-MM-DD"},
        {"no day 32", [](json& t) { t["effective_from"] = "2026-07-32"; }, "effective_from", "YYYY-MM-DD"},
        {"no day 0", [](json& t) { t["effective_from"] = "2026-07-00"; }, "effective_from", "YYYY-MM-DD"},
        {"season with a slash", [](json& t) { t["season"] = "2026/27"; }, "season", "2026-27"},
        {"season of one year", [](json& t) { t["season"] = "2026"; }, "season", "2026-27"},
        {"season of two years apart", [](json& t) { t["season"] = "2026-28"; }, "season", "2026-27"},
        {"bad direction", [](json& t) { t["direction"] = "up"; }, "direction", "at_least or at_most"},
        {"missing author", [](json& t) { t.erase("author"); }, "author", "missing"},
        {"missing season", [](json& t) { t.erase("season"); }, "season", "missing"},
        {"negative watch margin", [](json& t) { t["watch_margin"] = -0.1; }, "watch_margin", "≥ 0"},
        {"fractional min sample", [](json& t) { t["min_sample"] = 2.5; }, "min_sample", "whole number"},
        {"retired not a flag", [](json& t) { t["retired"] = "yes"; }, "retired", "true or false"},
    };
    for (const auto& c : cases) {
        INFO(c.what);
        json t = baseTarget();
        c.edit(t);
        const auto r = parse(fileWith(t));
        INFO(describeAll(r.errors));
        CHECK(r.targets.empty()); // one bad target refuses the whole file
        const Problem* p = problemAt(r, c.field);
        REQUIRE(p);
        CHECK(p->file == "club-targets.json");
        CHECK(p->message.find(c.words) != std::string::npos);
        CHECK(p->describe().rfind(std::string("club-targets.json: targets[1].") + c.field + ": ", 0) == 0);
        // The good first target has no problem of its own.
        CHECK(std::none_of(r.errors.begin(), r.errors.end(),
                           [](const Problem& q) { return q.place == "targets[0]"; }));
    }
}

TEST_CASE("a targets file with the wrong header or no JSON is refused as a whole", "[targets]") {
    const json t = baseTarget();
    for (const json& root :
         {json{{"format", "pitchloop-metrics"}, {"version", 1}, {"targets", {t}}},
          json{{"format", "pitchloop-targets"}, {"version", 2}, {"targets", {t}}},
          json{{"version", 1}, {"targets", {t}}}, json::array({t})}) {
        INFO(root.dump());
        const auto r = parse(root.dump());
        CHECK(r.targets.empty());
        REQUIRE(r.errors.size() == 1);
        CHECK(r.errors[0].file == "club-targets.json");
        CHECK(r.errors[0].place.empty());
        CHECK(r.errors[0].field == "format");
        CHECK(r.errors[0].describe() ==
              "club-targets.json: format: expected \"format\": \"pitchloop-targets\" and "
              "\"version\": 1");
    }
    const auto noList = parse(R"({"format": "pitchloop-targets", "version": 1, "targets": {}})");
    REQUIRE(noList.errors.size() == 1);
    CHECK(noList.errors[0].field == "targets");

    const auto broken = parse(R"({"format": "pitchloop-targets", "version": 1, "targets": [)");
    REQUIRE(broken.errors.size() == 1);
    CHECK(broken.errors[0].message.rfind("not valid JSON", 0) == 0);
    CHECK(broken.targets.empty());
}

TEST_CASE("writeTargetFile is read back by parseTargetFile unchanged", "[targets]") {
    std::vector<Target> written;
    written.push_back(version(0.45, "2026-07-01", "2026-07-20T10:00:00Z", 11));
    Target whole = version(0.05, "2026-08-15", "2026-08-14T08:30:00Z", 12);
    whole.key = {"Under-21s", "2026-27", "shot_after_loss", 0, 0};
    whole.direction = Direction::AtMost;
    whole.watchMargin = 0.01;
    whole.minSample = 45;
    whole.rationale = "a loss should rarely cost a shot, \"even\" late on";
    written.push_back(whole);
    Target count = version(2.25, "2026-07-01", "", 13); // recorded time not known
    count.key = {"First team", "2026-27", "pre_shot_passes_against", 2, 5};
    count.direction = Direction::AtMost;
    count.watchMargin = 0.5;
    count.minSample = 3;
    written.push_back(count);
    written.push_back(version(0.45, "2026-11-01", "2026-10-30T18:00:00Z", 14, true));
    // A value that needs every digit of a double.
    written.push_back(version(1.0 / 3.0, "2027-01-01", "2026-12-31T23:59:59Z", 15));

    const std::string text = writeTargetFile(written);
    const auto r = parse(text);
    INFO(text);
    INFO(describeAll(r.errors));
    REQUIRE(r.errors.empty());
    REQUIRE(r.targets.size() == written.size());
    for (std::size_t i = 0; i < written.size(); ++i) {
        INFO("target " << i);
        Target expected = written[i];
        expected.version = 0; // storage ids are not part of the file
        const Target& got = r.targets[i];
        CHECK(got.key == expected.key);
        CHECK(got.direction == expected.direction);
        CHECK(got.value == expected.value);
        CHECK(got.watchMargin == expected.watchMargin);
        CHECK(got.minSample == expected.minSample);
        CHECK(got.author == expected.author);
        CHECK(got.rationale == expected.rationale);
        CHECK(got.effectiveFrom == expected.effectiveFrom);
        CHECK(got.recordedAt == expected.recordedAt);
        CHECK(got.retired == expected.retired);
        CHECK(got.version == 0);
    }
    // Written again, the file is byte for byte the same.
    CHECK(writeTargetFile(r.targets) == text);
    // A whole-pitch target carries no band or lane in the file.
    const json j = json::parse(text);
    CHECK_FALSE(j["targets"][1].contains("band"));
    CHECK(j["targets"][0]["band"] == 5);
}

TEST_CASE("newVersionsOnly skips exact repeats and keeps changes", "[targets]") {
    const Target a = version(0.45, "2026-07-01", "2026-07-20T10:00:00Z", 0);
    Target b = a;
    b.key.band = 6;
    const std::vector<Target> file{a, b};

    // First import: everything is new. Importing the same file again adds nothing.
    const auto first = newVersionsOnly({}, file);
    CHECK(first.size() == 2);
    std::vector<Target> stored = first;
    for (std::size_t i = 0; i < stored.size(); ++i) stored[i].version = static_cast<long long>(i + 1);
    CHECK(newVersionsOnly(stored, file).empty());

    // A repeat inside one file counts once.
    CHECK(newVersionsOnly({}, {a, a, b}).size() == 2);

    // A stored version whose recorded time was filled in on import still matches an incoming
    // one without a recorded time.
    Target noTime = a;
    noTime.recordedAt.clear();
    CHECK(newVersionsOnly(stored, {noTime}).empty());

    // Any change of the rule is a new version.
    Target changedValue = a;
    changedValue.value = 0.5;
    const auto kept = newVersionsOnly(stored, {a, changedValue, b});
    REQUIRE(kept.size() == 1);
    CHECK(kept[0].value == 0.5);

    Target changedDate = a;
    changedDate.effectiveFrom = "2026-09-01";
    Target changedMargin = a;
    changedMargin.watchMargin = 0.1;
    Target changedAuthor = a;
    changedAuthor.author = "P. Okafor";
    Target retired = a;
    retired.retired = true;
    Target otherRecorded = a;
    otherRecorded.recordedAt = "2026-07-21T10:00:00Z";
    CHECK(newVersionsOnly(stored, {changedDate, changedMargin, changedAuthor, retired,
                                   otherRecorded})
              .size() == 5);
}
