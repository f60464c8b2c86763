#pragma once
// How a sub-command plugs into the command line: it declares its options on a CLI11 sub-app and
// returns the function that does the work once parsing succeeded.
#include "atollog/engine/work_progress.hpp"

#include <CLI/CLI.hpp>

#include <functional>
#include <iosfwd>

namespace atollog::cli {

struct CommandIo {
    std::ostream& out;
    std::ostream& err;
    bool show_progress = false; ///< stderr is a terminal: long work reports its phases there
    void progress(const std::string& message) const;
    /// On a terminal: a WorkProgress that shows how far the current phase is, in whole per
    /// cent on one line rewritten in place ("atollog:   45 %"), ended at 100 %; it never stops
    /// the work. Elsewhere: none (empty), so scripts and logs see only the phases.
    WorkProgress steps() const;
};

/// The work of one sub-command; returns the exit code. Throws for bad input; runCli turns the
/// exception into a message on stderr and exit code 2.
using CommandRun = std::function<int()>;

// Each registers one sub-command on `app` and returns its run function. Options are bound to
// state the returned function owns.
CommandRun addInitCommand(CLI::App& app, const CommandIo& io);
CommandRun addImportCommand(CLI::App& app, const CommandIo& io);
CommandRun addExportCommand(CLI::App& app, const CommandIo& io);
CommandRun addCheckCommand(CLI::App& app, const CommandIo& io);
CommandRun addShowCommand(CLI::App& app, const CommandIo& io);
CommandRun addHistoryCommand(CLI::App& app, const CommandIo& io);
CommandRun addRangesCommand(CLI::App& app, const CommandIo& io);
CommandRun addDatumsCommand(CLI::App& app, const CommandIo& io);
CommandRun addZonesCommand(CLI::App& app, const CommandIo& io);
CommandRun addChartCommand(CLI::App& app, const CommandIo& io);
CommandRun addChainCommand(CLI::App& app, const CommandIo& io);
CommandRun addDatesCommand(CLI::App& app, const CommandIo& io);
CommandRun addAgeCommand(CLI::App& app, const CommandIo& io);
CommandRun addRatesCommand(CLI::App& app, const CommandIo& io);
CommandRun addSubsidenceCommand(CLI::App& app, const CommandIo& io);
CommandRun addOrderCommand(CLI::App& app, const CommandIo& io);
CommandRun addSequenceCommand(CLI::App& app, const CommandIo& io);
CommandRun addLineCommand(CLI::App& app, const CommandIo& io);
CommandRun addIsochronsCommand(CLI::App& app, const CommandIo& io);
CommandRun addPanelCommand(CLI::App& app, const CommandIo& io);

} // namespace atollog::cli
