#pragma once

#include "draw/display_list.hpp"
#include "draw/panel_frame.hpp"
#include "draw/panel_input.hpp"
#include "draw/panel_link_labels.hpp"

#include <vector>

namespace atollog::draw {

/// Every isochron of the panel (panel_links.hpp) in the isochron look of panel_style.hpp: the
/// q025..q975 band into `bands`, the q500 line into `lines`, its label into `labels`.
/// Returns whether any isochron skipped a hole.
bool appendPanelIsochrons(DisplayList &bands, DisplayList &lines, std::vector<LinkLabel> &labels,
                          const PanelFrame &frame, const PanelInput &input);

} // namespace atollog::draw
