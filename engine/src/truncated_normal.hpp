#pragma once
// A normal age drawn at or above a floor (the age already reached above it), with the mass of
// the allowed part, for the age model's order-respecting sampler. Written here rather than via
// AgeDistribution::cdf/quantile because it runs for every tie of every draw and must stay exact
// deep in the upper tail, where 1 - cdf loses all digits.
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

} // namespace atollog::detail
