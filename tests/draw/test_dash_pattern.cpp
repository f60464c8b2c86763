#include "draw/dash_pattern.hpp"

#include <catch2/catch.hpp>

#include <cmath>

using namespace atollog::draw;
using Catch::Matchers::WithinAbs;

namespace {
double length_mm(const std::vector<PointMm> &pts) {
    double sum = 0;
    for (std::size_t i = 1; i < pts.size(); ++i) {
        sum += std::hypot(pts[i].x_mm - pts[i - 1].x_mm, pts[i].y_mm - pts[i - 1].y_mm);
    }
    return sum;
}
} // namespace

TEST_CASE("Dashes of a straight line", "[draw][geometry]") {
    // 10 mm at 1.2 on / 0.8 off: five whole periods, so five dashes of 1.2 mm.
    const auto dashes = splitIntoDashes({{0, 0}, {10, 0}}, {1.2, 0.8});
    REQUIRE(dashes.size() == 5);
    for (const auto &d : dashes) {
        CHECK_THAT(length_mm(d), WithinAbs(1.2, 1e-9));
    }
    CHECK_THAT(dashes[1].front().x_mm, WithinAbs(2.0, 1e-9)); // one period after the first
    CHECK_THAT(dashes[4].back().x_mm, WithinAbs(9.2, 1e-9));
}

TEST_CASE("Dashes run on around corners", "[draw][geometry]") {
    // An L of 1 mm + 1 mm with 1.5 mm dashes: the first dash turns the corner.
    const auto dashes = splitIntoDashes({{0, 0}, {1, 0}, {1, 1}}, {1.5, 1.0});
    REQUIRE(dashes.size() == 1);
    REQUIRE(dashes[0].size() == 3);
    CHECK_THAT(length_mm(dashes[0]), WithinAbs(1.5, 1e-9));
    CHECK_THAT(dashes[0].back().y_mm, WithinAbs(0.5, 1e-9));
}

TEST_CASE("Dash lengths: a partial last dash, degenerate input", "[draw][geometry]") {
    const auto dashes = splitIntoDashes({{0, 0}, {0, 2.5}}, {1.0, 1.0});
    REQUIRE(dashes.size() == 2);
    CHECK_THAT(length_mm(dashes[1]), WithinAbs(0.5, 1e-9));
    CHECK(splitIntoDashes({{0, 0}}, {1.0, 1.0}).empty());
    CHECK_THROWS_AS(splitIntoDashes({{0, 0}, {1, 0}}, {0.0, 1.0}), std::invalid_argument);
}
