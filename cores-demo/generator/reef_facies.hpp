#pragma once
// How one logged interval looks: rock, carbonate texture and the attributes that define it
// (after Dunham 1962 and Embry & Klovan 1971), the surface at its base, water-depth indicators
// and, on some intervals, physical properties.
#include "rng.hpp"
#include "true_history.hpp"

#include "atollog/engine/core_records.hpp"

namespace atollog::demo {

/// A reef texture typical of this water depth (common practice: rigid coral frame and algal
/// crusts in the shallowest metres, baffling and coarse debris below, muddier sediment deeper).
Texture drawReefTexture(double water_depth_m, DemoRng& rng);

/// Fills binding, coarse_pct, mud_supported and grains_pct so that they classify to `texture`.
void setTextureAttributes(LithInterval& interval, Texture texture, DemoRng& rng);

LithInterval describeInterval(const TrueHoleHistory& h, double top_m, double base_m,
                              DemoRng& rng);

} // namespace atollog::demo
