#include "draw/age_depth_plot_validation.hpp"
#include "draw/metres_text.hpp"

#include <cmath>
#include <cstdio>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

std::string megayears(double v) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.4g Ma", v);
    return buf;
}

[[noreturn]] void fail(const AgeDepthPlotInput &in, const std::string &what) {
    throw std::invalid_argument("age-depth plot of hole '" + in.hole + "': " + what);
}

void requireOnDepthAxis(const AgeDepthPlotInput &in, double depth_m, const std::string &what) {
    if (!std::isfinite(depth_m)) {
        fail(in, what + " is not a finite depth");
    }
    if (depth_m < in.top_m || depth_m > in.base_m) {
        fail(in, what + " at " + metresText(depth_m) + " lies outside the depth axis " +
                     metresText(in.top_m) + " to " + metresText(in.base_m));
    }
}

/// Ages must be finite, and on the age axis when the caller fixed it (a clipped cross or
/// envelope would misstate the model, so we refuse rather than cut).
void requireOnAgeAxis(const AgeDepthPlotInput &in, double age_ma, const std::string &what) {
    if (!std::isfinite(age_ma)) {
        fail(in, what + " is not a finite age");
    }
    if (in.age_axis && (age_ma < in.age_axis->min_ma || age_ma > in.age_axis->max_ma)) {
        fail(in, what + " " + megayears(age_ma) + " lies outside the age axis " +
                     megayears(in.age_axis->min_ma) + " to " + megayears(in.age_axis->max_ma));
    }
}

void validateAxes(const AgeDepthPlotInput &in) {
    if (!std::isfinite(in.top_m) || !std::isfinite(in.base_m) || in.base_m <= in.top_m) {
        fail(in, "the depth axis base " + metresText(in.base_m) + " must lie below its top " +
                     metresText(in.top_m));
    }
    if (!std::isfinite(in.scale_ratio) || in.scale_ratio <= 0.0) {
        fail(in, "the depth scale 1:N needs a positive N, got " + std::to_string(in.scale_ratio));
    }
    if (!std::isfinite(in.age_axis_length_mm) || in.age_axis_length_mm <= 0.0) {
        fail(in, "the age axis length must be a positive number of mm, got " +
                     std::to_string(in.age_axis_length_mm));
    }
    if (in.age_axis && !(std::isfinite(in.age_axis->min_ma) && std::isfinite(in.age_axis->max_ma) &&
                         in.age_axis->max_ma > in.age_axis->min_ma)) {
        fail(in, "the age axis must run from a younger to an older finite age, got " +
                     megayears(in.age_axis->min_ma) + " to " + megayears(in.age_axis->max_ma));
    }
}

void validateModel(const AgeDepthPlotInput &in) {
    if (in.model.size() < 2) {
        fail(in, "the age model grid has " + std::to_string(in.model.size()) +
                     " point(s); the envelope needs at least 2");
    }
    for (std::size_t i = 0; i < in.model.size(); ++i) {
        const AgeModelGridPoint &p = in.model[i];
        const std::string name = "age model grid point " + std::to_string(i + 1);
        requireOnDepthAxis(in, p.depth_m, name);
        requireOnAgeAxis(in, p.age_q025_ma, name + " 2.5 % age");
        requireOnAgeAxis(in, p.age_q500_ma, name + " median age");
        requireOnAgeAxis(in, p.age_q975_ma, name + " 97.5 % age");
        if (!(p.age_q025_ma <= p.age_q500_ma && p.age_q500_ma <= p.age_q975_ma)) {
            fail(in, name + " at " + metresText(p.depth_m) + " has quantiles out of order: 2.5 % " +
                         megayears(p.age_q025_ma) + ", median " + megayears(p.age_q500_ma) +
                         ", 97.5 % " + megayears(p.age_q975_ma));
        }
        if (i > 0 && p.depth_m < in.model[i - 1].depth_m) {
            fail(in, name + " at " + metresText(p.depth_m) + " lies above the point before it at " +
                         metresText(in.model[i - 1].depth_m) + "; the grid must be in depth order");
        }
    }
    if (in.model.back().depth_m <= in.model.front().depth_m) {
        fail(in, "the age model grid spans no depth (all points at " +
                     metresText(in.model.front().depth_m) + ")");
    }
}

void validateTies(const AgeDepthPlotInput &in) {
    for (std::size_t i = 0; i < in.ties.size(); ++i) {
        const AgeDepthTie &t = in.ties[i];
        if (t.label.empty()) {
            fail(in, "tie " + std::to_string(i + 1) + " has no label");
        }
        const std::string name = "tie '" + t.label + "'";
        requireOnDepthAxis(in, t.shallow_m, name + " shallow end");
        requireOnDepthAxis(in, t.deep_m, name + " deep end");
        if (t.deep_m < t.shallow_m) {
            fail(in, name + " deep end " + metresText(t.deep_m) + " lies above its shallow end " +
                         metresText(t.shallow_m));
        }
        requireOnAgeAxis(in, t.age_ma, name + " age");
        requireOnAgeAxis(in, t.age_lo_ma, name + " young end");
        requireOnAgeAxis(in, t.age_hi_ma, name + " old end");
        if (!(t.age_lo_ma <= t.age_ma && t.age_ma <= t.age_hi_ma)) {
            fail(in, name + " age " + megayears(t.age_ma) + " lies outside its range " +
                         megayears(t.age_lo_ma) + " to " + megayears(t.age_hi_ma));
        }
    }
}

void validateHiatusesAndReference(const AgeDepthPlotInput &in) {
    for (const AgeDepthHiatus &h : in.hiatuses) {
        const std::string name = h.label.empty() ? "hiatus" : "hiatus '" + h.label + "'";
        requireOnDepthAxis(in, h.depth_m, name);
        if (!std::isfinite(h.duration_q500_ma) || h.duration_q500_ma < 0.0) {
            fail(in, name + " at " + metresText(h.depth_m) +
                         " needs a finite, non-negative duration, got " +
                         megayears(h.duration_q500_ma));
        }
    }
    if (in.reference) {
        const std::string name = "reference line '" + in.reference->label + "'";
        if (in.reference->label.empty()) {
            fail(in, "the reference line has no label for the legend");
        }
        if (in.reference->points.size() < 2) {
            fail(in, name + " has " + std::to_string(in.reference->points.size()) +
                         " point(s), needs at least 2");
        }
        for (std::size_t i = 0; i < in.reference->points.size(); ++i) {
            const AgeDepthPoint &p = in.reference->points[i];
            const std::string point = name + " point " + std::to_string(i + 1);
            requireOnDepthAxis(in, p.depth_m, point);
            requireOnAgeAxis(in, p.age_ma, point + " age");
        }
    }
}

} // namespace

void validateAgeDepthPlotInput(const AgeDepthPlotInput &in) {
    validateAxes(in);
    validateModel(in);
    validateTies(in);
    validateHiatusesAndReference(in);
}

} // namespace atollog::draw
