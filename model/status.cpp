#include "status.h"

#include <boost/math/special_functions/beta.hpp>
#include <boost/math/special_functions/gamma.hpp>

#include <algorithm>
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

/// Posterior evidence for a rate target: Jeffreys prior, posterior Beta(x + ½, n − x + ½).
Evidence rateEvidence(double x, double n, const Target& t, double offThreshold) {
    Evidence e;
    const bool atLeast = t.direction == Direction::AtLeast;
    auto miss = [&](double xx, double line) {
        return atLeast ? stats::probRateBelow(xx, n, line) : stats::probRateAbove(xx, n, line);
    };
    e.pMiss = miss(x, t.value);
    e.pWatch = miss(x, atLeast ? t.value + t.watchMargin : t.value - t.watchMargin);
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
/// prior, posterior Gamma(count + ½, rate exposure).
Evidence poissonEvidence(double count, double exposure, const Target& t, double offThreshold) {
    Evidence e;
    const bool atLeast = t.direction == Direction::AtLeast;
    auto miss = [&](double c, double line) {
        return atLeast ? stats::probPoissonRateBelow(c, exposure, line)
                       : stats::probPoissonRateAbove(c, exposure, line);
    };
    e.pMiss = miss(count, t.value);
    e.pWatch = miss(count, atLeast ? t.value + t.watchMargin : std::max(0.0, t.value - t.watchMargin));
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

WindowSum windowSum(const std::vector<ZoneTally>& series, std::size_t focal, const Window& w,
                    double seed) {
    WindowSum s;
    if (series.empty() || focal >= series.size()) return s;
    std::size_t first = 0;
    switch (w.kind) {
    case Window::Kind::Match: first = focal; break;
    case Window::Kind::LastN:
        first = focal + 1 >= static_cast<std::size_t>(w.n) ? focal + 1 - static_cast<std::size_t>(w.n) : 0;
        break;
    case Window::Kind::Season: first = 0; break;
    case Window::Kind::Ewma: {
        double meanDen = 0;
        for (std::size_t t = 0; t <= focal; ++t) meanDen += static_cast<double>(series[t].den);
        meanDen /= static_cast<double>(focal + 1);
        double weight = w.lambda;
        double sumWeightedDen = 0, sumSquaredWeightDen = 0;
        for (std::size_t t = focal + 1; t-- > 0;) {
            const double d = static_cast<double>(series[t].den);
            s.num += weight * static_cast<double>(series[t].num);
            s.den += weight * d;
            sumWeightedDen += weight * d;
            sumSquaredWeightDen += weight * weight * d;
            weight *= 1 - w.lambda;
        }
        // `weight` is now λ(1 − λ)^(focal+1); the seed's weight is (1 − λ)^(focal+1).
        const double seedWeight = weight / w.lambda;
        s.num += seedWeight * seed * meanDen;
        s.den += seedWeight * meanDen;
        sumWeightedDen += seedWeight * meanDen;
        sumSquaredWeightDen += seedWeight * seedWeight * meanDen;
        // Weighted sums are not counts: Σw·x has variance Σw²·(count variance), so scale both
        // by Σw·d / Σw²·d to get effective counts whose Poisson/binomial spread matches (the
        // Kish effective sample size). For a per-match count this is (2 − λ)/λ matches in the
        // long run — the EWMA's own variance factor λ/(2 − λ), NIST §6.3.2.4.
        if (sumSquaredWeightDen > 0) {
            const double scale = sumWeightedDen / sumSquaredWeightDen;
            s.num *= scale;
            s.den *= scale;
        }
        s.matches = static_cast<int>(focal + 1);
        return s;
    }
    }
    for (std::size_t t = first; t <= focal; ++t) {
        s.num += static_cast<double>(series[t].num);
        s.den += static_cast<double>(series[t].den);
    }
    s.matches = static_cast<int>(focal - first + 1);
    return s;
}

std::string_view toString(FlagState s) {
    switch (s) {
    case FlagState::OnTarget: return "on_target";
    case FlagState::Watch: return "watch";
    case FlagState::OffTarget: return "off_target";
    case FlagState::TooLittleData: return "too_little_data";
    case FlagState::NoTarget: return "no_target";
    }
    return "?";
}

std::vector<ZoneStatus> computeStatus(const SeasonTallies& season, std::size_t focal,
                                      const std::vector<MetricSpec>& metrics,
                                      const std::vector<Target>& targets, const ZoneGrid& grid,
                                      const std::vector<Window>& windows,
                                      const FlagSettings& settings) {
    std::vector<ZoneStatus> out;
    if (focal >= season.matchIds.size()) return out;
    const std::string& date = season.dates[focal];

    for (const auto& metric : metrics) {
        auto found = season.byMetric.find(metric.id);
        if (found == season.byMetric.end()) continue;
        const MetricKind kind = metric.kind();
        for (int zone = -1; zone < grid.zoneCount(); ++zone) {
            const Zone z = zone < 0 ? Zone{0, 0} : grid.zoneAt(zone);
            std::vector<Target> versions;
            for (const auto& t : targets)
                if (t.key.metric == metric.id && t.key.band == z.band && t.key.lane == z.lane)
                    versions.push_back(t);
            const std::optional<Target> target = inForce(versions, date);
            const auto series = zoneSeries(found->second, zone, kind == MetricKind::Count, focal);
            for (const Window& w : windows) {
                ZoneStatus st;
                st.metric = metric.id;
                st.band = z.band;
                st.lane = z.lane;
                st.window = w;
                st.target = target;
                st.level = settings.level;
                // An EWMA starts from the target when there is one, else from the season's
                // value so far (NIST: z_0 = the target or the process mean).
                double seed = 0;
                if (target) {
                    seed = target->value;
                } else {
                    const WindowSum all = windowSum(series, focal, {Window::Kind::Season, 0, 0}, 0);
                    seed = all.den > 0 ? all.num / all.den : 0;
                }
                st.sum = windowSum(series, focal, w, seed);
                const double num = st.sum.num, den = st.sum.den;
                st.value = den > 0 ? num / den : kNaN;
                if (kind == MetricKind::Rate) {
                    st.interval = settings.rateInterval == IntervalMethod::Jeffreys
                                      ? stats::jeffreys(num, den, settings.level)
                                      : stats::wilson(num, den, settings.level);
                } else {
                    st.interval = den > 0 ? stats::garwood(num, den, settings.level)
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
                    out.push_back(std::move(st));
                    continue;
                }
                const Evidence e = kind == MetricKind::Rate
                                       ? rateEvidence(num, den, *target, settings.offThreshold)
                                       : poissonEvidence(num, den, *target, settings.offThreshold);
                st.pMiss = e.pMiss;
                st.pValue = e.pValue;
                st.chanceOff = e.chanceOff;
                st.state = e.pMiss >= settings.offThreshold ? FlagState::OffTarget
                           : e.pWatch >= settings.watchThreshold ? FlagState::Watch
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
                st.state = FlagState::Watch;
        }
    }
    return out;
}

double expectedChanceFlags(const std::vector<ZoneStatus>& statuses) {
    double sum = 0;
    for (const auto& s : statuses)
        if (s.target && s.state != FlagState::TooLittleData) sum += s.chanceOff;
    return sum;
}

} // namespace pitchloop::model
