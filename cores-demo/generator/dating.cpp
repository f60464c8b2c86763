#include "dating.hpp"

#include "rounding.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::demo {
namespace {

constexpr double kLn2 = 0.69314718055994530942;
constexpr double kLibbyMeanLifeYr = 8033.0;

NumericalDate dateOf(const Sample& sample, DateMethod method) {
    NumericalDate d;
    d.hole = sample.hole;
    d.sample = sample.sample;
    d.method = method;
    return d;
}

} // namespace

UThRatios closedSystemUTh(double age_yr, double initial_d234u_permil) {
    const double l230 = kLn2 / kTh230HalfLifeYr;
    const double l234 = kLn2 / kU234HalfLifeYr;
    const double d234u_measured = initial_d234u_permil * std::exp(-l234 * age_yr);
    UThRatios r;
    r.th230_u238_act = 1.0 - std::exp(-l230 * age_yr) +
                       (d234u_measured / 1000.0) * l230 / (l230 - l234) *
                           (1.0 - std::exp(-(l230 - l234) * age_yr));
    r.u234_u238_act = 1.0 + d234u_measured / 1000.0;
    return r;
}

NumericalDate uthDate(const Sample& sample, double age_ma, double initial_d234u_permil,
                      DemoRng& rng) {
    const UThRatios truth = closedSystemUTh(age_ma * 1e6, initial_d234u_permil);
    // Typical precision: 0.2-0.4 % on 230Th/238U (at least 0.0004), about 1 per mil on 234U/238U.
    const double th_sd = roundDp(
        std::max(0.0004, truth.th230_u238_act * rng.uniform(0.002, 0.004)), 5);
    const double u_sd = roundDp(rng.uniform(0.0008, 0.0014), 5);
    UThMeasurement m;
    m.th230_u238_act = roundDp(rng.normal(truth.th230_u238_act, th_sd), 5);
    m.th230_u238_act_sd = th_sd;
    m.u234_u238_act = roundDp(rng.normal(truth.u234_u238_act, u_sd), 5);
    m.u234_u238_act_sd = u_sd;
    // Clean coral aragonite: about 3 ppm U and little detrital thorium.
    m.u238_ppb = roundDp(rng.uniform(2400, 3600), 0);
    m.th232_ppb = roundDp(rng.uniform(0.05, 0.8), 2);
    NumericalDate d = dateOf(sample, DateMethod::UTh);
    d.uth = m;
    return d;
}

double syntheticC14AgeBp(double cal_bp) { return 410.0 + 0.93 * cal_bp; }
double syntheticC14SdYr(double cal_bp) { return roundDp(15.0 + 0.0015 * cal_bp, 0); }

std::vector<CalibrationPoint> syntheticCalibrationCurve() {
    std::vector<CalibrationPoint> curve;
    for (int cal_bp = 0; cal_bp <= 12000; cal_bp += 100) {
        CalibrationPoint p;
        p.cal_bp = cal_bp;
        p.c14_bp = roundDp(syntheticC14AgeBp(cal_bp), 1);
        p.sd = syntheticC14SdYr(cal_bp);
        curve.push_back(p);
    }
    return curve;
}

NumericalDate c14Date(const Sample& sample, double age_ma, DemoRng& rng) {
    const double f14c = std::exp(-syntheticC14AgeBp(age_ma * 1e6) / kLibbyMeanLifeYr);
    const double sd = roundDp(f14c * rng.uniform(0.002, 0.0035), 5);
    C14Measurement m;
    m.f14c = roundDp(rng.normal(f14c, sd), 5);
    m.f14c_sd = sd;
    NumericalDate d = dateOf(sample, DateMethod::C14);
    d.c14 = m;
    return d;
}

NumericalDate arArDate(const Sample& sample, double age_ma, DemoRng& rng) {
    const double sd = roundDp(std::max(0.010, 0.02 * age_ma), 3);
    NumericalDate d = dateOf(sample, DateMethod::ArAr);
    d.age_ma = roundDp(rng.normal(age_ma, sd), 3);
    d.age_sd_ma = sd;
    return d;
}

} // namespace atollog::demo
