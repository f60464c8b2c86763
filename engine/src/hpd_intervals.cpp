#include "atollog/engine/hpd_intervals.hpp"

#include <boost/math/distributions/normal.hpp>

#include <algorithm>
#include <numeric>
#include <stdexcept>
#include <string>

namespace atollog {

std::vector<AgeInterval> highestDensityIntervals(const AgeDistribution& age, double level) {
    if (!(level > 0 && level < 1))
        throw std::invalid_argument("highestDensityIntervals: level must lie in (0, 1), got " +
                                    std::to_string(level));
    if (age.isNormal()) {
        // Symmetric and unimodal: the central interval is the highest-density one.
        // From the upper tail: 0.5 + 0.5 level rounds to 1 for a level within 1e-16 of 1, and
        // the quantile at 1 overflows (Boost throws std::overflow_error).
        const double z = boost::math::quantile(
            boost::math::complement(boost::math::normal(0.0, 1.0), 0.5 - 0.5 * level));
        return {{age.mean_ma() - z * age.sd_ma(), age.mean_ma() + z * age.sd_ma(), level}};
    }
    const auto& edges = age.grid_ages_ma();
    const auto& cdf = age.grid_cdf();
    const std::size_t bins = edges.size() - 1;
    std::vector<double> mass(bins), density(bins);
    for (std::size_t i = 0; i < bins; ++i) {
        mass[i] = cdf[i + 1] - cdf[i];
        density[i] = mass[i] / (edges[i + 1] - edges[i]);
    }
    std::vector<std::size_t> order(bins);
    std::iota(order.begin(), order.end(), 0);
    // Stable: on a plateau of equal density, younger bins first, so the result is reproducible.
    std::stable_sort(order.begin(), order.end(),
                     [&](std::size_t a, std::size_t b) { return density[a] > density[b]; });
    std::vector<bool> taken(bins, false);
    double held = 0;
    for (std::size_t i : order) {
        if (held >= level) break;
        if (mass[i] <= 0) break;
        taken[i] = true;
        held += mass[i];
    }
    std::vector<AgeInterval> out;
    for (std::size_t i = 0; i < bins; ++i) {
        if (!taken[i]) continue;
        if (!out.empty() && i > 0 && taken[i - 1]) {
            out.back().old_ma = edges[i + 1];
            out.back().probability += mass[i];
        } else {
            out.push_back({edges[i], edges[i + 1], mass[i]});
        }
    }
    return out;
}

} // namespace atollog
