#include "draw/hole_column_ages.hpp"

#include "draw/hole_column_data_tracks.hpp"
#include "draw/hole_column_track_symbols.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace ts = track_symbols;

std::string AgeTrackScale::tickLabel(std::size_t i) const {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f%s", decimals, ticks_ma.at(i),
                  i + 1 == ticks_ma.size() ? " Ma" : "");
    return buf;
}

namespace {

/// The smallest step of the 1-2-5 series that puts at most three multiples in [lo, hi].
double tickStep(double lo, double hi) {
    const double span = hi - lo;
    if (!std::isfinite(lo) || !std::isfinite(hi) || !(span > 0.0) || !std::isfinite(span)) {
        throw std::invalid_argument("age track: the ages to scale (" + std::to_string(lo) +
                                    " to " + std::to_string(hi) +
                                    " Ma) are not a finite range; check the dates and the age "
                                    "model rows of this hole");
    }
    double decade = std::pow(10.0, std::floor(std::log10(span)) - 2.0);
    // Three decades up always reach a step above the span, so this ends; bounded anyway.
    for (int guard = 0; guard < 700; ++guard) {
        for (const double m : {1.0, 2.0, 5.0}) {
            const double step = m * decade;
            const double first = std::ceil(lo / step - 1e-9);
            const double last = std::floor(hi / step + 1e-9);
            if (last - first + 1 <= 3) {
                return step;
            }
        }
        decade *= 10.0;
    }
    throw std::invalid_argument("age track: no tick step fits the ages " + std::to_string(lo) +
                                " to " + std::to_string(hi) + " Ma; check the hole's ages");
}

ColumnAgeRow lerpRow(const ColumnAgeRow &a, const ColumnAgeRow &b, double d) {
    if (d <= a.depth_m) {
        return a;
    }
    if (d >= b.depth_m) {
        return b;
    }
    const double f = (d - a.depth_m) / (b.depth_m - a.depth_m);
    const auto mix = [f](double u, double v) { return u + f * (v - u); };
    return {d, mix(a.q025_ma, b.q025_ma), mix(a.q500_ma, b.q500_ma), mix(a.q975_ma, b.q975_ma)};
}

bool sameRow(const ColumnAgeRow &a, const ColumnAgeRow &b) {
    return a.depth_m == b.depth_m && a.q025_ma == b.q025_ma && a.q500_ma == b.q500_ma &&
           a.q975_ma == b.q975_ma;
}

void addModel(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
              const DepthWindow &w, const AgeTrackScale &age, HoleColumnLegendContent &legend) {
    const std::vector<ColumnAgeRow> rows = ageRowsInWindow(in.age_model.rows, w);
    if (rows.empty()) {
        return;
    }
    // Each row's depth goes through the scale on its own: the scale need not be linear. The
    // row above a surface (the first of two at one depth) takes the shallower side of a step of
    // a warped scale, the row below it the deeper side.
    std::vector<double> ys;
    for (std::size_t i = 0; i < rows.size(); ++i) {
        const bool above_surface = i + 1 < rows.size() && rows[i + 1].depth_m == rows[i].depth_m;
        ys.push_back(above_surface ? scale.yAbove_mm(rows[i].depth_m) : scale.y_mm(rows[i].depth_m));
    }
    std::vector<PointMm> band, median;
    for (std::size_t i = 0; i < rows.size(); ++i) {
        band.push_back({age.x_mm(rows[i].q025_ma), ys[i]});
        median.push_back({age.x_mm(rows[i].q500_ma), ys[i]});
    }
    for (std::size_t i = rows.size(); i-- > 0;) {
        band.push_back({age.x_mm(rows[i].q975_ma), ys[i]});
    }
    if (rows.size() >= 2) {
        list.add(Polygon{std::move(band), ts::kBand,
                         Stroke{ts::kBandEdge, ts::kBandEdge_mm, DashStyle::Solid},
                         {ItemRole::ColumnAgeModel, "band"}});
        legend.age_band = true;
        list.add(Polyline{std::move(median), Stroke{ts::kMedian, ts::kMedian_mm, DashStyle::Solid},
                          {ItemRole::ColumnAgeModel, "median"}});
        legend.age_median = true;
    }
}

void addDates(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
              const DepthWindow &w, const AgeTrackScale &age, HoleColumnLegendContent &legend) {
    const Stroke bar{ts::kDate, ts::kDateBar_mm, DashStyle::Solid};
    const double cap = ts::kDateBarCap_mm / 2;
    // Used dates on top: a hollow marker never hides a filled one.
    for (const bool used_pass : {false, true}) {
        for (const ColumnDate &d : in.dates) {
            if (d.used_in_model != used_pass || !w.meets(d.shallow_m, d.deep_m)) {
                continue;
            }
            const ItemTag bar_tag{ItemRole::ColumnDateBar, d.id};
            const double x = age.x_mm(d.age_ma);
            const double top = std::max(d.shallow_m, w.top_m);
            const double base = std::min(d.deep_m, w.base_m);
            if (base > top) {
                list.add(Line{{x, scale.y_mm(top)}, {x, scale.y_mm(base)}, bar, bar_tag});
                for (const double end : {d.shallow_m, d.deep_m}) {
                    if (w.contains(end)) {
                        const double y = scale.y_mm(end);
                        list.add(Line{{x - cap, y}, {x + cap, y}, bar, bar_tag});
                    }
                }
            }
            const double mid_m = (d.shallow_m + d.deep_m) / 2;
            if (!w.contains(mid_m)) {
                continue;
            }
            const double y = scale.y_mm(mid_m);
            const double x0 = age.x_mm(d.age_low_ma), x1 = age.x_mm(d.age_high_ma);
            list.add(Line{{x0, y}, {x1, y}, bar, bar_tag});
            list.add(Line{{x0, y - cap}, {x0, y + cap}, bar, bar_tag});
            list.add(Line{{x1, y - cap}, {x1, y + cap}, bar, bar_tag});
            list.add(Marker{{x, y},
                            MarkerShape::Circle,
                            ts::kDateMarker_mm,
                            ts::kDate,
                            !d.used_in_model,
                            0.2,
                            {ItemRole::ColumnDateMarker, d.id}});
            (d.used_in_model ? legend.date_used : legend.date_unused) = true;
        }
    }
}

} // namespace

std::optional<AgeTrackScale> ageTrackScale(const HoleColumnInput &in,
                                           const HoleColumnTrackPositions &x) {
    if (!ageTrackShown(in)) {
        return std::nullopt;
    }
    double lo = std::numeric_limits<double>::infinity();
    double hi = -lo;
    if (in.age_track_range_ma) {
        lo = in.age_track_range_ma->first;
        hi = in.age_track_range_ma->second;
    } else {
        if (ageModelShown(in)) {
            for (const ColumnAgeRow &r : in.age_model.rows) {
                lo = std::min(lo, r.q025_ma);
                hi = std::max(hi, r.q975_ma);
            }
        }
        if (datesShown(in)) {
            for (const ColumnDate &d : in.dates) {
                lo = std::min(lo, d.age_low_ma);
                hi = std::max(hi, d.age_high_ma);
            }
        }
    }
    if (!(hi > lo)) {
        // One age only: a range around it, so it has a place and a tick.
        const double pad = std::max(std::fabs(lo) * 0.1, 0.001);
        lo -= pad;
        hi += pad;
    }
    AgeTrackScale s;
    s.young_ma = lo;
    s.old_ma = hi;
    s.left_mm = x.ages_left_mm + ts::kAgeTrackInset_mm;
    s.right_mm = x.ages_right_mm - ts::kAgeTrackInset_mm;
    const double step = tickStep(lo, hi);
    // Counted, at most three: far from zero, k += 1 would no longer move k.
    const double first = std::ceil(lo / step - 1e-9);
    const double last = std::floor(hi / step + 1e-9);
    for (int i = 0; first + i <= last && i < 3; ++i) {
        s.ticks_ma.push_back((first + i) * step + 0.0); // + 0.0: never a "-0.0" label
    }
    s.decimals = std::max(0, static_cast<int>(-std::floor(std::log10(step) + 1e-9)));
    return s;
}

std::vector<ColumnAgeRow> ageRowsInWindow(const std::vector<ColumnAgeRow> &rows,
                                          const DepthWindow &w) {
    std::vector<ColumnAgeRow> out;
    const auto push = [&out](const ColumnAgeRow &r) {
        if (out.empty() || !sameRow(out.back(), r)) {
            out.push_back(r);
        }
    };
    if (rows.size() == 1 && w.contains(rows[0].depth_m)) {
        push(rows[0]);
    }
    for (std::size_t i = 0; i + 1 < rows.size(); ++i) {
        const ColumnAgeRow &a = rows[i];
        const ColumnAgeRow &b = rows[i + 1];
        if (a.depth_m == b.depth_m) { // a surface: both rows, above first
            if (w.contains(a.depth_m)) {
                push(a);
                push(b);
            }
            continue;
        }
        const double lo = std::max(a.depth_m, w.top_m);
        const double hi = std::min(b.depth_m, w.base_m);
        if (lo > hi) {
            continue;
        }
        push(lerpRow(a, b, lo));
        push(lerpRow(a, b, hi));
    }
    return out;
}

void appendAgeTrack(DisplayList &list, const HoleColumnInput &in, const DepthScale &scale,
                    const DepthWindow &w, const HoleColumnTrackPositions &x,
                    HoleColumnLegendContent &legend) {
    const std::optional<AgeTrackScale> age = ageTrackScale(in, x);
    if (!age) {
        return;
    }
    const double top = scale.y_mm(w.top_m), base = scale.y_mm(w.base_m);
    for (std::size_t i = 0; i < age->ticks_ma.size(); ++i) {
        const double tx = age->x_mm(age->ticks_ma[i]);
        list.add(Line{{tx, top},
                      {tx, base},
                      Stroke{ts::kGrid, ts::kGrid_mm, DashStyle::Solid},
                      {ItemRole::ColumnAgeScale, age->tickLabel(i)}});
    }
    if (ageModelShown(in)) {
        addModel(list, in, scale, w, *age, legend);
    }
    if (datesShown(in)) {
        addDates(list, in, scale, w, *age, legend);
    }
    // The frame last, so the band's edge never covers it.
    list.add(Rect{{x.ages_left_mm, top, x.ages_right_mm - x.ages_left_mm, base - top},
                  std::nullopt,
                  FillPattern::None,
                  Stroke{ts::kFrame, ts::kFrame_mm, DashStyle::Solid},
                  {ItemRole::ColumnAgeScale, "frame"}});
}

} // namespace atollog::draw
