#pragma once
// The project file: one plain SQLite database holding a core dataset and the provenance of every
// model run. Schema version in PRAGMA user_version, application id in PRAGMA application_id.
#include "atollog/engine/core_dataset.hpp"

#include <cstdint>
#include <filesystem>
#include <functional>
#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace SQLite { class Database; }

namespace atollog::db {

/// What ran, with which settings and seed, from which inputs, when and by which program version.
struct ModelRunRecord {
    std::int64_t id = 0;          ///< assigned on insert
    std::string kind;             ///< e.g. "import", "datums", "age-model"
    std::string settings;         ///< settings as text (key=value lines)
    std::optional<std::uint64_t> seed;
    std::string program_version;  ///< filled on insert when empty
    std::string started_utc;      ///< ISO 8601; filled on insert when empty
    std::string inputs_sha256;    ///< hash of the inputs the run read
    std::string summary;          ///< one line of what came out
};

class ProjectStore {
  public:
    static constexpr std::int32_t kApplicationId = 0x41544C47; // "ATLG"
    static constexpr int kSchemaVersion = 4;

    /// Creates a new, empty project. Throws ProjectError if the file exists.
    static ProjectStore create(const std::filesystem::path& file);
    /// Opens an existing project, migrating an older schema forward. Throws ProjectError for a
    /// missing file, a file that is not SQLite, a foreign SQLite file, a newer schema version,
    /// a damaged file or one with objects (triggers, views, tables) that are not ours.
    static ProjectStore open(const std::filesystem::path& file);

    ProjectStore(ProjectStore&&) noexcept;
    ProjectStore& operator=(ProjectStore&&) noexcept;
    ~ProjectStore();

    const std::filesystem::path& path() const { return path_; }
    int schemaVersion() const;

    /// The whole dataset, rows in stored order.
    CoreDataset loadDataset() const;
    /// Replaces the whole dataset in one transaction; on any failure nothing changes.
    void replaceDataset(const CoreDataset& data);
    /// Replaces the dataset and records the run that produced it (e.g. an import) in one
    /// transaction, so provenance and data never disagree. Returns the run's id. When given,
    /// `complete_run` is called after the rows are written and before the run is recorded, so
    /// work on another thread (checks, the input hash) can overlap the writing and still fill
    /// the record; if it throws, the transaction rolls back and the exception propagates.
    std::int64_t replaceDataset(const CoreDataset& data, ModelRunRecord produced_by,
                                const std::function<void(ModelRunRecord&)>& complete_run = {});
    /// True when any dataset table holds a row.
    bool hasData() const;
    /// Number of stored rows of one dataset table.
    std::int64_t rowCount(Table table) const;

    std::int64_t recordModelRun(ModelRunRecord run);
    /// Records the run and lets `write_results` store what it produced (given the database and
    /// the new run's id) in the same transaction: results never exist without their provenance.
    std::int64_t recordModelRun(
        ModelRunRecord run,
        const std::function<void(SQLite::Database&, std::int64_t run_id)>& write_results);
    std::vector<ModelRunRecord> modelRuns() const;

    /// SHA-256 (hex) over a canonical serialisation of the dataset: the inputs hash for runs.
    static std::string datasetHash(const CoreDataset& data);

    SQLite::Database& database(); ///< for tests and later layers of db

  private:
    ProjectStore(std::filesystem::path path, std::unique_ptr<SQLite::Database> db);
    void replaceDatasetRows(const CoreDataset& data);  ///< inside the caller's transaction
    std::int64_t insertModelRun(ModelRunRecord& run);  ///< fills id, version, time
    std::filesystem::path path_;
    std::unique_ptr<SQLite::Database> db_;
};

} // namespace atollog::db
