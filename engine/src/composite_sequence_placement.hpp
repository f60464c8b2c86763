#pragma once
// Exact range extensions for one hole and one order: where the order puts the hole's events.
#include "atollog/engine/composite_sequence.hpp"

#include <vector>

namespace atollog::detail {

struct PlacementInput {
    SequenceEventKind kind = SequenceEventKind::Base;
    double observed_m = 0;
};

/// Places a hole's events, given oldest first (in composite order), at depths that never get
/// shallower with age (placed[i] >= placed[i + 1]), minimising the summed distance moved, where
/// a base moving down, or a top moving up, costs 1 per metre, and any other move (a base up, a
/// top down, a dated horizon at all) kInfeasiblePairPenalty per metre, so that a hole that
/// cannot follow the order still gets a placement. Each cost is convex and piecewise linear with
/// one kink at the observed level, so pool-adjacent-violators is exact: a pooled block sits at
/// its weighted median (the lowest minimiser of its summed cost, so ties go the same way every
/// time), and every placed depth is one of the observed levels.
std::vector<double> placeInOrder(const std::vector<PlacementInput>& oldest_first);

/// The extensions the order needs in every hole, non-zero ones only, by hole then by order.
std::vector<HoleExtension> holeExtensions(const CorrelationData& data,
                                          const std::vector<std::size_t>& order);

} // namespace atollog::detail
