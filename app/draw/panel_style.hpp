#pragma once
// The look of the correlation panel, in one place so the legend draws what the panel draws.
// Our own choices. Ties and isochrons differ by dash and weight as well as by hue, so the panel
// reads in grey and with any common colour-vision deficiency; the hues are from Okabe & Ito
// (2008, "Color Universal Design"), whose blue and vermillion stay apart for all three common
// deficiencies:
//
// | item                          | line                 | weight  | colour                     |
// |-------------------------------|----------------------|---------|----------------------------|
// | tie line, neighbouring holes  | solid                | 0.35 mm | blue #0072B2               |
// | tie line skipping a hole      | dashed               | 0.35 mm | blue #0072B2               |
// | tie bracket band              | fill, no outline     |         | blue #0072B2 at 22 % alpha |
// | isochron median               | dotted               | 0.55 mm | vermillion #D55E00         |
// | isochron skipping a hole      | dotted               | 0.30 mm | vermillion #D55E00         |
// | isochron 95 % band            | fill, dotted outline | 0.15 mm | vermillion at 11 % alpha   |
// | sea level (elevation axis)    | dotted               | 0.25 mm | dark grey #555555          |
//
// Bands are drawn before the columns, so a column's boxes always cover them: a band shows in the
// gaps between columns and never hides a log. Lines go on top of everything. The isochron fill
// is the fainter of the two: where a tie band lies over it, blue over a strong orange mixed to a
// grey that read as neither. The span bars on the column edges stand apart (ties 0.4 mm off the
// lithology track, isochrons 1.2 mm), so one never covers the other.
#include "draw/colour.hpp"
#include "draw/display_list.hpp"

namespace atollog::draw::panel_style {

inline constexpr Colour kInk = colourFromHex(0x000000);
inline constexpr Colour kMuted = colourFromHex(0x555555);
inline constexpr Colour kTie = colourFromHex(0x0072B2);
inline constexpr Colour kTieBand = Colour{0x00, 0x72, 0xB2, 56};
inline constexpr Colour kIsochron = colourFromHex(0xD55E00);
inline constexpr Colour kIsochronBand = Colour{0xD5, 0x5E, 0x00, 28};

/// The gap an age axis opens at a logged surface (time not represented by rock): a pale grey,
/// lighter than any fill, so it reads as empty rather than as a unit.
inline constexpr Colour kHiatusGap = Colour{0x99, 0x99, 0x99, 60};

inline constexpr Stroke kTieStroke{kTie, 0.35, DashStyle::Solid};
inline constexpr Stroke kTieSkipStroke{kTie, 0.35, DashStyle::Dashed};
inline constexpr Stroke kIsochronStroke{kIsochron, 0.55, DashStyle::Dotted};
inline constexpr Stroke kIsochronSkipStroke{kIsochron, 0.30, DashStyle::Dotted};
inline constexpr Stroke kIsochronBandOutline{kIsochron, 0.15, DashStyle::Dotted};
inline constexpr Stroke kSeaLevelStroke{kMuted, 0.25, DashStyle::Dotted};
inline constexpr double kBracketEnd_mm = 0.5; // weight of the bracket bar at each tie end

inline constexpr double kMargin_mm = 10.0;
inline constexpr double kTitleSize_pt = 12.0;
inline constexpr double kSubtitleSize_pt = 7.5;
inline constexpr double kAxisLabelSize_pt = 7.0;
inline constexpr double kLinkLabelSize_pt = 6.0;
inline constexpr double kNoteSize_pt = 6.5;
inline constexpr double kAxisWidth_mm = 18.0; // title, labels and ticks left of the axis line
inline constexpr double kAxisToColumns_mm = 6.0;
inline constexpr double kTitleToColumns_mm = 6.0;
inline constexpr double kLegendGap_mm = 10.0;
inline constexpr double kLabelLane_mm = 30.0; // right of the last column, for link labels

} // namespace atollog::draw::panel_style
