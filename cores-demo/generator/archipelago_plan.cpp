#include "archipelago_plan.hpp"

#include "rounding.hpp"

#include <cmath>
#include <numbers>

namespace atollog::demo {
namespace {

// The chain runs west-north-west from the active centre (azimuth 290 degrees), the way the plate
// carries the volcanoes away; 1 degree of latitude is about 110.6 km.
void placeAlongChain(IslandPlan& p) {
    const double azimuth_rad = 290.0 * std::numbers::pi / 180.0;
    const double north_km = p.chain_km * std::cos(azimuth_rad);
    const double east_km = p.chain_km * std::sin(azimuth_rad);
    const double km_per_deg_lat = 110.57;
    const double km_per_deg_lon = 111.32 * std::cos(kActiveCentreLatDeg * std::numbers::pi / 180.0);
    p.lat_deg = roundDp(kActiveCentreLatDeg + north_km / km_per_deg_lat, 3);
    p.lon_deg = roundDp(kActiveCentreLonDeg + east_km / km_per_deg_lon, 3);
}

TrueSegment segment(double top_m, double base_m, double age_top_ma, double age_base_ma,
                    double water_top_m, double water_base_m) {
    return {top_m, base_m, age_top_ma, age_base_ma, water_top_m, water_base_m};
}

IslandPlan island(std::string name, std::string site, std::string hole, double chain_km,
                  double collar_elev_m, std::vector<TrueSegment> segments, double total_depth_m) {
    IslandPlan p;
    p.island = std::move(name);
    p.site = std::move(site);
    p.sample_prefix = hole;
    p.chain_km = chain_km;
    p.collar_elev_m = collar_elev_m;
    placeAlongChain(p);
    p.history.hole = std::move(hole);
    p.history.basalt_top_m = segments.back().base_m;
    p.history.total_depth_m = total_depth_m;
    p.history.basalt_top_age_ma = roundDp(chain_km / kPlateSpeedKmPerMyr, 3);
    p.history.reef_segments = std::move(segments);
    return p;
}

} // namespace

// Every hole starts with a fast Holocene reef (about 1 m/kyr) over an exposure surface that
// stands for the last glacial lowstand, then older Pleistocene and Pliocene packages at tens of
// metres per Myr separated by further exposure surfaces; each package shallows upward. Reef caps
// thicken and their bases get older away from the active centre.
std::vector<IslandPlan> archipelagoPlan() {
    std::vector<IslandPlan> plan;

    plan.push_back(island("Kalvessa", "Kalvessa north reef flat", "KAL1", 40, 2.4,
                          {segment(0.0, 6.5, 0.0008, 0.0075, 1, 9),
                           segment(6.5, 19.0, 0.118, 0.205, 2, 14),
                           segment(19.0, 34.0, 0.235, 0.380, 3, 22)},
                          38.0));

    plan.push_back(island("Tormundi", "Tormundi lagoon rim", "TOR1", 130, 3.1,
                          {segment(0.0, 8.2, 0.0006, 0.0082, 1, 10),
                           segment(8.2, 31.0, 0.121, 0.430, 2, 18),
                           segment(31.0, 72.0, 0.620, 1.320, 4, 30)},
                          77.0));
    plan.back().expanded_run_near_m = 40.0;

    plan.push_back(island("Ossiraku", "Ossiraku windward islet", "OSS1", 260, 3.8,
                          {segment(0.0, 5.4, 0.0010, 0.0070, 1, 7),
                           segment(5.4, 40.0, 0.125, 0.800, 2, 20),
                           segment(40.0, 108.0, 1.150, 2.700, 3, 35)},
                          113.0));
    plan.back().history.hardground_depths_m = {71.3};

    plan.push_back(island("Pelvanoa", "Pelvanoa atoll rim", "PEL1", 420, 3.4,
                          {segment(0.0, 4.1, 0.0012, 0.0065, 1, 6),
                           segment(4.1, 36.0, 0.128, 0.950, 2, 16),
                           segment(36.0, 92.0, 1.600, 2.900, 3, 28),
                           segment(92.0, 146.0, 3.300, 4.350, 4, 40)},
                          152.0));
    plan.back().history.hardground_depths_m = {63.7, 118.4};

    return plan;
}

} // namespace atollog::demo
