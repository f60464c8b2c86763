// Radiocarbon: conventional ages (checks.md "Radiocarbon") and calibration on synthetic curves
// whose answers are known analytically.
#include "atollog/engine/radiocarbon.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <stdexcept>
#include <vector>

using namespace atollog;
using Catch::WithinAbs;

namespace {

CalibrationPoint point(double cal_bp, double c14_bp, double sd) {
    CalibrationPoint p;
    p.cal_bp = cal_bp;
    p.c14_bp = c14_bp;
    p.sd = sd;
    return p;
}

/// Straight line c14 = slope x cal + offset, every 50 cal yr over [0, 20,000].
std::vector<CalibrationPoint> line(double slope, double offset, double sd) {
    std::vector<CalibrationPoint> c;
    for (int t = 0; t <= 20000; t += 50) c.push_back(point(t, slope * t + offset, sd));
    return c;
}

constexpr double kYrPerMa = 1e6;

} // namespace

TEST_CASE("conventional radiocarbon age from F14C", "[unit][c14]") {
    // CRA = -8033 ln(F14C) (Stuiver & Polach 1977, Radiocarbon 19:355): F14C 0.5 -> 5568.05 yr,
    // 0.25 -> 11,136.1 yr [F: checks.md].
    CHECK_THAT(conventionalAge(0.5, 0.001).cra_yr, WithinAbs(5568.05, 0.005));
    CHECK_THAT(conventionalAge(0.25, 0.001).cra_yr, WithinAbs(11136.1, 0.05));
    // sd by first-order propagation: 8033 x 0.002 / 0.5 = 32.132 yr [F].
    CHECK_THAT(conventionalAge(0.5, 0.002).cra_sd_yr, WithinAbs(32.132, 1e-9));
    CHECK_THROWS_AS(conventionalAge(0.0, 0.001), std::invalid_argument);
    CHECK_THROWS_AS(conventionalAge(0.5, 0.0), std::invalid_argument);
}

TEST_CASE("Delta-R is subtracted, its sd added in quadrature", "[unit][c14]") {
    // Local offset from the marine curve (Stuiver, Pearson & Braziunas 1986, Radiocarbon 28:980):
    // 5000 +/- 30 with Delta-R 100 +/- 40 -> 4900 +/- 50 [F].
    const RadiocarbonAge a = applyDeltaR({5000.0, 30.0}, 100.0, 40.0);
    CHECK_THAT(a.cra_yr, WithinAbs(4900.0, 1e-9));
    CHECK_THAT(a.cra_sd_yr, WithinAbs(50.0, 1e-9));
    C14Measurement m;
    m.f14c = 0.5;
    m.f14c_sd = 0.002;
    m.delta_r_yr = -50.0;
    m.delta_r_sd_yr = 0.0;
    CHECK_THAT(radiocarbonAgeOf(m).cra_yr, WithinAbs(5568.05 + 50.0, 0.005));
}

TEST_CASE("calibration on the identity line gives back a normal in calendar years",
          "[unit][c14]") {
    // c14 = cal with sd 0: p(t) ~ exp(-(CRA - t)^2 / 2 s^2), a normal with mean CRA and sd s
    // (analytic); its 95.4 % range is mean -/+ 2.0 s (z(0.977) = 1.995), 68.3 % -/+ 1.0 s.
    const RadiocarbonAge cra{5000.0, 30.0};
    const CalibratedAge cal = calibrate(cra, line(1.0, 0.0, 0.0));
    CHECK(cal.grid_step_yr == 1.0);
    CHECK_FALSE(cal.at_curve_edge);
    CHECK_THAT(cal.age.mean_ma() * kYrPerMa, WithinAbs(5000.0, 0.01)); // yr
    // The 1-yr bins add 1/12 yr^2 to the variance: negligible beside 900.
    CHECK_THAT(cal.age.sd_ma() * kYrPerMa, WithinAbs(30.0, 0.01));
    REQUIRE(cal.hpd_95.size() == 1);
    REQUIRE(cal.hpd_68.size() == 1);
    // Whole 1-yr bins: the range may overshoot by about a year on each side.
    CHECK_THAT(cal.hpd_95[0].young_ma * kYrPerMa, WithinAbs(5000.0 - 1.995 * 30.0, 1.5));
    CHECK_THAT(cal.hpd_95[0].old_ma * kYrPerMa, WithinAbs(5000.0 + 1.995 * 30.0, 1.5));
    CHECK_THAT(cal.hpd_68[0].young_ma * kYrPerMa, WithinAbs(5000.0 - 1.0 * 30.0, 1.5));
    CHECK_THAT(cal.hpd_68[0].old_ma * kYrPerMa, WithinAbs(5000.0 + 1.0 * 30.0, 1.5));
    CHECK(cal.hpd_95[0].probability >= 0.954);
    CHECK(cal.hpd_95[0].probability < 0.96);
    // The common-practice shorthand: 95 % ~ mean -/+ 1.96 sd.
    CHECK_THAT(cal.age.quantile(0.975) * kYrPerMa, WithinAbs(5000.0 + 1.96 * 30.0, 0.5));
}

TEST_CASE("calibration on a line of slope 0.5 stretches the calendar spread", "[unit][c14]") {
    // c14 = 0.5 cal + 100, curve sd 0: p(t) ~ exp(-(CRA - 100 - 0.5 t)^2 / 2 s^2), a normal with
    // mean (CRA - 100) / 0.5 and sd s / 0.5 (analytic).
    const RadiocarbonAge cra{3100.0, 25.0};
    const CalibratedAge cal = calibrate(cra, line(0.5, 100.0, 0.0));
    CHECK_THAT(cal.age.mean_ma() * kYrPerMa, WithinAbs(6000.0, 0.01));
    CHECK_THAT(cal.age.sd_ma() * kYrPerMa, WithinAbs(50.0, 0.01));

    // A curve sd adds in quadrature: s^2 + sigma^2 = 25^2 + 20^2 -> sd sqrt(1025) / 0.5.
    const CalibratedAge wider = calibrate(cra, line(0.5, 100.0, 20.0));
    CHECK_THAT(wider.age.sd_ma() * kYrPerMa, WithinAbs(std::sqrt(1025.0) / 0.5, 0.02));
}

TEST_CASE("a plateau and a wiggle in the curve widen and split the ranges", "[unit][c14]") {
    const RadiocarbonAge cra{1000.0, 10.0};
    const CalibratedAge plain = calibrate(cra, line(1.0, 0.0, 0.0));

    // Plateau: c14 stays at 1000 from 1000 to 1400 cal BP. The whole plateau is as likely as
    // its start, so the 95.4 % range spans it: at least 400 yr wide against ~40 yr.
    const std::vector<CalibrationPoint> plateau{point(0, 0, 0), point(1000, 1000, 0),
                                                point(1400, 1000, 0), point(3000, 2600, 0)};
    const CalibratedAge flat = calibrate(cra, plateau);
    REQUIRE(flat.hpd_95.size() == 1);
    const double plain_width = plain.hpd_95[0].old_ma - plain.hpd_95[0].young_ma;
    const double flat_width = flat.hpd_95[0].old_ma - flat.hpd_95[0].young_ma;
    CHECK(flat_width * kYrPerMa > 400.0);
    CHECK(flat_width > 5 * plain_width);

    // Wiggle: the curve rises to 1000 at 1000 cal BP, falls to 900 at 1100, rises through 1000
    // again at 1200. Two calendar solutions, 200 yr apart, with nothing between them (at
    // 1100 cal BP the curve is 10 sd away): two disjoint ranges at both levels.
    const std::vector<CalibrationPoint> wiggle{point(0, 0, 0), point(1000, 1000, 0),
                                               point(1100, 900, 0), point(1300, 1100, 0),
                                               point(3000, 2800, 0)};
    const CalibratedAge two = calibrate(cra, wiggle);
    REQUIRE(two.hpd_95.size() == 2);
    REQUIRE(two.hpd_68.size() == 2);
    CHECK(two.hpd_95[0].young_ma * kYrPerMa < 1000.0);
    CHECK(two.hpd_95[0].old_ma * kYrPerMa > 1000.0);
    CHECK(two.hpd_95[1].young_ma * kYrPerMa < 1200.0);
    CHECK(two.hpd_95[1].old_ma * kYrPerMa > 1200.0);
    CHECK(two.hpd_95[0].old_ma * kYrPerMa < 1100.0);
    // The two solutions hold equal mass (each spans 20 cal yr of the +/-10 c14-yr band).
    CHECK_THAT(two.hpd_95[0].probability, WithinAbs(two.hpd_95[1].probability, 0.02));
}

TEST_CASE("calibration flags a date off the curve and rejects bad curves", "[unit][c14]") {
    const CalibratedAge off = calibrate({30000.0, 50.0}, line(1.0, 0.0, 0.0));
    CHECK(off.at_curve_edge);
    CHECK_THROWS_AS(calibrate({1000.0, 10.0}, {point(0, 0, 0)}), std::invalid_argument);
    CHECK_THROWS_AS(calibrate({1000.0, 10.0}, {point(0, 0, 0), point(0, 10, 0)}),
                    std::invalid_argument);
    CHECK_THROWS_AS(calibrate({1000.0, 0.0}, line(1.0, 0.0, 0.0)), std::invalid_argument);
    CHECK_THROWS_AS(calibrate({1000.0, 10.0}, {point(0, 0, -1), point(10, 10, 0)}),
                    std::invalid_argument);
}
