#pragma once
// Cutting tie and isochron geometry at the panel's window: the window is a horizontal strip
// y_top..y_bottom on paper, and only what lies inside it is produced.
#include "draw/scene_rect.hpp"

#include <optional>
#include <utility>
#include <vector>

namespace atollog::draw {

/// The part of a closed polygon inside top_mm <= y <= bottom_mm (Sutherland-Hodgman against the
/// two edges; the polygons here are convex quadrilaterals, for which the result is exact).
/// Empty when nothing is left.
std::vector<PointMm> clipPolygonToStrip(const std::vector<PointMm> &polygon, double top_mm,
                                        double bottom_mm);

/// The part of a segment inside the strip, if any.
std::optional<std::pair<PointMm, PointMm>> clipSegmentToStrip(PointMm a, PointMm b, double top_mm,
                                                              double bottom_mm);

} // namespace atollog::draw
