// Depth model checks, hand-worked from the ocean-drilling convention (checks.md, "Biostratigraphy
// and drilling depths" [P: ocean-drilling explanatory notes and depth-scale terminology]):
// recovered core is placed at the top of its cored interval; recovery = recovered / cored length;
// over 100 % recovery happens through core expansion.
#include "atollog/engine/depth_model.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

namespace {

CoreRun run(const char *id, double top_m, double base_m, double recovered_m) {
    CoreRun r;
    r.hole = "KAI-1";
    r.run = id;
    r.top_m = top_m;
    r.base_m = base_m;
    r.recovered_m = recovered_m;
    return r;
}

constexpr double kTol_m = 1e-9; // pure arithmetic on metres; nanometre slack for rounding

} // namespace

TEST_CASE("partial recovery: core sits at the top of the run", "[unit][depth]") {
    // Run 10.0-13.0 m, 1.8 m recovered: recovered part 10.0-11.8 m (core at the run top),
    // unrecovered 11.8-13.0 m (1.2 m). Worked by hand from the convention above.
    const DepthModel model({run("1R", 10.0, 13.0, 1.8)});

    const DepthLocation at_10_5 = model.locate(10.5);
    CHECK(at_10_5.part == DepthPart::Recovered);
    CHECK(at_10_5.run_index == 0u);
    // 10.5 m logged may stand for 10.5 m down to 10.5 + 1.2 = 11.7 m.
    const DepthRange r = model.trueDepthRange(10.5);
    CHECK_THAT(r.shallow_m, WithinAbs(10.5, kTol_m));
    CHECK_THAT(r.deep_m, WithinAbs(11.7, kTol_m));
    CHECK_THAT(r.width_m(), WithinAbs(1.2, kTol_m));

    // 11.5 m: 11.5 + 1.2 = 12.7 m, still inside the run.
    CHECK_THAT(model.trueDepthRange(11.5).deep_m, WithinAbs(12.7, kTol_m));

    CHECK(model.locate(12.5).part == DepthPart::Unrecovered);
    CHECK(model.locate(12.5).run_index == 0u);
    // Our choice for a depth in the unrecovered part: anything from it to the run base.
    CHECK_THAT(model.trueDepthRange(12.5).shallow_m, WithinAbs(12.5, kTol_m));
    CHECK_THAT(model.trueDepthRange(12.5).deep_m, WithinAbs(13.0, kTol_m));

    CHECK(model.locate(9.0).part == DepthPart::Uncored);
    CHECK_FALSE(model.locate(9.0).run_index);
    CHECK_THAT(model.trueDepthRange(9.0).shallow_m, WithinAbs(9.0, kTol_m));
    CHECK_THAT(model.trueDepthRange(9.0).deep_m, WithinAbs(9.0, kTol_m));
    CHECK(model.locate(13.5).part == DepthPart::Uncored);

    // Recovery = recovered / cored = 1.8 / 3.0 = 0.6.
    CHECK_THAT(model.cored_m(), WithinAbs(3.0, kTol_m));
    CHECK_THAT(model.recovered_m(), WithinAbs(1.8, kTol_m));
    CHECK_THAT(model.recovery_fraction(), WithinAbs(0.6, 1e-12));
}

TEST_CASE("edges of the recovered part and of the run", "[unit][depth]") {
    const DepthModel model({run("1R", 10.0, 13.0, 1.8)});
    CHECK(model.locate(10.0).part == DepthPart::Recovered); // the run top
    CHECK(model.locate(11.8).part == DepthPart::Recovered); // last recovered depth
    CHECK(model.locate(11.81).part == DepthPart::Unrecovered);
    CHECK(model.locate(13.0).part == DepthPart::Unrecovered); // base of a run nothing follows
    CHECK(model.locate(13.0).run_index == 0u);
    // At the recovered base the gap can only lie below: 11.8-13.0.
    CHECK_THAT(model.trueDepthRange(11.8).deep_m, WithinAbs(13.0, kTol_m));
}

TEST_CASE("over 100 % recovery: the whole run is recovered, depth is exact", "[unit][depth]") {
    // Core expansion gives recovery above 100 % (convention above); it fills the cored length
    // and no more: run 20-23 m, 3.3 m recovered counts as 3.0 m.
    const DepthModel model({run("3R", 20.0, 23.0, 3.3)});
    CHECK(model.locate(22.9).part == DepthPart::Recovered);
    CHECK(model.locate(23.0).part == DepthPart::Recovered);
    CHECK_THAT(model.trueDepthRange(21.0).width_m(), WithinAbs(0.0, kTol_m));
    CHECK_THAT(model.recovered_m(), WithinAbs(3.0, kTol_m));
    CHECK_THAT(model.recovery_fraction(), WithinAbs(1.0, 1e-12));
}

TEST_CASE("nothing recovered: even the run top is unrecovered", "[unit][depth]") {
    const DepthModel model({run("4R", 30.0, 31.5, 0.0)});
    CHECK(model.locate(30.0).part == DepthPart::Unrecovered);
    CHECK_THAT(model.trueDepthRange(30.0).deep_m, WithinAbs(31.5, kTol_m));
    CHECK_THAT(model.recovery_fraction(), WithinAbs(0.0, 1e-12));
}

TEST_CASE("several runs: sorted, located by binary search, boundaries go to the deeper run",
          "[unit][depth]") {
    // Given out of order; 2R touches 1R at 13.0 m; a gap (uncored) from 16.0 to 18.0 m.
    const DepthModel model(
        {run("3R", 18.0, 21.0, 3.0), run("1R", 10.0, 13.0, 1.8), run("2R", 13.0, 16.0, 1.5)});
    REQUIRE(model.runs().size() == 3);
    CHECK(model.runs()[0].run == "1R");
    CHECK(model.runs()[1].run == "2R");
    CHECK(model.runs()[2].run == "3R");

    // 13.0 m is the base of 1R and the top of 2R: it belongs to 2R, where it is recovered.
    CHECK(model.locate(13.0).run_index == 1u);
    CHECK(model.locate(13.0).part == DepthPart::Recovered);
    // 2R: 13.0-16.0 m with 1.5 m recovered -> 14.0 m may stand for 14.0-15.5 m.
    CHECK_THAT(model.trueDepthRange(14.0).deep_m, WithinAbs(15.5, kTol_m));
    CHECK(model.locate(15.0).part == DepthPart::Unrecovered);
    CHECK(model.locate(17.0).part == DepthPart::Uncored);
    CHECK(model.locate(18.0).run_index == 2u);
    CHECK(model.locate(21.0).run_index == 2u);
    CHECK(model.locate(21.01).part == DepthPart::Uncored);

    // Cored 3 + 3 + 3 = 9 m; recovered 1.8 + 1.5 + 3.0 = 6.3 m; recovery 70 %.
    CHECK_THAT(model.cored_m(), WithinAbs(9.0, kTol_m));
    CHECK_THAT(model.recovered_m(), WithinAbs(6.3, kTol_m));
    CHECK_THAT(model.recovery_fraction(), WithinAbs(0.7, 1e-12));
}

TEST_CASE("no runs: everything uncored, recovery 0", "[unit][depth]") {
    const DepthModel model({});
    CHECK(model.locate(5.0).part == DepthPart::Uncored);
    CHECK_THAT(model.cored_m(), WithinAbs(0.0, kTol_m));
    CHECK_THAT(model.recovery_fraction(), WithinAbs(0.0, 1e-12));
}

TEST_CASE("inconsistent runs are refused with std::invalid_argument", "[unit][depth]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_AS(DepthModel({run("1R", nan, 13.0, 1.0)}), std::invalid_argument);
    CHECK_THROWS_AS(DepthModel({run("1R", 10.0, 13.0, nan)}), std::invalid_argument);
    CHECK_THROWS_AS(DepthModel({run("1R", 13.0, 10.0, 1.0)}), std::invalid_argument);
    CHECK_THROWS_AS(DepthModel({run("1R", 10.0, 10.0, 0.0)}), std::invalid_argument);
    CHECK_THROWS_AS(DepthModel({run("1R", 10.0, 13.0, -0.1)}), std::invalid_argument);
    CHECK_THROWS_WITH(DepthModel({run("1R", 10.0, 13.0, 1.0), run("2R", 12.0, 15.0, 1.0)}),
                      Catch::Contains("run '2R'") && Catch::Contains("overlaps"));
    // A run inside another overlaps too.
    CHECK_THROWS_AS(DepthModel({run("1R", 10.0, 20.0, 1.0), run("2R", 12.0, 15.0, 1.0)}),
                    std::invalid_argument);
    // Touching is fine.
    CHECK_NOTHROW(DepthModel({run("1R", 10.0, 13.0, 1.0), run("2R", 13.0, 15.0, 1.0)}));
}

TEST_CASE("a non-finite depth is refused, never located", "[unit][depth]") {
    const DepthModel model({run("1R", 10.0, 13.0, 1.8)});
    CHECK_THROWS_AS(model.locate(std::nan("")), std::invalid_argument);
    CHECK_THROWS_AS(model.trueDepthRange(std::numeric_limits<double>::infinity()),
                    std::invalid_argument);
}
