// validateDataset, one rule at a time: each SECTION breaks one thing in a clean dataset and looks
// for the issue it must cause (severity, table, row, column, message). The rules are those of the
// core data folder contract (/work/shared/formats.md); recovery and "core at the top of its run"
// follow the ocean-drilling convention (checks.md [P: ocean-drilling explanatory notes]); the
// texture rules follow Dunham (1962) and Embry & Klovan (1971).
#include "atollog/engine/validation.hpp"

#include "test_fixture_dataset.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <limits>
#include <sstream>

using namespace atollog;
using atollog::test::cleanDataset;
using atollog::test::makeInterval;
using atollog::test::makeOccurrence;
using atollog::test::makeRun;
using atollog::test::makeSample;

namespace {

const double kNaN = std::numeric_limits<double>::quiet_NaN();
const double kInf = std::numeric_limits<double>::infinity();

std::string describe(const std::vector<DataIssue> &issues) {
    std::ostringstream out;
    for (const DataIssue &i : issues)
        out << toString(i.severity) << " " << tableName(i.table) << "["
            << (i.row ? std::to_string(*i.row) : "-") << "]." << i.column << " '" << i.value
            << "': " << i.problem << " | " << i.fix << "\n";
    return out.str();
}

std::vector<DataIssue> issuesAt(const std::vector<DataIssue> &issues, Table table, std::size_t row,
                                const std::string &column) {
    std::vector<DataIssue> out;
    for (const DataIssue &i : issues)
        if (i.table == table && i.row == row && i.column == column)
            out.push_back(i);
    return out;
}

/// Validates and requires exactly one issue at (table, row, column) with this severity and a
/// problem containing `text`; returns it for further checks.
DataIssue expectIssue(const CoreDataset &data, Table table, std::size_t row,
                      const std::string &column, Severity severity, const std::string &text) {
    const std::vector<DataIssue> issues = validateDataset(data);
    INFO(describe(issues));
    const std::vector<DataIssue> found = issuesAt(issues, table, row, column);
    REQUIRE(found.size() == 1);
    CHECK(found[0].severity == severity);
    CHECK_THAT(found[0].problem, Catch::Contains(text));
    CHECK_FALSE(found[0].fix.empty());
    return found[0];
}

void expectNoIssues(const CoreDataset &data) {
    const std::vector<DataIssue> issues = validateDataset(data);
    INFO(describe(issues));
    CHECK(issues.empty());
}

} // namespace

TEST_CASE("a clean dataset has no issues", "[unit][validation]") {
    expectNoIssues(cleanDataset());
}

TEST_CASE("non-finite numbers are errors, reported once", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("runs.top_m NaN") {
        d.runs[1].top_m = kNaN;
        expectIssue(d, Table::Runs, 1, "top_m", Severity::Error, "not a finite number");
        // Not also "base above top": a NaN is reported as what it is.
        const auto issues = validateDataset(d);
        CHECK(issuesAt(issues, Table::Runs, 1, "base_m").empty());
    }
    SECTION("optional intervals.grains_pct Inf") {
        d.intervals[1].grains_pct = kInf;
        const DataIssue i =
            expectIssue(d, Table::Intervals, 1, "grains_pct", Severity::Error, "inf");
        CHECK(i.value == "inf");
    }
    SECTION("raw measurement field") {
        d.dates[0].uth->u234_u238_act_sd = kNaN;
        expectIssue(d, Table::Dates, 0, "u234_u238_act_sd", Severity::Error, "not a finite number");
    }
    SECTION("holes, samples, events, sealevel and curve") {
        d.holes[0].chain_km = kNaN;
        d.samples[0].base_m = kNaN;
        d.events[0].age_ma = -kInf;
        d.sea_level[1].level_m = kNaN;
        d.curve[0].c14_bp = kNaN;
        expectIssue(d, Table::Holes, 0, "chain_km", Severity::Error, "not a finite");
        expectIssue(d, Table::Samples, 0, "base_m", Severity::Error, "not a finite");
        expectIssue(d, Table::Events, 0, "age_ma", Severity::Error, "-inf");
        expectIssue(d, Table::SeaLevel, 1, "level_m", Severity::Error, "not a finite");
        expectIssue(d, Table::Curve, 0, "c14_bp", Severity::Error, "not a finite");
    }
}

TEST_CASE("duplicate ids are errors naming the first row", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("holes.hole") {
        d.holes[1].hole = "VEY-1";
        expectIssue(d, Table::Holes, 1, "hole", Severity::Error, "already used in data row 1");
    }
    SECTION("runs.run") {
        d.runs[2].run = "1R";
        expectIssue(d, Table::Runs, 2, "run", Severity::Error, "'1R' is already used in data row 1");
    }
    SECTION("samples.sample") {
        d.samples[3].sample = "S2";
        expectIssue(d, Table::Samples, 3, "sample", Severity::Error, "already used in data row 2");
    }
    SECTION("taxa.taxon") {
        d.taxa[2].taxon = "T1";
        expectIssue(d, Table::Taxa, 2, "taxon", Severity::Error, "already used in data row 1");
    }
    SECTION("events.event") {
        d.events[1].event = "E1";
        expectIssue(d, Table::Events, 1, "event", Severity::Error, "already used in data row 1");
    }
    SECTION("zones (scheme, zone) pair; the same zone name in another scheme is fine") {
        Zone again = d.zones[0];
        Zone other_scheme = d.zones[0];
        other_scheme.scheme = "VNN";
        d.zones.push_back(other_scheme);
        d.zones.push_back(again);
        expectIssue(d, Table::Zones, 2, "zone", Severity::Error, "'VPF/VPF1' is already used");
        CHECK(issuesAt(validateDataset(d), Table::Zones, 1, "zone").empty());
    }
}

TEST_CASE("required text present, ids without edge spaces", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("empty site") {
        d.holes[0].site = "";
        expectIssue(d, Table::Holes, 0, "site", Severity::Error, "site is empty");
    }
    SECTION("blank run id") {
        d.runs[0].run = "  ";
        expectIssue(d, Table::Runs, 0, "run", Severity::Error, "run is empty");
    }
    SECTION("empty taxon name and event id") {
        d.taxa[0].name = "";
        d.events[0].event = "";
        d.zones[0].base_event.reset(); // the zone no longer refers to the unnamed event
        expectIssue(d, Table::Taxa, 0, "name", Severity::Error, "name is empty");
        expectIssue(d, Table::Events, 0, "event", Severity::Error, "event is empty");
    }
    SECTION("empty scheme and zone") {
        d.zones[0].scheme = "";
        d.zones[0].zone = "";
        expectIssue(d, Table::Zones, 0, "scheme", Severity::Error, "scheme is empty");
        expectIssue(d, Table::Zones, 0, "zone", Severity::Error, "zone is empty");
    }
    SECTION("sample id with a trailing space") {
        d.samples[4].sample = "C1 ";
        d.occurrences[4].sample = "C1 ";
        const DataIssue i = expectIssue(d, Table::Samples, 4, "sample", Severity::Error,
                                        "leading or trailing spaces");
        CHECK_THAT(i.fix, Catch::Contains("'C1'"));
    }
}

TEST_CASE("references resolve", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("runs -> hole") {
        d.runs[0].hole = "VEY-9";
        expectIssue(d, Table::Runs, 0, "hole", Severity::Error,
                    "hole 'VEY-9' of run '1R' is not in holes.csv");
    }
    SECTION("intervals, samples and dates -> hole") {
        d.intervals[3].hole = "VEY-9";
        d.samples[0].hole = "VEY-9";
        d.dates[2].hole = "VEY-9";
        expectIssue(d, Table::Intervals, 3, "hole", Severity::Error, "'VEY-9' is not in holes.csv");
        expectIssue(d, Table::Samples, 0, "hole", Severity::Error, "'VEY-9' of sample 'S1'");
        expectIssue(d, Table::Dates, 2, "hole", Severity::Error, "not in holes.csv");
    }
    SECTION("a reference with stray spaces suggests the trimmed id") {
        d.runs[0].hole = "VEY-1 ";
        const DataIssue i =
            expectIssue(d, Table::Runs, 0, "hole", Severity::Error, "not in holes.csv");
        CHECK_THAT(i.fix, Catch::Contains("without the spaces"));
    }
    SECTION("occurrences -> sample and taxon") {
        d.occurrences[2].sample = "S99";
        d.occurrences[3].taxon = "T99";
        expectIssue(d, Table::Occurrences, 2, "sample", Severity::Error,
                    "sample 'S99' is not in samples.csv");
        expectIssue(d, Table::Occurrences, 3, "taxon", Severity::Error,
                    "taxon 'T99' is not in taxa.csv");
    }
    SECTION("events -> taxon") {
        d.events[1].taxon = "T99";
        expectIssue(d, Table::Events, 1, "taxon", Severity::Error,
                    "of event 'E2' is not in taxa.csv");
    }
    SECTION("dates.sample -> sample, of the same hole") {
        d.dates[0].sample = "S99";
        expectIssue(d, Table::Dates, 0, "sample", Severity::Error, "'S99' is not in samples.csv");
    }
    SECTION("a dated sample of another hole") {
        d.dates[0].sample = "C1";
        expectIssue(d, Table::Dates, 0, "sample", Severity::Error,
                    "sample 'C1' belongs to hole 'VEY-2C', but the date is given for hole 'VEY-1'");
    }
    SECTION("zones -> events") {
        d.zones[0].base_event = "E8";
        d.zones[0].top_event = "E9";
        expectIssue(d, Table::Zones, 0, "base_event", Severity::Error,
                    "event 'E8' (base of zone 'VPF1')");
        expectIssue(d, Table::Zones, 0, "top_event", Severity::Error,
                    "event 'E9' (top of zone 'VPF1')");
    }
}

TEST_CASE("base deeper than top, depths not negative", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("run base above top") {
        d.runs.push_back(makeRun("VEY-1", "4R", 14.5, 12.3, 1.0));
        const DataIssue i = expectIssue(d, Table::Runs, 3, "base_m", Severity::Error,
                                        "base_m 12.3 is above top_m 14.5");
        CHECK(i.value == "12.3");
        CHECK_THAT(i.problem, Catch::Contains("run '4R' of hole 'VEY-1'"));
        CHECK_THAT(i.fix, Catch::Contains("must be deeper (larger) than top_m"));
    }
    SECTION("interval of no thickness") {
        d.intervals[3].base_m = 6.0;
        expectIssue(d, Table::Intervals, 3, "base_m", Severity::Error, "equals top_m 6");
    }
    SECTION("sample base above top; a point sample (base = top) is fine") {
        d.samples[1].base_m = 1.7;
        expectIssue(d, Table::Samples, 1, "base_m", Severity::Error,
                    "base_m 1.7 is above top_m 1.8");
        CHECK(issuesAt(validateDataset(d), Table::Samples, 0, "base_m").empty());
    }
    SECTION("negative depths") {
        d.holes[1].kind = HoleKind::Cuttings;
        d.samples[4].top_m = -2.0;
        expectIssue(d, Table::Samples, 4, "top_m", Severity::Error, "negative (above the collar)");
        d.dates[2].depth_m = -1.0;
        expectIssue(d, Table::Dates, 2, "depth_m", Severity::Error, "negative");
    }
}

TEST_CASE("runs and intervals of one hole do not overlap", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("overlapping runs") {
        d.runs.push_back(makeRun("VEY-1", "2Rb", 5.0, 7.0, 1.0));
        expectIssue(d, Table::Runs, 3, "top_m", Severity::Error,
                    "run '2Rb' (5-7 m) overlaps run '2R' (3-6 m, data row 2) of hole 'VEY-1'");
        // With its runs in error, the hole's coverage is not checked (a warning says so).
        expectIssue(d, Table::Holes, 0, "hole", Severity::Warning, "were not checked");
    }
    SECTION("runs of different holes may share depths") {
        d.holes[1].kind = HoleKind::Core;
        d.runs.push_back(makeRun("VEY-2C", "1R", 9.0, 13.0, 4.0));
        d.runs.back().run = "C-1R";
        expectNoIssues(d);
    }
    SECTION("overlapping intervals") {
        d.intervals.push_back(makeInterval("VEY-1", 0.8, 1.0, Rock::Limestone));
        expectIssue(d, Table::Intervals, 4, "top_m", Severity::Error,
                    "interval 0.8-1 m overlaps the interval 0-1.2 m in data row 1 of hole 'VEY-1'");
    }
    SECTION("touching intervals are fine") {
        d.intervals.push_back(makeInterval("VEY-1", 7.5, 8.0, Rock::Basalt));
        d.runs[2].recovered_m = 2.0;
        expectNoIssues(d);
    }
}

TEST_CASE("intervals, samples and dated depths lie inside the cored part", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    d.runs.push_back(makeRun("VEY-1", "4R", 12.0, 15.0, 3.0)); // uncored gap 9-12 m
    SECTION("interval outside every run") {
        d.intervals.push_back(makeInterval("VEY-1", 9.5, 10.5, Rock::Basalt));
        expectIssue(d, Table::Intervals, 4, "top_m", Severity::Error,
                    "lies outside every run of hole 'VEY-1'");
    }
    SECTION("interval reaching into the uncored gap") {
        d.runs[2].recovered_m = 3.0;
        d.intervals.push_back(makeInterval("VEY-1", 8.0, 9.5, Rock::Basalt));
        expectIssue(d, Table::Intervals, 4, "top_m", Severity::Error, "only partly inside");
    }
    SECTION("interval spanning touching runs is inside") {
        d.intervals[2].top_m = 2.4; // 1R is recovered to 2.4 m only, so start there
        d.intervals[2].base_m = 6.0;
        d.intervals[2].top_m = 3.0;
        d.intervals.push_back(makeInterval("VEY-1", 12.0, 15.0, Rock::Basalt));
        expectNoIssues(d);
    }
    SECTION("interval extending into the unrecovered part -> warning") {
        // 3R: 6-9 m, 1.5 m recovered: core fills 6.0-7.5 m (top of run, ocean-drilling
        // convention), so 7.5-8.0 m of this interval has no core behind it.
        d.intervals[3].base_m = 8.0;
        const DataIssue i = expectIssue(d, Table::Intervals, 3, "base_m", Severity::Warning,
                                        "extends into the unrecovered part of run '3R'");
        CHECK_THAT(i.problem, Catch::Contains("7.5-8 m of it"));
    }
    SECTION("sample outside every run") {
        d.samples.push_back(makeSample("VEY-1", "S5", 10.0, 10.0));
        expectIssue(d, Table::Samples, 5, "top_m", Severity::Error, "outside every run");
    }
    SECTION("sample in the unrecovered part -> warning") {
        d.samples.push_back(makeSample("VEY-1", "S5", 8.0, 8.0));
        const DataIssue i = expectIssue(d, Table::Samples, 5, "top_m", Severity::Warning,
                                        "unrecovered part of run '3R'");
        CHECK_THAT(i.problem, Catch::Contains("recovered core ends at 7.5 m"));
    }
    SECTION("sample at the base of the last run is cored") {
        d.samples.push_back(makeSample("VEY-1", "S5", 15.0, 15.0));
        expectNoIssues(d);
    }
    SECTION("dated depth outside the cored part -> error, unrecovered -> warning") {
        d.dates[1].depth_m = 10.0;
        expectIssue(d, Table::Dates, 1, "depth_m", Severity::Error, "outside every run");
        d.dates[1].depth_m = 8.5;
        expectIssue(d, Table::Dates, 1, "depth_m", Severity::Warning, "unrecovered part");
    }
    SECTION("holes without runs are not checked (cuttings)") {
        d.samples.push_back(makeSample("VEY-2C", "C2", 300.0, 310.0));
        expectNoIssues(d);
    }
}

TEST_CASE("recovery", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("negative recovered_m -> error") {
        d.runs[0].recovered_m = -0.2;
        expectIssue(d, Table::Runs, 0, "recovered_m", Severity::Error,
                    "recovered_m -0.2 is negative");
    }
    SECTION("over 100 % -> warning (core expansion, ocean-drilling convention)") {
        // 3.3 m recovered from a 3.0 m run: 110 % recovery.
        d.runs[1].recovered_m = 3.3;
        expectIssue(d, Table::Runs, 1, "recovered_m", Severity::Warning,
                    "more than the cored length 3 m (110 % recovery)");
    }
    SECTION("a core hole without runs -> warning; a cuttings hole without runs is fine") {
        d.holes[1].kind = HoleKind::Core;
        expectIssue(d, Table::Holes, 1, "kind", Severity::Warning,
                    "core hole 'VEY-2C' has no runs");
    }
}

TEST_CASE("single values within their range", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("percentages 0-100") {
        d.intervals[1].porosity_pct = 130;
        d.intervals[1].caco3_pct = -1;
        d.intervals[2].grains_pct = 101;
        d.intervals[0].coarse_pct = 0.4e3;
        expectIssue(d, Table::Intervals, 1, "porosity_pct", Severity::Error,
                    "porosity_pct 130 is outside 0 to 100");
        expectIssue(d, Table::Intervals, 1, "caco3_pct", Severity::Error, "outside 0 to 100");
        expectIssue(d, Table::Intervals, 2, "grains_pct", Severity::Error, "grains_pct 101");
        expectIssue(d, Table::Intervals, 0, "coarse_pct", Severity::Error, "coarse_pct 400");
    }
    SECTION("dry density: > 0 error, above 3.0 g/cm3 warning") {
        d.intervals[1].dry_density_g_cm3 = 0.0;
        expectIssue(d, Table::Intervals, 1, "dry_density_g_cm3", Severity::Error,
                    "not greater than 0");
        d.intervals[1].dry_density_g_cm3 = 1900.0; // kg/m3 by mistake
        expectIssue(d, Table::Intervals, 1, "dry_density_g_cm3", Severity::Warning,
                    "above 3.0 g/cm3");
    }
    SECTION("paleodepths") {
        d.intervals[1].paleodepth_min_m = 20;
        expectIssue(d, Table::Intervals, 1, "paleodepth_min_m", Severity::Error,
                    "paleodepth_min_m 20 is deeper than paleodepth_max_m 10");
        d.intervals[1].paleodepth_min_m = -5;
        expectIssue(d, Table::Intervals, 1, "paleodepth_min_m", Severity::Error, "negative");
    }
    SECTION("coordinates") {
        d.holes[0].lat_deg = 91.0;
        d.holes[0].lon_deg = -181.0;
        expectIssue(d, Table::Holes, 0, "lat_deg", Severity::Error,
                    "lat_deg 91 is outside -90 to 90");
        expectIssue(d, Table::Holes, 0, "lon_deg", Severity::Error, "outside -180 to 180");
    }
    SECTION("standard deviations > 0") {
        d.events[0].age_sd_ma = 0.0;
        d.dates[2].age_sd_ma = -0.1;
        d.dates[0].uth->th230_u238_act_sd = 0.0;
        d.dates[0].uth->u234_u238_act_sd = 0.0;
        d.dates[1].c14->f14c_sd = 0.0;
        d.dates[1].c14->delta_r_sd_yr = 0.0;
        d.sea_level[0].level_sd_m = 0.0;
        d.curve[2].sd = 0.0;
        expectIssue(d, Table::Events, 0, "age_sd_ma", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Dates, 2, "age_sd_ma", Severity::Error, "-0.1 is not greater than 0");
        expectIssue(d, Table::Dates, 0, "th230_u238_act_sd", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Dates, 0, "u234_u238_act_sd", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Dates, 1, "f14c_sd", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Dates, 1, "delta_r_sd_yr", Severity::Error, "not greater than 0");
        expectIssue(d, Table::SeaLevel, 0, "level_sd_m", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Curve, 2, "sd", Severity::Error, "not greater than 0");
    }
    SECTION("ages >= 0, activity ratios and F14C > 0") {
        d.events[1].age_ma = -0.5;
        d.dates[2].age_ma = -1.5;
        d.sea_level[1].age_ma = -0.02;
        d.dates[0].uth->th230_u238_act = 0.0;
        d.dates[0].uth->u234_u238_act = -1.0;
        d.dates[1].c14->f14c = 0.0;
        expectIssue(d, Table::Events, 1, "age_ma", Severity::Error, "age_ma -0.5 is negative");
        expectIssue(d, Table::Dates, 2, "age_ma", Severity::Error, "negative");
        expectIssue(d, Table::SeaLevel, 1, "age_ma", Severity::Error, "negative");
        expectIssue(d, Table::Dates, 0, "th230_u238_act", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Dates, 0, "u234_u238_act", Severity::Error, "not greater than 0");
        expectIssue(d, Table::Dates, 1, "f14c", Severity::Error, "not greater than 0");
    }
}

TEST_CASE("textures against rock and attributes", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("texture on a non-carbonate rock -> warning") {
        d.intervals[3].texture = Texture::Grainstone;
        expectIssue(d, Table::Intervals, 3, "texture", Severity::Warning,
                    "texture grainstone is given for basalt");
    }
    SECTION("texture disagreeing with decided attributes names both") {
        // Mud supported with 30 % grains is a wackestone (Dunham 1962), not a mudstone.
        d.intervals[2].texture = Texture::Mudstone;
        const DataIssue i = expectIssue(d, Table::Intervals, 2, "texture", Severity::Warning,
                                        "texture mudstone disagrees with wackestone");
        CHECK(i.value == "mudstone");
    }
    SECTION("texture impossible under partial attributes lists what is allowed") {
        // Grain supported (Dunham 1962): grainstone or packstone, never wackestone.
        d.intervals[1].texture = Texture::Wackestone;
        expectIssue(d, Table::Intervals, 1, "texture", Severity::Warning,
                    "allow only packstone, grainstone");
    }
    SECTION("grain supported: grainstone and packstone are both consistent") {
        d.intervals[1].texture = Texture::Packstone;
        expectNoIssues(d);
    }
    SECTION("boundstone is consistent with a bound rock (Embry & Klovan 1971)") {
        d.intervals[0].texture = Texture::Boundstone;
        expectNoIssues(d);
        d.intervals[2].texture = Texture::Boundstone; // binding none: not a boundstone
        expectIssue(d, Table::Intervals, 2, "texture", Severity::Warning, "boundstone disagrees");
    }
    SECTION("crystalline is the logger's call") {
        d.intervals[2].texture = Texture::Crystalline;
        expectNoIssues(d);
    }
    SECTION("the 10 % boundary: 10 % grains is mudstone, 10 % coarse is not floatstone") {
        d.intervals[2].grains_pct = 10.0;
        d.intervals[2].coarse_pct = 10.0;
        expectIssue(d, Table::Intervals, 2, "texture", Severity::Warning,
                    "wackestone disagrees with mudstone");
    }
}

TEST_CASE("dates: place and form", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("both sample and depth_m") {
        d.dates[0].depth_m = 4.0;
        expectIssue(d, Table::Dates, 0, "depth_m", Severity::Error,
                    "gives both sample 'S3' and depth_m 4");
    }
    SECTION("neither sample nor depth_m") {
        d.dates[2].depth_m.reset();
        expectIssue(d, Table::Dates, 2, "sample", Severity::Error, "neither sample nor depth_m");
    }
    SECTION("age without sd, sd without age") {
        d.dates[2].age_sd_ma.reset();
        expectIssue(d, Table::Dates, 2, "age_sd_ma", Severity::Error,
                    "age_ma 1.5 without age_sd_ma");
        d.dates[2].age_sd_ma = 0.1;
        d.dates[2].age_ma.reset();
        expectIssue(d, Table::Dates, 2, "age_ma", Severity::Error, "age_sd_ma 0.1 without age_ma");
    }
    SECTION("raw measurement on the wrong method") {
        d.dates[0].method = DateMethod::C14;
        expectIssue(d, Table::Dates, 0, "th230_u238_act", Severity::Error,
                    "carries a U-Th measurement (activity ratios) but its method is c14");
        d.dates[1].method = DateMethod::ArAr;
        expectIssue(d, Table::Dates, 1, "f14c", Severity::Error, "its method is ar-ar");
    }
    SECTION("no age and no measurement") {
        d.dates[1].c14.reset();
        const DataIssue i = expectIssue(d, Table::Dates, 1, "age_ma", Severity::Error,
                                        "gives no age and no measurement");
        CHECK_THAT(i.fix, Catch::Contains("f14c"));
    }
}

TEST_CASE("occurrences", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("negative count") {
        d.occurrences[1].abundance = Abundance{std::int64_t{-3}};
        expectIssue(d, Table::Occurrences, 1, "abundance", Severity::Error, "count -3 is negative");
    }
    SECTION("the same (sample, taxon, status) twice") {
        d.occurrences.push_back(makeOccurrence("S3", "T2"));
        expectIssue(d, Table::Occurrences, 5, "taxon", Severity::Error,
                    "taxon 'T2' (in_place) in sample 'S3' is already listed in data row 3");
    }
    SECTION("the same taxon in a sample with another status is fine") {
        d.occurrences.push_back(makeOccurrence("S3", "T2", OccurrenceStatus::Caved));
        expectNoIssues(d);
    }
}

TEST_CASE("zones and the calibration curve", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("base and top event the same") {
        d.zones[0].top_event = "E1";
        expectIssue(d, Table::Zones, 0, "top_event", Severity::Error, "both 'E1'");
    }
    SECTION("a zone with neither event -> warning") {
        d.zones[0].base_event.reset();
        d.zones[0].top_event = "";
        expectIssue(d, Table::Zones, 0, "base_event", Severity::Warning,
                    "neither base_event nor top_event");
    }
    SECTION("an open zone (one event) is fine") {
        d.zones[0].top_event.reset();
        expectNoIssues(d);
    }
    SECTION("duplicate cal_bp -> error; an unsorted curve is fine") {
        d.curve.push_back({1000.0, 1120.0, 20.0, {}});
        expectIssue(d, Table::Curve, 3, "cal_bp", Severity::Error,
                    "cal_bp 1000 appears again (first in data row 1)");
    }
}

TEST_CASE("several problems are all reported, in table then row order", "[unit][validation]") {
    CoreDataset d = cleanDataset();
    d.curve[1].cal_bp = 2000.0;    // curve: duplicate cal_bp
    d.occurrences[0].taxon = "T7"; // occurrences: unknown taxon
    d.intervals[2].base_m = 2.0;   // intervals: base above top
    d.runs[0].recovered_m = -1.0;  // runs: negative recovery
    d.holes[0].lat_deg = kNaN;     // holes: non-finite
    const std::vector<DataIssue> issues = validateDataset(d);
    INFO(describe(issues));
    REQUIRE(issues.size() >= 5);
    CHECK(issuesAt(issues, Table::Holes, 0, "lat_deg").size() == 1);
    CHECK(issuesAt(issues, Table::Runs, 0, "recovered_m").size() == 1);
    CHECK(issuesAt(issues, Table::Intervals, 2, "base_m").size() == 1);
    CHECK(issuesAt(issues, Table::Occurrences, 0, "taxon").size() == 1);
    CHECK(issuesAt(issues, Table::Curve, 2, "cal_bp").size() == 1);
    // The only other issue allowed is the note that VEY-1's coverage was not checked.
    CHECK(issues.size() == 6);
    CHECK(issuesAt(issues, Table::Holes, 0, "hole").size() == 1);
    CHECK(std::is_sorted(issues.begin(), issues.end(), [](const DataIssue &a, const DataIssue &b) {
        return a.table != b.table ? a.table < b.table : a.row < b.row;
    }));
    CHECK(hasErrors(issues));
}

TEST_CASE("validation at scale: 50,000 samples, 1,000,000 occurrences", "[slow][.]") {
    // Not timed here (benchmarks are run by hand); proves the checks stay out of quadratic time
    // and still find the one planted duplicate.
    CoreDataset d = cleanDataset();
    const std::size_t samples = 50'000, per_sample = 20;
    d.runs.clear();
    for (std::size_t r = 0; r < 5'000; ++r)
        d.runs.push_back(makeRun("VEY-1", "R" + std::to_string(r), 3.0 * r, 3.0 * r + 3.0, 3.0));
    d.samples.clear();
    d.occurrences.clear();
    d.dates.resize(2);
    d.dates[0].sample = "S0";
    d.occurrences.reserve(samples * per_sample + 1);
    for (std::size_t s = 0; s < samples; ++s) {
        const std::string id = "S" + std::to_string(s);
        d.samples.push_back(makeSample("VEY-1", id, 0.3 * s, 0.3 * s));
        for (std::size_t t = 0; t < per_sample; ++t)
            d.occurrences.push_back(makeOccurrence(id, "T" + std::to_string(1 + (s + t) % 3),
                                                   static_cast<OccurrenceStatus>((t / 3) % 3)));
    }
    const std::vector<DataIssue> issues = validateDataset(d);
    INFO(describe(std::vector<DataIssue>(
        issues.begin(), issues.begin() + std::min<std::size_t>(issues.size(), 5))));
    // 20 occurrences per sample over 3 taxa x 3 statuses: 9 distinct keys, 11 repeats each.
    CHECK(issues.size() == samples * (per_sample - 9));
}
