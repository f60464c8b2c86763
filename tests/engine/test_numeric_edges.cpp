// Numbers at the edges, at every engine entry point that takes them: NaN and infinities, runs
// and intervals of zero thickness, runs with 0 % recovery, and finite values so large that
// arithmetic on them overflows. Each either gives a clear message (std::invalid_argument naming
// the row, or a DataIssue) or a finite result: no entry point may hand back a NaN
// (DEVELOPERS.md, "Errors"). IEEE 754 facts relied on: NaN compares false with everything, and
// 1e308 - (-1e308) overflows to +inf.
#include "atollog/engine/depth_model.hpp"
#include "atollog/engine/hole_summary.hpp"
#include "atollog/engine/texture_classifier.hpp"
#include "atollog/engine/validation.hpp"
#include "test_fixture_dataset.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <stdexcept>

using namespace atollog;
using atollog::test::cleanDataset;
using atollog::test::makeRun;
using Catch::Matchers::Contains;

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kHuge = 1e308; // finite, but the difference of two of them is not

bool finiteRange(const DepthRange& r) {
    return std::isfinite(r.shallow_m) && std::isfinite(r.deep_m) && r.shallow_m <= r.deep_m;
}

void requireFiniteSummary(const HoleSummary& s) {
    INFO("hole " << s.hole);
    CHECK(std::isfinite(s.cored_m));
    CHECK(std::isfinite(s.recovered_m));
    CHECK(std::isfinite(s.recovery_pct));
    CHECK(std::isfinite(s.logged_m));
    for (const auto& [word, metres] : s.thickness_by_class_m) CHECK(std::isfinite(metres));
}

bool hasErrorAt(const std::vector<DataIssue>& issues, Table table, std::size_t row,
                const std::string& column) {
    for (const DataIssue& i : issues) {
        if (i.severity == Severity::Error && i.table == table && i.row == row &&
            i.column == column && !i.problem.empty() && !i.fix.empty())
            return true;
    }
    return false;
}

} // namespace

TEST_CASE("DepthModel refuses non-finite and zero-length runs with the run named", "[unit]") {
    for (const auto& [top, base, recovered] :
         {std::tuple{kNaN, 3.0, 1.0}, std::tuple{0.0, kInf, 1.0}, std::tuple{0.0, 3.0, kNaN},
          std::tuple{-kInf, 3.0, 1.0}, std::tuple{0.0, 3.0, kInf}}) {
        INFO("top " << top << " base " << base << " recovered " << recovered);
        CHECK_THROWS_WITH(DepthModel({makeRun("EDGE-1", "R1", top, base, recovered)}),
                          Contains("run 'R1' of hole 'EDGE-1'") && Contains("non-finite"));
    }
    CHECK_THROWS_WITH(DepthModel({makeRun("EDGE-1", "R0", 4.0, 4.0, 0.0)}),
                      Contains("run 'R0'") && Contains("base_m must be deeper"));
}

TEST_CASE("DepthModel refuses a run whose length overflows to infinity", "[unit]") {
    // Both ends finite, the cored length is not: recovery arithmetic on it would give NaN or 0.
    const auto build = [] { return DepthModel({makeRun("EDGE-1", "R1", -kHuge, kHuge, 1.0)}); };
    CHECK_THROWS_AS(build(), std::invalid_argument);
    CHECK_THROWS_WITH(build(), Contains("run 'R1'"));
}

TEST_CASE("DepthModel with 0 % recovery and with no runs gives finite answers", "[unit]") {
    const DepthModel empty_run({makeRun("EDGE-1", "R1", 0.0, 3.0, 0.0)});
    CHECK(empty_run.recovered_m() == 0.0);
    CHECK(empty_run.recovery_fraction() == 0.0);
    // The whole run is unrecovered: a depth in it stands for anything down to the run base.
    CHECK(empty_run.locate(0.0).part == DepthPart::Unrecovered);
    const DepthRange r = empty_run.trueDepthRange(1.0);
    CHECK(finiteRange(r));
    CHECK(r.shallow_m == 1.0);
    CHECK(r.deep_m == 3.0);

    const DepthModel no_runs({});
    CHECK(no_runs.cored_m() == 0.0);
    CHECK(no_runs.recovery_fraction() == 0.0); // not 0/0
    CHECK(finiteRange(no_runs.trueDepthRange(5.0)));

    CHECK_THROWS_WITH(empty_run.locate(kNaN), Contains("depth"));
    CHECK_THROWS_AS(empty_run.trueDepthRange(kInf), std::invalid_argument);
}

TEST_CASE("classifyTexture refuses non-finite percentages by name", "[unit]") {
    for (const double bad : {kNaN, kInf, -kInf}) {
        TextureAttributes grains;
        grains.mud_supported = true;
        grains.grains_pct = bad;
        CHECK_THROWS_WITH(classifyTexture(grains), Contains("grains_pct"));
        TextureAttributes coarse;
        coarse.coarse_pct = bad;
        CHECK_THROWS_WITH(classifyTexture(coarse), Contains("coarse_pct"));
        CHECK_THROWS_AS(possibleTextures(coarse), std::invalid_argument);
    }
    TextureAttributes zero; // 0 % is a value, not "missing"
    zero.binding = Binding::None;
    zero.coarse_pct = 0.0;
    zero.mud_supported = true;
    zero.grains_pct = 0.0;
    REQUIRE(classifyTexture(zero).texture.has_value());
    CHECK(*classifyTexture(zero).texture == Texture::Mudstone);
}

TEST_CASE("summarizeHoles: 0 % recovery and runless holes are finite, bad intervals refused",
          "[unit]") {
    CoreDataset d = cleanDataset();
    SECTION("every run of a hole with 0 % recovery") {
        for (CoreRun& r : d.runs) r.recovered_m = 0.0;
        for (const HoleSummary& s : summarizeHoles(d)) {
            requireFiniteSummary(s);
            if (s.hole == "VEY-1") CHECK(s.recovery_pct == 0.0);
        }
    }
    SECTION("a hole without runs has recovery 0, not 0/0") {
        d.runs.clear();
        for (const HoleSummary& s : summarizeHoles(d)) {
            requireFiniteSummary(s);
            CHECK(s.recovery_pct == 0.0);
        }
    }
    SECTION("a zero-thickness interval is refused with its row") {
        d.intervals[1].base_m = d.intervals[1].top_m;
        CHECK_THROWS_WITH(summarizeHoles(d), Contains("intervals.csv data row 2") &&
                                                 Contains("no positive finite thickness"));
    }
    SECTION("a NaN interval depth is refused with its row") {
        d.intervals[0].top_m = kNaN;
        CHECK_THROWS_WITH(summarizeHoles(d), Contains("intervals.csv data row 1"));
    }
    SECTION("an interval whose thickness overflows is refused") {
        d.intervals[3].top_m = -kHuge;
        d.intervals[3].base_m = kHuge;
        CHECK_THROWS_AS(summarizeHoles(d), std::invalid_argument);
    }
    SECTION("a NaN run depth is refused naming the hole") {
        d.runs[2].recovered_m = kNaN;
        CHECK_THROWS_WITH(summarizeHoles(d), Contains("hole VEY-1"));
    }
}

TEST_CASE("validateDataset reports zero thickness and non-finite values as errors; accepts "
          "0 % recovery",
          "[unit][validation]") {
    CoreDataset d = cleanDataset();
    SECTION("0 % recovery is valid data (nothing came up), not an error") {
        for (CoreRun& r : d.runs) r.recovered_m = 0.0;
        for (const DataIssue& i : validateDataset(d)) {
            INFO(i.problem);
            CHECK_FALSE((i.table == Table::Runs && i.severity == Severity::Error));
        }
    }
    SECTION("a zero-length run and a zero-thickness interval") {
        d.runs[2].base_m = d.runs[2].top_m;
        d.intervals[0].base_m = d.intervals[0].top_m;
        const auto issues = validateDataset(d);
        CHECK(hasErrorAt(issues, Table::Runs, 2, "base_m"));
        CHECK(hasErrorAt(issues, Table::Intervals, 0, "base_m"));
    }
    SECTION("non-finite values in every kind of depth") {
        d.runs[0].recovered_m = kInf;
        d.intervals[2].base_m = kNaN;
        d.samples[1].top_m = -kInf;
        const auto issues = validateDataset(d);
        CHECK(hasErrorAt(issues, Table::Runs, 0, "recovered_m"));
        CHECK(hasErrorAt(issues, Table::Intervals, 2, "base_m"));
        CHECK(hasErrorAt(issues, Table::Samples, 1, "top_m"));
    }
    SECTION("finite depths whose difference overflows") {
        d.runs[2].top_m = -kHuge;
        d.runs[2].base_m = kHuge;
        const auto issues = validateDataset(d);
        CHECK(hasErrors(issues));
        // Whatever it reports, summarizeHoles must not sum it into a NaN or infinity.
        bool refused = false;
        try {
            for (const HoleSummary& s : summarizeHoles(d)) requireFiniteSummary(s);
        } catch (const std::invalid_argument&) {
            refused = true;
        }
        CHECK(refused);
    }
}
