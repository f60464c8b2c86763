#pragma once

#include "draw/display_list.hpp"
#include "draw/hole_column_input.hpp"

namespace atollog::draw {

/// How a surface is drawn across the column. Every kind differs from every other by dash and
/// line weight (and erosion also by its wavy course), never by colour alone, so the kinds stay
/// apart in greyscale and with any colour-vision deficiency. Our own choices:
///
/// | surface          | line                      | weight  | colour (Okabe & Ito 2008) |
/// |------------------|---------------------------|---------|---------------------------|
/// | exposure         | dashed                    | 0.45 mm | vermillion #D55E00        |
/// | hardground       | dotted                    | 0.60 mm | blue #0072B2              |
/// | erosion          | solid, wavy               | 0.30 mm | black                     |
/// | basement contact | solid, straight           | 0.70 mm | black                     |
///
/// The wavy erosion line is the trade's usual sign for an erosional base (common practice);
/// the basement contact is the heaviest line because it ends the carbonate cap.
struct SurfaceLook {
    Stroke stroke;
    bool wavy = false;
};

SurfaceLook surfaceLook(SurfaceKind kind);

/// The points of a surface line from x0 to x1 at y: straight, or for a wavy look a sine of
/// 0.5 mm amplitude and 2 mm wavelength sampled every 0.25 mm (phase anchored at x = 0, so
/// neighbouring columns' waves line up).
std::vector<PointMm> surfacePath(const SurfaceLook &look, double x0_mm, double x1_mm, double y_mm);

} // namespace atollog::draw
