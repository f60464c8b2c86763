#include "draw/panel_frame.hpp"

#include "draw/metres_text.hpp"
#include "draw/panel_style.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <stdexcept>

namespace atollog::draw {

namespace ps = panel_style;

std::optional<double> flatteningLevel_m(const PanelInput &in, const std::string &name,
                                        std::size_t column) {
    for (const PanelTie &t : in.ties) {
        if (t.event != name) {
            continue;
        }
        for (const PanelTie::At &at : t.at) {
            if (at.column == column) {
                return at.level_m;
            }
        }
        return std::nullopt; // the tie is the flattening item; this hole lacks it
    }
    for (const PanelIsochron &i : in.isochrons) {
        if (i.label != name) {
            continue;
        }
        for (const PanelIsochron::At &at : i.at) {
            if (at.column == column) {
                return at.q500_m;
            }
        }
        return std::nullopt;
    }
    return std::nullopt;
}

namespace {

/// The plain shift of a column: none on a depth axis; on an elevation axis the collar sits at
/// -collar_elev_m, so higher collars stand higher (axis values grow downward).
double plainOffset_m(const HoleColumnInput &c, PanelAxis axis) {
    return axis == PanelAxis::Elevation ? -c.collar_elev_m : 0.0;
}

} // namespace

PanelFrame placePanel(const PanelInput &in, const PanelView &view, double title_height_mm,
                      const HoleColumnStyle &style) {
    PanelFrame f;
    f.mm_per_m = 1000.0 / view.scale_ratio;
    f.columns.resize(in.columns.size());
    for (std::size_t c = 0; c < in.columns.size(); ++c) {
        PanelColumnFrame &col = f.columns[c];
        col.offset_m = plainOffset_m(in.columns[c], view.axis);
        if (view.flatten_on) {
            if (const auto level = flatteningLevel_m(in, *view.flatten_on, c)) {
                col.offset_m = -*level;
                col.flattened = true;
            } else {
                col.has_note = true;
            }
        }
    }

    // The axis range: the window, its unset ends the highest collar and the deepest base.
    double top = f.columns.front().offset_m;
    double base = in.columns.front().drilled_base_m + f.columns.front().offset_m;
    for (std::size_t c = 0; c < in.columns.size(); ++c) {
        top = std::min(top, f.columns[c].offset_m);
        base = std::max(base, in.columns[c].drilled_base_m + f.columns[c].offset_m);
    }
    f.axis_top_m = view.window_top_m.value_or(top);
    f.axis_base_m = view.window_base_m.value_or(base);
    if (f.axis_base_m <= f.axis_top_m) {
        throw std::invalid_argument(
            "correlation panel: window " + metresText(f.axis_top_m) + " to " +
            metresText(f.axis_base_m) +
            " holds nothing (the holes span " + metresText(top) + " to " + metresText(base) +
            " on this axis); give both window ends, the base below the top");
    }

    // Columns left to right after the shared axis, column_gap_mm between their edges.
    f.axis_x_mm = ps::kMargin_mm + ps::kAxisWidth_mm;
    double left = f.axis_x_mm + ps::kAxisToColumns_mm;
    const double note_h = textLineHeight_mm(ps::kNoteSize_pt) + 1.0;
    double highest_rel = 0.0; // top of the tallest header, relative to the axis top
    for (std::size_t c = 0; c < in.columns.size(); ++c) {
        PanelColumnFrame &col = f.columns[c];
        const HoleColumnInput &hole = in.columns[c];
        col.x = holeColumnTrackPositions(hole.tracks, style, left);
        left = col.x.right_mm + view.column_gap_mm;

        HoleColumnView hv;
        hv.scale_ratio = view.scale_ratio;
        hv.depth_unit = view.depth_unit;
        col.header_height_mm = holeColumnHeaderHeight_mm(hole, hv, style);
        const double w_top = std::max(0.0, f.axis_top_m - col.offset_m);
        const double w_base = std::min(hole.drilled_base_m, f.axis_base_m - col.offset_m);
        double body_rel = 0.0; // a column outside the window keeps its header at the axis top
        if (w_base > w_top) {
            hv.window_top_m = w_top;
            hv.window_base_m = w_base;
            col.view = hv;
            body_rel = (w_top + col.offset_m - f.axis_top_m) * f.mm_per_m;
        }
        highest_rel =
            std::min(highest_rel, body_rel - col.header_height_mm - (col.has_note ? note_h : 0.0));
    }
    f.title_top_mm = ps::kMargin_mm;
    f.axis_origin_y_mm = ps::kMargin_mm + title_height_mm + ps::kTitleToColumns_mm - highest_rel;
    return f;
}

} // namespace atollog::draw
