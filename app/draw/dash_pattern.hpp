#pragma once

#include "draw/display_list.hpp"

#include <vector>

namespace atollog::draw {

/// Dash and gap lengths on paper for a dashed or dotted stroke (Solid has none).
struct DashLengths {
    double on_mm = 0.0;
    double off_mm = 0.0;
};
DashLengths dashLengths(DashStyle style);

/// Cuts a polyline into its dashes: each dash is a polyline of its own (it may turn a corner),
/// the pattern runs on across vertices and starts with a dash at the first point.
///
/// Dashes are cut here rather than by QPen because QSvgGenerator (Qt 6.4) writes a pen's dash
/// pattern into stroke-dasharray in multiples of the pen width, while SVG reads it in user
/// units: a dotted 0.1 mm line came out with dots ten times too long. Cut geometry looks the
/// same on every backend. Throws std::invalid_argument when on_mm or off_mm is not positive.
std::vector<std::vector<PointMm>> splitIntoDashes(const std::vector<PointMm> &points,
                                                  DashLengths dash);

} // namespace atollog::draw
