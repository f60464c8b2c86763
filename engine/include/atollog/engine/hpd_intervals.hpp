#pragma once
// Highest-density ranges of an age distribution: the smallest set of ages holding a given
// probability, as one or several disjoint intervals (a calibrated radiocarbon age on a wiggly
// curve is often bimodal).
#include "atollog/engine/age_distribution.hpp"

#include <vector>

namespace atollog {

struct AgeInterval {
    double young_ma = 0;    ///< younger end
    double old_ma = 0;      ///< older end
    double probability = 0; ///< mass of the distribution inside
};

/// Intervals youngest first. A normal gives mean -/+ z sd exactly. A gridded distribution takes
/// whole bins in order of falling density until their mass reaches `level`, then joins touching
/// bins: the mass may exceed `level` by at most the last bin taken (one grid step of density),
/// which keeps the range on the safe, slightly wider side. Throws std::invalid_argument unless
/// 0 < level < 1.
std::vector<AgeInterval> highestDensityIntervals(const AgeDistribution& age, double level);

} // namespace atollog
