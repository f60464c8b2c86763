#include "cli/stored_run_note.hpp"

namespace atollog::cli {

std::string storedRunNote(const StoredRunOutcome& outcome) {
    return (outcome.unchanged ? "unchanged since run #" : "stored as run #") +
           std::to_string(outcome.run_id);
}

} // namespace atollog::cli
