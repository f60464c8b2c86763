// Hole column geometry: depth to paper y at a drafting ratio, the recovered part of a run at
// its top, box width by texture, surfaces at their depth, feet labels, columns side by side.
#include "display_list_queries.hpp"
#include "draw/hole_column.hpp"
#include "sample_hole_column.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <set>
#include <utility>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleHoleColumn;

namespace {

/// A hole with one 1 m interval per texture class (or rock), top to bottom in the given order.
HoleColumnInput ladder(const std::vector<std::pair<RockKind, TextureClass>> &steps) {
    HoleColumnInput in;
    in.hole = "LADDER";
    in.drilled_base_m = static_cast<double>(steps.size());
    for (std::size_t i = 0; i < steps.size(); ++i) {
        in.intervals.push_back({static_cast<double>(i), static_cast<double>(i + 1), steps[i].first,
                                steps[i].second, std::nullopt});
    }
    return in;
}

double boxWidth(const DisplayList &list, double top_m) {
    for (const Rect *r : itemsOf<Rect>(list, ItemRole::LithologyInterval)) {
        if (r->tag.key.rfind(std::to_string(static_cast<int>(top_m)) + ".00-", 0) == 0) {
            return r->box.width_mm;
        }
    }
    FAIL("no interval box at " << top_m << " m");
    return 0.0;
}

} // namespace

TEST_CASE("Column depth maps to paper at the drafting ratio", "[draw][column]") {
    const HoleColumnInput in = sampleHoleColumn();
    HoleColumnView view;
    view.scale_ratio = 200.0;
    const DisplayList list = layoutHoleColumn(in, view);
    const DepthScale scale = holeColumnDepthScale(in, view);
    // A drafting ratio 1:200 puts 1000 mm of core on 5 mm of paper.
    CHECK(scale.mm_per_m() == Approx(1000.0 / 200.0));

    // The 38-43 m floatstone box spans 5 m, i.e. 25 mm at 1:200, and starts 38 m * 5 mm/m
    // below the collar's y.
    const Rect &box = onlyItem<Rect>(list, ItemRole::LithologyInterval, "38.00-43.00");
    CHECK(box.box.height_mm == Approx(25.0).margin(1e-9));
    CHECK(box.box.top_mm - scale.y_mm(0.0) == Approx(38.0 * 5.0).margin(1e-9));

    SECTION("at 1:500 the same box is 10 mm high") {
        view.scale_ratio = 500.0;
        const DisplayList at500 = layoutHoleColumn(in, view);
        CHECK(onlyItem<Rect>(at500, ItemRole::LithologyInterval, "38.00-43.00").box.height_mm ==
              Approx(5.0 * 1000.0 / 500.0).margin(1e-9));
    }
}

TEST_CASE("A run with 60 % recovery draws recovered core on top, then the gap", "[draw][column]") {
    // Recovered core is placed at the top of its run (ocean-drilling convention; DEVELOPERS.md,
    // depth model). Run R5 is cored 12-15 m and brought back 1.8 m: 60 %.
    const HoleColumnInput in = sampleHoleColumn();
    const ColumnRun &r5 = in.runs[4];
    REQUIRE(r5.id == "R5");
    REQUIRE(r5.recovered_m / (r5.base_m - r5.top_m) == Approx(0.60));
    const DisplayList list = layoutHoleColumn(in);
    const DepthScale scale = holeColumnDepthScale(in);

    const Rect &rec = onlyItem<Rect>(list, ItemRole::RecoveryRun, "R5 recovered");
    const Rect &gap = onlyItem<Rect>(list, ItemRole::RecoveryRun, "R5 unrecovered");
    CHECK(rec.box.top_mm == Approx(scale.y_mm(12.0)));
    CHECK(rec.box.bottom_mm() == Approx(scale.y_mm(12.0 + 1.8)));
    CHECK(gap.box.top_mm == Approx(scale.y_mm(13.8)));
    CHECK(gap.box.bottom_mm() == Approx(scale.y_mm(15.0)));
    // 1.8 m and 1.2 m at 5 mm/m.
    CHECK(rec.box.height_mm == Approx(9.0));
    CHECK(gap.box.height_mm == Approx(6.0));
    // Recovered dark, unrecovered white: they must differ, and only the gap is outlined.
    REQUIRE(rec.fill.has_value());
    REQUIRE(gap.fill.has_value());
    CHECK_FALSE(*rec.fill == *gap.fill);
    CHECK(gap.stroke.has_value());

    SECTION("full and empty runs draw one box each") {
        HoleColumnInput two = in;
        two.runs = {{"full", 0.0, 3.0, 3.0}, {"empty", 3.0, 6.0, 0.0}};
        const DisplayList l2 = layoutHoleColumn(two);
        CHECK(itemsOf<Rect>(l2, ItemRole::RecoveryRun).size() == 2);
        onlyItem<Rect>(l2, ItemRole::RecoveryRun, "full recovered");
        onlyItem<Rect>(l2, ItemRole::RecoveryRun, "empty unrecovered");
    }
}

TEST_CASE("Texture class sets the box width, finer textures narrower", "[draw][column]") {
    // Common practice on graphic logs of carbonates: the profile widens with the Dunham (1962)
    // / Embry & Klovan (1971) texture sequence mudstone < wackestone < packstone < grainstone
    // < floatstone/rudstone < boundstone; siliciclastics by grain size clay < sand < gravel;
    // igneous rock full width.
    using R = RockKind;
    using T = TextureClass;
    const DisplayList list = layoutHoleColumn(ladder({
        {R::Limestone, T::Mudstone},    // 0
        {R::Limestone, T::Wackestone},  // 1
        {R::Limestone, T::Packstone},   // 2
        {R::Limestone, T::Grainstone},  // 3
        {R::Limestone, T::Floatstone},  // 4
        {R::Limestone, T::Rudstone},    // 5
        {R::Limestone, T::Boundstone},  // 6
        {R::Limestone, T::Framestone},  // 7
        {R::Dolostone, T::Bindstone},   // 8
        {R::Limestone, T::Bafflestone}, // 9
        {R::Clay, T::None},             // 10
        {R::Sand, T::None},             // 11
        {R::Gravel, T::None},           // 12
        {R::Basalt, T::None},           // 13
        {R::Dolostone, T::Grainstone},  // 14
    }));
    const auto w = [&](int top) { return boxWidth(list, top); };
    CHECK(w(0) < w(1));
    CHECK(w(1) < w(2));
    CHECK(w(2) < w(3));
    CHECK(w(3) < w(4));
    CHECK(w(4) == Approx(w(5))); // floatstone and rudstone: both > 10 % coarse components
    CHECK(w(5) < w(6));
    CHECK(w(6) == Approx(w(7))); // the organically bound textures share one width
    CHECK(w(6) == Approx(w(8)));
    CHECK(w(6) == Approx(w(9)));
    CHECK(w(10) < w(11));
    CHECK(w(11) < w(12));
    CHECK(w(14) == Approx(w(3))); // dolostone keeps its texture's width
    // Basalt fills the lithology track.
    const HoleColumnTrackPositions x = holeColumnTrackPositions(HoleColumnInput{}, HoleColumnStyle{}, 10.0);
    CHECK(w(13) == Approx(x.lithology_right_mm - x.lithology_left_mm));
    CHECK(w(12) < w(13));
    // Every box starts at the track's left edge, so the right edge is the texture profile.
    for (const Rect *r : itemsOf<Rect>(list, ItemRole::LithologyInterval)) {
        CHECK(r->box.left_mm == Approx(x.lithology_left_mm));
    }
}

TEST_CASE("Surfaces land at their depth, each with its own dash and weight", "[draw][column]") {
    const HoleColumnInput in = sampleHoleColumn();
    const DisplayList list = layoutHoleColumn(in);
    const DepthScale scale = holeColumnDepthScale(in);
    const auto surfaces = itemsOf<Polyline>(list, ItemRole::Surface);

    // One line per interval with a base surface, at that interval's base.
    std::size_t expected = 0;
    for (const ColumnInterval &iv : in.intervals) {
        if (!iv.base_surface) {
            continue;
        }
        ++expected;
        const double y = scale.y_mm(iv.base_m);
        const bool found = std::any_of(surfaces.begin(), surfaces.end(), [&](const Polyline *p) {
            double lo = p->points.front().y_mm, hi = lo;
            for (const PointMm &pt : p->points) {
                lo = std::min(lo, pt.y_mm);
                hi = std::max(hi, pt.y_mm);
            }
            // Straight lines lie on y; the wavy erosion line swings at most 0.5 mm about it.
            return lo >= y - 0.5 - 1e-9 && hi <= y + 0.5 + 1e-9 &&
                   (hi + lo) / 2 == Approx(y).margin(0.05);
        });
        CAPTURE(iv.base_m);
        CHECK(found);
    }
    CHECK(surfaces.size() == expected);

    // The four kinds differ pairwise by dash or weight (never by colour alone), and erosion is
    // also wavy: each kind must be told apart in greyscale.
    std::set<std::pair<DashStyle, double>> looks;
    std::set<std::string> kinds;
    for (const Polyline *p : surfaces) {
        if (kinds.insert(p->tag.key).second) {
            looks.insert({p->stroke.dash, p->stroke.width_mm});
        }
    }
    CHECK(kinds == std::set<std::string>{"exposure", "hardground", "erosion", "basement_contact"});
    CHECK(looks.size() == 4);
    const Polyline &erosion = onlyItem<Polyline>(list, ItemRole::Surface, "erosion");
    CHECK(erosion.points.size() > 10);
    const Polyline &contact = onlyItem<Polyline>(list, ItemRole::Surface, "basement_contact");
    CHECK(contact.points.size() == 2);
    // The contact is the heaviest line (it ends the carbonate cap).
    for (const Polyline *p : surfaces) {
        CHECK(p->stroke.width_mm <= contact.stroke.width_mm);
    }
}

TEST_CASE("Feet labels stand at depth / 0.3048", "[draw][column]") {
    // 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959).
    const HoleColumnInput in = sampleHoleColumn();
    HoleColumnView view;
    view.depth_unit = DepthUnit::Feet;
    const DisplayList list = layoutHoleColumn(in, view);
    const DepthScale scale = holeColumnDepthScale(in, view);
    // 62.4 m = 204.7 ft; at 5 mm/m a foot is 1.524 mm, so labels come every 10 ft (15.2 mm).
    const Text &label100 = onlyItem<Text>(list, ItemRole::DepthLabel, "100");
    CHECK(label100.anchor_mm.y_mm == Approx(scale.y_mm(30.48)));
    const Text &label200 = onlyItem<Text>(list, ItemRole::DepthLabel, "200");
    CHECK(label200.anchor_mm.y_mm == Approx(scale.y_mm(60.96)));
    CHECK(itemsOf<Text>(list, ItemRole::DepthLabel).size() == 21 + 1); // 0..200 ft + heading
    onlyItem<Text>(list, ItemRole::DepthLabel, "heading");
    bool heading_in_feet = false;
    for (const Text *t : itemsOf<Text>(list, ItemRole::DepthLabel)) {
        heading_in_feet = heading_in_feet || t->text == "depth (ft)";
    }
    CHECK(heading_in_feet);
}

TEST_CASE("Columns laid out with one scale stand side by side", "[draw][column]") {
    const HoleColumnInput a = sampleHoleColumn();
    HoleColumnInput b = sampleHoleColumn();
    b.hole = "TAV-3";
    const HoleColumnView view;
    const DepthScale scale = DepthScale::fromRatio(0.0, 200.0, 40.0);
    DisplayList list;
    const HoleColumnPlacement first = appendHoleColumn(list, a, scale, 10.0, view);
    const double second_left = first.box.right_mm() + 5.0;
    const HoleColumnPlacement second = appendHoleColumn(list, b, scale, second_left, view);
    CHECK(second.box.left_mm >= first.box.right_mm());
    // The same interval sits at the same y in both, shifted by the columns' offset in x.
    std::vector<const Rect *> boxes;
    for (const Rect *r : itemsOf<Rect>(list, ItemRole::LithologyInterval)) {
        if (r->tag.key == "15.20-19.50") {
            boxes.push_back(r);
        }
    }
    REQUIRE(boxes.size() == 2);
    CHECK(boxes[0]->box.top_mm == Approx(boxes[1]->box.top_mm));
    CHECK(boxes[1]->box.left_mm - boxes[0]->box.left_mm == Approx(second_left - 10.0));
    // The header ends above the window's top at the given scale.
    CHECK(first.box.top_mm ==
          Approx(scale.y_mm(0.0) - holeColumnHeaderHeight_mm(a, view)).margin(0.5));
}
