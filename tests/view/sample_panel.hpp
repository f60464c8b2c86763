#pragma once
// An invented three-hole panel for the viewer tests: holes AX1-AX3 on an imaginary atoll, two
// tie events seen in all three holes, one seen in two, and one isochron. Numbers are made up.
#include "draw/panel_input.hpp"

#include <algorithm>
#include <string>

namespace atollog::view::test {

inline draw::HoleColumnInput sampleHole(const std::string &id, double collar_m, double base_m,
                                        double shift_m) {
    draw::HoleColumnInput h;
    h.hole = id;
    h.collar_elev_m = collar_m;
    h.drilled_base_m = base_m;
    for (int r = 0; r * 5.0 < base_m; ++r) {
        const double top = r * 5.0, bottom = std::min(base_m, top + 5.0);
        h.runs.push_back({id + "-R" + std::to_string(r + 1), top, bottom,
                          (bottom - top) * (r % 3 == 0 ? 0.9 : 0.6)});
    }
    using draw::RockKind;
    using draw::TextureClass;
    h.intervals = {
        {0.0, 6.0 + shift_m, RockKind::Limestone, TextureClass::Grainstone, {}},
        {6.0 + shift_m, 15.0 + shift_m, RockKind::Limestone, TextureClass::Framestone,
         draw::SurfaceKind::Exposure},
        {15.0 + shift_m, 26.0 + shift_m, RockKind::Limestone, TextureClass::Packstone, {}},
        {26.0 + shift_m, base_m - 4.0, RockKind::Dolostone, TextureClass::Crystalline,
         draw::SurfaceKind::BasementContact},
        {base_m - 4.0, base_m, RockKind::Basalt, TextureClass::None, {}},
    };
    for (int s = 0; s * 2.5 + 1.0 < base_m - 4.0; ++s) {
        h.samples.push_back({id + "-S" + std::to_string(s + 1), s * 2.5 + 1.0});
    }
    return h;
}

inline draw::PanelInput samplePanel() {
    draw::PanelInput in;
    in.title = "Invented atoll";
    in.columns = {sampleHole("AX1", 2.0, 40.0, 0.0), sampleHole("AX2", 4.5, 36.0, -2.0),
                  sampleHole("AX3", 1.0, 44.0, 3.0)};
    in.ties = {
        {"B ALPHA", {{0, 11.5, 13.0, 12.3}, {1, 9.0, 10.5, 10.1}, {2, 13.2, 15.0, 14.0}}},
        {"T BETA", {{0, 20.0, 21.5, 20.5}, {1, 17.0, 18.8, 18.0}, {2, 22.5, 24.0, 23.2}}},
        {"date AX1-S9", {{0, 21.0, 21.0, 21.0}, {2, 24.5, 24.5, 24.5}}},
    };
    in.isochrons = {
        {"1 Ma", 1.0, {{0, 24.0, 26.0, 28.0}, {1, 21.0, 23.0, 25.5}, {2, 27.0, 29.5, 31.0}}}};
    return in;
}

} // namespace atollog::view::test
