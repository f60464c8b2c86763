// `check`: every problem in a core data folder or a project, with where it is and how to fix it.
#include "cli/command.hpp"
#include "cli/run_cli.hpp"
#include "cli/table_printer.hpp"

#include "atollog/db/core_folder.hpp"
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/engine/validation.hpp"

#include <filesystem>
#include <memory>
#include <ostream>

namespace fs = std::filesystem;

namespace atollog::cli {
namespace {

struct Finding {
    bool is_error = true;
    std::string where, column, value, problem, fix;
};

std::vector<Finding> checkFolder(const fs::path& folder) {
    std::vector<db::InputProblem> problems;
    try {
        db::readCoreFolder(folder, &problems);
    } catch (const db::InputError& e) {
        const auto& errors = e.problems();
        problems.insert(problems.begin(), errors.begin(), errors.end());
    }
    std::vector<Finding> out;
    for (const auto& p : problems) {
        std::string where = p.file;
        if (p.line > 0) where += ":" + std::to_string(p.line);
        out.push_back({!p.is_warning, where, p.column, p.value, p.problem, p.fix});
    }
    return out;
}

std::vector<Finding> checkProject(const fs::path& file) {
    const auto store = db::ProjectStore::open(file);
    std::vector<Finding> out;
    for (const auto& issue : validateDataset(store.loadDataset())) {
        std::string where(tableName(issue.table));
        if (issue.row) where += " data row " + std::to_string(*issue.row + 1);
        out.push_back({issue.severity == Severity::Error, where, issue.column, issue.value,
                       issue.problem, issue.fix});
    }
    return out;
}

} // namespace

CommandRun addCheckCommand(CLI::App& app, const CommandIo& io) {
    struct Options {
        fs::path target;
        bool csv = false;
    };
    auto o = std::make_shared<Options>();
    auto* sub = app.add_subcommand(
        "check", "Check a core data folder or a project against every rule of the format. Exit "
                 "status 0 when clean, 1 when anything was found.");
    sub->add_option("target", o->target, "Core data folder or project file")
        ->required()
        ->check(CLI::ExistingPath);
    sub->add_flag("--csv", o->csv, "Print CSV instead of an aligned table");
    return [o, &io]() {
        io.progress("checking " + o->target.string());
        const auto findings =
            fs::is_directory(o->target) ? checkFolder(o->target) : checkProject(o->target);
        std::size_t errors = 0;
        TablePrinter table({{"severity"}, {"where"}, {"column"}, {"value"}, {"problem"}, {"fix"}});
        for (const auto& f : findings) {
            errors += f.is_error ? 1 : 0;
            table.addRow({f.is_error ? "error" : "warning", f.where, f.column, f.value, f.problem, f.fix});
        }
        if (o->csv) {
            table.printCsv(io.out);
        } else if (findings.empty()) {
            io.out << o->target.string() << ": no problems found\n";
        } else {
            table.printText(io.out);
            io.out << o->target.string() << ": " << errors << " errors, "
                   << findings.size() - errors << " warnings\n";
        }
        return findings.empty() ? int(kOk) : int(kFindings);
    };
}

} // namespace atollog::cli
