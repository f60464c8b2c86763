#pragma once

#include "draw/subsidence_plot_input.hpp"

namespace atollog::draw {

/// The checks layoutSubsidencePlot makes (see there); throws std::invalid_argument.
void validateSubsidencePlotInput(const SubsidencePlotInput &input);

} // namespace atollog::draw
