#pragma once

#include "draw/age_depth_plot_input.hpp"
#include "draw/age_depth_plot_style.hpp"
#include "draw/depth_scale.hpp"
#include "draw/depth_ticks.hpp"
#include "draw/scene_rect.hpp"

namespace atollog::draw {

/// Maps age (Ma, older to the right) to paper x (mm): x_mm = left_mm + (age_ma - min_ma) *
/// mm_per_ma, with mm_per_ma = length_mm / (max_ma - min_ma).
class AgeScale {
  public:
    /// Throws std::invalid_argument unless min_ma < max_ma and length_mm > 0, all finite.
    AgeScale(double min_ma, double max_ma, double left_mm, double length_mm);

    double x_mm(double age_ma) const { return left_mm_ + (age_ma - min_ma_) * mm_per_ma_; }
    double age_ma(double x_mm) const { return min_ma_ + (x_mm - left_mm_) / mm_per_ma_; }

    double min_ma() const { return min_ma_; }
    double max_ma() const { return max_ma_; }
    double mm_per_ma() const { return mm_per_ma_; }

  private:
    double min_ma_;
    double max_ma_;
    double left_mm_;
    double mm_per_ma_;
};

/// Where the plot area lies on paper and how depth and age map onto it. The age ticks reuse
/// DepthTicks (the same 1-2-5 series), with values in Ma.
struct AgeDepthPlotFrame {
    RectMm plot_mm; // the framed data area: age axis along its top, depth axis down its left
    DepthScale depth;
    AgeScale age;
    DepthTicks depth_ticks;
    DepthTicks age_ticks;
    // Middles of the text lines above the plot, top to bottom.
    double title_y_mm = 0.0;
    double subtitle_y_mm = 0.0;
    double age_heading_y_mm = 0.0;
    double age_label_y_mm = 0.0;
    double major_tick_mm = 0.0; // length of the major ticks, outward from the frame
};

/// The age axis range the plot uses: input.age_axis when given; otherwise the youngest to the
/// oldest age drawn (envelope, tie ranges, reference line) widened outward to whole steps of
/// the 1-2-5 tick series chosen for age_axis_length_mm. Expects a validated input.
AgeRange ageDepthPlotAgeRange(const AgeDepthPlotInput &input, const AgeDepthPlotStyle &style);

/// The frame layoutAgeDepthPlot draws into, so callers (tests, the viewer's pointer read-out)
/// map depth and age to paper exactly as the plot does. Expects a validated input.
AgeDepthPlotFrame ageDepthPlotFrame(const AgeDepthPlotInput &input,
                                    const AgeDepthPlotStyle &style = {});

} // namespace atollog::draw
