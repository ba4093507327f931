#include "layoutdraft.h"

#include "types.h"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <map>
#include <set>
#include <unordered_map>

namespace pitchloop::model {

using nlohmann::json;

namespace {

/// Lower case, letters and digits only: "Start X" and "start_x" both read "startx".
std::string squashed(std::string_view s) {
    std::string out;
    for (unsigned char c : s)
        if (std::isalnum(c)) out += static_cast<char>(std::tolower(c));
    return out;
}

/// Our word for a table's word when it is one of ours: any case, spaces or hyphens for
/// underscores ("Take on" → take_on).
std::string asOurWord(std::string_view s) {
    std::string out;
    for (unsigned char c : s) {
        if (c == ' ' || c == '-') out += '_';
        else out += static_cast<char>(std::tolower(c));
    }
    return out;
}

// Our own lists of the column names that usually mean each role (squashed).
const std::vector<std::pair<std::string, std::vector<std::string>>>& roleNames() {
    static const std::vector<std::pair<std::string, std::vector<std::string>>> names{
        {"period", {"period", "half", "periodno", "halfno", "part"}},
        {"time", {"time", "clock", "t", "sec", "secs", "seconds", "matchtime", "gametime", "timestamp", "timecode"}},
        {"side", {"side", "team", "squad", "teamname", "club", "homeaway"}},
        {"player", {"player", "playername", "shirt", "shirtno", "number", "who", "name"}},
        {"type", {"type", "event", "eventtype", "action", "what", "code", "kind"}},
        {"result", {"result", "outcome", "success", "how"}},
        {"x", {"x", "startx", "posx", "xstart", "fromx", "x1", "locx", "locationx"}},
        {"y", {"y", "starty", "posy", "ystart", "fromy", "y1", "locy", "locationy"}},
        {"to_x", {"tox", "endx", "x2", "xend", "targetx"}},
        {"to_y", {"toy", "endy", "y2", "yend", "targety"}},
        {"zone", {"zone", "area", "zonelabel", "cell", "box", "sector", "fromzone", "startzone"}},
        {"to_zone", {"tozone", "endzone", "zoneto", "targetzone"}},
        {"tags", {"tags", "labels", "flags", "tag"}},
        {"match.id", {"match", "matchid", "game", "gameid", "matchno", "fixture"}},
        {"match.date", {"date", "matchdate", "gamedate", "day"}},
        {"match.opponent", {"opponent", "opponents", "opposition", "against", "vs", "versus"}},
        {"match.venue", {"venue", "ground", "ha", "where"}},
    };
    return names;
}

bool isMatchRole(const std::string& role) { return role.rfind("match.", 0) == 0; }

} // namespace

TableGuess guessTableFormat(std::string_view bytes) {
    TableGuess g;
    std::string_view body = bytes;
    if (body.substr(0, 3) == "\xEF\xBB\xBF") body.remove_prefix(3);
    g.encoding = decodeText(body, TextEncoding::Utf8, "").errors.empty() ? TextEncoding::Utf8
                                                                         : TextEncoding::Windows1252;
    const auto first = body.find_first_not_of(" \t\r\n");
    if (first != std::string_view::npos && body[first] == '[') {
        g.format.layout = TableLayout::JsonArray;
        return g;
    }
    if (first != std::string_view::npos && body[first] == '{') {
        g.format.layout = TableLayout::JsonLines;
        return g;
    }
    // The first lines, outside quotes: the delimiter that splits them into the same number of
    // cells, most cells winning.
    std::vector<std::string_view> lines;
    std::size_t at = first == std::string_view::npos ? body.size() : first;
    while (at < body.size() && lines.size() < 20) {
        auto nl = body.find('\n', at);
        if (nl == std::string_view::npos) nl = body.size();
        if (nl > at) lines.push_back(body.substr(at, nl - at));
        at = nl + 1;
    }
    auto cellsOf = [](std::string_view line, char d) {
        std::size_t n = 1;
        bool quoted = false;
        for (char c : line) {
            if (c == '"') quoted = !quoted;
            else if (c == d && !quoted) ++n;
        }
        return n;
    };
    std::size_t bestCells = 1;
    for (char d : {',', ';', '\t', '|'}) {
        if (lines.empty()) break;
        const std::size_t n = cellsOf(lines.front(), d);
        bool even = n > 1;
        for (const auto& l : lines) even = even && cellsOf(l, d) == n;
        if (even && n > bestCells) {
            bestCells = n;
            g.format.delimiter = d;
        }
    }
    // A header names columns: none of its cells is a number.
    if (!lines.empty()) {
        const TableResult head = parseTable(std::string(lines.front()) + "\n",
                                            TableFormat{TableLayout::Delimited, g.format.delimiter, '"', false}, "");
        bool anyNumber = false;
        if (!head.table.rows.empty())
            for (const auto& c : head.table.rows.front().cells)
                anyNumber = anyNumber || (!c.empty() && readTableNumber(c, g.format.delimiter == ',' ? '.' : ','));
        g.format.header = !anyNumber;
    }
    // A decimal comma: with another delimiter, cells of digits with one comma.
    if (g.format.delimiter != ',') {
        int commas = 0, points = 0;
        for (std::size_t i = 1; i < lines.size(); ++i) {
            const std::string_view l = lines[i];
            for (std::size_t k = 1; k + 1 < l.size(); ++k) {
                const bool digits = std::isdigit(static_cast<unsigned char>(l[k - 1])) &&
                                    std::isdigit(static_cast<unsigned char>(l[k + 1]));
                commas += digits && l[k] == ',';
                points += digits && l[k] == '.';
            }
        }
        if (commas > points) g.decimal = ',';
    }
    return g;
}

std::vector<ColumnLook> lookAtColumns(const Table& table, char decimal, std::size_t samples) {
    std::vector<ColumnLook> out(table.columns.size());
    std::vector<std::set<std::string>> seen(table.columns.size());
    for (std::size_t c = 0; c < table.columns.size(); ++c) {
        out[c].name = table.columns[c];
        out[c].numeric = true;
        out[c].clock = true;
    }
    for (const auto& row : table.rows) {
        for (std::size_t c = 0; c < out.size() && c < row.cells.size(); ++c) {
            const std::string& v = row.cells[c];
            if (v.empty()) continue;
            ColumnLook& look = out[c];
            if (seen[c].size() < 1000 && seen[c].insert(v).second && look.samples.size() < samples)
                look.samples.push_back(v);
            const auto number = readTableNumber(v, decimal);
            if (number) {
                look.min = look.filled == 0 ? *number : std::min(look.min, *number);
                look.max = look.filled == 0 ? *number : std::max(look.max, *number);
            }
            look.numeric = look.numeric && number.has_value();
            look.clock = look.clock && v.find(':') != std::string::npos && readTableClock(v, decimal);
            ++look.filled;
        }
    }
    for (std::size_t c = 0; c < out.size(); ++c) {
        out[c].distinct = seen[c].size();
        if (out[c].filled == 0) out[c].numeric = out[c].clock = false;
    }
    return out;
}

const std::vector<std::string>& columnRoles() {
    static const std::vector<std::string> roles = [] {
        std::vector<std::string> r;
        for (const auto& [role, names] : roleNames()) r.push_back(role);
        return r;
    }();
    return roles;
}

/// "B2-L5" → "B{band}-L{lane}": the first two runs of digits become the band and the lane;
/// empty when a label has fewer than two.
std::string guessZonePattern(const std::string& label) {
    std::string out;
    int runs = 0;
    for (std::size_t i = 0; i < label.size();) {
        if (std::isdigit(static_cast<unsigned char>(label[i])) && runs < 2) {
            while (i < label.size() && std::isdigit(static_cast<unsigned char>(label[i]))) ++i;
            out += runs++ == 0 ? "{band}" : "{lane}";
        } else {
            out += label[i++];
        }
    }
    return runs == 2 ? out : std::string();
}

void assignRole(MappingProfile& p, const std::string& column, const std::string& role) {
    // Positions come as x and y or as zone labels, never both.
    static const std::set<std::string> byPosition{"x", "y", "to_x", "to_y"}, byZone{"zone", "to_zone"};
    const auto& other = byZone.count(role) ? byPosition : byPosition.count(role) ? byZone : std::set<std::string>{};
    for (const auto& f : other) p.columns.erase(f);
    for (auto it = p.columns.begin(); it != p.columns.end();)
        it = it->second == column || it->first == role ? p.columns.erase(it) : std::next(it);
    for (auto it = p.matchColumns.begin(); it != p.matchColumns.end();)
        it = it->second == column || "match." + it->first == role ? p.matchColumns.erase(it) : std::next(it);
    if (role.empty()) return;
    if (isMatchRole(role)) p.matchColumns[role.substr(6)] = column;
    else p.columns[role] = column;
    if (!p.columns.count("zone")) {
        p.zoneGrid.reset();
        p.zoneLabels.clear();
        p.zonePattern.clear();
    } else if (!p.zoneGrid) {
        p.zoneGrid = ZoneGrid{};
    }
}

std::string roleOf(const MappingProfile& p, const std::string& column) {
    for (const auto& [field, c] : p.columns)
        if (c == column) return field;
    for (const auto& [detail, c] : p.matchColumns)
        if (c == column) return "match." + detail;
    return {};
}

const std::vector<std::string>& typeChoices() {
    static const std::vector<std::string> choices = [] {
        std::vector<std::string> c;
        for (auto name : eventTypeNames()) {
            const auto type = eventTypeFromString(name);
            c.emplace_back(wordOf(*type, 2));
            if (*type == EventType::Shot)
                for (Result r : allowedResults(*type)) c.push_back("shot/" + std::string(wordOf(r, 2)));
        }
        c.emplace_back("skip");
        return c;
    }();
    return choices;
}

MappingProfile draftProfile(const Table& table, const TableGuess& guess, const std::string& ourName) {
    MappingProfile p;
    p.table = guess.format;
    p.encoding = guess.encoding;
    p.decimal = guess.decimal;
    p.usValues.clear();
    const auto looks = lookAtColumns(table, guess.decimal);
    // Roles by name first, then a clock-like column for the time.
    for (const auto& look : looks) {
        const std::string key = squashed(look.name);
        for (const auto& [role, names] : roleNames()) {
            if (std::find(names.begin(), names.end(), key) == names.end()) continue;
            const bool taken = isMatchRole(role) ? p.matchColumns.count(role.substr(6)) > 0 : p.columns.count(role) > 0;
            if (!taken) assignRole(p, look.name, role);
            break;
        }
    }
    if (!p.columns.count("time"))
        for (const auto& look : looks)
            if (look.clock && roleOf(p, look.name).empty()) {
                assignRole(p, look.name, "time");
                break;
            }
    auto lookOf = [&](const std::string& field) -> const ColumnLook* {
        const auto it = p.columns.find(field);
        if (it == p.columns.end()) return nullptr;
        for (const auto& look : looks)
            if (look.name == it->second) return &look;
        return nullptr;
    };
    if (const ColumnLook* t = lookOf("time")) {
        p.timeForm = t->clock ? MappingProfile::TimeForm::Clock : MappingProfile::TimeForm::Seconds;
        // One clock beyond a half's length: from kick-off.
        const double longest = t->clock ? 0 : t->max;
        p.timeFromKickoff = longest > 3600;
        if (t->clock)
            for (const auto& row : table.rows)
                if (const auto at = table.column(t->name); at && row.cells.size() > *at)
                    if (const auto s = readTableClock(row.cells[*at], guess.decimal); s && *s > 3600) {
                        p.timeFromKickoff = true;
                        break;
                    }
    }
    if (const ColumnLook* zone = lookOf("zone"); zone && !zone->samples.empty())
        p.zonePattern = guessZonePattern(zone->samples.front());
    // The extent, from the largest coordinates: 0–1, metres, 0–100, else a picture's pixels.
    const ColumnLook* x = lookOf("x");
    const ColumnLook* y = lookOf("y");
    if (x && y && x->numeric && y->numeric) {
        const double mx = std::max({x->max, lookOf("to_x") ? lookOf("to_x")->max : 0.0});
        const double my = std::max({y->max, lookOf("to_y") ? lookOf("to_y")->max : 0.0});
        if (mx <= 1.0001 && my <= 1.0001) p.width = p.height = 1;
        else if (mx <= 105.5 && my <= 68.5 && mx > 0) p.width = 105, p.height = 68;
        else if (mx <= 100.0001 && my <= 100.0001) p.width = p.height = 100;
        else if (mx <= 120.5 && my <= 80.5) p.width = 120, p.height = 80;
        else {
            p.width = std::ceil(mx / 10) * 10;
            p.height = std::ceil(my / 10) * 10;
        }
    }
    // Our side's value, and our words wherever the table already uses them.
    if (const ColumnLook* side = lookOf("side")) {
        const std::string ours = squashed(ourName);
        for (const auto& w : vocabulary(table, p))
            if (w.field == "side" && ((!ours.empty() && squashed(w.word) == ours) || squashed(w.word) == "us" ||
                                      squashed(w.word) == "we" || squashed(w.word) == "own"))
                p.usValues.push_back(w.word);
        (void)side;
    }
    for (const auto& w : vocabulary(table, p)) {
        const std::string word = asOurWord(w.word);
        if (w.field == "type") {
            auto type = eventTypeFromWord(word, 2);
            if (!type) type = eventTypeFromWord(word, 1);
            if (type) p.types[w.word] = WordMeaning{std::string(wordOf(*type, 1)), {}, {}};
        } else if (w.field == "result") {
            auto result = resultFromWord(word, 2);
            if (!result) result = resultFromWord(word, 1);
            if (result) p.results[w.word] = std::string(wordOf(*result, 1));
        }
    }
    return p;
}

std::vector<WordUse> vocabulary(const Table& table, const MappingProfile& p) {
    std::vector<WordUse> out;
    for (const char* field : {"side", "type", "result", "period", "zone", "to_zone"}) {
        const auto col = p.columns.find(field);
        if (col == p.columns.end()) continue;
        const auto at = table.column(col->second);
        if (!at) continue;
        std::unordered_map<std::string, std::size_t> index;
        std::vector<WordUse> words;
        for (const auto& row : table.rows) {
            if (*at >= row.cells.size()) continue;
            std::string w = row.cells[*at];
            const auto b = w.find_first_not_of(" \t\r");
            w = b == std::string::npos ? std::string() : w.substr(b, w.find_last_not_of(" \t\r") - b + 1);
            if (w.empty()) continue;
            if (std::string(field) == "period" && readTableNumber(w, p.decimal)) continue;
            auto [it, fresh] = index.try_emplace(w, words.size());
            if (fresh) words.push_back({field, col->second, w, 0, {}, {}});
            WordUse& u = words[it->second];
            ++u.count;
            if (u.lines.size() < 3) u.lines.push_back(row.line);
        }
        for (WordUse& u : words) {
            const std::string f = u.field;
            if (f == "side") {
                if (!p.homeValue.empty()) u.ours = u.word == p.homeValue ? "home" : u.word == p.awayValue ? "away" : "";
                else if (std::find(p.usValues.begin(), p.usValues.end(), u.word) != p.usValues.end()) u.ours = "us";
                else if (p.oppValues.empty() ||
                         std::find(p.oppValues.begin(), p.oppValues.end(), u.word) != p.oppValues.end())
                    u.ours = "opp";
            } else if (f == "type") {
                if (std::find(p.skip.begin(), p.skip.end(), u.word) != p.skip.end()) u.ours = "skip";
                else if (const auto m = p.types.find(u.word); m != p.types.end()) {
                    u.ours = std::string(wordOf(*eventTypeFromString(m->second.type), 2));
                    if (!m->second.result.empty())
                        u.ours += "/" + std::string(wordOf(*resultFromString(m->second.result), 2));
                }
            } else if (f == "result") {
                if (const auto r = p.results.find(u.word); r != p.results.end())
                    u.ours = std::string(wordOf(*resultFromString(r->second), 2));
            } else if (f == "zone" || f == "to_zone") {
                if (const auto z = zoneOfLabelIn(p, u.word))
                    u.ours = std::to_string(z->band) + "," + std::to_string(z->lane);
            } else if (const auto n = p.periodWords.find(u.word); n != p.periodWords.end()) {
                u.ours = std::to_string(n->second);
            }
        }
        std::stable_sort(words.begin(), words.end(), [](const WordUse& a, const WordUse& b) { return a.count > b.count; });
        out.insert(out.end(), words.begin(), words.end());
    }
    return out;
}

bool mapWord(MappingProfile& p, const std::string& field, const std::string& word, const std::string& ours) {
    auto drop = [&](std::vector<std::string>& list) { list.erase(std::remove(list.begin(), list.end(), word), list.end()); };
    if (field == "side") {
        if (!ours.empty() && ours != "us" && ours != "opp") return false;
        drop(p.usValues);
        drop(p.oppValues);
        if (ours == "us") p.usValues.push_back(word);
        // A listed "them" side makes every other value an unmapped word; keep it only when
        // the person said so for some value.
        if (ours == "opp" && !p.oppValues.empty()) p.oppValues.push_back(word);
        return true;
    }
    if (field == "type") {
        WordMeaning m;
        if (!ours.empty() && ours != "skip") {
            const auto slash = ours.find('/');
            const auto type = eventTypeFromWord(ours.substr(0, slash), 2);
            if (!type) return false;
            m.type = std::string(wordOf(*type, 1));
            if (slash != std::string::npos) {
                const auto result = resultFromWord(ours.substr(slash + 1), 2);
                if (!result) return false;
                m.result = std::string(wordOf(*result, 1));
            }
        }
        drop(p.skip);
        p.types.erase(word);
        if (ours == "skip") p.skip.push_back(word);
        else if (!ours.empty()) p.types[word] = m;
        return true;
    }
    if (field == "result") {
        const auto result = ours.empty() ? std::nullopt : resultFromWord(ours, 2);
        if (!ours.empty() && !result) return false;
        p.results.erase(word);
        if (result) p.results[word] = std::string(wordOf(*result, 1));
        return true;
    }
    if (field == "zone" || field == "to_zone") {
        int band = 0, lane = 0;
        if (!ours.empty() && (std::sscanf(ours.c_str(), "%d,%d", &band, &lane) != 2 || !p.zoneGrid ||
                              band < 1 || band > p.zoneGrid->bands() || lane < 1 || lane > p.zoneGrid->lanes()))
            return false;
        p.zoneLabels.erase(word);
        if (!ours.empty()) p.zoneLabels[word] = Zone{band, lane};
        return true;
    }
    if (field == "period") {
        const int n = ours.empty() ? 0 : std::atoi(ours.c_str());
        if (!ours.empty() && (n < 1 || n > 9)) return false;
        p.periodWords.erase(word);
        if (n > 0) p.periodWords[word] = n;
        return true;
    }
    return false;
}

DraftCheck checkDraft(std::string_view bytes, const MappingProfile& draft, const MatchDetails& details,
                      const std::string& fileName) {
    DraftCheck out;
    const ProfileResult parsed = parseProfile(toJson(draft).dump(), draft.name.empty() ? "layout" : draft.name);
    if (!parsed.profile) {
        out.profileErrors = parsed.errors;
        return out;
    }
    const MappingProfile& profile = *parsed.profile;
    // As ingest would: every match mapped, then read by the match reader (table terms).
    for (const MappedTable& mapped : mapFileMatches(bytes, profile, details, fileName)) {
        out.warnings.insert(out.warnings.end(), mapped.warnings.begin(), mapped.warnings.end());
        if (!mapped.errors.empty()) {
            out.errors.insert(out.errors.end(), mapped.errors.begin(), mapped.errors.end());
            continue;
        }
        ++out.matches;
        const ReadResult read = parseMatchDocument(mapped.match, fileName);
        const Problems errors = inTableTerms(read.errors, mapped, profile);
        const Problems warnings = inTableTerms(read.warnings, mapped, profile);
        out.errors.insert(out.errors.end(), errors.begin(), errors.end());
        out.warnings.insert(out.warnings.end(), warnings.begin(), warnings.end());
    }
    MatchDetails preview = details;
    preview.preview = true;
    for (MappedTable& mapped : mapFileMatches(bytes, profile, preview, fileName)) {
        if (!mapped.match.contains("events")) continue;
        ReadResult read = parseMatchDocument(mapped.match, fileName);
        if (!read.match) {
            // Leave out the events the reader refuses ("events[12]"), and read the rest.
            std::set<std::size_t> refused;
            for (const Problem& e : read.errors)
                if (e.place.rfind("events[", 0) == 0) refused.insert(std::strtoul(e.place.c_str() + 7, nullptr, 10));
            json& events = mapped.match["events"];
            json kept = json::array();
            for (std::size_t i = 0; i < events.size(); ++i)
                if (!refused.count(i)) kept.push_back(std::move(events[i]));
            events = std::move(kept);
            if (!events.empty()) read = parseMatchDocument(mapped.match, fileName);
        }
        if (read.match) out.preview = std::move(read.match);
        break;
    }
    return out;
}

json toJson(const MappingProfile& p) {
    json table{{"layout", std::string(toString(p.table.layout))}, {"encoding", std::string(toString(p.encoding))}};
    if (p.table.layout == TableLayout::Delimited) {
        table["delimiter"] = p.table.delimiter == '\t' ? std::string("tab") : std::string(1, p.table.delimiter);
        table["quote"] = p.table.quote ? std::string(1, p.table.quote) : std::string();
        table["header"] = p.table.header;
    }
    table["decimal"] = std::string(1, p.decimal);
    json doc{{"format", std::string(kProfileFormat)}, {"version", kProfileFormatVersion}};
    if (!p.name.empty()) doc["name"] = p.name;
    doc["table"] = table;
    doc["columns"] = p.columns;
    json time{{"form", p.timeForm == MappingProfile::TimeForm::Clock    ? "clock"
                       : p.timeForm == MappingProfile::TimeForm::Frames ? "frames"
                                                                        : "seconds"},
              {"from", p.timeFromKickoff ? "kickoff" : "period"}};
    if (p.timeForm == MappingProfile::TimeForm::Frames) time["fps"] = p.fps;
    if (p.timeFromKickoff) {
        json starts = json::object();
        for (const auto& [n, s] : p.periodStarts) starts[std::to_string(n)] = s;
        time["period_starts"] = starts;
    }
    doc["time"] = time;
    if (!p.periodWords.empty()) doc["periods"] = p.periodWords;
    json side = json::object();
    if (!p.homeValue.empty()) {
        side["home"] = p.homeValue;
        side["away"] = p.awayValue;
    } else {
        side["us"] = p.usValues;
        if (!p.oppValues.empty()) side["opp"] = p.oppValues;
    }
    doc["side"] = side;
    json coordinates{{"width", p.width}, {"height", p.height}, {"origin", p.origin},
                     {"y", p.yUp ? "up" : "down"}, {"frame", p.frame}};
    if (p.frame == "ground") coordinates["us_attack"] = p.usAttack;
    doc["coordinates"] = coordinates;
    if (p.zoneGrid) {
        json zones{{"grid", p.zoneGrid->name()}};
        if (!p.zonePattern.empty()) zones["pattern"] = p.zonePattern;
        if (!p.zoneLabels.empty()) {
            json labels = json::object();
            for (const auto& [label, z] : p.zoneLabels) labels[label] = {z.band, z.lane};
            zones["labels"] = labels;
        }
        doc["zones"] = zones;
    }
    json types = json::object();
    for (const auto& [word, m] : p.types) {
        const std::string type(wordOf(*eventTypeFromString(m.type), 2));
        if (m.result.empty() && m.tags.empty()) {
            types[word] = type;
            continue;
        }
        json meaning{{"type", type}};
        if (!m.result.empty()) meaning["result"] = std::string(wordOf(*resultFromString(m.result), 2));
        if (!m.tags.empty()) meaning["tags"] = m.tags;
        types[word] = meaning;
    }
    doc["types"] = types;
    json results = json::object();
    for (const auto& [word, r] : p.results) results[word] = std::string(wordOf(*resultFromString(r), 2));
    if (!results.empty()) doc["results"] = results;
    if (!p.skip.empty()) doc["skip"] = p.skip;
    doc["tag_separator"] = p.tagSeparator;
    if (!p.fileNamePattern.empty()) doc["file_name"] = p.fileNamePattern;
    if (!p.matchColumns.empty()) doc["match_columns"] = p.matchColumns;
    if (!p.venueWords.empty()) doc["venues"] = p.venueWords;
    if (!p.match.empty()) doc["match"] = p.match;
    return doc;
}

} // namespace pitchloop::model
