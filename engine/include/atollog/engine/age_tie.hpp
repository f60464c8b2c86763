#pragma once
// A tie of an age-depth model: somewhere in a depth bracket lies a level whose age follows a
// distribution. Datum picks (a time-scale event's age +/- sd over the pick's bracket) and
// numerical dates (a computed age distribution over the depth range the sample may stand for,
// given partial recovery) both become ties.
#include "atollog/engine/age_distribution.hpp"

#include <string>
#include <vector>

namespace atollog {

enum class AgeTieSource { Datum, Date };

struct AgeTie {
    std::string hole;
    std::string label;        ///< event id for a datum; "<method> <sample or depth>" for a date
    AgeTieSource source = AgeTieSource::Date;
    double shallow_m = 0;     ///< the level lies uniformly anywhere in [shallow_m, deep_m]
    double deep_m = 0;        ///< equal to shallow_m for a point
    AgeDistribution age = AgeDistribution::normal(0.0, 1.0);
    std::vector<std::string> flags;
};

} // namespace atollog
