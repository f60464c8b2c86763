#pragma once
// Tail scores of the ties: where each tie's posterior median age falls in its own distribution
// (TieTail, age_model.hpp).
#include "age_model_inputs.hpp"

#include "atollog/engine/age_model.hpp"

#include <vector>

namespace atollog::detail {

/// The tail score of one tie given its posterior medians.
TieTail tieTail(const PreparedTie& tie, double depth_q500_m, double age_q500_ma);

/// Sorts by |z_score|, largest first (equal: prepared order).
void rankTieTails(std::vector<TieTail>& tails);

} // namespace atollog::detail
