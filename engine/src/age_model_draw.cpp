#include "age_model_draw.hpp"

#include "draw_seeds.hpp"
#include "truncated_normal.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace atollog::detail {

namespace {

constexpr double kMinusInf = -std::numeric_limits<double>::infinity();

/// A gridded (or any non-normal) distribution truncated below, through its cdf and quantile.
TruncatedDraw truncatedGeneric(const AgeDistribution& d, double floor, double u) {
    const double below = floor == kMinusInf ? 0.0 : d.cdf(floor);
    const double mass = 1.0 - below;
    if (!(mass > 0))
        return {floor, kMinusInf};
    const double p = std::min(below + u * mass, std::nextafter(1.0, 0.0));
    return {std::max(d.quantile(std::max(p, 0x1.0p-60)), floor), std::log(mass)};
}

} // namespace

void drawTies(const std::vector<PreparedTie>& ties, std::mt19937_64& rng, TieDraw& out,
              int skip) {
    const int n = static_cast<int>(ties.size());
    out.depth_m.resize(ties.size());
    out.age_ma.resize(ties.size());
    out.depth_order.clear();
    for (int i = 0; i < n; ++i) {
        if (i == skip)
            continue;
        const PreparedTie& t = ties[static_cast<std::size_t>(i)];
        const double width = t.deep_m - t.shallow_m;
        out.depth_m[static_cast<std::size_t>(i)] =
            width > 0 ? t.shallow_m + openUniform(rng) * width : t.shallow_m;
        // Insertion sort: ties come in midpoint order, so most draws move nothing.
        auto pos = out.depth_order.end();
        while (pos != out.depth_order.begin() &&
               out.depth_m[static_cast<std::size_t>(*(pos - 1))] >
                   out.depth_m[static_cast<std::size_t>(i)])
            --pos;
        out.depth_order.insert(pos, i);
    }
    double floor = kMinusInf;
    double log_weight = 0;
    for (int i : out.depth_order) {
        const PreparedTie& t = ties[static_cast<std::size_t>(i)];
        TruncatedDraw d;
        if (t.open_floor) {
            // A floor only: it sits at its lowest age and costs the draw nothing.
            d = TruncatedDraw{std::max(t.age.support_min_ma(), floor), 0.0};
        } else if (t.exact_age) {
            d = t.age.mean_ma() >= floor ? TruncatedDraw{t.age.mean_ma(), 0.0}
                                         : TruncatedDraw{floor, kMinusInf};
        } else if (t.age.isNormal()) {
            d = truncatedNormalDraw(t.age.mean_ma(), t.age.sd_ma(), floor, openUniform(rng));
        } else {
            d = truncatedGeneric(t.age, floor, openUniform(rng));
        }
        out.age_ma[static_cast<std::size_t>(i)] = d.value;
        log_weight += d.log_mass;
        floor = d.value;
    }
    out.log_weight = log_weight;
}

} // namespace atollog::detail
