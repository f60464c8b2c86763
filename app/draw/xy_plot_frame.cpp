#include "draw/xy_plot_frame.hpp"

#include "draw/text_extent.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <stdexcept>

namespace atollog::draw {

namespace {

constexpr double kTitleGap_mm = 1.5;
constexpr double kHeaderGap_mm = 5.0; // subtitle to the plot's top edge
constexpr double kMajorTick_mm = 1.8;
constexpr double kMinorTick_mm = 1.0;
constexpr double kLabelGap_mm = 0.8;
constexpr double kHeadingGap_mm = 1.2;

const Colour kInk = colourFromHex(0x000000);
const Colour kGrid = colourFromHex(0xE0E0E0);

bool finiteRange(const ValueRange &r) {
    return std::isfinite(r.min) && std::isfinite(r.max);
}

double tickStep(const ValueRange &r, double length_mm, double min_spacing_mm) {
    return chooseDepthTicks(r.min, r.max, length_mm / (r.max - r.min), min_spacing_mm)
        .major_step_m;
}

ValueRange axisRange(const XyAxisSpec &a, double min_spacing_mm, const char *name) {
    if (!std::isfinite(a.length_mm) || a.length_mm <= 0.0) {
        throw std::invalid_argument(std::string("x-y plot: the ") + name +
                                    " axis needs a positive length in mm, got " +
                                    std::to_string(a.length_mm));
    }
    if (a.fixed) {
        if (!finiteRange(*a.fixed) || !(a.fixed->max > a.fixed->min) ||
            (a.logarithmic && !(a.fixed->min > 0.0))) {
            throw std::invalid_argument(std::string("x-y plot: the ") + name + " axis range " +
                                        std::to_string(a.fixed->min) + " to " +
                                        std::to_string(a.fixed->max) +
                                        " is empty (or not above 0 on a logarithmic "
                                        "axis); give a smaller minimum than maximum");
        }
        return *a.fixed;
    }
    if (a.logarithmic) {
        return niceLogAxisRange(a.data);
    }
    return niceAxisRange(a.data, a.from_zero, a.length_mm, min_spacing_mm);
}

Text axisText(PointMm at, std::string text, TextAnchor anchor, double size_pt, ItemTag tag,
              double rotation_deg = 0.0) {
    return Text{at, std::move(text), anchor, size_pt, FontWeight::Regular, rotation_deg, kInk,
                std::move(tag)};
}

/// A minor tick's key: one decimal more than the labels on a linear axis.
std::string minorKey(double v, const DepthTicks &ticks, bool logarithmic) {
    return logarithmic ? tickLabel(v, ticks, true) : fixedText(v, ticks.label_decimals + 1);
}

} // namespace

std::string fixedText(double v, int decimals) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.*f", decimals, v);
    std::string s = buf;
    if (s.front() == '-' && s.find_first_not_of("-0.") == std::string::npos) {
        s.erase(0, 1); // "-0.0" -> "0.0"
    }
    return s;
}

AxisScale::AxisScale(ValueRange range, double from_mm, double to_mm, bool logarithmic)
    : range_(range), log_(logarithmic), warped_min_(0.0), from_mm_(from_mm), mm_per_unit_(0.0) {
    if (!finiteRange(range) || !(range.max > range.min)) {
        throw std::invalid_argument("AxisScale: the range must run from a smaller to a larger "
                                    "finite value, got " +
                                    std::to_string(range.min) + " to " + std::to_string(range.max));
    }
    if (log_ && !(range.min > 0.0)) {
        throw std::invalid_argument("AxisScale: a logarithmic axis needs a range above 0, got " +
                                    std::to_string(range.min) + " to " +
                                    std::to_string(range.max));
    }
    if (!std::isfinite(from_mm) || !std::isfinite(to_mm) || from_mm == to_mm) {
        throw std::invalid_argument("AxisScale: the axis needs a finite, non-zero length");
    }
    warped_min_ = warp(range.min);
    mm_per_unit_ = (to_mm - from_mm) / (warp(range.max) - warped_min_);
}

double AxisScale::warp(double value) const {
    return log_ ? std::log10(value) : value;
}

double AxisScale::value(double mm) const {
    const double warped = warped_min_ + (mm - from_mm_) / mm_per_unit_;
    return log_ ? std::pow(10.0, warped) : warped;
}

bool AxisScale::contains(double value) const {
    if (log_ && !(value > 0.0)) {
        return false;
    }
    const double lo = warp(range_.min), hi = warp(range_.max), v = warp(value);
    const double tolerance = 1e-9 * std::max(1.0, hi - lo);
    return v >= lo - tolerance && v <= hi + tolerance;
}

ValueRange niceLogAxisRange(ValueRange data) {
    if (!finiteRange(data) || !(data.min > 0.0) || data.min > data.max) {
        throw std::invalid_argument("niceLogAxisRange: the data range must be finite with "
                                    "0 < min <= max");
    }
    double lo = std::floor(std::log10(data.min) + 1e-9);
    double hi = std::ceil(std::log10(data.max) - 1e-9);
    if (hi <= lo) {
        hi = lo + 1; // one value on a power of ten: one decade above it
    }
    return {std::pow(10.0, lo), std::pow(10.0, hi)};
}

DepthTicks chooseLogTicks(ValueRange range, double mm_per_decade, double min_spacing_mm) {
    DepthTicks t;
    t.major_step_m = 0.0;
    const double log2 = std::log10(2.0);
    const bool one_two_five = mm_per_decade * log2 >= min_spacing_mm;
    const int every = std::max(1, static_cast<int>(std::ceil(min_spacing_mm / mm_per_decade - 1e-9)));
    const bool minors = mm_per_decade * std::log10(10.0 / 9.0) >= 0.8;
    const int first = static_cast<int>(std::floor(std::log10(range.min))) - 1;
    const int last = static_cast<int>(std::ceil(std::log10(range.max))) + 1;
    const auto inside = [&range](double v) {
        return v >= range.min * (1 - 1e-9) && v <= range.max * (1 + 1e-9);
    };
    for (int k = first; k <= last; ++k) {
        const double decade = std::pow(10.0, k);
        for (int m = 1; m <= 9; ++m) {
            const double v = m * decade;
            if (!inside(v)) {
                continue;
            }
            const bool major = one_two_five ? (m == 1 || m == 2 || m == 5)
                                            : (m == 1 && ((k % every) + every) % every == 0);
            if (major) {
                t.major_m.push_back(v);
            } else if (minors) {
                t.minor_m.push_back(v);
            }
        }
    }
    return t;
}

std::string tickLabel(double value, const DepthTicks &ticks, bool logarithmic) {
    if (!logarithmic) {
        return fixedText(value, ticks.label_decimals);
    }
    const int decimals = std::max(0, -static_cast<int>(std::floor(std::log10(value) + 1e-9)));
    return fixedText(value, decimals);
}

ValueRange niceAxisRange(ValueRange data, bool from_zero, double length_mm,
                         double min_spacing_mm) {
    if (!finiteRange(data) || data.min > data.max) {
        throw std::invalid_argument("niceAxisRange: the data range must be finite with min <= max");
    }
    if (from_zero) {
        data = {std::min(data.min, 0.0), std::max(data.max, 0.0)};
    }
    if (data.max - data.min < 1e-12 * std::max(1.0, std::abs(data.max))) {
        // One value everywhere: give the axis some width around it.
        const double pad = data.max == 0.0 ? 1.0 : std::abs(data.max) * 0.1;
        data = {data.min - pad, data.max + pad};
    }
    // Widening to whole steps shrinks mm per unit, which may call for a coarser step; the step
    // only grows, so this settles within a few rounds.
    double step = tickStep(data, length_mm, min_spacing_mm);
    ValueRange widened = data;
    for (int round = 0; round < 8; ++round) {
        widened = {std::floor(data.min / step + 1e-9) * step,
                   std::ceil(data.max / step - 1e-9) * step};
        const double next = tickStep(widened, length_mm, min_spacing_mm);
        if (next <= step * (1 + 1e-9)) {
            break;
        }
        step = next;
    }
    return widened;
}

XyPlotFrame xyPlotFrame(const XyPlotSpec &spec, const XyPlotStyle &s) {
    const ValueRange xr = axisRange(spec.x, s.x_tick_min_spacing_mm, "x");
    const ValueRange yr = axisRange(spec.y, s.y_tick_min_spacing_mm, "y");
    const double title_h = textLineHeight_mm(s.title_size_pt);
    const double subtitle_h = textLineHeight_mm(s.subtitle_size_pt);
    const double title_y = s.margin_mm + title_h / 2;
    const double subtitle_y = s.margin_mm + title_h + kTitleGap_mm + subtitle_h / 2;
    const double top = subtitle_y + subtitle_h / 2 + kHeaderGap_mm;
    const double left = s.margin_mm + s.y_axis_width_mm;
    const RectMm plot{left, top, spec.x.length_mm, spec.y.length_mm};
    const AxisScale x(xr, left, plot.right_mm(), spec.x.logarithmic);
    const AxisScale y = spec.y.downward
                            ? AxisScale(yr, top, plot.bottom_mm(), spec.y.logarithmic)
                            : AxisScale(yr, plot.bottom_mm(), top, spec.y.logarithmic);
    const auto ticks = [](const AxisScale &scale, double spacing_mm) {
        const ValueRange r = scale.range();
        return scale.logarithmic() ? chooseLogTicks(r, scale.mmPerUnit(), spacing_mm)
                                   : chooseDepthTicks(r.min, r.max, scale.mmPerUnit(), spacing_mm);
    };
    return XyPlotFrame{plot,
                       x,
                       y,
                       ticks(x, s.x_tick_min_spacing_mm),
                       ticks(y, s.y_tick_min_spacing_mm),
                       title_y,
                       subtitle_y};
}

void appendXyTitle(DisplayList &list, const XyPlotSpec &spec, const XyPlotFrame &f,
                   const XyPlotStyle &s) {
    list.add(Text{{s.margin_mm, f.title_y_mm},
                  spec.title,
                  TextAnchor::Start,
                  s.title_size_pt,
                  FontWeight::Bold,
                  0.0,
                  kInk,
                  {ItemRole::Title, spec.key}});
    if (!spec.subtitle.empty()) {
        list.add(axisText({s.margin_mm, f.subtitle_y_mm}, spec.subtitle, TextAnchor::Start,
                          s.subtitle_size_pt, {ItemRole::Subtitle, spec.key}));
    }
}

void appendXyGrid(DisplayList &list, const XyPlotFrame &f) {
    const Stroke grid{kGrid, 0.15, DashStyle::Solid};
    const ItemTag tag{ItemRole::Frame, "grid"};
    const RectMm &p = f.plot_mm;
    for (const double v : f.y_ticks.major_m) {
        list.add(Line{{p.left_mm, f.y.mm(v)}, {p.right_mm(), f.y.mm(v)}, grid, tag});
    }
    for (const double v : f.x_ticks.major_m) {
        list.add(Line{{f.x.mm(v), p.top_mm}, {f.x.mm(v), p.bottom_mm()}, grid, tag});
    }
}

void appendXyAxes(DisplayList &list, const XyPlotSpec &spec, const XyPlotFrame &f,
                  const XyPlotStyle &s) {
    const RectMm &p = f.plot_mm;
    list.add(Rect{p, std::nullopt, FillPattern::None, Stroke{kInk, 0.35, DashStyle::Solid},
                  {ItemRole::Frame, "plot"}});
    const Stroke minor{kInk, 0.2, DashStyle::Solid};
    const Stroke major{kInk, 0.25, DashStyle::Solid};
    const double label_h = textLineHeight_mm(s.label_size_pt);

    // x along the bottom, ticks outward (down).
    for (const double v : f.x_ticks.minor_m) {
        const double x = f.x.mm(v);
        list.add(Line{{x, p.bottom_mm()},
                      {x, p.bottom_mm() + kMinorTick_mm},
                      minor,
                      {ItemRole::XyAxis, "x " + minorKey(v, f.x_ticks, f.x.logarithmic())}});
    }
    const double x_label_y = p.bottom_mm() + kMajorTick_mm + kLabelGap_mm + label_h / 2;
    for (const double v : f.x_ticks.major_m) {
        const std::string label = tickLabel(v, f.x_ticks, f.x.logarithmic());
        const double x = f.x.mm(v);
        list.add(Line{{x, p.bottom_mm()}, {x, p.bottom_mm() + kMajorTick_mm}, major,
                      {ItemRole::XyAxis, "x " + label}});
        list.add(axisText({x, x_label_y}, label, TextAnchor::Middle, s.label_size_pt,
                          {ItemRole::XyAxisLabel, "x " + label}));
    }
    list.add(axisText({p.left_mm + p.width_mm / 2, x_label_y + label_h + kHeadingGap_mm},
                      spec.x.heading, TextAnchor::Middle, s.label_size_pt,
                      {ItemRole::XyAxis, "x heading"}));

    // y up (or down) the left side, ticks outward (left).
    for (const double v : f.y_ticks.minor_m) {
        const double y = f.y.mm(v);
        list.add(Line{{p.left_mm - kMinorTick_mm, y},
                      {p.left_mm, y},
                      minor,
                      {ItemRole::XyAxis, "y " + minorKey(v, f.y_ticks, f.y.logarithmic())}});
    }
    for (const double v : f.y_ticks.major_m) {
        const std::string label = tickLabel(v, f.y_ticks, f.y.logarithmic());
        const double y = f.y.mm(v);
        list.add(Line{{p.left_mm - kMajorTick_mm, y}, {p.left_mm, y}, major,
                      {ItemRole::XyAxis, "y " + label}});
        list.add(axisText({p.left_mm - kMajorTick_mm - kLabelGap_mm, y}, label, TextAnchor::End,
                          s.label_size_pt, {ItemRole::XyAxisLabel, "y " + label}));
    }
    // The heading reads bottom to top along the axis, centred on it.
    list.add(axisText({s.margin_mm + label_h / 2, p.top_mm + p.height_mm / 2}, spec.y.heading,
                      TextAnchor::Middle, s.label_size_pt, {ItemRole::XyAxis, "y heading"},
                      -90.0));
}

PointMm xyLegendCorner(const DisplayList &list, const XyPlotFrame &f, const XyPlotStyle &s) {
    // The title block above the plot may run wider than it; the legend stands beside the plot
    // and what is drawn out beside it, not beyond the title.
    double right = f.plot_mm.right_mm();
    for (const DisplayItem &item : list.items()) {
        const ItemRole role = itemTag(item).role;
        if (role != ItemRole::Title && role != ItemRole::Subtitle) {
            right = std::max(right, itemBounds(item).right_mm());
        }
    }
    return {right + s.legend_gap_mm, f.plot_mm.top_mm};
}

void finishXyPage(DisplayList &list, const XyPlotStyle &s) {
    const RectMm content = list.boundingBox();
    list.setPage(
        RectMm{0.0, 0.0, content.right_mm() + s.margin_mm, content.bottom_mm() + s.margin_mm});
}

} // namespace atollog::draw
