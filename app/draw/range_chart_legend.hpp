#pragma once

#include "draw/display_list.hpp"
#include "draw/range_chart_style.hpp"

#include <string>
#include <vector>

namespace atollog::draw {

/// What a range chart actually drew, so its legend lists exactly that.
struct RangeChartLegendContent {
    std::vector<std::string> groups; // group words, in order of first column
    bool in_place = false;
    bool range_bar = false;
    bool reworked = false;
    bool caved = false;
    bool top_pick = false;
    bool base_pick = false;
    bool bracket = false;
    bool extended_bracket = false;
    bool open_ended = false;
    bool sample_examined = false;
    bool sample_barren = false;
    bool recovered = false;
    bool unrecovered = false;
};

/// Appends the legend with its top-left corner at `top_left`; returns the box it occupies
/// (estimated text widths). Nothing is appended, and an empty box returned, when nothing is shown.
RectMm appendRangeChartLegend(DisplayList &list, const RangeChartLegendContent &content,
                              PointMm top_left, const RangeChartStyle &style);

} // namespace atollog::draw
