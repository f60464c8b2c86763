#pragma once
// What the drillers and the core logger record for one hole: core runs with their recovery, and
// lithology intervals logged in the recovered part of each run (placed at the top of the run, the
// usual convention). The demo pretends the recovered core really came from the top of its run,
// so a logged depth is also the true depth of that rock.
#include "archipelago_plan.hpp"
#include "rng.hpp"

#include "atollog/engine/core_records.hpp"

#include <vector>

namespace atollog::demo {

std::vector<CoreRun> drillRuns(const IslandPlan& plan, DemoRng& rng);

/// Logged depth range of a run's recovered core: from the run top, never past the run base (an
/// over-recovered run has expanded core, not extra rock).
double loggedBaseM(const CoreRun& run);

std::vector<LithInterval> logIntervals(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                       DemoRng& rng);

} // namespace atollog::demo
