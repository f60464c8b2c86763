#pragma once
// Straight line y = a + b x with errors in both variables: the iterative solution of York,
// Evensen, Martinez & De Basabe Delgado (2004, Am. J. Phys. 72:367, section III), which allows
// the x and y errors of each point to be correlated (r_i). The standard errors of slope and
// intercept are the method's own (York et al. 2004 eqs. 13a-b), NOT scaled by sqrt(MSWD): a
// caller who wants the scatter-inflated figure multiplies by sqrt(mswd) when mswd > 1.
#include <span>

namespace atollog {

struct YorkFit {
    double intercept = 0;
    double intercept_sd = 0;
    double slope = 0;
    double slope_sd = 0;
    double chi_square = 0;       ///< sum of W_i (y_i - b x_i - a)^2
    int degrees_of_freedom = 0;  ///< n - 2
    double mswd = 0;             ///< chi_square / (n - 2)
    int iterations = 0;
};

/// Fits the line. x_sd, y_sd: one standard deviation of each point (> 0, finite); r: the
/// correlation of each point's x and y errors in (-1, 1), empty for uncorrelated errors. Needs at
/// least 3 points (so that MSWD has a degree of freedom) and x not all equal. Throws
/// std::invalid_argument on bad input; std::runtime_error if the slope does not converge within
/// 1000 iterations (change below 1e-14 x max(1, |slope|)). Values and sds so far apart in size
/// that the sums overflow a double are refused with std::invalid_argument naming the sds.
YorkFit yorkFit(std::span<const double> x, std::span<const double> x_sd,
                std::span<const double> y, std::span<const double> y_sd,
                std::span<const double> r = {});

} // namespace atollog
