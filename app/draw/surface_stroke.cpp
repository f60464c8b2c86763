#include "draw/surface_stroke.hpp"

#include <cmath>
#include <numbers>

namespace atollog::draw {

namespace {
constexpr double kWaveAmplitude_mm = 0.5;
constexpr double kWaveLength_mm = 2.0;
constexpr double kWaveSample_mm = 0.25;
} // namespace

SurfaceLook surfaceLook(SurfaceKind kind) {
    switch (kind) {
    case SurfaceKind::Exposure:
        return {Stroke{colourFromHex(0xD55E00), 0.45, DashStyle::Dashed}, false};
    case SurfaceKind::Hardground:
        return {Stroke{colourFromHex(0x0072B2), 0.60, DashStyle::Dotted}, false};
    case SurfaceKind::Erosion:
        return {Stroke{colourFromHex(0x000000), 0.30, DashStyle::Solid}, true};
    case SurfaceKind::BasementContact:
        break;
    }
    return {Stroke{colourFromHex(0x000000), 0.70, DashStyle::Solid}, false};
}

std::vector<PointMm> surfacePath(const SurfaceLook &look, double x0_mm, double x1_mm, double y_mm) {
    if (!look.wavy || x1_mm <= x0_mm) {
        return {{x0_mm, y_mm}, {x1_mm, y_mm}};
    }
    std::vector<PointMm> points;
    const auto wave = [y_mm](double x) {
        return y_mm + kWaveAmplitude_mm * std::sin(2 * std::numbers::pi * x / kWaveLength_mm);
    };
    points.push_back({x0_mm, wave(x0_mm)});
    for (double x = std::floor(x0_mm / kWaveSample_mm + 1) * kWaveSample_mm; x < x1_mm;
         x += kWaveSample_mm) {
        points.push_back({x, wave(x)});
    }
    points.push_back({x1_mm, wave(x1_mm)});
    return points;
}

} // namespace atollog::draw
