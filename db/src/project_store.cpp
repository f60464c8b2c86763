// ProjectStore: the one owner of the project's SQLite connection. Creating, opening (with the
// checks of project_guard and forward migration), loading and replacing the dataset.
#include "atollog/db/project_store.hpp"

#include "atollog/db/errors.hpp"
#include "atollog/db/schema.hpp"
#include "dataset_rows.hpp"
#include "project_guard.hpp"
#include "write_transaction.hpp"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Exception.h>
#include <SQLiteCpp/Transaction.h>

namespace atollog::db {
namespace {

// Foreign keys are checked once over the whole file before a bulk replace commits, instead of
// row by row: PRAGMA foreign_keys cannot change inside a transaction, so it is switched off
// around it and back on however the replace ends. With it off, DELETE of a whole table takes
// SQLite's truncate path. https://www.sqlite.org/foreignkeys.html section 2.
class ForeignKeysCheckedAtEnd {
  public:
    explicit ForeignKeysCheckedAtEnd(SQLite::Database& db) : db_(db) {
        db_.exec("PRAGMA foreign_keys = OFF");
    }
    ForeignKeysCheckedAtEnd(const ForeignKeysCheckedAtEnd&) = delete;
    ForeignKeysCheckedAtEnd& operator=(const ForeignKeysCheckedAtEnd&) = delete;
    ~ForeignKeysCheckedAtEnd() { db_.tryExec("PRAGMA foreign_keys = ON"); }

  private:
    SQLite::Database& db_;
};

// A failed create must not leave a file that later looks like a project.
void removeCreatedFiles(const std::filesystem::path& file) {
    std::error_code ignored;
    for (const char* suffix : {"", "-wal", "-shm", "-journal"}) {
        std::filesystem::remove(file.string() + suffix, ignored);
    }
}

} // namespace

ProjectStore::ProjectStore(std::filesystem::path path, std::unique_ptr<SQLite::Database> db)
    : path_(std::move(path)), db_(std::move(db)) {}

ProjectStore::ProjectStore(ProjectStore&&) noexcept = default;
ProjectStore& ProjectStore::operator=(ProjectStore&&) noexcept = default;
ProjectStore::~ProjectStore() = default;

ProjectStore ProjectStore::create(const std::filesystem::path& file) {
    std::error_code ec;
    // symlink_status: a dangling link counts as existing, since SQLite would create its target.
    if (std::filesystem::exists(std::filesystem::symlink_status(file, ec))) {
        throw ProjectError("cannot create project " + file.string() +
                           ": a file of that name exists; choose another name or open it");
    }
    std::unique_ptr<SQLite::Database> db;
    detail::configureSqliteProcess();
    try {
        // NOMUTEX: a store's connection is used by one thread at a time (DEVELOPERS.md), so
        // SQLite's per-call connection mutex is pure cost (a twentieth of an import).
        db = std::make_unique<SQLite::Database>(
            file, SQLite::OPEN_READWRITE | SQLite::OPEN_CREATE | SQLite::OPEN_NOMUTEX);
        detail::hardenConnection(*db);
        detail::configureProjectConnection(*db, file);
        detail::WriteTransaction transaction(*db);
        db->exec("PRAGMA application_id = " + std::to_string(kApplicationId));
        applyMigrations(*db, projectMigrations());
        transaction.commit();
    } catch (const SQLite::Exception& e) {
        db.reset();
        removeCreatedFiles(file);
        throw ProjectError("cannot create project " + file.string() + ": " + e.what() +
                           "; check that the folder exists and is writable");
    } catch (const ProjectError&) {
        db.reset();
        removeCreatedFiles(file);
        throw;
    }
    return ProjectStore(file, std::move(db));
}

ProjectStore ProjectStore::open(const std::filesystem::path& file) {
    std::unique_ptr<SQLite::Database> db = detail::openCheckedProject(file);
    try {
        detail::configureProjectConnection(*db, file);
        if (readUserVersion(*db) < kSchemaVersion) {
            detail::WriteTransaction transaction(*db);
            applyMigrations(*db, projectMigrations());
            transaction.commit();
        }
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot open project " + file.string() + ": " + e.what());
    }
    return ProjectStore(file, std::move(db));
}

int ProjectStore::schemaVersion() const { return readUserVersion(*db_); }

SQLite::Database& ProjectStore::database() { return *db_; }

CoreDataset ProjectStore::loadDataset() const {
    try {
        // One read transaction: a concurrent writer cannot show us half of its change.
        SQLite::Transaction transaction(*db_);
        CoreDataset data = detail::loadDatasetRows(*db_);
        transaction.commit();
        return data;
    } catch (const ProjectError& e) {
        throw ProjectError("cannot read the dataset of " + path_.string() + ": " + e.what());
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot read the dataset of " + path_.string() + ": " + e.what());
    }
}

void ProjectStore::replaceDatasetRows(const CoreDataset& data) {
    const int version = schemaVersion();
    detail::deleteDatasetRows(*db_);
    detail::dropIndexes(*db_, version);
    detail::insertDatasetRows(*db_, data);
    detail::createIndexes(*db_, version);
    detail::checkForeignKeys(*db_);
}

void ProjectStore::replaceDataset(const CoreDataset& data) {
    try {
        ForeignKeysCheckedAtEnd foreign_keys(*db_);
        detail::WriteTransaction transaction(*db_);
        replaceDatasetRows(data);
        transaction.commit();
    } catch (const ProjectError& e) {
        throw ProjectError("cannot save the dataset to " + path_.string() + ": " + e.what() +
                           "; the project is unchanged");
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot save the dataset to " + path_.string() + ": " + e.what() +
                           "; the project is unchanged");
    }
}

std::int64_t ProjectStore::replaceDataset(const CoreDataset& data, ModelRunRecord produced_by,
                                          const std::function<void(ModelRunRecord&)>& complete_run) {
    try {
        ForeignKeysCheckedAtEnd foreign_keys(*db_);
        detail::WriteTransaction transaction(*db_);
        replaceDatasetRows(data);
        if (complete_run) complete_run(produced_by);
        const std::int64_t run_id = insertModelRun(produced_by);
        transaction.commit();
        return run_id;
    } catch (const ProjectError& e) {
        throw ProjectError("cannot save the dataset to " + path_.string() + ": " + e.what() +
                           "; the project is unchanged");
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot save the dataset to " + path_.string() + ": " + e.what() +
                           "; the project is unchanged");
    }
}

bool ProjectStore::hasData() const {
    for (Table t : {Table::Holes, Table::Runs, Table::Intervals, Table::Samples, Table::Taxa,
                    Table::Occurrences, Table::Events, Table::Dates, Table::Zones,
                    Table::SeaLevel, Table::Curve}) {
        if (rowCount(t) > 0) return true;
    }
    return false;
}

std::int64_t ProjectStore::rowCount(Table table) const { return detail::countRows(*db_, table); }

} // namespace atollog::db
