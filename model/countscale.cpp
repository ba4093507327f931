#include "countscale.h"

#include <cmath>

namespace pitchloop::model {

std::string_view toString(CountScale s) {
    switch (s) {
    case CountScale::PerMatch: return "match";
    case CountScale::Per90: return "per90";
    case CountScale::PerOpponentPasses: return "per_opponent_passes";
    case CountScale::ShareOfTotal: return "share";
    }
    return "match";
}

std::optional<CountScale> countScaleFromString(std::string_view s) {
    for (const CountScale c : {CountScale::PerMatch, CountScale::Per90, CountScale::PerOpponentPasses,
                               CountScale::ShareOfTotal})
        if (toString(c) == s) return c;
    return std::nullopt;
}

std::string scaleWords(CountScale s) {
    switch (s) {
    case CountScale::PerMatch: return "a match";
    case CountScale::Per90: return "per 90 minutes";
    case CountScale::PerOpponentPasses: return "per 100 of their passes";
    case CountScale::ShareOfTotal: return "of the pitch's total";
    }
    return "a match";
}

double exposurePerMatch(const std::vector<MatchExposure>& exposures, std::size_t focal, const Window& window,
                        CountScale scale) {
    if (scale == CountScale::PerMatch || scale == CountScale::ShareOfTotal) return 1;
    if (exposures.empty() || focal >= exposures.size()) return 1;
    const std::size_t first = windowStart(focal, window);
    // The weights windowSum gives: 1 each, or λ(1 − λ)^age for the EWMA.
    double weight = window.kind == Window::Kind::Ewma ? window.lambda : 1, sumW = 0, sumWE = 0;
    for (std::size_t t = focal + 1; t-- > first;) {
        const MatchExposure& e = exposures[t];
        const double units = scale == CountScale::Per90 ? e.minutes / 90 : static_cast<double>(e.opponentPasses) / 100;
        sumW += weight;
        sumWE += weight * units;
        if (window.kind == Window::Kind::Ewma) weight *= 1 - window.lambda;
    }
    return sumW > 0 && sumWE > 0 ? sumWE / sumW : 1;
}

ZoneCount scaledCount(const ZoneStatus& zone, const ZoneStatus& wholePitch, CountScale scale, double exposure) {
    ZoneCount c{zone.band, zone.lane, zone.sum.effNum, zone.sum.effDen};
    switch (scale) {
    case CountScale::PerMatch: break;
    case CountScale::Per90:
    case CountScale::PerOpponentPasses: c.den = zone.sum.effDen * exposure; break;
    case CountScale::ShareOfTotal: {
        // The zone's design effect (effective over raw) carried to both counts.
        const double ratio = zone.sum.num > 0 ? zone.sum.effNum / zone.sum.num
                             : zone.sum.den > 0 ? zone.sum.effDen / zone.sum.den
                                                : 1;
        c.num = zone.sum.num * ratio;
        c.den = wholePitch.sum.num * ratio;
        break;
    }
    }
    return c;
}

MetricKind scaledKind(CountScale scale) {
    return scale == CountScale::ShareOfTotal ? MetricKind::Rate : MetricKind::Count;
}

} // namespace pitchloop::model
