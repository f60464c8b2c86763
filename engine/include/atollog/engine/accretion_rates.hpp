#pragma once
// Linear accretion rates (thickness / time) with their uncertainty, taken from the same draws as
// the age model, so that a rate and the ages it comes from agree.
//
// Units: m/Myr and mm/yr; 1 m/Myr = 0.001 mm/yr (checks.md: 1 cm/kyr = 10 m/Myr = 0.01 mm/yr).
// Across a hiatus: the rate between two ties on either side of a surface is a mean rate that
// includes the missing time; the rate of a logged interval excludes the jump of every surface
// inside it or at its ends (its top is read just below a surface there, its base just above).
#include "atollog/engine/rate_units.hpp" // mmPerYrFromMPerMyr

#include <string>

namespace atollog {

/// A logged interval whose rate the caller wants (e.g. a reef framework unit).
struct RateInterval {
    std::string label;
    double top_m = 0;
    double base_m = 0;           ///< > top_m
    bool reef_framework = false; ///< only then is the reef plausibility flag meaningful
};

/// Reef vertical accretion plausibility range, 1-10 mm/yr (common practice; checks.md).
constexpr double kReefAccretionMin_mm_per_yr = 1.0;
constexpr double kReefAccretionMax_mm_per_yr = 10.0;


struct AccretionRate {
    std::string label;   ///< "<upper tie> .. <lower tie>" or the interval's label
    bool between_ties = true; ///< false: a logged interval given by the caller
    bool reef_framework = false;
    double top_m = 0;    ///< the interval, or the two ties' bracket midpoints
    double base_m = 0;
    /// Weighted share of the draws in which the rate is defined (time > 0 and thickness > 0);
    /// the quantiles are over those draws. 0: no quantile (all members below are 0).
    double defined_share = 0;
    double rate_q025_m_per_myr = 0;
    double rate_q500_m_per_myr = 0;
    double rate_q975_m_per_myr = 0;
    double rate_q025_mm_per_yr = 0;
    double rate_q500_mm_per_yr = 0;
    double rate_q975_mm_per_yr = 0;
    /// The median leaves 1-10 mm/yr. Computed for every rate; it means something only for reef
    /// framework (long-term rates through a whole reef cap, hiatuses included, are far lower).
    bool median_outside_reef_range = false;
};

/// Fills the mm/yr members and the flag from the m/Myr quantiles.
void completeAccretionRate(AccretionRate& rate);

} // namespace atollog
