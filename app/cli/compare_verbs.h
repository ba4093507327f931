#pragma once
// `pitchloop compare`: two sets of a season's matches on one map, zone by zone, with the
// difference's own interval (docs/statistics.md, "Comparing two sets of matches").

#include "common.h"

#include <CLI/CLI.hpp>

#include <ostream>
#include <string>

namespace pitchloop::cli {

class CompareVerbs {
  public:
    explicit CompareVerbs(CLI::App& app);
    bool chosen() const { return m_compare->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

  private:
    CLI::App* m_compare = nullptr;
    std::string m_metric;
    std::string m_split;
    std::string m_season;
    std::string m_squad;
    std::string m_format = "table";
};

} // namespace pitchloop::cli
