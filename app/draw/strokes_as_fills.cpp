#include "draw/strokes_as_fills.hpp"

#include <QPaintDevice>
#include <QPaintEngine>
#include <QPainter>
#include <QTransform>

#include <algorithm>
#include <cmath>

namespace atollog::draw {

namespace {

bool solid(const Stroke &s) {
    return s.dash == DashStyle::Solid && std::isfinite(s.width_mm) && s.width_mm >= 0.0;
}

} // namespace

StrokesAsFills::StrokesAsFills(const QPainter &painter, bool allowed) {
    const QPaintEngine *engine = painter.paintEngine();
    const QPaintDevice *device = painter.device();
    if (!allowed || engine == nullptr || device == nullptr ||
        engine->type() != QPaintEngine::Raster) {
        return;
    }
    // What the raster engine applies: the painter's transform, then the device pixel ratio.
    const double dpr = device->devicePixelRatio();
    const QTransform to_device = painter.combinedTransform() * QTransform::fromScale(dpr, dpr);
    if (to_device.type() > QTransform::TxScale || !(to_device.m11() > 0.0) ||
        !(to_device.m22() > 0.0) || !std::isfinite(to_device.m11()) ||
        !std::isfinite(to_device.m22())) {
        return; // rotated or mirrored: a rectangle would not stay one
    }
    px_per_mm_x_ = to_device.m11();
    px_per_mm_y_ = to_device.m22();
    largest_scale_ = std::max(px_per_mm_x_, px_per_mm_y_);
    on_ = true;
}

StrokesAsFills::Area StrokesAsFills::pen(double width_mm) const {
    const double width_px = width_mm * largest_scale_;
    if (width_px <= 1.0) {
        // The cosmetic case: one pixel wide, as opaque as the pen is wide (0: fully).
        const QRectF half(0.0, 0.0, 0.5 / px_per_mm_x_, 0.5 / px_per_mm_y_);
        return {half, {}, width_px > 0.0 ? width_px : 1.0};
    }
    return {QRectF(0.0, 0.0, width_mm / 2, width_mm / 2), {}, 1.0};
}

std::optional<StrokesAsFills::Area> StrokesAsFills::boxOutline(const Rect &r) const {
    if (!on_ || !r.stroke || !solid(*r.stroke) || !(r.box.width_mm >= 0.0) ||
        !(r.box.height_mm >= 0.0)) {
        return std::nullopt;
    }
    const Area p = pen(r.stroke->width_mm);
    const double hx = p.outer.width(), hy = p.outer.height();
    const QRectF b(r.box.left_mm, r.box.top_mm, r.box.width_mm, r.box.height_mm);
    QRectF inner = b.adjusted(hx, hy, -hx, -hy);
    if (!(inner.width() > 0.0 && inner.height() > 0.0)) {
        inner = QRectF();
    }
    return Area{b.adjusted(-hx, -hy, hx, hy), inner, p.opacity};
}

std::optional<StrokesAsFills::Area> StrokesAsFills::line(const Line &l) const {
    const bool horizontal = l.from.y_mm == l.to.y_mm;
    const bool vertical = l.from.x_mm == l.to.x_mm;
    if (!on_ || !solid(l.stroke) || horizontal == vertical) {
        return std::nullopt; // a sloping line, or a point
    }
    const Area p = pen(l.stroke.width_mm);
    if (p.opacity < 1.0 || l.stroke.width_mm == 0.0) {
        // A line under a pixel: the raster engine's own thin-line stroker was faster here than
        // a translucent fill (a box outline, four lines at once, still gains as a fill).
        return std::nullopt;
    }
    const double hx = p.outer.width(), hy = p.outer.height();
    const double left = std::min(l.from.x_mm, l.to.x_mm) - hx; // square caps
    const double right = std::max(l.from.x_mm, l.to.x_mm) + hx;
    const double top = std::min(l.from.y_mm, l.to.y_mm) - hy;
    const double bottom = std::max(l.from.y_mm, l.to.y_mm) + hy;
    return Area{QRectF(QPointF(left, top), QPointF(right, bottom)), {}, p.opacity};
}

} // namespace atollog::draw
