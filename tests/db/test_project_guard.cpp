// ProjectStore::open refuses files it must not use, with a message naming the file and what to
// do, and without writing to them. Also the migration runner.
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/schema.hpp"
#include "store_fixtures.hpp"

#include <SQLiteCpp/SQLiteCpp.h>
#include <catch2/catch.hpp>

#include <random>

using atollog::db::ProjectError;
using atollog::db::ProjectStore;
using atollog::test::TempPath;
using Catch::Matchers::Contains;
using Catch::Matchers::StartsWith;

namespace {

void writeBytes(const std::filesystem::path& file, const std::string& bytes) {
    std::ofstream(file, std::ios::binary) << bytes;
}

/// A closed project holding the every-field dataset plus `extra_occurrences` more rows.
void makeProject(const std::filesystem::path& file, int extra_occurrences = 0) {
    atollog::CoreDataset data = atollog::test::everyFieldDataset();
    for (int i = 0; i < extra_occurrences; ++i) {
        data.occurrences.push_back({"KV-1-S2", "TX-A", std::int64_t{i},
                                    atollog::OccurrenceStatus::InPlace,
                                    {{"x_note", "filler row " + std::to_string(i)}}});
    }
    ProjectStore store = ProjectStore::create(file);
    store.replaceDataset(data);
}

/// Changes (or creates) a closed SQLite file with a plain connection, as another tool would.
void tamper(const std::filesystem::path& file, const std::string& sql) {
    SQLite::Database db(file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
    db.exec(sql);
}

/// open() must throw ProjectError containing every fragment and leave the file's bytes as
/// they were (nothing in a refused file is run or written).
void checkRefused(const std::filesystem::path& file, const std::vector<std::string>& fragments) {
    const std::string before = atollog::test::fileBytes(file);
    std::string message;
    try {
        ProjectStore::open(file);
    } catch (const ProjectError& e) {
        message = e.what();
    }
    INFO("message: " << message);
    REQUIRE_FALSE(message.empty());
    for (const std::string& fragment : fragments) CHECK_THAT(message, Contains(fragment));
    CHECK(atollog::test::fileBytes(file) == before);
}

} // namespace

TEST_CASE("open refuses a missing file and a folder", "[unit]") {
    TempPath file("missing");
    CHECK_THROWS_WITH(ProjectStore::open(file.path()),
                      "cannot open project " + file.path().string() +
                          ": no such file; check the path or create a new project");
    std::filesystem::create_directory(file.path());
    CHECK_THROWS_WITH(ProjectStore::open(file.path()), Contains("it is a folder"));
}

TEST_CASE("open refuses random bytes and an empty file as not SQLite", "[unit]") {
    TempPath file("random");
    std::mt19937 random(20310203);
    std::string bytes(8192, '\0');
    for (char& c : bytes) c = static_cast<char>(random() & 0xff);
    writeBytes(file.path(), bytes);
    const std::string expected =
        "not an atollog project: " + file.path().string() + " is not an SQLite database";
    CHECK_THROWS_WITH(ProjectStore::open(file.path()), expected);
    writeBytes(file.path(), "");
    CHECK_THROWS_WITH(ProjectStore::open(file.path()), expected);
    // The right magic but garbage after it: SQLite's own header check.
    // https://www.sqlite.org/fileformat.html 1.3: "SQLite format 3\000" then the page size.
    writeBytes(file.path(), std::string("SQLite format 3\0", 16) + bytes);
    checkRefused(file.path(), {expected});
}

TEST_CASE("open refuses a truncated project as damaged", "[unit]") {
    TempPath file("truncated");
    makeProject(file.path(), 3000);
    const auto size = std::filesystem::file_size(file.path());
    REQUIRE(size > 16 * 4096); // big enough that half of it loses table pages
    std::filesystem::resize_file(file.path(), size / 2);
    checkRefused(file.path(), {file.path().string() + " is damaged: ",
                               "restore the project from a backup"});
}

TEST_CASE("open refuses an SQLite file of another program", "[unit]") {
    TempPath file("foreign");
    SECTION("tables but application id 0") {
        tamper(file.path(), "CREATE TABLE foo (a INTEGER, b TEXT); INSERT INTO foo VALUES (1, 'x')");
        checkRefused(file.path(), {file.path().string() +
                                       " is an SQLite database of another program "
                                       "(application id 0x00000000), not an atollog project"});
    }
    SECTION("another application id") {
        // https://www.sqlite.org/pragma.html#pragma_application_id
        tamper(file.path(), "PRAGMA application_id = 1234567; CREATE TABLE hole (id INTEGER)");
        checkRefused(file.path(), {"another program (application id 0x0012D687)"});
    }
    SECTION("an empty SQLite database") {
        tamper(file.path(), "PRAGMA user_version = 0");
        {
            SQLite::Database touch(file.path(), SQLite::OPEN_READWRITE);
            touch.exec("CREATE TABLE t (a); DROP TABLE t"); // makes it a non-empty file
        }
        checkRefused(file.path(), {"is an empty SQLite database; create a new project instead"});
    }
}

TEST_CASE("open refuses a project written by a newer atollog", "[unit]") {
    TempPath file("newer");
    makeProject(file.path());
    const int newer = ProjectStore::kSchemaVersion + 1;
    tamper(file.path(), "PRAGMA user_version = " + std::to_string(newer));
    checkRefused(file.path(), {file.path().string() + " was written by a newer atollog (schema " +
                               std::to_string(newer) + ", this program reads up to " +
                               std::to_string(ProjectStore::kSchemaVersion) +
                               "): update atollog"});
}

TEST_CASE("open refuses objects atollog did not create", "[unit]") {
    TempPath file("planted");
    makeProject(file.path());
    const std::string prefix = file.path().string() + " contains a ";
    const std::string suffix = " that atollog did not create: refusing to open it";
    SECTION("a trigger") {
        tamper(file.path(), "CREATE TRIGGER wipe AFTER INSERT ON hole BEGIN DELETE FROM sample; END");
        checkRefused(file.path(), {prefix + "trigger 'wipe'" + suffix});
    }
    SECTION("a view") {
        tamper(file.path(), "CREATE VIEW everything AS SELECT * FROM hole");
        checkRefused(file.path(), {prefix + "view 'everything'" + suffix});
    }
    SECTION("a table") {
        tamper(file.path(), "CREATE TABLE notes (t TEXT)");
        checkRefused(file.path(), {prefix + "table 'notes'" + suffix});
    }
    SECTION("an index") {
        tamper(file.path(), "CREATE INDEX hole_site ON hole(site)");
        checkRefused(file.path(), {prefix + "index 'hole_site'" + suffix});
    }
    SECTION("a table whose definition was rewritten") {
        // https://www.sqlite.org/pragma.html#pragma_writable_schema
        tamper(file.path(), "PRAGMA writable_schema = ON;"
                            "UPDATE sqlite_master SET sql = replace(sql, 'recovered_m >= 0',"
                            " 'recovered_m >= -1') WHERE name = 'core_run'");
        checkRefused(file.path(), {prefix + "table 'core_run' whose definition atollog did not "
                                            "write: refusing to open it"});
    }
    SECTION("a missing table") {
        tamper(file.path(), "DROP TABLE calibration_point");
        checkRefused(file.path(), {file.path().string() + " is damaged: its table "
                                                          "'calibration_point' is missing"});
    }
    SECTION("our application id without a schema version") {
        tamper(file.path(), "PRAGMA user_version = 0");
        checkRefused(file.path(), {"is damaged: it carries atollog's application id but schema "
                                   "version 0"});
    }
}

TEST_CASE("open accepts statistics tables left by ANALYZE", "[unit]") {
    TempPath file("analyzed");
    makeProject(file.path());
    tamper(file.path(), "ANALYZE");
    ProjectStore store = ProjectStore::open(file.path());
    CHECK(store.loadDataset() == atollog::test::everyFieldDataset());
}

TEST_CASE("A version 1 project is migrated to the current schema with its data intact",
          "[unit]") {
    TempPath file("v1");
    {
        // A file exactly as schema version 1 left it: only the first migration, our id.
        SQLite::Database raw(file.path(), SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE);
        SQLite::Transaction t(raw);
        atollog::db::applyMigrations(raw, {atollog::db::projectMigrations().front()});
        raw.exec("PRAGMA application_id = " + std::to_string(ProjectStore::kApplicationId));
        raw.exec("INSERT INTO hole (id, hole, site, kind) VALUES (1, 'MIG-1', 'Old site', 'core')");
        t.commit();
        REQUIRE(atollog::db::readUserVersion(raw) == 1);
    }
    ProjectStore store = ProjectStore::open(file.path());
    CHECK(store.schemaVersion() == ProjectStore::kSchemaVersion);
    const auto data = store.loadDataset();
    REQUIRE(data.holes.size() == 1);
    CHECK(data.holes[0].hole == "MIG-1");
    CHECK(store.database().tableExists("tie_point"));
}

TEST_CASE("The migration list runs 1..kSchemaVersion in order", "[unit]") {
    const auto& migrations = atollog::db::projectMigrations();
    REQUIRE_FALSE(migrations.empty());
    for (std::size_t i = 0; i < migrations.size(); ++i) {
        CHECK(migrations[i].version == static_cast<int>(i + 1));
    }
    CHECK(migrations.back().version == ProjectStore::kSchemaVersion);
}

TEST_CASE("applyMigrations runs only the missing steps and stops at a failing one", "[unit]") {
    using atollog::db::Migration;
    SQLite::Database db(":memory:", SQLite::OPEN_READWRITE);
    const std::vector<Migration> v1{{1, "CREATE TABLE core_box (id INTEGER PRIMARY KEY)"}};
    atollog::db::applyMigrations(db, v1);
    CHECK(atollog::db::readUserVersion(db) == 1);
    db.exec("INSERT INTO core_box (id) VALUES (7)");

    std::vector<Migration> v2 = v1; // re-running step 1 would fail: the table exists
    v2.push_back({2, "ALTER TABLE core_box ADD COLUMN shelf TEXT"});
    atollog::db::applyMigrations(db, v2);
    CHECK(atollog::db::readUserVersion(db) == 2);
    CHECK(db.execAndGet("SELECT count(*) FROM core_box WHERE shelf IS NULL").getInt() == 1);

    std::vector<Migration> v4 = v2;
    v4.push_back({3, "CREATE TABLE tray (id INTEGER)"});
    v4.push_back({4, "THIS IS NOT SQL"});
    {
        SQLite::Transaction transaction(db);
        CHECK_THROWS_AS(atollog::db::applyMigrations(db, v4), SQLite::Exception);
    } // rolled back
    CHECK(atollog::db::readUserVersion(db) == 2);
    CHECK_FALSE(db.tableExists("tray"));
}

TEST_CASE("The expected schema of the current version is what create writes", "[unit]") {
    TempPath file("schema");
    ProjectStore store = ProjectStore::create(file.path());
    const auto objects = atollog::db::readSchemaObjects(store.database());
    CHECK(objects == atollog::db::expectedSchemaObjects(ProjectStore::kSchemaVersion));
    // Every table of the contributor guide's list is there.
    std::vector<std::string> tables;
    for (const auto& o : objects) {
        if (o.type == "table") tables.push_back(o.name);
    }
    CHECK(tables == std::vector<std::string>{
                        "age_model_hiatus", "age_model_hole", "age_model_point", "age_model_rate",
                        "calibration_point", "core_run", "free_attribute", "free_column", "hole",
                        "lith_interval", "model_run", "numerical_date", "occurrence", "sample",
                        "sea_level_point", "sequence_event", "taxon", "tie_point",
                        "time_scale_event", "zone"});
}
