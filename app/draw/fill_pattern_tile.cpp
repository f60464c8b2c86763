#include "draw/fill_pattern_tile.hpp"

#include "draw/fill_pattern_painter.hpp"

#include <QPainter>
#include <QTransform>

#include <cmath>
#include <stdexcept>
#include <string>

namespace atollog::draw {

namespace {

void requirePositive(double v, const char *what) {
    if (!std::isfinite(v) || v <= 0.0) {
        throw std::invalid_argument(std::string("fill pattern tile: ") + what +
                                    " must be positive and finite, got " + std::to_string(v));
    }
}

} // namespace

TileRepeat chooseTileRepeat(double period_mm, double px_per_mm) {
    requirePositive(period_mm, "pattern period");
    requirePositive(px_per_mm, "device scale");
    const double one_px = period_mm * px_per_mm;
    TileRepeat best{0, 0};
    double best_stretch = 0.0;
    for (int n = 1; n == 1 || n * one_px <= kSearchedTileSide_px; ++n) {
        const double length = n * one_px;
        // Clamped only to keep the int conversion defined; the renderer refuses what is too big.
        const double size = std::min(std::round(length), 1e9);
        if (size < 1.0) {
            continue;
        }
        const double stretch = std::abs(size - length) / length;
        if (best.repeats == 0 || stretch < best_stretch) {
            best = {n, static_cast<int>(size)};
            best_stretch = stretch;
        }
        if (stretch <= kGoodEnoughStretch) {
            break; // the smallest tile that is good enough
        }
    }
    return best;
}

QImage renderFillPatternTile(const FillPatternTileKey &key) {
    requirePositive(key.px_per_mm_x, "device scale along x");
    requirePositive(key.px_per_mm_y, "device scale along y");
    if (key.phase_x < 0 || key.phase_x >= kTilePhaseSteps || key.phase_y < 0 ||
        key.phase_y >= kTilePhaseSteps) {
        throw std::invalid_argument("fill pattern tile: phase " + std::to_string(key.phase_x) +
                                    ", " + std::to_string(key.phase_y) + " is outside 0 to " +
                                    std::to_string(kTilePhaseSteps - 1));
    }
    if (key.pattern == FillPattern::None) {
        return {};
    }
    const PeriodMm period = fillPatternPeriod(key.pattern);
    const TileRepeat along_x = chooseTileRepeat(period.x_mm, key.px_per_mm_x);
    const TileRepeat along_y = chooseTileRepeat(period.y_mm, key.px_per_mm_y);
    if (along_x.size_px > kLargestTileSide_px || along_y.size_px > kLargestTileSide_px) {
        return {};
    }
    // The tile's own scale: a whole number of repeats in a whole number of pixels.
    const double scale_x = along_x.size_px / (along_x.repeats * period.x_mm);
    const double scale_y = along_y.size_px / (along_y.repeats * period.y_mm);
    const double origin_x_px = static_cast<double>(key.phase_x) / kTilePhaseSteps;
    const double origin_y_px = static_cast<double>(key.phase_y) / kTilePhaseSteps;

    QImage tile(along_x.size_px, along_y.size_px, QImage::Format_ARGB32_Premultiplied);
    tile.fill(Qt::transparent);
    QPainter painter(&tile);
    painter.setRenderHint(QPainter::Antialiasing, true);
    // The scene area under the tile and one repeat beyond each edge: a mark cut by one edge is
    // drawn whole at the opposite edge too, so the tile wraps without a seam (its pixels on
    // both sides of the cut get their share of the anti-aliased ink).
    const RectMm region{-origin_x_px / scale_x - period.x_mm, -origin_y_px / scale_y - period.y_mm,
                        along_x.size_px / scale_x + 2 * period.x_mm,
                        along_y.size_px / scale_y + 2 * period.y_mm};
    drawFillPatternLineWork(painter, key.pattern, region,
                            QTransform(scale_x, 0.0, 0.0, scale_y, origin_x_px, origin_y_px));
    painter.end();
    return tile;
}

} // namespace atollog::draw
