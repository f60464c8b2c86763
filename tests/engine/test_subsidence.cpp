// Subsidence since deposition, S = (d - e) + w - L(t), checked by hand: the formula is ours
// (present depth below sea level, plus the water the reef grew in, minus where sea level stood),
// so these are hand-worked cases, not published values.
#include "atollog/engine/subsidence.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>
#include <vector>

using namespace atollog;
using Catch::WithinAbs;

namespace {

SeaLevelPoint level(double age_ma, double level_m, std::optional<double> sd_m = std::nullopt) {
    SeaLevelPoint p;
    p.age_ma = age_ma;
    p.level_m = level_m;
    p.level_sd_m = sd_m;
    return p;
}

} // namespace

TEST_CASE("no sea-level curve and a point paleodepth: S = d - e + w exactly", "[subsidence]") {
    const std::vector<double> ages = {1.0, 1.25, 2.0};
    const SubsidenceEstimate e = subsidenceDraws(50.0, 3.0, 10.0, 10.0, ages, SeaLevelCurve{}, 7);
    CHECK(e.no_sea_level_curve);
    CHECK(e.present_depth_below_sea_level_m == 47.0);
    CHECK(e.subsidence_m.p2_5 == 57.0);
    CHECK(e.subsidence_m.p50 == 57.0);
    CHECK(e.subsidence_m.p97_5 == 57.0);
    CHECK(e.subsidence_m.mean == 57.0);
    REQUIRE(e.rate_m_per_myr);
    CHECK_THAT(e.rate_m_per_myr->p50, WithinAbs(57.0 / 1.25, 1e-12)); // m/Myr
    CHECK_THAT(e.rate_m_per_myr->mean, WithinAbs((57.0 + 57.0 / 1.25 + 28.5) / 3, 1e-12));
    CHECK(e.draws == 3);
}

TEST_CASE("a sea level of -120 m at the sample's age raises S by 120 m", "[subsidence]") {
    const std::vector<SeaLevelPoint> pts = {level(0.0, 0.0), level(0.02, -120.0),
                                            level(0.05, -120.0)};
    const SeaLevelCurve curve(pts);
    const std::vector<double> ages = {0.03};
    const SubsidenceEstimate low = subsidenceDraws(50.0, 3.0, 10.0, 10.0, ages, curve, 1);
    CHECK_FALSE(low.no_sea_level_curve);
    CHECK(low.draws_beyond_sea_level_curve == 0);
    CHECK_THAT(low.subsidence_m.p50, WithinAbs(57.0 + 120.0, 1e-12));
    // Half-way between the points the level is interpolated: -60 m at 0.01 Ma.
    const std::vector<double> mid = {0.01};
    CHECK_THAT(subsidenceDraws(50.0, 3.0, 10.0, 10.0, mid, curve, 1).subsidence_m.p50,
               WithinAbs(57.0 + 60.0, 1e-12));
}

TEST_CASE("a uniform paleodepth gives the uniform's quantiles", "[subsidence]") {
    const std::vector<double> ages(20000, 1.0);
    const SubsidenceEstimate e = subsidenceDraws(100.0, 4.0, 0.0, 40.0, ages, SeaLevelCurve{}, 42);
    // Uniform on [0, 40] shifted by d - e = 96 m: quantiles 97, 116, 135, mean 116, sd 40/sqrt(12).
    // Sampling error of these with 20,000 draws is below 0.1 m.
    CHECK_THAT(e.subsidence_m.p2_5, WithinAbs(97.0, 0.3));
    CHECK_THAT(e.subsidence_m.p50, WithinAbs(116.0, 0.5));
    CHECK_THAT(e.subsidence_m.p97_5, WithinAbs(135.0, 0.3));
    CHECK_THAT(e.subsidence_m.mean, WithinAbs(116.0, 0.4));
    CHECK_THAT(e.subsidence_m.sd, WithinAbs(40.0 / std::sqrt(12.0), 0.2));
}

TEST_CASE("sea-level sd spreads S as a normal", "[subsidence]") {
    const std::vector<SeaLevelPoint> pts = {level(0.0, -50.0, 10.0), level(1.0, -50.0, 10.0)};
    const std::vector<double> ages(20000, 0.5);
    const SubsidenceEstimate e = subsidenceDraws(20.0, 2.0, 5.0, 5.0, ages, SeaLevelCurve(pts), 3);
    // S = 18 + 5 + 50 = 73 m, sd 10 m; normal 2.5 % and 97.5 % quantiles at -/+ 1.96 sd.
    CHECK_THAT(e.subsidence_m.mean, WithinAbs(73.0, 0.3));
    CHECK_THAT(e.subsidence_m.sd, WithinAbs(10.0, 0.2));
    CHECK_THAT(e.subsidence_m.p2_5, WithinAbs(73.0 - 19.6, 0.6));
    CHECK_THAT(e.subsidence_m.p97_5, WithinAbs(73.0 + 19.6, 0.6));
}

TEST_CASE("young samples, old samples beyond the curve, determinism", "[subsidence]") {
    const std::vector<SeaLevelPoint> pts = {level(0.0, 0.0, 3.0), level(0.6, -60.0, 15.0)};
    const SeaLevelCurve curve(pts);
    SECTION("a Holocene sample has no rate, and no NaN") {
        const std::vector<double> ages = {0.004, 0.006, 0.013};
        const SubsidenceEstimate e = subsidenceDraws(6.0, 2.0, 1.0, 5.0, ages, curve, 9);
        CHECK(e.rate_undefined_young_age);
        CHECK_FALSE(e.rate_m_per_myr.has_value());
        CHECK(std::isfinite(e.subsidence_m.mean));
    }
    SECTION("ages older than the curve are flagged and take the present level") {
        const std::vector<double> ages = {2.0, 2.1};
        const SubsidenceEstimate e = subsidenceDraws(90.0, 3.0, 10.0, 10.0, ages, curve, 9);
        CHECK(e.draws_beyond_sea_level_curve == 2);
        CHECK(e.subsidence_m.p50 == 97.0);
    }
    SECTION("the same seed gives the same draws; another seed others") {
        const std::vector<double> ages = {0.3, 0.35, 0.4, 0.45};
        const auto a = subsidenceDraws(40.0, 3.0, 0.0, 30.0, ages, curve, 11);
        const auto b = subsidenceDraws(40.0, 3.0, 0.0, 30.0, ages, curve, 11);
        const auto c = subsidenceDraws(40.0, 3.0, 0.0, 30.0, ages, curve, 12);
        CHECK(a.subsidence_m.mean == b.subsidence_m.mean);
        CHECK(a.subsidence_m.mean != c.subsidence_m.mean);
    }
}

TEST_CASE("subsidence rejects bad input", "[subsidence]") {
    const std::vector<double> ages = {1.0};
    const std::vector<double> none;
    CHECK_THROWS_WITH(subsidenceDraws(10, 1, 20, 5, ages, SeaLevelCurve{}, 1),
                      Catch::Contains("paleodepth_min_m (20.000000) is greater than"));
    CHECK_THROWS_WITH(subsidenceDraws(10, 1, 2, 5, none, SeaLevelCurve{}, 1),
                      Catch::Contains("no age draws"));
    CHECK_THROWS_WITH(subsidenceDraws(std::nan(""), 1, 2, 5, ages, SeaLevelCurve{}, 1),
                      Catch::Contains("depth_m is not finite"));
    const std::vector<double> future = {-0.01};
    CHECK_THROWS_WITH(subsidenceDraws(10, 1, 2, 5, future, SeaLevelCurve{}, 1),
                      Catch::Contains("more than a century after 1950"));
    const std::vector<SeaLevelPoint> twice = {level(0.1, -5), level(0.1, -6)};
    CHECK_THROWS_WITH(SeaLevelCurve(twice), Catch::Contains("two points at age"));
}

TEST_CASE("per-hole subsidence rate is the York slope of S on t", "[subsidence]") {
    // Points exactly on S = 12 m + 45 m/Myr x t.
    std::vector<SubsidencePoint> pts;
    for (double t : {0.2, 0.6, 1.1, 1.7, 2.4})
        pts.push_back({"s", t, 0.02 * t + 0.005, 12.0 + 45.0 * t, 4.0, 0.0});
    const HoleSubsidenceRate r = holeSubsidenceRate(pts);
    CHECK_THAT(r.rate_m_per_myr, WithinAbs(45.0, 1e-9));
    CHECK_THAT(r.intercept_m, WithinAbs(12.0, 1e-9));
    CHECK(r.rate_sd_m_per_myr > 0);
    CHECK(r.points == 5);
    pts[2].age_sd_ma = 0;
    CHECK_THROWS_WITH(holeSubsidenceRate(pts), Catch::Contains("needs age_sd_ma > 0"));
}
