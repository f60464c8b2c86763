// `sequence`: one composite order of all events by constrained optimisation (Kemple, Sadler &
// Strauss 1995): seeded simulated annealing over orders, the misfit summed over holes.
#include "cli/command.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"
#include "atollog/db/sequence_store.hpp"
#include "atollog/db/tie_point_store.hpp"
#include "atollog/engine/composite_sequence.hpp"
#include "atollog/engine/event_order_graph.hpp"

#include <filesystem>
#include <memory>
#include <ostream>
#include <sstream>

namespace fs = std::filesystem;

namespace atollog::cli {

CommandRun addSequenceCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string by = "order";
        std::string unit = "metres";
        std::uint64_t seed = 1;
        int restarts = 4;
        std::int64_t moves = 200000;
        double tolerance = 0.02;
        int threads = 1;
        bool csv = false;
        bool no_store = false;
        CorrelationOptions correlation;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "sequence", "Composite sequence: one order of all events that best fits every hole (bases "
                    "may only move down, tops only up, each base before its top, dated horizons "
                    "in age order), by seeded simulated annealing; each event's range of ranks "
                    "among near-best orders; the range extensions each hole needs. Stored in "
                    "the project with its settings and seed.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("--by", o->by,
                    "order: every event, oldest first; extension: the range extensions the "
                    "order needs in each hole")
        ->check(CLI::IsMember({"order", "extension"}))
        ->capture_default_str();
    sub->add_option("--unit", o->unit,
                    "Misfit counted in metres moved, sampled levels crossed, or order inversions")
        ->check(CLI::IsMember({"metres", "levels", "inversions"}))
        ->capture_default_str();
    sub->add_option("--seed", o->seed, "Seed: the same seed gives the same order")
        ->capture_default_str();
    sub->add_option("--restarts", o->restarts, "Independent annealing runs; the best is kept")
        ->check(CLI::Range(1, 1000))
        ->capture_default_str();
    sub->add_option("--moves", o->moves, "Moves per run")
        ->check(CLI::Range(std::int64_t{1}, std::int64_t{1000000000}))
        ->capture_default_str();
    sub->add_option("--near-best", o->tolerance,
                    "Orders within this fraction of the best misfit count as near-best")
        ->check(CLI::Range(0.0, 10.0))
        ->capture_default_str();
    sub->add_option("--threads", o->threads, "Threads (the result does not depend on it)")
        ->check(CLI::Range(1, 256))
        ->capture_default_str();
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_flag("--no-store", o->no_store, "Do not store the sequence in the project");
    addCorrelationOptions(*sub, o->correlation);
    return [o, &io]() {
        auto store = db::ProjectStore::open(o->project);
        const CoreDataset dataset = store.loadDataset();
        io.progress("picking events");
        const CorrelationData data = gatherCorrelationData(dataset, o->correlation);
        SequenceSettings s;
        s.unit = o->unit == "levels"       ? MisfitUnit::Levels
                 : o->unit == "inversions" ? MisfitUnit::Inversions
                                           : MisfitUnit::Metres;
        s.seed = o->seed;
        s.restarts = o->restarts;
        s.moves_per_restart = o->moves;
        s.near_best_tolerance = o->tolerance;
        s.threads = o->threads;
        io.progress("first order from the event-order graph");
        const EventOrderGraph graph = buildEventOrderGraph(data);
        io.progress("annealing");
        const CompositeSequence seq = buildCompositeSequence(data, s, graph.first_composite);
        const bool csv = o->csv;
        using A = TablePrinter::Align;
        if (o->by == "extension") {
            TablePrinter t({{"hole"}, {"event"}, {"kind"}, {"observed_m", A::Right},
                            {"placed_m", A::Right}, {"extension_m", A::Right}});
            for (const HoleExtension& x : seq.extensions)
                t.addRow({data.holes[x.hole], data.events[x.event].id,
                          kindWord(data.events[x.event].kind), formatNumber(x.observed_m, csv, 2),
                          formatNumber(x.placed_m, csv, 2), formatNumber(x.extension_m, csv, 2)});
            t.print(io.out, csv);
        } else {
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
            t.print(io.out, csv);
        }
        std::ostream& note = csv ? io.err : io.out;
        std::ostringstream summary;
        summary << data.events.size() << " events in " << data.holes.size() << " holes, misfit "
                << formatNumber(seq.misfit, false, 3) << " " << o->unit << " (restarts:";
        for (double m : seq.restart_misfits) summary << " " << formatNumber(m, false, 3);
        summary << "), " << seq.moves_accepted << " of " << seq.moves_tried << " moves accepted";
        note << summary.str() << '\n';
        if (o->no_store) return int(kOk);

        db::ModelRunRecord run;
        run.kind = "sequence";
        std::ostringstream settings;
        settings << "sequence.unit=" << o->unit << "\nsequence.restarts=" << o->restarts
                 << "\nsequence.moves=" << o->moves << "\nsequence.near_best=" << o->tolerance
                 << '\n' << o->correlation.settingsText();
        run.settings = settings.str();
        run.seed = o->seed;
        run.inputs_sha256 = db::ProjectStore::datasetHash(dataset);
        if (const auto same = db::sameLatestRun(store, run)) {
            note << "sequence unchanged since run #" << same->id << '\n';
            return int(kOk);
        }
        run.summary = summary.str();
        std::vector<db::StoredSequenceEvent> stored;
        int rank = 0;
        for (std::size_t e : seq.order) {
            const SequenceEvent& ev = data.events[e];
            stored.push_back({++rank, ev.id, kindWord(ev.kind),
                              ev.taxon.empty() ? std::nullopt : std::optional<std::string>(ev.taxon),
                              seq.position_min[e] + 1, seq.position_max[e] + 1});
        }
        note << "stored the sequence as run #" << db::storeSequence(store, run, stored) << '\n';
        return int(kOk);
    };
}

} // namespace atollog::cli
