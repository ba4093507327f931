#include "metricspec.h"

#include "builtin_metrics_json.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <regex>
#include <set>
#include <stdexcept>

namespace pitchloop::model {

using nlohmann::json;

namespace {

/// Walks one spec's JSON, collecting problems with the path of each.
class SpecReader {
public:
    SpecReader(std::string source, std::string place)
        : m_source(std::move(source)), m_place(std::move(place)) {}

    void error(const std::string& path, std::string message) {
        m_errors.push_back({m_source, m_place, path, std::move(message)});
    }
    Problems& errors() { return m_errors; }

    void onlyKeys(const json& obj, const std::string& path, const std::set<std::string>& allowed) {
        for (auto it = obj.begin(); it != obj.end(); ++it) {
            if (allowed.contains(it.key())) continue;
            std::string list;
            for (const auto& k : allowed) list += (list.empty() ? "" : ", ") + k;
            error(join(path, it.key()), "unknown key (allowed here: " + list + ")");
        }
    }

    static std::string join(const std::string& path, const std::string& key) {
        return path.empty() ? key : path + "." + key;
    }

    /// A string or a list of strings.
    std::vector<std::string> words(const json& v, const std::string& path) {
        std::vector<std::string> out;
        if (v.is_string()) {
            out.push_back(v.get<std::string>());
        } else if (v.is_array()) {
            for (const auto& w : v) {
                if (!w.is_string()) {
                    error(path, "expected a word or a list of words");
                    return {};
                }
                out.push_back(w.get<std::string>());
            }
            if (out.empty()) error(path, "an empty list matches nothing; leave the key out instead");
        } else {
            error(path, "expected a word or a list of words");
        }
        return out;
    }

    EventSelector selector(const json& obj, const std::string& path, bool relativeSides) {
        EventSelector s;
        onlyKeys(obj, path,
                 {"side", "type", "result", "gives_control", "tags_any", "tags_all", "tags_none"});
        if (auto it = obj.find("side"); it != obj.end()) {
            const std::string p = join(path, "side");
            const std::string side = it->is_string() ? it->get<std::string>() : "";
            if (side == "us") s.side = SideRef::Us;
            else if (side == "opp") s.side = SideRef::Opp;
            else if (relativeSides && side == "same") s.side = SideRef::Same;
            else if (relativeSides && side == "other") s.side = SideRef::Other;
            else
                error(p, relativeSides ? "expected us, opp, same or other"
                                       : "expected us or opp (same/other only apply to events "
                                         "that follow an item)");
        }
        if (auto it = obj.find("type"); it != obj.end()) {
            for (const auto& w : words(*it, join(path, "type"))) {
                if (auto t = eventTypeFromString(w)) s.types.push_back(*t);
                else error(join(path, "type"), "unknown event type '" + w + "'");
            }
        }
        if (auto it = obj.find("result"); it != obj.end()) {
            for (const auto& w : words(*it, join(path, "result"))) {
                if (auto r = resultFromString(w)) s.results.push_back(*r);
                else error(join(path, "result"), "unknown result '" + w + "'");
            }
            for (Result r : s.results) {
                bool possible = s.types.empty();
                for (EventType t : s.types) {
                    const auto& allowed = allowedResults(t);
                    possible |= std::find(allowed.begin(), allowed.end(), r) != allowed.end();
                }
                if (!possible)
                    error(join(path, "result"),
                          "'" + std::string(toString(r)) + "' is not a result of the selected types");
            }
        }
        if (auto it = obj.find("gives_control"); it != obj.end()) {
            if (it->is_boolean()) s.givesControl = it->get<bool>();
            else error(join(path, "gives_control"), "expected true or false");
        }
        if (auto it = obj.find("tags_any"); it != obj.end()) s.tagsAny = words(*it, join(path, "tags_any"));
        if (auto it = obj.find("tags_all"); it != obj.end()) s.tagsAll = words(*it, join(path, "tags_all"));
        if (auto it = obj.find("tags_none"); it != obj.end()) s.tagsNone = words(*it, join(path, "tags_none"));
        return s;
    }

    ItemSpec items(const json& v, const std::string& path) {
        ItemSpec item;
        if (!v.is_object()) {
            error(path, "expected an object");
            return item;
        }
        if (auto it = v.find("losses_of"); it != v.end()) {
            item.losses = true;
            item.at = Place::LossPlace;
            onlyKeys(v, path, {"losses_of", "at"});
            const std::string side = it->is_string() ? it->get<std::string>() : "";
            if (side == "us") item.lossesOf = Side::Us;
            else if (side == "opp") item.lossesOf = Side::Opp;
            else error(join(path, "losses_of"), "expected us or opp");
        } else {
            json rest = v;
            rest.erase("at");
            item.select = selector(rest, path, false);
        }
        if (auto it = v.find("at"); it != v.end()) {
            const std::string at = it->is_string() ? it->get<std::string>() : "";
            if (item.losses) {
                if (at != "loss_place") error(join(path, "at"), "losses are binned at loss_place");
            } else if (at == "start") {
                item.at = Place::Start;
            } else if (at == "end") {
                item.at = Place::End;
            } else {
                error(join(path, "at"), "expected start or end (loss_place is for losses_of)");
            }
        }
        return item;
    }

    SuccessSpec success(const json& v, const std::string& path, bool lossItems) {
        SuccessSpec s;
        if (!v.is_object()) {
            error(path, "expected an object");
            return s;
        }
        const bool hasIs = v.contains("is"), hasFollowed = v.contains("followed_by");
        if (hasIs == hasFollowed) {
            error(path, "give exactly one of 'is' (a test on the item itself) or 'followed_by'");
            return s;
        }
        if (hasIs) {
            onlyKeys(v, path, {"is"});
            if (lossItems) error(join(path, "is"), "a loss is not an event; use followed_by");
            const json& is = v["is"];
            if (!is.is_object()) error(join(path, "is"), "expected an object");
            else s.is = selector(is, join(path, "is"), false);
            s.kind = SuccessSpec::Kind::Is;
            return s;
        }
        s.kind = SuccessSpec::Kind::FollowedBy;
        onlyKeys(v, path, {"followed_by", "within_s", "same_time", "censor"});
        const json& f = v["followed_by"];
        const std::string fp = join(path, "followed_by");
        if (!f.is_object()) {
            error(fp, "expected an object");
        } else if (auto any = f.find("any_of"); any != f.end()) {
            if (f.size() != 1) error(fp, "any_of stands alone: put the other keys inside its entries");
            if (!any->is_array() || any->empty()) {
                error(join(fp, "any_of"), "expected a non-empty list of event selectors");
            } else {
                for (std::size_t i = 0; i < any->size(); ++i) {
                    const std::string ip = join(fp, "any_of[" + std::to_string(i) + "]");
                    if (!(*any)[i].is_object()) error(ip, "expected an object");
                    else s.anyOf.push_back(selector((*any)[i], ip, true));
                }
            }
        } else {
            s.anyOf.push_back(selector(f, fp, true));
        }
        auto within = v.find("within_s");
        if (within == v.end()) {
            error(join(path, "within_s"), "missing: how many seconds after the item to look");
        } else if (!within->is_number() || within->get<double>() <= 0 ||
                   within->get<double>() > 600) {
            error(join(path, "within_s"), "expected a number of seconds above 0 and at most 600");
        } else {
            s.withinS = within->get<double>();
        }
        for (const char* key : {"same_time", "censor"}) {
            if (auto it = v.find(key); it != v.end()) {
                if (!it->is_boolean()) error(join(path, key), "expected true or false");
                else (std::string(key) == "same_time" ? s.sameTime : s.censor) = it->get<bool>();
            }
        }
        return s;
    }

    std::optional<MetricSpec> spec(const json& v) {
        if (!v.is_object()) {
            error("", "a metric is a JSON object");
            return std::nullopt;
        }
        onlyKeys(v, "", {"id", "name", "question", "sentence", "better", "items", "success", "per"});
        MetricSpec m;
        static const std::regex idPattern("[a-z][a-z0-9_]{0,39}");
        if (auto it = v.find("id"); it == v.end() || !it->is_string()) {
            error("id", "missing: a short name such as regain_5s");
        } else {
            m.id = it->get<std::string>();
            m_place = "metric '" + m.id + "'";
            if (!std::regex_match(m.id, idPattern))
                error("id", "use lower-case letters, digits and _ (at most 40, starting with a letter)");
        }
        if (auto it = v.find("name"); it != v.end()) {
            if (it->is_string()) m.name = it->get<std::string>();
            else error("name", "expected text");
        }
        if (m.name.empty()) m.name = m.id;
        if (auto it = v.find("question"); it != v.end()) {
            if (it->is_string()) m.question = it->get<std::string>();
            else error("question", "expected text");
        }
        if (auto it = v.find("sentence"); it != v.end()) {
            if (!it->is_string()) {
                error("sentence", "expected text");
            } else {
                m.sentence = it->get<std::string>();
                for (std::size_t open = m.sentence.find('{'); open != std::string::npos;
                     open = m.sentence.find('{', open + 1)) {
                    const std::size_t close = m.sentence.find('}', open);
                    const std::string field = m.sentence.substr(open, close == std::string::npos ? close : close - open + 1);
                    if (field != "{zone}" && field != "{value}" && field != "{window}")
                        error("sentence", "'" + field + "' is not a place holder (use {zone}, {value} and {window})");
                }
            }
        }
        if (auto it = v.find("better"); it == v.end()) {
            error("better", "missing: higher or lower");
        } else if (*it == "higher") {
            m.better = Better::Higher;
        } else if (*it == "lower") {
            m.better = Better::Lower;
        } else {
            error("better", "expected higher or lower");
        }
        if (auto it = v.find("items"); it == v.end()) error("items", "missing: what the metric counts");
        else m.items = items(*it, "items");
        if (auto it = v.find("success"); it != v.end()) m.success = success(*it, "success", m.items.losses);
        if (auto it = v.find("per"); it == v.end()) {
            error("per", "missing: items, match, or an event selector");
        } else if (*it == "items") {
            m.per = MetricSpec::Per::Items;
            if (m.success.kind == SuccessSpec::Kind::Always)
                error("per", "per items needs a success test (otherwise every value is 100 %)");
        } else if (*it == "match") {
            m.per = MetricSpec::Per::Match;
        } else if (it->is_object()) {
            m.per = MetricSpec::Per::Events;
            if (it->contains("losses_of")) error("per", "an exposure is a set of events, not losses");
            else m.perEvents = items(*it, "per");
        } else {
            error("per", "expected items, match, or an event selector object");
        }
        m.json = v.dump();
        if (!m_errors.empty()) return std::nullopt;
        return m;
    }

private:
    std::string m_source;
    std::string m_place;
    Problems m_errors;
};

bool anyTag(const Event& e, const std::vector<std::string>& tags) {
    return std::any_of(tags.begin(), tags.end(), [&](const auto& t) { return e.hasTag(t); });
}

} // namespace

bool EventSelector::matches(const Event& e, Side itemSide) const {
    switch (side) {
    case SideRef::Any: break;
    case SideRef::Us: if (e.side != Side::Us) return false; break;
    case SideRef::Opp: if (e.side != Side::Opp) return false; break;
    case SideRef::Same: if (e.side != itemSide) return false; break;
    case SideRef::Other: if (e.side == itemSide) return false; break;
    }
    if (!types.empty() && std::find(types.begin(), types.end(), e.type) == types.end()) return false;
    if (!results.empty() && std::find(results.begin(), results.end(), e.result) == results.end())
        return false;
    if (givesControl && givesControl != model::givesControl(e)) return false;
    if (!tagsAny.empty() && !anyTag(e, tagsAny)) return false;
    for (const auto& t : tagsAll)
        if (!e.hasTag(t)) return false;
    if (anyTag(e, tagsNone)) return false;
    return true;
}

MetricKind MetricSpec::kind() const {
    switch (per) {
    case Per::Items: return MetricKind::Rate;
    case Per::Match: return MetricKind::Count;
    case Per::Events: return MetricKind::Exposure;
    }
    return MetricKind::Rate;
}

SpecResult parseMetricSpec(std::string_view jsonText, const std::string& source) {
    SpecResult result;
    json v;
    try {
        v = json::parse(jsonText.begin(), jsonText.end());
    } catch (const json::parse_error& e) {
        result.errors.push_back({source, "", "", std::string("not valid JSON: ") + e.what()});
        return result;
    }
    SpecReader reader(source, "metric");
    result.spec = reader.spec(v);
    result.errors = std::move(reader.errors());
    return result;
}

std::pair<std::vector<MetricSpec>, Problems> parseMetricFile(std::string_view jsonText,
                                                             const std::string& source) {
    std::vector<MetricSpec> specs;
    Problems problems;
    json v;
    try {
        v = json::parse(jsonText.begin(), jsonText.end());
    } catch (const json::parse_error& e) {
        problems.push_back({source, "", "", std::string("not valid JSON: ") + e.what()});
        return {specs, problems};
    }
    std::vector<json> entries;
    if (v.is_object() && v.contains("metrics")) {
        if (v.value("format", "") != "pitchloop-metrics" || v.value("version", 0) != 1)
            problems.push_back({source, "", "format",
                                "expected \"format\": \"pitchloop-metrics\" and \"version\": 1"});
        if (!v["metrics"].is_array())
            problems.push_back({source, "", "metrics", "expected a list of metric objects"});
        else
            entries.assign(v["metrics"].begin(), v["metrics"].end());
    } else {
        entries.push_back(v);
    }
    std::set<std::string> seen;
    for (std::size_t i = 0; i < entries.size(); ++i) {
        SpecReader reader(source, "metrics[" + std::to_string(i) + "]");
        auto spec = reader.spec(entries[i]);
        for (auto& p : reader.errors()) problems.push_back(std::move(p));
        if (spec) {
            if (!seen.insert(spec->id).second)
                problems.push_back({source, "metric '" + spec->id + "'", "id", "defined twice"});
            specs.push_back(std::move(*spec));
        }
    }
    return {specs, problems};
}

const std::vector<MetricSpec>& builtinMetrics() {
    static const std::vector<MetricSpec> specs = [] {
        auto [parsed, problems] = parseMetricFile(kBuiltinMetricsJson, "built-in metrics");
        if (!problems.empty())
            throw std::logic_error("built-in metrics do not parse:\n" + describeAll(problems));
        return parsed;
    }();
    return specs;
}

std::string_view toString(MetricKind k) {
    switch (k) {
    case MetricKind::Rate: return "rate";
    case MetricKind::Count: return "count";
    case MetricKind::Exposure: return "exposure";
    }
    return "?";
}

std::string_view toString(Better b) { return b == Better::Higher ? "higher" : "lower"; }

} // namespace pitchloop::model
