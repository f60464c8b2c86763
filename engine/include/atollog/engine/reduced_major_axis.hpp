#pragma once
// Reduced major axis (RMA; also "geometric mean regression" or "standardised major axis"): the
// line y = a + b x with b = sign(r) s_y / s_x and a = mean(y) - b mean(x). It treats x and y
// alike (fitting x on y gives the same line), which is why it suits two sections neither of
// which is the better measured one, when the per-point errors are not trusted enough for a
// York fit. See Smith (2009, Am. J. Phys. Anthropol. 140:476, "Use and misuse of the reduced
// major axis for line-fitting") and Sokal & Rohlf (Biometry, section on model II regression).
//
// Standard errors are the large-sample ones of Kermack & Haldane (1950, Biometrika 37:30), in
// the form Davis (2002, Statistics and Data Analysis in Geology, 3rd ed., section 6) gives for
// geologists, after Miller & Kahn (1962) [M: from memory, checked in the tests against a Monte
// Carlo spread, not against a printed table]:
//   slope_sd     = |b| sqrt((1 - r^2) / n)
//   intercept_sd = s_y sqrt(((1 - |r|) / n) (2 + (mean(x) / s_x)^2 (1 + |r|)))
// (|r| in the intercept so that a falling line gets the same figure as its mirror image).
#include <span>

namespace atollog {

struct ReducedMajorAxis {
    double intercept = 0;
    double intercept_sd = 0;
    double slope = 0;
    double slope_sd = 0;
    double r = 0; ///< Pearson correlation of x and y
    int n = 0;
};

/// Needs at least 3 finite points and x not all equal. y all equal gives the flat line (slope 0,
/// both sds 0: s_y = 0). r = 0 with y not all equal leaves the sign of the slope undefined and
/// throws, like every other refusal, std::invalid_argument naming the problem.
ReducedMajorAxis reducedMajorAxis(std::span<const double> x, std::span<const double> y);

} // namespace atollog
