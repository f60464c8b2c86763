#include "draw/rate_plot.hpp"

#include "draw/legend_rows.hpp"
#include "draw/xy_plot_checks.hpp"
#include "draw/xy_plot_frame.hpp"

#include <algorithm>
#include <limits>
#include <stdexcept>

namespace atollog::draw {

namespace {

constexpr double kBar_mm = 0.6;
constexpr double kSwatchWidth_mm = 8.0;
const Colour kInk = colourFromHex(0x000000);
// Okabe & Ito (2008) blue and vermillion. The ties' band is blue at 25 % opacity; a package's
// band is only outlined, because two translucent fills of these hues mix to a grey that reads
// as a third kind.
const Colour kTiesBar = colourFromHex(0x0072B2);
const Colour kTiesBand{0x00, 0x72, 0xB2, 64};
const Colour kPackageBar = colourFromHex(0xD55E00);
constexpr double kPackageBandEdge_mm = 0.25;

/// The 95 % box: filled for ties, outlined for packages.
Rect bandBox(RectMm box, bool package, const std::string &key) {
    if (package) {
        return Rect{box, std::nullopt, FillPattern::None,
                    Stroke{kPackageBar, kPackageBandEdge_mm, DashStyle::Solid},
                    {ItemRole::RateBand, key}};
    }
    return Rect{box, kTiesBand, FillPattern::None, std::nullopt, {ItemRole::RateBand, key}};
}

bool isPackage(const RatePlotInterval &r) {
    return r.kind == RateIntervalKind::Package;
}

void validate(const RatePlotInput &in) {
    const std::string plot = "rate plot: hole " + in.hole;
    if (in.intervals.empty()) {
        throw std::invalid_argument(plot + " has no rate interval; give at least one");
    }
    const char *span = in.along == RatePlotAlong::Depth ? "depth (m)" : "age (Ma)";
    for (std::size_t i = 0; i < in.intervals.size(); ++i) {
        const RatePlotInterval &r = in.intervals[i];
        if (r.label.empty()) {
            throw std::invalid_argument(plot + ": interval " + std::to_string(i + 1) +
                                        " has no label; give its name");
        }
        const std::string what = plot + ", interval " + r.label;
        requireFiniteValue(r.span_top, what, span);
        requireFiniteValue(r.span_base, what, span);
        if (!(r.span_base > r.span_top)) {
            throw std::invalid_argument(what + ": its " + span + " span " +
                                        valueText(r.span_top) + " to " + valueText(r.span_base) +
                                        " is empty or inverted; give the top first and leave "
                                        "out intervals of no thickness");
        }
        requireWithinRange(r.rate_lo_m_per_myr, r.rate_m_per_myr, r.rate_hi_m_per_myr, what,
                           "rate (m/Myr)");
        if (!(r.rate_lo_m_per_myr > 0.0)) {
            throw std::invalid_argument(what + ": its 2.5 % rate " +
                                        valueText(r.rate_lo_m_per_myr) +
                                        " m/Myr is not above 0, which the logarithmic rate axis "
                                        "cannot show; leave the interval out");
        }
        requireOnAxis(r.span_top, r.span_base, in.span_axis, what, span);
        requireOnAxis(r.rate_lo_m_per_myr, r.rate_hi_m_per_myr, in.rate_axis_m_per_myr, what,
                      "rate");
    }
}

XyPlotSpec plotSpec(const RatePlotInput &in) {
    ValueRange span{std::numeric_limits<double>::max(), std::numeric_limits<double>::lowest()};
    ValueRange rate = span;
    for (const RatePlotInterval &r : in.intervals) {
        span = {std::min(span.min, r.span_top), std::max(span.max, r.span_base)};
        rate = {std::min(rate.min, r.rate_lo_m_per_myr), std::max(rate.max, r.rate_hi_m_per_myr)};
    }
    const bool depth = in.along == RatePlotAlong::Depth;
    XyPlotSpec spec;
    spec.key = in.hole;
    spec.title = "Hole " + in.hole + " \u2013 accretion rate against " + (depth ? "depth" : "age");
    spec.subtitle = std::string("bar: median rate over the interval's ") +
                    (depth ? "depth" : "age (median ages of its top and base)") +
                    "; box: its 95 % range";
    spec.x = {depth ? "depth (m)" : "age (Ma)", span, in.span_axis, in.span_axis_length_mm,
              false, depth};
    spec.y = {"accretion rate (m/Myr, log scale)", rate, in.rate_axis_m_per_myr,
              in.rate_axis_length_mm, false, false, true};
    return spec;
}

} // namespace

XyPlotFrame ratePlotFrame(const RatePlotInput &in, const XyPlotStyle &s) {
    return xyPlotFrame(plotSpec(in), s);
}

DisplayList layoutRatePlot(const RatePlotInput &in, const XyPlotStyle &s) {
    validate(in);
    const XyPlotSpec spec = plotSpec(in);
    const XyPlotFrame f = xyPlotFrame(spec, s);
    DisplayList list;
    appendXyTitle(list, spec, f, s);
    appendXyGrid(list, f);

    bool ties = false, packages = false;
    // Packages (long, few) first, so the shorter intervals between ties stand over them.
    for (const bool package_pass : {true, false}) {
        for (const RatePlotInterval &r : in.intervals) {
            if (isPackage(r) != package_pass) {
                continue;
            }
            const double x0 = f.x.mm(r.span_top), x1 = f.x.mm(r.span_base);
            const double y_hi = f.y.mm(r.rate_hi_m_per_myr), y_lo = f.y.mm(r.rate_lo_m_per_myr);
            list.add(bandBox(RectMm{x0, y_hi, x1 - x0, y_lo - y_hi}, package_pass, r.label));
            const double y = f.y.mm(r.rate_m_per_myr);
            list.add(Line{{x0, y},
                          {x1, y},
                          Stroke{package_pass ? kPackageBar : kTiesBar, kBar_mm,
                                 package_pass ? DashStyle::Dashed : DashStyle::Solid},
                          {ItemRole::RateBar, r.label}});
            (package_pass ? packages : ties) = true;
        }
    }
    appendXyAxes(list, spec, f, s);

    const PointMm corner = xyLegendCorner(list, f, s);
    LegendRows rows(list, corner, {s.legend_row_mm, s.label_size_pt, kSwatchWidth_mm, 2.0, kInk});
    const auto swatch = [&list](Colour bar, bool package, DashStyle dash, const std::string &what) {
        return [&list, bar, package, dash, what](PointMm p) {
            const double h = kSwatchWidth_mm / 2;
            Rect box = bandBox(RectMm{p.x_mm - h, p.y_mm - 1.3, kSwatchWidth_mm, 2.6}, package,
                               what);
            box.tag.role = ItemRole::LegendSwatch;
            list.add(box);
            list.add(Line{{p.x_mm - h, p.y_mm}, {p.x_mm + h, p.y_mm}, Stroke{bar, kBar_mm, dash},
                          {ItemRole::LegendSwatch, what}});
        };
    };
    rows.heading("Rates (median, 95 % range)");
    if (ties) {
        rows.row("between consecutive ties",
                 swatch(kTiesBar, false, DashStyle::Solid, "between ties"));
    }
    if (packages) {
        rows.row("logged package",
                 swatch(kPackageBar, true, DashStyle::Dashed, "package"));
    }
    finishXyPage(list, s);
    return list;
}

} // namespace atollog::draw
