// Hole summaries on the clean test dataset, with figures worked by hand. Recovery follows the
// ocean-drilling convention (checks.md [P: ocean-drilling explanatory notes]): recovery =
// recovered / cored length, and recovery beyond a run's cored length (core expansion) counts only
// up to that length.
#include "atollog/engine/hole_summary.hpp"

#include "test_fixture_dataset.hpp"

#include <catch2/catch.hpp>

#include <limits>
#include <stdexcept>

using namespace atollog;
using atollog::test::cleanDataset;
using atollog::test::makeInterval;
using atollog::test::makeOccurrence;
using atollog::test::makeRun;
using atollog::test::makeSample;
using Catch::WithinAbs;

namespace {
constexpr double kTol_m = 1e-9; // sums of a few metre values
constexpr double kTol_pct = 1e-9;
} // namespace

TEST_CASE("summary of a cored hole", "[unit][summary]") {
    const std::vector<HoleSummary> s = summarizeHoles(cleanDataset());
    REQUIRE(s.size() == 2);
    const HoleSummary &h = s[0];
    CHECK(h.hole == "VEY-1");
    CHECK(h.site == "Oru Veya Reef");
    CHECK(h.run_count == 3);
    // Runs 0-3 (2.4), 3-6 (3.0), 6-9 (1.5): cored 9 m, recovered 6.9 m, 76.67 %.
    CHECK_THAT(h.cored_m, WithinAbs(9.0, kTol_m));
    CHECK_THAT(h.recovered_m, WithinAbs(6.9, kTol_m));
    CHECK_THAT(h.recovery_pct, WithinAbs(100.0 * 6.9 / 9.0, kTol_pct));
    // Intervals 0-1.2 framestone, 1.2-2.4 grainstone, 3-6 wackestone, 6-7.5 basalt.
    CHECK_THAT(h.logged_m, WithinAbs(1.2 + 1.2 + 3.0 + 1.5, kTol_m));
    REQUIRE(h.thickness_by_class_m.size() == 4);
    CHECK_THAT(h.thickness_by_class_m.at("framestone"), WithinAbs(1.2, kTol_m));
    CHECK_THAT(h.thickness_by_class_m.at("grainstone"), WithinAbs(1.2, kTol_m));
    CHECK_THAT(h.thickness_by_class_m.at("wackestone"), WithinAbs(3.0, kTol_m));
    CHECK_THAT(h.thickness_by_class_m.at("basalt"), WithinAbs(1.5, kTol_m));
    CHECK(h.sample_count == 4);
    // Occurrences in S1-S3: T1, T2, T2 again, T3 (reworked counts too) -> 3 distinct taxa.
    CHECK(h.taxon_count == 3);
    CHECK(h.exposure_surface_count == 1);
}

TEST_CASE("summary of a cuttings hole without runs", "[unit][summary]") {
    const HoleSummary h = summarizeHoles(cleanDataset())[1];
    CHECK(h.hole == "VEY-2C");
    CHECK(h.run_count == 0);
    CHECK_THAT(h.cored_m, WithinAbs(0.0, kTol_m));
    CHECK_THAT(h.recovery_pct, WithinAbs(0.0, kTol_pct)); // nothing cored: 0, not NaN
    CHECK(h.sample_count == 1);
    CHECK(h.taxon_count == 1); // caved T3 in C1
    CHECK(h.thickness_by_class_m.empty());
}

TEST_CASE("recovery over 100 % counts up to the cored length", "[unit][summary]") {
    CoreDataset d = cleanDataset();
    d.runs[2].recovered_m = 3.4; // 6-9 m run, core expanded: counts as 3.0
    const HoleSummary h = summarizeHoles(d)[0];
    CHECK_THAT(h.recovered_m, WithinAbs(2.4 + 3.0 + 3.0, kTol_m));
    CHECK_THAT(h.recovery_pct, WithinAbs(100.0 * 8.4 / 9.0, kTol_pct));
}

TEST_CASE("carbonates without texture are unclassified; rock words otherwise", "[unit][summary]") {
    CoreDataset d = cleanDataset();
    d.intervals[1].texture.reset();
    d.intervals.push_back(makeInterval("VEY-1", 7.5, 8.0, Rock::Dolostone));
    d.intervals.push_back(makeInterval("VEY-1", 3.0, 3.5, Rock::Clay));
    d.intervals.back().hole = "VEY-2C";
    const auto s = summarizeHoles(d);
    CHECK_THAT(s[0].thickness_by_class_m.at("unclassified"), WithinAbs(1.2 + 0.5, kTol_m));
    CHECK(s[0].thickness_by_class_m.count("grainstone") == 0);
    CHECK_THAT(s[1].thickness_by_class_m.at("clay"), WithinAbs(0.5, kTol_m));
    CHECK_THAT(s[1].logged_m, WithinAbs(0.5, kTol_m));
}

TEST_CASE("distinct taxa follow occurrences to their sample's hole", "[unit][summary]") {
    CoreDataset d = cleanDataset();
    d.samples.push_back(makeSample("VEY-2C", "C2", 20.0, 22.0));
    d.occurrences.push_back(makeOccurrence("C2", "T1"));
    d.occurrences.push_back(makeOccurrence("C2", "T3"));   // already seen in C1
    d.occurrences.push_back(makeOccurrence("NOPE", "T2")); // dangling: belongs to no hole
    const auto s = summarizeHoles(d);
    CHECK(s[0].taxon_count == 3);
    CHECK(s[1].taxon_count == 2);
    CHECK(s[1].sample_count == 2);
}

TEST_CASE("data the summary cannot use is refused, not summed", "[unit][summary]") {
    CoreDataset d = cleanDataset();
    SECTION("overlapping runs") {
        d.runs.push_back(makeRun("VEY-1", "2Rb", 5.0, 7.0, 1.0));
        CHECK_THROWS_WITH(summarizeHoles(d),
                          Catch::Contains("hole VEY-1") && Catch::Contains("overlaps"));
    }
    SECTION("NaN interval depth") {
        d.intervals[0].base_m = std::numeric_limits<double>::quiet_NaN();
        CHECK_THROWS_WITH(summarizeHoles(d), Catch::Contains("intervals.csv data row 1"));
    }
    SECTION("duplicate hole ids") {
        d.holes[1].hole = "VEY-1";
        CHECK_THROWS_AS(summarizeHoles(d), std::invalid_argument);
    }
}

TEST_CASE("summary at scale: 1,000,000 occurrences", "[slow][.]") {
    CoreDataset d = cleanDataset();
    d.samples.clear();
    d.occurrences.clear();
    for (std::size_t s = 0; s < 50'000; ++s) {
        const std::string id = "S" + std::to_string(s);
        d.samples.push_back(makeSample(s % 2 ? "VEY-1" : "VEY-2C", id, 1.0, 1.0));
        for (std::size_t t = 0; t < 20; ++t)
            d.occurrences.push_back(makeOccurrence(id, "T" + std::to_string((s * 7 + t) % 500)));
    }
    const auto s = summarizeHoles(d);
    CHECK(s[0].sample_count == 25'000);
    // Odd s: (7s + t) mod 500 with t < 20 reaches every residue over 25,000 samples.
    CHECK(s[0].taxon_count == 500);
    CHECK(s[1].taxon_count == 500);
}
