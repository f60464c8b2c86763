#include "draw/subsidence_plot_validation.hpp"

#include "draw/xy_plot_checks.hpp"

#include <set>
#include <stdexcept>

namespace atollog::draw {

void validateSubsidencePlotInput(const SubsidencePlotInput &in) {
    if (in.holes.empty()) {
        throw std::invalid_argument("subsidence plot: no hole to draw; give at least one hole "
                                    "with a dated horizon");
    }
    std::set<std::string> names;
    for (std::size_t i = 0; i < in.holes.size(); ++i) {
        const SubsidencePlotHole &h = in.holes[i];
        if (h.hole.empty()) {
            throw std::invalid_argument("subsidence plot: hole " + std::to_string(i + 1) +
                                        " has no name; give its hole id");
        }
        if (!names.insert(h.hole).second) {
            throw std::invalid_argument("subsidence plot: hole " + h.hole +
                                        " is given twice; merge its points into one entry");
        }
        const std::string hole_what = "subsidence plot: hole " + h.hole;
        if (h.points.empty()) {
            throw std::invalid_argument(hole_what + " has no point; leave the hole out");
        }
        for (const SubsidencePlotPoint &p : h.points) {
            const std::string what = hole_what + ", sample " + p.sample;
            requireWithinRange(p.age_lo_ma, p.age_ma, p.age_hi_ma, what, "age (Ma)");
            requireWithinRange(p.subsidence_lo_m, p.subsidence_m, p.subsidence_hi_m, what,
                               "subsidence (m)");
            requireOnAxis(p.age_lo_ma, p.age_hi_ma, in.age_axis_ma, what + " age", "age");
            requireOnAxis(p.subsidence_lo_m, p.subsidence_hi_m, in.subsidence_axis_m,
                          what + " subsidence", "subsidence");
        }
        if (h.rate) {
            requireFiniteValue(h.rate->rate_m_per_myr, hole_what, "the rate (m/Myr)");
            requireFiniteValue(h.rate->intercept_m, hole_what, "the rate line's intercept (m)");
            requireFiniteValue(h.rate->rate_sd_m_per_myr, hole_what, "the rate's sd (m/Myr)");
            if (h.rate->rate_sd_m_per_myr < 0) {
                throw std::invalid_argument(hole_what + ": the rate's sd " +
                                            valueText(h.rate->rate_sd_m_per_myr) +
                                            " m/Myr is negative; give it as a positive number");
            }
        }
    }
}

} // namespace atollog::draw
