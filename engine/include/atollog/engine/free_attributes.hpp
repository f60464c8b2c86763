#pragma once
// Free attributes: the x_ columns of a core data folder row, kept verbatim and exported back.
#include <string>
#include <utility>
#include <vector>

namespace atollog {

/// Column name (starting with "x_") and cell text, in the column order of the source table.
/// Only non-empty cells are stored; an empty cell means "not given".
using FreeAttributes = std::vector<std::pair<std::string, std::string>>;

} // namespace atollog
