#pragma once

#include "draw/display_list.hpp"

class QPainter;
class QTransform;

namespace atollog::draw {

/// Boxes under this many device pixels in width or height get no pattern, only their fill.
inline constexpr double kSmallestPatternedBox_px = 3.0;

/// The repeat of a pattern's line work in scene mm: the drawing is the same after a shift by a
/// whole number of periods along x or y (all patterns are anchored at the scene origin).
struct PeriodMm {
    double x_mm = 0.0;
    double y_mm = 0.0;
};

/// The repeat of `pattern`; {0, 0} for FillPattern::None.
PeriodMm fillPatternPeriod(FillPattern pattern);

/// True when `box` (scene mm) maps, through `to_device`, to less than kSmallestPatternedBox_px
/// in width or height.
bool boxTooSmallForPattern(const QTransform &to_device, const RectMm &box);

/// Draws the line work of `pattern` over all of `region` and a little beyond (scene mm),
/// unclipped, in black on whatever is there. The marks are mapped from scene mm to the
/// painter's coordinates by `scene_to_painter` (identity: the painter is in scene mm), the line
/// width with them. Sets the painter's pen and brush. Used by paintFillPattern, and to render
/// raster tiles: those map the marks to pixels themselves and paint with a plain translation,
/// so a thin line is rasterised as it is on a page painted at a uniform scale (the raster
/// engine strokes lines under a pixel wide its own way, but only under a uniform scale, and a
/// tile's scale differs a little between x and y).
void drawFillPatternLineWork(QPainter &painter, FillPattern pattern, const RectMm &region,
                             const QTransform &scene_to_painter);

/// Draws `pattern` as line work clipped to `box` (scene mm; the painter is in scene mm). The
/// pattern grid is anchored at the scene origin, so neighbouring boxes continue one another.
/// Boxes under kSmallestPatternedBox_px get nothing.
void paintFillPattern(QPainter &painter, FillPattern pattern, const RectMm &box);

} // namespace atollog::draw
