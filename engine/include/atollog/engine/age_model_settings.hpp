#pragma once
// Settings of one age-depth model run (buildAgeModel, age_model.hpp).
#include "atollog/engine/accretion_rates.hpp"

#include <cstdint>
#include <optional>
#include <vector>

namespace atollog {

/// The age of the core top (depth 0, the collar), treated as one more tie: a point in depth with
/// a normal age, or an exact age when sd_ma is 0; or, when `open`, only bounded: no younger than
/// age_ma and no older than the shallowest tie (uniform between, sd_ma unused). Why open: a
/// raised, emerged or eroded reef top stopped growing at an unknown time, and pinning it to the
/// present would pull every age above the shallowest tie too young.
struct CoreTopAge {
    double age_ma = 0; ///< 0: the core top is "now" (or, when open, no younger than now)
    double sd_ma = 0;
    bool open = false;
};

struct AgeModelSettings {
    int draws = 10000;      ///< 1 .. 10,000,000
    std::uint64_t seed = 1; ///< same seed, same result, bit for bit, at any thread count
    double grid_step_m = 0.5;
    /// Unset: no tie at the core top; the model starts at the shallowest tie bracket. Default:
    /// the collar is present day (0 Ma at 0 m) unless the user gives another age. Why: a reef
    /// flat cored at low tide is still growing; a raised or eroded top needs its own age.
    std::optional<CoreTopAge> core_top = CoreTopAge{};
    /// Extend the model below the deepest tie bracket with the deepest segment's rate, down to
    /// extrapolate_to_m (or the deepest kept depth or rate interval, if deeper).
    bool extrapolate_below = false;
    std::optional<double> extrapolate_to_m;
    /// The drilled base of the hole: the model never reaches below it, even where a tie bracket
    /// (a range-extended base) does.
    std::optional<double> section_base_m;
    /// The logged contact of the carbonate section on its volcanic basement. Ties lying wholly
    /// below it (lava dates) become one tie at the contact: their inverse-variance weighted mean,
    /// its sd widened by sqrt(MSWD) when MSWD > 1 (basement_age.hpp). The contact is a hiatus
    /// surface, tie brackets reaching across it end at it, and the model ends there. Why: a
    /// lava pile is dated as a unit; forcing its scattered dates into depth order would push
    /// the deepest ones old and say nothing about the reef above.
    std::optional<double> basement_contact_m;
    /// Logged surfaces where the age may jump (exposure, hardground, erosion from
    /// loggedSurfaces); the caller chooses which.
    std::vector<double> hiatus_depths_m;
    /// Logged intervals whose accretion rate is wanted, besides every pair of consecutive ties.
    std::vector<RateInterval> rate_intervals;
    int threads = 1;       ///< 1 .. 256; never changes the result
    int outlier_draws = 1000; ///< draws per leave-one-out run; 0 skips the outlier search
    /// Gibbs sampler (age_model.hpp): sweeps each chain runs before it keeps any (0 .. 1e6),
    /// and sweeps per kept draw (1 .. 1000). Each fixed block of draws runs its own chain.
    int burn_in_sweeps = 200;
    int thin = 2;
    /// Independent (importance-weighted) draws behind the reported acceptance rate, 1 .. 1e7.
    int acceptance_draws = 1000;
};

} // namespace atollog
