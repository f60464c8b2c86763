#pragma once

#include "draw/display_list.hpp"

class QPainter;

namespace atollog::draw {

/// Draws `pattern` as line work clipped to `box` (scene mm; the painter is in scene mm). The
/// pattern grid is anchored at the scene origin, so neighbouring boxes continue one another.
void paintFillPattern(QPainter &painter, FillPattern pattern, const RectMm &box);

} // namespace atollog::draw
