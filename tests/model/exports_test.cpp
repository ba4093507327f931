// CSV exports (RFC 4180, formula cells neutralised) and iCalendar files (RFC 5545): quoting,
// line ends, folding, escaping, all-day and timed entries, review due dates.

#include "calendar.h"
#include "exports.h"

#include <catch2/catch.hpp>

#include <set>
#include <sstream>

using namespace pitchloop::model;
using Catch::Matchers::Contains;

namespace {

/// Unfolds RFC 5545 content lines: a CRLF followed by a space joins the next line.
std::vector<std::string> unfolded(const std::string& ics) {
    std::vector<std::string> out;
    std::size_t at = 0;
    while (at < ics.size()) {
        const auto end = ics.find("\r\n", at);
        REQUIRE(end != std::string::npos); // every line ends in CRLF
        const std::string line = ics.substr(at, end - at);
        if (!line.empty() && line.front() == ' ')
            out.back() += line.substr(1);
        else
            out.push_back(line);
        at = end + 2;
    }
    return out;
}

std::vector<std::string> physicalLines(const std::string& ics) {
    std::vector<std::string> out;
    std::size_t at = 0;
    while (at < ics.size()) {
        const auto end = ics.find("\r\n", at);
        if (end == std::string::npos) break;
        out.push_back(ics.substr(at, end - at));
        at = end + 2;
    }
    return out;
}

} // namespace

TEST_CASE("CSV fields: RFC 4180 quoting", "[exports]") {
    CHECK(csvField("plain") == "plain");
    CHECK(csvField("") == "");
    CHECK(csvField("a,b") == "\"a,b\"");
    CHECK(csvField("say \"hi\"") == "\"say \"\"hi\"\"\"");
    CHECK(csvField("two\nlines") == "\"two\nlines\"");
    CHECK(csvField("Café 1–0") == "Café 1–0"); // UTF-8 kept byte for byte
}

TEST_CASE("CSV fields: text a spreadsheet would run as a formula is neutralised", "[exports]") {
    for (const std::string bad : {"=1+2", "+1", "-2+3", "@SUM(A1:A9)", "\tx", "\rx"}) {
        INFO(bad);
        CHECK(looksLikeFormula(bad));
        const std::string f = csvField(bad);
        CHECK(f.substr(0, 2) == "\"'"); // quoted, apostrophe first
        CHECK(f.back() == '"');
    }
    CHECK(csvField("=HYPERLINK(\"x\",\"y\")") == "\"'=HYPERLINK(\"\"x\"\",\"\"y\"\")\"");
    CHECK_FALSE(looksLikeFormula("a=b"));
    CHECK_FALSE(looksLikeFormula("KB-2026-01"));
    CHECK_FALSE(looksLikeFormula(""));
}

TEST_CASE("CSV numbers: six significant digits, NaN empty", "[exports]") {
    CHECK(csvNumber(0.5) == "0.5");
    CHECK(csvNumber(-0.25) == "-0.25"); // numbers are never neutralised
    CHECK(csvNumber(1.0 / 3.0) == "0.333333");
    CHECK(csvNumber(std::nan("")) == "");
}

TEST_CASE("tallies CSV: header, one CRLF-ended record a row", "[exports]") {
    const std::vector<TallyRow> rows{{"KB-1", "passes", 1, 2, 3, 4}, {"=cmd", "passes", 0, 0, 5, 6}};
    CHECK(talliesCsv(rows) == "match_id,metric,band,lane,num,den\r\n"
                              "KB-1,passes,1,2,3,4\r\n"
                              "\"'=cmd\",passes,0,0,5,6\r\n");
    CHECK(talliesCsv({}) == "match_id,metric,band,lane,num,den\r\n");
}

TEST_CASE("iCalendar text: escaping and folding", "[calendar]") {
    CHECK(icalText("a,b;c\\d\ne") == "a\\,b\\;c\\\\d\\ne");
    CHECK(icalText("x\r\ny") == "x\\ny");
    CHECK(icalFold("SHORT") == "SHORT\r\n");
    // 200 octets of 'é' (2 octets each): folded lines never exceed 75 octets, never split a
    // character, and unfold to the original.
    std::string line = "SUMMARY:";
    for (int i = 0; i < 100; ++i) line += "é";
    const std::string folded = icalFold(line);
    for (const auto& l : physicalLines(folded)) {
        CHECK(l.size() <= 75);
        CHECK((static_cast<unsigned char>(l.back()) & 0xC0) != 0xC0); // no lead byte left hanging
    }
    REQUIRE(unfolded(folded).size() == 1);
    CHECK(unfolded(folded).front() == line);
}

TEST_CASE("iCalendar: timed and all-day entries, one VEVENT each", "[calendar]") {
    CalendarEvent session{"s1@pitchloop", "2026-09-29", "23:30", 75, "Training, MD-4", "Line 1\nLine 2", "Training"};
    CalendarEvent review{"r1@pitchloop", "2026-12-31", "", 0, "Review focus #1", "", "Review"};
    const std::string ics = toICalendar({session, review}, "2026-12-02T09:30:05Z", "Kestrel Bay");
    const auto lines = unfolded(ics);
    CHECK(lines.front() == "BEGIN:VCALENDAR");
    CHECK(lines.back() == "END:VCALENDAR");
    auto has = [&](const std::string& l) {
        return std::find(lines.begin(), lines.end(), l) != lines.end();
    };
    CHECK(has("VERSION:2.0"));
    CHECK(has("DTSTAMP:20261202T093005Z"));
    // 23:30 + 75 min runs past midnight into the next day.
    CHECK(has("DTSTART:20260929T233000"));
    CHECK(has("DTEND:20260930T004500"));
    CHECK(has("SUMMARY:Training\\, MD-4"));
    CHECK(has("DESCRIPTION:Line 1\\nLine 2"));
    // All-day: DATE values, DTEND the next day (the year turns over).
    CHECK(has("DTSTART;VALUE=DATE:20261231"));
    CHECK(has("DTEND;VALUE=DATE:20270101"));
    CHECK(std::count(lines.begin(), lines.end(), "BEGIN:VEVENT") == 2);
    CHECK(std::count(lines.begin(), lines.end(), "END:VEVENT") == 2);
}

TEST_CASE("review due date: the set date, or the day after the N-th fixture", "[calendar]") {
    Focus f;
    f.startDate = "2026-09-27";
    f.reviewAfterMatches = 2;
    std::vector<Fixture> fixtures;
    for (const char* d : {"2026-09-26", "2026-10-03", "2026-10-07", "2026-10-10"})
        fixtures.push_back(Fixture{d, "15:00", "Harbour Rovers", "home", "", ""});
    CHECK(reviewDueDate(f, fixtures) == "2026-10-08"); // 2nd fixture from the start: 10-07
    f.reviewAfterMatches = 4;
    CHECK_FALSE(reviewDueDate(f, fixtures).has_value()); // the schedule stops short
    f.reviewOn = "2026-11-01";
    CHECK(reviewDueDate(f, fixtures) == "2026-11-01");
}

TEST_CASE("session and review entries: stable unique UIDs, caution in the session", "[calendar]") {
    SavedSession s;
    s.squad = "First team";
    s.date = "2026-09-29";
    s.minutes = 80;
    s.players = 18;
    s.dayLabel = "MD-4";
    s.cap = 4;
    s.blocks = {SavedBlock{BlockRole::WarmUp, 3, 15, std::nullopt, false, ""},
                SavedBlock{BlockRole::Main, 6, 50, 1, false, ""}};
    const auto e = sessionEvent(s, {"Rondo", "Overload the flank"}, "10:30", "Kestrel Bay FC");
    CHECK(e.uid == "session-2026-09-29-first-team-kestrel-bay-fc@pitchloop");
    CHECK(e.minutes == 80);
    CHECK_THAT(e.description, Contains("50 min  main  Overload the flank"));
    CHECK_THAT(e.description, Contains("qualified staff"));
    Focus f;
    f.id = 7;
    f.squad = "First team";
    const auto r = reviewEvent(f, "2026-10-08", "Pre-shot passes against", "Kestrel Bay FC");
    CHECK(r.uid == "review-focus-7-first-team-kestrel-bay-fc@pitchloop");
    CHECK(r.uid != e.uid);
    CHECK(uidSlug("  ") == "club");
}
