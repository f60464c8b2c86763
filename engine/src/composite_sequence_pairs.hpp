#pragma once
// The pair cost of the composite sequence's misfit (composite_sequence.hpp states the rule):
// what it costs, in one hole, to place one observed event before another, and the matrix of
// those costs summed over holes that the annealer reads.
#include "atollog/engine/composite_sequence.hpp"

#include <cstddef>
#include <vector>

namespace atollog::detail {

/// One event as observed in one hole, with the counts of the hole's sampled levels that a misfit
/// in levels needs, found once so that a pair costs O(1).
struct HoleObservation {
    std::size_t event = 0;
    SequenceEventKind kind = SequenceEventKind::Base;
    double shallow_m = 0, deep_m = 0;
    std::size_t levels_above_shallow = 0; ///< sampled levels < shallow_m
    std::size_t levels_to_deep = 0;       ///< sampled levels <= deep_m
};

/// Per hole, the events observed there (in the order of data.levels). Expects valid data.
std::vector<std::vector<HoleObservation>> observationsByHole(const CorrelationData& data);

/// The cost in one hole of placing `older` before `younger`: zero unless older's bracket lies
/// wholly above younger's; then the unit cost, times kInfeasiblePairPenalty when neither a
/// base `older` may move down nor a top `younger` up.
double orderedPairCost(const HoleObservation& older, const HoleObservation& younger,
                       MisfitUnit unit);

/// The misfit of an order from the observations: the full recompute. `rank[e]` is event e's
/// position in the order.
double misfitFromObservations(const std::vector<std::vector<HoleObservation>>& holes,
                              const std::vector<std::size_t>& rank, MisfitUnit unit);

/// C[a * n + b] = the cost summed over holes of placing event a before event b (n = events).
/// Row-major doubles: 1,000 events take 8 MB.
std::vector<double> pairCostMatrix(const CorrelationData& data, MisfitUnit unit);

/// sum over i < j of C[order[i] * n + order[j]]: the misfit of an order read from the matrix.
double misfitFromMatrix(const std::vector<double>& cost, const std::vector<std::size_t>& order);

} // namespace atollog::detail
