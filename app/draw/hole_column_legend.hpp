#pragma once

#include "draw/display_list.hpp"
#include "draw/hole_column_input.hpp"
#include "draw/hole_column_style.hpp"

#include <vector>

namespace atollog::draw {

/// One fill a column used: the rock, and whether it was drawn as reef framework.
struct DrawnFill {
    RockKind rock = RockKind::Limestone;
    bool reef_framework = false;
    friend bool operator==(const DrawnFill &, const DrawnFill &) = default;
};

/// What a hole column actually drew, so its legend lists exactly that (in order of first
/// appearance down the hole).
struct HoleColumnLegendContent {
    std::vector<DrawnFill> fills;
    std::vector<SurfaceKind> surfaces;
    bool recovered = false;
    bool unrecovered = false;
    bool samples = false;

    void addFill(DrawnFill f);
    void addSurface(SurfaceKind s);
    /// Merges another column's content (a correlation panel shares one legend).
    void merge(const HoleColumnLegendContent &other);
};

/// Appends the legend with its top-left corner at `top_left`; returns the box it occupies.
/// Appends nothing, and returns an empty box, when nothing was drawn.
RectMm appendHoleColumnLegend(DisplayList &list, const HoleColumnLegendContent &content,
                              PointMm top_left, const HoleColumnStyle &style);

} // namespace atollog::draw
