#include "types.h"

#include <algorithm>
#include <array>
#include <chrono>
#include <utility>

namespace pitchloop::model {

namespace {

template <typename E, std::size_t N>
std::optional<E> lookup(const std::array<std::pair<E, std::string_view>, N>& table,
                        std::string_view name) {
    for (const auto& [value, text] : table)
        if (text == name) return value;
    return std::nullopt;
}

template <typename E, std::size_t N>
std::string_view nameOf(const std::array<std::pair<E, std::string_view>, N>& table, E value) {
    for (const auto& [v, text] : table)
        if (v == value) return text;
    return "?";
}

constexpr std::array<std::pair<Side, std::string_view>, 2> kSides{{
    {Side::Us, "us"},
    {Side::Opp, "opp"},
}};

constexpr std::array<std::pair<EventType, std::string_view>, 12> kTypes{{
    {EventType::Pass, "pass"},
    {EventType::Carry, "carry"},
    {EventType::TakeOn, "take_on"},
    {EventType::Shot, "shot"},
    {EventType::Recovery, "recovery"},
    {EventType::Interception, "interception"},
    {EventType::Tackle, "tackle"},
    {EventType::Keeper, "keeper"},
    {EventType::Clearance, "clearance"},
    {EventType::Block, "block"},
    {EventType::Foul, "foul"},
    {EventType::Out, "out"},
}};

constexpr std::array<std::pair<Result, std::string_view>, 8> kResults{{
    {Result::None, ""},
    {Result::Ok, "ok"},
    {Result::Fail, "fail"},
    {Result::Goal, "goal"},
    {Result::Saved, "saved"},
    {Result::Blocked, "blocked"},
    {Result::Off, "off"},
    {Result::Post, "post"},
}};

// Match format version 2: our own words where version 1 shared another vocabulary's
// (docs/match-format.md, "Version 2"); every other word is the same in both.
constexpr std::array<std::pair<std::string_view, std::string_view>, 7> kRenamedInV2{{
    {"take_on", "beat"}, {"fail", "lost"}, {"goal", "scored"}, {"saved", "stopped"},
    {"blocked", "charged_down"}, {"off", "wide"}, {"post", "woodwork"},
}};

/// A version 2 word as version 1 spells it; nullopt for a version 1 word that version 2 renamed.
std::optional<std::string_view> asVersion1(std::string_view word) {
    for (const auto& [v1, v2] : kRenamedInV2) {
        if (word == v2) return v1;
        if (word == v1) return std::nullopt;
    }
    return word;
}

std::string_view asVersion2(std::string_view word) {
    for (const auto& [v1, v2] : kRenamedInV2)
        if (word == v1) return v2;
    return word;
}

constexpr std::array<std::pair<Frame, std::string_view>, 3> kFrames{{
    {Frame::Acting, "acting"},
    {Frame::Us, "us"},
    {Frame::Ground, "ground"},
}};

} // namespace

bool Event::hasTag(std::string_view tag) const {
    return std::find(tags.begin(), tags.end(), tag) != tags.end();
}

double MatchInfo::periodLength(int n) const {
    for (const auto& p : periods)
        if (p.n == n) return p.lengthS;
    return 0;
}

std::string_view toString(Side s) { return nameOf(kSides, s); }
std::string_view toString(EventType t) { return nameOf(kTypes, t); }
std::string_view toString(Result r) { return nameOf(kResults, r); }
std::string_view toString(Frame f) { return nameOf(kFrames, f); }
std::optional<Side> sideFromString(std::string_view s) { return lookup(kSides, s); }
std::optional<EventType> eventTypeFromString(std::string_view s) { return lookup(kTypes, s); }
std::optional<Result> resultFromString(std::string_view s) {
    if (s.empty()) return std::nullopt;
    return lookup(kResults, s);
}
std::optional<Frame> frameFromString(std::string_view s) { return lookup(kFrames, s); }

std::optional<EventType> eventTypeFromWord(std::string_view s, int version) {
    if (version < 2) return lookup(kTypes, s);
    const auto v1 = asVersion1(s);
    return v1 ? lookup(kTypes, *v1) : std::nullopt;
}
std::optional<Result> resultFromWord(std::string_view s, int version) {
    if (s.empty()) return std::nullopt;
    if (version < 2) return lookup(kResults, s);
    const auto v1 = asVersion1(s);
    return v1 ? lookup(kResults, *v1) : std::nullopt;
}
std::string_view wordOf(EventType t, int version) {
    return version >= 2 ? asVersion2(nameOf(kTypes, t)) : nameOf(kTypes, t);
}
std::string_view wordOf(Result r, int version) {
    return version >= 2 ? asVersion2(nameOf(kResults, r)) : nameOf(kResults, r);
}

const std::vector<std::string_view>& eventTypeNames() {
    static const std::vector<std::string_view> names = [] {
        std::vector<std::string_view> v;
        for (const auto& entry : kTypes) v.push_back(entry.second);
        return v;
    }();
    return names;
}

const std::vector<Result>& allowedResults(EventType type) {
    static const std::vector<Result> okFail{Result::Ok, Result::Fail};
    static const std::vector<Result> okOnly{Result::Ok};
    static const std::vector<Result> shot{Result::Goal, Result::Saved, Result::Blocked, Result::Off,
                                          Result::Post};
    static const std::vector<Result> none;
    switch (type) {
    case EventType::Shot: return shot;
    case EventType::Recovery: return okOnly;
    case EventType::Foul:
    case EventType::Out: return none;
    default: return okFail;
    }
}

bool isIsoDate(std::string_view s) {
    if (s.size() != 10 || s[4] != '-' || s[7] != '-') return false;
    for (std::size_t i : {0u, 1u, 2u, 3u, 5u, 6u, 8u, 9u})
        if (s[i] < '0' || s[i] > '9') return false;
    using namespace std::chrono;
    const int y = (s[0] - '0') * 1000 + (s[1] - '0') * 100 + (s[2] - '0') * 10 + (s[3] - '0');
    const unsigned m = static_cast<unsigned>((s[5] - '0') * 10 + (s[6] - '0'));
    const unsigned d = static_cast<unsigned>((s[8] - '0') * 10 + (s[9] - '0'));
    return year_month_day{year{y}, month{m}, day{d}}.ok(); // 2026-02-29 and 2026-04-31 fail
}

bool givesControl(const Event& e) {
    switch (e.type) {
    case EventType::Pass:
    case EventType::Carry:
    case EventType::TakeOn:
    case EventType::Shot:
    case EventType::Recovery: return true;
    case EventType::Interception:
    case EventType::Tackle:
    case EventType::Keeper: return e.result == Result::Ok;
    case EventType::Clearance:
    case EventType::Block:
    case EventType::Foul:
    case EventType::Out: return false;
    }
    return false;
}

} // namespace pitchloop::model
