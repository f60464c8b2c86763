#pragma once

#include "draw/depth_scale.hpp"
#include "draw/display_list.hpp"
#include "draw/hole_column_input.hpp"
#include "draw/hole_column_legend.hpp"
#include "draw/hole_column_style.hpp"
#include "draw/hole_column_view.hpp"

namespace atollog::draw {

/// Left and right edges (scene mm) of a column's tracks, left to right: depth axis (labels left
/// of the axis line), core runs, lithology (also the room surfaces are drawn across), samples,
/// then the data tracks: one lane per chosen taxon, one lane per zonation scheme, the age track
/// (dates and the age model on an age axis). A hidden track, or a data track without data, has
/// zero width and no gap.
struct HoleColumnTrackPositions {
    double left_mm = 0;   // the column's left edge (left of the depth labels)
    double axis_x_mm = 0; // the depth axis line
    double runs_left_mm = 0;
    double runs_right_mm = 0;
    double lithology_left_mm = 0;
    double lithology_right_mm = 0;
    double samples_left_mm = 0;
    double samples_right_mm = 0;
    double taxa_left_mm = 0; // lanes of HoleColumnStyle::taxon_lane_width_mm, in input order
    double taxa_right_mm = 0;
    double zones_left_mm = 0; // lanes of HoleColumnStyle::zone_lane_width_mm, one per scheme
    double zones_right_mm = 0;
    double ages_left_mm = 0;
    double ages_right_mm = 0;
    double right_mm = 0; // the column's right edge
};

/// The positions of every track of this column at left_mm. The data tracks' widths follow the
/// input (how many taxa, which schemes, whether there is a model or a date to show).
HoleColumnTrackPositions holeColumnTrackPositions(const HoleColumnInput &input,
                                                  const HoleColumnStyle &style, double left_mm);

/// Height of the header (hole id, collar and drilled depth, rotated track headings and the
/// texture scale) that appendHoleColumn draws above the top of the depth window.
double holeColumnHeaderHeight_mm(const HoleColumnInput &input, const HoleColumnView &view,
                                 const HoleColumnStyle &style = {});

/// What appendHoleColumn covered and drew.
struct HoleColumnPlacement {
    RectMm box;                     // every item it appended, header included
    HoleColumnLegendContent legend; // what the column's legend must list
};

/// Appends one hole's column at left_mm, mapping depth through `scale`; its header ends just
/// above scale.y_mm(top of the window) (leave holeColumnHeaderHeight_mm there). Several holes
/// laid out with one scale at different left_mm stand side by side on a common depth axis.
///
/// Tracks: depth axis in m or ft (ft labels via 0.3048 m/ft); core runs, the recovered part at
/// the top of each run; lithology boxes whose width follows texture (lithology_width.hpp) and
/// whose fill follows the rock (lithology_fill.hpp); surfaces across the lithology track at
/// their interval's base (surface_stroke.hpp); samples as ticks; the drilled base as a heavy
/// line with its depth. Only items that meet the view's depth window are produced, cut at its
/// edges. A pure function: no Qt, no font engine. Validates first (validateHoleColumnInput).
HoleColumnPlacement appendHoleColumn(DisplayList &list, const HoleColumnInput &input,
                                     const DepthScale &scale, double left_mm,
                                     const HoleColumnView &view = {},
                                     const HoleColumnStyle &style = {});

/// A stand-alone page: one column at the view's drafting ratio, its legend on the right and a
/// scale note under it.
DisplayList layoutHoleColumn(const HoleColumnInput &input, const HoleColumnView &view = {},
                             const HoleColumnStyle &style = {});

/// The depth scale layoutHoleColumn uses, so callers map depth to paper y exactly as it does.
DepthScale holeColumnDepthScale(const HoleColumnInput &input, const HoleColumnView &view = {},
                                const HoleColumnStyle &style = {});

} // namespace atollog::draw
