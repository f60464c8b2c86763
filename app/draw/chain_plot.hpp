#pragma once

#include "draw/chain_plot_input.hpp"
#include "draw/display_list.hpp"
#include "draw/xy_plot_style.hpp"

namespace atollog::draw {

/// Age against distance along the volcanic chain: distance (km) along the bottom from the
/// active centre, age (Ma) up the left side, both from 0. Each hole is a marker with capped bars
/// over +- 1.96 sd (95 % of a normal) in distance and age, its name beside it; the fitted line
/// runs from distance 0 (where its intercept is the age at the active centre) to the farthest
/// point, and the legend gives the rate +- 1 sd.
///
/// Roles: ChainPoint, ChainBar, ChainLabel (key: the hole), ChainFit (key "fit"), XyAxis/
/// XyAxisLabel, Frame, Title/Subtitle, LegendSwatch/LegendText.
///
/// Throws std::invalid_argument naming the hole when there is no point, a hole has no name or
/// is given twice, a value is not finite, an sd is negative, the fit's rate sd is negative or
/// its values are not finite, or (when an axis range is given) a point's 95 % range lies off it.
DisplayList layoutChainPlot(const ChainPlotInput &input, const XyPlotStyle &style = {});

/// The frame layoutChainPlot draws into. Expects a validated input.
XyPlotFrame chainPlotFrame(const ChainPlotInput &input, const XyPlotStyle &style = {});

/// Half the width of a 95 % range of a normal error: 1.96 sd.
inline constexpr double kNormal95 = 1.96;

} // namespace atollog::draw
