#include "atollog/engine/decompaction.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <cmath>
#include <cstdint>
#include <stdexcept>
#include <string>

namespace atollog {

const std::vector<NamedPorosityLaw>& builtInPorosityLaws() {
    // Wangen 2010, Physical Principles of Sedimentary Basin Analysis, Table 2.1 (phi0, 1/c).
    static const std::vector<NamedPorosityLaw> laws = {
        {"shale", {0.63, 1960.0}},
        {"sandstone", {0.49, 3703.0}},
        {"chalk", {0.70, 1408.0}},
        {"shaly_sandstone", {0.56, 2464.0}},
    };
    return laws;
}

PorosityLaw builtInPorosityLaw(std::string_view rock) {
    std::string names;
    for (const NamedPorosityLaw& n : builtInPorosityLaws()) {
        if (n.rock == rock)
            return n.law;
        names += names.empty() ? "" : ", ";
        names += n.rock;
    }
    throw std::invalid_argument("no built-in porosity law for rock '" + std::string(rock) +
                                "' (built in: " + names +
                                "); set phi0 and decay_length_m for it yourself");
}

void validatePorosityLaw(const PorosityLaw& law) {
    if (!std::isfinite(law.phi0) || law.phi0 < 0 || law.phi0 >= 1)
        throw std::invalid_argument("porosity law: phi0 must be a fraction in [0, 1), got " +
                                    std::to_string(law.phi0));
    if (!std::isfinite(law.decay_length_m) || law.decay_length_m <= 0)
        throw std::invalid_argument("porosity law: decay_length_m must be > 0, got " +
                                    std::to_string(law.decay_length_m));
}

double porosityAt(const PorosityLaw& law, double depth_m) {
    validatePorosityLaw(law);
    if (!std::isfinite(depth_m) || depth_m < 0)
        throw std::invalid_argument("porosity: depth_m must be finite and >= 0, got " +
                                    std::to_string(depth_m));
    return law.phi0 * std::exp(-depth_m / law.decay_length_m);
}

namespace {

// Pore thickness between two depths: integral of phi0 exp(-z/L) dz.
double poreThicknessM(const PorosityLaw& law, double top_m, double base_m) {
    const double L = law.decay_length_m;
    return law.phi0 * L * (std::exp(-top_m / L) - std::exp(-base_m / L));
}

void requireDepth(const char* what, double v) {
    if (!std::isfinite(v) || v < 0)
        throw std::invalid_argument(std::string("decompaction: ") + what +
                                    " must be finite and >= 0, got " + std::to_string(v));
}

} // namespace

double solidThicknessM(const PorosityLaw& law, double top_m, double base_m) {
    validatePorosityLaw(law);
    requireDepth("top_m", top_m);
    requireDepth("base_m", base_m);
    if (base_m <= top_m)
        throw std::invalid_argument("decompaction: base_m (" + std::to_string(base_m) +
                                    ") must be deeper than top_m (" + std::to_string(top_m) + ")");
    return (base_m - top_m) - poreThicknessM(law, top_m, base_m);
}

DecompactedLayer decompactLayer(double top_m, double base_m, double new_top_m,
                                const PorosityLaw& law) {
    requireDepth("new_top_m", new_top_m);
    const double solid_m = solidThicknessM(law, top_m, base_m);
    // f(new_base) = solid thickness at the new position - solid thickness now; it rises
    // strictly with new_base because porosity stays below 1.
    auto f = [&](double new_base_m) {
        return (new_base_m - new_top_m) - poreThicknessM(law, new_top_m, new_base_m) - solid_m;
    };
    // Brackets: the layer is at least its solids thick, and at most its solids at porosity phi0.
    const double lo = new_top_m + solid_m;
    const double hi = new_top_m + solid_m / (1.0 - law.phi0);
    const double f_lo = f(lo);
    const double f_hi = f(hi);
    if (f_lo >= 0)
        return {new_top_m, lo}; // phi0 = 0: no pores, nothing to restore
    if (f_hi <= 0)
        return {new_top_m, hi};
    // Solved in units of the solid thickness (same root): TOMS 748 multiplies function values
    // together, and for a layer near 1e300 m those products overflowed into a NaN base.
    auto f_scaled = [&](double new_base_m) { return f(new_base_m) / solid_m; };
    std::uintmax_t max_iter = 200;
    const auto root = boost::math::tools::toms748_solve(
        f_scaled, lo, hi, f_lo / solid_m, f_hi / solid_m,
        boost::math::tools::eps_tolerance<double>(50), max_iter);
    return {new_top_m, 0.5 * (root.first + root.second)};
}

} // namespace atollog
