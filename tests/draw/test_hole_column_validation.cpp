// Hole column input checks: each refusal names the hole, the item, the value and the fix.
#include "draw/hole_column.hpp"
#include "sample_hole_column.hpp"

#include <catch2/catch.hpp>

#include <limits>

using namespace atollog::draw;
using atollog::draw::test::sampleHoleColumn;
using Catch::Contains;

namespace {
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kInf = std::numeric_limits<double>::infinity();
} // namespace

TEST_CASE("The sample hole is valid", "[draw][column][validation]") {
    CHECK_NOTHROW(layoutHoleColumn(sampleHoleColumn()));
}

TEST_CASE("Column refuses non-finite values", "[draw][column][validation]") {
    HoleColumnInput in = sampleHoleColumn();
    SECTION("interval top") {
        in.intervals[3].top_m = kNaN;
        CHECK_THROWS_AS(layoutHoleColumn(in), std::invalid_argument);
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("TAV-2") && Contains("(limestone) top") &&
                                                    Contains("nan") && Contains("finite"));
    }
    SECTION("run recovery") {
        in.runs[2].recovered_m = kInf;
        CHECK_THROWS_WITH(layoutHoleColumn(in),
                          Contains("run 'R3' recovered length") && Contains("inf"));
    }
    SECTION("sample depth") {
        in.samples[0].depth_m = kNaN;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("sample 'R1-a' depth"));
    }
    SECTION("collar elevation") {
        in.collar_elev_m = kNaN;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("collar elevation"));
    }
}

TEST_CASE("Column refuses a base at or above its top", "[draw][column][validation]") {
    HoleColumnInput in = sampleHoleColumn();
    SECTION("interval") {
        in.intervals[2].base_m = in.intervals[2].top_m; // 4.2-4.2: zero thickness
        CHECK_THROWS_WITH(layoutHoleColumn(in),
                          Contains("interval 4.200-4.200 m (limestone)") &&
                              Contains("base 4.200 m is not below its top 4.200 m") &&
                              Contains("give base_m deeper than top_m"));
    }
    SECTION("run") {
        in.runs[0].base_m = -1.0;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("run 'R1'") && Contains("-1.000 m"));
    }
    SECTION("drilled base") {
        in.drilled_base_m = 0.0;
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("drilled base 0.000 m"));
    }
    SECTION("interval below the drilled base") {
        in.drilled_base_m = 61.0; // the basalt interval reaches 62.0 m
        CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("below the drilled base 61.000 m"));
    }
}

TEST_CASE("Column refuses overlapping intervals, naming both", "[draw][column][validation]") {
    HoleColumnInput in = sampleHoleColumn();
    in.intervals[5].top_m = 13.5; // sand now starts inside the bafflestone 9.8-14.0 m
    CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("interval 9.800-14.000 m (limestone)") &&
                                                Contains("interval 13.500-15.200 m (sand)") &&
                                                Contains("overlap by 0.500 m") &&
                                                Contains("14.000 m or deeper"));
    // Touching intervals (base == next top) are not overlapping.
    in.intervals[5].top_m = 14.0;
    CHECK_NOTHROW(layoutHoleColumn(in));
}

TEST_CASE("Column refuses recovery beyond the cored length", "[draw][column][validation]") {
    HoleColumnInput in = sampleHoleColumn();
    in.runs[4].recovered_m = 3.4; // R5 is cored 12-15 m: 3 m
    CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("run 'R5' 12.000 m to 15.000 m") &&
                                                Contains("recovered 3.400 m exceeds the cored "
                                                         "3.000 m") &&
                                                Contains("clamp recovered_m"));
    in.runs[4].recovered_m = -0.1;
    CHECK_THROWS_WITH(layoutHoleColumn(in), Contains("recovered -0.100 m is negative"));
    in.runs[4].recovered_m = 3.0; // exactly 100 % is fine
    CHECK_NOTHROW(layoutHoleColumn(in));
}

TEST_CASE("Column refuses a bad view", "[draw][column][validation]") {
    HoleColumnInput in = sampleHoleColumn();
    HoleColumnView view;
    view.window_top_m = 30.0;
    view.window_base_m = 30.0;
    CHECK_THROWS_WITH(layoutHoleColumn(in, view), Contains("depth window 30.000 m to 30.000 m"));
    view = {};
    view.scale_ratio = 0.0;
    CHECK_THROWS_WITH(layoutHoleColumn(in, view), Contains("positive N"));
    view = {};
    in.samples.push_back({"deep", 70.0});
    CHECK_THROWS_WITH(layoutHoleColumn(in, view),
                      Contains("sample 'deep' at 70.000 m") && Contains("outside the hole"));
}
