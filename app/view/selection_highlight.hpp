#pragma once
// How a selection shows: every item of the selected datum (a tie's lines, bars and band across
// all holes, not only the segment clicked) redrawn on top in the highlight colour. Made as a
// display list, so the canvas paints it with the same backend as the panel.
#include "draw/display_list.hpp"

namespace atollog::view {

/// True when two roles draw the same kind of datum (a tie's line, band and label; an
/// isochron's; otherwise only the same role).
bool sameDatum(draw::ItemRole a, draw::ItemRole b);

/// Copies of the items of `tag`'s datum (same key, sameDatum role) in the highlight colour,
/// lines and outlines thickened, bands tinted without outline; with the page of `list`.
draw::DisplayList selectionHighlight(const draw::DisplayList &list, const draw::ItemTag &tag);

} // namespace atollog::view
