#pragma once
// A club file for the planner and settings tests, built from the demo club's files with model/
// alone (as sample-club/prepare.cmake does with the command line): the first matches of the demo
// season, its targets, drill book and fixtures, and the story's focus (left-back zone 2,5 of
// pre_shot_passes_against after KB-2026-08, drills 6, 7 and 9 linked).

#include "drills.h"
#include "fixtures.h"
#include "focus.h"
#include "ingest.h"
#include "repository.h"
#include "sessions.h"
#include "targets.h"

#include <QFile>
#include <QString>

#include <stdexcept>
#include <string>

namespace plannertest {

inline std::string readAll(const QString& path) {
    QFile f(path);
    if (!f.open(QIODevice::ReadOnly)) throw std::runtime_error("cannot read " + path.toStdString());
    return f.readAll().toStdString();
}

/// Fills `file` with the demo season up to match `matches` (8 or more for the story's focus).
inline void prepareClub(const QString& source, const QString& file, int matches) {
    using namespace pitchloop::model;
    ClubRepository repo(file.toStdString());
    for (int i = 1; i <= matches; ++i) {
        const auto report = ingestFile(
            repo, QStringLiteral("%1/sample-club/matches/KB-2026-%2.json")
                      .arg(source)
                      .arg(i, 2, 10, QLatin1Char('0'))
                      .toStdString());
        if (!report.ok()) throw std::runtime_error("ingest failed: " + report.file);
    }
    const auto grid = repo.tallyGrid();
    const auto targets = parseTargetFile(readAll(source + "/sample-club/targets.json"),
                                         "targets.json", repo.metrics(), grid.bands(), grid.lanes());
    if (!targets.errors.empty()) throw std::runtime_error("targets.json");
    repo.addTargets(targets.targets, "2026-07-20T10:00:00Z");
    DrillBook book(repo);
    const auto drills = parseDrillFile(readAll(source + "/sample-club/drills.json"), "drills.json",
                                       repo.metrics(), grid);
    if (!drills.errors.empty()) throw std::runtime_error("drills.json");
    if (!book.importDrills(drills.drills, "2026-07-20T10:00:00Z").errors.empty())
        throw std::runtime_error("drill import");
    const auto fixtures = parseFixtureFile(readAll(source + "/sample-club/fixtures.csv"), "fixtures.csv");
    if (!fixtures.errors.empty()) throw std::runtime_error("fixtures.csv");
    if (!FixtureStore(repo).importFixtures("First team", fixtures.fixtures).errors.empty())
        throw std::runtime_error("fixture import");
    if (matches < 8) return;

    const SeasonTallies season = repo.seasonTallies("First team", "2026-27");
    std::size_t focal = 0;
    for (std::size_t i = 0; i < season.matchIds.size(); ++i)
        if (season.matchIds[i] == "KB-2026-08") focal = i;
    const auto metric = repo.metric("pre_shot_passes_against");
    if (!metric) throw std::runtime_error("no metric pre_shot_passes_against");
    Focus f;
    f.squad = "First team";
    f.season = "2026-27";
    f.metric = metric->id;
    f.zones = {{2, 5}};
    f.openedAfterMatch = "KB-2026-08";
    f.startDate = addDays(season.dates[focal], 1);
    f.evidence = focusEvidence(season, focal, *metric, repo.targets("First team", "2026-27"), grid,
                               repo.flagSettings(), f.zones, false, "2026-09-27T09:00:00Z")
                     .json;
    f.note = "their right side keeps overloading our left back";
    f.openedBy = "Test coach";
    f.drills = {6, 7, 9};
    FocusStore(repo).open(f, "2026-09-27T09:00:00Z");
}

} // namespace plannertest
