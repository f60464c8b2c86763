#pragma once
// Ordinary least squares line y = a + b x (errors in y only, all equal): the textbook fit, kept
// beside the York fit as a check that needs no error estimates.
#include <span>

namespace atollog {

struct LeastSquaresLine {
    double intercept = 0;
    double intercept_sd = 0; ///< from the residual scatter, s^2 = SSR / (n - 2)
    double slope = 0;
    double slope_sd = 0;
    double r = 0;            ///< Pearson correlation coefficient of x and y
    int n = 0;
};

/// Needs at least 3 finite points and x not all equal; throws std::invalid_argument otherwise.
/// r is 0 when y is constant (the correlation is then undefined; the line is flat).
LeastSquaresLine leastSquaresLine(std::span<const double> x, std::span<const double> y);

} // namespace atollog
