#include "atollog/engine/accumulation.hpp"

#include "draw_statistics.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog {

double massAccumulationRate_g_cm2_kyr(double lsr_cm_per_kyr, double dry_density_g_cm3) {
    if (!std::isfinite(lsr_cm_per_kyr) || lsr_cm_per_kyr < 0)
        throw std::invalid_argument("mass accumulation rate: lsr_cm_per_kyr must be finite and "
                                    ">= 0, got " + std::to_string(lsr_cm_per_kyr));
    if (!std::isfinite(dry_density_g_cm3) || dry_density_g_cm3 <= 0)
        throw std::invalid_argument("mass accumulation rate: dry_density_g_cm3 must be > 0, got " +
                                    std::to_string(dry_density_g_cm3));
    // cm/kyr x g/cm3 = g/cm2/kyr.
    const double mar = lsr_cm_per_kyr * dry_density_g_cm3;
    // Two finite factors whose product overflows (1e300 x 1e300): refused rather than inf.
    if (!std::isfinite(mar))
        throw std::invalid_argument("mass accumulation rate: lsr_cm_per_kyr " +
                                    std::to_string(lsr_cm_per_kyr) + " x dry_density_g_cm3 " +
                                    std::to_string(dry_density_g_cm3) +
                                    " overflows; check both values and their units");
    return mar;
}

double carbonateAccumulationRate_g_cm2_kyr(double mar_g_cm2_kyr, double caco3_pct) {
    if (!std::isfinite(mar_g_cm2_kyr) || mar_g_cm2_kyr < 0)
        throw std::invalid_argument("carbonate accumulation rate: mar_g_cm2_kyr must be finite "
                                    "and >= 0, got " + std::to_string(mar_g_cm2_kyr));
    if (!std::isfinite(caco3_pct) || caco3_pct < 0 || caco3_pct > 100)
        throw std::invalid_argument("carbonate accumulation rate: caco3_pct must be in 0-100, "
                                    "got " + std::to_string(caco3_pct));
    return mar_g_cm2_kyr * caco3_pct / 100.0;
}

std::vector<AccumulationQuantile>
accumulationFromLsrQuantiles(std::span<const double> probabilities,
                             std::span<const double> lsr_quantiles_cm_per_kyr,
                             double dry_density_g_cm3, std::optional<double> caco3_pct) {
    if (probabilities.size() != lsr_quantiles_cm_per_kyr.size())
        throw std::invalid_argument("accumulation quantiles: " +
                                    std::to_string(probabilities.size()) + " probabilities for " +
                                    std::to_string(lsr_quantiles_cm_per_kyr.size()) +
                                    " LSR quantiles");
    std::vector<AccumulationQuantile> out;
    for (std::size_t i = 0; i < probabilities.size(); ++i) {
        const double p = probabilities[i];
        if (!std::isfinite(p) || p < 0 || p > 1)
            throw std::invalid_argument("accumulation quantiles: probability must be in [0, 1], "
                                        "got " + std::to_string(p));
        AccumulationQuantile q;
        q.probability = p;
        q.lsr_cm_per_kyr = lsr_quantiles_cm_per_kyr[i];
        q.mar_g_cm2_kyr = massAccumulationRate_g_cm2_kyr(q.lsr_cm_per_kyr, dry_density_g_cm3);
        if (caco3_pct)
            q.car_g_cm2_kyr = carbonateAccumulationRate_g_cm2_kyr(q.mar_g_cm2_kyr, *caco3_pct);
        out.push_back(q);
    }
    return out;
}

std::vector<AccumulationQuantile>
accumulationFromLsrDraws(std::span<const double> lsr_draws_cm_per_kyr,
                         std::span<const double> probabilities, double dry_density_g_cm3,
                         std::optional<double> caco3_pct) {
    if (lsr_draws_cm_per_kyr.empty())
        throw std::invalid_argument("accumulation quantiles: no LSR draws");
    std::vector<double> sorted(lsr_draws_cm_per_kyr.begin(), lsr_draws_cm_per_kyr.end());
    for (double v : sorted)
        if (!std::isfinite(v))
            throw std::invalid_argument("accumulation quantiles: a non-finite LSR draw");
    std::sort(sorted.begin(), sorted.end());
    std::vector<double> lsr_q;
    for (double p : probabilities) {
        if (!std::isfinite(p) || p < 0 || p > 1)
            throw std::invalid_argument("accumulation quantiles: probability must be in [0, 1], "
                                        "got " + std::to_string(p));
        lsr_q.push_back(draw_stats::quantileOfSorted(sorted, p));
    }
    return accumulationFromLsrQuantiles(probabilities, lsr_q, dry_density_g_cm3, caco3_pct);
}

} // namespace atollog
