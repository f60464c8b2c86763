#pragma once
// The zone lanes of a hole column: one lane per zonation scheme, each zone a box from its top
// boundary to its base boundary, neighbours in alternate greys, the bracket of each picked
// boundary hatched (the boundary lies somewhere in it), an edge whose event is not picked here
// dashed. The zone name sits in the box, turned when it does not fit across, left out when it
// fits neither way (the tooltip still names the zone).
#include "draw/depth_scale.hpp"
#include "draw/display_list.hpp"
#include "draw/hole_column.hpp"
#include "draw/hole_column_window.hpp"

#include <vector>

namespace atollog::draw {

/// 45-degree hatch lines (rising to the right) clipped to a box, `spacing_mm` apart along x,
/// anchored at the scene origin so neighbouring boxes continue one another.
std::vector<Line> hatchLines(const RectMm &box, double spacing_mm, const Stroke &stroke,
                             const ItemTag &tag);

/// Sub-lanes of one scheme's lane for zones sorted by their tops: zones whose certain bodies
/// overlap (the picks disagree in the hole) go side by side. Returns each zone's sub-lane and
/// sets `count` (at least 1).
std::vector<std::size_t> zoneSubLanes(const std::vector<const ColumnZone *> &zones,
                                      std::size_t &count);

/// Appends the lanes (nothing when the zones track is hidden). Only what meets the window, cut
/// at its edges; every depth goes through `scale`.
void appendZoneLanes(DisplayList &list, const HoleColumnInput &input, const HoleColumnStyle &style,
                     const DepthScale &scale, const DepthWindow &window,
                     const HoleColumnTrackPositions &x, HoleColumnLegendContent &legend);

} // namespace atollog::draw
