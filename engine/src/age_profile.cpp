#include "age_profile.hpp"

#include <limits>

namespace atollog::detail {

namespace {

// Two ties closer than this give no usable rate (a zero-thickness segment).
constexpr double kMinSegment_m = 1e-9;

} // namespace

void AgeProfile::build(const TieDraw& draw, const std::vector<double>& surfaces_m) {
    z_.clear();
    a_.clear();
    for (int i : draw.depth_order) {
        z_.push_back(draw.depth_m[static_cast<std::size_t>(i)]);
        a_.push_back(draw.age_ma[static_cast<std::size_t>(i)]);
    }
    const std::size_t n = z_.size();
    outcomes_.assign(surfaces_m.size(), SurfaceOutcome{});
    pieces_.clear();

    // Rate of segment i (points i, i+1); false when it has no thickness or does not exist.
    auto rate = [&](std::ptrdiff_t i, double& r) {
        if (i < 0 || static_cast<std::size_t>(i + 1) >= n)
            return false;
        const double dz = z_[static_cast<std::size_t>(i) + 1] - z_[static_cast<std::size_t>(i)];
        if (!(dz > kMinSegment_m))
            return false;
        r = (a_[static_cast<std::size_t>(i) + 1] - a_[static_cast<std::size_t>(i)]) / dz;
        return true;
    };
    double first_rate = 0, last_rate = 0;
    for (std::ptrdiff_t i = 0; i + 1 < static_cast<std::ptrdiff_t>(n); ++i)
        if (rate(i, first_rate))
            break;
    for (std::ptrdiff_t i = static_cast<std::ptrdiff_t>(n) - 2; i >= 0; --i)
        if (rate(i, last_rate))
            break;

    // Above the first point: extrapolated upward (only reached inside the top tie's bracket,
    // or not at all when the core top is a tie).
    pieces_.push_back({-std::numeric_limits<double>::infinity(), z_[0], a_[0], first_rate});
    std::size_t s = 0;
    while (s < surfaces_m.size() && surfaces_m[s] <= z_[0])
        ++s; // above every tie: nothing to measure a jump against
    for (std::size_t i = 0; i + 1 < n; ++i) {
        const double z0 = z_[i], z1 = z_[i + 1];
        // Surfaces in (z0, z1]: at a tie's own depth a surface belongs to the segment above,
        // because the tie then dates the rock just below it.
        const std::size_t s_first = s;
        while (s < surfaces_m.size() && surfaces_m[s] <= z1)
            ++s;
        if (!(z1 > z0))
            continue;
        double linear = 0;
        rate(static_cast<std::ptrdiff_t>(i), linear);
        if (s == s_first) {
            pieces_.push_back({z0, z0, a_[i], linear});
            continue;
        }
        const std::size_t deepest = s - 1;
        const double sd = surfaces_m[deepest];
        double r_above = 0, r_below = 0;
        const bool has_above = rate(static_cast<std::ptrdiff_t>(i) - 1, r_above);
        const bool has_below = rate(static_cast<std::ptrdiff_t>(i) + 1, r_below);
        if (!has_above && has_below)
            r_above = r_below;
        if (!has_below && has_above)
            r_below = r_above;
        if (!has_above && !has_below) {
            pieces_.push_back({z0, z0, a_[i], linear});
            continue;
        }
        const double age_above = a_[i] + r_above * (sd - z0);
        const double age_below = a_[i + 1] - r_below * (z1 - sd);
        outcomes_[deepest].resolved = s - s_first == 1;
        if (!(age_below > age_above)) { // the lines cross: no time is missing here
            pieces_.push_back({z0, z0, a_[i], linear});
            continue;
        }
        outcomes_[deepest].profile_jump_ma = age_below - age_above;
        if (s - s_first == 1)
            outcomes_[deepest].jump_ma = age_below - age_above;
        pieces_.push_back({z0, z0, a_[i], r_above});
        pieces_.push_back({sd, z1, a_[i + 1], r_below});
    }
    // Below the last point: extrapolated downward with the deepest segment's rate.
    pieces_.push_back({z_[n - 1], z_[n - 1], a_[n - 1], last_rate});
}

double AgeProfile::ageAt(double depth_m, bool above) const {
    std::size_t k = 0;
    while (k + 1 < pieces_.size() &&
           (above ? pieces_[k + 1].from_m < depth_m : pieces_[k + 1].from_m <= depth_m))
        ++k;
    const Piece& p = pieces_[k];
    return p.anchor_age_ma + p.rate_ma_per_m * (depth_m - p.anchor_m);
}

} // namespace atollog::detail
