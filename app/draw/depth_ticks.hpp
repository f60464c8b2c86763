#pragma once

#include <vector>

namespace atollog::draw {

/// Depths of the ticks of a depth axis between top_m and base_m (both inclusive when on a step).
struct DepthTicks {
    double major_step_m = 1.0;
    double minor_step_m = 0.0; // 0: no minor ticks
    int label_decimals = 0;    // enough to tell neighbouring labels apart
    std::vector<double> major_m;
    std::vector<double> minor_m; // minor ticks that are not also major
};

/// The smallest step from the 1-2-5 series whose ticks lie at least min_spacing_mm apart at
/// mm_per_m; minor ticks at a fifth (or half, for a 2-step) of it when they stay >= 1.5 mm apart.
/// Throws std::invalid_argument for an empty interval or non-positive sizes.
DepthTicks chooseDepthTicks(double top_m, double base_m, double mm_per_m, double min_spacing_mm);

} // namespace atollog::draw
