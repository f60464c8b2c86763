#include "view/hit_test.hpp"

#include <algorithm>
#include <cmath>
#include <variant>
#include <vector>

namespace atollog::view {

namespace {

using draw::PointMm;

double distanceToSegment(const PointMm &p, const PointMm &a, const PointMm &b) {
    const double dx = b.x_mm - a.x_mm, dy = b.y_mm - a.y_mm;
    const double len2 = dx * dx + dy * dy;
    double t = 0.0;
    if (len2 > 0.0) {
        t = std::clamp(((p.x_mm - a.x_mm) * dx + (p.y_mm - a.y_mm) * dy) / len2, 0.0, 1.0);
    }
    return std::hypot(p.x_mm - (a.x_mm + t * dx), p.y_mm - (a.y_mm + t * dy));
}

bool nearPolyline(const PointMm &p, const std::vector<PointMm> &points, double reach) {
    if (points.size() == 1) {
        return distanceToSegment(p, points[0], points[0]) <= reach;
    }
    for (std::size_t i = 1; i < points.size(); ++i) {
        if (distanceToSegment(p, points[i - 1], points[i]) <= reach) {
            return true;
        }
    }
    return false;
}

/// Even-odd rule, as the painter fills polygons.
bool insidePolygon(const PointMm &p, const std::vector<PointMm> &points) {
    bool inside = false;
    for (std::size_t i = 0, j = points.size() - 1; i < points.size(); j = i++) {
        const PointMm &a = points[i], &b = points[j];
        if ((a.y_mm > p.y_mm) != (b.y_mm > p.y_mm) &&
            p.x_mm < (b.x_mm - a.x_mm) * (p.y_mm - a.y_mm) / (b.y_mm - a.y_mm) + a.x_mm) {
            inside = !inside;
        }
    }
    return inside;
}

bool contains(const draw::RectMm &box, const PointMm &p) {
    return p.x_mm >= box.left_mm && p.x_mm <= box.right_mm() && p.y_mm >= box.top_mm &&
           p.y_mm <= box.bottom_mm();
}

struct Hit {
    PointMm p;
    double tol;
    bool operator()(const draw::Rect &r) const { return contains(r.box.grown(tol), p); }
    bool operator()(const draw::Line &l) const {
        return distanceToSegment(p, l.from, l.to) <= tol + l.stroke.width_mm / 2;
    }
    bool operator()(const draw::Polyline &l) const {
        return nearPolyline(p, l.points, tol + l.stroke.width_mm / 2);
    }
    bool operator()(const draw::Polygon &g) const {
        if (g.points.size() >= 3 && insidePolygon(p, g.points)) {
            return true;
        }
        std::vector<PointMm> closed = g.points;
        if (!closed.empty()) {
            closed.push_back(closed.front());
        }
        return nearPolyline(p, closed, tol);
    }
    bool operator()(const draw::Text &t) const {
        return contains(itemBounds(draw::DisplayItem{t}), p);
    }
    bool operator()(const draw::Marker &m) const {
        return contains(itemBounds(draw::DisplayItem{m}).grown(tol), p);
    }
};

} // namespace

std::optional<std::size_t> hitTest(const draw::DisplayList &list, const draw::PointMm &at,
                                   double tolerance_mm) {
    const auto &items = list.items();
    for (std::size_t i = items.size(); i-- > 0;) {
        const draw::ItemTag &tag = draw::itemTag(items[i]);
        if (tag.role == draw::ItemRole::None || tag.role == draw::ItemRole::Frame) {
            continue;
        }
        // The conservative bounds reject almost everything cheaply before the exact test.
        if (!contains(itemBounds(items[i]).grown(tolerance_mm), at)) {
            continue;
        }
        if (std::visit(Hit{at, tolerance_mm}, items[i])) {
            return i;
        }
    }
    return std::nullopt;
}

} // namespace atollog::view
