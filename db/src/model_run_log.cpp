// The model_run table: provenance of every import and model run (what, settings, seed, inputs
// hash, program version, start time).
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/version.hpp"
#include "write_transaction.hpp"

#include <SQLiteCpp/Database.h>
#include <SQLiteCpp/Exception.h>
#include <SQLiteCpp/Statement.h>

#include <array>
#include <chrono>
#include <ctime>

namespace atollog::db {
namespace {

std::string utcNowIso8601() {
    const std::time_t now = std::chrono::system_clock::to_time_t(std::chrono::system_clock::now());
    std::tm utc{};
    gmtime_r(&now, &utc);
    std::array<char, 32> text{};
    std::strftime(text.data(), text.size(), "%Y-%m-%dT%H:%M:%SZ", &utc);
    return text.data();
}

} // namespace

std::int64_t ProjectStore::insertModelRun(ModelRunRecord& run) {
    if (run.program_version.empty()) run.program_version = kProgramVersion;
    if (run.started_utc.empty()) run.started_utc = utcNowIso8601();
    SQLite::Statement insert(*db_,
                             "INSERT INTO model_run (kind, settings, seed, program_version,"
                             " started_utc, inputs_sha256, summary) VALUES (?, ?, ?, ?, ?, ?, ?)");
    insert.bind(1, run.kind);
    insert.bind(2, run.settings);
    if (run.seed) {
        // SQLite integers are signed 64-bit: the seed's bits are stored as they are.
        insert.bind(3, static_cast<std::int64_t>(*run.seed));
    } else {
        insert.bind(3);
    }
    insert.bind(4, run.program_version);
    insert.bind(5, run.started_utc);
    insert.bind(6, run.inputs_sha256);
    insert.bind(7, run.summary);
    insert.exec();
    run.id = db_->getLastInsertRowid();
    return run.id;
}

std::int64_t ProjectStore::recordModelRun(ModelRunRecord run) {
    try {
        // Its own IMMEDIATE transaction, so a concurrent writer makes it wait, not fail.
        detail::WriteTransaction transaction(*db_);
        const std::int64_t id = insertModelRun(run);
        transaction.commit();
        return id;
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot record the " + run.kind + " run in " + path_.string() + ": " +
                           e.what());
    }
}

std::int64_t ProjectStore::recordModelRun(
    ModelRunRecord run,
    const std::function<void(SQLite::Database&, std::int64_t run_id)>& write_results) {
    try {
        detail::WriteTransaction transaction(*db_);
        const std::int64_t id = insertModelRun(run);
        write_results(*db_, id);
        transaction.commit();
        return id;
    } catch (const SQLite::Exception& e) {
        throw ProjectError("cannot record the " + run.kind + " run and its results in " +
                           path_.string() + ": " + e.what() + "; the project is unchanged");
    }
}

std::vector<ModelRunRecord> ProjectStore::modelRuns() const {
    std::vector<ModelRunRecord> runs;
    SQLite::Statement query(*db_, "SELECT id, kind, settings, seed, program_version, started_utc,"
                                  " inputs_sha256, summary FROM model_run ORDER BY id");
    while (query.executeStep()) {
        ModelRunRecord run;
        run.id = query.getColumn(0).getInt64();
        run.kind = query.getColumn(1).getString();
        run.settings = query.getColumn(2).getString();
        if (!query.getColumn(3).isNull()) {
            run.seed = static_cast<std::uint64_t>(query.getColumn(3).getInt64());
        }
        run.program_version = query.getColumn(4).getString();
        run.started_utc = query.getColumn(5).getString();
        run.inputs_sha256 = query.getColumn(6).getString();
        run.summary = query.getColumn(7).getString();
        runs.push_back(std::move(run));
    }
    return runs;
}

} // namespace atollog::db
