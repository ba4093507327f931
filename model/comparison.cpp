#include "comparison.h"

#include "variation.h"

#include <boost/math/distributions/normal.hpp>

#include <cmath>

namespace pitchloop::model {

std::optional<MatchSplit> parseSplit(std::string_view text) {
    if (text == "venue") return MatchSplit{MatchSplit::Kind::Venue, {}};
    if (text.rfind("date:", 0) == 0 && isIsoDate(text.substr(5)))
        return MatchSplit{MatchSplit::Kind::Date, std::string(text.substr(5))};
    if (text.rfind("opponent:", 0) == 0 && text.size() > 9)
        return MatchSplit{MatchSplit::Kind::Opponent, std::string(text.substr(9))};
    return std::nullopt;
}

Comparison compareSplit(const SeasonTallies& season, const std::vector<MatchSummary>& summaries,
                        const MetricSpec& metric, const ZoneGrid& grid, const MatchSplit& split,
                        const FlagSettings& settings) {
    Comparison out;
    switch (split.kind) {
    case MatchSplit::Kind::Venue:
        out.firstLabel = "home";
        out.secondLabel = "away";
        break;
    case MatchSplit::Kind::Date:
        out.firstLabel = "before " + split.value;
        out.secondLabel = "from " + split.value;
        break;
    case MatchSplit::Kind::Opponent:
        out.firstLabel = split.value;
        out.secondLabel = "the rest";
        break;
    }
    // Which side each match is on: 0 first, 1 second, -1 neither (a neutral ground).
    std::vector<int> side(season.matchIds.size(), -1);
    for (std::size_t m = 0; m < season.matchIds.size() && m < summaries.size(); ++m) {
        const MatchSummary& s = summaries[m];
        switch (split.kind) {
        case MatchSplit::Kind::Venue: side[m] = s.venue == "home" ? 0 : s.venue == "away" ? 1 : -1; break;
        case MatchSplit::Kind::Date: side[m] = s.date < split.value ? 0 : 1; break;
        case MatchSplit::Kind::Opponent: side[m] = s.opponent == split.value ? 0 : 1; break;
        }
        if (side[m] == 0) out.firstMatches.push_back(season.matchIds[m]);
        if (side[m] == 1) out.secondMatches.push_back(season.matchIds[m]);
    }
    if (out.firstMatches.empty() || out.secondMatches.empty()) {
        out.problem = "no match is " + (out.firstMatches.empty() ? out.firstLabel : out.secondLabel) +
                      " in this season";
        return out;
    }
    const auto found = season.byMetric.find(metric.id);
    if (found == season.byMetric.end() || found->second.empty()) {
        out.problem = "no tallies of " + metric.id + " in this season";
        return out;
    }
    const auto& tallies = found->second;
    const MetricKind kind = metric.kind();
    MetricVariation variation;
    if (settings.matchVariation)
        variation = estimateVariation(tallies, tallies.size() - 1, kind, settings.variationPrior);

    std::vector<ZoneCount> counts[2];
    for (int zone = 0; zone < grid.zoneCount(); ++zone) {
        const Zone z = grid.zoneAt(zone);
        std::vector<ZoneTally> series[2];
        ZoneTally all;
        for (std::size_t m = 0; m < tallies.size(); ++m) {
            const ZoneTally& t = tallies[m][static_cast<std::size_t>(zone)];
            all.num += t.num;
            all.den += t.den;
            if (side[m] >= 0) series[side[m]].push_back(t);
        }
        // The design effect of a count at the zone's season rate, as the flags do without a target.
        const double mean = all.den > 0 ? static_cast<double>(all.num) / static_cast<double>(all.den) : 0;
        const WindowVariation wv{kind, variation.zones.value, mean};
        for (int k = 0; k < 2; ++k) {
            const WindowSum sum = windowSum(series[k], series[k].size() - 1, Window{Window::Kind::Season, 0, 0.3}, wv);
            counts[k].push_back({z.band, z.lane, sum.effNum, sum.effDen});
        }
    }
    const PooledMap first = poolZones(counts[0], grid, kind, settings.level, 1.0);
    const PooledMap second = poolZones(counts[1], grid, kind, settings.level, 1.0);
    const boost::math::normal standard;
    const double zCrit = boost::math::quantile(standard, 0.5 + settings.level / 2);
    for (std::size_t i = 0; i < first.zones.size(); ++i) {
        ZoneDifference d;
        d.band = first.zones[i].band;
        d.lane = first.zones[i].lane;
        d.first = first.zones[i];
        d.second = second.zones[i];
        if (d.first.den > 0 && d.second.den > 0) {
            d.difference = d.second.pooled - d.first.pooled;
            const double sd = std::sqrt(d.first.sd * d.first.sd + d.second.sd * d.second.sd);
            d.interval = {d.difference - zCrit * sd, d.difference + zCrit * sd};
            d.probSecondHigher = sd > 0 ? boost::math::cdf(standard, d.difference / sd) : (d.difference > 0 ? 1 : 0);
        }
        out.zones.push_back(d);
    }
    return out;
}

} // namespace pitchloop::model
