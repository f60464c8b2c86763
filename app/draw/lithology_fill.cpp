#include "draw/lithology_fill.hpp"

#include "draw/lithology_words.hpp"

namespace atollog::draw {

namespace {

// Our own assignment of Okabe & Ito (2008) hues to rocks, each as a 40 % tint. Neighbours that
// meet in reef holes differ in lightness as well as hue: limestone (sky blue) against reef
// framework (orange), dolostone (reddish purple), sand (yellow) and clay (bluish green). The
// volcanic basement is neutral grey, darker than every carbonate tint, so the contact reads
// in greyscale. Gravel and soil are neutral: rare in these holes, and their patterns carry them.
constexpr double kTintShare = 0.4;
constexpr Colour kLimestone = tintOf(colourFromHex(0x56B4E9), kTintShare);      // sky blue
constexpr Colour kReef = tintOf(colourFromHex(0xE69F00), kTintShare);           // orange
constexpr Colour kDolostone = tintOf(colourFromHex(0xCC79A7), kTintShare);      // reddish purple
constexpr Colour kSand = tintOf(colourFromHex(0xF0E442), kTintShare);           // yellow
constexpr Colour kClay = tintOf(colourFromHex(0x009E73), kTintShare);           // bluish green
constexpr Colour kVolcaniclastic = tintOf(colourFromHex(0xD55E00), kTintShare); // vermillion
constexpr Colour kBasalt = colourFromHex(0xA6A6A6);
constexpr Colour kGravel = colourFromHex(0xE3E3E3);
constexpr Colour kSoil = colourFromHex(0xD9D9D9);
constexpr Colour kCavity = colourFromHex(0xFFFFFF);

} // namespace

LithologyFill lithologyFill(RockKind rock, TextureClass texture) {
    if (isCarbonateRock(rock) && isReefFrameworkTexture(texture)) {
        return {kReef, FillPattern::ReefFramework};
    }
    switch (rock) {
    case RockKind::Limestone:
        return {kLimestone, FillPattern::Limestone};
    case RockKind::Dolostone:
        return {kDolostone, FillPattern::Dolostone};
    case RockKind::Sand:
        return {kSand, FillPattern::Sand};
    case RockKind::Clay:
        return {kClay, FillPattern::Clay};
    case RockKind::Gravel:
        return {kGravel, FillPattern::Gravel};
    case RockKind::Basalt:
        return {kBasalt, FillPattern::Basalt};
    case RockKind::Volcaniclastic:
        return {kVolcaniclastic, FillPattern::Volcaniclastic};
    case RockKind::Soil:
        return {kSoil, FillPattern::None};
    case RockKind::Cavity:
        break;
    }
    return {kCavity, FillPattern::None};
}

} // namespace atollog::draw
