#include "commands.h"
#include "debrief.h"
#include "exports.h"
#include "gridchange.h"
#include "pooling.h"
#include "format.h"
#include "verbs.h"
#include "wording.h"
#include "zonenames.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <map>
#include <set>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

/// The season of a match, loaded, with the match's position in it.
struct MatchContext {
    std::string squad;
    std::string season;
    SeasonTallies tallies;
    std::size_t focal = 0;
    MatchSummary summary;
};

std::optional<MatchContext> loadContext(ClubRepository& repo, const std::string& match,
                                        const std::string& dbName, std::ostream& err) {
    auto summary = repo.matchSummary(match);
    auto where = repo.seasonOfMatch(match);
    if (!summary || !where) {
        err << "error: no match '" << match << "' in " << dbName << " (see: pitchloop matches)\n";
        return std::nullopt;
    }
    MatchContext c;
    c.squad = where->first;
    c.season = where->second;
    c.tallies = repo.seasonTallies(c.squad, c.season);
    c.summary = *summary;
    for (std::size_t i = 0; i < c.tallies.matchIds.size(); ++i)
        if (c.tallies.matchIds[i] == match) c.focal = i;
    return c;
}

std::string num(double v) {
    if (std::isnan(v)) return "";
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

std::string targetText(MetricKind kind, const std::optional<Target>& t) {
    if (!t) return "–";
    return words::target(t->direction, kind, t->value);
}

} // namespace

StatusVerbs::StatusVerbs(CLI::App& app) {
    m_status = app.add_subcommand("status", "Every zone × metric at a match: values over windows, "
                                            "intervals, targets and flags");
    m_status->add_option("match", m_match, "Match id")->required();
    m_status->add_option("--window", m_windows,
                         "Windows: match, lastN (e.g. last5), season, ewma or ewma0.2 "
                         "(default: match, the judged window, season, ewma)");
    m_status->add_option("--metric", m_metrics, "Only these metrics");
    m_status->add_flag("--all-zones", m_allZones,
                       "Table: every zone (default: zones with targets and the whole pitch)");
    m_status->add_option("--format", m_format, "table, csv or json")
        ->check(CLI::IsMember({"table", "csv", "json"}));

    m_debrief = app.add_subcommand("debrief", "A match judged against the season's targets: what "
                                              "slipped, what is new, what recovered");
    m_debrief->add_option("match", m_match, "Match id (see: pitchloop matches)")->required();
    m_debrief->add_flag("--tables", m_tables, "Also print each metric's per-zone table");
    m_debrief->add_option("--metric", m_metrics, "Tables: only these metrics");
    m_debrief->add_option("--grid", m_grid, "Tables: zone grid, e.g. markings:6");

    m_settings = app.add_subcommand("settings", "Flag settings of the club file");
    m_settings->require_subcommand(1);
    m_settingsShow = m_settings->add_subcommand("show", "Print the settings in force");
    m_settingsSet = m_settings->add_subcommand("set", "Change one setting");
    m_settingsSet->add_option("key", m_key,
                              "level | off_threshold | watch_threshold | window | interval | "
                              "fdr | fdr_q")
        ->required();
    m_settingsSet->add_option("value", m_value)->required();
    m_settingsGrid = m_settings->add_subcommand(
        "grid", "Show the zone grid and its changes, or move the club to another grid");
    m_settingsGrid->add_option("grid", m_grid,
                               "equal:BxL (e.g. equal:6x5) or markings:B (lanes at the area lines)");
    m_settingsGrid->add_option("--by", m_by, "Who changes it (required to change)");
    m_settingsGrid->add_flag("--preview", m_preview, "Say what would change; write nothing");
}

bool StatusVerbs::chosen() const {
    return m_status->parsed() || m_debrief->parsed() || m_settings->parsed();
}

int StatusVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    if (m_status->parsed()) return runStatus(*repo, out, err);
    if (m_debrief->parsed()) return runDebrief(*repo, out, err);
    return runSettings(*repo, out, err);
}

std::optional<StatusRun> matchStatuses(ClubRepository& repo, const std::string& match,
                                      const std::vector<std::string>& windowTexts,
                                      const std::vector<std::string>& metricIds,
                                      std::ostream& err) {
    auto c = loadContext(repo, match, "the club file", err);
    if (!c) return std::nullopt;
    StatusRun run;
    run.settings = repo.flagSettings();
    const FlagSettings& settings = run.settings;
    std::vector<Window>& windows = run.windows;
    if (windowTexts.empty()) windows = defaultStatusWindows(settings);
    for (const auto& text : windowTexts) {
        auto w = Window::parse(text);
        if (!w) {
            err << "error: --window " << text << ": expected match, lastN, season or ewma[λ]\n";
            return std::nullopt;
        }
        windows.push_back(*w);
    }
    auto metrics = repo.metrics();
    if (!metricIds.empty()) {
        for (const auto& id : metricIds)
            if (std::none_of(metrics.begin(), metrics.end(), [&](auto& m) { return m.id == id; })) {
                err << "error: --metric: no metric '" << id << "'\n";
                return std::nullopt;
            }
        std::erase_if(metrics, [&](const MetricSpec& m) {
            return std::find(metricIds.begin(), metricIds.end(), m.id) == metricIds.end();
        });
    }
    run.grid = repo.tallyGrid();
    const auto targets = repo.targets(c->squad, c->season);
    run.statuses =
        computeStatus(c->tallies, c->focal, metrics, targets, run.grid, windows, settings);
    run.metrics = std::move(metrics);
    run.squad = c->squad;
    run.season = c->season;
    run.summary = c->summary;
    run.focal = c->focal;
    run.seasonMatches = c->tallies.matchIds.size();
    return run;
}

int StatusVerbs::runStatus(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const auto run = matchStatuses(repo, m_match, m_windows, m_metrics, err);
    if (!run) return kExitBadInput;
    const FlagSettings& settings = run->settings;
    const std::vector<Window>& windows = run->windows;
    const std::vector<MetricSpec>& metrics = run->metrics;
    const ZoneGrid& grid = run->grid;
    const std::vector<ZoneStatus>& statuses = run->statuses;
    if (m_format == "csv") {
        out << statusCsv(m_match, statuses);
        return kExitOk;
    }
    if (m_format == "json") {
        nlohmann::json j;
        j["match_id"] = m_match;
        j["date"] = run->summary.date;
        j["squad"] = run->squad;
        j["season"] = run->season;
        j["grid"] = grid.name();
        j["settings"] = {{"level", settings.level},
                         {"off_threshold", statuses.empty() ? settings.offThreshold : statuses.front().offThreshold},
                         {"false_flags_per_season", settings.falseFlagsPerSeason},
                         {"season_matches", settings.seasonMatches},
                         {"match_variation", settings.matchVariation},
                         {"watch_threshold", settings.watchThreshold},
                         {"window", settings.window.name()},
                         {"fdr", settings.fdr},
                         {"fdr_q", settings.fdrQ}};
        nlohmann::json chance = nlohmann::json::object();
        for (const auto& w : windows) {
            std::vector<ZoneStatus> inWindow;
            for (const auto& s : statuses)
                if (s.window == w) inWindow.push_back(s);
            chance[w.name()] = expectedChanceFlags(inWindow);
        }
        j["chance_off_flags"] = chance;
        j["zones"] = nlohmann::json::array();
        // Every zone's value pooled toward its neighbours, as the app's maps draw it.
        std::vector<ZoneStatus> pooled = statuses;
        poolStatuses(pooled, metrics, grid);
        for (const auto& s : pooled) j["zones"].push_back(toJson(s));
        out << j.dump(2) << "\n";
        return kExitOk;
    }
    std::map<std::string, MetricKind> kinds;
    for (const auto& m : metrics) kinds[m.id] = m.kind();
    out << m_match << "  " << run->summary.date << "  v " << run->summary.opponent << "  — "
        << run->squad << " " << run->season << ", match " << run->focal + 1 << " of "
        << run->seasonMatches << " stored; intervals at " << num(100 * settings.level)
        << "%\n\n";
    out << padColumn("metric", 25) << padColumn("zone", 44) << padColumn("window", 8) << padColumn("num/den", 13)
        << padColumn("value", 8) << padColumn("interval", 16) << padColumn("target", 10) << padColumn("state", 18)
        << "P(miss)\n";
    std::set<std::pair<std::string, std::pair<int, int>>> withTarget;
    for (const auto& s : statuses)
        if (s.target) withTarget.insert({s.metric, {s.band, s.lane}});
    for (const auto& s : statuses) {
        const bool shown = m_allZones || (s.band == 0 && s.lane == 0) ||
                           withTarget.count({s.metric, {s.band, s.lane}});
        if (!shown) continue;
        const MetricKind kind = kinds[s.metric];
        char nd[32];
        std::snprintf(nd, sizeof nd, s.window.kind == Window::Kind::Ewma ? "%.1f/%.1f" : "%.0f/%.0f",
                      s.sum.num, s.sum.den);
        out << padColumn(s.metric, 25) << padColumn(zoneName(s.band, s.lane, grid), 44) << padColumn(s.window.name(), 8)
            << padColumn(nd, 13) << padColumn(words::value(kind, s.value), 8)
            << padColumn(words::interval(kind, s.interval), 16) << padColumn(targetText(kind, s.target), 10)
            << padColumn(words::stateName(s.state), 18)
            << (s.target && s.state != FlagState::TooLittleData ? words::probability(s.pMiss) : "")
            << "\n";
    }
    return kExitOk;
}

int StatusVerbs::runDebrief(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    auto c = loadContext(repo, m_match, "the club file", err);
    if (!c) return kExitBadInput;
    const FlagSettings settings = repo.flagSettings();
    const auto metrics = repo.metrics();
    const ZoneGrid grid = repo.tallyGrid();
    const auto targets = repo.targets(c->squad, c->season);
    std::map<std::string, MetricSpec> byId;
    for (const auto& m : metrics) byId[m.id] = m;

    const MatchSummary& m = c->summary;
    out << m.id << "  " << m.date << "  " << repo.clubName() << " v " << m.opponent << " ("
        << m.venue << ")  " << scoreLine(m) << "\n";
    if (const std::string note = m.zoneOnlyNote(grid); !note.empty())
        out << "Zone-only match: " << note << "; it adds nothing to the values below.\n";
    if (targets.empty()) {
        out << "No targets set for " << c->squad << " " << c->season
            << " yet (pitchloop targets set --help); per-zone values of the match follow.\n\n";
    } else {
        const Debrief d = buildDebrief(c->tallies, c->focal, metrics, targets, grid, settings);
        const std::size_t first =
            settings.window.kind == Window::Kind::LastN && c->focal + 1 > static_cast<std::size_t>(settings.window.n)
                ? c->focal + 1 - static_cast<std::size_t>(settings.window.n)
                : 0;
        out << "Judged over " << words::windowName(settings.window) << " (" << c->tallies.matchIds[first]
            << " … " << m.id << "): off target when P(miss) ≥ " << num(d.offThreshold)
            << (settings.falseFlagsPerSeason > 0
                    ? " (about " + num(settings.falseFlagsPerSeason) + " false flag" +
                          (settings.falseFlagsPerSeason == 1 ? "" : "s") + " a season across " +
                          std::to_string(d.seriesWithTargets) + " targets)"
                    : std::string())
            << (settings.fdr ? ", with Benjamini–Hochberg at q = " + num(settings.fdrQ) : "")
            << "; intervals at " << num(100 * settings.level) << "%.\n\n";
        // Each zone as the app's debrief list shows it: metric and zone, the coach's sentence,
        // the analyst's line (model/wording.h).
        auto line = [&](const DebriefItem& item, bool markNew) {
            const ZoneStatus& s = item.now;
            const MetricSpec& spec = byId[s.metric];
            const MetricKind kind = spec.kind();
            std::string head = "  " + (spec.name.empty() ? s.metric : spec.name) + " · " +
                               zoneName(s.band, s.lane, grid);
            if (markNew && item.before != FlagState::OffTarget && !d.previousMatchId.empty())
                head += "  (new since " + d.previousMatchId + ")";
            else if (item.before && *item.before != s.state)
                head += "  (was " + words::stateName(*item.before) + ")";
            out << head << "\n    " << words::coachSentence(spec, s, grid) << "\n    "
                << words::analystLine(s, kind) << "\n";
        };
        auto section = [&](const std::string& title, const std::vector<DebriefItem>& items,
                           bool markNew) {
            out << title << " (" << items.size() << ")\n";
            if (items.empty()) out << "  none\n";
            for (const auto& item : items) line(item, markNew);
            out << "\n";
        };
        const std::string window = words::windowName(settings.window);
        section("Off target over " + window, d.slippedInWindow, true);
        section("Off target in this match alone", d.slippedInMatch, false);
        if (!d.unusualInMatch.empty()) {
            out << "Unusual in this match alone (" << d.unusualInMatch.size()
                << "): a per-match count target cannot be judged on one match, but a team on its "
                   "target has a match like this at most once in a hundred\n";
            for (const auto& item : d.unusualInMatch) {
                const ZoneStatus& s = item.now;
                const MetricSpec& spec = byId[s.metric];
                out << "  " << (spec.name.empty() ? s.metric : spec.name) << " · "
                    << zoneName(s.band, s.lane, grid) << "\n    " << words::unusualMatchSentence(spec, s, grid)
                    << "\n    " << words::analystLine(s, spec.kind()) << " · " << words::value(spec.kind(), s.sum.num)
                    << " in this match, 1 in " << words::grouped(1 / std::max(s.matchTail, 1e-12))
                    << " if on target\n";
            }
            out << "\n";
        }
        if (!d.previousMatchId.empty())
            section(words::capitalised(words::backOnTarget()) + " since " + d.previousMatchId, d.recovered, false);
        section("Likely off or close to the line over " + window, d.watched, false);
        char chance[400];
        std::snprintf(chance, sizeof chance,
                      "%d zones with targets judged over %s (%d more have too little data). If "
                      "every true value sat exactly on its target, chance alone would flag at most "
                      "about %.1f of them off target at some point this season (%.2f at this one "
                      "look).\n",
                      d.judged, window.c_str(), d.tooLittleData, d.seasonChanceFlags, d.chanceFlags);
        out << chance;
        out << "Slips are evidence for the staff to weigh, not verdicts; see docs/statistics.md.\n";
    }
    if (!targets.empty() && !m_tables) return kExitOk;

    ZoneGrid tableGrid = grid;
    if (!m_grid.empty()) {
        auto parsed = ZoneGrid::parse(m_grid);
        if (!parsed) {
            err << "error: --grid " << m_grid << ": expected equal:BANDSxLANES (e.g. equal:6x5) or "
                << "markings:BANDS (lanes cut at the penalty- and goal-area lines)\n";
            return kExitBadInput;
        }
        tableGrid = *parsed;
    }
    std::vector<MetricSpec> specs;
    if (m_metrics.empty()) {
        specs = builtinMetrics();
    } else {
        for (const auto& id : m_metrics) {
            if (!byId.count(id)) {
                err << "error: no metric '" << id << "' (see: pitchloop metrics list)\n";
                return kExitBadInput;
            }
            specs.push_back(byId[id]);
        }
    }
    out << "\nPer-zone tallies of this match (grid " << tableGrid.name() << ", pitch "
        << m.pitch.lengthM << " × " << m.pitch.widthM << " m, " << m.eventCount << " events)\n\n";
    if (const std::string note = m.zoneOnlyNote(tableGrid); !note.empty()) {
        out << "Zone-only match: " << note << ".\n";
        return kExitOk;
    }
    const auto loaded = repo.loadMatch(m.id);
    const MatchFacts facts(*loaded);
    for (const auto& spec : specs) printZoneTable(out, spec, tableGrid, computeTally(facts, spec, tableGrid));
    return kExitOk;
}

int StatusVerbs::runGrid(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    const ZoneGrid current = repo.tallyGrid();
    if (m_grid.empty()) {
        out << "grid  " << current.name() << "   (" << describeGrid(current) << ")\n";
        for (const auto& c : repo.gridChanges())
            out << "  " << c.at << "  " << c.from << " -> " << c.to << " by " << c.by << ": "
                << c.summary << "\n";
        return kExitOk;
    }
    const auto to = ZoneGrid::parse(m_grid);
    if (!to) {
        err << "error: settings grid " << m_grid
            << ": expected equal:BxL (e.g. equal:6x5) or markings:B, with 1–20 bands and lanes\n";
        return kExitBadInput;
    }
    const GridChangePreview preview = previewGridChange(repo, *to);
    out << (m_preview ? "Moving" : "Moved") << " from " << current.name() << " to " << to->name()
        << (m_preview ? " would do this:\n" : ":\n");
    for (const auto& line : preview.lines) out << "  - " << line << "\n";
    if (m_preview || current == *to) return kExitOk;
    if (m_by.find_first_not_of(" \t") == std::string::npos) {
        err << "error: settings grid " << m_grid << ": --by: say who changes the grid\n";
        return kExitBadInput;
    }
    repo.changeGrid(*to, m_by, nowUtc());
    return kExitOk;
}

int StatusVerbs::runSettings(ClubRepository& repo, std::ostream& out, std::ostream& err) {
    if (m_settingsGrid->parsed()) return runGrid(repo, out, err);
    FlagSettings f = repo.flagSettings();
    if (m_settingsSet->parsed()) {
        auto number = parseNumber(m_value);
        auto bad = [&](const std::string& why) {
            err << "error: settings set " << m_key << " " << m_value << ": " << why << "\n";
            return kExitBadInput;
        };
        if (m_key == "level" || m_key == "off_threshold" || m_key == "watch_threshold" ||
            m_key == "fdr_q") {
            if (!number || *number <= 0 || *number >= 1) return bad("expected a number between 0 and 1");
            (m_key == "level" ? f.level
             : m_key == "off_threshold" ? f.offThreshold
             : m_key == "watch_threshold" ? f.watchThreshold
                                          : f.fdrQ) = *number;
        } else if (m_key == "window") {
            auto w = Window::parse(m_value);
            if (!w) return bad("expected match, lastN (e.g. last5), season or ewma[λ]");
            f.window = *w;
        } else if (m_key == "interval") {
            if (m_value != "wilson" && m_value != "jeffreys") return bad("expected wilson or jeffreys");
            f.rateInterval = m_value == "jeffreys" ? IntervalMethod::Jeffreys : IntervalMethod::Wilson;
        } else if (m_key == "fdr" || m_key == "match_variation") {
            if (m_value != "on" && m_value != "off") return bad("expected on or off");
            (m_key == "fdr" ? f.fdr : f.matchVariation) = m_value == "on";
        } else if (m_key == "false_flags_per_season") {
            if (!number || *number < 0 || *number > 100)
                return bad("expected a number from 0 (no season budget: off_threshold applies) to 100");
            f.falseFlagsPerSeason = *number;
        } else if (m_key == "season_matches") {
            if (!number || *number < 1 || *number > 120 || *number != std::floor(*number))
                return bad("expected a whole number of matches from 1 to 120");
            f.seasonMatches = static_cast<int>(*number);
        } else {
            return bad("unknown setting (level, off_threshold, watch_threshold, window, interval, "
                       "fdr, fdr_q, false_flags_per_season, season_matches, match_variation)");
        }
        repo.saveFlagSettings(f);
    }
    out << "grid             " << repo.tallyGrid().name() << "   (" << describeGrid(repo.tallyGrid())
        << "; change with: pitchloop settings grid)\n"
        << "level            " << num(f.level) << "   (confidence of intervals)\n"
        << "interval         " << (f.rateInterval == IntervalMethod::Jeffreys ? "jeffreys" : "wilson")
        << "   (for rates; counts use the exact Poisson interval)\n"
        << "window           " << f.window.name() << "   (the window a debrief judges)\n"
        << "false_flags_per_season " << num(f.falseFlagsPerSeason)
        << "   (about this many false off-target flags a season across the board; 0: use off_threshold)\n"
        << "season_matches   " << f.seasonMatches << "   (matches a season: the looks the budget covers)\n"
        << "off_threshold    " << num(f.offThreshold) << "   (P(miss) for off target"
        << (f.falseFlagsPerSeason > 0 ? ", used only with no season budget)\n" : ")\n")
        << "match_variation  " << (f.matchVariation ? "on" : "off")
        << "   (allow for match-to-match variation, estimated from the club's matches)\n"
        << "watch_threshold  " << num(f.watchThreshold) << "   (P(short of the watch line) for close to the line)\n"
        << "fdr              " << (f.fdr ? "on" : "off") << "   (Benjamini–Hochberg on off-target flags)\n"
        << "fdr_q            " << num(f.fdrQ) << "\n";
    return kExitOk;
}

} // namespace pitchloop::cli
