#pragma once
// The per-draw quantities besides the grid ages: hiatus jumps and accretion rates.
#include "age_model_inputs.hpp"
#include "age_profile.hpp"

#include <cstddef>

namespace atollog::detail {

/// Rates above this (100 m/yr) are recorded as this: no rock grows so fast, and the quantile
/// columns take only bounded values.
constexpr double kRateCap_m_per_myr = 1e8;

/// Rate columns: one per pair of consecutive prepared ties, then one per rate interval.
inline std::size_t rateColumns(const PreparedModel& m) {
    return m.ties.size() - 1 + m.intervals.size();
}

/// Calls on_hiatus(k, jump_ma) for every resolved surface and on_rate(c, rate_m_per_myr) for
/// every rate column where the rate is defined in this draw.
template <class OnHiatus, class OnRate>
void forEachDrawQuantity(const PreparedModel& m, const TieDraw& draw, const AgeProfile& profile,
                         OnHiatus&& on_hiatus, OnRate&& on_rate) {
    const auto& outcomes = profile.surfaces();
    for (std::size_t k = 0; k < outcomes.size(); ++k)
        if (outcomes[k].resolved)
            on_hiatus(k, outcomes[k].jump_ma);
    auto emit = [&](std::size_t c, double thickness_m, double time_myr) {
        if (thickness_m > 0 && time_myr > 0)
            on_rate(c, thickness_m / time_myr < kRateCap_m_per_myr ? thickness_m / time_myr
                                                                   : kRateCap_m_per_myr);
    };
    for (std::size_t t = 0; t + 1 < m.ties.size(); ++t) {
        double dz = draw.depth_m[t + 1] - draw.depth_m[t];
        double da = draw.age_ma[t + 1] - draw.age_ma[t];
        if (dz < 0) { // the pair came out in the other depth order: so did their ages
            dz = -dz;
            da = -da;
        }
        emit(t, dz, da);
    }
    for (std::size_t i = 0; i < m.intervals.size(); ++i) {
        const RateInterval& r = m.intervals[i];
        double time = profile.ageAt(r.base_m, true) - profile.ageAt(r.top_m, false);
        for (std::size_t k = 0; k < outcomes.size(); ++k)
            if (m.surfaces_m[k] > r.top_m && m.surfaces_m[k] < r.base_m)
                time -= outcomes[k].profile_jump_ma;
        emit(m.ties.size() - 1 + i, r.base_m - r.top_m, time);
    }
}

} // namespace atollog::detail
