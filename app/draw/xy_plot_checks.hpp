#pragma once
// Input checks shared by the x-y plots: each throws std::invalid_argument with a message that
// starts with the plot and the item (`what`, e.g. "subsidence plot: hole KAL1, sample K-12")
// and says what to fix.

#include "draw/xy_plot_frame.hpp"

#include <optional>
#include <string>

namespace atollog::draw {

void requireFiniteValue(double value, const std::string &what, const char *name);

/// lo <= mid <= hi, all finite.
void requireWithinRange(double lo, double mid, double hi, const std::string &what,
                        const char *name);

/// When `axis` is given, [lo, hi] lies on it.
void requireOnAxis(double lo, double hi, const std::optional<ValueRange> &axis,
                   const std::string &what, const char *axis_name);

/// A value as the messages print it: up to six significant digits.
std::string valueText(double value);

} // namespace atollog::draw
