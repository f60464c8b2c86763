#include "atollog/engine/reduced_major_axis.hpp"

#include "scaled_moments.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <stdexcept>
#include <string>

namespace atollog {

namespace {

[[noreturn]] void fail(const std::string& what) {
    throw std::invalid_argument("reduced major axis: " + what);
}

} // namespace

ReducedMajorAxis reducedMajorAxis(std::span<const double> x, std::span<const double> y) {
    const std::size_t n = x.size();
    if (y.size() != n)
        fail("x has " + std::to_string(n) + " values but y has " + std::to_string(y.size()));
    if (n < 3)
        fail("needs at least 3 points, got " + std::to_string(n));
    double sum_x = 0, sum_y = 0;
    for (std::size_t i = 0; i < n; ++i) {
        if (!std::isfinite(x[i]) || !std::isfinite(y[i]))
            fail("point " + std::to_string(i + 1) + " is not finite");
        sum_x += x[i];
        sum_y += y[i];
    }
    const double dn = static_cast<double>(n);
    const double mx = sum_x / dn, my = sum_y / dn;
    if (!std::isfinite(mx) || !std::isfinite(my))
        fail("the mean of x or y overflows a double; rescale the values");
    if (detail::powerOfTwoScale(x, mx) == 0)
        fail("all x values are equal; the slope is undefined");
    const detail::ScaledMoments sm = detail::scaledMoments(x, y, mx, my);
    const double kx = sm.kx, ky = sm.ky, suu = sm.suu, svv = sm.svv, suv = sm.suv;
    ReducedMajorAxis fit;
    fit.n = static_cast<int>(n);
    if (svv == 0) {
        // y constant: s_y = 0, the flat line through it, known exactly.
        fit.intercept = my;
        return fit;
    }
    fit.r = suv / std::sqrt(suu * svv);
    if (fit.r == 0)
        fail("x and y are uncorrelated (r = 0): the sign of the slope is undefined");
    // s_y / s_x: the (n - 1) of the two sds cancels.
    const double ratio_scaled = std::sqrt(svv / suu);
    const double sign = fit.r > 0 ? 1.0 : -1.0;
    fit.slope = sign * ratio_scaled * (ky / kx);
    fit.intercept = my - fit.slope * mx;
    const double r2 = std::min(1.0, fit.r * fit.r);
    const double abs_r = std::min(1.0, std::fabs(fit.r));
    // Kermack & Haldane (1950); Davis (2002): see the header.
    fit.slope_sd = std::fabs(fit.slope) * std::sqrt((1.0 - r2) / dn);
    const double sx_scaled = std::sqrt(suu / (dn - 1.0)); // s_x / kx
    const double sy = std::sqrt(svv / (dn - 1.0)) * ky;
    const double mx_over_sx = (mx / kx) / sx_scaled;
    fit.intercept_sd =
        sy * std::sqrt((1.0 - abs_r) / dn * (2.0 + mx_over_sx * mx_over_sx * (1.0 + abs_r)));
    for (const double v : {fit.slope, fit.intercept, fit.slope_sd, fit.intercept_sd})
        if (!std::isfinite(v))
            fail("the slope or intercept (or their sds) overflows a double; x and y differ by "
                 "too many orders of magnitude: rescale them");
    return fit;
}

} // namespace atollog
