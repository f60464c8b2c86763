#pragma once
// One age-model run over the holes of a project: the models built from the gathered inputs, and
// their storing with provenance (settings, seed, inputs hash). The `age` command and the
// viewer's analyses share it, so a run from either reads the same in `history` and in the panel.
#include "cli/age_model_inputs.hpp"
#include "cli/phase_report.hpp"

#include "atollog/db/age_model_store.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/engine/age_model.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace atollog::cli {

struct AgeModelRun {
    std::vector<HoleModelInputs> inputs;
    std::vector<AgeModel> models; ///< one per input, same order
};

/// Builds the model of every hole with ties (or only `hole`), reporting a phase per hole and,
/// within it, each block of draws to `step`. Throws AnalysisStopped when either says stop,
/// std::invalid_argument as gatherAgeModelInputs does.
AgeModelRun buildAgeModels(const CoreDataset& data, const AgeModelOptions& options,
                           const std::string& hole, const PhaseReport& phase = {},
                           const WorkProgress& step = {});

/// The most likely outlier: a tie whose posterior sits far in its own tail, else the tie whose
/// removal raises acceptance most, when either passes its threshold.
std::optional<std::string> leadingOutlier(const AgeModel& m);

/// The provenance record of a run with these options over `data` (not yet stored).
db::ModelRunRecord ageModelRunRecord(const CoreDataset& data, const AgeModelOptions& options,
                                     const std::string& hole);

struct StoredRunOutcome {
    std::int64_t run_id = 0;
    bool unchanged = false; ///< an identical run (settings, seed, inputs) was the newest: kept
};

/// Stores the run's models (grid, sample ages, hiatuses, rates) in one transaction with its
/// provenance, unless the newest run of its kind has the same settings, seed and inputs.
StoredRunOutcome storeAgeModelRun(db::ProjectStore& store, const CoreDataset& data,
                                  const AgeModelOptions& options, const std::string& hole,
                                  const AgeModelRun& run);

} // namespace atollog::cli
