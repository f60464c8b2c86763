// Import of a core data folder: read, check and write, all or nothing.
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

struct CheckedInputs {
    std::vector<InputProblem> warnings;
    std::string sha256;
};

} // namespace

ImportResult importCoreFolder(ProjectStore& store, const std::filesystem::path& folder,
                              bool replace) {
    // Checked before reading: refusing takes no time, reading a large folder does.
    if (!replace) refuseIfHoldingData(store);

    const ParsedCoreFolder parsed = parseCoreFolder(folder); // syntax errors throw here
    const CoreDataset& data = parsed.data();

    // The whole-dataset checks and the input hash only read the data: they run on the second
    // core while this one writes the rows. Nothing commits before both are done; a check that
    // fails throws inside the write transaction, which then rolls back.
    std::future<CheckedInputs> checked = std::async(std::launch::async, [&parsed, &data] {
        CheckedInputs c;
        c.warnings = parsed.check();
        c.sha256 = ProjectStore::datasetHash(data);
        return c;
    });

    ImportResult result;
    std::string counts;
    for (Table t : kAllTables) {
        const std::size_t n = rowsOf(data, t);
        result.row_count += n;
        counts += (counts.empty() ? "" : ", ") + std::string(tableName(t)) + " " +
                  std::to_string(n);
    }

    ModelRunRecord run;
    run.kind = "import";
    run.settings = "folder=" + std::filesystem::absolute(folder).lexically_normal().string() +
                   "\nreplace=" + (replace ? "1" : "0");
    try {
        result.model_run_id = store.replaceDataset(data, std::move(run), [&](ModelRunRecord& r) {
            CheckedInputs c = checked.get();
            r.inputs_sha256 = std::move(c.sha256);
            r.summary = "imported " + std::to_string(result.row_count) + " rows (" + counts + ")" +
                        (c.warnings.empty()
                             ? ""
                             : "; " + std::to_string(c.warnings.size()) +
                                   (c.warnings.size() == 1 ? " warning" : " warnings"));
            result.warnings = std::move(c.warnings);
        });
    } catch (...) {
        // Writing can fail on data the checks would have explained better (an unknown
        // reference, say): prefer the checks' located message when they found errors.
        if (checked.valid()) checked.get(); // throws InputError when the data is bad
        throw;
    }
    return result;
}

} // namespace atollog::db
