#pragma once

namespace atollog::draw {

/// Sizes of an age-depth plot on paper. The defaults give a plot readable when printed at 100 %.
struct AgeDepthPlotStyle {
    double margin_mm = 10.0;
    double title_size_pt = 11.0;
    double subtitle_size_pt = 8.0;
    double label_size_pt = 7.0;     // axis labels and headings, legend
    double tie_label_size_pt = 6.5; // labels beside the ties and hiatuses
    bool show_tie_labels = true;
    double depth_axis_width_mm = 14.0; // depth labels + heading, left of the plot
    double tie_marker_mm = 2.0;
    double legend_gap_mm = 8.0;
    double legend_row_mm = 4.2;
    double major_tick_min_spacing_mm = 10.0; // depth labels never closer than this
    double age_tick_min_spacing_mm = 14.0;   // age labels stand side by side, so wider apart
};

} // namespace atollog::draw
