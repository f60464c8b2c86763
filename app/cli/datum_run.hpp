#pragma once
// Datum picks of a project, shared by the `datums` command and the viewer's analyses: the
// biostratigraphy run, its table as the command prints it (aligned or CSV), and the tie points
// stored with their provenance (kind "datums"), so a run from either reads the same in
// `history` and feeds the same age models.
#include "cli/age_model_run.hpp"
#include "cli/biostrat_options.hpp"
#include "cli/phase_report.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <string>

namespace atollog::cli {

/// Which picks the table lists.
struct DatumTableChoice {
    std::string hole; ///< only this hole (empty: all)
    bool all = false; ///< also events whose taxon is not found in a hole
};

/// The whole biostratigraphy under `options` (picks, zones, conflicts, tie points), after the
/// phase "picking datums". Throws AnalysisStopped when the phase says stop,
/// std::invalid_argument for bad options or data.
BiostratResult pickDatums(const CoreDataset& data, const BiostratOptions& options,
                          const PhaseReport& phase = {});

/// The picks as `atollog datums` prints them: numbers fixed for people, round-trip in CSV.
TablePrinter datumTable(const BiostratResult& result, const DatumTableChoice& choice, bool csv);

/// A bracket end for a table cell: "open" (empty in CSV) when the bracket is open there.
std::string bracketEndCell(double value_m, bool open, bool csv);

/// "40 tie points from 120 picks; 2 conflicts": the stored run's summary.
std::string datumRunSummary(const BiostratResult& result);

/// The provenance record of the tie points of `options` over `data` (not yet stored).
db::ModelRunRecord datumRunRecord(const CoreDataset& data, const BiostratOptions& options);

/// Stores the tie points with their provenance in one transaction, unless the newest "datums"
/// run has the same settings and inputs. Reports the phase "storing the tie points with their
/// provenance" first, so a stop asked for during the picks stores nothing.
StoredRunOutcome storeDatumRun(db::ProjectStore& store, const CoreDataset& data,
                               const BiostratOptions& options, const BiostratResult& result,
                               const PhaseReport& phase = {});

/// The command's line about the stored tie points: "stored 40 tie points as run #3" or
/// "tie points unchanged since run #3".
std::string datumStoreNote(const StoredRunOutcome& outcome, const BiostratResult& result);

} // namespace atollog::cli
