#pragma once

namespace atollog::draw {

/// Sizes of an x-y plot on paper, shared by every x-y plot; readable when printed at 100 %.
struct XyPlotStyle {
    double margin_mm = 10.0;
    double title_size_pt = 11.0;
    double subtitle_size_pt = 8.0;
    double label_size_pt = 7.0;       // tick labels, headings, legend
    double point_label_size_pt = 6.5; // labels beside points
    double y_axis_width_mm = 16.0;    // y tick labels and heading, left of the plot
    double x_tick_min_spacing_mm = 14.0; // x labels stand side by side, so wider apart
    double y_tick_min_spacing_mm = 10.0;
    double marker_mm = 2.0;
    double legend_gap_mm = 8.0;
    double legend_row_mm = 4.2;
};

} // namespace atollog::draw
