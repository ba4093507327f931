// Reads one JSON request per line on stdin, {"fn": "wilson", "args": [x, n, level]}, calls the
// statistics module and prints one JSON line per request: {"fn": ..., "result": ...} or
// {"fn": ..., "error": "..."}. Used by tests/python/stats_against_scipy.py to compare the
// module with Debian's scipy and statsmodels.
//
// Non-finite numbers are written as the strings "inf", "-inf" and "nan" (JSON has no such
// numbers); finite ones with 17 significant digits, so they read back exactly.

#include "stats.h"
#include "variation.h"

#include <cmath>
#include <iostream>
#include <nlohmann/json.hpp>
#include <stdexcept>
#include <string>

using nlohmann::json;
namespace stats = pitchloop::model::stats;
using namespace pitchloop::model;

namespace {

json number(double v) {
    if (std::isnan(v)) return "nan";
    if (std::isinf(v)) return v > 0 ? "inf" : "-inf";
    return v;
}

json interval(const stats::Interval& ci) {
    return {{"low", number(ci.low)}, {"high", number(ci.high)}};
}

json numbers(const std::vector<double>& values) {
    json out = json::array();
    for (double v : values)
        out.push_back(number(v));
    return out;
}

long count(const json& args, std::size_t i) {
    return args.at(i).get<long>();
}
double real(const json& args, std::size_t i) {
    return args.at(i).get<double>();
}

// Calls the function named in the request with its arguments.
json call(const std::string& fn, const json& a) {
    if (fn == "wilson") return interval(stats::wilson(count(a, 0), count(a, 1), real(a, 2)));
    if (fn == "wilsonCC") return interval(stats::wilsonCC(count(a, 0), count(a, 1), real(a, 2)));
    if (fn == "jeffreys") return interval(stats::jeffreys(count(a, 0), count(a, 1), real(a, 2)));
    if (fn == "clopperPearson")
        return interval(stats::clopperPearson(count(a, 0), count(a, 1), real(a, 2)));
    if (fn == "garwood") return interval(stats::garwood(count(a, 0), real(a, 1), real(a, 2)));
    if (fn == "probRateBelow")
        return number(stats::probRateBelow(count(a, 0), count(a, 1), real(a, 2)));
    if (fn == "probRateAbove")
        return number(stats::probRateAbove(count(a, 0), count(a, 1), real(a, 2)));
    if (fn == "probPoissonRateBelow")
        return number(stats::probPoissonRateBelow(count(a, 0), real(a, 1), real(a, 2)));
    if (fn == "probPoissonRateAbove")
        return number(stats::probPoissonRateAbove(count(a, 0), real(a, 1), real(a, 2)));
    if (fn == "betaSummary") {
        const stats::BetaSummary s = stats::betaSummary(real(a, 0), real(a, 1), real(a, 2));
        return {{"mean", number(s.mean)}, {"sd", number(s.sd)}, {"interval", interval(s.interval)}};
    }
    if (fn == "ewma") {
        json out = json::array();
        for (const stats::EwmaPoint& p :
             stats::ewma(a.at(0).get<std::vector<double>>(), real(a, 1), real(a, 2), real(a, 3),
                         real(a, 4), a.at(5).get<bool>()))
            out.push_back(
                {{"value", number(p.value)}, {"low", number(p.low)}, {"high", number(p.high)}});
        return out;
    }
    if (fn == "ewmaSeries")
        return numbers(
            stats::ewmaSeries(a.at(0).get<std::vector<double>>(), real(a, 1), real(a, 2)));
    if (fn == "benjaminiHochberg")
        return numbers(stats::benjaminiHochberg(a.at(0).get<std::vector<double>>()));
    if (fn == "bhReject") {
        json out = json::array();
        for (bool r : stats::bhReject(a.at(0).get<std::vector<double>>(), real(a, 1)))
            out.push_back(r);
        return out;
    }
    if (fn == "newcombeDifference")
        return interval(stats::newcombeDifference(count(a, 0), count(a, 1), count(a, 2),
                                                  count(a, 3), real(a, 4)));
    if (fn == "fisherExact") {
        const stats::FisherResult r =
            stats::fisherExact(count(a, 0), count(a, 1), count(a, 2), count(a, 3));
        return {{"pLess", number(r.pLess)},
                {"pGreater", number(r.pGreater)},
                {"pTwoSided", number(r.pTwoSided)},
                {"oddsRatio", number(r.oddsRatio)}};
    }
    if (fn == "poissonConditionalTest") {
        const stats::PoissonTwoSample r =
            stats::poissonConditionalTest(count(a, 0), real(a, 1), count(a, 2), real(a, 3));
        return {{"pLess", number(r.pLess)},
                {"pGreater", number(r.pGreater)},
                {"pTwoSided", number(r.pTwoSided)}};
    }
    if (fn == "probRateImproved")
        return number(stats::probRateImproved(count(a, 0), count(a, 1), count(a, 2), count(a, 3),
                                              a.at(4).get<bool>()));
    if (fn == "probPoissonRateImproved")
        return number(stats::probPoissonRateImproved(count(a, 0), real(a, 1), count(a, 2),
                                                     real(a, 3), a.at(4).get<bool>()));
    if (fn == "pChart") {
        json out = json::array();
        for (const stats::PChartPoint& p :
             stats::pChart(a.at(0).get<std::vector<long>>(), a.at(1).get<std::vector<long>>(),
                           a.at(2).get<std::size_t>(), real(a, 3)))
            out.push_back({{"p", number(p.p)},
                           {"centre", number(p.centre)},
                           {"lcl", number(p.lcl)},
                           {"ucl", number(p.ucl)},
                           {"above", p.above},
                           {"below", p.below}});
        return out;
    }
    if (fn == "countTail")
        return number(countTail(real(a, 0), real(a, 1), real(a, 2), a.at(3).get<bool>()));
    if (fn == "designEffect") {
        const auto kind = a.at(0).get<std::string>() == "rate" ? MetricKind::Rate : MetricKind::Count;
        return number(designEffect(kind, real(a, 1), real(a, 2), real(a, 3)));
    }
    if (fn == "rateDispersion" || fn == "countDispersion") {
        // args: [[[num, den], ...] per series, ...], matches; no prior weight (the raw estimate).
        std::vector<TallySeries> series;
        for (const auto& zs : a.at(0)) {
            TallySeries t;
            for (const auto& m : zs) t.push_back({m.at(0).get<long>(), m.at(1).get<long>()});
            series.push_back(std::move(t));
        }
        VariationPrior none;
        none.priorWeight = 0;
        const int matches = a.at(1).get<int>();
        const Dispersion d = fn == "rateDispersion" ? estimateRateDispersion(series, matches, none)
                                                    : estimateCountDispersion(series, matches, none);
        return number(d.estimate);
    }
    throw std::invalid_argument("unknown function " + fn);
}

} // namespace

int main() {
    std::string line;
    while (std::getline(std::cin, line)) {
        if (line.empty()) continue;
        json reply;
        try {
            const json request = json::parse(line);
            reply["fn"] = request.at("fn");
            reply["result"] = call(request.at("fn").get<std::string>(), request.at("args"));
        } catch (const std::exception& e) {
            reply["error"] = e.what();
        }
        std::cout << reply.dump() << '\n';
    }
    return 0;
}
