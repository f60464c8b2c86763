// Project files edited by other tools or built to attack: what test_project_guard.cpp does not
// already cover. Each must be refused with a ProjectError (at open, or at the first read of the
// rows it spoils), never loaded as silently different data, and nothing stored in the file may
// run. SQLite facts relied on, from its documentation: PRAGMA quick_check verifies CHECK and
// NOT NULL constraints but not foreign keys (https://www.sqlite.org/pragma.html#pragma_quick_check);
// PRAGMA ignore_check_constraints lets another tool store rows that break them
// (https://www.sqlite.org/pragma.html#pragma_ignore_check_constraints); a column's declared
// type does not stop a text value in a REAL column without a CHECK
// (https://www.sqlite.org/datatype3.html, "Type Affinity"); a WAL file's committed frames are
// part of the database (https://www.sqlite.org/wal.html).
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/SQLiteCpp.h>
#include <catch2/catch.hpp>
#include <sqlite3.h>

using atollog::db::ProjectError;
using atollog::db::ProjectStore;
using atollog::test::TempPath;
using Catch::Matchers::Contains;

namespace {

void makeProject(const std::filesystem::path& file) {
    ProjectStore store = ProjectStore::create(file);
    store.replaceDataset(atollog::test::everyFieldDataset());
}

/// Changes a closed project with a plain connection, as another tool would.
void tamper(const std::filesystem::path& file, const std::string& sql) {
    SQLite::Database db(file, SQLite::OPEN_READWRITE);
    db.exec(sql);
}

/// The message of the ProjectError that opening and then reading the project throws; "" when
/// the project opens and loads.
std::string openAndLoadError(const std::filesystem::path& file) {
    try {
        ProjectStore store = ProjectStore::open(file);
        (void)store.loadDataset();
        (void)store.modelRuns();
    } catch (const ProjectError& e) {
        return e.what();
    }
    return "";
}

} // namespace

TEST_CASE("A CHECK constraint removed through writable_schema is refused at open", "[unit]") {
    TempPath file("check-removed");
    makeProject(file.path());
    // The vocabulary CHECK of hole.kind, dropped, so that any word could then be stored.
    tamper(file.path(),
           "PRAGMA writable_schema = ON;"
           "UPDATE sqlite_master SET sql = replace(sql, substr(sql, instr(sql, 'CHECK (kind'),"
           " instr(substr(sql, instr(sql, 'CHECK (kind')), ')')), '')"
           " WHERE name = 'hole'");
    {
        SQLite::Database raw(file.path(), SQLite::OPEN_READONLY);
        REQUIRE_THAT(raw.execAndGet("SELECT sql FROM sqlite_master WHERE name = 'hole'")
                         .getString(),
                     !Contains("CHECK (kind"));
    }
    const std::string before = atollog::test::fileBytes(file.path());
    CHECK_THAT(openAndLoadError(file.path()),
               Contains("table 'hole' whose definition atollog did not write"));
    CHECK(atollog::test::fileBytes(file.path()) == before);
}

TEST_CASE("A CHECK rewritten to call a function is refused before anything evaluates it",
          "[unit]") {
    TempPath file("check-calls");
    makeProject(file.path());
    // Were this CHECK evaluated (quick_check evaluates CHECKs), it would try to load a library.
    // The schema comparison runs first, and extension loading is off in any case.
    tamper(file.path(),
           "PRAGMA writable_schema = ON;"
           "UPDATE sqlite_master SET sql = replace(sql, 'recovered_m >= 0',"
           " 'recovered_m >= 0 AND load_extension(''/nonexistent/atollog-planted'') IS NULL')"
           " WHERE name = 'core_run'");
    const std::string before = atollog::test::fileBytes(file.path());
    CHECK_THAT(openAndLoadError(file.path()),
               Contains("table 'core_run' whose definition atollog did not write"));
    CHECK(atollog::test::fileBytes(file.path()) == before);
}

TEST_CASE("Rows stored against the CHECK constraints are refused as damaged", "[unit]") {
    TempPath file("ignored-checks");
    makeProject(file.path());
    tamper(file.path(), "PRAGMA ignore_check_constraints = ON;"
                        "UPDATE hole SET kind = 'volcano' WHERE hole = 'KV-1'");
    CHECK_THAT(openAndLoadError(file.path()),
               Contains("is damaged") && Contains("restore the project from a backup"));
}

TEST_CASE("Text stored in a number column is refused, not read as 0", "[unit]") {
    TempPath file("text-in-real");
    makeProject(file.path());
    // hole.lat_deg has no CHECK; REAL affinity keeps a word as text.
    tamper(file.path(), "UPDATE hole SET lat_deg = 'north' WHERE hole = 'KV-1'");
    {
        SQLite::Database raw(file.path(), SQLite::OPEN_READONLY);
        REQUIRE(raw.execAndGet("SELECT typeof(lat_deg) FROM hole WHERE hole = 'KV-1'")
                    .getString() == "text");
    }
    CHECK_THAT(openAndLoadError(file.path()),
               Contains("lat_deg") && Contains("changed outside atollog"));
}

TEST_CASE("Rows whose parent was deleted with foreign keys off are refused at load", "[unit]") {
    TempPath file("orphans");
    makeProject(file.path());
    tamper(file.path(), "PRAGMA foreign_keys = OFF; DELETE FROM taxon WHERE taxon = 'TX-B'");
    CHECK_THAT(openAndLoadError(file.path()),
               Contains("refers to no row") && Contains("changed outside atollog"));
}

TEST_CASE("A trigger planted only in the WAL file is refused, and the refusal writes nothing",
          "[unit]") {
    TempPath file("planted-wal");
    makeProject(file.path());
    {
        SQLite::Database db(file.path(), SQLite::OPEN_READWRITE);
        // Keep the change in the -wal file: no checkpoint when this connection closes.
        // https://www.sqlite.org/c3ref/c_dbconfig_defensive.html (SQLITE_DBCONFIG_NO_CKPT_ON_CLOSE)
        REQUIRE(sqlite3_db_config(db.getHandle(), SQLITE_DBCONFIG_NO_CKPT_ON_CLOSE, 1, nullptr) ==
                SQLITE_OK);
        db.exec("CREATE TRIGGER wipe AFTER INSERT ON model_run BEGIN DELETE FROM hole; END");
    }
    const std::filesystem::path wal = file.path().string() + "-wal";
    REQUIRE(std::filesystem::exists(wal));
    REQUIRE(std::filesystem::file_size(wal) > 0);
    const std::string main_before = atollog::test::fileBytes(file.path());
    const std::string wal_before = atollog::test::fileBytes(wal);

    CHECK_THAT(openAndLoadError(file.path()),
               Contains("trigger 'wipe' that atollog did not create"));
    // Closing the refused connection must not checkpoint the planted frames into the file.
    CHECK(atollog::test::fileBytes(file.path()) == main_before);
    CHECK(std::filesystem::exists(wal));
    CHECK(atollog::test::fileBytes(wal) == wal_before);
}
