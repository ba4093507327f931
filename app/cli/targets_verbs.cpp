#include "commands.h"
#include "format.h"
#include "matchreader.h"
#include "verbs.h"

#include <nlohmann/json.hpp>

#include <cmath>
#include <cstdio>
#include <map>

namespace pitchloop::cli {

using namespace pitchloop::model;

TargetVerbs::TargetVerbs(CLI::App& app) {
    m_group = app.add_subcommand("targets", "Season targets: set, retire, list, history, copy, "
                                            "import, export");
    m_group->require_subcommand(1);
    auto common = [this](CLI::App* sub) {
        sub->add_option("--squad", m_squad, "Squad")->capture_default_str();
        sub->add_option("--season", m_season, "Season, e.g. 2026-27 (default: today's season)");
    };
    auto key = [this](CLI::App* sub) {
        sub->add_option("--metric", m_metric, "Metric id (see: pitchloop metrics list)")->required();
        sub->add_option("--zone", m_zones, "Zone as BAND,LANE (repeat for several)");
        sub->add_flag("--all-zones", m_allZones, "Every zone of the grid");
        sub->add_flag("--whole-pitch", m_wholePitch, "The metric over the whole pitch");
        sub->add_option("--author", m_author, "Who sets it")->required();
        sub->add_option("--why", m_why, "One-line rationale");
        sub->add_option("--from", m_from, "Date from which it is in force (default: today)");
    };
    m_set = m_group->add_subcommand("set", "Set (or change) a target; earlier versions are kept");
    common(m_set);
    key(m_set);
    m_set->add_option("--value", m_value, "Target value: a share for rates (0.45 or 45%), "
                                          "a number per match or per exposure otherwise")
        ->required();
    m_set->add_option("--direction", m_direction, "at_least or at_most (default: from the metric)")
        ->check(CLI::IsMember({"at_least", "at_most"}));
    m_set->add_option("--margin", m_margin, "Watch margin on the good side of the target");
    m_set->add_option("--min-sample", m_minSample, "Too little data below this denominator");

    m_retire = m_group->add_subcommand("retire", "End a target from a date (history is kept)");
    common(m_retire);
    key(m_retire);

    m_list = m_group->add_subcommand("list", "Targets in force on a date");
    common(m_list);
    m_list->add_option("--on", m_on, "Date (default: today)");
    m_list->add_option("--format", m_format)->check(CLI::IsMember({"table", "csv", "json"}));

    m_history = m_group->add_subcommand("history", "Every version of the season's targets");
    common(m_history);
    m_history->add_option("--metric", m_metric, "Only this metric");
    m_history->add_option("--format", m_format)->check(CLI::IsMember({"table", "csv", "json"}));

    m_copy = m_group->add_subcommand("copy-season", "Copy a season's targets into the next, "
                                                    "with last season's achieved values");
    m_copy->add_option("--squad", m_squad, "Squad")->capture_default_str();
    m_copy->add_option("--from-season", m_fromSeason, "Season to copy from")->required();
    m_copy->add_option("--to-season", m_toSeason, "Season to copy into")->required();
    m_copy->add_option("--author", m_author, "Who copies them")->required();

    m_import = m_group->add_subcommand("import", "Add target versions from a JSON file "
                                                 "(docs/targets.md); exact repeats are skipped");
    m_import->add_option("file", m_file)->required();
    m_export = m_group->add_subcommand("export", "Write target versions as JSON (all seasons, "
                                                 "or --season)");
    common(m_export);
}

int TargetVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    if (m_season.empty()) m_season = seasonOf(today());
    if (!isSeasonName(m_season)) {
        err << "error: --season " << m_season << ": expected a season such as 2026-27\n";
        return kExitBadInput;
    }
    if (m_set->parsed()) return runSet(*repo, false, err);
    if (m_retire->parsed()) return runSet(*repo, true, err);
    if (m_list->parsed()) return runList(*repo, false, out, err);
    if (m_history->parsed()) return runList(*repo, true, out, err);
    if (m_copy->parsed()) return runCopy(*repo, out, err);
    if (m_import->parsed()) return runImport(*repo, err);
    if (m_export->parsed()) return runExport(*repo, out);
    return kExitOk;
}

int TargetVerbs::runSet(ClubRepository& repo, bool retire, std::ostream& err) {
    const auto metric = repo.metric(m_metric);
    if (!metric) {
        err << "error: --metric: no metric '" << m_metric << "' (see: pitchloop metrics list)\n";
        return kExitBadInput;
    }
    const ZoneGrid grid = repo.tallyGrid();
    std::vector<Zone> zones;
    for (const auto& text : m_zones) {
        auto z = parseZone(text);
        if (!z || z->band > grid.bands() || z->lane > grid.lanes()) {
            err << "error: --zone " << text << ": expected BAND,LANE within the " << grid.name()
                << " grid (bands 1–" << grid.bands() << ", lanes 1–" << grid.lanes() << ")\n";
            return kExitBadInput;
        }
        zones.push_back(*z);
    }
    if (m_allZones)
        for (int i = 0; i < grid.zoneCount(); ++i) zones.push_back(grid.zoneAt(i));
    if (m_wholePitch) zones.push_back({0, 0});
    if (zones.empty()) {
        err << "error: say where: --zone BAND,LANE (repeatable), --all-zones or --whole-pitch\n";
        return kExitBadInput;
    }
    const std::string from = m_from.empty() ? today() : m_from;
    if (!isIsoDate(from)) {
        err << "error: --from " << from << ": expected a date YYYY-MM-DD\n";
        return kExitBadInput;
    }
    Target base;
    base.key.squad = m_squad;
    base.key.season = m_season;
    base.key.metric = metric->id;
    base.direction = defaultDirection(*metric);
    base.watchMargin = defaultWatchMargin(metric->kind());
    base.minSample = defaultMinSample(metric->kind());
    base.author = m_author;
    base.rationale = m_why;
    base.effectiveFrom = from;
    base.retired = retire;
    if (!retire) {
        auto value = parseNumber(m_value);
        if (!value || *value < 0 || (metric->kind() == MetricKind::Rate && *value > 1)) {
            err << "error: --value " << m_value << ": "
                << (metric->kind() == MetricKind::Rate
                        ? "a rate target is a share from 0 to 1 (0.45) or a percentage (45%)"
                        : "expected a number ≥ 0")
                << "\n";
            return kExitBadInput;
        }
        base.value = *value;
        if (!m_direction.empty()) base.direction = *directionFromString(m_direction);
        if (!m_margin.empty()) {
            auto margin = parseNumber(m_margin);
            if (!margin || *margin < 0) {
                err << "error: --margin " << m_margin << ": expected a number ≥ 0\n";
                return kExitBadInput;
            }
            base.watchMargin = *margin;
        }
        if (m_set->count("--min-sample") > 0 && m_minSample < 0) {
            err << "error: --min-sample " << m_minSample << ": expected a whole number ≥ 0\n";
            return kExitBadInput;
        }
        if (m_minSample >= 0) base.minSample = m_minSample;
    } else {
        // A retirement keeps the last value for the record; it carries no target of its own.
        const auto versions = repo.targets(m_squad, m_season);
        for (const auto& t : versions)
            if (t.key.metric == metric->id) base.value = t.value;
    }
    std::vector<Target> versions;
    for (const Zone& z : zones) {
        Target t = base;
        t.key.band = z.band;
        t.key.lane = z.lane;
        versions.push_back(t);
    }
    repo.addTargets(versions, nowUtc());
    err << (retire ? "retired " : "set ") << versions.size() << " target"
        << (versions.size() == 1 ? "" : "s") << " for " << metric->id << " in " << m_squad << " "
        << m_season << " from " << from << "\n";
    return kExitOk;
}

int TargetVerbs::runList(ClubRepository& repo, bool history, std::ostream& out,
                         std::ostream& err) {
    const std::string on = m_on.empty() ? today() : m_on;
    if (!isIsoDate(on)) {
        err << "error: --on " << on << ": expected a date YYYY-MM-DD\n";
        return kExitBadInput;
    }
    const auto all = repo.targets(m_squad, m_season);
    std::vector<Target> shown;
    if (history) {
        for (const auto& t : all)
            if (m_metric.empty() || t.key.metric == m_metric) shown.push_back(t);
    } else {
        std::map<std::tuple<std::string, int, int>, std::vector<Target>> byKey;
        for (const auto& t : all) byKey[{t.key.metric, t.key.band, t.key.lane}].push_back(t);
        for (const auto& [key, versions] : byKey)
            if (auto t = inForce(versions, on)) shown.push_back(*t);
    }
    if (m_format == "json") {
        out << writeTargetFile(shown);
        return kExitOk;
    }
    std::map<std::string, MetricKind> kinds;
    for (const auto& m : repo.metrics()) kinds[m.id] = m.kind();
    if (m_format == "csv") {
        out << "squad,season,metric,band,lane,direction,value,watch_margin,min_sample,author,"
               "rationale,effective_from,recorded_at,retired\n";
        for (const auto& t : shown)
            out << csvField(t.key.squad) << ',' << t.key.season << ',' << t.key.metric << ','
                << t.key.band << ',' << t.key.lane << ',' << toString(t.direction) << ','
                << t.value << ',' << t.watchMargin << ',' << t.minSample << ','
                << csvField(t.author) << ',' << csvField(t.rationale) << ',' << t.effectiveFrom
                << ',' << t.recordedAt << ',' << (t.retired ? 1 : 0) << "\n";
        return kExitOk;
    }
    out << (history ? "Every target version" : "Targets in force on " + on) << " — " << m_squad
        << " " << m_season << "\n";
    if (shown.empty()) out << "(none: pitchloop targets set --help)\n";
    for (const auto& t : shown) {
        const MetricKind kind = kinds.count(t.key.metric) ? kinds[t.key.metric] : MetricKind::Rate;
        char line[320];
        std::snprintf(line, sizeof line, "%-24s %-44s %-8s %8s  margin %-7s min %-4ld %s%s  %s\n",
                      t.key.metric.c_str(), zoneName(t.key.band, t.key.lane, repo.tallyGrid()).c_str(),
                      std::string(toString(t.direction)).c_str(),
                      formatValue(kind, t.value).c_str(), formatValue(kind, t.watchMargin).c_str(),
                      t.minSample, t.retired ? "RETIRED " : "", ("from " + t.effectiveFrom).c_str(),
                      (t.author + (t.rationale.empty() ? "" : ": " + t.rationale)).c_str());
        out << line;
    }
    return kExitOk;
}

int TargetVerbs::runCopy(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const auto versions = repo.targets(m_squad, m_fromSeason);
    if (versions.empty()) {
        err << "error: no targets in " << m_squad << " " << m_fromSeason << " to copy\n";
        return kExitBadInput;
    }
    if (!isSeasonName(m_toSeason)) {
        err << "error: --to-season " << m_toSeason << ": expected a season such as 2027-28\n";
        return kExitBadInput;
    }
    const std::string fromEnd = std::to_string(std::stoi(m_fromSeason.substr(0, 4)) + 1) + "-06-30";
    const std::string toStart = m_toSeason.substr(0, 4) + "-07-01";
    std::map<std::tuple<std::string, int, int>, std::vector<Target>> byKey;
    for (const auto& t : versions) byKey[{t.key.metric, t.key.band, t.key.lane}].push_back(t);

    // Last season's achieved values: the season window at its last match.
    const SeasonTallies season = repo.seasonTallies(m_squad, m_fromSeason);
    const auto metrics = repo.metrics();
    std::vector<ZoneStatus> achieved;
    if (!season.matchIds.empty())
        achieved = computeStatus(season, season.matchIds.size() - 1, metrics, {}, repo.tallyGrid(),
                                 {Window{Window::Kind::Season, 0, 0.3}}, repo.flagSettings());
    std::map<std::string, MetricKind> kinds;
    for (const auto& m : metrics) kinds[m.id] = m.kind();

    std::vector<Target> copies;
    out << "Copied into " << m_squad << " " << m_toSeason << " from " << toStart
        << " (achieved: " << m_fromSeason << ", " << season.matchIds.size() << " matches)\n";
    for (const auto& [key, list] : byKey) {
        auto t = inForce(list, fromEnd);
        if (!t) continue;
        Target copy = *t;
        copy.key.season = m_toSeason;
        copy.effectiveFrom = toStart;
        copy.recordedAt.clear();
        copy.author = m_author;
        copy.rationale = "copied from " + m_fromSeason + (t->rationale.empty() ? "" : ": " + t->rationale);
        copies.push_back(copy);
        std::string was = "-";
        for (const auto& a : achieved)
            if (a.metric == t->key.metric && a.band == t->key.band && a.lane == t->key.lane) {
                const MetricKind kind = kinds[a.metric];
                was = formatValue(kind, a.value) + " (" + formatValue(kind, a.interval.low) + "–" +
                      formatValue(kind, a.interval.high) + ")";
            }
        const MetricKind kind = kinds.count(t->key.metric) ? kinds[t->key.metric] : MetricKind::Rate;
        char line[256];
        std::snprintf(line, sizeof line, "%-24s %-44s %-8s %8s   last season %s\n",
                      t->key.metric.c_str(), zoneName(t->key.band, t->key.lane, repo.tallyGrid()).c_str(),
                      std::string(toString(t->direction)).c_str(),
                      formatValue(kind, t->value).c_str(), was.c_str());
        out << line;
    }
    repo.addTargets(copies, nowUtc());
    err << "copied " << copies.size() << " targets\n";
    return kExitOk;
}

int TargetVerbs::runImport(ClubRepository& repo, std::ostream& err) {
    std::string text;
    try {
        text = readFileBytes(m_file);
    } catch (const IoError&) {
        err << "error: " << m_file << ": cannot be read\n";
        return kExitBadInput;
    }
    const ZoneGrid grid = repo.tallyGrid();
    auto parsed = parseTargetFile(text, m_file, repo.metrics(), grid.bands(), grid.lanes());
    if (!parsed.errors.empty()) {
        for (const auto& p : parsed.errors) err << "error: " << p.describe() << "\n";
        err << m_file << ": no target imported\n";
        return kExitBadInput;
    }
    const auto fresh = newVersionsOnly(repo.allTargets(), parsed.targets);
    repo.addTargets(fresh, nowUtc());
    err << "imported " << fresh.size() << " target versions ("
        << parsed.targets.size() - fresh.size() << " already there)\n";
    return kExitOk;
}

int TargetVerbs::runExport(ClubRepository& repo, std::ostream& out) {
    const bool oneSeason = m_export->count("--season") > 0;
    out << writeTargetFile(oneSeason ? repo.targets(m_squad, m_season) : repo.allTargets());
    return kExitOk;
}

} // namespace pitchloop::cli
