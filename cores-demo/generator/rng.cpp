#include "rng.hpp"

#include <cmath>
#include <numbers>

namespace atollog::demo {

double DemoRng::uniform01() {
    constexpr double kTwoToMinus53 = 1.0 / 9007199254740992.0;
    return static_cast<double>(engine_() >> 11) * kTwoToMinus53;
}

double DemoRng::uniform(double lo, double hi) { return lo + (hi - lo) * uniform01(); }

double DemoRng::normal(double mean, double sd) {
    // 1 - u keeps the logarithm finite: uniform01() can return 0 but never 1.
    const double u1 = 1.0 - uniform01();
    const double u2 = uniform01();
    const double z = std::sqrt(-2.0 * std::log(u1)) * std::cos(2.0 * std::numbers::pi * u2);
    return mean + sd * z;
}

int DemoRng::integer(int lo, int hi) {
    const double span = static_cast<double>(hi - lo + 1);
    const int k = lo + static_cast<int>(std::floor(uniform01() * span));
    return k > hi ? hi : k;
}

bool DemoRng::chance(double probability) { return uniform01() < probability; }

} // namespace atollog::demo
