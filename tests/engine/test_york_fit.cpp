// Straight lines: York et al. 2004 (Am. J. Phys. 72:367) and ordinary least squares, checked
// against checks.md "Straight lines with errors in both variables".
#include "atollog/engine/least_squares_line.hpp"
#include "atollog/engine/york_fit.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <stdexcept>
#include <vector>

using namespace atollog;
using Catch::WithinAbs;

namespace {

// Pearson's (1901) data with York's (1966) weights, as tabulated in York et al. 2004.
const std::vector<double> kX = {0.0, 0.9, 1.8, 2.6, 3.3, 4.4, 5.2, 6.1, 6.5, 7.4};
const std::vector<double> kWx = {1000, 1000, 500, 800, 200, 80, 60, 20, 1.8, 1};
const std::vector<double> kY = {5.9, 5.4, 4.4, 4.6, 3.5, 3.7, 2.8, 2.8, 2.4, 1.5};
const std::vector<double> kWy = {1, 1.8, 4, 8, 20, 20, 70, 70, 100, 500};

std::vector<double> sdsFromWeights(const std::vector<double>& w) {
    std::vector<double> sd;
    for (double v : w)
        sd.push_back(1.0 / std::sqrt(v));
    return sd;
}

} // namespace

TEST_CASE("York fit of Pearson's data with York's weights", "[york]") {
    // York et al. 2004, Am. J. Phys. 72:367 [P]: intercept 5.47991 +/- 0.29497, slope
    // -0.48053 +/- 0.05799 (unscaled), chi-square 11.87 on 8 degrees of freedom.
    const YorkFit f = yorkFit(kX, sdsFromWeights(kWx), kY, sdsFromWeights(kWy));
    CHECK_THAT(f.intercept, WithinAbs(5.47991, 0.000005));
    CHECK_THAT(f.intercept_sd, WithinAbs(0.29497, 0.000005));
    CHECK_THAT(f.slope, WithinAbs(-0.48053, 0.000005));
    CHECK_THAT(f.slope_sd, WithinAbs(0.05799, 0.000005));
    CHECK_THAT(f.chi_square, WithinAbs(11.87, 0.005));
    CHECK(f.degrees_of_freedom == 8);
    CHECK_THAT(f.mswd, WithinAbs(11.87 / 8, 0.001));
}

TEST_CASE("OLS of Pearson's data ignores the weights", "[york]") {
    // checks.md [F]: unweighted least squares gives 5.7612 and -0.5396, a guard against a York
    // fit that ignores its weights.
    const LeastSquaresLine l = leastSquaresLine(kX, kY);
    CHECK_THAT(l.intercept, WithinAbs(5.7612, 0.00005));
    CHECK_THAT(l.slope, WithinAbs(-0.5396, 0.00005));
}

TEST_CASE("OLS on Anscombe's set I", "[york]") {
    // Anscombe 1973, Am. Stat. 27:17 [P]: y = 3.000 + 0.500 x, r = 0.816.
    const std::vector<double> x = {10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5};
    const std::vector<double> y = {8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68};
    const LeastSquaresLine l = leastSquaresLine(x, y);
    CHECK_THAT(l.intercept, WithinAbs(3.000, 0.0005));
    CHECK_THAT(l.slope, WithinAbs(0.500, 0.0005));
    CHECK_THAT(l.r, WithinAbs(0.816, 0.0005));
    CHECK(l.n == 11);
}

TEST_CASE("York fit properties", "[york]") {
    const std::vector<double> x = {1, 2, 3, 4, 5, 6};
    const std::vector<double> y = {2.1, 3.9, 6.2, 7.8, 10.1, 12.2};
    const std::vector<double> sx = {0.1, 0.2, 0.1, 0.3, 0.2, 0.1};
    const std::vector<double> sy = {0.2, 0.1, 0.3, 0.2, 0.2, 0.4};
    SECTION("swapping the axes gives the reciprocal slope (the fit treats x and y alike)") {
        const YorkFit xy = yorkFit(x, sx, y, sy);
        const YorkFit yx = yorkFit(y, sy, x, sx);
        CHECK_THAT(xy.slope * yx.slope, WithinAbs(1.0, 1e-10));
        CHECK_THAT(xy.chi_square, WithinAbs(yx.chi_square, 1e-9));
    }
    SECTION("with negligible x errors and equal y errors it is OLS") {
        const std::vector<double> tiny(6, 1e-9), one(6, 1.0);
        const YorkFit f = yorkFit(x, tiny, y, one);
        const LeastSquaresLine l = leastSquaresLine(x, y);
        CHECK_THAT(f.slope, WithinAbs(l.slope, 1e-9));
        CHECK_THAT(f.intercept, WithinAbs(l.intercept, 1e-9));
    }
    SECTION("correlated errors change the answer, and r = 0 is the uncorrelated fit") {
        const std::vector<double> r0(6, 0.0), r8(6, 0.8);
        const YorkFit plain = yorkFit(x, sx, y, sy);
        CHECK(yorkFit(x, sx, y, sy, r0).slope == plain.slope);
        CHECK(std::abs(yorkFit(x, sx, y, sy, r8).slope - plain.slope) > 1e-4);
    }
    SECTION("points exactly on a line give that line and chi-square 0") {
        const std::vector<double> yl = {3, 5, 7, 9, 11, 13};
        const YorkFit f = yorkFit(x, sx, yl, sy);
        CHECK_THAT(f.slope, WithinAbs(2.0, 1e-12));
        CHECK_THAT(f.intercept, WithinAbs(1.0, 1e-12));
        CHECK_THAT(f.chi_square, WithinAbs(0.0, 1e-20));
    }
}

TEST_CASE("straight lines reject bad input", "[york]") {
    const std::vector<double> x2 = {1, 2}, s2 = {1, 1};
    CHECK_THROWS_WITH(yorkFit(x2, s2, x2, s2), Catch::Contains("at least 3 points"));
    CHECK_THROWS_WITH(leastSquaresLine(x2, x2), Catch::Contains("at least 3 points"));
    const std::vector<double> x = {1, 2, 3}, s = {1, 1, 1}, s0 = {1, 0, 1}, sn = {1, 1, -2};
    CHECK_THROWS_WITH(yorkFit(x, s0, x, s), Catch::Contains("x_sd of point 2 must be > 0"));
    CHECK_THROWS_WITH(yorkFit(x, s, x, sn), Catch::Contains("y_sd of point 3 must be > 0"));
    const std::vector<double> same = {4, 4, 4};
    CHECK_THROWS_WITH(yorkFit(same, s, x, s), Catch::Contains("all x values are equal"));
    CHECK_THROWS_WITH(leastSquaresLine(same, x), Catch::Contains("all x values are equal"));
    const std::vector<double> r1 = {0, 1, 0};
    CHECK_THROWS_WITH(yorkFit(x, s, x, s, r1), Catch::Contains("must lie in (-1, 1)"));
    const std::vector<double> short_sd = {1, 1};
    CHECK_THROWS_AS(yorkFit(x, short_sd, x, s), std::invalid_argument);
}
