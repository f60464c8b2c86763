// The chain figure: basement ages against distance with the migration fit.
#include "cli/figure_inputs.hpp"

namespace atollog::cli {

draw::ChainPlotInput chainPlotInput(const std::vector<ChainPoint>& points,
                                    const ChainMigration& fit) {
    draw::ChainPlotInput plot;
    plot.note = "basement: the oldest Ar-Ar or K-Ar date in a volcanic interval of each "
                "hole; bars: 95 % (1.96 sd)";
    for (const auto& p : points)
        plot.points.push_back({p.hole, p.distance_km, p.distance_sd_km, p.age_ma, p.age_sd_ma});
    if (fit.rate_km_per_myr && fit.rate_sd_km_per_myr)
        plot.fit = draw::ChainPlotFit{fit.intercept_ma, fit.york.slope, *fit.rate_km_per_myr,
                                      *fit.rate_sd_km_per_myr, "York fit"};
    return plot;
}

} // namespace atollog::cli
