#include "draw/lithology_words.hpp"

namespace atollog::draw {

std::string_view rockWord(RockKind rock) {
    switch (rock) {
    case RockKind::Limestone:
        return "limestone";
    case RockKind::Dolostone:
        return "dolostone";
    case RockKind::Basalt:
        return "basalt";
    case RockKind::Volcaniclastic:
        return "volcaniclastic";
    case RockKind::Clay:
        return "clay";
    case RockKind::Sand:
        return "sand";
    case RockKind::Gravel:
        return "gravel";
    case RockKind::Soil:
        return "soil";
    case RockKind::Cavity:
        return "cavity";
    }
    return "unknown";
}

std::string_view textureWord(TextureClass texture) {
    switch (texture) {
    case TextureClass::None:
        return "none";
    case TextureClass::Mudstone:
        return "mudstone";
    case TextureClass::Wackestone:
        return "wackestone";
    case TextureClass::Packstone:
        return "packstone";
    case TextureClass::Grainstone:
        return "grainstone";
    case TextureClass::Floatstone:
        return "floatstone";
    case TextureClass::Rudstone:
        return "rudstone";
    case TextureClass::Boundstone:
        return "boundstone";
    case TextureClass::Framestone:
        return "framestone";
    case TextureClass::Bindstone:
        return "bindstone";
    case TextureClass::Bafflestone:
        return "bafflestone";
    case TextureClass::Crystalline:
        return "crystalline";
    }
    return "unknown";
}

std::string_view surfaceWord(SurfaceKind surface) {
    switch (surface) {
    case SurfaceKind::Exposure:
        return "exposure";
    case SurfaceKind::Hardground:
        return "hardground";
    case SurfaceKind::Erosion:
        return "erosion";
    case SurfaceKind::BasementContact:
        return "basement_contact";
    }
    return "unknown";
}

bool isCarbonateRock(RockKind rock) {
    return rock == RockKind::Limestone || rock == RockKind::Dolostone;
}

bool isReefFrameworkTexture(TextureClass texture) {
    return texture == TextureClass::Boundstone || texture == TextureClass::Framestone ||
           texture == TextureClass::Bindstone || texture == TextureClass::Bafflestone;
}

} // namespace atollog::draw
