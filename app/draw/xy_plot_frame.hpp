#pragma once
// The frame every x-y plot draws into (subsidence, rates, line of correlation, chain): linear
// axes with 1-2-5 ticks (the series of depth_ticks.hpp) or logarithmic axes with ticks at 1, 2
// and 5 times powers of ten, x along the bottom, y up the left side (or down it, for
// depth-like quantities), a title block above and a legend to the right.

#include "draw/depth_ticks.hpp"
#include "draw/display_list.hpp"
#include "draw/xy_plot_style.hpp"

#include <optional>
#include <string>

namespace atollog::draw {

/// A closed interval of axis values, in the axis's own unit.
struct ValueRange {
    double min = 0.0;
    double max = 0.0;
};

/// Maps an axis value onto paper: `from_mm` at min, `to_mm` at max (to_mm < from_mm for a y
/// axis growing upward), linearly in the value or, when `logarithmic`, in its log10.
class AxisScale {
  public:
    /// Throws std::invalid_argument unless min < max, from_mm != to_mm, all finite, and min > 0
    /// on a logarithmic scale.
    AxisScale(ValueRange range, double from_mm, double to_mm, bool logarithmic = false);

    double mm(double value) const { return from_mm_ + (warp(value) - warped_min_) * mm_per_unit_; }
    double value(double mm) const;
    ValueRange range() const { return range_; }
    bool logarithmic() const { return log_; }
    /// Paper length of one unit (of one decade on a logarithmic scale), always positive.
    double mmPerUnit() const { return mm_per_unit_ < 0 ? -mm_per_unit_ : mm_per_unit_; }
    bool contains(double value) const;

  private:
    double warp(double value) const;
    ValueRange range_;
    bool log_;
    double warped_min_;
    double from_mm_;
    double mm_per_unit_; // signed, per unit of warp()
};

struct XyAxisSpec {
    std::string heading;             // with its unit, e.g. "age (Ma)"
    ValueRange data;                 // what is drawn on it; used when `fixed` is empty
    std::optional<ValueRange> fixed; // the axis range, taken as given
    double length_mm = 100.0;
    bool downward = false; // y only: values grow down the page (depth, subsidence)
    bool from_zero = false; // the automatic range reaches 0 (linear axes only)
    bool logarithmic = false; // log10 axis; every value on it must be > 0
};

struct XyPlotSpec {
    std::string key;      // the key of the title, subtitle and frame items (e.g. the hole)
    std::string title;    // bold, top left
    std::string subtitle; // one line under it; may be empty
    XyAxisSpec x;
    XyAxisSpec y;
};

struct XyPlotFrame {
    RectMm plot_mm; // the framed data area
    AxisScale x;
    AxisScale y;
    DepthTicks x_ticks; // values in the axis unit (the tick chooser is unit-free)
    DepthTicks y_ticks; // on a log axis: major_step_m 0, label_decimals unused
    double title_y_mm = 0.0; // middles of the text lines above the plot
    double subtitle_y_mm = 0.0;
};

/// The automatic range of an axis: the data range (with 0 when from_zero) widened outward to
/// whole steps of the 1-2-5 tick series chosen for length_mm at min_spacing_mm; a range of one
/// value is first padded by 10 % of it (or 1 unit at 0). Throws std::invalid_argument when the
/// data range is not finite or min > max.
ValueRange niceAxisRange(ValueRange data, bool from_zero, double length_mm, double min_spacing_mm);

/// The automatic range of a logarithmic axis: the data range widened outward to whole decades.
/// Throws std::invalid_argument unless 0 < min <= max, both finite.
ValueRange niceLogAxisRange(ValueRange data);

/// Ticks of a logarithmic axis over [min, max] at mm_per_decade: majors at 1, 2 and 5 times
/// each power of ten when they stand at least min_spacing_mm apart (log10 2 of a decade), else
/// at every power of ten (every n-th when decades are closer than min_spacing_mm); minors at
/// the other whole multiples 2-9 when 0.8 mm apart.
DepthTicks chooseLogTicks(ValueRange range, double mm_per_decade, double min_spacing_mm);

/// A tick's label: with the tick set's decimals on a linear axis; on a log axis as few
/// decimals as the value needs ("0.05", "2", "1000").
std::string tickLabel(double value, const DepthTicks &ticks, bool logarithmic);

/// Where the plot area lies and how values map onto it. Throws std::invalid_argument naming
/// the axis when a length is not positive or a fixed range is empty or not finite.
XyPlotFrame xyPlotFrame(const XyPlotSpec &spec, const XyPlotStyle &style = {});

/// Title and subtitle (roles Title, Subtitle; key spec.key).
void appendXyTitle(DisplayList &list, const XyPlotSpec &spec, const XyPlotFrame &frame,
                   const XyPlotStyle &style = {});

/// Light grid lines at the labelled values (role Frame, key "grid"); add before the data.
void appendXyGrid(DisplayList &list, const XyPlotFrame &frame);

/// The frame box (Frame, "plot"), ticks outward (XyAxis, key "x <label>" / "y <label>"),
/// tick labels (XyAxisLabel, same keys) and the two headings (XyAxis, "x heading",
/// "y heading"); add after the data, so the frame is never covered.
void appendXyAxes(DisplayList &list, const XyPlotSpec &spec, const XyPlotFrame &frame,
                  const XyPlotStyle &style = {});

/// Where the legend's top-left corner goes: right of the plot and of anything drawn out there.
PointMm xyLegendCorner(const DisplayList &list, const XyPlotFrame &frame,
                       const XyPlotStyle &style = {});

/// Sets the page to everything drawn plus the margin.
void finishXyPage(DisplayList &list, const XyPlotStyle &style = {});

/// `v` with `decimals` decimals ("%.*f"), minus sign dropped from a rounded zero.
std::string fixedText(double v, int decimals);

} // namespace atollog::draw
