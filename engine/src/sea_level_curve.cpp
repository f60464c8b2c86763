#include "atollog/engine/sea_level_curve.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog {

SeaLevelCurve::SeaLevelCurve(std::span<const SeaLevelPoint> points)
    : points_(points.begin(), points.end()) {
    for (const SeaLevelPoint& p : points_) {
        if (!std::isfinite(p.age_ma) || !std::isfinite(p.level_m))
            throw std::invalid_argument("sea-level curve: a point has a non-finite age or level "
                                        "(age_ma " + std::to_string(p.age_ma) + ")");
        if (p.level_sd_m && (!std::isfinite(*p.level_sd_m) || *p.level_sd_m < 0))
            throw std::invalid_argument("sea-level curve: level_sd_m at age " +
                                        std::to_string(p.age_ma) + " Ma must be >= 0, got " +
                                        std::to_string(*p.level_sd_m));
    }
    std::stable_sort(points_.begin(), points_.end(),
                     [](const SeaLevelPoint& a, const SeaLevelPoint& b) { return a.age_ma < b.age_ma; });
    for (std::size_t i = 1; i < points_.size(); ++i)
        if (points_[i].age_ma == points_[i - 1].age_ma)
            throw std::invalid_argument("sea-level curve: two points at age " +
                                        std::to_string(points_[i].age_ma) + " Ma");
}

SeaLevelAt SeaLevelCurve::at(double age_ma) const {
    if (points_.empty())
        throw std::logic_error("sea-level curve: asked for a level from an empty curve");
    if (!std::isfinite(age_ma))
        throw std::invalid_argument("sea-level curve: non-finite age");
    auto sd = [](const SeaLevelPoint& p) { return p.level_sd_m.value_or(0.0); };
    if (age_ma < points_.front().age_ma)
        return {points_.front().level_m, sd(points_.front()), true};
    if (age_ma > points_.back().age_ma)
        return {0.0, 0.0, true};
    const auto hi = std::lower_bound(points_.begin(), points_.end(), age_ma,
                                     [](const SeaLevelPoint& p, double a) { return p.age_ma < a; });
    if (hi->age_ma == age_ma)
        return {hi->level_m, sd(*hi), false};
    const auto lo = hi - 1;
    const double f = (age_ma - lo->age_ma) / (hi->age_ma - lo->age_ma);
    // (1 - f) a + f b rather than a + f (b - a): b - a overflows for levels of -1e308 and 1e308.
    return {(1.0 - f) * lo->level_m + f * hi->level_m, (1.0 - f) * sd(*lo) + f * sd(*hi), false};
}

} // namespace atollog
