#pragma once
// A level correlated from hole to hole (a tie's observed bracket, an isochron's depth range),
// drawn the same way for both: per pair of neighbouring holes that have it, a translucent band
// joining the span on the right edge of the left column's lithology track to the span on the
// left edge of the right column's, a line joining the levels, and a short bar marking the span
// on each edge. A hole without it is skipped: the next hole that has it is joined, with the
// look's skip stroke, so the skip shows.
#include "draw/display_list.hpp"
#include "draw/panel_frame.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

struct LinkLevel {
    std::size_t column = 0;
    double shallow_m = 0.0, level_m = 0.0, deep_m = 0.0; ///< m below that hole's collar
};

struct LinkLook {
    Stroke line;
    Stroke skip_line;
    Colour band;
    std::optional<Stroke> band_outline;
    double edge_bar_mm = 0.5;   ///< width of the span bar on each edge
    double edge_inset_mm = 0.4; ///< how far the bar stands off the lithology track
    ItemRole line_role = ItemRole::TieLine;
    ItemRole band_role = ItemRole::TieBand;
};

/// What appendLink drew: where its label goes (right of the last column that has it, at its
/// level there; unset when that level is outside the window) and whether it skipped a hole.
struct LinkResult {
    std::optional<PointMm> label_at;
    bool skips = false;
};

/// Appends the bands to `bands` and the lines and edge bars to `lines` (the caller draws the
/// columns between the two), all cut at the frame's axis window; returns the label anchor when
/// the level in the last column lies inside the window. Levels may come in any column order.
LinkResult appendLink(DisplayList &bands, DisplayList &lines,
                                          const PanelFrame &frame, std::vector<LinkLevel> levels,
                                          const LinkLook &look, const std::string &key);

} // namespace atollog::draw
