// Tests of the targets page's controller on a club file with two seasons: saves write one new
// version per zone, read back through a separate model::ClubRepository; a refused save keeps
// the form; retire, copy from last season and undo are real writes, read back the same way;
// last season's value beside each zone equals the model's season window sum; the selection
// and the history. Every list model runs under QAbstractItemModelTester.
//
// The club: demo matches 1–6 as season 2026-27 with the demo targets (sample-club/targets.json),
// and demo matches 7–10 moved one year back (ids KB-2025-07…10, dates in 2025) as season
// 2025-26, with two invented 2025-26 targets.

#include "modelcheck.h"
#include "clubsession.h"
#include "display.h"
#include "ingest.h"
#include "repository.h"
#include "status.h"
#include "targethistorymodel.h"
#include "targets.h"
#include "targetsview.h"
#include "targetzonemodel.h"
#include "zonemapmodel.h"
#include "testmain.h"

#include <QAbstractItemModelTester>
#include <QFile>
#include <QGuiApplication>
#include <QLocale>
#include <QRegularExpression>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QtQml/qqmlextensionplugin.h>

#include <cmath>
#include <memory>

Q_IMPORT_QML_PLUGIN(PitchloopPlugin)

using namespace pitchloop;
using namespace pitchloop::desktop;

using pitchloop::desktop::testing::watch;
using pitchloop::desktop::testing::role;

namespace {

const QString kSource = QStringLiteral(PITCHLOOP_SOURCE_DIR);
const std::string kSquad = "First team";

QString demoMatch(int n) {
    return QStringLiteral("%1/sample-club/matches/KB-2026-%2.json").arg(kSource).arg(n, 2, 10, QLatin1Char('0'));
}

/// The row of a zone in the editor's zone list, -1 when absent.
int zoneRow(const TargetZoneModel& zones, int band, int lane) {
    for (int row = 0; row < zones.rowCount(); ++row)
        if (role(zones, row, "band").toInt() == band && role(zones, row, "lane").toInt() == lane) return row;
    return -1;
}

model::Target previousTarget(const std::string& metric, int band, int lane, double value) {
    model::Target t;
    t.key = {kSquad, "2025-26", metric, band, lane};
    t.direction = model::Direction::AtLeast;
    t.value = value;
    t.watchMargin = 0.05;
    t.minSample = 30;
    t.author = "R. Tamsin (assistant)";
    t.rationale = "invented for the test";
    t.effectiveFrom = "2025-07-01";
    return t;
}

} // namespace

class TargetsViewTest : public QObject {
    Q_OBJECT

private slots:
    void init();
    void cleanup();
    void defaultsToTheLatestSeason();
    void lastSeasonIsTheModelsSeasonSum();
    void noPreviousSeasonSaysSo();
    void selection();
    void formFillsFromTheZonesTarget();
    void saveWritesOneVersionPerZone();
    void refusedSaveKeepsTheForm();
    void undoPutsBackTheEarlierVersion();
    void undoRetiresANewTarget();
    void retireAndUndo();
    void copyFromLastSeason();
    void historyListsEveryVersion();
    void formNumbers();

private:
    std::vector<model::Target> stored(const std::string& season = "2026-27") const {
        return model::ClubRepository(m_file.toStdString()).targets(kSquad, season);
    }
    std::vector<model::Target> storedOf(const std::string& metric, int band, int lane) const {
        std::vector<model::Target> out;
        for (const auto& t : stored())
            if (t.key.metric == metric && t.key.band == band && t.key.lane == lane) out.push_back(t);
        return out;
    }

    std::unique_ptr<QTemporaryDir> m_dir;
    QString m_file;
    std::unique_ptr<ClubSession> m_session;
    std::unique_ptr<TargetsView> m_view;
    std::vector<std::unique_ptr<QAbstractItemModelTester>> m_testers;
};

void TargetsViewTest::init() {
    m_dir = std::make_unique<QTemporaryDir>();
    QVERIFY(m_dir->isValid());
    m_file = m_dir->filePath(QStringLiteral("club.sqlite"));
    {
        model::ClubRepository repo(m_file.toStdString());
        for (int n = 1; n <= 6; ++n) QVERIFY(model::ingestFile(repo, demoMatch(n).toStdString()).ok());
        for (int n = 7; n <= 10; ++n) {
            QFile f(demoMatch(n));
            QVERIFY(f.open(QIODevice::ReadOnly));
            QString text = QString::fromUtf8(f.readAll());
            text.replace(QStringLiteral("\"KB-2026-"), QStringLiteral("\"KB-2025-"));
            text.replace(QRegularExpression(QStringLiteral("\"date\": \"2026-")), QStringLiteral("\"date\": \"2025-"));
            const auto report = model::ingestBytes(repo, text.toStdString(), "moved.json");
            QVERIFY2(report.ok(), model::describeAll(report.errors).c_str());
        }
        QFile targets(kSource + QStringLiteral("/sample-club/targets.json"));
        QVERIFY(targets.open(QIODevice::ReadOnly));
        const auto grid = repo.tallyGrid();
        const auto parsed = model::parseTargetFile(targets.readAll().toStdString(), "targets.json",
                                                   repo.metrics(), grid.bands(), grid.lanes());
        QVERIFY(parsed.errors.empty());
        repo.addTargets(parsed.targets, "2026-07-20T10:00:00Z");
        repo.addTargets({previousTarget("regain_5s", 4, 3, 0.5), previousTarget("regain_5s", 5, 1, 0.4)},
                        "2025-07-02T10:00:00Z");
        QCOMPARE(repo.seasons(kSquad), (std::vector<std::string>{"2025-26", "2026-27"}));
    }
    m_session = std::make_unique<ClubSession>();
    QVERIFY(m_session->open(m_file));
    m_view = std::make_unique<TargetsView>();
    m_testers.clear();
    m_testers.push_back(watch(m_view->zones()));
    m_testers.push_back(watch(m_view->history()));
    m_testers.push_back(watch(m_view->lastSeasonMap()));
    m_view->setToday(QStringLiteral("2026-11-15"));
    m_view->setSession(m_session.get());
    QVERIFY2(m_view->errorString().isEmpty(), qPrintable(m_view->errorString()));
}

void TargetsViewTest::cleanup() {
    m_testers.clear();
    m_view.reset();
    m_session.reset();
    m_dir.reset();
}

void TargetsViewTest::defaultsToTheLatestSeason() {
    QCOMPARE(m_view->season(), QStringLiteral("2026-27"));
    QCOMPARE(m_view->previousSeason(), QStringLiteral("2025-26"));
    QVERIFY(m_view->hasPreviousSeason());
    QVERIFY(m_view->seasonOptions().contains(QStringLiteral("2025-26")));
    QVERIFY(m_view->seasonOptions().contains(QStringLiteral("2027-28"))); // to prepare the next
    QCOMPARE(m_view->zones()->rowCount(), m_session->grid().zoneCount());
    QCOMPARE(m_view->asOfText(), QStringLiteral("Targets in force on Sun 15 Nov 2026"));
}

void TargetsViewTest::lastSeasonIsTheModelsSeasonSum() {
    model::ClubRepository repo(m_file.toStdString());
    const model::SeasonTallies last = repo.seasonTallies(kSquad, "2025-26");
    QCOMPARE(last.matchIds.size(), std::size_t(4));
    const model::ZoneGrid grid = repo.tallyGrid();
    for (const char* metricId : {"regain_5s", "pre_shot_passes_against"}) {
        m_view->setMetricId(QString::fromLatin1(metricId));
        QCOMPARE(m_view->metricId(), QString::fromLatin1(metricId));
        const model::MetricKind kind = repo.metric(metricId)->kind();
        const auto& tallies = last.byMetric.at(metricId);
        double wholeNum = 0, wholeDen = 0;
        for (int i = 0; i < grid.zoneCount(); ++i) {
            std::vector<model::ZoneTally> series;
            for (const auto& match : tallies) series.push_back(match[static_cast<std::size_t>(i)]);
            const model::WindowSum sum = model::windowSum(series, series.size() - 1,
                                                          model::Window{model::Window::Kind::Season, 0, 0.3});
            QCOMPARE(sum.matches, 4);
            wholeNum += sum.num;
            wholeDen += sum.den;
            const model::Zone z = grid.zoneAt(i);
            const int row = zoneRow(*m_view->zones(), z.band, z.lane);
            QVERIFY(row >= 0);
            QVERIFY(role(*m_view->zones(), row, "hasLastSeason").toBool());
            const QString expected = valueText(kind, sum.den > 0 ? sum.num / sum.den : std::nan(""));
            QCOMPARE(role(*m_view->zones(), row, "lastSeasonText").toString(), expected);
            // The heat map's own value for the zone is the same number (its colour is pooled).
            const QVariantMap cell = m_view->lastSeasonMap()->zone(z.band, z.lane);
            if (sum.den > 0) QCOMPARE(cell.value(QStringLiteral("raw")).toDouble(), sum.num / sum.den);
        }
        if (kind == model::MetricKind::Rate) // the whole pitch pools every zone's items
            QCOMPARE(m_view->wholePitchLastSeasonText(), valueText(kind, wholeNum / wholeDen));
    }
    QVERIFY(m_view->lastSeasonText().contains(QStringLiteral("2025-26")));
    QVERIFY(m_view->lastSeasonText().contains(QStringLiteral("4 matches")));
}

void TargetsViewTest::noPreviousSeasonSaysSo() {
    m_view->setSeason(QStringLiteral("2025-26"));
    QCOMPARE(m_view->previousSeason(), QStringLiteral("2024-25"));
    QVERIFY(!m_view->hasPreviousSeason());
    QVERIFY(m_view->lastSeasonText().startsWith(QStringLiteral("No 2024-25 season")));
    QCOMPARE(m_view->lastSeasonMap()->rowCount(), 0);
    for (int row = 0; row < m_view->zones()->rowCount(); ++row)
        QVERIFY(!role(*m_view->zones(), row, "hasLastSeason").toBool());
    QVERIFY(!m_view->canCopy());
    QVERIFY(!m_view->copyFromPreviousSeason());
}

void TargetsViewTest::selection() {
    QSignalSpy changed(m_view.get(), &TargetsView::selectionChanged);
    m_view->selectZone(2, 5, false);
    QCOMPARE(m_view->selectedZones(), QStringList{QStringLiteral("2,5")});
    m_view->selectZone(3, 5, true);
    QCOMPARE(m_view->selectedZones(), QStringList({QStringLiteral("2,5"), QStringLiteral("3,5")}));
    QVERIFY(role(*m_view->zones(), zoneRow(*m_view->zones(), 3, 5), "selected").toBool());
    m_view->selectZone(2, 5, true); // Shift+click on a selected zone takes it out
    QCOMPARE(m_view->selectedZones(), QStringList{QStringLiteral("3,5")});
    QVERIFY(!role(*m_view->zones(), zoneRow(*m_view->zones(), 2, 5), "selected").toBool());
    m_view->selectArea(2, 3, 1, 1, false); // corners in either order
    QCOMPARE(m_view->selectedZones(),
             QStringList({QStringLiteral("1,1"), QStringLiteral("1,2"), QStringLiteral("1,3"),
                          QStringLiteral("2,1"), QStringLiteral("2,2"), QStringLiteral("2,3")}));
    m_view->selectArea(6, 5, 6, 5, true);
    QCOMPARE(m_view->selectedCount(), 7);
    m_view->selectZone(0, 0, false);
    QVERIFY(m_view->wholePitchSelected());
    QCOMPARE(m_view->selectedZones(), QStringList{QStringLiteral("0,0")});
    m_view->selectZone(9, 9, false); // not on the grid: ignored
    QCOMPARE(m_view->selectedZones(), QStringList{QStringLiteral("0,0")});
    m_view->clearSelection();
    QCOMPARE(m_view->selectedCount(), 0);
    QVERIFY(changed.count() >= 7);
}

void TargetsViewTest::formFillsFromTheZonesTarget() {
    // sample-club/targets.json: pre_shot_passes_against in band 2, lane 5 is at most 2.0 a match.
    m_view->setMetricId(QStringLiteral("pre_shot_passes_against"));
    m_view->selectZone(2, 5, false);
    QCOMPARE(m_view->valueText(), QStringLiteral("2"));
    QCOMPARE(m_view->direction(), 1);
    QCOMPARE(m_view->focusTargetText(), QStringLiteral("≤ 2 in force since 1 Jul 2026"));
    QCOMPARE(role(*m_view->zones(), zoneRow(*m_view->zones(), 2, 5), "targetText").toString(), QStringLiteral("≤ 2"));
    // A typed value survives another click; a zone without a target then starts empty.
    m_view->setValueText(QStringLiteral("1.5"));
    m_view->selectZone(6, 5, false);
    QCOMPARE(m_view->valueText(), QStringLiteral("1.5"));
    m_view->setMetricId(QStringLiteral("regain_5s")); // another metric: the form starts over
    QCOMPARE(m_view->valueText(), QString());
    QCOMPARE(m_view->direction(), 0); // more regains is better
    QCOMPARE(m_view->effectiveFrom(), QStringLiteral("2026-11-15"));
    QVERIFY(m_view->isRate());
    QCOMPARE(m_view->unitText(), QStringLiteral("%"));
    // The minimum sample counts what the metric counts (model/wording itemsWord), not "items".
    QCOMPARE(m_view->sampleUnitText(), QStringLiteral("losses"));
}

void TargetsViewTest::saveWritesOneVersionPerZone() {
    const std::size_t before = stored().size();
    m_view->setMetricId(QStringLiteral("regain_5s"));
    m_view->selectZone(4, 2, false);
    m_view->selectZone(4, 3, true);
    m_view->setValueText(QStringLiteral("45%"));
    m_view->setMarginText(QStringLiteral("4"));
    m_view->setMinSampleText(QStringLiteral("25"));
    m_view->setAuthor(QStringLiteral("R. Tamsin (assistant)"));
    m_view->setRationale(QStringLiteral("win it back high"));
    m_view->setEffectiveFrom(QStringLiteral("2026-10-01"));
    QSignalSpy reloaded(m_session.get(), &ClubSession::opened);
    QVERIFY2(m_view->save(), qPrintable(m_view->formError()));
    QVERIFY(m_view->formError().isEmpty());
    QCOMPARE(reloaded.count(), 1);

    const auto all = stored();
    QCOMPARE(all.size(), before + 2);
    for (int lane : {2, 3}) {
        const auto versions = storedOf("regain_5s", 4, lane);
        QCOMPARE(versions.size(), std::size_t(1));
        const model::Target& t = versions.front();
        QCOMPARE(t.value, 0.45);
        QVERIFY(t.direction == model::Direction::AtLeast);
        QCOMPARE(t.watchMargin, 0.04);
        QCOMPARE(t.minSample, 25L);
        QCOMPARE(t.author, std::string("R. Tamsin (assistant)"));
        QCOMPARE(t.rationale, std::string("win it back high"));
        QCOMPARE(t.effectiveFrom, std::string("2026-10-01"));
        QVERIFY(!t.recordedAt.empty());
        QCOMPARE(model::inForce(versions, "2026-11-15")->value, 0.45);
        QCOMPARE(role(*m_view->zones(), zoneRow(*m_view->zones(), 4, lane), "targetText").toString(),
                 QStringLiteral("≥ 45.0%"));
    }
    QVERIFY(m_view->canUndo());
    QVERIFY(m_view->statusText().startsWith(QStringLiteral("Saved: set 2 targets")));
    QCOMPARE(m_view->valueText(), QStringLiteral("45%")); // the form keeps what was typed
}

void TargetsViewTest::refusedSaveKeepsTheForm() {
    const std::size_t before = stored().size();
    m_view->setMetricId(QStringLiteral("regain_5s"));
    m_view->selectZone(4, 2, false);
    m_view->setValueText(QStringLiteral("45 percent"));
    m_view->setMarginText(QStringLiteral("-1"));
    m_view->setAuthor(QString());
    m_view->setEffectiveFrom(QStringLiteral("1 Oct"));
    QVERIFY(!m_view->save());
    const QString error = m_view->formError();
    QVERIFY2(error.contains(QStringLiteral("Value “45 percent”")), qPrintable(error));
    QVERIFY2(error.contains(QStringLiteral("Margin “-1”")), qPrintable(error));
    QVERIFY2(error.contains(QStringLiteral("Author")), qPrintable(error));
    QVERIFY2(error.contains(QStringLiteral("Effective from “1 Oct”")), qPrintable(error));
    QCOMPARE(m_view->valueText(), QStringLiteral("45 percent"));
    QCOMPARE(m_view->effectiveFrom(), QStringLiteral("1 Oct"));
    QCOMPARE(stored().size(), before);
    QVERIFY(!m_view->canUndo());

    m_view->setValueText(QStringLiteral("140%")); // a share cannot pass 100%
    m_view->setMarginText(QString());
    m_view->setAuthor(QStringLiteral("R. Tamsin"));
    m_view->setEffectiveFrom(QStringLiteral("2026-10-01"));
    QVERIFY(!m_view->save());
    QVERIFY(m_view->formError().contains(QStringLiteral("percentage from 0 to 100")));
    m_view->clearSelection();
    m_view->setValueText(QStringLiteral("40"));
    QVERIFY(!m_view->save());
    QVERIFY(m_view->formError().startsWith(QStringLiteral("Zones: none selected")));
    QCOMPARE(stored().size(), before);
}

void TargetsViewTest::undoPutsBackTheEarlierVersion() {
    // sample-club/targets.json: band 2, lane 5 at most 2.0 a match from 1 Jul 2026.
    m_view->setMetricId(QStringLiteral("pre_shot_passes_against"));
    m_view->selectZone(2, 5, false);
    m_view->setValueText(QStringLiteral("1.5"));
    m_view->setAuthor(QStringLiteral("D. Arkwright"));
    m_view->setEffectiveFrom(QStringLiteral("2026-10-01"));
    QVERIFY(m_view->save());
    QCOMPARE(model::inForce(storedOf("pre_shot_passes_against", 2, 5), "2026-10-15")->value, 1.5);

    QVERIFY(m_view->undo());
    QVERIFY(!m_view->canUndo()); // one level
    QVERIFY(!m_view->undo());
    const auto versions = storedOf("pre_shot_passes_against", 2, 5);
    QCOMPARE(versions.size(), std::size_t(3)); // the original, the change, the undo: all kept
    QCOMPARE(model::inForce(versions, "2026-10-15")->value, 2.0);
    QCOMPARE(model::inForce(versions, "2026-08-01")->value, 2.0);
    QVERIFY(model::inForce(versions, "2026-10-15")->rationale.starts_with("undo: "));
    QCOMPARE(role(*m_view->zones(), zoneRow(*m_view->zones(), 2, 5), "targetText").toString(), QStringLiteral("≤ 2"));
    QCOMPARE(m_view->valueText(), QStringLiteral("2")); // the form shows what stands again
}

void TargetsViewTest::undoRetiresANewTarget() {
    m_view->setMetricId(QStringLiteral("regain_5s"));
    m_view->selectArea(4, 4, 4, 5, false);
    m_view->setValueText(QStringLiteral("30"));
    m_view->setAuthor(QStringLiteral("R. Tamsin"));
    QVERIFY(m_view->save());
    QCOMPARE(model::inForce(storedOf("regain_5s", 4, 4), "2026-11-15")->value, 0.30);
    QVERIFY(m_view->undo());
    for (int lane : {4, 5}) {
        const auto versions = storedOf("regain_5s", 4, lane);
        QCOMPARE(versions.size(), std::size_t(2));
        QVERIFY(!model::inForce(versions, "2026-11-15").has_value());
        QVERIFY(!role(*m_view->zones(), zoneRow(*m_view->zones(), 4, lane), "hasTarget").toBool());
    }
}

void TargetsViewTest::retireAndUndo() {
    m_view->setMetricId(QStringLiteral("pre_shot_passes_against"));
    m_view->selectZone(2, 1, false);
    m_view->setAuthor(QStringLiteral("D. Arkwright"));
    m_view->setRationale(QStringLiteral("the back four changed"));
    m_view->setEffectiveFrom(QStringLiteral("2026-10-01"));
    QVERIFY(m_view->retire());
    auto versions = storedOf("pre_shot_passes_against", 2, 1);
    QVERIFY(!model::inForce(versions, "2026-10-15").has_value());
    QCOMPARE(model::inForce(versions, "2026-09-15")->value, 2.0); // history untouched before
    QCOMPARE(role(*m_view->zones(), zoneRow(*m_view->zones(), 2, 1), "targetText").toString(), QStringLiteral("no target"));
    QVERIFY(m_view->undo());
    versions = storedOf("pre_shot_passes_against", 2, 1);
    QCOMPARE(model::inForce(versions, "2026-10-15")->value, 2.0);

    // A zone without a target has nothing to retire.
    m_view->selectZone(6, 5, false);
    QVERIFY(!m_view->retire());
    QVERIFY(m_view->formError().contains(QStringLiteral("nothing to retire")));
}

void TargetsViewTest::copyFromLastSeason() {
    QVERIFY(m_view->canCopy());
    QCOMPARE(m_view->copyText(), QStringLiteral("Copy 2 targets from 2025-26"));
    m_view->setMetricId(QStringLiteral("regain_5s"));
    m_view->setAuthor(QStringLiteral("P. Nwosu (analyst)"));
    QVERIFY2(m_view->copyFromPreviousSeason(), qPrintable(m_view->formError()));
    auto versions = storedOf("regain_5s", 4, 3);
    QCOMPARE(versions.size(), std::size_t(1));
    QCOMPARE(versions.front().value, 0.5);
    QCOMPARE(versions.front().effectiveFrom, std::string("2026-07-01"));
    QCOMPARE(versions.front().author, std::string("P. Nwosu (analyst)"));
    QCOMPARE(versions.front().rationale, std::string("copied from 2025-26: invented for the test"));
    // Band 5, lane 1 had this season's own 55% from 1 July; the copy (40%) takes its place.
    QCOMPARE(role(*m_view->zones(), zoneRow(*m_view->zones(), 5, 1), "targetText").toString(), QStringLiteral("≥ 40.0%"));
    QVERIFY(m_view->undo());
    QVERIFY(!model::inForce(storedOf("regain_5s", 4, 3), "2026-11-15").has_value());
    QCOMPARE(model::inForce(storedOf("regain_5s", 5, 1), "2026-11-15")->value, 0.55);
    QCOMPARE(stored("2025-26").size(), std::size_t(2)); // last season untouched
}

void TargetsViewTest::historyListsEveryVersion() {
    m_view->setMetricId(QStringLiteral("pre_shot_passes_against"));
    m_view->selectZone(2, 5, false);
    QCOMPARE(m_view->history()->rowCount(), 1);
    m_view->setValueText(QStringLiteral("1.5"));
    m_view->setAuthor(QStringLiteral("D. Arkwright"));
    m_view->setRationale(QStringLiteral("tighter after the autumn"));
    m_view->setEffectiveFrom(QStringLiteral("2026-10-01"));
    QVERIFY(m_view->save());
    const TargetHistoryModel& h = *m_view->history();
    QCOMPARE(h.rowCount(), 2);
    // Newest first; the new version is the one in force on 15 Nov.
    QCOMPARE(role(h, 0, "author").toString(), QStringLiteral("D. Arkwright"));
    QCOMPARE(role(h, 0, "rationale").toString(), QStringLiteral("tighter after the autumn"));
    QCOMPARE(role(h, 0, "effectiveText").toString(), QStringLiteral("from 1 Oct 2026"));
    QVERIFY(role(h, 0, "ruleText").toString().startsWith(QStringLiteral("≤ 1.5")));
    QVERIFY(role(h, 0, "inForce").toBool());
    QCOMPARE(role(h, 1, "recordedText").toString(), QStringLiteral("20 Jul 2026, 10:00 UTC"));
    QVERIFY(!role(h, 1, "inForce").toBool());
    QVERIFY(m_view->undo());
    QCOMPARE(h.rowCount(), 3);
    QVERIFY(role(h, 0, "inForce").toBool()); // the undo's copy of the original
    QVERIFY(role(h, 0, "ruleText").toString().startsWith(QStringLiteral("≤ 2")));
}

void TargetsViewTest::formNumbers() {
    QCOMPARE(parseFormNumber(QStringLiteral("45%"), true), std::optional<double>(0.45));
    QCOMPARE(parseFormNumber(QStringLiteral(" 45 "), true), std::optional<double>(0.45));
    QCOMPARE(parseFormNumber(QStringLiteral("12,5 %"), true), std::optional<double>(0.125));
    QCOMPARE(parseFormNumber(QStringLiteral("2.5"), false), std::optional<double>(2.5));
    QVERIFY(!parseFormNumber(QStringLiteral("2.5%"), false)); // a % makes no sense for a count
    QVERIFY(!parseFormNumber(QStringLiteral("%"), true));
    QVERIFY(!parseFormNumber(QStringLiteral("forty"), true));
    QVERIFY(!parseFormNumber(QString(), false));
}

int main(int argc, char* argv[]) {
    return pitchloop::desktop::testing::runDesktopTest<TargetsViewTest>(argc, argv, "targets_view_tests");
}

#include "targets_view_test.moc"
