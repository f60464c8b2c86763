#pragma once
// A hand-made hole for the column tests: TAV-2 on the invented islet of Taveru (Vessari
// archipelago, invented like all demo data). A Holocene-style reef cap over older carbonate
// packages separated by exposure surfaces, a dolomitised interval with a cavity, and the
// volcanic basement; runs of 3 m with the patchy recovery usual in reef rock.

#include "draw/hole_column_input.hpp"

#include <cmath>
#include <string>

namespace atollog::draw::test {

inline HoleColumnInput sampleHoleColumn() {
    using R = RockKind;
    using T = TextureClass;
    using S = SurfaceKind;
    HoleColumnInput in;
    in.hole = "TAV-2";
    in.collar_elev_m = 3.2;
    in.drilled_base_m = 62.4;
    in.intervals = {
        {0.0, 0.6, R::Soil, T::None, std::nullopt},
        {0.6, 4.2, R::Limestone, T::Framestone, S::Exposure},
        {4.2, 7.5, R::Limestone, T::Grainstone, std::nullopt},
        {7.5, 9.8, R::Limestone, T::Packstone, S::Hardground},
        {9.8, 14.0, R::Limestone, T::Bafflestone, std::nullopt},
        {14.0, 15.2, R::Sand, T::None, std::nullopt},
        {15.2, 19.5, R::Limestone, T::Rudstone, S::Exposure},
        {19.5, 24.0, R::Limestone, T::Wackestone, std::nullopt},
        {24.0, 27.0, R::Dolostone, T::Crystalline, std::nullopt},
        {27.0, 27.8, R::Cavity, T::None, std::nullopt},
        {27.8, 33.0, R::Dolostone, T::Packstone, S::Erosion},
        {33.0, 36.5, R::Limestone, T::Mudstone, std::nullopt},
        {36.5, 38.0, R::Clay, T::None, std::nullopt},
        {38.0, 43.0, R::Limestone, T::Floatstone, std::nullopt},
        {43.0, 48.5, R::Limestone, T::Boundstone, S::Exposure},
        {48.5, 50.0, R::Gravel, T::None, S::BasementContact},
        {50.0, 53.0, R::Volcaniclastic, T::None, std::nullopt},
        {53.0, 62.0, R::Basalt, T::None, std::nullopt},
    };
    // 3 m runs; recovery in per cent, run R5 (12-15 m) at exactly 60 %.
    const int recovery_pct[] = {45, 80, 35, 70, 60, 25, 90, 75, 55,  40, 85,
                                65, 50, 95, 70, 30, 60, 80, 90, 100, 100};
    for (int i = 0; i < 21; ++i) {
        const double top = 3.0 * i;
        const double base = std::min(top + 3.0, in.drilled_base_m);
        in.runs.push_back(
            {"R" + std::to_string(i + 1), top, base, (base - top) * recovery_pct[i] / 100.0});
    }
    // A sample near the top of every run's recovered part, two in the long reef runs.
    for (const ColumnRun &r : in.runs) {
        in.samples.push_back({r.id + "-a", r.top_m + 0.2});
        if (r.recovered_m > 1.5) {
            in.samples.push_back({r.id + "-b", r.top_m + r.recovered_m - 0.3});
        }
    }
    return in;
}

} // namespace atollog::draw::test
