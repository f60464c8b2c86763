#include "atollog/engine/line_of_correlation.hpp"

#include "atollog/engine/number_text.hpp"
#include "line_of_correlation_pieces.hpp"

#include <algorithm>
#include <cmath>
#include <optional>
#include <set>
#include <stdexcept>
#include <string>
#include <tuple>

namespace atollog {

namespace {

[[noreturn]] void fail(const std::string& what) {
    throw std::invalid_argument("line of correlation: " + what);
}

void validateSettings(const LocSettings& s) {
    if (!std::isfinite(s.off_line_z) || s.off_line_z <= 0)
        fail("off_line_z is " + numberText(s.off_line_z) + "; give a finite number > 0");
    if (!std::isfinite(s.sd_floor_m) || s.sd_floor_m <= 0)
        fail("sd_floor_m is " + numberText(s.sd_floor_m) + "; give a finite number > 0");
}

void requireHole(const CorrelationData& d, std::size_t hole) {
    if (hole >= d.holes.size())
        fail("hole index " + std::to_string(hole) + " is beyond the " +
             std::to_string(d.holes.size()) + " holes");
}

/// Each hole's bracket of each event it observed (nullopt where it did not).
std::vector<std::optional<EventLevel>> levelsOf(const CorrelationData& d, std::size_t hole) {
    std::vector<std::optional<EventLevel>> out(d.events.size());
    for (const EventLevel& l : d.levels)
        if (l.hole == hole)
            out[l.event] = l;
    return out;
}

/// A bracket read as a uniform: its mean and sd (width / sqrt 12), the sd held at the floor.
void bracketMoments(const EventLevel& l, double floor_m, double& mean_m, double& sd_m) {
    mean_m = l.shallow_m + 0.5 * (l.deep_m - l.shallow_m);
    sd_m = std::max(floor_m, (l.deep_m - l.shallow_m) / std::sqrt(12.0));
}

/// Sorts the points, cuts them at the surfaces, fits the pieces; refuses a non-finite result.
void finish(LineOfCorrelation& line, const std::vector<double>& x_surfaces_m,
            const std::vector<double>& y_surfaces_m, const LocSettings& s) {
    std::sort(line.points.begin(), line.points.end(), [](const LocPoint& a, const LocPoint& b) {
        return std::tie(a.x_m, a.y_m, a.event) < std::tie(b.x_m, b.y_m, b.event);
    });
    std::vector<detail::LocCut> cuts;
    if (s.break_at_surfaces)
        cuts = detail::surfaceCuts(line.points, x_surfaces_m, y_surfaces_m);
    detail::fitPieces(line, cuts, s);
    auto finite = [](double v) { return std::isfinite(v); };
    for (const LocPoint& p : line.points)
        if (!finite(p.residual_m) || !finite(p.z))
            fail(line.x_name + " against " + line.y_name +
                 ": a residual overflows a double; the depths differ by too many orders of "
                 "magnitude");
}

} // namespace

LineOfCorrelation lineOfCorrelation(const CorrelationData& data, std::size_t x_hole,
                                    std::size_t y_hole, const LocSettings& s) {
    validateCorrelationData(data);
    validateSettings(s);
    requireHole(data, x_hole);
    requireHole(data, y_hole);
    if (x_hole == y_hole)
        fail("hole '" + data.holes[x_hole] + "' is given as both x and y; choose two holes");
    LineOfCorrelation line;
    line.x_name = data.holes[x_hole];
    line.y_name = data.holes[y_hole];
    line.fit = s.fit;
    const auto in_x = levelsOf(data, x_hole), in_y = levelsOf(data, y_hole);
    for (std::size_t e = 0; e < data.events.size(); ++e) {
        if (!in_x[e] || !in_y[e])
            continue;
        LocPoint p;
        p.event = e;
        bracketMoments(*in_x[e], s.sd_floor_m, p.x_m, p.x_sd_m);
        bracketMoments(*in_y[e], s.sd_floor_m, p.y_m, p.y_sd_m);
        line.points.push_back(p);
    }
    if (line.points.size() < 3)
        fail("holes '" + line.x_name + "' and '" + line.y_name + "' share " +
             std::to_string(line.points.size()) +
             " events; a line of correlation needs at least 3");
    finish(line, data.surfaces_m[x_hole], data.surfaces_m[y_hole], s);
    return line;
}

LineOfCorrelation lineAgainstComposite(const CorrelationData& data,
                                       const std::vector<std::size_t>& composite_order,
                                       std::size_t hole, const LocSettings& s) {
    validateCorrelationData(data);
    validateSettings(s);
    requireHole(data, hole);
    std::set<std::size_t> seen;
    for (std::size_t e : composite_order) {
        if (e >= data.events.size())
            fail("the composite lists event index " + std::to_string(e) + ", beyond the " +
                 std::to_string(data.events.size()) + " events");
        if (!seen.insert(e).second)
            fail("the composite lists event '" + data.events[e].id + "' twice");
    }
    LineOfCorrelation line;
    line.x_name = "composite";
    line.y_name = data.holes[hole];
    line.fit = s.fit;
    const auto in_hole = levelsOf(data, hole);
    const std::size_t n = composite_order.size();
    for (std::size_t pos = 0; pos < n; ++pos) {
        const std::size_t e = composite_order[pos];
        if (!in_hole[e])
            continue;
        LocPoint p;
        p.event = e;
        // Oldest first in the list; counted from the youngest end so x grows down-section.
        p.x_m = static_cast<double>(n - 1 - pos);
        p.x_sd_m = 1.0 / std::sqrt(12.0);
        bracketMoments(*in_hole[e], s.sd_floor_m, p.y_m, p.y_sd_m);
        line.points.push_back(p);
    }
    if (line.points.size() < 3)
        fail("hole '" + line.y_name + "' has " + std::to_string(line.points.size()) +
             " of the composite's " + std::to_string(n) +
             " events; a line against the composite needs at least 3");
    finish(line, {}, data.surfaces_m[hole], s);
    return line;
}

} // namespace atollog
