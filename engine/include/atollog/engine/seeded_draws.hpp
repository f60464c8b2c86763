#pragma once
// Reproducible random draws for Monte Carlo: std::mt19937_64 raw output through our own
// transforms, because the standard distributions may give different numbers on different
// standard libraries. Normals by inversion with Boost.Math's quantile.
#include <cstdint>
#include <random>

namespace atollog {

class SeededDraws {
  public:
    explicit SeededDraws(std::uint64_t seed) : engine_(seed) {}
    /// Uniform in (0, 1): the top 53 bits of one engine output times 2^-53; a zero (probability
    /// 2^-53) is drawn again so that a quantile of it stays finite.
    double uniformOpen();
    /// Normal(mean, sd) by inversion of uniformOpen(). Throws std::invalid_argument unless
    /// sd >= 0 and both are finite (sd 0 returns the mean: a quantity held fixed).
    double normal(double mean, double sd);

  private:
    std::mt19937_64 engine_;
};

/// A seed for stream `index` of a run seeded with `run_seed` (splitmix64 of their mix), so each
/// date's draws depend only on the run seed and its own row, not on the other rows.
std::uint64_t streamSeed(std::uint64_t run_seed, std::uint64_t index);

} // namespace atollog
