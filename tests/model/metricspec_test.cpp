// Metric specs: the built-in seven, valid user specs, and bad specs rejected with messages that
// name the key path (docs/metrics.md).

#include "metricspec.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <string>
#include <vector>

using namespace pitchloop::model;
using Catch::Matchers::Contains;

namespace {

const std::string kSource = "club-metrics.json";

/// The problems of a spec that must be rejected.
Problems errorsOf(const std::string& json) {
    const SpecResult r = parseMetricSpec(json, kSource);
    INFO(json);
    CHECK_FALSE(r.spec.has_value());
    CHECK_FALSE(r.errors.empty());
    return r.errors;
}

/// The problem at `field` (a key path), or a problem with an empty message when there is none.
Problem at(const Problems& problems, const std::string& field) {
    for (const auto& p : problems)
        if (p.field == field) return p;
    return {};
}

/// Asserts a problem at `field` whose message contains `words`, and shows all problems if not.
void expectProblem(const Problems& problems, const std::string& field, const std::string& words) {
    INFO("problems:\n" << describeAll(problems));
    const Problem p = at(problems, field);
    CHECK(p.field == field);
    CHECK_THAT(p.message, Contains(words));
    CHECK(p.file == kSource);
}

MetricSpec accepted(const std::string& json) {
    const SpecResult r = parseMetricSpec(json, kSource);
    INFO(json << "\n" << describeAll(r.errors));
    REQUIRE(r.errors.empty());
    REQUIRE(r.spec.has_value());
    return *r.spec;
}

} // namespace

// ---------------------------------------------------------------------------------------------
// Built-in metrics

TEST_CASE("builtinMetrics: the seven metrics in order, with kind and direction") {
    const auto& specs = builtinMetrics();
    struct Expected {
        const char* id;
        MetricKind kind;
        Better better;
    };
    // docs/metrics.md: rates for shares of items, counts per match, one exposure metric.
    const std::vector<Expected> expected{
        {"regain_5s", MetricKind::Rate, Better::Higher},
        {"shot_after_loss", MetricKind::Rate, Better::Lower},
        {"pre_shot_passes_for", MetricKind::Count, Better::Higher},
        {"pre_shot_passes_against", MetricKind::Count, Better::Lower},
        {"losses", MetricKind::Count, Better::Lower},
        {"press_rate", MetricKind::Exposure, Better::Higher},
        {"pass_completion", MetricKind::Rate, Better::Higher},
    };
    REQUIRE(specs.size() == expected.size());
    for (std::size_t i = 0; i < expected.size(); ++i) {
        INFO("metric " << i << " " << specs[i].id);
        CHECK(specs[i].id == expected[i].id);
        CHECK(toString(specs[i].kind()) == toString(expected[i].kind));
        CHECK(toString(specs[i].better) == toString(expected[i].better));
        CHECK_FALSE(specs[i].name.empty());
        CHECK_FALSE(specs[i].question.empty());
        CHECK_FALSE(specs[i].json.empty());
    }
}

TEST_CASE("builtinMetrics: windows and items as defined") {
    const auto& s = builtinMetrics();
    REQUIRE(s.size() == 7);
    // regain_5s: our losses, 5 s, censored
    CHECK(s[0].items.losses);
    CHECK(s[0].items.lossesOf == Side::Us);
    CHECK(s[0].items.at == Place::LossPlace);
    CHECK(s[0].success.kind == SuccessSpec::Kind::FollowedBy);
    CHECK(s[0].success.withinS == 5);
    CHECK(s[0].success.censor);
    CHECK(s[0].success.anyOf.size() == 2); // our control event; their foul or out
    // shot_after_loss: our losses, 15 s
    CHECK(s[1].items.losses);
    CHECK(s[1].success.withinS == 15);
    // pre-shot passes: completed passes binned at their start, 15 s, shot strictly later
    for (int i : {2, 3}) {
        INFO(s[static_cast<std::size_t>(i)].id);
        const auto& m = s[static_cast<std::size_t>(i)];
        CHECK(m.items.select.types == std::vector<EventType>{EventType::Pass});
        CHECK(m.items.select.results == std::vector<Result>{Result::Ok});
        CHECK(m.items.at == Place::Start);
        CHECK(m.success.withinS == 15);
        CHECK_FALSE(m.success.sameTime);
        CHECK(m.per == MetricSpec::Per::Match);
    }
    CHECK(s[2].items.select.side == SideRef::Us);
    CHECK(s[3].items.select.side == SideRef::Opp);
    // losses: every loss of ours, no success test
    CHECK(s[4].items.losses);
    CHECK(s[4].success.kind == SuccessSpec::Kind::Always);
    // press_rate: our four defensive types per opponent pass
    CHECK(s[5].items.select.side == SideRef::Us);
    CHECK(s[5].items.select.types.size() == 4);
    CHECK(s[5].perEvents.select.side == SideRef::Opp);
    CHECK(s[5].perEvents.select.types == std::vector<EventType>{EventType::Pass});
    // pass_completion: our passes, success when ok
    CHECK(s[6].success.kind == SuccessSpec::Kind::Is);
    CHECK(s[6].success.is.results == std::vector<Result>{Result::Ok});
    CHECK(s[6].items.select.results.empty()); // every pass is attempted, whatever its result
}

// ---------------------------------------------------------------------------------------------
// Valid specs

TEST_CASE("valid user specs are accepted with what they say") {
    SECTION("crosses that arrive, with tags_any") {
        const auto m = accepted(R"({"id": "cross_completion", "name": "Crosses that arrive",
            "better": "higher",
            "items": {"side": "us", "type": "pass", "tags_any": ["cross", "cutback"]},
            "success": {"is": {"result": "ok"}}, "per": "items"})");
        CHECK(m.id == "cross_completion");
        CHECK(m.name == "Crosses that arrive");
        CHECK(m.items.select.tagsAny == std::vector<std::string>{"cross", "cutback"});
        CHECK(m.kind() == MetricKind::Rate);
    }
    SECTION("a count binned at the pass end, name defaulting to the id") {
        const auto m = accepted(R"({"id": "pass_targets", "better": "higher",
            "items": {"side": "us", "type": "pass", "result": "ok", "at": "end"}, "per": "match"})");
        CHECK(m.items.at == Place::End);
        CHECK(m.name == "pass_targets");
        CHECK(m.kind() == MetricKind::Count);
    }
    SECTION("followed_by with same_time and censor switched off") {
        const auto m = accepted(R"({"id": "take_on_to_shot", "better": "higher",
            "items": {"side": "us", "type": "take_on", "result": "ok"},
            "success": {"followed_by": {"side": "same", "type": "shot"}, "within_s": 3.5,
                        "same_time": false, "censor": false},
            "per": "items"})");
        CHECK(m.success.kind == SuccessSpec::Kind::FollowedBy);
        CHECK(m.success.withinS == 3.5);
        CHECK_FALSE(m.success.sameTime);
        CHECK_FALSE(m.success.censor);
        REQUIRE(m.success.anyOf.size() == 1);
        CHECK(m.success.anyOf[0].side == SideRef::Same);
    }
    SECTION("defaults: same_time and censor on") {
        const auto m = accepted(R"({"id": "x", "better": "lower", "items": {"losses_of": "opp"},
            "success": {"followed_by": {"side": "other", "gives_control": true}, "within_s": 600},
            "per": "items"})");
        CHECK(m.success.sameTime);
        CHECK(m.success.censor);
        CHECK(m.success.withinS == 600); // the upper limit is allowed
        CHECK(m.items.lossesOf == Side::Opp);
        REQUIRE(m.success.anyOf.size() == 1);
        CHECK(m.success.anyOf[0].givesControl == std::optional<bool>(true));
    }
    SECTION("losses binned at loss_place, said explicitly") {
        const auto m = accepted(R"({"id": "losses_again", "better": "lower",
            "items": {"losses_of": "us", "at": "loss_place"}, "per": "match"})");
        CHECK(m.items.at == Place::LossPlace);
    }
    SECTION("an exposure: our tackles per opponent carry, binned at the carry's end") {
        const auto m = accepted(R"({"id": "tackles_per_carry", "better": "higher",
            "items": {"side": "us", "type": "tackle"},
            "per": {"side": "opp", "type": "carry", "at": "end"}})");
        CHECK(m.kind() == MetricKind::Exposure);
        CHECK(m.perEvents.at == Place::End);
        CHECK(m.perEvents.select.types == std::vector<EventType>{EventType::Carry});
    }
    SECTION("a result possible for one of several types") {
        const auto m = accepted(R"({"id": "goals_or_passes", "better": "higher",
            "items": {"type": ["shot", "pass"], "result": ["goal", "ok"]}, "per": "match"})");
        CHECK(m.items.select.results == std::vector<Result>{Result::Goal, Result::Ok});
    }
    SECTION("tags_all and tags_none") {
        const auto m = accepted(R"({"id": "open_play_headers", "better": "higher",
            "items": {"type": "shot", "tags_all": ["header"], "tags_none": ["set_piece"]},
            "per": "match"})");
        CHECK(m.items.select.tagsAll == std::vector<std::string>{"header"});
        CHECK(m.items.select.tagsNone == std::vector<std::string>{"set_piece"});
    }
    SECTION("an id of 40 characters") {
        accepted(R"({"id": "a234567890123456789012345678901234567890", "better": "higher",
            "items": {"type": "pass"}, "per": "match"})");
    }
}

TEST_CASE("EventSelector::matches resolves same and other against the item's side") {
    Event e;
    e.side = Side::Opp;
    e.type = EventType::Pass;
    e.result = Result::Ok;
    e.tags = {"cross"};
    EventSelector s;
    s.side = SideRef::Same;
    CHECK(s.matches(e, Side::Opp));
    CHECK_FALSE(s.matches(e, Side::Us));
    s.side = SideRef::Other;
    CHECK(s.matches(e, Side::Us));
    s.side = SideRef::Us;
    CHECK_FALSE(s.matches(e, Side::Opp));
    s.side = SideRef::Any;
    s.tagsNone = {"cross"};
    CHECK_FALSE(s.matches(e, Side::Us));
    s.tagsNone.clear();
    s.givesControl = false;
    CHECK_FALSE(s.matches(e, Side::Us)); // a pass gives control
}

// ---------------------------------------------------------------------------------------------
// Rejected specs

TEST_CASE("an unknown key is named with its path") {
    SECTION("at the top") {
        const auto p = errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
            "per": "match", "colour": "red"})");
        expectProblem(p, "colour", "unknown key");
        // The message lists what is allowed.
        expectProblem(p, "colour", "better, id, items, name, per, question, sentence, success");
    }
    SECTION("in items") {
        const auto p = errorsOf(R"({"id": "x", "better": "higher",
            "items": {"type": "pass", "colur": "red"}, "per": "match"})");
        expectProblem(p, "items.colur", "unknown key");
        // One line says file, metric, key path, what is wrong and what is allowed.
        CHECK(at(p, "items.colur").describe() ==
              "club-metrics.json: metric 'x'.items.colur: unknown key (allowed here: "
              "gives_control, result, side, tags_all, tags_any, tags_none, type)");
    }
    SECTION("in losses items") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher",
            "items": {"losses_of": "us", "type": "pass"}, "per": "match"})"),
                      "items.type", "unknown key");
    }
    SECTION("in success") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
            "success": {"followed_by": {"type": "shot"}, "within_s": 5, "window": 3},
            "per": "items"})"),
                      "success.window", "unknown key");
    }
    SECTION("in an any_of entry") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"losses_of": "us"},
            "success": {"followed_by": {"any_of": [{"side": "same"}, {"sid": "other"}]},
                        "within_s": 5},
            "per": "items"})"),
                      "success.followed_by.any_of[1].sid", "unknown key");
    }
}

TEST_CASE("an unknown event type is named") {
    SECTION("in items") {
        const auto p = errorsOf(R"({"id": "x", "better": "higher",
            "items": {"side": "us", "type": ["pass", "volley"]}, "per": "match"})");
        expectProblem(p, "items.type", "unknown event type 'volley'");
    }
    SECTION("in followed_by") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
            "success": {"followed_by": {"type": "goal"}, "within_s": 5}, "per": "items"})"),
                      "success.followed_by.type", "unknown event type 'goal'");
    }
    SECTION("in per") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "tackle"},
            "per": {"side": "opp", "type": "dribble"}})"),
                      "per.type", "unknown event type 'dribble'");
    }
}

TEST_CASE("a result impossible for the selected types is rejected") {
    SECTION("ok is not a shot result") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher",
            "items": {"type": "shot", "result": "ok"}, "per": "match"})"),
                      "items.result", "'ok' is not a result of the selected types");
    }
    SECTION("goal is not a pass or carry result") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher",
            "items": {"type": ["pass", "carry"], "result": "goal"}, "per": "match"})"),
                      "items.result", "'goal' is not a result");
    }
    SECTION("fail is not a recovery result") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher",
            "items": {"type": "recovery", "result": "fail"}, "per": "match"})"),
                      "items.result", "'fail' is not a result");
    }
    SECTION("fouls have no result") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher",
            "items": {"type": "foul", "result": "ok"}, "per": "match"})"),
                      "items.result", "'ok' is not a result");
    }
    SECTION("in success.is") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "shot"},
            "success": {"is": {"type": "shot", "result": "ok"}}, "per": "items"})"),
                      "success.is.result", "'ok' is not a result");
    }
    SECTION("an unknown result word") {
        expectProblem(errorsOf(R"({"id": "x", "better": "higher",
            "items": {"type": "pass", "result": "won"}, "per": "match"})"),
                      "items.result", "unknown result 'won'");
    }
}

TEST_CASE("better is required and must be higher or lower") {
    expectProblem(errorsOf(R"({"id": "x", "items": {"type": "pass"}, "per": "match"})"),
                  "better", "missing");
    expectProblem(errorsOf(R"({"id": "x", "better": "up", "items": {"type": "pass"},
        "per": "match"})"),
                  "better", "higher or lower");
}

TEST_CASE("items and per are required") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "per": "match"})"), "items",
                  "missing");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"}})"), "per",
                  "missing");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "per": "season"})"),
                  "per", "expected items, match, or an event selector");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "tackle"},
        "per": {"losses_of": "opp"}})"),
                  "per", "not losses");
}

TEST_CASE("per items needs a success test") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "per": "items"})"),
                  "per", "success test");
}

TEST_CASE("success takes exactly one of is and followed_by") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"is": {"result": "ok"}, "followed_by": {"type": "shot"}, "within_s": 5},
        "per": "items"})"),
                  "success", "exactly one of 'is'");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {}, "per": "items"})"),
                  "success", "exactly one of 'is'");
    // is takes no window
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"is": {"result": "ok"}, "within_s": 5}, "per": "items"})"),
                  "success.within_s", "unknown key");
    // any_of stands alone
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"followed_by": {"any_of": [{"type": "shot"}], "side": "same"},
                    "within_s": 5}, "per": "items"})"),
                  "success.followed_by", "any_of stands alone");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"followed_by": {"any_of": []}, "within_s": 5}, "per": "items"})"),
                  "success.followed_by.any_of", "non-empty list");
}

TEST_CASE("a loss cannot be tested with is") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"losses_of": "us"},
        "success": {"is": {"result": "ok"}}, "per": "items"})"),
                  "success.is", "use followed_by");
}

TEST_CASE("within_s must be above 0 and at most 600") {
    const std::string within = GENERATE(as<std::string>{}, "0", "-5", "600.5", "\"5\"", "true",
                                        "null");
    INFO("within_s: " << within);
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"followed_by": {"type": "shot"}, "within_s": )" +
                           within + R"(}, "per": "items"})"),
                  "success.within_s", "above 0");
}

TEST_CASE("within_s is required with followed_by") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"followed_by": {"type": "shot"}}, "per": "items"})"),
                  "success.within_s", "missing");
}

TEST_CASE("same_time and censor must be true or false") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"followed_by": {"type": "shot"}, "within_s": 5, "same_time": "no"},
        "per": "items"})"),
                  "success.same_time", "true or false");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "pass"},
        "success": {"followed_by": {"type": "shot"}, "within_s": 5, "censor": 0},
        "per": "items"})"),
                  "success.censor", "true or false");
}

TEST_CASE("same and other sides only apply to events that follow an item") {
    const std::string side = GENERATE(as<std::string>{}, "same", "other");
    INFO("side: " << side);
    expectProblem(errorsOf(R"({"id": "x", "better": "higher",
        "items": {"side": ")" + side + R"(", "type": "pass"}, "per": "match"})"),
                  "items.side", "same/other only apply");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "tackle"},
        "per": {"side": ")" + side + R"(", "type": "pass"}})"),
                  "per.side", "same/other only apply");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": "shot"},
        "success": {"is": {"side": ")" + side + R"("}}, "per": "items"})"),
                  "success.is.side", "same/other only apply");
}

TEST_CASE("a bad side word is rejected") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"side": "them"},
        "per": "match"})"),
                  "items.side", "expected us or opp");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"losses_of": "them"},
        "per": "match"})"),
                  "items.losses_of", "expected us or opp");
}

TEST_CASE("losses are binned at their loss place only") {
    const std::string where = GENERATE(as<std::string>{}, "start", "end");
    INFO("at: " << where);
    expectProblem(errorsOf(R"({"id": "x", "better": "lower",
        "items": {"losses_of": "us", "at": ")" + where + R"("}, "per": "match"})"),
                  "items.at", "loss_place");
}

TEST_CASE("event items are binned at start or end") {
    expectProblem(errorsOf(R"({"id": "x", "better": "lower",
        "items": {"type": "pass", "at": "loss_place"}, "per": "match"})"),
                  "items.at", "expected start or end");
    expectProblem(errorsOf(R"({"id": "x", "better": "lower",
        "items": {"type": "pass", "at": "middle"}, "per": "match"})"),
                  "items.at", "expected start or end");
}

TEST_CASE("a bad id is rejected") {
    const std::string id = GENERATE(as<std::string>{}, "Regain5", "5s_regain", "", "has space",
                                    "pass-completion", "_x",
                                    "a2345678901234567890123456789012345678901");
    INFO("id: '" << id << "'");
    expectProblem(errorsOf(R"({"id": ")" + id + R"(", "better": "higher",
        "items": {"type": "pass"}, "per": "match"})"),
                  "id", "lower-case letters");
}

TEST_CASE("a missing id is named") {
    expectProblem(errorsOf(R"({"better": "higher", "items": {"type": "pass"}, "per": "match"})"),
                  "id", "missing");
    expectProblem(errorsOf(R"({"id": 7, "better": "higher", "items": {"type": "pass"},
        "per": "match"})"),
                  "id", "missing");
}

TEST_CASE("empty and non-word lists are rejected") {
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"type": []},
        "per": "match"})"),
                  "items.type", "empty list");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher", "items": {"tags_any": [1]},
        "per": "match"})"),
                  "items.tags_any", "list of words");
    expectProblem(errorsOf(R"({"id": "x", "better": "higher",
        "items": {"gives_control": "yes"}, "per": "match"})"),
                  "items.gives_control", "true or false");
}

TEST_CASE("text that is not JSON or not an object") {
    const auto p = errorsOf(R"({"id": "x", "better": )");
    REQUIRE(p.size() == 1);
    CHECK_THAT(p[0].message, Contains("not valid JSON"));
    CHECK(p[0].file == kSource);
    const auto q = errorsOf("[1, 2]");
    REQUIRE(q.size() == 1);
    CHECK_THAT(q[0].message, Contains("JSON object"));
}

TEST_CASE("all problems of a spec are reported, not just the first") {
    const auto p = errorsOf(R"({"id": "x", "items": {"side": "same", "type": "volley"},
        "per": "items", "extra": 1})");
    // Missing better, bad side, unknown type, per items without success, unknown key: 5.
    INFO(describeAll(p));
    CHECK(p.size() == 5);
    CHECK(at(p, "better").field == "better");
    CHECK(at(p, "items.side").field == "items.side");
    CHECK(at(p, "items.type").field == "items.type");
    CHECK(at(p, "per").field == "per");
    CHECK(at(p, "extra").field == "extra");
}

// ---------------------------------------------------------------------------------------------
// Metrics files

TEST_CASE("a metrics file: several metrics, duplicates and bad entries") {
    SECTION("two good metrics") {
        auto [specs, problems] = parseMetricFile(R"({"format": "pitchloop-metrics", "version": 1,
            "metrics": [
              {"id": "a", "better": "higher", "items": {"type": "pass"}, "per": "match"},
              {"id": "b", "better": "lower", "items": {"losses_of": "us"}, "per": "match"}]})",
                                                 kSource);
        INFO(describeAll(problems));
        CHECK(problems.empty());
        REQUIRE(specs.size() == 2);
        CHECK(specs[0].id == "a");
        CHECK(specs[1].id == "b");
    }
    SECTION("a duplicate id") {
        auto [specs, problems] = parseMetricFile(R"({"format": "pitchloop-metrics", "version": 1,
            "metrics": [
              {"id": "dup", "better": "higher", "items": {"type": "pass"}, "per": "match"},
              {"id": "dup", "better": "lower", "items": {"type": "shot"}, "per": "match"}]})",
                                                 kSource);
        REQUIRE(problems.size() == 1);
        CHECK(problems[0].field == "id");
        CHECK(problems[0].place == "metric 'dup'");
        CHECK_THAT(problems[0].message, Contains("defined twice"));
        CHECK(problems[0].describe() == "club-metrics.json: metric 'dup'.id: defined twice");
    }
    SECTION("a bad entry is placed by its position until its id is known") {
        auto [specs, problems] = parseMetricFile(R"({"format": "pitchloop-metrics", "version": 1,
            "metrics": [
              {"id": "a", "better": "higher", "items": {"type": "pass"}, "per": "match"},
              {"better": "lower", "items": {"type": "shot"}, "per": "match"}]})",
                                                 kSource);
        REQUIRE(problems.size() == 1);
        CHECK(problems[0].place == "metrics[1]");
        CHECK(problems[0].field == "id");
        CHECK(specs.size() == 1); // the good one is still read
    }
    SECTION("a wrong format name") {
        auto [specs, problems] = parseMetricFile(R"({"format": "metrics", "version": 1,
            "metrics": []})",
                                                 kSource);
        REQUIRE(problems.size() == 1);
        CHECK(problems[0].field == "format");
    }
    SECTION("a single metric object is a file of one") {
        auto [specs, problems] = parseMetricFile(
            R"({"id": "a", "better": "higher", "items": {"type": "pass"}, "per": "match"})",
            kSource);
        CHECK(problems.empty());
        REQUIRE(specs.size() == 1);
        CHECK(specs[0].id == "a");
    }
}
