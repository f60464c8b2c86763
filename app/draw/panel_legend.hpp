#pragma once
// The panel's legend: what the columns drew (their merged HoleColumnLegendContent, drawn as a
// hole column's legend draws it), then a "Correlation" block with rows for ties and isochrons,
// each only when the panel shows it.
#include "draw/display_list.hpp"
#include "draw/hole_column_legend.hpp"

namespace atollog::draw {

/// What the correlation block lists.
struct PanelLegendLinks {
    bool ties = false;
    bool tie_skips = false;
    bool isochrons = false;
    bool isochron_skips = false;
    bool sea_level = false;
};

/// Appends the legend at `top_left`; returns the box it covers (empty when nothing was drawn).
RectMm appendPanelLegend(DisplayList &list, const HoleColumnLegendContent &columns,
                         const PanelLegendLinks &links, PointMm top_left,
                         const HoleColumnStyle &style);

} // namespace atollog::draw
