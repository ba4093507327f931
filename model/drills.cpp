#include "drills.h"
#include "storeguard.h"

#include "repository.h"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Statement.h>
#include <SQLiteCpp/Transaction.h>
#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <nlohmann/json.hpp>
#include <set>

namespace pitchloop::model {

using nlohmann::json;
using nlohmann::ordered_json;

std::string_view intensityName(int level) {
    static constexpr std::string_view kNames[] = {"recovery", "light", "moderate", "high",
                                                  "maximal"};
    if (level < kIntensityMin || level > kIntensityMax) return "";
    return kNames[level - 1];
}

bool Drill::sameContent(const Drill& o) const {
    return title == o.title && purpose == o.purpose && organisation == o.organisation &&
           coachingPoints == o.coachingPoints && durationMin == o.durationMin &&
           intensity == o.intensity && playersMin == o.playersMin && playersMax == o.playersMax &&
           areaLengthM == o.areaLengthM && areaWidthM == o.areaWidthM && equipment == o.equipment &&
           metrics == o.metrics && zones == o.zones && tags == o.tags && role == o.role &&
           author == o.author;
}

std::string_view toString(DrillRole r) {
    switch (r) {
    case DrillRole::Any: return "";
    case DrillRole::WarmUp: return "warm_up";
    case DrillRole::Main: return "main";
    case DrillRole::CoolDown: return "cool_down";
    }
    return "";
}

std::optional<DrillRole> drillRoleFromString(std::string_view s) {
    for (DrillRole r : {DrillRole::WarmUp, DrillRole::Main, DrillRole::CoolDown})
        if (toString(r) == s) return r;
    return std::nullopt;
}

namespace {

/// Whole metres as integers (40, not 40.0), anything else as it is.
template <typename J> J metres(double v) {
    if (std::floor(v) == v && std::abs(v) < 1e9) return J(static_cast<std::int64_t>(v));
    return J(v);
}

/// The content of a drill in file order (ordered_json) or key order (json).
template <typename J> J contentJson(const Drill& d) {
    J j = J::object();
    j["title"] = d.title;
    j["purpose"] = d.purpose;
    j["organisation"] = d.organisation;
    j["coaching_points"] = d.coachingPoints;
    j["duration_min"] = d.durationMin;
    j["intensity"] = d.intensity;
    J players = J::object();
    players["min"] = d.playersMin;
    players["max"] = d.playersMax;
    j["players"] = players;
    if (d.hasArea()) {
        J area = J::object();
        area["length"] = metres<J>(d.areaLengthM);
        area["width"] = metres<J>(d.areaWidthM);
        j["area_m"] = area;
    }
    j["equipment"] = d.equipment;
    j["metrics"] = d.metrics;
    J zones = J::array();
    for (const Zone& z : d.zones)
        zones.push_back(J::array({z.band, z.lane}));
    j["zones"] = zones;
    j["tags"] = d.tags;
    if (d.role != DrillRole::Any) j["role"] = std::string(toString(d.role));
    j["author"] = d.author;
    return j;
}

bool isBlank(std::string_view s) {
    return std::all_of(s.begin(), s.end(), [](unsigned char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\r';
    });
}

/// Well-formed UTF-8 (RFC 3629): no stray continuation bytes, overlong forms, surrogates or
/// code points past U+10FFFF.
bool validUtf8(std::string_view s) {
    std::size_t i = 0;
    while (i < s.size()) {
        const auto c = static_cast<unsigned char>(s[i]);
        int extra = 0;
        std::uint32_t cp = 0;
        if (c < 0x80) {
            ++i;
            continue;
        } else if (c >= 0xC2 && c <= 0xDF) {
            extra = 1;
            cp = c & 0x1F;
        } else if (c >= 0xE0 && c <= 0xEF) {
            extra = 2;
            cp = c & 0x0F;
        } else if (c >= 0xF0 && c <= 0xF4) {
            extra = 3;
            cp = c & 0x07;
        } else {
            return false;
        }
        if (i + static_cast<std::size_t>(extra) >= s.size()) return false;
        for (int k = 1; k <= extra; ++k) {
            const auto cc = static_cast<unsigned char>(s[i + static_cast<std::size_t>(k)]);
            if ((cc & 0xC0) != 0x80) return false;
            cp = (cp << 6) | (cc & 0x3F);
        }
        if ((extra == 2 && (cp < 0x800 || (cp >= 0xD800 && cp <= 0xDFFF))) ||
            (extra == 3 && (cp < 0x10000 || cp > 0x10FFFF)))
            return false;
        i += static_cast<std::size_t>(extra) + 1;
    }
    return true;
}

/// ASCII control characters (line breaks and tabs allowed when `lines`).
bool hasControl(std::string_view s, bool lines) {
    return std::any_of(s.begin(), s.end(), [lines](char ch) {
        const auto c = static_cast<unsigned char>(ch);
        if (lines && (c == '\n' || c == '\t' || c == '\r')) return false;
        return c < 0x20 || c == 0x7F;
    });
}

std::string numberText(double v) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%g", v);
    return buf;
}

std::string rangeText(int lo, int hi) {
    return std::to_string(lo) + "–" + std::to_string(hi);
}

} // namespace

void to_json(json& j, const Drill& d) {
    j = contentJson<json>(d);
}

std::vector<std::string> changedFields(const Drill& before, const Drill& after) {
    const json a = before, b = after;
    std::vector<std::string> out;
    for (auto it = b.begin(); it != b.end(); ++it)
        if (!a.contains(it.key()) || a[it.key()] != it.value()) out.push_back(it.key());
    for (auto it = a.begin(); it != a.end(); ++it)
        if (!b.contains(it.key())) out.push_back(it.key());
    return out;
}

void from_json(const json& j, Drill& d) {
    d.title = j.at("title").get<std::string>();
    d.purpose = j.value("purpose", std::string());
    d.organisation = j.value("organisation", std::string());
    d.coachingPoints = j.value("coaching_points", std::vector<std::string>());
    d.durationMin = j.at("duration_min").get<int>();
    d.intensity = j.at("intensity").get<int>();
    d.playersMin = j.at("players").at("min").get<int>();
    d.playersMax = j.at("players").at("max").get<int>();
    d.areaLengthM = 0;
    d.areaWidthM = 0;
    if (auto it = j.find("area_m"); it != j.end()) {
        d.areaLengthM = it->at("length").get<double>();
        d.areaWidthM = it->at("width").get<double>();
    }
    d.equipment = j.value("equipment", std::vector<std::string>());
    d.metrics = j.value("metrics", std::vector<std::string>());
    d.zones.clear();
    if (auto it = j.find("zones"); it != j.end())
        for (const auto& z : *it)
            d.zones.push_back({z.at(0).get<int>(), z.at(1).get<int>()});
    d.tags = j.value("tags", std::vector<std::string>());
    d.role = DrillRole::Any;
    if (auto it = j.find("role"); it != j.end())
        if (const auto r = drillRoleFromString(it->get<std::string>())) d.role = *r;
    d.author = j.at("author").get<std::string>();
}

Problems validateDrill(const Drill& d, const std::vector<MetricSpec>& metrics, const ZoneGrid& grid,
                       const std::string& source) {
    Problems out;
    auto problem = [&](const std::string& field, const std::string& message) {
        out.push_back({source, "", field, message});
    };
    auto text = [&](const std::string& field, const std::string& v, bool required, bool lines) {
        if (!validUtf8(v))
            problem(field, "not valid UTF-8 text");
        else if (required && isBlank(v))
            problem(field, "required");
        else if (hasControl(v, lines))
            problem(field, lines ? "control characters other than line breaks and tabs"
                                 : "expected one line without control characters");
    };
    auto texts = [&](const std::string& key, const std::vector<std::string>& list, bool lines,
                     bool caseless) {
        std::set<std::string> seen;
        for (std::size_t i = 0; i < list.size(); ++i) {
            const std::string field = key + "[" + std::to_string(i) + "]";
            const std::size_t before = out.size();
            text(field, list[i], true, lines);
            if (out.size() != before) continue;
            if (!seen.insert(caseless ? asciiLower(list[i]) : list[i]).second)
                problem(field, "'" + list[i] + "' is listed twice");
        }
    };
    auto range = [&](const std::string& field, int v, int lo, int hi) {
        if (v < lo || v > hi)
            problem(field, "expected " + rangeText(lo, hi) + ", found " + std::to_string(v));
        return v >= lo && v <= hi;
    };

    text("title", d.title, true, false);
    text("author", d.author, true, false);
    text("purpose", d.purpose, false, true);
    text("organisation", d.organisation, false, true);
    texts("coaching_points", d.coachingPoints, true, false);
    texts("equipment", d.equipment, false, false);
    texts("tags", d.tags, false, true);

    range("duration_min", d.durationMin, 1, kDrillMinutesMax);
    range("intensity", d.intensity, kIntensityMin, kIntensityMax);
    const bool minOk = range("players.min", d.playersMin, 1, kDrillPlayersMax);
    const bool maxOk = range("players.max", d.playersMax, 1, kDrillPlayersMax);
    if (minOk && maxOk && d.playersMin > d.playersMax)
        problem("players", "min " + std::to_string(d.playersMin) + " is more than max " +
                               std::to_string(d.playersMax));
    if (d.hasArea()) {
        for (auto [field, v, hi] :
             {std::tuple{"area_m.length", d.areaLengthM, kDrillAreaLengthMaxM},
              std::tuple{"area_m.width", d.areaWidthM, kDrillAreaWidthMaxM}})
            if (!std::isfinite(v) || v < 1 || v > hi)
                problem(field, "expected 1–" + numberText(hi) + " m, found " + numberText(v));
    }

    std::set<std::string> seenMetrics;
    for (std::size_t i = 0; i < d.metrics.size(); ++i) {
        const std::string field = "metrics[" + std::to_string(i) + "]";
        const std::string& id = d.metrics[i];
        const bool known = std::any_of(metrics.begin(), metrics.end(),
                                       [&](const MetricSpec& m) { return m.id == id; });
        if (!known)
            problem(field, "unknown metric '" + id + "'");
        else if (!seenMetrics.insert(id).second)
            problem(field, "'" + id + "' is listed twice");
    }
    for (std::size_t i = 0; i < d.zones.size(); ++i) {
        const std::string field = "zones[" + std::to_string(i) + "]";
        const Zone z = d.zones[i];
        if (z.band < 1 || z.band > grid.bands() || z.lane < 1 || z.lane > grid.lanes())
            problem(field, "band " + std::to_string(z.band) + " lane " + std::to_string(z.lane) +
                               " is outside the " + grid.name() + " grid (bands " +
                               rangeText(1, grid.bands()) + ", lanes " +
                               rangeText(1, grid.lanes()) + ")");
        else if (std::find(d.zones.begin(), d.zones.begin() + static_cast<std::ptrdiff_t>(i), z) !=
                 d.zones.begin() + static_cast<std::ptrdiff_t>(i))
            problem(field, "band " + std::to_string(z.band) + " lane " + std::to_string(z.lane) +
                               " is listed twice");
    }
    return out;
}

std::string asciiLower(std::string_view text) {
    std::string out(text);
    for (char& c : out)
        if (c >= 'A' && c <= 'Z') c = static_cast<char>(c - 'A' + 'a');
    return out;
}

std::string drillSearchText(const Drill& d) {
    std::string out = d.title + "\n" + d.purpose + "\n" + d.organisation;
    for (const auto& p : d.coachingPoints)
        out += "\n" + p;
    for (const auto& t : d.tags) {
        out += "\n" + t;
        if (t.find('_') != std::string::npos) {
            std::string spaced = t;
            std::replace(spaced.begin(), spaced.end(), '_', ' ');
            out += "\n" + spaced;
        }
    }
    return asciiLower(out);
}

// Reading drills files --------------------------------------------------------------------

namespace {

/// Reads one drill object onto a drill, reporting shape problems (wrong types, unknown or
/// missing keys); the ranges are left to validateDrill.
class DrillReader {
  public:
    DrillReader(const std::string& source, std::string place, Problems& errors)
        : m_source(source), m_place(std::move(place)), m_errors(errors) {}

    void read(const json& v, Drill& d, bool complete) {
        static const std::set<std::string> kKeys{
            "title",     "purpose", "organisation", "coaching_points", "duration_min",
            "intensity", "players", "area_m",       "equipment",       "metrics",
            "zones",     "tags",    "role",         "author"};
        for (auto it = v.begin(); it != v.end(); ++it)
            if (!kKeys.contains(it.key())) error(it.key(), "unknown key");
        if (complete)
            for (const char* key : {"title", "author", "duration_min", "intensity", "players"})
                if (!v.contains(key)) error(key, "missing");
        text(v, "title", d.title);
        text(v, "purpose", d.purpose);
        text(v, "organisation", d.organisation);
        textList(v, "coaching_points", d.coachingPoints);
        whole(v, "duration_min", d.durationMin);
        whole(v, "intensity", d.intensity);
        if (auto it = v.find("players"); it != v.end()) {
            if (!it->is_object()) {
                error("players", "expected {\"min\": N, \"max\": N}, found " + shown(*it));
            } else {
                for (auto k = it->begin(); k != it->end(); ++k)
                    if (k.key() != "min" && k.key() != "max")
                        error("players." + k.key(), "unknown key");
                for (auto [key, out] :
                     {std::pair{"min", &d.playersMin}, std::pair{"max", &d.playersMax}}) {
                    if (!it->contains(key))
                        error(std::string("players.") + key, "missing");
                    else
                        whole(*it, key, *out, "players.");
                }
            }
        }
        if (auto it = v.find("area_m"); it != v.end()) {
            if (!it->is_object()) {
                error("area_m", "expected {\"length\": M, \"width\": M}, found " + shown(*it));
            } else {
                for (auto k = it->begin(); k != it->end(); ++k)
                    if (k.key() != "length" && k.key() != "width")
                        error("area_m." + k.key(), "unknown key");
                for (auto [key, out] :
                     {std::pair{"length", &d.areaLengthM}, std::pair{"width", &d.areaWidthM}}) {
                    auto f = it->find(key);
                    if (f == it->end())
                        error(std::string("area_m.") + key, "missing");
                    else if (!f->is_number())
                        error(std::string("area_m.") + key, "expected metres, found " + shown(*f));
                    else
                        *out = f->get<double>();
                }
            }
        }
        textList(v, "equipment", d.equipment);
        textList(v, "metrics", d.metrics);
        if (auto it = v.find("zones"); it != v.end()) {
            if (!it->is_array()) {
                error("zones", "expected a list of [band, lane] pairs, found " + shown(*it));
            } else {
                d.zones.clear();
                for (std::size_t i = 0; i < it->size(); ++i) {
                    const json& z = (*it)[i];
                    if (!z.is_array() || z.size() != 2 || !isWhole(z[0]) || !isWhole(z[1])) {
                        error("zones[" + std::to_string(i) + "]",
                              "expected [band, lane] with whole numbers, found " + shown(z));
                        continue;
                    }
                    d.zones.push_back({z[0].get<int>(), z[1].get<int>()});
                }
            }
        }
        textList(v, "tags", d.tags);
        if (auto it = v.find("role"); it != v.end()) {
            const auto r = it->is_string() ? drillRoleFromString(it->get<std::string>()) : std::nullopt;
            if (!r) error("role", "expected warm_up, main or cool_down, found " + shown(*it));
            else d.role = *r;
        }
        text(v, "author", d.author);
    }

    /// Fields (their first key) that already have a problem.
    const std::set<std::string>& failed() const { return m_failed; }

  private:
    static std::string shown(const json& v) {
        std::string s = v.dump();
        if (s.size() > 40) s = s.substr(0, 37) + "...";
        return s;
    }
    static bool isWhole(const json& v) {
        if (v.is_number_integer())
            return v.get<std::int64_t>() >= std::numeric_limits<int>::min() &&
                   v.get<std::int64_t>() <= std::numeric_limits<int>::max();
        return false;
    }
    void error(const std::string& field, const std::string& message) {
        m_errors.push_back({m_source, m_place, field, message});
        m_failed.insert(field.substr(0, field.find_first_of(".[")));
    }
    void text(const json& v, const char* key, std::string& out) {
        auto it = v.find(key);
        if (it == v.end()) return;
        if (!it->is_string())
            error(key, "expected text, found " + shown(*it));
        else
            out = it->get<std::string>();
    }
    void textList(const json& v, const char* key, std::vector<std::string>& out) {
        auto it = v.find(key);
        if (it == v.end()) return;
        if (!it->is_array()) {
            error(key, "expected a list of texts, found " + shown(*it));
            return;
        }
        out.clear();
        for (std::size_t i = 0; i < it->size(); ++i) {
            if (!(*it)[i].is_string())
                error(std::string(key) + "[" + std::to_string(i) + "]",
                      "expected text, found " + shown((*it)[i]));
            else
                out.push_back((*it)[i].get<std::string>());
        }
    }
    void whole(const json& v, const char* key, int& out, const std::string& prefix = "") {
        auto it = v.find(key);
        if (it == v.end()) return;
        if (!isWhole(*it))
            error(prefix + key, "expected a whole number, found " + shown(*it));
        else
            out = it->get<int>();
    }

    const std::string& m_source;
    std::string m_place;
    Problems& m_errors;
    std::set<std::string> m_failed;
};

/// Reads and validates one drill object; problems (shape first, then content) go to `errors`.
Drill readDrill(const json& v, const Drill& base, bool complete, const std::string& source,
                const std::string& place, const std::vector<MetricSpec>& metrics,
                const ZoneGrid& grid, Problems& errors) {
    Drill d = base;
    if (!v.is_object()) {
        errors.push_back(
            {source, place, "", "expected a drill object, found " + v.dump().substr(0, 40)});
        return d;
    }
    DrillReader reader(source, place, errors);
    reader.read(v, d, complete);
    for (Problem p : validateDrill(d, metrics, grid, source)) {
        if (reader.failed().contains(p.field.substr(0, p.field.find_first_of(".[")))) continue;
        p.place = place;
        errors.push_back(std::move(p));
    }
    return d;
}

std::optional<json> parseJson(std::string_view text, const std::string& source, Problems& errors) {
    try {
        return json::parse(text.begin(), text.end());
    } catch (const json::parse_error& e) {
        errors.push_back({source, "", "", std::string("not valid JSON: ") + e.what()});
        return std::nullopt;
    }
}

bool isDrillsFile(const json& root) {
    return root.is_object() && root.contains("format") && root.contains("drills");
}

bool checkHeader(const json& root, const std::string& source, Problems& errors) {
    if (!root.is_object() || root.value("format", json()) != "pitchloop-drills" ||
        root.value("version", json()) != 1) {
        errors.push_back(
            {source, "", "format", "expected \"format\": \"pitchloop-drills\" and \"version\": 1"});
        return false;
    }
    for (auto it = root.begin(); it != root.end(); ++it)
        if (it.key() != "format" && it.key() != "version" && it.key() != "drills")
            errors.push_back({source, "", it.key(), "unknown key"});
    if (!root.contains("drills") || !root["drills"].is_array()) {
        errors.push_back({source, "", "drills", "expected a list of drills"});
        return false;
    }
    return errors.empty();
}

} // namespace

DrillFileResult parseDrillFile(std::string_view jsonText, const std::string& source,
                               const std::vector<MetricSpec>& metrics, const ZoneGrid& grid) {
    DrillFileResult r;
    const auto root = parseJson(jsonText, source, r.errors);
    if (!root || !checkHeader(*root, source, r.errors)) return r;
    const json& list = (*root)["drills"];
    for (std::size_t i = 0; i < list.size(); ++i)
        r.drills.push_back(readDrill(list[i], Drill{}, true, source,
                                     "drills[" + std::to_string(i) + "]", metrics, grid, r.errors));
    if (!r.errors.empty()) r.drills.clear();
    return r;
}

DrillObjectResult parseDrillObject(std::string_view jsonText, const std::string& source,
                                   const Drill& base, bool complete,
                                   const std::vector<MetricSpec>& metrics, const ZoneGrid& grid) {
    DrillObjectResult r{base, {}};
    const auto root = parseJson(jsonText, source, r.errors);
    if (!root) return r;
    if (isDrillsFile(*root)) {
        if (!checkHeader(*root, source, r.errors)) return r;
        if ((*root)["drills"].size() != 1) {
            r.errors.push_back({source, "", "drills",
                                "expected one drill here, found " +
                                    std::to_string((*root)["drills"].size()) +
                                    " (a file of several drills is imported into the drill book as a whole)"});
            return r;
        }
        r.drill = readDrill((*root)["drills"][0], base, complete, source, "drills[0]", metrics,
                            grid, r.errors);
        return r;
    }
    r.drill = readDrill(*root, base, complete, source, "", metrics, grid, r.errors);
    return r;
}

namespace {

/// Numbers, and lists or objects of nothing but numbers, fit on one line.
bool numbersOnly(const ordered_json& v) {
    if (v.is_number()) return true;
    if (!v.is_structured()) return false;
    return std::all_of(v.begin(), v.end(), [](const ordered_json& c) { return numbersOnly(c); });
}

/// A short list of short texts (tags, metrics, equipment) fits on one line.
bool shortTexts(const ordered_json& v) {
    if (!v.is_array()) return false;
    std::size_t length = 0;
    for (const auto& c : v) {
        if (!c.is_string()) return false;
        length += c.get_ref<const std::string&>().size() + 4;
    }
    return length <= 64;
}

/// Like dump(2), but zones ([[2, 5], [3, 5]]), players, area and short lists of texts stay on
/// one line so the file reads as people write it.
void writePretty(const ordered_json& v, int indent, std::string& out) {
    const bool oneLine = numbersOnly(v) || shortTexts(v) || v.empty() || !v.is_structured();
    if (!v.is_structured() || (oneLine && v.empty())) {
        out += v.dump();
        return;
    }
    const bool object = v.is_object();
    const std::string inner(static_cast<std::size_t>(indent + 2), ' ');
    out += object ? '{' : '[';
    bool first = true;
    for (auto it = v.begin(); it != v.end(); ++it) {
        out += first ? "" : ",";
        out += oneLine ? (first ? "" : " ") : "\n" + inner;
        first = false;
        if (object) out += ordered_json(it.key()).dump() + ": ";
        writePretty(*it, indent + 2, out);
    }
    if (!oneLine) out += "\n" + std::string(static_cast<std::size_t>(indent), ' ');
    out += object ? '}' : ']';
}

} // namespace

std::string writeDrillFile(const std::vector<Drill>& drills) {
    ordered_json list = ordered_json::array();
    for (const auto& d : drills)
        list.push_back(contentJson<ordered_json>(d));
    ordered_json root = ordered_json::object();
    root["format"] = "pitchloop-drills";
    root["version"] = 1;
    root["drills"] = list;
    std::string out;
    writePretty(root, 0, out);
    return out + "\n";
}

// The drill book ---------------------------------------------------------------------------

namespace {

Problem noDrill(std::int64_t id) {
    return {"", "", "", "no drill " + std::to_string(id)};
}

/// deleted_at of a drill: nullopt when there is no such drill, "" when it is live.
std::optional<std::string> deletedAt(SQLite::Database& db, std::int64_t id) {
    SQLite::Statement q(db, "SELECT deleted_at FROM drill WHERE id = ?");
    q.bind(1, id);
    if (!q.executeStep()) return std::nullopt;
    return q.getColumn(0).isNull() ? std::string() : q.getColumn(0).getString();
}

Drill readBody(const std::string& body, std::int64_t id) {
    try {
        return json::parse(body).get<Drill>();
    } catch (const json::exception& e) {
        throw StorageError("drill " + std::to_string(id) +
                           ": a stored version is damaged: " + e.what());
    }
}

/// A version written on another grid shows its zones on the club's grid (mapZones); the
/// stored body is left as the coach wrote it.
void onClubGrid(Drill& d, const std::string& storedGrid, const ZoneGrid& clubGrid) {
    const auto grid = ZoneGrid::parse(storedGrid);
    if (!grid || *grid == clubGrid || d.zones.empty()) return;
    d.zonesGrid = grid->name();
    d.zones = mapZones(d.zones, *grid, clubGrid);
}

} // namespace

DrillBook::DrillBook(ClubRepository& repo) : m_repo(repo) {}

std::vector<MetricSpec> DrillBook::metrics() const {
    return m_repo.metrics();
}

ZoneGrid DrillBook::grid() const {
    return m_repo.tallyGrid();
}

std::int64_t DrillBook::insert(const Drill& drill, const std::string& who, const std::string& now) {
    SQLite::Database& db = m_repo.database();
    SQLite::Statement ins(db, "INSERT INTO drill(created_at) VALUES (?)");
    ins.bind(1, now);
    ins.exec();
    const std::int64_t id = db.getLastInsertRowid();
    addVersion(id, drill, who, now);
    return id;
}

void DrillBook::addVersion(std::int64_t id, const Drill& drill, const std::string& who,
                           const std::string& now) {
    SQLite::Statement ins(m_repo.database(),
                          "INSERT INTO drill_version(drill_id, body, title, search_text, "
                          "edited_by, edited_at, grid) VALUES (?, ?, ?, ?, ?, ?, ?)");
    ins.bind(1, id);
    ins.bind(2, json(drill).dump());
    ins.bind(3, drill.title);
    ins.bind(4, drillSearchText(drill));
    ins.bind(5, who);
    ins.bind(6, now);
    ins.bind(7, grid().name()); // zones are validated on the club's grid
    ins.exec();
}

DrillChange DrillBook::add(const Drill& drill, const std::string& who, const std::string& now,
                           const std::string& source) {
    DrillChange r;
    r.problems = validateDrill(drill, metrics(), grid(), source);
    if (isBlank(who)) r.problems.push_back({source, "", "edited_by", "say who writes it"});
    if (!r.ok()) return r;
    return guarded("cannot save drill", [&] {
        SQLite::Transaction tx(m_repo.database());
        r.id = insert(drill, who, now);
        tx.commit();
        r.changed = true;
        return r;
    });
}

DrillChange DrillBook::edit(std::int64_t id, const Drill& drill, const std::string& who,
                            const std::string& now, const std::string& source) {
    DrillChange r;
    r.id = id;
    r.problems = validateDrill(drill, metrics(), grid(), source);
    if (isBlank(who)) r.problems.push_back({source, "", "edited_by", "say who edits it"});
    return guarded("cannot save drill", [&] {
        // The drill is looked at inside the transaction that adds the version, so a delete
        // made meanwhile by another program cannot slip in between.
        SQLite::Transaction tx(m_repo.database());
        const auto current = get(id);
        if (!current || current->deleted) {
            r.problems.assign(1, current ? Problem{"", "", "",
                                                   "drill " + std::to_string(id) +
                                                       " is deleted; restore it first"}
                                         : noDrill(id));
            return r;
        }
        if (!r.ok() || current->sameContent(drill)) return r;
        addVersion(id, drill, who, now);
        tx.commit();
        r.changed = true;
        return r;
    });
}

std::vector<Drill> DrillBook::query(const std::string& where, const std::vector<std::string>& words,
                                    std::optional<std::int64_t> id) const {
    return guarded("cannot read drills", [&] {
        std::string sql =
            "SELECT d.id, d.created_at, d.deleted_at IS NOT NULL, v.body, v.edited_by, "
            "v.edited_at, (SELECT count(*) FROM drill_version c WHERE c.drill_id = d.id), v.grid "
            "FROM drill d JOIN drill_version v ON v.id = "
            "(SELECT max(l.id) FROM drill_version l WHERE l.drill_id = d.id) WHERE 1 " +
            where;
        if (id) sql += " AND d.id = ?";
        for (std::size_t i = 0; i < words.size(); ++i)
            sql += " AND instr(v.search_text, ?) > 0";
        sql += " ORDER BY d.id";
        SQLite::Statement q(m_repo.database(), sql);
        int n = 0;
        if (id) q.bind(++n, *id);
        for (const auto& w : words)
            q.bind(++n, w);
        std::vector<Drill> out;
        const ZoneGrid clubGrid = grid();
        while (q.executeStep()) {
            const std::int64_t drillId = q.getColumn(0).getInt64();
            Drill d = readBody(q.getColumn(3).getString(), drillId);
            onClubGrid(d, q.getColumn(7).getString(), clubGrid);
            d.id = drillId;
            d.createdAt = q.getColumn(1).getString();
            d.deleted = q.getColumn(2).getInt() != 0;
            d.editedBy = q.getColumn(4).getString();
            d.editedAt = q.getColumn(5).getString();
            d.versionCount = q.getColumn(6).getInt();
            out.push_back(std::move(d));
        }
        return out;
    });
}

std::optional<Drill> DrillBook::get(std::int64_t id) const {
    auto found = query("", {}, id);
    if (found.empty()) return std::nullopt;
    return found.front();
}

std::vector<Drill> DrillBook::history(std::int64_t id) const {
    return guarded("cannot read drill history", [&] {
        std::vector<Drill> out;
        SQLite::Statement q(m_repo.database(),
                            "SELECT d.created_at, d.deleted_at IS NOT NULL, v.body, v.edited_by, "
                            "v.edited_at, v.grid FROM drill_version v JOIN drill d ON d.id = v.drill_id "
                            "WHERE v.drill_id = ? ORDER BY v.id");
        q.bind(1, id);
        const ZoneGrid clubGrid = grid();
        while (q.executeStep()) {
            Drill d = readBody(q.getColumn(2).getString(), id);
            onClubGrid(d, q.getColumn(5).getString(), clubGrid);
            d.id = id;
            d.createdAt = q.getColumn(0).getString();
            d.deleted = q.getColumn(1).getInt() != 0;
            d.editedBy = q.getColumn(3).getString();
            d.editedAt = q.getColumn(4).getString();
            d.versionCount = static_cast<int>(out.size()) + 1;
            out.push_back(std::move(d));
        }
        return out;
    });
}

std::vector<Drill> DrillBook::list(bool includeDeleted) const {
    return query(includeDeleted ? "" : "AND d.deleted_at IS NULL", {}, std::nullopt);
}

std::vector<Drill> DrillBook::search(const DrillQuery& q) const {
    std::vector<std::string> words;
    const std::string lowered = asciiLower(q.text);
    std::size_t at = 0;
    while (at < lowered.size()) {
        const std::size_t start = lowered.find_first_not_of(" \t\r\n", at);
        if (start == std::string::npos) break;
        const std::size_t end = lowered.find_first_of(" \t\r\n", start);
        words.push_back(lowered.substr(start, end - start));
        at = end == std::string::npos ? lowered.size() : end;
    }
    auto found = query(q.includeDeleted ? "" : "AND d.deleted_at IS NULL", words, std::nullopt);
    const std::string tag = asciiLower(q.tag);
    std::erase_if(found, [&](const Drill& d) {
        if (!tag.empty() && std::none_of(d.tags.begin(), d.tags.end(), [&](const std::string& t) {
                return asciiLower(t) == tag;
            }))
            return true;
        if (!q.metric.empty() &&
            std::find(d.metrics.begin(), d.metrics.end(), q.metric) == d.metrics.end())
            return true;
        if (q.zone && std::find(d.zones.begin(), d.zones.end(), *q.zone) == d.zones.end())
            return true;
        return false;
    });
    return found;
}

DrillChange DrillBook::remove(std::int64_t id, const std::string& now) {
    return guarded("cannot delete drill", [&] {
        DrillChange r;
        r.id = id;
        SQLite::Transaction tx(m_repo.database());
        const auto deleted = deletedAt(m_repo.database(), id);
        if (!deleted)
            r.problems.push_back(noDrill(id));
        else if (!deleted->empty())
            r.problems.push_back(
                {"", "", "",
                 "drill " + std::to_string(id) + " is already deleted (since " + *deleted + ")"});
        if (!r.ok()) return r;
        SQLite::Statement u(m_repo.database(), "UPDATE drill SET deleted_at = ? WHERE id = ?");
        u.bind(1, now);
        u.bind(2, id);
        u.exec();
        tx.commit();
        r.changed = true;
        return r;
    });
}

DrillChange DrillBook::restore(std::int64_t id) {
    return guarded("cannot restore drill", [&] {
        DrillChange r;
        r.id = id;
        SQLite::Transaction tx(m_repo.database());
        const auto deleted = deletedAt(m_repo.database(), id);
        if (!deleted)
            r.problems.push_back(noDrill(id));
        else if (deleted->empty())
            r.problems.push_back({"", "", "", "drill " + std::to_string(id) + " is not deleted"});
        if (!r.ok()) return r;
        SQLite::Statement u(m_repo.database(), "UPDATE drill SET deleted_at = NULL WHERE id = ?");
        u.bind(1, id);
        u.exec();
        tx.commit();
        r.changed = true;
        return r;
    });
}

DrillImport DrillBook::importDrills(const std::vector<Drill>& drills, const std::string& now,
                                    const std::string& source) {
    DrillImport r;
    const auto specs = metrics();
    const ZoneGrid g = grid();
    for (std::size_t i = 0; i < drills.size(); ++i)
        for (Problem p : validateDrill(drills[i], specs, g, source)) {
            p.place = "drills[" + std::to_string(i) + "]";
            r.errors.push_back(std::move(p));
        }
    if (!r.errors.empty()) return r;
    return guarded("cannot import drills", [&] {
        SQLite::Transaction tx(m_repo.database());
        std::vector<Drill> live = list(false);
        for (const Drill& d : drills) {
            const bool known = std::any_of(live.begin(), live.end(),
                                           [&](const Drill& l) { return l.sameContent(d); });
            if (known) {
                ++r.skipped;
                continue;
            }
            r.added.push_back(insert(d, d.author, now));
            live.push_back(d);
        }
        tx.commit();
        return r;
    });
}

} // namespace pitchloop::model
