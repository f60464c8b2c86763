// Composite sequences stored with their run (schema version 4), and read back exactly.
#include "atollog/db/sequence_store.hpp"

#include "store_fixtures.hpp"

#include <catch2/catch.hpp>

using atollog::db::ModelRunRecord;
using atollog::db::ProjectStore;
using atollog::db::StoredSequenceEvent;

namespace {
std::vector<StoredSequenceEvent> sampleSequence() {
    return {{1, "B ALPHA", "base", std::string("ALPHA"), 1, 2},
            {2, "B BETA", "base", std::string("BETA"), 1, 3},
            {3, "date u-th KV-1-004", "dated", std::nullopt, 2, 3},
            {4, "T ALPHA", "top", std::string("ALPHA"), 4, 4}};
}
} // namespace

TEST_CASE("a composite sequence round-trips with its run", "[unit]") {
    atollog::test::TempPath file("sequence");
    ProjectStore store = ProjectStore::create(file.path());
    ModelRunRecord run;
    run.kind = "sequence";
    run.seed = 7;
    run.settings = "sequence.unit=metres";
    const auto id = atollog::db::storeSequence(store, run, sampleSequence());
    CHECK(atollog::db::loadSequence(store, id) == sampleSequence());
    const auto runs = store.modelRuns();
    REQUIRE(runs.size() == 1);
    CHECK(runs.front().seed == 7u);
}

TEST_CASE("a sequence with broken ranks is refused and nothing is stored", "[unit]") {
    atollog::test::TempPath file("sequence-bad");
    ProjectStore store = ProjectStore::create(file.path());
    ModelRunRecord run;
    run.kind = "sequence";
    auto events = sampleSequence();
    events[2].rank = 5;
    CHECK_THROWS_WITH(atollog::db::storeSequence(store, run, events),
                      Catch::Contains("has rank 5 at position 3"));
    events = sampleSequence();
    events[1].position_max = 1;
    CHECK_THROWS_WITH(atollog::db::storeSequence(store, run, events),
                      Catch::Contains("outside its range"));
    CHECK(store.modelRuns().empty());
}
