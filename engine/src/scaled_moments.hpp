#pragma once
// Second moments of paired values about their means, with the deviations divided by a power of
// two near their largest size (exact: the sums are those of the plain deviations, scaled).
// Why: squares of deviations near 1e300 overflow into a NaN slope, and near 1e-300 underflow to
// 0 ("all x equal" when they are not). Shared by the straight-line fits.
#include <algorithm>
#include <cmath>
#include <cstddef>
#include <span>

namespace atollog::detail {

/// A power of two near the largest |v - mean| (0 when all equal the mean).
inline double powerOfTwoScale(std::span<const double> v, double mean) {
    double largest = 0;
    for (double e : v)
        largest = std::max(largest, std::fabs(e - mean));
    return largest > 0 && std::isfinite(largest) ? std::ldexp(1.0, std::ilogb(largest)) : largest;
}

struct ScaledMoments {
    double kx = 0, ky = 1;          ///< the scales (ky is 1 when every y equals its mean)
    double suu = 0, svv = 0, suv = 0; ///< sums of u^2, v^2, uv with u = (x - mx)/kx, v = (y - my)/ky
};

/// Requires kx > 0, i.e. not all x equal (the caller checks powerOfTwoScale(x, mx) first).
inline ScaledMoments scaledMoments(std::span<const double> x, std::span<const double> y,
                                   double mx, double my) {
    ScaledMoments m;
    m.kx = powerOfTwoScale(x, mx);
    const double ky = powerOfTwoScale(y, my);
    m.ky = ky == 0 ? 1.0 : ky;
    for (std::size_t i = 0; i < x.size(); ++i) {
        const double u = (x[i] - mx) / m.kx, v = (y[i] - my) / m.ky;
        m.suu += u * u;
        m.svv += v * v;
        m.suv += u * v;
    }
    return m;
}

} // namespace atollog::detail
