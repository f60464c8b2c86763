#pragma once

#include "draw/xy_plot_frame.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// One dated horizon: its age and subsidence (medians) with their 95 % ranges.
struct SubsidencePlotPoint {
    std::string sample;
    double age_ma = 0.0;
    double age_lo_ma = 0.0; // 2.5 %
    double age_hi_ma = 0.0; // 97.5 %
    double subsidence_m = 0.0;
    double subsidence_lo_m = 0.0;
    double subsidence_hi_m = 0.0;
};

/// A hole's fitted line, subsidence = intercept_m + rate_m_per_myr * age.
struct SubsidenceRateLine {
    double rate_m_per_myr = 0.0;
    double rate_sd_m_per_myr = 0.0; // 1 sd; shown in the legend
    double intercept_m = 0.0;
};

struct SubsidencePlotHole {
    std::string hole;
    std::vector<SubsidencePlotPoint> points; // at least one
    std::optional<SubsidenceRateLine> rate;  // drawn over the hole's age range
};

struct SubsidencePlotInput {
    std::string note; // the subtitle, e.g. how the points were made; may be empty
    std::vector<SubsidencePlotHole> holes; // one series each, distinguished by colour and marker
    std::optional<ValueRange> age_axis_ma;       // automatic when empty
    std::optional<ValueRange> subsidence_axis_m; // automatic when empty
    double age_axis_length_mm = 130.0;
    double subsidence_axis_length_mm = 100.0;
};

} // namespace atollog::draw
