#include "view/analysis_request.hpp"

#include "cli/datum_run.hpp"
#include "cli/hole_filter.hpp"
#include "cli/stored_run_note.hpp"
#include "cli/zone_run.hpp"

#include "atollog/db/project_store.hpp"

#include <sstream>
#include <stdexcept>

namespace atollog::view {
namespace {

std::string tableOr(const AnalysisRequest& r) {
    return r.table.empty() ? analysisTables(r.kind).front().by : r.table;
}

std::string holesText(const std::string& hole) { return hole.empty() ? "all holes" : hole; }

} // namespace

const std::vector<AnalysisKind>& analysisKinds() {
    static const std::vector<AnalysisKind> kinds{AnalysisKind::DatumPicks, AnalysisKind::Zones,
                                                 AnalysisKind::CompositeSequence};
    return kinds;
}

std::string analysisKindName(AnalysisKind kind) {
    switch (kind) {
    case AnalysisKind::DatumPicks: return "Datum picks";
    case AnalysisKind::Zones: return "Zones";
    case AnalysisKind::CompositeSequence: return "Composite sequence";
    }
    return "?";
}

const std::vector<AnalysisTableChoice>& analysisTables(AnalysisKind kind) {
    static const std::vector<AnalysisTableChoice> picks{{"", "Picks and tie points"}};
    static const std::vector<AnalysisTableChoice> zones{
        {"interval", "Zones by interval"},
        {"sample", "Zone of every sample"},
        {"boundary", "Zone boundaries"},
        {"conflict", "Conflicting picks"},
        {"explained", "Inversions a surface explains"}};
    static const std::vector<AnalysisTableChoice> sequence{
        {"order", "Events in order"}, {"extension", "Range extensions per hole"}};
    switch (kind) {
    case AnalysisKind::Zones: return zones;
    case AnalysisKind::CompositeSequence: return sequence;
    case AnalysisKind::DatumPicks: break;
    }
    return picks;
}

AnalysisResult runAnalysis(const std::filesystem::path& project, const AnalysisRequest& request,
                           const cli::PhaseReport& phase, const WorkProgress& step) {
    cli::reportPhase(phase, "reading the project");
    db::ProjectStore store = db::ProjectStore::open(project);
    const CoreDataset data = store.loadDataset();
    AnalysisResult out;
    switch (request.kind) {
    case AnalysisKind::DatumPicks: {
        cli::requireHole(data, request.hole);
        const BiostratResult bio = cli::pickDatums(data, request.biostrat, phase);
        const cli::DatumTableChoice choice{request.hole, request.all_events};
        out.title = "Datum picks, " + holesText(request.hole);
        out.shown = cli::datumTable(bio, choice, false);
        out.csv = cli::datumTable(bio, choice, true);
        out.summary = cli::datumRunSummary(bio);
        out.provenance =
            cli::storedRunNote(cli::storeDatumRun(store, data, request.biostrat, bio, phase));
        break;
    }
    case AnalysisKind::Zones: {
        cli::requireHole(data, request.hole);
        const BiostratResult bio = cli::assignZonesOf(data, request.biostrat, phase);
        const cli::ZoneTableChoice choice{request.hole, "", tableOr(request)};
        out.title = "Zones, " + holesText(request.hole);
        out.shown = cli::zoneTable(bio, choice, false);
        out.csv = cli::zoneTable(bio, choice, true);
        out.summary = std::to_string(bio.zones.samples.size()) + " sample calls, " +
                      std::to_string(bio.conflicts.size()) + " conflicting picks, " +
                      std::to_string(bio.explained_conflicts.size()) + " explained inversions";
        out.provenance = "not stored: zones follow from the data and settings each time";
        break;
    }
    case AnalysisKind::CompositeSequence: {
        const cli::SequenceRun run = cli::buildSequence(data, request.sequence, phase, step);
        const std::string by = tableOr(request);
        out.title = "Composite sequence, seed " + std::to_string(request.sequence.seed);
        out.shown = cli::sequenceTable(run, by, false);
        out.csv = cli::sequenceTable(run, by, true);
        out.summary = run.summary;
        out.provenance = cli::storedRunNote(
            cli::storeSequenceRun(store, data, request.sequence, run, phase));
        break;
    }
    }
    return out;
}

std::string analysisCsv(const AnalysisResult& result) {
    std::ostringstream text;
    result.csv.printCsv(text);
    return text.str();
}

} // namespace atollog::view
