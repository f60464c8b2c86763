// Age against distance along the chain: geometry, structure and input checks.
#include "display_list_queries.hpp"
#include "draw/chain_plot.hpp"
#include "sample_xy_plots.hpp"

#include <catch2/catch.hpp>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleChainPlot;
using Catch::Matchers::Contains;

TEST_CASE("Chain plot puts each hole at its distance and age with 95 % bars",
          "[draw][xy][chain]") {
    const ChainPlotInput in = sampleChainPlot();
    const DisplayList list = layoutChainPlot(in);
    const XyPlotFrame f = chainPlotFrame(in);
    CHECK(f.x.range().min == 0.0); // the active centre is on the plot
    for (const ChainPlotPoint &p : in.points) {
        CAPTURE(p.hole);
        const Marker &m = onlyItem<Marker>(list, ItemRole::ChainPoint, p.hole);
        CHECK(m.centre_mm.x_mm == Approx(f.x.mm(p.distance_km)));
        CHECK(m.centre_mm.y_mm == Approx(f.y.mm(p.age_ma)));
        double top = 1e9, bottom = -1e9;
        for (const Line *l : itemsOf<Line>(list, ItemRole::ChainBar)) {
            if (l->tag.key == p.hole && l->from.x_mm == l->to.x_mm) {
                top = std::min({top, l->from.y_mm, l->to.y_mm});
                bottom = std::max({bottom, l->from.y_mm, l->to.y_mm});
            }
        }
        // 1.96 sd: the 97.5 % point of the standard normal (any statistics table).
        CHECK(f.y.value(top) == Approx(p.age_ma + 1.96 * p.age_sd_ma));
        CHECK(f.y.value(bottom) == Approx(p.age_ma - 1.96 * p.age_sd_ma));
        CHECK(onlyItem<Text>(list, ItemRole::ChainLabel, p.hole).text == p.hole);
    }
}

TEST_CASE("Chain fit runs from the active centre on age = intercept + distance / rate",
          "[draw][xy][chain]") {
    const ChainPlotInput in = sampleChainPlot();
    const DisplayList list = layoutChainPlot(in);
    const XyPlotFrame f = chainPlotFrame(in);
    const Line &fit = onlyItem<Line>(list, ItemRole::ChainFit, "fit");
    CHECK(f.x.value(fit.from.x_mm) == Approx(0.0).margin(1e-9));
    CHECK(f.y.value(fit.from.y_mm) == Approx(0.5));
    CHECK(f.x.value(fit.to.x_mm) == Approx(400.0));
    CHECK(f.y.value(fit.to.y_mm) == Approx(0.5 + 400.0 / 80.0));
    CHECK(legendTexts(list).count("York fit: 80.0 \u00b1 4.0 mm/yr (1 sd)") == 1);

    ChainPlotInput no_fit = in;
    no_fit.fit.reset();
    const DisplayList bare = layoutChainPlot(no_fit);
    CHECK(itemsOf<Line>(bare, ItemRole::ChainFit).empty());
    CHECK(legendTexts(bare).count("Migration") == 0);
}

TEST_CASE("Chain plot rejects bad input naming the hole", "[draw][xy][chain]") {
    const ChainPlotInput good = sampleChainPlot();
    ChainPlotInput in = good;
    in.points[1].age_sd_ma = -0.1;
    CHECK_THROWS_WITH(layoutChainPlot(in), Contains("hole QX-2") && Contains("negative sd"));
    in = good;
    in.points[2].hole = "QX-1";
    CHECK_THROWS_WITH(layoutChainPlot(in), Contains("hole QX-1 is given twice"));
    in = good;
    in.age_axis_ma = ValueRange{0.0, 4.0};
    CHECK_THROWS_WITH(layoutChainPlot(in), Contains("hole QX-3") && Contains("off the age axis"));
    in = good;
    in.points.clear();
    CHECK_THROWS_WITH(layoutChainPlot(in), Contains("no hole to draw"));
}
