// Range-extension confidence interval on a range end, from the number of fossil horizons.
// Source: Strauss & Sadler 1989 (Math. Geol. 21:411), as applied by Marshall 1990
// (Paleobiology 16:1, eq. 1): alpha = (1 - C)^(-1/(H-1)) - 1, a fraction of the observed range.
// Expected values below are [F]: worked by hand from that equation.
#include "atollog/engine/range_extension.hpp"

#include <catch2/catch.hpp>

#include <stdexcept>

using atollog::rangeExtensionFraction;
using Catch::WithinAbs;

TEST_CASE("range extension fraction from the equation", "[unit][biostrat][extension]") {
    // H = 10, C = 0.95: 0.05^(-1/9) - 1 = 20^(1/9) - 1 = 0.394951 [F]
    CHECK_THAT(*rangeExtensionFraction(10, 0.95), WithinAbs(0.394951, 1e-6));
    // H = 10, C = 0.50: 2^(1/9) - 1 = 0.080060 [F]
    CHECK_THAT(*rangeExtensionFraction(10, 0.50), WithinAbs(0.080060, 1e-6));
    // H = 2, C = 0.95: 0.05^-1 - 1 = 19 [F]: two horizons say almost nothing.
    CHECK_THAT(*rangeExtensionFraction(2, 0.95), WithinAbs(19.0, 1e-9));
    // More horizons, narrower interval (the point of the method).
    CHECK(*rangeExtensionFraction(30, 0.95) < *rangeExtensionFraction(10, 0.95));
    CHECK(*rangeExtensionFraction(10, 0.99) > *rangeExtensionFraction(10, 0.95));
}

TEST_CASE("range extension is undefined below two horizons", "[unit][biostrat][extension]") {
    CHECK_FALSE(rangeExtensionFraction(1, 0.95).has_value());
    CHECK_FALSE(rangeExtensionFraction(0, 0.95).has_value());
}

TEST_CASE("range extension rejects bad input", "[unit][biostrat][extension]") {
    CHECK_THROWS_AS(rangeExtensionFraction(10, 1.0), std::invalid_argument);
    CHECK_THROWS_AS(rangeExtensionFraction(10, 0.0), std::invalid_argument);
    CHECK_THROWS_AS(rangeExtensionFraction(10, -0.5), std::invalid_argument);
    CHECK_THROWS_AS(rangeExtensionFraction(-1, 0.95), std::invalid_argument);
    CHECK_THROWS_WITH(rangeExtensionFraction(10, 1.5), Catch::Contains("1.5") &&
                                                           Catch::Contains("between 0 and 1"));
}
