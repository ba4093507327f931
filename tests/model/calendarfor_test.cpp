// model::calendarFor: the calendar file the command line and the desktop app write for a
// squad's dates — saved sessions as timed entries, open focuses' review dates as all-day
// entries, focuses whose review the schedule does not reach yet named in notes.

#include "calendar.h"
#include "drills.h"
#include "focus.h"
#include "repository.h"
#include "sessions.h"
#include "testutil.h"

#include <catch2/catch.hpp>

using namespace pitchloop::model;
using namespace pitchloop::testutil;
using Catch::Matchers::Contains;

namespace {

const std::string kSquad = "First team";
const std::string kNow = "2026-08-01T09:00:00Z";

Drill drill(const std::string& title, int minutes, int intensity, std::vector<std::string> tags,
            std::vector<std::string> metrics = {}) {
    Drill d;
    d.title = title;
    d.durationMin = minutes;
    d.intensity = intensity;
    d.playersMin = 6;
    d.playersMax = 22;
    d.tags = std::move(tags);
    d.metrics = std::move(metrics);
    d.author = "R. Tamsin";
    return d;
}

std::size_t count(const std::string& text, const std::string& what) {
    std::size_t n = 0;
    for (auto at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
    return n;
}

} // namespace

TEST_CASE("calendarFor: the dates' saved sessions and the review dates that fall in them",
          "[calendar]") {
    const auto dir = freshTempDir("calendar-for");
    ClubRepository repo((dir / "club.sqlite").string());
    repo.ensureSeason(kSquad, "2026-27");
    DrillBook book(repo);
    for (const auto& d : {drill("Rondo warm-up", 10, 2, {"warm_up"}),
                          drill("Walk and stretch", 10, 1, {"cool_down"}),
                          drill("Press the first pass", 20, 4, {}, {"press_rate"})})
        REQUIRE(book.add(d, "R. Tamsin", kNow).ok());
    FixtureStore fixtures(repo);
    REQUIRE(fixtures
                .importFixtures(kSquad, {{"2026-08-08", "15:00", "Harbour Rovers", "home", "", ""},
                                         {"2026-08-15", "15:00", "Quarry Town", "away", "", ""}})
                .errors.empty());

    // Two open focuses: one reviewed after one match (due the day after 2026-08-15), one after
    // five, which the two fixtures do not reach.
    FocusStore focuses(repo);
    Focus f;
    f.squad = kSquad;
    f.season = "2026-27";
    f.metric = "press_rate";
    f.zones = {{4, 3}};
    f.openedAfterMatch = "KB-2026-01";
    f.startDate = "2026-08-09";
    f.reviewAfterMatches = 1;
    f.evidence = "{}";
    f.openedBy = "R. Tamsin";
    const auto due = focuses.open(f, kNow);
    f.reviewAfterMatches = 5;
    const auto notDue = focuses.open(f, kNow);

    PlanRequest r;
    r.date = "2026-08-11";
    r.season = "2026-27";
    r.minutes = 40;
    r.playersAvailable = 16;
    r.fixtures = fixtures.list(kSquad, "2026-27");
    r.caps = fixtures.caps();
    r.drills = book.list();
    const PlanResult plan = planSession(r);
    REQUIRE(plan.plan);
    SessionStore(repo).save(kSquad, *plan.plan, "R. Tamsin", kNow);

    const SquadCalendar all = calendarFor(repo, kSquad, "", "", "18:15", "2026-08-10T08:00:00Z");
    CHECK(all.sessions == 1);
    CHECK(all.reviews == 1);
    CHECK_FALSE(all.empty());
    REQUIRE(all.notes.size() == 1);
    CHECK_THAT(all.notes[0], Contains("focus " + std::to_string(notDue)));
    CHECK(count(all.text, "BEGIN:VEVENT") == 2);
    CHECK_THAT(all.text, Contains("DTSTART:20260811T181500\r\n"));
    CHECK_THAT(all.text, Contains("DTEND:20260811T185500\r\n")); // 18:15 + the session's 40 minutes
    CHECK_THAT(all.text, Contains("DTSTART;VALUE=DATE:20260816\r\n"));
    CHECK_THAT(all.text, Contains("UID:review-focus-" + std::to_string(due) + "-"));
    CHECK_THAT(all.text, Contains("DTSTAMP:20260810T080000Z"));
    CHECK_THAT(all.text, Contains("X-WR-CALNAME:Pitchloop First team"));

    // Dates: only what falls in them; another squad has nothing.
    const SquadCalendar week = calendarFor(repo, kSquad, "2026-08-10", "2026-08-14", "10:30", kNow);
    CHECK(week.sessions == 1);
    CHECK(week.reviews == 0);
    const SquadCalendar later = calendarFor(repo, kSquad, "2026-08-12", "2026-08-20", "10:30", kNow);
    CHECK(later.sessions == 0);
    CHECK(later.reviews == 1);
    const SquadCalendar other = calendarFor(repo, "Under-18", "", "", "10:30", kNow);
    CHECK(other.empty());
    CHECK(count(other.text, "BEGIN:VEVENT") == 0);
    CHECK_THAT(other.text, Contains("BEGIN:VCALENDAR"));
}
