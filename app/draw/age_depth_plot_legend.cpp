#include "draw/age_depth_plot_legend.hpp"

#include "draw/age_depth_plot_symbols.hpp"
#include "draw/legend_rows.hpp"
#include "draw/text_extent.hpp"

#include <algorithm>
#include <cmath>
#include <functional>
#include <numbers>

namespace atollog::draw {

namespace sym = age_plot_symbols;

namespace {

constexpr double kSwatchWidth_mm = 6.0;
constexpr double kTextGap_mm = 2.0;


ItemTag swatchTag(const std::string &what) {
    return {ItemRole::LegendSwatch, what};
}

/// A circle as a closed polyline, for rings that must not hide what lies inside them.
std::vector<PointMm> ring(PointMm centre, double radius_mm) {
    std::vector<PointMm> points;
    constexpr int kSegments = 24;
    for (int i = 0; i <= kSegments; ++i) {
        const double a = 2 * std::numbers::pi * i / kSegments;
        points.push_back(
            {centre.x_mm + radius_mm * std::cos(a), centre.y_mm + radius_mm * std::sin(a)});
    }
    return points;
}

} // namespace

std::vector<PointMm> outlierRing(PointMm centre, double marker_mm) {
    return ring(centre, marker_mm / 2 + sym::kOutlierRingGap_mm);
}

RectMm appendAgeDepthLegend(DisplayList &list, const AgeDepthLegendContent &c, PointMm top_left,
                            const AgeDepthPlotStyle &style) {
    LegendRows rows(
        list, top_left,
        {style.legend_row_mm, style.label_size_pt, kSwatchWidth_mm, kTextGap_mm, sym::kInk});
    const double half = kSwatchWidth_mm / 2;
    const auto line = [&list, half](Colour colour, double width_mm, DashStyle dash,
                                    const std::string &what) {
        return [&list, half, colour, width_mm, dash, what](PointMm p) {
            list.add(Line{{p.x_mm - half, p.y_mm},
                          {p.x_mm + half, p.y_mm},
                          Stroke{colour, width_mm, dash},
                          swatchTag(what)});
        };
    };
    const auto marker = [&list, &style](MarkerShape shape, Colour colour, bool hollow,
                                        const std::string &what) {
        return [&list, &style, shape, colour, hollow, what](PointMm p) {
            list.add(Marker{p, shape, style.tie_marker_mm, colour, hollow, 0.25, swatchTag(what)});
        };
    };

    if (c.envelope || c.median || !c.reference_label.empty()) {
        rows.heading("Age model");
    }
    if (c.envelope) {
        rows.row("95 % range", [&](PointMm p) {
            list.add(Rect{{p.x_mm - half, p.y_mm - 1.3, kSwatchWidth_mm, 2.6},
                          sym::kEnvelopeFill,
                          FillPattern::None,
                          Stroke{sym::kEnvelopeEdge, sym::kEnvelopeEdge_mm, DashStyle::Solid},
                          swatchTag("envelope")});
        });
    }
    if (c.median) {
        rows.row("median", line(sym::kMedian, sym::kMedian_mm, DashStyle::Solid, "median"));
    }
    if (!c.reference_label.empty()) {
        rows.row(c.reference_label,
                 line(sym::kReference, sym::kReference_mm, DashStyle::Dotted, "reference"));
    }

    const bool any_tie =
        c.datum || c.date || c.tie_bars || c.outlier || c.excluded_datum || c.excluded_date;
    if (any_tie) {
        rows.heading("Ties");
    }
    if (c.datum) {
        rows.row("datum (event age)", marker(sym::kDatumShape, sym::kDatum, false, "datum"));
    }
    if (c.date) {
        rows.row("date (measured age)", marker(sym::kDateShape, sym::kDate, false, "date"));
    }
    if (c.tie_bars) {
        rows.row("depth bracket, age range", [&](PointMm p) {
            const Stroke bar{sym::kInk, sym::kTieBar_mm, DashStyle::Solid};
            list.add(Line{{p.x_mm - half + 0.5, p.y_mm},
                          {p.x_mm + half - 0.5, p.y_mm},
                          bar,
                          swatchTag("bars")});
            list.add(Line{{p.x_mm, p.y_mm - 1.6}, {p.x_mm, p.y_mm + 1.6}, bar, swatchTag("bars")});
        });
    }
    if (c.outlier) {
        rows.row("outlier (leave-one-out)", [&](PointMm p) {
            list.add(Polyline{outlierRing(p, style.tie_marker_mm),
                              Stroke{sym::kInk, sym::kOutlierRing_mm, DashStyle::Solid},
                              swatchTag("outlier")});
        });
    }
    if (c.excluded_datum) {
        rows.row("datum left out of the model",
                 marker(sym::kDatumShape, sym::kExcluded, true, "excluded datum"));
    }
    if (c.excluded_date) {
        rows.row("date left out of the model",
                 marker(sym::kDateShape, sym::kExcluded, true, "excluded date"));
    }

    if (c.hiatus) {
        rows.heading("Gaps");
        rows.row("hiatus (median duration)",
                 line(sym::kHiatus, sym::kHiatus_mm, DashStyle::Dashed, "hiatus"));
    }
    return rows.box(top_left);
}

} // namespace atollog::draw
