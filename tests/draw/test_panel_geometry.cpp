// Correlation panel geometry: depth to paper y at 1:500, column positions and the gap, tie and
// isochron ends at the given depths, elevation and flattening shifts, the window.
#include "display_list_queries.hpp"
#include "draw/panel_layout.hpp"
#include "sample_panel.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::onlyItem;
using atollog::draw::test::samplePanel;
using atollog::draw::test::samplePanelView;

namespace {

/// The one slanted line (a join between columns, not an edge bar) of a link starting at x.
const Line &joinFrom(const DisplayList &list, ItemRole role, const std::string &key, double x_mm) {
    const Line *found = nullptr;
    for (const Line *l : itemsOf<Line>(list, role)) {
        if (l->tag.key == key && l->from.x_mm != l->to.x_mm &&
            std::min(l->from.x_mm, l->to.x_mm) == Approx(x_mm).margin(1e-9)) {
            REQUIRE(found == nullptr);
            found = l;
        }
    }
    REQUIRE(found != nullptr);
    return *found;
}

/// The y of a line's end at x.
double yAt(const Line &l, double x_mm) {
    return std::abs(l.from.x_mm - x_mm) < 1e-9 ? l.from.y_mm : l.to.y_mm;
}

} // namespace

TEST_CASE("Panel depth maps to paper at 1:500 (1 m on 2 mm)", "[panel]") {
    PanelGeometry g;
    const DisplayList list = layoutPanel(samplePanel(), samplePanelView(), &g);
    // 1:500 puts 1000 mm of core on 2 mm of paper.
    CHECK(g.mm_per_axis_unit == Approx(2.0).epsilon(1e-12));
    // MRV-L1's 11.0-17.5 m grainstone: 6.5 m -> 13 mm, its top 11 m -> 22 mm below the collar.
    const Rect &box = onlyItem<Rect>(list, ItemRole::LithologyInterval, "11.00-17.50");
    CHECK(box.box.height_mm == Approx(13.0).margin(1e-9));
    CHECK(box.box.top_mm - panelY_mm(g, 0, 0.0) == Approx(22.0).margin(1e-9));
    CHECK(panelDepth_m(g, 0, box.box.top_mm) == Approx(11.0).margin(1e-9));
    // On a depth axis every collar sits at one y.
    CHECK(panelY_mm(g, 1, 0.0) == Approx(panelY_mm(g, 2, 0.0)).margin(1e-9));
    CHECK_THROWS_AS(panelY_mm(g, 3, 0.0), std::out_of_range);

    // The shared axis labels its ticks at the same y: "20" sits at 20 m below the collars.
    const Text &label = onlyItem<Text>(list, ItemRole::PanelAxisLabel, "20");
    CHECK(label.anchor_mm.y_mm == Approx(panelY_mm(g, 0, 20.0)).margin(1e-9));
}

TEST_CASE("Panel columns stand left to right with the gap between their edges", "[panel]") {
    PanelView view = samplePanelView();
    for (const double gap : {25.0, 40.0}) {
        view.column_gap_mm = gap;
        PanelGeometry g;
        const DisplayList list = layoutPanel(samplePanel(), view, &g);
        REQUIRE(g.column_boxes.size() == 3);
        for (std::size_t c = 0; c + 1 < 3; ++c) {
            CHECK(g.column_boxes[c + 1].left_mm - g.column_boxes[c].right_mm() ==
                  Approx(gap).margin(1e-9));
        }
        // Every lithology box lies inside its column's box; the axis lies left of column 0.
        const Rect &deep = onlyItem<Rect>(list, ItemRole::LithologyInterval, "50.50-62.00");
        CHECK(deep.box.left_mm >= g.column_boxes[2].left_mm);
        CHECK(deep.box.right_mm() <= g.column_boxes[2].right_mm());
        const Line &axis = onlyItem<Line>(list, ItemRole::PanelAxis, "axis");
        CHECK(axis.from.x_mm < g.column_boxes[0].left_mm);
    }
}

TEST_CASE("Tie lines end at the picked levels on the lithology track edges", "[panel]") {
    PanelGeometry g;
    const DisplayList list = layoutPanel(samplePanel(), samplePanelView(), &g);
    const std::string top = "top Maruvaiella alta";
    // Levels 10.2 m (MRV-L1), 8.0 m (MRV-F2), 11.5 m (MRV-R3).
    const Line &first = joinFrom(list, ItemRole::TieLine, top, g.link_out_mm[0]);
    CHECK(yAt(first, g.link_out_mm[0]) == Approx(panelY_mm(g, 0, 10.2)).margin(1e-9));
    CHECK(yAt(first, g.lithology_left_mm[1]) == Approx(panelY_mm(g, 1, 8.0)).margin(1e-9));
    CHECK(first.stroke.dash == DashStyle::Solid);
    const Line &second = joinFrom(list, ItemRole::TieLine, top, g.link_out_mm[1]);
    CHECK(yAt(second, g.lithology_left_mm[2]) == Approx(panelY_mm(g, 2, 11.5)).margin(1e-9));

    // The band joins the brackets 9.6-10.9 m (L1) and 7.4-8.6 m (F2).
    const auto bands = itemsOf<Polygon>(list, ItemRole::TieBand);
    const auto band = std::find_if(bands.begin(), bands.end(), [&](const Polygon *p) {
        return p->tag.key == top && p->points[0].x_mm == g.link_out_mm[0];
    });
    REQUIRE(band != bands.end());
    const std::vector<PointMm> &pts = (*band)->points;
    REQUIRE(pts.size() == 4);
    CHECK(pts[0].y_mm == Approx(panelY_mm(g, 0, 9.6)).margin(1e-9));
    CHECK(pts[1].y_mm == Approx(panelY_mm(g, 1, 7.4)).margin(1e-9));
    CHECK(pts[2].y_mm == Approx(panelY_mm(g, 1, 8.6)).margin(1e-9));
    CHECK(pts[3].y_mm == Approx(panelY_mm(g, 0, 10.9)).margin(1e-9));

    SECTION("a tie missing from the middle hole skips it with a dashed line") {
        const Line &skip =
            joinFrom(list, ItemRole::TieLine, "base Tavoripora rosea", g.link_out_mm[0]);
        CHECK(skip.stroke.dash == DashStyle::Dashed);
        CHECK(std::max(skip.from.x_mm, skip.to.x_mm) == Approx(g.lithology_left_mm[2]));
        CHECK(yAt(skip, g.lithology_left_mm[2]) == Approx(panelY_mm(g, 2, 31.0)).margin(1e-9));
    }
    SECTION("isochrons join their medians, dotted, and are told apart from ties") {
        const Line &iso = joinFrom(list, ItemRole::Isochron, "0.400 Ma", g.link_out_mm[1]);
        CHECK(yAt(iso, g.link_out_mm[1]) == Approx(panelY_mm(g, 1, 39.2)).margin(1e-9));
        CHECK(yAt(iso, g.lithology_left_mm[2]) == Approx(panelY_mm(g, 2, 44.6)).margin(1e-9));
        CHECK(iso.stroke.dash == DashStyle::Dotted);
        CHECK(iso.stroke.colour != first.stroke.colour);
        CHECK(iso.stroke.width_mm != first.stroke.width_mm);
    }
}

TEST_CASE("Elevation axis shifts each column up by its collar elevation", "[panel]") {
    PanelView view = samplePanelView();
    PanelGeometry depth_g, elev_g;
    const DisplayList by_depth = layoutPanel(samplePanel(), view, &depth_g);
    view.axis = PanelAxis::Elevation;
    const DisplayList by_elev = layoutPanel(samplePanel(), view, &elev_g);
    // Collars +1.4 m (L1) and +3.6 m (F2): F2's collar stands 2.2 m = 4.4 mm higher.
    CHECK(elev_g.column_offset_m[1] == Approx(-3.6));
    CHECK(panelY_mm(elev_g, 1, 0.0) - panelY_mm(elev_g, 0, 0.0) == Approx(-4.4).margin(1e-9));
    const Rect &soil = onlyItem<Rect>(by_elev, ItemRole::LithologyInterval, "0.00-0.50");
    CHECK(soil.box.top_mm == Approx(panelY_mm(elev_g, 1, 0.0)).margin(1e-9));
    // Relative to its own column 0, F2's soil moved up by (3.6 - 1.4) m * 2 mm/m.
    const Rect &soil_d = onlyItem<Rect>(by_depth, ItemRole::LithologyInterval, "0.00-0.50");
    const Rect &sand_d = onlyItem<Rect>(by_depth, ItemRole::LithologyInterval, "0.00-0.80");
    const Rect &sand_e = onlyItem<Rect>(by_elev, ItemRole::LithologyInterval, "0.00-0.80");
    CHECK((soil.box.top_mm - sand_e.box.top_mm) - (soil_d.box.top_mm - sand_d.box.top_mm) ==
          Approx(-4.4).margin(1e-9));
    // Sea level (axis 0) lies 1.4 m below L1's collar, and is labelled as a height of 0 m.
    const Line &sea = onlyItem<Line>(by_elev, ItemRole::SeaLevel, "0");
    CHECK(sea.from.y_mm == Approx(panelY_mm(elev_g, 0, 1.4)).margin(1e-9));
    const Text &zero = onlyItem<Text>(by_elev, ItemRole::PanelAxisLabel, "0");
    CHECK(zero.anchor_mm.y_mm == Approx(sea.from.y_mm).margin(1e-9));
    // Heights are labelled up-positive: 20 m below sea level reads "-20".
    const Text &minus20 = onlyItem<Text>(by_elev, ItemRole::PanelAxisLabel, "-20");
    CHECK(minus20.anchor_mm.y_mm == Approx(panelY_mm(elev_g, 0, 21.4)).margin(1e-9));
    CHECK(by_depth.withRole(ItemRole::SeaLevel).empty());
}

TEST_CASE("Flattening puts the chosen level of every column on one line", "[panel]") {
    PanelView view = samplePanelView();
    SECTION("on an isochron every column has") {
        view.flatten_on = "0.400 Ma";
        PanelGeometry g;
        const DisplayList list = layoutPanel(samplePanel(), view, &g);
        const double y0 = panelY_mm(g, 0, 34.0);
        CHECK(panelY_mm(g, 1, 39.2) == Approx(y0).margin(1e-9));
        CHECK(std::abs(panelY_mm(g, 2, 44.6) - y0) <= 1e-9);
        for (const Line *l : itemsOf<Line>(list, ItemRole::Isochron)) {
            if (l->tag.key == "0.400 Ma" && l->from.x_mm != l->to.x_mm) {
                CHECK(std::abs(l->from.y_mm - y0) <= 1e-9);
                CHECK(std::abs(l->to.y_mm - y0) <= 1e-9);
            }
        }
        CHECK(list.withRole(ItemRole::ColumnNote).empty());
        // The level is axis 0.
        CHECK(onlyItem<Text>(list, ItemRole::PanelAxisLabel, "0").anchor_mm.y_mm ==
              Approx(y0).margin(1e-9));
    }
    SECTION("on a tie one hole lacks: that hole keeps its plain place and is marked") {
        view.flatten_on = "base Tavoripora rosea";
        PanelGeometry g;
        const DisplayList list = layoutPanel(samplePanel(), view, &g);
        CHECK(std::abs(panelY_mm(g, 0, 28.5) - panelY_mm(g, 2, 31.0)) <= 1e-9);
        CHECK(g.column_offset_m[1] == 0.0);
        const Text &note = onlyItem<Text>(list, ItemRole::ColumnNote, "MRV-F2");
        CHECK(note.text == "not flattened");
        // The note stands over the hole's header, not over its log.
        CHECK(note.anchor_mm.y_mm < g.column_boxes[1].top_mm);
    }
}

TEST_CASE("A window on the axis drops the items outside it", "[panel]") {
    PanelView view = samplePanelView();
    view.window_top_m = 20.0;
    view.window_base_m = 30.0;
    PanelGeometry g;
    const DisplayList list = layoutPanel(samplePanel(), view, &g);
    const double top = panelY_mm(g, 0, 20.0), base = panelY_mm(g, 0, 30.0);
    const auto boxes = itemsOf<Rect>(list, ItemRole::LithologyInterval);
    REQUIRE(!boxes.empty());
    for (const Rect *r : boxes) {
        CHECK(r->box.top_mm >= top - 1e-9);
        CHECK(r->box.bottom_mm() <= base + 1e-9);
    }
    // The sand at 0-0.8 m and the ties and isochrons near 8-12 m and 31-49 m are gone.
    for (const Rect *r : boxes) {
        CHECK(r->tag.key != "0.00-0.80");
    }
    CHECK(itemsOf<Line>(list, ItemRole::Isochron).empty());
    for (const Line *l : itemsOf<Line>(list, ItemRole::TieLine)) {
        CHECK(l->tag.key == "base Tavoripora rosea");
    }
    // The skipping tie's band (27.2-31.8 m) is cut at the window's base.
    const Polygon &band = onlyItem<Polygon>(list, ItemRole::TieBand, "base Tavoripora rosea");
    for (const PointMm &p : band.points) {
        CHECK(p.y_mm <= base + 1e-9);
        CHECK(p.y_mm >= top - 1e-9);
    }
    // A whole layout has many more items than the window's.
    CHECK(list.size() * 2 < layoutPanel(samplePanel(), samplePanelView()).size());
}
