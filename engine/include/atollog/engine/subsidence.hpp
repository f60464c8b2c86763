#pragma once
// Subsidence of a reef sample since it grew, from where it is now and where it grew.
//
// A sample at drilled depth d (m below the collar) in a hole whose collar stands e m above present
// sea level lies d - e m below present sea level. It grew under w m of water (its paleodepth)
// when sea level stood L(t) m relative to present (negative below) at its age t. Since then the
// ground under it has sunk by
//     S = (d - e) + w - L(t)
// (positive = subsidence). This ignores compaction of the rock above and any uplift.
//
// Uncertainty is carried by draws: each draw takes one age from the age model, a water depth
// uniform within the interval's paleodepth bracket [min, max], and a sea level drawn normal about
// the curve's level at that age with the curve's sd. The subsidence rate S / t (m/Myr) is left
// undefined (a flag, never NaN) when any age draw is younger than min_age_for_rate_ma.
#include "atollog/engine/sea_level_curve.hpp"
#include "atollog/engine/york_fit.hpp"

#include <cstdint>
#include <optional>
#include <span>
#include <string>

namespace atollog {

struct SubsidenceSettings {
    /// Below this age the rate S/t is not reported: S is then metres over a few kyr and the
    /// ratio says nothing about the long-term sinking. Default: the base of the Holocene, 11.7 ka
    /// (the Holocene GSSP, Walker et al. 2009, J. Quat. Sci. 24:3; from memory [M]).
    double min_age_for_rate_ma = 0.0117;
};

/// The 2.5 %, 50 % and 97.5 % quantiles (type 7) and the mean of a set of draws.
struct DrawSummary {
    double p2_5 = 0;
    double p50 = 0;
    double p97_5 = 0;
    double mean = 0;
    double sd = 0; ///< sample standard deviation (n - 1); 0 for a single draw
};

struct SubsidenceEstimate {
    double present_depth_below_sea_level_m = 0; ///< d - e
    DrawSummary subsidence_m;
    DrawSummary age_ma;
    std::optional<DrawSummary> rate_m_per_myr;  ///< empty when rate_undefined_young_age
    /// Correlation of the S and t draws (0 when either is constant): the r of a York fit.
    double subsidence_age_correlation = 0;
    int draws = 0;
    bool no_sea_level_curve = false;       ///< no curve given: L = 0 was used
    int draws_beyond_sea_level_curve = 0;  ///< draws whose age lay outside the curve
    bool rate_undefined_young_age = false; ///< some age draw < min_age_for_rate_ma
};

/// One sample's subsidence from draws of its age (Ma). The draws are used in order, one water
/// depth and one sea level per age draw, from std::mt19937_64 seeded with `seed`. Throws
/// std::invalid_argument on a non-finite input, paleodepth_min_m > paleodepth_max_m, no age
/// draws, or an age draw below -0.0001 Ma (more than a century after 1950); also on a depth,
/// elevation or paleodepth beyond 1e7 m, an age draw above 1e6 Ma, or min_age_for_rate_ma
/// below 1e-6 Ma (bounds that keep every sum of squares finite).
SubsidenceEstimate subsidenceDraws(double depth_m, double collar_elev_m, double paleodepth_min_m,
                                   double paleodepth_max_m, std::span<const double> age_draws_ma,
                                   const SeaLevelCurve& sea_level, std::uint64_t seed,
                                   const SubsidenceSettings& settings = {});

/// One point of a hole's subsidence history, for the per-hole rate.
struct SubsidencePoint {
    std::string sample;
    double age_ma = 0;
    double age_sd_ma = 0;
    double subsidence_m = 0;
    double subsidence_sd_m = 0;
    double correlation = 0; ///< of the age and subsidence errors
};

/// A point from an estimate: the means and sds of its draws.
SubsidencePoint subsidencePoint(std::string sample, const SubsidenceEstimate& e);

/// A hole's long-term subsidence rate: the York et al. (2004) line of S (m) against t (Ma)
/// through the hole's samples, with both sds and their correlation; the slope is the rate in
/// m/Myr. The intercept is left free (S at t = 0 need not vanish: young reef grows in water).
/// York rather than OLS because ages of old samples are far less certain than young ones; the
/// sds are York's (not scaled by sqrt(MSWD)). Needs >= 3 points with sds > 0.
struct HoleSubsidenceRate {
    double rate_m_per_myr = 0;
    double rate_sd_m_per_myr = 0;
    double intercept_m = 0;
    double intercept_sd_m = 0;
    double mswd = 0;
    int points = 0;
};
HoleSubsidenceRate holeSubsidenceRate(std::span<const SubsidencePoint> points);

} // namespace atollog
