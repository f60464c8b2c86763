#pragma once
// Radiocarbon: conventional age from F14C, the local reservoir offset, and calibration against
// a curve the user supplies.
//
// Conventional radiocarbon age CRA = -8033 ln(F14C) yr BP, 8033 = 5568 / ln 2 the Libby mean
// life (Stuiver & Polach 1977, Radiocarbon 19:355); its sd by first-order propagation,
// 8033 x sd(F14C) / F14C.
//
// Marine samples: the global marine reservoir age R(t) is part of a marine calibration curve,
// so a coral date is calibrated against a marine curve the user supplies (curve.csv), and only
// the local offset Delta-R from that curve is handled here: subtracted from the CRA, its sd
// added in quadrature (Stuiver, Pearson & Braziunas 1986, Radiocarbon 28:980; Reimer & Reimer
// 2017). Applying a Delta-R to a date calibrated on an atmospheric curve would be a user error
// the engine cannot see.
#include "atollog/engine/age_distribution.hpp"
#include "atollog/engine/core_records.hpp"
#include "atollog/engine/hpd_intervals.hpp"

#include <vector>

namespace atollog {

/// 5568 / ln 2, rounded as in Stuiver & Polach 1977.
constexpr double kLibbyMeanLifeYr = 8033.0;

struct RadiocarbonAge {
    double cra_yr = 0;    ///< conventional radiocarbon age, yr BP
    double cra_sd_yr = 0;
};

/// CRA and its sd. Throws std::invalid_argument unless 0 < f14c and f14c_sd > 0, both finite.
RadiocarbonAge conventionalAge(double f14c, double f14c_sd);

/// The CRA less Delta-R, sds in quadrature. Throws std::invalid_argument on non-finite values
/// or a negative sd.
RadiocarbonAge applyDeltaR(const RadiocarbonAge& cra, double delta_r_yr, double delta_r_sd_yr);

/// CRA (with Delta-R when given) of a measurement.
RadiocarbonAge radiocarbonAgeOf(const C14Measurement& m);

struct CalibratedAge {
    AgeDistribution age;             ///< gridded, in Ma
    std::vector<AgeInterval> hpd_68; ///< 68.3 % highest-density ranges, in Ma, youngest first
    std::vector<AgeInterval> hpd_95; ///< 95.4 %
    double grid_step_yr = 0;         ///< spacing of the calendar grid used
    /// The density at the young or old end of the curve is above 1 % of its peak: the curve
    /// does not cover the date and the distribution is cut there.
    bool at_curve_edge = false;
};

/// Largest number of calendar grid points of one calibration; a curve spanning more than this
/// many years is gridded more coarsely (span / limit) to keep a calibration cheap.
constexpr double kMaxCalibrationGridPoints = 100000;

/// Calibration on the curve's calendar axis. The curve (any order; sorted here by cal_bp) is
/// interpolated linearly, mean and sd alike, to a 1-yr grid from its youngest to its oldest
/// point (coarser only above kMaxCalibrationGridPoints), and at each calendar age t
///   p(t) ~ exp(-(CRA - mu(t))^2 / (2 (s^2 + sigma(t)^2))) / sqrt(s^2 + sigma(t)^2),
/// normalised. Computed in logs relative to the peak, so a date far off the curve still gives
/// a distribution (piled at the nearest end, at_curve_edge). Throws std::invalid_argument on
/// fewer than two curve points, non-finite values, negative curve sds, two points at one
/// calendar age, or a CRA sd not > 0 while every curve sd is 0 somewhere it matters (s = 0 and
/// sigma(t) = 0 leave the likelihood undefined).
CalibratedAge calibrate(const RadiocarbonAge& cra, const std::vector<CalibrationPoint>& curve);

} // namespace atollog
