// Structure of a laid-out range chart, checked on the display list (no pixels).
#include "display_list_queries.hpp"
#include "draw/group_palette.hpp"
#include "draw/range_chart.hpp"
#include "sample_range_chart.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <set>
#include <stdexcept>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleRangeChart;
using Catch::Matchers::WithinAbs;

namespace {


std::vector<std::string> legendTexts(const DisplayList &list) {
    std::vector<std::string> out;
    for (const Text *t : itemsOf<Text>(list, ItemRole::LegendText)) {
        out.push_back(t->text);
    }
    return out;
}

bool contains(const std::vector<std::string> &v, const std::string &s) {
    return std::find(v.begin(), v.end(), s) != v.end();
}

} // namespace

TEST_CASE("Range bars join in-place finds only, from highest to lowest", "[draw][layout]") {
    const RangeChartInput in = sampleRangeChart();
    const DisplayList list = layoutRangeChart(in);
    const DepthScale scale = rangeChartDepthScale(in);

    // tx-a, tx-b and tx-c have in-place finds; tx-d has only reworked ones and gets no bar.
    const auto bars = itemsOf<Rect>(list, ItemRole::TaxonRangeBar);
    std::set<std::string> bar_keys;
    for (const Rect *bar : bars) {
        bar_keys.insert(bar->tag.key);
    }
    CHECK(bars.size() == 3);
    CHECK(bar_keys == std::set<std::string>{"tx-a", "tx-b", "tx-c"});

    const Rect &bar_a = onlyItem<Rect>(list, ItemRole::TaxonRangeBar, "tx-a");
    CHECK_THAT(bar_a.box.top_mm, WithinAbs(scale.y_mm(24.0), 1e-9));
    CHECK_THAT(bar_a.box.bottom_mm(), WithinAbs(scale.y_mm(41.2), 1e-9));
    // The caved find of tx-b at 28.0 m does not stretch its bar upward.
    const Rect &bar_b = onlyItem<Rect>(list, ItemRole::TaxonRangeBar, "tx-b");
    CHECK_THAT(bar_b.box.top_mm, WithinAbs(scale.y_mm(35.0), 1e-9));
    CHECK_THAT(bar_b.box.bottom_mm(), WithinAbs(scale.y_mm(47.5), 1e-9));
    // One find: a bar of zero height at its depth.
    const Rect &bar_c = onlyItem<Rect>(list, ItemRole::TaxonRangeBar, "tx-c");
    CHECK_THAT(bar_c.box.height_mm, WithinAbs(0.0, 1e-12));
    CHECK_THAT(bar_c.box.top_mm, WithinAbs(scale.y_mm(22.0), 1e-9));

    // Bars take their group's colour.
    REQUIRE(bar_a.fill.has_value());
    CHECK(*bar_a.fill == groupColour("larger_benthic_foram"));
}

TEST_CASE("Reworked and caved finds are hollow and beside the bar", "[draw][layout]") {
    const RangeChartInput in = sampleRangeChart();
    const DisplayList list = layoutRangeChart(in);
    const DepthScale scale = rangeChartDepthScale(in);
    const Rect &bar_a = onlyItem<Rect>(list, ItemRole::TaxonRangeBar, "tx-a");

    int hollow = 0, filled = 0;
    for (const Marker *m : itemsOf<Marker>(list, ItemRole::Occurrence)) {
        if (m->hollow) {
            ++hollow;
            const Rect *bar = nullptr;
            for (const Rect *b : itemsOf<Rect>(list, ItemRole::TaxonRangeBar)) {
                if (b->tag.key == m->tag.key) {
                    bar = b;
                }
            }
            if (bar != nullptr) {
                // Entirely left of the bar: never read as part of the range.
                CHECK(m->centre_mm.x_mm + m->size_mm / 2 < bar->box.left_mm);
            }
        } else {
            ++filled;
        }
    }
    CHECK(hollow == 4); // tx-a reworked, tx-b caved, tx-d two reworked
    CHECK(filled == 6); // in-place: 3 + 2 + 1

    const auto occurrences_a = itemsOf<Marker>(list, ItemRole::Occurrence);
    const auto reworked_a =
        std::find_if(occurrences_a.begin(), occurrences_a.end(),
                     [](const Marker *m) { return m->tag.key == "tx-a" && m->hollow; });
    REQUIRE(reworked_a != occurrences_a.end());
    CHECK_THAT((*reworked_a)->centre_mm.y_mm, WithinAbs(scale.y_mm(52.0), 1e-9));
    CHECK((*reworked_a)->centre_mm.y_mm > bar_a.box.bottom_mm());

    // Abundance rank sets the size: rank 4 (30.5 m) larger than rank 2 (41.2 m).
    double size_r4 = 0, size_r2 = 0;
    for (const Marker *m : occurrences_a) {
        if (m->tag.key == "tx-a" && std::abs(m->centre_mm.y_mm - scale.y_mm(30.5)) < 1e-9) {
            size_r4 = m->size_mm;
        }
        if (m->tag.key == "tx-a" && std::abs(m->centre_mm.y_mm - scale.y_mm(41.2)) < 1e-9) {
            size_r2 = m->size_mm;
        }
    }
    CHECK(size_r4 > size_r2);
}

TEST_CASE("Picks: marker at the quoted depth, bracket over its interval", "[draw][layout]") {
    const RangeChartInput in = sampleRangeChart();
    const DisplayList list = layoutRangeChart(in);
    const DepthScale scale = rangeChartDepthScale(in);

    const Marker &top_a = onlyItem<Marker>(list, ItemRole::PickMarker, "top-a");
    CHECK_THAT(top_a.centre_mm.y_mm, WithinAbs(scale.y_mm(23.0), 1e-9));
    CHECK(top_a.shape == MarkerShape::TriangleUp);
    const Marker &base_a = onlyItem<Marker>(list, ItemRole::PickMarker, "base-a");
    CHECK_THAT(base_a.centre_mm.y_mm, WithinAbs(scale.y_mm(42.6), 1e-9));
    CHECK(base_a.shape == MarkerShape::TriangleDown);
    CHECK(itemsOf<Marker>(list, ItemRole::PickMarker).size() == in.picks.size());

    // The bracket's vertical runs from the shallow to the deep end of the interval.
    const Polyline &bracket = onlyItem<Polyline>(list, ItemRole::PickBracket, "base-a");
    REQUIRE(bracket.points.size() == 4);
    CHECK_THAT(bracket.points[1].y_mm, WithinAbs(scale.y_mm(41.2), 1e-9));
    CHECK_THAT(bracket.points[2].y_mm, WithinAbs(scale.y_mm(44.0), 1e-9));
    CHECK(bracket.stroke.dash == DashStyle::Solid);

    // Extended brackets are dashed; an end not given falls back to the ordinary end.
    const Polyline &ext_a = onlyItem<Polyline>(list, ItemRole::PickExtendedBracket, "top-a");
    CHECK(ext_a.stroke.dash == DashStyle::Dashed);
    CHECK_THAT(ext_a.points[1].y_mm, WithinAbs(scale.y_mm(20.5), 1e-9));
    CHECK_THAT(ext_a.points[2].y_mm, WithinAbs(scale.y_mm(24.0), 1e-9));
    const Polyline &ext_b = onlyItem<Polyline>(list, ItemRole::PickExtendedBracket, "base-b");
    CHECK_THAT(ext_b.points[1].y_mm, WithinAbs(scale.y_mm(47.5), 1e-9));
    CHECK_THAT(ext_b.points[2].y_mm, WithinAbs(scale.y_mm(53.0), 1e-9));
    CHECK(itemsOf<Polyline>(list, ItemRole::PickExtendedBracket).size() == 2);

    // The open-ended top continues upward (smaller y) past its shallow end.
    const Line &open = onlyItem<Line>(list, ItemRole::PickBracket, "top-c");
    CHECK(open.stroke.dash == DashStyle::Dotted);
    CHECK_THAT(open.from.y_mm, WithinAbs(scale.y_mm(21.0), 1e-9));
    CHECK(open.to.y_mm < open.from.y_mm);
}

TEST_CASE("Taxon names stand rotated above the body and clear of each other", "[draw][layout]") {
    const RangeChartInput in = sampleRangeChart();
    const DisplayList list = layoutRangeChart(in);
    const double body_top = rangeChartDepthScale(in).y_mm(in.top_m);

    const auto names = itemsOf<Text>(list, ItemRole::TaxonName);
    REQUIRE(names.size() == in.taxa.size());
    for (std::size_t i = 0; i < names.size(); ++i) {
        CHECK(names[i]->text == in.taxa[i].display_name); // in the order given
        CHECK(names[i]->rotation_deg == -90.0);
        const RectMm box = itemBounds(*list.withRole(ItemRole::TaxonName)[i]);
        CHECK(box.bottom_mm() < body_top);
        for (std::size_t j = i + 1; j < names.size(); ++j) {
            CHECK_FALSE(box.intersects(itemBounds(*list.withRole(ItemRole::TaxonName)[j])));
        }
        // Left to right in input order.
        if (i > 0) {
            CHECK(names[i]->anchor_mm.x_mm > names[i - 1]->anchor_mm.x_mm);
        }
    }
    // The title and subtitle stay above every rotated name.
    const RectMm subtitle = itemBounds(*list.withRole(ItemRole::Subtitle).front());
    for (const DisplayItem *name : list.withRole(ItemRole::TaxonName)) {
        CHECK(itemBounds(*name).top_mm > subtitle.bottom_mm());
    }
}

TEST_CASE("Depth labels do not overlap and everything lies on the page", "[draw][layout]") {
    const DisplayList list = layoutRangeChart(sampleRangeChart());
    const auto labels = list.withRole(ItemRole::DepthLabel);
    REQUIRE(labels.size() > 5);
    for (std::size_t i = 0; i < labels.size(); ++i) {
        for (std::size_t j = i + 1; j < labels.size(); ++j) {
            CHECK_FALSE(itemBounds(*labels[i]).intersects(itemBounds(*labels[j])));
        }
    }
    const RectMm page = list.page();
    for (const DisplayItem &item : list.items()) {
        const RectMm box = itemBounds(item);
        CHECK(box.left_mm >= page.left_mm);
        CHECK(box.top_mm >= page.top_mm);
        CHECK(box.right_mm() <= page.right_mm());
        CHECK(box.bottom_mm() <= page.bottom_mm());
    }
}

TEST_CASE("The legend lists what the chart draws and nothing else", "[draw][layout]") {
    RangeChartInput in = sampleRangeChart();
    const auto full = legendTexts(layoutRangeChart(in));
    for (const char *expected :
         {"larger benthic foram", "benthic foram", "coral", "mollusc", "reworked", "caved",
          "top (highest occurrence)", "base (lowest occurrence)", "extended interval",
          "may lie beyond", "sample barren", "no recovery"}) {
        CAPTURE(expected);
        CHECK(contains(full, expected));
    }
    CHECK_FALSE(contains(full, "planktonic foram"));

    // Without reworked/caved finds, picks, barren samples or recovery, their entries go.
    for (ChartTaxon &t : in.taxa) {
        std::erase_if(t.occurrences,
                      [](const ChartOccurrence &o) { return o.kind != OccurrenceKind::InPlace; });
    }
    in.picks.clear();
    in.recovery.clear();
    std::erase_if(in.samples, [](const ChartSample &s) { return !s.examined; });
    const DisplayList reduced = layoutRangeChart(in);
    const auto fewer = legendTexts(reduced);
    for (const char *gone : {"reworked", "caved", "top (highest occurrence)", "datum lies within",
                             "sample barren", "no recovery"}) {
        CAPTURE(gone);
        CHECK_FALSE(contains(fewer, gone));
    }
    CHECK(contains(fewer, "sample examined"));
    CHECK(reduced.withRole(ItemRole::RecoveryRun).empty());
}

TEST_CASE("Range chart input errors name the item", "[draw][layout]") {
    RangeChartInput in = sampleRangeChart();
    SECTION("occurrence below the section") {
        in.taxa[1].occurrences.push_back({61.0, OccurrenceKind::InPlace, 1});
        CHECK_THROWS_WITH(layoutRangeChart(in), Catch::Contains("tx-b") &&
                                                    Catch::Contains("61.000 m") &&
                                                    Catch::Contains("KT-7"));
    }
    SECTION("quoted depth outside its bracket") {
        in.picks[1].depth_m = 45.0;
        CHECK_THROWS_WITH(layoutRangeChart(in), Catch::Contains("base-a"));
    }
    SECTION("pick for a taxon without a column") {
        in.picks[0].taxon_id = "tx-z";
        CHECK_THROWS_WITH(layoutRangeChart(in), Catch::Contains("tx-z"));
    }
    SECTION("abundance rank above 5") {
        in.taxa[0].occurrences[0].abundance_rank = 6;
        CHECK_THROWS_WITH(layoutRangeChart(in), Catch::Contains("abundance rank 6"));
    }
    SECTION("empty section") {
        in.base_m = in.top_m;
        CHECK_THROWS_AS(layoutRangeChart(in), std::invalid_argument);
    }
    SECTION("repeated taxon") {
        in.taxa.push_back(in.taxa.front());
        CHECK_THROWS_WITH(layoutRangeChart(in), Catch::Contains("two columns"));
    }
}
