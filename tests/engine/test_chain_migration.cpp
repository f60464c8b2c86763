// Migration of volcanism along a chain: age = intercept + distance / v, fitted with York et al.
// (2004). Hand cases only; the demo archipelago is checked in tests/cli/test_demo_chain.cpp.
#include "atollog/engine/chain_migration.hpp"

#include <catch2/catch.hpp>

#include <stdexcept>
#include <vector>

using namespace atollog;
using Catch::WithinAbs;

TEST_CASE("a chain aged exactly distance / 80 km/Myr gives 80 mm/yr", "[chain]") {
    std::vector<ChainPoint> pts;
    for (double km : {50.0, 150.0, 300.0, 500.0})
        pts.push_back({"h", km, 5.0, 0.2 + km / 80.0, 0.05});
    const ChainMigration m = chainMigration(pts);
    REQUIRE(m.rate_km_per_myr);
    CHECK_THAT(*m.rate_km_per_myr, WithinAbs(80.0, 1e-9));       // km/Myr = mm/yr
    CHECK_THAT(cmPerYrFromKmPerMyr(*m.rate_km_per_myr), WithinAbs(8.0, 1e-10));
    CHECK_THAT(m.intercept_ma, WithinAbs(0.2, 1e-12));
    CHECK_THAT(m.mswd, WithinAbs(0.0, 1e-18));
    // sd_v = sd_b / b^2 (first-order propagation).
    CHECK_THAT(*m.rate_sd_km_per_myr,
               WithinAbs(m.york.slope_sd / (m.york.slope * m.york.slope), 1e-12));
    REQUIRE(m.ols_rate_km_per_myr);
    CHECK_THAT(*m.ols_rate_km_per_myr, WithinAbs(80.0, 1e-9));
}

TEST_CASE("ages that fall along the chain give no rate", "[chain]") {
    std::vector<ChainPoint> pts = {{"a", 10, 5, 3.0, 0.1}, {"b", 100, 5, 2.0, 0.1},
                                   {"c", 200, 5, 1.0, 0.1}};
    const ChainMigration m = chainMigration(pts);
    CHECK_FALSE(m.ages_increase_along_chain());
    CHECK_FALSE(m.rate_sd_km_per_myr.has_value());
}

TEST_CASE("basement ages from a dataset", "[chain]") {
    CoreDataset d;
    auto hole = [&](const char* id, std::optional<double> km) {
        Hole h;
        h.hole = id;
        h.chain_km = km;
        d.holes.push_back(h);
    };
    hole("A1", 40.0);
    hole("B1", 120.0);
    hole("C1", std::nullopt); // no chain position: left out
    LithInterval basalt;
    basalt.hole = "A1";
    basalt.top_m = 30;
    basalt.base_m = 40;
    basalt.rock = Rock::Basalt;
    d.intervals.push_back(basalt);
    auto sample = [&](const char* h, const char* id, double top_m) {
        Sample s;
        s.hole = h;
        s.sample = id;
        s.top_m = s.base_m = top_m;
        d.samples.push_back(s);
    };
    sample("A1", "A1-1", 32.0);
    sample("A1", "A1-2", 36.0);
    auto date = [&](const char* h, std::optional<std::string> s, std::optional<double> depth,
                    DateMethod m, double age, double sd) {
        NumericalDate n;
        n.hole = h;
        n.sample = s;
        n.depth_m = depth;
        n.method = m;
        n.age_ma = age;
        n.age_sd_ma = sd;
        d.dates.push_back(n);
    };
    date("A1", "A1-1", std::nullopt, DateMethod::ArAr, 0.52, 0.01);
    date("A1", "A1-2", std::nullopt, DateMethod::ArAr, 0.50, 0.01); // deeper, but younger
    date("A1", std::nullopt, 20.0, DateMethod::KAr, 0.90, 0.05);    // in no volcanic interval
    date("A1", std::nullopt, 39.0, DateMethod::UTh, 3.0, 0.1);      // not a volcanic method
    // B1 has no logged volcanic interval: its deepest volcanic date is used.
    date("B1", std::nullopt, 70.0, DateMethod::KAr, 1.50, 0.04);
    date("B1", std::nullopt, 75.0, DateMethod::ArAr, 1.45, 0.03);
    date("C1", std::nullopt, 10.0, DateMethod::ArAr, 9.0, 0.1);

    const std::vector<ChainPoint> pts = basementAgesFromDataset(d, 7.5);
    REQUIRE(pts.size() == 2);
    CHECK(pts[0].hole == "A1");
    CHECK(pts[0].age_ma == 0.52); // oldest date inside the basalt
    CHECK(pts[0].distance_km == 40.0);
    CHECK(pts[0].distance_sd_km == 7.5);
    CHECK(pts[1].hole == "B1");
    CHECK(pts[1].age_ma == 1.45); // deepest volcanic-method date
    CHECK(pts[1].age_sd_ma == 0.03);
    CHECK_THROWS_WITH(basementAgesFromDataset(d, 0.0), Catch::Contains("distance_sd_km must be > 0"));
}
