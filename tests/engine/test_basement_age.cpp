// Pooling the dates of a volcanic basement: the inverse-variance weighted mean and its error
// (Taylor 1997, "An Introduction to Error Analysis", 2nd ed., eq. 7.10 and 7.12) and the MSWD
// (Wendt & Carl 1991, Chemical Geology 86:275). Expected values worked by hand from those
// equations.
#include "atollog/engine/basement_age.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>

using namespace atollog;

TEST_CASE("weighted mean, its sd and the MSWD of two dates", "[unit][basement]") {
    // 10 +/- 1 and 12 +/- 2: weights 1 and 0.25; mean (10 + 3) / 1.25 = 10.4; sd 1 / sqrt(1.25);
    // chi-square 0.4^2 / 1 + 1.6^2 / 4 = 0.8 on 1 degree of freedom: MSWD 0.8, no widening.
    const PooledAge p = pooledAge({10.0, 12.0}, {1.0, 2.0});
    CHECK(p.mean_ma == Approx(10.4).epsilon(1e-12));
    CHECK(p.sd_plain_ma == Approx(1.0 / std::sqrt(1.25)).epsilon(1e-12));
    CHECK(p.mswd == Approx(0.8).epsilon(1e-12));
    CHECK(p.sd_ma == p.sd_plain_ma);
    CHECK(p.count == 2);
}

TEST_CASE("scatter beyond the errors widens the sd by sqrt(MSWD)", "[unit][basement]") {
    // 10 +/- 1 and 14 +/- 1: mean 12, sd 1 / sqrt(2); chi-square 4 + 4 = 8, MSWD 8; widened sd
    // sqrt(8) / sqrt(2) = 2 (common practice in geochronology).
    const PooledAge p = pooledAge({10.0, 14.0}, {1.0, 1.0});
    CHECK(p.mean_ma == Approx(12.0).epsilon(1e-12));
    CHECK(p.mswd == Approx(8.0).epsilon(1e-12));
    CHECK(p.sd_ma == Approx(2.0).epsilon(1e-12));
}

TEST_CASE("one date pools to itself", "[unit][basement]") {
    const PooledAge p = pooledAge({4.7}, {0.09});
    CHECK(p.mean_ma == 4.7);
    CHECK(p.sd_ma == 0.09);
    CHECK(p.mswd == 0.0);
}

TEST_CASE("pooling refuses what it cannot pool, naming the entry", "[unit][basement][edges]") {
    const double nan = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_WITH(pooledAge({}, {}), Catch::Contains("no age"));
    CHECK_THROWS_WITH(pooledAge({1.0, nan}, {0.1, 0.1}), Catch::Contains("age 2"));
    CHECK_THROWS_WITH(pooledAge({1.0}, {0.0}), Catch::Contains("sd 1"));
    CHECK_THROWS_WITH(pooledAge({1.0}, {0.1, 0.2}), Catch::Contains("1 ages but 2 sds"));
    CHECK_THROWS_WITH(poolBasementTies({}, nan), Catch::Contains("contact depth"));
}

TEST_CASE("ties below the contact pool; brackets across it end at it", "[unit][basement]") {
    auto tie = [](const std::string& label, double shallow, double deep, double age, double sd) {
        return AgeTie{"H", label, AgeTieSource::Date, shallow, deep,
                      AgeDistribution::normal(age, sd), {}};
    };
    const auto out = poolBasementTies(
        {tie("reef", 2, 4, 1.0, 0.1), tie("across", 8, 12, 1.5, 0.1), tie("lava", 11, 11, 3.0, 0.1)},
        10.0);
    REQUIRE(out.size() == 3);
    CHECK(out[0].deep_m == 4.0);
    CHECK(out[1].deep_m == 10.0);
    CHECK(out[1].flags == std::vector<std::string>{"cut_at_basement"});
    CHECK(out[2].label == "basement (1 date, MSWD 0)");
    CHECK(out[2].shallow_m == 10.0);
    CHECK(out[2].age.mean_ma() == 3.0);
    // Nothing below: nothing pooled.
    CHECK(poolBasementTies({tie("reef", 2, 4, 1.0, 0.1)}, 10.0).size() == 1);
}
