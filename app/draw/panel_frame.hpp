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
    double offset_m = 0.0;   ///< depth and elevation axes: axis value = depth + offset_m
    bool flattened = false;  ///< shifted to the flattening level
    bool has_note = false;   ///< "not flattened" over the header
    bool no_age_model = false; ///< age axis: the hole has no model to stand on it
    /// Depth to paper y for this column (linear, or through its age model on an age axis).
    std::optional<DepthScale> scale;
    /// The column's depth window (m below its collar); unset when nothing of it is in the window.
    std::optional<HoleColumnView> view;
    double header_height_mm = 0.0;
};

struct PanelFrame {
    std::vector<PanelColumnFrame> columns;
    double axis_top_m = 0.0; ///< axis value at the top of the body (m, or Ma on an age axis)
    double axis_base_m = 0.0;
    double mm_per_axis_unit = 2.0; ///< paper mm per axis unit (m, or Myr on an age axis)
    double axis_origin_y_mm = 0.0; ///< y of axis_top_m
    double axis_x_mm = 0.0;        ///< the shared axis line
    double title_top_mm = 0.0;

    double y_mm(double axis_value) const {
        return axis_origin_y_mm + (axis_value - axis_top_m) * mm_per_axis_unit;
    }
    /// The column's depths on paper: depth d lands at y_mm(d + offset), or on an age axis at
    /// y_mm(median age at d).
    const DepthScale &columnScale(std::size_t column) const { return *columns.at(column).scale; }
    double columnY_mm(std::size_t column, double depth_m) const {
        return columnScale(column).y_mm(depth_m);
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
