// Tables and mapping profiles (model/table.h, model/importprofile.h): cutting text into cells,
// decoding, reading a profile, mapping rows to our events, and every bad profile or bad file
// refused with a problem naming the file, the line and the column — storing nothing. The
// whole-season check against the native files is tests/python/import_check.py.

#include "importprofile.h"
#include "ingest.h"
#include "profilestore.h"
#include "repository.h"
#include "table.h"
#include "testutil.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>

using namespace pitchloop::model;
using pitchloop::testutil::contains;
using pitchloop::testutil::dataSnapshot;
using pitchloop::testutil::freshTempDir;
namespace fs = std::filesystem;

namespace {

/// A small profile of our own: ';' with a decimal comma, clock from kick-off, 0–100 from the
/// top-left corner. `extra` is spliced into the top-level object.
std::string profileText(const std::string& extra = "") {
    return R"({"format": "pitchloop-profile", "version": 1, "name": "test sheet",
      "table": {"layout": "delimited", "delimiter": ";", "decimal": ","},
      "columns": {"period": "Half", "time": "Clock", "side": "Team", "type": "Action",
                  "result": "Outcome", "x": "X", "y": "Y"},
      "time": {"form": "clock", "from": "kickoff"},
      "side": {"us": ["Kestrel Bay"]},
      "coordinates": {"width": 100, "height": 100, "origin": "top-left"},
      "types": {"Pass": "pass", "Shot": "shot", "Ball won": "recovery"},
      "results": {"Complete": "ok", "Incomplete": "fail", "Goal": "goal", "Saved": "saved"},
      "skip": ["Substitution"],
      "match": {"us": "Kestrel Bay", "id": "KB-T-01", "date": "2026-08-01", "venue": "home",
                "opponent": "Saltmarsh Athletic"})" +
           extra + "}";
}

MappingProfile profile(const std::string& extra = "") {
    const ProfileResult p = parseProfile(profileText(extra), "test.json");
    INFO(describeAll(p.errors));
    REQUIRE(p.profile);
    return *p.profile;
}

const char* kGoodTable =
    "Half;Clock;Team;Action;Outcome;X;Y\n"
    "1;00:03,0;Kestrel Bay;Pass;Complete;50;50\n"
    "1;00:05,5;Kestrel Bay;Pass;Incomplete;60;25\n"
    "1;00:07,0;Saltmarsh Athletic;Ball won;Complete;42,5;80\n"
    "1;00:09,0;Kestrel Bay;Substitution;;;\n"
    "2;45:10,0;Kestrel Bay;Shot;Saved;90;50\n";

MappedTable mapText(const std::string& table, const MappingProfile& p, const std::string& name = "t.csv") {
    return mapFile(table, p, {}, name);
}

} // namespace

TEST_CASE("delimited text: quotes, CRLF, blank lines and short rows", "[import]") {
    TableFormat f;
    const auto r = parseTable("a,b,c\r\n\"x, y\",\"say \"\"hi\"\"\",3\r\n\r\n\"two\nlines\",2\n", f, "q.csv");
    REQUIRE(r.errors.empty());
    REQUIRE(r.table.rows.size() == 2);
    CHECK(r.table.rows[0].cells == std::vector<std::string>{"x, y", "say \"hi\"", "3"});
    CHECK(r.table.rows[0].line == 2);
    CHECK(r.table.rows[1].cells == std::vector<std::string>{"two\nlines", "2", ""}); // padded
    CHECK(r.table.rows[1].line == 4);
    // A row with more cells than the header names its line.
    const auto wide = parseTable("a,b\n1,2,3\n", f, "w.csv");
    REQUIRE(wide.errors.size() == 1);
    CHECK(wide.errors[0].place == "line 2");
    CHECK(contains(wide.errors[0].message, "3 cells"));
    // Without a header the columns are numbered from 1.
    f.header = false;
    const auto bare = parseTable("1\t2\n", TableFormat{TableLayout::Delimited, '\t', 0, false}, "b.tsv");
    CHECK(bare.table.columns == std::vector<std::string>{"1", "2"});
    CHECK(bare.table.column("2") == 1u);
}

TEST_CASE("text encodings: BOM, Latin-1, Windows-1252 and refused non-UTF-8", "[import]") {
    const auto bom = decodeText("\xEF\xBB\xBFTeam", TextEncoding::Utf8, "b.csv");
    CHECK(bom.hadBom);
    CHECK(bom.text == "Team");
    // Latin-1 0xE9 is é: Python's bytes([0xe9]).decode('latin-1').encode() → c3 a9.
    CHECK(decodeText("caf\xE9", TextEncoding::Latin1, "l.csv").text == "caf\xC3\xA9");
    // Windows-1252 0x80–0x9F, against Python's cp1252 codec: 0x80 → e2 82 ac (€),
    // 0x92 → e2 80 99 (’), 0x8a → c5 a0 (Š), 0x9f → c5 b8 (Ÿ); 0x81 is undefined.
    CHECK(decodeText("\x80\x92\x8A\x9F", TextEncoding::Windows1252, "w.csv").text ==
          "\xE2\x82\xAC\xE2\x80\x99\xC5\xA0\xC5\xB8");
    const auto undefined = decodeText("ok\x81", TextEncoding::Windows1252, "w.csv");
    REQUIRE(undefined.errors.size() == 1);
    CHECK(undefined.errors[0].place == "line 1, column 3");
    // A Latin-1 file read as UTF-8 is refused at its first foreign byte (mixed encodings).
    const auto mixed = decodeText("Team\nCaf\xC3\xA9\nCaf\xE9\n", TextEncoding::Utf8, "m.csv");
    REQUIRE(mixed.errors.size() == 1);
    CHECK(mixed.errors[0].place == "line 3, column 4");
    CHECK(contains(mixed.errors[0].message, "not UTF-8"));
}

TEST_CASE("JSON Lines and JSON arrays of flat objects become tables", "[import]") {
    const auto lines = parseTable("{\"t\": 1.5, \"who\": \"9\"}\n\n{\"t\": 2, \"extra\": true}\n",
                                  {TableLayout::JsonLines, ',', '"', true}, "l.jsonl");
    REQUIRE(lines.errors.empty());
    CHECK(lines.table.columns == std::vector<std::string>{"t", "who", "extra"});
    REQUIRE(lines.table.rows.size() == 2);
    CHECK(lines.table.rows[0].cells == std::vector<std::string>{"1.5", "9", ""});
    CHECK(lines.table.rows[1].cells == std::vector<std::string>{"2", "", "true"});
    CHECK(lines.table.rows[1].line == 3);
    const auto nested = parseTable("[{\"t\": {\"s\": 1}}]", {TableLayout::JsonArray, ',', '"', true}, "a.json");
    REQUIRE(nested.errors.size() == 1);
    CHECK(nested.errors[0].place == "[0]");
    CHECK(nested.errors[0].field == "t");
}

TEST_CASE("a table maps to our events: clock from kick-off, sides, skipped rows, positions",
          "[import]") {
    const MappedTable m = mapText(kGoodTable, profile());
    INFO(describeAll(m.errors));
    REQUIRE(m.errors.empty());
    CHECK(m.skipped == 1);
    const auto& events = m.match["events"];
    REQUIRE(events.size() == 4);
    // Row 2: 00:03,0 → 3 s; (50, 50) of 100 from the top-left → (52.5, 34) on 105 × 68.
    CHECK(events[0]["t"] == 3.0);
    CHECK(events[0]["x"] == 52.5);
    CHECK(events[0]["y"] == 34.0);
    // Row 3: y 25 from the top with y down → 75 % of the width up from our right touchline.
    CHECK(events[1]["y"] == 51.0);
    CHECK(events[1]["result"] == "fail");
    CHECK(events[2]["side"] == "opp");
    CHECK(events[2]["x"] == 44.63); // 42,5 % of 105 = 44.625, kept to the centimetre
    // Row 6: 45:10 from kick-off is 10 s into period 2.
    CHECK(events[3]["period"] == 2);
    CHECK(events[3]["t"] == 10.0);
    CHECK(m.rowPlaces[3] == "line 6");
    CHECK(m.countsByType.at("us pass") == 2);
    // Periods without stated lengths run to their last event, rounded up.
    CHECK(m.match["match"]["periods"][1]["length_s"] == 11.0);
    // It reads as one of our own match files.
    CHECK(parseMatch(m.match.dump(), "t.csv").ok());
}

TEST_CASE("match details come from the file name pattern and the caller, in that order",
          "[import]") {
    MappingProfile p = profile(R"(, "file_name": "{id}_{date}_{opponent}.csv")");
    p.match.erase("id");
    p.match.erase("date");
    p.match.erase("opponent");
    MatchDetails d;
    d.values["opponent"] = "Duneford City";
    const MappedTable m = mapFile(kGoodTable, p, d, "/data/KB-T-09_2026-09-12_Nettleby.csv");
    INFO(describeAll(m.errors));
    REQUIRE(m.errors.empty());
    CHECK(m.match["match"]["id"] == "KB-T-09");
    CHECK(m.match["match"]["date"] == "2026-09-12");
    CHECK(m.match["match"]["opponent"] == "Duneford City"); // the caller wins
    const MappedTable off = mapFile(kGoodTable, p, d, "KB-T-09.csv");
    REQUIRE_FALSE(off.errors.empty());
    CHECK(contains(off.errors[0].message, "does not follow the profile's pattern"));
}

TEST_CASE("bad files are refused naming file, line and column", "[import][badinput]") {
    const MappingProfile p = profile();
    SECTION("a column the profile names is not in the table") {
        const auto m = mapText("Half;Time;Team;Action;Outcome;X;Y\n1;1;Kestrel Bay;Pass;Complete;1;1\n", p);
        REQUIRE_FALSE(m.errors.empty());
        CHECK(m.errors[0].field == "Clock");
        CHECK(contains(m.errors[0].message, "no such column"));
        CHECK(contains(m.errors[0].message, "Time"));
    }
    SECTION("an unmapped word is listed with its count and first lines") {
        const auto m = mapText(std::string(kGoodTable) + "1;00:20,0;Kestrel Bay;Header;Complete;50;50\n"
                                                         "1;00:25,0;Kestrel Bay;Header;Complete;50;50\n", p);
        REQUIRE(m.unmapped.size() == 1);
        CHECK(m.unmapped[0].word == "Header");
        CHECK(m.unmapped[0].count == 2);
        REQUIRE(m.errors.size() == 1);
        CHECK(m.errors[0].place == "line 7");
        CHECK(m.errors[0].field == "Action");
        CHECK(contains(m.errors[0].message, "2 times; lines 7, 8"));
    }
    SECTION("an impossible time") {
        const auto m = mapText("Half;Clock;Team;Action;Outcome;X;Y\n2;12:30;Kestrel Bay;Pass;Complete;5;5\n", p);
        REQUIRE(m.errors.size() == 1);
        CHECK(m.errors[0].place == "line 2");
        CHECK(m.errors[0].field == "Clock");
        CHECK(contains(m.errors[0].message, "impossible time"));
        const auto bad = mapText("Half;Clock;Team;Action;Outcome;X;Y\n1;12:75;Kestrel Bay;Pass;Complete;5;5\n", p);
        REQUIRE(bad.errors.size() == 1);
        CHECK(contains(bad.errors[0].message, "is not a time"));
    }
    SECTION("positions past the stated extent") {
        // 0–100 stated, but the file is in metres on 105 × 68: 104 is past 103 (3 % slack).
        const auto m = mapText("Half;Clock;Team;Action;Outcome;X;Y\n1;00:01;Kestrel Bay;Pass;Complete;104;50\n", p);
        REQUIRE(m.errors.size() == 1);
        CHECK(m.errors[0].place == "line 2");
        CHECK(m.errors[0].field == "X");
        CHECK(contains(m.errors[0].message, "outside the stated extent"));
    }
    SECTION("a result our format does not allow for the type, in the table's terms") {
        // A pass that "Goal"s maps, but the match reader refuses it: the problem names the
        // table's line and column.
        const auto m = mapText("Half;Clock;Team;Action;Outcome;X;Y\n1;00:01;Kestrel Bay;Pass;Goal;50;50\n", p);
        REQUIRE(m.errors.empty());
        const ReadResult read = parseMatch(m.match.dump(), "t.csv");
        REQUIRE_FALSE(read.ok());
        const Problems problems = inTableTerms(read.errors, m, p);
        CHECK(problems[0].place == "line 2");
        CHECK(problems[0].field == "Outcome");
    }
}

TEST_CASE("bad profiles are refused naming the field", "[import][badinput]") {
    auto firstError = [](const std::string& text) {
        const ProfileResult r = parseProfile(text, "p.json");
        REQUIRE_FALSE(r.profile);
        REQUIRE_FALSE(r.errors.empty());
        return r.errors.front();
    };
    CHECK(firstError(profileText(R"(, "colour": "blue")")).field == "colour");
    const Problem type = firstError(profileText(R"(, "types": {"Pass": "lob"})"));
    CHECK(type.place == "types");
    CHECK(type.field == "Pass");
    CHECK(contains(type.message, "not one of our event types"));
    const Problem decimal = firstError(R"({"format": "pitchloop-profile", "version": 1,
        "table": {"delimiter": ",", "decimal": ","}, "columns": {"time": "t", "side": "s",
        "type": "a", "x": "x", "y": "y"}, "side": {"us": ["A"]}, "types": {}})");
    CHECK(decimal.field == "decimal");
    const Problem missing = firstError(R"({"format": "pitchloop-profile", "version": 1,
        "columns": {"time": "t"}, "side": {"us": ["A"]}, "types": {}})");
    CHECK(missing.place == "columns");
    CHECK(firstError("not json").message.rfind("not valid JSON", 0) == 0);
}

TEST_CASE("ingest with a profile stores the match, or nothing at all", "[import]") {
    const fs::path dir = freshTempDir("import");
    const std::string club = (dir / "club.sqlite").string();
    const fs::path good = dir / "good.csv", bad = dir / "bad.csv";
    std::ofstream(good, std::ios::binary) << kGoodTable;
    std::ofstream(bad, std::ios::binary) << std::string(kGoodTable) + "1;00:20,0;Kestrel Bay;Header;;50;50\n";
    {
        ClubRepository repo(club);
        const auto r = ingestTableFile(repo, bad, profile(), {});
        REQUIRE(r.size() == 1);
        CHECK(r[0].status == IngestStatus::Invalid);
        CHECK(repo.matches().empty());
    }
    const std::string before = dataSnapshot(club);
    {
        ClubRepository repo(club);
        const auto again = ingestTableFile(repo, bad, profile(), {});
        CHECK_FALSE(again.at(0).ok());
    }
    CHECK(dataSnapshot(club) == before); // nothing stored by the bad file
    ClubRepository repo(club);
    const auto r = ingestTableFile(repo, good, profile(), {});
    REQUIRE(r.size() == 1);
    INFO(describeAll(r[0].errors));
    CHECK(r[0].status == IngestStatus::Added);
    CHECK(r[0].events == 4);
    CHECK(ingestTableFile(repo, good, profile(), {}).at(0).status == IngestStatus::Unchanged);
    std::error_code ec;
    fs::remove_all(dir, ec);
}

TEST_CASE("sanity checks warn when x looks reversed or a period is far too long", "[import]") {
    // Six of our shots, all at x 10 of 100 (our own half in the acting frame): a reversed axis.
    std::string table = "Half;Clock;Team;Action;Outcome;X;Y\n";
    for (int i = 0; i < 6; ++i)
        table += "1;0" + std::to_string(i) + ":00;Kestrel Bay;Shot;Saved;10;50\n";
    table += "2;130:00;Kestrel Bay;Pass;Complete;50;50\n"; // 85 minutes into period 2
    const MappedTable m = mapText(table, profile());
    INFO(describeAll(m.errors));
    REQUIRE(m.errors.empty());
    REQUIRE(m.warnings.size() == 2);
    CHECK(contains(m.warnings[0].message, "period 2 lasts 85 minutes"));
    CHECK(contains(m.warnings[1].message, "6 of our 6 shots are in our own half"));
    CHECK(m.warnings[1].field == "X");
}

TEST_CASE("a table of several matches: match details from columns, one match per id", "[import]") {
    MappingProfile p = profile(R"(, "match_columns": {"id": "Game", "date": "Day", "opponent": "Against",
                                                      "venue": "Where"},
                                  "venues": {"H": "home", "A": "away"})");
    for (const char* key : {"id", "date", "opponent", "venue"}) p.match.erase(key);
    const std::string table =
        "Game;Day;Against;Where;Half;Clock;Team;Action;Outcome;X;Y\n"
        "KB-1;2026-08-01;Saltmarsh Athletic;H;1;00:03;Kestrel Bay;Pass;Complete;50;50\n"
        "KB-2;2026-08-08;Duneford City;A;1;00:02;Kestrel Bay;Pass;Complete;50;50\n"
        "KB-1;2026-08-01;Saltmarsh Athletic;H;1;00:09;Saltmarsh Athletic;Ball won;Complete;40;40\n"
        "KB-2;2026-08-08;Duneford City;A;1;00:07;Duneford City;Ball won;Complete;40;40\n";
    const auto all = mapFileMatches(table, p, {}, "season.csv");
    REQUIRE(all.size() == 2);
    for (const auto& m : all) {
        INFO(describeAll(m.errors));
        REQUIRE(m.errors.empty());
        CHECK(m.match["events"].size() == 2);
    }
    CHECK(all[0].match["match"]["id"] == "KB-1");
    CHECK(all[0].match["match"]["venue"] == "home");
    CHECK(all[1].match["match"]["opponent"] == "Duneford City");
    CHECK(all[1].match["match"]["venue"] == "away");
    CHECK(all[1].rowPlaces[1] == "line 5");
    // A row whose details contradict its match's earlier rows is refused where it is.
    const auto bad = mapFileMatches(table + "KB-1;2026-08-02;Saltmarsh Athletic;H;1;00:30;Kestrel Bay;Pass;Complete;5;5\n",
                                    p, {}, "season.csv");
    REQUIRE(bad.size() == 1);
    REQUIRE(bad[0].errors.size() == 1);
    CHECK(bad[0].errors[0].place == "line 6");
    CHECK(bad[0].errors[0].field == "Day");
}

TEST_CASE("saved profiles: stored by name, and the one whose columns a table has is found",
          "[import]") {
    ClubRepository repo(":memory:");
    ProfileStore store(repo);
    CHECK(store.save("sheet", profileText(), "R. Tamsin", "2026-12-04T09:00:00Z").empty());
    // A second layout with other column names.
    std::string other = profileText();
    for (const auto& [from, to] : std::vector<std::pair<std::string, std::string>>{
             {"\"Clock\"", "\"Time\""}, {"\"Action\"", "\"Event\""}})
        other.replace(other.find(from), from.size(), to);
    CHECK(store.save("other", other, "", "t").empty());
    // A profile that does not read is refused and nothing is saved.
    const Problems bad = store.save("broken", R"({"format": "pitchloop-profile"})", "", "t");
    CHECK_FALSE(bad.empty());
    REQUIRE(store.list().size() == 2);
    CHECK(store.get("sheet")->savedBy == "R. Tamsin");

    const auto found = profileFor(kGoodTable, store.list());
    REQUIRE(found);
    CHECK(found->name == "sheet");
    const auto otherFound = profileFor("Half;Time;Team;Event;Outcome;X;Y\n1;3;Kestrel Bay;Pass;Complete;5;5\n",
                                       store.list());
    REQUIRE(otherFound);
    CHECK(otherFound->name == "other");
    CHECK_FALSE(profileFor("a;b;c\n1;2;3\n", store.list()));
    CHECK(store.remove("other"));
    CHECK_FALSE(store.remove("other"));
    CHECK(looksLikeTable("season.CSV"));
    CHECK(looksLikeTable("log.jsonl"));
    CHECK_FALSE(looksLikeTable("KB-2026-01.json"));
}
