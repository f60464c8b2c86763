#pragma once
// The core data folder: one CSV file per table (see README, "Core data folder").
#include "atollog/db/errors.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <filesystem>
#include <memory>
#include <vector>

namespace atollog::db {

/// Reads every table of the folder (holes.csv required, the others optional), converting units
/// (_ft to metres, _yr/_ka to Ma) and keeping x_ columns. Checks the syntax of each file and then
/// the whole dataset with atollog::validateDataset. Throws InputError listing every error found
/// (file, line, column, value, expectation); warnings are returned through `warnings`.
CoreDataset readCoreFolder(const std::filesystem::path& folder,
                           std::vector<InputProblem>* warnings = nullptr);

/// A folder read and checked for syntax (files, headers, cells, units) but not yet validated as a
/// whole. Lets the importer validate on one core while it writes on the other.
class ParsedCoreFolder {
  public:
    struct Impl;
    explicit ParsedCoreFolder(std::unique_ptr<Impl> impl);
    ParsedCoreFolder(ParsedCoreFolder&&) noexcept;
    ParsedCoreFolder& operator=(ParsedCoreFolder&&) noexcept;
    ~ParsedCoreFolder();

    const CoreDataset& data() const;
    CoreDataset takeData() &&;
    /// atollog::validateDataset on the data, each issue located in the folder's files. Throws
    /// InputError listing every error (errors first, then warnings); returns the warnings.
    /// Only reads: safe to run on another thread while data() is being read elsewhere.
    std::vector<InputProblem> check() const;

  private:
    std::unique_ptr<Impl> impl_;
};

/// The syntax half of readCoreFolder: throws InputError for every problem in files, headers,
/// cells and units; does not validate the dataset as a whole (see ParsedCoreFolder::check).
ParsedCoreFolder parseCoreFolder(const std::filesystem::path& folder);

/// Writes the dataset as a core data folder in canonical form: metres, Ma, fixed column order,
/// numbers in shortest round-trip form, x_ columns after the standard ones. Tables with no rows
/// are not written (holes.csv always is). Writes into a temporary folder beside `folder` and
/// renames it into place, so a failed export leaves nothing half-written. Refuses to overwrite a
/// non-empty folder unless `overwrite` is true.
void writeCoreFolder(const CoreDataset& data, const std::filesystem::path& folder,
                     bool overwrite = false);

} // namespace atollog::db
