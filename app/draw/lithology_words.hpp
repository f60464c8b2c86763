#pragma once

#include "draw/hole_column_input.hpp"

#include <string_view>

namespace atollog::draw {

// The words a column uses for its keys, messages and legend: the core data folder's own
// vocabulary words, so a tooltip reads as the data was logged.
std::string_view rockWord(RockKind rock);
std::string_view textureWord(TextureClass texture); // "none" for TextureClass::None
std::string_view surfaceWord(SurfaceKind surface);  // "basement_contact" for the contact

/// Limestone and dolostone: the rocks whose width follows their texture class.
bool isCarbonateRock(RockKind rock);

/// Organically bound textures (boundstone and its Embry & Klovan subdivisions), drawn with the
/// reef-framework pattern.
bool isReefFrameworkTexture(TextureClass texture);

} // namespace atollog::draw
