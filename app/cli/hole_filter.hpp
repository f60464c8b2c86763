#pragma once
// The `--hole` filter of the biostratigraphy tables (ranges, datums, zones) and of the viewer's
// analyses: a hole that is not in the project is an error naming the holes there are.
#include "atollog/engine/core_dataset.hpp"

#include <string>

namespace atollog::cli {

/// Throws std::invalid_argument naming the project's holes when `hole` (non-empty) is not one.
void requireHole(const CoreDataset& data, const std::string& hole);

/// Whether a row of `hole` passes the filter (an empty filter passes every hole).
inline bool wantedHole(const std::string& filter, const std::string& hole) {
    return filter.empty() || filter == hole;
}

} // namespace atollog::cli
