#pragma once
// The age models a project already holds: for each hole, the newest stored age-model run that
// covers it and was made from the project's current data (same inputs hash). The viewer shows
// these, so it draws the models the user ran with their own settings rather than re-running
// them with defaults; a stale run (the data changed since) is not used.
#include "atollog/db/project_store.hpp"
#include "atollog/engine/age_model.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <map>
#include <string>
#include <vector>

namespace atollog::cli {

struct StoredModelChoice {
    std::map<std::string, AgeModel> models; ///< per hole: its grid of age quantiles
    /// Per hole with a model, in hole order: "KAL1: run #7 of 2026-12-01T23:10:00Z".
    std::vector<std::string> sources;
};

/// Reads the project's age-model runs, newest first, and keeps each hole's first fresh one.
/// The models carry their grid rows only (AgeModel::grid: depth and age quantiles; two rows at
/// one depth where the run had a logged surface, the one above first), which is what isochrons
/// and the age track read.
StoredModelChoice latestStoredAgeModels(db::ProjectStore& store, const CoreDataset& data);

} // namespace atollog::cli
