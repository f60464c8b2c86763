// Decompaction checks against the porosity-depth law of Sclater & Christie (1980, JGR 85:3711)
// with the parameters tabulated in Wangen 2010 (Physical Principles of Sedimentary Basin
// Analysis, Table 2.1), via /work/shared/checks.md "Subsidence and compaction".
#include "atollog/engine/decompaction.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

TEST_CASE("built-in porosity laws are Wangen 2010 Table 2.1 and have no limestone", "[decompaction]") {
    // Wangen 2010, Table 2.1 [P]: phi0 and 1/c.
    CHECK(builtInPorosityLaw("shale") == PorosityLaw{0.63, 1960.0});
    CHECK(builtInPorosityLaw("sandstone") == PorosityLaw{0.49, 3703.0});
    CHECK(builtInPorosityLaw("chalk") == PorosityLaw{0.70, 1408.0});
    CHECK(builtInPorosityLaw("shaly_sandstone") == PorosityLaw{0.56, 2464.0});
    // No published limestone pair was found (checks.md): the user must set one.
    CHECK_THROWS_WITH(builtInPorosityLaw("limestone"),
                      Catch::Contains("no built-in porosity law for rock 'limestone'"));
}

TEST_CASE("shale 2000-2500 m restored to the surface is 823.3 m thick", "[decompaction]") {
    // checks.md [F]: solid-thickness conservation (Sclater & Christie 1980) with Wangen's shale.
    const DecompactedLayer l = decompactLayer(2000.0, 2500.0, 0.0, builtInPorosityLaw("shale"));
    CHECK(l.top_m == 0.0);
    CHECK_THAT(l.thickness_m(), WithinAbs(823.3, 0.05)); // m
    // The solids are conserved to well below a millimetre.
    const PorosityLaw shale = builtInPorosityLaw("shale");
    CHECK_THAT(solidThicknessM(shale, l.top_m, l.base_m),
               WithinAbs(solidThicknessM(shale, 2000.0, 2500.0), 1e-6)); // m
}

TEST_CASE("decompaction round trip and identities", "[decompaction]") {
    const PorosityLaw chalk = builtInPorosityLaw("chalk");
    SECTION("a layer restored to its own position is unchanged") {
        const DecompactedLayer l = decompactLayer(0.0, 12.5, 0.0, chalk);
        CHECK_THAT(l.base_m, WithinAbs(12.5, 1e-9));
    }
    SECTION("phi0 = 0: nothing to compact, thickness unchanged at any depth") {
        const DecompactedLayer l = decompactLayer(800.0, 850.0, 0.0, PorosityLaw{0.0, 1000.0});
        CHECK_THAT(l.thickness_m(), WithinAbs(50.0, 1e-12));
    }
    SECTION("burying and restoring returns the original layer") {
        const DecompactedLayer deep = decompactLayer(0.0, 100.0, 1500.0, chalk);
        CHECK(deep.thickness_m() < 100.0);
        const DecompactedLayer back = decompactLayer(deep.top_m, deep.base_m, 0.0, chalk);
        CHECK_THAT(back.base_m, WithinAbs(100.0, 1e-8));
    }
    SECTION("porosity at depth") {
        CHECK_THAT(porosityAt(chalk, 1408.0), WithinAbs(0.70 / std::exp(1.0), 1e-12));
    }
}

TEST_CASE("decompaction rejects bad input", "[decompaction]") {
    const PorosityLaw shale = builtInPorosityLaw("shale");
    CHECK_THROWS_AS(decompactLayer(10.0, 5.0, 0.0, shale), std::invalid_argument);
    CHECK_THROWS_AS(decompactLayer(-1.0, 5.0, 0.0, shale), std::invalid_argument);
    CHECK_THROWS_AS(decompactLayer(0.0, 5.0, -2.0, shale), std::invalid_argument);
    CHECK_THROWS_AS(decompactLayer(0.0, std::numeric_limits<double>::quiet_NaN(), 0.0, shale),
                    std::invalid_argument);
    CHECK_THROWS_WITH(decompactLayer(0.0, 5.0, 0.0, PorosityLaw{1.0, 1000.0}),
                      Catch::Contains("phi0 must be a fraction in [0, 1)"));
    CHECK_THROWS_WITH(decompactLayer(0.0, 5.0, 0.0, PorosityLaw{0.5, 0.0}),
                      Catch::Contains("decay_length_m must be > 0"));
}
