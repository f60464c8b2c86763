#include "true_history.hpp"

namespace atollog::demo {
namespace {

double lerp(double a, double b, double fraction) { return a + (b - a) * fraction; }

const TrueSegment* segmentAt(const TrueHoleHistory& h, double depth_m) {
    for (const auto& s : h.reef_segments)
        if (depth_m >= s.top_m && depth_m < s.base_m) return &s;
    return nullptr;
}

} // namespace

double trueAgeMa(const TrueHoleHistory& h, double depth_m) {
    if (depth_m >= h.basalt_top_m)
        return h.basalt_top_age_ma + (depth_m - h.basalt_top_m) * kLavaPileMaPerM;
    const TrueSegment* s = segmentAt(h, depth_m < 0 ? 0 : depth_m);
    if (!s) return h.reef_segments.front().age_top_ma;
    return lerp(s->age_top_ma, s->age_base_ma, (depth_m - s->top_m) / (s->base_m - s->top_m));
}

std::optional<double> trueWaterDepthM(const TrueHoleHistory& h, double depth_m) {
    if (depth_m >= h.basalt_top_m) return std::nullopt;
    const TrueSegment* s = segmentAt(h, depth_m < 0 ? 0 : depth_m);
    if (!s) return std::nullopt;
    return lerp(s->water_depth_top_m, s->water_depth_base_m,
                (depth_m - s->top_m) / (s->base_m - s->top_m));
}

std::optional<double> trueDepthOfAgeM(const TrueHoleHistory& h, double age_ma) {
    for (const auto& s : h.reef_segments)
        if (age_ma >= s.age_top_ma && age_ma <= s.age_base_ma)
            return lerp(s.top_m, s.base_m,
                        (age_ma - s.age_top_ma) / (s.age_base_ma - s.age_top_ma));
    return std::nullopt;
}

} // namespace atollog::demo
