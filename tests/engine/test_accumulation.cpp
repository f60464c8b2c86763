// Accumulation rates: mass accumulation rate = LSR x dry bulk density, carbonate accumulation
// rate = MAR x CaCO3 fraction (standard ocean-drilling usage [M], checks.md "Accumulation").
#include "atollog/engine/accumulation.hpp"
#include "atollog/engine/rate_units.hpp"
#include "atollog/engine/reef_accretion_range.hpp"

#include <catch2/catch.hpp>

#include <stdexcept>
#include <vector>

using namespace atollog;
using Catch::WithinAbs;

TEST_CASE("MAR and CAR from the checks.md example", "[accumulation]") {
    // checks.md [F]: 2.5 cm/kyr at 0.80 g/cm3 -> 2.00 g/cm2/kyr; at 85 % CaCO3 -> 1.70.
    const double mar = massAccumulationRate_g_cm2_kyr(2.5, 0.80);
    CHECK_THAT(mar, WithinAbs(2.00, 1e-12)); // g/cm2/kyr
    CHECK_THAT(carbonateAccumulationRate_g_cm2_kyr(mar, 85.0), WithinAbs(1.70, 1e-12));
}

TEST_CASE("rate unit conversions", "[accumulation]") {
    // checks.md: 1 cm/kyr = 10 m/Myr = 0.01 mm/yr.
    CHECK(mPerMyrFromCmPerKyr(1.0) == 10.0);
    CHECK(mmPerYrFromCmPerKyr(1.0) == 0.01);
    CHECK(cmPerKyrFromMPerMyr(10.0) == 1.0);
    CHECK(cmPerKyrFromMmPerYr(0.01) == 1.0);
    CHECK(mmPerYrFromMPerMyr(1000.0) == 1.0);
    CHECK(mPerMyrFromMmPerYr(1.0) == 1000.0);
}

TEST_CASE("MAR and CAR quantiles from LSR quantiles and draws", "[accumulation]") {
    const std::vector<double> p = {0.025, 0.5, 0.975};
    const auto q = accumulationFromLsrQuantiles(p, std::vector<double>{1.0, 2.5, 4.0}, 0.80, 85.0);
    REQUIRE(q.size() == 3);
    CHECK_THAT(q[1].mar_g_cm2_kyr, WithinAbs(2.00, 1e-12));
    CHECK_THAT(*q[1].car_g_cm2_kyr, WithinAbs(1.70, 1e-12));
    CHECK_THAT(q[2].mar_g_cm2_kyr, WithinAbs(3.20, 1e-12));

    // Draws 0..100 cm/kyr in steps of 1: the type-7 quantiles are exactly 2.5, 50, 97.5.
    std::vector<double> draws;
    for (int i = 100; i >= 0; --i)
        draws.push_back(i);
    const auto d = accumulationFromLsrDraws(draws, p, 2.0, std::nullopt);
    CHECK_THAT(d[0].lsr_cm_per_kyr, WithinAbs(2.5, 1e-12));
    CHECK_THAT(d[1].mar_g_cm2_kyr, WithinAbs(100.0, 1e-12));
    CHECK_THAT(d[2].mar_g_cm2_kyr, WithinAbs(195.0, 1e-12));
    CHECK_FALSE(d[0].car_g_cm2_kyr.has_value());
}

TEST_CASE("accumulation rejects bad input", "[accumulation]") {
    CHECK_THROWS_WITH(massAccumulationRate_g_cm2_kyr(2.0, 0.0),
                      Catch::Contains("dry_density_g_cm3 must be > 0"));
    CHECK_THROWS_AS(massAccumulationRate_g_cm2_kyr(-1.0, 1.0), std::invalid_argument);
    CHECK_THROWS_WITH(carbonateAccumulationRate_g_cm2_kyr(1.0, 120.0),
                      Catch::Contains("caco3_pct must be in 0-100"));
    CHECK_THROWS_AS(accumulationFromLsrDraws(std::vector<double>{}, std::vector<double>{0.5}, 1.0,
                                             std::nullopt),
                    std::invalid_argument);
    CHECK_THROWS_AS(accumulationFromLsrQuantiles(std::vector<double>{0.5, 0.6},
                                                 std::vector<double>{1.0}, 1.0, std::nullopt),
                    std::invalid_argument);
}

TEST_CASE("reef accretion plausibility range", "[accumulation]") {
    // 1-10 mm/yr is common practice (checks.md); Smith & Kinsey 1976 (Science 194:937) give a
    // maximum of 3-5 mm/yr from calcification; the Holocene mean is about 5 m/kyr = 5 mm/yr
    // (Depositional Record 5(3):515, 2019), well inside.
    CHECK(reefAccretionVerdict(5.0) == ReefAccretionVerdict::InRange);
    CHECK(reefAccretionVerdict(1.0) == ReefAccretionVerdict::InRange);
    CHECK(reefAccretionVerdict(10.0) == ReefAccretionVerdict::InRange);
    CHECK(reefAccretionVerdict(0.05) == ReefAccretionVerdict::BelowRange); // 50 m/Myr long-term
    CHECK(reefAccretionVerdict(12.0) == ReefAccretionVerdict::AboveRange);
    CHECK_THROWS_AS(reefAccretionVerdict(-1.0), std::invalid_argument);
}
