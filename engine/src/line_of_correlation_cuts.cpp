#include "line_of_correlation_pieces.hpp"

#include <cstddef>

namespace atollog::detail {

namespace {

/// An x-hole surface: the points shallower than it come first in x order, so the cut is the
/// first point at or below it (a level on a surface belongs below it).
std::size_t xSurfaceCut(const std::vector<LocPoint>& p, double s_m) {
    std::size_t k = 0;
    while (k < p.size() && p[k].x_m < s_m)
        ++k;
    return k;
}

/// A y-hole surface: the y values need not rise strictly with x (scatter, an off-line point),
/// so the cut is where the fewest points fall on the wrong side: cost(k) = points before k at
/// or below the surface + points from k on above it. The shallowest minimum wins.
std::size_t ySurfaceCut(const std::vector<LocPoint>& p, double s_m) {
    std::size_t above_total = 0;
    for (const LocPoint& q : p)
        above_total += q.y_m < s_m ? 1 : 0;
    // cost(0) = every point above the surface stands after the cut.
    std::size_t cost = above_total, best_cost = cost, best_k = 0;
    for (std::size_t k = 1; k <= p.size(); ++k) {
        // Moving the cut past point k - 1 puts it before the cut.
        if (p[k - 1].y_m < s_m)
            --cost;
        else
            ++cost;
        if (cost < best_cost) {
            best_cost = cost;
            best_k = k;
        }
    }
    return best_k;
}

} // namespace

std::vector<LocCut> surfaceCuts(const std::vector<LocPoint>& p,
                                const std::vector<double>& x_surfaces_m,
                                const std::vector<double>& y_surfaces_m) {
    std::vector<LocCut> cuts;
    const std::size_t n = p.size();
    for (double s : x_surfaces_m) {
        const std::size_t k = xSurfaceCut(p, s);
        if (k > 0 && k < n)
            cuts.push_back({k, s});
    }
    for (double s : y_surfaces_m) {
        const std::size_t k = ySurfaceCut(p, s);
        if (k > 0 && k < n)
            cuts.push_back({k, 0.5 * (p[k - 1].x_m + p[k].x_m)});
    }
    return cuts;
}

} // namespace atollog::detail
