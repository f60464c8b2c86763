#pragma once

#include "draw/age_depth_plot_frame.hpp"
#include "draw/age_depth_plot_input.hpp"
#include "draw/age_depth_plot_style.hpp"
#include "draw/display_list.hpp"

#include <string>

namespace atollog::draw {

/// Lays out the age-depth plot of one hole: title and subtitle; a framed plot with depth (m)
/// down its left side and age (Ma) along its top; the model's 95 % band as a light filled area
/// with its median as a line; an optional dotted reference line; each tie as a cross (vertical
/// bar = depth bracket, horizontal bar = age range) around a marker at the middle of its bracket
/// and its central age (diamond = datum, circle = date; a ring marks an outlier, excluded ties
/// are hollow and grey); each hiatus as a dashed line across the plot labelled with its median
/// duration; and a legend listing only what is drawn. A pure function: no Qt, no font engine.
///
/// Items carry their role (ItemRole::Age*, Hiatus*, ReferenceLine, DepthAxis/Tick/Label,
/// Legend*) and a key: the tie's label for tie items, hiatusKey(depth) for hiatus items.
///
/// Throws std::invalid_argument naming the hole, the item and the value when the depth axis is
/// empty, the scale or the age axis length is not positive, a given age axis is empty, the model
/// grid has fewer than two points, is out of depth order or spans no depth, a grid point's
/// quantiles are out of order (2.5 % <= median <= 97.5 %), a tie has no label, an inverted
/// bracket or a central age outside its range, a hiatus duration is negative, the reference
/// line has no label or fewer than two points, any depth lies off the depth axis, or (when the
/// age axis is given) any age drawn lies off the age axis; and for any value that is not finite.
DisplayList layoutAgeDepthPlot(const AgeDepthPlotInput &input, const AgeDepthPlotStyle &style = {});

/// The key of a hiatus's items: its depth in metres to two decimals ("34.00").
std::string hiatusKey(double depth_m);

} // namespace atollog::draw
