// Sub-commands that move data in and out of a project file: init, import, export, history.
#include "cli/command.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/core_folder.hpp"
#include "atollog/db/importer.hpp"
#include "atollog/db/project_store.hpp"

#include <filesystem>
#include <memory>
#include <ostream>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

// Removes a project file this command created, with its WAL companions, so a failed first
// import leaves nothing behind.
void removeProjectFiles(const fs::path& file) {
    std::error_code ec;
    for (const char* suffix : {"", "-wal", "-shm", "-journal"})
        fs::remove(fs::path(file.string() + suffix), ec);
}

void printWarnings(const CommandIo& io, const std::vector<db::InputProblem>& warnings) {
    if (warnings.empty()) return;
    io.out << warnings.size() << (warnings.size() == 1 ? " warning" : " warnings") << ":\n";
    for (const auto& w : warnings) io.out << "  " << w.format() << '\n';
}

} // namespace

CommandRun addInitCommand(CLI::App& app, const CommandIo& io) {
    auto project = std::make_shared<fs::path>();
    auto* sub = app.add_subcommand("init", "Create a new, empty project file.");
    sub->add_option("project", *project, "Project file to create (e.g. campaign.atollog)")->required();
    return [project, &io]() {
        db::ProjectStore::create(*project);
        io.out << "created " << project->string() << " (schema "
               << db::ProjectStore::kSchemaVersion << ")\n";
        return int(kOk);
    };
}

CommandRun addImportCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project, folder;
        bool replace = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "import", "Load a core data folder into a project file (created if missing). All or "
                  "nothing: on any error the project is left as it was.");
    sub->add_option("project", o->project, "Project file")->required();
    sub->add_option("folder", o->folder, "Core data folder (holes.csv, runs.csv, ...)")
        ->required()
        ->check(CLI::ExistingDirectory);
    sub->add_flag("--replace", o->replace, "Replace the data a project already holds");
    return [o, &io]() {
        const bool created = !fs::exists(o->project);
        auto store = created ? db::ProjectStore::create(o->project) : db::ProjectStore::open(o->project);
        try {
            io.progress("reading and checking " + o->folder.string());
            const db::ImportResult result = db::importCoreFolder(store, o->folder, o->replace);
            io.out << "imported " << result.row_count << " rows from " << o->folder.string()
                   << " into " << o->project.string() << " (provenance run #"
                   << result.model_run_id << ")\n";
            printWarnings(io, result.warnings);
        } catch (...) {
            if (created) {
                { auto closing = std::move(store); } // close the file before removing it
                removeProjectFiles(o->project);
            }
            throw;
        }
        return int(kOk);
    };
}

CommandRun addExportCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project, folder;
        bool overwrite = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "export", "Write a project back out as a core data folder (metres, Ma, canonical order).");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_option("folder", o->folder, "Folder to write (must not exist or be empty)")->required();
    sub->add_flag("--overwrite", o->overwrite, "Replace an existing non-empty folder");
    return [o, &io]() {
        const auto store = db::ProjectStore::open(o->project);
        io.progress("reading " + o->project.string());
        const CoreDataset data = store.loadDataset();
        io.progress("writing " + o->folder.string());
        db::writeCoreFolder(data, o->folder, o->overwrite);
        io.out << "exported " << data.holes.size() << " holes to " << o->folder.string() << '\n';
        return int(kOk);
    };
}

CommandRun addHistoryCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path project;
        bool csv = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "history", "List the recorded runs (imports and models) with settings, seed and input hash.");
    sub->add_option("project", o->project, "Project file")->required()->check(CLI::ExistingFile);
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    return [o, &io]() {
        const auto store = db::ProjectStore::open(o->project);
        using A = TablePrinter::Align;
        TablePrinter table({{"run", A::Right},
                            {"kind"},
                            {"started_utc"},
                            {"program_version"},
                            {"seed", A::Right},
                            {"inputs_sha256"},
                            {"summary"}});
        for (const auto& r : store.modelRuns())
            table.addRow({std::to_string(r.id), r.kind, r.started_utc, r.program_version,
                          r.seed ? std::to_string(*r.seed) : "", o->csv ? r.inputs_sha256 : r.inputs_sha256.substr(0, 12), r.summary});
        table.print(io.out, o->csv);
        return int(kOk);
    };
}

} // namespace atollog::cli
