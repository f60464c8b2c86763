// The dataset tables of the project file and their row counts.
#include "dataset_rows.hpp"

#include "atollog/db/errors.hpp"
#include "atollog/db/schema.hpp"

#include <SQLiteCpp/Statement.h>

#include <string>

namespace atollog::db::detail {

std::string_view sqlTableName(Table t) {
    switch (t) {
    case Table::Holes: return "hole";
    case Table::Runs: return "core_run";
    case Table::Intervals: return "lith_interval";
    case Table::Samples: return "sample";
    case Table::Taxa: return "taxon";
    case Table::Occurrences: return "occurrence";
    case Table::Events: return "time_scale_event";
    case Table::Dates: return "numerical_date";
    case Table::Zones: return "zone";
    case Table::SeaLevel: return "sea_level_point";
    case Table::Curve: return "calibration_point";
    }
    return "?";
}

std::int64_t countRows(SQLite::Database& db, Table t) {
    // The table name comes from the switch above, never from input.
    SQLite::Statement count(db, "SELECT count(*) FROM " + std::string(sqlTableName(t)));
    count.executeStep();
    return count.getColumn(0).getInt64();
}

void deleteDatasetRows(SQLite::Database& db) {
    // Children before parents, so the order is also valid with foreign keys on.
    db.exec("DELETE FROM free_attribute;"
            "DELETE FROM free_column;"
            "DELETE FROM occurrence;"
            "DELETE FROM zone;"
            "DELETE FROM numerical_date;"
            "DELETE FROM time_scale_event;"
            "DELETE FROM core_run;"
            "DELETE FROM lith_interval;"
            "DELETE FROM sample;"
            "DELETE FROM taxon;"
            "DELETE FROM hole;"
            "DELETE FROM sea_level_point;"
            "DELETE FROM calibration_point;");
}

std::vector<std::string> indexStatements(int version) {
    std::vector<std::string> statements;
    for (const SchemaObject& o : expectedSchemaObjects(version)) {
        if (o.type == "index" && !o.sql.empty()) statements.push_back(o.sql);
    }
    return statements;
}

void dropIndexes(SQLite::Database& db, int version) {
    for (const SchemaObject& o : expectedSchemaObjects(version)) {
        // Index names are our own constants from the migrations.
        if (o.type == "index" && !o.sql.empty()) db.exec("DROP INDEX " + o.name);
    }
}

void createIndexes(SQLite::Database& db, int version) {
    for (const std::string& sql : indexStatements(version)) db.exec(sql);
}

void checkForeignKeys(SQLite::Database& db) {
    // https://www.sqlite.org/pragma.html#pragma_foreign_key_check: one row per violation,
    // columns table, rowid, parent table, foreign key id.
    SQLite::Statement check(db, "PRAGMA foreign_key_check");
    if (check.executeStep()) {
        throw ProjectError("table " + check.getColumn(0).getString() + " row id " +
                           std::to_string(check.getColumn(1).getInt64()) +
                           " refers to a row of " + check.getColumn(2).getString() +
                           " that does not exist");
    }
}

} // namespace atollog::db::detail
