#include "fixtures.h"

#include <algorithm>
#include <cstdio>
#include <map>
#include <nlohmann/json.hpp>
#include <set>

namespace pitchloop::model {

using nlohmann::json;

// Calendar dates ---------------------------------------------------------------------------

namespace {

// Days from civil and back: the proleptic Gregorian calendar algorithms of H. Hinnant's
// "chrono-Compatible Low-Level Date Algorithms" (public domain).
long daysFromCivil(long y, unsigned m, unsigned d) {
    y -= m <= 2;
    const long era = (y >= 0 ? y : y - 399) / 400;
    const unsigned yoe = static_cast<unsigned>(y - era * 400);
    const unsigned doy = (153 * (m > 2 ? m - 3 : m + 9) + 2) / 5 + d - 1;
    const unsigned doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
    return era * 146097 + static_cast<long>(doe) - 719468;
}

bool leap(long y) {
    return (y % 4 == 0 && y % 100 != 0) || y % 400 == 0;
}

unsigned daysInMonth(long y, unsigned m) {
    static constexpr unsigned kDays[] = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
    return m == 2 && leap(y) ? 29 : kDays[m - 1];
}

} // namespace

std::optional<long> dayNumber(std::string_view s) {
    if (s.size() != 10 || s[4] != '-' || s[7] != '-') return std::nullopt;
    for (std::size_t i : {0u, 1u, 2u, 3u, 5u, 6u, 8u, 9u})
        if (s[i] < '0' || s[i] > '9') return std::nullopt;
    auto num = [&](std::size_t from, std::size_t n) {
        long v = 0;
        for (std::size_t i = from; i < from + n; ++i)
            v = v * 10 + (s[i] - '0');
        return v;
    };
    const long y = num(0, 4);
    const long m = num(5, 2);
    const long d = num(8, 2);
    if (m < 1 || m > 12 || d < 1 || d > static_cast<long>(daysInMonth(y, static_cast<unsigned>(m))))
        return std::nullopt;
    return daysFromCivil(y, static_cast<unsigned>(m), static_cast<unsigned>(d));
}

std::string isoDate(long z) {
    z += 719468;
    const long era = (z >= 0 ? z : z - 146096) / 146097;
    const unsigned doe = static_cast<unsigned>(z - era * 146097);
    const unsigned yoe = (doe - doe / 1460 + doe / 36524 - doe / 146096) / 365;
    const long y = static_cast<long>(yoe) + era * 400;
    const unsigned doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
    const unsigned mp = (5 * doy + 2) / 153;
    const unsigned d = doy - (153 * mp + 2) / 5 + 1;
    const unsigned m = mp < 10 ? mp + 3 : mp - 9;
    char buf[48];
    std::snprintf(buf, sizeof buf, "%04ld-%02u-%02u", y + (m <= 2), m, d);
    return buf;
}

std::string addDays(const std::string& date, long days) {
    const auto n = dayNumber(date);
    if (!n) throw std::invalid_argument("addDays: '" + date + "' is not a date");
    return isoDate(*n + days);
}

// Fixtures ---------------------------------------------------------------------------------

bool isClockTime(std::string_view s) {
    if (s.size() != 5 || s[2] != ':') return false;
    for (std::size_t i : {0u, 1u, 3u, 4u})
        if (s[i] < '0' || s[i] > '9') return false;
    const int h = (s[0] - '0') * 10 + (s[1] - '0');
    const int m = (s[3] - '0') * 10 + (s[4] - '0');
    return h <= 23 && m <= 59;
}

namespace {

std::string trim(std::string_view s) {
    const auto first = s.find_first_not_of(" \t");
    if (first == std::string_view::npos) return "";
    const auto last = s.find_last_not_of(" \t");
    return std::string(s.substr(first, last - first + 1));
}

/// Adds a problem for every fixture sharing its date with an earlier one (a squad plays at
/// most one match a day).
void checkDuplicateDates(const std::vector<Fixture>& fixtures,
                         const std::vector<std::string>& places, const std::string& source,
                         Problems& errors) {
    std::map<std::string, std::string> seen;
    for (std::size_t i = 0; i < fixtures.size(); ++i) {
        const std::string& date = fixtures[i].date;
        if (date.empty()) continue;
        auto [it, fresh] = seen.emplace(date, places[i]);
        if (!fresh)
            errors.push_back({source, places[i], "date",
                              "a second fixture on " + date + " (the first is at " + it->second +
                                  "); a squad plays one match a day"});
    }
}

} // namespace

Problems validateFixture(const Fixture& f, const std::string& source, const std::string& place) {
    Problems out;
    auto error = [&](const char* field, std::string message) {
        out.push_back({source, place, field, std::move(message)});
    };
    if (f.date.empty())
        error("date", "missing");
    else if (!dayNumber(f.date))
        error("date", "'" + f.date + "' is not a date YYYY-MM-DD");
    if (!f.kickoff.empty() && !isClockTime(f.kickoff))
        error("kickoff", "'" + f.kickoff +
                             "' is not a time HH:MM (00:00 to 23:59), or empty "
                             "while unknown");
    if (trim(f.opponent).empty()) error("opponent", "missing");
    if (f.venue.empty())
        error("venue", "missing");
    else if (f.venue != "home" && f.venue != "away" && f.venue != "neutral")
        error("venue", "'" + f.venue + "' is not one of home, away, neutral");
    return out;
}

FixtureFileResult parseFixtureCsv(std::string_view text, const std::string& source) {
    FixtureFileResult r;
    // Split into records of fields (RFC 4180), remembering the line each record starts on.
    struct Record {
        int line = 0;
        std::vector<std::string> fields;
    };
    std::vector<Record> records;
    if (text.substr(0, 3) == "\xEF\xBB\xBF") text.remove_prefix(3); // a byte-order mark
    int line = 1;
    std::size_t i = 0;
    while (i < text.size()) {
        Record rec;
        rec.line = line;
        std::string field;
        bool endOfRecord = false;
        while (!endOfRecord) {
            field.clear();
            if (i < text.size() && text[i] == '"') {
                const int quoteLine = line;
                ++i;
                bool closed = false;
                while (i < text.size()) {
                    if (text[i] == '"') {
                        if (i + 1 < text.size() && text[i + 1] == '"') {
                            field += '"';
                            i += 2;
                            continue;
                        }
                        ++i;
                        closed = true;
                        break;
                    }
                    if (text[i] == '\n') ++line;
                    field += text[i++];
                }
                if (!closed) {
                    r.errors.push_back({source, "line " + std::to_string(quoteLine), "",
                                        "a quoted field is never closed"});
                    return r;
                }
                if (i < text.size() && text[i] != ',' && text[i] != '\n' && text[i] != '\r') {
                    r.errors.push_back({source, "line " + std::to_string(line), "",
                                        "text after a closing quote (write \"\" for a quote "
                                        "inside a quoted field)"});
                    return r;
                }
            } else {
                while (i < text.size() && text[i] != ',' && text[i] != '\n' && text[i] != '\r') {
                    if (text[i] == '"') {
                        r.errors.push_back({source, "line " + std::to_string(line), "",
                                            "a quote inside an unquoted field (quote the whole "
                                            "field and write \"\" for the quote)"});
                        return r;
                    }
                    field += text[i++];
                }
            }
            rec.fields.push_back(field);
            if (i >= text.size()) {
                endOfRecord = true;
            } else if (text[i] == ',') {
                ++i;
            } else {
                if (text[i] == '\r') ++i;
                if (i < text.size() && text[i] == '\n') ++i;
                ++line;
                endOfRecord = true;
            }
        }
        const bool blank = rec.fields.size() == 1 && trim(rec.fields[0]).empty();
        if (!blank) records.push_back(std::move(rec));
    }
    if (records.empty()) {
        r.errors.push_back({source, "line 1", "",
                            "empty file: expected the header "
                            "date,kickoff,opponent,venue,competition"});
        return r;
    }

    const std::vector<std::string> names{"date", "kickoff", "opponent", "venue", "competition"};
    std::map<std::string, std::size_t> column;
    const Record& header = records.front();
    for (std::size_t c = 0; c < header.fields.size(); ++c) {
        const std::string name = trim(header.fields[c]);
        if (std::find(names.begin(), names.end(), name) == names.end())
            r.errors.push_back({source, "line " + std::to_string(header.line), name,
                                "unknown column '" + name +
                                    "' (expected date,kickoff,opponent,venue,competition)"});
        else if (!column.emplace(name, c).second)
            r.errors.push_back(
                {source, "line " + std::to_string(header.line), name, "column named twice"});
    }
    for (const auto& name : names)
        if (!column.contains(name))
            r.errors.push_back({source, "line " + std::to_string(header.line), name,
                                "missing column (the header is "
                                "date,kickoff,opponent,venue,competition)"});
    if (!r.errors.empty()) return r;

    std::vector<Fixture> fixtures;
    std::vector<std::string> places;
    for (std::size_t k = 1; k < records.size(); ++k) {
        const Record& rec = records[k];
        const std::string place = "line " + std::to_string(rec.line);
        if (rec.fields.size() != header.fields.size()) {
            r.errors.push_back({source, place, "",
                                std::to_string(rec.fields.size()) +
                                    " fields where the header has " +
                                    std::to_string(header.fields.size())});
            continue;
        }
        Fixture f;
        f.date = trim(rec.fields[column["date"]]);
        f.kickoff = trim(rec.fields[column["kickoff"]]);
        f.opponent = trim(rec.fields[column["opponent"]]);
        f.venue = trim(rec.fields[column["venue"]]);
        f.competition = trim(rec.fields[column["competition"]]);
        const Problems p = validateFixture(f, source, place);
        r.errors.insert(r.errors.end(), p.begin(), p.end());
        fixtures.push_back(std::move(f));
        places.push_back(place);
    }
    checkDuplicateDates(fixtures, places, source, r.errors);
    if (r.errors.empty()) r.fixtures = std::move(fixtures);
    return r;
}

FixtureFileResult parseFixtureJson(std::string_view text, const std::string& source) {
    FixtureFileResult r;
    json root;
    try {
        root = json::parse(text.begin(), text.end());
    } catch (const json::parse_error& e) {
        r.errors.push_back({source, "", "", std::string("not valid JSON: ") + e.what()});
        return r;
    }
    if (!root.is_object() || root.value("format", "") != "pitchloop-fixtures" ||
        root.value("version", 0) != 1) {
        r.errors.push_back({source, "", "format",
                            "expected \"format\": \"pitchloop-fixtures\" and \"version\": 1"});
        return r;
    }
    for (auto it = root.begin(); it != root.end(); ++it)
        if (it.key() != "format" && it.key() != "version" && it.key() != "fixtures")
            r.errors.push_back({source, "", it.key(), "unknown key"});
    if (!root.contains("fixtures") || !root["fixtures"].is_array()) {
        r.errors.push_back({source, "", "fixtures", "expected a list of fixtures"});
        return r;
    }
    const std::set<std::string> allowed{"date", "kickoff", "opponent", "venue", "competition"};
    std::vector<Fixture> fixtures;
    std::vector<std::string> places;
    const json& list = root["fixtures"];
    for (std::size_t i = 0; i < list.size(); ++i) {
        const std::string place = "fixtures[" + std::to_string(i) + "]";
        const json& v = list[i];
        if (!v.is_object()) {
            r.errors.push_back({source, place, "", "expected an object"});
            continue;
        }
        for (auto it = v.begin(); it != v.end(); ++it)
            if (!allowed.contains(it.key()))
                r.errors.push_back({source, place, it.key(), "unknown key"});
        Fixture f;
        bool typed = true;
        auto field = [&](const char* key, std::string& out) {
            auto it = v.find(key);
            if (it == v.end() || it->is_null()) return;
            if (!it->is_string()) {
                r.errors.push_back({source, place, key, "expected text"});
                typed = false;
            } else {
                out = it->get<std::string>();
            }
        };
        field("date", f.date);
        field("kickoff", f.kickoff);
        field("opponent", f.opponent);
        field("venue", f.venue);
        field("competition", f.competition);
        if (typed) {
            const Problems p = validateFixture(f, source, place);
            r.errors.insert(r.errors.end(), p.begin(), p.end());
        }
        fixtures.push_back(std::move(f));
        places.push_back(place);
    }
    checkDuplicateDates(fixtures, places, source, r.errors);
    if (r.errors.empty()) r.fixtures = std::move(fixtures);
    return r;
}

FixtureFileResult parseFixtureFile(std::string_view text, const std::string& source) {
    std::string_view rest = text;
    if (rest.substr(0, 3) == "\xEF\xBB\xBF") rest.remove_prefix(3);
    const auto first = rest.find_first_not_of(" \t\r\n");
    if (first != std::string_view::npos && rest[first] == '{')
        return parseFixtureJson(rest, source);
    return parseFixtureCsv(text, source);
}

// Microcycle -------------------------------------------------------------------------------

MicrocycleDay microcycle(const std::string& date, const std::vector<Fixture>& fixtures) {
    MicrocycleDay day;
    day.date = date;
    const auto today = dayNumber(date);
    if (!today) return day;
    std::optional<long> prevDay, nextDay;
    for (const Fixture& f : fixtures) {
        const auto d = dayNumber(f.date);
        if (!d) continue;
        if (*d < *today && (!prevDay || *d > *prevDay)) {
            prevDay = d;
            day.previous = f;
        }
        if (*d >= *today && (!nextDay || *d < *nextDay)) {
            nextDay = d;
            day.next = f;
        }
    }
    if (prevDay) day.daysAfterPrevious = static_cast<int>(*today - *prevDay);
    if (nextDay) day.daysToNext = static_cast<int>(*nextDay - *today);
    const std::string plus = prevDay ? "MD+" + std::to_string(*day.daysAfterPrevious) : "";
    const std::string minus = nextDay ? "MD-" + std::to_string(*day.daysToNext) : "";
    if (nextDay && *day.daysToNext == 0) {
        day.label = "MD";
    } else if (prevDay && nextDay && *nextDay - *prevDay <= kCongestedWithinDays) {
        day.congested = true;
        day.label = plus + " / " + minus;
    } else if (prevDay && (*day.daysAfterPrevious <= kRecoveryDays || !nextDay)) {
        day.label = plus;
    } else if (nextDay) {
        day.label = minus;
    }
    return day;
}

int IntensityCaps::after(int n) const {
    return n >= 1 && n <= kRecoveryDays ? afterMatch[static_cast<std::size_t>(n - 1)] : otherDays;
}

int IntensityCaps::before(int n) const {
    return n >= 1 && n <= static_cast<int>(beforeMatch.size())
               ? beforeMatch[static_cast<std::size_t>(n - 1)]
               : otherDays;
}

std::optional<int> intensityCap(const MicrocycleDay& day, const IntensityCaps& caps) {
    if (day.label.empty()) return std::nullopt;
    if (day.daysToNext && *day.daysToNext == 0) return caps.matchDay;
    if (day.congested)
        return std::min(caps.after(*day.daysAfterPrevious), caps.before(*day.daysToNext));
    if (day.label.starts_with("MD+")) return caps.after(*day.daysAfterPrevious);
    return caps.before(*day.daysToNext);
}

std::string capsToJson(const IntensityCaps& caps) {
    json j{{"md", caps.matchDay},
           {"md_plus", caps.afterMatch},
           {"md_minus", caps.beforeMatch},
           {"other", caps.otherDays}};
    return j.dump();
}

CapsResult parseCaps(std::string_view text, const std::string& source) {
    CapsResult r;
    json root;
    try {
        root = json::parse(text.begin(), text.end());
    } catch (const json::parse_error& e) {
        r.errors.push_back({source, "", "", std::string("not valid JSON: ") + e.what()});
        return r;
    }
    if (!root.is_object()) {
        r.errors.push_back({source, "", "", "expected an object"});
        return r;
    }
    auto level = [&](const json& v, const std::string& field, int& out) {
        if (!v.is_number_integer() || v.get<int>() < 0 || v.get<int>() > 5)
            r.errors.push_back({source, "", field,
                                "expected a whole number from 0 (no session) "
                                "to 5"});
        else
            out = v.get<int>();
    };
    auto list = [&](const char* key, auto& out) {
        auto it = root.find(key);
        if (it == root.end()) return;
        if (!it->is_array() || it->size() != out.size()) {
            r.errors.push_back(
                {source, "", key, "expected a list of " + std::to_string(out.size()) + " caps"});
            return;
        }
        for (std::size_t i = 0; i < out.size(); ++i)
            level((*it)[i], std::string(key) + "[" + std::to_string(i) + "]", out[i]);
    };
    for (auto it = root.begin(); it != root.end(); ++it)
        if (it.key() != "md" && it.key() != "md_plus" && it.key() != "md_minus" &&
            it.key() != "other")
            r.errors.push_back({source, "", it.key(), "unknown key"});
    if (root.contains("md")) level(root["md"], "md", r.caps.matchDay);
    list("md_plus", r.caps.afterMatch);
    list("md_minus", r.caps.beforeMatch);
    if (root.contains("other")) level(root["other"], "other", r.caps.otherDays);
    if (!r.errors.empty()) r.caps = IntensityCaps{};
    return r;
}

} // namespace pitchloop::model
