#include "truncated_normal.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace atollog::detail {

namespace {

double horner(const double (&c)[8], double x) {
    double v = c[7];
    for (int i = 6; i >= 0; --i)
        v = v * x + c[i];
    return v;
}

} // namespace

double standardNormalQuantile(double p) {
    // Coefficients of AS 241 (PPND16), lowest order first.
    static constexpr double a[8] = {3.3871328727963666080e0,  1.3314166789178437745e+2,
                                    1.9715909503065514427e+3, 1.3731693765509461125e+4,
                                    4.5921953931549871457e+4, 6.7265770927008700853e+4,
                                    3.3430575583588128105e+4, 2.5090809287301226727e+3};
    static constexpr double b[8] = {1.0,
                                    4.2313330701600911252e+1, 6.8718700749205790830e+2,
                                    5.3941960214247511077e+3, 2.1213794301586595867e+4,
                                    3.9307895800092710610e+4, 2.8729085735721942674e+4,
                                    5.2264952788528545610e+3};
    static constexpr double c[8] = {1.42343711074968357734e0, 4.63033784615654529590e0,
                                    5.76949722146069140550e0, 3.64784832476320460504e0,
                                    1.27045825245236838258e0, 2.41780725177450611770e-1,
                                    2.27238449892691845833e-2, 7.74545014278341407640e-4};
    static constexpr double d[8] = {1.0,
                                    2.05319162663775882187e0,  1.67638483018380384940e0,
                                    6.89767334985100004550e-1, 1.48103976427480074590e-1,
                                    1.51986665636164571966e-2, 5.47593808499534494600e-4,
                                    1.05075007164441684324e-9};
    static constexpr double e[8] = {6.65790464350110377720e0,  5.46378491116411436990e0,
                                    1.78482653991729133580e0,  2.96560571828504891230e-1,
                                    2.65321895265761230930e-2, 1.24266094738807843860e-3,
                                    2.71155556874348757815e-5, 2.01033439929228813265e-7};
    static constexpr double f[8] = {1.0,
                                    5.99832206555887937690e-1, 1.36929880922735805310e-1,
                                    1.48753612908506148525e-2, 7.86869131145613259100e-4,
                                    1.84631831751005468180e-5, 1.42151175831644588870e-7,
                                    2.04426310338993978564e-15};
    const double q = p - 0.5;
    if (std::fabs(q) <= 0.425) {
        const double r = 0.180625 - q * q;
        return q * horner(a, r) / horner(b, r);
    }
    double r = q < 0 ? p : 1.0 - p;
    r = std::sqrt(-std::log(r));
    const double v = r <= 5.0 ? horner(c, r - 1.6) / horner(d, r - 1.6)
                              : horner(e, r - 5.0) / horner(f, r - 5.0);
    return q < 0 ? -v : v;
}

TruncatedDraw truncatedNormalDraw(double mean, double sd, double floor, double u) {
    const double z_floor = (floor - mean) / sd;
    double z = 0;
    double log_mass = 0;
    if (!(z_floor > -38.0)) { // no truncation left in double precision (or floor = -inf)
        z = standardNormalQuantile(u);
    } else if (z_floor <= 0) {
        const double below = 0.5 * std::erfc(-z_floor / std::numbers::sqrt2);
        const double mass = 1.0 - below;
        log_mass = std::log(mass);
        z = standardNormalQuantile(below + u * mass);
    } else if (z_floor <= 30.0) {
        // Upper tail: invert the survival function, which keeps its digits out here.
        const double mass = 0.5 * std::erfc(z_floor / std::numbers::sqrt2);
        log_mass = std::log(mass);
        // 1 - u keeps the draw increasing in u on every branch (exact for u >= 0.5).
        z = -standardNormalQuantile((1.0 - u) * mass);
    } else {
        const double zz = z_floor * z_floor;
        log_mass = -0.5 * zz - std::log(z_floor) - 0.5 * std::log(2 * std::numbers::pi) +
                   std::log1p(-1.0 / zz + 3.0 / (zz * zz));
        z = z_floor - std::log1p(-u) / z_floor;
    }
    return {std::max(mean + sd * z, floor), log_mass};
}

namespace {

/// Standard normal truncated to [a, b] with b <= 0 or a <= 0 <= b handled by the caller's flip:
/// here a <= 0 (the interval reaches the lower side, where Phi keeps its digits).
double standardBetweenLowerSide(double a, double b, double u) {
    if (b < -30.0) {
        // Both ends more than 30 sd below the mean: on [-b, -a] the density is proportional to
        // exp(-t^2/2) ~ exp(-c t) near c = -b (the Mills-ratio tail approximation); draw t - c
        // from an exponential of rate c truncated to -a - c, then flip back.
        const double c = -b;
        const double width = -a - c; // may be +inf
        const double cut = std::isfinite(width) ? -std::expm1(-c * width) : 1.0;
        const double t = c - std::log1p(-u * cut) / c;
        return std::clamp(-t, a, b);
    }
    // An end more than 8.5 sd out cuts off less than 1e-17: taken as open (and clamped).
    const double lo_p = a > -8.5 ? 0.5 * std::erfc(-a / std::numbers::sqrt2) : 0.0;
    const double hi_p = b < 8.5 ? 0.5 * std::erfc(-b / std::numbers::sqrt2) : 1.0;
    const double mass = hi_p - lo_p;
    if (!(mass > 0)) // an interval too narrow for double cdf differences: any point of it
        return std::clamp(a + u * (b - a), a, b);
    const double p = std::clamp(lo_p + u * mass, 0x1.0p-1074, std::nextafter(1.0, 0.0));
    return std::clamp(standardNormalQuantile(p), a, b);
}

} // namespace

double truncatedNormalBetween(double mean, double sd, double lo, double hi, double u) {
    if (!(hi > lo))
        return lo;
    const double a = (lo - mean) / sd, b = (hi - mean) / sd;
    // Keep the interval on the lower side: if it lies wholly above the mean, flip it (and u,
    // which keeps the draw increasing in u).
    const bool flip = a > 0;
    const double z = flip ? -standardBetweenLowerSide(-b, -a, 1.0 - u)
                          : standardBetweenLowerSide(a, b, u);
    return std::clamp(mean + sd * z, lo, hi);
}

} // namespace atollog::detail
