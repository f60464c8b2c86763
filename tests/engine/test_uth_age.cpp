// U-Th closed-system ages against checks.md ("U-series (230Th) ages of corals").
#include "atollog/engine/uth_age.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

TEST_CASE("with d234U = 0 the ratio gives T from the 230Th half-life alone", "[unit][uth]") {
    // (230Th/238U) = 1 - exp(-l230 T) when d234U = 0 (Edwards, Chen & Wasserburg 1987, EPSL
    // 81:175, eq. for the closed system), so ratio 0.5 gives T = the 230Th half-life,
    // 75,584 yr (Cheng et al. 2013, EPSL 371-372:82) [F].
    const auto half = solveUThAgeYr(0.5, 0.0, UThHalfLifeSet::Cheng2013);
    REQUIRE(half);
    CHECK_THAT(*half, WithinAbs(75584.0, 0.01)); // yr
    // Ratio 0.1 -> 11,489.0 yr; 0.9 -> 251,084.6 yr [F: checks.md, from the same equation].
    const auto r01 = solveUThAgeYr(0.1, 0.0, UThHalfLifeSet::Cheng2013);
    const auto r09 = solveUThAgeYr(0.9, 0.0, UThHalfLifeSet::Cheng2013);
    REQUIRE(r01);
    REQUIRE(r09);
    CHECK_THAT(*r01, WithinAbs(11489.0, 0.05));  // yr
    CHECK_THAT(*r09, WithinAbs(251084.6, 0.05)); // yr
}

TEST_CASE("forward and inverse at 10 kyr with seawater d234U", "[unit][uth]") {
    // T = 10,000 yr, d234U_i = 146.8 (Andersen et al. 2010 seawater): d234U_m = 142.715,
    // (230Th/238U) = 0.100307 [F: checks.md, Edwards et al. 1987 equation, Cheng 2013 half-lives].
    const UThRatios r = uthRatiosForAge(10000.0, 146.8, UThHalfLifeSet::Cheng2013);
    CHECK_THAT(r.d234u_measured_permil, WithinAbs(142.715, 0.0005)); // per mil
    CHECK_THAT(r.th230_u238_act, WithinAbs(0.100307, 0.0000005));
    const auto t = solveUThAgeYr(r.th230_u238_act, r.d234u_measured_permil,
                                 UThHalfLifeSet::Cheng2013);
    REQUIRE(t);
    CHECK_THAT(*t, WithinAbs(10000.0, 0.001)); // yr
    CHECK_THAT(d234uInitialPermil(r.d234u_measured_permil, *t, UThHalfLifeSet::Cheng2013),
               WithinAbs(146.8, 1e-6)); // per mil
    CHECK_THAT(d234uPermilFromActivity(1.142715), WithinAbs(142.715, 1e-9));
}

TEST_CASE("Cheng 2000 half-lives give an older age than Cheng 2013", "[unit][uth]") {
    // With d234U = 0 the age is the 230Th half-life at ratio 0.5: 75,690 yr with the Cheng et
    // al. 2000 (Chem. Geol. 169:17) set against 75,584 yr with Cheng et al. 2013 [F].
    const auto t2000 = solveUThAgeYr(0.5, 0.0, UThHalfLifeSet::Cheng2000);
    const auto t2013 = solveUThAgeYr(0.5, 0.0, UThHalfLifeSet::Cheng2013);
    REQUIRE(t2000);
    REQUIRE(t2013);
    CHECK_THAT(*t2000, WithinAbs(75690.0, 0.01));
    CHECK(*t2000 > *t2013);
    // A coral-like measurement (the 10-kyr ratios above) is older with the 2000 set too: the
    // longer 230Th half-life needs more time to grow the same 230Th.
    const auto c2000 = solveUThAgeYr(0.100307, 142.715, UThHalfLifeSet::Cheng2000);
    const auto c2013 = solveUThAgeYr(0.100307, 142.715, UThHalfLifeSet::Cheng2013);
    REQUIRE(c2000);
    REQUIRE(c2013);
    CHECK(*c2000 > *c2013);
}

TEST_CASE("a ratio beyond the equation's range has no solution", "[unit][uth]") {
    // With d234U = 0 the ratio tends to 1 and never exceeds it; with d234U = 50 per mil it tends
    // to 1 + 0.05 l230/(l230 - l234) = 1.0722 [F].
    CHECK_FALSE(solveUThAgeYr(1.05, 0.0, UThHalfLifeSet::Cheng2013));
    CHECK_FALSE(solveUThAgeYr(1.08, 50.0, UThHalfLifeSet::Cheng2013));
    CHECK(solveUThAgeYr(1.05, 50.0, UThHalfLifeSet::Cheng2013));
    // Less 230Th than the detrital share alone.
    CHECK_FALSE(solveUThAgeYr(0.001, 140.0, UThHalfLifeSet::Cheng2013, 0.002));
    CHECK_THROWS_AS(solveUThAgeYr(-0.1, 0.0, UThHalfLifeSet::Cheng2013), std::invalid_argument);
    CHECK_THROWS_AS(solveUThAgeYr(std::numeric_limits<double>::quiet_NaN(), 0.0,
                                  UThHalfLifeSet::Cheng2013),
                    std::invalid_argument);
}

TEST_CASE("detrital correction: share from concentrations, and the age it recovers",
          "[unit][uth]") {
    // 1 ppb 232Th in 1000 ppb 238U, initial 230Th/232Th atomic 4.4e-6 (common practice for
    // corals): (1/232.038)/(1000/238.051) x 4.4e-6 x (4.4683e9 / 75,584) = 2.6686e-4 as a
    // 230Th/238U activity ratio [F: activity = atoms x lambda; 238U half-life Jaffey et al.
    // 1971; atomic masses from memory, M].
    const double share = detritalTh230U238Act(1.0, 1000.0, 4.4e-6, UThHalfLifeSet::Cheng2013);
    CHECK_THAT(share, WithinAbs(2.6686e-4, 0.0001e-4));

    // A coral 10 kyr old with that initial thorium: the measured ratio carries the decayed
    // share, measured = closed(T) + share e^(-l230 T); the correction recovers T.
    const UThRatios r = uthRatiosForAge(10000.0, 146.8, UThHalfLifeSet::Cheng2013);
    const double l230 = uthHalfLives(UThHalfLifeSet::Cheng2013).lambda230_per_yr();
    const double measured = r.th230_u238_act + share * std::exp(-l230 * 10000.0);
    const auto corrected =
        solveUThAgeYr(measured, r.d234u_measured_permil, UThHalfLifeSet::Cheng2013, share);
    const auto uncorrected =
        solveUThAgeYr(measured, r.d234u_measured_permil, UThHalfLifeSet::Cheng2013);
    REQUIRE(corrected);
    REQUIRE(uncorrected);
    CHECK_THAT(*corrected, WithinAbs(10000.0, 0.001)); // yr
    CHECK(*uncorrected > *corrected + 10.0); // detrital 230Th makes a coral look older
}

TEST_CASE("Monte Carlo spread: centred, seeded, and shrinking with the ratios' sds",
          "[unit][uth]") {
    UThMeasurement m;
    m.th230_u238_act = 0.100307;
    m.u234_u238_act = 1.142715;
    m.th230_u238_act_sd = 0.0004;
    m.u234_u238_act_sd = 0.001;
    UThSettings s;
    s.detrital_correction = false;
    const UThAge wide = computeUThAge(m, s, 7);
    REQUIRE(wide.age_yr);
    REQUIRE(wide.spread);
    // The inputs are the 10-kyr ratios rounded to 6-7 digits: 2e-7 in the ratio is 0.02 yr.
    CHECK_THAT(*wide.age_yr, WithinAbs(10000.0, 0.05));
    CHECK(wide.draws == 2000);
    CHECK(wide.draws_without_solution == 0);
    // Near-linear here: dT/dR ~ 1 / (l230 e^{-l230 T}(1 + ...)) ~ 1.0e5 yr per unit ratio, so
    // sd ~ 0.0004 x 1.0e5 ~ 40 yr; the mean within a few standard errors of the central age.
    CHECK(wide.spread->sd_age_yr > 30.0);
    CHECK(wide.spread->sd_age_yr < 50.0);
    CHECK_THAT(wide.spread->mean_age_yr, WithinAbs(10000.0, 4.0)); // 4 yr ~ 4 sd / sqrt(2000)
    CHECK(wide.spread->q025_age_yr < wide.spread->median_age_yr);
    CHECK(wide.spread->median_age_yr < wide.spread->q975_age_yr);

    const UThAge again = computeUThAge(m, s, 7);
    CHECK(again.spread->mean_age_yr == wide.spread->mean_age_yr);
    const UThAge other_seed = computeUThAge(m, s, 8);
    CHECK(other_seed.spread->mean_age_yr != wide.spread->mean_age_yr);

    m.th230_u238_act_sd = 0.0001;
    m.u234_u238_act_sd = 0.00025;
    const UThAge narrow = computeUThAge(m, s, 7);
    REQUIRE(narrow.spread);
    CHECK(narrow.spread->sd_age_yr < 0.4 * wide.spread->sd_age_yr);
    CHECK(narrow.spread->sd_d234u_initial_permil < 0.4 * wide.spread->sd_d234u_initial_permil);

    m.th230_u238_act_sd = 0.0;
    CHECK_THROWS_AS(computeUThAge(m, s, 7), std::invalid_argument);
}

TEST_CASE("the detrital correction widens the spread and lowers the age", "[unit][uth]") {
    UThMeasurement m;
    m.th230_u238_act = 0.02;
    m.u234_u238_act = 1.146;
    m.th230_u238_act_sd = 0.0002;
    m.u234_u238_act_sd = 0.001;
    m.th232_ppb = 2.0;
    m.u238_ppb = 2500.0;
    UThSettings off;
    off.detrital_correction = false;
    UThSettings on;
    const UThAge plain = computeUThAge(m, off, 3);
    const UThAge corrected = computeUThAge(m, on, 3);
    REQUIRE(plain.spread);
    REQUIRE(corrected.spread);
    REQUIRE(corrected.detrital_th230_u238_act);
    CHECK_FALSE(plain.detrital_th230_u238_act);
    CHECK(*corrected.age_yr < *plain.age_yr);
    CHECK(corrected.spread->sd_age_yr > plain.spread->sd_age_yr);
}
