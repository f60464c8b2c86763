#pragma once

#include "draw/display_list.hpp"
#include "draw/fill_pattern_tile_cache.hpp"

#include <QBrush>
#include <QTransform>

#include <array>
#include <cstddef>

class QPainter;

namespace atollog::draw {

/// The fill patterns of one paint call. On a raster device (QImage, QPixmap, a widget) whose
/// transform from scene mm only scales and moves, each pattern is painted with a brush of its
/// cached tile, one texture pixel per device pixel, anchored at the scene origin: every box
/// filled with it continues its neighbours, as the line work does, at a fraction of the cost.
/// Everywhere else (SVG, PDF, printers, rotated painters), and for patterns whose tile would be
/// too large, boxes get line work (paintFillPattern), so vector output stays vector.
class FillPatternTileBrushes {
  public:
    /// Reads the painter's device and its transform now: construct it after the painter has its
    /// scene transform, and paint with that transform. `allow_tiles` false forces line work.
    FillPatternTileBrushes(const QPainter &painter, bool allow_tiles,
                           FillPatternTileCache &cache = FillPatternTileCache::shared());

    /// Whether this paint call fills patterns from tiles.
    bool usesTiles() const { return tiles_; }

    /// Paints `pattern` over `box` (scene mm): nothing for FillPattern::None or a box under
    /// kSmallestPatternedBox_px; otherwise a tile brush fill or line work clipped to the box, as
    /// above. Leaves the painter's pen and brush as line work leaves them (callers set their
    /// own).
    void paint(QPainter &painter, FillPattern pattern, const RectMm &box);

    /// The brush of `pattern`'s tile, or nullptr when it is painted as line work.
    const QBrush *brush(FillPattern pattern);

  private:
    static constexpr std::size_t kPatterns =
        static_cast<std::size_t>(FillPattern::ReefFramework) + 1;

    FillPatternTileCache &cache_;
    bool tiles_ = false;
    QTransform to_device_;
    double origin_px_x_ = 0.0; // whole device pixel at which the tiles start
    double origin_px_y_ = 0.0;
    int phase_x_ = 0; // the scene origin's sub-pixel place, in 1/kTilePhaseSteps px
    int phase_y_ = 0;
    std::array<bool, kPatterns> looked_up_{};
    std::array<QBrush, kPatterns> brushes_{};
    std::array<bool, kPatterns> has_brush_{};
};

} // namespace atollog::draw
