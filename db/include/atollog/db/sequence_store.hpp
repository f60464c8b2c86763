#pragma once
// Composite sequences stored per model run (schema version 4), so an order of events used in a
// report or drawn between columns can be traced to the run (settings, seed, inputs hash) that
// made it.
#include "atollog/db/project_store.hpp"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace atollog::db {

struct StoredSequenceEvent {
    int rank = 0; ///< 1 = oldest
    std::string event;
    std::string kind; ///< "base", "top" or "dated"
    std::optional<std::string> taxon;
    int position_min = 0, position_max = 0; ///< 1-based ranks among near-best orders
    bool operator==(const StoredSequenceEvent&) const = default;
};

/// Records `run` and its sequence in one transaction; returns the run's id. Throws
/// std::invalid_argument when ranks are not 1..n in order or a rank lies outside its range.
std::int64_t storeSequence(ProjectStore& store, ModelRunRecord run,
                           const std::vector<StoredSequenceEvent>& events);

/// The sequence stored with one run, oldest first.
std::vector<StoredSequenceEvent> loadSequence(ProjectStore& store, std::int64_t run_id);

} // namespace atollog::db
