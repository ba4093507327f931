#include "drills_verbs.h"

#include "commands.h"
#include "format.h"
#include "matchreader.h"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <map>
#include <nlohmann/json.hpp>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

/// The source name of problems found in flags; they are reported by flag, not by file key.
const std::string kCommandLine = "command line";

/// The flag that sets a file key ("players.min" → "--players (min)").
std::string flagFor(const std::string& field) {
    static const std::map<std::string, std::string> kFlags{{"title", "--title"},
                                                           {"purpose", "--purpose"},
                                                           {"organisation", "--organisation"},
                                                           {"coaching_points", "--point"},
                                                           {"duration_min", "--minutes"},
                                                           {"intensity", "--intensity"},
                                                           {"players", "--players"},
                                                           {"area_m", "--area"},
                                                           {"equipment", "--equipment"},
                                                           {"metrics", "--metric"},
                                                           {"zones", "--zone"},
                                                           {"tags", "--tag"},
                                                           {"author", "--author"},
                                                           {"edited_by", "--author"}};
    const std::string root = field.substr(0, field.find_first_of(".["));
    const auto it = kFlags.find(root);
    if (it == kFlags.end()) return field;
    const auto dot = field.find('.');
    return dot == std::string::npos ? it->second : it->second + " (" + field.substr(dot + 1) + ")";
}

std::string describeProblem(const Problem& p) {
    if (p.file.empty()) return p.message;
    if (p.file == kCommandLine) return flagFor(p.field) + ": " + p.message;
    return p.describe();
}

int reportProblems(const Problems& problems, std::ostream& err) {
    for (const auto& p : problems)
        err << "error: " << describeProblem(p) << "\n";
    return kExitBadInput;
}

/// Symbols below U+3000 that terminals draw two columns wide (emoji presentation, Unicode
/// East Asian Width "W").
bool wideSymbol(char32_t cp) {
    static constexpr std::pair<char32_t, char32_t> kRanges[] = {
        {0x231A, 0x231B}, {0x23E9, 0x23EC}, {0x23F0, 0x23F0}, {0x23F3, 0x23F3}, {0x25FD, 0x25FE},
        {0x2614, 0x2615}, {0x2648, 0x2653}, {0x267F, 0x267F}, {0x2693, 0x2693}, {0x26A1, 0x26A1},
        {0x26AA, 0x26AB}, {0x26BD, 0x26BE}, {0x26C4, 0x26C5}, {0x26CE, 0x26CE}, {0x26D4, 0x26D4},
        {0x26EA, 0x26EA}, {0x26F2, 0x26F3}, {0x26F5, 0x26F5}, {0x26FA, 0x26FA}, {0x26FD, 0x26FD},
        {0x2705, 0x2705}, {0x270A, 0x270B}, {0x2728, 0x2728}, {0x274C, 0x274C}, {0x274E, 0x274E},
        {0x2753, 0x2755}, {0x2757, 0x2757}, {0x2795, 0x2797}, {0x27B0, 0x27B0}, {0x27BF, 0x27BF},
        {0x2B1B, 0x2B1C}, {0x2B50, 0x2B50}, {0x2B55, 0x2B55}};
    return std::any_of(std::begin(kRanges), std::end(kRanges),
                       [cp](const auto& r) { return cp >= r.first && cp <= r.second; });
}

/// Columns a UTF-8 text takes in a terminal: East Asian wide characters and emoji take two.
int columnsOf(char32_t cp) {
    const bool wide = wideSymbol(cp) || (cp >= 0x1100 && cp <= 0x115F) ||
                      (cp >= 0x2E80 && cp <= 0xA4CF) || (cp >= 0xAC00 && cp <= 0xD7A3) ||
                      (cp >= 0xF900 && cp <= 0xFAFF) || (cp >= 0xFE30 && cp <= 0xFE4F) ||
                      (cp >= 0xFF00 && cp <= 0xFF60) || (cp >= 0xFFE0 && cp <= 0xFFE6) ||
                      (cp >= 0x1F300 && cp <= 0x1FAFF) || (cp >= 0x20000 && cp <= 0x3FFFD);
    const bool zero =
        (cp >= 0x0300 && cp <= 0x036F) || cp == 0x200D || (cp >= 0xFE00 && cp <= 0xFE0F);
    return zero ? 0 : wide ? 2 : 1;
}

/// `text` cut to at most `width` columns (ending in "…" when cut) and padded with spaces.
std::string fit(const std::string& text, int width) {
    std::vector<std::pair<std::string, int>> chars; // bytes of each code point, its columns
    for (std::size_t i = 0; i < text.size();) {
        const auto c = static_cast<unsigned char>(text[i]);
        const std::size_t n = c < 0x80 ? 1 : c < 0xE0 ? 2 : c < 0xF0 ? 3 : 4;
        char32_t cp = n == 1 ? c : n == 2 ? c & 0x1F : n == 3 ? c & 0x0F : c & 0x07;
        for (std::size_t k = 1; k < n && i + k < text.size(); ++k)
            cp = (cp << 6) | (static_cast<unsigned char>(text[i + k]) & 0x3F);
        const char ch = text[i];
        chars.emplace_back(text.substr(i, n), ch == '\n' || ch == '\t' ? 1 : columnsOf(cp));
        i += n;
    }
    int total = 0;
    for (const auto& c : chars)
        total += c.second;
    std::string out;
    int used = 0;
    const int room = total > width ? width - 1 : width;
    for (const auto& [bytes, cols] : chars) {
        if (used + cols > room) break;
        out += bytes == "\n" || bytes == "\t" ? " " : bytes;
        used += cols;
    }
    if (total > width) {
        out += "…";
        ++used;
    }
    return out + std::string(static_cast<std::size_t>(std::max(0, width - used)), ' ');
}

std::string join(const std::vector<std::string>& items, const std::string& sep) {
    std::string out;
    for (std::size_t i = 0; i < items.size(); ++i)
        out += (i ? sep : "") + items[i];
    return out;
}

std::string playersText(const Drill& d) {
    if (d.playersMin == d.playersMax) return std::to_string(d.playersMin);
    return std::to_string(d.playersMin) + "–" + std::to_string(d.playersMax);
}

std::string metresText(double v) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%g", v);
    return buf;
}

/// "2,5" for machine formats; with a grid, the zone's name on it.
std::vector<std::string> zoneTexts(const Drill& d, const ZoneGrid* grid = nullptr) {
    std::vector<std::string> out;
    for (const Zone& z : d.zones)
        out.push_back(grid ? zoneName(z.band, z.lane, *grid)
                           : std::to_string(z.band) + "," + std::to_string(z.lane));
    return out;
}

nlohmann::json listedJson(const Drill& d) {
    nlohmann::json j = d;
    j["id"] = d.id;
    j["created_at"] = d.createdAt;
    j["edited_at"] = d.editedAt;
    j["edited_by"] = d.editedBy;
    j["versions"] = d.versionCount;
    j["deleted"] = d.deleted;
    return j;
}

/// Reads "8-14" (or "8–14") as a range, "10" as 10–10.
bool parsePlayers(const std::string& text, int& lo, int& hi) {
    std::string s = text;
    for (const std::string dash : {"–", "—"})
        if (auto at = s.find(dash); at != std::string::npos) s.replace(at, dash.size(), "-");
    try {
        std::size_t used = 0;
        lo = std::stoi(s, &used);
        if (used == s.size()) {
            hi = lo;
            return true;
        }
        if (s[used] != '-') return false;
        const std::string rest = s.substr(used + 1);
        std::size_t used2 = 0;
        hi = std::stoi(rest, &used2);
        return used2 == rest.size() && !rest.empty() &&
               std::isdigit(static_cast<unsigned char>(rest[0]));
    } catch (const std::exception&) {
        return false;
    }
}

/// Reads "40x30" (also "40X30", "40×30", "52.5x40") as length × width in metres.
bool parseArea(const std::string& text, double& length, double& width) {
    std::string s = text;
    if (auto at = s.find("×"); at != std::string::npos) s.replace(at, std::string("×").size(), "x");
    const auto x = s.find_first_of("xX");
    if (x == std::string::npos) return false;
    auto number = [](const std::string& part, double& out) {
        try {
            std::size_t used = 0;
            out = std::stod(part, &used);
            return used == part.size() && !part.empty() &&
                   std::isdigit(static_cast<unsigned char>(part[0])) && std::isfinite(out);
        } catch (const std::exception&) {
            return false;
        }
    };
    return number(s.substr(0, x), length) && number(s.substr(x + 1), width);
}

} // namespace

void DrillVerbs::addFieldFlags(CLI::App* sub) {
    sub->add_option("--title", m_title, "Title (any language or script)");
    sub->add_option("--purpose", m_purpose, "What the drill is for");
    sub->add_option("--organisation", m_organisation, "Set-up, rules, rotations (free text)");
    sub->add_option("--point", m_points, "A coaching point (repeat, in order)")
        ->allow_extra_args(false);
    sub->add_option("--minutes", m_minutes, "Duration in minutes, 1–180");
    sub->add_option("--intensity", m_intensity,
                    "1 recovery, 2 light, 3 moderate, 4 high, 5 maximal");
    sub->add_option("--players", m_players, "Players, e.g. 8-14 or 10 (1–40)");
    sub->add_option("--area", m_area, "Area in metres, LENGTHxWIDTH, e.g. 40x30");
    sub->add_option("--equipment", m_equipment, "Equipment item (repeat)")->allow_extra_args(false);
    sub->add_option("--metric", m_metrics, "Metric id it works on (repeat; pitchloop metrics list)")
        ->allow_extra_args(false);
    sub->add_option("--zone", m_zones, "Zone it works on as BAND,LANE (repeat)")
        ->allow_extra_args(false);
    sub->add_option("--tag", m_tags, "Tag, e.g. warm_up, cool_down, pressing (repeat)")
        ->allow_extra_args(false);
    sub->add_option("--role", m_role, "Its part in a session: warm_up, main or cool_down (else the "
                                      "tags warm_up / cool_down say)")
        ->check(CLI::IsMember({"warm_up", "main", "cool_down"}));
}

DrillVerbs::DrillVerbs(CLI::App& app) {
    m_group = app.add_subcommand("drills", "The drill book: add, edit, list, show, search, "
                                           "history, delete, restore, import, export");
    m_group->require_subcommand(1);
    auto format = [this](CLI::App* sub, std::initializer_list<std::string> allowed) {
        sub->add_option("--format", m_format, "Output: " + join(allowed, ", "))
            ->check(CLI::IsMember(std::vector<std::string>(allowed)));
    };

    m_add = m_group->add_subcommand("add", "Add a drill from --file or from field flags");
    auto* addFile =
        m_add->add_option("--file", m_file, "One drill as a JSON object (docs/drills.md)");
    addFieldFlags(m_add);
    m_add->add_option("--author", m_author, "Who wrote the drill");
    for (auto* opt : m_add->get_options())
        if (opt != addFile && opt->get_name() != "--help") addFile->excludes(opt);

    m_edit = m_group->add_subcommand("edit", "Change the given fields of a drill (a new "
                                             "version; earlier ones are kept)");
    m_edit->add_option("id", m_id, "Drill id")->required();
    auto* editFile = m_edit->add_option("--file", m_file, "JSON object with the fields to change");
    addFieldFlags(m_edit);
    m_edit
        ->add_option("--clear", m_clear,
                     "Empty a field: purpose, organisation, points, area, "
                     "equipment, metrics, zones, tags (repeat)")
        ->check(CLI::IsMember(
            {"purpose", "organisation", "points", "area", "equipment", "metrics", "zones", "tags"}))
        ->allow_extra_args(false);
    for (auto* opt : m_edit->get_options())
        if (opt != editFile && opt->get_name() != "--help" && opt->get_name() != "id")
            editFile->excludes(opt);
    m_edit->add_option("--author", m_author, "Who makes the change")->required();

    m_list = m_group->add_subcommand("list", "Every drill (a table, csv or json)");
    m_list->add_flag("--include-deleted", m_includeDeleted, "Also deleted drills");
    format(m_list, {"table", "csv", "json"});

    m_search = m_group->add_subcommand("search", "Drills matching every filter given");
    m_search->add_option("text", m_words,
                         "Words that must all appear (title, purpose, "
                         "organisation, coaching points, tags; case ignored)");
    m_search->add_option("--tag", m_tag, "Has this tag");
    m_search->add_option("--metric", m_metric, "Works on this metric");
    m_search->add_option("--zone", m_zone, "Works on this zone, BAND,LANE");
    m_search->add_flag("--include-deleted", m_includeDeleted, "Also deleted drills");
    format(m_search, {"table", "csv", "json"});

    m_show = m_group->add_subcommand("show", "Every field of a drill and its version count");
    m_show->add_option("id", m_id, "Drill id")->required();
    format(m_show, {"text", "json"});

    m_history = m_group->add_subcommand("history", "Every version of a drill, oldest first");
    m_history->add_option("id", m_id, "Drill id")->required();
    format(m_history, {"table", "json"});

    m_delete = m_group->add_subcommand("delete", "Remove a drill from the book (restorable)");
    m_delete->add_option("id", m_id, "Drill id")->required();
    m_restore = m_group->add_subcommand("restore", "Bring a deleted drill back");
    m_restore->add_option("id", m_id, "Drill id")->required();

    m_import = m_group->add_subcommand("import", "Add the drills of a drills file; drills the "
                                                 "book already has are skipped");
    m_import->add_option("file", m_file, "Drills file (docs/drills.md)")->required();
    m_export = m_group->add_subcommand("export", "Write the live drills as a drills file");
}

int DrillVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    DrillBook book(*repo);
    if (m_add->parsed()) return runAdd(book, out, err);
    if (m_edit->parsed()) return runEdit(book, err);
    if (m_list->parsed()) return runList(book, false, out, err);
    if (m_search->parsed()) return runList(book, true, out, err);
    if (m_show->parsed()) return runShow(book, out, err);
    if (m_history->parsed()) return runHistory(book, out, err);
    if (m_delete->parsed()) return runDelete(book, false, err);
    if (m_restore->parsed()) return runDelete(book, true, err);
    if (m_import->parsed()) return runImport(book, err);
    if (m_export->parsed()) return runExport(book, out);
    return kExitOk;
}

bool DrillVerbs::applyFlags(const CLI::App* sub, Drill& d, bool& given, std::ostream& err) const {
    auto has = [&](const char* flag) {
        const bool yes = sub->count(flag) > 0;
        given = given || yes;
        return yes;
    };
    for (const auto& field : m_clear) {
        given = true;
        if (field == "purpose")
            d.purpose.clear();
        else if (field == "organisation")
            d.organisation.clear();
        else if (field == "points")
            d.coachingPoints.clear();
        else if (field == "area")
            d.areaLengthM = d.areaWidthM = 0;
        else if (field == "equipment")
            d.equipment.clear();
        else if (field == "metrics")
            d.metrics.clear();
        else if (field == "zones")
            d.zones.clear();
        else if (field == "tags")
            d.tags.clear();
    }
    if (has("--title")) d.title = m_title;
    if (has("--purpose")) d.purpose = m_purpose;
    if (has("--organisation")) d.organisation = m_organisation;
    if (has("--point")) d.coachingPoints = m_points;
    if (has("--minutes")) d.durationMin = m_minutes;
    if (has("--intensity")) d.intensity = m_intensity;
    if (has("--players") && !parsePlayers(m_players, d.playersMin, d.playersMax)) {
        err << "error: --players " << m_players << ": expected MIN-MAX such as 8-14, or one "
            << "number\n";
        return false;
    }
    if (has("--area") && !parseArea(m_area, d.areaLengthM, d.areaWidthM)) {
        err << "error: --area " << m_area << ": expected LENGTHxWIDTH in metres such as 40x30\n";
        return false;
    }
    if (has("--equipment")) d.equipment = m_equipment;
    if (has("--metric")) d.metrics = m_metrics;
    if (has("--zone")) {
        d.zones.clear();
        for (const auto& text : m_zones) {
            const auto z = parseZone(text);
            if (!z) {
                err << "error: --zone " << text << ": expected BAND,LANE such as 2,5\n";
                return false;
            }
            d.zones.push_back(*z);
        }
    }
    if (has("--tag")) d.tags = m_tags;
    if (has("--role")) d.role = *drillRoleFromString(m_role);
    return true;
}

int DrillVerbs::runAdd(DrillBook& book, std::ostream& out, std::ostream& err) {
    Drill d;
    std::string source = kCommandLine;
    if (!m_file.empty()) {
        std::string text;
        try {
            text = readFileBytes(m_file);
        } catch (const IoError&) {
            err << "error: " << m_file << ": cannot be read\n";
            return kExitBadInput;
        }
        auto parsed = parseDrillObject(text, m_file, Drill{}, true, book.metrics(), book.grid());
        if (!parsed.errors.empty()) {
            reportProblems(parsed.errors, err);
            err << m_file << ": no drill added\n";
            return kExitBadInput;
        }
        d = parsed.drill;
        source = m_file;
    } else {
        std::vector<std::string> missing;
        for (const char* flag : {"--title", "--author", "--minutes", "--intensity", "--players"})
            if (m_add->count(flag) == 0) missing.push_back(flag);
        if (!missing.empty()) {
            err << "error: drills add needs " << join(missing, ", ")
                << " (or --file with one drill)\n";
            return kExitBadInput;
        }
        bool given = false;
        if (!applyFlags(m_add, d, given, err)) return kExitBadInput;
        d.author = m_author;
    }
    const DrillChange r = book.add(d, d.author, nowUtc(), source);
    if (!r.ok()) return reportProblems(r.problems, err);
    out << r.id << "\n";
    err << "added drill " << r.id << ": " << d.title << "\n";
    return kExitOk;
}

int DrillVerbs::runEdit(DrillBook& book, std::ostream& err) {
    const auto current = book.get(m_id);
    if (!current) {
        err << "error: no drill " << m_id << " (see: pitchloop drills list)\n";
        return kExitBadInput;
    }
    Drill d = *current;
    std::string source = kCommandLine;
    if (!m_file.empty()) {
        std::string text;
        try {
            text = readFileBytes(m_file);
        } catch (const IoError&) {
            err << "error: " << m_file << ": cannot be read\n";
            return kExitBadInput;
        }
        auto parsed = parseDrillObject(text, m_file, *current, false, book.metrics(), book.grid());
        if (!parsed.errors.empty()) {
            reportProblems(parsed.errors, err);
            err << m_file << ": drill " << m_id << " unchanged\n";
            return kExitBadInput;
        }
        d = parsed.drill;
        source = m_file;
    } else {
        bool given = false;
        if (!applyFlags(m_edit, d, given, err)) return kExitBadInput;
        if (!given) {
            err << "error: nothing to change: give --file or a field flag (--title, --minutes, "
                   "...; see: pitchloop drills edit --help)\n";
            return kExitBadInput;
        }
    }
    const DrillChange r = book.edit(m_id, d, m_author, nowUtc(), source);
    if (!r.ok()) return reportProblems(r.problems, err);
    if (!r.changed)
        err << "drill " << m_id << " unchanged: it already says that\n";
    else
        err << "drill " << m_id << ": version " << current->versionCount + 1 << " saved\n";
    return kExitOk;
}

int DrillVerbs::runList(DrillBook& book, bool search, std::ostream& out, std::ostream& err) {
    std::vector<Drill> drills;
    if (search) {
        DrillQuery q;
        q.text = join(m_words, " ");
        q.tag = m_tag;
        q.metric = m_metric;
        q.includeDeleted = m_includeDeleted;
        if (!m_metric.empty()) {
            const auto metrics = book.metrics();
            if (std::none_of(metrics.begin(), metrics.end(),
                             [&](const MetricSpec& m) { return m.id == m_metric; })) {
                err << "error: --metric: no metric '" << m_metric
                    << "' (see: pitchloop metrics list)\n";
                return kExitBadInput;
            }
        }
        if (!m_zone.empty()) {
            const ZoneGrid grid = book.grid();
            q.zone = parseZone(m_zone);
            if (!q.zone || q.zone->band > grid.bands() || q.zone->lane > grid.lanes()) {
                err << "error: --zone " << m_zone << ": expected BAND,LANE within the "
                    << grid.name() << " grid (bands 1–" << grid.bands() << ", lanes 1–"
                    << grid.lanes() << ")\n";
                return kExitBadInput;
            }
        }
        drills = book.search(q);
    } else {
        drills = book.list(m_includeDeleted);
    }
    if (m_format == "json") {
        nlohmann::json list = nlohmann::json::array();
        for (const auto& d : drills)
            list.push_back(listedJson(d));
        out << list.dump(2) << "\n";
        return kExitOk;
    }
    if (m_format == "csv") {
        out << "id,title,duration_min,intensity,players_min,players_max,area_length_m,"
               "area_width_m,metrics,zones,tags,author,edited_at,versions,deleted\n";
        for (const auto& d : drills)
            out << d.id << ',' << csvField(d.title) << ',' << d.durationMin << ',' << d.intensity
                << ',' << d.playersMin << ',' << d.playersMax << ','
                << (d.hasArea() ? metresText(d.areaLengthM) : "") << ','
                << (d.hasArea() ? metresText(d.areaWidthM) : "") << ','
                << csvField(join(d.metrics, ";")) << ',' << csvField(join(zoneTexts(d), ";"))
                << ',' << csvField(join(d.tags, ";")) << ',' << csvField(d.author) << ','
                << d.editedAt << ',' << d.versionCount << ',' << (d.deleted ? 1 : 0) << "\n";
        return kExitOk;
    }
    out << "  id  " << fit("title", 44) << "  min  intensity    players  metrics\n";
    for (const auto& d : drills) {
        char head[16];
        std::snprintf(head, sizeof head, "%4lld  ", static_cast<long long>(d.id));
        char numbers[96];
        std::snprintf(numbers, sizeof numbers, "  %3d  %d %-9s  ", d.durationMin, d.intensity,
                      std::string(intensityName(d.intensity)).c_str());
        out << head << fit(d.deleted ? "[deleted] " + d.title : d.title, 44) << numbers
            << fit(playersText(d), 7) << "  " << (d.metrics.empty() ? "-" : join(d.metrics, ", "))
            << "\n";
    }
    if (drills.empty())
        out << (search ? "(no drill matches)\n" : "(no drills yet: pitchloop drills add --help)\n");
    return kExitOk;
}

int DrillVerbs::runShow(DrillBook& book, std::ostream& out, std::ostream& err) {
    const auto found = book.get(m_id);
    if (!found) {
        err << "error: no drill " << m_id << " (see: pitchloop drills list)\n";
        return kExitBadInput;
    }
    const Drill& d = *found;
    if (m_format == "json") {
        out << listedJson(d).dump(2) << "\n";
        return kExitOk;
    }
    auto line = [&](const char* label, const std::string& value) {
        out << fit(std::string(label) + ":", 17) << value << "\n";
    };
    out << "Drill " << d.id << ": " << d.title << (d.deleted ? "  [deleted]" : "") << "\n";
    line("purpose", d.purpose.empty() ? "-" : d.purpose);
    if (d.organisation.empty())
        line("organisation", "-");
    else {
        out << "organisation:\n";
        std::size_t at = 0;
        while (at <= d.organisation.size()) {
            const auto end = d.organisation.find('\n', at);
            out << "  " << d.organisation.substr(at, end - at) << "\n";
            if (end == std::string::npos) break;
            at = end + 1;
        }
    }
    if (d.coachingPoints.empty())
        line("coaching points", "-");
    else {
        out << "coaching points:\n";
        for (std::size_t i = 0; i < d.coachingPoints.size(); ++i)
            out << "  " << i + 1 << ". " << d.coachingPoints[i] << "\n";
    }
    line("duration", std::to_string(d.durationMin) + " min");
    line("intensity",
         std::to_string(d.intensity) + " (" + std::string(intensityName(d.intensity)) + ")");
    line("players", playersText(d));
    line("area",
         d.hasArea() ? metresText(d.areaLengthM) + " × " + metresText(d.areaWidthM) + " m" : "-");
    line("equipment", d.equipment.empty() ? "-" : join(d.equipment, ", "));
    line("metrics", d.metrics.empty() ? "-" : join(d.metrics, ", "));
    const ZoneGrid grid = book.grid();
    line("zones", d.zones.empty() ? "-" : join(zoneTexts(d, &grid), ", "));
    line("tags", d.tags.empty() ? "-" : join(d.tags, ", "));
    if (d.role != DrillRole::Any) line("role", std::string(toString(d.role)));
    line("author", d.author);
    line("created", d.createdAt);
    line("last edited", d.editedAt + " by " + d.editedBy);
    line("versions", std::to_string(d.versionCount));
    if (d.deleted)
        line("status", "deleted (pitchloop drills restore " + std::to_string(d.id) + ")");
    return kExitOk;
}

int DrillVerbs::runHistory(DrillBook& book, std::ostream& out, std::ostream& err) {
    const auto versions = book.history(m_id);
    if (versions.empty()) {
        err << "error: no drill " << m_id << " (see: pitchloop drills list)\n";
        return kExitBadInput;
    }
    if (m_format == "json") {
        nlohmann::json list = nlohmann::json::array();
        for (const auto& v : versions)
            list.push_back({{"version", v.versionCount},
                            {"edited_at", v.editedAt},
                            {"edited_by", v.editedBy},
                            {"drill", nlohmann::json(v)}});
        out << list.dump(2) << "\n";
        return kExitOk;
    }
    out << "Drill " << m_id << ": " << versions.back().title << " — every version, oldest first"
        << (versions.back().deleted ? " (deleted)" : "") << "\n";
    for (std::size_t i = 0; i < versions.size(); ++i) {
        const Drill& v = versions[i];
        const std::string what =
            i == 0 ? "first version" : "changed: " + join(changedFields(versions[i - 1], v), ", ");
        out << "v" << v.versionCount << "  " << v.editedAt << "  " << fit(v.editedBy, 28) << "  "
            << what << "\n";
    }
    return kExitOk;
}

int DrillVerbs::runDelete(DrillBook& book, bool restore, std::ostream& err) {
    const DrillChange r = restore ? book.restore(m_id) : book.remove(m_id, nowUtc());
    if (!r.ok()) return reportProblems(r.problems, err);
    if (restore)
        err << "restored drill " << m_id << "\n";
    else
        err << "deleted drill " << m_id << " (undo: pitchloop drills restore " << m_id << ")\n";
    return kExitOk;
}

int DrillVerbs::runImport(DrillBook& book, std::ostream& err) {
    std::string text;
    try {
        text = readFileBytes(m_file);
    } catch (const IoError&) {
        err << "error: " << m_file << ": cannot be read\n";
        return kExitBadInput;
    }
    const auto parsed = parseDrillFile(text, m_file, book.metrics(), book.grid());
    DrillImport r;
    r.errors = parsed.errors;
    if (r.errors.empty()) r = book.importDrills(parsed.drills, nowUtc(), m_file);
    if (!r.errors.empty()) {
        reportProblems(r.errors, err);
        err << m_file << ": no drill imported\n";
        return kExitBadInput;
    }
    err << "imported " << r.added.size() << " drill" << (r.added.size() == 1 ? "" : "s") << " ("
        << r.skipped << " already there)\n";
    return kExitOk;
}

int DrillVerbs::runExport(DrillBook& book, std::ostream& out) {
    out << writeDrillFile(book.list(false));
    return kExitOk;
}

} // namespace pitchloop::cli
