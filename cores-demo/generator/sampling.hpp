#pragma once
// Samples taken every 1-2.2 m of logged core, with ids unique over the whole archipelago.
#include "archipelago_plan.hpp"
#include "rng.hpp"

#include "atollog/engine/core_records.hpp"

#include <vector>

namespace atollog::demo {

/// Point samples (top_m == base_m) placed only in logged (recovered) core.
std::vector<Sample> takeSamples(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                DemoRng& rng);

/// The logged interval holding a depth, or nullptr.
const LithInterval* intervalAt(const std::vector<LithInterval>& intervals, const std::string& hole,
                               double depth_m);

} // namespace atollog::demo
