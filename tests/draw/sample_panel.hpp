#pragma once
// A hand-made correlation panel for the panel tests: three holes across the invented Maruvai
// atoll (lagoon, reef flat, outer rim; invented like all demo data), each a reef cap over older
// carbonate packages on the volcanic basement. Two ties (one missing from the middle hole, so
// its line skips it) and two isochrons with their 95 % depth ranges.

#include "draw/panel_input.hpp"

#include <algorithm>
#include <string>
#include <vector>

namespace atollog::draw::test {

struct SampleLayer {
    double base_m;
    RockKind rock;
    TextureClass texture;
    std::optional<SurfaceKind> surface;
};

/// A hole from its layers (each down to its base), 3 m runs with recovery cycling through
/// `recovery_pct`, and a sample 0.3 m below each run top.
inline HoleColumnInput samplePanelHole(const std::string &id, double collar_elev_m,
                                       double drilled_base_m,
                                       const std::vector<SampleLayer> &layers,
                                       const std::vector<int> &recovery_pct) {
    HoleColumnInput h;
    h.hole = id;
    h.collar_elev_m = collar_elev_m;
    h.drilled_base_m = drilled_base_m;
    double top = 0.0;
    for (const SampleLayer &l : layers) {
        h.intervals.push_back({top, l.base_m, l.rock, l.texture, l.surface});
        top = l.base_m;
    }
    for (int i = 0; 3.0 * i < drilled_base_m; ++i) {
        const double run_top = 3.0 * i;
        const double run_base = std::min(run_top + 3.0, drilled_base_m);
        const double pct = recovery_pct[static_cast<std::size_t>(i) % recovery_pct.size()];
        const std::string run = "R" + std::to_string(i + 1);
        h.runs.push_back({run, run_top, run_base, (run_base - run_top) * pct / 100.0});
        h.samples.push_back({id + "-" + run + "-a", run_top + 0.3});
    }
    return h;
}

inline PanelInput samplePanel() {
    using R = RockKind;
    using T = TextureClass;
    using S = SurfaceKind;
    PanelInput in;
    in.title = "Maruvai atoll: lagoon to outer rim";
    in.columns.push_back(samplePanelHole("MRV-L1", 1.4, 48.0,
                                         {{0.8, R::Sand, T::None, std::nullopt},
                                          {6.5, R::Limestone, T::Packstone, std::nullopt},
                                          {11.0, R::Limestone, T::Framestone, S::Exposure},
                                          {17.5, R::Limestone, T::Grainstone, std::nullopt},
                                          {24.0, R::Limestone, T::Wackestone, S::Hardground},
                                          {31.0, R::Dolostone, T::Crystalline, std::nullopt},
                                          {38.5, R::Limestone, T::Boundstone, S::BasementContact},
                                          {48.0, R::Basalt, T::None, std::nullopt}},
                                         {70, 45, 85, 60, 30, 90}));
    in.columns.push_back(samplePanelHole("MRV-F2", 3.6, 56.0,
                                         {{0.5, R::Soil, T::None, std::nullopt},
                                          {9.0, R::Limestone, T::Framestone, S::Exposure},
                                          {13.5, R::Limestone, T::Rudstone, std::nullopt},
                                          {21.0, R::Limestone, T::Bindstone, S::Erosion},
                                          {27.5, R::Limestone, T::Packstone, std::nullopt},
                                          {28.3, R::Cavity, T::None, std::nullopt},
                                          {36.0, R::Dolostone, T::Packstone, std::nullopt},
                                          {44.0, R::Limestone, T::Floatstone, S::BasementContact},
                                          {47.0, R::Volcaniclastic, T::None, std::nullopt},
                                          {56.0, R::Basalt, T::None, std::nullopt}},
                                         {55, 80, 40, 95, 65}));
    in.columns.push_back(samplePanelHole("MRV-R3", 2.2, 62.0,
                                         {{12.5, R::Limestone, T::Framestone, S::Exposure},
                                          {16.0, R::Gravel, T::None, std::nullopt},
                                          {25.0, R::Limestone, T::Bafflestone, std::nullopt},
                                          {33.0, R::Limestone, T::Grainstone, S::Hardground},
                                          {37.5, R::Clay, T::None, std::nullopt},
                                          {50.5, R::Limestone, T::Boundstone, S::BasementContact},
                                          {62.0, R::Basalt, T::None, std::nullopt}},
                                         {85, 50, 70, 35, 90, 60}));

    // Ties: observed brackets (shallow, deep) and levels, m below each collar.
    in.ties.push_back({"top Maruvaiella alta", {{0, 9.6, 10.9, 10.2}, {1, 7.4, 8.6, 8.0},
                                                {2, 10.8, 12.1, 11.5}}});
    // Not found in the reef-flat hole: the line passes it.
    in.ties.push_back({"base Tavoripora rosea", {{0, 27.2, 29.4, 28.5}, {2, 30.1, 31.8, 31.0}}});
    in.isochrons.push_back({"0.125 Ma", 0.125, {{0, 9.0, 11.2, 13.6}, {1, 7.1, 8.9, 11.3},
                                                {2, 10.4, 12.2, 14.9}}});
    in.isochrons.push_back({"0.400 Ma", 0.400, {{0, 31.5, 34.0, 36.9}, {1, 36.5, 39.2, 42.3},
                                                {2, 41.0, 44.6, 48.2}}});
    return in;
}

inline PanelView samplePanelView() {
    PanelView v;
    v.scale_ratio = 500.0;
    v.date_text = "2031-04-17";
    return v;
}

} // namespace atollog::draw::test
