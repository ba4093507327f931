#include "status.h"

#include <boost/math/special_functions/beta.hpp>
#include <boost/math/special_functions/gamma.hpp>

#include <nlohmann/json.hpp>

#include <algorithm>
#include <map>
#include <tuple>
#include <cmath>
#include <limits>

namespace pitchloop::model {

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

// ---- one-sided exact p-values against a target (for Benjamini–Hochberg) --------------------
// Rates: X ~ Binomial(n, T). P(X <= x) = I_{1−T}(n − x, x + 1), the regularized incomplete
// beta, which also serves the non-integer effective counts of an EWMA.
double binomialCdf(double x, double n, double p) {
    if (x >= n) return 1;
    if (x < 0) return 0;
    if (p <= 0) return 1;
    if (p >= 1) return 0;
    return boost::math::ibetac(x + 1, n - x, p);
}
// Counts: X ~ Poisson(μ). P(X <= x) = Q(x + 1, μ), the regularized upper incomplete gamma.
double poissonCdf(double x, double mu) {
    if (x < 0) return 0;
    if (mu <= 0) return 1;
    return boost::math::gamma_q(x + 1, mu);
}

struct Evidence {
    double pMiss = 0;
    double pWatch = 0;
    double pValue = 1;
    double chanceOff = 0;
};

/// A target at the edge of what the value can be ("at least 100 %", "at most 0 %", "at most 0 a
/// match") is missed only by data that contradict it — one failure, one event — and then for
/// certain; a continuous posterior would put all its mass past such a target and call a perfect
/// zone off. A target that cannot be missed ("at least 0", "at most 100 %") never is.
std::optional<Evidence> boundaryEvidence(bool rate, double rawNum, double rawDen, const Target& t) {
    const bool atLeast = t.direction == Direction::AtLeast;
    const bool lowEdge = t.value <= 0, highEdge = rate && t.value >= 1;
    if (!lowEdge && !highEdge) return std::nullopt;
    Evidence e;
    bool contradicted = false;
    if (atLeast && highEdge) contradicted = rawNum < rawDen;    // a failure
    else if (!atLeast && lowEdge) contradicted = rawNum > 0;    // an event or a success
    // "at least 0" and "at most 100 %" are met whatever happens.
    e.pMiss = contradicted ? 1 : 0;
    e.pWatch = e.pMiss;
    e.pValue = contradicted ? 0 : 1;
    e.chanceOff = 0; // a truth exactly on such a target never produces a contradiction
    return e;
}

/// The watch line: the target moved by its margin towards the good side, but never past half
/// the way to the edge of what the value can be (a 0.97 target with a 0.05 margin watches at
/// 0.985, not at an impossible 1.02).
double watchLine(bool rate, const Target& t) {
    const bool atLeast = t.direction == Direction::AtLeast;
    double room = atLeast ? (rate ? (1 - t.value) / 2 : t.watchMargin) : t.value / 2;
    const double margin = std::clamp(t.watchMargin, 0.0, std::max(0.0, room));
    return atLeast ? t.value + margin : t.value - margin;
}

/// Posterior evidence for a rate target: Jeffreys prior, posterior Beta(x + ½, n − x + ½), on
/// the window's effective counts.
Evidence rateEvidence(double x, double n, const Target& t, double offThreshold) {
    Evidence e;
    const bool atLeast = t.direction == Direction::AtLeast;
    auto miss = [&](double xx, double line) {
        return atLeast ? stats::probRateBelow(xx, n, line) : stats::probRateAbove(xx, n, line);
    };
    e.pMiss = miss(x, t.value);
    e.pWatch = miss(x, watchLine(true, t));
    e.pValue = atLeast ? binomialCdf(x, n, t.value) : 1 - binomialCdf(x - 1, n, t.value);
    // Chance of an off-target flag if the truth were exactly the target: pMiss falls as x
    // rises (at least) or rises with x (at most), so the flagged x form one tail; find its end.
    const long trials = std::lround(n);
    if (atLeast) {
        long lo = -1, hi = trials; // largest x with pMiss >= threshold, −1 when none
        while (lo < hi) {
            const long mid = (lo + hi + 1) / 2;
            if (miss(static_cast<double>(mid), t.value) >= offThreshold) lo = mid;
            else hi = mid - 1;
        }
        e.chanceOff = lo < 0 ? 0 : binomialCdf(static_cast<double>(lo), trials, t.value);
    } else {
        long lo = 0, hi = trials + 1; // smallest x with pMiss >= threshold, trials+1 when none
        while (lo < hi) {
            const long mid = (lo + hi) / 2;
            if (miss(static_cast<double>(mid), t.value) >= offThreshold) hi = mid;
            else lo = mid + 1;
        }
        e.chanceOff = lo > trials ? 0 : 1 - binomialCdf(static_cast<double>(lo - 1), trials, t.value);
    }
    return e;
}

/// Posterior evidence for a Poisson rate target (per match or per exposure event): Jeffreys
/// prior, posterior Gamma(count + ½, rate exposure), on the window's effective counts.
Evidence poissonEvidence(double count, double exposure, const Target& t, double offThreshold) {
    Evidence e;
    const bool atLeast = t.direction == Direction::AtLeast;
    auto miss = [&](double c, double line) {
        return atLeast ? stats::probPoissonRateBelow(c, exposure, line)
                       : stats::probPoissonRateAbove(c, exposure, line);
    };
    e.pMiss = miss(count, t.value);
    e.pWatch = miss(count, watchLine(false, t));
    const double mu = t.value * exposure;
    e.pValue = atLeast ? poissonCdf(count, mu) : 1 - poissonCdf(count - 1, mu);
    // Search the flagged tail up to a count far past the mean.
    const long top = static_cast<long>(mu + 20 * std::sqrt(mu + 1) + 20);
    if (atLeast) {
        long lo = -1, hi = top;
        while (lo < hi) {
            const long mid = (lo + hi + 1) / 2;
            if (miss(static_cast<double>(mid), t.value) >= offThreshold) lo = mid;
            else hi = mid - 1;
        }
        e.chanceOff = lo < 0 ? 0 : poissonCdf(static_cast<double>(lo), mu);
    } else {
        long lo = 0, hi = top + 1;
        while (lo < hi) {
            const long mid = (lo + hi) / 2;
            if (miss(static_cast<double>(mid), t.value) >= offThreshold) hi = mid;
            else lo = mid + 1;
        }
        e.chanceOff = lo > top ? 0 : 1 - poissonCdf(static_cast<double>(lo - 1), mu);
    }
    return e;
}

/// How unusual one match's count would be for a team exactly on its per-match target.
double singleMatchTail(double count, const Target& t, double phi) {
    return countTail(std::round(count), std::max(0.0, t.value), phi,
                     t.direction == Direction::AtMost);
}

std::vector<ZoneTally> zoneSeries(const std::vector<MatchTally>& tallies, int zoneIndex,
                                  bool countKind, std::size_t upTo) {
    std::vector<ZoneTally> series;
    series.reserve(upTo + 1);
    for (std::size_t m = 0; m <= upTo; ++m) {
        const MatchTally& t = tallies[m];
        if (zoneIndex >= 0) {
            series.push_back(t[static_cast<std::size_t>(zoneIndex)]);
            continue;
        }
        ZoneTally whole;
        for (const auto& z : t) {
            whole.num += z.num;
            whole.den += z.den;
        }
        if (countKind) whole.den = 1; // a per-match count over the whole pitch: one match
        series.push_back(whole);
    }
    return series;
}

} // namespace

std::string Window::name() const {
    switch (kind) {
    case Kind::Match: return "match";
    case Kind::LastN: return "last" + std::to_string(n);
    case Kind::Season: return "season";
    case Kind::Ewma: {
        char buf[32];
        std::snprintf(buf, sizeof buf, "ewma%g", lambda);
        return buf;
    }
    }
    return "?";
}

std::optional<Window> Window::parse(std::string_view text) {
    if (text == "match") return Window{Kind::Match, 1, 0.3};
    if (text == "season") return Window{Kind::Season, 0, 0.3};
    if (text.starts_with("last")) {
        try {
            std::size_t used = 0;
            const std::string rest(text.substr(4));
            const int n = std::stoi(rest, &used);
            if (used == rest.size() && n >= 1 && n <= 100) return Window{Kind::LastN, n, 0.3};
        } catch (const std::exception&) {
        }
        return std::nullopt;
    }
    if (text.starts_with("ewma")) {
        const std::string rest(text.substr(4));
        if (rest.empty()) return Window{Kind::Ewma, 0, 0.3};
        try {
            std::size_t used = 0;
            const double lambda = std::stod(rest, &used);
            if (used == rest.size() && lambda > 0 && lambda <= 1) return Window{Kind::Ewma, 0, lambda};
        } catch (const std::exception&) {
        }
    }
    return std::nullopt;
}

std::size_t windowStart(std::size_t focal, const Window& w) {
    switch (w.kind) {
    case Window::Kind::Match: return focal;
    case Window::Kind::LastN:
        return focal + 1 >= static_cast<std::size_t>(w.n) ? focal + 1 - static_cast<std::size_t>(w.n) : 0;
    case Window::Kind::Season:
    case Window::Kind::Ewma: return 0;
    }
    return 0;
}

WindowSum windowSum(const std::vector<ZoneTally>& series, std::size_t focal, const Window& w,
                    const WindowVariation& v) {
    WindowSum s;
    if (series.empty() || focal >= series.size()) return s;
    const std::size_t first = windowStart(focal, w);
    // Weighted sums: w = 1 in a plain window, λ(1 − λ)^age in the EWMA. Σw²·d·D is the variance
    // of Σw·x in units of one chance's pure-noise variance, D the match's design effect.
    const bool ewma = w.kind == Window::Kind::Ewma;
    double weight = ewma ? w.lambda : 1;
    double sumWD = 0, sumW2D = 0, sumW2DD = 0;
    for (std::size_t t = focal + 1; t-- > first;) {
        const double d = static_cast<double>(series[t].den);
        const double deff = designEffect(v.kind, v.dispersion, d, v.mean);
        s.num += weight * static_cast<double>(series[t].num);
        s.den += weight * d;
        sumWD += weight * d;
        sumW2D += weight * weight * d;
        sumW2DD += weight * weight * d * deff;
        if (ewma) weight *= 1 - w.lambda;
    }
    s.matches = static_cast<int>(focal - first + 1);
    if (ewma && sumW2D > 0) {
        // Weighted sums are not counts: Σw·x has variance Σw²·(count variance), so scale both
        // by Σw·d / Σw²·d to get effective counts whose binomial/Poisson spread matches (the
        // Kish effective sample size). For a per-match count this is (2 − λ)/λ matches in the
        // long run — the EWMA's own variance factor λ/(2 − λ), NIST §6.3.2.4.
        const double scale = sumWD / sumW2D;
        s.num *= scale;
        s.den *= scale;
    }
    const double value = s.den > 0 ? s.num / s.den : 0;
    s.effDen = sumW2DD > 0 ? sumWD * sumWD / sumW2DD : 0;
    s.effNum = value * s.effDen;
    return s;
}

std::string_view toString(FlagState s) {
    switch (s) {
    case FlagState::OnTarget: return "on_target";
    case FlagState::CloseToLine: return "close_to_line";
    case FlagState::LikelyOff: return "likely_off";
    case FlagState::OffTarget: return "off_target";
    case FlagState::TooLittleData: return "too_little_data";
    case FlagState::NoTarget: return "no_target";
    }
    return "?";
}

std::optional<FlagState> flagStateFromString(std::string_view s) {
    for (FlagState f : {FlagState::OnTarget, FlagState::CloseToLine, FlagState::LikelyOff,
                        FlagState::OffTarget, FlagState::TooLittleData, FlagState::NoTarget})
        if (toString(f) == s) return f;
    if (s == "watch") return FlagState::CloseToLine; // evidence frozen before the split
    return std::nullopt;
}

double seriesAlarmShare(const FlagSettings& s, int series) {
    const double looks = std::max(1, s.seasonMatches);
    if (s.falseFlagsPerSeason <= 0) return std::min(1.0, (1 - s.offThreshold) * looks);
    return std::min(0.05, s.falseFlagsPerSeason / std::max(1, series));
}

double offThresholdFor(const FlagSettings& s, int series) {
    if (s.falseFlagsPerSeason <= 0) return s.offThreshold;
    return 1 - seriesAlarmShare(s, series) / std::max(1, s.seasonMatches);
}

int seriesWithTargets(const std::vector<Target>& targets, const std::string& date) {
    std::map<std::tuple<std::string, int, int>, std::vector<Target>> byKey;
    for (const auto& t : targets) byKey[{t.key.metric, t.key.band, t.key.lane}].push_back(t);
    int n = 0;
    for (const auto& [key, versions] : byKey) n += inForce(versions, date).has_value();
    return n;
}

std::vector<ZoneStatus> computeStatus(const SeasonTallies& season, std::size_t focal,
                                      const std::vector<MetricSpec>& metrics,
                                      const std::vector<Target>& targets, const ZoneGrid& grid,
                                      const std::vector<Window>& windows,
                                      const FlagSettings& settings) {
    std::vector<ZoneStatus> out;
    if (focal >= season.matchIds.size()) return out;
    const std::string& date = season.dates[focal];
    // One threshold for the whole board: the season's alarm budget shared over every series
    // with a target, whichever metrics this call asks for.
    const double offThreshold = offThresholdFor(settings, seriesWithTargets(targets, date));

    for (const auto& metric : metrics) {
        auto found = season.byMetric.find(metric.id);
        if (found == season.byMetric.end()) continue;
        const MetricKind kind = metric.kind();
        const bool rate = kind == MetricKind::Rate;
        // The club's own match-to-match variation of this metric, from the matches played up
        // to this one (never later ones).
        MetricVariation variation;
        if (settings.matchVariation)
            variation = estimateVariation(found->second, focal, kind, settings.variationPrior);
        for (int zone = -1; zone < grid.zoneCount(); ++zone) {
            const Zone z = zone < 0 ? Zone{0, 0} : grid.zoneAt(zone);
            std::vector<Target> versions;
            for (const auto& t : targets)
                if (t.key.metric == metric.id && t.key.band == z.band && t.key.lane == z.lane)
                    versions.push_back(t);
            const std::optional<Target> target = inForce(versions, date);
            const auto series = zoneSeries(found->second, zone, kind == MetricKind::Count, focal);
            // The design effect of a count is computed at the target (the value being tested)
            // or, without one, at the season's rate so far.
            const WindowSum all = windowSum(series, focal, {Window::Kind::Season, 0, 0});
            const double seasonMean = all.den > 0 ? all.num / all.den : 0;
            const WindowVariation wv{kind,
                                     zone < 0 ? variation.wholePitch.value : variation.zones.value,
                                     target ? target->value : seasonMean};
            for (const Window& w : windows) {
                ZoneStatus st;
                st.metric = metric.id;
                st.band = z.band;
                st.lane = z.lane;
                st.window = w;
                st.target = target;
                st.level = settings.level;
                st.offThreshold = offThreshold;
                st.dispersion = wv.dispersion;
                st.sum = windowSum(series, focal, w, wv);
                const double den = st.sum.den;
                const double effNum = st.sum.effNum, effDen = st.sum.effDen;
                st.value = den > 0 ? st.sum.num / den : kNaN;
                // The interval comes from the same effective counts as the evidence.
                if (rate) {
                    st.interval = settings.rateInterval == IntervalMethod::Jeffreys
                                      ? stats::jeffreys(effNum, effDen, settings.level)
                                      : stats::wilson(effNum, effDen, settings.level);
                } else {
                    st.interval = effDen > 0 ? stats::garwood(effNum, effDen, settings.level)
                                             : stats::Interval{0, kNaN};
                }
                if (!target) {
                    st.state = FlagState::NoTarget;
                    st.pMiss = kNaN;
                    st.pValue = kNaN;
                    out.push_back(std::move(st));
                    continue;
                }
                const double sample = kind == MetricKind::Count ? st.sum.matches : den;
                if (den <= 0 || sample < static_cast<double>(target->minSample)) {
                    st.state = FlagState::TooLittleData;
                    st.pMiss = kNaN;
                    st.pValue = kNaN;
                    if (kind == MetricKind::Count && w.kind == Window::Kind::Match && den > 0)
                        st.matchTail = singleMatchTail(st.sum.num, *target, wv.dispersion);
                    out.push_back(std::move(st));
                    continue;
                }
                const auto edge = boundaryEvidence(rate, st.sum.num, den, *target);
                const Evidence e = edge ? *edge
                                   : rate ? rateEvidence(effNum, effDen, *target, offThreshold)
                                          : poissonEvidence(effNum, effDen, *target, offThreshold);
                st.pMiss = e.pMiss;
                st.pValue = e.pValue;
                st.chanceOff = e.chanceOff;
                st.state = e.pMiss >= offThreshold              ? FlagState::OffTarget
                           : e.pMiss >= 0.5                      ? FlagState::LikelyOff
                           : e.pWatch >= settings.watchThreshold ? FlagState::CloseToLine
                                                                 : FlagState::OnTarget;
                out.push_back(std::move(st));
            }
        }
    }

    // Benjamini–Hochberg across every judged zone of one window: with many zones and metrics,
    // a few small p-values are expected by chance alone.
    for (const Window& w : windows) {
        std::vector<std::size_t> judged;
        std::vector<double> p;
        for (std::size_t i = 0; i < out.size(); ++i)
            if (out[i].window == w && out[i].target && !std::isnan(out[i].pValue)) {
                judged.push_back(i);
                p.push_back(out[i].pValue);
            }
        if (p.empty()) continue;
        const auto reject = stats::bhReject(p, settings.fdrQ);
        for (std::size_t k = 0; k < judged.size(); ++k) {
            ZoneStatus& st = out[judged[k]];
            st.bhRejected = reject[k];
            if (settings.fdr && st.state == FlagState::OffTarget && !st.bhRejected)
                st.state = FlagState::LikelyOff;
        }
    }
    return out;
}

nlohmann::json toJson(const ZoneStatus& s) {
    using nlohmann::json;
    json j{{"metric", s.metric},        {"band", s.band},
           {"lane", s.lane},            {"window", s.window.name()},
           {"num", s.sum.num},          {"den", s.sum.den},
           {"matches", s.sum.matches},  {"level", s.level},
           {"state", toString(s.state)}};
    auto put = [&](const char* key, double v) {
        j[key] = std::isnan(v) || std::isinf(v) ? json() : json(v);
    };
    put("value", s.value);
    put("low", s.interval.low);
    put("high", s.interval.high);
    put("p_miss", s.pMiss);
    put("p_value", s.pValue);
    put("effective_num", s.sum.effNum);
    put("effective_den", s.sum.effDen);
    put("dispersion", s.dispersion);
    put("match_tail", s.matchTail);
    if (!std::isnan(s.pooled)) {
        put("pooled", s.pooled);
        put("pooled_low", s.pooledInterval.low);
        put("pooled_high", s.pooledInterval.high);
        put("pooled_weight", s.pooledWeight);
    }
    if (s.target) {
        j["target"] = {{"direction", toString(s.target->direction)},
                       {"value", s.target->value},
                       {"watch_margin", s.target->watchMargin},
                       {"min_sample", s.target->minSample},
                       {"author", s.target->author},
                       {"effective_from", s.target->effectiveFrom}};
        j["chance_off"] = s.chanceOff;
        j["bh_rejected"] = s.bhRejected;
        j["off_threshold"] = s.offThreshold;
    } else {
        j["target"] = nullptr;
    }
    return j;
}

double expectedChanceFlags(const std::vector<ZoneStatus>& statuses) {
    double sum = 0;
    for (const auto& s : statuses)
        if (s.target && s.state != FlagState::TooLittleData) sum += s.chanceOff;
    return sum;
}

double seasonChanceFlags(const std::vector<ZoneStatus>& statuses, const FlagSettings& settings,
                         int series) {
    const double share = seriesAlarmShare(settings, series);
    const double looks = std::max(1, settings.seasonMatches);
    double sum = 0;
    for (const auto& s : statuses)
        if (s.target && s.state != FlagState::TooLittleData)
            sum += std::min(share, looks * s.chanceOff);
    return sum;
}

} // namespace pitchloop::model
