// Isochrons from age models built by the engine, against answers known outside the model:
// linear interpolation between two ties of (practically) exact age, the depth quantiles the
// age quantiles of two normal ties imply (sum of independent normals; P(depth(A) <= z) =
// P(age(z) >= A) for ages non-decreasing with depth), a hiatus at a logged surface, and the
// tie line of one event across holes.
#include "atollog/engine/age_model.hpp"
#include "atollog/engine/isochrons.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

namespace {

AgeTie tie(const std::string& label, double depth_m, double age_ma, double sd_ma) {
    return AgeTie{"H1",    label,   AgeTieSource::Date,
                  depth_m, depth_m, AgeDistribution::normal(age_ma, sd_ma),
                  {}};
}

/// Ties at 10 m (1.0 Ma) and 20 m (2.0 Ma), both of sd `sd_ma`; no core top, so the model runs
/// from 10 to 20 m on a 0.5 m grid.
AgeModel twoTies(double sd_ma, int draws, std::uint64_t seed) {
    AgeModelSettings s;
    s.draws = draws;
    s.seed = seed;
    s.core_top.reset();
    s.outlier_draws = 0;
    return buildAgeModel("H1", {tie("a", 10, 1.0, sd_ma), tie("b", 20, 2.0, sd_ma)}, s);
}

/// The depth at which the age p-quantile of the two-normal model equals A, analytically: at
/// f = (z - 10) / 10 the age is (1 - f) X + f Y ~ N(1 + f, sd sqrt((1 - f)^2 + f^2)) (sum of
/// independent normals), rising in f here, so bisection finds it.
double analyticDepth(double age_ma, double sd_ma, double z_of_p) {
    auto age = [&](double f) {
        return 1.0 + f + z_of_p * sd_ma * std::sqrt((1 - f) * (1 - f) + f * f);
    };
    double lo = 0, hi = 1;
    for (int i = 0; i < 100; ++i) {
        const double mid = 0.5 * (lo + hi);
        (age(mid) < age_ma ? lo : hi) = mid;
    }
    return 10.0 + 10.0 * 0.5 * (lo + hi);
}

constexpr double kZ975 = 1.959964; // standard normal table

} // namespace

TEST_CASE("isochron between two exact ties lies at the interpolated depth", "[correlation][isochron]") {
    // 1.0 Ma at 10 m, 2.0 Ma at 20 m, linear between: 1.5 Ma at 15 m, 1.2 Ma at 12 m. Within
    // a grid step (0.5 m), all three quantiles.
    const AgeModel m = twoTies(1e-4, 4000, 3);
    const IsochronDepth i = isochronDepth(m, 1.5);
    CHECK(i.hole == "H1");
    CHECK(i.age_ma == 1.5);
    REQUIRE(i.depth_q025_m);
    REQUIRE(i.depth_q500_m);
    REQUIRE(i.depth_q975_m);
    CHECK_THAT(*i.depth_q025_m, WithinAbs(15.0, 0.5));
    CHECK_THAT(*i.depth_q500_m, WithinAbs(15.0, 0.5));
    CHECK_THAT(*i.depth_q975_m, WithinAbs(15.0, 0.5));
    CHECK_FALSE(i.in_hiatus);
    CHECK_FALSE(i.outside_model);
    CHECK_THAT(*isochronDepth(m, 1.2).depth_q500_m, WithinAbs(12.0, 0.5));
}

TEST_CASE("isochron depth quantiles follow from the age quantiles", "[correlation][isochron]") {
    // Ties 1.0 and 2.0 Ma, sd 0.1 each (7 combined sds apart: the order removes no measurable
    // mass). The depth p-quantile of 1.5 Ma is where the age (1 - p)-quantile is 1.5 Ma: the
    // shallow end from the old end of the age band, the deep end from the young end.
    const double sd = 0.1;
    const AgeModel m = twoTies(sd, 40000, 29);
    for (double age : {1.3, 1.5, 1.7}) {
        const IsochronDepth i = isochronDepth(m, age);
        REQUIRE(i.depth_q025_m);
        REQUIRE(i.depth_q500_m);
        REQUIRE(i.depth_q975_m);
        // Tolerance 0.05 m: the histogram quantiles err by under 0.005 Ma here (0.2 % of the
        // range, streaming_quantiles.hpp), 0.05 m at 10 m/Myr; the interpolation between rows
        // 0.5 m apart adds far less (the band edges curve gently).
        CHECK_THAT(*i.depth_q025_m, WithinAbs(analyticDepth(age, sd, kZ975), 0.05));
        CHECK_THAT(*i.depth_q500_m, WithinAbs(analyticDepth(age, sd, 0.0), 0.05));
        CHECK_THAT(*i.depth_q975_m, WithinAbs(analyticDepth(age, sd, -kZ975), 0.05));
        // The band is wide enough for the order of the ends to mean something (> 1 m).
        CHECK(*i.depth_q975_m - *i.depth_q025_m > 1.0);
        // Against the model's own grid quantiles: at the depth found, the age quantile read
        // back (AgeModel::ageAt, the same linear interpolation) is A.
        CHECK_THAT(m.ageAt(*i.depth_q025_m)->q975_ma, WithinAbs(age, 1e-9));
        CHECK_THAT(m.ageAt(*i.depth_q500_m)->q500_ma, WithinAbs(age, 1e-9));
        CHECK_THAT(m.ageAt(*i.depth_q975_m)->q025_ma, WithinAbs(age, 1e-9));
    }
}

TEST_CASE("an isochron inside a hiatus sits on the surface", "[correlation][isochron]") {
    // Core top 0 Ma at 0 m; ties 0.5 Ma at 5 m, 1.0 Ma at 10 m, 3.0 Ma at 15 m, 3.5 Ma at 20 m;
    // a logged surface at 12.5 m. Both sides accrete 10 m/Myr, so (age_model.hpp) the age just
    // above the surface is 1.25 Ma and at it 2.75 Ma: 1.5 Myr missing. 2.0 Ma falls in the gap.
    AgeModelSettings s;
    s.draws = 4000;
    s.seed = 8;
    s.outlier_draws = 0;
    s.hiatus_depths_m = {12.5};
    const AgeModel m = buildAgeModel("H1",
                                     {tie("a", 5, 0.5, 1e-3), tie("b", 10, 1.0, 1e-3),
                                      tie("c", 15, 3.0, 1e-3), tie("d", 20, 3.5, 1e-3)},
                                     s);
    const IsochronDepth in_gap = isochronDepth(m, 2.0);
    CHECK(in_gap.in_hiatus);
    CHECK_FALSE(in_gap.outside_model);
    REQUIRE(in_gap.depth_q500_m);
    CHECK(*in_gap.depth_q500_m == 12.5);
    CHECK_THAT(*in_gap.depth_q025_m, WithinAbs(12.5, 1e-9));
    CHECK_THAT(*in_gap.depth_q975_m, WithinAbs(12.5, 1e-9));
    // Just above the gap the rock is there: 1.2 Ma at 12 m.
    const IsochronDepth above = isochronDepth(m, 1.2);
    CHECK_FALSE(above.in_hiatus);
    CHECK_THAT(*above.depth_q500_m, WithinAbs(12.0, 0.05));
    // And below it: 3.2 Ma at 17 m.
    const IsochronDepth below = isochronDepth(m, 3.2);
    CHECK_FALSE(below.in_hiatus);
    CHECK_THAT(*below.depth_q500_m, WithinAbs(17.0, 0.05));
}

TEST_CASE("an isochron outside the model has no depth", "[correlation][isochron]") {
    const AgeModel m = twoTies(1e-4, 2000, 5); // 10..20 m, 1.0..2.0 Ma
    for (double age : {0.5, 2.5}) {
        const IsochronDepth i = isochronDepth(m, age);
        CHECK(i.outside_model);
        CHECK_FALSE(i.in_hiatus);
        CHECK_FALSE(i.depth_q025_m);
        CHECK_FALSE(i.depth_q500_m);
        CHECK_FALSE(i.depth_q975_m);
    }
    CHECK_FALSE(isochronDepth(m, 1.01).outside_model);
    CHECK_THROWS_AS(isochronDepth(m, std::numeric_limits<double>::quiet_NaN()),
                    std::invalid_argument);
    AgeModel empty;
    empty.hole = "H9";
    CHECK_THROWS_WITH(isochronDepth(empty, 1.0), Catch::Contains("'H9'"));
}

TEST_CASE("a tie line lists one event's bracket in every hole that has it", "[correlation][isochron]") {
    CorrelationData d;
    d.holes = {"NA-1", "NA-2", "NA-3"};
    d.sampled_levels_m = {{}, {}, {}};
    d.surfaces_m = {{}, {}, {}};
    d.events = {{"B T0", SequenceEventKind::Base, "T0", std::nullopt, std::nullopt},
                {"T T0", SequenceEventKind::Top, "T0", std::nullopt, std::nullopt}};
    d.levels = {{2, 0, 30.0, 31.0, 31.0}, {0, 1, 4.0, 5.0, 4.0}, {0, 0, 20.0, 22.5, 22.5}};
    const std::vector<EventTie> t = eventTieLine(d, 0);
    REQUIRE(t.size() == 2);
    CHECK(t[0].hole == 0u);
    CHECK(t[0].shallow_m == 20.0);
    CHECK(t[0].deep_m == 22.5);
    CHECK(t[0].level_m == 22.5);
    CHECK(t[1].hole == 2u);
    CHECK(t[1].shallow_m == 30.0);
    CHECK(eventTieLine(d, 1).size() == 1);
    CHECK_THROWS_WITH(eventTieLine(d, 2), Catch::Contains("event index 2"));
}
