#pragma once
// Load and save of the dataset tables (internal to atollog::db). The caller owns the
// transaction; these functions only run statements.
#include "atollog/engine/core_dataset.hpp"

#include <SQLiteCpp/Database.h>

#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace atollog::db::detail {

/// The SQL table holding the rows of `t` ("hole", "core_run", ...).
std::string_view sqlTableName(Table t);

/// Every dataset row, in stored order. Throws ProjectError for content the schema should have
/// kept out (an unknown word, a dangling reference): the file was edited by another tool.
CoreDataset loadDatasetRows(SQLite::Database& db);

/// Stored ids (`id` column) of the loaded rows, in the order of the dataset's vectors.
struct DatasetRowIds {
    std::vector<std::int64_t> holes, runs, intervals, samples, taxa, occurrences, events, dates,
        zones;
};
/// The rows a scoped load reads (stored ids): the scope a row edit is checked in. Holes, taxa,
/// events, zones, sea level and curve are always read whole.
struct LoadScope {
    std::vector<std::int64_t> hole_ids;   ///< runs, intervals, samples and dates of these holes
    std::vector<std::int64_t> run_ids;    ///< and these runs
    std::vector<std::int64_t> sample_ids; ///< and these samples, with their occurrences
};
/// As above; with a `scope`, only its rows (and the samples its dates name), with no other
/// occurrences than those of scope.sample_ids. Fills `row_ids` if given.
CoreDataset loadDatasetRows(SQLite::Database& db, const LoadScope* scope,
                            DatasetRowIds* row_ids);

/// Deletes every dataset row (not the model runs).
void deleteDatasetRows(SQLite::Database& db);

/// Inserts every row of `data` into empty dataset tables. Throws ProjectError naming the table,
/// the 1-based row and the problem (unknown reference, NaN, constraint) on the first failure.
void insertDatasetRows(SQLite::Database& db, const CoreDataset& data);

/// The CREATE INDEX statements of schema `version` (not the automatic UNIQUE indexes). Taken
/// from our migrations, never from the file, so nothing stored in a file is ever executed.
std::vector<std::string> indexStatements(int version);
/// Drops the indexes `indexStatements` creates, for a bulk insert; the caller recreates them
/// with `createIndexes` before commit (building an index once is faster than growing it).
void dropIndexes(SQLite::Database& db, int version);
void createIndexes(SQLite::Database& db, int version);

/// PRAGMA foreign_key_check over the whole file: throws ProjectError naming the first row whose
/// reference resolves to nothing.
void checkForeignKeys(SQLite::Database& db);

/// Number of stored rows of table `t`.
std::int64_t countRows(SQLite::Database& db, Table t);

} // namespace atollog::db::detail
