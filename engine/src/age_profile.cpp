#include "age_profile.hpp"

#include <algorithm>
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
        const double s_top = surfaces_m[s_first];
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
        const double age_above = a_[i] + r_above * (s_top - z0);
        const double age_below = a_[i + 1] - r_below * (z1 - sd);
        outcomes_[deepest].resolved = s - s_first == 1;
        if (!(age_below > age_above)) { // the lines cross: no time is missing here
            pieces_.push_back({z0, z0, a_[i], linear});
            continue;
        }
        pieces_.push_back({z0, z0, a_[i], r_above});
        if (s - s_first == 1) {
            outcomes_[deepest].profile_jump_ma = age_below - age_above;
            outcomes_[deepest].jump_ma = age_below - age_above;
            pieces_.push_back({sd, z1, a_[i + 1], r_below});
            continue;
        }
        splitBetweenSurfaces(draw, surfaces_m, s_first, deepest, age_above, age_below,
                             r_above, r_below);
        pieces_.push_back({sd, z1, a_[i + 1], r_below});
    }
    // Below the last point: extrapolated downward with the deepest segment's rate.
    pieces_.push_back({z_[n - 1], z_[n - 1], a_[n - 1], last_rate});
}

// Several surfaces between two ties: the draw says how much time passes from just above the
// first to just below the last (total), not where it goes. The rock between the surfaces
// accretes at a rate drawn uniformly between the neighbouring segments' rates (at most all of
// the total); the rest is shared among the surfaces' jumps by a flat Dirichlet (spacings of
// sorted uniforms). Why not all at the deepest surface: that puts every missing year in one
// place and makes the ages between the surfaces look surer than anything in the data allows.
void AgeProfile::splitBetweenSurfaces(const TieDraw& draw, const std::vector<double>& surfaces_m,
                                      std::size_t first, std::size_t last, double age_above,
                                      double age_below, double r_above, double r_below) {
    auto u = [&](std::size_t k) { return k < draw.split_u.size() ? draw.split_u[k] : 0.5; };
    const double total = age_below - age_above;
    const double thickness = surfaces_m[last] - surfaces_m[first];
    double r_mid = r_above + u(first) * (r_below - r_above);
    if (thickness > 0)
        r_mid = std::min(r_mid, total / thickness);
    else
        r_mid = 0;
    const double jumps = std::max(0.0, total - r_mid * thickness);
    // k jumps from k - 1 sorted uniforms.
    cuts_.clear();
    for (std::size_t k = first + 1; k <= last; ++k)
        cuts_.push_back(u(k));
    std::sort(cuts_.begin(), cuts_.end());
    cuts_.push_back(1.0);
    double previous_cut = 0, age = age_above;
    for (std::size_t k = first; k <= last; ++k) {
        const double share = cuts_[k - first] - previous_cut;
        previous_cut = cuts_[k - first];
        const double jump = jumps * share;
        outcomes_[k].profile_jump_ma = jump;
        age += jump;
        if (k < last) {
            pieces_.push_back({surfaces_m[k], surfaces_m[k], age, r_mid});
            age += r_mid * (surfaces_m[k + 1] - surfaces_m[k]);
        }
    }
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
