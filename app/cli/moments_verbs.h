#pragma once
// `pitchloop moments` and `pitchloop export clips`: the moments behind a zone's number, as a
// list and as a clip list for a video player (docs/moments.md).

#include "common.h"

#include <CLI/CLI.hpp>

#include <map>
#include <ostream>
#include <string>
#include <vector>

namespace pitchloop::cli {

class MomentVerbs {
  public:
    /// Registers `moments` on `app` and `clips` in its `export` group (made before this).
    explicit MomentVerbs(CLI::App& app);
    bool chosen() const { return m_list->parsed() || m_clips->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

  private:
    int runList(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runClips(model::ClubRepository& repo, std::ostream& out, std::ostream& err);

    CLI::App* m_list = nullptr;
    CLI::App* m_clips = nullptr;
    std::string m_match;
    std::string m_metric;
    std::string m_zone;
    std::string m_window = "match";
    std::string m_format = "table";
    std::string m_clipFormat = "vtt";
    std::string m_out;
    double m_leadIn = 8;
    double m_leadOut = 4;
    std::vector<std::string> m_periodStarts;
    std::string m_player;
    std::string m_unit;
};

} // namespace pitchloop::cli
