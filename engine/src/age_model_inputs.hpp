#pragma once
// The validated, ordered inputs of one age-model run: ties (core top first, then by bracket
// midpoint), surfaces, grid nodes, kept depths and rate intervals.
#include "atollog/engine/age_distribution.hpp"
#include "atollog/engine/age_model_settings.hpp"
#include "atollog/engine/age_tie.hpp"

#include <string>
#include <vector>

namespace atollog::detail {

struct PreparedTie {
    std::string label;
    double shallow_m = 0;
    double deep_m = 0;
    bool exact_age = false; ///< a core top with sd 0
    AgeDistribution age = AgeDistribution::normal(0.0, 1.0);
    bool is_core_top = false;
    /// An open core top (CoreTopAge::open): only a floor on the ages below; `age` is flat. It
    /// has no tail to score and adds no constraint to the acceptance rate.
    bool open_floor = false;
};

struct GridNode {
    double depth_m = 0;
    bool above_surface = false; ///< the limit from above at a surface
};

struct PreparedModel {
    std::vector<PreparedTie> ties;
    std::vector<double> surfaces_m; ///< ascending, unique
    std::vector<GridNode> nodes;    ///< ascending; at equal depth the above-surface node first
    std::vector<double> kept_m;
    std::vector<RateInterval> intervals;
    double top_m = 0;
    double base_m = 0;
};

/// Validates (see buildAgeModel) and orders the inputs.
PreparedModel prepareAgeModel(const std::string& hole, const std::vector<AgeTie>& ties,
                              const AgeModelSettings& settings,
                              const std::vector<double>& keep_draws_at_m);

} // namespace atollog::detail
