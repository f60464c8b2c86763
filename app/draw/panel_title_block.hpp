#pragma once
// The title block over a correlation panel: the project title, the holes shown, and a line with
// the vertical scale, the axis mode and the date, so a printed panel can be measured and dated.
#include "draw/display_list.hpp"
#include "draw/panel_input.hpp"

namespace atollog::draw {

/// Height the block takes (0 when view.title_block is off).
double panelTitleBlockHeight_mm(const PanelView &view);

/// Appends the block with its top-left corner at `top_left` (nothing when view.title_block is
/// off); returns the box it covers. Roles: Title (key: the title), Subtitle (keys "holes",
/// "scale"). `mm_per_axis_unit` is the panel's vertical scale as laid out: an age axis states it
/// as mm per Myr, the others as the view's ratio.
RectMm appendPanelTitleBlock(DisplayList &list, const PanelInput &input, const PanelView &view,
                             PointMm top_left, double mm_per_axis_unit);

} // namespace atollog::draw
