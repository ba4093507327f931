// The calibration study with match-to-match variation (docs/statistics.md, "Calibration with
// variation"): seeded seasons of a 30-zone board judged by the model's own code, plus two
// yardsticks computed here — a test that knows when the drop happened and looks once, and a
// CUSUM on the likelihood ratio with the variation known. Run on demand (about 75 s):
//
//     build/tests/bench/pitchloop_variation_study
//
// The fast CI version of the same checks is tests/model/calibration_test.cpp.

#define CATCH_CONFIG_RUNNER
#include "variation_sim.h"

#include <catch2/catch.hpp>

#include <boost/math/distributions/normal.hpp>

#include <cstdio>

using namespace pitchloop::model;
using namespace pitchloop::testutil::sim;

namespace {

constexpr int kSeasons = 200;
constexpr int kDropAt = 11; // match 12, 0-based
const int kDropped[] = {2, 8, 14, 20, 26};

FlagSettings withWindow(const Window& w) {
    FlagSettings s;
    s.window = w;
    return s;
}

double everOff(double chances, double sd, const Window& w, std::uint64_t seed) {
    Board b;
    b.chances.assign(30, chances);
    b.sd = sd;
    const auto targets = boardTargets(b.target);
    std::mt19937_64 rng(seed);
    int flagged = 0, total = 0;
    for (int k = 0; k < kSeasons; ++k) {
        for (int f : firstOff(season(b, rng), targets, withWindow(w), b.matches)) {
            flagged += f >= 0;
            ++total;
        }
    }
    return 100.0 * flagged / total;
}

struct Detection {
    double within6 = 0;  ///< % of dropped zones flagged at matches 12–17
    int medianDelay = 0; ///< matches at the lower rate up to the first flag (34: never)
    double early = 0;    ///< % flagged before the drop (false flags)
};

Detection detect(double chances, double sd, const Window& w, std::uint64_t seed) {
    Board b;
    b.chances.assign(30, chances);
    b.sd = sd;
    b.dropAt.assign(30, -1);
    for (int z : kDropped) b.dropAt[static_cast<std::size_t>(z)] = kDropAt;
    const auto targets = boardTargets(b.target);
    std::mt19937_64 rng(seed);
    std::vector<int> delays;
    int within = 0, early = 0;
    for (int k = 0; k < kSeasons; ++k) {
        const auto first = firstOff(season(b, rng), targets, withWindow(w), b.matches);
        for (int z : kDropped) {
            const int f = first[static_cast<std::size_t>(z)];
            early += f >= 0 && f < kDropAt;
            within += f >= kDropAt && f < kDropAt + 6;
            delays.push_back(f >= kDropAt ? f - kDropAt + 1 : 99);
        }
    }
    std::sort(delays.begin(), delays.end());
    const int median = delays[delays.size() / 2];
    const double n = static_cast<double>(delays.size());
    return {100.0 * within / n, median > b.matches - kDropAt ? 99 : median, 100.0 * early / n};
}

/// The yardstick: knowing the drop began at match 12, one test of matches 12–17 against the
/// target at 5 % (one-sided), with the true variation: z = (x/n − T)/√(T(1 − T)/n_eff).
double oracle(double chances, double sd, std::uint64_t seed) {
    Board b;
    b.chances.assign(30, chances);
    b.sd = sd;
    b.matches = kDropAt + 6;
    b.dropAt.assign(30, -1);
    for (int z : kDropped) b.dropAt[static_cast<std::size_t>(z)] = kDropAt;
    const double rho = sd * sd / (b.target * (1 - b.target));
    const double zCrit = boost::math::quantile(boost::math::normal_distribution<double>(), 0.95);
    std::mt19937_64 rng(seed);
    int caught = 0, total = 0;
    for (int k = 0; k < kSeasons; ++k) {
        const auto s = season(b, rng);
        for (int z : kDropped) {
            double x = 0, n = 0, nd = 0;
            for (int m = kDropAt; m < b.matches; ++m) {
                const auto& t = s.byMetric.at("regain_5s")[static_cast<std::size_t>(m)][static_cast<std::size_t>(z)];
                x += static_cast<double>(t.num);
                n += static_cast<double>(t.den);
                nd += static_cast<double>(t.den) * designEffect(MetricKind::Rate, rho, static_cast<double>(t.den), 0);
            }
            ++total;
            if (n <= 0) continue;
            const double effN = n * n / nd;
            caught += (x / n - b.target) / std::sqrt(b.target * (1 - b.target) / effN) < -zCrit;
        }
    }
    return 100.0 * caught / total;
}

/// A CUSUM on the binomial log likelihood ratio of 0.35 against 0.45, each match's term divided
/// by its design effect (the variation known), S = max(0, S + llr); flagged when S ≥ h.
/// Returns {false flags % of on-target zone-seasons (34 matches), % of drops caught in 6}.
std::pair<double, double> cusum(double chances, double sd, double h, std::uint64_t seed) {
    const double rho = sd * sd / (0.45 * 0.55);
    const double a = std::log(0.35 / 0.45), c = std::log(0.65 / 0.55);
    auto run = [&](const SeasonTallies& s, int zone, int upTo) {
        double S = 0;
        for (int m = 0; m < upTo; ++m) {
            const auto& t = s.byMetric.at("regain_5s")[static_cast<std::size_t>(m)][static_cast<std::size_t>(zone)];
            if (t.den <= 0) continue;
            const double d = static_cast<double>(t.den);
            S = std::max(0.0, S + (static_cast<double>(t.num) * a + (d - static_cast<double>(t.num)) * c) /
                                      designEffect(MetricKind::Rate, rho, d, 0));
            if (S >= h) return m;
        }
        return -1;
    };
    Board on;
    on.chances.assign(30, chances);
    on.sd = sd;
    Board drop = on;
    drop.matches = kDropAt + 6;
    drop.dropAt.assign(30, -1);
    for (int z : kDropped) drop.dropAt[static_cast<std::size_t>(z)] = kDropAt;
    std::mt19937_64 rng(seed);
    int off = 0, offTotal = 0, caught = 0, dropTotal = 0;
    for (int k = 0; k < kSeasons; ++k) {
        const auto s = season(on, rng);
        for (int z = 0; z < 30; ++z, ++offTotal) off += run(s, z, on.matches) >= 0;
        const auto d = season(drop, rng);
        for (int z : kDropped) {
            const int f = run(d, z, drop.matches);
            caught += f >= kDropAt;
            ++dropTotal;
        }
    }
    return {100.0 * off / offTotal, 100.0 * caught / dropTotal};
}

double falseClaims(double sd, std::uint64_t seed) {
    Board b;
    b.chances = spreadChances();
    b.sd = sd;
    b.matches = 13;
    const auto targets = boardTargets(b.target);
    std::mt19937_64 rng(seed);
    int claims = 0;
    const int n = 5 * kSeasons;
    for (int k = 0; k < n; ++k) claims += reviewClaims(season(b, rng), targets, FlagSettings{}, 7, 5);
    return 100.0 * claims / n;
}

} // namespace

int main() {
    // Catch's session is started only for the helpers' checks (builtin() fails through it).
    Catch::Session session;
    const Window last3{Window::Kind::LastN, 3, 0.3}, last5{Window::Kind::LastN, 5, 0.3},
        last8{Window::Kind::LastN, 8, 0.3}, ewma{Window::Kind::Ewma, 0, 0.3},
        seasonW{Window::Kind::Season, 0, 0.3};
    const std::vector<std::pair<const char*, Window>> windows{
        {"last3", last3}, {"last5", last5}, {"last8", last8}, {"ewma0.3", ewma}, {"season", seasonW}};
    const double chances[] = {4, 8, 15, 40};

    std::printf("Default settings (season budget 1 over 30 targets: off at P(miss) >= %.6f),\n"
                "a 30-zone board, target 45 %%, %d seasons of 34 matches per cell.\n\n",
                offThresholdFor(FlagSettings{}, 30), kSeasons);

    std::printf("False flags: %% of on-target zone-seasons ever flagged off, last 5\n");
    std::printf("%-10s %8s %8s %8s\n", "chances", "SD 0", "SD 0.05", "SD 0.08");
    for (double c : chances) {
        std::printf("%-10g", c);
        for (double sd : {0.0, 0.05, 0.08}) std::printf(" %7.1f%%", everOff(c, sd, last5, 11));
        std::printf("\n");
    }

    std::printf("\nFalse flags by window, SD 0.08 (%% of on-target zone-seasons)\n%-10s", "chances");
    for (const auto& [name, w] : windows) std::printf(" %8s", name);
    std::printf("\n");
    for (double c : chances) {
        std::printf("%-10g", c);
        for (const auto& [name, w] : windows) std::printf(" %7.1f%%", everOff(c, 0.08, w, 21));
        std::printf("\n");
    }

    std::printf("\nTen-point drop from match 12, SD 0.08: caught within 6 matches %% / median delay "
                "(matches at the lower rate; 99 = not by match 34)\n%-10s", "chances");
    for (const auto& [name, w] : windows) std::printf(" %13s", name);
    std::printf(" %13s\n", "oracle (once)");
    for (double c : {4.0, 8.0, 15.0, 40.0, 80.0}) {
        std::printf("%-10g", c);
        for (const auto& [name, w] : windows) {
            const Detection d = detect(c, 0.08, w, 31);
            std::printf("   %5.1f%% / %2d", d.within6, d.medianDelay);
        }
        std::printf("   %10.1f%%\n", oracle(c, 0.08, 41));
    }

    std::printf("\nCUSUM on the likelihood ratio (0.35 vs 0.45, variation known), 15 chances a match, SD 0.08\n");
    std::printf("%-6s %22s %22s\n", "h", "false flags (season)", "drops caught in 6");
    for (double h : {2.0, 3.0, 4.0, 5.0, 6.0}) {
        const auto [fa, det] = cusum(15, 0.08, h, 51);
        std::printf("%-6g %21.1f%% %21.1f%%\n", h, fa, det);
    }

    std::printf("\nReviews of the worst-looking unchanged zone (focus after match 8, reviewed after 13) "
                "claiming an improvement, 4-40 chances a match, %d seasons\n", 5 * kSeasons);
    for (double sd : {0.0, 0.05, 0.08}) std::printf("SD %-5g %6.1f%%\n", sd, falseClaims(sd, 61));
    return 0;
}
