#pragma once
// Age-depth model of one hole: a seeded Monte Carlo over its ties (a depth bracket and an age
// distribution each), in which age never decreases downward except by a non-negative jump at a
// logged surface, with linear interpolation between ties.
//
// Sampler: Gibbs sampling (Geman & Geman 1984; Gelfand & Smith 1990) over the joint state of
// the ties (a depth in each bracket, an age for each), with the order constraint handled as in
// Gelfand, Smith & Lee (1992, JASA 87:523): each sweep draws every tie's depth uniformly between
// its neighbours' depths (inside its bracket) and its age from its own distribution truncated to
// [age of the tie above, age of the tie below]; each sweep ends with a Metropolis move that lets
// two ties adjacent in depth swap places (depths and ages) when their brackets allow it, so
// overlapping brackets are not held in their midpoint order. Chains start from the
// medians made monotone (isotonic regression), run burn_in_sweeps, then keep one state every
// `thin` sweeps; each fixed block of 512 kept draws runs its own chain from a seed derived from
// the run seed, so any thread count gives the same result. Every kept draw has weight 1.
//
// Conflicting ties: the Gibbs draws always respect the order, so ties that disagree no longer
// make the run fail; the order pulls them together, and a conflicting tie shows up as one whose
// posterior median age lies far in the tail of its own distribution (tie_tails, ranked by
// |z|). Draws of neighbouring ties squeezed together by a conflict are strongly correlated, so
// the chain moves slowly there: treat a likely outlier's band as a warning, not an estimate.
//
// Acceptance rate (what is reported): the chance that independent draws of all ties come out in
// order, estimated with acceptance_draws importance-weighted independent draws (each tie placed
// in its bracket, ages drawn top-down truncated to at least the age above, weight = product of
// truncated masses; the mean weight). A tiny value means ties disagree. The leave-one-out
// search (outlier_ranking) reruns that estimate without each tie in turn.
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
#include "atollog/engine/work_progress.hpp"

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
    /// Share of draws in which the surface lay between two ties with a rate on each
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

/// How far a tie's posterior median age lies in the tail of its own distribution. The Gibbs
/// draws always respect the order, so a tie that conflicts with the others is pulled to where
/// they allow: its posterior median then sits far out in its own distribution.
struct TieTail {
    std::string label;
    double depth_q500_m = 0;  ///< posterior median depth
    double age_q500_ma = 0;   ///< posterior median age
    /// Normal: (median - mean) / sd. Other distributions: the standard normal quantile of
    /// cdf(median) (the same where both exist), (median - mean) / sd where cdf is 0 or 1.
    /// 0 for an exact core top. Positive: the order makes the tie older than it claims.
    double z_score = 0;
    double tail_probability = 1; ///< two-sided, erfc(|z| / sqrt 2)
    /// |z| >= 3: our own threshold, not a published one.
    bool likely_outlier = false;
};

struct AgeModel {
    std::string hole;
    std::uint64_t seed = 0;
    int draws = 0;
    std::size_t draws_used = 0;  ///< kept Gibbs draws: all of them (= draws)
    /// Kish size of the equally weighted kept draws: = draws. Not corrected for the chain's
    /// autocorrelation.
    double effective_draws = 0;
    double acceptance_rate = 0;  ///< see the header comment; may underflow to 0
    double log10_acceptance = 0; ///< log10 of it, finite
    std::vector<AgeGridRow> grid;
    std::vector<HiatusEstimate> hiatuses;         ///< one per hiatus depth, shallowest first
    std::vector<TieInfluence> outlier_ranking;    ///< largest gain first
    std::vector<TieTail> tie_tails;               ///< every tie, largest |z_score| first
    std::vector<AccretionRate> rates;             ///< consecutive ties, then rate_intervals
    std::vector<double> kept_depths_m;            ///< as asked (keep_draws_at_m)
    std::vector<std::vector<double>> kept_age_draws_ma; ///< [kept depth][draw]
    std::vector<double> draw_weights;             ///< [draw], all 1 / draws (Gibbs draws)

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
/// outside the grid, a core top age or sd not finite (sd < 0), burn_in_sweeps outside
/// 0 .. 1,000,000, thin outside 1 .. 1000, acceptance_draws outside 1 .. 10,000,000. Ties that
/// conflict do not throw: see tie_tails and outlier_ranking.
/// `progress` is told of each block of work done: a chain of the pilot and of the main pass
/// (512 kept draws each), a leave-one-out run per tie; when it returns false the model stops at
/// the next block and WorkStopped is thrown. It never changes the result.
AgeModel buildAgeModel(const std::string& hole, std::vector<AgeTie> ties,
                       const AgeModelSettings& settings,
                       const std::vector<double>& keep_draws_at_m = {},
                       const WorkProgress& progress = {});

} // namespace atollog
