// Migration rate along the invented Vessari chain from its basement ages, compared with the
// generator's truth: the plan sets basement age = distance / 90 km/Myr
// (kPlateSpeedKmPerMyr in cores-demo/generator/archipelago_plan.hpp; cores-demo/README.md), and
// Ar-Ar dates scatter with sd 2 %. Model-versus-truth on invented data, not a published check.
#include "archipelago_generator.hpp"
#include "archipelago_plan.hpp"

#include "atollog/engine/chain_migration.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <iostream>

using namespace atollog;
using namespace atollog::demo;

TEST_CASE("demo chain: migration rate recovers the generator's plate speed", "[demo][chain]") {
    const DemoArchipelago demo = generateArchipelago(kDemoSeed);
    const std::vector<ChainPoint> pts = basementAgesFromDataset(demo.data);
    REQUIRE(pts.size() == 4);
    for (const ChainPoint& p : pts) {
        // The basement age lies within 3 sd of the true age of the top of the basalt (the lava
        // pile below adds only 0.5 kyr per metre).
        const double true_ma = trueHistory(demo.truth, p.hole).basalt_top_age_ma;
        INFO(p.hole << ": basement " << p.age_ma << " +/- " << p.age_sd_ma << " Ma, true "
                    << true_ma);
        CHECK(std::abs(p.age_ma - true_ma) < 3 * p.age_sd_ma);
        CHECK(p.distance_sd_km == kDefaultChainDistanceSdKm);
    }
    const ChainMigration m = chainMigration(pts);
    REQUIRE(m.rate_km_per_myr);
    std::cout << "demo chain: rate " << *m.rate_km_per_myr << " +/- " << *m.rate_sd_km_per_myr
              << " mm/yr (" << cmPerYrFromKmPerMyr(*m.rate_km_per_myr) << " cm/yr), intercept "
              << m.intercept_ma << " +/- " << m.intercept_sd_ma << " Ma, MSWD " << m.mswd
              << "; OLS rate " << m.ols_rate_km_per_myr.value_or(0) << " mm/yr\n";
    CHECK(std::abs(*m.rate_km_per_myr - kPlateSpeedKmPerMyr) < 3 * *m.rate_sd_km_per_myr);
    CHECK(std::abs(m.intercept_ma) < 3 * m.intercept_sd_ma); // the active centre is age 0
    CHECK(std::isfinite(m.mswd));
    CHECK(m.york.degrees_of_freedom == 2);
}
