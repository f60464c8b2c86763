#include "atollog/engine/least_squares_line.hpp"

#include "scaled_moments.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <stdexcept>
#include <string>

namespace atollog {

LeastSquaresLine leastSquaresLine(std::span<const double> x, std::span<const double> y) {
    const std::size_t n = x.size();
    if (y.size() != n)
        throw std::invalid_argument("straight line: x has " + std::to_string(n) +
                                    " values but y has " + std::to_string(y.size()));
    if (n < 3)
        throw std::invalid_argument("straight line: needs at least 3 points, got " +
                                    std::to_string(n));
    double sx = 0, sy = 0;
    for (std::size_t i = 0; i < n; ++i) {
        if (!std::isfinite(x[i]) || !std::isfinite(y[i]))
            throw std::invalid_argument("straight line: point " + std::to_string(i + 1) +
                                        " is not finite");
        sx += x[i];
        sy += y[i];
    }
    const double dn = static_cast<double>(n);
    const double mx = sx / dn, my = sy / dn;
    if (detail::powerOfTwoScale(x, mx) == 0)
        throw std::invalid_argument("straight line: all x values are equal (" +
                                    std::to_string(x[0]) + "); the slope is undefined");
    const detail::ScaledMoments sm = detail::scaledMoments(x, y, mx, my);
    const double kx = sm.kx, ky = sm.ky, suu = sm.suu, svv = sm.svv, suv = sm.suv;
    LeastSquaresLine fit;
    fit.n = static_cast<int>(n);
    const double b_scaled = suv / suu;
    fit.slope = b_scaled * (ky / kx);
    fit.intercept = my - fit.slope * mx;
    double ssr_scaled = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const double res = (y[i] - my) / ky - b_scaled * (x[i] - mx) / kx;
        ssr_scaled += res * res;
    }
    const double s2_scaled = ssr_scaled / (dn - 2.0);
    fit.slope_sd = std::sqrt(s2_scaled / suu) * (ky / kx);
    fit.intercept_sd = ky * std::sqrt(s2_scaled * (1.0 / dn + (mx / kx) * (mx / kx) / suu));
    fit.r = svv == 0 ? 0.0 : suv / std::sqrt(suu * svv);
    // Finite x and y can still give a slope beyond a double (x in 1e-300, y in 1e300).
    for (const double v : {fit.slope, fit.intercept, fit.slope_sd, fit.intercept_sd, fit.r})
        if (!std::isfinite(v))
            throw std::invalid_argument("straight line: the slope or intercept (or their sds) "
                                        "overflows a double; x and y differ by too many orders "
                                        "of magnitude: rescale them");
    return fit;
}

} // namespace atollog
