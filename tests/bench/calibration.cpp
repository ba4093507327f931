// Calibration study of the target flags (docs/statistics.md, "Calibration"). Run on demand:
//   cmake --build build --target pitchloop_calibration && build/tests/bench/pitchloop_calibration
// Options: --seasons N (default 2000 per scenario and sample size), --csv FILE (every row).
//
// Simulated zone-seasons of 34 matches for one rate metric on a 1×1 grid. Every flag comes
// from the real model code: computeStatus() is called at every match with the target's
// minimum sample set to 0, and the sweep over thresholds and minimum samples reads its pMiss
// and window sample (a zone is off target exactly when sample >= minSample and
// pMiss >= offThreshold, which the program checks against computeStatus() run with the
// default settings). One rule change that is not in the model is prototyped here, marked
// "prototype": a persistence rule (off target only after two consecutive off-target matches).
//
// Randomness: std::mt19937_64 seeded per (sample size, scenario, season) from kSeed, with the
// standard library's poisson and binomial distributions (libstdc++ on Debian 12; another
// library may draw other numbers, so figures could differ slightly elsewhere).
#include "metricspec.h"
#include "stats.h"
#include "status.h"
#include "targets.h"
#include "zones.h"

#include <algorithm>
#include <array>
#include <chrono>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstring>
#include <fstream>
#include <iostream>
#include <limits>
#include <random>
#include <string>
#include <vector>

using namespace pitchloop::model;

namespace {

constexpr std::uint64_t kSeed = 20260817;
constexpr int kMatches = 34;
constexpr double kTarget = 0.45;
constexpr double kDrop = 0.10;
constexpr int kChange = 11;      // 0-based: the drop takes effect from match 12
constexpr int kDetectWithin = 6; // flagged at one of matches 12..17

const std::vector<double> kSizes{4, 8, 19, 40, 60, 80, 120}; // mean items per zone per match
const std::vector<double> kThresholds{0.90, 0.95, 0.975, 0.99, 0.995, 0.997, 0.998, 0.999};
const std::vector<double> kWatchThresholds{0.5, 0.67, 0.8, 0.9};
const std::vector<long> kMinSamples{0, 10, 20, 30, 50, 100};

enum Scenario { Null = 0, DropS = 1, Comfort = 2 };
const char* scenarioName(int s) { return s == Null ? "null" : s == DropS ? "drop" : "comfort"; }

double trueRate(int scenario, int match) {
    switch (scenario) {
    case Null: return kTarget;
    case DropS: return match >= kChange ? kTarget - kDrop : kTarget;
    default: return kTarget + kDrop;
    }
}

std::vector<Window> studyWindows() {
    return {Window{Window::Kind::Match, 1, 0.3}, Window{Window::Kind::LastN, 5, 0.3},
            Window{Window::Kind::LastN, 8, 0.3}, Window{Window::Kind::Season, 0, 0.3},
            Window{Window::Kind::Ewma, 0, 0.2},  Window{Window::Kind::Ewma, 0, 0.3}};
}

/// One simulated season's per-match tallies for a 1×1 grid.
SeasonTallies simulate(const std::string& metricId, double meanItems, int scenario,
                       std::mt19937_64& rng) {
    SeasonTallies s;
    std::poisson_distribution<long> items(meanItems);
    std::vector<MatchTally> tallies;
    for (int m = 0; m < kMatches; ++m) {
        char id[16], date[16];
        std::snprintf(id, sizeof id, "SIM-%02d", m + 1);
        std::snprintf(date, sizeof date, "2026-%02d-%02d", 8 + m / 28, 1 + m % 28);
        s.matchIds.emplace_back(id);
        s.dates.emplace_back(date);
        const long n = items(rng);
        std::binomial_distribution<long> hits(n, trueRate(scenario, m));
        const long x = n > 0 ? hits(rng) : 0;
        tallies.push_back(MatchTally{ZoneTally{x, n}});
    }
    s.byMetric[metricId] = std::move(tallies);
    return s;
}

/// Per match: the window's sample and pMiss (NaN when not judged), from computeStatus().
struct Track {
    std::array<double, kMatches> den{};
    std::array<double, kMatches> pMiss{};
};

struct Outcome {
    double falseFlag = 0;  // null: share of seasons ever off target
    double perLook = 0;    // null: share of judged matches off target
    double judged = 0;     // null: share of matches judged (not too little data)
    double detected = 0;   // drop: share flagged at one of matches 12..17
    double medianDelay = 0; // drop: matches at the lower rate until the first flag (inf: never)
};

/// The flag at each match for one threshold and minimum sample; `persist` = 2 requires two
/// consecutive off-target matches (prototype).
std::array<bool, kMatches> flags(const Track& tr, double threshold, long minSample, int persist) {
    std::array<bool, kMatches> off{};
    for (int m = 0; m < kMatches; ++m)
        off[m] = !std::isnan(tr.pMiss[m]) && tr.den[m] > 0 &&
                 tr.den[m] >= static_cast<double>(minSample) && tr.pMiss[m] >= threshold;
    if (persist <= 1) return off;
    std::array<bool, kMatches> kept{};
    for (int m = persist - 1; m < kMatches; ++m) {
        bool all = true;
        for (int k = 0; k < persist; ++k) all = all && off[m - k];
        kept[m] = all;
    }
    return kept;
}

Outcome evaluate(const std::vector<Track>& nullTracks, const std::vector<Track>& dropTracks,
                 double threshold, long minSample, int persist) {
    Outcome o;
    long looks = 0, lookFlags = 0, judgedLooks = 0;
    for (const auto& tr : nullTracks) {
        const auto f = flags(tr, threshold, minSample, persist);
        bool ever = false;
        for (int m = 0; m < kMatches; ++m) {
            const bool judged = tr.den[m] > 0 && tr.den[m] >= static_cast<double>(minSample);
            ++looks;
            if (judged) ++judgedLooks;
            if (f[m]) ++lookFlags, ever = true;
        }
        if (ever) o.falseFlag += 1;
    }
    o.falseFlag /= static_cast<double>(nullTracks.size());
    o.perLook = judgedLooks ? static_cast<double>(lookFlags) / static_cast<double>(judgedLooks) : 0;
    o.judged = static_cast<double>(judgedLooks) / static_cast<double>(looks);
    std::vector<double> delays;
    for (const auto& tr : dropTracks) {
        const auto f = flags(tr, threshold, minSample, persist);
        double delay = std::numeric_limits<double>::infinity();
        for (int m = kChange; m < kMatches; ++m)
            if (f[m]) {
                delay = m - kChange + 1;
                break;
            }
        if (delay <= kDetectWithin) o.detected += 1;
        delays.push_back(delay);
    }
    o.detected /= static_cast<double>(dropTracks.size());
    std::sort(delays.begin(), delays.end());
    o.medianDelay = delays[delays.size() / 2];
    return o;
}

std::string pct(double v) {
    char buf[16];
    std::snprintf(buf, sizeof buf, "%.1f", 100 * v);
    return buf;
}
std::string delayText(double d) {
    if (std::isinf(d)) return ">23";
    char buf[16];
    std::snprintf(buf, sizeof buf, "%g", d);
    return buf;
}

} // namespace

int main(int argc, char** argv) {
    int seasons = 2000;
    std::string csvPath;
    for (int i = 1; i < argc; ++i) {
        if (!std::strcmp(argv[i], "--seasons") && i + 1 < argc) seasons = std::atoi(argv[++i]);
        else if (!std::strcmp(argv[i], "--csv") && i + 1 < argc) csvPath = argv[++i];
        else {
            std::cerr << "usage: pitchloop_calibration [--seasons N] [--csv FILE]\n";
            return 2;
        }
    }
    if (seasons < 1) {
        std::cerr << "--seasons needs a whole number of at least 1\n";
        return 2;
    }
    const auto start = std::chrono::steady_clock::now();

    const MetricSpec* spec = nullptr;
    for (const auto& m : builtinMetrics())
        if (m.id == "regain_5s") spec = &m;
    if (!spec || spec->kind() != MetricKind::Rate) {
        std::cerr << "regain_5s (a rate) not among the built-in metrics\n";
        return 1;
    }
    const std::vector<MetricSpec> metrics{*spec};
    const ZoneGrid grid = ZoneGrid::equal(1, 1);
    Target target;
    target.key = TargetKey{"First team", "2026-27", spec->id, 1, 1};
    target.direction = Direction::AtLeast;
    target.value = kTarget;
    target.watchMargin = defaultWatchMargin(MetricKind::Rate);
    target.minSample = 0; // the sweep applies the minimum sample itself
    target.author = "calibration";
    target.effectiveFrom = "2026-01-01";
    Target defaultTarget = target;
    defaultTarget.minSample = defaultMinSample(MetricKind::Rate);

    // This older study sweeps fixed thresholds on pure binomial noise (no match-to-match
    // variation, no season budget); the variation study is pitchloop_variation_study.
    FlagSettings defaults{};
    defaults.matchVariation = false;
    defaults.falseFlagsPerSeason = 0;
    const auto windows = studyWindows();
    FlagSettings sweep = defaults;
    sweep.fdr = false;

    std::vector<std::string> windowNames;
    for (const auto& w : windows) windowNames.push_back(w.name());
    const std::size_t nWin = windowNames.size();

    std::printf("Pitchloop calibration: seed %llu, %d seasons per scenario and sample size, %d "
                "matches, target %.2f (at least), drop of %.2f from match %d\n",
                static_cast<unsigned long long>(kSeed), seasons, kMatches, kTarget, kDrop,
                kChange + 1);
    std::printf("Defaults under test: window %s, offThreshold %g, watchThreshold %g, fdr %s, "
                "rate minSample %ld, rate watchMargin %g\n\n",
                defaults.window.name().c_str(), defaults.offThreshold, defaults.watchThreshold,
                defaults.fdr ? "on" : "off", defaultMinSample(MetricKind::Rate),
                defaultWatchMargin(MetricKind::Rate));

    std::ofstream csv;
    if (!csvPath.empty()) {
        csv.open(csvPath);
        csv << "items_per_match,window,off_threshold,min_sample,persist,false_flag_seasons,"
               "false_flag_per_look,judged_share,detected_within_6,median_delay\n";
    }

    // Default-settings check: states straight from computeStatus() with FlagSettings{} and the
    // default minimum sample, per scenario: [size][scenario] counts of each state.
    struct StateCounts {
        long on = 0, watch = 0, off = 0, little = 0;
        long everOff = 0, detected = 0;
        long seasons = 0;
        long dropWindowWarned = 0, dropWindowLooks = 0; // judged matches 12..17: watch or off
    };
    // [size][scenario][watch threshold candidate]
    std::vector<std::array<std::vector<StateCounts>, 3>> defaultCounts(kSizes.size());
    for (auto& a : defaultCounts)
        for (auto& v : a) v.assign(kWatchThresholds.size(), StateCounts{});
    long mismatches = 0, checked = 0;

    // results[size][window][threshold][minSample][persist]
    std::vector<std::vector<std::vector<std::vector<std::array<Outcome, 2>>>>> results(
        kSizes.size(), std::vector<std::vector<std::vector<std::array<Outcome, 2>>>>(
                           nWin, std::vector<std::vector<std::array<Outcome, 2>>>(
                                     kThresholds.size(),
                                     std::vector<std::array<Outcome, 2>>(kMinSamples.size()))));

    const std::size_t defaultWindow = static_cast<std::size_t>(
        std::find(windows.begin(), windows.end(), defaults.window) - windows.begin());
    auto countState = [](StateCounts& c, FlagState state, int scenario, int focal, char& everOff,
                         char& detected) {
        switch (state) {
        case FlagState::OnTarget: ++c.on; break;
        case FlagState::CloseToLine:
        case FlagState::LikelyOff: ++c.watch; break;
        case FlagState::OffTarget: ++c.off; break;
        default: ++c.little; break;
        }
        const bool afterChange = focal >= kChange && focal < kChange + kDetectWithin;
        if (state == FlagState::OffTarget) {
            everOff = 1;
            if (afterChange) detected = 1;
        }
        if (scenario == DropS && afterChange && state != FlagState::TooLittleData) {
            ++c.dropWindowLooks;
            if (state == FlagState::OffTarget || state == FlagState::LikelyOff ||
                state == FlagState::CloseToLine)
                ++c.dropWindowWarned;
        }
    };

    for (std::size_t si = 0; si < kSizes.size(); ++si) {
        std::array<std::vector<std::vector<Track>>, 2> tracks; // [scenario][window][season]
        for (auto& t : tracks) t.assign(nWin, std::vector<Track>(static_cast<std::size_t>(seasons)));
        for (int scenario = 0; scenario < 3; ++scenario) {
            for (int season = 0; season < seasons; ++season) {
                std::seed_seq seq{static_cast<std::uint32_t>(kSeed), static_cast<std::uint32_t>(kSeed >> 32),
                                  static_cast<std::uint32_t>(si), static_cast<std::uint32_t>(scenario),
                                  static_cast<std::uint32_t>(season)};
                std::mt19937_64 rng(seq);
                const SeasonTallies st = simulate(spec->id, kSizes[si], scenario, rng);
                auto& counts = defaultCounts[si][static_cast<std::size_t>(scenario)];
                for (auto& c : counts) ++c.seasons;
                std::vector<char> everOff(kWatchThresholds.size(), 0), detected(kWatchThresholds.size(), 0);
                for (int focal = 0; focal < kMatches; ++focal) {
                    if (scenario != Comfort) {
                        const auto out = computeStatus(st, static_cast<std::size_t>(focal), metrics,
                                                       {target}, grid, windows, sweep);
                        for (const auto& zs : out) {
                            if (zs.band != 1 || zs.lane != 1) continue;
                            const auto w = static_cast<std::size_t>(
                                std::find(windows.begin(), windows.end(), zs.window) - windows.begin());
                            Track& tr = tracks[static_cast<std::size_t>(scenario)][w]
                                              [static_cast<std::size_t>(season)];
                            tr.den[static_cast<std::size_t>(focal)] = zs.sum.den;
                            tr.pMiss[static_cast<std::size_t>(focal)] = zs.pMiss;
                        }
                    }
                    // The defaults, exactly as a debrief would judge this zone (and with other
                    // watch thresholds).
                    for (std::size_t c = 0; c < kWatchThresholds.size(); ++c) {
                        FlagSettings judging = defaults;
                        judging.watchThreshold = kWatchThresholds[c];
                        const auto judged = computeStatus(st, static_cast<std::size_t>(focal), metrics,
                                                          {defaultTarget}, grid, {defaults.window},
                                                          judging);
                        for (const auto& zs : judged) {
                            if (zs.band != 1 || zs.lane != 1) continue;
                            countState(counts[c], zs.state, scenario, focal, everOff[c], detected[c]);
                            if (kWatchThresholds[c] == defaults.watchThreshold && scenario != Comfort &&
                                defaultWindow < windows.size() && !defaults.fdr) {
                                // The sweep's reading of the flag rule against the real state.
                                const Track& tr = tracks[static_cast<std::size_t>(scenario)][defaultWindow]
                                                        [static_cast<std::size_t>(season)];
                                const double den = tr.den[static_cast<std::size_t>(focal)];
                                const double p = tr.pMiss[static_cast<std::size_t>(focal)];
                                const bool sweepOff = den > 0 &&
                                                      den >= static_cast<double>(defaultTarget.minSample) &&
                                                      !std::isnan(p) && p >= defaults.offThreshold;
                                ++checked;
                                if (sweepOff != (zs.state == FlagState::OffTarget)) ++mismatches;
                            }
                        }
                    }
                }
                for (std::size_t wi = 0; wi < kWatchThresholds.size(); ++wi) {
                    if (everOff[wi]) ++counts[wi].everOff;
                    if (detected[wi]) ++counts[wi].detected;
                }
            }
        }
        for (std::size_t w = 0; w < nWin; ++w)
            for (std::size_t ti = 0; ti < kThresholds.size(); ++ti)
                for (std::size_t mi = 0; mi < kMinSamples.size(); ++mi)
                    for (int persist = 1; persist <= 2; ++persist) {
                        const Outcome o = evaluate(tracks[0][w], tracks[1][w], kThresholds[ti],
                                                   kMinSamples[mi], persist);
                        results[si][w][ti][mi][static_cast<std::size_t>(persist - 1)] = o;
                        if (csv)
                            csv << kSizes[si] << ',' << windowNames[w] << ',' << kThresholds[ti] << ','
                                << kMinSamples[mi] << ',' << persist << ',' << o.falseFlag << ','
                                << o.perLook << ',' << o.judged << ',' << o.detected << ','
                                << (std::isinf(o.medianDelay) ? -1 : o.medianDelay) << '\n';
                    }
        std::fprintf(stderr, "items %g done after %.0f s\n", kSizes[si],
                     std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count());
    }

    auto idx = [](const auto& v, auto x) {
        return static_cast<std::size_t>(std::find(v.begin(), v.end(), x) - v.begin());
    };
    auto table = [&](const char* title, long minSample, int persist,
                     const std::vector<std::size_t>& wins, const std::vector<double>& ths) {
        std::printf("%s (minSample %ld%s)\n", title, minSample, persist > 1 ? ", persistence 2" : "");
        std::printf("cells: false-flag seasons %% / detected within 6 %% / median delay\n");
        std::printf("%-12s %-6s", "window", "thresh");
        for (double s : kSizes) std::printf(" | %-19s", (std::to_string(static_cast<int>(s)) + " a match").c_str());
        std::printf("\n");
        const std::size_t mi = idx(kMinSamples, minSample);
        for (std::size_t w : wins)
            for (double th : ths) {
                const std::size_t ti = idx(kThresholds, th);
                std::printf("%-12s %-6g", windowNames[w].c_str(), th);
                for (std::size_t si = 0; si < kSizes.size(); ++si) {
                    const Outcome& o = results[si][w][ti][mi][static_cast<std::size_t>(persist - 1)];
                    const std::string cell =
                        pct(o.falseFlag) + " / " + pct(o.detected) + " / " + delayText(o.medianDelay);
                    std::printf(" | %-19s", cell.c_str());
                }
                std::printf("\n");
            }
        std::printf("\n");
    };

    std::vector<std::size_t> allWindows;
    for (std::size_t w = 0; w < windows.size(); ++w) allWindows.push_back(w);
    table("Windows × thresholds", 0, 1, allWindows, kThresholds);
    if (const long ms = defaultMinSample(MetricKind::Rate);
        ms != 0 && idx(kMinSamples, ms) < kMinSamples.size())
        table("Windows × thresholds", ms, 1, allWindows, kThresholds);

    // Minimum sample, for the default window and threshold.
    {
        const std::size_t w = idx(windows, defaults.window);
        const std::size_t ti = idx(kThresholds, defaults.offThreshold);
        if (w < windows.size() && ti < kThresholds.size()) {
            std::printf("Minimum sample, window %s, threshold %g\n", windowNames[w].c_str(),
                        defaults.offThreshold);
            std::printf("cells: false-flag seasons %% / detected within 6 %% / share of matches judged %%\n");
            for (std::size_t mi = 0; mi < kMinSamples.size(); ++mi) {
                std::printf("minSample %-4ld", kMinSamples[mi]);
                for (std::size_t si = 0; si < kSizes.size(); ++si) {
                    const Outcome& o = results[si][w][ti][mi][0];
                    const std::string cell = pct(o.falseFlag) + " / " + pct(o.detected) + " / " + pct(o.judged);
                    std::printf(" | %-19s", cell.c_str());
                }
                std::printf("\n");
            }
            std::printf("\n");
        }
    }

    // Prototype.
    table("Prototype: off target only after two consecutive off-target matches",
          defaultMinSample(MetricKind::Rate), 2, allWindows, kThresholds);

    // Summaries at the default minimum sample.
    {
        const long ms = defaultMinSample(MetricKind::Rate);
        const std::size_t mi = idx(kMinSamples, ms);
        struct Rule {
            std::size_t window;
            int persist;
        };
        std::vector<Rule> rules;
        for (std::size_t w = 0; w < nWin; ++w) rules.push_back({w, 1});
        for (std::size_t w = 0; w < nWin; ++w) rules.push_back({w, 2});
        auto ruleName = [&](const Rule& r) {
            return windowNames[r.window] + (r.persist > 1 ? " x2" : "");
        };
        if (mi < kMinSamples.size()) {
            std::printf("Summary A: false-flag seasons %%, lowest-highest over the sample sizes "
                        "(minSample %ld; x2 = two consecutive off-target matches, prototype)\n",
                        ms);
            std::printf("%-16s", "rule");
            for (double th : kThresholds) std::printf(" | %-11g", th);
            std::printf("\n");
            for (const Rule& r : rules) {
                std::printf("%-16s", ruleName(r).c_str());
                for (std::size_t ti = 0; ti < kThresholds.size(); ++ti) {
                    double lo = 1, hi = 0;
                    for (std::size_t si = 0; si < kSizes.size(); ++si) {
                        const double f = results[si][r.window][ti][mi][static_cast<std::size_t>(r.persist - 1)].falseFlag;
                        lo = std::min(lo, f);
                        hi = std::max(hi, f);
                    }
                    std::printf(" | %-11s", (pct(lo) + "-" + pct(hi)).c_str());
                }
                std::printf("\n");
            }
            std::printf("\nSummary B: each rule at its lowest threshold with false flags <= 5 %% at "
                        "every sample size; cells: detected within 6 %% / median delay\n");
            std::printf("%-16s %-6s %-7s", "rule", "thresh", "max FF");
            for (double sz : kSizes) std::printf(" | %-11s", (std::to_string(static_cast<int>(sz)) + " a match").c_str());
            std::printf("\n");
            for (const Rule& r : rules) {
                for (std::size_t ti = 0; ti < kThresholds.size(); ++ti) {
                    double hi = 0;
                    for (std::size_t si = 0; si < kSizes.size(); ++si)
                        hi = std::max(hi, results[si][r.window][ti][mi][static_cast<std::size_t>(r.persist - 1)].falseFlag);
                    if (hi > 0.05) continue;
                    std::printf("%-16s %-6g %-7s", ruleName(r).c_str(), kThresholds[ti], pct(hi).c_str());
                    for (std::size_t si = 0; si < kSizes.size(); ++si) {
                        const Outcome& o = results[si][r.window][ti][mi][static_cast<std::size_t>(r.persist - 1)];
                        std::printf(" | %-11s", (pct(o.detected) + " / " + delayText(o.medianDelay)).c_str());
                    }
                    std::printf("\n");
                    break;
                }
            }
            std::printf("\n");
        }
        std::printf("90 %% Wilson interval at an observed 45 %% (what a window of N chances can "
                    "tell):\n");
        for (double n : {10.0, 20.0, 30.0, 40.0, 60.0, 100.0}) {
            const auto iv = stats::wilson(0.45 * n, n, 0.90);
            std::printf("  N %-4g %.3f-%.3f (half-width %.3f)\n", n, iv.low, iv.high,
                        (iv.high - iv.low) / 2);
        }
        std::printf("\n");
    }

    // The defaults straight from computeStatus().
    std::printf("Defaults as judged by computeStatus() (window %s, offThreshold %g, watchThreshold "
                "%g, minSample %ld)\n",
                defaults.window.name().c_str(), defaults.offThreshold, defaults.watchThreshold,
                defaultMinSample(MetricKind::Rate));
    std::printf("%-8s %-8s %8s %8s %8s %8s %8s %10s %12s\n", "items", "truth", "on %", "watch %",
                "off %", "little %", "ever off", "det. 6", "warn 12-17");
    const std::size_t dw = idx(kWatchThresholds, defaults.watchThreshold);
    for (std::size_t si = 0; si < kSizes.size() && dw < kWatchThresholds.size(); ++si)
        for (int sc = 0; sc < 3; ++sc) {
            const StateCounts& c = defaultCounts[si][static_cast<std::size_t>(sc)][dw];
            const double looks = static_cast<double>(c.on + c.watch + c.off + c.little);
            std::printf("%-8g %-8s %8s %8s %8s %8s %8s %10s %12s\n", kSizes[si], scenarioName(sc),
                        pct(c.on / looks).c_str(), pct(c.watch / looks).c_str(),
                        pct(c.off / looks).c_str(), pct(c.little / looks).c_str(),
                        pct(static_cast<double>(c.everOff) / c.seasons).c_str(),
                        sc == DropS ? pct(static_cast<double>(c.detected) / c.seasons).c_str() : "-",
                        sc == DropS ? pct(static_cast<double>(c.dropWindowWarned) / c.dropWindowLooks).c_str()
                                    : "-");
        }
    std::printf("\nWatch threshold, with the default window, offThreshold and minSample; shares of "
                "judged matches (not too little data)\n");
    std::printf("cells: comfortable zone (truth %.2f) shown watch or off %% / on-target zone (truth "
                "%.2f) watch or off %% / after the drop (matches %d-%d) watch or off %%\n",
                kTarget + kDrop, kTarget, kChange + 1, kChange + kDetectWithin);
    for (std::size_t wi = 0; wi < kWatchThresholds.size(); ++wi) {
        std::printf("watch %-5g", kWatchThresholds[wi]);
        for (std::size_t si = 0; si < kSizes.size(); ++si) {
            auto warned = [&](int sc) {
                const StateCounts& c = defaultCounts[si][static_cast<std::size_t>(sc)][wi];
                const double judgedLooks = static_cast<double>(c.on + c.watch + c.off);
                return judgedLooks > 0 ? static_cast<double>(c.watch + c.off) / judgedLooks : 0.0;
            };
            const StateCounts& d = defaultCounts[si][DropS][wi];
            const double dropShare =
                d.dropWindowLooks ? static_cast<double>(d.dropWindowWarned) / d.dropWindowLooks : 0.0;
            const std::string cell = pct(warned(Comfort)) + " / " + pct(warned(Null)) + " / " + pct(dropShare);
            std::printf(" | %-19s", cell.c_str());
        }
        std::printf("\n");
    }
    std::printf("\nSweep vs computeStatus() flag check: %ld of %ld match judgements differ\n",
                mismatches, checked);
    std::printf("Run time %.0f s\n",
                std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count());
    return mismatches == 0 ? 0 : 1;
}
