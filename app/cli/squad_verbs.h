#pragma once
// `pitchloop squad list | import FILE | add NUMBER | remove NUMBER`: a squad's list of players
// (number, name, position), so moments name the players in them (docs/moments.md).

#include "common.h"

#include <CLI/CLI.hpp>

#include <ostream>
#include <string>

namespace pitchloop::cli {

class SquadVerbs {
  public:
    explicit SquadVerbs(CLI::App& app);
    bool chosen() const { return m_group->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

  private:
    CLI::App* m_group = nullptr;
    CLI::App* m_list = nullptr;
    CLI::App* m_import = nullptr;
    CLI::App* m_add = nullptr;
    CLI::App* m_remove = nullptr;
    std::string m_squad = "First team";
    std::string m_file;
    std::string m_number;
    std::string m_name;
    std::string m_position;
};

} // namespace pitchloop::cli
