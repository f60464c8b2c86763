#pragma once
// U-series (230Th) ages of corals from activity ratios, closed-system (Edwards, Chen &
// Wasserburg 1987, EPSL 81:175):
//   (230Th/238U) = 1 - e^(-l230 T) + (d234U_m/1000) l230/(l230 - l234) (1 - e^(-(l230 - l234) T))
//   d234U_initial = d234U_m e^(l234 T),  d234U = ((234U/238U) - 1) x 1000.
// The uncertainty comes from a seeded Monte Carlo over the measured ratios (and, when the
// detrital correction is on, its assumed initial ratio); the half-lives are held fixed, as is
// usual when ages are compared with one another rather than with other clocks.
#include "atollog/engine/core_records.hpp"

#include <cstddef>
#include <cstdint>
#include <optional>

namespace atollog {

enum class UThHalfLifeSet {
    Cheng2013, ///< 230Th 75,584 yr, 234U 245,620 yr (Cheng et al. 2013, EPSL 371-372:82)
    Cheng2000  ///< 230Th 75,690 yr, 234U 245,250 yr (Cheng et al. 2000, Chem. Geol. 169:17)
};

struct UThHalfLives {
    double th230_yr = 0;
    double u234_yr = 0;
    double lambda230_per_yr() const;
    double lambda234_per_yr() const;
};
UThHalfLives uthHalfLives(UThHalfLifeSet set);

/// 238U half-life, Jaffey et al. 1971 (Phys. Rev. C 4:1889).
constexpr double kU238HalfLifeYr = 4.4683e9;
/// Modern seawater d234U, Andersen et al. 2010 (G-cubed): 146.8 +/- 0.1 per mil.
constexpr double kSeawaterD234uPermil = 146.8;
/// The root search stops here: a ratio still unmatched at 2 Myr counts as no solution. (A
/// search limit, not a claim that ages up to 2 Myr are meaningful.)
constexpr double kUThSearchLimitYr = 2.0e6;

double d234uPermilFromActivity(double u234_u238_act);

struct UThRatios {
    double th230_u238_act = 0;
    double d234u_measured_permil = 0;
};

/// Forward: the closed-system ratios after age_yr for an initial d234U. Throws
/// std::invalid_argument on a negative or non-finite age or non-finite d234U.
UThRatios uthRatiosForAge(double age_yr, double d234u_initial_permil, UThHalfLifeSet set);

/// Inverse: the age whose closed-system (230Th/238U) matches, given the measured d234U, after
/// removing `detrital_th230_u238_act` of initial 230Th that has decayed with the age:
///   measured = closed-system(T) + detrital x e^(-l230 T).
/// nullopt when no age in [0, kUThSearchLimitYr] matches (ratio beyond the equation's range, or
/// below the detrital share). Throws std::invalid_argument on non-finite input, a negative ratio
/// or detrital share, or d234U <= -1000.
std::optional<double> solveUThAgeYr(double th230_u238_act, double d234u_measured_permil,
                                    UThHalfLifeSet set, double detrital_th230_u238_act = 0);

/// d234U_initial = d234U_m e^(l234 T).
double d234uInitialPermil(double d234u_measured_permil, double age_yr, UThHalfLifeSet set);

/// Detrital (initial) 230Th as a (230Th/238U) activity ratio, from 232Th and 238U concentrations
/// and an assumed initial 230Th/232Th atomic ratio:
///   (230Th/238U)_act = (N232/N238) x r_atomic x l230/l238,
///   N232/N238 = (th232_ppb / M232) / (u238_ppb / M238)
/// (activity = N l; l232 cancels because the 232Th atoms appear on both sides). Throws
/// std::invalid_argument unless the concentrations are finite, th232 >= 0, u238 > 0, r >= 0.
double detritalTh230U238Act(double th232_ppb, double u238_ppb, double th230_th232_atomic,
                            UThHalfLifeSet set);

struct UThSettings {
    UThHalfLifeSet half_lives = UThHalfLifeSet::Cheng2013;
    /// Correct for detrital 230Th when th232_ppb and u238_ppb are given.
    bool detrital_correction = true;
    /// Assumed initial 230Th/232Th atomic ratio: 4.4e-6 +/- 50 % is common practice for corals
    /// (a crustal silicate value at secular equilibrium), not a law.
    double detrital_th230_th232_atomic = 4.4e-6;
    double detrital_ratio_relative_sd = 0.5;
    std::size_t mc_draws = 2000;
};

/// The Monte Carlo summary of one date.
struct UThSpread {
    double mean_age_yr = 0;
    double sd_age_yr = 0;
    double q025_age_yr = 0; ///< 2.5 % quantile of the draws
    double median_age_yr = 0;
    double q975_age_yr = 0;
    double mean_d234u_initial_permil = 0;
    double sd_d234u_initial_permil = 0;
};

struct UThAge {
    std::optional<double> age_yr;               ///< from the central ratios; nullopt: no solution
    std::optional<double> d234u_initial_permil; ///< with age_yr
    double d234u_measured_permil = 0;
    std::optional<UThSpread> spread;            ///< nullopt when fewer than 2 draws solved
    std::size_t draws = 0;
    std::size_t draws_without_solution = 0;
    /// The detrital 230Th removed (central value), when the correction was applied.
    std::optional<double> detrital_th230_u238_act;
};

/// Age, initial d234U and Monte Carlo spread of one measurement. Draws: each ratio from a normal
/// with its sd; with the correction, the detrital share times a normal(1, relative sd) clipped
/// at zero (a negative amount of thorium is not physical); concentrations are held fixed (their
/// error is small beside the 50 % on the assumed ratio). Throws std::invalid_argument on
/// non-finite or negative ratios, sds not > 0, mc_draws < 2, or bad detrital settings.
UThAge computeUThAge(const UThMeasurement& m, const UThSettings& settings, std::uint64_t seed);

} // namespace atollog
