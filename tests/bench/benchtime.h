#pragma once
// The benchmarks' shared clock helpers: milliseconds of a steady-clock span, and the median.

#include <algorithm>
#include <chrono>
#include <vector>

namespace pitchloop::bench {

using Clock = std::chrono::steady_clock;

inline double ms(Clock::duration d) { return std::chrono::duration<double, std::milli>(d).count(); }

inline double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    return v.size() % 2 ? v[v.size() / 2] : (v[v.size() / 2 - 1] + v[v.size() / 2]) / 2;
}

} // namespace pitchloop::bench
