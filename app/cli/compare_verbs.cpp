#include "compare_verbs.h"

#include "commands.h"
#include "comparison.h"
#include "exports.h"
#include "format.h"
#include "wording.h"
#include "zonenames.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace pitchloop::cli {

using namespace pitchloop::model;

namespace {

/// A difference in the metric's unit: "+6.9 pts" for shares, "−0.8" for counts.
std::string differenceText(MetricKind kind, double d) {
    char buf[32];
    if (kind == MetricKind::Rate) std::snprintf(buf, sizeof buf, "%+.1f pts", 100 * d);
    else std::snprintf(buf, sizeof buf, "%+.2f", d);
    return buf;
}

nlohmann::json sideJson(const PooledZone& z) {
    auto num = [](double v) { return std::isnan(v) ? nlohmann::json() : nlohmann::json(v); };
    return {{"num", z.num}, {"den", z.den}, {"raw", num(z.raw)}, {"pooled", num(z.pooled)},
            {"pooled_low", num(z.interval.low)}, {"pooled_high", num(z.interval.high)}};
}

} // namespace

CompareVerbs::CompareVerbs(CLI::App& app) {
    m_compare = app.add_subcommand("compare", "Two sets of a season's matches on one map: the difference "
                                              "zone by zone with its own interval");
    m_compare->add_option("--metric", m_metric, "Metric id")->required();
    m_compare->add_option("--split", m_split,
                          "venue (home against away), date:YYYY-MM-DD (before against from that day) "
                          "or opponent:NAME (that opponent against the rest)")
        ->required();
    m_compare->add_option("--season", m_season, "Season (default: the latest match's)");
    m_compare->add_option("--squad", m_squad, "Squad (default: the latest match's)");
    m_compare->add_option("--format", m_format, "table, csv or json")
        ->capture_default_str()
        ->check(CLI::IsMember({"table", "csv", "json"}));
}

int CompareVerbs::run(const Globals& g, std::ostream& out, std::ostream& err) {
    auto repo = openClub(g);
    const auto split = parseSplit(m_split);
    if (!split) {
        err << "error: --split '" << m_split << "': expected venue, date:YYYY-MM-DD or opponent:NAME\n";
        return kExitBadInput;
    }
    const auto metrics = repo->metrics();
    const auto metric = std::find_if(metrics.begin(), metrics.end(), [&](const MetricSpec& m) { return m.id == m_metric; });
    if (metric == metrics.end()) {
        err << "error: --metric: no metric '" << m_metric << "' (see: pitchloop metrics list)\n";
        return kExitBadInput;
    }
    auto all = repo->matches();
    if (all.empty()) {
        err << "error: no matches in the club file\n";
        return kExitBadInput;
    }
    const std::string squad = m_squad.empty() ? all.back().squad : m_squad;
    const std::string season = m_season.empty() ? all.back().season : m_season;
    std::vector<MatchSummary> summaries;
    for (auto& m : all)
        if (m.squad == squad && m.season == season) summaries.push_back(std::move(m));
    if (summaries.empty()) {
        err << "error: no matches of " << squad << " in season " << season << "\n";
        return kExitBadInput;
    }
    const SeasonTallies tallies = repo->seasonTallies(squad, season);
    const ZoneGrid grid = repo->tallyGrid();
    const FlagSettings settings = repo->flagSettings();
    const Comparison c = compareSplit(tallies, summaries, *metric, grid, *split, settings);
    if (!c.problem.empty()) {
        err << "error: --split " << m_split << ": " << c.problem << "\n";
        return kExitBadInput;
    }
    const MetricKind kind = metric->kind();
    if (m_format == "json") {
        nlohmann::json j{{"metric", metric->id},   {"squad", squad},
                         {"season", season},       {"split", m_split},
                         {"first", c.firstLabel},  {"second", c.secondLabel},
                         {"first_matches", c.firstMatches}, {"second_matches", c.secondMatches},
                         {"level", settings.level}};
        j["zones"] = nlohmann::json::array();
        auto num = [](double v) { return std::isnan(v) ? nlohmann::json() : nlohmann::json(v); };
        for (const auto& d : c.zones)
            j["zones"].push_back({{"band", d.band},
                                  {"lane", d.lane},
                                  {"first", sideJson(d.first)},
                                  {"second", sideJson(d.second)},
                                  {"difference", num(d.difference)},
                                  {"low", num(d.interval.low)},
                                  {"high", num(d.interval.high)},
                                  {"p_second_higher", num(d.probSecondHigher)}});
        out << j.dump(2) << "\n";
        return kExitOk;
    }
    if (m_format == "csv") {
        out << "band,lane,first_num,first_den,first_pooled,second_num,second_den,second_pooled,difference,low,high,"
               "p_second_higher\r\n";
        for (const auto& d : c.zones)
            out << d.band << ',' << d.lane << ',' << csvNumber(d.first.num) << ',' << csvNumber(d.first.den) << ','
                << csvNumber(d.first.pooled) << ',' << csvNumber(d.second.num) << ',' << csvNumber(d.second.den)
                << ',' << csvNumber(d.second.pooled) << ',' << csvNumber(d.difference) << ','
                << csvNumber(d.interval.low) << ',' << csvNumber(d.interval.high) << ','
                << csvNumber(d.probSecondHigher) << "\r\n";
        return kExitOk;
    }
    out << (metric->name.empty() ? metric->id : metric->name) << " · " << squad << " " << season << " · "
        << c.firstLabel << " (" << c.firstMatches.size() << " matches) against " << c.secondLabel << " ("
        << c.secondMatches.size() << " matches)\n"
        << "Each side pulled toward its neighbours; the difference's interval at "
        << std::lround(100 * settings.level) << "%; strongest evidence first.\n\n";
    std::vector<const ZoneDifference*> rows;
    for (const auto& d : c.zones)
        if (!std::isnan(d.difference)) rows.push_back(&d);
    std::stable_sort(rows.begin(), rows.end(), [](const ZoneDifference* a, const ZoneDifference* b) {
        return std::abs(a->probSecondHigher - 0.5) > std::abs(b->probSecondHigher - 0.5);
    });
    out << padColumn("zone", 44) << padColumn(c.firstLabel, 16) << padColumn(c.secondLabel, 16)
        << padColumn(c.secondLabel + " − " + c.firstLabel, 34) << "P(" << c.secondLabel << " higher)\n";
    for (const ZoneDifference* d : rows) {
        const std::string interval = differenceText(kind, d->difference) + " (" +
                                     differenceText(kind, d->interval.low) + " to " +
                                     differenceText(kind, d->interval.high) + ")";
        out << padColumn(zoneLabel(d->band, d->lane, grid), 44) << padColumn(words::value(kind, d->first.pooled), 16)
            << padColumn(words::value(kind, d->second.pooled), 16) << padColumn(interval, 34)
            << words::probability(d->probSecondHigher) << "\n";
    }
    return kExitOk;
}

} // namespace pitchloop::cli
