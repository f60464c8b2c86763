#pragma once
// The composite sequence of a project, shared by the `sequence` command and the viewer's
// analyses: the options as the command takes them, the search with its phases and progress,
// the tables the command prints, and the order stored with its provenance (kind "sequence":
// settings, seed, inputs hash).
#include "cli/age_model_run.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/phase_report.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/composite_sequence.hpp"
#include "atollog/engine/core_dataset.hpp"
#include "atollog/engine/correlation_data.hpp"

#include <cstdint>
#include <string>

namespace atollog::cli {

/// The command's options that shape the result, with its defaults.
struct SequenceOptions {
    std::string unit = "metres"; ///< metres, levels or inversions
    std::uint64_t seed = 1;
    int restarts = 4;
    std::int64_t moves = 200000;
    double tolerance = 0.02; ///< near-best fraction
    int threads = 1;         ///< never changes the result, so not part of the provenance
    CorrelationOptions correlation;

    /// The engine's settings; throws std::invalid_argument for an unknown unit.
    SequenceSettings settings() const;
    /// "sequence.key=value" lines and the correlation settings, for the provenance record.
    std::string settingsText() const;
};

struct SequenceRun {
    CorrelationData data;
    CompositeSequence sequence;
    /// "54 events in 4 holes, misfit 12.345 metres (restarts: ...), 1234 of 800000 moves
    /// accepted": the command's summary line and the stored run's summary.
    std::string summary;
};

/// Gathers the events, orders them by the event-order graph and anneals, with a phase before
/// each step and the annealing's blocks of moves reported to `step`. Throws AnalysisStopped when
/// either says stop, std::invalid_argument for bad options or data.
SequenceRun buildSequence(const CoreDataset& dataset, const SequenceOptions& options,
                          const PhaseReport& phase = {}, const WorkProgress& step = {});

/// The table `atollog sequence --by <by>` prints: "order" (every event, oldest first) or
/// "extension" (the range extensions each hole needs).
TablePrinter sequenceTable(const SequenceRun& run, const std::string& by, bool csv);

/// The provenance record of a run with these options over `dataset` (not yet stored).
db::ModelRunRecord sequenceRunRecord(const CoreDataset& dataset, const SequenceOptions& options);

/// Stores the order with its provenance in one transaction, unless the newest "sequence" run
/// has the same settings, seed and inputs. Reports the phase "storing the sequence with its
/// provenance" first, so a stop asked for during the search stores nothing.
StoredRunOutcome storeSequenceRun(db::ProjectStore& store, const CoreDataset& dataset,
                                  const SequenceOptions& options, const SequenceRun& run,
                                  const PhaseReport& phase = {});

/// The command's line about the stored order: "stored the sequence as run #5" or "sequence
/// unchanged since run #5".
std::string sequenceStoreNote(const StoredRunOutcome& outcome);

} // namespace atollog::cli
