#pragma once
// One data record of a core data folder table into its value type (core_records.hpp).
#include "atollog/engine/core_dataset.hpp"
#include "row_cells.hpp"

namespace atollog::db::folder_io {

/// Appends the record held by `cells` to the table's vector in `data` when all of its cells are
/// good; returns whether it did. Bad cells are reported through `cells`.
bool appendRecord(Table table, RowCells& cells, CoreDataset& data);

} // namespace atollog::db::folder_io
