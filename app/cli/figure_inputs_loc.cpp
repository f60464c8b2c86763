// The line-of-correlation cross-plot from a fitted line.
#include "cli/figure_inputs.hpp"

#include <cmath>
#include <stdexcept>

namespace atollog::cli {
namespace {

const EventLevel& levelOf(const CorrelationData& data, std::size_t hole, std::size_t event) {
    for (const EventLevel& l : data.levels)
        if (l.hole == hole && l.event == event) return l;
    throw std::logic_error("line: a shared event has no level in one of its holes");
}

draw::LocEventKind plotKind(SequenceEventKind k) {
    switch (k) {
    case SequenceEventKind::Base: return draw::LocEventKind::Base;
    case SequenceEventKind::Top: return draw::LocEventKind::Top;
    case SequenceEventKind::Dated: break;
    }
    return draw::LocEventKind::Dated;
}

/// The 95 % band of a fitted piece: y(x) +- 1.96 sd, var y(x) = 1/sum(W) + (x - xbar)^2 sd_b^2
/// with York weights W = 1/(y_sd^2 + b^2 x_sd^2) and xbar their weighted mean of x (York 1966,
/// the variance of a fitted line about its weighted centroid; with the observed rather than the
/// adjusted x, so approximate). Used for RMA pieces too, where it is only a guide.
std::vector<draw::LocBandPoint> pieceBand(const LineOfCorrelation& loc, std::size_t piece) {
    const LocSegment& g = loc.segments[piece];
    double sum_w = 0, sum_wx = 0;
    for (const LocPoint& p : loc.points) {
        if (p.segment != piece) continue;
        const double w = 1 / (p.y_sd_m * p.y_sd_m + g.slope * g.slope * p.x_sd_m * p.x_sd_m);
        sum_w += w;
        sum_wx += w * p.x_m;
    }
    std::vector<draw::LocBandPoint> band;
    if (!(sum_w > 0) || !std::isfinite(sum_w)) return band;
    const double xbar = sum_wx / sum_w;
    constexpr int kSteps = 24;
    for (int k = 0; k <= kSteps; ++k) {
        const double x = g.x_from_m + (g.x_to_m - g.x_from_m) * k / kSteps;
        const double y = g.intercept_m + g.slope * x;
        const double sd = std::sqrt(1 / sum_w + (x - xbar) * (x - xbar) * g.slope_sd * g.slope_sd);
        band.push_back({x, y - 1.96 * sd, y + 1.96 * sd});
    }
    return band;
}

} // namespace

draw::LocPlotInput locPlotInput(const LineOfCorrelation& loc, const CorrelationData& data,
                             std::size_t x_hole, std::size_t y_hole) {
    draw::LocPlotInput p;
    p.x_hole = loc.x_name;
    p.y_hole = loc.y_name;
    p.fit_name = loc.fit == LocFit::York ? "York fit per piece (York et al. 2004), 95 % band"
                                         : "reduced major axis per piece, approximate 95 % band";
    for (const LocPoint& pt : loc.points) {
        const EventLevel& x = levelOf(data, x_hole, pt.event);
        const EventLevel& y = levelOf(data, y_hole, pt.event);
        p.events.push_back({data.events[pt.event].id, plotKind(data.events[pt.event].kind),
                            x.shallow_m, x.deep_m, x.level_m, y.shallow_m, y.deep_m, y.level_m,
                            pt.off_line});
    }
    for (std::size_t i = 0; i < loc.segments.size(); ++i) {
        const LocSegment& g = loc.segments[i];
        if (!g.fitted || !(g.x_to_m > g.x_from_m)) continue;
        p.segments.push_back({g.x_from_m, g.x_to_m, g.slope, g.intercept_m, pieceBand(loc, i)});
    }
    p.x_surfaces_m = data.surfaces_m[x_hole];
    p.y_surfaces_m = data.surfaces_m[y_hole];
    return p;
}

} // namespace atollog::cli
