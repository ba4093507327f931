// Tests of the week planner page's controller: the week's microcycle labels and caps against
// model::microcycle and model::intensityCap; the proposed session (run off the window's thread)
// against model::planSession on the same request, also after the coach pins, leaves out and
// swaps drills; the planner's problems shown in plain words; a save read back through
// model::SessionStore; the calendar file read back (unfolded, DTSTART/DTEND, one UID an entry);
// the session sheet. Every list model runs under QAbstractItemModelTester.
//
// The club: the demo season's first nine matches, targets, drills, fixtures and the story's
// focus (tests/desktop/plannerclub.h); "today" is Tue 29 Sep 2026 ($PITCHLOOP_TODAY), MD-4
// before the match of Sat 3 Oct (sample-club/fixtures.csv).

#include "modelcheck.h"
#include "appclock.h"
#include "calendar.h"
#include "clubsession.h"
#include "planblockmodel.h"
#include "plandrillchoicemodel.h"
#include "planfocusmodel.h"
#include "planinput.h"
#include "plannerview.h"
#include "planweekmodel.h"
#include "plannerclub.h"
#include "uicheck.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QDate>
#include <QDir>
#include <QFile>
#include <QGuiApplication>
#include <QLocale>
#include <QQmlEngine>
#include <QQuickItem>
#include <QQuickStyle>
#include <QQuickView>
#include <QSet>
#include <QSettings>
#include <QTime>
#include <QUrl>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::watch;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);
const std::string kSquad = "First team";
constexpr int kPlanTimeoutMs = 30000;

/// The calendar text with its folded lines joined again (RFC 5545 §3.1), one line an entry.
QStringList unfold(const QByteArray& bytes) {
    QString text = QString::fromUtf8(bytes);
    text.replace(QStringLiteral("\r\n "), QString());
    return text.split(QStringLiteral("\r\n"), Qt::SkipEmptyParts);
}

} // namespace

class PlannerViewTest : public QObject {
    Q_OBJECT

private slots:
    void initTestCase();
    void weekFollowsTheMicrocycle();
    void weekNavigation();
    void proposalEqualsTheModelsPlan();
    void coachChangesPlanAgain();
    void problemsInPlainWords();
    void saveWritesASession();
    void calendarReadsBack();
    void sessionSheet();
    void pageShowsTheProposal();
    void emptyClub();
    void fixturesEnteredInTheApp();

private:
    /// Proposes and waits for the worker; the blocks shown must then be the plan's.
    void proposeAndWait(PlannerView& view, const QString& minutes, const QString& players);
    /// Checks the view's blocks and focus minutes against planSession(`request`).
    void checkAgainstModel(PlannerView& view, const model::PlanRequest& request);

    QTemporaryDir m_dir;
    QString m_file;
    std::unique_ptr<model::ClubRepository> m_reference; ///< the same file, read independently
    ClubSession m_session;
};

void PlannerViewTest::initTestCase() {
    qputenv("PITCHLOOP_TODAY", "2026-09-29");
    QVERIFY(m_dir.isValid());
    // The page keeps "saved by" and the start time in QSettings: here, away from the user's.
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope, m_dir.filePath(QStringLiteral("settings")));
    m_file = m_dir.filePath(QStringLiteral("club.sqlite"));
    plannertest::prepareClub(kSource, m_file, 9);
    QVERIFY(m_session.open(m_file));
    m_reference = std::make_unique<model::ClubRepository>(m_file.toStdString());
}

void PlannerViewTest::proposeAndWait(PlannerView& view, const QString& minutes, const QString& players) {
    QSignalSpy busy(&view, &PlannerView::busyChanged);
    QVERIFY(view.propose(minutes, players));
    QVERIFY(view.busy()); // the planner runs on a worker; the window's thread goes on
    QTRY_VERIFY_WITH_TIMEOUT(!view.busy(), kPlanTimeoutMs);
    QCOMPARE(busy.count(), 2);
}

void PlannerViewTest::checkAgainstModel(PlannerView& view, const model::PlanRequest& request) {
    const model::PlanResult expected = model::planSession(request);
    QVERIFY2(expected.plan, expected.problem.c_str());
    QVERIFY2(view.hasPlan(), qPrintable(view.problem()));
    QVERIFY(view.problem().isEmpty());
    const auto& rows = view.blocks()->rows();
    QCOMPARE(rows.size(), expected.plan->blocks.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        const model::PlanBlock& b = expected.plan->blocks[i];
        QCOMPARE(rows[i].drillId, b.drillId);
        QCOMPARE(rows[i].title, QString::fromStdString(b.title));
        QCOMPARE(rows[i].minutes, b.minutes);
        QCOMPARE(rows[i].intensity, b.intensity);
        QCOMPARE(rows[i].pinned, b.pinned);
        QCOMPARE(rows[i].why, QString::fromStdString(b.why));
        QCOMPARE(rows[i].main, b.role == model::BlockRole::Main);
    }
    QCOMPARE(rows.front().role, QStringLiteral("Warm-up"));
    QCOMPARE(rows.back().role, QStringLiteral("Cool-down"));
    const auto& focuses = view.focusMinutes()->rows();
    QCOMPARE(focuses.size(), expected.plan->focusMinutes.size());
    // Most severe first, as the model ranks them (watched zones have no focus id, so rows are
    // compared in order).
    std::vector<model::FocusMinutes> ranked = expected.plan->focusMinutes;
    std::stable_sort(ranked.begin(), ranked.end(), [&](const auto& a, const auto& b) {
        return request.focuses[a.focus].severity > request.focuses[b.focus].severity;
    });
    for (std::size_t i = 0; i < ranked.size(); ++i) {
        QCOMPARE(focuses[i].focusId, ranked[i].focusId);
        QCOMPARE(focuses[i].minutes, ranked[i].minutes);
    }
    QVERIFY(view.planSummary().contains(QString::number(expected.plan->minutesUsed)));
    QCOMPARE(view.caution(), QString::fromUtf8(model::kPlanCaution.data(),
                                               static_cast<qsizetype>(model::kPlanCaution.size())));
}

void PlannerViewTest::weekFollowsTheMicrocycle() {
    PlannerView view;
    const auto days = watch(view.days());
    const auto choices = watch(view.drillChoices());
    view.setSession(&m_session);
    QVERIFY2(view.errorString().isEmpty(), qPrintable(view.errorString()));
    QCOMPARE(view.squad(), QString::fromStdString(kSquad));
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-09-29")); // $PITCHLOOP_TODAY
    QVERIFY(view.weekNote().isEmpty());

    model::FixtureStore fixtures(*m_reference);
    const auto schedule = fixtures.list(kSquad, "2026-27");
    const auto caps = fixtures.caps();
    const auto& rows = view.days()->rows();
    QCOMPARE(rows.size(), std::size_t{7});
    QCOMPARE(rows.front().date, QStringLiteral("2026-09-28")); // the Monday
    QCOMPARE(rows.front().weekday, QLocale().toString(QDate(2026, 9, 28), QStringLiteral("ddd")));
    for (const PlanWeekDay& row : rows) {
        const auto day = model::microcycle(row.date.toStdString(), schedule);
        QCOMPARE(row.label, QString::fromStdString(day.label));
        QCOMPARE(row.cap, model::intensityCap(day, caps).value_or(-1));
        QCOMPARE(row.congested, day.congested);
        QCOMPARE(row.selected, row.date == QStringLiteral("2026-09-29"));
        QCOMPARE(row.today, row.date == QStringLiteral("2026-09-29"));
    }
    // Sat 3 Oct is match day v Kestrel Bay's next opponent (sample-club/fixtures.csv).
    const PlanWeekDay& saturday = rows[5];
    QVERIFY(saturday.matchDay);
    QCOMPARE(saturday.label, QStringLiteral("MD"));
    const auto fixture = std::find_if(schedule.begin(), schedule.end(),
                                      [](const model::Fixture& f) { return f.date == "2026-10-03"; });
    QVERIFY(fixture != schedule.end());
    QVERIFY(saturday.fixtureText.contains(QString::fromStdString(fixture->opponent)));
    QVERIFY(saturday.fixtureDetail.contains(QString::fromStdString(fixture->kickoff)));
    QCOMPARE(rows[1].label, QStringLiteral("MD-4"));
    QCOMPARE(rows[1].cap, caps.before(4));
    QVERIFY(view.selectedDayDetail().startsWith(QStringLiteral("MD-4")));

    // Every live drill of the book is a swap choice.
    QCOMPARE(view.drillChoices()->rows().size(), model::DrillBook(*m_reference).list().size());
    view.selectDay(QStringLiteral("2026-10-01"));
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-10-01"));
    QVERIFY(view.days()->rows()[3].selected);
    QVERIFY(!view.days()->rows()[1].selected);
    view.selectDay(QStringLiteral("2026-10-09")); // not in the shown week: ignored
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-10-01"));
}

void PlannerViewTest::weekNavigation() {
    PlannerView view;
    const auto days = watch(view.days());
    view.setSession(&m_session);
    QSignalSpy errors(&view, &PlannerView::dateErrorChanged);
    QVERIFY(!view.goToDate(QStringLiteral("2026-02-30")));
    QVERIFY(view.dateError().contains(QStringLiteral("2026-02-30")));
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-09-29")); // unchanged
    QVERIFY(view.goToDate(QStringLiteral(" 2026-10-15 ")));
    QVERIFY(view.dateError().isEmpty());
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-10-15"));
    QCOMPARE(view.days()->rows().front().date, QStringLiteral("2026-10-12"));
    view.nextWeek();
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-10-22"));
    QCOMPARE(view.days()->rows().front().date, QStringLiteral("2026-10-19"));
    view.previousWeek();
    view.previousWeek();
    QCOMPARE(view.days()->rows().front().date, QStringLiteral("2026-10-05"));
    view.goToToday();
    QCOMPARE(view.selectedDate(), QStringLiteral("2026-09-29"));
    QCOMPARE(view.suggestedFileName(QStringLiteral("ics")), QStringLiteral("week-2026-09-28.ics"));
    QCOMPARE(view.suggestedFileName(QStringLiteral("pdf")), QStringLiteral("session-2026-09-29.pdf"));
    QVERIFY(errors.count() >= 2);
}

void PlannerViewTest::proposalEqualsTheModelsPlan() {
    PlannerView view;
    const auto blocks = watch(view.blocks());
    const auto focuses = watch(view.focusMinutes());
    view.setSession(&m_session);
    proposeAndWait(view, QStringLiteral("90"), QStringLiteral(" 18 "));
    std::vector<std::string> notes;
    const auto request = model::planRequestFor(*m_reference, kSquad, "2026-09-29", 90, 18, notes);
    QVERIFY(!request.focuses.empty()); // the story's focus is ranked from match 9's flags
    checkAgainstModel(view, request);
    QCOMPARE(view.planDate(), QStringLiteral("2026-09-29"));
    QCOMPARE(view.suggestedMinutes(), QStringLiteral("90"));
    // The open focus gets minutes, and its row names it.
    QCOMPARE(view.focusMinutes()->rows().front().focusId, request.focuses.front().id);
    QVERIFY(view.focusMinutes()->rows().front().minutes > 0);

    // Planning the same day again refills the models (under the testers).
    proposeAndWait(view, QStringLiteral("60"), QStringLiteral("14"));
    notes.clear();
    checkAgainstModel(view, model::planRequestFor(*m_reference, kSquad, "2026-09-29", 60, 14, notes));

    // Another day drops the proposal.
    view.selectDay(QStringLiteral("2026-09-30"));
    QVERIFY(!view.hasPlan());
    QCOMPARE(view.blocks()->rowCount(), 0);
}

void PlannerViewTest::coachChangesPlanAgain() {
    PlannerView view;
    const auto blocks = watch(view.blocks());
    const auto choices = watch(view.drillChoices());
    view.setSession(&m_session);
    QVERIFY(!view.togglePin(1)); // nothing proposed yet
    proposeAndWait(view, QStringLiteral("90"), QStringLiteral("18"));
    std::vector<std::string> notes;
    model::PlanRequest request = model::planRequestFor(*m_reference, kSquad, "2026-09-29", 90, 18, notes);
    checkAgainstModel(view, request);

    // Leave out the first main drill.
    const auto main = std::find_if(view.blocks()->rows().begin(), view.blocks()->rows().end(),
                                   [](const PlanBlockRow& r) { return r.main; });
    QVERIFY(main != view.blocks()->rows().end());
    const qint64 out = main->drillId;
    QVERIFY(view.removeDrill(out));
    QTRY_VERIFY_WITH_TIMEOUT(!view.busy(), kPlanTimeoutMs);
    request.removed = {out};
    checkAgainstModel(view, request);
    QVERIFY(std::none_of(view.blocks()->rows().begin(), view.blocks()->rows().end(),
                         [&](const PlanBlockRow& r) { return r.drillId == out; }));
    QVERIFY(view.hasAdjustments());
    QVERIFY(view.adjustmentsText().startsWith(QStringLiteral("Left out: ")));

    // Pin a drill of the plan.
    const qint64 kept = view.blocks()->rows()[1].drillId;
    QVERIFY(view.togglePin(kept));
    QTRY_VERIFY_WITH_TIMEOUT(!view.busy(), kPlanTimeoutMs);
    request.pinned = {kept};
    checkAgainstModel(view, request);
    QVERIFY(view.blocks()->rows()[1].pinned || std::any_of(view.blocks()->rows().begin(),
                                                           view.blocks()->rows().end(),
                                                           [&](const PlanBlockRow& r) {
                                                               return r.drillId == kept && r.pinned;
                                                           }));

    // Swap the pinned drill for one of the book that is not in the plan, within the cap.
    qint64 in = 0;
    for (const PlanDrillChoice& c : view.drillChoices()->rows())
        if (!c.inPlan && !c.aboveCap && c.drillId != out) {
            in = c.drillId;
            break;
        }
    QVERIFY(in > 0);
    QVERIFY(view.swapDrill(kept, in));
    QTRY_VERIFY_WITH_TIMEOUT(!view.busy(), kPlanTimeoutMs);
    request = model::swapDrill(request, kept, in);
    const model::PlanResult swapped = model::planSession(request);
    if (swapped.plan) {
        checkAgainstModel(view, request);
        QVERIFY(std::any_of(view.blocks()->rows().begin(), view.blocks()->rows().end(),
                            [&](const PlanBlockRow& r) { return r.drillId == in && r.pinned; }));
    } else {
        QVERIFY(!view.hasPlan()); // a swap the rules cannot meet is explained, not forced
        QVERIFY(view.problem().contains(QString::fromStdString(swapped.problem).mid(1)));
    }

    // Clearing the changes plans from the club file's request alone.
    QVERIFY(view.clearAdjustments());
    QTRY_VERIFY_WITH_TIMEOUT(!view.busy(), kPlanTimeoutMs);
    QVERIFY(!view.hasAdjustments());
    request.pinned.clear();
    request.removed.clear();
    checkAgainstModel(view, request);
}

void PlannerViewTest::problemsInPlainWords() {
    PlannerView view;
    const auto blocks = watch(view.blocks());
    view.setSession(&m_session);
    QVERIFY(!view.propose(QStringLiteral("ninety"), QStringLiteral("18")));
    QVERIFY(view.problem().startsWith(QStringLiteral("Minutes: 'ninety'")));
    QVERIFY(!view.hasPlan());
    QVERIFY(!view.propose(QStringLiteral("90"), QStringLiteral("")));
    QVERIFY(view.problem().startsWith(QStringLiteral("Players:")));

    // Each of these is the model's own problem, shown as a sentence.
    const struct {
        QString date, minutes, players;
    } cases[] = {
        {QStringLiteral("2026-09-29"), QStringLiteral("10"), QStringLiteral("18")}, // < warm-up + cool-down
        {QStringLiteral("2026-09-29"), QStringLiteral("90"), QStringLiteral("0")},  // no players
        {QStringLiteral("2026-10-03"), QStringLiteral("60"), QStringLiteral("18")}, // match day, cap 0
    };
    for (const auto& c : cases) {
        QVERIFY(view.goToDate(c.date));
        proposeAndWait(view, c.minutes, c.players);
        std::vector<std::string> notes;
        const auto expected = model::planSession(model::planRequestFor(
            *m_reference, kSquad, c.date.toStdString(), c.minutes.toInt(), c.players.toInt(), notes));
        QVERIFY(!expected.plan);
        QVERIFY(!view.hasPlan());
        QCOMPARE(view.blocks()->rowCount(), 0);
        QVERIFY2(view.problem().startsWith(QStringLiteral("No session planned: ")), qPrintable(view.problem()));
        QVERIFY2(view.problem().contains(QString::fromStdString(expected.problem).mid(1)),
                 qPrintable(view.problem() + " / " + QString::fromStdString(expected.problem)));
    }
    QVERIFY(!view.save(QStringLiteral("Test coach")));
    QVERIFY(view.messageIsError());
}

void PlannerViewTest::saveWritesASession() {
    PlannerView view;
    const auto days = watch(view.days());
    view.setSession(&m_session);
    QVERIFY(view.goToDate(QStringLiteral("2026-09-30")));
    QVERIFY(!view.selectedHasSession());
    proposeAndWait(view, QStringLiteral("75"), QStringLiteral("16"));
    QVERIFY(view.hasPlan());
    QVERIFY(!view.planReplacesSaved());
    QVERIFY(!view.save(QStringLiteral("  "))); // who saves it is required
    QVERIFY(view.messageIsError());

    QSignalSpy opened(&m_session, &ClubSession::opened);
    QVERIFY(view.save(QStringLiteral("Test coach")));
    QVERIFY(!view.messageIsError());
    QCOMPARE(opened.count(), 1); // every page recomputes
    const auto saved = model::SessionStore(*m_reference).get(kSquad, "2026-09-30");
    QVERIFY(saved);
    QCOMPARE(saved->minutes, 75);
    QCOMPARE(saved->players, 16);
    QCOMPARE(saved->savedBy, std::string("Test coach"));
    QCOMPARE(saved->dayLabel, std::string("MD-3"));
    const auto& rows = view.blocks()->rows();
    QCOMPARE(saved->blocks.size(), rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        QCOMPARE(saved->blocks[i].drillId, rows[i].drillId);
        QCOMPARE(saved->blocks[i].minutes, rows[i].minutes);
        QCOMPARE(saved->blocks[i].why, rows[i].why.toStdString());
    }
    // The week shows it, and the proposal stays on screen.
    QVERIFY(view.selectedHasSession());
    QVERIFY(view.days()->rows()[2].hasSession);
    QCOMPARE(view.days()->rows()[2].sessionText, QStringLiteral("75 min · 16 players"));
    QVERIFY(view.hasPlan());
    QVERIFY(view.planReplacesSaved()); // a second save replaces it (the page asks first)
    QVERIFY(view.save(QStringLiteral("Test coach")));
    QVERIFY(view.message().contains(QStringLiteral("replacing")));
    QCOMPARE(model::SessionStore(*m_reference).list(kSquad, "2026-09-30", "2026-09-30").size(),
             std::size_t{1});
}

void PlannerViewTest::calendarReadsBack() {
    PlannerView view;
    view.setSession(&m_session);
    QVERIFY(view.goToDate(QStringLiteral("2026-09-29")));
    proposeAndWait(view, QStringLiteral("90"), QStringLiteral("18"));
    QVERIFY(view.save(QStringLiteral("Test coach")));

    const QString path = m_dir.filePath(QStringLiteral("week.ics"));
    QVERIFY(!view.exportCalendar(QUrl::fromLocalFile(path), QStringLiteral("25:00")));
    QVERIFY(view.messageIsError());
    QVERIFY(!QFile::exists(path));
    QVERIFY2(view.exportCalendar(QUrl::fromLocalFile(path), QStringLiteral("18:15")), qPrintable(view.message()));
    QVERIFY(!view.messageIsError());

    QFile file(path);
    QVERIFY(file.open(QIODevice::ReadOnly));
    const QByteArray bytes = file.readAll();
    QVERIFY(bytes.contains("\r\n"));
    const QStringList lines = unfold(bytes);
    QCOMPARE(lines.front(), QStringLiteral("BEGIN:VCALENDAR"));
    QCOMPARE(lines.back(), QStringLiteral("END:VCALENDAR"));
    for (const QString& line : lines) QVERIFY(line.toUtf8().size() > 0);

    // One entry a saved session of the week, each with its own UID, and the times of each.
    const auto sessions = model::SessionStore(*m_reference).list(kSquad, "2026-09-28", "2026-10-04");
    QVERIFY(!sessions.empty());
    int events = 0;
    QStringList uids;
    for (const QString& line : lines) {
        if (line == QLatin1String("BEGIN:VEVENT")) ++events;
        if (line.startsWith(QLatin1String("UID:"))) uids << line.mid(4);
    }
    QCOMPARE(uids.size(), events);
    QCOMPARE(QSet<QString>(uids.begin(), uids.end()).size(), events);
    int reviews = 0;
    for (const auto& uid : uids) reviews += uid.startsWith(QLatin1String("review-"));
    QCOMPARE(events - reviews, static_cast<int>(sessions.size()));
    for (const auto& s : sessions) {
        const QString day = QString::fromStdString(s.date).remove(QLatin1Char('-'));
        const QTime end = QTime(18, 15).addSecs(60 * s.minutes);
        QVERIFY2(lines.contains(QStringLiteral("DTSTART:%1T181500").arg(day)), qPrintable(day));
        QVERIFY(lines.contains(QStringLiteral("DTEND:%1T%2").arg(day, end.toString(QStringLiteral("HHmmss")))));
    }
    // The same entries as model::calendarFor gives for the week (the command line's assembly).
    const auto expected = model::calendarFor(*m_reference, kSquad, "2026-09-28", "2026-10-04", "18:15",
                                             nowUtcIso());
    QCOMPARE(expected.sessions + expected.reviews, events);
    QCOMPARE(QString::fromUtf8(bytes), QString::fromStdString(expected.text));
    // No temporary file is left beside it.
    QCOMPARE(QDir(m_dir.path()).entryList({QStringLiteral("*.ics*")}, QDir::Files | QDir::Hidden).size(), 1);

    // A week with nothing in it writes nothing and says so.
    QVERIFY(view.goToDate(QStringLiteral("2027-05-10")));
    const QString empty = m_dir.filePath(QStringLiteral("empty.ics"));
    const bool wrote = view.exportCalendar(QUrl::fromLocalFile(empty), QStringLiteral("10:30"));
    const auto later = model::calendarFor(*m_reference, kSquad, "2027-05-10", "2027-05-16", "10:30", nowUtcIso());
    QCOMPARE(wrote, !later.empty());
    QCOMPARE(QFile::exists(empty), !later.empty());
}

void PlannerViewTest::sessionSheet() {
    PlannerView view;
    view.setSession(&m_session);
    QVERIFY(view.goToDate(QStringLiteral("2026-10-02"))); // MD-1: nothing saved there
    QVERIFY(!view.selectedHasSession());
    const QString path = m_dir.filePath(QStringLiteral("sheet.pdf"));
    QVERIFY(!view.exportSheet(QUrl::fromLocalFile(path)));
    QVERIFY(view.messageIsError());
    QVERIFY(view.message().contains(QStringLiteral("No saved session")));
    QVERIFY(!QFile::exists(path));

    proposeAndWait(view, QStringLiteral("45"), QStringLiteral("18"));
    QVERIFY2(view.hasPlan(), qPrintable(view.problem()));
    QVERIFY(view.save(QStringLiteral("Test coach")));
    QVERIFY(view.selectedHasSession());
    QVERIFY2(view.exportSheet(QUrl::fromLocalFile(path)), qPrintable(view.message()));
    QFile pdf(path);
    QVERIFY(pdf.open(QIODevice::ReadOnly));
    QVERIFY(pdf.read(5) == "%PDF-");
    // An unwritable place is reported in words.
    QVERIFY(!view.exportSheet(QUrl::fromLocalFile(m_dir.filePath(QStringLiteral("no/such/folder/x.pdf")))));
    QVERIFY(view.messageIsError());
    QVERIFY(!view.message().isEmpty());
}

void PlannerViewTest::pageShowsTheProposal() {
    // The page itself, offscreen: it loads, shows a proposal and a saved week without a QML
    // warning. With $PITCHLOOP_SHOT_DIR set it leaves a picture there to look at.
    const int warningsBefore = WarningCounter::count();
    QQuickView window;
    pitchloop::desktop::testing::loadPage(window, &m_session, "PlannerPage");
    QCOMPARE(window.status(), QQuickView::Ready);
    window.show();
    auto* view = window.rootObject()->findChild<PlannerView*>();
    QVERIFY(view);
    QVERIFY(view->goToDate(QStringLiteral("2026-10-01")));
    QVERIFY(QMetaObject::invokeMethod(window.rootObject(), "proposeNow")); // the page's own fields
    QTRY_VERIFY_WITH_TIMEOUT(!view->busy(), kPlanTimeoutMs);
    if (!view->hasPlan()) { // an empty form: the page shows the planner's word for it
        QVERIFY(!view->problem().isEmpty());
        proposeAndWait(*view, QStringLiteral("60"), QStringLiteral("18"));
    }
    QVERIFY2(view->hasPlan(), qPrintable(view->problem()));
    QTest::qWait(50);
    const QImage image = window.grabWindow();
    QVERIFY(!image.isNull());
    if (const QString dir = qEnvironmentVariable("PITCHLOOP_SHOT_DIR"); !dir.isEmpty())
        QVERIFY(image.save(QDir(dir).filePath(QStringLiteral("planner-proposal.png"))));
    QCOMPARE(WarningCounter::count(), warningsBefore);
}

void PlannerViewTest::emptyClub() {
    QTemporaryDir dir;
    ClubSession empty;
    QVERIFY(empty.open(dir.filePath(QStringLiteral("empty.sqlite"))));
    PlannerView view;
    const auto days = watch(view.days());
    const auto blocks = watch(view.blocks());
    view.setSession(&empty);
    QVERIFY2(view.errorString().isEmpty(), qPrintable(view.errorString()));
    QCOMPARE(view.days()->rowCount(), 7);
    QVERIFY(view.weekNote().contains(QStringLiteral("no fixtures")));
    for (const auto& row : view.days()->rows()) {
        QVERIFY(row.label.isEmpty());
        QCOMPARE(row.cap, -1);
    }
    proposeAndWait(view, QStringLiteral("60"), QStringLiteral("18"));
    QVERIFY(!view.hasPlan());
    QVERIFY(!view.problem().isEmpty());
    QCOMPARE(view.drillChoices()->rowCount(), 0);
    // The note points at the page's own import, not at the command line.
    QVERIFY(view.weekNote().contains(QStringLiteral("Import fixtures")));
    QVERIFY(!view.weekNote().contains(QStringLiteral("pitchloop")));

    // A bad fixtures file imports nothing and says where it is wrong.
    const QString bad = dir.filePath(QStringLiteral("bad-fixtures.csv"));
    {
        QFile f(bad);
        QVERIFY(f.open(QIODevice::WriteOnly));
        f.write("date,kickoff,opponent,venue,competition\n2026-02-30,15:00,Nettleby Town,home,League\n");
    }
    QVERIFY(!view.importFixtures(QUrl::fromLocalFile(bad)));
    QVERIFY(view.messageIsError());
    QVERIFY2(view.message().contains(QStringLiteral("bad-fixtures.csv")), qPrintable(view.message()));
    QVERIFY(model::FixtureStore(*empty.repository()).list(kSquad, "2026-27").empty());
    // The demo's schedule imports, and the week of 29 Sep then has its microcycle.
    QVERIFY(view.importFixtures(QUrl::fromLocalFile(kSource + QStringLiteral("/sample-club/fixtures.csv"))));
    QVERIFY2(!view.messageIsError(), qPrintable(view.message()));
    QVERIFY(view.message().contains(QStringLiteral("added")));
    QVERIFY(!model::FixtureStore(*empty.repository()).list(kSquad, "2026-27").empty());
    QVERIFY(view.weekNote().isEmpty());
}

void PlannerViewTest::fixturesEnteredInTheApp() {
    // A club with no schedule enters its fixtures one by one in the planner: add, edit (move
    // the date), remove; a bad field is named in the form's words and changes nothing.
    QTemporaryDir dir;
    ClubSession club;
    QVERIFY(club.open(dir.filePath(QStringLiteral("club.sqlite"))));
    PlannerView view;
    view.setSession(&club);
    QVERIFY(view.goToDate(QStringLiteral("2026-09-29")));
    const auto stored = [&] { return model::FixtureStore(*club.repository()).list(kSquad, "2026-27"); };

    QVERIFY(!view.saveFixture({}, QStringLiteral("2026-10-03"), QStringLiteral("25:00"), QString(),
                              QStringLiteral("home"), QString()));
    QVERIFY(view.messageIsError());
    QVERIFY2(view.message().contains(QStringLiteral("Kick-off: '25:00' is not a time")), qPrintable(view.message()));
    QVERIFY2(view.message().contains(QStringLiteral("Opponent: missing")), qPrintable(view.message()));
    QVERIFY(stored().empty());

    QVERIFY(view.saveFixture({}, QStringLiteral("2026-10-03"), QStringLiteral("15:00"), QStringLiteral("Saltmere Rovers"),
                             QStringLiteral("home"), QStringLiteral("League")));
    QVERIFY2(!view.messageIsError(), qPrintable(view.message()));
    QCOMPARE(stored().size(), std::size_t{1});
    QCOMPARE(stored().front().opponent, std::string("Saltmere Rovers"));
    // The week now has its microcycle: 29 Sep is MD-4 before the match on 3 Oct.
    view.selectDay(QStringLiteral("2026-09-29"));
    QVERIFY2(view.selectedDayDetail().startsWith(QStringLiteral("MD-4")), qPrintable(view.selectedDayDetail()));
    view.selectDay(QStringLiteral("2026-10-03"));
    QCOMPARE(view.selectedFixture().value(QStringLiteral("opponent")).toString(), QStringLiteral("Saltmere Rovers"));

    // Moved to the Sunday with a new kick-off: one fixture, on the new date.
    QVERIFY(view.saveFixture(QStringLiteral("2026-10-03"), QStringLiteral("2026-10-04"), QStringLiteral("13:30"),
                             QStringLiteral("Saltmere Rovers"), QStringLiteral("away"), QStringLiteral("League")));
    QCOMPARE(stored().size(), std::size_t{1});
    QCOMPARE(stored().front().date, std::string("2026-10-04"));
    QCOMPARE(stored().front().venue, std::string("away"));
    view.selectDay(QStringLiteral("2026-10-03"));
    QVERIFY(view.selectedFixture().isEmpty());

    QVERIFY(view.removeFixture(QStringLiteral("2026-10-04")));
    QVERIFY(stored().empty());
    QVERIFY(!view.removeFixture(QStringLiteral("2026-10-04")));
    QVERIFY(view.messageIsError());
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<PlannerViewTest>(argc, argv, "planner_view_tests");
}

#include "planner_view_test.moc"
