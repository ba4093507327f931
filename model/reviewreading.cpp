#include "reviewreading.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <limits>

namespace pitchloop::model {

using nlohmann::json;

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

double numberOr(const json& j, const char* key) {
    const auto it = j.find(key);
    return it == j.end() || it->is_null() ? kNaN : it->get<double>();
}

ReviewWindow windowFrom(const json& j) {
    ReviewWindow w;
    for (const auto& m : j.at("matches")) {
        w.matchIds.push_back(m.at("match_id").get<std::string>());
        w.dates.push_back(m.at("date").get<std::string>());
        w.num.push_back(m.at("num").get<long>());
        w.den.push_back(m.at("den").get<long>());
    }
    w.totalNum = j.at("num").get<long>();
    w.totalDen = j.at("den").get<long>();
    w.value = numberOr(j, "value");
    w.interval = {numberOr(j, "low"), numberOr(j, "high")};
    w.effDen = numberOr(j, "effective_den");
    return w;
}

} // namespace

ChartReading readChart(const Review& r) {
    ChartReading c;
    c.low = kNaN;
    c.high = kNaN;
    const bool higher = r.better == Better::Higher;
    for (const ChartPoint& p : r.chart) {
        if (p.trigger) continue; // the flag's own matches are shown, not read
        (p.after ? c.afterMatches : c.beforeMatches) += 1;
        if (p.after) {
            c.afterOnBetterSide += higher ? p.above : p.below;
            c.afterOnWorseSide += higher ? p.below : p.above;
        } else {
            c.beforeOutside += p.above || p.below;
        }
        for (double v : {p.value, p.centre, p.lcl, p.ucl, p.ewma}) {
            if (!std::isfinite(v)) continue;
            c.low = std::isnan(c.low) ? v : std::min(c.low, v);
            c.high = std::isnan(c.high) ? v : std::max(c.high, v);
        }
    }
    return c;
}

std::optional<Review> reviewFromJson(const std::string& text) {
    try {
        const json j = json::parse(text);
        Review r;
        r.focusId = j.at("focus_id").get<std::int64_t>();
        r.metric = j.at("metric").get<std::string>();
        const std::string kind = j.at("kind").get<std::string>();
        r.kind = MetricKind::Rate;
        for (MetricKind k : {MetricKind::Rate, MetricKind::Count, MetricKind::Exposure})
            if (toString(k) == kind) r.kind = k;
        r.better = j.at("better").get<std::string>() == toString(Better::Lower) ? Better::Lower
                                                                                : Better::Higher;
        for (const auto& z : j.at("zones")) r.zones.push_back({z.at(0).get<int>(), z.at(1).get<int>()});
        r.level = j.at("level").get<double>();
        r.before = windowFrom(j.at("before"));
        r.after = windowFrom(j.at("after"));
        if (const auto t = j.find("trigger"); t != j.end()) r.trigger = windowFrom(*t);
        r.baselineNote = j.value("baseline_note", std::string());
        r.dispersion = j.value("dispersion", 0.0);
        r.controlDispersion = j.value("control_dispersion", 0.0);
        r.expected = numberOr(j, "expected");
        r.effect = numberOr(j, "effect");
        r.effectInterval = {numberOr(j, "effect_low"), numberOr(j, "effect_high")};
        r.minChange = j.value("min_change", 0.0);
        r.probImprovedByMinChange = numberOr(j, "prob_improved_by_min_change");
        r.probAfterMeetsTarget = numberOr(j, "prob_after_meets_target");
        // Reviews stored before the finding was recorded read as "no clear change" unless
        // their own numbers said otherwise.
        const std::string finding = j.value("finding", std::string());
        r.finding = ReviewFinding::NoClearChange;
        for (ReviewFinding f : {ReviewFinding::ImprovedByMinChange, ReviewFinding::Improved,
                                ReviewFinding::NoClearChange, ReviewFinding::Worse,
                                ReviewFinding::NoBaseline})
            if (toString(f) == finding) r.finding = f;
        if (const auto t = j.find("target"); t != j.end() && t->is_object()) {
            Target target;
            target.direction = directionFromString(t->value("direction", std::string()))
                                   .value_or(Direction::AtLeast);
            target.value = t->value("value", 0.0);
            target.watchMargin = t->value("watch_margin", 0.0);
            r.target = target;
        }
        r.difference = numberOr(j, "difference");
        r.differenceInterval = {numberOr(j, "difference_low"), numberOr(j, "difference_high")};
        r.rateRatio = numberOr(j, "rate_ratio");
        r.testName = j.at("test").get<std::string>();
        r.pTwoSided = numberOr(j, "p_two_sided");
        r.pImproved = numberOr(j, "p_improved");
        r.probImproved = numberOr(j, "prob_improved");
        const json& chart = j.at("chart");
        r.ewmaLambda = chart.at("ewma_lambda").get<double>();
        for (const auto& p : chart.at("points")) {
            const std::string part = p.at("window").get<std::string>();
            r.chart.push_back({p.at("match_id").get<std::string>(), part == "after",
                               numberOr(p, "value"), numberOr(p, "centre"), numberOr(p, "lcl"),
                               numberOr(p, "ucl"), p.at("above").get<bool>(),
                               p.at("below").get<bool>(), numberOr(p, "ewma"), part == "trigger"});
        }
        if (const auto t = j.find("training_minutes"); t != j.end() && !t->is_null())
            r.trainingMinutes = t->get<double>();
        r.trainingNote = j.value("training_note", std::string());
        return r;
    } catch (const json::exception&) {
        return std::nullopt;
    }
}

} // namespace pitchloop::model
