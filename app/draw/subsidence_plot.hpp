#pragma once

#include "draw/display_list.hpp"
#include "draw/subsidence_plot_input.hpp"
#include "draw/xy_plot_style.hpp"

namespace atollog::draw {

/// Subsidence against age: age (Ma) along the bottom, older to the right; subsidence (m) down
/// the left side, growing downward like the depth it is. Each dated horizon is a marker at its
/// median age and subsidence with capped bars over both 95 % ranges; each hole has its own
/// colour and marker (xy_series_style.hpp) and its fitted rate line, drawn over the age range of
/// its points; the legend lists each hole with its rate +- 1 sd.
///
/// Roles: SubsidencePoint and SubsidenceBar (key "<hole> <sample>"), SubsidenceRateLine (key
/// the hole), XyAxis/XyAxisLabel, Frame, Title/Subtitle, LegendSwatch/LegendText.
///
/// Throws std::invalid_argument naming the hole and sample when there is no hole, a hole has
/// no name, two holes share one, a hole has no point, a value is not finite, a median lies
/// outside its range, a rate sd is negative, or (when an axis range is given) a point or its
/// range lies off that axis.
DisplayList layoutSubsidencePlot(const SubsidencePlotInput &input,
                                 const XyPlotStyle &style = {});

/// The frame layoutSubsidencePlot draws into (for tests and the viewer's read-out). Expects a
/// validated input.
XyPlotFrame subsidencePlotFrame(const SubsidencePlotInput &input, const XyPlotStyle &style = {});

} // namespace atollog::draw
