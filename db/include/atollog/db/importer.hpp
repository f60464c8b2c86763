#pragma once
// Import of a core data folder into a project: read and check everything first, then write in
// one transaction. On any error the project is left exactly as it was.
#include "atollog/db/errors.hpp"
#include "atollog/db/project_store.hpp"

#include <filesystem>
#include <vector>

namespace atollog::db {

struct ImportResult {
    std::size_t row_count = 0;               ///< rows imported over all tables
    std::vector<InputProblem> warnings;
    std::int64_t model_run_id = 0;            ///< provenance record of the import
};

/// Refuses (ProjectError) a project that already holds data unless `replace` is set.
ImportResult importCoreFolder(ProjectStore& store, const std::filesystem::path& folder,
                              bool replace = false);

} // namespace atollog::db
