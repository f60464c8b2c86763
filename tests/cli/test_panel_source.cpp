// The correlation panel's input filled from a project's data: columns, ties and isochrons.
#include "cli/panel_source.hpp"

#include "demo_data.hpp"

#include <catch2/catch.hpp>

#include <algorithm>

using namespace atollog;
using namespace atollog::demo;

TEST_CASE("panel columns follow the chain and carry the logged core", "[unit][cli][panel]") {
    const CoreDataset& data = demoData().data;
    cli::PanelSourceOptions o;
    const draw::PanelInput in = cli::panelInputFromDataset(data, o);
    REQUIRE(in.columns.size() == data.holes.size());
    // Ordered by chain distance.
    std::vector<double> chain;
    for (const auto& c : in.columns)
        for (const Hole& h : data.holes)
            if (h.hole == c.hole) chain.push_back(h.chain_km.value_or(1e9));
    CHECK(std::is_sorted(chain.begin(), chain.end()));
    for (const auto& c : in.columns) {
        std::size_t runs = 0, intervals = 0, samples = 0;
        for (const CoreRun& r : data.runs) runs += r.hole == c.hole;
        for (const LithInterval& iv : data.intervals) intervals += iv.hole == c.hole;
        for (const Sample& s : data.samples) samples += s.hole == c.hole;
        CHECK(c.runs.size() == runs);
        CHECK(c.intervals.size() == intervals);
        CHECK(c.samples.size() == samples);
        for (const auto& r : c.runs) CHECK(r.recovered_m <= r.base_m - r.top_m); // clamped
        // The basement contact is drawn at the base of the interval above the basalt.
        CHECK(std::count_if(c.intervals.begin(), c.intervals.end(), [](const auto& iv) {
                  return iv.base_surface == draw::SurfaceKind::BasementContact;
              }) == 1);
    }
}

TEST_CASE("panel ties and isochrons land in the chosen columns", "[unit][cli][panel]") {
    const CoreDataset& data = demoData().data;
    cli::PanelSourceOptions o;
    o.holes = {"PEL1", "OSS1"};
    o.events = {"B CONV-MIN"};
    o.ages_ma = {0.45};
    o.model.draws = 500;
    o.model.outlier_draws = 0;
    o.model.core_top_open = true;
    const draw::PanelInput in = cli::panelInputFromDataset(data, o);
    REQUIRE(in.columns.size() == 2);
    CHECK(in.columns[0].hole == "PEL1");
    REQUIRE(in.ties.size() == 1);
    for (const auto& at : in.ties[0].at) {
        CHECK(at.column < 2);
        CHECK(at.shallow_m <= at.level_m);
        CHECK(at.level_m <= at.deep_m);
    }
    REQUIRE(in.isochrons.size() == 1);
    CHECK(in.isochrons[0].label == "0.45 Ma");
    for (const auto& at : in.isochrons[0].at) {
        CHECK(at.q025_m <= at.q500_m);
        CHECK(at.q500_m <= at.q975_m);
    }
    o.holes = {"PEL1", "NOPE"};
    CHECK_THROWS_WITH(cli::panelInputFromDataset(data, o), Catch::Contains("no hole 'NOPE'"));
    o.holes = {"PEL1", "PEL1"};
    CHECK_THROWS_WITH(cli::panelInputFromDataset(data, o), Catch::Contains("listed twice"));
}
