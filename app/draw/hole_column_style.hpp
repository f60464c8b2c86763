#pragma once

namespace atollog::draw {

/// Sizes of a hole column on paper. The defaults read when printed at 100 % at 1:200 (1 m on
/// 5 mm): labels at 7 pt, the texture names at 6 pt, track widths that leave room for them.
struct HoleColumnStyle {
    double margin_mm = 10.0; // around a stand-alone column page
    double title_size_pt = 10.0;
    double subtitle_size_pt = 7.0;
    double label_size_pt = 7.0;         // depth labels, track headings, legend
    double texture_label_size_pt = 6.0; // texture names above the lithology track
    double depth_axis_width_mm = 12.0;  // labels and ticks, left of the axis line
    double run_track_width_mm = 4.0;
    double lithology_track_width_mm = 30.0;
    double sample_track_width_mm = 4.0;
    double taxon_lane_width_mm = 4.0; // per chosen taxon: bar, finds, and excluded finds aside
    double zone_lane_width_mm = 6.0;  // per zonation scheme; room for a 4-character zone name
    double age_track_width_mm = 26.0;
    double track_label_size_pt = 6.0; // taxon, scheme and age-scale names over their tracks
    double zone_label_size_pt = 5.5;
    double track_gap_mm = 1.5;
    double major_tick_min_spacing_mm = 10.0; // depth labels never closer than this
    double legend_gap_mm = 8.0;
    double legend_row_mm = 5.2;
};

} // namespace atollog::draw
