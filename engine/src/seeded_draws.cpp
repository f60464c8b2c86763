#include "atollog/engine/seeded_draws.hpp"

#include <boost/math/distributions/normal.hpp>

#include <cmath>
#include <stdexcept>

namespace atollog {

double SeededDraws::uniformOpen() {
    for (;;) {
        const double u = static_cast<double>(engine_() >> 11) * 0x1.0p-53;
        if (u > 0) return u;
    }
}

double SeededDraws::normal(double mean, double sd) {
    if (!std::isfinite(mean) || !std::isfinite(sd) || sd < 0)
        throw std::invalid_argument("SeededDraws::normal: mean and sd must be finite, sd >= 0");
    const double u = uniformOpen();
    if (sd == 0) return mean;
    return mean + sd * boost::math::quantile(boost::math::normal(0.0, 1.0), u);
}

std::uint64_t streamSeed(std::uint64_t run_seed, std::uint64_t index) {
    // splitmix64 (Steele, Lea & Flood 2014) finaliser on seed + golden-ratio step x (index + 1).
    std::uint64_t z = run_seed + 0x9E3779B97F4A7C15ULL * (index + 1);
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
    return z ^ (z >> 31);
}

} // namespace atollog
