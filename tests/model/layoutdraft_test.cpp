// A first profile for an unmapped table (model/layoutdraft.h), as the app's mapping assistant
// starts it: the layout sniffed, roles guessed, words listed with counts, words mapped, and the
// finished draft written as a profile that reads back and maps the table.

#include "importprofile.h"
#include "layoutdraft.h"
#include "table.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;

namespace {

// An invented analyst's sheet: semicolons, a decimal comma, a clock from kick-off, team names,
// 0–100 coordinates, one word ("Dribble") that is not ours and one ("Pass") that is.
const char* kSheet =
    "Half;Clock;Team;Action;Outcome;PosX;PosY\n"
    "1st;00:03,0;Kestrel Bay;Pass;Complete;50;50\n"
    "1st;00:05,5;Kestrel Bay;Pass;Incomplete;60;25\n"
    "1st;00:07,0;Saltmarsh;Dribble;Complete;42,5;80\n"
    "1st;00:09,0;Kestrel Bay;Sub;;;\n"
    "2nd;46:10,0;Kestrel Bay;Shot;Saved;90;50\n";

Table tableOf(const char* text, const TableGuess& g) {
    const TableResult t = parseTable(text, g.format, "sheet.csv");
    REQUIRE(t.errors.empty());
    return t.table;
}

const WordUse* find(const std::vector<WordUse>& words, const std::string& field, const std::string& word) {
    for (const auto& w : words)
        if (w.field == field && w.word == word) return &w;
    return nullptr;
}

} // namespace

TEST_CASE("the layout of a table is sniffed from its bytes", "[layoutdraft]") {
    const TableGuess g = guessTableFormat(kSheet);
    CHECK(g.format.layout == TableLayout::Delimited);
    CHECK(g.format.delimiter == ';');
    CHECK(g.format.header);
    CHECK(g.decimal == ',');
    CHECK(g.encoding == TextEncoding::Utf8);

    CHECK(guessTableFormat("a,b\n1,2\n").format.delimiter == ',');
    CHECK(guessTableFormat("a\tb\tc\n1\t2\t3\n").format.delimiter == '\t');
    CHECK_FALSE(guessTableFormat("1,2,3\n4,5,6\n").format.header); // numbers: no header row
    CHECK(guessTableFormat("  [{\"a\": 1}]").format.layout == TableLayout::JsonArray);
    CHECK(guessTableFormat("{\"a\": 1}\n{\"a\": 2}\n").format.layout == TableLayout::JsonLines);
    // "Mälarö" in Windows-1252 (0xE4, 0xF6) is not valid UTF-8.
    CHECK(guessTableFormat("team\nM\xE4lar\xF6\n").encoding == TextEncoding::Windows1252);
    CHECK(guessTableFormat("\xEF\xBB\xBFteam\nM\xC3\xA4lar\xC3\xB6\n").encoding == TextEncoding::Utf8);
}

TEST_CASE("columns are shown with samples and their roles guessed", "[layoutdraft]") {
    const TableGuess g = guessTableFormat(kSheet);
    const Table t = tableOf(kSheet, g);
    const auto looks = lookAtColumns(t, g.decimal);
    REQUIRE(looks.size() == 7);
    CHECK(looks[1].clock);
    CHECK(looks[2].samples == std::vector<std::string>{"Kestrel Bay", "Saltmarsh"});
    CHECK(looks[5].numeric);
    CHECK(looks[5].max == 90);
    CHECK(looks[5].filled == 4); // the substitution has no position

    const MappingProfile p = draftProfile(t, g, "Kestrel Bay");
    CHECK(roleOf(p, "Half") == "period");
    CHECK(roleOf(p, "Clock") == "time");
    CHECK(roleOf(p, "Team") == "side");
    CHECK(roleOf(p, "Action") == "type");
    CHECK(roleOf(p, "Outcome") == "result");
    CHECK(roleOf(p, "PosX") == "x");
    CHECK(roleOf(p, "PosY") == "y");
    CHECK(p.timeForm == MappingProfile::TimeForm::Clock);
    CHECK(p.width == 100); // 90 along and 80 across: not metres of a 105 × 68 pitch
    CHECK(p.usValues == std::vector<std::string>{"Kestrel Bay"});
    // Our own words are recognised; others are left for the person.
    CHECK(p.types.count("Pass") == 1);
    CHECK(p.types.count("Shot") == 1);
    CHECK(p.types.count("Dribble") == 0);
    CHECK(p.results.count("Saved") == 1);    // version 1's word
    CHECK(p.results.count("Complete") == 0); // not ours

    MappingProfile q = p;
    assignRole(q, "Outcome", "type"); // takes the role from Action
    CHECK(roleOf(q, "Action").empty());
    CHECK(roleOf(q, "Outcome") == "type");
    assignRole(q, "Team", "match.opponent");
    CHECK(q.matchColumns.at("opponent") == "Team");
    CHECK(q.columns.count("side") == 0);
}

TEST_CASE("words are listed with counts and mapped one by one", "[layoutdraft]") {
    const TableGuess g = guessTableFormat(kSheet);
    const Table t = tableOf(kSheet, g);
    MappingProfile p = draftProfile(t, g, "Kestrel Bay");
    auto words = vocabulary(t, p);
    const WordUse* pass = find(words, "type", "Pass");
    REQUIRE(pass);
    CHECK(pass->count == 2);
    CHECK(pass->lines == std::vector<std::size_t>{2, 3});
    CHECK(pass->ours == "pass");
    REQUIRE(find(words, "type", "Dribble"));
    CHECK(find(words, "type", "Dribble")->ours.empty());
    CHECK(find(words, "side", "Saltmarsh")->ours == "opp");
    CHECK(find(words, "period", "1st")->count == 4);

    CHECK(mapWord(p, "type", "Dribble", "beat"));
    CHECK(mapWord(p, "type", "Sub", "skip"));
    CHECK(mapWord(p, "type", "Shot", "shot/stopped"));
    CHECK(mapWord(p, "result", "Complete", "ok"));
    CHECK(mapWord(p, "result", "Incomplete", "lost"));
    CHECK(mapWord(p, "period", "1st", "1"));
    CHECK(mapWord(p, "period", "2nd", "2"));
    CHECK_FALSE(mapWord(p, "type", "Dribble", "juggle"));
    CHECK_FALSE(mapWord(p, "period", "1st", "0"));
    words = vocabulary(t, p);
    CHECK(find(words, "type", "Dribble")->ours == "beat");
    CHECK(find(words, "type", "Sub")->ours == "skip");
    CHECK(find(words, "type", "Shot")->ours == "shot/stopped");
    CHECK(find(words, "result", "Incomplete")->ours == "lost");
    for (const auto& w : words) CHECK_FALSE(w.ours.empty());

    SECTION("the finished draft is a profile that reads back and maps the table") {
        p.timeFromKickoff = true;
        p.origin = "top-left";
        p.yUp = false;
        p.match = {{"us", "Kestrel Bay"}};
        p.name = "sheet";
        const std::string text = toJson(p).dump(2);
        const ProfileResult back = parseProfile(text, "sheet.json");
        INFO(text << "\n" << describeAll(back.errors));
        REQUIRE(back.profile);
        CHECK(toJson(*back.profile) == toJson(p));
        MatchDetails details;
        details.values = {{"id", "KB-X-01"}, {"date", "2026-08-01"}, {"venue", "home"}, {"opponent", "Saltmarsh"}};
        const MappedTable m = mapTable(t, *back.profile, details, "sheet.csv");
        INFO(describeAll(m.errors));
        REQUIRE(m.errors.empty());
        CHECK(m.skipped == 1);
        const auto& events = m.match["events"];
        REQUIRE(events.size() == 4);
        // Row 4: "Dribble" → take_on (written in version 1's word), 42.5 of 100 along → 44.625 m;
        // 80 of 100 from the top → 20 % up from the bottom of 68 m = 13.6 m.
        CHECK(events[2]["type"] == "take_on");
        CHECK(events[2]["side"] == "opp");
        CHECK(events[2]["x"].get<double>() == Approx(44.63));
        CHECK(events[2]["y"].get<double>() == Approx(13.6));
        // Row 6: period 2 from 45:00 of the kick-off clock: 70 s into it; the shot stopped.
        CHECK(events[3]["period"] == 2);
        CHECK(events[3]["t"].get<double>() == Approx(70));
        CHECK(events[3]["result"] == "saved");
    }
}

TEST_CASE("a preview maps what it can before the profile is finished", "[layoutdraft]") {
    const TableGuess g = guessTableFormat(kSheet);
    const Table t = tableOf(kSheet, g);
    MappingProfile p = draftProfile(t, g, "Kestrel Bay");
    mapWord(p, "period", "1st", "1");
    mapWord(p, "period", "2nd", "2");
    MatchDetails preview;
    preview.preview = true;
    const MappedTable m = mapTable(t, p, preview, "sheet.csv");
    // Dribble, Sub, Complete and Incomplete are unmapped: errors, yet the other rows map.
    CHECK_FALSE(m.errors.empty());
    CHECK(m.unmapped.size() == 4);
    REQUIRE(m.match.contains("events"));
    CHECK(m.match["events"].size() == 1); // only the shot: its result word is ours
    // Without the preview flag the same table gives nothing.
    CHECK_FALSE(mapTable(t, p, MatchDetails{}, "sheet.csv").match.contains("events"));
}

TEST_CASE("a zone-only table is drafted with its grid and label pattern", "[layoutdraft]") {
    // Invented hand tagging: zone labels instead of positions, one label ("spot") of its own.
    const char* tags = "Half,Secs,Side,Event,Outcome,Zone\n"
                       "1,3,ours,pass,ok,B3-L2\n"
                       "1,9,theirs,pass,ok,B5-L5\n"
                       "1,20,ours,shot,wide,spot\n";
    const TableGuess g = guessTableFormat(tags);
    const Table t = tableOf(tags, g);
    MappingProfile p = draftProfile(t, g, "");
    CHECK(roleOf(p, "Zone") == "zone");
    REQUIRE(p.zoneGrid);
    CHECK(p.zoneGrid->name() == "equal:6x5");
    CHECK(p.zonePattern == "B{band}-L{lane}");
    CHECK(guessZonePattern("Z12/7") == "Z{band}/{lane}");
    CHECK(guessZonePattern("left wing").empty());
    auto words = vocabulary(t, p);
    REQUIRE(find(words, "zone", "B3-L2"));
    CHECK(find(words, "zone", "B3-L2")->ours == "3,2");
    CHECK(find(words, "zone", "spot")->ours.empty());
    CHECK(mapWord(p, "zone", "spot", "6,3"));
    CHECK_FALSE(mapWord(p, "zone", "spot", "7,3")); // beyond the grid's 6 bands
    CHECK(find(vocabulary(t, p), "zone", "spot")->ours == "6,3");
    mapWord(p, "side", "ours", "us");
    // A position role takes the zone's away, and back.
    assignRole(p, "Zone", "x");
    CHECK_FALSE(p.zoneGrid);
    assignRole(p, "Zone", "zone");
    REQUIRE(p.zoneGrid);
    p.zonePattern = "B{band}-L{lane}";
    mapWord(p, "zone", "spot", "6,3");

    const ProfileResult back = parseProfile(toJson(p).dump(), "tags.json");
    INFO(toJson(p).dump(2) << "\n" << describeAll(back.errors));
    REQUIRE(back.profile);
    MatchDetails details;
    details.values = {{"id", "KB-Z-01"}, {"date", "2026-08-01"}, {"venue", "home"}, {"us", "Kestrel Bay"},
                      {"opponent", "Saltmarsh"}};
    const MappedTable m = mapTable(t, *back.profile, details, "tags.csv");
    INFO(describeAll(m.errors));
    REQUIRE(m.errors.empty());
    // "spot" is band 6 lane 3 of 6 × 5 on 105 × 68: centre (96.25, 34) — bands of 17.5 m, lanes
    // of 13.6 m, lane 3 spanning 27.2–40.8 m.
    CHECK(m.match["events"][2]["x"].get<double>() == Approx(96.25));
    CHECK(m.match["events"][2]["y"].get<double>() == Approx(34));
    CHECK(m.match["match"]["zone_only"]["grid"] == "equal:6x5");
}
