#pragma once
// The look of the hole column's data tracks (taxa, zones, the age track), in one place so the
// legend draws what the tracks draw. Our own choices. Hues from Okabe & Ito (2008, "Color
// Universal Design"), as on the range chart and the age-depth plot: taxon bars in their group's
// colour, the age model sky blue and blue, dates vermillion; zones in two neutral greys, so
// they are never read as data. Every kind also differs by shape, fill or dash, so the tracks
// read in grey.
#include "draw/colour.hpp"
#include "draw/display_list.hpp"

namespace atollog::draw::track_symbols {

inline constexpr Colour kInk = colourFromHex(0x000000);
inline constexpr Colour kOutline = colourFromHex(0x333333);
inline constexpr Colour kWhite = colourFromHex(0xFFFFFF);

// Taxa: a bar in the group colour with a dark rim (so yellow reads on white), filled circles at
// counted finds; reworked (diamond) and caved (square) finds hollow and black, left of the bar,
// as on the range chart.
inline constexpr double kTaxonBarWidth_mm = 1.0;
inline constexpr double kTaxonBarOutline_mm = 0.15;
inline constexpr double kFindMarker_mm = 1.3;
inline constexpr double kExcludedMarker_mm = 1.1;
inline constexpr double kBarOffset_mm = 0.5;       // bar and finds right of the lane centre
inline constexpr double kExcludedOffset_mm = -1.0; // excluded finds left of it
inline constexpr MarkerShape kReworkedShape = MarkerShape::Diamond;
inline constexpr MarkerShape kCavedShape = MarkerShape::Square;

// Zones: neighbours alternate between two greys; a boundary's bracket is white with a dark grey
// hatch; an edge whose event is not picked here is a dashed line.
inline constexpr Colour kZoneTintA = colourFromHex(0xD4D4D4);
inline constexpr Colour kZoneTintB = colourFromHex(0xEDEDED);
inline constexpr Colour kZoneHatch = colourFromHex(0x777777);
inline constexpr double kZoneHatchSpacing_mm = 0.9;
inline constexpr double kZoneHatch_mm = 0.12;
inline constexpr double kZoneEdge_mm = 0.15;

// Age track: frame and grid, the model's band (sky blue #56B4E9, translucent, so grid lines
// and dates show through) and median (blue #0072B2), dates in vermillion #D55E00.
inline constexpr Colour kFrame = colourFromHex(0x888888);
inline constexpr Colour kGrid = colourFromHex(0xD0D0D0);
inline constexpr Colour kBand = Colour{0x56, 0xB4, 0xE9, 110};
inline constexpr Colour kBandEdge = colourFromHex(0x56B4E9);
inline constexpr Colour kMedian = colourFromHex(0x0072B2);
inline constexpr Colour kDate = colourFromHex(0xD55E00);
inline constexpr double kFrame_mm = 0.15;
inline constexpr double kGrid_mm = 0.12;
inline constexpr double kBandEdge_mm = 0.12;
inline constexpr double kMedian_mm = 0.4;
inline constexpr double kDateMarker_mm = 1.3;
inline constexpr double kDateBar_mm = 0.25;
inline constexpr double kDateBarCap_mm = 0.8;
inline constexpr double kAgeTrackInset_mm = 1.5; // the age range ends this far inside the frame

} // namespace atollog::draw::track_symbols
