// Open-time checks: is this file an atollog project, from a version we can read, holding only
// the objects we create, and undamaged? The order matters. The file header is read by hand
// before SQLite sees the file; sqlite_master is compared with our schema before anything that
// could evaluate stored SQL (quick_check evaluates CHECK expressions) and before any write.
#include "project_guard.hpp"

#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/schema.hpp"

#include <SQLiteCpp/Statement.h>
#include <sqlite3.h>

#include <array>
#include <cstdio>
#include <fstream>
#include <map>
#include <mutex>
#include <sstream>

namespace atollog::db::detail {
namespace {

// https://www.sqlite.org/fileformat.html, 1.3: every database file starts with these 16 bytes.
constexpr std::string_view kSqliteMagic{"SQLite format 3\0", 16};

std::string hexId(int id) {
    std::array<char, 16> text{};
    std::snprintf(text.data(), text.size(), "0x%08X", static_cast<unsigned>(id));
    return text.data();
}

void setConfig(SQLite::Database& db, int option, int value, const char* what) {
    if (sqlite3_db_config(db.getHandle(), option, value, nullptr) != SQLITE_OK) {
        throw ProjectError(std::string("cannot configure the SQLite connection: ") + what);
    }
}

void checkHeader(const std::filesystem::path& file) {
    std::error_code ec;
    const auto status = std::filesystem::status(file, ec);
    if (!std::filesystem::exists(status)) {
        throw ProjectError("cannot open project " + file.string() +
                           ": no such file; check the path or create a new project");
    }
    if (std::filesystem::is_directory(status)) {
        throw ProjectError("cannot open project " + file.string() +
                           ": it is a folder, not a project file");
    }
    std::ifstream in(file, std::ios::binary);
    if (!in) {
        throw ProjectError("cannot open project " + file.string() +
                           ": the file cannot be read; check its permissions");
    }
    std::string head(kSqliteMagic.size(), '\0');
    in.read(head.data(), static_cast<std::streamsize>(head.size()));
    if (static_cast<std::size_t>(in.gcount()) != head.size() || head != kSqliteMagic) {
        throw ProjectError("not an atollog project: " + file.string() +
                           " is not an SQLite database");
    }
}

std::string describe(const SchemaObject& o) { return o.type + " '" + o.name + "'"; }

// sqlite_stat1 and sqlite_stat4 appear when someone runs ANALYZE with an SQLite tool; that is
// harmless and does not make the file foreign. Their definitions are fixed by SQLite.
bool isAnalyzeTable(const SchemaObject& o) {
    return o.type == "table" &&
           ((o.name == "sqlite_stat1" && o.sql == "CREATE TABLE sqlite_stat1(tbl,idx,stat)") ||
            (o.name == "sqlite_stat4" &&
             o.sql == "CREATE TABLE sqlite_stat4(tbl,idx,neq,nlt,ndlt,sample)"));
}

void checkSchemaObjects(SQLite::Database& db, const std::filesystem::path& file, int version) {
    std::map<std::pair<std::string, std::string>, SchemaObject> expected;
    for (SchemaObject& o : expectedSchemaObjects(version)) {
        expected.emplace(std::pair{o.type, o.name}, std::move(o));
    }
    for (const SchemaObject& found : readSchemaObjects(db)) {
        if (isAnalyzeTable(found)) continue;
        const auto it = expected.find({found.type, found.name});
        if (it == expected.end()) {
            throw ProjectError(file.string() + " contains a " + describe(found) +
                               " that atollog did not create: refusing to open it");
        }
        if (it->second != found) {
            throw ProjectError(file.string() + " contains a " + describe(found) +
                               " whose definition atollog did not write: refusing to open it");
        }
        expected.erase(it);
    }
    if (!expected.empty()) {
        throw ProjectError(file.string() + " is damaged: its " +
                           describe(expected.begin()->second) +
                           " is missing; restore the project from a backup");
    }
}

void checkIntegrity(SQLite::Database& db, const std::filesystem::path& file) {
    SQLite::Statement check(db, "PRAGMA quick_check(5)");
    std::string problems;
    while (check.executeStep()) {
        const std::string line = check.getColumn(0).getString();
        if (line == "ok") return;
        problems += (problems.empty() ? "" : "; ") + line;
    }
    throw ProjectError(file.string() + " is damaged: " + problems +
                       "; restore the project from a backup");
}

} // namespace

void configureSqliteProcess() {
    static std::once_flag once;
    std::call_once(once, [] {
        // SQLITE_MISUSE when SQLite is already initialised: nothing to do then.
        (void)sqlite3_config(SQLITE_CONFIG_MEMSTATUS, 0);
    });
}

void hardenConnection(SQLite::Database& db) {
    // https://www.sqlite.org/c3ref/c_dbconfig_defensive.html and
    // https://www.sqlite.org/security.html ("Untrusted SQLite Database Files").
    setConfig(db, SQLITE_DBCONFIG_DEFENSIVE, 1, "defensive mode");
    setConfig(db, SQLITE_DBCONFIG_TRUSTED_SCHEMA, 0, "untrusted schema");
    setConfig(db, SQLITE_DBCONFIG_ENABLE_TRIGGER, 0, "triggers off");
    setConfig(db, SQLITE_DBCONFIG_ENABLE_VIEW, 0, "views off");
    setConfig(db, SQLITE_DBCONFIG_ENABLE_LOAD_EXTENSION, 0, "extension loading off");
    db.exec("PRAGMA trusted_schema = OFF");
    db.setBusyTimeout(5000);
}

void configureProjectConnection(SQLite::Database& db, const std::filesystem::path& file) {
    setConfig(db, SQLITE_DBCONFIG_NO_CKPT_ON_CLOSE, 0, "checkpoint on close");
    db.exec("PRAGMA foreign_keys = ON");
    // A larger page cache keeps the occurrence indexes in memory during a bulk replace.
    db.exec("PRAGMA cache_size = -65536");
    const std::string mode = db.execAndGet("PRAGMA journal_mode = WAL").getString();
    if (mode != "wal") {
        throw ProjectError("cannot use " + file.string() + ": SQLite refused WAL journal mode (" +
                           mode + "); is the file on a network drive or read-only medium?");
    }
    db.exec("PRAGMA synchronous = NORMAL");
}

std::unique_ptr<SQLite::Database> openCheckedProject(const std::filesystem::path& file) {
    checkHeader(file);
    configureSqliteProcess();
    try {
        // NOMUTEX: one thread at a time per connection (see ProjectStore::create).
        auto db = std::make_unique<SQLite::Database>(file,
                                                     SQLite::OPEN_READWRITE | SQLite::OPEN_NOMUTEX);
        hardenConnection(*db);
        // Until the file passes the checks, closing must not write it: the last connection to
        // close normally checkpoints the WAL into the database file, which would merge frames
        // planted by another tool into a file we refuse. configureProjectConnection lifts this.
        setConfig(*db, SQLITE_DBCONFIG_NO_CKPT_ON_CLOSE, 1, "no checkpoint on close");

        const int application_id = readApplicationId(*db);
        const int version = readUserVersion(*db);
        const int object_count = db->execAndGet("SELECT count(*) FROM main.sqlite_master").getInt();

        if (application_id != ProjectStore::kApplicationId) {
            if (application_id == 0 && object_count == 0) {
                throw ProjectError("not an atollog project: " + file.string() +
                                   " is an empty SQLite database; create a new project instead");
            }
            throw ProjectError(
                file.string() + " is an SQLite database of another program (application id " +
                hexId(application_id) + "), not an atollog project: open an atollog project or "
                "import the data from a core data folder");
        }
        if (version > ProjectStore::kSchemaVersion) {
            throw ProjectError(file.string() + " was written by a newer atollog (schema " +
                               std::to_string(version) + ", this program reads up to " +
                               std::to_string(ProjectStore::kSchemaVersion) +
                               "): update atollog");
        }
        if (version < 1) {
            throw ProjectError(file.string() + " is damaged: it carries atollog's application id "
                               "but schema version " + std::to_string(version) +
                               "; restore the project from a backup");
        }
        checkSchemaObjects(*db, file, version);
        checkIntegrity(*db, file);
        return db;
    } catch (const SQLite::Exception& e) {
        switch (e.getErrorCode()) {
        case SQLITE_NOTADB:
            throw ProjectError("not an atollog project: " + file.string() +
                               " is not an SQLite database");
        case SQLITE_CORRUPT:
            throw ProjectError(file.string() + " is damaged: " + e.what() +
                               "; restore the project from a backup");
        case SQLITE_BUSY:
        case SQLITE_LOCKED:
            throw ProjectError("cannot open project " + file.string() +
                               ": another program is writing to it; close it and try again");
        default:
            throw ProjectError("cannot open project " + file.string() + ": " + e.what());
        }
    }
}

} // namespace atollog::db::detail
