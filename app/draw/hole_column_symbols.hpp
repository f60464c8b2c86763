#pragma once

#include "draw/colour.hpp"

namespace atollog::draw::column_symbols {

// One place for the look of the column's own marks, so the legend draws what the column draws.
// Core recovery as on the range chart: dark = recovered, white outlined = no recovery.
inline constexpr Colour kInk = colourFromHex(0x000000);
inline constexpr Colour kOutline = colourFromHex(0x333333);
inline constexpr Colour kRecovered = colourFromHex(0x4D4D4D);
inline constexpr Colour kWhite = colourFromHex(0xFFFFFF);
inline constexpr double kBoxOutline_mm = 0.2;
inline constexpr double kRunOutline_mm = 0.15;
inline constexpr double kRunCut_mm = 0.35; // white line between consecutive runs
inline constexpr double kSampleTick_mm = 0.25;
inline constexpr double kDrilledBaseLine_mm = 0.5;

} // namespace atollog::draw::column_symbols
