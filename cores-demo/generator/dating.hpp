#pragma once
// Numerical dates forward-computed from true ages, with laboratory-like noise:
// U-Th activity ratios on corals, radiocarbon F14C on Holocene material, Ar-Ar on the basalt.
#include "rng.hpp"

#include "atollog/engine/core_records.hpp"

#include <vector>

namespace atollog::demo {

// Half-lives of Cheng et al. 2013 (EPSL 371-372:82), in years.
constexpr double kTh230HalfLifeYr = 75584.0;
constexpr double kU234HalfLifeYr = 245620.0;
/// Modern seawater d234U, per mil (Andersen et al. 2010): the initial value of a pristine coral.
constexpr double kSeawaterDelta234UPermil = 146.8;

struct UThRatios {
    double th230_u238_act = 0;
    double u234_u238_act = 0;
};

/// Closed-system ratios after age_yr (Edwards, Chen & Wasserburg 1987):
/// 230Th/238U = 1 - e^(-l230 T) + (d234U_m/1000) l230/(l230-l234) (1 - e^(-(l230-l234) T)),
/// with d234U_m = d234U_i e^(-l234 T).
UThRatios closedSystemUTh(double age_yr, double initial_d234u_permil);

/// A measured U-Th date: ratios with noise at typical mass-spectrometer precision.
NumericalDate uthDate(const Sample& sample, double age_ma, double initial_d234u_permil,
                      DemoRng& rng);

/// The synthetic straight-line "calibration" of the demo: conventional radiocarbon age for a
/// calendar age. Invented; no real calibration curve is this simple.
double syntheticC14AgeBp(double cal_bp);
double syntheticC14SdYr(double cal_bp);
/// curve.csv: the synthetic line every 100 cal yr from 0 to 12,000 cal BP.
std::vector<CalibrationPoint> syntheticCalibrationCurve();

/// F14C = exp(-CRA / 8033) (Stuiver & Polach 1977), with noise.
NumericalDate c14Date(const Sample& sample, double age_ma, DemoRng& rng);

/// An Ar-Ar plateau age on basalt, sd 2 % of the age (at least 10 kyr).
NumericalDate arArDate(const Sample& sample, double age_ma, DemoRng& rng);

} // namespace atollog::demo
