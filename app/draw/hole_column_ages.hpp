#pragma once
// The age track of a hole column: age (Ma) across, depth down on the column's own scale. The
// age model's 95 % band as one translucent polygon and its median as a line, both through every
// grid row (two rows at one depth at a logged surface make the jump a horizontal step); dates
// as markers at the middle of their depth bracket with a horizontal bar over their 95 % age
// range and a vertical bar over the bracket, hollow when the model does not use them.
#include "draw/depth_scale.hpp"
#include "draw/display_list.hpp"
#include "draw/hole_column.hpp"
#include "draw/hole_column_window.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// The age axis of one column's age track.
struct AgeTrackScale {
    double young_ma = 0.0; // at left_mm
    double old_ma = 1.0;   // at right_mm
    double left_mm = 0.0;
    double right_mm = 0.0;
    std::vector<double> ticks_ma; // 2-3 round values (1-2-5 steps) inside the range
    int decimals = 0;             // of the tick labels

    double x_mm(double age_ma) const {
        return left_mm + (age_ma - young_ma) / (old_ma - young_ma) * (right_mm - left_mm);
    }
    /// The i-th tick's label; the last carries the unit ("1.0 Ma").
    std::string tickLabel(std::size_t i) const;
};

/// The scale of the column's age track: the input's common range when given, else the span of
/// what the track shows (the model's 2.5-97.5 % ages over all rows, the dates' ranges), padded
/// when it is a single age. nullopt when the column shows no age track.
std::optional<AgeTrackScale> ageTrackScale(const HoleColumnInput &input,
                                           const HoleColumnTrackPositions &x);

/// The age-model rows inside the window, in order: rows between its edges as given, and a row
/// interpolated linearly in depth at each edge that falls between two rows (not at a surface's
/// pair of rows, which keep their order).
std::vector<ColumnAgeRow> ageRowsInWindow(const std::vector<ColumnAgeRow> &rows,
                                          const DepthWindow &window);

/// Appends the track (nothing when it is not shown).
void appendAgeTrack(DisplayList &list, const HoleColumnInput &input, const DepthScale &scale,
                    const DepthWindow &window, const HoleColumnTrackPositions &x,
                    HoleColumnLegendContent &legend);

} // namespace atollog::draw
