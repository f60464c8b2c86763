// The hole column's data tracks: taxon lanes, zone lanes, the age track (model and dates). Marks
// must land where the column's DepthScale puts their depths (linear or warped) and where the
// track's age scale puts their ages; hidden tracks and tracks without data take no room.
#include "display_list_queries.hpp"
#include "draw/hole_column.hpp"
#include "draw/hole_column_ages.hpp"
#include "draw/hole_column_taxa.hpp"
#include "draw/hole_column_track_symbols.hpp"
#include "draw/hole_column_zones.hpp"
#include "sample_column_tracks.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <set>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleColumnWithTracks;
using atollog::draw::test::sampleHoleColumn;

namespace {

constexpr double kLeft_mm = 10.0;

/// One column on a plain 1:200 scale whose depth 0 lies at y = 50 mm.
struct Laid {
    DisplayList list;
    DepthScale scale{0.0, 5.0, 50.0};
    HoleColumnTrackPositions x;
    HoleColumnPlacement placed;
};

Laid lay(const HoleColumnInput &in, const HoleColumnView &view = {},
         std::optional<DepthScale> scale = std::nullopt) {
    Laid out;
    if (scale) {
        out.scale = *scale;
    }
    out.x = holeColumnTrackPositions(in, HoleColumnStyle{}, kLeft_mm);
    out.placed = appendHoleColumn(out.list, in, out.scale, kLeft_mm, view);
    return out;
}

std::set<std::string> keysOf(const DisplayList &list, ItemRole role) {
    std::set<std::string> keys;
    for (const DisplayItem *item : list.withRole(role)) {
        keys.insert(itemTag(*item).key);
    }
    return keys;
}

} // namespace

TEST_CASE("A find's mark lies at the scale's y of its depth, in its taxon's lane",
          "[draw][column][tracks]") {
    const HoleColumnInput in = sampleColumnWithTracks();
    const Laid l = lay(in);
    const HoleColumnStyle s;
    std::size_t finds = 0;
    for (const Marker *m : itemsOf<Marker>(l.list, ItemRole::ColumnTaxonFind)) {
        const std::size_t lane = m->tag.key == "TAVK-MIN" ? 0 : 1;
        const double centre = taxonLaneCentre_mm(l.x, s, lane);
        CHECK(m->centre_mm.x_mm == Approx(centre + track_symbols::kBarOffset_mm));
        CHECK(m->centre_mm.x_mm > l.x.taxa_left_mm + lane * s.taxon_lane_width_mm);
        CHECK(m->centre_mm.x_mm < l.x.taxa_left_mm + (lane + 1) * s.taxon_lane_width_mm);
        const auto &depths = in.taxa[lane].finds_m;
        CHECK(std::any_of(depths.begin(), depths.end(), [&](double d) {
            return std::abs(l.scale.y_mm(d) - m->centre_mm.y_mm) < 1e-9;
        }));
        ++finds;
    }
    CHECK(finds == 7);
    // The bar runs from the shallowest to the deepest counted find; excluded finds stay out.
    const Rect &bar = onlyItem<Rect>(l.list, ItemRole::ColumnTaxonBar, "TAVK-MIN");
    CHECK(bar.box.top_mm == Approx(l.scale.y_mm(3.2)));
    CHECK(bar.box.bottom_mm() == Approx(l.scale.y_mm(12.2)));
    const auto excluded = itemsOf<Marker>(l.list, ItemRole::ColumnTaxonExcluded);
    REQUIRE(excluded.size() == 2);
    for (const Marker *m : excluded) {
        CHECK(m->hollow);
        CHECK(m->centre_mm.x_mm < bar.box.left_mm); // beside the bar, never on it
    }
    CHECK(excluded[0]->centre_mm.y_mm == Approx(l.scale.y_mm(1.2))); // reworked: diamond
    CHECK(excluded[0]->shape == MarkerShape::Diamond);
    CHECK(excluded[1]->shape == MarkerShape::Square); // caved
}

TEST_CASE("The age curve passes through every row at the row's depth and ages",
          "[draw][column][tracks]") {
    const HoleColumnInput in = sampleColumnWithTracks();
    const Laid l = lay(in);
    const auto age = ageTrackScale(in, l.x);
    REQUIRE(age);
    // Own range: the youngest 2.5 % age (0) to the oldest 97.5 % age (0.26 Ma), inside the frame.
    CHECK(age->young_ma == Approx(0.0));
    CHECK(age->old_ma == Approx(0.26));
    CHECK(age->x_mm(0.0) == Approx(l.x.ages_left_mm + track_symbols::kAgeTrackInset_mm));
    CHECK(age->x_mm(0.26) == Approx(l.x.ages_right_mm - track_symbols::kAgeTrackInset_mm));

    const Polyline &median = onlyItem<Polyline>(l.list, ItemRole::ColumnAgeModel, "median");
    const auto &rows = in.age_model.rows;
    REQUIRE(median.points.size() == rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        CHECK(median.points[i].x_mm == Approx(age->x_mm(rows[i].q500_ma)));
        CHECK(median.points[i].y_mm == Approx(l.scale.y_mm(rows[i].depth_m)));
    }
    // The surface's two rows make a horizontal step of the median: same y, the older age below.
    CHECK(median.points[3].y_mm == median.points[4].y_mm);
    CHECK(median.points[4].x_mm > median.points[3].x_mm);

    const Polygon &band = onlyItem<Polygon>(l.list, ItemRole::ColumnAgeModel, "band");
    REQUIRE(band.points.size() == 2 * rows.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
        CHECK(band.points[i].x_mm == Approx(age->x_mm(rows[i].q025_ma)));
        const PointMm &back = band.points[2 * rows.size() - 1 - i];
        CHECK(back.x_mm == Approx(age->x_mm(rows[i].q975_ma)));
        CHECK(back.y_mm == Approx(l.scale.y_mm(rows[i].depth_m)));
    }
    CHECK(band.fill.a < 255); // translucent: the grid and the dates show through
}

TEST_CASE("On a warped scale the curve and marks follow the scale, not a straight line",
          "[draw][column][tracks]") {
    // A scale that squeezes 0-10 m into 10 mm and stretches 10-62.4 m over 200 mm, with a step at
    // 19.5 m (a surface on an age axis): nothing between two knots may be assumed linear in depth
    // across them.
    const DepthScale warped = DepthScale::warped(
        {{0.0, 0.0}, {10.0, 1.0}, {19.5, 2.0}, {19.5, 3.0}, {62.4, 20.0}}, 0.0, 10.0, 40.0);
    const HoleColumnInput in = sampleColumnWithTracks();
    const Laid l = lay(in, {}, warped);
    const Polyline &median = onlyItem<Polyline>(l.list, ItemRole::ColumnAgeModel, "median");
    const auto &rows = in.age_model.rows;
    for (std::size_t i = 0; i < rows.size(); ++i) {
        const double want = i == 3 ? warped.yAbove_mm(rows[i].depth_m) : warped.y_mm(rows[i].depth_m);
        CHECK(median.points[i].y_mm == Approx(want));
    }
    // The step opens a gap: the row above the surface ends where the gap begins.
    CHECK(median.points[4].y_mm - median.points[3].y_mm == Approx(10.0));
    // A find at 6.2 m sits where the warped scale puts 6.2 m (0.62 axis units: 46.2 mm), not
    // where a straight line between the curve's rows would.
    CHECK(warped.y_mm(6.2) == Approx(46.2));
    const Marker *find_6_2 = nullptr;
    for (const Marker *m : itemsOf<Marker>(l.list, ItemRole::ColumnTaxonFind)) {
        if (std::abs(m->centre_mm.y_mm - warped.y_mm(6.2)) < 1e-9) {
            find_6_2 = m;
        }
    }
    CHECK(find_6_2 != nullptr);
}

TEST_CASE("A date's bars span its age range and its depth bracket", "[draw][column][tracks]") {
    const HoleColumnInput in = sampleColumnWithTracks();
    const Laid l = lay(in);
    const auto age = ageTrackScale(in, l.x);
    REQUIRE(age);
    const ColumnDate &d = in.dates[1];
    const Marker &m = onlyItem<Marker>(l.list, ItemRole::ColumnDateMarker, d.id);
    const double y = l.scale.y_mm((d.shallow_m + d.deep_m) / 2);
    CHECK(m.centre_mm.x_mm == Approx(age->x_mm(d.age_ma)));
    CHECK(m.centre_mm.y_mm == Approx(y));
    CHECK_FALSE(m.hollow);
    bool horizontal = false, vertical = false;
    for (const Line *line : itemsOf<Line>(l.list, ItemRole::ColumnDateBar)) {
        if (line->tag.key != d.id) {
            continue;
        }
        const double x0 = std::min(line->from.x_mm, line->to.x_mm);
        const double x1 = std::max(line->from.x_mm, line->to.x_mm);
        horizontal = horizontal || (line->from.y_mm == Approx(y) && line->to.y_mm == Approx(y) &&
                                    x0 == Approx(age->x_mm(d.age_low_ma)) &&
                                    x1 == Approx(age->x_mm(d.age_high_ma)));
        vertical = vertical || (line->from.x_mm == Approx(m.centre_mm.x_mm) &&
                                line->from.y_mm == Approx(l.scale.y_mm(d.shallow_m)) &&
                                line->to.y_mm == Approx(l.scale.y_mm(d.deep_m)));
    }
    CHECK(horizontal);
    CHECK(vertical);
    // A date the model leaves out is hollow.
    CHECK(onlyItem<Marker>(l.list, ItemRole::ColumnDateMarker, "c14 TAV-2-14").hollow);
}

TEST_CASE("The age scale has two or three round ticks, the last with its unit",
          "[draw][column][tracks]") {
    HoleColumnInput in = sampleColumnWithTracks();
    const HoleColumnTrackPositions x = holeColumnTrackPositions(in, HoleColumnStyle{}, 0.0);
    // 0-0.26 Ma: steps of 0.05 would give six ticks, 0.1 gives three (1-2-5 series).
    auto age = ageTrackScale(in, x);
    REQUIRE(age);
    CHECK(age->ticks_ma == std::vector<double>{0.0, 0.1, 0.2});
    CHECK(age->tickLabel(0) == "0.0");
    CHECK(age->tickLabel(2) == "0.2 Ma");
    // A common range given by the panel wins over the column's own data.
    in.age_track_range_ma = std::pair{0.0, 1.3};
    age = ageTrackScale(in, x);
    REQUIRE(age);
    CHECK(age->ticks_ma == std::vector<double>{0.0, 0.5, 1.0});
    CHECK(age->x_mm(1.3) == Approx(x.ages_right_mm - track_symbols::kAgeTrackInset_mm));
    // The header shows the ticks as rotated labels.
    const DisplayList list = layoutHoleColumn(in);
    CHECK(keysOf(list, ItemRole::ColumnAgeScale).count("1.0 Ma") == 1);
}

TEST_CASE("A zone box spans top to base, its brackets hatched, an open edge dashed",
          "[draw][column][tracks]") {
    const HoleColumnInput in = sampleColumnWithTracks();
    const Laid l = lay(in);
    // TV1: top boundary picked in 10-12 m, base in 33-36 m; the certain body is 12-33 m.
    const Rect &tv1 = onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TV1");
    CHECK(tv1.box.top_mm == Approx(l.scale.y_mm(12.0)));
    CHECK(tv1.box.bottom_mm() == Approx(l.scale.y_mm(33.0)));
    CHECK(tv1.box.left_mm >= l.x.zones_left_mm);
    CHECK(tv1.box.right_mm() <= l.x.zones_left_mm + HoleColumnStyle{}.zone_lane_width_mm);
    // Its brackets: boxes over 10-12 and 33-36 m with hatch lines inside them.
    std::vector<RectMm> brackets;
    for (const Rect *r : itemsOf<Rect>(l.list, ItemRole::ColumnZoneBracket)) {
        if (r->tag.key == "TV1") {
            brackets.push_back(r->box);
        }
    }
    REQUIRE(brackets.size() == 2);
    CHECK(brackets[0].top_mm == Approx(l.scale.y_mm(10.0)));
    CHECK(brackets[0].bottom_mm() == Approx(l.scale.y_mm(12.0)));
    CHECK(brackets[1].top_mm == Approx(l.scale.y_mm(33.0)));
    CHECK(brackets[1].bottom_mm() == Approx(l.scale.y_mm(36.0)));
    std::size_t hatch = 0;
    for (const Line *line : itemsOf<Line>(l.list, ItemRole::ColumnZoneBracket)) {
        const RectMm &b = brackets[0];
        if (line->tag.key == "TV1" && line->from.y_mm <= b.bottom_mm() + 1e-9 &&
            line->from.y_mm >= b.top_mm - 1e-9) {
            ++hatch;
            // Inside the box and at 45 degrees.
            CHECK(std::min(line->from.x_mm, line->to.x_mm) >= b.left_mm - 1e-9);
            CHECK(std::max(line->from.x_mm, line->to.x_mm) <= b.right_mm() + 1e-9);
            CHECK(std::abs(line->to.x_mm - line->from.x_mm) ==
                  Approx(std::abs(line->to.y_mm - line->from.y_mm)));
        }
    }
    CHECK(hatch > 5);
    // Neighbours alternate tints; TV2 (above) and TV1 differ.
    CHECK(onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TV2").fill != tv1.fill);
    // TV2's top is not picked: a dashed edge at its reach, 0.6 m.
    bool dashed = false;
    for (const Line *line : itemsOf<Line>(l.list, ItemRole::ColumnZone)) {
        dashed = dashed || (line->tag.key == "TV2" && line->stroke.dash == DashStyle::Dashed &&
                            line->from.y_mm == Approx(l.scale.y_mm(0.6)));
    }
    CHECK(dashed);
    // Two schemes: two lanes, the second scheme's box in the second lane.
    const Rect &tn1 = onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TN1");
    CHECK(tn1.box.left_mm >= l.x.zones_left_mm + HoleColumnStyle{}.zone_lane_width_mm);
    CHECK(l.x.zones_right_mm - l.x.zones_left_mm ==
          Approx(2 * HoleColumnStyle{}.zone_lane_width_mm));
    // Names fit across a 6 mm lane ("TV1" at 5.5 pt).
    CHECK(onlyItem<Text>(l.list, ItemRole::ColumnZoneName, "TV1").rotation_deg == 0.0);
}

TEST_CASE("Hatch lines stay inside their box at 45 degrees", "[draw][column][tracks]") {
    const RectMm box{3.3, 7.1, 4.0, 2.5};
    const auto lines = hatchLines(box, 1.0, Stroke{}, ItemTag{});
    // Lines x + y = k, k a multiple of 1 from ceil(l + t = 10.4) = 11 to floor(r + b = 16.9) = 16.
    REQUIRE(lines.size() == 6);
    for (const Line &l : lines) {
        CHECK(l.from.x_mm + l.from.y_mm == Approx(l.to.x_mm + l.to.y_mm));
        for (const PointMm &p : {l.from, l.to}) {
            CHECK(p.x_mm >= box.left_mm - 1e-9);
            CHECK(p.x_mm <= box.right_mm() + 1e-9);
            CHECK(p.y_mm >= box.top_mm - 1e-9);
            CHECK(p.y_mm <= box.bottom_mm() + 1e-9);
        }
    }
}

TEST_CASE("Data tracks take room only when shown and given data", "[draw][column][tracks]") {
    const HoleColumnStyle s;
    const HoleColumnInput plain = sampleHoleColumn();
    const HoleColumnInput full = sampleColumnWithTracks();
    const auto xp = holeColumnTrackPositions(plain, s, 0.0);
    const auto xf = holeColumnTrackPositions(full, s, 0.0);
    CHECK(xp.right_mm == Approx(xp.samples_right_mm)); // a plain column is as wide as ever
    CHECK(xf.right_mm - xp.right_mm ==
          Approx(2 * s.taxon_lane_width_mm + 2 * s.zone_lane_width_mm + s.age_track_width_mm +
                 3 * s.track_gap_mm));
    // A plain column lists none of the new roles and the same items as without the fields.
    const DisplayList lp = layoutHoleColumn(plain);
    for (const ItemRole role : {ItemRole::ColumnTaxonName, ItemRole::ColumnZone,
                                ItemRole::ColumnAgeScale, ItemRole::ColumnAgeModel}) {
        CHECK(lp.withRole(role).empty());
    }

    HoleColumnInput hidden = full;
    hidden.tracks.taxa = false;
    hidden.tracks.zones = false;
    hidden.tracks.dates = false;
    hidden.tracks.age_model = false;
    const auto xh = holeColumnTrackPositions(hidden, s, 0.0);
    CHECK(xh.right_mm == Approx(xp.right_mm));
    const Laid l = lay(hidden);
    for (const ItemRole role :
         {ItemRole::ColumnTaxonFind, ItemRole::ColumnTaxonName, ItemRole::ColumnZone,
          ItemRole::ColumnZoneScheme, ItemRole::ColumnDateMarker, ItemRole::ColumnAgeModel,
          ItemRole::ColumnAgeScale}) {
        CHECK(l.list.withRole(role).empty());
    }

    // Dates alone keep the age track; the model alone too.
    HoleColumnInput dates_only = full;
    dates_only.tracks.age_model = false;
    const Laid d = lay(dates_only);
    CHECK(d.list.withRole(ItemRole::ColumnAgeModel).empty());
    CHECK(itemsOf<Marker>(d.list, ItemRole::ColumnDateMarker).size() == 3);
    CHECK(d.x.ages_right_mm - d.x.ages_left_mm == Approx(s.age_track_width_mm));
}

TEST_CASE("Track items carry their keys; the legend lists what is shown and only that",
          "[draw][column][tracks]") {
    const HoleColumnInput in = sampleColumnWithTracks();
    const DisplayList list = layoutHoleColumn(in);
    CHECK(keysOf(list, ItemRole::ColumnTaxonName) == std::set<std::string>{"TAVK-MIN", "RUSO-LAT"});
    CHECK(keysOf(list, ItemRole::ColumnTaxonBar) == std::set<std::string>{"TAVK-MIN", "RUSO-LAT"});
    CHECK(keysOf(list, ItemRole::ColumnZone) == std::set<std::string>{"TV1", "TV2", "TN1"});
    CHECK(keysOf(list, ItemRole::ColumnZoneScheme) ==
          std::set<std::string>{"TV forams", "TV nannos"});
    CHECK(keysOf(list, ItemRole::ColumnDateMarker) ==
          std::set<std::string>{"u-th TAV-2-03", "u-th TAV-2-11", "c14 TAV-2-14"});
    CHECK(keysOf(list, ItemRole::ColumnAgeModel) == std::set<std::string>{"median", "band"});
    // Header names: the taxon's name, rotated.
    const Text &name = onlyItem<Text>(list, ItemRole::ColumnTaxonName, "TAVK-MIN");
    CHECK(name.text == "Tavekia minor");
    CHECK(name.rotation_deg == -90.0);

    const auto texts = legendTexts(list);
    for (const char *row :
         {"Taxa", "larger benthic foram: counted finds and range", "coral: counted finds and range",
          "reworked find (not in the range)", "caved find (not in the range)", "Zones",
          "boundary lies in this bracket", "boundary not picked in the hole", "Ages",
          "age model: median, 95 % band", "date: 95 % age range, depth bracket",
          "date not used in the age model"}) {
        CHECK(texts.count(row) == 1);
    }

    SECTION("only what is shown") {
        HoleColumnInput less = in;
        less.taxa.resize(1);
        less.taxa[0].reworked_m.clear();
        less.tracks.zones = false;
        less.dates.pop_back(); // the one date the model leaves out
        less.tracks.age_model = false;
        const auto t = legendTexts(layoutHoleColumn(less));
        CHECK(t.count("larger benthic foram: counted finds and range") == 1);
        CHECK(t.count("coral: counted finds and range") == 0);
        CHECK(t.count("reworked find (not in the range)") == 0);
        CHECK(t.count("caved find (not in the range)") == 1);
        CHECK(t.count("Zones") == 0);
        CHECK(t.count("age model: median, 95 % band") == 0);
        CHECK(t.count("date: 95 % age range, depth bracket") == 1);
        CHECK(t.count("date not used in the age model") == 0);
    }
    SECTION("a plain column has no data-track legend") {
        const auto t = legendTexts(layoutHoleColumn(sampleHoleColumn()));
        CHECK(t.count("Taxa") == 0);
        CHECK(t.count("Zones") == 0);
        CHECK(t.count("Ages") == 0);
    }
}

TEST_CASE("Data tracks are cut at the depth window", "[draw][column][tracks]") {
    const HoleColumnInput in = sampleColumnWithTracks();
    HoleColumnView view;
    view.window_top_m = 7.5;
    view.window_base_m = 25.0;
    const DepthScale scale(7.5, 5.0, 50.0);
    const Laid l = lay(in, view, scale);
    // Rows cut at the window: the first point interpolated at 7.5 m between the 5 and 10 m rows.
    const Polyline &median = onlyItem<Polyline>(l.list, ItemRole::ColumnAgeModel, "median");
    CHECK(median.points.front().y_mm == Approx(scale.y_mm(7.5)));
    const auto age = ageTrackScale(in, l.x);
    REQUIRE(age);
    CHECK(median.points.front().x_mm == Approx(age->x_mm((0.007 + 0.014) / 2)));
    CHECK(median.points.back().y_mm == Approx(scale.y_mm(25.0)));
    // Rows: 7.5 (cut), 10, 19.5 twice, 25 (cut).
    CHECK(median.points.size() == 5);
    // The date at 3.0-3.4 m lies above the window; the one at 24.0-24.6 m inside it.
    CHECK(keysOf(l.list, ItemRole::ColumnDateMarker) ==
          std::set<std::string>{"u-th TAV-2-11", "c14 TAV-2-14"});
    // Finds outside the window are left out, the bar cut at the window's top.
    const Rect &bar = onlyItem<Rect>(l.list, ItemRole::ColumnTaxonBar, "TAVK-MIN");
    CHECK(bar.box.top_mm == Approx(scale.y_mm(7.5)));
    for (const Marker *m : itemsOf<Marker>(l.list, ItemRole::ColumnTaxonFind)) {
        CHECK(m->centre_mm.y_mm >= scale.y_mm(7.5) - 1e-9);
        CHECK(m->centre_mm.y_mm <= scale.y_mm(25.0) + 1e-9);
    }
    // TV2's body (0.6-10 m) is cut at the window top; TN1 reaches 40 m, cut at 25 m.
    CHECK(onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TV2").box.top_mm ==
          Approx(scale.y_mm(7.5)));
    CHECK(onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TN1").box.bottom_mm() ==
          Approx(scale.y_mm(25.0)));
}

TEST_CASE("Age rows in a window keep a surface's pair and interpolate at the edges",
          "[draw][column][tracks]") {
    const std::vector<ColumnAgeRow> rows{
        {0.0, 0.0, 0.0, 0.0}, {10.0, 1.0, 2.0, 3.0}, {10.0, 5.0, 6.0, 7.0}, {20.0, 6.0, 7.0, 8.0}};
    const auto in = ageRowsInWindow(rows, DepthWindow{5.0, 15.0});
    REQUIRE(in.size() == 4);
    CHECK(in[0].depth_m == 5.0);
    CHECK(in[0].q500_ma == Approx(1.0)); // halfway between 0 and 2
    CHECK(in[1].q500_ma == 2.0);         // above the surface
    CHECK(in[2].q500_ma == 6.0);         // below it
    CHECK(in[3].depth_m == 15.0);
    CHECK(in[3].q500_ma == Approx(6.5));
    // A window between two rows gets both ends interpolated.
    const auto inner = ageRowsInWindow(rows, DepthWindow{12.0, 14.0});
    REQUIRE(inner.size() == 2);
    CHECK(inner[0].q025_ma == Approx(5.2));
    CHECK(inner[1].q975_ma == Approx(7.4));
}

TEST_CASE("Zones whose picks overlap stand side by side in their scheme's lane",
          "[draw][column][tracks]") {
    HoleColumnInput in = sampleColumnWithTracks();
    // A third zone of "TV forams" whose body (14-20 m) overlaps TV1's (12-33 m).
    in.zones.push_back({"TV forams", "TV0", {13.0, 14.0, false}, {20.0, 21.0, false}});
    const Laid l = lay(in);
    const Rect &tv1 = onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TV1");
    const Rect &tv0 = onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TV0");
    const Rect &tv2 = onlyItem<Rect>(l.list, ItemRole::ColumnZone, "TV2");
    CHECK(tv0.box.left_mm >= tv1.box.right_mm() - 1e-9); // beside, not over
    CHECK(tv2.box.left_mm == Approx(tv1.box.left_mm));   // TV2 ends above TV1: same sub-lane
    CHECK(tv0.box.right_mm() <= l.x.zones_left_mm + HoleColumnStyle{}.zone_lane_width_mm + 1e-9);
    CHECK(l.placed.legend.zone_overlap);
    CHECK(legendTexts(layoutHoleColumn(in)).count("zones side by side: their picks overlap") == 1);
    CHECK(legendTexts(layoutHoleColumn(sampleColumnWithTracks()))
              .count("zones side by side: their picks overlap") == 0);
}
