#pragma once
// `focus open | link | unlink | list | show` and `review FOCUS`.

#include "common.h"

#include <CLI/CLI.hpp>

#include <cstdint>
#include <ostream>
#include <optional>
#include <string>
#include <vector>

namespace pitchloop::cli {

class FocusVerbs {
public:
    explicit FocusVerbs(CLI::App& app);
    bool chosen() const { return m_group->parsed() || m_review->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

private:
    int runOpen(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runList(model::ClubRepository& repo, std::ostream& out);
    int runShow(model::ClubRepository& repo, std::ostream& out, std::ostream& err);
    int runLink(model::ClubRepository& repo, bool link, std::ostream& err);
    int runReview(model::ClubRepository& repo, std::ostream& out, std::ostream& err);

    CLI::App* m_group = nullptr;
    CLI::App* m_open = nullptr;
    CLI::App* m_link = nullptr;
    CLI::App* m_unlink = nullptr;
    CLI::App* m_list = nullptr;
    CLI::App* m_show = nullptr;
    CLI::App* m_review = nullptr;
    std::string m_match;
    std::string m_metric;
    std::vector<std::string> m_zones;
    std::vector<std::int64_t> m_drills;
    std::string m_by;
    std::string m_start;
    int m_reviewAfter = 5;
    std::string m_reviewOn;
    std::string m_momentsOut;
    std::string m_note;
    std::optional<double> m_minChange;
    std::int64_t m_focus = 0;
    std::int64_t m_drill = 0;
    int m_before = 0;
    int m_after = 0;
    double m_level = 0.95;
    std::string m_format = "table";
    std::string m_verdict;
};

} // namespace pitchloop::cli
