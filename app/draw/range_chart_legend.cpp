#include "draw/range_chart_legend.hpp"

#include "draw/group_palette.hpp"
#include "draw/range_chart_symbols.hpp"
#include "draw/legend_rows.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <functional>
#include <string>

namespace atollog::draw {

namespace cs = chart_symbols;

namespace {

constexpr double kSwatchWidth_mm = 5.0;
constexpr double kTextGap_mm = 2.0;


ItemTag swatchTag(const std::string &what) {
    return {ItemRole::LegendSwatch, what};
}

void bracketSwatch(DisplayList &list, PointMm c, DashStyle dash, const std::string &what) {
    const double half = 1.4;
    const double x = c.x_mm + 0.6;
    list.add(Polyline{{{x - cs::kBracketCap_mm, c.y_mm - half},
                       {x, c.y_mm - half},
                       {x, c.y_mm + half},
                       {x - cs::kBracketCap_mm, c.y_mm + half}},
                      Stroke{cs::kInk, cs::kBracketWidth_mm, dash},
                      swatchTag(what)});
}

} // namespace

RectMm appendRangeChartLegend(DisplayList &list, const RangeChartLegendContent &c, PointMm top_left,
                              const RangeChartStyle &style) {
    LegendRows w(
        list, top_left,
        {style.legend_row_mm, style.label_size_pt, kSwatchWidth_mm, kTextGap_mm, cs::kInk});
    const auto marker = [&](MarkerShape shape, double size_mm, Colour colour, bool hollow,
                            const std::string &what) {
        return [&list, shape, size_mm, colour, hollow, what](PointMm p) {
            list.add(Marker{p, shape, size_mm, colour, hollow, 0.25, swatchTag(what)});
        };
    };

    if (!c.groups.empty()) {
        w.heading("Taxon groups");
        for (const std::string &g : c.groups) {
            const std::string label{groupLabelWord(g)};
            w.row(label, [&](PointMm p) {
                list.add(Rect{{p.x_mm - kSwatchWidth_mm / 2, p.y_mm - 1.1, kSwatchWidth_mm, 2.2},
                              groupColour(g),
                              FillPattern::None,
                              Stroke{cs::kOutline, cs::kBarOutline_mm, DashStyle::Solid},
                              swatchTag(g)});
            });
        }
    }

    const bool any_symbol = c.in_place || c.range_bar || c.reworked || c.caved || c.top_pick ||
                            c.base_pick || c.bracket || c.extended_bracket || c.open_ended;
    if (any_symbol) {
        w.heading("Occurrences and datums");
    }
    const Colour neutral = colourFromHex(0x999999);
    if (c.range_bar) {
        w.row("observed range (in place)", [&](PointMm p) {
            list.add(Rect{{p.x_mm - style.bar_width_mm / 2, p.y_mm - 1.6, style.bar_width_mm, 3.2},
                          neutral,
                          FillPattern::None,
                          Stroke{cs::kOutline, cs::kBarOutline_mm, DashStyle::Solid},
                          swatchTag("range bar")});
        });
    }
    if (c.in_place) {
        w.row("in place; size = abundance 0-5",
              marker(MarkerShape::Circle, cs::occurrenceMarker_mm(style, 3), neutral, false,
                     "in place"));
    }
    if (c.reworked) {
        w.row("reworked", marker(cs::kReworkedShape, cs::occurrenceMarker_mm(style, 3), cs::kInk,
                                 true, "reworked"));
    }
    if (c.caved) {
        w.row("caved",
              marker(cs::kCavedShape, cs::occurrenceMarker_mm(style, 3), cs::kInk, true, "caved"));
    }
    if (c.top_pick) {
        w.row("top (highest occurrence)",
              marker(cs::kTopShape, style.pick_marker_mm, cs::kInk, false, "top"));
    }
    if (c.base_pick) {
        w.row("base (lowest occurrence)",
              marker(cs::kBaseShape, style.pick_marker_mm, cs::kInk, false, "base"));
    }
    if (c.bracket) {
        w.row("datum lies within",
              [&](PointMm p) { bracketSwatch(list, p, DashStyle::Solid, "bracket"); });
    }
    if (c.extended_bracket) {
        w.row("extended interval",
              [&](PointMm p) { bracketSwatch(list, p, DashStyle::Dashed, "extended bracket"); });
    }
    if (c.open_ended) {
        w.row("may lie beyond", [&](PointMm p) {
            list.add(Line{{p.x_mm, p.y_mm + 1.5},
                          {p.x_mm, p.y_mm - 0.8},
                          Stroke{cs::kInk, cs::kBracketWidth_mm, DashStyle::Dotted},
                          swatchTag("open end")});
            list.add(Marker{{p.x_mm, p.y_mm - 1.0},
                            MarkerShape::TriangleUp,
                            cs::kOpenEndMarker_mm,
                            cs::kInk,
                            true,
                            0.2,
                            swatchTag("open end")});
        });
    }

    const bool any_track = c.sample_examined || c.sample_barren || c.recovered || c.unrecovered;
    if (any_track) {
        w.heading("Samples and core");
    }
    if (c.sample_examined) {
        w.row("sample examined", [&](PointMm p) {
            list.add(Line{{p.x_mm - 1.5, p.y_mm},
                          {p.x_mm + 1.5, p.y_mm},
                          Stroke{cs::kInk, 0.25, DashStyle::Solid},
                          swatchTag("sample examined")});
        });
    }
    if (c.sample_barren) {
        w.row("sample barren", marker(cs::kBarrenShape, 1.2, cs::kInk, true, "sample barren"));
    }
    if (c.recovered) {
        w.row("core recovered", [&](PointMm p) {
            list.add(Rect{{p.x_mm - 1.5, p.y_mm - 1.4, 3.0, 2.8},
                          cs::kRecovered,
                          FillPattern::None,
                          std::nullopt,
                          swatchTag("recovered")});
        });
    }
    if (c.unrecovered) {
        w.row("no recovery", [&](PointMm p) {
            list.add(Rect{{p.x_mm - 1.5, p.y_mm - 1.4, 3.0, 2.8},
                          cs::kWhite,
                          FillPattern::None,
                          Stroke{cs::kOutline, 0.15, DashStyle::Solid},
                          swatchTag("unrecovered")});
        });
    }
    return w.box(top_left);
}

} // namespace atollog::draw
