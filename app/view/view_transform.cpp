#include "view/view_transform.hpp"

#include <algorithm>

namespace atollog::view {

QPointF ViewTransform::toWidget(const draw::PointMm &scene) const {
    return origin_px_ + QPointF(scene.x_mm, scene.y_mm) * px_per_mm_;
}

draw::PointMm ViewTransform::toScene(const QPointF &widget) const {
    const QPointF p = (widget - origin_px_) / px_per_mm_;
    return {p.x(), p.y()};
}

QRectF ViewTransform::toWidget(const draw::RectMm &scene) const {
    return QRectF(toWidget(draw::PointMm{scene.left_mm, scene.top_mm}),
                  QSizeF(scene.width_mm * px_per_mm_, scene.height_mm * px_per_mm_));
}

draw::RectMm ViewTransform::toScene(const QRectF &widget) const {
    const draw::PointMm tl = toScene(widget.topLeft());
    return {tl.x_mm, tl.y_mm, widget.width() / px_per_mm_, widget.height() / px_per_mm_};
}

void ViewTransform::zoomAbout(const QPointF &anchor_px, double factor) {
    if (!(factor > 0.0)) {
        return;
    }
    const draw::PointMm fixed = toScene(anchor_px);
    px_per_mm_ = std::clamp(px_per_mm_ * factor, kMinPxPerMm, kMaxPxPerMm);
    origin_px_ = anchor_px - QPointF(fixed.x_mm, fixed.y_mm) * px_per_mm_;
}

void ViewTransform::fit(const draw::RectMm &page, const QSizeF &widget, double margin_px) {
    const double w = widget.width() - 2 * margin_px, h = widget.height() - 2 * margin_px;
    if (page.width_mm <= 0 || page.height_mm <= 0 || w <= 0 || h <= 0) {
        return;
    }
    px_per_mm_ =
        std::clamp(std::min(w / page.width_mm, h / page.height_mm), kMinPxPerMm, kMaxPxPerMm);
    const QPointF page_centre(page.left_mm + page.width_mm / 2, page.top_mm + page.height_mm / 2);
    origin_px_ = QPointF(widget.width() / 2, widget.height() / 2) - page_centre * px_per_mm_;
}

} // namespace atollog::view
