#include "atollog/engine/accretion_rates.hpp"

#include <cmath>
#include <stdexcept>
#include <string>
#include <utility>

namespace atollog {

void completeAccretionRate(AccretionRate& r) {
    // The last stop before a rate reaches the user: a NaN or inf here would pass on silently.
    for (const auto& [name, v] : {std::pair{"rate_q025_m_per_myr", r.rate_q025_m_per_myr},
                                  std::pair{"rate_q500_m_per_myr", r.rate_q500_m_per_myr},
                                  std::pair{"rate_q975_m_per_myr", r.rate_q975_m_per_myr}})
        if (!std::isfinite(v))
            throw std::invalid_argument("accretion rate '" + r.label + "': " + name + " is " +
                                        std::to_string(v) + "; rates must be finite");
    r.rate_q025_mm_per_yr = mmPerYrFromMPerMyr(r.rate_q025_m_per_myr);
    r.rate_q500_mm_per_yr = mmPerYrFromMPerMyr(r.rate_q500_m_per_myr);
    r.rate_q975_mm_per_yr = mmPerYrFromMPerMyr(r.rate_q975_m_per_myr);
    r.median_outside_reef_range = r.defined_share > 0 &&
                                  (r.rate_q500_mm_per_yr < kReefAccretionMin_mm_per_yr ||
                                   r.rate_q500_mm_per_yr > kReefAccretionMax_mm_per_yr);
}

} // namespace atollog
