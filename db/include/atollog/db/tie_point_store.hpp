#pragma once
// Tie points (datum picks with their time-scale ages) stored per model run, so an age model can
// name exactly which picks, from which data and settings, it was built on.
#include "atollog/db/project_store.hpp"
#include "atollog/engine/tie_points.hpp"

#include <cstdint>
#include <optional>
#include <string_view>
#include <vector>

namespace atollog::db {

/// Records `run` and its tie points in one transaction; returns the run's id.
std::int64_t storeTiePoints(ProjectStore& store, ModelRunRecord run,
                            const std::vector<TiePoint>& ties);

/// The tie points of one run, in stored order (empty for a run without any).
std::vector<TiePoint> loadTiePoints(ProjectStore& store, std::int64_t run_id);

/// The most recent run of this kind, if any.
std::optional<ModelRunRecord> latestModelRun(const ProjectStore& store, std::string_view kind);

/// The latest run of run.kind when it had the same settings and inputs hash as `run`: the
/// results it stored still stand, so a command need not store them again.
std::optional<ModelRunRecord> sameLatestRun(const ProjectStore& store, const ModelRunRecord& run);

} // namespace atollog::db
