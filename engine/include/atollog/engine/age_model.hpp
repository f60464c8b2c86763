#pragma once
// Age-depth model of one hole: a seeded Monte Carlo over its ties (a depth bracket and an age
// distribution each), in which age never decreases downward except by a non-negative jump at a
// logged surface, with linear interpolation between ties.
//
// Sampler (order respected by construction, weighted): each draw places every tie uniformly in
// its bracket, independently; sorts the ties by the depths drawn; then, from the top down, draws
// each tie's age from its distribution truncated to at least the age reached above it
// (quantile(F(lo) + u (1 - F(lo)))). The draw's importance weight is the product of the
// truncated masses, so the weighted draws follow the ties' distributions conditioned on order.
// A tie whose distribution lies wholly younger than the age forced on it by shallower ties gives
// a weight near 0 in every draw: the leave-one-out search names it.
//
// Acceptance rate (what is reported): the mean weight, i.e. the probability that independent
// draws of all ties come out in order; plain rejection sampling would keep that share. A tiny
// value means ties disagree; effective_draws (Kish: (sum w)^2 / sum w^2) says how many equally
// weighted draws the weighted ones are worth.
//
// Hiatus at a surface s lying between consecutive ties i (above) and i+1 (below) in a draw: the
// age just above s is extrapolated down from tie i with the rate of the segment above it, the
// age just below s up from tie i+1 with the rate of the segment below it; jump = below - above.
// When only one point lies on a side, that side borrows the other side's rate; with one point on
// each side, or when the jump comes out negative (the two lines cross), the ties are joined
// linearly and the jump is 0. Several surfaces between the same two ties cannot be told apart:
// the jump goes to the deepest and the others are "unresolved" in that draw.
#include "atollog/engine/accretion_rates.hpp"
#include "atollog/engine/age_model_settings.hpp"
#include "atollog/engine/age_tie.hpp"

#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace atollog {

struct AgeQuantiles {
    double q025_ma = 0;
    double q500_ma = 0;
    double q975_ma = 0;
    double mean_ma = 0;
};

/// One row of the model's grid. At a logged surface the grid holds two rows at the same depth:
/// first the age just above the surface (above_surface), then the age at and below it.
struct AgeGridRow {
    double depth_m = 0;
    bool above_surface = false;
    double age_q025_ma = 0;
    double age_q500_ma = 0;
    double age_q975_ma = 0;
    double age_mean_ma = 0;
};

struct HiatusEstimate {
    double depth_m = 0;
    /// Weighted share of draws in which the surface lay between two ties with a rate on each
    /// side and was the only (or deepest) surface between them: the quantiles are over those.
    double resolved_share = 0;
    std::optional<double> duration_q025_myr; ///< unset when resolved_share is 0
    std::optional<double> duration_q500_myr;
    std::optional<double> duration_q975_myr;
    double probability_positive = 0; ///< P(jump > 0) over the resolved draws
};

/// The effect of leaving one tie out: how much the acceptance rate rises.
struct TieInfluence {
    std::string label;
    double log10_acceptance_without = 0;
    double log10_gain = 0; ///< log10(acceptance without / acceptance with all ties)
    /// log10_gain >= 2 (acceptance x100 without it): our own threshold, not a published one.
    bool likely_conflict = false;
};

struct AgeModel {
    std::string hole;
    std::uint64_t seed = 0;
    int draws = 0;
    std::size_t draws_used = 0;  ///< draws with a weight above 2^-40 of the reference weight
    double effective_draws = 0;  ///< Kish effective sample size
    double acceptance_rate = 0;  ///< mean weight (see the header comment); may underflow to 0
    double log10_acceptance = 0; ///< log10 of it, finite
    std::vector<AgeGridRow> grid;
    std::vector<HiatusEstimate> hiatuses;         ///< one per hiatus depth, shallowest first
    std::vector<TieInfluence> outlier_ranking;    ///< largest gain first
    std::vector<AccretionRate> rates;             ///< consecutive ties, then rate_intervals
    std::vector<double> kept_depths_m;            ///< as asked (keep_draws_at_m)
    std::vector<std::vector<double>> kept_age_draws_ma; ///< [kept depth][draw]
    std::vector<double> draw_weights;             ///< [draw], summing to 1 (needed with the above)

    /// Quantiles at a depth, interpolated linearly between the two grid rows around it (at and
    /// below a surface: its lower row). nullopt outside the grid.
    std::optional<AgeQuantiles> ageAt(double depth_m) const;
};

/// Builds the model (see the header comment). `ties` must all belong to `hole`; the ties' age
/// distributions and brackets are used as given. keep_draws_at_m: depths inside the grid at
/// which every draw's age is kept. Throws std::invalid_argument on: an empty hole name, a tie of
/// another hole, a non-finite or negative bracket or shallow_m > deep_m, no tie (and no core
/// top), draws outside 1 .. 10,000,000, grid_step_m not finite and > 0, threads outside 1 .. 256,
/// outlier_draws < 0, a non-finite or negative hiatus depth, a kept depth or rate interval
/// outside the grid, a core top age or sd not finite (sd < 0), and when every draw has weight 0
/// (ties that cannot be put in order; the message names the leading outlier).
AgeModel buildAgeModel(const std::string& hole, std::vector<AgeTie> ties,
                       const AgeModelSettings& settings,
                       const std::vector<double>& keep_draws_at_m = {});

} // namespace atollog
