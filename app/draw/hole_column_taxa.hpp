#pragma once
// The taxon lanes of a hole column: for each chosen taxon a bar from its shallowest to its
// deepest counted in-place find, a filled mark at each find, reworked and caved finds hollow
// beside the bar.
#include "draw/depth_scale.hpp"
#include "draw/display_list.hpp"
#include "draw/hole_column.hpp"
#include "draw/hole_column_window.hpp"

namespace atollog::draw {

/// The lane centre (scene mm) of the i-th taxon.
double taxonLaneCentre_mm(const HoleColumnTrackPositions &x, const HoleColumnStyle &style,
                          std::size_t lane);

/// Appends the lanes (nothing when the taxa track is hidden). Only what meets the window, the
/// bar cut at its edges; every depth goes through `scale`.
void appendTaxonLanes(DisplayList &list, const HoleColumnInput &input, const HoleColumnStyle &style,
                      const DepthScale &scale, const DepthWindow &window,
                      const HoleColumnTrackPositions &x, HoleColumnLegendContent &legend);

} // namespace atollog::draw
