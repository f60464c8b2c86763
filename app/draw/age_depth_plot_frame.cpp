#include "draw/age_depth_plot_frame.hpp"

#include "draw/text_extent.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

// Vertical stack above the plot: title, subtitle, then the age heading and tick labels.
constexpr double kTitleGap_mm = 1.5;
constexpr double kHeaderGap_mm = 4.0;
constexpr double kHeadingGap_mm = 1.0;
constexpr double kLabelGap_mm = 0.8;
constexpr double kMajorTick_mm = 1.8;

/// Youngest and oldest age anything on the plot is drawn at.
AgeRange dataAgeRange(const AgeDepthPlotInput &in) {
    AgeRange r{in.model.front().age_q025_ma, in.model.front().age_q975_ma};
    const auto take = [&r](double lo, double hi) {
        r.min_ma = std::min(r.min_ma, lo);
        r.max_ma = std::max(r.max_ma, hi);
    };
    for (const AgeModelGridPoint &p : in.model) {
        take(p.age_q025_ma, p.age_q975_ma);
    }
    for (const AgeDepthTie &t : in.ties) {
        take(t.age_lo_ma, t.age_hi_ma);
    }
    if (in.reference) {
        for (const AgeDepthPoint &p : in.reference->points) {
            take(p.age_ma, p.age_ma);
        }
    }
    return r;
}

double tickStep(const AgeRange &r, double length_mm, double min_spacing_mm) {
    return chooseDepthTicks(r.min_ma, r.max_ma, length_mm / (r.max_ma - r.min_ma), min_spacing_mm)
        .major_step_m;
}

} // namespace

AgeScale::AgeScale(double min_ma, double max_ma, double left_mm, double length_mm)
    : min_ma_(min_ma), max_ma_(max_ma), left_mm_(left_mm), mm_per_ma_(0.0) {
    if (!std::isfinite(min_ma) || !std::isfinite(max_ma) || !(max_ma > min_ma)) {
        throw std::invalid_argument("AgeScale: the axis must run from a younger to an older "
                                    "finite age, got " +
                                    std::to_string(min_ma) + " to " + std::to_string(max_ma));
    }
    if (!std::isfinite(left_mm) || !std::isfinite(length_mm) || length_mm <= 0.0) {
        throw std::invalid_argument("AgeScale: the axis needs a positive finite length, got " +
                                    std::to_string(length_mm) + " mm");
    }
    mm_per_ma_ = length_mm / (max_ma - min_ma);
}

AgeRange ageDepthPlotAgeRange(const AgeDepthPlotInput &in, const AgeDepthPlotStyle &s) {
    if (in.age_axis) {
        return *in.age_axis;
    }
    AgeRange data = dataAgeRange(in);
    if (data.max_ma - data.min_ma < 1e-9) {
        // One age everywhere (a flat model): give the axis some width around it.
        const double pad = std::max(0.001, std::abs(data.max_ma) * 0.1);
        data = {data.min_ma - pad, data.max_ma + pad};
    }
    // Widening to whole steps shrinks mm per Ma, which may call for a coarser step; the step
    // only grows, so this settles within a few rounds.
    double step = tickStep(data, in.age_axis_length_mm, s.age_tick_min_spacing_mm);
    AgeRange widened = data;
    for (int round = 0; round < 8; ++round) {
        widened = {std::floor(data.min_ma / step + 1e-9) * step,
                   std::ceil(data.max_ma / step - 1e-9) * step};
        const double next = tickStep(widened, in.age_axis_length_mm, s.age_tick_min_spacing_mm);
        if (next <= step * (1 + 1e-9)) {
            break;
        }
        step = next;
    }
    return widened;
}

AgeDepthPlotFrame ageDepthPlotFrame(const AgeDepthPlotInput &in, const AgeDepthPlotStyle &s) {
    const AgeRange ages = ageDepthPlotAgeRange(in, s);
    const double title_h = textLineHeight_mm(s.title_size_pt);
    const double subtitle_h = textLineHeight_mm(s.subtitle_size_pt);
    const double label_h = textLineHeight_mm(s.label_size_pt);
    const double title_y = s.margin_mm + title_h / 2;
    const double subtitle_y = s.margin_mm + title_h + kTitleGap_mm + subtitle_h / 2;
    const double heading_y = subtitle_y + subtitle_h / 2 + kHeaderGap_mm + label_h / 2;
    const double label_y = heading_y + label_h + kHeadingGap_mm;
    const double top = label_y + label_h / 2 + kLabelGap_mm + kMajorTick_mm;
    const double left = s.margin_mm + s.depth_axis_width_mm;
    const DepthScale depth = DepthScale::fromRatio(in.top_m, in.scale_ratio, top);
    const AgeScale age(ages.min_ma, ages.max_ma, left, in.age_axis_length_mm);
    const RectMm plot{left, top, in.age_axis_length_mm, depth.y_mm(in.base_m) - top};
    return AgeDepthPlotFrame{
        plot,
        depth,
        age,
        chooseDepthTicks(in.top_m, in.base_m, depth.mm_per_m(), s.major_tick_min_spacing_mm),
        chooseDepthTicks(ages.min_ma, ages.max_ma, age.mm_per_ma(), s.age_tick_min_spacing_mm),
        title_y,
        subtitle_y,
        heading_y,
        label_y,
        kMajorTick_mm};
}

} // namespace atollog::draw
