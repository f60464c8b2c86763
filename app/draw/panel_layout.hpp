#pragma once
// The correlation panel: hole columns side by side on one vertical axis (depth below collar,
// elevation, or flattened on a tie or isochron), tie lines and isochrons joining them, a title
// block and a legend of what is shown. A pure function of plain input: no Qt, no engine, no db.
#include "draw/depth_scale.hpp"
#include "draw/display_list.hpp"
#include "draw/panel_input.hpp"

#include <cstddef>
#include <optional>
#include <vector>

namespace atollog::draw {

/// Geometry the viewer needs for hit tests and interaction.
struct PanelGeometry {
    /// Per column: from its left edge (left of its depth labels) to its right edge, from the top
    /// of its header to the bottom of what it drew.
    std::vector<RectMm> column_boxes;
    /// Per column on a depth or elevation axis: axis value = depth + offset (0 on an age axis).
    std::vector<double> column_offset_m;
    /// Per column: depth to paper y (through its age model on an age axis; unset for a hole
    /// without one there).
    std::vector<std::optional<DepthScale>> column_scales;
    double mm_per_axis_unit = 0.0; ///< paper mm per axis unit (m, or Myr on an age axis)
    double axis_origin_y_mm = 0.0; ///< paper y of axis_top_m
    double axis_top_m = 0.0;       ///< axis value at the top of the shown window (m or Ma)
    double axis_base_m = 0.0;      ///< axis value at its base
    /// Per column: x of the lithology track's edges; ties and isochrons come into a column at
    /// its lithology_left_mm and leave it at link_out_mm (its right edge, past its data tracks).
    std::vector<double> lithology_left_mm, lithology_right_mm, link_out_mm;
};

/// Lays out the panel. Columns stand left to right with view.column_gap_mm between their edges;
/// only items meeting the view's window are produced (each column through its own depth window,
/// ties and isochrons cut at it); the page is the panel plus a margin. Validates first
/// (validatePanelInput, then each column) and throws std::invalid_argument naming the item and
/// the fix. `geometry`, when given, receives the placement.
DisplayList layoutPanel(const PanelInput &input, const PanelView &view,
                        PanelGeometry *geometry = nullptr);

/// Convenience for the viewer: the paper y (mm) of a depth (m below the collar) in a column,
/// and back. Throw std::out_of_range for a column the geometry does not have, or one with no
/// place on the axis (an age axis and no age model).
double panelY_mm(const PanelGeometry &geometry, std::size_t column, double depth_m);
double panelDepth_m(const PanelGeometry &geometry, std::size_t column, double y_mm);

} // namespace atollog::draw
