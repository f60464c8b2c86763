// Subsidence against age: geometry, structure and input checks on the display list.
#include "display_list_queries.hpp"
#include "draw/subsidence_plot.hpp"
#include "draw/xy_series_style.hpp"
#include "sample_xy_plots.hpp"

#include <catch2/catch.hpp>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleSubsidencePlot;
using Catch::Matchers::Contains;

TEST_CASE("Subsidence plot puts each horizon at its age and subsidence", "[draw][xy][subsidence]") {
    const SubsidencePlotInput in = sampleSubsidencePlot();
    const DisplayList list = layoutSubsidencePlot(in);
    const XyPlotFrame f = subsidencePlotFrame(in);
    // Subsidence grows downward, age to the right.
    CHECK(f.y.mm(10.0) < f.y.mm(100.0));
    CHECK(f.x.mm(0.2) < f.x.mm(1.0));
    const SubsidencePlotPoint &p = in.holes[0].points[2];
    const Marker &m = onlyItem<Marker>(list, ItemRole::SubsidencePoint, "QX-1 " + p.sample);
    CHECK(m.centre_mm.x_mm == Approx(f.x.mm(p.age_ma)));
    CHECK(m.centre_mm.y_mm == Approx(f.y.mm(p.subsidence_m)));
    // The bars reach the 95 % range ends in both directions.
    double left = 1e9, right = -1e9, top = 1e9, bottom = -1e9;
    for (const Line *l : itemsOf<Line>(list, ItemRole::SubsidenceBar)) {
        if (l->tag.key != "QX-1 " + p.sample) {
            continue;
        }
        left = std::min({left, l->from.x_mm, l->to.x_mm});
        right = std::max({right, l->from.x_mm, l->to.x_mm});
        top = std::min({top, l->from.y_mm, l->to.y_mm});
        bottom = std::max({bottom, l->from.y_mm, l->to.y_mm});
    }
    CHECK(left == Approx(f.x.mm(p.age_lo_ma)));
    CHECK(right == Approx(f.x.mm(p.age_hi_ma)));
    CHECK(top == Approx(f.y.mm(p.subsidence_lo_m)));
    CHECK(bottom == Approx(f.y.mm(p.subsidence_hi_m)));
    // Every horizon lies inside the frame.
    for (const Marker *mk : itemsOf<Marker>(list, ItemRole::SubsidencePoint)) {
        CHECK(f.plot_mm.intersects(RectMm{mk->centre_mm.x_mm, mk->centre_mm.y_mm, 0, 0}));
    }
}

TEST_CASE("Subsidence rate line follows intercept + rate x age", "[draw][xy][subsidence]") {
    const SubsidencePlotInput in = sampleSubsidencePlot();
    const DisplayList list = layoutSubsidencePlot(in);
    const XyPlotFrame f = subsidencePlotFrame(in);
    const Polyline &line = onlyItem<Polyline>(list, ItemRole::SubsidenceRateLine, "QX-1");
    REQUIRE(line.points.size() >= 2);
    for (const PointMm &pt : line.points) {
        const double age = f.x.value(pt.x_mm);
        CHECK(f.y.value(pt.y_mm) == Approx(2.0 + 80.0 * age));
    }
    // Over the hole's own ages only: from its youngest to its oldest horizon.
    CHECK(f.x.value(line.points.front().x_mm) == Approx(0.2));
    CHECK(f.x.value(line.points.back().x_mm) == Approx(1.4));
    // No line for the hole without a rate.
    CHECK(itemsOf<Polyline>(list, ItemRole::SubsidenceRateLine).size() == 1);
}

TEST_CASE("Subsidence holes differ by marker and colour; the legend lists them with rates",
          "[draw][xy][subsidence]") {
    const DisplayList list = layoutSubsidencePlot(sampleSubsidencePlot());
    const Marker &a = onlyItem<Marker>(list, ItemRole::SubsidencePoint, "QX-1 QX-1-1");
    const Marker &b = onlyItem<Marker>(list, ItemRole::SubsidencePoint, "QX-2 QX-2-1");
    CHECK(a.shape != b.shape);
    CHECK(!(a.colour == b.colour));
    const auto legend = legendTexts(list);
    CHECK(legend.count("QX-1: 80 \u00b1 6 m/Myr") == 1);
    CHECK(legend.count("QX-2") == 1); // no rate, no rate text
    CHECK(legend.count("95 % range of age and subsidence") == 1);
    // A rate swatch only for the hole with a line.
    int rate_swatches = 0;
    for (const Line *l : itemsOf<Line>(list, ItemRole::LegendSwatch)) {
        rate_swatches += l->tag.key.find(" rate") != std::string::npos ? 1 : 0;
    }
    CHECK(rate_swatches == 1);
}

TEST_CASE("Subsidence plot rejects bad input naming the item", "[draw][xy][subsidence]") {
    const SubsidencePlotInput good = sampleSubsidencePlot();
    SubsidencePlotInput in = good;
    in.holes[0].points[1].subsidence_m = in.holes[0].points[1].subsidence_hi_m + 1.0;
    CHECK_THROWS_WITH(layoutSubsidencePlot(in),
                      Contains("hole QX-1, sample QX-1-2") && Contains("subsidence (m)") &&
                          Contains("outside its range"));
    in = good;
    in.holes[1].hole = "QX-1";
    CHECK_THROWS_WITH(layoutSubsidencePlot(in), Contains("hole QX-1 is given twice"));
    in = good;
    in.age_axis_ma = ValueRange{0.0, 1.0};
    CHECK_THROWS_WITH(layoutSubsidencePlot(in),
                      Contains("sample QX-1-4 age") && Contains("off the age axis"));
    in = good;
    in.holes[0].rate->rate_sd_m_per_myr = -1.0;
    CHECK_THROWS_WITH(layoutSubsidencePlot(in), Contains("hole QX-1") && Contains("negative"));
    in = good;
    in.holes[1].points.clear();
    CHECK_THROWS_WITH(layoutSubsidencePlot(in), Contains("hole QX-2 has no point"));
    in = good;
    in.holes[0].points[0].age_ma = std::nan("");
    CHECK_THROWS_WITH(layoutSubsidencePlot(in), Contains("not a finite number"));
}
