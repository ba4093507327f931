// Fixtures: calendar arithmetic, the CSV and JSON fixture files with their problems, microcycle
// labels (an ordinary week and a congested one) and the intensity caps of each day.

#include "fixtures.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;
using Catch::Matchers::Contains;

namespace {

Fixture fx(const std::string& date, const std::string& opponent = "Harbour Rovers") {
    return Fixture{date, "15:00", opponent, "home", "League", ""};
}

bool hasProblem(const Problems& ps, const std::string& place, const std::string& field,
                const std::string& words) {
    for (const auto& p : ps)
        if (p.place == place && p.field == field && p.message.find(words) != std::string::npos)
            return true;
    return false;
}

} // namespace

TEST_CASE("calendar dates: day numbers, real dates only, adding days", "[fixtures]") {
    CHECK(dayNumber("1970-01-01") == 0);
    // Python: (date(2026, 8, 8) - date(1970, 1, 1)).days == 20673
    CHECK(dayNumber("2026-08-08") == 20673);
    CHECK(isoDate(20673) == "2026-08-08");
    CHECK(dayNumber("2028-02-29").has_value()); // 2028 is a leap year
    CHECK_FALSE(dayNumber("2026-02-29").has_value());
    CHECK_FALSE(dayNumber("2100-02-29").has_value()); // divisible by 100, not by 400
    CHECK(dayNumber("2000-02-29").has_value());       // divisible by 400
    CHECK_FALSE(dayNumber("2026-13-01").has_value());
    CHECK_FALSE(dayNumber("2026-04-31").has_value());
    CHECK_FALSE(dayNumber("2026-4-1").has_value());
    CHECK(addDays("2026-12-30", 3) == "2027-01-02");
    CHECK(addDays("2027-03-01", -1) == "2027-02-28");
    CHECK(addDays("2028-03-01", -1) == "2028-02-29");
}

TEST_CASE("a CSV fixtures file: quoting, any column order, CRLF and a byte-order mark",
          "[fixtures]") {
    const std::string csv = "\xEF\xBB\xBF"
                            "opponent,date,venue,kickoff,competition\r\n"
                            "\"Harbour Rovers, Reserves\",2026-08-08,home,15:00,League\r\n"
                            "\"The \"\"Old\"\" Mill\",2026-08-12,away,19:45,\"County\nCup\"\r\n"
                            "\r\n"
                            "Quarry Town,2026-08-15,neutral,,Friendly\r\n";
    const auto r = parseFixtureCsv(csv, "season.csv");
    REQUIRE(r.errors.empty());
    REQUIRE(r.fixtures.size() == 3);
    CHECK(r.fixtures[0] ==
          Fixture{"2026-08-08", "15:00", "Harbour Rovers, Reserves", "home", "League", ""});
    CHECK(r.fixtures[1].opponent == "The \"Old\" Mill");
    CHECK(r.fixtures[1].competition == "County\nCup"); // a line break inside quotes is kept
    CHECK(r.fixtures[2].kickoff.empty());              // not known yet
    CHECK(r.fixtures[2].venue == "neutral");
    // Chosen by content: no '{' first, so CSV.
    CHECK(parseFixtureFile(csv, "season.csv").fixtures == r.fixtures);
}

TEST_CASE("CSV problems name the line the record starts on and the column", "[fixtures]") {
    SECTION("field problems, counted past a quoted line break") {
        const std::string csv = "date,kickoff,opponent,venue,competition\n"
                                "2026-08-08,15:00,\"Two\nLines\",home,League\n" // lines 2–3
                                "2026-08-15,25:00,Quarry Town,Home,League\n"    // line 4
                                "2026-02-30,15:00,,away,League\n"               // line 5
                                "2026-08-08,15:00,Mill,away,Cup\n";             // line 6
        const auto r = parseFixtureCsv(csv, "s.csv");
        CHECK(r.fixtures.empty());
        CHECK(hasProblem(r.errors, "line 4", "kickoff", "'25:00' is not a time HH:MM"));
        CHECK(hasProblem(r.errors, "line 4", "venue", "'Home' is not one of home, away, neutral"));
        CHECK(hasProblem(r.errors, "line 5", "date", "'2026-02-30' is not a date"));
        CHECK(hasProblem(r.errors, "line 5", "opponent", "missing"));
        CHECK(hasProblem(r.errors, "line 6", "date", "a second fixture on 2026-08-08"));
        CHECK(r.errors.size() == 5);
        CHECK(r.errors[0].describe() ==
              "s.csv: line 4.kickoff: '25:00' is not a time HH:MM (00:00 to 23:59), or empty "
              "while unknown");
    }
    SECTION("header problems") {
        const auto r =
            parseFixtureCsv("date,time,opponent,venue\n2026-08-08,15:00,X,home\n", "h.csv");
        CHECK(r.fixtures.empty());
        CHECK(hasProblem(r.errors, "line 1", "time", "unknown column 'time'"));
        CHECK(hasProblem(r.errors, "line 1", "kickoff", "missing column"));
        CHECK(hasProblem(r.errors, "line 1", "competition", "missing column"));
    }
    SECTION("record shape and quoting") {
        auto r = parseFixtureCsv(
            "date,kickoff,opponent,venue,competition\n2026-08-08,15:00,X,home\n", "a.csv");
        CHECK(hasProblem(r.errors, "line 2", "", "4 fields where the header has 5"));
        r = parseFixtureCsv(
            "date,kickoff,opponent,venue,competition\n2026-08-08,15:00,\"X,home,L\n", "b.csv");
        CHECK(hasProblem(r.errors, "line 2", "", "a quoted field is never closed"));
        r = parseFixtureCsv(
            "date,kickoff,opponent,venue,competition\n2026-08-08,15:00,X \"Y\",home,L\n", "c.csv");
        CHECK(hasProblem(r.errors, "line 2", "", "a quote inside an unquoted field"));
        r = parseFixtureCsv("", "d.csv");
        CHECK(hasProblem(r.errors, "line 1", "", "empty file"));
    }
}

TEST_CASE("a JSON fixtures file and its problems", "[fixtures]") {
    const std::string good = R"({"format": "pitchloop-fixtures", "version": 1, "fixtures": [
        {"date": "2026-08-08", "kickoff": "15:00", "opponent": "Harbour Rovers", "venue": "home",
         "competition": "League"},
        {"date": "2026-08-12", "opponent": "Quarry Town", "venue": "away"}]})";
    auto r = parseFixtureFile(good, "s.json");
    REQUIRE(r.errors.empty());
    REQUIRE(r.fixtures.size() == 2);
    CHECK(r.fixtures[0] == fx("2026-08-08"));
    CHECK(r.fixtures[1].kickoff.empty());
    CHECK(r.fixtures[1].competition.empty());

    r = parseFixtureJson(R"({"format": "pitchloop-targets", "version": 1, "fixtures": []})",
                         "x.json");
    CHECK(hasProblem(r.errors, "", "format", "pitchloop-fixtures"));
    r = parseFixtureJson("{not json", "x.json");
    CHECK(hasProblem(r.errors, "", "", "not valid JSON"));
    r = parseFixtureJson(R"({"format": "pitchloop-fixtures", "version": 1, "fixtures": [
        {"date": "2026-08-08", "opponent": "A", "venue": "home", "ground": "Park"},
        {"date": 20260815, "opponent": "B", "venue": "away"},
        {"date": "2026-08-22", "opponent": "C", "venue": "abroad", "kickoff": "3pm"},
        7]})",
                         "x.json");
    CHECK(r.fixtures.empty());
    CHECK(hasProblem(r.errors, "fixtures[0]", "ground", "unknown key"));
    CHECK(hasProblem(r.errors, "fixtures[1]", "date", "expected text"));
    CHECK(hasProblem(r.errors, "fixtures[2]", "venue", "'abroad' is not one of"));
    CHECK(hasProblem(r.errors, "fixtures[2]", "kickoff", "'3pm' is not a time"));
    CHECK(hasProblem(r.errors, "fixtures[3]", "", "expected an object"));
    CHECK(r.errors.size() == 5);
}

TEST_CASE("microcycle labels and caps through an ordinary Saturday-to-Saturday week",
          "[fixtures][microcycle]") {
    // 2026-08-08 and 2026-08-15 are Saturdays (Python: date(2026, 8, 8).weekday() == 5).
    const std::vector<Fixture> fixtures{fx("2026-08-15", "Quarry Town"), fx("2026-08-08")};
    const IntensityCaps caps;
    struct Expect {
        const char* date;
        const char* label;
        int cap; // the default table: MD+1 2, MD+2 3, MD-4 5, MD-3 4, MD-2 3, MD-1 2, MD 0
    };
    for (const Expect& e : {Expect{"2026-08-09", "MD+1", 2}, Expect{"2026-08-10", "MD+2", 3},
                            Expect{"2026-08-11", "MD-4", 5}, Expect{"2026-08-12", "MD-3", 4},
                            Expect{"2026-08-13", "MD-2", 3}, Expect{"2026-08-14", "MD-1", 2},
                            Expect{"2026-08-15", "MD", 0}}) {
        INFO(e.date);
        const MicrocycleDay d = microcycle(e.date, fixtures);
        CHECK(d.label == e.label);
        CHECK(intensityCap(d, caps) == e.cap);
        CHECK_FALSE(d.congested);
    }
    const MicrocycleDay wed = microcycle("2026-08-12", fixtures);
    REQUIRE(wed.previous);
    REQUIRE(wed.next);
    CHECK(wed.previous->date == "2026-08-08");
    CHECK(wed.next->opponent == "Quarry Town");
    CHECK(wed.daysAfterPrevious == 4);
    CHECK(wed.daysToNext == 3);
}

TEST_CASE("a congested week labels days from both matches and takes the lower cap",
          "[fixtures][microcycle]") {
    // Saturday 15th, Wednesday 19th, Saturday 22nd: 4 and 3 days apart, both congested.
    const std::vector<Fixture> fixtures{fx("2026-08-15"), fx("2026-08-19"), fx("2026-08-22")};
    const IntensityCaps caps;
    struct Expect {
        const char* date;
        const char* label;
        int cap;
    };
    for (const Expect& e :
         {Expect{"2026-08-16", "MD+1 / MD-3", 2}, // min(MD+1 2, MD-3 4)
          Expect{"2026-08-17", "MD+2 / MD-2", 3}, // min(3, 3)
          Expect{"2026-08-18", "MD+3 / MD-1", 2}, // min(other 4, MD-1 2)
          Expect{"2026-08-19", "MD", 0}, Expect{"2026-08-20", "MD+1 / MD-2", 2}, // min(2, 3)
          Expect{"2026-08-21", "MD+2 / MD-1", 2}}) {                             // min(3, 2)
        INFO(e.date);
        const MicrocycleDay d = microcycle(e.date, fixtures);
        CHECK(d.label == e.label);
        CHECK(d.congested == (d.label != "MD")); // match day is MD, congested or not
        CHECK(intensityCap(d, caps) == e.cap);
    }
    // Five days apart is not congested: MD+1, MD+2, then the countdown.
    const std::vector<Fixture> five{fx("2026-08-15"), fx("2026-08-20")};
    CHECK(microcycle("2026-08-16", five).label == "MD+1");
    CHECK_FALSE(microcycle("2026-08-16", five).congested);
    CHECK(microcycle("2026-08-18", five).label == "MD-2");
}

TEST_CASE("days far from any match, and no fixtures at all", "[fixtures][microcycle]") {
    const std::vector<Fixture> fixtures{fx("2026-08-08"), fx("2026-08-29")};
    const IntensityCaps caps;
    // Pre-season: nineteen days before the first fixture.
    CHECK(microcycle("2026-07-20", fixtures).label == "MD-19");
    CHECK(intensityCap(microcycle("2026-07-20", fixtures), caps) == caps.otherDays);
    // A three-week gap: MD+2, then counting down from MD-18.
    CHECK(microcycle("2026-08-10", fixtures).label == "MD+2");
    CHECK(microcycle("2026-08-11", fixtures).label == "MD-18");
    CHECK(intensityCap(microcycle("2026-08-11", fixtures), caps) == 4);
    // After the last fixture the days count up.
    CHECK(microcycle("2026-09-03", fixtures).label == "MD+5");
    CHECK(intensityCap(microcycle("2026-09-03", fixtures), caps) == 4);
    // No fixtures: no label and no cap.
    CHECK(microcycle("2026-08-10", {}).label.empty());
    CHECK_FALSE(intensityCap(microcycle("2026-08-10", {}), caps).has_value());
}

TEST_CASE("edited caps are used, and caps round-trip through JSON", "[fixtures][microcycle]") {
    IntensityCaps caps;
    caps.beforeMatch[0] = 1; // a coach wants MD-1 at recovery intensity
    caps.afterMatch[0] = 1;
    const std::vector<Fixture> fixtures{fx("2026-08-08"), fx("2026-08-15")};
    CHECK(intensityCap(microcycle("2026-08-14", fixtures), caps) == 1);
    CHECK(intensityCap(microcycle("2026-08-09", fixtures), caps) == 1);
    CHECK(capsToJson(IntensityCaps{}) ==
          R"({"md":0,"md_minus":[2,3,4,5],"md_plus":[2,3],"other":4})");
    const auto back = parseCaps(capsToJson(caps), "caps");
    REQUIRE(back.errors.empty());
    CHECK(back.caps == caps);
    // Keys left out keep their defaults.
    const auto partial = parseCaps(R"({"other": 3})", "caps");
    REQUIRE(partial.errors.empty());
    CHECK(partial.caps.otherDays == 3);
    CHECK(partial.caps.beforeMatch == IntensityCaps{}.beforeMatch);
    const auto bad = parseCaps(R"({"md": 6, "md_plus": [2], "weekend": 1})", "caps");
    CHECK(hasProblem(bad.errors, "", "md", "from 0 (no session) to 5"));
    CHECK(hasProblem(bad.errors, "", "md_plus", "a list of 2 caps"));
    CHECK(hasProblem(bad.errors, "", "weekend", "unknown key"));
    CHECK(bad.caps == IntensityCaps{});
}
