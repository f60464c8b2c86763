// The panel columns' data tracks filled from a project: taxon lanes, zones, dates and the age
// model, each compared with what the engine itself reports for the same data.
#include "cli/panel_source.hpp"
#include "cli/panel_tracks.hpp"

#include "demo_data.hpp"

#include "atollog/engine/biostrat_run.hpp"
#include "atollog/engine/date_ages.hpp"

#include <catch2/catch.hpp>

#include <algorithm>

using namespace atollog;
using namespace atollog::demo;

namespace {

/// One invented hole, four samples, one taxon found in place twice (once "rare", once without
/// abundance), once reworked and once caved.
CoreDataset tinyDataset() {
    CoreDataset d;
    Hole h;
    h.hole = "MIRO-1";
    d.holes.push_back(h);
    d.runs.push_back({"MIRO-1", "R1", 0.0, 10.0, 10.0, {}});
    d.intervals.push_back({});
    d.intervals.back().hole = "MIRO-1";
    d.intervals.back().top_m = 0.0;
    d.intervals.back().base_m = 10.0;
    for (const auto& [id, top] : std::vector<std::pair<std::string, double>>{
             {"M-1", 1.0}, {"M-2", 3.5}, {"M-3", 6.0}, {"M-4", 8.5}})
        d.samples.push_back({"MIRO-1", id, top, top, "", {}});
    d.taxa.push_back({"TIRA-VEL", "Tiravella velata", TaxonGroup::BenthicForam, {}});
    d.occurrences.push_back({"M-1", "TIRA-VEL", std::nullopt, OccurrenceStatus::InPlace, {}});
    d.occurrences.push_back({"M-2", "TIRA-VEL", std::nullopt, OccurrenceStatus::Reworked, {}});
    d.occurrences.push_back({"M-3", "TIRA-VEL", AbundanceClass::Rare, OccurrenceStatus::InPlace, {}});
    d.occurrences.push_back({"M-4", "TIRA-VEL", std::nullopt, OccurrenceStatus::Caved, {}});
    return d;
}

} // namespace

TEST_CASE("taxon lanes hold the counted finds, reworked and caved apart", "[unit][cli][panel]") {
    const CoreDataset d = tinyDataset();
    cli::PanelSourceOptions o;
    o.taxa = {"TIRA-VEL"};
    const draw::PanelInput in = cli::panelInputFromDataset(d, o);
    REQUIRE(in.columns.size() == 1);
    REQUIRE(in.columns[0].taxa.size() == 1);
    const draw::ColumnTaxonRange& lane = in.columns[0].taxa[0];
    CHECK(lane.name == "Tiravella velata");
    CHECK(lane.group == "benthic_foram");
    CHECK(lane.finds_m == std::vector<double>{1.0, 6.0});
    CHECK(lane.reworked_m == std::vector<double>{3.5});
    CHECK(lane.caved_m == std::vector<double>{8.5});
    // Without the taxa asked for there is no lane, and no other track data.
    const draw::PanelInput plain = cli::panelInputFromDataset(d, cli::PanelSourceOptions{});
    CHECK(plain.columns[0].taxa.empty());
    CHECK(plain.columns[0].zones.empty());
    CHECK(plain.columns[0].dates.empty());
    CHECK(plain.columns[0].age_model.rows.empty());
    CHECK_FALSE(plain.columns[0].age_track_range_ma);

    SECTION("the abundance threshold decides what counts, as for the observed range") {
        o.model.biostrat.min_class = "rare";
        const draw::PanelInput t = cli::panelInputFromDataset(d, o);
        // M-1 has no abundance: nothing shows it reaches the threshold (BiostratSettings).
        CHECK(t.columns[0].taxa[0].finds_m == std::vector<double>{6.0});
        const auto ranges = observeRanges(d, o.model.biostrat.settings());
        REQUIRE(ranges.size() == 1);
        CHECK(ranges[0].highest->top_m == 6.0);
        CHECK(ranges[0].lowest->top_m == 6.0);
    }
    SECTION("an unknown taxon is named, with how to list them") {
        o.taxa = {"TIRA-VEL", "NOPE-XX"};
        CHECK_THROWS_WITH(cli::panelInputFromDataset(d, o),
                          Catch::Contains("no taxon 'NOPE-XX'") &&
                              Catch::Contains("atollog ranges"));
    }
}

TEST_CASE("zones, dates and the age model fill the demo's columns as the engine reports them",
          "[unit][cli][panel]") {
    const CoreDataset& data = demoData().data;
    cli::PanelSourceOptions o;
    o.holes = {"OSS1", "PEL1"};
    o.zones = true;
    o.zone_scheme = "VL larger benthic foraminifera";
    o.dates = true;
    o.age_model = true;
    o.ages_ma = {0.45};
    o.model.draws = 500;
    o.model.outlier_draws = 0;
    o.model.core_top_open = true;
    const draw::PanelInput in = cli::panelInputFromDataset(data, o);
    REQUIRE(in.columns.size() == 2);

    const BiostratResult bio = runBiostratigraphy(data, o.model.biostrat.settings());
    for (const draw::HoleColumnInput& c : in.columns) {
        INFO(c.hole);
        CHECK_FALSE(c.zones.empty());
        for (const draw::ColumnZone& z : c.zones) {
            CHECK(z.scheme == o.zone_scheme);
            CHECK(z.top.shallow_m <= z.base.deep_m);
            // A picked edge is the pick's plain bracket.
            for (const ZoneBoundaryPick& b : bio.zones.boundaries) {
                if (b.hole != c.hole || b.zone != z.zone || !b.picked) continue;
                const draw::ColumnZoneEdge& e = b.edge == ZoneEdge::Top ? z.top : z.base;
                CHECK_FALSE(e.open);
                CHECK(e.shallow_m == b.plain.shallow_m);
                CHECK(e.deep_m == b.plain.deep_m);
            }
        }
        // Dates: every date of the hole with an age, median and 2.5-97.5 % of its distribution.
        const auto dates = computeDateAges(data, o.model.dates.settings());
        std::size_t with_age = 0;
        for (const DateAge& d : dates)
            if (d.hole == c.hole && d.age) ++with_age;
        CHECK(c.dates.size() == with_age);
        CHECK(with_age > 0);
        for (const draw::ColumnDate& d : c.dates) {
            CHECK(d.age_low_ma <= d.age_ma);
            CHECK(d.age_ma <= d.age_high_ma);
            CHECK(d.shallow_m <= d.deep_m);
        }
        // The model: rows by depth, both rows at a surface.
        REQUIRE(c.age_model.rows.size() > 10);
        for (std::size_t i = 1; i < c.age_model.rows.size(); ++i)
            CHECK(c.age_model.rows[i - 1].depth_m <= c.age_model.rows[i].depth_m);
        // One range for both columns, spanning both.
        REQUIRE(c.age_track_range_ma);
        CHECK(*c.age_track_range_ma == *in.columns[0].age_track_range_ma);
        for (const auto& r : c.age_model.rows) {
            CHECK(r.q025_ma >= c.age_track_range_ma->first);
            CHECK(r.q975_ma <= c.age_track_range_ma->second);
        }
    }
    // The isochron comes from the same models as the track: its median depth in a column is
    // where that column's median age reaches 0.45 Ma.
    REQUIRE(in.isochrons.size() == 1);
    for (const auto& at : in.isochrons[0].at) {
        const auto& rows = in.columns[at.column].age_model.rows;
        const auto below = std::find_if(rows.begin(), rows.end(),
                                        [&](const draw::ColumnAgeRow& r) { return r.depth_m >= at.q500_m; });
        REQUIRE(below != rows.end());
        REQUIRE(below != rows.begin());
        CHECK((below - 1)->q500_ma <= 0.45 + 1e-9);
        CHECK(below->q500_ma >= 0.45 - 1e-9);
    }

    o.zone_scheme = "VX nothing";
    CHECK_THROWS_WITH(cli::panelInputFromDataset(data, o),
                      Catch::Contains("no zonation scheme 'VX nothing'") &&
                          Catch::Contains("VN calcareous nannofossils"));
}
