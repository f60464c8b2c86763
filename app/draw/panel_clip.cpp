#include "draw/panel_clip.hpp"

namespace atollog::draw {

namespace {

PointMm atY(PointMm a, PointMm b, double y) {
    const double t = (y - a.y_mm) / (b.y_mm - a.y_mm);
    return {a.x_mm + t * (b.x_mm - a.x_mm), y};
}

/// Keeps the side of the line y = edge where `inside` holds.
template <class Inside>
std::vector<PointMm> clipAgainst(const std::vector<PointMm> &in, double edge, Inside inside) {
    std::vector<PointMm> out;
    for (std::size_t i = 0; i < in.size(); ++i) {
        const PointMm cur = in[i];
        const PointMm prev = in[(i + in.size() - 1) % in.size()];
        const bool cur_in = inside(cur.y_mm), prev_in = inside(prev.y_mm);
        if (cur_in != prev_in) {
            out.push_back(atY(prev, cur, edge));
        }
        if (cur_in) {
            out.push_back(cur);
        }
    }
    return out;
}

} // namespace

std::vector<PointMm> clipPolygonToStrip(const std::vector<PointMm> &polygon, double top_mm,
                                        double bottom_mm) {
    if (polygon.size() < 3) {
        return {};
    }
    std::vector<PointMm> out =
        clipAgainst(polygon, top_mm, [top_mm](double y) { return y >= top_mm; });
    if (out.empty()) {
        return out;
    }
    out = clipAgainst(out, bottom_mm, [bottom_mm](double y) { return y <= bottom_mm; });
    return out.size() >= 3 ? out : std::vector<PointMm>{};
}

std::optional<std::pair<PointMm, PointMm>> clipSegmentToStrip(PointMm a, PointMm b, double top_mm,
                                                              double bottom_mm) {
    if (a.y_mm > b.y_mm) {
        std::swap(a, b); // a is the upper end now; the result keeps no direction
    }
    if (b.y_mm < top_mm || a.y_mm > bottom_mm) {
        return std::nullopt;
    }
    if (a.y_mm < top_mm) {
        a = atY(a, b, top_mm);
    }
    if (b.y_mm > bottom_mm) {
        b = atY(a, b, bottom_mm);
    }
    return std::pair{a, b};
}

} // namespace atollog::draw
