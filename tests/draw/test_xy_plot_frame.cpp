// The shared x-y plot frame: linear scales, nice axis ranges and ticks, axes as drawn.
#include "display_list_queries.hpp"
#include "draw/xy_plot_frame.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <stdexcept>

using namespace atollog::draw;
using atollog::draw::test::itemsOf;
using Catch::Matchers::Contains;

namespace {

/// The 1-2-5 series (common practice for axis steps): step = m x 10^k with m in {1, 2, 5}.
bool onOneTwoFive(double step) {
    const double k = std::floor(std::log10(step) + 1e-9);
    const double m = step / std::pow(10.0, k);
    return std::abs(m - 1) < 1e-9 || std::abs(m - 2) < 1e-9 || std::abs(m - 5) < 1e-9;
}

bool multipleOf(double v, double step) {
    const double k = v / step;
    return std::abs(k - std::round(k)) < 1e-6;
}

XyPlotSpec spec(ValueRange x, ValueRange y, bool downward) {
    XyPlotSpec s;
    s.key = "t";
    s.title = "test";
    s.x = {"x (u)", x, std::nullopt, 120.0, false, false};
    s.y = {"y (u)", y, std::nullopt, 80.0, downward, false};
    return s;
}

} // namespace

TEST_CASE("Linear scale maps the range ends onto the given paper ends", "[draw][xy]") {
    const AxisScale up({10.0, 50.0}, 100.0, 20.0); // a y axis growing upward
    CHECK(up.mm(10.0) == Approx(100.0));
    CHECK(up.mm(50.0) == Approx(20.0));
    CHECK(up.mm(30.0) == Approx(60.0));
    CHECK(up.value(60.0) == Approx(30.0));
    CHECK(up.mmPerUnit() == Approx(2.0));
    CHECK_THROWS_AS(AxisScale({5.0, 5.0}, 0.0, 10.0), std::invalid_argument);
}

TEST_CASE("Log scale puts equal factors at equal distances", "[draw][xy]") {
    const AxisScale log({1.0, 1000.0}, 0.0, 90.0, true);
    CHECK(log.mm(10.0) == Approx(30.0));
    CHECK(log.mm(100.0) == Approx(60.0));
    CHECK(log.mm(20.0) - log.mm(10.0) == Approx(log.mm(200.0) - log.mm(100.0)));
    CHECK(log.value(45.0) == Approx(std::pow(10.0, 1.5)));
    CHECK(log.mmPerUnit() == Approx(30.0)); // per decade
    CHECK_FALSE(log.contains(0.0));
    CHECK_THROWS_WITH(AxisScale({0.0, 10.0}, 0.0, 90.0, true), Contains("above 0"));

    const ValueRange r = niceLogAxisRange({23.0, 24000.0});
    CHECK(r.min == Approx(10.0));
    CHECK(r.max == Approx(100000.0));
    // 22.5 mm a decade: 1-2-5 would stand 6.8 mm apart, under 10 mm, so decades only.
    const DepthTicks sparse = chooseLogTicks(r, 22.5, 10.0);
    CHECK(sparse.major_m == std::vector<double>{10.0, 100.0, 1000.0, 10000.0, 100000.0});
    CHECK(sparse.minor_m.size() == 4 * 8);
    // 40 mm a decade: 12 mm between 1 and 2, so 1, 2 and 5 are labelled.
    const DepthTicks dense = chooseLogTicks({10.0, 1000.0}, 40.0, 10.0);
    CHECK(dense.major_m.size() == 7); // 10 20 50 100 200 500 1000
    CHECK(tickLabel(0.05, dense, true) == "0.05");
    CHECK(tickLabel(1000.0, dense, true) == "1000");
}

TEST_CASE("Automatic axis ranges cover the data and end on 1-2-5 ticks", "[draw][xy]") {
    for (const ValueRange data : {ValueRange{0.3, 8.7}, ValueRange{-12.0, 47.0},
                                  ValueRange{1234.0, 1290.0}, ValueRange{0.0012, 0.0097}}) {
        CAPTURE(data.min, data.max);
        const ValueRange r = niceAxisRange(data, false, 100.0, 10.0);
        CHECK(r.min <= data.min);
        CHECK(r.max >= data.max);
        const DepthTicks t = chooseDepthTicks(r.min, r.max, 100.0 / (r.max - r.min), 10.0);
        CHECK(onOneTwoFive(t.major_step_m));
        CHECK(multipleOf(r.min, t.major_step_m));
        CHECK(multipleOf(r.max, t.major_step_m));
        // Not widened by more than a step at either end.
        CHECK(data.min - r.min < t.major_step_m + 1e-9);
        CHECK(r.max - data.max < t.major_step_m + 1e-9);
    }
    const ValueRange with_zero = niceAxisRange({120.0, 480.0}, true, 100.0, 10.0);
    CHECK(with_zero.min == 0.0);
    // A single value is padded, never an empty axis.
    const ValueRange one = niceAxisRange({3.0, 3.0}, false, 100.0, 10.0);
    CHECK(one.max > one.min);
}

TEST_CASE("Frame puts values where its scales say and ticks inside the range", "[draw][xy]") {
    const XyPlotSpec s = spec({0.3, 8.7}, {-12.0, 47.0}, false);
    const XyPlotFrame f = xyPlotFrame(s);
    // y grows upward: the range's minimum on the bottom edge, its maximum on the top edge.
    CHECK(f.y.mm(f.y.range().min) == Approx(f.plot_mm.bottom_mm()));
    CHECK(f.y.mm(f.y.range().max) == Approx(f.plot_mm.top_mm));
    CHECK(f.x.mm(f.x.range().min) == Approx(f.plot_mm.left_mm));
    CHECK(f.x.mm(f.x.range().max) == Approx(f.plot_mm.right_mm()));
    for (const double v : f.y_ticks.major_m) {
        CHECK(f.y.contains(v));
        CHECK(multipleOf(v, f.y_ticks.major_step_m));
    }
    CHECK(f.y_ticks.major_m.size() >= 3);
    CHECK(f.y_ticks.major_step_m * f.y.mmPerUnit() >= XyPlotStyle{}.y_tick_min_spacing_mm);

    const XyPlotFrame down = xyPlotFrame(spec({0.3, 8.7}, {0.0, 40.0}, true));
    CHECK(down.y.mm(0.0) == Approx(down.plot_mm.top_mm));
    CHECK(down.y.mm(40.0) == Approx(down.plot_mm.bottom_mm()));

    DisplayList list;
    appendXyAxes(list, s, f);
    // Every major tick is labelled once, at the tick's paper position.
    const auto labels = itemsOf<Text>(list, ItemRole::XyAxisLabel);
    CHECK(labels.size() == f.x_ticks.major_m.size() + f.y_ticks.major_m.size());
    for (const Text *t : labels) {
        if (t->tag.key.rfind("y ", 0) == 0) {
            const double v = std::stod(t->text);
            CHECK(t->anchor_mm.y_mm == Approx(f.y.mm(v)).margin(1e-6));
        }
    }
}

TEST_CASE("Frame refuses an empty fixed range, naming the axis", "[draw][xy]") {
    XyPlotSpec s = spec({0.0, 1.0}, {0.0, 1.0}, false);
    s.y.fixed = ValueRange{5.0, 5.0};
    CHECK_THROWS_WITH(xyPlotFrame(s), Contains("the y axis range") && Contains("is empty"));
    s.y.fixed.reset();
    s.x.length_mm = 0.0;
    CHECK_THROWS_WITH(xyPlotFrame(s), Contains("the x axis needs a positive length"));
    CHECK(fixedText(-0.001, 1) == "0.0");
    CHECK(fixedText(-0.26, 1) == "-0.3");
}
