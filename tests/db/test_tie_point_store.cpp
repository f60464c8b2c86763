// Tie points stored with the provenance of the run that made them.
#include "atollog/db/tie_point_store.hpp"

#include "store_fixtures.hpp"

#include <SQLiteCpp/SQLiteCpp.h>
#include <catch2/catch.hpp>

using atollog::EventKind;
using atollog::TiePoint;
using atollog::db::ModelRunRecord;
using atollog::db::ProjectStore;

namespace {
TiePoint tie(const char* hole, const char* event, EventKind kind, double shallow_m, double deep_m,
             std::vector<std::string> flags = {}) {
    TiePoint t;
    t.hole = hole;
    t.event = event;
    t.kind = kind;
    t.shallow_m = shallow_m;
    t.deep_m = deep_m;
    t.depth_m = 0.5 * (shallow_m + deep_m);
    t.age_ma = 1.25;
    t.age_sd_ma = 0.05;
    t.flags = std::move(flags);
    return t;
}
} // namespace

TEST_CASE("tie points round-trip with their run and flags", "[unit]") {
    atollog::test::TempPath file("ties");
    ProjectStore store = ProjectStore::create(file.path());
    const std::vector<TiePoint> ties{
        tie("KV-1", "T ALPHA", EventKind::Top, 43.8, 45.3),
        tie("KV-1", "B BETA", EventKind::Base, 50.0, 52.5, {"widened_by_recovery", "extended"})};
    ModelRunRecord run;
    run.kind = "datums";
    run.settings = "biostrat.depth_quote=midpoint";
    run.inputs_sha256 = "abc";
    const auto id = atollog::db::storeTiePoints(store, run, ties);

    const auto back = atollog::db::loadTiePoints(store, id);
    REQUIRE(back.size() == 2);
    CHECK(back[0].event == "T ALPHA");
    CHECK(back[0].kind == EventKind::Top);
    CHECK(back[0].depth_m == 0.5 * (43.8 + 45.3));
    CHECK(back[1].flags == std::vector<std::string>{"widened_by_recovery", "extended"});
    const auto latest = atollog::db::latestModelRun(store, "datums");
    REQUIRE(latest);
    CHECK(latest->id == id);
    CHECK(latest->settings == run.settings);
    CHECK_FALSE(atollog::db::latestModelRun(store, "age-model"));
}

TEST_CASE("a tie point the schema refuses leaves neither run nor points", "[unit]") {
    atollog::test::TempPath file("ties-bad");
    ProjectStore store = ProjectStore::create(file.path());
    auto bad = tie("KV-1", "T ALPHA", EventKind::Top, 45.3, 43.8); // deep above shallow
    ModelRunRecord run;
    run.kind = "datums";
    CHECK_THROWS_WITH(atollog::db::storeTiePoints(store, run, {bad}),
                      Catch::Contains("the project is unchanged"));
    CHECK(store.modelRuns().empty());
    CHECK(store.database().execAndGet("SELECT count(*) FROM tie_point").getInt() == 0);
}
