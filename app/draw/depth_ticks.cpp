#include "draw/depth_ticks.hpp"

#include <cmath>
#include <stdexcept>

namespace atollog::draw {

namespace {
constexpr double kMinMinorSpacing_mm = 1.5;

std::vector<double> multiplesBetween(double top_m, double base_m, double step_m) {
    std::vector<double> out;
    // Integer multiples avoid accumulating rounding error down a long hole.
    const auto first = static_cast<long long>(std::ceil(top_m / step_m - 1e-9));
    const auto last = static_cast<long long>(std::floor(base_m / step_m + 1e-9));
    for (long long k = first; k <= last; ++k) {
        out.push_back(static_cast<double>(k) * step_m);
    }
    return out;
}
} // namespace

DepthTicks chooseDepthTicks(double top_m, double base_m, double mm_per_m, double min_spacing_mm) {
    if (!std::isfinite(top_m) || !std::isfinite(base_m) || base_m <= top_m) {
        throw std::invalid_argument("chooseDepthTicks: base_m must lie below top_m");
    }
    if (!(mm_per_m > 0.0) || !(min_spacing_mm > 0.0)) {
        throw std::invalid_argument("chooseDepthTicks: mm_per_m and min_spacing_mm must be > 0");
    }
    DepthTicks ticks;
    // Walk the 1-2-5 series upward from 1 mm of depth until the spacing is wide enough.
    double decade = 0.001;
    const double mantissas[] = {1.0, 2.0, 5.0};
    bool found = false;
    while (!found) {
        for (const double m : mantissas) {
            if (m * decade * mm_per_m >= min_spacing_mm) {
                ticks.major_step_m = m * decade;
                found = true;
                break;
            }
        }
        if (!found) {
            decade *= 10.0;
        }
    }
    const bool two_step = std::abs(ticks.major_step_m / decade - 2.0) < 1e-9;
    const double minor = ticks.major_step_m / (two_step ? 4.0 : 5.0);
    ticks.minor_step_m = minor * mm_per_m >= kMinMinorSpacing_mm ? minor : 0.0;
    ticks.label_decimals =
        std::max(0, static_cast<int>(std::ceil(-std::log10(ticks.major_step_m) - 1e-9)));

    ticks.major_m = multiplesBetween(top_m, base_m, ticks.major_step_m);
    if (ticks.minor_step_m > 0.0) {
        const double ratio = ticks.major_step_m / ticks.minor_step_m;
        for (const double d : multiplesBetween(top_m, base_m, ticks.minor_step_m)) {
            const double k = d / ticks.minor_step_m;
            if (std::abs(std::fmod(std::round(k), ratio)) > 1e-6) {
                ticks.minor_m.push_back(d);
            }
        }
    }
    return ticks;
}

} // namespace atollog::draw
