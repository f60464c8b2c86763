#pragma once

#include "draw/age_depth_plot_style.hpp"
#include "draw/display_list.hpp"

#include <string>
#include <vector>

namespace atollog::draw {

/// What an age-depth plot actually drew, so its legend lists exactly that.
struct AgeDepthLegendContent {
    bool envelope = false;
    bool median = false;
    std::string reference_label; // empty: no reference line drawn
    bool datum = false;          // ties used by the model, by kind
    bool date = false;
    bool tie_bars = false;
    bool outlier = false;
    bool excluded_datum = false;
    bool excluded_date = false;
    bool hiatus = false;
};

/// Appends the legend with its top-left corner at `top_left`; returns the box it occupies
/// (estimated text widths). Nothing is appended, and an empty box returned, when nothing is shown.
/// The ring that marks an outlier around a tie marker of size marker_mm, as a closed polyline
/// (a hollow Marker would paint white over the bars inside it). Shared with the plot.
std::vector<PointMm> outlierRing(PointMm centre, double marker_mm);

RectMm appendAgeDepthLegend(DisplayList &list, const AgeDepthLegendContent &content,
                            PointMm top_left, const AgeDepthPlotStyle &style);

} // namespace atollog::draw
