#pragma once
// Where the scene (paper millimetres) sits on the canvas: a scale and the widget position of the
// scene origin. Kept apart from the widget so zoom and pan arithmetic is tested without pixels.
#include "draw/scene_rect.hpp"

#include <QPointF>
#include <QRectF>
#include <QSizeF>

namespace atollog::view {

class ViewTransform {
  public:
    /// Zoom limits (logical px per mm): below about 0.05 a whole ocean-drilling hole is a few
    /// pixels; above 200 one millimetre fills a screen. Outside these nothing useful is shown.
    static constexpr double kMinPxPerMm = 0.05;
    static constexpr double kMaxPxPerMm = 200.0;

    double pxPerMm() const { return px_per_mm_; }
    QPointF originPx() const { return origin_px_; }

    QPointF toWidget(const draw::PointMm &scene) const;
    draw::PointMm toScene(const QPointF &widget) const;
    QRectF toWidget(const draw::RectMm &scene) const;
    draw::RectMm toScene(const QRectF &widget) const;

    /// Multiplies the scale by `factor` (clamped to the limits) so that the scene point under
    /// `anchor_px` stays under it.
    void zoomAbout(const QPointF &anchor_px, double factor);
    void panBy(const QPointF &delta_px) { origin_px_ += delta_px; }
    /// The largest scale that shows all of `page` inside `widget` with `margin_px` on every side,
    /// centred. An empty page or widget leaves the transform as it was.
    void fit(const draw::RectMm &page, const QSizeF &widget, double margin_px);

  private:
    double px_per_mm_ = 2.0;
    QPointF origin_px_{0.0, 0.0};
};

} // namespace atollog::view
