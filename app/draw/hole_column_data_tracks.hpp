#pragma once
// Which data tracks a column shows (taxa, zones, the age track): shown when ticked in
// HoleColumnTracks and there is something to draw in them, so a column without such data keeps
// the width it always had.
#include "draw/hole_column_input.hpp"

#include <cstddef>
#include <string>
#include <vector>

namespace atollog::draw {

/// Taxon lanes shown: one per ColumnTaxonRange, none when the taxa track is hidden.
std::size_t shownTaxonLanes(const HoleColumnInput &input);

/// The zonation schemes shown, in order of first appearance: one lane each.
std::vector<std::string> shownZoneSchemes(const HoleColumnInput &input);

/// The age track is shown when it has an age model (rows) or dates to draw and that part is
/// ticked.
bool ageModelShown(const HoleColumnInput &input);
bool datesShown(const HoleColumnInput &input);
bool ageTrackShown(const HoleColumnInput &input);

} // namespace atollog::draw
