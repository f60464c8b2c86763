#include "draw/depth_scale.hpp"
#include "draw/depth_ticks.hpp"

#include <catch2/catch.hpp>

#include <limits>
#include <stdexcept>

using atollog::draw::chooseDepthTicks;
using atollog::draw::DepthScale;
using Catch::Matchers::WithinAbs;

TEST_CASE("DepthScale from a drafting ratio", "[draw][geometry]") {
    // A representative fraction 1:200 puts 200 mm of ground on 1 mm of paper, i.e. 1 m on 5 mm
    // (definition of a map/section scale ratio).
    const DepthScale scale = DepthScale::fromRatio(100.0, 200.0, 30.0);
    CHECK_THAT(scale.mm_per_m(), WithinAbs(5.0, 1e-12));
    CHECK_THAT(scale.y_mm(100.0), WithinAbs(30.0, 1e-9)); // the top sits on the origin
    CHECK_THAT(scale.y_mm(110.0), WithinAbs(80.0, 1e-9)); // 10 m -> 50 mm lower
    CHECK_THAT(scale.y_mm(99.0), WithinAbs(25.0, 1e-9));  // above the top: negative offset
    // 1:1000 puts a metre on 1 mm.
    CHECK_THAT(DepthScale::fromRatio(0.0, 1000.0).y_mm(37.5), WithinAbs(37.5, 1e-9));
}

TEST_CASE("DepthScale round trip depth -> y -> depth", "[draw][geometry]") {
    const DepthScale scale(12.34, 7.5, -3.0);
    for (const double depth_m : {12.34, 12.35, 20.0, 57.125, 1234.5}) {
        CHECK_THAT(scale.depth_m(scale.y_mm(depth_m)), WithinAbs(depth_m, 1e-9));
    }
    for (const double y_mm : {-3.0, 0.0, 10.0, 999.9}) {
        CHECK_THAT(scale.y_mm(scale.depth_m(y_mm)), WithinAbs(y_mm, 1e-9));
    }
}

TEST_CASE("DepthScale refuses degenerate scales", "[draw][geometry]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_AS(DepthScale(0.0, 0.0), std::invalid_argument);
    CHECK_THROWS_AS(DepthScale(0.0, -5.0), std::invalid_argument);
    CHECK_THROWS_AS(DepthScale(nan, 5.0), std::invalid_argument);
    CHECK_THROWS_AS(DepthScale::fromRatio(0.0, 0.0), std::invalid_argument);
    CHECK_THROWS_WITH(DepthScale::fromRatio(0.0, -200.0), Catch::Contains("1:N"));
}

TEST_CASE("Depth ticks follow the 1-2-5 series and keep labels apart", "[draw][geometry]") {
    SECTION("1:200 (5 mm/m), labels at least 10 mm apart -> every 2 m, minor every 0.5 m") {
        const auto t = chooseDepthTicks(20.0, 30.0, 5.0, 10.0);
        CHECK(t.major_step_m == Approx(2.0));
        CHECK(t.minor_step_m == Approx(0.5));
        CHECK(t.label_decimals == 0);
        REQUIRE(t.major_m.size() == 6); // 20 22 24 26 28 30
        CHECK(t.major_m.front() == Approx(20.0));
        CHECK(t.major_m.back() == Approx(30.0));
        CHECK(t.minor_m.size() == 15); // 4 per 2 m interval minus the shared majors: 5 x 3
    }
    SECTION("1:50 (20 mm/m) -> every 0.5 m with one decimal") {
        const auto t = chooseDepthTicks(3.2, 6.9, 20.0, 10.0);
        CHECK(t.major_step_m == Approx(0.5));
        CHECK(t.label_decimals == 1);
        REQUIRE_FALSE(t.major_m.empty());
        CHECK(t.major_m.front() == Approx(3.5));
        CHECK(t.major_m.back() == Approx(6.5));
    }
    SECTION("1:1000 (1 mm/m) -> every 10 m") {
        const auto t = chooseDepthTicks(0.0, 95.0, 1.0, 10.0);
        CHECK(t.major_step_m == Approx(10.0));
        CHECK(t.major_m.size() == 10);
    }
    CHECK_THROWS_AS(chooseDepthTicks(30.0, 20.0, 5.0, 10.0), std::invalid_argument);
}

TEST_CASE("A warped DepthScale interpolates between knots and opens a step", "[draw][geometry]") {
    // Depth to axis value through knots (piecewise linear interpolation), then 10 mm per unit;
    // the two knots at 10 m are a step from 1 to 3.
    const DepthScale scale = DepthScale::warped(
        {{0.0, 0.0}, {10.0, 1.0}, {10.0, 3.0}, {20.0, 4.0}}, 0.5, 10.0, 100.0);
    CHECK(scale.isWarped());
    CHECK_THAT(scale.y_mm(5.0), WithinAbs(100.0 + (0.5 - 0.5) * 10.0, 1e-9));
    CHECK_THAT(scale.y_mm(15.0), WithinAbs(100.0 + (3.5 - 0.5) * 10.0, 1e-9));
    // At the step: the deeper side for y_mm, the shallower side for yAbove_mm.
    CHECK_THAT(scale.y_mm(10.0), WithinAbs(100.0 + 2.5 * 10.0, 1e-9));
    CHECK_THAT(scale.yAbove_mm(10.0), WithinAbs(100.0 + 0.5 * 10.0, 1e-9));
    // Off a step both sides agree.
    CHECK(scale.yAbove_mm(12.5) == scale.y_mm(12.5));
    // Beyond the end knots: the end values.
    CHECK_THAT(scale.y_mm(-3.0), WithinAbs(100.0 - 0.5 * 10.0, 1e-9));
    CHECK_THAT(scale.y_mm(25.0), WithinAbs(100.0 + 3.5 * 10.0, 1e-9));
    // Back from y: inside the step it is the step's depth; elsewhere the inverse.
    CHECK_THAT(scale.depth_m(scale.y_mm(7.5)), WithinAbs(7.5, 1e-9));
    CHECK_THAT(scale.depth_m(scale.y_mm(17.5)), WithinAbs(17.5, 1e-9));
    CHECK_THAT(scale.depth_m(100.0 + (2.0 - 0.5) * 10.0), WithinAbs(10.0, 1e-9));
    // Tick spacing uses the mean paper per metre: 4 units x 10 mm over 20 m.
    CHECK_THAT(scale.mm_per_m(), WithinAbs(2.0, 1e-12));
}

TEST_CASE("A warped DepthScale refuses knots it cannot use", "[draw][geometry][bad-input]") {
    using V = std::vector<atollog::draw::AxisKnot>;
    const double nan = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_WITH(DepthScale::warped(V{{0.0, 0.0}}, 0.0, 1.0),
                      Catch::Contains("at least two knots"));
    CHECK_THROWS_WITH(DepthScale::warped(V{{0.0, 0.0}, {5.0, nan}}, 0.0, 1.0),
                      Catch::Contains("knot 2 is not finite"));
    CHECK_THROWS_WITH(DepthScale::warped(V{{0.0, 1.0}, {5.0, 0.5}}, 0.0, 1.0),
                      Catch::Contains("must not decrease"));
    CHECK_THROWS_WITH(DepthScale::warped(V{{5.0, 0.0}, {4.0, 1.0}}, 0.0, 1.0),
                      Catch::Contains("must not decrease"));
    CHECK_THROWS_WITH(DepthScale::warped(V{{5.0, 0.0}, {5.0, 1.0}}, 0.0, 1.0),
                      Catch::Contains("span no depth"));
    CHECK_THROWS_AS(DepthScale::warped(V{{0.0, 0.0}, {5.0, 1.0}}, 0.0, 0.0), std::invalid_argument);
}
