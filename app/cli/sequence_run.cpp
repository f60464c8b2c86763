#include "cli/sequence_run.hpp"

#include "atollog/db/sequence_store.hpp"
#include "atollog/db/tie_point_store.hpp"
#include "atollog/engine/event_order_graph.hpp"

#include <optional>
#include <sstream>
#include <stdexcept>
#include <vector>

namespace atollog::cli {

SequenceSettings SequenceOptions::settings() const {
    SequenceSettings s;
    if (unit == "metres") s.unit = MisfitUnit::Metres;
    else if (unit == "levels") s.unit = MisfitUnit::Levels;
    else if (unit == "inversions") s.unit = MisfitUnit::Inversions;
    else
        throw std::invalid_argument("--unit '" + unit +
                                    "': expected one of metres, levels, inversions");
    s.seed = seed;
    s.restarts = restarts;
    s.moves_per_restart = moves;
    s.near_best_tolerance = tolerance;
    s.threads = threads;
    return s;
}

std::string SequenceOptions::settingsText() const {
    std::ostringstream text;
    text << "sequence.unit=" << unit << "\nsequence.restarts=" << restarts
         << "\nsequence.moves=" << moves << "\nsequence.near_best=" << tolerance << '\n'
         << correlation.settingsText();
    return text.str();
}

SequenceRun buildSequence(const CoreDataset& dataset, const SequenceOptions& options,
                          const PhaseReport& phase, const WorkProgress& step) {
    SequenceRun run;
    reportPhase(phase, "picking events");
    run.data = gatherCorrelationData(dataset, options.correlation);
    const SequenceSettings s = options.settings();
    reportPhase(phase, "first order from the event-order graph");
    const EventOrderGraph graph = buildEventOrderGraph(run.data);
    reportPhase(phase, "annealing");
    run.sequence = stoppable(
        [&] { return buildCompositeSequence(run.data, s, graph.first_composite, step); });
    std::ostringstream summary;
    summary << run.data.events.size() << " events in " << run.data.holes.size()
            << " holes, misfit " << formatNumber(run.sequence.misfit, false, 3) << " "
            << options.unit << " (restarts:";
    for (double m : run.sequence.restart_misfits) summary << " " << formatNumber(m, false, 3);
    summary << "), " << run.sequence.moves_accepted << " of " << run.sequence.moves_tried
            << " moves accepted";
    run.summary = summary.str();
    return run;
}

TablePrinter sequenceTable(const SequenceRun& run, const std::string& by, bool csv) {
    using A = TablePrinter::Align;
    const CorrelationData& data = run.data;
    const CompositeSequence& seq = run.sequence;
    if (by == "extension") {
        TablePrinter t({{"hole"}, {"event"}, {"kind"}, {"observed_m", A::Right},
                        {"placed_m", A::Right}, {"extension_m", A::Right}});
        for (const HoleExtension& x : seq.extensions)
            t.addRow({data.holes[x.hole], data.events[x.event].id,
                      kindWord(data.events[x.event].kind), formatNumber(x.observed_m, csv, 2),
                      formatNumber(x.placed_m, csv, 2), formatNumber(x.extension_m, csv, 2)});
        return t;
    }
    if (by != "order")
        throw std::invalid_argument("sequence table '" + by + "': expected order or extension");
    TablePrinter t({{"rank", A::Right}, {"event"}, {"kind"}, {"taxon"},
                    {"position_min", A::Right}, {"position_max", A::Right},
                    {"age_ma", A::Right}});
    int rank = 0;
    for (std::size_t e : seq.order) {
        const SequenceEvent& ev = data.events[e];
        t.addRow({std::to_string(++rank), ev.id, kindWord(ev.kind), ev.taxon,
                  std::to_string(seq.position_min[e] + 1),
                  std::to_string(seq.position_max[e] + 1),
                  ev.age_ma ? formatNumber(*ev.age_ma, csv, 3) : ""});
    }
    return t;
}

db::ModelRunRecord sequenceRunRecord(const CoreDataset& dataset, const SequenceOptions& options) {
    db::ModelRunRecord run;
    run.kind = "sequence";
    run.settings = options.settingsText();
    run.seed = options.seed;
    run.inputs_sha256 = db::ProjectStore::datasetHash(dataset);
    return run;
}

StoredRunOutcome storeSequenceRun(db::ProjectStore& store, const CoreDataset& dataset,
                                  const SequenceOptions& options, const SequenceRun& run,
                                  const PhaseReport& phase) {
    reportPhase(phase, "storing the sequence with its provenance");
    db::ModelRunRecord record = sequenceRunRecord(dataset, options);
    if (const auto same = db::sameLatestRun(store, record)) return {same->id, true};
    record.summary = run.summary;
    std::vector<db::StoredSequenceEvent> stored;
    int rank = 0;
    for (std::size_t e : run.sequence.order) {
        const SequenceEvent& ev = run.data.events[e];
        stored.push_back({++rank, ev.id, kindWord(ev.kind),
                          ev.taxon.empty() ? std::nullopt : std::optional<std::string>(ev.taxon),
                          run.sequence.position_min[e] + 1, run.sequence.position_max[e] + 1});
    }
    return {db::storeSequence(store, record, stored), false};
}

std::string sequenceStoreNote(const StoredRunOutcome& outcome) {
    return outcome.unchanged ? "sequence unchanged since run #" + std::to_string(outcome.run_id)
                             : "stored the sequence as run #" + std::to_string(outcome.run_id);
}

} // namespace atollog::cli
