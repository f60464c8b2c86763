#pragma once
// What the canvas shows: a laid-out panel and the facts needed to read it back (which hole each
// column is, what the vertical axis means). Plain values, filled by the main window after each
// layout, or by hand in tests.
#include "draw/display_list.hpp"
#include "draw/panel_input.hpp"
#include "draw/panel_layout.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::view {

struct PanelScene {
    draw::DisplayList list;
    draw::PanelGeometry geometry;   ///< column boxes and the axis; empty for a plain drawing
    std::vector<std::string> holes; ///< hole id per column, as geometry.column_boxes
    draw::PanelAxis axis = draw::PanelAxis::Depth;
    std::optional<std::string> flatten_on;
    draw::PanelInput input; ///< what was laid out: the data-track tooltips read it
};

} // namespace atollog::view
