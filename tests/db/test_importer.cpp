// importCoreFolder: everything or nothing, refusal of a project that holds data, and the
// provenance record written with the data.
#include "atollog/db/core_folder.hpp"
#include "atollog/db/errors.hpp"
#include "atollog/db/importer.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/version.hpp"
#include "store_fixtures.hpp"

#include <catch2/catch.hpp>

using atollog::CoreDataset;
using atollog::db::importCoreFolder;
using atollog::db::InputError;
using atollog::db::ProjectError;
using atollog::db::ProjectStore;
using atollog::test::TempPath;
using Catch::Matchers::Contains;

namespace {

const std::filesystem::path kMinimalFolder =
    std::filesystem::path(ATOLLOG_TEST_DATA_DIR) / "good-input" / "minimal";

std::size_t rowTotal(const CoreDataset& d) {
    return d.holes.size() + d.runs.size() + d.intervals.size() + d.samples.size() +
           d.taxa.size() + d.occurrences.size() + d.events.size() + d.dates.size() +
           d.zones.size() + d.sea_level.size() + d.curve.size();
}

/// A copy of the minimal folder in a temporary place, to be spoiled by a test.
void copyMinimalTo(const std::filesystem::path& target) {
    std::filesystem::create_directories(target);
    std::filesystem::copy(kMinimalFolder, target, std::filesystem::copy_options::recursive);
}

} // namespace

TEST_CASE("Importing a folder stores exactly what the reader read, with provenance", "[unit]") {
    REQUIRE(std::filesystem::exists(kMinimalFolder / "holes.csv"));
    std::vector<atollog::db::InputProblem> expected_warnings;
    const CoreDataset expected = atollog::db::readCoreFolder(kMinimalFolder, &expected_warnings);
    REQUIRE_FALSE(expected.holes.empty());

    TempPath file("import");
    ProjectStore store = ProjectStore::create(file.path());
    const auto result = importCoreFolder(store, kMinimalFolder);

    CHECK(result.row_count == rowTotal(expected));
    CHECK(result.warnings.size() == expected_warnings.size());
    CHECK(store.loadDataset() == expected);

    const auto runs = store.modelRuns();
    REQUIRE(runs.size() == 1);
    const auto& run = runs[0];
    CHECK(run.id == result.model_run_id);
    CHECK(run.kind == "import");
    CHECK(run.settings == "folder=" +
                              std::filesystem::absolute(kMinimalFolder).lexically_normal().string() +
                              "\nreplace=0");
    CHECK(run.inputs_sha256 == ProjectStore::datasetHash(store.loadDataset()));
    CHECK(run.program_version == atollog::kProgramVersion);
    CHECK_FALSE(run.seed.has_value());
    CHECK_THAT(run.summary, Contains("imported " + std::to_string(rowTotal(expected)) + " rows") &&
                                Contains("holes " + std::to_string(expected.holes.size())) &&
                                Contains("occurrences " +
                                         std::to_string(expected.occurrences.size())));
}

TEST_CASE("Import refuses a project holding data unless asked to replace it", "[unit]") {
    TempPath file("import-refuse");
    ProjectStore store = ProjectStore::create(file.path());
    const CoreDataset before = atollog::test::everyFieldDataset();
    store.replaceDataset(before);

    CHECK_THROWS_WITH(importCoreFolder(store, kMinimalFolder),
                      file.path().string() + " already holds 2 holes (" +
                          std::to_string(rowTotal(before)) +
                          " rows in all); use --replace to replace them");
    CHECK(store.loadDataset() == before);
    CHECK(store.modelRuns().empty());

    const auto result = importCoreFolder(store, kMinimalFolder, true);
    CHECK(store.loadDataset() == atollog::db::readCoreFolder(kMinimalFolder));
    REQUIRE(store.modelRuns().size() == 1);
    CHECK_THAT(store.modelRuns()[0].settings, Contains("\nreplace=1"));
    CHECK(result.model_run_id == store.modelRuns()[0].id);
}

TEST_CASE("A bad folder leaves the project exactly as it was", "[unit]") {
    TempPath file("import-bad");
    TempPath folder("bad-folder");
    ProjectStore store = ProjectStore::create(file.path());
    importCoreFolder(store, kMinimalFolder);
    const CoreDataset before = store.loadDataset();
    const auto runs_before = store.modelRuns().size();

    SECTION("a folder that does not exist") {
        CHECK_THROWS_AS(importCoreFolder(store, folder.path() / "nowhere", true), InputError);
    }
    SECTION("a run whose base is above its top") {
        copyMinimalTo(folder.path());
        std::ofstream(folder.path() / "runs.csv", std::ios::app) << "TV-1,TV-1-R9,20,10,1\n";
        CHECK_THROWS_AS(importCoreFolder(store, folder.path(), true), InputError);
    }
    SECTION("a folder without holes.csv") {
        copyMinimalTo(folder.path());
        std::filesystem::remove(folder.path() / "holes.csv");
        CHECK_THROWS_AS(importCoreFolder(store, folder.path(), true), InputError);
    }
    CHECK(store.loadDataset() == before);
    CHECK(store.modelRuns().size() == runs_before);
}

TEST_CASE("Import into a reopened project survives closing and opening", "[unit]") {
    TempPath file("import-reopen");
    {
        ProjectStore store = ProjectStore::create(file.path());
        importCoreFolder(store, kMinimalFolder);
    }
    ProjectStore reopened = ProjectStore::open(file.path());
    CHECK(reopened.loadDataset() == atollog::db::readCoreFolder(kMinimalFolder));
    CHECK(reopened.modelRuns().size() == 1);
}
