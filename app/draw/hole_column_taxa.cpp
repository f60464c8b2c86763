#include "draw/hole_column_taxa.hpp"

#include "draw/group_palette.hpp"
#include "draw/hole_column_data_tracks.hpp"
#include "draw/hole_column_track_symbols.hpp"

#include <algorithm>

namespace atollog::draw {

namespace ts = track_symbols;

double taxonLaneCentre_mm(const HoleColumnTrackPositions &x, const HoleColumnStyle &s,
                          std::size_t lane) {
    return x.taxa_left_mm + s.taxon_lane_width_mm * (static_cast<double>(lane) + 0.5);
}

namespace {

void addExcluded(DisplayList &list, const std::vector<double> &depths_m, MarkerShape shape,
                 const std::string &taxon, const DepthScale &scale, const DepthWindow &w,
                 double x_mm, bool &drawn) {
    for (const double d : depths_m) {
        if (!w.contains(d)) {
            continue;
        }
        list.add(Marker{{x_mm, scale.y_mm(d)},
                        shape,
                        ts::kExcludedMarker_mm,
                        ts::kInk,
                        true,
                        0.2,
                        {ItemRole::ColumnTaxonExcluded, taxon}});
        drawn = true;
    }
}

} // namespace

void appendTaxonLanes(DisplayList &list, const HoleColumnInput &in, const HoleColumnStyle &s,
                      const DepthScale &scale, const DepthWindow &w,
                      const HoleColumnTrackPositions &x, HoleColumnLegendContent &legend) {
    if (shownTaxonLanes(in) == 0) {
        return;
    }
    for (std::size_t lane = 0; lane < in.taxa.size(); ++lane) {
        const ColumnTaxonRange &t = in.taxa[lane];
        const double centre = taxonLaneCentre_mm(x, s, lane);
        const double bar_x = centre + ts::kBarOffset_mm;
        const Colour colour = groupColour(t.group);
        if (!t.finds_m.empty()) {
            const auto [lo, hi] = std::minmax_element(t.finds_m.begin(), t.finds_m.end());
            // One find makes no bar, only its mark.
            if (*hi > *lo) {
                if (const auto box = boxInWindow(scale, w, *lo, *hi,
                                                 bar_x - ts::kTaxonBarWidth_mm / 2,
                                                 ts::kTaxonBarWidth_mm)) {
                    list.add(Rect{*box,
                                  colour,
                                  FillPattern::None,
                                  Stroke{ts::kOutline, ts::kTaxonBarOutline_mm, DashStyle::Solid},
                                  {ItemRole::ColumnTaxonBar, t.taxon}});
                    legend.addTaxonGroup(t.group);
                }
            }
        }
        for (const double d : t.finds_m) {
            if (!w.contains(d)) {
                continue;
            }
            list.add(Marker{{bar_x, scale.y_mm(d)},
                            MarkerShape::Circle,
                            ts::kFindMarker_mm,
                            colour,
                            false,
                            0.15,
                            {ItemRole::ColumnTaxonFind, t.taxon}});
            legend.addTaxonGroup(t.group);
        }
        const double aside = centre + ts::kExcludedOffset_mm;
        addExcluded(list, t.reworked_m, ts::kReworkedShape, t.taxon, scale, w, aside,
                    legend.taxon_reworked);
        addExcluded(list, t.caved_m, ts::kCavedShape, t.taxon, scale, w, aside,
                    legend.taxon_caved);
    }
}

} // namespace atollog::draw
