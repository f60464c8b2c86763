#pragma once

#include "draw/xy_plot_frame.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// What the rate plot stands along: depth (m) or age (Ma), both growing to the right.
enum class RatePlotAlong { Depth, Age };

enum class RateIntervalKind {
    BetweenTies, // between two consecutive ties of the age model
    Package,     // a logged package between surfaces
};

/// One interval's accretion rate: its span along the x axis and its rate quantiles.
struct RatePlotInterval {
    std::string label; // its key, e.g. "B CONV-MIN .. T LEPT-TEN"
    RateIntervalKind kind = RateIntervalKind::BetweenTies;
    double span_top = 0.0;  // depth (m) or age (Ma) at the interval's top
    double span_base = 0.0; // the same at its base; more than span_top
    double rate_lo_m_per_myr = 0.0; // 2.5 %
    double rate_m_per_myr = 0.0;    // median
    double rate_hi_m_per_myr = 0.0; // 97.5 %
};

struct RatePlotInput {
    std::string hole;
    RatePlotAlong along = RatePlotAlong::Depth;
    std::vector<RatePlotInterval> intervals; // at least one
    std::optional<ValueRange> span_axis;     // depth (m) or age (Ma); automatic when empty
    std::optional<ValueRange> rate_axis_m_per_myr; // log axis, > 0; whole decades when empty
    double span_axis_length_mm = 140.0;
    double rate_axis_length_mm = 90.0;
};

} // namespace atollog::draw
