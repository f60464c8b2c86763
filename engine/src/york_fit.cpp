#include "atollog/engine/york_fit.hpp"

#include "atollog/engine/least_squares_line.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <optional>
#include <stdexcept>
#include <string>
#include <vector>

namespace atollog {

namespace {
/// Plain York iterations before the fixed point is solved for directly.
constexpr int kPlainSteps = 200;
} // namespace
namespace {

void requirePositiveSds(std::span<const double> sd, const char* which) {
    for (std::size_t i = 0; i < sd.size(); ++i)
        if (!std::isfinite(sd[i]) || sd[i] <= 0)
            throw std::invalid_argument(std::string("York fit: ") + which + " of point " +
                                        std::to_string(i + 1) + " must be > 0, got " +
                                        std::to_string(sd[i]));
}

void requireFiniteValues(std::span<const double> v, const char* which) {
    for (std::size_t i = 0; i < v.size(); ++i)
        if (!std::isfinite(v[i]))
            throw std::invalid_argument(std::string("York fit: ") + which + " of point " +
                                        std::to_string(i + 1) + " is " + std::to_string(v[i]) +
                                        "; give a finite number");
}

/// A power of two near the largest value: dividing by it is exact.
double powerOfTwoNear(std::span<const double> v) {
    double largest = 0;
    for (double e : v) largest = std::max(largest, std::fabs(e));
    return std::ldexp(1.0, std::ilogb(largest));
}

YorkFit yorkFitUnscaled(std::span<const double> x, std::span<const double> x_sd,
                        std::span<const double> y, std::span<const double> y_sd,
                        std::span<const double> r);

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
    requireFiniteValues(x, "x");
    requireFiniteValues(y, "y");
    requirePositiveSds(x_sd, "x_sd");
    requirePositiveSds(y_sd, "y_sd");
    // The fit is solved in units of the largest sd of x and of y (powers of two, so exact):
    // weights 1/sd^2 of sds near 1e100 underflowed to 0 and the slope became NaN. The answer
    // scales back exactly; only the convergence test, relative to max(1, |slope|), sees units.
    const double kx = powerOfTwoNear(x_sd), ky = powerOfTwoNear(y_sd);
    auto scaled = [](std::span<const double> v, double k) {
        std::vector<double> out(v.begin(), v.end());
        for (double& e : out) e /= k;
        return out;
    };
    const std::vector<double> xs = scaled(x, kx), xs_sd = scaled(x_sd, kx), ys = scaled(y, ky),
                              ys_sd = scaled(y_sd, ky);
    for (std::size_t i = 0; i < n; ++i) {
        if (!std::isfinite(xs[i]) || !std::isfinite(ys[i]))
            throw std::invalid_argument("York fit: x or y of point " + std::to_string(i + 1) +
                                        " is too large beside the largest x_sd or y_sd for a "
                                        "double; check the values and their sds");
        // After scaling, an sd whose 1/sd^2 still overflows lies too many orders of magnitude
        // below the largest one.
        if (!std::isfinite(1.0 / (xs_sd[i] * xs_sd[i])))
            throw std::invalid_argument("York fit: x_sd of point " + std::to_string(i + 1) + " (" +
                                        std::to_string(x_sd[i]) +
                                        ") is too small beside the largest x_sd for 1/sd^2 in "
                                        "a double; give sds of comparable size");
        if (!std::isfinite(1.0 / (ys_sd[i] * ys_sd[i])))
            throw std::invalid_argument("York fit: y_sd of point " + std::to_string(i + 1) + " (" +
                                        std::to_string(y_sd[i]) +
                                        ") is too small beside the largest y_sd for 1/sd^2 in "
                                        "a double; give sds of comparable size");
    }
    YorkFit fit = yorkFitUnscaled(xs, xs_sd, ys, ys_sd, r);
    fit.slope *= ky / kx;
    fit.slope_sd *= ky / kx;
    fit.intercept *= ky;
    fit.intercept_sd *= ky;
    for (const double v : {fit.slope, fit.slope_sd, fit.intercept, fit.intercept_sd,
                           fit.chi_square, fit.mswd})
        if (!std::isfinite(v))
            throw std::invalid_argument("York fit: the line overflows a double; x, y and their "
                                        "sds differ by too many orders of magnitude: check the "
                                        "values and the x_sd and y_sd");
    return fit;
}

namespace {

YorkFit yorkFitUnscaled(std::span<const double> x, std::span<const double> x_sd,
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
    // One step of the iteration: the slope York's equations give at the weights of `slope`.
    auto nextSlope = [&](double slope) {
        update(slope);
        double num = 0, den = 0;
        for (std::size_t i = 0; i < n; ++i) {
            const double U = x[i] - x_bar, V = y[i] - y_bar;
            num += W[i] * beta[i] * V;
            den += W[i] * beta[i] * U;
        }
        return num / den;
    };
    bool converged = false;
    // The last slopes the step moved up and down: the fixed point lies between them.
    std::optional<double> step_up, step_down;
    for (int it = 1; it <= kPlainSteps; ++it) {
        const double b_new = nextSlope(b);
        fit.iterations = it;
        // Finite, validated input whose products still overflow: a problem of the values' sizes,
        // hence invalid_argument naming them (it was a runtime_error before).
        if (!std::isfinite(b_new))
            throw std::invalid_argument("York fit: the slope became non-finite at iteration " +
                                        std::to_string(it) + "; x, y, x_sd and y_sd differ by "
                                        "too many orders of magnitude");
        const bool settled = std::abs(b_new - b) <= 1e-14 * std::max(1.0, std::abs(b_new));
        (b_new > b ? step_up : step_down) = b;
        b = b_new;
        if (settled) {
            converged = true;
            break;
        }
    }
    // The plain iteration converges where the step map contracts; with strongly correlated x
    // and y errors it can swing about the fixed point for good (about 1 random case in 20 in
    // our tests). Then the fixed point is solved for directly between the last slopes stepped
    // up and down (TOMS 748, Alefeld, Potra & Shi 1995): the same equations, the same answer.
    if (!converged && step_up && step_down) {
        auto gap = [&](double slope) { return nextSlope(slope) - slope; };
        double lo = std::min(*step_up, *step_down), hi = std::max(*step_up, *step_down);
        const double g_lo = gap(lo), g_hi = gap(hi);
        if (g_lo == 0 || g_hi == 0) {
            b = g_lo == 0 ? lo : hi;
            converged = true;
        } else if ((g_lo > 0) != (g_hi > 0)) {
            std::uintmax_t max_iter = 200;
            const auto root = boost::math::tools::toms748_solve(
                gap, lo, hi, g_lo, g_hi,
                [](double p, double q) {
                    return std::abs(p - q) <= 1e-14 * std::max(1.0, std::abs(p));
                },
                max_iter);
            b = 0.5 * (root.first + root.second);
            converged = max_iter < 200 && std::isfinite(b);
        }
    }
    if (!converged)
        throw std::runtime_error("York fit: the slope did not converge in " +
                                 std::to_string(kPlainSteps) + " iterations");
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
    // Sums that overflowed (values ~1e300 sds apart) would give a slope sd of 0 or NaN.
    if (!std::isfinite(swu2) || !(swu2 > 0) || !std::isfinite(sw) || !std::isfinite(chi2))
        throw std::invalid_argument("York fit: the weighted sums overflow a double; the x and y "
                                    "values lie too many x_sd or y_sd apart: check the sds");
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

} // namespace

} // namespace atollog
