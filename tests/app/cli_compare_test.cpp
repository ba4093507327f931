// `compare` on the command line: the demo's planted story (their build-up through our left-back
// area eases after the first weeks) shows as the strongest difference before and from October,
// the JSON carries every zone's sides, and bad requests are named.

#include "clirun.h"
#include "testutil.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

using pitchloop::testutil::cli;
using pitchloop::testutil::contains;
using pitchloop::testutil::demoClub;

namespace {

struct DemoSeason {
    std::string db = demoClub("compare-cli", 16);
};

} // namespace

TEST_CASE("compare: before and from a date, the story's zone first", "[cli][compare]") {
    const DemoSeason demo;
    auto r = cli({"--db", demo.db, "compare", "--metric", "pre_shot_passes_against", "--split", "date:2026-10-01"});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(contains(r.out, "before 2026-10-01 (8 matches) against from 2026-10-01 (8 matches)"));
    const auto firstRow = r.out.substr(r.out.find('\n', r.out.find("zone ")) + 1);
    CHECK(firstRow.rfind("our left-back area (B2·L5)", 0) == 0);
    r = cli({"--db", demo.db, "compare", "--metric", "regain_5s", "--split", "venue", "--format", "json"});
    REQUIRE(r.code == 0);
    const auto j = nlohmann::json::parse(r.out);
    CHECK(j["first"] == "home");
    CHECK(j["first_matches"].size() + j["second_matches"].size() == 16);
    CHECK(j["zones"].size() == 30);
    for (const auto& z : j["zones"]) {
        if (z["difference"].is_null()) continue;
        CHECK(z["low"].get<double>() <= z["difference"].get<double>());
        CHECK(z["difference"].get<double>() <= z["high"].get<double>());
        CHECK(z["difference"].get<double>() ==
              Approx(z["second"]["pooled"].get<double>() - z["first"]["pooled"].get<double>()));
    }
}

TEST_CASE("compare: bad requests are named", "[cli][compare]") {
    const DemoSeason demo;
    struct Case {
        std::vector<std::string> args;
        std::string message;
    };
    for (const Case& c : std::vector<Case>{
             {{"--metric", "regain_5s", "--split", "weather"}, "--split 'weather': expected venue, date:YYYY-MM-DD or opponent:NAME"},
             {{"--metric", "regain_5s", "--split", "date:2026-13-01"}, "--split 'date:2026-13-01'"},
             {{"--metric", "nope", "--split", "venue"}, "no metric 'nope'"},
             {{"--metric", "regain_5s", "--split", "opponent:Nobody FC"}, "no match is Nobody FC in this season"},
             {{"--metric", "regain_5s", "--split", "venue", "--season", "1999-00"}, "no matches of First team in season 1999-00"},
         }) {
        std::vector<std::string> args{"--db", demo.db, "compare"};
        args.insert(args.end(), c.args.begin(), c.args.end());
        const auto r = cli(args);
        INFO(r.err);
        CHECK(r.code == 2);
        CHECK(contains(r.err, c.message));
    }
}
