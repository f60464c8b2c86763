#pragma once

namespace atollog::draw {

/// Sizes of a range chart on paper. The defaults give a chart readable when printed at 100 %.
struct RangeChartStyle {
    double margin_mm = 10.0;
    double title_size_pt = 11.0;
    double subtitle_size_pt = 8.0;
    double label_size_pt = 7.0;        // depth labels, taxon names, legend
    double depth_axis_width_mm = 14.0; // labels + ticks, left of the axis line
    double sample_track_width_mm = 3.0;
    double recovery_track_width_mm = 3.0;
    double track_gap_mm = 1.5;
    double column_width_mm = 7.0;
    double bar_width_mm = 1.4;
    double min_marker_mm = 0.9; // abundance rank 0
    double max_marker_mm = 2.4; // abundance rank 5
    double pick_marker_mm = 1.8;
    double legend_gap_mm = 8.0;
    double legend_row_mm = 4.2;
    double major_tick_min_spacing_mm = 10.0; // depth labels never closer than this
};

} // namespace atollog::draw
