#pragma once

#include "draw/display_list.hpp"

#include <cstddef>

class QPainter;

namespace atollog::draw {

/// How many items a paint call drew and how many it skipped as lying outside the visible area.
struct PaintStats {
    std::size_t painted = 0;
    std::size_t culled = 0;
};

/// How fill patterns are painted.
enum class PatternRendering {
    /// From cached raster tiles on raster devices (QImage, QPixmap, widgets), as line work on
    /// vector devices (SVG, PDF, printers). What every caller wants.
    Automatic,
    /// Always as line work: only to compare the two ways (benchmarks, tests).
    LineWork,
};

struct PaintOptions {
    PatternRendering patterns = PatternRendering::Automatic;
    /// On raster devices, paint horizontal and vertical solid strokes (box outlines, ticks) as
    /// rectangle fills (see StrokesAsFills): the same pixels in about half the time. false
    /// strokes them: only to compare the two ways.
    bool strokes_as_fills = true;
};

/// Paints the items whose bounds intersect `visible_mm` (scene millimetres). Composes with the
/// painter's current transform: scene point visible_mm's top-left lands on the painter's origin,
/// and one scene millimetre covers px_per_mm painter units. The painter's state is restored on
/// return. Text uses the bundled font (see bundledFontFamily, which needs a QGuiApplication).
/// Throws std::invalid_argument when px_per_mm is not positive and finite.
PaintStats paintDisplayList(QPainter &painter, const DisplayList &list, const RectMm &visible_mm,
                            double px_per_mm, const PaintOptions &options = {});

} // namespace atollog::draw
