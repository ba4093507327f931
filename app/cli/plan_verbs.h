#pragma once
// `pitchloop fixtures ...` and `pitchloop plan DATE`: the squad's schedule, the microcycle day
// and the session planner on the command line (docs/planner.md).

#include "common.h"

#include <CLI/CLI.hpp>
#include <cstdint>
#include <ostream>
#include <string>
#include <vector>

namespace pitchloop::cli {

/// `fixtures import | add | list | remove | next | caps`, `plan DATE` and `sessions`.
class PlanVerbs {
  public:
    explicit PlanVerbs(CLI::App& app);
    bool chosen() const {
        return m_fixtures->parsed() || m_plan->parsed() || m_sessions->parsed();
    }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

  private:
    int runImport(model::ClubRepository& repo, std::ostream& err);
    int runAdd(model::ClubRepository& repo, std::ostream& err);
    int runList(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runRemove(model::ClubRepository& repo, std::ostream& err);
    int runNext(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runCaps(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runPlan(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runSessions(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runMark(model::ClubRepository& repo, std::ostream& out, std::ostream& err);

    CLI::App* m_fixtures = nullptr;
    CLI::App* m_import = nullptr;
    CLI::App* m_add = nullptr;
    CLI::App* m_list = nullptr;
    CLI::App* m_remove = nullptr;
    CLI::App* m_next = nullptr;
    CLI::App* m_caps = nullptr;
    CLI::App* m_plan = nullptr;
    CLI::App* m_sessions = nullptr;
    CLI::App* m_mark = nullptr;
    std::string m_outcome;
    std::vector<int> m_blockMinutes;
    std::string m_from;
    std::string m_to;

    std::string m_squad = "First team";
    std::string m_season;
    std::string m_file;
    std::string m_date;
    std::string m_kickoff;
    std::string m_opponent;
    std::string m_venue;
    std::string m_competition;
    std::string m_format = "table";
    std::string m_setCaps;
    int m_minutes = 0;
    int m_players = 0;
    std::vector<std::int64_t> m_pin;
    std::vector<std::int64_t> m_removeDrills;
    std::vector<std::string> m_swap;
    bool m_save = false;
    std::string m_by;
};

} // namespace pitchloop::cli
