#include "squadlist.h"

#include "table.h"

#include <algorithm>
#include <cctype>

namespace pitchloop::model {

namespace {

std::string upper(std::string_view s) {
    std::string out(s);
    for (char& c : out) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    return out;
}

std::string trimmed(std::string_view s) {
    const auto first = s.find_first_not_of(" \t");
    if (first == std::string_view::npos) return {};
    const auto last = s.find_last_not_of(" \t");
    return std::string(s.substr(first, last - first + 1));
}

} // namespace

std::string_view toString(Unit u) {
    switch (u) {
    case Unit::Goalkeeper: return "goalkeeper";
    case Unit::Defence: return "defence";
    case Unit::Midfield: return "midfield";
    case Unit::Attack: return "attack";
    case Unit::LeftSide: return "left_side";
    case Unit::RightSide: return "right_side";
    case Unit::Centre: return "centre";
    }
    return "centre";
}

const std::vector<Unit>& allUnits() {
    static const std::vector<Unit> units{Unit::Goalkeeper, Unit::Defence,  Unit::Midfield, Unit::Attack,
                                         Unit::LeftSide,   Unit::RightSide, Unit::Centre};
    return units;
}

std::optional<Unit> unitFromString(std::string_view s) {
    for (const Unit u : allUnits())
        if (toString(u) == s) return u;
    return std::nullopt;
}

std::string unitWords(Unit u) {
    switch (u) {
    case Unit::Goalkeeper: return "our goalkeeper";
    case Unit::Defence: return "our defence";
    case Unit::Midfield: return "our midfield";
    case Unit::Attack: return "our attack";
    case Unit::LeftSide: return "our left side";
    case Unit::RightSide: return "our right side";
    case Unit::Centre: return "our centre";
    }
    return {};
}

const std::vector<std::string_view>& knownPositions() {
    static const std::vector<std::string_view> positions{"GK", "RB", "RWB", "CB", "LB", "LWB", "DM", "CM",
                                                         "AM", "RM", "LM",  "RW", "LW", "CF",  "ST"};
    return positions;
}

bool inUnit(std::string_view position, Unit unit) {
    const std::string p = upper(position);
    auto among = [&](std::initializer_list<std::string_view> list) {
        return std::find(list.begin(), list.end(), p) != list.end();
    };
    switch (unit) {
    case Unit::Goalkeeper: return p == "GK";
    case Unit::Defence: return among({"RB", "RWB", "CB", "LB", "LWB"});
    case Unit::Midfield: return among({"DM", "CM", "AM", "RM", "LM"});
    case Unit::Attack: return among({"RW", "LW", "CF", "ST"});
    case Unit::LeftSide: return among({"LB", "LWB", "LM", "LW"});
    case Unit::RightSide: return among({"RB", "RWB", "RM", "RW"});
    case Unit::Centre: return among({"GK", "CB", "DM", "CM", "AM", "CF", "ST"});
    }
    return false;
}

Problems checkPlayer(const Player& p, const std::vector<std::string>& taken) {
    Problems out;
    auto problem = [&](const char* field, std::string message) {
        out.push_back({"", "", field, std::move(message)});
    };
    if (p.number.empty()) problem("number", "a shirt number (or the id the match files give) is needed");
    else if (std::find(taken.begin(), taken.end(), p.number) != taken.end())
        problem("number", "number " + p.number + " is already in the list");
    if (p.name.empty()) problem("name", "a name is needed");
    const auto& known = knownPositions();
    if (std::find(known.begin(), known.end(), upper(p.position)) == known.end()) {
        std::string list;
        for (const auto k : known) list += (list.empty() ? "" : ", ") + std::string(k);
        problem("position", "'" + p.position + "' is not a position the list knows (" + list + ")");
    }
    return out;
}

SquadListResult parseSquadList(std::string_view text, const std::string& fileName) {
    SquadListResult out;
    TableFormat format;
    if (text.find(';') != std::string_view::npos && text.find(',') == std::string_view::npos) format.delimiter = ';';
    if (text.find('\t') != std::string_view::npos && text.find(',') == std::string_view::npos) format.delimiter = '\t';
    const DecodedText decoded = decodeText(text, TextEncoding::Utf8, fileName);
    if (!decoded.errors.empty()) {
        out.errors = decoded.errors;
        return out;
    }
    TableResult table = parseTable(decoded.text, format, fileName);
    if (!table.errors.empty()) {
        out.errors = std::move(table.errors);
        return out;
    }
    const Table& t = table.table;
    std::optional<std::size_t> columns[3];
    const char* names[3] = {"number", "name", "position"};
    for (int k = 0; k < 3; ++k) {
        for (std::size_t c = 0; c < t.columns.size(); ++c) {
            std::string h = trimmed(t.columns[c]);
            std::transform(h.begin(), h.end(), h.begin(), [](unsigned char ch) { return std::tolower(ch); });
            if (h == names[k]) columns[k] = c;
        }
        if (!columns[k])
            out.errors.push_back({fileName, "line 1", names[k], "the header has no column '" + std::string(names[k]) +
                                                                    "' (number, name and position are needed)"});
    }
    if (!out.errors.empty()) return out;
    std::vector<std::string> taken;
    for (const auto& row : t.rows) {
        Player p{trimmed(row.cells[*columns[0]]), trimmed(row.cells[*columns[1]]), upper(trimmed(row.cells[*columns[2]]))};
        for (Problem problem : checkPlayer(p, taken)) {
            problem.file = fileName;
            problem.place = t.place(row);
            out.errors.push_back(std::move(problem));
        }
        taken.push_back(p.number);
        out.players.push_back(std::move(p));
    }
    if (!out.errors.empty()) out.players.clear();
    return out;
}

} // namespace pitchloop::model
