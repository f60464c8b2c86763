#include "sea_level.hpp"

#include "rounding.hpp"

#include <cmath>

namespace atollog::demo {
namespace {

constexpr double kCycleKa = 120.0;
constexpr double kLowstandM = -122.0;
// Highstand level of each cycle, youngest (the present) first; invented.
constexpr double kHighstandM[] = {0.0, 4.0, -3.0, 2.0, -1.0, 1.0};

double levelAtM(double age_ka) {
    const int cycle = static_cast<int>(age_ka / kCycleKa);
    const double a = age_ka - cycle * kCycleKa; // age within the cycle
    const double high = kHighstandM[cycle];
    const double next_high = kHighstandM[cycle + 1];
    if (a <= 8.0) return high;                                              // highstand
    if (a <= 20.0) return high + (kLowstandM - high) * (a - 8.0) / 12.0;    // termination
    return kLowstandM + (next_high - kLowstandM) * (a - 20.0) / (kCycleKa - 20.0); // slow fall
}

} // namespace

std::vector<SeaLevelPoint> syntheticSeaLevel() {
    std::vector<SeaLevelPoint> points;
    for (int age_ka = 0; age_ka < 600; age_ka += 4) {
        SeaLevelPoint p;
        p.age_ma = age_ka / 1000.0;
        p.level_m = roundDp(levelAtM(age_ka), 1);
        p.level_sd_m = roundDp(3.0 + 0.02 * age_ka, 1); // older levels are less certain
        points.push_back(p);
    }
    return points;
}

} // namespace atollog::demo
