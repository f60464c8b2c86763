#pragma once
// The viewer's analyses (datum picks, zones, the composite sequence) as plain requests and
// results, computed and stored by the same command-line functions as `atollog datums`, `zones`
// and `sequence`. No widgets here: the analyses window runs runAnalysis on a worker thread,
// tests call it directly.
#include "cli/biostrat_options.hpp"
#include "cli/phase_report.hpp"
#include "cli/sequence_run.hpp"
#include "cli/table_printer.hpp"

#include <filesystem>
#include <string>
#include <vector>

namespace atollog::view {

enum class AnalysisKind { DatumPicks, Zones, CompositeSequence };

/// The kinds in the window's order, and their names there.
const std::vector<AnalysisKind>& analysisKinds();
std::string analysisKindName(AnalysisKind kind);

/// A table an analysis can show: the command's `--by` word and its name in the window.
struct AnalysisTableChoice {
    std::string by;
    std::string name;
};
/// The tables of a kind, the command's default first (datum picks have one).
const std::vector<AnalysisTableChoice>& analysisTables(AnalysisKind kind);

struct AnalysisRequest {
    AnalysisKind kind = AnalysisKind::DatumPicks;
    std::string hole;        ///< datum picks and zones: only this hole (empty: all)
    bool all_events = false; ///< datum picks: also events not found in a hole (`--all`)
    std::string table;       ///< zones and sequence: the `--by` table (empty: the default)
    cli::BiostratOptions biostrat; ///< datum picks and zones
    cli::SequenceOptions sequence; ///< the composite sequence (with its own pick options)
};

struct AnalysisResult {
    std::string title;                                        ///< "Datum picks, all holes"
    cli::TablePrinter shown{std::vector<cli::TablePrinter::Column>{}}; ///< cells as people read them
    cli::TablePrinter csv{std::vector<cli::TablePrinter::Column>{}};   ///< the command's --csv cells
    /// "stored as run #12", "unchanged since run #12", or why nothing is stored (zones).
    std::string provenance;
    std::string summary; ///< one line of what came out (the stored run's summary)
};

/// Opens `project` (its own connection: this may run on any thread), runs the analysis and
/// stores its result with provenance as the command does (tie points, the sequence; zones are
/// never stored), unless the newest run of its kind has the same settings, seed and inputs.
/// Reports a phase before each long step (storing is a phase of its own) and the annealing's
/// blocks of moves to `step`; throws cli::AnalysisStopped when either says stop (then nothing
/// is stored), std::invalid_argument or db::ProjectError with a message naming what to fix.
AnalysisResult runAnalysis(const std::filesystem::path& project, const AnalysisRequest& request,
                           const cli::PhaseReport& phase = {}, const WorkProgress& step = {});

/// The result's table as `atollog <command> --csv` prints it on standard output.
std::string analysisCsv(const AnalysisResult& result);

} // namespace atollog::view
