#include "atollog/engine/reef_accretion_range.hpp"

#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog {

ReefAccretionVerdict reefAccretionVerdict(double rate_mm_per_yr) {
    if (!std::isfinite(rate_mm_per_yr) || rate_mm_per_yr < 0)
        throw std::invalid_argument("reef accretion: rate_mm_per_yr must be finite and >= 0, got " +
                                    std::to_string(rate_mm_per_yr));
    if (rate_mm_per_yr < kReefAccretionLow_mm_per_yr)
        return ReefAccretionVerdict::BelowRange;
    if (rate_mm_per_yr > kReefAccretionHigh_mm_per_yr)
        return ReefAccretionVerdict::AboveRange;
    return ReefAccretionVerdict::InRange;
}

} // namespace atollog
