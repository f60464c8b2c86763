#include "draw/subsidence_plot.hpp"

#include "draw/legend_rows.hpp"
#include "draw/subsidence_plot_validation.hpp"
#include "draw/xy_plot_frame.hpp"
#include "draw/xy_series_style.hpp"

#include <algorithm>
#include <limits>

namespace atollog::draw {

namespace {

constexpr double kBar_mm = 0.25;
constexpr double kCap_mm = 0.8;
constexpr double kRateLine_mm = 0.4;
constexpr double kSwatchWidth_mm = 8.0;
const Colour kInk = colourFromHex(0x000000);

struct DataBox {
    ValueRange age{std::numeric_limits<double>::max(), std::numeric_limits<double>::lowest()};
    ValueRange subsidence = age;
};

DataBox dataBox(const SubsidencePlotInput &in) {
    DataBox b;
    const auto take = [](ValueRange &r, double lo, double hi) {
        r.min = std::min(r.min, lo);
        r.max = std::max(r.max, hi);
    };
    for (const SubsidencePlotHole &h : in.holes) {
        for (const SubsidencePlotPoint &p : h.points) {
            take(b.age, p.age_lo_ma, p.age_hi_ma);
            take(b.subsidence, p.subsidence_lo_m, p.subsidence_hi_m);
        }
    }
    return b;
}

XyPlotSpec plotSpec(const SubsidencePlotInput &in) {
    const DataBox b = dataBox(in);
    XyPlotSpec spec;
    spec.key = "subsidence";
    spec.title = "Subsidence against age";
    spec.subtitle = in.note;
    spec.x = {"age (Ma)", b.age, in.age_axis_ma, in.age_axis_length_mm, false, true};
    spec.y = {"subsidence since deposition (m)", b.subsidence, in.subsidence_axis_m,
              in.subsidence_axis_length_mm, true, true};
    return spec;
}

/// A line with end caps across it (vertical bar when `vertical`).
void addCappedBar(DisplayList &list, PointMm from, PointMm to, bool vertical, Colour colour,
                  const ItemTag &tag) {
    const Stroke bar{colour, kBar_mm, DashStyle::Solid};
    const double c = kCap_mm / 2;
    list.add(Line{from, to, bar, tag});
    for (const PointMm end : {from, to}) {
        if (vertical) {
            list.add(Line{{end.x_mm - c, end.y_mm}, {end.x_mm + c, end.y_mm}, bar, tag});
        } else {
            list.add(Line{{end.x_mm, end.y_mm - c}, {end.x_mm, end.y_mm + c}, bar, tag});
        }
    }
}

std::string rateText(const SubsidenceRateLine &r) {
    const int decimals = std::abs(r.rate_m_per_myr) >= 10 ? 0 : 1;
    return fixedText(r.rate_m_per_myr, decimals) + " \u00b1 " +
           fixedText(r.rate_sd_m_per_myr, decimals) + " m/Myr";
}

} // namespace

XyPlotFrame subsidencePlotFrame(const SubsidencePlotInput &in, const XyPlotStyle &s) {
    return xyPlotFrame(plotSpec(in), s);
}

DisplayList layoutSubsidencePlot(const SubsidencePlotInput &in, const XyPlotStyle &s) {
    validateSubsidencePlotInput(in);
    const XyPlotSpec spec = plotSpec(in);
    const XyPlotFrame f = xyPlotFrame(spec, s);
    DisplayList list;
    appendXyTitle(list, spec, f, s);
    appendXyGrid(list, f);

    // Rate lines first, so no point hides under another hole's line.
    for (std::size_t i = 0; i < in.holes.size(); ++i) {
        const SubsidencePlotHole &h = in.holes[i];
        if (!h.rate) {
            continue;
        }
        double young = h.points.front().age_ma, old = young;
        for (const SubsidencePlotPoint &p : h.points) {
            young = std::min(young, p.age_ma);
            old = std::max(old, p.age_ma);
        }
        // Cut to the plot: a steep line over a wide age range may leave it.
        const ValueRange ys = f.y.range();
        std::vector<PointMm> line;
        constexpr int kSteps = 64;
        for (int k = 0; k <= kSteps; ++k) {
            const double age = young + (old - young) * k / kSteps;
            const double sub = h.rate->intercept_m + h.rate->rate_m_per_myr * age;
            if (sub >= ys.min && sub <= ys.max) {
                line.push_back({f.x.mm(age), f.y.mm(sub)});
            }
        }
        if (line.size() >= 2) {
            list.add(Polyline{{line.front(), line.back()},
                              Stroke{seriesColour(i), kRateLine_mm, DashStyle::Solid},
                              {ItemRole::SubsidenceRateLine, h.hole}});
        }
    }
    for (std::size_t i = 0; i < in.holes.size(); ++i) {
        const SubsidencePlotHole &h = in.holes[i];
        for (const SubsidencePlotPoint &p : h.points) {
            const std::string key = h.hole + " " + p.sample;
            const double x = f.x.mm(p.age_ma), y = f.y.mm(p.subsidence_m);
            const ItemTag bar_tag{ItemRole::SubsidenceBar, key};
            if (p.age_hi_ma > p.age_lo_ma) {
                addCappedBar(list, {f.x.mm(p.age_lo_ma), y}, {f.x.mm(p.age_hi_ma), y}, false,
                             seriesColour(i), bar_tag);
            }
            if (p.subsidence_hi_m > p.subsidence_lo_m) {
                addCappedBar(list, {x, f.y.mm(p.subsidence_lo_m)}, {x, f.y.mm(p.subsidence_hi_m)},
                             true, seriesColour(i), bar_tag);
            }
        }
        for (const SubsidencePlotPoint &p : h.points) {
            list.add(Marker{{f.x.mm(p.age_ma), f.y.mm(p.subsidence_m)},
                            seriesShape(i),
                            s.marker_mm,
                            seriesColour(i),
                            false,
                            0.25,
                            {ItemRole::SubsidencePoint, h.hole + " " + p.sample}});
        }
    }
    appendXyAxes(list, spec, f, s);

    const PointMm corner = xyLegendCorner(list, f, s);
    LegendRows rows(list, corner, {s.legend_row_mm, s.label_size_pt, kSwatchWidth_mm, 2.0, kInk});
    rows.heading("Holes (rate \u00b1 1 sd)");
    for (std::size_t i = 0; i < in.holes.size(); ++i) {
        const SubsidencePlotHole &h = in.holes[i];
        const std::string label = h.hole + (h.rate ? ": " + rateText(*h.rate) : "");
        rows.row(label, [&](PointMm p) {
            if (h.rate) {
                list.add(Line{{p.x_mm - kSwatchWidth_mm / 2, p.y_mm},
                              {p.x_mm + kSwatchWidth_mm / 2, p.y_mm},
                              Stroke{seriesColour(i), kRateLine_mm, DashStyle::Solid},
                              {ItemRole::LegendSwatch, h.hole + " rate"}});
            }
            list.add(Marker{p, seriesShape(i), s.marker_mm, seriesColour(i), false, 0.25,
                            {ItemRole::LegendSwatch, h.hole}});
        });
    }
    rows.heading("Bars");
    rows.row("95 % range of age and subsidence", [&](PointMm p) {
        addCappedBar(list, {p.x_mm - 2.5, p.y_mm}, {p.x_mm + 2.5, p.y_mm}, false, kInk,
                     {ItemRole::LegendSwatch, "bars"});
        addCappedBar(list, {p.x_mm, p.y_mm - 1.6}, {p.x_mm, p.y_mm + 1.6}, true, kInk,
                     {ItemRole::LegendSwatch, "bars"});
    });
    finishXyPage(list, s);
    return list;
}

} // namespace atollog::draw
