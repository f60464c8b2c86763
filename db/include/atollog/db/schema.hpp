#pragma once
// The project file's schema: an ordered list of migrations, each taking the file from
// version - 1 to version. Version 1 creates everything; later versions alter it. The SQL text of
// a released migration never changes: the open-time check compares the file's schema with the
// one these statements produce, so an edited migration would make old files look foreign.
#include <string>
#include <string_view>
#include <vector>

namespace SQLite { class Database; }

namespace atollog::db {

struct Migration {
    int version = 0;     ///< user_version after this migration has run
    std::string sql;     ///< one or more statements
};

/// The project schema's migrations, versions 1, 2, ... ProjectStore::kSchemaVersion in order.
const std::vector<Migration>& projectMigrations();

/// Runs every migration of `migrations` whose version is above the file's user_version, then
/// sets user_version to the last one run. The caller holds the transaction: a failing migration
/// then leaves the file at its old version.
void applyMigrations(SQLite::Database& db, const std::vector<Migration>& migrations);

/// PRAGMA user_version of `db`.
int readUserVersion(SQLite::Database& db);
/// PRAGMA application_id of `db`.
int readApplicationId(SQLite::Database& db);

/// One row of sqlite_master: what the open-time check compares.
struct SchemaObject {
    std::string type;        ///< table, index, view, trigger
    std::string name;
    std::string table_name;  ///< the table an index or trigger belongs to
    std::string sql;         ///< empty for indexes SQLite creates for UNIQUE constraints
    bool operator==(const SchemaObject&) const = default;
};

/// Every object of `db`'s sqlite_master (main schema), sorted by type and name.
std::vector<SchemaObject> readSchemaObjects(SQLite::Database& db);

/// The objects a project of `version` holds: the migrations up to `version` replayed on an
/// in-memory database.
std::vector<SchemaObject> expectedSchemaObjects(int version);

} // namespace atollog::db
