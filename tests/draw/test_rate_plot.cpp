// Accretion rate against depth or age: geometry, structure and input checks.
#include "display_list_queries.hpp"
#include "draw/rate_plot.hpp"
#include "sample_xy_plots.hpp"

#include <catch2/catch.hpp>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using atollog::draw::test::legendTexts;
using atollog::draw::test::onlyItem;
using atollog::draw::test::sampleRatePlot;
using Catch::Matchers::Contains;

TEST_CASE("Rate bar spans its interval at its median rate", "[draw][xy][rates]") {
    const RatePlotInput in = sampleRatePlot();
    const DisplayList list = layoutRatePlot(in);
    const XyPlotFrame f = ratePlotFrame(in);
    for (const RatePlotInterval &r : in.intervals) {
        CAPTURE(r.label);
        const Line &bar = onlyItem<Line>(list, ItemRole::RateBar, r.label);
        CHECK(bar.from.x_mm == Approx(f.x.mm(r.span_top)));
        CHECK(bar.to.x_mm == Approx(f.x.mm(r.span_base)));
        CHECK(bar.from.y_mm == Approx(f.y.mm(r.rate_m_per_myr)));
        CHECK(bar.to.y_mm == Approx(bar.from.y_mm));
        const Rect &band = onlyItem<Rect>(list, ItemRole::RateBand, r.label);
        CHECK(band.box.left_mm == Approx(bar.from.x_mm));
        CHECK(band.box.right_mm() == Approx(bar.to.x_mm));
        CHECK(band.box.top_mm == Approx(f.y.mm(r.rate_hi_m_per_myr)));
        CHECK(band.box.bottom_mm() == Approx(f.y.mm(r.rate_lo_m_per_myr)));
    }
    // The rate axis is logarithmic over whole decades (90-520 m/Myr: 10 to 1000); rates grow
    // upward, and a factor of 2 is the same height at any rate.
    CHECK(f.y.logarithmic());
    CHECK(f.y.range().min == Approx(10.0));
    CHECK(f.y.range().max == Approx(1000.0));
    CHECK(f.y.mm(10.0) == Approx(f.plot_mm.bottom_mm()));
    CHECK(f.y.mm(100.0) - f.y.mm(200.0) == Approx(f.y.mm(300.0) - f.y.mm(600.0)));
    // The package is dashed, the intervals between ties solid.
    CHECK(onlyItem<Line>(list, ItemRole::RateBar, "upper reef").stroke.dash == DashStyle::Dashed);
    CHECK(onlyItem<Line>(list, ItemRole::RateBar, "B AAA .. T BBB").stroke.dash ==
          DashStyle::Solid);
}

TEST_CASE("Rate legend lists only the kinds drawn; the axis follows depth or age",
          "[draw][xy][rates]") {
    RatePlotInput in = sampleRatePlot();
    CHECK(legendTexts(layoutRatePlot(in)) ==
          std::set<std::string>{"Rates (median, 95 % range)", "between consecutive ties",
                                "logged package"});
    in.intervals.pop_back(); // the package
    const DisplayList no_package = layoutRatePlot(in);
    CHECK(legendTexts(no_package).count("logged package") == 0);
    CHECK(onlyItem<Text>(no_package, ItemRole::XyAxis, "x heading").text == "depth (m)");
    in.along = RatePlotAlong::Age;
    in.intervals = {{"a .. b", RateIntervalKind::BetweenTies, 0.12, 0.31, 40, 60, 90}};
    const DisplayList by_age = layoutRatePlot(in);
    CHECK(onlyItem<Text>(by_age, ItemRole::XyAxis, "x heading").text == "age (Ma)");
    const XyPlotFrame f = ratePlotFrame(in);
    CHECK(f.x.range().min <= 0.12);
    CHECK(f.x.range().max >= 0.31);
}

TEST_CASE("Rate plot rejects bad input naming the interval", "[draw][xy][rates]") {
    const RatePlotInput good = sampleRatePlot();
    RatePlotInput in = good;
    std::swap(in.intervals[1].span_top, in.intervals[1].span_base);
    CHECK_THROWS_WITH(layoutRatePlot(in), Contains("hole QX-1, interval T BBB .. B CCC") &&
                                              Contains("empty or inverted"));
    in = good;
    in.intervals[0].rate_lo_m_per_myr = 400.0;
    CHECK_THROWS_WITH(layoutRatePlot(in), Contains("interval B AAA .. T BBB") &&
                                              Contains("rate (m/Myr) 300 lies outside"));
    in = good;
    in.rate_axis_m_per_myr = ValueRange{10.0, 400.0};
    CHECK_THROWS_WITH(layoutRatePlot(in), Contains("off the rate axis"));
    in = good;
    in.intervals[2].rate_lo_m_per_myr = 0.0;
    CHECK_THROWS_WITH(layoutRatePlot(in), Contains("interval upper reef") &&
                                              Contains("not above 0"));
    in = good;
    in.intervals.clear();
    CHECK_THROWS_WITH(layoutRatePlot(in), Contains("has no rate interval"));
}
