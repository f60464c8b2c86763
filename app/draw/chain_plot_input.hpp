#pragma once

#include "draw/xy_plot_frame.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::draw {

/// One hole: its distance along the chain from the active centre and its basement (or
/// horizon) age, each with its 1 sd.
struct ChainPlotPoint {
    std::string hole;
    double distance_km = 0.0;
    double distance_sd_km = 0.0;
    double age_ma = 0.0;
    double age_sd_ma = 0.0;
};

/// The fitted line age = intercept_ma + slope_ma_per_km * distance, and the migration rate it
/// gives (1 / slope, km/Myr = mm/yr) with its 1 sd.
struct ChainPlotFit {
    double intercept_ma = 0.0;
    double slope_ma_per_km = 0.0;
    double rate_km_per_myr = 0.0;
    double rate_sd_km_per_myr = 0.0;
    std::string method; // e.g. "York fit"; in the legend
};

struct ChainPlotInput {
    std::string note; // the subtitle; may be empty
    std::string age_heading = "basement age (Ma)";
    std::vector<ChainPlotPoint> points; // at least one
    std::optional<ChainPlotFit> fit;    // drawn from distance 0 to the farthest point
    std::optional<ValueRange> distance_axis_km; // automatic (from 0) when empty
    std::optional<ValueRange> age_axis_ma;      // automatic (from 0) when empty
    double distance_axis_length_mm = 130.0;
    double age_axis_length_mm = 90.0;
};

} // namespace atollog::draw
