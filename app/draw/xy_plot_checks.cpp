#include "draw/xy_plot_checks.hpp"

#include <cmath>
#include <cstdio>
#include <stdexcept>

namespace atollog::draw {

std::string valueText(double value) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%g", value);
    return buf;
}

void requireFiniteValue(double value, const std::string &what, const char *name) {
    if (!std::isfinite(value)) {
        throw std::invalid_argument(what + ": " + name + " is not a finite number (" +
                                    valueText(value) + "); give a number or leave the item out");
    }
}

void requireWithinRange(double lo, double mid, double hi, const std::string &what,
                        const char *name) {
    requireFiniteValue(lo, what, name);
    requireFiniteValue(mid, what, name);
    requireFiniteValue(hi, what, name);
    if (!(lo <= mid && mid <= hi)) {
        throw std::invalid_argument(what + ": " + name + " " + valueText(mid) +
                                    " lies outside its range " + valueText(lo) + " to " +
                                    valueText(hi) +
                                    "; give the 2.5 % quantile, the median and the 97.5 % "
                                    "quantile in that order");
    }
}

void requireOnAxis(double lo, double hi, const std::optional<ValueRange> &axis,
                   const std::string &what, const char *axis_name) {
    if (!axis) {
        return;
    }
    const double tolerance = 1e-9 * std::max(1.0, std::abs(axis->max - axis->min));
    if (lo < axis->min - tolerance || hi > axis->max + tolerance) {
        throw std::invalid_argument(what + ": " + valueText(lo) + " to " + valueText(hi) +
                                    " lies off the " + axis_name + " axis (" +
                                    valueText(axis->min) + " to " + valueText(axis->max) +
                                    "); widen the axis or leave it automatic");
    }
}

} // namespace atollog::draw
