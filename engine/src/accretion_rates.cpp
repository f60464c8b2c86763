#include "atollog/engine/accretion_rates.hpp"

namespace atollog {

void completeAccretionRate(AccretionRate& r) {
    r.rate_q025_mm_per_yr = mmPerYrFromMPerMyr(r.rate_q025_m_per_myr);
    r.rate_q500_mm_per_yr = mmPerYrFromMPerMyr(r.rate_q500_m_per_myr);
    r.rate_q975_mm_per_yr = mmPerYrFromMPerMyr(r.rate_q975_m_per_myr);
    r.median_outside_reef_range = r.defined_share > 0 &&
                                  (r.rate_q500_mm_per_yr < kReefAccretionMin_mm_per_yr ||
                                   r.rate_q500_mm_per_yr > kReefAccretionMax_mm_per_yr);
}

} // namespace atollog
