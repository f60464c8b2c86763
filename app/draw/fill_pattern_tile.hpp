#pragma once

#include "draw/display_list.hpp"

#include <QImage>

#include <compare>

namespace atollog::draw {

/// Tiles hold as many repeats of a pattern as bring their length within kGoodEnoughStretch of
/// a whole number of pixels, looking up to this side (beyond it, tiles get slow to draw and
/// large to keep).
inline constexpr int kSearchedTileSide_px = 1024;
/// Above this, one repeat of the pattern is drawn as line work instead (deep zoom: few repeats
/// are visible, and line work is cheap for them).
inline constexpr int kLargestTileSide_px = 2048;
/// The stretch (relative) of a tile's repeats that is taken at once: the pattern then lands at
/// most half a pixel from its line-work place 4,000 px from the scene origin.
inline constexpr double kGoodEnoughStretch = 1.25e-4;
/// The sub-pixel position of the scene origin is baked into a tile in steps of 1/16 px (a
/// thin line moved by 1/16 px changes its anti-aliased pixels by a few per cent).
inline constexpr int kTilePhaseSteps = 16;

/// How many repeats of a pattern one tile holds along one axis, and its size in pixels.
struct TileRepeat {
    int repeats = 1;
    int size_px = 1;
};

/// Along one axis: the number of repeats n whose length n * period_mm * px_per_mm is nearest a
/// whole number of pixels, relative to the length, and the size, that length rounded. The
/// smallest n within kGoodEnoughStretch is taken, else the best n up to kSearchedTileSide_px
/// (n = 1 when one repeat is longer). The tile is then drawn at size_px / (n * period_mm) px per
/// mm, which differs from px_per_mm by at most half a pixel over the tile: a texture tiles only
/// with a whole number of pixels, and a tile painted one texture pixel per device pixel keeps
/// lines as sharp as line work. Throws std::invalid_argument unless both arguments are
/// positive and finite.
TileRepeat chooseTileRepeat(double period_mm, double px_per_mm);

/// What a tile depends on. Device scale per axis (px per mm; exact values, so painting at
/// the same scale finds the same tile) and where the scene origin falls inside a device pixel,
/// in 1/kTilePhaseSteps px (0 to kTilePhaseSteps - 1).
struct FillPatternTileKey {
    FillPattern pattern = FillPattern::None;
    double px_per_mm_x = 0.0;
    double px_per_mm_y = 0.0;
    int phase_x = 0;
    int phase_y = 0;

    friend auto operator<=>(const FillPatternTileKey &, const FillPatternTileKey &) = default;
};

/// One repeat block of a pattern's line work in premultiplied ARGB (black ink on transparent),
/// made to be tiled from device pixel 0, 0: the scene origin lies at tile pixel
/// (phase_x, phase_y) / kTilePhaseSteps, and the tile's size is chooseTileRepeat's per axis.
/// A null image when FillPattern::None, or when a side would exceed kLargestTileSide_px.
/// Throws std::invalid_argument for scales that are not positive and finite, or a phase out of
/// range.
QImage renderFillPatternTile(const FillPatternTileKey &key);

} // namespace atollog::draw
