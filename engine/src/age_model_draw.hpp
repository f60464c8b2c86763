#pragma once
// One draw of the ties: depths uniform in their brackets, then ages from the top down, each
// truncated to at least the age above it, with the log of the product of truncated masses. The
// model's draws come from the Gibbs sampler (age_model_gibbs.hpp), which reuses TieDraw as its
// state; these independent weighted draws estimate the acceptance rate and rank outliers.
#include "age_model_inputs.hpp"

#include <random>
#include <vector>

namespace atollog::detail {

struct TieDraw {
    std::vector<double> depth_m;  ///< by prepared tie index
    std::vector<double> age_ma;   ///< by prepared tie index
    std::vector<int> depth_order; ///< prepared indices, shallowest drawn depth first
    double log_weight = 0;        ///< may be -infinity (a tie that cannot be placed in order)
    /// One uniform in (0, 1) per surface, drawn afresh for every kept draw from a stream of its
    /// own: how the time between two ties is shared out when several surfaces lie between them
    /// (AgeProfile::build). Empty: every share at its middle (0.5).
    std::vector<double> split_u;
};

/// Draws every tie of `ties` except `skip` (-1: none); consumes one uniform per bracket of
/// positive width (in tie order), then one per tie with an age distribution (in depth order).
void drawTies(const std::vector<PreparedTie>& ties, std::mt19937_64& rng, TieDraw& out,
              int skip = -1);

} // namespace atollog::detail
