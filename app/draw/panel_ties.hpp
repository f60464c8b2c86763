#pragma once

#include "draw/display_list.hpp"
#include "draw/panel_frame.hpp"
#include "draw/panel_input.hpp"
#include "draw/panel_link_labels.hpp"

#include <vector>

namespace atollog::draw {

/// Every tie of the panel (panel_links.hpp) in the tie look of panel_style.hpp: bands into
/// `bands`, lines and edge bars into `lines`, one label per tie (its event id) into `labels`.
/// Returns whether any tie skipped a hole (the legend lists the dashed line only then).
bool appendPanelTies(DisplayList &bands, DisplayList &lines, std::vector<LinkLabel> &labels,
                     const PanelFrame &frame, const PanelInput &input);

} // namespace atollog::draw
