#include "draw/panel_layout.hpp"

#include "draw/hole_column.hpp"
#include "draw/hole_column_header.hpp"
#include "draw/hole_column_validation.hpp"
#include "draw/panel_frame.hpp"
#include "draw/panel_isochrons.hpp"
#include "draw/panel_legend.hpp"
#include "draw/panel_link_labels.hpp"
#include "draw/panel_style.hpp"
#include "draw/panel_ties.hpp"
#include "draw/panel_title_block.hpp"
#include "draw/panel_validation.hpp"
#include "draw/panel_vertical_axis.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cstdio>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace ps = panel_style;

namespace {

/// A small note over a column's header (e.g. it lacks the flattening level, or has nothing in
/// the window); the frame left room for one line there.
void addColumnNote(DisplayList &list, const HoleColumnInput &hole, const PanelColumnFrame &col,
                   double header_top_mm, const std::string &text) {
    const double h = textLineHeight_mm(ps::kNoteSize_pt);
    list.add(Text{{col.x.left_mm, header_top_mm - h / 2 - 0.5}, text, TextAnchor::Start,
                  ps::kNoteSize_pt, FontWeight::Bold, 0.0, ps::kIsochron,
                  {ItemRole::ColumnNote, hole.hole}});
}

/// On an age axis the time a logged surface stands for opens as a gap in the column (the model's
/// two rows at the surface's depth): a tinted band across the column's tracks says so, so the gap
/// does not read as missing core.
void addHiatusGaps(DisplayList &list, const HoleColumnInput &hole, const DepthScale &scale,
                   const PanelColumnFrame &col, const HoleColumnView &window) {
    const std::vector<ColumnAgeRow> &rows = hole.age_model.rows;
    for (std::size_t i = 0; i + 1 < rows.size(); ++i) {
        const double d = rows[i].depth_m;
        if (rows[i + 1].depth_m != d || !(rows[i + 1].q500_ma > rows[i].q500_ma) ||
            d < *window.window_top_m || d > *window.window_base_m) {
            continue;
        }
        const double top = scale.yAbove_mm(d), bottom = scale.y_mm(d);
        if (bottom - top <= 0.0) {
            continue;
        }
        char key[32];
        std::snprintf(key, sizeof key, "%.2f", d);
        list.add(Rect{RectMm{col.x.runs_left_mm, top, col.x.right_mm - col.x.runs_left_mm, bottom - top},
                      ps::kHiatusGap,
                      FillPattern::None,
                      std::nullopt,
                      {ItemRole::Hiatus, hole.hole + " " + key}});
    }
}

} // namespace

DisplayList layoutPanel(const PanelInput &in, const PanelView &view, PanelGeometry *geometry) {
    validatePanelLinks(in, view); // each column is checked where it is drawn
    const HoleColumnStyle style;
    const PanelFrame f = placePanel(in, view, panelTitleBlockHeight_mm(view), style);
    const double columns_right = f.columns.back().x.right_mm;
    const bool sea_level = view.axis == PanelAxis::Elevation && !view.flatten_on &&
                           f.axis_top_m <= 0.0 && f.axis_base_m >= 0.0;

    DisplayList list;
    RectMm extent = appendPanelTitleBlock(list, in, view, {ps::kMargin_mm, f.title_top_mm},
                                          f.mm_per_axis_unit);
    // Underneath the columns: the axis with the sea-level line, then the bands, so that no
    // band or line across the panel ever hides a log.
    appendPanelVerticalAxis(list, f, view, columns_right);
    DisplayList lines;
    std::vector<LinkLabel> labels;
    const bool tie_skips = appendPanelTies(list, lines, labels, f, in);
    const bool iso_skips = appendPanelIsochrons(list, lines, labels, f, in);

    HoleColumnLegendContent legend;
    std::vector<RectMm> boxes;
    for (std::size_t c = 0; c < in.columns.size(); ++c) {
        const PanelColumnFrame &col = f.columns[c];
        const HoleColumnInput &hole = in.columns[c];
        RectMm box;
        double header_top = 0.0;
        if (col.view) {
            const HoleColumnPlacement placed =
                appendHoleColumn(list, hole, f.columnScale(c), col.x.left_mm, *col.view, style);
            legend.merge(placed.legend);
            header_top = f.columnY_mm(c, *col.view->window_top_m) - col.header_height_mm;
            box = placed.box;
        } else {
            // Nothing of this hole lies in the window: its header keeps its place in the row.
            HoleColumnView hv;
            hv.scale_ratio = view.scale_ratio;
            hv.depth_unit = view.depth_unit;
            validateHoleColumnInput(hole, hv);
            const double body_top = f.y_mm(f.axis_top_m);
            appendHoleColumnHeader(list, hole, hv, style, col.x, body_top);
            header_top = body_top - col.header_height_mm;
            box = RectMm{col.x.left_mm, header_top, 0.0, col.header_height_mm};
            if (!col.no_age_model) {
                addColumnNote(list, hole, col, header_top + col.header_height_mm + 4.0,
                              "nothing in the window");
            }
        }
        if (col.no_age_model) {
            addColumnNote(list, hole, col, header_top, "no age model");
        } else if (col.view && view.axis == PanelAxis::Age) {
            addHiatusGaps(list, hole, f.columnScale(c), col, *col.view);
        }
        if (col.has_note) {
            addColumnNote(list, hole, col, header_top, "not flattened");
        }
        boxes.push_back(RectMm{col.x.left_mm, header_top, col.x.right_mm - col.x.left_mm,
                               std::max(box.bottom_mm(), header_top) - header_top});
        extent = extent.united(box).united(boxes.back());
    }
    // Only what the window shows goes into the legend.
    const bool ties_shown = !lines.withRole(ItemRole::TieLine).empty();
    const bool isochrons_shown = !lines.withRole(ItemRole::Isochron).empty();
    for (const DisplayItem &item : lines.items()) {
        list.add(item);
    }
    if (sea_level) {
        labels.push_back({{columns_right, f.y_mm(0.0)}, "sea level", ps::kMuted,
                          {ItemRole::SeaLevel, "0"}});
    }
    const double labels_right = appendLinkLabels(list, labels, ps::kLinkLabelSize_pt);

    if (view.legend) {
        const double legend_x =
            std::max(columns_right + ps::kLabelLane_mm, labels_right) + ps::kLegendGap_mm;
        const PanelLegendLinks links{ties_shown, ties_shown && tie_skips, isochrons_shown,
                                     isochrons_shown && iso_skips, sea_level};
        extent = extent.united(
            appendPanelLegend(list, legend, links, {legend_x, f.axis_origin_y_mm}, style));
    }
    // The axis title and labels sit left of the first column; the margin covers the left edge.
    extent = extent.united(RectMm{ps::kMargin_mm, f.y_mm(f.axis_top_m),
                                  std::max(labels_right, columns_right) - ps::kMargin_mm,
                                  f.y_mm(f.axis_base_m) - f.y_mm(f.axis_top_m)});
    list.setPage(RectMm{0.0, 0.0, extent.right_mm() + ps::kMargin_mm,
                        extent.bottom_mm() + ps::kMargin_mm});

    if (geometry) {
        PanelGeometry g;
        g.column_boxes = std::move(boxes);
        for (const PanelColumnFrame &col : f.columns) {
            g.column_offset_m.push_back(col.offset_m);
            g.column_scales.push_back(col.scale);
            g.lithology_left_mm.push_back(col.x.lithology_left_mm);
            g.lithology_right_mm.push_back(col.x.lithology_right_mm);
            g.link_out_mm.push_back(col.x.right_mm);
        }
        g.mm_per_axis_unit = f.mm_per_axis_unit;
        g.axis_origin_y_mm = f.axis_origin_y_mm;
        g.axis_top_m = f.axis_top_m;
        g.axis_base_m = f.axis_base_m;
        *geometry = std::move(g);
    }
    return list;
}

namespace {

const DepthScale &scaleOf(const PanelGeometry &g, std::size_t column) {
    const std::optional<DepthScale> &scale = g.column_scales.at(column);
    if (!scale) {
        throw std::out_of_range("column " + std::to_string(column + 1) +
                                " has no place on this axis (no age model)");
    }
    return *scale;
}

} // namespace

double panelY_mm(const PanelGeometry &g, std::size_t column, double depth_m) {
    return scaleOf(g, column).y_mm(depth_m);
}

double panelDepth_m(const PanelGeometry &g, std::size_t column, double y_mm) {
    return scaleOf(g, column).depth_m(y_mm);
}

} // namespace atollog::draw
