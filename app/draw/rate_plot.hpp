#pragma once

#include "draw/display_list.hpp"
#include "draw/rate_plot_input.hpp"
#include "draw/xy_plot_style.hpp"

namespace atollog::draw {

/// Accretion rate against depth or age for one hole: depth (m) or age (Ma) along the bottom,
/// rate (m/Myr) up the left side on a logarithmic axis. Logarithmic, not linear: rates between
/// close ties come with 97.5 % quantiles tens of times their medians, and one such interval
/// on a linear axis flattens every other bar onto the 0 line; on a log axis an equal factor of
/// uncertainty is an equal height wherever the rate lies (reef framework at thousands of m/Myr
/// and lagoon mud at tens both read). Each interval is a horizontal bar at its median rate over
/// its span, in a box from its 2.5 % to its 97.5 % rate: intervals between ties in blue with a
/// translucent box, logged packages in vermillion with a dashed bar and an outlined box (they
/// overlap the ties' intervals, so they differ by dash and fill as well as colour). The legend
/// lists only the kinds drawn.
///
/// Roles: RateBar and RateBand (key: the interval's label), XyAxis/XyAxisLabel, Frame,
/// Title/Subtitle, LegendSwatch/LegendText.
///
/// Throws std::invalid_argument naming the hole and the interval when there is no interval,
/// an interval has no label, a value is not finite, its span's base is not past its top, its
/// median rate lies outside its range, a rate is not above 0 (a log axis cannot show it), or
/// (when an axis range is given) it lies off that axis.
DisplayList layoutRatePlot(const RatePlotInput &input, const XyPlotStyle &style = {});

/// The frame layoutRatePlot draws into. Expects a validated input.
XyPlotFrame ratePlotFrame(const RatePlotInput &input, const XyPlotStyle &style = {});

} // namespace atollog::draw
