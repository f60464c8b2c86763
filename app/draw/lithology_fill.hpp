#pragma once

#include "draw/display_list.hpp"
#include "draw/hole_column_input.hpp"

namespace atollog::draw {

/// How an interval's box is filled: a pale colour under black pattern line work.
struct LithologyFill {
    Colour colour;
    FillPattern pattern = FillPattern::None;
};

/// The fill of a rock (and, for carbonates, its texture: organically bound textures get the
/// reef-framework pattern). The pattern is what identifies the rock; the colour only helps, so
/// a column still reads in greyscale or with any colour-vision deficiency. Colours are pale
/// tints of the Okabe & Ito (2008) palette used for taxon groups (see lithology_fill.cpp).
LithologyFill lithologyFill(RockKind rock, TextureClass texture);

/// A colour mixed with white: `share` of the colour (0..1), the rest white. Tints keep the
/// hue of their palette colour while leaving the black pattern readable on top.
constexpr Colour tintOf(Colour c, double share) {
    const auto mix = [share](std::uint8_t v) {
        return static_cast<std::uint8_t>(v * share + 255.0 * (1.0 - share) + 0.5);
    };
    return Colour{mix(c.r), mix(c.g), mix(c.b), 255};
}

} // namespace atollog::draw
