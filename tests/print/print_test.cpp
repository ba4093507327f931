// The printed sheets (app/print): the data they show, taken from model/ on a small club built
// here by hand, the one-page promise of the session sheet, and bad input, which writes nothing.
//
// The club: three matches a week apart (M1–M3 on Saturdays 2026-08-08/15/22), each with 40 of
// our passes from each of three zones; arrived of 40: band 1 lane 1: 10, band 6 lane 5: 20,
// band 3 lane 3: 36. Targets "pass completion ≥ 80 %" in those zones (min sample 30). Over the
// judged window (last 5, so all three matches): 30/120 = 25 %, 60/120 = 50 % and 108/120 =
// 90 %, so the first two slip and the third does not.

#include "drills.h"
#include "fixtures.h"
#include "focus.h"
#include "pdfdocument.h"
#include "planner.h"
#include "printing.h"
#include "repository.h"
#include "sessions.h"
#include "sheetdata.h"
#include "sheetformat.h"
#include "sheets.h"
#include "testutil.h"

#include <QGuiApplication>
#include <QPdfWriter>
#include <catch2/catch.hpp>
#include <filesystem>
#include <fstream>
#include <sstream>

using namespace pitchloop::model;
using namespace pitchloop::print;
using namespace pitchloop::testutil;
using Catch::Matchers::Contains;
namespace fs = std::filesystem;

namespace {

const std::string kSquad = "First team";
const std::string kNow = "2026-08-01T09:00:00Z";
const std::string kSessionDate = "2026-08-25"; // Tuesday: MD-4 before the 29th, cap 5

Match matchOn(const std::string& id, const std::string& date) {
    std::vector<Event> events;
    double t = 1;
    auto passes = [&](double x, double y, int ok) {
        for (int i = 0; i < 40; ++i, t += 5)
            events.push_back(
                ev(Side::Us, EventType::Pass, i < ok ? Result::Ok : Result::Fail, t, x, y));
    };
    passes(5, 5, 10);    // band 1, lane 1
    passes(100, 60, 20); // band 6, lane 5
    passes(45, 34, 36);  // band 3, lane 3
    Match m = makeMatch(std::move(events));
    m.info.id = id;
    m.info.date = date;
    m.info.goalsUs = 1;
    m.info.goalsOpp = 2;
    return m;
}

Target completionTarget(int band, int lane) {
    Target t;
    t.key = {kSquad, "2026-27", "pass_completion", band, lane};
    t.direction = Direction::AtLeast;
    t.value = 0.8;
    t.watchMargin = 0.05;
    t.minSample = 30;
    t.author = "R. Tamsin";
    t.effectiveFrom = "2026-07-01";
    t.recordedAt = "2026-07-01T08:00:00Z";
    return t;
}

Drill drill(const std::string& title, int minutes, int intensity, std::vector<std::string> metrics,
            std::vector<Zone> zones, std::vector<std::string> tags) {
    Drill d;
    d.title = title;
    d.purpose = "Invented for the print tests.";
    d.organisation = "A 30 × 20 m area, two teams of six and two neutral players. Play starts "
                     "from the coach; three passes in a row earn a point.";
    d.coachingPoints = {"Open your body before the ball arrives", "Play forward when you can"};
    d.durationMin = minutes;
    d.intensity = intensity;
    d.playersMin = 6;
    d.playersMax = 22;
    d.metrics = std::move(metrics);
    d.zones = std::move(zones);
    d.tags = std::move(tags);
    d.author = "R. Tamsin";
    return d;
}

/// A fresh temporary folder, removed with everything in it at the end of the test.
struct ScratchDir {
    fs::path path;
    explicit ScratchDir(const std::string& name) : path(freshTempDir(name)) {}
    ~ScratchDir() {
        std::error_code ignored;
        fs::remove_all(path, ignored);
    }
    ScratchDir(const ScratchDir&) = delete;
    ScratchDir& operator=(const ScratchDir&) = delete;
};

/// The small club of the file comment, with a saved session on kSessionDate.
struct SmallClub {
    ScratchDir scratch{"print"}; // first member: removed after the club file is closed
    fs::path dir = scratch.path;
    std::string file = (dir / "club.sqlite").string();
    ClubRepository repo{file};
    std::int64_t warm = 0, cool = 0, build = 0, focusId = 0;
    Plan plan;

    SmallClub() {
        repo.storeMatch(matchOn("M1", "2026-08-08"), {"m1.json", "1", kNow}, kSquad, false);
        repo.storeMatch(matchOn("M2", "2026-08-15"), {"m2.json", "2", kNow}, kSquad, false);
        repo.storeMatch(matchOn("M3", "2026-08-22"), {"m3.json", "3", kNow}, kSquad, false);
        repo.addTargets({completionTarget(1, 1), completionTarget(6, 5), completionTarget(3, 3)},
                        kNow);

        DrillBook book(repo);
        auto add = [&](const Drill& d) {
            const DrillChange c = book.add(d, "R. Tamsin", kNow);
            INFO(describeAll(c.problems));
            REQUIRE(c.ok());
            return c.id;
        };
        warm = add(drill("Rondo warm-up", 10, 2, {}, {}, {"warm_up"}));
        cool = add(drill("Walk and stretch", 10, 1, {}, {}, {"cool_down"}));
        build =
            add(drill("Build-up past the first line", 20, 4, {"pass_completion"}, {{1, 1}}, {}));

        Focus f;
        f.squad = kSquad;
        f.season = "2026-27";
        f.metric = "pass_completion";
        f.zones = {{1, 1}};
        f.openedAfterMatch = "M3";
        f.startDate = "2026-08-23";
        f.evidence = "{}";
        f.openedBy = "R. Tamsin";
        focusId = FocusStore(repo).open(f, kNow);

        FixtureStore fixtures(repo);
        std::vector<Fixture> list;
        for (const char* date : {"2026-08-08", "2026-08-15", "2026-08-22", "2026-08-29"})
            list.push_back(Fixture{date, "15:00", "Test Opponents", "home", "League", ""});
        REQUIRE(fixtures.importFixtures(kSquad, list).errors.empty());

        PlanRequest r;
        r.date = kSessionDate;
        r.season = "2026-27";
        r.minutes = 45;
        r.playersAvailable = 16;
        r.fixtures = fixtures.list(kSquad, "2026-27");
        r.caps = fixtures.caps();
        PlanFocus pf;
        pf.id = focusId;
        pf.metric = "pass_completion";
        pf.zones = {{1, 1}};
        pf.band = 1;
        pf.lane = 1;
        pf.severity = 0.6;
        r.focuses = {pf};
        r.drills = book.list();
        const PlanResult result = planSession(r);
        INFO(result.problem);
        REQUIRE(result.plan);
        plan = *result.plan;
        SessionStore(repo).save(kSquad, plan, "R. Tamsin", kNow);
    }
};

bool startsWithPdf(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    std::string head(5, '\0');
    in.read(head.data(), 5);
    return head == "%PDF-";
}

/// The files of a folder by name, the club file (with its WAL files) left out.
std::vector<std::string> entries(const fs::path& dir) {
    std::vector<std::string> out;
    for (const auto& e : fs::directory_iterator(dir))
        if (e.path().filename().string().rfind("club.sqlite", 0) != 0)
            out.push_back(e.path().filename().string());
    std::sort(out.begin(), out.end());
    return out;
}

} // namespace

TEST_CASE("the session sheet's data is the saved session with its drills and focuses",
          "[print][session]") {
    SmallClub club;
    const auto built = sessionSheetData(club.repo, kSquad, kSessionDate);
    INFO(built.problem);
    REQUIRE(built.data);
    const SessionSheetData& d = *built.data;
    CHECK(d.club == "Kestrel Bay"); // the name the first match gave (testutil makeMatch)
    CHECK(d.squad == kSquad);
    CHECK(d.date == kSessionDate);
    CHECK(longDate(d.date, d.dayNumber) == "Tuesday 25 August 2026");
    CHECK(d.dayLabel == "MD-4"); // four days before the fixture of the 29th
    CHECK(d.cap == 5);           // the default cap of MD-4
    CHECK(d.minutes == 45);
    CHECK(d.players == 16);
    CHECK(d.caution == std::string(kPlanCaution));

    // Blocks in the plan's order: warm-up first, cool-down last, each with its drill's notes.
    REQUIRE(d.blocks.size() == club.plan.blocks.size());
    REQUIRE(d.blocks.size() >= 3);
    int sum = 0;
    for (std::size_t i = 0; i < d.blocks.size(); ++i) {
        CHECK(d.blocks[i].drillId == club.plan.blocks[i].drillId);
        CHECK(d.blocks[i].minutes == club.plan.blocks[i].minutes);
        CHECK(d.blocks[i].role == club.plan.blocks[i].role);
        sum += d.blocks[i].minutes;
    }
    CHECK(d.minutesInBlocks == sum);
    CHECK(d.minutesInBlocks == club.plan.minutesUsed);
    CHECK(d.blocks.front().role == BlockRole::WarmUp);
    CHECK(d.blocks.front().title == "Rondo warm-up");
    CHECK(d.blocks.front().minutes == 10);
    CHECK(d.blocks.front().intensity == 2);
    CHECK(d.blocks.back().role == BlockRole::CoolDown);
    CHECK(d.blocks.back().title == "Walk and stretch");
    const auto main = std::find_if(d.blocks.begin(), d.blocks.end(),
                                   [&](const SheetBlock& b) { return b.drillId == club.build; });
    REQUIRE(main != d.blocks.end());
    CHECK(main->role == BlockRole::Main);
    CHECK(main->title == "Build-up past the first line");
    CHECK(main->minutes == 20);
    CHECK(main->intensity == 4);
    CHECK(main->focusId == club.focusId);
    CHECK_THAT(main->organisation, Contains("two neutral players"));
    CHECK(main->coachingPoints.size() == 2);

    // The focus: 20 minutes of the build-up drill work on it (its zone and metric).
    REQUIRE(d.focuses.size() == 1);
    CHECK(d.focuses[0].id == club.focusId);
    CHECK(d.focuses[0].label == "F1");
    CHECK(d.focuses[0].metric == "pass_completion");
    CHECK(d.focuses[0].metricName == "Pass completion");
    CHECK(d.focuses[0].minutes == 20);
    CHECK(d.focuses[0].zones == std::vector<Zone>{{1, 1}});
    CHECK(d.focusesNotMet.empty());
}

TEST_CASE("the debrief's data lists the slipped targets in the model's order", "[print][debrief]") {
    SmallClub club;
    const auto built = debriefSheetData(club.repo, "M3");
    INFO(built.problem);
    REQUIRE(built.data);
    const DebriefSheetData& d = *built.data;
    CHECK(d.matchId == "M3");
    CHECK(d.date == "2026-08-22");
    CHECK(d.opponent == "Test Opponents");
    CHECK(scoreText(d.goalsUs, d.goalsOpp) == "1–2 L");
    CHECK(d.matchNumber == 3);
    CHECK(d.seasonMatches == 3);
    CHECK(d.previousMatchId == "M2");
    CHECK(d.hasTargets);
    CHECK(d.windowFirstMatch == "M1"); // last5 reaches back to the first of three

    // The same list, in the same order, as the model's own debrief.
    const auto tallies = club.repo.seasonTallies(kSquad, "2026-27");
    const Debrief model =
        buildDebrief(tallies, 2, club.repo.metrics(), club.repo.targets(kSquad, "2026-27"),
                     club.repo.tallyGrid(), club.repo.flagSettings());
    REQUIRE(d.slippedInWindow.size() == model.slippedInWindow.size());
    for (std::size_t i = 0; i < d.slippedInWindow.size(); ++i) {
        CHECK(d.slippedInWindow[i].band == model.slippedInWindow[i].now.band);
        CHECK(d.slippedInWindow[i].lane == model.slippedInWindow[i].now.lane);
        CHECK(d.slippedInWindow[i].pMiss == model.slippedInWindow[i].now.pMiss);
    }
    // Two zones slipped: 30/120 and 60/120 against ≥ 80 % (the file comment); the one at 25 %
    // is the more certain, so it comes first. 108/120 = 90 % is on target.
    REQUIRE(d.slippedInWindow.size() == 2);
    CHECK(d.slippedInWindow[0].band == 1);
    CHECK(d.slippedInWindow[0].lane == 1);
    CHECK(d.slippedInWindow[0].value == Approx(0.25));
    CHECK(d.slippedInWindow[0].sample == 120);
    CHECK(d.slippedInWindow[0].matches == 3);
    CHECK(d.slippedInWindow[0].target == 0.8);
    CHECK(d.slippedInWindow[0].direction == Direction::AtLeast);
    CHECK(d.slippedInWindow[0].low < 0.25);
    CHECK(d.slippedInWindow[0].high > 0.25);
    CHECK(d.slippedInWindow[0].metricName == "Pass completion");
    CHECK(d.slippedInWindow[1].band == 6);
    CHECK(d.slippedInWindow[1].lane == 5);
    CHECK(d.slippedInWindow[1].value == Approx(0.5));
    CHECK(d.slippedInWindow[0].pMiss >= d.slippedInWindow[1].pMiss);
    CHECK(d.slippedInWindow[1].pMiss >= 0.999);
    // Both were already off target after M2: neither is new.
    CHECK_FALSE(d.slippedInWindow[0].isNew);
    CHECK(d.slippedInWindow[0].before == FlagState::OffTarget);
    // In M3 alone: 10/40 and 20/40 slip too.
    REQUIRE(d.slippedInMatch.size() == 2);
    CHECK(d.slippedInMatch[0].sample == 40);
    CHECK(d.judged == 3);
}

TEST_CASE("a match with nothing slipped, and a season without targets, say so",
          "[print][debrief]") {
    const ScratchDir scratch("print-quiet");
    const fs::path dir = scratch.path;
    ClubRepository repo((dir / "club.sqlite").string());
    repo.storeMatch(matchOn("M1", "2026-08-08"), {"m1.json", "1", kNow}, kSquad, false);
    auto built = debriefSheetData(repo, "M1");
    REQUIRE(built.data);
    CHECK_FALSE(built.data->hasTargets);
    CHECK(built.data->slippedInWindow.empty());

    Target easy = completionTarget(3, 3); // 36 of 40 against ≥ 80 %: on target
    repo.addTargets({easy}, kNow);
    built = debriefSheetData(repo, "M1");
    REQUIRE(built.data);
    CHECK(built.data->hasTargets);
    CHECK(built.data->slippedInWindow.empty());
    CHECK(built.data->slippedInMatch.empty());

    std::ostringstream err;
    const fs::path pdf = dir / "quiet.pdf";
    CHECK(exportDebrief(repo, "M1", pdf.string(), err) == 0);
    CHECK(startsWithPdf(pdf));
}

TEST_CASE("both PDFs are written, without and with the caller's GUI application", "[print][pdf]") {
    SmallClub club;
    std::ostringstream err;
    REQUIRE(QGuiApplication::instance() == nullptr);
    const fs::path sheet = club.dir / "sheet.pdf";
    CHECK(exportSessionSheet(club.repo, kSquad, kSessionDate, sheet.string(), err) == 0);
    CHECK(startsWithPdf(sheet));
    CHECK(QGuiApplication::instance() == nullptr); // the one made for the call is gone
    const fs::path debrief = club.dir / "debrief.pdf";
    CHECK(exportDebrief(club.repo, "M3", debrief.string(), err) == 0);
    CHECK(startsWithPdf(debrief));
    INFO(err.str());
    CHECK_THAT(err.str(), Contains("sheet.pdf (1 page)"));
    CHECK(entries(club.dir) == std::vector<std::string>{"debrief.pdf", "sheet.pdf"});

    // With an application of the caller's, that one is used and left alone.
    static int argc = 3;
    static char a0[] = "print_tests", a1[] = "-platform", a2[] = "offscreen";
    static char* argv[] = {a0, a1, a2, nullptr};
    {
        QGuiApplication app(argc, argv);
        const fs::path again = club.dir / "sheet-again.pdf";
        CHECK(exportSessionSheet(club.repo, kSquad, kSessionDate, again.string(), err) == 0);
        CHECK(QGuiApplication::instance() == &app);
        CHECK(startsWithPdf(again));
        CHECK(fs::file_size(again) > 0);
    }
}

TEST_CASE("the session sheet keeps every drill text whole: long notes shrink the type a little, "
          "then run onto a second page",
          "[print][pdf][session]") {
    SmallClub club;
    auto built = sessionSheetData(club.repo, kSquad, kSessionDate);
    REQUIRE(built.data);
    const GuiScope gui;
    auto draw = [&](const SessionSheetData& d, const std::string& name) {
        PdfFile file((club.dir / name).string());
        std::string problem;
        REQUIRE(file.open(problem));
        const DrawReport r = drawSessionSheet(d, file.writer());
        REQUIRE(file.commit(problem));
        return r;
    };
    const DrawReport plain = draw(*built.data, "plain.pdf");
    CHECK(plain.ok);
    CHECK(plain.pages == 1);
    CHECK(plain.fontScale == 1.0);
    CHECK(plain.elidedTexts == 0);
    CHECK(plain.blocksLeftOut == 0);

    // Six blocks with two thousand characters of organisation and eight long points each.
    SessionSheetData heavy = *built.data;
    std::string longText;
    while (longText.size() < 2000)
        longText += "Players rotate through the three stations on the whistle. ";
    SheetBlock b = heavy.blocks.front();
    b.organisation = longText;
    b.coachingPoints.assign(8, "Keep the distances between the lines short, talk early and loudly, "
                               "and reset the shape as soon as the ball goes dead");
    heavy.blocks.assign(6, b);
    const DrawReport continued = draw(heavy, "heavy.pdf");
    CHECK(continued.pages >= 2);
    CHECK(continued.fontScale >= 0.95); // readable on the pitch, not squeezed
    CHECK(continued.elidedTexts == 0);  // nothing cut: no "…", no "+ more coaching points"
    CHECK(continued.blocksLeftOut == 0);
    // A page count the reader can trust: the PDF has as many pages as the report says.
    std::ifstream in(club.dir / "heavy.pdf", std::ios::binary);
    const std::string bytes((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
    std::size_t pages = 0;
    for (std::size_t at = bytes.find("/Type /Page"); at != std::string::npos; at = bytes.find("/Type /Page", at + 1))
        pages += bytes.compare(at, 12, "/Type /Pages") != 0;
    CHECK(pages == static_cast<std::size_t>(continued.pages));
}

TEST_CASE("a debrief with many slipped targets runs over several pages", "[print][pdf][debrief]") {
    SmallClub club;
    auto built = debriefSheetData(club.repo, "M3");
    REQUIRE(built.data);
    const GuiScope gui;
    auto draw = [&](const DebriefSheetData& d, const std::string& name) {
        PdfFile file((club.dir / name).string());
        std::string problem;
        REQUIRE(file.open(problem));
        const DrawReport r = drawDebriefSheet(d, file.writer());
        REQUIRE(file.commit(problem));
        return r;
    };
    const DrawReport plain = draw(*built.data, "debrief.pdf");
    CHECK(plain.ok);
    CHECK(plain.pages == 1); // two cards over the window, two in the match, a short table

    // Twelve slips over the window (a new one, a whole-pitch count among them) and six in the
    // match: at most three rows of two cards fit a page, so at least four pages.
    DebriefSheetData many = *built.data;
    DebriefMark whole = many.slippedInWindow.front();
    whole.band = whole.lane = 0;
    whole.metric = "pre_shot_passes_against";
    whole.metricName = "Their passes before their shots";
    whole.kind = MetricKind::Count;
    whole.direction = Direction::AtMost;
    whole.value = 36.8;
    whole.target = 30;
    whole.isNew = true;
    std::vector<DebriefMark> window;
    for (int i = 0; i < 11; ++i) {
        DebriefMark m = many.slippedInWindow[static_cast<std::size_t>(i) % 2];
        m.band = 1 + i % 6;
        m.lane = 1 + i % 5;
        window.push_back(m);
    }
    window.insert(window.begin() + 1, whole);
    many.slippedInWindow = window;
    many.slippedInMatch = std::vector<DebriefMark>(window.begin(), window.begin() + 6);
    const DrawReport long_ = draw(many, "debrief-many.pdf");
    CHECK(long_.ok);
    CHECK(long_.pages >= 4);
    CHECK(long_.pages <= 6);
}

TEST_CASE("bad input writes nothing and says what was wrong", "[print][badinput]") {
    SmallClub club;
    const fs::path out = club.dir / "out";
    fs::create_directories(out);

    SECTION("no saved session on that date") {
        std::ostringstream err;
        CHECK(exportSessionSheet(club.repo, kSquad, "2026-08-26", (out / "s.pdf").string(), err) ==
              2);
        CHECK_THAT(err.str(), Contains("no saved session of First team on 2026-08-26"));
        CHECK_THAT(err.str(), Contains("s.pdf not written"));
        CHECK(entries(out).empty());
    }
    SECTION("another squad has no session that day") {
        std::ostringstream err;
        CHECK(exportSessionSheet(club.repo, "Under-18", kSessionDate, (out / "s.pdf").string(),
                                 err) == 2);
        CHECK_THAT(err.str(), Contains("Under-18"));
        CHECK(entries(out).empty());
    }
    SECTION("not a date") {
        std::ostringstream err;
        CHECK(exportSessionSheet(club.repo, kSquad, "2026-02-30", (out / "s.pdf").string(), err) ==
              2);
        CHECK_THAT(err.str(), Contains("'2026-02-30' is not a date"));
        CHECK(entries(out).empty());
    }
    SECTION("unknown match") {
        std::ostringstream err;
        CHECK(exportDebrief(club.repo, "M9", (out / "d.pdf").string(), err) == 2);
        CHECK_THAT(err.str(), Contains("no match 'M9'"));
        CHECK(entries(out).empty());
    }
    SECTION("a folder that does not exist") {
        std::ostringstream err;
        const fs::path missing = out / "no-such-folder" / "d.pdf";
        CHECK(exportDebrief(club.repo, "M3", missing.string(), err) == 2);
        CHECK_THAT(err.str(), Contains(missing.string()));
        CHECK_THAT(err.str(), Contains("does not exist"));
        CHECK_FALSE(fs::exists(missing.parent_path()));
        CHECK(entries(out).empty());
    }
    SECTION("a path that is a folder") {
        std::ostringstream err;
        CHECK(exportSessionSheet(club.repo, kSquad, kSessionDate, out.string(), err) == 2);
        CHECK_THAT(err.str(), Contains("is a folder"));
        CHECK(entries(out).empty());
    }
    SECTION("an earlier file is kept when an export fails and replaced when one succeeds") {
        const fs::path pdf = out / "s.pdf";
        std::ofstream(pdf) << "earlier";
        std::ostringstream err;
        CHECK(exportSessionSheet(club.repo, kSquad, "2026-08-26", pdf.string(), err) == 2);
        CHECK(entries(out) == std::vector<std::string>{"s.pdf"});
        std::ifstream in(pdf);
        std::string text((std::istreambuf_iterator<char>(in)), std::istreambuf_iterator<char>());
        CHECK(text == "earlier");
        CHECK(exportSessionSheet(club.repo, kSquad, kSessionDate, pdf.string(), err) == 0);
        CHECK(startsWithPdf(pdf));
        CHECK(entries(out) == std::vector<std::string>{"s.pdf"}); // no temporary file left
    }
}

TEST_CASE("sheet wording: dates, values, P(miss)", "[print][format]") {
    CHECK(longDate("2026-09-26", *dayNumber("2026-09-26")) == "Saturday 26 September 2026");
    CHECK(longDate("2027-01-01", *dayNumber("2027-01-01")) == "Friday 1 January 2027");
    // The vocabulary and number format of model/wording.h, as on the screens.
    CHECK(valueText(MetricKind::Rate, 0.4567) == "45.7%");
    CHECK(valueText(MetricKind::Count, 2.4) == "2.4");
    CHECK(targetText(Direction::AtMost, MetricKind::Count, 2) == "≤ 2");
    CHECK(probabilityText(0.99996) == "> 0.999");
    CHECK(probabilityText(0.9984) == "0.998");
    CHECK(zoneText(0, 0, ZoneGrid{}) == "whole pitch");
    CHECK(zoneText(2, 5, ZoneGrid{}) == "our left-back area (B2·L5)");
    CHECK(windowText(Window{Window::Kind::LastN, 5, 0.3}) == "the last 5 matches");
    CHECK(shortNumber(0.999) == "0.999");
    CHECK(shortNumber(90.0, 1) == "90");
}
