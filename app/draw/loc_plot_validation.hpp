#pragma once

#include "draw/loc_plot_input.hpp"

namespace atollog::draw {

/// The checks layoutLocPlot makes (see there); throws std::invalid_argument.
void validateLocPlotInput(const LocPlotInput &input);

} // namespace atollog::draw
