#pragma once
// Inside lines of correlation: where logged surfaces cut the cross-plot, and the straight line
// of each piece (line_of_correlation.hpp says what and why).
#include "atollog/engine/line_of_correlation.hpp"

#include <cstddef>
#include <vector>

namespace atollog::detail {

/// A surface that cuts the x-sorted points before points[index], with its break on the x axis.
struct LocCut {
    std::size_t index = 0; ///< 1 .. points - 1
    double x_m = 0;
};

/// The cuts of the x hole's surfaces (depths on the x axis) and of the y hole's surfaces
/// (depths on the y axis) through points sorted by x. Surfaces that leave every point on one
/// side are left out.
std::vector<LocCut> surfaceCuts(const std::vector<LocPoint>& sorted_points,
                                const std::vector<double>& x_surfaces_m,
                                const std::vector<double>& y_surfaces_m);

/// Fills line.segments, line.breaks_x_m and each point's segment, residual, z and off_line;
/// line.points must be sorted by x and line.fit set.
void fitPieces(LineOfCorrelation& line, const std::vector<LocCut>& cuts, const LocSettings& s);

} // namespace atollog::detail
