#pragma once
// Verb groups of the command line beyond ingest and tallies; each registers its subcommands on
// the app and runs when chosen.

#include "common.h"

#include "status.h"

#include <CLI/CLI.hpp>

#include <optional>

#include <ostream>
#include <string>
#include <vector>

namespace pitchloop::cli {

/// Zone statuses of one stored match, as `status` computes them.
struct StatusRun {
    std::string squad;
    std::string season;
    model::MatchSummary summary;
    std::size_t focal = 0;         ///< the match's index in its season
    std::size_t seasonMatches = 0; ///< matches stored in the season
    model::FlagSettings settings;
    std::vector<model::Window> windows;
    std::vector<model::MetricSpec> metrics;
    model::ZoneGrid grid;
    std::vector<model::ZoneStatus> statuses;
};

/// Statuses of `match` in `windows` (texts as --window takes them; the status defaults when
/// empty) for `metrics` (ids; every metric when empty). nullopt after an error on `err`.
std::optional<StatusRun> matchStatuses(model::ClubRepository& repo, const std::string& match,
                                      const std::vector<std::string>& windows,
                                      const std::vector<std::string>& metrics,
                                      std::ostream& err);

/// `targets set | retire | list | history | copy-season | import | export`.
class TargetVerbs {
public:
    explicit TargetVerbs(CLI::App& app);
    bool chosen() const { return m_group->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

private:
    int runSet(model::ClubRepository& repo, bool retire, std::ostream& err);
    int runList(model::ClubRepository& repo, bool history, std::ostream& out, std::ostream& err);
    int runCopy(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runImport(model::ClubRepository& repo, std::ostream& err);
    int runExport(model::ClubRepository& repo, std::ostream& out);

    CLI::App* m_group = nullptr;
    CLI::App* m_set = nullptr;
    CLI::App* m_retire = nullptr;
    CLI::App* m_list = nullptr;
    CLI::App* m_history = nullptr;
    CLI::App* m_copy = nullptr;
    CLI::App* m_import = nullptr;
    CLI::App* m_export = nullptr;
    std::string m_squad = "First team";
    std::string m_season;
    std::string m_metric;
    std::vector<std::string> m_zones;
    bool m_allZones = false;
    bool m_wholePitch = false;
    std::string m_value;
    std::string m_direction;
    std::string m_margin;
    long m_minSample = -1;
    std::string m_author;
    std::string m_why;
    std::string m_from;
    std::string m_on;
    std::string m_format = "table";
    std::string m_fromSeason;
    std::string m_toSeason;
    std::string m_file;
};

/// `status MATCH`, `debrief MATCH` and `settings show | set`.
class StatusVerbs {
public:
    explicit StatusVerbs(CLI::App& app);
    bool chosen() const;
    int run(const Globals& g, std::ostream& out, std::ostream& err);

private:
    int runStatus(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runDebrief(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runSettings(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runGrid(model::ClubRepository& repo, std::ostream& out, std::ostream& err);

    CLI::App* m_status = nullptr;
    CLI::App* m_debrief = nullptr;
    CLI::App* m_settings = nullptr;
    CLI::App* m_settingsShow = nullptr;
    CLI::App* m_settingsSet = nullptr;
    CLI::App* m_settingsGrid = nullptr;
    std::string m_by;
    bool m_preview = false;
    std::string m_match;
    std::vector<std::string> m_windows;
    std::vector<std::string> m_metrics;
    std::string m_format = "table";
    bool m_allZones = false;
    bool m_tables = false;
    std::string m_grid;
    std::string m_key;
    std::string m_value;
};

} // namespace pitchloop::cli
