#pragma once
// The core data folder: one CSV file per table (see README, "Core data folder").
#include "atollog/db/errors.hpp"
#include "atollog/engine/core_dataset.hpp"

#include <filesystem>

namespace atollog::db {

/// Reads every table of the folder (holes.csv required, the others optional), converting units
/// (_ft to metres, _yr/_ka to Ma) and keeping x_ columns. Checks the syntax of each file and then
/// the whole dataset with atollog::validateDataset. Throws InputError listing every error found
/// (file, line, column, value, expectation); warnings are returned through `warnings`.
CoreDataset readCoreFolder(const std::filesystem::path& folder,
                           std::vector<InputProblem>* warnings = nullptr);

/// Writes the dataset as a core data folder in canonical form: metres, Ma, fixed column order,
/// numbers in shortest round-trip form, x_ columns after the standard ones. Tables with no rows
/// are not written (holes.csv always is). Writes into a temporary folder beside `folder` and
/// renames it into place, so a failed export leaves nothing half-written. Refuses to overwrite a
/// non-empty folder unless `overwrite` is true.
void writeCoreFolder(const CoreDataset& data, const std::filesystem::path& folder,
                     bool overwrite = false);

} // namespace atollog::db
