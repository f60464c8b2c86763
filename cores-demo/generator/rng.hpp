#pragma once
// The demo's only source of randomness. Distributions are written here on top of the raw 64-bit
// output of std::mt19937_64 (whose sequence the standard fixes), because std::uniform_real_
// distribution and std::normal_distribution are not specified bit for bit: another standard
// library would give another demo from the same seed.
#include <cstdint>
#include <random>

namespace atollog::demo {

class DemoRng {
public:
    explicit DemoRng(std::uint64_t seed) : engine_(seed) {}

    /// Uniform in [0, 1) from the top 53 bits of one draw (every double is exactly reachable).
    double uniform01();
    double uniform(double lo, double hi);
    /// Box-Muller with no cached second value, so each call consumes exactly two draws.
    double normal(double mean, double sd);
    /// Uniform integer in [lo, hi] inclusive.
    int integer(int lo, int hi);
    bool chance(double probability);

private:
    std::mt19937_64 engine_;
};

} // namespace atollog::demo
