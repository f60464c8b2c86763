#include "line_of_correlation_pieces.hpp"

#include "atollog/engine/least_squares_line.hpp"
#include "atollog/engine/reduced_major_axis.hpp"
#include "atollog/engine/york_fit.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <set>
#include <vector>

namespace atollog::detail {

namespace {

/// Fits one piece's points (already all of one segment); returns the segment with its line, or
/// fitted = false where a line is undefined (see line_of_correlation.hpp).
LocSegment fitPiece(const std::vector<LocPoint>& pts, LocFit how) {
    LocSegment seg;
    seg.points = static_cast<int>(pts.size());
    seg.x_from_m = pts.front().x_m;
    seg.x_to_m = pts.back().x_m;
    if (pts.size() < 3 || seg.x_from_m == seg.x_to_m)
        return seg;
    std::vector<double> x, xs, y, ys;
    for (const LocPoint& q : pts) {
        x.push_back(q.x_m);
        xs.push_back(q.x_sd_m);
        y.push_back(q.y_m);
        ys.push_back(q.y_sd_m);
    }
    if (how == LocFit::York) {
        const YorkFit f = yorkFit(x, xs, y, ys);
        seg.slope = f.slope;
        seg.slope_sd = f.slope_sd;
        seg.intercept_m = f.intercept;
        seg.intercept_sd_m = f.intercept_sd;
        seg.mswd = f.mswd;
    } else {
        // r = 0 (with y not constant) leaves the sign of an RMA slope undefined: no line
        // rather than an exception that would lose the other pieces.
        const bool y_constant =
            std::all_of(y.begin(), y.end(), [&](double v) { return v == y[0]; });
        if (!y_constant && leastSquaresLine(x, y).r == 0)
            return seg;
        const ReducedMajorAxis f = reducedMajorAxis(x, y);
        seg.slope = f.slope;
        seg.slope_sd = f.slope_sd;
        seg.intercept_m = f.intercept;
        seg.intercept_sd_m = f.intercept_sd;
    }
    seg.fitted = true;
    return seg;
}

} // namespace

void fitPieces(LineOfCorrelation& line, const std::vector<LocCut>& cuts, const LocSettings& s) {
    std::set<std::size_t> starts = {0};
    std::set<double> breaks;
    for (const LocCut& c : cuts) {
        starts.insert(c.index);
        breaks.insert(c.x_m);
    }
    line.breaks_x_m.assign(breaks.begin(), breaks.end());
    line.segments.clear();
    std::vector<std::size_t> bounds(starts.begin(), starts.end());
    bounds.push_back(line.points.size());
    for (std::size_t b = 0; b + 1 < bounds.size(); ++b) {
        const std::vector<LocPoint> piece(
            line.points.begin() + static_cast<std::ptrdiff_t>(bounds[b]),
            line.points.begin() + static_cast<std::ptrdiff_t>(bounds[b + 1]));
        const LocSegment seg = fitPiece(piece, line.fit);
        const std::size_t index = line.segments.size();
        for (std::size_t i = bounds[b]; i < bounds[b + 1]; ++i) {
            LocPoint& q = line.points[i];
            q.segment = index;
            q.residual_m = 0;
            q.z = 0;
            q.off_line = false;
            if (!seg.fitted)
                continue;
            q.residual_m = q.y_m - (seg.intercept_m + seg.slope * q.x_m);
            // The point's error across the line (the York weight's denominator): y_sd > 0
            // always (the floor), so this is never 0.
            const double across = std::hypot(q.y_sd_m, seg.slope * q.x_sd_m);
            q.z = q.residual_m / across;
            q.off_line = std::fabs(q.z) >= s.off_line_z;
        }
        line.segments.push_back(seg);
    }
}

} // namespace atollog::detail
