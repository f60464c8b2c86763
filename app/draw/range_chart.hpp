#pragma once

#include "draw/depth_scale.hpp"
#include "draw/display_list.hpp"
#include "draw/range_chart_input.hpp"
#include "draw/range_chart_style.hpp"

namespace atollog::draw {

/// Lays out the range chart of one hole: title, depth axis (m) with sample ticks and a
/// recovery track, one column per taxon (name rotated above, in-place occurrences joined into a
/// range bar, reworked and caved occurrences as hollow symbols beside it, picks as a marker at
/// the quoted depth with a bracket over the interval they may lie in) and a legend listing only
/// what is drawn. A pure function: no Qt, no font engine, no files.
///
/// Throws std::invalid_argument naming the offending item when the section is empty, a depth is
/// not finite or lies outside the section, a pick's quoted depth lies outside its bracket, an
/// abundance rank is outside 0..5, a taxon id repeats, or a pick names an unknown taxon.
DisplayList layoutRangeChart(const RangeChartInput &input, const RangeChartStyle &style = {});

/// The depth scale layoutRangeChart uses for this input, so callers (tests, the viewer's
/// pointer read-out) can map between depth and paper y exactly as the chart does.
DepthScale rangeChartDepthScale(const RangeChartInput &input, const RangeChartStyle &style = {});

} // namespace atollog::draw
