#pragma once
// `pitchloop drills ...`: the coaches' drill book on the command line (docs/drills.md).

#include "common.h"
#include "drills.h"

#include <CLI/CLI.hpp>
#include <cstdint>
#include <ostream>
#include <string>
#include <vector>

namespace pitchloop::cli {

/// `drills add | edit | list | show | search | history | delete | restore | import | export`.
class DrillVerbs {
  public:
    explicit DrillVerbs(CLI::App& app);
    bool chosen() const { return m_group->parsed(); }
    int run(const Globals& g, std::ostream& out, std::ostream& err);

  private:
    int runAdd(model::DrillBook& book, std::ostream& out, std::ostream& err);
    int runEdit(model::DrillBook& book, std::ostream& err);
    int runList(model::DrillBook& book, bool search, std::ostream& out, std::ostream& err);
    int runShow(model::DrillBook& book, std::ostream& out, std::ostream& err);
    int runHistory(model::DrillBook& book, std::ostream& out, std::ostream& err);
    int runDelete(model::DrillBook& book, bool restore, std::ostream& err);
    int runImport(model::DrillBook& book, std::ostream& err);
    int runExport(model::DrillBook& book, std::ostream& out);

    /// Registers the content flags (--title ... --author) on `sub`.
    void addFieldFlags(CLI::App* sub);
    /// Copies the content flags given on `sub` onto `d`; false (with a message on `err`) when a
    /// flag's text cannot be read. `given` tells whether any content flag was given.
    bool applyFlags(const CLI::App* sub, model::Drill& d, bool& given, std::ostream& err) const;

    CLI::App* m_group = nullptr;
    CLI::App* m_add = nullptr;
    CLI::App* m_edit = nullptr;
    CLI::App* m_list = nullptr;
    CLI::App* m_show = nullptr;
    CLI::App* m_search = nullptr;
    CLI::App* m_history = nullptr;
    CLI::App* m_delete = nullptr;
    CLI::App* m_restore = nullptr;
    CLI::App* m_import = nullptr;
    CLI::App* m_export = nullptr;

    std::int64_t m_id = 0;
    std::string m_file;
    std::string m_title;
    std::string m_purpose;
    std::string m_organisation;
    std::vector<std::string> m_points;
    int m_minutes = 0;
    int m_intensity = 0;
    std::string m_players;
    std::string m_area;
    std::vector<std::string> m_equipment;
    std::vector<std::string> m_metrics;
    std::vector<std::string> m_zones;
    std::vector<std::string> m_tags;
    std::string m_role;
    std::string m_author;
    std::vector<std::string> m_clear;

    std::vector<std::string> m_words;
    std::string m_tag;
    std::string m_metric;
    std::string m_zone;
    bool m_includeDeleted = false;
    std::string m_format = "table";
};

} // namespace pitchloop::cli
