// Age-depth model results stored with their run, and read back exactly.
#include "atollog/db/age_model_store.hpp"

#include "store_fixtures.hpp"

#include <SQLiteCpp/SQLiteCpp.h>
#include <catch2/catch.hpp>

using atollog::db::ModelRunRecord;
using atollog::db::ProjectStore;
using atollog::db::StoredAgeModel;

namespace {
StoredAgeModel sampleModel(const char* hole) {
    StoredAgeModel m;
    m.hole = hole;
    m.tie_count = 7;
    m.draws = 10000;
    m.acceptance_rate = 0.83;
    m.outlier_tie = "T ALPHA";
    // Values with full double precision: the store must give back the same bits.
    m.points = {{0.0, std::nullopt, 0.0, 0.0, 0.0, 0.0},
                {0.5, std::nullopt, 0.0011, 0.0013333333333333333, 0.0016, 0.001340000000000001},
                {12.3, std::string("KV-1-004"), 0.101, 0.125, 0.15, 0.1251}};
    m.hiatuses = {{10.2, 0.05, 0.12, 0.2, 0.998}};
    m.rates = {{"tie 1-2", 0.0, 10.2, 20.0, 35.5, 61.25, ""},
               {"tie 2-3", 10.2, 30.0, 1.0, 4.0, 12.0, "implausible_reef_rate"}};
    return m;
}
} // namespace

TEST_CASE("age models round-trip bit for bit with their run", "[unit]") {
    atollog::test::TempPath file("agemodels");
    ProjectStore store = ProjectStore::create(file.path());
    ModelRunRecord run;
    run.kind = "age-model";
    run.seed = 42;
    run.settings = "age.draws=10000";
    const std::vector<StoredAgeModel> models{sampleModel("KV-1"), sampleModel("KV-2")};
    const auto id = atollog::db::storeAgeModels(store, run, models);
    CHECK(atollog::db::loadAgeModels(store, id) == models);
    CHECK(store.modelRuns().back().seed == 42u);
}

TEST_CASE("an age model the schema refuses leaves neither run nor rows", "[unit]") {
    atollog::test::TempPath file("agemodels-bad");
    ProjectStore store = ProjectStore::create(file.path());
    auto bad = sampleModel("KV-1");
    bad.points[1].age_q025_ma = 1.0; // above its median: quantiles out of order
    ModelRunRecord run;
    run.kind = "age-model";
    CHECK_THROWS_WITH(atollog::db::storeAgeModels(store, run, {bad}),
                      Catch::Contains("the project is unchanged"));
    CHECK(store.modelRuns().empty());
    CHECK(store.database().execAndGet("SELECT count(*) FROM age_model_hole").getInt() == 0);
}
