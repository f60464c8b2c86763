// The viewer's age models: each hole's newest stored age-model run made from the current data,
// read back from the project (cli::latestStoredAgeModels); a run on older data is not used.
#include "cli/stored_age_models.hpp"
#include "cli_runner.hpp"

#include "atollog/db/age_model_store.hpp"
#include "atollog/db/project_store.hpp"
#include "atollog/db/tie_point_store.hpp"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>

using atollog::test::runAtollog;
using atollog::test::TempDir;
namespace fs = std::filesystem;

namespace {

const std::string kDemo = std::string(ATOLLOG_SOURCE_DIR) + "/cores-demo/archipelago";

std::vector<std::string> ageArgs(const std::string& project, const std::string& hole,
                                 const std::string& seed) {
    return {"age", project, "--hole", hole, "--draws", "300", "--outlier-draws", "0",
            "--seed", seed, "--core-top-open"};
}

/// The grid rows (points without a sample) of the newest stored run of `hole`.
std::vector<atollog::db::StoredAgePoint> storedGrid(atollog::db::ProjectStore& store,
                                                    const std::string& hole) {
    const auto run = atollog::db::latestModelRun(store, "age-model");
    REQUIRE(run);
    for (const auto& m : atollog::db::loadAgeModels(store, run->id)) {
        if (m.hole != hole) continue;
        std::vector<atollog::db::StoredAgePoint> grid;
        for (const auto& p : m.points)
            if (!p.sample) grid.push_back(p);
        return grid;
    }
    FAIL("no stored model of " << hole);
    return {};
}

} // namespace

TEST_CASE("the newest fresh stored age model of each hole is the one shown", "[unit][cli][panel]") {
    TempDir tmp("stored-models");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    {
        auto store = atollog::db::ProjectStore::open(p);
        const auto none = atollog::cli::latestStoredAgeModels(store, store.loadDataset());
        CHECK(none.models.empty());
    }
    REQUIRE(runAtollog(ageArgs(p, "KAL1", "11")).exit_code == 0);
    REQUIRE(runAtollog(ageArgs(p, "TOR1", "11")).exit_code == 0);
    REQUIRE(runAtollog(ageArgs(p, "KAL1", "12")).exit_code == 0); // newer run of KAL1

    auto store = atollog::db::ProjectStore::open(p);
    const auto data = store.loadDataset();
    const auto choice = atollog::cli::latestStoredAgeModels(store, data);
    REQUIRE(choice.models.size() == 2);
    REQUIRE(choice.models.count("KAL1") == 1);
    REQUIRE(choice.sources.size() == 2);
    CHECK(choice.sources[0].rfind("KAL1: run #", 0) == 0); // in the project's hole order
    CHECK(choice.sources[1].rfind("TOR1: run #", 0) == 0);

    // KAL1's grid is the seed-12 run's, row for row; a logged surface gives two rows at one
    // depth, the first marked as the age just above it.
    const auto grid = storedGrid(store, "KAL1");
    const auto& model = choice.models.at("KAL1");
    REQUIRE(model.grid.size() == grid.size());
    int surfaces = 0;
    for (std::size_t i = 0; i < grid.size(); ++i) {
        CHECK(model.grid[i].depth_m == grid[i].depth_m);
        CHECK(model.grid[i].age_q500_ma == grid[i].age_q500_ma);
        CHECK(model.grid[i].age_q025_ma == grid[i].age_q025_ma);
        const bool doubled = i + 1 < grid.size() && grid[i + 1].depth_m == grid[i].depth_m;
        CHECK(model.grid[i].above_surface == doubled);
        surfaces += doubled;
    }
    CHECK(surfaces > 0); // KAL1 has logged exposure surfaces
}

TEST_CASE("a stored age model of older data is not shown", "[unit][cli][panel]") {
    TempDir tmp("stale-models");
    const auto p = (tmp / "demo.atollog").string();
    REQUIRE(runAtollog({"import", p, kDemo}).exit_code == 0);
    REQUIRE(runAtollog(ageArgs(p, "KAL1", "11")).exit_code == 0);

    // The same folder with KAL1's collar 0.1 m higher, imported over the project.
    const fs::path folder = tmp / "changed";
    fs::copy(kDemo, folder, fs::copy_options::recursive);
    std::stringstream holes;
    holes << std::ifstream(folder / "holes.csv").rdbuf();
    std::string text = holes.str();
    const std::string from = "-113.741,2.4,", to = "-113.741,2.5,";
    REQUIRE(text.find(from) != std::string::npos);
    text.replace(text.find(from), from.size(), to);
    std::ofstream(folder / "holes.csv") << text;
    const auto re = runAtollog({"import", p, folder.string(), "--replace"});
    INFO(re.err);
    REQUIRE(re.exit_code == 0);

    auto store = atollog::db::ProjectStore::open(p);
    const auto choice = atollog::cli::latestStoredAgeModels(store, store.loadDataset());
    CHECK(choice.models.empty());
    CHECK(choice.sources.empty());
}
