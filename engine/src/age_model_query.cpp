#include "atollog/engine/age_model.hpp"

#include <algorithm>
#include <cmath>

namespace atollog {

std::optional<AgeQuantiles> AgeModel::ageAt(double depth_m) const {
    if (grid.empty() || !std::isfinite(depth_m) || depth_m < grid.front().depth_m ||
        depth_m > grid.back().depth_m)
        return std::nullopt;
    // First row deeper than depth_m; the row before it is at or above, and at a surface depth
    // it is the lower row (rows at equal depth come above-surface first).
    const auto hi = std::upper_bound(grid.begin(), grid.end(), depth_m,
                                     [](double d, const AgeGridRow& r) { return d < r.depth_m; });
    const AgeGridRow& a = *(hi - 1);
    if (hi == grid.end() || a.depth_m == depth_m)
        return AgeQuantiles{a.age_q025_ma, a.age_q500_ma, a.age_q975_ma, a.age_mean_ma};
    const AgeGridRow& b = *hi;
    const double f = (depth_m - a.depth_m) / (b.depth_m - a.depth_m);
    auto mix = [f](double x, double y) { return x + f * (y - x); };
    return AgeQuantiles{mix(a.age_q025_ma, b.age_q025_ma), mix(a.age_q500_ma, b.age_q500_ma),
                        mix(a.age_q975_ma, b.age_q975_ma), mix(a.age_mean_ma, b.age_mean_ma)};
}

} // namespace atollog
