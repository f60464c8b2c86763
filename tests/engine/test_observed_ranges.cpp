// Observed ranges from in-place occurrences, worked by hand on an invented hole. Reworked fossils
// are older than their rock and caved ones younger (common practice), so neither may extend a
// range: they are counted and listed beside it.
#include "atollog/engine/observed_ranges.hpp"

#include "biostrat_fixture.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <limits>
#include <stdexcept>

using namespace atollog;
using namespace atollog::test;
using Catch::WithinAbs;

namespace {
constexpr double kTol_m = 1e-9;

/// Hole VEB-1, samples at 5, 6, 6 (two samples at one level), 8, 9 and 12 m.
CoreDataset rangeDataset() {
    CoreDataset d;
    d.holes = {makeHole("VEB-1")};
    d.samples = {makeSample("VEB-1", "E1", 5, 5),  makeSample("VEB-1", "E2", 6, 6),
                 makeSample("VEB-1", "E2b", 6, 6), makeSample("VEB-1", "E3", 8, 8),
                 makeSample("VEB-1", "E4", 9, 9),  makeSample("VEB-1", "E5", 12, 12)};
    d.occurrences = {
        makeOccurrence("E1", "KA", OccurrenceStatus::Caved),   // caved: not the top
        makeCounted("E2", "KA", AbundanceClass::Few),
        makeCounted("E2b", "KA", AbundanceClass::Abundant),    // same level as E2
        makeCounted("E3", "KA", std::int64_t{40}),
        makeCounted("E4", "KA", AbundanceClass::Common),
        makeOccurrence("E5", "KA", OccurrenceStatus::Reworked), // reworked: not the base
        makeOccurrence("E5", "KB", OccurrenceStatus::Reworked),
        makeOccurrence("E3", "KB", OccurrenceStatus::Caved),
    };
    return d;
}

const ObservedRange& rangeOf(const std::vector<ObservedRange>& rs, const std::string& taxon) {
    auto it = std::find_if(rs.begin(), rs.end(),
                           [&](const ObservedRange& r) { return r.taxon == taxon; });
    REQUIRE(it != rs.end());
    return *it;
}

} // namespace

TEST_CASE("observed range from in-place occurrences only", "[unit][biostrat][ranges]") {
    const auto ranges = observeRanges(rangeDataset(), BiostratSettings{});
    REQUIRE(ranges.size() == 2);
    const ObservedRange& ka = rangeOf(ranges, "KA");
    CHECK(ka.hole == "VEB-1");
    REQUIRE(ka.highest);
    REQUIRE(ka.lowest);
    CHECK(ka.highest->sample == "E2"); // E1 holds KA only caved
    CHECK_THAT(ka.highest->top_m, WithinAbs(6.0, kTol_m));
    CHECK(ka.lowest->sample == "E4"); // E5 holds KA only reworked
    CHECK_THAT(ka.lowest->top_m, WithinAbs(9.0, kTol_m));
    CHECK(ka.sample_count == 4);
    CHECK(ka.horizon_count == 3); // 6 m (E2, E2b), 8 m, 9 m
    CHECK_THAT(ka.length_m(), WithinAbs(3.0, kTol_m));
    REQUIRE(ka.caved.size() == 1);
    CHECK(ka.caved[0].sample == "E1");
    CHECK_THAT(ka.caved[0].top_m, WithinAbs(5.0, kTol_m));
    REQUIRE(ka.reworked.size() == 1);
    CHECK_THAT(ka.reworked[0].top_m, WithinAbs(12.0, kTol_m));
}

TEST_CASE("a taxon seen only reworked or caved has no range", "[unit][biostrat][ranges]") {
    const ObservedRange kb = rangeOf(observeRanges(rangeDataset(), BiostratSettings{}), "KB");
    CHECK_FALSE(kb.highest.has_value());
    CHECK_FALSE(kb.lowest.has_value());
    CHECK(kb.horizon_count == 0);
    CHECK_THAT(kb.length_m(), WithinAbs(0.0, kTol_m));
    CHECK(kb.reworked.size() == 1);
    CHECK(kb.caved.size() == 1);
}

TEST_CASE("abundance thresholds narrow the range", "[unit][biostrat][ranges]") {
    BiostratSettings s;
    s.min_abundance_class = AbundanceClass::Common; // few at E2 fails, abundant at E2b passes
    s.min_abundance_count = 50;                     // 40 at E3 fails
    const ObservedRange ka = rangeOf(observeRanges(rangeDataset(), s), "KA");
    CHECK(ka.highest->sample == "E2b");
    CHECK(ka.lowest->sample == "E4");
    CHECK(ka.horizon_count == 2);
    CHECK(ka.below_threshold_count == 2);
    s.min_abundance_count = 40; // "at or above": 40 passes
    CHECK(rangeOf(observeRanges(rangeDataset(), s), "KA").horizon_count == 3);
    // Only a class threshold: counts pass whatever their size.
    s.min_abundance_count.reset();
    s.min_abundance_class = AbundanceClass::Dominant;
    const ObservedRange dom = rangeOf(observeRanges(rangeDataset(), s), "KA");
    CHECK(dom.highest->sample == "E3");
    CHECK(dom.lowest->sample == "E3");
}

TEST_CASE("observed ranges reject unusable input", "[unit][biostrat][ranges]") {
    CoreDataset d = rangeDataset();
    d.samples.push_back(makeSample("VEB-1", "E1", 20, 20));
    CHECK_THROWS_WITH(observeRanges(d, {}), Catch::Contains("'E1'") && Catch::Contains("twice"));
    d = rangeDataset();
    d.samples[0].hole = "ELSEWHERE";
    CHECK_THROWS_WITH(observeRanges(d, {}), Catch::Contains("unknown hole 'ELSEWHERE'"));
    d = rangeDataset();
    d.occurrences[1].abundance = std::int64_t{-2};
    CHECK_THROWS_WITH(observeRanges(d, {}), Catch::Contains("-2"));
    d = rangeDataset();
    d.samples[2].top_m = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_AS(observeRanges(d, {}), std::invalid_argument);
}
