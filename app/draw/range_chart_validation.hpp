#pragma once

#include "draw/range_chart_input.hpp"

namespace atollog::draw {

/// Checks a range chart input before layout; throws std::invalid_argument with a message that
/// names the hole, the item and the value. See layoutRangeChart for the rules.
void validateRangeChartInput(const RangeChartInput &input);

} // namespace atollog::draw
