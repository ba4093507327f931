// Browsing the drill book: the intensity filter on top of a search, and the tags in use.
// Every drill here is invented.

#include "drillbrowse.h"
#include "repository.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;

namespace {

Drill drill(const std::string& title, int intensity, std::vector<std::string> tags) {
    Drill d;
    d.title = title;
    d.durationMin = 15;
    d.intensity = intensity;
    d.playersMin = 6;
    d.playersMax = 12;
    d.tags = std::move(tags);
    d.metrics = {"pass_completion"};
    d.author = "L. Farrant";
    return d;
}

std::vector<std::string> titles(const std::vector<Drill>& drills) {
    std::vector<std::string> out;
    for (const auto& d : drills) out.push_back(d.title);
    return out;
}

} // namespace

TEST_CASE("browsing the drill book filters by intensity on top of the search", "[drills]") {
    ClubRepository repo(":memory:");
    DrillBook book(repo);
    const std::string now = "2026-07-20T10:00:00Z";
    REQUIRE(book.add(drill("Rondo 5v2", 3, {"Rondo", "warm_up"}), "L. Farrant", now).ok());
    REQUIRE(book.add(drill("Pressing box", 5, {"pressing"}), "L. Farrant", now).ok());
    REQUIRE(book.add(drill("Rondo to goal", 5, {"rondo", "finishing"}), "L. Farrant", now).ok());

    DrillFilter f;
    CHECK(browseDrills(book, f).size() == 3);
    f.intensity = 5;
    CHECK(titles(browseDrills(book, f)) == std::vector<std::string>{"Pressing box", "Rondo to goal"});
    f.query.text = "rondo";
    CHECK(titles(browseDrills(book, f)) == std::vector<std::string>{"Rondo to goal"});
    f.intensity = 2;
    CHECK(browseDrills(book, f).empty());
    f = {};
    f.query.tag = "RONDO"; // ASCII case ignored, as DrillBook::search does
    f.intensity = 3;
    CHECK(titles(browseDrills(book, f)) == std::vector<std::string>{"Rondo 5v2"});

    // Tags once each, ASCII case ignored (first spelling kept), sorted.
    CHECK(drillTags(book.list()) ==
          std::vector<std::string>{"finishing", "pressing", "Rondo", "warm_up"});
    CHECK(drillTags({}).empty());
}
