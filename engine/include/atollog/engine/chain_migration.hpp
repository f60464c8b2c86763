#pragma once
// Migration of volcanism along a hotspot chain: the basement age of each cored island against
// its distance from the active centre. A plate moving at v over a fixed melting anomaly gives
// age = intercept + distance / v, so the York et al. (2004) line of age (Ma) on distance (km)
// has slope 1/v (Myr/km) and v = 1/slope in km/Myr (= mm/yr); its sd by first-order propagation,
// sd_v = sd_slope / slope^2. The intercept is the age at the active centre (ideally about 0).
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/least_squares_line.hpp"
#include "atollog/engine/york_fit.hpp"

#include <optional>
#include <span>
#include <string>
#include <vector>

namespace atollog {

struct ChainPoint {
    std::string hole;
    double distance_km = 0;
    double distance_sd_km = 0;
    double age_ma = 0;
    double age_sd_ma = 0;
};

/// Default sd of a hole's distance along the chain. A setting, not a measurement: it stands for
/// where on the volcano's footprint (tens of km across) the hole sits relative to the vent.
constexpr double kDefaultChainDistanceSdKm = 5.0;

/// The basement age of each hole that has chain_km and a volcanic date (method ar-ar or k-ar
/// with age_ma and age_sd_ma). A date's depth is its depth_m, or the middle of its sample. The
/// basement age is the oldest such date whose depth lies in a basalt or volcaniclastic interval
/// of the hole (top_m <= depth <= base_m): the oldest lava reached is the closest to the
/// volcano's main building stage. When none lies in a logged volcanic interval (e.g. the
/// intervals were not logged), the deepest volcanic-method date of the hole is used instead.
/// Holes without chain_km or without a volcanic date are left out. Points in dataset hole order.
/// Throws std::invalid_argument when distance_sd_km is not > 0 or a chosen date's sd is not > 0.
std::vector<ChainPoint> basementAgesFromDataset(const CoreDataset& data,
                                                double distance_sd_km = kDefaultChainDistanceSdKm);

struct ChainMigration {
    YorkFit york;             ///< age_ma = intercept + slope * distance_km
    LeastSquaresLine ols;     ///< the same without errors, for comparison
    /// 1/slope; empty when the slope is not positive (ages do not increase along the chain).
    std::optional<double> rate_km_per_myr;   ///< = mm/yr
    std::optional<double> rate_sd_km_per_myr;
    std::optional<double> ols_rate_km_per_myr;
    double intercept_ma = 0;  ///< York: age at the active centre
    double intercept_sd_ma = 0;
    double mswd = 0;
    int points = 0;
    bool ages_increase_along_chain() const { return rate_km_per_myr.has_value(); }
};

/// Fits the line through >= 3 points (sds > 0). Throws std::invalid_argument on bad points.
ChainMigration chainMigration(std::span<const ChainPoint> points);

/// km/Myr -> cm/yr (1 km/Myr = 1 mm/yr = 0.1 cm/yr).
constexpr double cmPerYrFromKmPerMyr(double rate_km_per_myr) { return rate_km_per_myr / 10.0; }

} // namespace atollog
