#include "draw/dash_pattern.hpp"

#include <cmath>
#include <stdexcept>

namespace atollog::draw {

DashLengths dashLengths(DashStyle style) {
    switch (style) {
    case DashStyle::Dashed:
        return {1.2, 0.8};
    case DashStyle::Dotted:
        return {0.3, 0.6};
    case DashStyle::Solid:
        break;
    }
    return {};
}

std::vector<std::vector<PointMm>> splitIntoDashes(const std::vector<PointMm> &points,
                                                  DashLengths dash) {
    if (!(dash.on_mm > 0.0) || !(dash.off_mm > 0.0)) {
        throw std::invalid_argument("splitIntoDashes: dash and gap lengths must be positive");
    }
    std::vector<std::vector<PointMm>> dashes;
    if (points.size() < 2) {
        return dashes;
    }
    bool drawing = true;               // in a dash (true) or a gap (false)
    double left_in_phase = dash.on_mm; // length remaining in the current dash or gap
    std::vector<PointMm> current{points.front()};
    for (std::size_t i = 1; i < points.size(); ++i) {
        PointMm from = points[i - 1];
        const PointMm to = points[i];
        double segment = std::hypot(to.x_mm - from.x_mm, to.y_mm - from.y_mm);
        while (segment > left_in_phase) {
            const double t = left_in_phase / segment;
            const PointMm cut{from.x_mm + t * (to.x_mm - from.x_mm),
                              from.y_mm + t * (to.y_mm - from.y_mm)};
            if (drawing) {
                current.push_back(cut);
                dashes.push_back(std::move(current));
                current.clear();
            } else {
                current = {cut};
            }
            segment -= left_in_phase;
            from = cut;
            drawing = !drawing;
            left_in_phase = drawing ? dash.on_mm : dash.off_mm;
        }
        left_in_phase -= segment;
        if (drawing) {
            current.push_back(to);
        }
    }
    if (drawing && current.size() >= 2) {
        dashes.push_back(std::move(current));
    }
    return dashes;
}

} // namespace atollog::draw
