#pragma once
// How x-y plots tell several series (holes) apart: by colour and by marker shape together, so a
// series reads with a colour-vision deficiency and in grey.

#include "draw/colour.hpp"
#include "draw/display_list.hpp"

#include <array>
#include <cstddef>

namespace atollog::draw {

/// Seven colours of Okabe & Ito (2008, "Color Universal Design"), in an order that keeps the
/// first few far apart; their yellow #F0E442 is left out (too faint as a line on white).
inline constexpr std::array<Colour, 7> kSeriesColours{
    colourFromHex(0x0072B2), // blue
    colourFromHex(0xD55E00), // vermillion
    colourFromHex(0x009E73), // bluish green
    colourFromHex(0xCC79A7), // reddish purple
    colourFromHex(0xE69F00), // orange
    colourFromHex(0x56B4E9), // sky blue
    colourFromHex(0x000000), // black
};

inline constexpr std::array<MarkerShape, 5> kSeriesShapes{
    MarkerShape::Circle, MarkerShape::Square, MarkerShape::Diamond, MarkerShape::TriangleUp,
    MarkerShape::TriangleDown};

/// Series i: colour i mod 7, shape i mod 5, so the pair repeats only after 35 series.
inline Colour seriesColour(std::size_t i) {
    return kSeriesColours[i % kSeriesColours.size()];
}
inline MarkerShape seriesShape(std::size_t i) {
    return kSeriesShapes[i % kSeriesShapes.size()];
}

} // namespace atollog::draw
