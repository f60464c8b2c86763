// Reference ocean depth against lithosphere age. Parsons & Sclater 1977 (JGR 82:803): both
// relations are printed in the paper's abstract, d = 2500 + 350 sqrt(t) for 0-70 Ma and
// d = 6400 - 3200 exp(-t/62.8) beyond 20 Ma [P: abstract read through the search tool]. Stein &
// Stein 1992 GDH1 (Nature 359:123): coefficients from memory [M] as in checks.md; the old-age
// branch agrees with a textbook's rounded form 5.65 - 2.47 exp(-t/36) km (1/36 = 0.0278), the
// square-root branch is not confirmed.
#include "atollog/engine/reference_depth_curves.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <stdexcept>

using namespace atollog;
using Catch::WithinAbs;

TEST_CASE("Parsons & Sclater 1977 depth", "[reference_depth]") {
    const auto ps = ReferenceDepthCurve::ParsonsSclater1977;
    CHECK_THAT(referenceOceanDepthM(ps, 25.0), WithinAbs(4250.0, 1e-9)); // [F] 2500 + 350 * 5
    CHECK_THAT(referenceOceanDepthM(ps, 0.0), WithinAbs(2500.0, 1e-9));
    // Beyond 70 Ma the exponential relation [F]: 6400 - 3200 exp(-100/62.8) = 5749.0 m.
    CHECK_THAT(referenceOceanDepthM(ps, 100.0), WithinAbs(5749.0, 0.05));
    // The two relations do not meet at 70 Ma: the curve steps by about 78 m there [F].
    const double step = referenceOceanDepthM(ps, 70.0) - referenceOceanDepthM(ps, 70.000001);
    CHECK_THAT(step, WithinAbs(78.0, 0.5));
}

TEST_CASE("Stein & Stein 1992 GDH1 depth", "[reference_depth]") {
    const auto gdh = ReferenceDepthCurve::SteinStein1992;
    CHECK_THAT(referenceOceanDepthM(gdh, 4.0), WithinAbs(3330.0, 1e-9)); // [F] 2600 + 365 * 2
    // [F] the branches meet within a metre at 20 Ma.
    const double young = 2600.0 + 365.0 * std::sqrt(20.0);
    CHECK_THAT(referenceOceanDepthM(gdh, 20.0), WithinAbs(young, 1.0));
    CHECK_THAT(referenceOceanDepthM(gdh, 19.9999999), WithinAbs(referenceOceanDepthM(gdh, 20.0), 1.0));
    CHECK_THAT(referenceOceanDepthM(gdh, 100.0), WithinAbs(5651.0 - 2473.0 * std::exp(-2.78), 1e-9));
}

TEST_CASE("expected thermal subsidence between two plate ages", "[reference_depth]") {
    // [F] PS77 from 25 to 64 Ma: 350 * (8 - 5) = 1050 m.
    CHECK_THAT(expectedThermalSubsidenceM(ReferenceDepthCurve::ParsonsSclater1977, 25.0, 64.0),
               WithinAbs(1050.0, 1e-9));
    CHECK_THROWS_WITH(referenceOceanDepthM(ReferenceDepthCurve::SteinStein1992, -1.0),
                      Catch::Contains("age_ma must be finite and >= 0"));
    CHECK_THROWS_AS(referenceOceanDepthM(ReferenceDepthCurve::ParsonsSclater1977, std::nan("")),
                    std::invalid_argument);
}
