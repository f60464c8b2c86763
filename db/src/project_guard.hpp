#pragma once
// Open-time checks of a project file (internal to atollog::db). A project may come from anyone:
// nothing stored in it is run before it has been shown to hold only atollog's own schema.
#include <SQLiteCpp/Database.h>

#include <filesystem>
#include <memory>

namespace atollog::db::detail {

/// Process-wide SQLite settings, applied once before the first connection: memory statistics
/// off (they take a global mutex on every allocation, and atollog never reads them). Harmless
/// when SQLite was already started by someone else: the setting is then left as it was.
void configureSqliteProcess();

/// Settings every connection gets before it reads anything: triggers, views, untrusted schema
/// functions and extension loading off; defensive mode on; busy timeout 5000 ms.
void hardenConnection(SQLite::Database& db);

/// Settings of a checked project connection: foreign keys, WAL, synchronous=NORMAL, page cache.
/// journal_mode writes the file header, so this runs only after the checks.
void configureProjectConnection(SQLite::Database& db, const std::filesystem::path& file);

/// Opens `file` and checks that it is an atollog project this program can read: SQLite, our
/// application id, a schema version not newer than ours, exactly our schema objects, and a
/// passing quick_check. Writes nothing. Throws ProjectError naming the file and what to do.
std::unique_ptr<SQLite::Database> openCheckedProject(const std::filesystem::path& file);

} // namespace atollog::db::detail
