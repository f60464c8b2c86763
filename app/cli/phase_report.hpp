#pragma once
// How long analyses report their phases and learn that they should stop: the command line
// prints the phases on a terminal, the viewer shows them under its progress bar and stops the
// work when Cancel is pressed: between phases, and inside an age model between its blocks of
// draws (through the engine's WorkProgress, which also moves the bar).
#include "atollog/engine/work_progress.hpp"

#include <functional>
#include <stdexcept>
#include <string>

namespace atollog::cli {

/// Called before each phase with what it does ("age model of KAL1 (14 ties)"); returning false
/// stops the work, which then throws AnalysisStopped.
using PhaseReport = std::function<bool(const std::string&)>;

/// The work was stopped through a PhaseReport: nothing was returned or stored.
struct AnalysisStopped : std::runtime_error {
    AnalysisStopped() : std::runtime_error("stopped before it was done") {}
};

/// Reports `text` when there is a report; throws AnalysisStopped when it says stop.
inline void reportPhase(const PhaseReport& report, const std::string& text) {
    if (report && !report(text)) throw AnalysisStopped();
}

/// Runs `work` (an engine call given a WorkProgress); an engine stop becomes AnalysisStopped.
template <class Work> auto stoppable(Work&& work) {
    try {
        return work();
    } catch (const WorkStopped&) {
        throw AnalysisStopped();
    }
}

} // namespace atollog::cli
