#pragma once

#include "draw/display_list.hpp"
#include "draw/hole_column_input.hpp"
#include "draw/hole_column_style.hpp"

#include <string>
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
    std::vector<std::string> taxon_groups; // group words of the taxon bars and finds drawn
    bool taxon_reworked = false;
    bool taxon_caved = false;
    bool zone = false;
    bool zone_bracket = false; // the uncertain part of a boundary
    bool zone_open = false;    // an edge whose event is not picked here
    bool zone_overlap = false; // zones side by side: their picks disagree in the hole
    bool age_median = false;
    bool age_band = false;
    bool date_used = false;
    bool date_unused = false;

    void addFill(DrawnFill f);
    void addSurface(SurfaceKind s);
    void addTaxonGroup(const std::string &group_word);
    /// Merges another column's content (a correlation panel shares one legend).
    void merge(const HoleColumnLegendContent &other);
};

/// Appends the legend with its top-left corner at `top_left`; returns the box it occupies.
/// Appends nothing, and returns an empty box, when nothing was drawn.
RectMm appendHoleColumnLegend(DisplayList &list, const HoleColumnLegendContent &content,
                              PointMm top_left, const HoleColumnStyle &style);

} // namespace atollog::draw
