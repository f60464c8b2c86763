#include "draw/panel_legend.hpp"

#include "draw/legend_rows.hpp"
#include "draw/panel_style.hpp"

namespace atollog::draw {

namespace ps = panel_style;

namespace {

constexpr double kSwatchWidth_mm = 10.0; // as wide as the column legend's swatches

ItemTag swatchTag(const char *what) {
    return {ItemRole::LegendSwatch, what};
}

void lineSwatch(DisplayList &list, PointMm p, const Stroke &stroke, const char *what) {
    list.add(Line{{p.x_mm - kSwatchWidth_mm / 2, p.y_mm}, {p.x_mm + kSwatchWidth_mm / 2, p.y_mm},
                  stroke, swatchTag(what)});
}

/// A band swatch as the panel draws it: the translucent fill over a white ground, with the
/// line through it.
void bandSwatch(DisplayList &list, PointMm p, Colour band, const std::optional<Stroke> &outline,
                const Stroke &line, const char *what) {
    const double l = p.x_mm - kSwatchWidth_mm / 2, r = p.x_mm + kSwatchWidth_mm / 2;
    list.add(Polygon{{{l, p.y_mm - 1.0}, {r, p.y_mm - 1.6}, {r, p.y_mm + 1.6}, {l, p.y_mm + 1.0}},
                     band,
                     outline,
                     swatchTag(what)});
    list.add(Line{{l, p.y_mm}, {r, p.y_mm}, line, swatchTag(what)});
}

} // namespace

RectMm appendPanelLegend(DisplayList &list, const HoleColumnLegendContent &columns,
                         const PanelLegendLinks &links, PointMm top_left,
                         const HoleColumnStyle &style) {
    const RectMm upper = appendHoleColumnLegend(list, columns, top_left, style);
    const bool any = links.ties || links.isochrons || links.sea_level;
    if (!any) {
        return upper;
    }
    const PointMm below{top_left.x_mm, upper.height_mm > 0.0
                                           ? upper.bottom_mm() + style.legend_row_mm * 0.5
                                           : top_left.y_mm};
    LegendRows rows(list, below,
                    {style.legend_row_mm, style.label_size_pt, kSwatchWidth_mm, 2.0, ps::kInk});
    rows.heading("Correlation");
    if (links.ties) {
        rows.row("tie: observed level, bracket", [&](PointMm p) {
            bandSwatch(list, p, ps::kTieBand, std::nullopt, ps::kTieStroke, "tie");
        });
    }
    if (links.tie_skips) {
        rows.row("tie passing a hole without it",
                 [&](PointMm p) { lineSwatch(list, p, ps::kTieSkipStroke, "tie skip"); });
    }
    if (links.isochrons) {
        rows.row("isochron: median depth, 95 % range", [&](PointMm p) {
            bandSwatch(list, p, ps::kIsochronBand, ps::kIsochronBandOutline, ps::kIsochronStroke,
                       "isochron");
        });
    }
    if (links.isochron_skips) {
        rows.row("isochron passing a hole without it", [&](PointMm p) {
            lineSwatch(list, p, ps::kIsochronSkipStroke, "isochron skip");
        });
    }
    if (links.sea_level) {
        rows.row("present sea level",
                 [&](PointMm p) { lineSwatch(list, p, ps::kSeaLevelStroke, "sea level"); });
    }
    const RectMm lower = rows.box(below);
    return upper.height_mm > 0.0 ? upper.united(lower) : lower;
}

} // namespace atollog::draw
