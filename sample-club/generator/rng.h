#pragma once

#include <array>
#include <cstddef>
#include <cstdint>
#include <span>
#include <utility>

namespace pitchloop::demo {

// One splitmix64 step; seeds xoshiro and derives independent per-match streams.
constexpr std::uint64_t splitmix64(std::uint64_t& state) {
    state += 0x9E3779B97F4A7C15ull;
    std::uint64_t z = state;
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ull;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBull;
    return z ^ (z >> 31);
}

// e^-x for x >= 0 using only + - * /, so results never depend on the platform's libm.
constexpr double expNeg(double x) {
    int halvings = 0;
    while (x > 0.25) {
        x /= 2.0;
        ++halvings;
    }
    double term = 1.0;
    double sum = 1.0;
    for (int k = 1; k < 18; ++k) {
        term *= -x / k;
        sum += term;
    }
    for (int i = 0; i < halvings; ++i) {
        sum *= sum;
    }
    return sum;
}

// xoshiro256** with hand-written distributions: the same seed gives the same numbers everywhere.
class Rng {
  public:
    explicit Rng(std::uint64_t seed) {
        std::uint64_t sm = seed;
        for (auto& word : m_state) {
            word = splitmix64(sm);
        }
    }

    std::uint64_t next() {
        const std::uint64_t result = rotl(m_state[1] * 5, 7) * 9;
        const std::uint64_t t = m_state[1] << 17;
        m_state[2] ^= m_state[0];
        m_state[3] ^= m_state[1];
        m_state[1] ^= m_state[2];
        m_state[0] ^= m_state[3];
        m_state[2] ^= t;
        m_state[3] = rotl(m_state[3], 45);
        return result;
    }

    // Uniform in [0, 1) with 53 random bits.
    double uniform() { return static_cast<double>(next() >> 11) * 0x1.0p-53; }

    double uniform(double lo, double hi) { return lo + (hi - lo) * uniform(); }

    // Uniform integer in [lo, hi], both inclusive.
    int uniformInt(int lo, int hi) {
        const auto span = static_cast<std::uint64_t>(hi - lo + 1);
        return lo + static_cast<int>(((next() >> 32) * span) >> 32);
    }

    bool chance(double p) { return uniform() < p; }

    // Irwin-Hall sum of twelve uniforms: close enough to normal, bounded at +-6 sd, and
    // arithmetic-only (Box-Muller would pull in log/cos).
    double normal(double mean, double sd) {
        double sum = 0.0;
        for (int i = 0; i < 12; ++i) {
            sum += uniform();
        }
        return mean + sd * (sum - 6.0);
    }

    // Knuth's multiplication method; fine for the small means used here.
    int poisson(double lambda) {
        const double limit = expNeg(lambda);
        int k = 0;
        double product = uniform();
        while (product > limit) {
            ++k;
            product *= uniform();
        }
        return k;
    }

    // Index drawn with probability proportional to weights[i]; weights must not all be zero.
    std::size_t weighted(std::span<const double> weights) {
        double total = 0.0;
        for (double w : weights) {
            total += w;
        }
        double pick = uniform() * total;
        for (std::size_t i = 0; i < weights.size(); ++i) {
            if (pick < weights[i]) {
                return i;
            }
            pick -= weights[i];
        }
        for (std::size_t i = weights.size(); i > 0; --i) {
            if (weights[i - 1] > 0.0) {
                return i - 1;
            }
        }
        return 0;
    }

    template <typename T> void shuffle(std::span<T> items) {
        for (std::size_t i = items.size(); i > 1; --i) {
            const auto j = static_cast<std::size_t>(uniformInt(0, static_cast<int>(i) - 1));
            std::swap(items[i - 1], items[j]);
        }
    }

  private:
    static constexpr std::uint64_t rotl(std::uint64_t v, int k) {
        return (v << k) | (v >> (64 - k));
    }

    std::array<std::uint64_t, 4> m_state{};
};

} // namespace pitchloop::demo
