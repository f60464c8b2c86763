#include "age_model_tails.hpp"

#include "truncated_normal.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>

namespace atollog::detail {

namespace {

/// |z| at or above this flags a likely outlier: our own threshold (two-sided p ~ 0.0027).
constexpr double kOutlierZ = 3.0;

} // namespace

TieTail tieTail(const PreparedTie& tie, double depth_q500_m, double age_q500_ma) {
    TieTail t;
    t.label = tie.label;
    t.depth_q500_m = depth_q500_m;
    t.age_q500_ma = age_q500_ma;
    if (tie.exact_age || tie.open_floor)
        return t;
    const AgeDistribution& d = tie.age;
    double z = (age_q500_ma - d.mean_ma()) / d.sd_ma();
    if (!d.isNormal()) {
        const double f = d.cdf(age_q500_ma);
        if (f > 0 && f < 1)
            z = standardNormalQuantile(f);
    }
    // A gridded age with no spread in double precision (sd 0) and a median outside its
    // support gave z = +/-inf (or NaN at its mean). Only those are replaced: the largest finite
    // score keeps them ranked first; finite scores are left as they are.
    if (std::isnan(z))
        z = 0;
    else if (std::isinf(z))
        z = std::copysign(std::numeric_limits<double>::max(), z);
    t.z_score = z;
    t.tail_probability = std::erfc(std::fabs(z) / std::numbers::sqrt2);
    t.likely_outlier = std::fabs(z) >= kOutlierZ;
    return t;
}

void rankTieTails(std::vector<TieTail>& tails) {
    std::stable_sort(tails.begin(), tails.end(), [](const TieTail& a, const TieTail& b) {
        return std::fabs(a.z_score) > std::fabs(b.z_score);
    });
}

} // namespace atollog::detail
