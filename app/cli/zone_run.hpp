#pragma once
// Zone assignment of a project, shared by the `zones` command and the viewer's analyses: the
// zone of each sample and the tables the command prints (`--by`). Nothing is stored: the zones
// follow from the data and the settings every time, as the command does.
#include "cli/biostrat_options.hpp"
#include "cli/phase_report.hpp"
#include "cli/table_printer.hpp"

#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <string>
#include <vector>

namespace atollog::cli {

/// Which zone table, and which of its rows.
struct ZoneTableChoice {
    std::string hole;   ///< only this hole (empty: all)
    std::string scheme; ///< only this zonation scheme (empty: all)
    /// interval, sample, boundary, conflict or explained (zoneTableKinds()).
    std::string by = "interval";
};

/// The tables `--by` offers, in the command's order.
const std::vector<std::string>& zoneTableKinds();

/// Throws std::invalid_argument when `scheme` (non-empty) is no scheme of the project's zones.
void requireScheme(const CoreDataset& data, const std::string& scheme);

/// The biostratigraphy under `options` after the phase "assigning zones" (the zones, their
/// boundaries and the conflicting picks). Throws AnalysisStopped when the phase says stop.
BiostratResult assignZonesOf(const CoreDataset& data, const BiostratOptions& options,
                             const PhaseReport& phase = {});

/// The table `choice.by` as `atollog zones` prints it. Throws std::invalid_argument for an
/// unknown `by`.
TablePrinter zoneTable(const BiostratResult& result, const ZoneTableChoice& choice, bool csv);

} // namespace atollog::cli
