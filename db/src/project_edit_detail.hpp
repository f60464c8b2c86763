#pragma once
// Internals of applyEdit (internal to atollog::db): the scope an edit is checked in, the edit
// applied to it in memory, the comparison of the engine's issues before and after, and the SQL
// that writes one row. One file each: project_edit_scope.cpp, project_edit_check.cpp,
// project_edit_sql.cpp; project_edits.cpp ties them together.
#include "atollog/db/project_edits.hpp"
#include "dataset_rows.hpp"

#include <SQLiteCpp/Database.h>

#include <cstddef>
#include <optional>
#include <string>
#include <vector>

namespace atollog::db::detail {

/// Which vector of CoreDataset and DatasetRowIds holds rows of type Row.
template <class Row> struct RowTable;
template <> struct RowTable<Hole> {
    static constexpr Table table = Table::Holes;
    static constexpr auto rows = &CoreDataset::holes;
    static constexpr auto ids = &DatasetRowIds::holes;
};
template <> struct RowTable<CoreRun> {
    static constexpr Table table = Table::Runs;
    static constexpr auto rows = &CoreDataset::runs;
    static constexpr auto ids = &DatasetRowIds::runs;
};
template <> struct RowTable<LithInterval> {
    static constexpr Table table = Table::Intervals;
    static constexpr auto rows = &CoreDataset::intervals;
    static constexpr auto ids = &DatasetRowIds::intervals;
};
template <> struct RowTable<Sample> {
    static constexpr Table table = Table::Samples;
    static constexpr auto rows = &CoreDataset::samples;
    static constexpr auto ids = &DatasetRowIds::samples;
};
template <> struct RowTable<Occurrence> {
    static constexpr Table table = Table::Occurrences;
    static constexpr auto rows = &CoreDataset::occurrences;
    static constexpr auto ids = &DatasetRowIds::occurrences;
};
template <> struct RowTable<TimeScaleEvent> {
    static constexpr Table table = Table::Events;
    static constexpr auto rows = &CoreDataset::events;
    static constexpr auto ids = &DatasetRowIds::events;
};
template <> struct RowTable<NumericalDate> {
    static constexpr Table table = Table::Dates;
    static constexpr auto rows = &CoreDataset::dates;
    static constexpr auto ids = &DatasetRowIds::dates;
};
template <> struct RowTable<Zone> {
    static constexpr Table table = Table::Zones;
    static constexpr auto rows = &CoreDataset::zones;
    static constexpr auto ids = &DatasetRowIds::zones;
};

// --- scope (project_edit_scope.cpp) ---

/// What an edit is checked against: the rows validateDataset relates to the edited row (see
/// addScopeOf in project_edit_scope.cpp), read under the write lock. Rows outside the scope
/// cannot gain or lose an issue through the edit, so the edited rows get the same issues as
/// in a check of the whole project; issues of the scope's partial view (e.g. a hole whose runs
/// are not read) are the same before and after and cancel out.
struct EditScope {
    CoreDataset data;
    DatasetRowIds ids;
};
EditScope loadEditScope(SQLite::Database& db, const RowEdit& edit);

/// Index of the first row of the scope equal to `row`, and its stored id.
struct RowPlace {
    std::size_t index = 0;
    std::int64_t id = 0;
};
std::optional<RowPlace> findRow(const EditScope& scope, const EditableRow& row);

/// The scope's dataset with the edit applied the way SQL will apply it: an added row at the
/// place of its stored id, an update in place, and a changed id (hole, sample, event) carried
/// to the rows that refer to it (they refer by stored id). Returns the index of the edited row
/// in the result (none for a removal). `ids` are updated alike.
std::optional<std::size_t> applyInMemory(CoreDataset& data, DatasetRowIds& ids,
                                         const RowEdit& edit, std::optional<RowPlace> place,
                                         std::int64_t added_id);

/// "run 'KV-1-R2' of hole 'KV-1'", "interval 1.25-2 m of hole 'KV-1'", ...
std::string rowKey(const EditableRow& row);
/// The key of row `index` of `table` in `data` ("row N" for tables that are not edited here).
std::string rowKey(const CoreDataset& data, Table table, std::size_t index);

// --- check (project_edit_check.cpp) ---

struct EditCheck {
    std::vector<EditProblem> refusals; ///< errors the edit brings in
    std::vector<EditProblem> warnings; ///< warnings the edit brings in
};
/// Compares validateDataset before and after: an issue counts as brought in when the same
/// issue (table, column, value, problem, fix, and whether it is on the edited row) is not
/// among the issues before. Issues elsewhere that were there already do not block. A row
/// number in a refusal ("data row 3") is turned from the scope's numbering (`after_ids` are
/// the stored ids of `after`'s rows) into the row's place in the whole stored table.
EditCheck checkEdit(SQLite::Database& db, const CoreDataset& before,
                    std::optional<std::size_t> edited_before, const CoreDataset& after,
                    const DatasetRowIds& after_ids, std::optional<std::size_t> edited_after,
                    Table table);

// --- SQL (project_edit_sql.cpp) ---

/// The stored id an added row gets: `wanted` when given and free, else one past the last.
std::int64_t idForAddedRow(SQLite::Database& db, Table table, std::optional<std::int64_t> wanted);
void insertRow(SQLite::Database& db, std::int64_t id, const EditableRow& row);
void updateRow(SQLite::Database& db, std::int64_t id, const EditableRow& row);
void deleteRow(SQLite::Database& db, std::int64_t id, const EditableRow& row);
/// Rows that still refer to the stored row (runs of a hole, occurrences of a sample, zones of
/// an event): removing it is refused while any exist.
std::optional<EditProblem> rowsReferringTo(SQLite::Database& db, std::int64_t id,
                                           const EditableRow& row);

} // namespace atollog::db::detail
