#pragma once

#include "draw/display_list.hpp"
#include "draw/hole_column.hpp"

namespace atollog::draw {

/// Draws the header of a hole column so that it ends at body_top_mm: the hole id, a line with
/// collar elevation and drilled depth, rotated track headings, and the texture scale above the
/// lithology track (a tick at the right edge of each class's box width, with its name). The
/// height is holeColumnHeaderHeight_mm.
void appendHoleColumnHeader(DisplayList &list, const HoleColumnInput &input,
                            const HoleColumnView &view, const HoleColumnStyle &style,
                            const HoleColumnTrackPositions &x, double body_top_mm);

/// "m" or "ft": the unit word of the view's depth labels.
const char *depthUnitWord(DepthUnit unit);

/// A depth in metres written in the view's unit with `decimals` decimals and the unit word.
std::string depthText(double depth_m, DepthUnit unit, int decimals);

} // namespace atollog::draw
