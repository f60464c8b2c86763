#pragma once
// The legend rows of a hole column's data tracks (taxa, zones, ages): only what was drawn, with
// swatches drawn by the tracks' own symbols.
#include "draw/hole_column_legend.hpp"
#include "draw/legend_rows.hpp"

namespace atollog::draw {

/// Adds the "Taxa", "Zones" and "Ages" blocks for what `content` says was drawn.
void appendDataTrackLegend(LegendRows &rows, const HoleColumnLegendContent &content);

} // namespace atollog::draw
