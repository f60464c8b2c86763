#include "draw/depth_scale.hpp"

#include <algorithm>
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

DepthScale DepthScale::warped(std::vector<AxisKnot> knots, double axis_top,
                              double mm_per_axis_unit, double origin_y_mm) {
    DepthScale s(axis_top, mm_per_axis_unit, origin_y_mm);
    if (knots.size() < 2) {
        throw std::invalid_argument("DepthScale: a warped scale needs at least two knots, got " +
                                    std::to_string(knots.size()));
    }
    for (std::size_t i = 0; i < knots.size(); ++i) {
        const AxisKnot &k = knots[i];
        if (!std::isfinite(k.depth_m) || !std::isfinite(k.axis_value)) {
            throw std::invalid_argument("DepthScale: knot " + std::to_string(i + 1) +
                                        " is not finite");
        }
        if (i > 0 && (k.depth_m < knots[i - 1].depth_m || k.axis_value < knots[i - 1].axis_value)) {
            throw std::invalid_argument(
                "DepthScale: knot " + std::to_string(i + 1) + " (" + std::to_string(k.depth_m) +
                " m, " + std::to_string(k.axis_value) +
                ") goes back up from the one before; depth and axis value must not decrease");
        }
    }
    if (!(knots.back().depth_m > knots.front().depth_m)) {
        throw std::invalid_argument("DepthScale: the knots of a warped scale span no depth");
    }
    s.knots_ = std::make_shared<const std::vector<AxisKnot>>(std::move(knots));
    return s;
}

namespace {

double interpolate(const AxisKnot &a, const AxisKnot &b, double depth_m) {
    if (b.depth_m <= a.depth_m) {
        return b.axis_value;
    }
    return a.axis_value + (depth_m - a.depth_m) / (b.depth_m - a.depth_m) * (b.axis_value - a.axis_value);
}

} // namespace

double DepthScale::axisValueBelow(double depth_m) const {
    const std::vector<AxisKnot> &k = *knots_;
    if (depth_m < k.front().depth_m) {
        return k.front().axis_value;
    }
    if (depth_m >= k.back().depth_m) {
        return k.back().axis_value;
    }
    // The first knot deeper than depth_m: knots at depth_m itself (a step) lie before it, and
    // the one just before it is the step's deeper side.
    const auto hi = std::upper_bound(k.begin(), k.end(), depth_m,
                                     [](double d, const AxisKnot &x) { return d < x.depth_m; });
    return interpolate(*std::prev(hi), *hi, depth_m);
}

double DepthScale::axisValueAbove(double depth_m) const {
    const std::vector<AxisKnot> &k = *knots_;
    if (depth_m <= k.front().depth_m) {
        return k.front().axis_value;
    }
    if (depth_m > k.back().depth_m) {
        return k.back().axis_value;
    }
    // The first knot at or deeper than depth_m: at a step, its shallower side.
    const auto at = std::lower_bound(k.begin(), k.end(), depth_m,
                                     [](const AxisKnot &x, double d) { return x.depth_m < d; });
    if (at->depth_m == depth_m) {
        return at->axis_value;
    }
    return interpolate(*std::prev(at), *at, depth_m);
}

double DepthScale::depth_m(double y_mm) const {
    const double v = top_m_ + (y_mm - origin_y_mm_) / mm_per_m_;
    if (!knots_) {
        return v;
    }
    const std::vector<AxisKnot> &k = *knots_;
    if (v <= k.front().axis_value) {
        return k.front().depth_m;
    }
    if (v >= k.back().axis_value) {
        return k.back().depth_m;
    }
    const auto hi = std::lower_bound(k.begin(), k.end(), v,
                                     [](const AxisKnot &x, double value) { return x.axis_value < value; });
    const AxisKnot &a = *std::prev(hi);
    const AxisKnot &b = *hi;
    if (b.axis_value <= a.axis_value || b.depth_m <= a.depth_m) {
        return b.depth_m; // inside a step
    }
    return a.depth_m + (v - a.axis_value) / (b.axis_value - a.axis_value) * (b.depth_m - a.depth_m);
}

double DepthScale::mm_per_m() const {
    if (!knots_) {
        return mm_per_m_;
    }
    const std::vector<AxisKnot> &k = *knots_;
    const double paper_mm = (k.back().axis_value - k.front().axis_value) * mm_per_m_;
    const double span_m = k.back().depth_m - k.front().depth_m;
    // A column whose model spans no time would give 0; keep the tick chooser away from it.
    return std::max(paper_mm / span_m, 1e-9);
}

} // namespace atollog::draw
