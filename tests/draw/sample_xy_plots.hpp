#pragma once
// Invented inputs for the x-y plot tests (holes and values are made up for the tests).
#include "draw/chain_plot_input.hpp"
#include "draw/loc_plot_input.hpp"
#include "draw/rate_plot_input.hpp"
#include "draw/subsidence_plot_input.hpp"

namespace atollog::draw::test {

inline SubsidencePlotInput sampleSubsidencePlot() {
    SubsidencePlotInput in;
    in.note = "test holes";
    SubsidencePlotHole a{"QX-1", {}, SubsidenceRateLine{80.0, 6.0, 2.0}};
    for (int i = 0; i < 5; ++i) {
        const double age = 0.2 + 0.3 * i;
        const double sub = 2.0 + 80.0 * age;
        a.points.push_back({"QX-1-" + std::to_string(i + 1), age, age - 0.04, age + 0.05, sub,
                            sub - 6.0, sub + 5.0});
    }
    SubsidencePlotHole b{"QX-2", {}, std::nullopt}; // too few points for a rate
    b.points.push_back({"QX-2-1", 0.5, 0.45, 0.6, 30.0, 25.0, 36.0});
    b.points.push_back({"QX-2-2", 0.9, 0.8, 1.0, 55.0, 50.0, 61.0});
    in.holes = {a, b};
    return in;
}

inline RatePlotInput sampleRatePlot() {
    RatePlotInput in;
    in.hole = "QX-1";
    in.intervals = {
        {"B AAA .. T BBB", RateIntervalKind::BetweenTies, 2.0, 14.0, 150.0, 300.0, 520.0},
        {"T BBB .. B CCC", RateIntervalKind::BetweenTies, 14.0, 31.0, 90.0, 160.0, 240.0},
        {"upper reef", RateIntervalKind::Package, 0.0, 31.0, 140.0, 210.0, 330.0},
    };
    return in;
}

inline LocPlotInput sampleLocPlot() {
    LocPlotInput in;
    in.x_hole = "QX-1";
    in.y_hole = "QX-2";
    in.fit_name = "York fit";
    // y = 2 + 1.5 x below, with one event far off the line.
    in.events = {
        {"B AAA", LocEventKind::Base, 4.0, 5.0, 5.0, 7.0, 9.0, 9.0, false},
        {"T BBB", LocEventKind::Top, 9.5, 10.5, 9.5, 15.5, 17.0, 15.5, false},
        {"B CCC", LocEventKind::Base, 15.0, 16.0, 16.0, 24.0, 26.0, 26.0, false},
        {"T DDD", LocEventKind::Top, 20.0, 21.0, 20.0, 8.0, 9.0, 8.0, true},
        {"B EEE", LocEventKind::Base, 25.0, 26.0, 26.0, 39.0, 41.0, 41.0, false},
    };
    LocPlotSegment g{5.0, 26.0, 1.5, 2.0, {}};
    for (int k = 0; k <= 4; ++k) {
        const double x = 5.0 + 21.0 * k / 4;
        g.band.push_back({x, 2.0 + 1.5 * x - 1.0, 2.0 + 1.5 * x + 1.0});
    }
    in.segments = {g};
    in.x_surfaces_m = {12.0, 300.0}; // the second lies off the plot
    in.y_surfaces_m = {20.0};
    return in;
}

inline ChainPlotInput sampleChainPlot() {
    ChainPlotInput in;
    in.note = "test chain";
    // age = 0.5 + distance / 80 (80 km/Myr = 80 mm/yr).
    in.points = {{"QX-1", 100.0, 5.0, 1.75, 0.05},
                 {"QX-2", 220.0, 5.0, 3.25, 0.08},
                 {"QX-3", 400.0, 5.0, 5.50, 0.10}};
    in.fit = ChainPlotFit{0.5, 1.0 / 80.0, 80.0, 4.0, "York fit"};
    return in;
}

} // namespace atollog::draw::test
