#pragma once
// The invented Vessari archipelago: four volcanic islands strung along a hotspot chain, one cored
// hole each. The plan is fixed (not drawn from the seed) so the README can describe each hole;
// the seed decides everything the drilling and the laboratory add on top of it.
#include "true_history.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog::demo {

struct IslandPlan {
    std::string island;
    std::string site;
    std::string sample_prefix; ///< sample ids are prefix + "-" + three digits, e.g. KAL1-012
    double chain_km = 0;       ///< distance from the active volcanic centre along the chain
    double lat_deg = 0;
    double lon_deg = 0;
    double collar_elev_m = 0;
    /// Near this depth one run recovers a little more than it cut (core expansion).
    std::optional<double> expanded_run_near_m;
    TrueHoleHistory history;
};

/// Textbook hotspot reasoning: a plate moving 9 cm/yr (90 km/Myr) over a fixed hotspot carries
/// each volcano away from the active centre, so basement age = distance / speed.
constexpr double kPlateSpeedKmPerMyr = 90.0;

/// The invented active volcanic centre, in open ocean far from any real island.
constexpr double kActiveCentreLatDeg = -7.80;
constexpr double kActiveCentreLonDeg = -113.40;

std::vector<IslandPlan> archipelagoPlan();

} // namespace atollog::demo
