// The correlation panel on an age axis: each column drawn through its hole's age model (the
// medians), so equal ages stand level across holes; a logged surface's time opens as a gap; holes
// without a model keep their header with a note; flattening is refused.
#include "display_list_queries.hpp"
#include "draw/display_list_export.hpp"
#include "draw/panel_layout.hpp"
#include "sample_panel.hpp"

#include <catch2/catch.hpp>

#include <filesystem>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::onlyItem;
using atollog::draw::test::samplePanel;
using atollog::draw::test::samplePanelView;

namespace {

/// Median ages (Ma) growing linearly with depth at `ma_per_m`, with a step of `gap_ma` at a
/// surface depth: the model's two rows there, above then below.
ColumnAgeModel linearModel(double top_m, double base_m, double ma_per_m, double surface_m,
                           double gap_ma) {
    ColumnAgeModel m;
    const auto add = [&m](double d, double a) { m.rows.push_back({d, a - 0.01, a, a + 0.01}); };
    add(top_m, top_m * ma_per_m);
    add(surface_m, surface_m * ma_per_m);
    add(surface_m, surface_m * ma_per_m + gap_ma);
    add(base_m, base_m * ma_per_m + gap_ma);
    return m;
}

PanelInput ageSample() {
    PanelInput in = samplePanel();
    // MRV-L1: 0.01 Ma/m, its exposure surface at 11 m stands for 0.05 Myr; MRV-R3: 0.005 Ma/m
    // with no gap (a surface step of zero); MRV-F2 has no model.
    in.columns[0].age_model = linearModel(0.0, 38.5, 0.01, 11.0, 0.05);
    in.columns[2].age_model = linearModel(0.0, 50.5, 0.005, 12.5, 0.0);
    return in;
}

PanelView ageView() {
    PanelView v = samplePanelView();
    v.axis = PanelAxis::Age;
    return v;
}

} // namespace

TEST_CASE("On an age axis equal ages stand level across holes", "[draw][panel][geometry]") {
    PanelGeometry g;
    layoutPanel(ageSample(), ageView(), &g);
    // 0.08 Ma: 8 m in MRV-L1 (above its gap), 16 m in MRV-R3.
    CHECK(panelY_mm(g, 0, 8.0) == Approx(panelY_mm(g, 2, 16.0)).margin(1e-9));
    // 0.20 Ma: 15 m in MRV-L1 (0.15 + 0.05 gap), 40 m in MRV-R3.
    CHECK(panelY_mm(g, 0, 15.0) == Approx(panelY_mm(g, 2, 40.0)).margin(1e-9));
    // The axis spans the models: 0 Ma to MRV-L1's base age 0.385 + 0.05.
    CHECK(g.axis_top_m == Approx(0.0));
    CHECK(g.axis_base_m == Approx(0.435));
    // Automatic paper per Myr: the deepest hole (62 m) at 1:500 would stand 124 mm tall.
    CHECK(g.mm_per_axis_unit == Approx(124.0 / 0.435));
    // y follows the axis: 0.2 Ma below the top.
    CHECK(panelY_mm(g, 2, 40.0) == Approx(g.axis_origin_y_mm + 0.2 * g.mm_per_axis_unit));
    // And back: depth from y through the model.
    CHECK(panelDepth_m(g, 2, panelY_mm(g, 2, 33.3)) == Approx(33.3));
    // The hole without a model has no place on the axis.
    REQUIRE(g.column_scales.size() == 3);
    CHECK_FALSE(g.column_scales[1].has_value());
    CHECK_THROWS_AS(panelY_mm(g, 1, 5.0), std::out_of_range);
}

TEST_CASE("On an age axis a surface's time opens as a gap", "[draw][panel][geometry]") {
    PanelGeometry g;
    const DisplayList list = layoutPanel(ageSample(), ageView(), &g);
    // MRV-L1's exposure surface at 11 m: 0.11 Ma above, 0.16 Ma below.
    const Rect &gap = onlyItem<Rect>(list, ItemRole::Hiatus, "MRV-L1 11.00");
    CHECK(gap.box.top_mm == Approx(g.axis_origin_y_mm + 0.11 * g.mm_per_axis_unit));
    CHECK(gap.box.bottom_mm() == Approx(g.axis_origin_y_mm + 0.16 * g.mm_per_axis_unit));
    // The unit resting on the surface ends at the gap's top, the one below starts at its base.
    const Rect &above = onlyItem<Rect>(list, ItemRole::LithologyInterval, "6.50-11.00");
    CHECK(above.box.bottom_mm() == Approx(gap.box.top_mm));
    bool below_found = false;
    for (const Rect *r : itemsOf<Rect>(list, ItemRole::LithologyInterval)) {
        if (r->tag.key == "11.00-17.50") {
            below_found = true;
            CHECK(r->box.top_mm == Approx(gap.box.bottom_mm()));
        }
    }
    CHECK(below_found);
    // A surface with no time (MRV-R3's, a zero step) opens no gap.
    for (const Rect *r : itemsOf<Rect>(list, ItemRole::Hiatus)) {
        CHECK(r->tag.key.rfind("MRV-R3", 0) != 0);
    }
}

TEST_CASE("On an age axis a hole without a model is noted and ties pass it",
          "[draw][panel][structure]") {
    const DisplayList list = layoutPanel(ageSample(), ageView());
    const Text &note = onlyItem<Text>(list, ItemRole::ColumnNote, "MRV-F2");
    CHECK(note.text == "no age model");
    // No lithology of MRV-F2 is drawn (its 0.5 m soil is the only 0.00-0.50 interval).
    for (const Rect *r : itemsOf<Rect>(list, ItemRole::LithologyInterval)) {
        CHECK(r->tag.key != "0.00-0.50");
    }
    // The first tie (in all three holes) joins MRV-L1 straight to MRV-R3.
    for (const Line *l : itemsOf<Line>(list, ItemRole::TieLine)) {
        CHECK(l->tag.key.size() > 0);
    }
    const auto axis_title = onlyItem<Text>(list, ItemRole::PanelAxis, "title");
    CHECK(axis_title.text == "age from the age models (Ma)");
}

TEST_CASE("An age axis refuses flattening and models that get younger downhole",
          "[draw][panel][bad-input]") {
    PanelView v = ageView();
    v.flatten_on = "0.125 Ma";
    CHECK_THROWS_WITH(layoutPanel(ageSample(), v), Catch::Contains("cannot be flattened"));

    PanelInput in = ageSample();
    in.columns[0].age_model.rows[1].q500_ma = -1.0;
    in.columns[0].age_model.rows[1].q025_ma = -1.1;
    CHECK_THROWS_WITH(layoutPanel(in, ageView()),
                      Catch::Contains("MRV-L1") && Catch::Contains("never get younger downhole"));

    PanelInput none = samplePanel();
    CHECK_THROWS_WITH(layoutPanel(none, ageView()), Catch::Contains("no hole has an age model"));
}

// Run by hand to look at it: draw_tests "[.look]" also writes $TMPDIR/panel_age.png.
TEST_CASE("Look: the sample panel on an age axis", "[.look]") {
    PanelInput in = ageSample();
    PanelView v = ageView();
    exportPng(layoutPanel(in, v), std::filesystem::temp_directory_path() / "panel_age.png", 200.0);
}

TEST_CASE("An age axis states its scale as paper per Myr", "[draw][panel][structure]") {
    PanelView v = ageView();
    v.age_mm_per_myr = 250.0;
    PanelGeometry g;
    const DisplayList list = layoutPanel(ageSample(), v, &g);
    CHECK(g.mm_per_axis_unit == 250.0);
    const Text &scale = onlyItem<Text>(list, ItemRole::Subtitle, "scale");
    CHECK(scale.text.rfind("vertical scale 250 mm per Myr", 0) == 0);
    v.age_mm_per_myr = -1.0;
    CHECK_THROWS_WITH(layoutPanel(ageSample(), v), Catch::Contains("mm per Myr"));
}
