// CorrelationData: its validation, and how it is filled from a project's picks and dates.
#include "atollog/engine/correlation_data.hpp"
#include "atollog/engine/correlation_data_from.hpp"

#include "atollog/engine/biostrat_run.hpp"

#include "biostrat_fixture.hpp"
#include "test_fixture_dataset.hpp"

#include <catch2/catch.hpp>

#include <limits>

using namespace atollog;
using namespace atollog::test;

namespace {

CorrelationData twoHoles() {
    CorrelationData d;
    d.holes = {"H1", "H2"};
    d.events = {{"B A", SequenceEventKind::Base, "A", 2.0, 0.1},
                {"T A", SequenceEventKind::Top, "A", 1.0, 0.1},
                {"date u-th S1", SequenceEventKind::Dated, "", 0.5, 0.01}};
    d.levels = {{0, 0, 10, 12, 10}, {0, 1, 3, 5, 5}, {1, 0, 20, 21, 20}, {1, 2, 2, 2, 2}};
    d.sampled_levels_m = {{1, 5, 10}, {2, 20}};
    d.surfaces_m = {{7}, {}};
    return d;
}

} // namespace

TEST_CASE("correlation data: a valid set passes, each fault is named", "[unit][correlation]") {
    CHECK_NOTHROW(validateCorrelationData(twoHoles()));
    auto d = twoHoles();
    d.events.push_back(d.events.front());
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("'B A' is listed twice"));
    d = twoHoles();
    d.levels.push_back({0, 0, 1, 2, 1});
    CHECK_THROWS_WITH(validateCorrelationData(d),
                      Catch::Contains("event 'B A' in hole 'H1' is observed twice"));
    d = twoHoles();
    d.levels[1].level_m = 9;
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("outside its bracket"));
    d = twoHoles();
    d.levels[0].deep_m = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("non-finite depth"));
    d = twoHoles();
    d.events[2].age_ma.reset();
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("has no age"));
    d = twoHoles();
    d.levels[0].hole = 5;
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("beyond the 2 holes"));
    d = twoHoles();
    d.sampled_levels_m[0] = {5, 1};
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("ascending"));
    d = twoHoles();
    d.surfaces_m.pop_back();
    CHECK_THROWS_WITH(validateCorrelationData(d), Catch::Contains("1 lists for 2 holes"));
}

TEST_CASE("correlation data from picks: found, closed picks at their finds", "[unit][correlation]") {
    // Hole VEC-1, samples S1..S6 at 1..6 m. Taxon A in S2..S4: top bracket 1-2 m (level 2),
    // base 4-5 m (level 4). Taxon B only in S6, the deepest sample: its base is open-ended and
    // stays out; its top (5-6 m) goes in. Taxon C is never found.
    CoreDataset d;
    d.holes = {makeHole("VEC-1")};
    d.runs = {makeRun("VEC-1", "R1", 0, 7, 7)};
    d.intervals = {makeInterval("VEC-1", 0, 7, Rock::Limestone)};
    for (int i = 1; i <= 6; ++i) {
        const std::string id = "S" + std::to_string(i);
        d.samples.push_back(makeSample("VEC-1", id, i, i));
        if (i >= 2 && i <= 4)
            d.occurrences.push_back(makeOccurrence(id, "A"));
        if (i == 6)
            d.occurrences.push_back(makeOccurrence(id, "B"));
        if (i == 1 || i == 5)
            d.occurrences.push_back(makeOccurrence(id, "R"));
    }
    d.events = {makeEvent("B A", "A", EventKind::Base, 3.0, 0.1),
                makeEvent("T A", "A", EventKind::Top, 1.0, 0.1),
                makeEvent("B B", "B", EventKind::Base, 4.0, 0.1),
                makeEvent("T B", "B", EventKind::Top, 2.0, 0.1),
                makeEvent("B C", "C", EventKind::Base, 5.0, 0.1)};
    const BiostratResult bio = runBiostratigraphy(d, {});
    const CorrelationData c = correlationDataFrom(d, bio.picks, {}, loggedSurfaces(d));
    REQUIRE(c.holes == std::vector<std::string>{"VEC-1"});
    std::vector<std::string> ids;
    for (const auto& e : c.events)
        ids.push_back(e.id);
    CHECK(ids == std::vector<std::string>{"B A", "T A", "T B"});
    REQUIRE(c.levels.size() == 3);
    CHECK(c.levels[0].shallow_m == 4.0);
    CHECK(c.levels[0].deep_m == 5.0);
    CHECK(c.levels[0].level_m == 4.0); // the lowest find
    CHECK(c.levels[1].level_m == 2.0); // the highest find
    CHECK(c.levels[2].shallow_m == 5.0);
    CHECK(c.sampled_levels_m[0] == std::vector<double>{1, 2, 3, 4, 5, 6});
}
