#include "draw/fill_pattern_tile_brush.hpp"

#include "draw/fill_pattern_painter.hpp"

#include <QPaintDevice>
#include <QPaintEngine>
#include <QPainter>

#include <cmath>

namespace atollog::draw {

namespace {

/// Splits a device coordinate into a whole pixel and a phase in 1/kTilePhaseSteps px.
void splitPixel(double v, double &whole, int &phase) {
    whole = std::floor(v);
    phase = static_cast<int>(std::lround((v - whole) * kTilePhaseSteps));
    if (phase == kTilePhaseSteps) {
        phase = 0;
        whole += 1.0;
    }
}

} // namespace

FillPatternTileBrushes::FillPatternTileBrushes(const QPainter &painter, bool allow_tiles,
                                               FillPatternTileCache &cache)
    : cache_(cache) {
    const QPaintEngine *engine = painter.paintEngine();
    const QPaintDevice *device = painter.device();
    // Only the raster engine: SVG, PDF and printers have their own engines, and they keep
    // line work so the file stays sharp at any zoom.
    if (!allow_tiles || engine == nullptr || device == nullptr ||
        engine->type() != QPaintEngine::Raster) {
        return;
    }
    // What the raster engine applies: the painter's transform, then the device pixel ratio.
    const double dpr = device->devicePixelRatio();
    to_device_ = painter.combinedTransform() * QTransform::fromScale(dpr, dpr);
    if (to_device_.type() > QTransform::TxScale || !(to_device_.m11() > 0.0) ||
        !(to_device_.m22() > 0.0) || !std::isfinite(to_device_.m11()) ||
        !std::isfinite(to_device_.m22()) || !std::isfinite(to_device_.dx()) ||
        !std::isfinite(to_device_.dy())) {
        return; // rotated, mirrored or degenerate: line work is right for any transform
    }
    splitPixel(to_device_.dx(), origin_px_x_, phase_x_);
    splitPixel(to_device_.dy(), origin_px_y_, phase_y_);
    tiles_ = true;
}

const QBrush *FillPatternTileBrushes::brush(FillPattern pattern) {
    const auto i = static_cast<std::size_t>(pattern);
    if (!tiles_ || pattern == FillPattern::None || i >= kPatterns) {
        return nullptr;
    }
    if (!looked_up_[i]) {
        looked_up_[i] = true;
        const auto tile =
            cache_.tile({pattern, to_device_.m11(), to_device_.m22(), phase_x_, phase_y_});
        if (tile) {
            QBrush brush(*tile);
            // Texture pixel (0, 0) on device pixel (origin_px_x_, origin_px_y_), one texture
            // pixel per device pixel: brush transform times painter transform is a move by
            // whole pixels, which the raster engine tiles without resampling.
            brush.setTransform(QTransform::fromTranslate(origin_px_x_, origin_px_y_) *
                               to_device_.inverted());
            brushes_[i] = brush;
            has_brush_[i] = true;
        }
    }
    return has_brush_[i] ? &brushes_[i] : nullptr;
}

void FillPatternTileBrushes::paint(QPainter &painter, FillPattern pattern, const RectMm &box) {
    if (pattern == FillPattern::None || boxTooSmallForPattern(painter.worldTransform(), box)) {
        return;
    }
    if (const QBrush *b = brush(pattern)) {
        painter.fillRect(QRectF(box.left_mm, box.top_mm, box.width_mm, box.height_mm), *b);
        return;
    }
    paintFillPattern(painter, pattern, box);
}

} // namespace atollog::draw
