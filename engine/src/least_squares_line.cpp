#include "atollog/engine/least_squares_line.hpp"

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
    double sxx = 0, syy = 0, sxy = 0;
    for (std::size_t i = 0; i < n; ++i) {
        sxx += (x[i] - mx) * (x[i] - mx);
        syy += (y[i] - my) * (y[i] - my);
        sxy += (x[i] - mx) * (y[i] - my);
    }
    if (sxx == 0)
        throw std::invalid_argument("straight line: all x values are equal (" +
                                    std::to_string(x[0]) + "); the slope is undefined");
    LeastSquaresLine fit;
    fit.n = static_cast<int>(n);
    fit.slope = sxy / sxx;
    fit.intercept = my - fit.slope * mx;
    double ssr = 0;
    for (std::size_t i = 0; i < n; ++i) {
        const double res = y[i] - fit.intercept - fit.slope * x[i];
        ssr += res * res;
    }
    const double s2 = ssr / (dn - 2.0);
    fit.slope_sd = std::sqrt(s2 / sxx);
    fit.intercept_sd = std::sqrt(s2 * (1.0 / dn + mx * mx / sxx));
    fit.r = syy == 0 ? 0.0 : sxy / std::sqrt(sxx * syy);
    return fit;
}

} // namespace atollog
