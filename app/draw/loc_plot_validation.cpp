#include "draw/loc_plot_validation.hpp"

#include "draw/xy_plot_checks.hpp"

#include <stdexcept>

namespace atollog::draw {

void validateLocPlotInput(const LocPlotInput &in) {
    if (in.x_hole.empty() || in.y_hole.empty()) {
        throw std::invalid_argument("line-of-correlation plot: a hole has no name; give both "
                                    "hole ids");
    }
    if (in.x_hole == in.y_hole) {
        throw std::invalid_argument("line-of-correlation plot: hole " + in.x_hole +
                                    " is on both axes; give two different holes");
    }
    const std::string plot = "line-of-correlation plot " + in.x_hole + " / " + in.y_hole;
    if (in.events.empty()) {
        throw std::invalid_argument(plot + ": no shared event; give at least one");
    }
    for (std::size_t i = 0; i < in.events.size(); ++i) {
        const LocPlotEvent &e = in.events[i];
        if (e.id.empty()) {
            throw std::invalid_argument(plot + ": event " + std::to_string(i + 1) +
                                        " has no id; give its event id");
        }
        const std::string what = plot + ", event " + e.id;
        requireWithinRange(e.x_shallow_m, e.x_level_m, e.x_deep_m, what + " in " + in.x_hole,
                           "the level (m)");
        requireWithinRange(e.y_shallow_m, e.y_level_m, e.y_deep_m, what + " in " + in.y_hole,
                           "the level (m)");
        requireOnAxis(e.x_shallow_m, e.x_deep_m, in.x_axis_m, what, in.x_hole.c_str());
        requireOnAxis(e.y_shallow_m, e.y_deep_m, in.y_axis_m, what, in.y_hole.c_str());
    }
    for (std::size_t i = 0; i < in.segments.size(); ++i) {
        const LocPlotSegment &g = in.segments[i];
        const std::string what = plot + ", segment " + std::to_string(i + 1);
        requireFiniteValue(g.x_from_m, what, "x_from_m");
        requireFiniteValue(g.x_to_m, what, "x_to_m");
        requireFiniteValue(g.slope, what, "the slope");
        requireFiniteValue(g.intercept_m, what, "the intercept (m)");
        if (!(g.x_to_m > g.x_from_m)) {
            throw std::invalid_argument(what + ": its x range " + valueText(g.x_from_m) + " to " +
                                        valueText(g.x_to_m) +
                                        " m is empty; leave out pieces that were not fitted");
        }
        for (std::size_t k = 0; k < g.band.size(); ++k) {
            const LocBandPoint &b = g.band[k];
            requireFiniteValue(b.x_m, what + " band", "x (m)");
            requireWithinRange(b.y_lo_m, b.y_lo_m, b.y_hi_m, what + " band", "y (m)");
            if (k > 0 && !(b.x_m > g.band[k - 1].x_m)) {
                throw std::invalid_argument(what + ": band point " + std::to_string(k + 1) +
                                            " is not right of the one before; give them in x "
                                            "order");
            }
        }
    }
    for (const double d : in.x_surfaces_m) {
        requireFiniteValue(d, plot + ", a surface of " + in.x_hole, "its depth (m)");
    }
    for (const double d : in.y_surfaces_m) {
        requireFiniteValue(d, plot + ", a surface of " + in.y_hole, "its depth (m)");
    }
}

} // namespace atollog::draw
