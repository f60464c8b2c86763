#pragma once
// Carbonate texture class from observed attributes, after Dunham (1962, AAPG Memoir 1:108) with
// the Embry & Klovan (1971, Bull. Can. Petrol. Geol. 19:730) extension for coarse and organically
// bound rocks.
#include "atollog/engine/core_records.hpp"
#include "atollog/engine/vocabulary.hpp"

#include <optional>
#include <string>
#include <vector>

namespace atollog {

struct TextureAttributes {
    bool depositional_texture_recognisable = true; ///< false -> crystalline
    std::optional<Binding> binding;          ///< organic binding at deposition and its role
    std::optional<double> coarse_pct;        ///< share of components over 2 mm, 0-100
    std::optional<bool> mud_supported;       ///< matrix (mud) supported rather than grain supported
    std::optional<double> grains_pct;        ///< grains as a share of the rock, 0-100
    /// Grain-supported rock with mud between the grains (packstone) or without (grainstone).
    /// The core data folder has no such column, so textureAttributesOf leaves it nullopt.
    std::optional<bool> mud_present;
};

struct TextureSuggestion {
    std::optional<Texture> texture; ///< nullopt when the attributes are not enough
    std::string reason;             ///< the rule that decided, or what attribute is missing
};

/// Exactly 10 % is not "more than 10 %": 10 % coarse components is not yet floatstone/rudstone,
/// and a mud-supported rock with exactly 10 % grains is a mudstone.
/// Throws std::invalid_argument when coarse_pct or grains_pct is non-finite or outside 0-100.
TextureSuggestion classifyTexture(const TextureAttributes& a);

/// Every texture the attributes allow when each attribute not given may take any value, in
/// declaration order of Texture. Boundstone never appears (its sub-classes do). A single entry
/// equals classifyTexture's answer. Throws as classifyTexture does.
std::vector<Texture> possibleTextures(const TextureAttributes& a);

/// The attributes an interval carries (binding, coarse_pct, mud_supported, grains_pct).
TextureAttributes textureAttributesOf(const LithInterval& interval);

} // namespace atollog
