#include "matchreader.h"

#include "zones.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <fstream>
#include <set>
#include <sstream>

namespace pitchloop::model {

using nlohmann::json;

namespace {

std::string jsonTypeName(const json& v) {
    if (v.is_number()) return "a number";
    if (v.is_string()) return "a string";
    if (v.is_boolean()) return "true/false";
    if (v.is_null()) return "null";
    if (v.is_array()) return "a list";
    return "an object";
}

std::string formatNumber(double v) {
    std::ostringstream s;
    s.precision(10);
    s << v;
    return s.str();
}

/// Collects problems while walking one file's JSON.
class Checker {
public:
    Checker(std::string file, std::size_t maxErrors) : m_file(std::move(file)), m_max(maxErrors) {}

    void error(std::string place, std::string field, std::string message) {
        if (m_errors.size() < m_max)
            m_errors.push_back({m_file, std::move(place), std::move(field), std::move(message)});
        else
            ++m_suppressed;
    }
    void warning(std::string place, std::string field, std::string message) {
        m_warnings.push_back({m_file, std::move(place), std::move(field), std::move(message)});
    }
    bool full() const { return m_errors.size() >= m_max; }
    bool hasErrors() const { return !m_errors.empty(); }

    const json* member(const json& obj, const std::string& place, const char* key, bool required) {
        auto it = obj.find(key);
        if (it == obj.end()) {
            if (required) error(place, key, "missing");
            return nullptr;
        }
        return &*it;
    }

    std::optional<std::string> string(const json& obj, const std::string& place, const char* key,
                                      bool required = true) {
        const json* v = member(obj, place, key, required);
        if (!v) return std::nullopt;
        if (!v->is_string()) {
            error(place, key, "expected a string, found " + jsonTypeName(*v));
            return std::nullopt;
        }
        return v->get<std::string>();
    }

    std::optional<double> number(const json& obj, const std::string& place, const char* key,
                                 bool required = true) {
        const json* v = member(obj, place, key, required);
        if (!v) return std::nullopt;
        if (!v->is_number()) {
            error(place, key, "expected a number, found " + jsonTypeName(*v));
            return std::nullopt;
        }
        const double d = v->get<double>();
        if (!std::isfinite(d)) {
            error(place, key, "not a finite number");
            return std::nullopt;
        }
        return d;
    }

    std::optional<long long> integer(const json& obj, const std::string& place, const char* key,
                                     bool required = true) {
        const json* v = member(obj, place, key, required);
        if (!v) return std::nullopt;
        if (!v->is_number_integer()) {
            error(place, key, "expected a whole number, found " + jsonTypeName(*v));
            return std::nullopt;
        }
        return v->get<long long>();
    }

    const json* object(const json& obj, const std::string& place, const char* key,
                       bool required = true) {
        const json* v = member(obj, place, key, required);
        if (v && !v->is_object()) {
            error(place, key, "expected an object, found " + jsonTypeName(*v));
            return nullptr;
        }
        return v;
    }

    const json* array(const json& obj, const std::string& place, const char* key,
                      bool required = true) {
        const json* v = member(obj, place, key, required);
        if (v && !v->is_array()) {
            error(place, key, "expected a list, found " + jsonTypeName(*v));
            return nullptr;
        }
        return v;
    }

    Problems takeErrors() {
        if (m_suppressed > 0)
            m_errors.push_back({m_file, "", "",
                                "and " + std::to_string(m_suppressed) + " more problems"});
        return std::move(m_errors);
    }
    Problems takeWarnings() { return std::move(m_warnings); }

private:
    std::string m_file;
    std::size_t m_max;
    std::size_t m_suppressed = 0;
    Problems m_errors;
    Problems m_warnings;
};

/// Fields of an event object this reader understands; anything else is kept as `extra`.
const std::set<std::string, std::less<>> kEventFields{"period", "t",    "side", "player", "type",
                                                      "result", "x",    "y",    "to_x",   "to_y",
                                                      "tags"};
const std::set<std::string, std::less<>> kMatchFields{
    "id",    "date",   "competition", "venue", "us", "opponent", "score",
    "pitch", "periods", "frame",      "us_attack", "zone_only"};

std::string extraFields(const json& obj, const std::set<std::string, std::less<>>& known) {
    json extra = json::object();
    for (auto it = obj.begin(); it != obj.end(); ++it)
        if (!known.contains(it.key())) extra[it.key()] = it.value();
    return extra.empty() ? std::string{} : extra.dump();
}

std::pair<std::size_t, std::size_t> lineAndColumn(std::string_view text, std::size_t byte) {
    std::size_t line = 1, column = 1;
    for (std::size_t i = 0; i < byte && i < text.size(); ++i) {
        if (text[i] == '\n') {
            ++line;
            column = 1;
        } else if ((static_cast<unsigned char>(text[i]) & 0xC0) != 0x80) {
            ++column; // count characters, not UTF-8 continuation bytes
        }
    }
    return {line, column};
}

/// Clamps a coordinate lying at most `margin` outside [0, limit]; nullopt when further out.
std::optional<double> clampCoordinate(double v, double limit, double margin) {
    if (v < -margin || v > limit + margin) return std::nullopt;
    return std::clamp(v, 0.0, limit);
}

struct MatchHeader {
    MatchInfo info;
    std::map<int, int> usAttack;
};

std::optional<MatchHeader> readHeader(const json& root, Checker& c) {
    const json* m = c.object(root, "", "match");
    if (!m) return std::nullopt;
    MatchHeader h;
    MatchInfo& info = h.info;
    const std::string place = "match";
    if (auto id = c.string(*m, place, "id")) {
        if (id->empty() || id->find_first_not_of(" \t") == std::string::npos)
            c.error(place, "id", "must not be empty");
        info.id = *id;
    }
    if (auto date = c.string(*m, place, "date")) {
        if (!isIsoDate(*date))
            c.error(place, "date", "'" + *date + "' is not a date of the form YYYY-MM-DD");
        info.date = *date;
    }
    if (auto comp = c.string(*m, place, "competition", false)) info.competition = *comp;
    if (auto venue = c.string(*m, place, "venue")) {
        if (*venue != "home" && *venue != "away" && *venue != "neutral")
            c.error(place, "venue", "'" + *venue + "' is not one of home, away, neutral");
        info.venue = *venue;
    }
    if (auto us = c.string(*m, place, "us")) info.us = *us;
    if (auto opp = c.string(*m, place, "opponent")) info.opponent = *opp;
    if (const json* score = c.object(*m, place, "score", false)) {
        const std::string sp = "match.score";
        auto goals = [&](const char* key) -> std::optional<int> {
            auto g = c.integer(*score, sp, key);
            if (g && *g < 0) {
                c.error(sp, key, "must not be negative");
                return std::nullopt;
            }
            if (g) return static_cast<int>(*g);
            return std::nullopt;
        };
        info.goalsUs = goals("us");
        info.goalsOpp = goals("opponent");
    }
    if (const json* pitch = c.object(*m, place, "pitch")) {
        const std::string pp = "match.pitch";
        auto length = c.number(*pitch, pp, "length_m");
        auto width = c.number(*pitch, pp, "width_m");
        if (length && (*length < kMinLengthM || *length > kMaxLengthM))
            c.error(pp, "length_m",
                    formatNumber(*length) +
                        " m is outside the Laws of the Game range 90–120 m (Law 1)");
        else if (length)
            info.pitch.lengthM = *length;
        if (width && (*width < kMinWidthM || *width > kMaxWidthM))
            c.error(pp, "width_m",
                    formatNumber(*width) +
                        " m is outside the Laws of the Game range 45–90 m (Law 1)");
        else if (width)
            info.pitch.widthM = *width;
        if (length && width && *length <= *width)
            c.error(pp, "length_m", "the touchline (length) must be longer than the goal line");
    }
    if (const json* periods = c.array(*m, place, "periods")) {
        if (periods->empty()) c.error(place, "periods", "must list at least one period");
        std::set<int> seen;
        for (std::size_t i = 0; i < periods->size(); ++i) {
            const std::string pp = "match.periods[" + std::to_string(i) + "]";
            const json& p = (*periods)[i];
            if (!p.is_object()) {
                c.error(pp, "", "expected an object, found " + jsonTypeName(p));
                continue;
            }
            auto n = c.integer(p, pp, "n");
            auto length = c.number(p, pp, "length_s");
            if (n && *n < 1) c.error(pp, "n", "period numbers start at 1");
            if (n && !seen.insert(static_cast<int>(*n)).second)
                c.error(pp, "n", "period " + std::to_string(*n) + " is listed twice");
            if (length && *length <= 0) c.error(pp, "length_s", "must be more than 0 s");
            if (n && length) info.periods.push_back({static_cast<int>(*n), *length});
        }
        std::sort(info.periods.begin(), info.periods.end(),
                  [](const Period& a, const Period& b) { return a.n < b.n; });
    }
    if (auto frame = c.string(*m, place, "frame")) {
        if (auto f = frameFromString(*frame))
            info.sourceFrame = *f;
        else
            c.error(place, "frame", "unknown frame '" + *frame + "' (known: acting, us, ground)");
    }
    if (info.sourceFrame == Frame::Ground) {
        if (const json* attack = c.object(*m, place, "us_attack")) {
            for (auto it = attack->begin(); it != attack->end(); ++it) {
                int n = 0;
                try {
                    std::size_t used = 0;
                    n = std::stoi(it.key(), &used);
                    if (used != it.key().size()) n = 0;
                } catch (const std::exception&) {
                    n = 0;
                }
                if (n < 1) {
                    c.error("match.us_attack", it.key(), "keys are period numbers such as \"1\"");
                    continue;
                }
                if (!it.value().is_string() ||
                    (it.value() != "+x" && it.value() != "-x")) {
                    c.error("match.us_attack", it.key(), "must be \"+x\" or \"-x\"");
                    continue;
                }
                h.usAttack[n] = it.value() == "+x" ? 1 : -1;
            }
            for (const auto& p : info.periods)
                if (!h.usAttack.contains(p.n))
                    c.error("match.us_attack", std::to_string(p.n),
                            "missing: the ground frame needs our attacking direction for "
                            "every period");
        }
    }
    if (const json* zoneOnly = c.object(*m, place, "zone_only", false)) {
        if (auto grid = c.string(*zoneOnly, "match.zone_only", "grid")) {
            if (auto g = ZoneGrid::parse(*grid))
                info.zoneOnlyGrid = g->name();
            else
                c.error("match.zone_only", "grid",
                        "'" + *grid + "' is not a zone grid (equal:BANDSxLANES or markings:BANDS)");
        }
    }
    info.extra = extraFields(*m, kMatchFields);
    return h;
}

void readEvent(const json& e, std::size_t index, const MatchHeader& h, const ReadOptions& options,
               int version,
               Checker& c, std::vector<Event>& out) {
    const std::string place = "events[" + std::to_string(index) + "]";
    if (!e.is_object()) {
        c.error(place, "", "expected an object, found " + jsonTypeName(e));
        return;
    }
    const MatchInfo& info = h.info;
    Event ev;
    ev.fileIndex = static_cast<int>(index);
    bool good = true;

    auto period = c.integer(e, place, "period");
    if (period) {
        if (info.periodLength(static_cast<int>(*period)) <= 0) {
            c.error(place, "period",
                    "period " + std::to_string(*period) + " is not listed in match.periods");
            good = false;
        }
        ev.period = static_cast<int>(*period);
    } else {
        good = false;
    }
    if (auto t = c.number(e, place, "t")) {
        if (*t < 0) {
            c.error(place, "t", formatNumber(*t) + " s is negative");
            good = false;
        } else if (period && info.periodLength(ev.period) > 0 &&
                   *t > info.periodLength(ev.period)) {
            c.error(place, "t",
                    formatNumber(*t) + " s is past the end of period " +
                        std::to_string(ev.period) + " (" +
                        formatNumber(info.periodLength(ev.period)) + " s)");
            good = false;
        }
        ev.t = *t;
    } else {
        good = false;
    }
    if (auto side = c.string(e, place, "side")) {
        if (auto s = sideFromString(*side))
            ev.side = *s;
        else {
            c.error(place, "side", "'" + *side + "' is not us or opp");
            good = false;
        }
    } else {
        good = false;
    }
    if (const json* player = c.member(e, place, "player", false)) {
        if (player->is_string())
            ev.player = player->get<std::string>();
        else if (player->is_number_integer())
            ev.player = std::to_string(player->get<long long>());
        else
            c.error(place, "player", "expected a string, found " + jsonTypeName(*player));
    }
    std::optional<EventType> type;
    if (auto typeName = c.string(e, place, "type")) {
        type = eventTypeFromWord(*typeName, version);
        if (!type) {
            if (auto mapped = options.typeMap.find(*typeName); mapped != options.typeMap.end())
                type = mapped->second;
        }
        if (!type) {
            std::string known;
            for (auto name : eventTypeNames()) {
                if (!known.empty()) known += ", ";
                known += wordOf(*eventTypeFromString(name), version);
            }
            c.error(place, "type",
                    "unknown event type '" + *typeName + "' (known: " + known + ")");
            good = false;
        } else {
            ev.type = *type;
        }
    } else {
        good = false;
    }
    if (type) {
        const auto& allowed = allowedResults(*type);
        const json* result = c.member(e, place, "result", false);
        if (allowed.empty()) {
            if (result && !result->is_null())
                c.error(place, "result",
                        std::string(toString(*type)) + " events take no result");
        } else if (!result) {
            c.error(place, "result", "missing");
            good = false;
        } else if (!result->is_string()) {
            c.error(place, "result", "expected a string, found " + jsonTypeName(*result));
            good = false;
        } else {
            const auto name = result->get<std::string>();
            auto r = resultFromWord(name, version);
            if (!r || std::find(allowed.begin(), allowed.end(), *r) == allowed.end()) {
                std::string list;
                for (Result a : allowed) {
                    if (!list.empty()) list += ", ";
                    list += wordOf(a, version);
                }
                c.error(place, "result",
                        "'" + name + "' is not a result of " + std::string(wordOf(*type, version)) +
                            " (allowed: " + list + ")");
                good = false;
            } else {
                ev.result = *r;
            }
        }
    }

    const double length = info.pitch.lengthM, width = info.pitch.widthM;
    auto coordinate = [&](const char* key, double limit, bool required) -> std::optional<double> {
        auto v = c.number(e, place, key, required);
        if (!v) return std::nullopt;
        auto clamped = clampCoordinate(*v, limit, options.clampMarginM);
        if (!clamped) {
            c.error(place, key,
                    formatNumber(*v) + " m is more than " + formatNumber(options.clampMarginM) +
                        " m outside the pitch (" + (limit == length ? "length " : "width ") +
                        formatNumber(limit) + " m)");
        }
        return clamped;
    };
    auto x = coordinate("x", length, true);
    auto y = coordinate("y", width, true);
    if (!x || !y) good = false;
    const bool hasToX = e.contains("to_x"), hasToY = e.contains("to_y");
    std::optional<double> toX, toY;
    if (hasToX || hasToY) {
        if (type && *type != EventType::Pass && *type != EventType::Carry) {
            c.error(place, hasToX ? "to_x" : "to_y", "only passes and carries have an end point");
            good = false;
        } else if (hasToX != hasToY) {
            c.error(place, hasToX ? "to_y" : "to_x", "missing: give both to_x and to_y, or neither");
            good = false;
        } else {
            toX = coordinate("to_x", length, true);
            toY = coordinate("to_y", width, true);
            if (!toX || !toY) good = false;
        }
    }
    if (const json* tags = c.array(e, place, "tags", false)) {
        for (std::size_t i = 0; i < tags->size(); ++i) {
            if (!(*tags)[i].is_string()) {
                c.error(place, "tags[" + std::to_string(i) + "]",
                        "expected a string, found " + jsonTypeName((*tags)[i]));
                continue;
            }
            ev.tags.push_back((*tags)[i].get<std::string>());
        }
    }
    if (!good || c.hasErrors()) return;

    const Frame frame = info.sourceFrame;
    ev.at = toOurFrame({*x, *y}, frame, ev.side, ev.period, info.pitch, h.usAttack);
    if (toX) ev.to = toOurFrame({*toX, *toY}, frame, ev.side, ev.period, info.pitch, h.usAttack);
    if (!info.zoneOnlyGrid.empty()) {
        // A zone-only match's positions are its grid's zone centres, nothing finer.
        const ZoneGrid grid = *ZoneGrid::parse(info.zoneOnlyGrid);
        auto offCentre = [&](Point p) {
            const Point centre = zoneCentre(grid.zoneOf(p, info.pitch), grid, info.pitch);
            return std::abs(p.x - centre.x) > kZoneCentreToleranceM ||
                   std::abs(p.y - centre.y) > kZoneCentreToleranceM;
        };
        auto refuse = [&](const char* key, double fx, double fy) {
            c.error(place, key,
                    "(" + formatNumber(fx) + ", " + formatNumber(fy) +
                        ") is not the centre of a zone of " + info.zoneOnlyGrid +
                        " (the match is marked zone-only on that grid)");
        };
        if (offCentre(ev.at)) return refuse("x", *x, *y);
        if (ev.to && offCentre(*ev.to)) return refuse("to_x", *toX, *toY);
    }
    ev.extra = extraFields(e, kEventFields);
    out.push_back(std::move(ev));
}

} // namespace

Point toOurFrame(Point p, Frame frame, Side side, int period, const Pitch& pitch,
                 const std::map<int, int>& usAttack) {
    bool mirror = false;
    switch (frame) {
    case Frame::Us: mirror = false; break;
    case Frame::Acting: mirror = side == Side::Opp; break;
    case Frame::Ground: {
        auto it = usAttack.find(period);
        mirror = it != usAttack.end() && it->second < 0;
        break;
    }
    }
    if (!mirror) return p;
    return {pitch.lengthM - p.x, pitch.widthM - p.y};
}

namespace {

/// The literal nlohmann names in "number overflow parsing '1e99999'".
std::string overflowLiteral(const std::string& what) {
    const auto open = what.find('\'');
    const auto close = open == std::string::npos ? open : what.find('\'', open + 1);
    return open == std::string::npos || close == std::string::npos
               ? std::string("a number")
               : what.substr(open + 1, close - open - 1);
}

/// Where the overflowing literal sits: "events[3]" and "x" when the rest of the file parses
/// with it replaced by a marker, otherwise its line and column.
std::pair<std::string, std::string> locateOverflow(std::string_view text, const std::string& what) {
    const std::string literal = overflowLiteral(what);
    std::size_t at = std::string_view::npos;
    for (std::size_t from = 0; (from = text.find(literal, from)) != std::string_view::npos; ++from) {
        // A number token: not inside a longer one.
        const char before = from > 0 ? text[from - 1] : ' ';
        const char after = from + literal.size() < text.size() ? text[from + literal.size()] : ' ';
        const auto digitish = [](char ch) {
            return (ch >= '0' && ch <= '9') || ch == '.' || ch == 'e' || ch == 'E' || ch == '-' || ch == '+';
        };
        if (!digitish(before) && !digitish(after)) {
            at = from;
            break;
        }
    }
    if (at == std::string_view::npos) return {"", ""};
    const auto [line, column] = lineAndColumn(text, at);
    const std::string fallback = "line " + std::to_string(line) + ", column " + std::to_string(column);
    static const std::string marker = "\\u0001pitchloop-overflow"; // a JSON escape
    std::string patched(text.substr(0, at));
    patched += "\"" + marker + "\"";
    patched += text.substr(at + literal.size());
    try {
        const json root = json::parse(patched);
        const std::string wanted = std::string(1, '\x01') + "pitchloop-overflow";
        if (root.contains("events") && root["events"].is_array()) {
            const auto& events = root["events"];
            for (std::size_t i = 0; i < events.size(); ++i)
                if (events[i].is_object())
                    for (const auto& [key, value] : events[i].items())
                        if (value.is_string() && value.get<std::string>() == wanted)
                            return {"events[" + std::to_string(i) + "]", key};
        }
        for (const auto& [section, body] : root.items()) {
            if (!body.is_object()) continue;
            for (const auto& [key, value] : body.items())
                if (value.is_string() && value.get<std::string>() == wanted) return {section, key};
        }
    } catch (const json::exception&) {
    }
    return {fallback, ""};
}

} // namespace

ReadResult parseMatch(std::string_view text, const std::string& fileName,
                      const ReadOptions& options) {
    ReadResult result;
    Checker c(fileName, options.maxErrors);
    json root;
    try {
        root = json::parse(text.begin(), text.end());
    } catch (const json::parse_error& e) {
        // nlohmann reports the byte just past the problem; people count lines and columns.
        const std::size_t byte = e.byte > 0 ? e.byte - 1 : 0;
        auto [line, column] = lineAndColumn(text, byte);
        std::string what = e.what();
        if (auto pos = what.find("syntax error"); pos != std::string::npos) what = what.substr(pos);
        c.error("line " + std::to_string(line) + ", column " + std::to_string(column), "",
                "not valid JSON: " + what);
        result.errors = c.takeErrors();
        return result;
    } catch (const json::out_of_range& e) {
        // A number too large for a double (e.g. 1e99999): the parser says which literal, not
        // where. Find it, name its place in the file's own terms, and refuse the file.
        const auto [place, field] = locateOverflow(text, e.what());
        c.error(place, field, "number too large: " + overflowLiteral(e.what()));
        result.errors = c.takeErrors();
        return result;
    }
    return parseMatchDocument(root, fileName, options);
}

ReadResult parseMatchDocument(const json& root, const std::string& fileName,
                              const ReadOptions& options) {
    ReadResult result;
    Checker c(fileName, options.maxErrors);
    if (!root.is_object()) {
        c.error("", "", "expected a JSON object at the top, found " + jsonTypeName(root));
        result.errors = c.takeErrors();
        return result;
    }
    if (auto format = c.string(root, "", "format")) {
        if (*format != kMatchFormat)
            c.error("", "format",
                    "'" + *format + "' is not a match file (expected '" +
                        std::string(kMatchFormat) + "')");
    }
    int version = kMatchFormatVersion;
    if (auto v = c.integer(root, "", "version")) {
        if (*v != 1 && *v != 2)
            c.error("", "version",
                    "version " + std::to_string(*v) + " is not supported (this reader knows 1 and 2)");
        else
            version = static_cast<int>(*v);
    }
    if (c.hasErrors()) {
        result.errors = c.takeErrors();
        return result;
    }

    auto header = readHeader(root, c);
    const json* events = c.array(root, "", "events");
    if (events && events->empty()) c.error("", "events", "the match has no events");
    if (!header || c.hasErrors()) {
        result.errors = c.takeErrors();
        return result;
    }

    Match match;
    match.info = header->info;
    match.events.reserve(events->size());
    for (std::size_t i = 0; i < events->size() && !c.full(); ++i)
        readEvent((*events)[i], i, *header, options, version, c, match.events);
    if (c.hasErrors()) {
        result.errors = c.takeErrors();
        return result;
    }

    // Stable sort: equal (period, t) keep file order, as the format promises.
    auto before = [](const Event& a, const Event& b) {
        return a.period != b.period ? a.period < b.period : a.t < b.t;
    };
    auto firstOutOfOrder = std::is_sorted_until(match.events.begin(), match.events.end(), before);
    if (firstOutOfOrder != match.events.end()) {
        c.warning("events[" + std::to_string(firstOutOfOrder->fileIndex) + "]", "t",
                  "events are not in (period, t) order; sorted them, keeping file order for "
                  "equal times");
        std::stable_sort(match.events.begin(), match.events.end(), before);
    }
    result.warnings = c.takeWarnings();
    result.match = std::move(match);
    return result;
}

std::string readFileBytes(const std::filesystem::path& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw IoError("cannot open " + path.string());
    std::ostringstream s;
    s << in.rdbuf();
    if (in.bad()) throw IoError("cannot read " + path.string());
    return std::move(s).str();
}

ReadResult readMatchFile(const std::filesystem::path& path, const ReadOptions& options) {
    std::string text;
    try {
        text = readFileBytes(path);
    } catch (const IoError&) {
        ReadResult r;
        std::error_code ec;
        const bool exists = std::filesystem::exists(path, ec);
        r.errors.push_back({path.string(), "", "",
                            exists ? "cannot be read" : "no such file"});
        return r;
    }
    return parseMatch(text, path.string(), options);
}

} // namespace pitchloop::model
