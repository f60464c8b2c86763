#pragma once
// What the drillers and the core logger record for one hole: core runs with their recovery, and
// lithology intervals logged in the recovered part of each run (placed at the top of the run, the
// usual convention). The recovered core really came from somewhere in its run: its true top lies
// `offset` below the run top, uniform in [0, cored - recovered], so a logged depth reads too
// shallow by that offset -- the uncertainty the engine's depth brackets stand for. Runs that cut
// a planned surface keep their core at the top (offset 0), so logged surfaces stand at their
// true depths and tests can match hiatuses by depth.
#include "archipelago_plan.hpp"
#include "rng.hpp"

#include "atollog/engine/core_records.hpp"

#include <vector>

namespace atollog::demo {

std::vector<CoreRun> drillRuns(const IslandPlan& plan, DemoRng& rng);

/// Logged depth range of a run's recovered core: from the run top, never past the run base (an
/// over-recovered run has expanded core, not extra rock).
double loggedBaseM(const CoreRun& run);

/// The true position of each run's recovered core (offsets in m, one per run), drawn from
/// `position_rng`, a stream of its own so that the rest of the demo stays as it was.
std::vector<double> drawCoreOffsets(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                    DemoRng& position_rng);

/// The true depth of rock logged at `logged_m` (in the logged part of a run): logged + offset.
double trueDepthOfLoggedM(const std::vector<CoreRun>& runs, const std::vector<double>& offsets_m,
                          double logged_m);

/// Intervals at logged depths, described from the rock at their true depths.
std::vector<LithInterval> logIntervals(const IslandPlan& plan, const std::vector<CoreRun>& runs,
                                       const std::vector<double>& offsets_m, DemoRng& rng);

} // namespace atollog::demo
