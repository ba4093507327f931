#include "targets.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <set>

namespace pitchloop::model {

using nlohmann::json;

Direction defaultDirection(const MetricSpec& metric) {
    return metric.better == Better::Higher ? Direction::AtLeast : Direction::AtMost;
}

double defaultWatchMargin(MetricKind kind) {
    switch (kind) {
    case MetricKind::Rate: return 0.05;     // five percentage points
    case MetricKind::Count: return 0.5;     // half an event per match
    case MetricKind::Exposure: return 0.02; // two actions per hundred exposure events
    }
    return 0;
}

long defaultMinSample(MetricKind kind) {
    switch (kind) {
    case MetricKind::Rate: return 30;     // items in the window
    case MetricKind::Count: return 3;     // matches in the window
    case MetricKind::Exposure: return 30; // exposure events in the window
    }
    return 0;
}

std::string_view toString(Direction d) { return d == Direction::AtLeast ? "at_least" : "at_most"; }

std::optional<Direction> directionFromString(std::string_view s) {
    if (s == "at_least") return Direction::AtLeast;
    if (s == "at_most") return Direction::AtMost;
    return std::nullopt;
}

std::optional<Target> inForce(const std::vector<Target>& versions, const std::string& date) {
    const Target* best = nullptr;
    for (const auto& t : versions) {
        if (t.effectiveFrom > date) continue;
        if (!best || t.effectiveFrom > best->effectiveFrom ||
            (t.effectiveFrom == best->effectiveFrom &&
             (t.recordedAt > best->recordedAt ||
              (t.recordedAt == best->recordedAt && t.version > best->version))))
            best = &t;
    }
    if (!best || best->retired) return std::nullopt;
    return *best;
}

bool misses(const Target& t, double value) {
    return t.direction == Direction::AtLeast ? value < t.value : value > t.value;
}

std::vector<Target> newVersionsOnly(const std::vector<Target>& stored,
                                    const std::vector<Target>& incoming) {
    auto same = [](const Target& a, const Target& b) {
        return a.key == b.key && a.direction == b.direction && a.value == b.value &&
               a.watchMargin == b.watchMargin && a.minSample == b.minSample &&
               a.author == b.author && a.rationale == b.rationale &&
               a.effectiveFrom == b.effectiveFrom && a.retired == b.retired &&
               (a.recordedAt.empty() || b.recordedAt.empty() || a.recordedAt == b.recordedAt);
    };
    std::vector<Target> out;
    for (const auto& t : incoming) {
        const bool known = std::any_of(stored.begin(), stored.end(),
                                       [&](const Target& s) { return same(s, t); }) ||
                           std::any_of(out.begin(), out.end(),
                                       [&](const Target& s) { return same(s, t); });
        if (!known) out.push_back(t);
    }
    return out;
}

bool isSeasonName(const std::string& s) {
    if (s.size() != 7 || s[4] != '-') return false;
    for (std::size_t i : {0u, 1u, 2u, 3u, 5u, 6u})
        if (s[i] < '0' || s[i] > '9') return false;
    const int first = std::stoi(s.substr(0, 4));
    return first >= 1900 && std::stoi(s.substr(5, 2)) == (first + 1) % 100;
}

TargetFileResult parseTargetFile(std::string_view jsonText, const std::string& source,
                                 const std::vector<MetricSpec>& metrics, int bands, int lanes) {
    TargetFileResult r;
    json root;
    try {
        root = json::parse(jsonText.begin(), jsonText.end());
    } catch (const json::parse_error& e) {
        r.errors.push_back({source, "", "", std::string("not valid JSON: ") + e.what()});
        return r;
    }
    if (!root.is_object() || root.value("format", "") != "pitchloop-targets" ||
        root.value("version", 0) != 1) {
        r.errors.push_back({source, "", "format",
                            "expected \"format\": \"pitchloop-targets\" and \"version\": 1"});
        return r;
    }
    if (!root.contains("targets") || !root["targets"].is_array()) {
        r.errors.push_back({source, "", "targets", "expected a list of targets"});
        return r;
    }
    const std::set<std::string> allowed{"squad",      "season",        "metric",     "band",
                                        "lane",       "direction",     "value",      "watch_margin",
                                        "min_sample", "author",        "rationale",  "effective_from",
                                        "retired",    "recorded_at"};
    const auto& list = root["targets"];
    for (std::size_t i = 0; i < list.size(); ++i) {
        const std::string place = "targets[" + std::to_string(i) + "]";
        const json& v = list[i];
        auto error = [&](const std::string& field, const std::string& message) {
            r.errors.push_back({source, place, field, message});
        };
        if (!v.is_object()) {
            error("", "expected an object");
            continue;
        }
        for (auto it = v.begin(); it != v.end(); ++it)
            if (!allowed.contains(it.key())) error(it.key(), "unknown key");
        Target t;
        auto text = [&](const char* key, std::string& out, bool required) {
            auto it = v.find(key);
            if (it == v.end()) {
                if (required) error(key, "missing");
                return;
            }
            if (!it->is_string()) error(key, "expected text");
            else out = it->get<std::string>();
        };
        text("squad", t.key.squad, false);
        text("season", t.key.season, true);
        text("metric", t.key.metric, true);
        text("author", t.author, true);
        text("rationale", t.rationale, false);
        text("effective_from", t.effectiveFrom, true);
        text("recorded_at", t.recordedAt, false);
        if (!t.key.season.empty() && !isSeasonName(t.key.season))
            error("season", "expected a season such as 2026-27");
        if (!t.effectiveFrom.empty() && !isIsoDate(t.effectiveFrom))
            error("effective_from", "expected a date YYYY-MM-DD");
        const MetricSpec* metric = nullptr;
        for (const auto& m : metrics)
            if (m.id == t.key.metric) metric = &m;
        if (!t.key.metric.empty() && !metric) error("metric", "unknown metric '" + t.key.metric + "'");
        for (auto [key, out, limit] : {std::tuple{"band", &t.key.band, bands},
                                       std::tuple{"lane", &t.key.lane, lanes}}) {
            auto it = v.find(key);
            if (it == v.end()) continue;
            if (!it->is_number_integer() || it->get<int>() < 1 || it->get<int>() > limit)
                error(key, "expected a whole number from 1 to " + std::to_string(limit));
            else
                *out = it->get<int>();
        }
        if ((t.key.band == 0) != (t.key.lane == 0))
            error(t.key.band == 0 ? "band" : "lane",
                  "give both band and lane for a zone, or neither for the whole pitch");
        if (auto it = v.find("retired"); it != v.end()) {
            if (!it->is_boolean()) error("retired", "expected true or false");
            else t.retired = it->get<bool>();
        }
        if (metric) {
            t.direction = defaultDirection(*metric);
            t.watchMargin = defaultWatchMargin(metric->kind());
            t.minSample = defaultMinSample(metric->kind());
        }
        if (auto it = v.find("direction"); it != v.end()) {
            auto d = it->is_string() ? directionFromString(it->get<std::string>()) : std::nullopt;
            if (!d) error("direction", "expected at_least or at_most");
            else t.direction = *d;
        }
        if (auto it = v.find("value"); it == v.end()) {
            if (!t.retired) error("value", "missing");
        } else if (!it->is_number()) {
            error("value", "expected a number");
        } else {
            t.value = it->get<double>();
            if (metric && metric->kind() == MetricKind::Rate && (t.value < 0 || t.value > 1))
                error("value", "a rate target is a share from 0 to 1 (e.g. 0.45 for 45 %)");
            if (t.value < 0) error("value", "must not be negative");
        }
        if (auto it = v.find("watch_margin"); it != v.end()) {
            if (!it->is_number() || it->get<double>() < 0) error("watch_margin", "expected a number ≥ 0");
            else t.watchMargin = it->get<double>();
        }
        if (auto it = v.find("min_sample"); it != v.end()) {
            if (!it->is_number_integer() || it->get<long>() < 0)
                error("min_sample", "expected a whole number ≥ 0");
            else
                t.minSample = it->get<long>();
        }
        r.targets.push_back(std::move(t));
    }
    if (!r.errors.empty()) r.targets.clear();
    return r;
}

std::string writeTargetFile(const std::vector<Target>& targets) {
    json list = json::array();
    for (const auto& t : targets) {
        json v;
        v["squad"] = t.key.squad;
        v["season"] = t.key.season;
        v["metric"] = t.key.metric;
        if (!t.key.wholePitch()) {
            v["band"] = t.key.band;
            v["lane"] = t.key.lane;
        }
        v["direction"] = std::string(toString(t.direction));
        v["value"] = t.value;
        v["watch_margin"] = t.watchMargin;
        v["min_sample"] = t.minSample;
        v["author"] = t.author;
        if (!t.rationale.empty()) v["rationale"] = t.rationale;
        v["effective_from"] = t.effectiveFrom;
        if (!t.recordedAt.empty()) v["recorded_at"] = t.recordedAt;
        if (t.retired) v["retired"] = true;
        list.push_back(std::move(v));
    }
    json root{{"format", "pitchloop-targets"}, {"version", 1}, {"targets", list}};
    return root.dump(2) + "\n";
}

} // namespace pitchloop::model
