#pragma once
// Leave-one-out search for ties that conflict with the others.
#include "age_model_inputs.hpp"
#include "progress_counter.hpp"

#include "atollog/engine/age_model.hpp"

#include <cstdint>
#include <vector>

namespace atollog::detail {

/// log10 of the mean weight of `draws` draws (stream Outliers of `seed`) with tie `skip` left
/// out (-1: none); at least -1e9 (no draw in order at all).
double log10MeanWeight(const std::vector<PreparedTie>& ties, int skip, int draws,
                       std::uint64_t seed);

/// How many leave-one-out runs rankTieInfluence makes: one per tie but the core top.
std::size_t outlierRuns(const std::vector<PreparedTie>& ties);

/// Every tie but the core top, by how much leaving it out raises the acceptance rate, largest
/// first (equal gains: input order). All runs share the same seed (common random numbers), so
/// differences between ties are not noise between streams. `progress` (may be null) advances
/// once per run.
std::vector<TieInfluence> rankTieInfluence(const std::vector<PreparedTie>& ties, int draws,
                                           std::uint64_t seed, int threads,
                                           ProgressCounter* progress = nullptr);

} // namespace atollog::detail
