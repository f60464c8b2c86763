#include "draw/depth_scale.hpp"

#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog::draw {

DepthScale::DepthScale(double top_m, double mm_per_m, double origin_y_mm)
    : top_m_(top_m), mm_per_m_(mm_per_m), origin_y_mm_(origin_y_mm) {
    if (!std::isfinite(top_m) || !std::isfinite(origin_y_mm)) {
        throw std::invalid_argument("DepthScale: top_m and origin_y_mm must be finite");
    }
    if (!std::isfinite(mm_per_m) || mm_per_m <= 0.0) {
        throw std::invalid_argument("DepthScale: mm_per_m must be a positive finite number, got " +
                                    std::to_string(mm_per_m));
    }
}

DepthScale DepthScale::fromRatio(double top_m, double ratio_denominator, double origin_y_mm) {
    if (!std::isfinite(ratio_denominator) || ratio_denominator <= 0.0) {
        throw std::invalid_argument("DepthScale: the scale 1:N needs a positive finite N, got " +
                                    std::to_string(ratio_denominator));
    }
    // 1:N means 1 mm of paper per N mm of hole, i.e. 1000/N mm of paper per metre.
    return DepthScale(top_m, 1000.0 / ratio_denominator, origin_y_mm);
}

} // namespace atollog::draw
