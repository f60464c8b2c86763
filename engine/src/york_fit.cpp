#include "atollog/engine/york_fit.hpp"

#include "atollog/engine/least_squares_line.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <stdexcept>
#include <string>
#include <vector>

namespace atollog {
namespace {

void requirePositiveSds(std::span<const double> sd, const char* which) {
    for (std::size_t i = 0; i < sd.size(); ++i)
        if (!std::isfinite(sd[i]) || sd[i] <= 0)
            throw std::invalid_argument(std::string("York fit: ") + which + " of point " +
                                        std::to_string(i + 1) + " must be > 0, got " +
                                        std::to_string(sd[i]));
}

} // namespace

YorkFit yorkFit(std::span<const double> x, std::span<const double> x_sd,
                std::span<const double> y, std::span<const double> y_sd,
                std::span<const double> r) {
    const std::size_t n = x.size();
    if (x_sd.size() != n || y.size() != n || y_sd.size() != n || (!r.empty() && r.size() != n))
        throw std::invalid_argument("York fit: x, x_sd, y, y_sd (and r when given) must have the "
                                    "same length");
    if (n < 3)
        throw std::invalid_argument("York fit: needs at least 3 points, got " + std::to_string(n));
    requirePositiveSds(x_sd, "x_sd");
    requirePositiveSds(y_sd, "y_sd");
    for (std::size_t i = 0; i < r.size(); ++i)
        if (!std::isfinite(r[i]) || r[i] <= -1 || r[i] >= 1)
            throw std::invalid_argument("York fit: error correlation r of point " +
                                        std::to_string(i + 1) + " must lie in (-1, 1), got " +
                                        std::to_string(r[i]));
    // The OLS start also validates x and y (finite, x not all equal).
    double b = leastSquaresLine(x, y).slope;

    std::vector<double> wx(n), wy(n), alpha(n), ri(n, 0.0), W(n), beta(n);
    for (std::size_t i = 0; i < n; ++i) {
        wx[i] = 1.0 / (x_sd[i] * x_sd[i]);
        wy[i] = 1.0 / (y_sd[i] * y_sd[i]);
        alpha[i] = std::sqrt(wx[i] * wy[i]);
        if (!r.empty())
            ri[i] = r[i];
    }
    // York et al. 2004, section III, steps 3-6, iterated until the slope settles.
    double x_bar = 0, y_bar = 0;
    auto update = [&](double slope) {
        double sw = 0, swx = 0, swy = 0;
        for (std::size_t i = 0; i < n; ++i) {
            W[i] = wx[i] * wy[i] /
                   (wx[i] + slope * slope * wy[i] - 2.0 * slope * ri[i] * alpha[i]);
            sw += W[i];
            swx += W[i] * x[i];
            swy += W[i] * y[i];
        }
        x_bar = swx / sw;
        y_bar = swy / sw;
        for (std::size_t i = 0; i < n; ++i) {
            const double U = x[i] - x_bar, V = y[i] - y_bar;
            beta[i] = W[i] * (U / wy[i] + slope * V / wx[i] - (slope * U + V) * ri[i] / alpha[i]);
        }
    };
    YorkFit fit;
    bool converged = false;
    for (int it = 1; it <= 1000; ++it) {
        update(b);
        double num = 0, den = 0;
        for (std::size_t i = 0; i < n; ++i) {
            const double U = x[i] - x_bar, V = y[i] - y_bar;
            num += W[i] * beta[i] * V;
            den += W[i] * beta[i] * U;
        }
        const double b_new = num / den;
        fit.iterations = it;
        if (!std::isfinite(b_new))
            throw std::runtime_error("York fit: the slope became non-finite at iteration " +
                                     std::to_string(it));
        const bool settled = std::abs(b_new - b) <= 1e-14 * std::max(1.0, std::abs(b_new));
        b = b_new;
        if (settled) {
            converged = true;
            break;
        }
    }
    if (!converged)
        throw std::runtime_error("York fit: the slope did not converge in 1000 iterations");
    update(b); // weights and beta at the final slope
    const double a = y_bar - b * x_bar;
    // Steps 8-9: adjusted x and the standard errors (eqs. 13a-b).
    double sw = 0, swx = 0;
    for (std::size_t i = 0; i < n; ++i) {
        sw += W[i];
        swx += W[i] * (x_bar + beta[i]);
    }
    const double xa_bar = swx / sw;
    double swu2 = 0, chi2 = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const double u = x_bar + beta[i] - xa_bar;
        swu2 += W[i] * u * u;
        const double res = y[i] - b * x[i] - a;
        chi2 += W[i] * res * res;
    }
    const double var_b = 1.0 / swu2;
    fit.slope = b;
    fit.intercept = a;
    fit.slope_sd = std::sqrt(var_b);
    fit.intercept_sd = std::sqrt(1.0 / sw + xa_bar * xa_bar * var_b);
    fit.chi_square = chi2;
    fit.degrees_of_freedom = static_cast<int>(n) - 2;
    fit.mswd = chi2 / fit.degrees_of_freedom;
    return fit;
}

} // namespace atollog
