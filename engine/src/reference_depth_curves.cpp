#include "atollog/engine/reference_depth_curves.hpp"

#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog {
namespace {

double parsonsSclater1977M(double t) {
    if (t <= 70.0)
        return 2500.0 + 350.0 * std::sqrt(t);
    return 6400.0 - 3200.0 * std::exp(-t / 62.8);
}

double steinStein1992M(double t) {
    if (t < 20.0)
        return 2600.0 + 365.0 * std::sqrt(t);
    return 5651.0 - 2473.0 * std::exp(-0.0278 * t);
}

} // namespace

double referenceOceanDepthM(ReferenceDepthCurve curve, double age_ma) {
    if (!std::isfinite(age_ma) || age_ma < 0)
        throw std::invalid_argument("reference ocean depth: lithosphere age_ma must be finite and "
                                    ">= 0, got " + std::to_string(age_ma));
    switch (curve) {
    case ReferenceDepthCurve::ParsonsSclater1977: return parsonsSclater1977M(age_ma);
    case ReferenceDepthCurve::SteinStein1992: return steinStein1992M(age_ma);
    }
    throw std::invalid_argument("reference ocean depth: unknown curve");
}

double expectedThermalSubsidenceM(ReferenceDepthCurve curve, double age1_ma, double age2_ma) {
    return referenceOceanDepthM(curve, age2_ma) - referenceOceanDepthM(curve, age1_ma);
}

} // namespace atollog
