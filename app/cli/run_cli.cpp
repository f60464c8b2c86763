#include "cli/run_cli.hpp"

#include "cli/command.hpp"

#include "atollog/db/errors.hpp"
#include "atollog/db/version.hpp"

#include <filesystem>
#include <iomanip>
#include <iostream>
#include <map>
#include <unistd.h>

namespace atollog::cli {

void CommandIo::progress(const std::string& message) const {
    if (show_progress) err << "atollog: " << message << '\n' << std::flush;
}

WorkProgress CommandIo::steps() const {
    if (!show_progress) return {};
    // Calls never overlap (the engine serialises them), so the last shown share needs no lock.
    return [&err = err, shown = -1](std::size_t done, std::size_t total) mutable {
        const int percent = total == 0 ? 100 : static_cast<int>(done * 100 / total);
        if (percent != shown) {
            shown = percent;
            err << "\ratollog: " << std::setw(4) << percent << " %" << (done >= total ? "\n" : "")
                << std::flush;
        }
        return true;
    };
}

int runCli(int argc, const char* const* argv, std::ostream& out, std::ostream& err) {
    CommandIo io{out, err, &err == &std::cerr && ::isatty(STDERR_FILENO) == 1};

    CLI::App app{"atollog: log reef drill cores, check them, and keep them in one project file.\n"
                 "A project file is a single SQLite database; a core data folder is a folder of\n"
                 "CSV tables (see README, 'Core data folder').",
                 "atollog"};
    app.set_version_flag("--version", std::string("atollog ") + kProgramVersion);
    app.require_subcommand(1);
    app.fallthrough(false);

    std::map<CLI::App*, CommandRun> runs;
    auto add = [&](CommandRun (*adder)(CLI::App&, const CommandIo&)) {
        const std::size_t before = app.get_subcommands({}).size();
        CommandRun run = adder(app, io);
        runs.emplace(app.get_subcommands({}).at(before), std::move(run));
    };
    add(addInitCommand);
    add(addImportCommand);
    add(addExportCommand);
    add(addCheckCommand);
    add(addShowCommand);
    add(addRangesCommand);
    add(addDatumsCommand);
    add(addZonesCommand);
    add(addChartCommand);
    add(addDatesCommand);
    add(addAgeCommand);
    add(addRatesCommand);
    add(addSubsidenceCommand);
    add(addChainCommand);
    add(addOrderCommand);
    add(addSequenceCommand);
    add(addLineCommand);
    add(addIsochronsCommand);
    add(addPanelCommand);
    add(addHistoryCommand);

    try {
        app.parse(argc, argv);
    } catch (const CLI::CallForHelp& e) {
        return app.exit(e, out, err), kOk;
    } catch (const CLI::CallForAllHelp& e) {
        return app.exit(e, out, err), kOk;
    } catch (const CLI::CallForVersion& e) {
        return app.exit(e, out, err), kOk;
    } catch (const CLI::ParseError& e) {
        err << "atollog: " << e.what() << "\n";
        err << "Run 'atollog --help' or 'atollog COMMAND --help' for usage.\n";
        return kBadInput;
    }

    for (const auto& [sub, run] : runs) {
        if (!sub->parsed()) continue;
        try {
            return run();
        } catch (const db::InputError& e) {
            err << "atollog " << sub->get_name() << ": the input has "
                << e.problems().size() << (e.problems().size() == 1 ? " problem" : " problems")
                << "; nothing was changed.\n"
                << e.what() << (std::string(e.what()).ends_with('\n') ? "" : "\n");
            return kBadInput;
        } catch (const db::ProjectError& e) {
            err << "atollog " << sub->get_name() << ": " << e.what() << "\n";
            return kBadInput;
        } catch (const std::filesystem::filesystem_error& e) {
            err << "atollog " << sub->get_name() << ": " << e.what() << "\n";
            return kBadInput;
        } catch (const std::exception& e) {
            err << "atollog " << sub->get_name() << ": " << e.what() << "\n";
            return kBadInput;
        }
    }
    err << "atollog: no command given; run 'atollog --help'.\n";
    return kBadInput;
}

} // namespace atollog::cli
