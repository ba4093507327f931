#include "importprofile.h"

#include "matchreader.h"
#include "types.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstdlib>
#include <set>

namespace pitchloop::model {

using nlohmann::json;

namespace {

const std::set<std::string> kFields{"period", "time", "side", "player", "type",   "result", "x",
                                    "y",      "to_x", "to_y", "tags",   "zone", "to_zone"};
const std::set<std::string> kDetails{"id", "date", "competition", "venue", "us", "opponent",
                                     "period_lengths"};

std::string typeName(const json& v) {
    if (v.is_string()) return "a string";
    if (v.is_number()) return "a number";
    if (v.is_boolean()) return "true/false";
    if (v.is_object()) return "an object";
    if (v.is_array()) return "an array";
    return "null";
}

/// Reads the profile's JSON with one problem per wrong field.
class ProfileReader {
public:
    ProfileReader(const json& root, std::string file) : m_root(root), m_file(std::move(file)) {}
    Problems errors;

    void error(const std::string& place, const std::string& field, const std::string& message) {
        errors.push_back({m_file, place, field, message});
    }
    const json* object(const json& parent, const std::string& place, const char* key) {
        const auto it = parent.find(key);
        if (it == parent.end()) return nullptr;
        if (!it->is_object()) {
            error(place, key, "expected an object, found " + typeName(*it));
            return nullptr;
        }
        return &*it;
    }
    std::optional<std::string> text(const json& parent, const std::string& place, const char* key) {
        const auto it = parent.find(key);
        if (it == parent.end()) return std::nullopt;
        if (!it->is_string()) {
            error(place, key, "expected a string, found " + typeName(*it));
            return std::nullopt;
        }
        return it->get<std::string>();
    }
    std::optional<double> number(const json& parent, const std::string& place, const char* key) {
        const auto it = parent.find(key);
        if (it == parent.end()) return std::nullopt;
        if (!it->is_number()) {
            error(place, key, "expected a number, found " + typeName(*it));
            return std::nullopt;
        }
        return it->get<double>();
    }
    std::vector<std::string> words(const json& parent, const std::string& place, const char* key) {
        std::vector<std::string> out;
        const auto it = parent.find(key);
        if (it == parent.end()) return out;
        if (it->is_string()) return {it->get<std::string>()};
        if (!it->is_array()) {
            error(place, key, "expected a list of words, found " + typeName(*it));
            return out;
        }
        for (const auto& w : *it) {
            if (w.is_string()) out.push_back(w.get<std::string>());
            else error(place, key, "expected words (strings) only, found " + typeName(w));
        }
        return out;
    }
    void onlyKeys(const json& obj, const std::string& place, std::initializer_list<const char*> keys) {
        for (const auto& [key, value] : obj.items()) {
            if (std::none_of(keys.begin(), keys.end(), [&](const char* k) { return key == k; })) {
                std::string known;
                for (const char* k : keys) known += (known.empty() ? "" : ", ") + std::string(k);
                error(place, key, "unknown key (known here: " + known + ")");
            }
        }
    }

private:
    const json& m_root;
    std::string m_file;
};

std::optional<char> oneChar(const std::string& s) {
    if (s == "tab" || s == "\\t" || s == "\t") return '\t';
    if (s.size() == 1) return s[0];
    return std::nullopt;
}

/// The profile's zones key (zone-only data): the grid, and listed labels or a pattern.
void readZones(ProfileReader& r, const json& root, MappingProfile& p) {
    const bool zoneColumn = p.columns.count("zone") > 0;
    const json* z = r.object(root, "", "zones");
    if (!z) {
        if (zoneColumn && !root.contains("zones"))
            r.error("", "zones", "missing: a zone column needs the grid its labels name and the "
                                 "labels (\"zones\": {\"grid\": \"equal:6x5\", \"pattern\": ...})");
        return;
    }
    if (!zoneColumn) r.error("columns", "zone", "missing: which column holds the zone labels?");
    r.onlyKeys(*z, "zones", {"grid", "labels", "pattern"});
    if (auto grid = r.text(*z, "zones", "grid")) {
        if (auto g = ZoneGrid::parse(*grid)) p.zoneGrid = *g;
        else r.error("zones", "grid", "'" + *grid + "' is not a zone grid: expected equal:BANDSxLANES "
                                      "(e.g. equal:6x5) or markings:BANDS, 1 to 20 of each");
    } else if (!z->contains("grid")) {
        r.error("zones", "grid", "missing: the grid the labels name (e.g. equal:6x5)");
    }
    if (const json* labels = r.object(*z, "zones", "labels")) {
        for (const auto& [label, zone] : labels->items()) {
            const bool pair = zone.is_array() && zone.size() == 2 && zone[0].is_number_integer() &&
                              zone[1].is_number_integer();
            if (!pair) {
                r.error("zones.labels", label, "expected [band, lane], two whole numbers from 1");
                continue;
            }
            const Zone at{zone[0].get<int>(), zone[1].get<int>()};
            if (p.zoneGrid && (at.band < 1 || at.band > p.zoneGrid->bands() || at.lane < 1 ||
                               at.lane > p.zoneGrid->lanes())) {
                r.error("zones.labels", label,
                        "[" + std::to_string(at.band) + ", " + std::to_string(at.lane) +
                            "] is outside the grid " + p.zoneGrid->name() + " (bands 1 to " +
                            std::to_string(p.zoneGrid->bands()) + ", lanes 1 to " +
                            std::to_string(p.zoneGrid->lanes()) + ")");
                continue;
            }
            p.zoneLabels[label] = at;
        }
    }
    if (auto pattern = r.text(*z, "zones", "pattern")) {
        // Exactly {band} and {lane}, apart: "B{band}-L{lane}", "{lane}/{band}".
        const auto band = pattern->find("{band}"), lane = pattern->find("{lane}");
        std::size_t braces = 0;
        for (char ch : *pattern) braces += ch == '{';
        const bool once = band != std::string::npos && lane != std::string::npos &&
                          pattern->find("{band}", band + 1) == std::string::npos &&
                          pattern->find("{lane}", lane + 1) == std::string::npos && braces == 2;
        if (!once)
            r.error("zones", "pattern", "'" + *pattern + "': expected {band} and {lane} once each, "
                                        "with no other braces (e.g. \"B{band}-L{lane}\")");
        else if (band + 6 == lane || lane + 6 == band)
            r.error("zones", "pattern", "'" + *pattern + "': put a character between {band} and "
                                        "{lane}, or \"12\" could be band 1 lane 2 or band 12");
        else
            p.zonePattern = *pattern;
    }
    if (!z->contains("labels") && !z->contains("pattern"))
        r.error("zones", "labels", "missing: list the labels ({\"label\": [band, lane]}) or give "
                                   "a pattern, or both");
}

} // namespace

ProfileResult parseProfile(std::string_view text, const std::string& fileName) {
    ProfileResult out;
    json root;
    try {
        root = json::parse(text);
    } catch (const json::exception& e) {
        out.errors.push_back({fileName, "", "", std::string("not valid JSON: ") + e.what()});
        return out;
    }
    if (!root.is_object()) {
        out.errors.push_back({fileName, "", "", "expected a JSON object at the top"});
        return out;
    }
    ProfileReader r(root, fileName);
    MappingProfile p;
    r.onlyKeys(root, "", {"format", "version", "name", "table", "columns", "time", "periods",
                          "side", "coordinates", "types", "results", "skip", "tag_separator",
                          "file_name", "match", "match_columns", "venues", "zones"});
    if (r.text(root, "", "format") != std::string(kProfileFormat))
        r.error("", "format", "expected \"" + std::string(kProfileFormat) + "\"");
    if (const auto v = r.number(root, "", "version"); !v || *v != kProfileFormatVersion)
        r.error("", "version", "expected " + std::to_string(kProfileFormatVersion));
    p.name = r.text(root, "", "name").value_or("");

    if (const json* t = r.object(root, "", "table")) {
        r.onlyKeys(*t, "table", {"layout", "delimiter", "quote", "header", "encoding", "decimal"});
        if (auto layout = r.text(*t, "table", "layout")) {
            if (auto l = layoutFromString(*layout)) p.table.layout = *l;
            else r.error("table", "layout", "'" + *layout + "': expected delimited, json-lines or json-array");
        }
        if (auto d = r.text(*t, "table", "delimiter")) {
            if (auto c = oneChar(*d)) p.table.delimiter = *c;
            else r.error("table", "delimiter", "'" + *d + "': expected one character, or \"tab\"");
        }
        if (auto q = r.text(*t, "table", "quote")) {
            if (q->empty()) p.table.quote = 0;
            else if (q->size() == 1) p.table.quote = (*q)[0];
            else r.error("table", "quote", "expected one character, or \"\" for none");
        }
        if (const auto h = t->find("header"); h != t->end()) {
            if (h->is_boolean()) p.table.header = h->get<bool>();
            else r.error("table", "header", "expected true or false");
        }
        if (auto e = r.text(*t, "table", "encoding")) {
            if (auto enc = encodingFromString(*e)) p.encoding = *enc;
            else r.error("table", "encoding", "'" + *e + "': expected utf-8, latin-1 or windows-1252");
        }
        if (auto d = r.text(*t, "table", "decimal")) {
            if (*d == "." || *d == ",") p.decimal = (*d)[0];
            else r.error("table", "decimal", "expected \".\" or \",\"");
        }
        if (p.decimal == ',' && p.table.layout == TableLayout::Delimited && p.table.delimiter == ',')
            r.error("table", "decimal", "a decimal comma needs another delimiter (\";\" or tab)");
    }

    if (const json* c = r.object(root, "", "columns")) {
        for (const auto& [field, col] : c->items()) {
            if (!kFields.count(field)) {
                r.error("columns", field, "not one of our fields (period, time, side, player, type, "
                                          "result, x, y, to_x, to_y, tags, zone, to_zone)");
                continue;
            }
            if (col.is_string()) p.columns[field] = col.get<std::string>();
            else if (col.is_number_integer() && col.get<int>() >= 1) p.columns[field] = std::to_string(col.get<int>());
            else r.error("columns", field, "expected a column name, or its number from 1");
        }
        for (const char* needed : {"time", "side", "type"})
            if (!p.columns.count(needed)) r.error("columns", needed, "missing: which column holds it?");
        // Positions: x and y (with to_x, to_y), or a zone label (with to_zone), not both.
        if (p.columns.count("zone")) {
            for (const char* coordinate : {"x", "y", "to_x", "to_y"})
                if (p.columns.count(coordinate))
                    r.error("columns", coordinate, "the table gives a zone column: give either the "
                                                   "zone or x and y, not both");
        } else {
            for (const char* needed : {"x", "y"})
                if (!p.columns.count(needed))
                    r.error("columns", needed, "missing: which column holds it? (or give a zone column "
                                               "and the zones key for zone labels)");
            if (p.columns.count("to_zone"))
                r.error("columns", "to_zone", "an end zone needs the zone column too");
        }
    } else {
        r.error("", "columns", "missing: which column holds each of our fields");
    }
    readZones(r, root, p);

    if (const json* t = r.object(root, "", "time")) {
        r.onlyKeys(*t, "time", {"form", "fps", "from", "period_starts"});
        if (auto f = r.text(*t, "time", "form")) {
            if (*f == "seconds") p.timeForm = MappingProfile::TimeForm::Seconds;
            else if (*f == "clock") p.timeForm = MappingProfile::TimeForm::Clock;
            else if (*f == "frames") p.timeForm = MappingProfile::TimeForm::Frames;
            else r.error("time", "form", "'" + *f + "': expected seconds, clock (mm:ss or hh:mm:ss.fff) or frames");
        }
        if (auto fps = r.number(*t, "time", "fps")) {
            if (*fps > 0 && *fps <= 1000) p.fps = *fps;
            else r.error("time", "fps", "expected frames a second, above 0");
        }
        if (auto from = r.text(*t, "time", "from")) {
            if (*from == "period") p.timeFromKickoff = false;
            else if (*from == "kickoff") p.timeFromKickoff = true;
            else r.error("time", "from", "'" + *from + "': expected period or kickoff");
        }
        if (const json* starts = r.object(*t, "time", "period_starts")) {
            p.periodStarts.clear();
            for (const auto& [n, s] : starts->items()) {
                const int period = std::atoi(n.c_str());
                if (period < 1 || !s.is_number() || s.get<double>() < 0)
                    r.error("time.period_starts", n, "expected a period number and its start in seconds from kick-off");
                else
                    p.periodStarts[period] = s.get<double>();
            }
        }
    }
    if (const json* words = r.object(root, "", "periods")) {
        for (const auto& [word, n] : words->items()) {
            if (n.is_number_integer() && n.get<int>() >= 1 && n.get<int>() <= 9) p.periodWords[word] = n.get<int>();
            else r.error("periods", word, "expected a period number from 1 to 9");
        }
    }

    if (const json* s = r.object(root, "", "side")) {
        r.onlyKeys(*s, "side", {"us", "opp", "home", "away"});
        p.usValues = r.words(*s, "side", "us");
        p.oppValues = r.words(*s, "side", "opp");
        p.homeValue = r.text(*s, "side", "home").value_or("");
        p.awayValue = r.text(*s, "side", "away").value_or("");
        const bool byVenue = !p.homeValue.empty() || !p.awayValue.empty();
        if (byVenue && (p.homeValue.empty() || p.awayValue.empty()))
            r.error("side", p.homeValue.empty() ? "home" : "away", "give both the home and the away value");
        if (!byVenue && p.usValues.empty())
            r.error("side", "us", "missing: the value(s) of the side column that mean us (or home and away)");
    } else {
        r.error("", "side", "missing: which values of the side column mean us");
    }

    if (const json* c = r.object(root, "", "coordinates")) {
        r.onlyKeys(*c, "coordinates", {"width", "height", "origin", "y", "frame", "us_attack"});
        if (auto w = r.number(*c, "coordinates", "width")) {
            if (*w > 0) p.width = *w;
            else r.error("coordinates", "width", "expected the extent along the pitch, above 0");
        }
        if (auto h = r.number(*c, "coordinates", "height")) {
            if (*h > 0) p.height = *h;
            else r.error("coordinates", "height", "expected the extent across the pitch, above 0");
        }
        if (auto o = r.text(*c, "coordinates", "origin")) {
            static const std::set<std::string> origins{"top-left", "top-right", "bottom-left",
                                                       "bottom-right", "centre"};
            if (origins.count(*o)) p.origin = *o;
            else r.error("coordinates", "origin", "'" + *o + "': expected top-left, top-right, bottom-left, bottom-right or centre");
        }
        p.yUp = p.origin.rfind("top", 0) != 0;
        if (auto y = r.text(*c, "coordinates", "y")) {
            if (*y == "up" || *y == "down") p.yUp = *y == "up";
            else r.error("coordinates", "y", "expected up or down");
            if (p.origin.rfind("top", 0) == 0 && p.yUp) r.error("coordinates", "y", "from a top corner y can only run down");
            if (p.origin.rfind("bottom", 0) == 0 && !p.yUp) r.error("coordinates", "y", "from a bottom corner y can only run up");
        }
        if (auto f = r.text(*c, "coordinates", "frame")) {
            if (*f == "acting" || *f == "us" || *f == "ground") p.frame = *f;
            else r.error("coordinates", "frame", "'" + *f + "': expected acting, us or ground");
        }
        if (const json* a = r.object(*c, "coordinates", "us_attack"))
            for (const auto& [period, dir] : a->items()) {
                if (dir.is_string() && (dir == "+x" || dir == "-x")) p.usAttack[period] = dir.get<std::string>();
                else r.error("coordinates.us_attack", period, "expected \"+x\" or \"-x\"");
            }
        if (p.frame == "ground" && p.usAttack.empty())
            r.error("coordinates", "us_attack", "the ground frame needs our attack direction per period");
    }

    if (const json* t = r.object(root, "", "types")) {
        for (const auto& [word, meaning] : t->items()) {
            WordMeaning m;
            if (meaning.is_string()) {
                m.type = meaning.get<std::string>();
            } else if (meaning.is_object()) {
                m.type = meaning.value("type", "");
                m.result = meaning.value("result", "");
                if (const auto tags = meaning.find("tags"); tags != meaning.end() && tags->is_array())
                    for (const auto& tag : *tags)
                        if (tag.is_string()) m.tags.push_back(tag.get<std::string>());
            }
            // Our words of either format version; the mapped match is written in version 1's.
            const auto type = eventTypeFromWord(m.type, 2) ? eventTypeFromWord(m.type, 2) : eventTypeFromWord(m.type, 1);
            const auto result = resultFromWord(m.result, 2) ? resultFromWord(m.result, 2) : resultFromWord(m.result, 1);
            if (!type) {
                r.error("types", word, "'" + m.type + "' is not one of our event types");
            } else if (!m.result.empty() && !result) {
                r.error("types", word, "'" + m.result + "' is not one of our results");
            } else {
                m.type = std::string(wordOf(*type, 1));
                if (result) m.result = std::string(wordOf(*result, 1));
                p.types[word] = m;
            }
        }
    } else {
        r.error("", "types", "missing: the table's event words and ours");
    }
    if (const json* res = r.object(root, "", "results")) {
        for (const auto& [word, ours] : res->items()) {
            const std::string ourWord = ours.is_string() ? ours.get<std::string>() : std::string();
            const auto result = resultFromWord(ourWord, 2) ? resultFromWord(ourWord, 2) : resultFromWord(ourWord, 1);
            if (result) p.results[word] = std::string(wordOf(*result, 1));
            else r.error("results", word, "expected one of our results (ok, lost, scored, stopped, "
                                          "charged_down, wide, woodwork; or version 1's words)");
        }
    }
    if (const json* mc = r.object(root, "", "match_columns")) {
        for (const auto& [detail, column] : mc->items()) {
            static const std::set<std::string> allowed{"id", "date", "opponent", "venue", "competition",
                                                       "period_lengths"};
            if (!allowed.count(detail))
                r.error("match_columns", detail, "not a match detail read from a column (id, date, "
                                                 "opponent, venue, competition, period_lengths)");
            else if (column.is_string()) p.matchColumns[detail] = column.get<std::string>();
            else if (column.is_number_integer() && column.get<int>() >= 1) p.matchColumns[detail] = std::to_string(column.get<int>());
            else r.error("match_columns", detail, "expected a column name, or its number from 1");
        }
        if (!p.matchColumns.empty() && !p.matchColumns.count("id"))
            r.error("match_columns", "id", "missing: which column gives each row's match id");
    }
    if (const json* v = r.object(root, "", "venues")) {
        for (const auto& [word, venue] : v->items()) {
            if (venue == "home" || venue == "away" || venue == "neutral") p.venueWords[word] = venue.get<std::string>();
            else r.error("venues", word, "expected home, away or neutral");
        }
    }
    p.skip = r.words(root, "", "skip");
    if (auto sep = r.text(root, "", "tag_separator")) p.tagSeparator = *sep;
    if (auto pattern = r.text(root, "", "file_name")) p.fileNamePattern = *pattern;
    if (const json* m = r.object(root, "", "match")) {
        for (const auto& [key, value] : m->items())
            if (!kDetails.count(key) && key != "pitch" && key != "score")
                r.error("match", key, "unknown match detail (id, date, competition, venue, us, opponent, pitch, score, period_lengths)");
        p.match = *m;
    }
    out.errors = std::move(r.errors);
    if (out.errors.empty()) out.profile = std::move(p);
    return out;
}

ProfileResult readProfileFile(const std::string& path) {
    try {
        return parseProfile(readFileBytes(path), path);
    } catch (const IoError& e) {
        ProfileResult r;
        r.errors.push_back({path, "", "", e.what()});
        return r;
    }
}

// ---- mapping ---------------------------------------------------------------------------------

namespace {

std::string trim(std::string s) {
    const auto b = s.find_first_not_of(" \t\r");
    if (b == std::string::npos) return {};
    const auto e = s.find_last_not_of(" \t\r");
    return s.substr(b, e - b + 1);
}

std::optional<double> readNumber(std::string_view s, char decimal) {
    while (!s.empty() && (s.front() == ' ' || s.front() == '\t')) s.remove_prefix(1);
    while (!s.empty() && (s.back() == ' ' || s.back() == '\t' || s.back() == '\r')) s.remove_suffix(1);
    if (s.empty()) return std::nullopt;
    if (s.front() == '+') s.remove_prefix(1); // from_chars takes no plus sign
    std::string swapped;
    if (decimal == ',' && s.find(',') != std::string_view::npos) {
        swapped.assign(s);
        std::replace(swapped.begin(), swapped.end(), ',', '.');
        s = swapped;
    }
    double v = 0;
    const auto [end, ec] = std::from_chars(s.data(), s.data() + s.size(), v);
    if (ec != std::errc() || end != s.data() + s.size() || !std::isfinite(v)) return std::nullopt;
    return v;
}

/// "75.4", "12:05", "1:02:05.250" → seconds.
std::optional<double> readClock(std::string_view text, char decimal) {
    std::string_view parts[3];
    std::size_t n = 0, start = 0;
    while (true) {
        const auto colon = text.find(':', start);
        if (n == 3) return std::nullopt;
        parts[n++] = text.substr(start, colon == std::string_view::npos ? std::string_view::npos : colon - start);
        if (colon == std::string_view::npos) break;
        start = colon + 1;
    }
    double seconds = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const bool last = i + 1 == n;
        const auto v = readNumber(parts[i], decimal);
        if (!v || *v < 0) return std::nullopt;
        if (!last && *v != std::floor(*v)) return std::nullopt;
        if (i > 0 && *v >= 60) return std::nullopt; // minutes and seconds below 60
        seconds = seconds * 60 + *v;
    }
    return seconds;
}

/// "{date}_{opponent}.csv" against a file name: the placeholders' values, or nullopt.
std::optional<std::map<std::string, std::string>> matchPattern(const std::string& pattern,
                                                               const std::string& name) {
    std::map<std::string, std::string> out;
    std::size_t p = 0, n = 0;
    while (p < pattern.size()) {
        if (pattern[p] == '{') {
            const auto close = pattern.find('}', p);
            if (close == std::string::npos) return std::nullopt;
            const std::string key = pattern.substr(p + 1, close - p - 1);
            p = close + 1;
            // The value runs up to the next literal character of the pattern (or the end).
            const std::size_t stop = p < pattern.size() ? name.find(pattern[p], n) : name.size();
            if (stop == std::string::npos || stop == n) return std::nullopt;
            out[key] = name.substr(n, stop - n);
            n = stop;
        } else {
            if (n >= name.size() || name[n] != pattern[p]) return std::nullopt;
            ++p;
            ++n;
        }
    }
    if (n != name.size()) return std::nullopt;
    return out;
}

std::string baseName(const std::string& path) {
    const auto slash = path.find_last_of("/\\");
    return slash == std::string::npos ? path : path.substr(slash + 1);
}

} // namespace

MappedTable mapTable(const Table& table, const MappingProfile& p, const MatchDetails& details,
                     const std::string& fileName) {
    MappedTable out;
    auto error = [&](const std::string& place, const std::string& field, const std::string& message) {
        if (out.errors.size() < 25) out.errors.push_back({fileName, place, field, message});
    };
    // Columns.
    std::map<std::string, std::size_t> col;
    std::string known;
    for (const auto& c : table.columns) known += (known.empty() ? "" : ", ") + c;
    for (const auto& [field, name] : p.columns) {
        if (auto at = table.column(name)) col[field] = *at;
        else error("", name, "no such column (for our " + field + "); the table has: " + known);
    }
    if (!out.errors.empty()) return out;

    // Match details: the profile's, then the file name's, then the caller's.
    json m = p.match;
    std::string patternNote;
    if (!p.fileNamePattern.empty()) {
        if (auto found = matchPattern(p.fileNamePattern, baseName(fileName)))
            for (const auto& [k, v] : *found) m[k] = v;
        else
            patternNote = "; the file name '" + baseName(fileName) +
                          "' does not follow the profile's pattern '" + p.fileNamePattern + "'";
    }
    for (const auto& [k, v] : details.values) m[k] = v;
    if (details.preview)
        for (const auto& [k, v] : std::map<std::string, std::string>{
                 {"id", "preview"}, {"date", "2000-01-01"}, {"venue", "home"}, {"us", "us"}, {"opponent", "them"}})
            if (!m.contains(k)) m[k] = v;
    for (const char* needed : {"id", "date", "venue", "us", "opponent"})
        if (!m.contains(needed))
            error("match", needed, std::string("not given: set it in the profile's match details or "
                                               "the file name pattern, or give it with the files") +
                                       patternNote);
    if (!m.contains("pitch")) m["pitch"] = {{"length_m", 105}, {"width_m", 68}};
    const double length = m["pitch"].value("length_m", 105.0), width = m["pitch"].value("width_m", 68.0);
    if (!out.errors.empty()) return out;
    const std::string venue = m.value("venue", "");

    std::map<std::pair<std::string, std::string>, UnmappedWord> unmapped;
    auto unknownWord = [&](const std::string& column, const std::string& word, std::size_t line) {
        auto& u = unmapped[{column, word}];
        u.column = column;
        u.word = word;
        ++u.count;
        if (u.lines.size() < 3) u.lines.push_back(line);
    };
    // Each field's column, looked up once.
    using Slot = std::optional<std::size_t>;
    auto slot = [&](const char* field) -> Slot {
        const auto it = col.find(field);
        return it == col.end() ? Slot{} : Slot{it->second};
    };
    const Slot cPeriod = slot("period"), cTime = slot("time"), cSide = slot("side"),
               cPlayer = slot("player"), cType = slot("type"), cResult = slot("result"),
               cX = slot("x"), cY = slot("y"), cToX = slot("to_x"), cToY = slot("to_y"),
               cTags = slot("tags"), cZone = slot("zone"), cToZone = slot("to_zone");
    auto cell = [&](const Table::Row& row, const Slot& at) -> std::optional<std::string> {
        if (!at) return std::nullopt;
        return trim(row.cells[*at]);
    };
    std::map<std::pair<std::string_view, const std::string*>, int> counts;
    const auto columnOf = [&](const char* field) { return p.columns.at(field); };
    const Pitch pitch{length, width};
    auto zoneOfLabel = [&](const std::string& label) { return zoneOfLabelIn(p, label); };

    struct Pending {
        int period;
        double t;
        std::size_t order;
        json event;
        std::string place;
        bool us;
        bool ourShotInOwnHalf;
    };
    std::vector<Pending> events;
    std::map<int, double> lastT;
    int backwards = 0;
    for (const auto& row : table.rows) {
        const std::string place = table.place(row);
        const std::string typeWord = *cell(row, cType);
        if (std::find(p.skip.begin(), p.skip.end(), typeWord) != p.skip.end()) {
            ++out.skipped;
            continue;
        }
        json e = json::object();
        // Period.
        int period = 1;
        if (auto text = cell(row, cPeriod)) {
            if (const auto w = p.periodWords.find(*text); w != p.periodWords.end()) {
                period = w->second;
            } else if (auto v = readNumber(*text, p.decimal); v && *v >= 1 && *v <= 9 && *v == std::floor(*v)) {
                period = static_cast<int>(*v);
            } else {
                unknownWord(columnOf("period"), *text, row.line);
                continue;
            }
        }
        // Time.
        const std::string timeText = *cell(row, cTime);
        std::optional<double> t;
        switch (p.timeForm) {
        case MappingProfile::TimeForm::Seconds: t = readNumber(timeText, p.decimal); break;
        case MappingProfile::TimeForm::Clock: t = readClock(timeText, p.decimal); break;
        case MappingProfile::TimeForm::Frames:
            if (auto f = readNumber(timeText, p.decimal)) t = *f / p.fps;
            break;
        }
        if (!t || *t < 0) {
            error(place, columnOf("time"), "'" + timeText + "' is not a time (" +
                                               (p.timeForm == MappingProfile::TimeForm::Clock ? "mm:ss or hh:mm:ss.fff"
                                                : p.timeForm == MappingProfile::TimeForm::Frames ? "a frame number"
                                                                                                 : "seconds") + ")");
            continue;
        }
        if (p.timeFromKickoff) {
            const auto start = p.periodStarts.find(period);
            if (start == p.periodStarts.end()) {
                error(place, columnOf("time"), "period " + std::to_string(period) +
                                                   " has no start in the profile's time.period_starts");
                continue;
            }
            if (*t < start->second) {
                error(place, columnOf("time"), "'" + timeText + "' is before period " + std::to_string(period) +
                                                   " starts (" + std::to_string(static_cast<int>(start->second)) +
                                                   " s from kick-off): impossible time");
                continue;
            }
            *t -= start->second;
        }
        // Side.
        const std::string sideWord = *cell(row, cSide);
        std::string side;
        if (!p.homeValue.empty()) {
            if (sideWord == p.homeValue) side = venue == "home" ? "us" : "opp";
            else if (sideWord == p.awayValue) side = venue == "home" ? "opp" : "us";
        } else if (std::find(p.usValues.begin(), p.usValues.end(), sideWord) != p.usValues.end()) {
            side = "us";
        } else if (p.oppValues.empty() ||
                   std::find(p.oppValues.begin(), p.oppValues.end(), sideWord) != p.oppValues.end()) {
            side = "opp";
        }
        if (side.empty()) {
            unknownWord(columnOf("side"), sideWord, row.line);
            continue;
        }
        // Type and result.
        const auto meaning = p.types.find(typeWord);
        if (meaning == p.types.end()) {
            unknownWord(columnOf("type"), typeWord, row.line);
            continue;
        }
        std::string result = meaning->second.result;
        if (result.empty()) {
            if (auto word = cell(row, cResult); word && !word->empty()) {
                if (const auto r = p.results.find(*word); r != p.results.end()) result = r->second;
                else {
                    unknownWord(columnOf("result"), *word, row.line);
                    continue;
                }
            }
        }
        // Coordinates: fractions of the stated extent, then metres in our picture (the acting
        // or our team attacking to the right, y = 0 at its right touchline, i.e. the bottom).
        auto coordinate = [&](const char* fx, const char* fy, const Slot& sx,
                              const Slot& sy) -> std::optional<std::pair<double, double>> {
            const auto xs = cell(row, sx), ys = cell(row, sy);
            if (!xs || !ys || (xs->empty() && ys->empty())) return std::nullopt;
            const auto x = readNumber(*xs, p.decimal), y = readNumber(*ys, p.decimal);
            bool bad = false;
            if (!x) error(place, columnOf(fx), "'" + *xs + "' is not a number"), bad = true;
            if (!y) error(place, columnOf(fy), "'" + *ys + "' is not a number"), bad = true;
            if (bad) return std::pair{-1e9, -1e9};
            double fxr = *x / p.width, fyr = *y / p.height;
            if (p.origin == "centre") {
                fxr += 0.5;
                fyr = p.yUp ? fyr + 0.5 : 0.5 - fyr;
            } else {
                if (p.origin.find("right") != std::string::npos) fxr = 1 - fxr;
                if (!p.yUp) fyr = 1 - fyr; // from the top: y runs down, ours up from the bottom
            }
            const double slack = 0.03; // 3 % of the extent: beyond it the extent must be wrong
            if (fxr < -slack || fxr > 1 + slack)
                error(place, columnOf(fx), "'" + *xs + "' is outside the stated extent (width " +
                                               std::to_string(p.width) + "): is the extent right?"),
                    bad = true;
            if (fyr < -slack || fyr > 1 + slack)
                error(place, columnOf(fy), "'" + *ys + "' is outside the stated extent (height " +
                                               std::to_string(p.height) + "): is the extent right?"),
                    bad = true;
            if (bad) return std::pair{-1e9, -1e9};
            return std::pair{fxr * length, fyr * width};
        };
        // Zone labels: the zone's centre in the same picture (the grid cut on the match's
        // pitch, band 1 at the left goal line, lane 1 at the bottom touchline).
        auto zoneCentreOf = [&](const char* field,
                                const Slot& sz) -> std::optional<std::pair<double, double>> {
            const auto label = cell(row, sz);
            if (!label || label->empty()) return std::nullopt;
            const std::optional<Zone> zone = zoneOfLabel(*label);
            if (!zone) {
                unknownWord(columnOf(field), *label, row.line);
                return std::pair{-1e9, -1e9};
            }
            if (zone->band < 1 || zone->band > p.zoneGrid->bands() || zone->lane < 1 ||
                zone->lane > p.zoneGrid->lanes()) {
                error(place, columnOf(field),
                      "'" + *label + "' names band " + std::to_string(zone->band) + ", lane " +
                          std::to_string(zone->lane) + ": outside the profile's grid " +
                          p.zoneGrid->name() + " (" + describeGrid(*p.zoneGrid) + ")");
                return std::pair{-1e9, -1e9};
            }
            const Point centre = zoneCentre(*zone, *p.zoneGrid, pitch);
            return std::pair{centre.x, centre.y};
        };
        const bool byZone = p.zoneGrid.has_value();
        const auto at = byZone ? zoneCentreOf("zone", cZone) : coordinate("x", "y", cX, cY);
        if (!at) {
            if (byZone) error(place, columnOf("zone"), "no zone (the zone cell is empty)");
            else error(place, columnOf("x"), "no position (x and y are empty)");
            continue;
        }
        if (at->first < -1e8) continue;
        std::optional<std::pair<double, double>> to;
        if (const auto end = byZone ? zoneCentreOf("to_zone", cToZone) : coordinate("to_x", "to_y", cToX, cToY)) {
            if (end->first < -1e8) continue;
            to = end;
        }
        std::vector<std::string> tags = meaning->second.tags;
        if (auto t2 = cell(row, cTags); t2 && !t2->empty()) {
            std::size_t s = 0;
            while (s <= t2->size()) {
                const auto cut = t2->find(p.tagSeparator, s);
                const std::string tag = trim(t2->substr(s, cut - s));
                if (!tag.empty()) tags.push_back(tag);
                if (cut == std::string::npos) break;
                s = cut + p.tagSeparator.size();
            }
        }
        // The event's fields in key order, each appended at the end of the object (no search).
        json::object_t& fields = e.get_ref<json::object_t&>();
        auto add = [&](const char* key, json value) { fields.emplace_hint(fields.end(), key, std::move(value)); };
        add("period", period);
        if (auto player = cell(row, cPlayer); player && !player->empty()) add("player", std::move(*player));
        if (!result.empty()) add("result", result);
        add("side", side);
        add("t", std::round(*t * 1000) / 1000);
        if (!tags.empty()) add("tags", std::move(tags));
        if (to) {
            add("to_x", std::round(to->first * 100) / 100);
            add("to_y", std::round(to->second * 100) / 100);
        }
        add("type", meaning->second.type);
        add("x", std::round(at->first * 100) / 100);
        add("y", std::round(at->second * 100) / 100);
        if (lastT.count(period) && *t < lastT[period]) ++backwards;
        lastT[period] = std::max(lastT[period], *t);
        const bool us = side == "us";
        events.push_back({period, *t, events.size(), std::move(e), place, us,
                          us && meaning->second.type == "shot" && at->first < length / 2});
        ++counts[{side == "us" ? std::string_view("us") : std::string_view("opp"), &meaning->second.type}];
    }
    for (const auto& [key, n] : counts) out.countsByType[std::string(key.first) + " " + *key.second] += n;
    for (auto& [key, u] : unmapped) {
        out.unmapped.push_back(u);
        std::string lines;
        for (auto l : u.lines) lines += (lines.empty() ? "" : ", ") + std::to_string(l);
        error("line " + std::to_string(u.lines.front()), u.column,
              "'" + u.word + "' is not mapped (" + std::to_string(u.count) + " time" +
                  (u.count == 1 ? "" : "s") + "; lines " + lines +
                  "): add it to the profile's " +
                  (u.column == p.columns.at("type") ? "types (or skip)"
                   : (p.columns.count("zone") && u.column == p.columns.at("zone")) ||
                           (p.columns.count("to_zone") && u.column == p.columns.at("to_zone"))
                       ? "zones.labels (or write it the way zones.pattern reads)"
                   : p.columns.count("result") && u.column == p.columns.at("result") ? "results"
                   : p.columns.count("period") && u.column == p.columns.at("period") ? "periods"
                                                                                      : "side values"));
    }
    if (!out.errors.empty() && !details.preview) return out;
    if (events.empty()) {
        error("", "", "no events to load (every row was skipped)");
        return out;
    }

    std::stable_sort(events.begin(), events.end(), [](const Pending& a, const Pending& b) {
        return a.period != b.period ? a.period < b.period : a.t < b.t;
    });
    if (backwards > 0)
        out.warnings.push_back({fileName, "", columnOf("time"),
                                std::to_string(backwards) + " rows have a time before the row above "
                                                            "in the same period; they were put in time order"});
    // Periods: the given lengths, else each period's last event rounded up.
    json periods = json::array();
    std::map<int, double> lengths;
    if (m.contains("period_lengths")) {
        const std::string text = m["period_lengths"].is_string() ? m["period_lengths"].get<std::string>() : "";
        std::size_t s = 0;
        int n = 1;
        while (s <= text.size() && !text.empty()) {
            const auto cut = text.find(',', s);
            if (auto v = readNumber(text.substr(s, cut - s), '.')) lengths[n] = *v;
            ++n;
            if (cut == std::string::npos) break;
            s = cut + 1;
        }
        m.erase("period_lengths");
    }
    for (const auto& [period, last] : lastT) {
        const double len = lengths.count(period) ? lengths[period] : std::ceil(last) + 1;
        periods.push_back({{"n", period}, {"length_s", len}});
        if (len > 3 * 3600)
            error("", columnOf("time"), "period " + std::to_string(period) + " would last " +
                                            std::to_string(static_cast<int>(len / 60)) +
                                            " minutes: are the times in seconds?");
        else if (len > 65 * 60)
            out.warnings.push_back({fileName, "", columnOf("time"),
                                    "period " + std::to_string(period) + " lasts " +
                                        std::to_string(static_cast<int>(len / 60)) +
                                        " minutes, far longer than a football period: check the time form"});
    }
    m["periods"] = periods;
    m["frame"] = p.frame;
    if (p.zoneGrid) m["zone_only"] = {{"grid", p.zoneGrid->name()}};
    if (p.frame == "ground") m["us_attack"] = p.usAttack;
    json list = json::array();
    list.get_ref<json::array_t&>().reserve(events.size());
    int ours = 0, ownHalf = 0, usEvents = 0;
    for (auto& pe : events) {
        usEvents += pe.us;
        ours += pe.us && pe.event["type"] == "shot";
        ownHalf += pe.ourShotInOwnHalf;
        list.push_back(std::move(pe.event));
        out.rowPlaces.push_back(std::move(pe.place));
    }

    // Sanity: our shots should mostly be in the half we attack.
    if (p.frame != "ground") {
        if (ours >= 5 && ownHalf * 10 > ours * 6)
            out.warnings.push_back({fileName, "", columnOf("x"),
                                    std::to_string(ownHalf) + " of our " + std::to_string(ours) +
                                        " shots are in our own half: x looks reversed — flip it (origin on the other side)?"});
        const int total = static_cast<int>(list.size());
        if (total >= 100 && (usEvents * 20 < total || (total - usEvents) * 20 < total))
            out.warnings.push_back({fileName, "", columnOf("side"),
                                    "one side has almost no events (" + std::to_string(usEvents) + " ours of " +
                                        std::to_string(total) + "): are the side values right?"});
    }
    out.match = {{"format", "pitchloop-match"}, {"version", 1}, {"match", std::move(m)}};
    out.match["events"] = std::move(list);
    return out;
}

namespace {

/// Decodes the bytes and cuts them into a table, the profile's way.
TableResult readTable(std::string_view bytes, const MappingProfile& profile, const std::string& fileName) {
    DecodedText text = decodeText(bytes, profile.encoding, fileName);
    if (!text.errors.empty()) return {{}, std::move(text.errors)};
    return parseTable(text.text, profile.table, fileName);
}

} // namespace

MappedTable mapFile(std::string_view bytes, const MappingProfile& profile,
                    const MatchDetails& details, const std::string& fileName) {
    TableResult table = readTable(bytes, profile, fileName);
    if (!table.errors.empty()) {
        MappedTable out;
        out.errors = std::move(table.errors);
        return out;
    }
    return mapTable(table.table, profile, details, fileName);
}

std::vector<MappedTable> mapFileMatches(std::string_view bytes, const MappingProfile& profile,
                                        const MatchDetails& details, const std::string& fileName) {
    auto failed = [](Problems errors) {
        MappedTable t;
        t.errors = std::move(errors);
        return std::vector<MappedTable>{std::move(t)};
    };
    TableResult parsed = readTable(bytes, profile, fileName);
    if (!parsed.errors.empty()) return failed(std::move(parsed.errors));
    const Table& table = parsed.table;
    if (profile.matchColumns.empty()) return {mapTable(table, profile, details, fileName)};

    std::map<std::string, std::size_t> at;
    Problems missing;
    for (const auto& [detail, name] : profile.matchColumns) {
        if (auto i = table.column(name)) at[detail] = *i;
        else missing.push_back({fileName, "", name, "no such column (for the match " + detail + ")"});
    }
    if (!missing.empty()) return failed(std::move(missing));
    // Rows by match id, in the order the ids first appear.
    std::vector<std::string> order;
    std::map<std::string, Table> byId;
    std::map<std::string, MatchDetails> detailsOf;
    Problems errors;
    for (const auto& row : table.rows) {
        const std::string id = trim(row.cells[at["id"]]);
        if (id.empty()) {
            errors.push_back({fileName, table.place(row), profile.matchColumns.at("id"), "no match id"});
            continue;
        }
        auto [it, fresh] = byId.try_emplace(id);
        MatchDetails& d = detailsOf[id];
        if (fresh) {
            order.push_back(id);
            it->second.columns = table.columns;
            it->second.byLine = table.byLine;
            d = details;
            d.values.erase("id");
            d.values["id"] = id;
        }
        for (const auto& [detail, index] : at) {
            if (detail == "id") continue;
            std::string value = trim(row.cells[index]);
            if (detail == "venue")
                if (const auto w = profile.venueWords.find(value); w != profile.venueWords.end()) value = w->second;
            if (details.values.count(detail)) continue; // the caller's word wins
            const auto known = d.values.find(detail);
            if (fresh || known == d.values.end()) d.values[detail] = value;
            else if (known->second != value)
                errors.push_back({fileName, table.place(row), profile.matchColumns.at(detail),
                                  "'" + value + "' differs from '" + known->second +
                                      "' earlier in match " + id});
        }
        it->second.rows.push_back(row);
    }
    if (!errors.empty()) return failed(std::move(errors));
    std::vector<MappedTable> out;
    for (const auto& id : order) out.push_back(mapTable(byId[id], profile, detailsOf[id], fileName));
    return out;
}

Problems inTableTerms(const Problems& problems, const MappedTable& mapped, const MappingProfile& p) {
    Problems out;
    for (Problem q : problems) {
        if (q.place.rfind("events[", 0) == 0) {
            const std::size_t i = std::strtoul(q.place.c_str() + 7, nullptr, 10);
            if (i < mapped.rowPlaces.size()) q.place = mapped.rowPlaces[i];
            static const std::map<std::string, std::string> ours{
                {"t", "time"}, {"x", "x"}, {"y", "y"}, {"to_x", "to_x"}, {"to_y", "to_y"},
                {"side", "side"}, {"type", "type"}, {"result", "result"}, {"period", "period"},
                {"player", "player"}, {"tags", "tags"}};
            if (const auto f = ours.find(q.field); f != ours.end()) {
                std::string field = f->second;
                if (p.zoneGrid && (field == "x" || field == "y")) field = "zone";
                if (p.zoneGrid && (field == "to_x" || field == "to_y")) field = "to_zone";
                if (p.columns.count(field)) q.field = p.columns.at(field);
            }
        }
        out.push_back(std::move(q));
    }
    return out;
}

std::optional<double> readTableNumber(std::string_view text, char decimal) { return readNumber(text, decimal); }
std::optional<double> readTableClock(std::string_view text, char decimal) { return readClock(text, decimal); }

// A zone label: a listed word, else the pattern's band and lane numbers.
std::optional<Zone> zoneOfLabelIn(const MappingProfile& p, const std::string& label) {
    if (const auto listed = p.zoneLabels.find(label); listed != p.zoneLabels.end()) return listed->second;
    if (p.zonePattern.empty()) return std::nullopt;
    const auto parts = matchPattern(p.zonePattern, label);
    if (!parts) return std::nullopt;
    auto whole = [&](const char* key) -> std::optional<int> {
        const auto it = parts->find(key);
        if (it == parts->end()) return std::nullopt;
        int v = 0;
        const auto [end, ec] = std::from_chars(it->second.data(), it->second.data() + it->second.size(), v);
        if (ec != std::errc() || end != it->second.data() + it->second.size()) return std::nullopt;
        return v;
    };
    const auto band = whole("band"), lane = whole("lane");
    if (!band || !lane) return std::nullopt;
    return Zone{*band, *lane};
}

} // namespace pitchloop::model
