#pragma once
// The depth window of one hole column and the cutting of items at its edges, shared by the
// column's tracks.
#include "draw/depth_scale.hpp"
#include "draw/hole_column_input.hpp"
#include "draw/hole_column_view.hpp"
#include "draw/scene_rect.hpp"

#include <algorithm>
#include <optional>

namespace atollog::draw {

/// The depths (m) a column shows: the view's window, its unset ends the collar and the drilled
/// base.
struct DepthWindow {
    double top_m;
    double base_m;

    bool meets(double top, double base) const { return top <= base_m && base >= top_m; }
    bool contains(double d) const { return d >= top_m && d <= base_m; }
};

inline DepthWindow depthWindowOf(const HoleColumnInput &in, const HoleColumnView &view) {
    return {view.window_top_m.value_or(0.0), view.window_base_m.value_or(in.drilled_base_m)};
}

/// A box spanning top..base (m) in x0..x0+width, cut at the window; nothing when it has no
/// height left. Both ends go through the scale (which need not be linear).
inline std::optional<RectMm> boxInWindow(const DepthScale &scale, const DepthWindow &w,
                                         double top_m, double base_m, double x0_mm,
                                         double width_mm) {
    const double top = std::max(top_m, w.top_m);
    const double base = std::min(base_m, w.base_m);
    if (base <= top) {
        return std::nullopt;
    }
    // The base is drawn on the shallower side of a step of a warped scale (age axis), so a unit
    // resting on a surface ends where the time gap under it opens.
    return RectMm{x0_mm, scale.y_mm(top), width_mm, scale.yAbove_mm(base) - scale.y_mm(top)};
}

} // namespace atollog::draw
