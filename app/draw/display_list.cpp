#include "draw/display_list.hpp"

#include "draw/text_extent.hpp"

#include <array>
#include <cmath>
#include <numbers>

namespace atollog::draw {

namespace {

RectMm boxOfPoints(const std::vector<PointMm> &points) {
    if (points.empty()) {
        return {};
    }
    double l = points.front().x_mm, r = l, t = points.front().y_mm, b = t;
    for (const PointMm &p : points) {
        l = std::min(l, p.x_mm);
        r = std::max(r, p.x_mm);
        t = std::min(t, p.y_mm);
        b = std::max(b, p.y_mm);
    }
    return RectMm{l, t, r - l, b - t};
}

RectMm textBounds(const Text &text) {
    const double w = estimateTextWidth_mm(text.text, text.size_pt, text.weight);
    const double h = textLineHeight_mm(text.size_pt);
    double x0 = 0.0;
    if (text.anchor == TextAnchor::Middle) {
        x0 = -w / 2;
    } else if (text.anchor == TextAnchor::End) {
        x0 = -w;
    }
    const double angle = text.rotation_deg * std::numbers::pi / 180.0;
    const double c = std::cos(angle), s = std::sin(angle);
    const std::array<PointMm, 4> local{
        {{x0, -h / 2}, {x0 + w, -h / 2}, {x0 + w, h / 2}, {x0, h / 2}}};
    std::vector<PointMm> corners;
    for (const PointMm &p : local) {
        // Clockwise rotation on a y-down page is the ordinary rotation matrix.
        corners.push_back({text.anchor_mm.x_mm + c * p.x_mm - s * p.y_mm,
                           text.anchor_mm.y_mm + s * p.x_mm + c * p.y_mm});
    }
    return boxOfPoints(corners);
}

} // namespace

RectMm itemBounds(const DisplayItem &item) {
    struct Visitor {
        RectMm operator()(const Rect &r) const {
            return r.stroke ? r.box.grown(r.stroke->width_mm / 2) : r.box;
        }
        RectMm operator()(const Line &l) const {
            return boxOfPoints({l.from, l.to}).grown(l.stroke.width_mm / 2);
        }
        RectMm operator()(const Polyline &p) const {
            return boxOfPoints(p.points).grown(p.stroke.width_mm / 2);
        }
        RectMm operator()(const Polygon &p) const {
            return boxOfPoints(p.points).grown(p.stroke ? p.stroke->width_mm / 2 : 0.0);
        }
        RectMm operator()(const Text &t) const { return textBounds(t); }
        RectMm operator()(const Marker &m) const {
            const double half = m.size_mm / 2 + m.stroke_mm;
            return RectMm{m.centre_mm.x_mm - half, m.centre_mm.y_mm - half, 2 * half, 2 * half};
        }
    };
    return std::visit(Visitor{}, item);
}

const ItemTag &itemTag(const DisplayItem &item) {
    return std::visit([](const auto &i) -> const ItemTag & { return i.tag; }, item);
}

RectMm DisplayList::boundingBox() const {
    if (items_.empty()) {
        return {};
    }
    RectMm box = itemBounds(items_.front());
    for (const DisplayItem &item : items_) {
        box = box.united(itemBounds(item));
    }
    return box;
}

RectMm DisplayList::page() const {
    return page_mm_ ? *page_mm_ : boundingBox();
}

std::vector<const DisplayItem *> DisplayList::withRole(ItemRole role) const {
    std::vector<const DisplayItem *> found;
    for (const DisplayItem &item : items_) {
        if (itemTag(item).role == role) {
            found.push_back(&item);
        }
    }
    return found;
}

} // namespace atollog::draw
