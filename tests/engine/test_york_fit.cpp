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

TEST_CASE("a York fit that swings about its slope is solved at York's fixed point",
          "[york]") {
    // Ten points with strongly correlated errors of either sign (invented for this check): the
    // plain iteration of York et al. 2004 (section III, steps 3-6) swings about the slope for
    // good here. The answer must still satisfy their eq. 13a, b = sum W beta V / sum W beta U,
    // with W (eq. 13b) and beta (eq. 13c) recomputed here from the published equations.
    const std::vector<double> x = {1.8160511033534292,  0.42087754803111221, 0.90490646318032997,
                                   1.2628837039493408,  1.5042038877247537,  0.37104654377435625,
                                   0.04063438807765931, 0.48437505547222326, 0.28590945881258562,
                                   1.0636456855920604};
    const std::vector<double> x_sd = {0.20158024667806759, 0.15596353378383312,
                                      0.17939956709900612, 0.15446519807361087,
                                      0.041558792826586442, 0.26090103668702974,
                                      0.19208600027885256, 0.16445818768838469,
                                      0.18519478064488309, 0.088250016997462169};
    const std::vector<double> y = {2.6489850416107528,  36.175149912387475, -31.376545675272109,
                                   7.6494625506677822,  16.035562738805076, 7.9512617936607501,
                                   -0.070493687295798191, -0.75611355296981508,
                                   15.27973904476921,   37.363143648482591};
    const std::vector<double> y_sd = {20.600753140413541, 37.520082120915013, 2.9234667144609765,
                                      3.3637807526018255, 4.385066163280297,  36.64875542782454,
                                      17.930130529747093, 19.619220224798244, 18.125706177705137,
                                      11.399237424552828};
    const std::vector<double> r = {-0.5760990616364845,  -0.45106235143603113, 0.41711226948739527,
                                   -0.17833238130063991, -0.86406976885162778, 0.89370850656668366,
                                   0.4744238437113692,   -0.099944072310716309,
                                   -0.045514517262208433, 0.3654062078979482};
    const YorkFit fit = yorkFit(x, x_sd, y, y_sd, r);
    const double b = fit.slope;
    double sw = 0, swx = 0, swy = 0;
    std::vector<double> W(x.size());
    for (std::size_t i = 0; i < x.size(); ++i) {
        const double wx = 1 / (x_sd[i] * x_sd[i]), wy = 1 / (y_sd[i] * y_sd[i]);
        W[i] = wx * wy / (wx + b * b * wy - 2 * b * r[i] * std::sqrt(wx * wy));
        sw += W[i];
        swx += W[i] * x[i];
        swy += W[i] * y[i];
    }
    double num = 0, den = 0;
    for (std::size_t i = 0; i < x.size(); ++i) {
        const double wx = 1 / (x_sd[i] * x_sd[i]), wy = 1 / (y_sd[i] * y_sd[i]);
        const double U = x[i] - swx / sw, V = y[i] - swy / sw;
        const double beta = W[i] * (U / wy + b * V / wx - (b * U + V) * r[i] / std::sqrt(wx * wy));
        num += W[i] * beta * V;
        den += W[i] * beta * U;
    }
    CHECK(std::isfinite(b));
    CHECK(num / den == Approx(b).epsilon(1e-9));
    CHECK(fit.intercept == Approx(swy / sw - b * swx / sw).epsilon(1e-9).margin(1e-9));
}
