#include "reef_facies.hpp"

#include "rounding.hpp"

#include <algorithm>
#include <cmath>

namespace atollog::demo {
namespace {

bool near(double a, double b) { return std::abs(a - b) < 1e-9; }

Surface surfaceAtBase(const TrueHoleHistory& h, double base_m) {
    for (std::size_t i = 1; i < h.reef_segments.size(); ++i)
        if (near(base_m, h.reef_segments[i].top_m)) return Surface::Exposure;
    for (double d : h.hardground_depths_m)
        if (near(base_m, d)) return Surface::Hardground;
    // The reef grew on an eroded volcanic surface.
    if (near(base_m, h.basalt_top_m)) return Surface::Erosion;
    return Surface::None;
}

std::string textureNote(Texture t) {
    switch (t) {
    case Texture::Framestone: return "massive and branching coral heads in growth position";
    case Texture::Bindstone: return "laminar coralline algal crusts";
    case Texture::Bafflestone: return "delicate branching corals with trapped sediment";
    case Texture::Rudstone: return "coral rubble, grain supported";
    case Texture::Floatstone: return "coral fragments in a muddy matrix";
    case Texture::Grainstone: return "well sorted skeletal sand";
    case Texture::Packstone: return "foraminiferal packstone";
    case Texture::Wackestone: return "bioturbated skeletal wackestone";
    default: return "";
    }
}

/// Porosity from grain density 2.71 g/cm3 (calcite) so density and porosity agree.
void setPhysicalProperties(LithInterval& iv, double grain_density_g_cm3, double lo_g_cm3,
                           double hi_g_cm3, DemoRng& rng) {
    const double density = roundDp(rng.uniform(lo_g_cm3, hi_g_cm3), 2);
    iv.dry_density_g_cm3 = density;
    iv.porosity_pct = roundDp((1.0 - density / grain_density_g_cm3) * 100.0, 1);
}

} // namespace

Texture drawReefTexture(double water_depth_m, DemoRng& rng) {
    const double u = rng.uniform01();
    if (water_depth_m < 4) {
        if (u < 0.40) return Texture::Framestone;
        if (u < 0.60) return Texture::Bindstone;
        if (u < 0.80) return Texture::Rudstone;
        return Texture::Grainstone;
    }
    if (water_depth_m < 12) {
        if (u < 0.35) return Texture::Framestone;
        if (u < 0.55) return Texture::Rudstone;
        if (u < 0.75) return Texture::Floatstone;
        if (u < 0.90) return Texture::Grainstone;
        return Texture::Bafflestone;
    }
    if (water_depth_m < 25) {
        if (u < 0.30) return Texture::Bafflestone;
        if (u < 0.60) return Texture::Floatstone;
        if (u < 0.85) return Texture::Packstone;
        return Texture::Framestone;
    }
    if (u < 0.45) return Texture::Packstone;
    if (u < 0.85) return Texture::Wackestone;
    return Texture::Floatstone;
}

void setTextureAttributes(LithInterval& iv, Texture texture, DemoRng& rng) {
    iv.texture = texture;
    const auto pct = [&](double lo, double hi) { return roundDp(rng.uniform(lo, hi), 0); };
    switch (texture) {
    case Texture::Framestone: iv.binding = Binding::Frame; iv.coarse_pct = pct(40, 80); break;
    case Texture::Bindstone: iv.binding = Binding::Bind; iv.coarse_pct = pct(15, 50); break;
    case Texture::Bafflestone: iv.binding = Binding::Baffle; iv.coarse_pct = pct(20, 50); break;
    case Texture::Floatstone:
        iv.binding = Binding::None; iv.coarse_pct = pct(15, 45);
        iv.mud_supported = true; iv.grains_pct = pct(25, 55); break;
    case Texture::Rudstone:
        iv.binding = Binding::None; iv.coarse_pct = pct(20, 60);
        iv.mud_supported = false; iv.grains_pct = pct(65, 90); break;
    case Texture::Grainstone:
        iv.binding = Binding::None; iv.coarse_pct = pct(0, 8);
        iv.mud_supported = false; iv.grains_pct = pct(85, 95); break;
    case Texture::Packstone:
        iv.binding = Binding::None; iv.coarse_pct = pct(0, 8);
        iv.mud_supported = false; iv.grains_pct = pct(55, 75); break;
    case Texture::Wackestone:
        iv.binding = Binding::None; iv.coarse_pct = pct(0, 8);
        iv.mud_supported = true; iv.grains_pct = pct(15, 45); break;
    default: break;
    }
}

LithInterval describeInterval(const TrueHoleHistory& h, double top_m, double base_m,
                              DemoRng& rng) {
    LithInterval iv;
    iv.hole = h.hole;
    iv.top_m = top_m;
    iv.base_m = base_m;
    iv.base_surface = surfaceAtBase(h, base_m);
    const double mid_m = 0.5 * (top_m + base_m);
    if (mid_m >= h.basalt_top_m) {
        iv.rock = Rock::Basalt;
        iv.notes = rng.chance(0.5) ? "olivine basalt, vesicular" : "basalt, weathered joints";
        if (rng.chance(0.5)) setPhysicalProperties(iv, 3.0, 2.55, 2.85, rng);
        return iv;
    }
    const double water_m = *trueWaterDepthM(h, mid_m);
    iv.rock = Rock::Limestone;
    setTextureAttributes(iv, drawReefTexture(water_m, rng), rng);
    if (rng.chance(0.4)) iv.notes = textureNote(*iv.texture);
    if (iv.base_surface == Surface::Exposure)
        iv.notes = "rests on a red-stained, root-etched exposure surface with caliche";
    if (iv.base_surface == Surface::Hardground) iv.notes = "rests on a bored, iron-stained hardground";
    // Depth indicators (coral growth forms, algae, foram assemblages) bracket the true depth.
    if (rng.chance(0.65)) {
        iv.paleodepth_min_m = std::max(0.0, floorDp(water_m - rng.uniform(1, 6), 0));
        iv.paleodepth_max_m = ceilDp(water_m + rng.uniform(2, 10), 0);
    }
    if (rng.chance(0.35)) {
        setPhysicalProperties(iv, 2.71, 1.70, 2.50, rng);
        iv.caco3_pct = roundDp(rng.uniform(93.0, 99.5), 1);
    }
    return iv;
}

} // namespace atollog::demo
