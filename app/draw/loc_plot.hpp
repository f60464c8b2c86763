#pragma once

#include "draw/display_list.hpp"
#include "draw/loc_plot_input.hpp"
#include "draw/xy_plot_style.hpp"

#include <string>

namespace atollog::draw {

/// The line-of-correlation cross-plot of two holes: depth in the x hole (m) along the bottom,
/// depth in the y hole (m) down the left side. Each shared event is a light box over its two
/// depth brackets with a marker at its two observed levels (base/FO: triangle down, top/LO:
/// triangle up, dated horizon: circle, each in its own colour); events flagged off the line are
/// ringed in black and labelled (every event with label_every_event). Each fitted piece is a
/// solid line over its own x range with its 95 % band; logged surfaces of the x hole are dashed
/// vertical lines, of the y hole dashed horizontal lines, each labelled with its depth. The axes
/// span the brackets and the pieces (surfaces outside them are left out). The legend lists only
/// what is drawn.
///
/// Roles: LocEventBracket, LocEventMarker, LocEventLabel, LocOffLine (key: the event id),
/// LocSegment and LocSegmentBand (key "segment <n>", from 1), LocSurface (key locSurfaceKey),
/// XyAxis/XyAxisLabel, Frame, Title/Subtitle, LegendSwatch/LegendText.
///
/// Throws std::invalid_argument naming the item when a hole name is empty or both are the
/// same, there is no event, an event has no id, a bracket is inverted or its level lies outside
/// it, a piece's x range is empty or its band is out of order, a value is not finite, or (when
/// an axis range is given) an event's bracket lies off it.
DisplayList layoutLocPlot(const LocPlotInput &input, const XyPlotStyle &style = {});

/// The frame layoutLocPlot draws into. Expects a validated input.
XyPlotFrame locPlotFrame(const LocPlotInput &input, const XyPlotStyle &style = {});

/// The key of a surface's items: "x 34.00" or "y 12.50" (m, two decimals).
std::string locSurfaceKey(char axis, double depth_m);

} // namespace atollog::draw
