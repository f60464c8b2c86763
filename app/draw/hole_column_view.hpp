#pragma once

#include <optional>

namespace atollog::draw {

enum class DepthUnit { Metres, Feet };

/// How a column is looked at, as opposed to what the hole holds: the same view is shared by
/// every column of a later correlation panel.
struct HoleColumnView {
    double scale_ratio = 200.0; // depth scale 1:N (used when the layout makes its own scale)
    DepthUnit depth_unit = DepthUnit::Metres; // axis labels only; the input stays in metres
    /// The depth window to draw (metres). Items wholly outside it are not produced and those
    /// crossing its edges are cut at them, so a long hole lays out only what is on screen.
    /// Unset ends default to the collar (0 m) and the drilled base.
    std::optional<double> window_top_m;
    std::optional<double> window_base_m;
};

/// 1 ft = 0.3048 m exactly (international foot, 1959 agreement); as in the folder contract.
inline constexpr double kMetresPerFoot = 0.3048;

} // namespace atollog::draw
