// Tests of the desktop adapters: every list model runs under QAbstractItemModelTester while its
// controller fills it; the numbers shown are checked against model/ computed independently (or
// by hand, as noted); the pitch map's clicks are checked against model::ZoneGrid::zoneOf.
//
// The club: the first seven matches of the demo season (sample-club/matches) and its targets
// (sample-club/targets.json), ingested into a temporary club file.

#include "modelcheck.h"
#include "clubsession.h"
#include "commands.h"
#include "debrieflistmodel.h"
#include "display.h"
#include "ingest.h"
#include "matchdebrief.h"
#include "matchlistmodel.h"
#include "metriclistmodel.h"
#include "pitchgeometry.h"
#include "palette.h"
#include "pooling.h"
#include "seasonoverview.h"
#include "seriesmodel.h"
#include "startup.h"
#include "targets.h"
#include "zonemapmodel.h"
#include "zoneseries.h"
#include "zonestate.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QFile>
#include <QFileInfo>
#include <QGuiApplication>
#include <QLocale>
#include <QQmlEngine>
#include <QQuickItem>
#include <QQuickStyle>
#include <QQuickView>
#include <QRegularExpression>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QUrl>
#include <QtQml/qqmlextensionplugin.h>

#include <cmath>
#include <memory>
#include <sstream>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::watch;
using pitchloop::desktop::testing::role;

namespace {

constexpr int kMatches = 7;
const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);

/// The model's own status of one zone after match `focal` of the test season.
model::ZoneStatus referenceStatus(const model::ClubRepository& repo, std::size_t focal,
                                  const std::string& metric, int band, int lane,
                                  const model::Window& window) {
    const auto season = repo.seasonTallies("First team", "2026-27");
    const auto statuses =
        model::computeStatus(season, focal, repo.metrics(), repo.targets("First team", "2026-27"),
                             repo.tallyGrid(), {window}, repo.flagSettings());
    for (const auto& s : statuses)
        if (s.metric == metric && s.band == band && s.lane == lane) return s;
    return {};
}

} // namespace

class DesktopTest : public QObject {
    Q_OBJECT

private slots:
    void initTestCase();
    void matchList();
    void metricList();
    void debriefMaps();
    void debriefList();
    void debriefCountScales();
    void appAndCommandLineSayTheSame();
    void debriefExportsFromThePage();
    void seasonOverview();
    void zoneSeries();
    void emptyClub();
    void scaleDomains();
    void valueTexts();
    void clubFileChoice();
    void pitchGeometry();
    void pitchClickMapsToZone();
    void pitchHoverShowsNumbers();

private:
    QTemporaryDir m_dir;
    QString m_file;
    std::unique_ptr<model::ClubRepository> m_reference; ///< same file, read independently
    ClubSession m_session;
};

void DesktopTest::initTestCase() {
    QVERIFY(m_dir.isValid());
    m_file = m_dir.filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(m_file.toStdString());
        for (int i = 1; i <= kMatches; ++i) {
            const auto report = model::ingestFile(
                repo, QStringLiteral("%1/sample-club/matches/KB-2026-%2.json")
                          .arg(kSource)
                          .arg(i, 2, 10, QLatin1Char('0'))
                          .toStdString());
            QVERIFY2(report.ok(), report.file.c_str());
        }
        QFile targets(kSource + QStringLiteral("/sample-club/targets.json"));
        QVERIFY(targets.open(QIODevice::ReadOnly));
        const auto grid = repo.tallyGrid();
        const auto parsed = model::parseTargetFile(targets.readAll().toStdString(), "targets.json",
                                                   repo.metrics(), grid.bands(), grid.lanes());
        QVERIFY(parsed.errors.empty());
        repo.addTargets(parsed.targets, "2026-07-20T10:00:00Z");
    }
    QSignalSpy opened(&m_session, &ClubSession::opened);
    QVERIFY(m_session.open(m_file));
    QCOMPARE(opened.count(), 1);
    QVERIFY(m_session.errorString().isEmpty());
    QCOMPARE(m_session.matchCount(), kMatches);
    m_reference = std::make_unique<model::ClubRepository>(m_file.toStdString());
}

void DesktopTest::matchList() {
    MatchListModel model;
    const auto tester = watch(&model);
    model.reset(m_reference->matches());
    QCOMPARE(model.rowCount(), kMatches);
    // Newest first; KB-2026-07 was lost 0–2 at home (sample-club/matches/KB-2026-07.json).
    QCOMPARE(role(model, 0, "matchId").toString(), QStringLiteral("KB-2026-07"));
    QCOMPARE(role(model, 0, "score").toString(), QStringLiteral("0–2"));
    QCOMPARE(role(model, 0, "outcome").toString(), QStringLiteral("L"));
    QCOMPARE(role(model, 0, "venue").toString(), QStringLiteral("Home"));
    QVERIFY(role(model, 0, "label").toString().startsWith(QStringLiteral("KB-2026-07 · ")));
    QCOMPARE(role(model, kMatches - 1, "matchId").toString(), QStringLiteral("KB-2026-01"));
    QCOMPARE(model.indexOf(QStringLiteral("KB-2026-05")), 2);
    QCOMPARE(model.idAt(2), QStringLiteral("KB-2026-05"));
    QCOMPARE(model.indexOf(QStringLiteral("nope")), -1);
    QVERIFY(model.idAt(kMatches).isEmpty());
    model.reset({});
    QCOMPARE(model.rowCount(), 0);
}

void DesktopTest::metricList() {
    MetricListModel model;
    const auto tester = watch(&model);
    const auto metrics = m_reference->metrics();
    model.reset(metrics);
    QCOMPARE(model.rowCount(), static_cast<int>(metrics.size()));
    const int regain = model.indexOf(QStringLiteral("regain_5s"));
    QVERIFY(regain >= 0);
    QCOMPARE(role(model, regain, "name").toString(), QStringLiteral("Regain within 5 s"));
    QCOMPARE(role(model, regain, "kind").toString(), QStringLiteral("share of items"));
    QCOMPARE(role(model, regain, "better").toString(), QStringLiteral("Higher is better"));
    const int losses = model.indexOf(QStringLiteral("losses"));
    QCOMPARE(role(model, losses, "better").toString(), QStringLiteral("Lower is better"));
    QCOMPARE(model.idAt(losses), QStringLiteral("losses"));
}

void DesktopTest::debriefMaps() {
    MatchDebrief debrief;
    const auto matchTester = watch(debrief.matchMap());
    const auto windowTester = watch(debrief.windowMap());
    const auto itemTester = watch(debrief.items());
    debrief.setMetricId(QStringLiteral("regain_5s"));
    debrief.setSession(&m_session);
    QVERIFY(debrief.errorString().isEmpty());
    QCOMPARE(debrief.matchId(), QStringLiteral("KB-2026-07")); // empty input: the latest match
    QCOMPARE(debrief.matchRow(), 0);
    QCOMPARE(debrief.matchMap()->rowCount(), 30); // the default 6 × 5 grid
    QCOMPARE(debrief.windowMap()->rowCount(), 30);

    const model::FlagSettings settings = m_reference->flagSettings();
    const model::Window match{model::Window::Kind::Match, 1, 0.3};
    // The maps colour each zone pooled toward its neighbours (model/pooling.h) from the same
    // statuses' effective counts; the zone's own value stays one hover away ("raw").
    auto pooledMap = [&](const model::Window& w) {
        std::vector<model::ZoneCount> counts;
        const model::ZoneGrid grid;
        for (int i = 0; i < grid.zoneCount(); ++i) {
            const model::Zone z = grid.zoneAt(i);
            const auto st = referenceStatus(*m_reference, kMatches - 1, "regain_5s", z.band, z.lane, w);
            counts.push_back({z.band, z.lane, st.sum.effNum, st.sum.effDen});
        }
        return model::poolZones(counts, grid, model::MetricKind::Rate, settings.level, 1.0);
    };
    const model::PooledMap pooledMatch = pooledMap(match), pooledWindow = pooledMap(settings.window);
    for (const auto& [band, lane] : {std::pair{5, 1}, {2, 5}, {1, 1}}) {
        const std::size_t at = static_cast<std::size_t>(model::ZoneGrid{}.indexOf({band, lane}));
        const QVariantMap inMatch = debrief.matchMap()->zone(band, lane);
        const QVariantMap inWindow = debrief.windowMap()->zone(band, lane);
        const auto a = referenceStatus(*m_reference, kMatches - 1, "regain_5s", band, lane, match);
        const auto b = referenceStatus(*m_reference, kMatches - 1, "regain_5s", band, lane, settings.window);
        QCOMPARE(inMatch.value(QStringLiteral("hasValue")).toBool(), !std::isnan(a.value));
        if (!std::isnan(a.value)) {
            QCOMPARE(inMatch.value(QStringLiteral("raw")).toDouble(), a.value);
            QCOMPARE(inMatch.value(QStringLiteral("value")).toDouble(), pooledMatch.zones[at].pooled);
            QCOMPARE(inMatch.value(QStringLiteral("valueText")).toString(),
                     valueText(model::MetricKind::Rate, pooledMatch.zones[at].pooled));
            // The zone's own num/den one hover away.
            QCOMPARE(inMatch.value(QStringLiteral("rawText")).toString(),
                     QStringLiteral("This zone alone: %1 of %2 = %3")
                         .arg(a.sum.num)
                         .arg(a.sum.den)
                         .arg(valueText(model::MetricKind::Rate, a.value)));
        }
        QCOMPARE(inWindow.value(QStringLiteral("raw")).toDouble(), std::isnan(b.value) ? 0 : b.value);
        QCOMPARE(inWindow.value(QStringLiteral("value")).toDouble(), std::isnan(b.value) ? 0 : pooledWindow.zones[at].pooled);
        QCOMPARE(inWindow.value(QStringLiteral("zoneState")).toInt(), static_cast<int>(ZoneState::from(b.state)));
        QCOMPARE(inWindow.value(QStringLiteral("zoneName")).toString(), zoneText(band, lane, model::ZoneGrid{}));
        const double scaled = inWindow.value(QStringLiteral("scaled")).toDouble();
        QVERIFY(scaled >= 0 && scaled <= 1);
        // Its colour: the palette's row from how sure the pooled value is, its step from the value.
        if (!std::isnan(b.value)) {
            namespace palette = model::palette;
            const int row = inWindow.value(QStringLiteral("certaintyRow")).toInt();
            QVERIFY(row >= 0 && row < palette::kLevels);
            QCOMPARE(inWindow.value(QStringLiteral("colour")).toString(),
                     QString::fromStdString(palette::toHex(palette::colour(row, palette::stepOf(scaled, row)))));
        }
    }
    // Both maps share one colour scale: its labels run from its low to its high end.
    QCOMPARE(debrief.matchMap()->scaleLabels(), debrief.windowMap()->scaleLabels());
    QVERIFY(debrief.matchMap()->scaleLabels().size() >= 2);

    // Another metric and another match refill every model (the testers watch the resets).
    debrief.setMetricId(QStringLiteral("losses"));
    QCOMPARE(debrief.metricRow(), m_session.metrics()->indexOf(QStringLiteral("losses")));
    debrief.setMatchId(QStringLiteral("KB-2026-03"));
    QCOMPARE(debrief.matchRow(), m_session.matches()->indexOf(QStringLiteral("KB-2026-03")));
    QCOMPARE(debrief.matchMap()->rowCount(), 30);
    // Counts: one match's value in a zone is its tally (den 1 a match).
    const auto tally = m_reference->matchTally("KB-2026-03", "losses");
    const model::ZoneGrid grid;
    const auto z = tally[static_cast<std::size_t>(grid.indexOf({3, 2}))];
    QCOMPARE(debrief.matchMap()->zone(3, 2).value(QStringLiteral("raw")).toDouble(),
             static_cast<double>(z.num) / static_cast<double>(z.den));
    // An unknown match falls back to the latest.
    debrief.setMatchId(QStringLiteral("no-such-match"));
    QCOMPARE(debrief.matchId(), QStringLiteral("KB-2026-07"));
}

void DesktopTest::debriefCountScales() {
    MatchDebrief debrief;
    const auto matchTester = watch(debrief.matchMap());
    debrief.setSession(&m_session);
    debrief.setMetricId(QStringLiteral("losses"));
    debrief.setMatchId(QStringLiteral("KB-2026-03"));
    QVERIFY(debrief.scalable());
    QCOMPARE(debrief.scaleText(), QStringLiteral("a match"));
    const auto tally = m_reference->matchTally("KB-2026-03", "losses");
    const model::ZoneGrid grid;
    const auto zone = tally[static_cast<std::size_t>(grid.indexOf({3, 2}))];
    long total = 0;
    for (const auto& z : tally) total += z.num;
    // Per 100 of their passes: this match's count over its opponent passes (the club file's
    // events, as model::ClubRepository::seasonExposures counts them).
    const auto exposures = m_reference->seasonExposures("First team", "2026-27");
    const auto ids = m_reference->seasonTallies("First team", "2026-27").matchIds;
    const auto at = static_cast<std::size_t>(std::find(ids.begin(), ids.end(), "KB-2026-03") - ids.begin());
    debrief.setCountScale(QStringLiteral("per_opponent_passes"));
    QCOMPARE(debrief.scaleText(), QStringLiteral("per 100 of their passes"));
    QCOMPARE(debrief.matchMap()->zone(3, 2).value(QStringLiteral("raw")).toDouble(),
             static_cast<double>(zone.num) / (static_cast<double>(exposures[at].opponentPasses) / 100));
    QVERIFY(debrief.matchMap()->zone(3, 2).value(QStringLiteral("rawText")).toString().contains(
        QStringLiteral("per 100 of their passes")));
    // A share of the pitch's total: the zone's losses of all the match's losses.
    debrief.setCountScale(QStringLiteral("share"));
    QCOMPARE(debrief.matchMap()->zone(3, 2).value(QStringLiteral("raw")).toDouble(),
             static_cast<double>(zone.num) / static_cast<double>(total));
    QVERIFY(debrief.matchMap()->zone(3, 2).value(QStringLiteral("valueText")).toString().endsWith(QLatin1Char('%')));
    // An unknown scale is refused; a rate metric ignores the choice.
    debrief.setCountScale(QStringLiteral("per minute"));
    QCOMPARE(debrief.countScale(), QStringLiteral("share"));
    debrief.setMetricId(QStringLiteral("regain_5s"));
    QVERIFY(!debrief.scalable());
    QCOMPARE(debrief.scaleText(), QStringLiteral("a match"));
}

void DesktopTest::debriefList() {
    MatchDebrief debrief;
    const auto tester = watch(debrief.items());
    debrief.setSession(&m_session);
    const auto season = m_reference->seasonTallies("First team", "2026-27");
    const auto reference =
        model::buildDebrief(season, kMatches - 1, m_reference->metrics(),
                            m_reference->targets("First team", "2026-27"), m_reference->tallyGrid(),
                            m_reference->flagSettings());
    const auto* items = debrief.items();
    QCOMPARE(items->rowCount(), static_cast<int>(reference.slippedInWindow.size() +
                                                 reference.slippedInMatch.size() +
                                                 reference.unusualInMatch.size() +
                                                 reference.watched.size()));
    QVERIFY(items->rowCount() > 0); // match 7 has a slip and several zones on watch (CLI debrief)
    // The default metric is that of the first line, and its zone is picked on the maps.
    QCOMPARE(debrief.metricId(), role(*items, 0, "metricId").toString());
    if (role(*items, 0, "band").toInt() > 0) {
        QCOMPARE(debrief.selectedBand(), role(*items, 0, "band").toInt());
        QCOMPARE(debrief.selectedLane(), role(*items, 0, "lane").toInt());
    }
    // Sections in order, each most certain first; the title row is marked once per section.
    QString section;
    double lastP = 2;
    for (int row = 0; row < items->rowCount(); ++row) {
        const QString s = role(*items, row, "section").toString();
        const bool first = role(*items, row, "firstInSection").toBool();
        QCOMPARE(first, s != section);
        if (first) lastP = 2;
        const double p = role(*items, row, "pMiss").toDouble();
        // Unusual single matches of a count are not judged (no P(miss)): most unusual first.
        if (s.startsWith(QStringLiteral("Unusual"))) {
            QVERIFY(std::isnan(p));
            section = s;
            continue;
        }
        QVERIFY2(p <= lastP, qPrintable(QStringLiteral("row %1 out of order").arg(row)));
        lastP = p;
        section = s;
    }
    if (!reference.slippedInWindow.empty()) {
        QCOMPARE(role(*items, 0, "zoneState").toInt(), static_cast<int>(ZoneState::OffTarget));
        QCOMPARE(role(*items, 0, "stateText").toString(), QStringLiteral("Off target"));
        QCOMPARE(role(*items, 0, "metricId").toString(),
                 QString::fromStdString(reference.slippedInWindow.front().now.metric));
    }
}

void DesktopTest::appAndCommandLineSayTheSame() {
    // One vocabulary (model/wording.h): every zone the app's debrief lists is listed by the
    // command line's debrief of the same match under the same section, with the same metric
    // name, zone name, sentence and numbers.
    MatchDebrief debrief;
    debrief.setSession(&m_session);
    const auto* items = debrief.items();
    QVERIFY(items->rowCount() > 0);
    std::vector<std::string> args{"pitchloop", "--db", m_file.toStdString(), "debrief",
                                  debrief.matchId().toStdString()};
    std::vector<char*> argv;
    for (auto& a : args) argv.push_back(a.data());
    std::ostringstream out, err;
    QCOMPARE(cli::run(static_cast<int>(argv.size()), argv.data(), out, err), 0);
    const QString said = QString::fromStdString(out.str());
    const auto lowerFirst = [](QString s) {
        if (!s.isEmpty()) s[0] = s[0].toLower();
        return s;
    };
    int compared = 0;
    for (int row = 0; row < items->rowCount(); ++row) {
        const QString section = role(*items, row, "section").toString();
        if (section.startsWith(QStringLiteral("Unusual"))) continue; // said differently: one match
        const QString head = QStringLiteral("  %1 · %2")
                                 .arg(role(*items, row, "metricName").toString(),
                                      lowerFirst(role(*items, row, "zoneText").toString()));
        const qsizetype sectionAt = said.indexOf(QLatin1Char('\n') + section + QStringLiteral(" ("));
        QVERIFY2(sectionAt >= 0, qPrintable(section));
        const qsizetype at = said.indexOf(head, sectionAt);
        QVERIFY2(at >= 0, qPrintable(head + QStringLiteral("\n") + said));
        // The item runs to the next line that is not indented by four (its sentence and numbers are).
        const qsizetype end = said.indexOf(QRegularExpression(QStringLiteral("\n(?!    )")), at + head.size());
        const QString item = said.mid(at, end - at);
        QVERIFY2(item.contains(role(*items, row, "coachText").toString()), qPrintable(item));
        QVERIFY2(item.contains(role(*items, row, "analystText").toString()), qPrintable(item));
        ++compared;
    }
    QVERIFY(compared > 0);
}

void DesktopTest::debriefExportsFromThePage() {
    // The debrief page writes the same files as the command line's exports: the statuses and
    // tallies CSV byte for byte, and a PDF.
    MatchDebrief debrief;
    debrief.setSession(&m_session);
    const std::string match = debrief.matchId().toStdString();
    QVERIFY(!match.empty());
    const auto cliBytes = [&](std::vector<std::string> args) {
        args.insert(args.begin(), {"pitchloop", "--db", m_file.toStdString(), "export"});
        std::vector<char*> argv;
        for (auto& a : args) argv.push_back(a.data());
        std::ostringstream out, err;
        const int code = cli::run(static_cast<int>(argv.size()), argv.data(), out, err);
        return code == 0 ? out.str() : "failed: " + err.str();
    };
    const auto fileBytes = [](const QString& path) {
        QFile f(path);
        return f.open(QIODevice::ReadOnly) ? f.readAll().toStdString() : std::string("unreadable");
    };
    const QString statuses = m_dir.filePath(debrief.suggestedFileName(QStringLiteral("statuses")));
    QCOMPARE(QFileInfo(statuses).fileName(), QStringLiteral("statuses-%1.csv").arg(debrief.matchId()));
    QVERIFY(debrief.exportStatusesCsv(QUrl::fromLocalFile(statuses)));
    QVERIFY(!debrief.exportFailed());
    QVERIFY(debrief.exportMessage().startsWith(QStringLiteral("Wrote ")));
    const auto firstDifference = [](const std::string& a, const std::string& b) {
        std::istringstream sa(a), sb(b);
        std::string la, lb;
        for (int n = 1;; ++n) {
            const bool moreA = static_cast<bool>(std::getline(sa, la)), moreB = static_cast<bool>(std::getline(sb, lb));
            if (!moreA && !moreB) break;
            if (!moreA) la.clear();
            if (!moreB) lb.clear();
            if (la != lb) return "line " + std::to_string(n) + ":\n  app " + la + "\n  cli " + lb;
        }
        return std::string();
    };
    const std::string fromCli = cliBytes({"statuses", match, "--out", "-"});
    QVERIFY2(fileBytes(statuses) == fromCli, firstDifference(fileBytes(statuses), fromCli).c_str());

    const QString tallies = m_dir.filePath(debrief.suggestedFileName(QStringLiteral("tallies")));
    QVERIFY(debrief.exportTalliesCsv(QUrl::fromLocalFile(tallies)));
    QCOMPARE(fileBytes(tallies), cliBytes({"tallies", "--match", match, "--out", "-"}));

    const QString pdf = m_dir.filePath(debrief.suggestedFileName(QStringLiteral("pdf")));
    QVERIFY(debrief.exportPdf(QUrl::fromLocalFile(pdf)));
    QVERIFY(fileBytes(pdf).rfind("%PDF-", 0) == 0);

    // A folder that is not there: a clear message, no file.
    const QString nowhere = m_dir.filePath(QStringLiteral("no-such-folder/x.csv"));
    QVERIFY(!debrief.exportStatusesCsv(QUrl::fromLocalFile(nowhere)));
    QVERIFY(debrief.exportFailed());
    QVERIFY2(debrief.exportMessage().contains(QStringLiteral("no-such-folder")), qPrintable(debrief.exportMessage()));
    QVERIFY(!QFileInfo::exists(nowhere));
}

void DesktopTest::seasonOverview() {
    SeasonOverview overview;
    const auto tester = watch(overview.items());
    QSignalSpy changed(&overview, &SeasonOverview::changed);
    overview.setSession(&m_session);
    QVERIFY(changed.count() >= 1);
    QVERIFY(overview.errorString().isEmpty());
    QCOMPARE(overview.lastMatchId(), QStringLiteral("KB-2026-07"));
    QCOMPARE(overview.lastScore(), QStringLiteral("0–2"));
    QCOMPARE(overview.lastOutcomeWord(), QStringLiteral("Lost"));
    QCOMPARE(overview.seasonMatchCount(), kMatches);
    QVERIFY(overview.hasTargets());
    const auto season = m_reference->seasonTallies("First team", "2026-27");
    const auto reference =
        model::buildDebrief(season, kMatches - 1, m_reference->metrics(),
                            m_reference->targets("First team", "2026-27"), m_reference->tallyGrid(),
                            m_reference->flagSettings());
    QCOMPARE(overview.judged(), reference.judged);
    QCOMPARE(overview.tooLittleData(), reference.tooLittleData);
    QCOMPARE(overview.slippedCount(), static_cast<int>(reference.slippedInWindow.size()));
    QCOMPARE(overview.watchCount(), static_cast<int>(reference.watched.size()));
    QCOMPARE(overview.recoveredCount(), static_cast<int>(reference.recovered.size()));
    QCOMPARE(overview.chanceFlags(), reference.seasonChanceFlags);
    QCOMPARE(overview.items()->rowCount(),
             overview.slippedCount() + overview.watchCount() + overview.recoveredCount());
    // Last 5 matches ending at match 7 start at match 3, played on 2026-08-22.
    QVERIFY(overview.windowRangeText().startsWith(compactDateText("2026-08-22")));
}

void DesktopTest::zoneSeries() {
    ZoneSeries trend;
    const auto seriesTester = watch(trend.series());
    const auto mapTester = watch(trend.map());
    trend.setSession(&m_session);
    trend.select(QStringLiteral("regain_5s"), 5, 1);
    QVERIFY(trend.errorString().isEmpty());
    QCOMPARE(trend.matchId(), QStringLiteral("KB-2026-07"));
    QCOMPARE(trend.focalRow(), kMatches - 1);
    const auto* series = trend.series();
    QCOMPARE(series->rowCount(), kMatches);
    QCOMPARE(trend.map()->rowCount(), 30);
    // A count's picker map can be read as each zone's share of the pitch's total.
    trend.select(QStringLiteral("losses"), 5, 1);
    QVERIFY(trend.scalable());
    trend.setCountScale(QStringLiteral("share"));
    QCOMPARE(trend.scaleText(), QStringLiteral("of the pitch's total"));
    QVERIFY(trend.map()->zone(5, 1).value(QStringLiteral("valueText")).toString().endsWith(QLatin1Char('%')));
    QVERIFY(trend.summaryPooledText().endsWith(QStringLiteral("of the pitch's total")));
    trend.setCountScale(QStringLiteral("match"));
    trend.select(QStringLiteral("regain_5s"), 5, 1);
    QVERIFY(!trend.scalable());
    // The card names the value the map colours for the zone (pooled), beside its own.
    QCOMPARE(trend.summaryPooledText(), QStringLiteral("On the map, pulled toward its neighbours: %1")
                                            .arg(trend.map()->zone(5, 1).value(QStringLiteral("valueText")).toString()));
    const model::ZoneGrid grid;
    const auto zone = static_cast<std::size_t>(grid.indexOf({5, 1}));
    const auto ids = m_reference->seasonTallies("First team", "2026-27").matchIds;
    for (int row = 0; row < kMatches; ++row) {
        // Each match's own value is its tally num/den in the zone.
        const auto t = m_reference->matchTally(ids[static_cast<std::size_t>(row)], "regain_5s")[zone];
        QCOMPARE(role(*series, row, "matchId").toString(), QString::fromStdString(ids[static_cast<std::size_t>(row)]));
        QCOMPARE(role(*series, row, "hasValue").toBool(), t.den > 0);
        if (t.den > 0)
            QCOMPARE(role(*series, row, "value").toDouble(),
                     static_cast<double>(t.num) / static_cast<double>(t.den));
        // The target in force all season: regain_5s band 5 lane 1 at least 55 %
        // (sample-club/targets.json, effective 2026-07-01).
        QCOMPARE(role(*series, row, "hasTarget").toBool(), true);
        QCOMPARE(role(*series, row, "target").toDouble(), 0.55);
        QCOMPARE(role(*series, row, "targetText").toString(), QStringLiteral("≥ 55.0%"));
        const double low = role(*series, row, "low").toDouble();
        const double high = role(*series, row, "high").toDouble();
        QVERIFY(low <= high);
    }
    QCOMPARE(series->values().size(), kMatches);
    // Rates are drawn on an axis inside 0–100 %.
    QVERIFY(series->axisLow() >= 0 && series->axisHigh() <= 1 && series->axisLow() < series->axisHigh());
    QCOMPARE(trend.zoneText(), QStringLiteral("Right wing in their third (B5·L1)"));
    QCOMPARE(series->point(0).value(QStringLiteral("matchId")).toString(), QStringLiteral("KB-2026-01"));
    QVERIFY(series->point(kMatches).isEmpty());

    // The whole pitch, and a zone outside the grid falls back to it.
    trend.select(QStringLiteral("regain_5s"), 0, 0);
    QCOMPARE(trend.zoneText(), QStringLiteral("Whole pitch"));
    trend.select(QStringLiteral("regain_5s"), 9, 9);
    QCOMPARE(trend.band(), 0);
    QCOMPARE(trend.lane(), 0);
    QCOMPARE(series->rowCount(), kMatches);
    // Up to an earlier match: the same season, the summary at that match.
    trend.select(QStringLiteral("losses"), 2, 3, QStringLiteral("KB-2026-04"));
    QCOMPARE(trend.focalRow(), 3);
    QCOMPARE(trend.metricRow(), m_session.metrics()->indexOf(QStringLiteral("losses")));
}

void DesktopTest::emptyClub() {
    QTemporaryDir dir;
    ClubSession empty;
    QVERIFY(empty.open(dir.filePath(QStringLiteral("new/club.sqlite"))));
    QCOMPARE(empty.matchCount(), 0);
    SeasonOverview overview;
    MatchDebrief debrief;
    ZoneSeries trend;
    const auto t1 = watch(overview.items());
    const auto t2 = watch(debrief.matchMap());
    const auto t3 = watch(debrief.items());
    const auto t4 = watch(trend.series());
    overview.setSession(&empty);
    debrief.setSession(&empty);
    trend.setSession(&empty);
    QVERIFY(!overview.hasMatches());
    QVERIFY(!debrief.hasMatch());
    QVERIFY(!trend.hasSeries());
    QCOMPARE(debrief.matchMap()->rowCount(), 0);
    QCOMPARE(trend.series()->rowCount(), 0);
    QVERIFY(overview.errorString().isEmpty() && debrief.errorString().isEmpty() &&
            trend.errorString().isEmpty());
}

void DesktopTest::scaleDomains() {
    using model::MetricKind;
    // Rates 33 %–47 %: tenths 0.3–0.5 span 0.2 ≤ 0.3, so steps of 5 points.
    auto d = scaleDomain(MetricKind::Rate, {0.33, 0.47, NAN});
    QCOMPARE(d.low, 0.3);
    QVERIFY(std::abs(d.high - 0.5) < 1e-12);
    QCOMPARE(d.steps(), 4);
    QCOMPARE(scaleLabels(MetricKind::Rate, d),
             (QStringList{"30%", "35%", "40%", "45%", "50%"}));
    QCOMPARE(d.position(0.4), 0.5);
    // Rates 0–100 %: span 1, steps of 20 points.
    d = scaleDomain(MetricKind::Rate, {0.0, 1.0});
    QCOMPARE(scaleLabels(MetricKind::Rate, d), (QStringList{"0%", "20%", "40%", "60%", "80%", "100%"}));
    // Counts up to 3.4: a quarter of 3.4 is 0.85, the next tidy step is 1, so 0–4.
    d = scaleDomain(MetricKind::Count, {0, 1.2, 3.4});
    QCOMPARE(d.low, 0.0);
    QCOMPARE(d.high, 4.0);
    QCOMPARE(scaleLabels(MetricKind::Count, d), (QStringList{"0", "1", "2", "3", "4"}));
    // Counts up to 1.4: a quarter is 0.35, the tidy step is 0.5, so 0–1.5.
    d = scaleDomain(MetricKind::Count, {1.4});
    QCOMPARE(scaleLabels(MetricKind::Count, d), (QStringList{"0.0", "0.5", "1.0", "1.5"}));
    // No values: a unit scale.
    d = scaleDomain(MetricKind::Exposure, {NAN});
    QCOMPARE(d.low, 0.0);
    QCOMPARE(d.high, 1.0);
    QCOMPARE(d.position(NAN), 0.0);
}

void DesktopTest::valueTexts() {
    using model::MetricKind;
    QCOMPARE(valueText(MetricKind::Rate, 0.523), QStringLiteral("52.3%"));
    QCOMPARE(valueText(MetricKind::Count, 3.0), QStringLiteral("3"));    // one match: whole
    QCOMPARE(valueText(MetricKind::Count, 6.8), QStringLiteral("6.8"));  // 34 in 5 matches
    QCOMPARE(valueText(MetricKind::Exposure, 0.153), QStringLiteral("0.15"));
    QCOMPARE(valueText(MetricKind::Count, NAN), QStringLiteral("–"));
    QCOMPARE(intervalText(MetricKind::Rate, {0.401, 0.642}), QStringLiteral("40.1–64.2%"));
    QCOMPARE(intervalText(MetricKind::Count, {5.0, 9.05}), QStringLiteral("5.0–9.1"));
    QCOMPARE(zoneText(0, 0, model::ZoneGrid{}), QStringLiteral("Whole pitch"));
    QCOMPARE(zoneText(2, 5, model::ZoneGrid{}), QStringLiteral("Our left-back area (B2·L5)"));
    QCOMPARE(zoneText(2, 4, model::ZoneGrid{}), QStringLiteral("Left half-space in our third (B2·L4)"));
    QCOMPARE(levelText(0.9), QStringLiteral("90% interval"));
    QCOMPARE(certaintyText(0.9996), QStringLiteral("P(miss) > 0.999"));
    QCOMPARE(certaintyText(0.64), QStringLiteral("P(miss) 0.64"));
    QVERIFY(certaintyText(NAN).isEmpty());
}

void DesktopTest::clubFileChoice() {
    QTemporaryDir dir;
    const QString user = dir.filePath(QStringLiteral("data/club.sqlite"));
    const QString demo = dir.filePath(QStringLiteral("demo.sqlite"));
    const QString missingDemo = dir.filePath(QStringLiteral("missing.sqlite"));
    // Nothing exists: the user's file, to be created.
    auto c = chooseClubFile({}, user, {missingDemo, demo});
    QCOMPARE(c.file, user);
    QVERIFY(!c.demo);
    // A demo club exists and the user has none: the demo.
    QFile(demo).open(QIODevice::WriteOnly);
    c = chooseClubFile({}, user, {missingDemo, demo});
    QCOMPARE(c.file, demo);
    QVERIFY(c.demo);
    // The user's own file wins over the demo once it exists.
    QVERIFY(QDir().mkpath(dir.filePath(QStringLiteral("data"))));
    QFile(user).open(QIODevice::WriteOnly);
    c = chooseClubFile({}, user, {demo});
    QCOMPARE(c.file, user);
    QVERIFY(!c.demo);
    // --db wins over everything, existing or not; $PITCHLOOP_DB when --db is not given.
    c = chooseClubFile(QStringLiteral("/x/other.sqlite"), user, {demo});
    QCOMPARE(c.file, QStringLiteral("/x/other.sqlite"));
    QVERIFY(!c.demo);
    qputenv("PITCHLOOP_DB", "/x/from-env.sqlite");
    QCOMPARE(explicitClubFile(QString()), QStringLiteral("/x/from-env.sqlite"));
    QCOMPARE(explicitClubFile(QStringLiteral("/x/option.sqlite")), QStringLiteral("/x/option.sqlite"));
    qunsetenv("PITCHLOOP_DB");
    QVERIFY(explicitClubFile(QString()).isEmpty());
}

void DesktopTest::pitchGeometry() {
    PitchGeometry g; // 105 × 68, 6 × 5 equal zones
    QCOMPARE(g.bands(), 6);
    QCOMPARE(g.lanes(), 5);
    QCOMPARE(g.bandEdges().size(), 7);
    QCOMPARE(g.bandEdges().back(), 105.0);
    // The zones tile the pitch: their areas add up to 105 × 68 = 7140 m².
    double area = 0;
    for (int band = 1; band <= 6; ++band)
        for (int lane = 1; lane <= 5; ++lane) {
            const QRectF r = g.zoneRect(band, lane);
            area += r.width() * r.height();
            // The centre of each zone's rectangle lies in that zone.
            QCOMPARE(g.zoneAt(r.center().x(), r.center().y()), QPoint(band, lane));
        }
    QVERIFY(std::abs(area - 105.0 * 68.0) < 1e-9);
    // Lane 1 is at our right touchline, drawn at the bottom: its rectangle ends at the bottom
    // edge of the pitch (margin + width); band 1 starts at our goal line (the margin).
    const QRectF corner = g.zoneRect(1, 1);
    QCOMPARE(corner.left(), g.margin());
    QCOMPARE(corner.bottom(), g.margin() + 68.0);
    QVERIFY(g.zoneRect(0, 0).isEmpty());
    QCOMPARE(g.zoneAt(0.5, 0.5), QPoint(0, 0)); // in the margin, off the pitch
    // Law 1 markings are all there: 4 corner arcs, 2 penalty arcs and the centre circle as arcs.
    const QString path = g.markingsPath(5);
    QCOMPARE(path.count(QLatin1Char('A')), 4 + 2 + 2);
    QCOMPARE(g.spotsPath(5).count(QLatin1Char('M')), 3); // centre mark and two penalty marks
    g.setGrid(QStringLiteral("markings:6"));
    QCOMPARE(g.grid(), QStringLiteral("markings:6"));
    // Markings lanes: the middle lane is the goal area's width, 18.32 m (Law 1).
    const auto lanes = g.laneEdges();
    QVERIFY(std::abs((lanes[3] - lanes[2]) - 18.32) < 1e-9);
}

void DesktopTest::pitchClickMapsToZone() {
    QQuickView view;
    view.engine()->addImportPath(QStringLiteral("qrc:/qt/qml"));
    view.setSource(QUrl::fromLocalFile(kSource + QStringLiteral("/tests/desktop/pitch_host.qml")));
    QCOMPARE(view.status(), QQuickView::Ready);
    view.show();
    QVERIFY(QTest::qWaitForWindowExposed(&view));
    auto* map = view.rootObject()->findChild<QQuickItem*>(QStringLiteral("map"));
    QVERIFY(map);
    QSignalSpy clicked(map, SIGNAL(zoneClicked(int, int)));

    const double scale = map->property("pxPerMetre").toDouble();
    const double margin = 2.5, length = 105, width = 68;
    const double left = (map->width() - (length + 2 * margin) * scale) / 2;
    const double top = (map->height() - (width + 2 * margin) * scale) / 2;
    // A point given as metres from our goal line (x) and from our right touchline (y).
    const auto pixel = [&](double x, double y) {
        return QPoint(static_cast<int>(std::lround(left + (margin + x) * scale)),
                      static_cast<int>(std::lround(top + (margin + width - y) * scale)));
    };

    // By hand: 80 m upfield is band 5 (80 / 17.5 = 4.6), 10 m from our right touchline is
    // lane 1 (10 / 13.6 = 0.7), drawn in the lower half since we attack left to right.
    const QPoint p = pixel(80, 10);
    QVERIFY(p.y() > map->height() / 2 && p.x() > map->width() / 2);
    QTest::mouseClick(&view, Qt::LeftButton, {}, p);
    QCOMPARE(clicked.count(), 1);
    QCOMPARE(clicked.takeFirst(), (QList<QVariant>{5, 1}));
    // 10 m from our goal line, 60 m from our right touchline: band 1, lane 5, top left.
    QTest::mouseClick(&view, Qt::LeftButton, {}, pixel(10, 60));
    QCOMPARE(clicked.takeFirst(), (QList<QVariant>{1, 5}));

    // A sweep over the pitch agrees with model::ZoneGrid::zoneOf, away from the zone lines
    // (a pixel is about 0.2 m here).
    const model::ZoneGrid grid;
    const model::Pitch pitch{length, width};
    const auto nearLine = [](double v, const std::vector<double>& edges) {
        for (double e : edges)
            if (std::abs(v - e) < 0.6) return true;
        return false;
    };
    int checked = 0;
    for (double x = 1.3; x < length; x += 6.1)
        for (double y = 1.7; y < width; y += 5.3) {
            if (nearLine(x, grid.bandEdges(pitch)) || nearLine(y, grid.laneEdges(pitch))) continue;
            QTest::mouseClick(&view, Qt::LeftButton, {}, pixel(x, y));
            QCOMPARE(clicked.count(), 1);
            const model::Zone z = grid.zoneOf({x, y}, pitch);
            QCOMPARE(clicked.takeFirst(), (QList<QVariant>{z.band, z.lane}));
            ++checked;
        }
    QVERIFY(checked > 150);

    // Beyond the goal line, in the drawn margin: no zone, no signal.
    QTest::mouseClick(&view, Qt::LeftButton, {}, pixel(-1.5, 30));
    QCOMPARE(clicked.count(), 0);
}

void DesktopTest::pitchHoverShowsNumbers() {
    MatchDebrief debrief;
    debrief.setMetricId(QStringLiteral("regain_5s"));
    debrief.setSession(&m_session);
    QQuickView view;
    view.engine()->addImportPath(QStringLiteral("qrc:/qt/qml"));
    view.setSource(QUrl::fromLocalFile(kSource + QStringLiteral("/tests/desktop/pitch_host.qml")));
    QCOMPARE(view.status(), QQuickView::Ready);
    view.show();
    QVERIFY(QTest::qWaitForWindowExposed(&view));
    auto* map = view.rootObject()->findChild<QQuickItem*>(QStringLiteral("map"));
    QVERIFY(map);
    map->setProperty("zones", QVariant::fromValue(debrief.windowMap()));
    QCOMPARE(map->property("captionText").toString(), QString()); // nothing hovered or picked

    // Hover the middle of band 5, lane 1 (x 70–87.5 m, y 0–13.6 m).
    const double scale = map->property("pxPerMetre").toDouble();
    const double left = (map->width() - 110 * scale) / 2, top = (map->height() - 73 * scale) / 2;
    const QPoint p(static_cast<int>(left + (2.5 + 78.75) * scale),
                   static_cast<int>(top + (2.5 + 68 - 6.8) * scale));
    QTest::mouseMove(&view, p);
    const QVariantMap zone = debrief.windowMap()->zone(5, 1);
    QTRY_VERIFY(map->property("captionText").toString().startsWith(QStringLiteral("Right wing in their third (B5·L1)")));
    const QString caption = map->property("captionText").toString();
    QVERIFY2(caption.contains(zone.value(QStringLiteral("valueText")).toString()), qPrintable(caption));
    // The zone's own count beside its pooled value.
    QVERIFY2(caption.contains(zone.value(QStringLiteral("rawText")).toString()), qPrintable(caption));
    QVERIFY2(caption.contains(QStringLiteral("90% interval ") +
                              zone.value(QStringLiteral("intervalText")).toString()),
             qPrintable(caption));

    // Picked but not hovered (the pointer in the margin beyond our goal line): the picked
    // zone's numbers.
    QTest::mouseMove(&view, QPoint(static_cast<int>(left + 1.0 * scale), p.y()));
    map->setProperty("selectedBand", 2);
    map->setProperty("selectedLane", 3);
    QTRY_VERIFY(map->property("captionText").toString().startsWith(QStringLiteral("In front of our box (B2·L3)")));
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<DesktopTest>(argc, argv, "desktop_tests");
}

#include "desktop_test.moc"
