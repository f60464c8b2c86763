#pragma once

#include "draw/display_list.hpp"

#include <QRectF>

#include <optional>

class QPainter;

namespace atollog::draw {

/// Axis-aligned solid strokes painted as fills, on raster devices under a plain scale. A
/// horizontal or vertical line with square caps covers a rectangle, and the outline of a box
/// (mitred corners) the ring between two rectangles; filling those gives the pixels stroking
/// gives, in about half the time (the outlines of 100,000 logged intervals were most of the
/// time of painting a poster-sized panel). The raster engine draws a pen of at most one device
/// pixel as a line one pixel wide whose opacity is the pen's width in pixels (its "cosmetic"
/// stroker; a width of 0 is one full pixel), and so do these fills. Vector devices (SVG, PDF)
/// keep real strokes, so their files hold lines as lines.
class StrokesAsFills {
  public:
    /// Reads the painter's device and transform now (after the scene transform is set).
    /// `allowed` false: nothing applies.
    StrokesAsFills(const QPainter &painter, bool allowed);

    /// What a stroke covers (scene mm), and the factor its colour's opacity is drawn with.
    struct Area {
        QRectF outer;
        QRectF inner; ///< a box outline's hole; empty for a line, or when the outline fills the box
        double opacity = 1.0;
    };
    /// For a box with a solid outline; nothing otherwise.
    std::optional<Area> boxOutline(const Rect &rect) const;
    /// For a solid, horizontal or vertical line over one device pixel wide; nothing otherwise
    /// (thinner lines are faster through the raster engine's own thin-line stroker).
    std::optional<Area> line(const Line &line) const;

  private:
    /// Half the drawn width of a stroke along x and y (scene mm), and its opacity factor.
    Area pen(double width_mm) const;

    bool on_ = false;
    double px_per_mm_x_ = 1.0;
    double px_per_mm_y_ = 1.0;
    double largest_scale_ = 1.0; // what the raster engine compares pen widths with
};

} // namespace atollog::draw
