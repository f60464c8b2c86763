#pragma once

#include "draw/colour.hpp"
#include "draw/display_list.hpp"

namespace atollog::draw::age_plot_symbols {

// One place for the look of every age-depth symbol, so the legend draws exactly what the plot
// draws. Colours are from the palette of Okabe & Ito (2008, "Color Universal Design"), like the
// range chart's, and every kind of item also differs by shape or dash, so the plot reads in grey.
inline constexpr Colour kInk = colourFromHex(0x000000);
inline constexpr Colour kGrid = colourFromHex(0xE0E0E0);
inline constexpr Colour kWhite = colourFromHex(0xFFFFFF);

// The envelope is sky blue (#56B4E9) mixed 30:70 with white, opaque: many slabs tile it (see
// age_depth_envelope.hpp), and a translucent fill would darken where they meet.
inline constexpr Colour kEnvelopeFill = colourFromHex(0xCCE9F8);
inline constexpr Colour kEnvelopeEdge = colourFromHex(0x56B4E9); // sky blue
inline constexpr Colour kMedian = colourFromHex(0x0072B2);       // blue
inline constexpr Colour kDatum = colourFromHex(0x009E73);        // bluish green
inline constexpr Colour kDate = colourFromHex(0xD55E00);         // vermillion
inline constexpr Colour kHiatus = colourFromHex(0xCC79A7);       // reddish purple
inline constexpr Colour kReference = colourFromHex(0x000000);
// Excluded ties: neutral grey, outside the palette, so it is never read as a kind of tie.
inline constexpr Colour kExcluded = colourFromHex(0x999999);
// Their labels in a darker grey: #999999 text on white is too faint to read at 6.5 pt.
inline constexpr Colour kExcludedText = colourFromHex(0x666666);
// Leaders join a label that had to move away from its tie back to the tie.
inline constexpr Colour kLeader = colourFromHex(0x666666);
inline constexpr double kLeader_mm = 0.15;

inline constexpr MarkerShape kDatumShape = MarkerShape::Diamond;
inline constexpr MarkerShape kDateShape = MarkerShape::Circle;

inline constexpr double kEnvelopeEdge_mm = 0.2;
inline constexpr double kMedian_mm = 0.45;
inline constexpr double kReference_mm = 0.35;
inline constexpr double kHiatus_mm = 0.4;
inline constexpr double kTieBar_mm = 0.3;
inline constexpr double kTieBarCap_mm = 0.9;      // end ticks of the bars
inline constexpr double kOutlierRingGap_mm = 0.7; // ring radius beyond the marker's half size
inline constexpr double kOutlierRing_mm = 0.3;

} // namespace atollog::draw::age_plot_symbols
