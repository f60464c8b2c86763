#pragma once

#include "draw/age_depth_plot_input.hpp"

namespace atollog::draw {

/// Checks an age-depth plot input before layout; throws std::invalid_argument with a message
/// that names the hole, the item and the value. See layoutAgeDepthPlot for the rules.
void validateAgeDepthPlotInput(const AgeDepthPlotInput &input);

} // namespace atollog::draw
