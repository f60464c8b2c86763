// AgeDistribution: a normal through Boost.Math, or a gridded density.
//
// Gridded form. n ages a_0 < ... < a_{n-1} with densities d_i become n bins whose edges are the
// midpoints of neighbouring ages; the outer edges lie half a spacing beyond the end ages
// (a_0 - (a_1 - a_0)/2 and a_{n-1} + (a_{n-1} - a_{n-2})/2), so every age is the centre of its
// own bin and an equally spaced grid gives bins of equal width. The density is constant inside
// a bin (mass d_i x width_i), hence the CDF is piecewise linear between edges and the quantile
// is exact by interpolation. Mean and sd are the moments of that piecewise-constant density, not
// of the point values, so they agree with cdf() and quantile().
#include "atollog/engine/age_distribution.hpp"

#include <boost/math/distributions/normal.hpp>

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog {
namespace {

constexpr double kNormalSupportSd = 8.0; // beyond 8 sd the normal's tail mass is below 1e-15

std::string number(double v) { return std::to_string(v); }

} // namespace

AgeDistribution AgeDistribution::normal(double mean_ma, double sd_ma) {
    if (!std::isfinite(mean_ma))
        throw std::invalid_argument("AgeDistribution::normal: mean_ma is not finite");
    if (!std::isfinite(sd_ma) || !(sd_ma > 0))
        throw std::invalid_argument("AgeDistribution::normal: sd_ma must be finite and > 0, got " +
                                    number(sd_ma));
    AgeDistribution d;
    d.mean_ma_ = mean_ma;
    d.sd_ma_ = sd_ma;
    return d;
}

AgeDistribution AgeDistribution::gridded(std::vector<double> ages_ma, std::vector<double> density) {
    const std::size_t n = ages_ma.size();
    if (n < 2)
        throw std::invalid_argument("AgeDistribution::gridded: need at least two ages, got " +
                                    std::to_string(n));
    if (density.size() != n)
        throw std::invalid_argument("AgeDistribution::gridded: " + std::to_string(n) +
                                    " ages but " + std::to_string(density.size()) + " densities");
    for (std::size_t i = 0; i < n; ++i) {
        if (!std::isfinite(ages_ma[i]))
            throw std::invalid_argument("AgeDistribution::gridded: age " + std::to_string(i) +
                                        " is not finite");
        if (!std::isfinite(density[i]) || density[i] < 0)
            throw std::invalid_argument("AgeDistribution::gridded: density " + std::to_string(i) +
                                        " must be finite and >= 0, got " + number(density[i]));
        if (i > 0 && !(ages_ma[i] > ages_ma[i - 1]))
            throw std::invalid_argument("AgeDistribution::gridded: ages must be strictly "
                                        "ascending (age " + std::to_string(i) + ")");
    }

    std::vector<double> edges(n + 1);
    edges[0] = ages_ma[0] - 0.5 * (ages_ma[1] - ages_ma[0]);
    for (std::size_t i = 1; i < n; ++i) edges[i] = 0.5 * (ages_ma[i - 1] + ages_ma[i]);
    edges[n] = ages_ma[n - 1] + 0.5 * (ages_ma[n - 1] - ages_ma[n - 2]);

    std::vector<double> mass(n);
    double total = 0;
    for (std::size_t i = 0; i < n; ++i) {
        mass[i] = density[i] * (edges[i + 1] - edges[i]);
        total += mass[i];
    }
    if (!(total > 0) || !std::isfinite(total))
        throw std::invalid_argument("AgeDistribution::gridded: the density has no mass (all "
                                    "densities 0, or ages so far apart that the bin widths "
                                    "overflow: give ages within a finite span)");

    AgeDistribution d;
    d.grid_cdf_.assign(n + 1, 0.0);
    double cumulative = 0, first_moment = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const double p = mass[i] / total;
        cumulative += p;
        d.grid_cdf_[i + 1] = std::min(cumulative, 1.0);
        first_moment += p * (0.5 * edges[i] + 0.5 * edges[i + 1]); // uniform on the bin
    }
    d.grid_cdf_[n] = 1.0; // exact, whatever the rounding of the running sum
    d.mean_ma_ = first_moment;
    // Variance about the mean, in units of the whole span: E[x^2] - E[x]^2 overflowed for ages
    // near 1e300 (inf - inf, read as sd 0) and cancelled to 0 for narrow grids far from 0 (a
    // tie's tail score then divided by 0). Each bin adds (centre - mean)^2 + width^2 / 12.
    const double span = edges[n] - edges[0];
    double variance_in_spans = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const double p = mass[i] / total;
        const double centre = ((0.5 * edges[i] + 0.5 * edges[i + 1]) - first_moment) / span;
        const double width = (edges[i + 1] - edges[i]) / span;
        variance_in_spans += p * (centre * centre + width * width / 12.0);
    }
    d.sd_ma_ = span * std::sqrt(variance_in_spans);
    d.grid_ages_ma_ = std::move(edges);
    return d;
}

double AgeDistribution::cdf(double age_ma) const {
    if (std::isnan(age_ma)) throw std::invalid_argument("AgeDistribution::cdf: age is NaN");
    if (isNormal()) {
        if (std::isinf(age_ma)) return age_ma > 0 ? 1.0 : 0.0;
        return boost::math::cdf(boost::math::normal(mean_ma_, sd_ma_), age_ma);
    }
    const auto& e = grid_ages_ma_;
    if (age_ma <= e.front()) return 0.0;
    if (age_ma >= e.back()) return 1.0;
    const auto it = std::upper_bound(e.begin(), e.end(), age_ma);
    const std::size_t k = static_cast<std::size_t>(it - e.begin()); // e[k-1] <= age < e[k]
    const double w = (age_ma - e[k - 1]) / (e[k] - e[k - 1]);
    return grid_cdf_[k - 1] + w * (grid_cdf_[k] - grid_cdf_[k - 1]);
}

double AgeDistribution::quantile(double p) const {
    if (!(p > 0 && p < 1))
        throw std::invalid_argument("AgeDistribution::quantile: p must lie in (0, 1), got " +
                                    number(p));
    if (isNormal()) return boost::math::quantile(boost::math::normal(mean_ma_, sd_ma_), p);
    // First edge whose cumulative probability reaches p; the bin before it has positive mass,
    // so the interpolation never divides by zero, and flat (empty) stretches are skipped.
    const auto it = std::lower_bound(grid_cdf_.begin(), grid_cdf_.end(), p);
    const std::size_t k = static_cast<std::size_t>(it - grid_cdf_.begin());
    const double c0 = grid_cdf_[k - 1], c1 = grid_cdf_[k];
    const double w = (p - c0) / (c1 - c0);
    return grid_ages_ma_[k - 1] + w * (grid_ages_ma_[k] - grid_ages_ma_[k - 1]);
}

double AgeDistribution::support_min_ma() const {
    if (isNormal()) return mean_ma_ - kNormalSupportSd * sd_ma_;
    // The last edge before any mass.
    std::size_t k = 0;
    while (k + 1 < grid_cdf_.size() && grid_cdf_[k + 1] == 0.0) ++k;
    return grid_ages_ma_[k];
}

double AgeDistribution::support_max_ma() const {
    if (isNormal()) return mean_ma_ + kNormalSupportSd * sd_ma_;
    // The first edge where all the mass is in.
    std::size_t k = grid_cdf_.size() - 1;
    while (k > 0 && grid_cdf_[k - 1] >= 1.0) --k;
    return grid_ages_ma_[k];
}

} // namespace atollog
