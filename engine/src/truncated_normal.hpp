#pragma once
// A normal age drawn at or above a floor (the age already reached above it), with the mass of
// the allowed part, for the age model's order-respecting sampler. Written here rather than via
// AgeDistribution::cdf/quantile because it runs for every tie of every draw and must stay exact
// deep in the upper tail, where 1 - cdf loses all digits.
#include <algorithm>
#include <cmath>

namespace atollog::detail {

/// Standard normal quantile, Wichura's algorithm AS 241 (Appl. Statist. 37:477, 1988), about
/// 1e-16 relative accuracy; p in (0, 1).
double standardNormalQuantile(double p);

struct TruncatedDraw {
    double value = 0;    ///< the drawn age, >= floor
    double log_mass = 0; ///< log P(age >= floor) under the untruncated normal; finite always
};

/// Draws from Normal(mean, sd) truncated to [floor, inf) with the uniform u in (0, 1).
/// floor may be -infinity. Far in the upper tail (floor more than 30 sd above the mean) the
/// mass comes from the asymptotic series of Mills' ratio and the draw from its exponential
/// approximation: such draws carry a weight below 1e-190 and only their ranking matters.
TruncatedDraw truncatedNormalDraw(double mean, double sd, double floor, double u);

/// Draws from Normal(mean, sd) truncated to [lo, hi] (lo <= hi; either may be infinite) with
/// the uniform u in (0, 1), for the Gibbs sampler's two-sided age updates. Works on the side of
/// the mean where the interval lies farther out (by symmetry), so the normal cdf keeps its
/// digits; beyond 30 sd it draws from the exponential approximation of the tail truncated to
/// the interval. Always finite and inside [lo, hi] (lo when lo == hi), never NaN.
double truncatedNormalBetween(double mean, double sd, double lo, double hi, double u);

/// The same distribution, drawing as many uniforms from `next_uniform` as it needs. When the
/// interval is narrow for its distance from the mean (width <= 2.5 sd / max(1, |m|), m its point
/// nearest the mean, in sd), by rejection from a uniform proposal on it (Robert 1995,
/// Statistics and Computing 5:121, the uniform-proposal case: accept z with probability
/// exp((m^2 - z^2)/2); exact, no cdf, acceptance above 0.3); otherwise as above with one
/// uniform. Why: the two erfc of the inversion were a third of the Gibbs sampler's time.
template <class NextUniform>
double truncatedNormalBetweenBy(double mean, double sd, double lo, double hi,
                                NextUniform&& next_uniform) {
    const double a = (lo - mean) / sd, b = (hi - mean) / sd;
    // m: the point of [a, b] nearest the mean, where the density peaks.
    const double m = a > 0 ? a : (b < 0 ? b : 0.0);
    if (b - a <= 2.5 / std::max(1.0, std::fabs(m))) {
        for (int tries = 0; tries < 400; ++tries) { // acceptance > 0.3: P(400 misses) < 1e-60
            const double z = a + (b - a) * next_uniform();
            if (next_uniform() <= std::exp(0.5 * (m * m - z * z)))
                return std::clamp(mean + sd * z, lo, hi);
        }
    }
    return truncatedNormalBetween(mean, sd, lo, hi, next_uniform());
}

} // namespace atollog::detail
