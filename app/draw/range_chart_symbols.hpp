#pragma once

#include "draw/display_list.hpp"
#include "draw/range_chart_style.hpp"

namespace atollog::draw::chart_symbols {

// One place for the look of every range-chart symbol, so the legend draws exactly what the chart
// draws. Our own choices: in-place finds are filled in the group colour, everything that is not
// in place is hollow and black (the colour is kept for the taxon's own record), picks are black.
inline constexpr Colour kInk = colourFromHex(0x000000);
inline constexpr Colour kOutline = colourFromHex(0x333333);
inline constexpr Colour kGuide = colourFromHex(0xBFBFBF);
inline constexpr Colour kGrid = colourFromHex(0xE0E0E0);
inline constexpr Colour kRecovered = colourFromHex(0x4D4D4D);
inline constexpr Colour kWhite = colourFromHex(0xFFFFFF);

inline constexpr MarkerShape kReworkedShape = MarkerShape::Diamond;
inline constexpr MarkerShape kCavedShape = MarkerShape::Square;
inline constexpr MarkerShape kBarrenShape = MarkerShape::Circle;
// A top closes a range upward, a base closes it downward: the triangle points the way the
// range ends.
inline constexpr MarkerShape kTopShape = MarkerShape::TriangleUp;
inline constexpr MarkerShape kBaseShape = MarkerShape::TriangleDown;

inline constexpr double kBarOutline_mm = 0.15;
inline constexpr double kBracketWidth_mm = 0.3;
inline constexpr double kBracketCap_mm = 0.7;
inline constexpr double kOpenEndLength_mm = 3.0;
inline constexpr double kOpenEndMarker_mm = 1.1;

/// Marker size for an abundance rank 0..5, linear between the style's extremes.
inline double occurrenceMarker_mm(const RangeChartStyle &s, int rank) {
    return s.min_marker_mm + (s.max_marker_mm - s.min_marker_mm) * rank / 5.0;
}

} // namespace atollog::draw::chart_symbols
