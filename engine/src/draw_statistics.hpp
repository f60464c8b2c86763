#pragma once
// Private helpers for summarising Monte Carlo draws and for turning raw std::mt19937_64 output
// into uniform and normal variates portably (the standard distributions are not required to give
// the same numbers on every library).
#include <cstdint>
#include <span>
#include <vector>

namespace atollog::draw_stats {

/// Uniform on [0, 1) from the top 53 bits of one 64-bit word.
inline double unitUniform(std::uint64_t word) { return static_cast<double>(word >> 11) * 0x1.0p-53; }

/// Standard normal variate by the inverse CDF (Boost.Math quantile) of a uniform on (0, 1).
/// Takes the next word of the generator; a zero uniform (probability 2^-53) is redrawn.
template <class Engine> double standardNormal(Engine& engine);

/// Empirical quantile of sorted values, linear between order statistics (Hyndman & Fan 1996,
/// type 7). sorted must not be empty; p in [0, 1].
double quantileOfSorted(std::span<const double> sorted, double p);

double meanOf(std::span<const double> values);
/// Sample standard deviation (n - 1); 0 for fewer than 2 values.
double sdOf(std::span<const double> values, double mean);

} // namespace atollog::draw_stats

#include <boost/math/distributions/normal.hpp>

template <class Engine> double atollog::draw_stats::standardNormal(Engine& engine) {
    double u = 0;
    while (u == 0)
        u = unitUniform(engine());
    return boost::math::quantile(boost::math::normal_distribution<double>(0.0, 1.0), u);
}
