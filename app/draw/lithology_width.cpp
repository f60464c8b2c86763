#include "draw/lithology_width.hpp"

#include "draw/lithology_words.hpp"

namespace atollog::draw {

namespace {

double carbonateWidth(TextureClass texture) {
    switch (texture) {
    case TextureClass::Mudstone:
        return 0.40;
    case TextureClass::Wackestone:
        return 0.50;
    case TextureClass::None:
    case TextureClass::Packstone:
        return 0.60;
    case TextureClass::Crystalline:
        return 0.65;
    case TextureClass::Grainstone:
        return 0.70;
    case TextureClass::Floatstone:
    case TextureClass::Rudstone:
        return 0.80;
    case TextureClass::Boundstone:
    case TextureClass::Framestone:
    case TextureClass::Bindstone:
    case TextureClass::Bafflestone:
        return 0.90;
    }
    return 0.60;
}

/// Non-carbonates by grain size; the texture class, if any was given, is not theirs to use.
double grainSizeWidth(RockKind rock) {
    switch (rock) {
    case RockKind::Clay:
    case RockKind::Soil:
        return 0.40; // mud-size, level with carbonate mudstone
    case RockKind::Sand:
        return 0.70; // sand-size grains, level with grainstone
    case RockKind::Gravel:
    case RockKind::Volcaniclastic:
        return 0.80; // granules and clasts over 2 mm, level with rudstone
    case RockKind::Basalt:
    case RockKind::Cavity:
    case RockKind::Limestone:
    case RockKind::Dolostone:
        break;
    }
    return 1.00;
}

} // namespace

double lithologyWidthFraction(RockKind rock, TextureClass texture) {
    return isCarbonateRock(rock) ? carbonateWidth(texture) : grainSizeWidth(rock);
}

} // namespace atollog::draw
