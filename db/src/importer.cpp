// importCoreFolder: read and check the whole folder first (nothing is written if it is bad),
// then replace the dataset and record the import in one transaction.
#include "atollog/db/importer.hpp"

#include "atollog/db/core_folder.hpp"

#include <array>
#include <future>

namespace atollog::db {
namespace {

constexpr std::array kAllTables{Table::Holes,  Table::Runs,   Table::Intervals, Table::Samples,
                                Table::Taxa,   Table::Occurrences, Table::Events, Table::Dates,
                                Table::Zones,  Table::SeaLevel, Table::Curve};

std::size_t rowsOf(const CoreDataset& d, Table t) {
    switch (t) {
    case Table::Holes: return d.holes.size();
    case Table::Runs: return d.runs.size();
    case Table::Intervals: return d.intervals.size();
    case Table::Samples: return d.samples.size();
    case Table::Taxa: return d.taxa.size();
    case Table::Occurrences: return d.occurrences.size();
    case Table::Events: return d.events.size();
    case Table::Dates: return d.dates.size();
    case Table::Zones: return d.zones.size();
    case Table::SeaLevel: return d.sea_level.size();
    case Table::Curve: return d.curve.size();
    }
    return 0;
}

void refuseIfHoldingData(const ProjectStore& store) {
    if (!store.hasData()) return;
    std::int64_t total = 0;
    for (Table t : kAllTables) total += store.rowCount(t);
    throw ProjectError(store.path().string() + " already holds " +
                       std::to_string(store.rowCount(Table::Holes)) + " holes (" +
                       std::to_string(total) + " rows in all); use --replace to replace them");
}

} // namespace

ImportResult importCoreFolder(ProjectStore& store, const std::filesystem::path& folder,
                              bool replace) {
    // Checked before reading: refusing takes no time, reading a large folder does.
    if (!replace) refuseIfHoldingData(store);

    ImportResult result;
    const CoreDataset data = readCoreFolder(folder, &result.warnings);

    std::string counts;
    for (Table t : kAllTables) {
        const std::size_t n = rowsOf(data, t);
        result.row_count += n;
        counts += (counts.empty() ? "" : ", ") + std::string(tableName(t)) + " " +
                  std::to_string(n);
    }

    // The input hash reads the dataset only; computing it on the second core while the rows are
    // written takes it off the import's critical path.
    std::future<std::string> inputsHash =
        std::async(std::launch::async, [&data] { return ProjectStore::datasetHash(data); });

    ModelRunRecord run;
    run.kind = "import";
    run.settings = "folder=" + std::filesystem::absolute(folder).lexically_normal().string() +
                   "\nreplace=" + (replace ? "1" : "0");
    run.summary = "imported " + std::to_string(result.row_count) + " rows (" + counts + ")" +
                  (result.warnings.empty()
                       ? ""
                       : "; " + std::to_string(result.warnings.size()) + " warnings");
    result.model_run_id = store.replaceDataset(data, std::move(run), [&inputsHash] {
        return inputsHash.get();
    });
    return result;
}

} // namespace atollog::db
