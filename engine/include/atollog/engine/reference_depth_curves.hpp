#pragma once
// Reference ocean depth (m below sea level, positive down) against lithosphere age (Ma): the
// empirical curves that put a volcano's thermal subsidence in context.
//
// Parsons & Sclater 1977 (JGR 82:803): d = 2500 + 350 sqrt(t) for 0 <= t <= 70 Ma, and for sea
// floor older than 20 Ma d = 6400 - 3200 exp(-t / 62.8). We use the square-root relation up to
// 70 Ma and the exponential beyond; the two relations differ by about 78 m at 70 Ma, so the
// curve steps there (the paper gives both for the overlap and no rule for joining them).
// Both relations and their ranges are printed in the paper's abstract.
//
// Stein & Stein 1992 GDH1 (Nature 359:123): d = 2600 + 365 sqrt(t) for t < 20 Ma and
// d = 5651 - 2473 exp(-0.0278 t) from 20 Ma; the branches meet within a metre at 20 Ma.
// Coefficients from memory: a textbook's rounded 5.65 - 2.47 exp(-t/36) km agrees with the old
// branch; the young branch is unconfirmed.

namespace atollog {

enum class ReferenceDepthCurve { ParsonsSclater1977, SteinStein1992 };

/// Depth (m) at lithosphere age age_ma (>= 0, finite; otherwise std::invalid_argument).
double referenceOceanDepthM(ReferenceDepthCurve curve, double age_ma);

/// Expected thermal subsidence (m) of the sea floor between plate ages age1_ma and age2_ma:
/// d(age2) - d(age1); positive when age2 > age1.
double expectedThermalSubsidenceM(ReferenceDepthCurve curve, double age1_ma, double age2_ma);

} // namespace atollog
