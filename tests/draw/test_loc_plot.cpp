// The line-of-correlation cross-plot: geometry, structure and input checks.
#include "display_list_queries.hpp"
#include "draw/loc_plot.hpp"
#include "sample_xy_plots.hpp"

#include <catch2/catch.hpp>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleLocPlot;
using Catch::Matchers::Contains;

TEST_CASE("LOC plot puts each event at its two levels inside its bracket box", "[draw][xy][loc]") {
    const LocPlotInput in = sampleLocPlot();
    const DisplayList list = layoutLocPlot(in);
    const XyPlotFrame f = locPlotFrame(in);
    // Depth in the y hole grows downward.
    CHECK(f.y.mm(5.0) < f.y.mm(30.0));
    for (const LocPlotEvent &e : in.events) {
        CAPTURE(e.id);
        const Marker &m = onlyItem<Marker>(list, ItemRole::LocEventMarker, e.id);
        CHECK(m.centre_mm.x_mm == Approx(f.x.mm(e.x_level_m)));
        CHECK(m.centre_mm.y_mm == Approx(f.y.mm(e.y_level_m)));
        const Rect &box = onlyItem<Rect>(list, ItemRole::LocEventBracket, e.id);
        CHECK(box.box.left_mm == Approx(f.x.mm(e.x_shallow_m)));
        CHECK(box.box.right_mm() == Approx(f.x.mm(e.x_deep_m)));
        CHECK(box.box.top_mm == Approx(f.y.mm(e.y_shallow_m)));
        CHECK(box.box.bottom_mm() == Approx(f.y.mm(e.y_deep_m)));
        CHECK(m.shape == (e.kind == LocEventKind::Base ? MarkerShape::TriangleDown
                                                        : MarkerShape::TriangleUp));
    }
    // The fitted piece runs over its own x range on y = intercept + slope x.
    const Line &seg = onlyItem<Line>(list, ItemRole::LocSegment, "segment 1");
    CHECK(f.x.value(seg.from.x_mm) == Approx(5.0));
    CHECK(f.y.value(seg.from.y_mm) == Approx(2.0 + 1.5 * 5.0));
    CHECK(f.x.value(seg.to.x_mm) == Approx(26.0));
    CHECK(f.y.value(seg.to.y_mm) == Approx(2.0 + 1.5 * 26.0));
    const Polygon &band = onlyItem<Polygon>(list, ItemRole::LocSegmentBand, "segment 1");
    CHECK(band.points.size() == 10);
}

TEST_CASE("LOC plot cuts a piece and its band at the frame", "[draw][xy][loc]") {
    LocPlotInput in = sampleLocPlot();
    for (LocBandPoint &b : in.segments[0].band) {
        b.y_lo_m -= 20.0; // the band now reaches above the shallowest event
    }
    in.segments[0].intercept_m = -20.0; // y(5) = -12.5 m, above the axis
    const DisplayList list = layoutLocPlot(in);
    const XyPlotFrame f = locPlotFrame(in);
    CHECK(f.y.range().min >= 0.0); // the axes follow the events only
    const Line &seg = onlyItem<Line>(list, ItemRole::LocSegment, "segment 1");
    CHECK(seg.from.y_mm == Approx(f.plot_mm.top_mm));
    CHECK(f.y.value(seg.to.y_mm) == Approx(-20.0 + 1.5 * 26.0));
    const Polygon &band = onlyItem<Polygon>(list, ItemRole::LocSegmentBand, "segment 1");
    for (const PointMm &pt : band.points) {
        CHECK(pt.y_mm >= f.plot_mm.top_mm - 1e-9);
        CHECK(pt.y_mm <= f.plot_mm.bottom_mm() + 1e-9);
    }
}

TEST_CASE("LOC plot flags off-line events, draws surfaces on the plot only",
          "[draw][xy][loc]") {
    const LocPlotInput in = sampleLocPlot();
    const DisplayList list = layoutLocPlot(in);
    const XyPlotFrame f = locPlotFrame(in);
    const auto rings = itemsOf<Polyline>(list, ItemRole::LocOffLine);
    REQUIRE(rings.size() == 1);
    CHECK(rings[0]->tag.key == "T DDD");
    const auto labels = itemsOf<Text>(list, ItemRole::LocEventLabel);
    REQUIRE(labels.size() == 1); // only the flagged event is labelled by default
    CHECK(labels[0]->text == "T DDD");
    // The x hole's surface at 12 m is a vertical line at x(12); the one at 300 m is off the plot.
    const auto x12 = itemsOf<Line>(list, ItemRole::LocSurface);
    REQUIRE(x12.size() == 2);
    const Line &vertical = onlyItem<Line>(list, ItemRole::LocSurface, locSurfaceKey('x', 12.0));
    CHECK(vertical.from.x_mm == Approx(f.x.mm(12.0)));
    CHECK(vertical.to.x_mm == Approx(f.x.mm(12.0)));
    const Line &horizontal = onlyItem<Line>(list, ItemRole::LocSurface, locSurfaceKey('y', 20.0));
    CHECK(horizontal.from.y_mm == Approx(f.y.mm(20.0)));
    CHECK(f.x.range().max < 300.0);

    LocPlotInput all = in;
    all.label_every_event = true;
    CHECK(itemsOf<Text>(layoutLocPlot(all), ItemRole::LocEventLabel).size() == in.events.size());
}

TEST_CASE("LOC legend lists only what is drawn", "[draw][xy][loc]") {
    LocPlotInput in = sampleLocPlot();
    auto legend = legendTexts(layoutLocPlot(in));
    CHECK(legend.count("base (FO)") == 1);
    CHECK(legend.count("top (LO)") == 1);
    CHECK(legend.count("dated horizon") == 0);
    CHECK(legend.count("off the line (flagged)") == 1);
    CHECK(legend.count("95 % band of the line") == 1);
    CHECK(legend.count("in QX-1 (vertical)") == 1);
    in.events[3].off_line = false;
    in.segments.clear();
    in.x_surfaces_m = {300.0}; // off the plot: not drawn, not listed
    in.y_surfaces_m.clear();
    legend = legendTexts(layoutLocPlot(in));
    CHECK(legend.count("off the line (flagged)") == 0);
    CHECK(legend.count("fitted piece") == 0);
    CHECK(legend.count("Logged surfaces") == 0);
    CHECK(legend.count("in QX-1 (vertical)") == 0);
}

TEST_CASE("LOC plot rejects bad input naming the item", "[draw][xy][loc]") {
    const LocPlotInput good = sampleLocPlot();
    LocPlotInput in = good;
    in.events[2].y_level_m = 30.0; // outside 24-26
    CHECK_THROWS_WITH(layoutLocPlot(in),
                      Contains("event B CCC in QX-2") && Contains("the level (m) 30"));
    in = good;
    in.y_hole = "QX-1";
    CHECK_THROWS_WITH(layoutLocPlot(in), Contains("QX-1 is on both axes"));
    in = good;
    in.segments[0].x_to_m = in.segments[0].x_from_m;
    CHECK_THROWS_WITH(layoutLocPlot(in), Contains("segment 1") && Contains("is empty"));
    in = good;
    in.x_axis_m = ValueRange{0.0, 20.0};
    CHECK_THROWS_WITH(layoutLocPlot(in), Contains("event T DDD") && Contains("off the QX-1 axis"));
}
