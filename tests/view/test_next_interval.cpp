// Where "add interval" puts the next interval (next_interval.hpp), on hand-made runs: continue
// at the deepest base, skip the unrecovered rest of a run and gaps between runs, cut the base
// at the end of the recovered core, stop at the drilled depth. The rule that recovered core is
// logged from the run top is the ocean-drilling convention the depth model follows (common
// practice); the 0.5 m first guess is our choice.
#include "view/next_interval.hpp"

#include <catch2/catch.hpp>

using namespace atollog;
using namespace atollog::view;

namespace {

CoreDataset twoRuns() {
    CoreDataset d;
    d.holes.push_back({"AX1", "test", {}, {}, {}, {}, HoleKind::Core, {}});
    d.runs.push_back({"AX1", "AX1-R1", 0.0, 2.0, 1.2, {}});  // recovered 0-1.2 m
    d.runs.push_back({"AX1", "AX1-R2", 2.0, 5.0, 3.0, {}});  // fully recovered
    d.runs.push_back({"AX1", "AX1-R3", 6.0, 7.0, 0.3, {}});  // after a gap, 6-6.3 m recovered
    return d;
}

LithInterval interval(double top_m, double base_m) {
    LithInterval v;
    v.hole = "AX1";
    v.top_m = top_m;
    v.base_m = base_m;
    return v;
}

} // namespace

TEST_CASE("the first interval of a hole starts at its shallowest run", "[view][desk]") {
    const NextInterval next = nextInterval(twoRuns(), "AX1");
    REQUIRE(next.interval);
    CHECK(next.interval->top_m == 0.0);
    CHECK(next.interval->base_m == 0.5);
    CHECK(next.interval->rock == Rock::Limestone);
    CHECK_FALSE(next.interval->texture);
}

TEST_CASE("the next interval starts at the deepest base, whatever the row order",
          "[view][desk]") {
    CoreDataset d = twoRuns();
    d.intervals = {interval(0.4, 0.9), interval(0.0, 0.4)};
    const NextInterval next = nextInterval(d, "AX1");
    REQUIRE(next.interval);
    CHECK(next.interval->top_m == 0.9);
    CHECK(next.interval->base_m == 1.2); // cut at the end of the recovered core
}

TEST_CASE("past the recovered core and across a gap, the log goes on at the next run's top",
          "[view][desk]") {
    CoreDataset d = twoRuns();
    d.intervals = {interval(0.0, 1.2)};
    NextInterval next = nextInterval(d, "AX1");
    REQUIRE(next.interval);
    CHECK(next.interval->top_m == 2.0);
    CHECK(next.interval->base_m == 2.5);

    d.intervals.push_back(interval(2.0, 5.0)); // AX1-R2 logged; a gap to 6 m follows
    next = nextInterval(d, "AX1");
    REQUIRE(next.interval);
    CHECK(next.interval->top_m == 6.0);
    CHECK(next.interval->base_m == 6.3);

    d.intervals.push_back(interval(6.0, 6.3)); // only the unrecovered rest of the last run
    next = nextInterval(d, "AX1");
    REQUIRE(next.interval);
    CHECK(next.interval->top_m == 6.3);
    CHECK(next.interval->base_m == 6.8); // 6.3 + 0.5 rounded to the micrometre

    d.intervals.push_back(interval(6.3, 7.0));
    next = nextInterval(d, "AX1");
    CHECK_FALSE(next.interval);
    CHECK(next.refusal.find("drilled depth (7 m)") != std::string::npos);
}

TEST_CASE("a computed base carries no binary noise", "[view][desk]") {
    CoreDataset d = twoRuns();
    d.runs = {{"AX1", "AX1-R1", 36.8, 38.0, 1.08, {}}}; // 36.8 + 1.08 = 37.879999999999995
    d.intervals = {interval(36.8, 37.8)};
    const NextInterval next = nextInterval(d, "AX1");
    REQUIRE(next.interval);
    CHECK(next.interval->base_m == 37.88);
}

TEST_CASE("a hole without runs gets no interval", "[view][desk]") {
    CoreDataset d = twoRuns();
    const NextInterval next = nextInterval(d, "NO-SUCH");
    CHECK_FALSE(next.interval);
    CHECK(next.refusal.find("has no runs") != std::string::npos);
}
