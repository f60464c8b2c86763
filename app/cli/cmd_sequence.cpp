// `sequence`: one composite order of all events by constrained optimisation (Kemple, Sadler &
// Strauss 1995): seeded simulated annealing over orders, the misfit summed over holes.
#include "cli/command.hpp"
#include "cli/correlation_inputs.hpp"
#include "cli/run_cli.hpp"
#include "cli/sequence_run.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/project_store.hpp"

#include <filesystem>
#include <memory>
#include <ostream>

namespace fs = std::filesystem;

namespace atollog::cli {

CommandRun addSequenceCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        std::string by = "order";
        bool csv = false;
        bool no_store = false;
        SequenceOptions sequence;
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
    sub->add_option("--unit", o->sequence.unit,
                    "Misfit counted in metres moved, sampled levels crossed, or order inversions")
        ->check(CLI::IsMember({"metres", "levels", "inversions"}))
        ->capture_default_str();
    sub->add_option("--seed", o->sequence.seed, "Seed: the same seed gives the same order")
        ->capture_default_str();
    sub->add_option("--restarts", o->sequence.restarts, "Independent annealing runs; the best is kept")
        ->check(CLI::Range(1, 1000))
        ->capture_default_str();
    sub->add_option("--moves", o->sequence.moves, "Moves per run")
        ->check(CLI::Range(std::int64_t{1}, std::int64_t{1000000000}))
        ->capture_default_str();
    sub->add_option("--near-best", o->sequence.tolerance,
                    "Orders within this fraction of the best misfit count as near-best")
        ->check(CLI::Range(0.0, 10.0))
        ->capture_default_str();
    sub->add_option("--threads", o->sequence.threads, "Threads (the result does not depend on it)")
        ->check(CLI::Range(1, 256))
        ->capture_default_str();
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    sub->add_flag("--no-store", o->no_store, "Do not store the sequence in the project");
    addCorrelationOptions(*sub, o->sequence.correlation);
    return [o, &io]() {
        auto store = db::ProjectStore::open(o->project);
        const CoreDataset dataset = store.loadDataset();
        const PhaseReport phase = [&io](const std::string& text) {
            io.progress(text);
            return true;
        };
        const SequenceRun run = buildSequence(dataset, o->sequence, phase);
        sequenceTable(run, o->by, o->csv).print(io.out, o->csv);
        std::ostream& note = o->csv ? io.err : io.out;
        note << run.summary << '\n';
        if (o->no_store) return int(kOk);
        note << sequenceStoreNote(storeSequenceRun(store, dataset, o->sequence, run)) << '\n';
        return int(kOk);
    };
}

} // namespace atollog::cli
