#pragma once
// The provenance line of a run the viewer or a command stored (or found already stored):
// "stored as run #12" or "unchanged since run #12".
#include "cli/age_model_run.hpp"

#include <string>

namespace atollog::cli {

std::string storedRunNote(const StoredRunOutcome& outcome);

} // namespace atollog::cli
