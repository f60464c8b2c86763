#pragma once
// Decompaction of a buried layer: porosity falls exponentially with burial depth,
// phi(z) = phi0 * exp(-z / decay_length_m) (Sclater & Christie 1980, JGR 85:3711), and the
// thickness of solid grains in a layer is conserved while it is buried or exhumed. Restoring a
// layer to a shallower depth therefore makes it thicker again.
#include <string_view>
#include <vector>

namespace atollog {

/// Parameters of the exponential porosity-depth law for one rock type.
struct PorosityLaw {
    double phi0 = 0;            ///< porosity at the surface, fraction in [0, 1)
    double decay_length_m = 0;  ///< 1/c: depth over which porosity falls by a factor e, > 0
    bool operator==(const PorosityLaw&) const = default;
};

/// A named set of parameters (a built-in preset or a user setting).
struct NamedPorosityLaw {
    std::string_view rock;
    PorosityLaw law;
};

/// The built-in presets, from Wangen 2010, Physical Principles of Sedimentary Basin Analysis,
/// Table 2.1: shale, sandstone, chalk, shaly_sandstone. There is deliberately no limestone
/// preset: no published limestone pair was found, so the user must set one.
const std::vector<NamedPorosityLaw>& builtInPorosityLaws();

/// The preset named `rock` (names as in builtInPorosityLaws). Throws std::invalid_argument
/// naming the available presets when there is none (including "limestone").
PorosityLaw builtInPorosityLaw(std::string_view rock);

/// Throws std::invalid_argument unless 0 <= phi0 < 1 and decay_length_m > 0, both finite.
void validatePorosityLaw(const PorosityLaw& law);

/// Porosity (fraction) at burial depth depth_m >= 0.
double porosityAt(const PorosityLaw& law, double depth_m);

/// Thickness of solid grains (m) in a layer between top_m and base_m (0 <= top_m < base_m):
/// (base - top) - (phi0 * L) * (exp(-top/L) - exp(-base/L)).
double solidThicknessM(const PorosityLaw& law, double top_m, double base_m);

/// A layer moved to a new depth.
struct DecompactedLayer {
    double top_m = 0;
    double base_m = 0;
    double thickness_m() const { return base_m - top_m; }
};

/// Moves the layer now between top_m and base_m so that its top lies at new_top_m, keeping its
/// solid thickness (the conservation equation of Sclater & Christie 1980), and solves for the
/// new base with a bracketing root finder (TOMS 748). The root is bracketed by the two limits of
/// the porosity: the layer cannot be thinner than its solids nor thicker than its solids at the
/// surface porosity phi0. Throws std::invalid_argument on non-finite or negative depths,
/// top_m >= base_m, or an invalid law.
DecompactedLayer decompactLayer(double top_m, double base_m, double new_top_m,
                                const PorosityLaw& law);

} // namespace atollog
