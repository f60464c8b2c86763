#pragma once
// Where everything of a correlation panel goes, worked out before anything is drawn: each
// column's shift on the shared axis, the axis range shown, the columns' x positions and the y
// origin. Ties, isochrons, the axis and the columns all read this one frame, so they agree.
#include "draw/depth_scale.hpp"
#include "draw/hole_column.hpp"
#include "draw/panel_input.hpp"

#include <optional>
#include <vector>

namespace atollog::draw {

struct PanelColumnFrame {
    HoleColumnTrackPositions x;
    double offset_m = 0.0;   ///< axis value = depth + offset_m
    bool flattened = false;  ///< shifted to the flattening level
    bool has_note = false;   ///< "not flattened" over the header
    /// The column's depth window (m below its collar); unset when nothing of it is in the window.
    std::optional<HoleColumnView> view;
    double header_height_mm = 0.0;
};

struct PanelFrame {
    std::vector<PanelColumnFrame> columns;
    double axis_top_m = 0.0; ///< axis value at the top of the body
    double axis_base_m = 0.0;
    double mm_per_m = 2.0;
    double axis_origin_y_mm = 0.0; ///< y of axis_top_m
    double axis_x_mm = 0.0;        ///< the shared axis line
    double title_top_mm = 0.0;

    double y_mm(double axis_m) const { return axis_origin_y_mm + (axis_m - axis_top_m) * mm_per_m; }
    /// The column's depths on paper: a DepthScale whose depth d lands at y_mm(d + offset).
    DepthScale columnScale(std::size_t column) const {
        return DepthScale(axis_top_m - columns[column].offset_m, mm_per_m, axis_origin_y_mm);
    }
    double columnY_mm(std::size_t column, double depth_m) const {
        return y_mm(depth_m + columns[column].offset_m);
    }
};

/// The level (m below the collar) of the flattening item in a column, if the column has it:
/// a tie's observed level, or an isochron's median depth. A tie of that name wins over an
/// isochron of the same name.
std::optional<double> flatteningLevel_m(const PanelInput &input, const std::string &name,
                                        std::size_t column);

/// Lays out the frame for a validated input. `title_height_mm` is the room the title block takes
/// above the column headers.
PanelFrame placePanel(const PanelInput &input, const PanelView &view, double title_height_mm,
                      const HoleColumnStyle &style);

} // namespace atollog::draw
