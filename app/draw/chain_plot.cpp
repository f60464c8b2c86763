#include "draw/chain_plot.hpp"

#include "draw/age_depth_plot_labels.hpp"
#include "draw/legend_rows.hpp"
#include "draw/text_extent.hpp"
#include "draw/xy_plot_checks.hpp"
#include "draw/xy_plot_frame.hpp"

#include <algorithm>
#include <limits>
#include <set>
#include <stdexcept>

namespace atollog::draw {

namespace {

constexpr double kBar_mm = 0.25;
constexpr double kCap_mm = 0.8;
constexpr double kFit_mm = 0.45;
constexpr double kLabelGap_mm = 1.0;
constexpr double kSwatchWidth_mm = 8.0;
const Colour kInk = colourFromHex(0x000000);
const Colour kPoint = colourFromHex(0x009E73); // Okabe & Ito bluish green
const Colour kFit = colourFromHex(0x0072B2);   // Okabe & Ito blue

void validate(const ChainPlotInput &in) {
    if (in.points.empty()) {
        throw std::invalid_argument("chain plot: no hole to draw; give at least one hole with a "
                                    "distance along the chain and an age");
    }
    std::set<std::string> names;
    for (std::size_t i = 0; i < in.points.size(); ++i) {
        const ChainPlotPoint &p = in.points[i];
        if (p.hole.empty()) {
            throw std::invalid_argument("chain plot: point " + std::to_string(i + 1) +
                                        " has no hole name; give its hole id");
        }
        if (!names.insert(p.hole).second) {
            throw std::invalid_argument("chain plot: hole " + p.hole +
                                        " is given twice; give one age per hole");
        }
        const std::string what = "chain plot: hole " + p.hole;
        requireFiniteValue(p.distance_km, what, "distance (km)");
        requireFiniteValue(p.distance_sd_km, what, "distance sd (km)");
        requireFiniteValue(p.age_ma, what, "age (Ma)");
        requireFiniteValue(p.age_sd_ma, what, "age sd (Ma)");
        if (p.distance_sd_km < 0 || p.age_sd_ma < 0) {
            throw std::invalid_argument(what + ": a negative sd (distance " +
                                        valueText(p.distance_sd_km) + " km, age " +
                                        valueText(p.age_sd_ma) +
                                        " Ma); give sds as positive numbers");
        }
        requireOnAxis(p.distance_km - kNormal95 * p.distance_sd_km,
                      p.distance_km + kNormal95 * p.distance_sd_km, in.distance_axis_km, what,
                      "distance");
        requireOnAxis(p.age_ma - kNormal95 * p.age_sd_ma, p.age_ma + kNormal95 * p.age_sd_ma,
                      in.age_axis_ma, what, "age");
    }
    if (in.fit) {
        const std::string what = "chain plot: the fitted line";
        requireFiniteValue(in.fit->intercept_ma, what, "intercept (Ma)");
        requireFiniteValue(in.fit->slope_ma_per_km, what, "slope (Ma/km)");
        requireFiniteValue(in.fit->rate_km_per_myr, what, "rate (km/Myr)");
        requireFiniteValue(in.fit->rate_sd_km_per_myr, what, "rate sd (km/Myr)");
        if (in.fit->rate_sd_km_per_myr < 0) {
            throw std::invalid_argument(what + ": the rate sd " +
                                        valueText(in.fit->rate_sd_km_per_myr) +
                                        " km/Myr is negative; give it as a positive number");
        }
    }
}

XyPlotSpec plotSpec(const ChainPlotInput &in) {
    ValueRange d{std::numeric_limits<double>::max(), std::numeric_limits<double>::lowest()};
    ValueRange a = d;
    for (const ChainPlotPoint &p : in.points) {
        d = {std::min(d.min, p.distance_km - kNormal95 * p.distance_sd_km),
             std::max(d.max, p.distance_km + kNormal95 * p.distance_sd_km)};
        a = {std::min(a.min, p.age_ma - kNormal95 * p.age_sd_ma),
             std::max(a.max, p.age_ma + kNormal95 * p.age_sd_ma)};
    }
    XyPlotSpec spec;
    spec.key = "chain";
    spec.title = "Age against distance along the chain";
    spec.subtitle = in.note;
    spec.x = {"distance from the active centre (km)", d, in.distance_axis_km,
              in.distance_axis_length_mm, false, true};
    spec.y = {in.age_heading, a, in.age_axis_ma, in.age_axis_length_mm, false, true};
    return spec;
}

void addCappedBar(DisplayList &list, PointMm from, PointMm to, bool vertical, Colour colour,
                  const ItemTag &tag) {
    const Stroke bar{colour, kBar_mm, DashStyle::Solid};
    const double c = kCap_mm / 2;
    list.add(Line{from, to, bar, tag});
    for (const PointMm end : {from, to}) {
        list.add(vertical ? Line{{end.x_mm - c, end.y_mm}, {end.x_mm + c, end.y_mm}, bar, tag}
                          : Line{{end.x_mm, end.y_mm - c}, {end.x_mm, end.y_mm + c}, bar, tag});
    }
}

/// The fitted line cut to the plot's rectangle (values outside its axes are not drawn).
std::optional<Line> fitLine(const ChainPlotFit &fit, double d_from, double d_to,
                            const XyPlotFrame &f) {
    const ValueRange ages = f.y.range();
    double lo = d_from, hi = d_to;
    const auto age = [&fit](double d) { return fit.intercept_ma + fit.slope_ma_per_km * d; };
    if (fit.slope_ma_per_km != 0) {
        // Distances where the line meets the age axis's ends.
        const double d1 = (ages.min - fit.intercept_ma) / fit.slope_ma_per_km;
        const double d2 = (ages.max - fit.intercept_ma) / fit.slope_ma_per_km;
        lo = std::max(lo, std::min(d1, d2));
        hi = std::min(hi, std::max(d1, d2));
    } else if (!f.y.contains(fit.intercept_ma)) {
        return std::nullopt;
    }
    if (!(hi > lo)) {
        return std::nullopt;
    }
    return Line{{f.x.mm(lo), f.y.mm(age(lo))},
                {f.x.mm(hi), f.y.mm(age(hi))},
                Stroke{kFit, kFit_mm, DashStyle::Solid},
                {ItemRole::ChainFit, "fit"}};
}

} // namespace

XyPlotFrame chainPlotFrame(const ChainPlotInput &in, const XyPlotStyle &s) {
    return xyPlotFrame(plotSpec(in), s);
}

DisplayList layoutChainPlot(const ChainPlotInput &in, const XyPlotStyle &s) {
    validate(in);
    const XyPlotSpec spec = plotSpec(in);
    const XyPlotFrame f = xyPlotFrame(spec, s);
    DisplayList list;
    appendXyTitle(list, spec, f, s);
    appendXyGrid(list, f);

    bool fit_drawn = false;
    if (in.fit) {
        double near = 0.0, far = 0.0; // from the active centre (or a hole behind it)
        for (const ChainPlotPoint &p : in.points) {
            near = std::min(near, p.distance_km);
            far = std::max(far, p.distance_km);
        }
        if (const auto line = fitLine(*in.fit, std::max(near, f.x.range().min),
                                      std::min(far, f.x.range().max), f)) {
            list.add(*line);
            fit_drawn = true;
        }
    }
    std::vector<RectMm> obstacles;
    for (const ChainPlotPoint &p : in.points) {
        const double x = f.x.mm(p.distance_km), y = f.y.mm(p.age_ma);
        const ItemTag bar_tag{ItemRole::ChainBar, p.hole};
        const double dd = kNormal95 * p.distance_sd_km, da = kNormal95 * p.age_sd_ma;
        if (dd > 0) {
            addCappedBar(list, {f.x.mm(p.distance_km - dd), y}, {f.x.mm(p.distance_km + dd), y},
                         false, kInk, bar_tag);
        }
        if (da > 0) {
            addCappedBar(list, {x, f.y.mm(p.age_ma - da)}, {x, f.y.mm(p.age_ma + da)}, true,
                         kInk, bar_tag);
        }
        list.add(Marker{{x, y}, MarkerShape::Circle, s.marker_mm, kPoint, false, 0.25,
                        {ItemRole::ChainPoint, p.hole}});
        obstacles.push_back(itemBounds(list.items().back()));
    }
    // Names up-left or up-right of the point, clear of the markers and each other.
    std::vector<LabelRequest> requests;
    for (const ChainPlotPoint &p : in.points) {
        const double x = f.x.mm(p.distance_km), y = f.y.mm(p.age_ma);
        const double off = s.marker_mm / 2 + kLabelGap_mm;
        const double up = y - off - textLineHeight_mm(s.point_label_size_pt) / 2;
        requests.push_back({Text{{}, p.hole, TextAnchor::Start, s.point_label_size_pt,
                                 FontWeight::Bold, 0.0, kInk, {ItemRole::ChainLabel, p.hole}},
                            {{{x + off, up}, TextAnchor::Start},
                             {{x - off, up}, TextAnchor::End},
                             {{x + off, y + off + 1.2}, TextAnchor::Start},
                             {{x - off, y + off + 1.2}, TextAnchor::End}}});
    }
    for (Text &t : placeLabels(requests, obstacles, f.plot_mm)) {
        list.add(std::move(t));
    }
    appendXyAxes(list, spec, f, s);

    const PointMm corner = xyLegendCorner(list, f, s);
    LegendRows rows(list, corner, {s.legend_row_mm, s.label_size_pt, kSwatchWidth_mm, 2.0, kInk});
    rows.heading("Holes");
    rows.row("age (\u00b11.96 sd)", [&](PointMm p) {
        addCappedBar(list, {p.x_mm, p.y_mm - 1.6}, {p.x_mm, p.y_mm + 1.6}, true, kInk,
                     {ItemRole::LegendSwatch, "point"});
        list.add(Marker{p, MarkerShape::Circle, s.marker_mm, kPoint, false, 0.25,
                        {ItemRole::LegendSwatch, "point"}});
    });
    if (fit_drawn) {
        rows.heading("Migration");
        const ChainPlotFit &fit = *in.fit;
        rows.row((fit.method.empty() ? std::string("fitted line") : fit.method) + ": " +
                     fixedText(fit.rate_km_per_myr, 1) + " \u00b1 " +
                     fixedText(fit.rate_sd_km_per_myr, 1) + " mm/yr (1 sd)",
                 [&](PointMm p) {
                     list.add(Line{{p.x_mm - kSwatchWidth_mm / 2, p.y_mm},
                                   {p.x_mm + kSwatchWidth_mm / 2, p.y_mm},
                                   Stroke{kFit, kFit_mm, DashStyle::Solid},
                                   {ItemRole::LegendSwatch, "fit"}});
                 });
    }
    finishXyPage(list, s);
    return list;
}

} // namespace atollog::draw
