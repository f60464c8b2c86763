#pragma once
// Mass and carbonate accumulation rates, in the usage of ocean drilling: mass accumulation rate
// (MAR) = linear sedimentation rate (LSR) x dry bulk density; carbonate accumulation rate (CAR) =
// MAR x CaCO3 fraction. Units: LSR in cm/kyr, density in g/cm3, so MAR in g/cm2/kyr.
#include <optional>
#include <span>
#include <vector>

namespace atollog {

/// MAR (g/cm2/kyr) from LSR (cm/kyr, >= 0) and dry bulk density (g/cm3, > 0).
/// Throws std::invalid_argument on negative or non-finite rate, non-positive density.
double massAccumulationRate_g_cm2_kyr(double lsr_cm_per_kyr, double dry_density_g_cm3);

/// CAR (g/cm2/kyr) from MAR (>= 0) and CaCO3 content in percent (0-100).
double carbonateAccumulationRate_g_cm2_kyr(double mar_g_cm2_kyr, double caco3_pct);

/// One quantile of the rates: probability and the LSR, MAR and (when CaCO3 is given) CAR there.
struct AccumulationQuantile {
    double probability = 0;
    double lsr_cm_per_kyr = 0;
    double mar_g_cm2_kyr = 0;
    std::optional<double> car_g_cm2_kyr;
};

/// MAR and CAR quantiles from quantiles of the LSR. With a fixed density and CaCO3 content, MAR
/// and CAR are the LSR times a positive constant, so the p-quantile of MAR is exactly the
/// p-quantile of LSR times that constant. (Uncertainty in density or CaCO3 is not propagated.)
/// probabilities and lsr_quantiles_cm_per_kyr pair up; probabilities in [0, 1].
std::vector<AccumulationQuantile>
accumulationFromLsrQuantiles(std::span<const double> probabilities,
                             std::span<const double> lsr_quantiles_cm_per_kyr,
                             double dry_density_g_cm3, std::optional<double> caco3_pct);

/// The same from draws of the LSR (e.g. from an age model): the empirical quantiles of the draws
/// (linear interpolation between order statistics, Hyndman & Fan 1996 type 7) at the given
/// probabilities, then scaled. Needs at least one draw.
std::vector<AccumulationQuantile>
accumulationFromLsrDraws(std::span<const double> lsr_draws_cm_per_kyr,
                         std::span<const double> probabilities, double dry_density_g_cm3,
                         std::optional<double> caco3_pct);

} // namespace atollog
