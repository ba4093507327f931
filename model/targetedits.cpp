#include "targetedits.h"

#include <cstdio>
#include <map>
#include <set>
#include <tuple>

namespace pitchloop::model {

namespace {

std::string seasonName(int first) {
    char buf[16];
    std::snprintf(buf, sizeof buf, "%d-%02d", first, (first + 1) % 100);
    return buf;
}

int firstYear(const std::string& season) { return std::stoi(season.substr(0, 4)); }

using ZoneKey = std::tuple<std::string, std::string, std::string, int, int>;

ZoneKey zoneKey(const TargetKey& k) { return {k.squad, k.season, k.metric, k.band, k.lane}; }

} // namespace

std::string previousSeason(const std::string& season) {
    if (!isSeasonName(season) || firstYear(season) <= 1900) return {};
    return seasonName(firstYear(season) - 1);
}

std::string nextSeason(const std::string& season) {
    return isSeasonName(season) ? seasonName(firstYear(season) + 1) : std::string();
}

std::string seasonStart(const std::string& season) {
    return isSeasonName(season) ? season.substr(0, 4) + "-07-01" : std::string();
}

std::string seasonEnd(const std::string& season) {
    return isSeasonName(season) ? std::to_string(firstYear(season) + 1) + "-06-30" : std::string();
}

std::vector<Target> copySeasonTargets(const std::vector<Target>& from, const std::string& fromSeason,
                                      const std::string& toSeason, const std::string& author) {
    std::vector<Target> copies;
    if (!isSeasonName(fromSeason) || !isSeasonName(toSeason)) return copies;
    std::map<ZoneKey, std::vector<Target>> byKey;
    for (const auto& t : from)
        if (t.key.season == fromSeason) byKey[zoneKey(t.key)].push_back(t);
    const std::string lastDay = seasonEnd(fromSeason);
    for (const auto& [key, versions] : byKey) {
        const auto t = inForce(versions, lastDay);
        if (!t) continue;
        Target copy = *t;
        copy.key.season = toSeason;
        copy.effectiveFrom = seasonStart(toSeason);
        copy.recordedAt.clear();
        copy.version = 0;
        copy.author = author;
        copy.rationale = "copied from " + fromSeason + (t->rationale.empty() ? "" : ": " + t->rationale);
        copies.push_back(std::move(copy));
    }
    return copies;
}

std::vector<Target> revertVersions(const std::vector<Target>& before, const std::vector<Target>& added,
                                   const std::string& author, const std::string& rationale,
                                   const std::string& now) {
    std::vector<Target> out;
    std::set<std::pair<ZoneKey, std::string>> done;
    for (const Target& a : added) {
        if (!done.insert({zoneKey(a.key), a.effectiveFrom}).second) continue;
        std::vector<Target> sameKey;
        for (const auto& t : before)
            if (t.key == a.key) sameKey.push_back(t);
        Target back;
        if (auto previous = inForce(sameKey, a.effectiveFrom)) {
            back = *previous;
        } else {
            // Nothing was in force: end the added target from its date, keeping its rule on record.
            back = a;
            back.retired = true;
        }
        back.key = a.key;
        back.effectiveFrom = a.effectiveFrom;
        back.author = author;
        back.rationale = rationale;
        back.recordedAt = a.recordedAt > now ? a.recordedAt : now;
        back.version = 0;
        out.push_back(std::move(back));
    }
    return out;
}

} // namespace pitchloop::model
