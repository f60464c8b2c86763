#pragma once

#include "draw/colour.hpp"

#include <string_view>

namespace atollog::draw {

/// The colour of a taxon group, by its folder word (coral, benthic_foram, ...).
///
/// The eight colours are the palette of Okabe & Ito (2008, "Color Universal Design", J*Fly),
/// published as distinguishable under the common forms of colour-vision deficiency. The eight
/// taxon-group words of the vocabulary map one to one onto its eight colours, so a chart never
/// reuses a colour. A word outside the vocabulary gets neutral grey (#999999), which is not in
/// the palette, so it cannot be mistaken for a known group.
Colour groupColour(std::string_view group_word);

/// The legend's wording for a group ("larger_benthic_foram" -> "larger benthic foram").
std::string_view groupLabelWord(std::string_view group_word);

} // namespace atollog::draw
