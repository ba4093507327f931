#pragma once
// `pitchloop export ...`: files a staff passes around — CSV of statuses and tallies, an
// iCalendar file of planned sessions and review dates, PDF session sheets and match debriefs
// (docs/exports.md).

#include "common.h"

#include <CLI/CLI.hpp>
#include <ostream>
#include <string>
#include <vector>

namespace pitchloop::cli {

/// `export statuses | tallies | calendar | sheet | debrief`.
class ExportVerbs {
  public:
    explicit ExportVerbs(CLI::App& app);
    bool chosen() const { return m_group->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

  private:
    int runStatuses(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runTallies(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runCalendar(model::ClubRepository& repo, std::ostream& out, std::ostream& err);

    CLI::App* m_group = nullptr;
    CLI::App* m_statuses = nullptr;
    CLI::App* m_tallies = nullptr;
    CLI::App* m_calendar = nullptr;
    CLI::App* m_sheet = nullptr;
    CLI::App* m_debrief = nullptr;

    std::string m_out;
    std::string m_match;
    std::string m_date;
    std::string m_squad = "First team";
    std::vector<std::string> m_windows;
    std::vector<std::string> m_metrics;
    std::string m_from;
    std::string m_to;
    std::string m_start = "10:30";
};

} // namespace pitchloop::cli
