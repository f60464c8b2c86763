#pragma once

#include <algorithm>

namespace atollog::draw {

/// A point in scene units: millimetres on paper, x to the right, y down.
struct PointMm {
    double x_mm = 0.0;
    double y_mm = 0.0;

    friend bool operator==(const PointMm &, const PointMm &) = default;
};

/// An axis-aligned rectangle in scene millimetres. A rectangle of zero height (a range bar of a
/// taxon found in one sample) is still a valid, intersectable rectangle.
struct RectMm {
    double left_mm = 0.0;
    double top_mm = 0.0;
    double width_mm = 0.0;
    double height_mm = 0.0;

    double right_mm() const { return left_mm + width_mm; }
    double bottom_mm() const { return top_mm + height_mm; }

    /// Closed-interval test, so that a zero-height bar lying on the visible edge is painted.
    bool intersects(const RectMm &o) const {
        return left_mm <= o.right_mm() && o.left_mm <= right_mm() && top_mm <= o.bottom_mm() &&
               o.top_mm <= bottom_mm();
    }

    RectMm united(const RectMm &o) const {
        const double l = std::min(left_mm, o.left_mm);
        const double t = std::min(top_mm, o.top_mm);
        const double r = std::max(right_mm(), o.right_mm());
        const double b = std::max(bottom_mm(), o.bottom_mm());
        return RectMm{l, t, r - l, b - t};
    }

    RectMm grown(double margin_mm) const {
        return RectMm{left_mm - margin_mm, top_mm - margin_mm, width_mm + 2 * margin_mm,
                      height_mm + 2 * margin_mm};
    }

    friend bool operator==(const RectMm &, const RectMm &) = default;
};

} // namespace atollog::draw
