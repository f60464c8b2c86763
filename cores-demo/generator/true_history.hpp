#pragma once
// The true depositional history of one hole: what the demo pretends really happened, against
// which models built from the generated data are judged.
#include <optional>
#include <string>
#include <vector>

namespace atollog::demo {

/// A stretch of reef laid down without a break: age and water depth vary linearly with depth.
struct TrueSegment {
    double top_m = 0;
    double base_m = 0;
    double age_top_ma = 0;
    double age_base_ma = 0;
    double water_depth_top_m = 0;  ///< water depth when the top of the segment grew
    double water_depth_base_m = 0; ///< deeper at the base: each package shallows upward
};

struct TrueHoleHistory {
    std::string hole;
    std::vector<TrueSegment> reef_segments; ///< contiguous in depth, from 0 to basalt_top_m
    double basalt_top_m = 0;
    double total_depth_m = 0;
    double basalt_top_age_ma = 0;
    std::vector<double> hardground_depths_m; ///< submarine surfaces with no measurable gap
};

/// Lava flows pile up fast compared with a reef: 0.5 kyr per metre keeps basalt ages increasing
/// downward without pretending to resolve them.
constexpr double kLavaPileMaPerM = 0.0005;

/// True age at a depth. At a hiatus depth the age is that of the rock just below the surface.
double trueAgeMa(const TrueHoleHistory& h, double depth_m);
/// True water depth at deposition; nullopt in the basalt.
std::optional<double> trueWaterDepthM(const TrueHoleHistory& h, double depth_m);
/// The depth in the reef cap where rock of this age lies; nullopt when that time is missing in a
/// hiatus, is younger than the top of the hole or older than the base of the reef cap.
std::optional<double> trueDepthOfAgeM(const TrueHoleHistory& h, double age_ma);

} // namespace atollog::demo
