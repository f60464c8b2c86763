#include "draw/panel_frame.hpp"

#include "draw/metres_text.hpp"
#include "draw/panel_style.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace ps = panel_style;

/// A kilometre of paper: beyond any plotter, screen or viewer zoom. Values that would need more
/// (a hole logged to 1e300 m, a scale of 1:1e-300) are refused here, before loops over ticks,
/// hatches or patterns meet coordinates where adding a step no longer moves them.
constexpr double kMaxPaper_mm = 1e6;

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

/// The knots of a column on an age axis: depth to median age, from its model's rows; empty
/// when the hole has no model that spans any depth.
std::vector<AxisKnot> ageKnots(const HoleColumnInput &c) {
    std::vector<AxisKnot> knots;
    for (const ColumnAgeRow &r : c.age_model.rows) {
        knots.push_back({r.depth_m, r.q500_ma});
    }
    if (knots.size() < 2 || !(knots.back().depth_m > knots.front().depth_m)) {
        return {};
    }
    for (std::size_t i = 1; i < knots.size(); ++i) {
        if (knots[i].depth_m < knots[i - 1].depth_m || knots[i].axis_value < knots[i - 1].axis_value) {
            throw std::invalid_argument(
                "correlation panel, hole '" + c.hole + "': its age model's median goes back from " +
                std::to_string(knots[i - 1].axis_value) + " Ma at " + metresText(knots[i - 1].depth_m) +
                " to " + std::to_string(knots[i].axis_value) + " Ma at " +
                metresText(knots[i].depth_m) +
                "; an age axis needs medians that never get younger downhole (rebuild the model)");
        }
    }
    return knots;
}

/// The depth range (m below the collar) of a column whose axis values lie in top..base.
struct ColumnDepths {
    double top_m, base_m;
};

ColumnDepths linearDepths(const HoleColumnInput &hole, double offset_m, double top, double base) {
    return {std::max(0.0, top - offset_m), std::min(hole.drilled_base_m, base - offset_m)};
}

ColumnDepths ageDepths(const HoleColumnInput &hole, const std::vector<AxisKnot> &knots,
                       double top_ma, double base_ma) {
    // A unit scale (axis value = y) inverts the knots.
    const DepthScale inverse = DepthScale::warped(knots, 0.0, 1.0, 0.0);
    const double first = std::max(0.0, knots.front().depth_m);
    const double last = std::min(hole.drilled_base_m, knots.back().depth_m);
    return {std::max(first, inverse.depth_m(top_ma)), std::min(last, inverse.depth_m(base_ma))};
}

void checkAgeView(const PanelView &view) {
    if (view.flatten_on) {
        throw std::invalid_argument(
            "correlation panel: an age axis already stands every isochron level, so it cannot be "
            "flattened on '" + *view.flatten_on +
            "'; flatten on the depth or elevation axis, or leave the flattening unset");
    }
    if (!std::isfinite(view.age_mm_per_myr) || view.age_mm_per_myr < 0.0) {
        throw std::invalid_argument("correlation panel: age_mm_per_myr " +
                                    std::to_string(view.age_mm_per_myr) +
                                    " must be a positive number of mm per Myr, or 0 for automatic");
    }
}

} // namespace

PanelFrame placePanel(const PanelInput &in, const PanelView &view, double title_height_mm,
                      const HoleColumnStyle &style) {
    PanelFrame f;
    const bool age_axis = view.axis == PanelAxis::Age;
    f.mm_per_axis_unit = 1000.0 / view.scale_ratio;
    f.columns.resize(in.columns.size());
    std::vector<std::vector<AxisKnot>> knots(in.columns.size());
    double top = 0.0, base = 0.0;
    bool any = false;
    const auto extend = [&](double t, double b) {
        top = any ? std::min(top, t) : t;
        base = any ? std::max(base, b) : b;
        any = true;
    };
    if (age_axis) {
        checkAgeView(view);
        double deepest_m = 0.0;
        for (std::size_t c = 0; c < in.columns.size(); ++c) {
            deepest_m = std::max(deepest_m, in.columns[c].drilled_base_m);
            knots[c] = ageKnots(in.columns[c]);
            if (knots[c].empty()) {
                f.columns[c].no_age_model = true;
            } else {
                extend(knots[c].front().axis_value, knots[c].back().axis_value);
            }
        }
        if (!any) {
            throw std::invalid_argument(
                "correlation panel: no hole has an age model, so nothing can stand on an age "
                "axis; give the holes age models (dates or datums) or use the depth axis");
        }
        const double span_myr = base - top;
        if (view.age_mm_per_myr > 0.0) {
            f.mm_per_axis_unit = view.age_mm_per_myr;
        } else if (span_myr > 0.0) {
            // As tall as the deepest hole would stand on a depth axis at the view's scale.
            f.mm_per_axis_unit = deepest_m * 1000.0 / view.scale_ratio / span_myr;
        } else {
            throw std::invalid_argument(
                "correlation panel: the age models span no time (all medians at " +
                std::to_string(top) + " Ma); an age axis needs some span");
        }
    } else {
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
            // The axis range: unset window ends take the highest collar and the deepest base.
            extend(col.offset_m, in.columns[c].drilled_base_m + col.offset_m);
        }
    }
    f.axis_top_m = view.window_top_m.value_or(top);
    f.axis_base_m = view.window_base_m.value_or(base);
    if (f.axis_base_m <= f.axis_top_m) {
        const auto text = [age_axis](double v) {
            return age_axis ? std::to_string(v) + " Ma" : metresText(v);
        };
        throw std::invalid_argument("correlation panel: window " + text(f.axis_top_m) + " to " +
                                    text(f.axis_base_m) + " holds nothing (the holes span " +
                                    text(top) + " to " + text(base) +
                                    " on this axis); give both window ends, the base below the top");
    }

    const double height_mm = (f.axis_base_m - f.axis_top_m) * f.mm_per_axis_unit;
    if (!(height_mm <= kMaxPaper_mm)) {
        throw std::invalid_argument(
            "correlation panel: the axis from " + std::to_string(f.axis_top_m) + " to " +
            std::to_string(f.axis_base_m) + " would take " + std::to_string(height_mm / 1000.0) +
            " m of paper at this scale; choose a smaller scale or a window");
    }

    // Columns left to right after the shared axis, column_gap_mm between their edges.
    f.axis_x_mm = ps::kMargin_mm + ps::kAxisWidth_mm;
    double left = f.axis_x_mm + ps::kAxisToColumns_mm;
    const double note_h = textLineHeight_mm(ps::kNoteSize_pt) + 1.0;
    double highest_rel = 0.0; // top of the tallest header, relative to the axis top
    for (std::size_t c = 0; c < in.columns.size(); ++c) {
        PanelColumnFrame &col = f.columns[c];
        const HoleColumnInput &hole = in.columns[c];
        col.x = holeColumnTrackPositions(hole, style, left);
        left = col.x.right_mm + view.column_gap_mm;

        HoleColumnView hv;
        hv.scale_ratio = view.scale_ratio;
        hv.depth_unit = view.depth_unit;
        col.header_height_mm = holeColumnHeaderHeight_mm(hole, hv, style);
        double body_rel = 0.0; // a column outside the window keeps its header at the axis top
        if (!col.no_age_model) {
            const ColumnDepths w =
                age_axis ? ageDepths(hole, knots[c], f.axis_top_m, f.axis_base_m)
                         : linearDepths(hole, col.offset_m, f.axis_top_m, f.axis_base_m);
            if (w.base_m > w.top_m) {
                hv.window_top_m = w.top_m;
                hv.window_base_m = w.base_m;
                col.view = hv;
                const double top_value =
                    age_axis ? DepthScale::warped(knots[c], 0.0, 1.0, 0.0).y_mm(w.top_m)
                             : w.top_m + col.offset_m;
                body_rel = (top_value - f.axis_top_m) * f.mm_per_axis_unit;
            }
        }
        const bool note = col.has_note || col.no_age_model;
        highest_rel = std::min(highest_rel, body_rel - col.header_height_mm - (note ? note_h : 0.0));
    }
    if (!(left <= kMaxPaper_mm)) {
        throw std::invalid_argument("correlation panel: the columns would take " +
                                    std::to_string(left / 1000.0) +
                                    " m of paper side by side; check column_gap_mm (" +
                                    std::to_string(view.column_gap_mm) + " mm)");
    }
    f.title_top_mm = ps::kMargin_mm;
    f.axis_origin_y_mm = ps::kMargin_mm + title_height_mm + ps::kTitleToColumns_mm - highest_rel;
    for (std::size_t c = 0; c < in.columns.size(); ++c) {
        PanelColumnFrame &col = f.columns[c];
        if (!age_axis) {
            col.scale = DepthScale(f.axis_top_m - col.offset_m, f.mm_per_axis_unit, f.axis_origin_y_mm);
        } else if (!knots[c].empty()) {
            col.scale = DepthScale::warped(std::move(knots[c]), f.axis_top_m, f.mm_per_axis_unit,
                                           f.axis_origin_y_mm);
        }
    }
    return f;
}

} // namespace atollog::draw
