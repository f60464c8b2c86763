#pragma once
// Input checks of a hole column's data tracks (taxa, zones, dates, the age model and the age
// track's range), kept apart from validateHoleColumnInput's checks of the logged core.
#include "draw/hole_column_input.hpp"

namespace atollog::draw {

/// Throws std::invalid_argument naming the hole, the item (taxon id, zone, date id, model row)
/// and the fix, for: a depth or age that is not finite; a depth outside the hole (0 m to the
/// drilled base); a zone edge or date bracket whose deep end lies above its shallow end; an open
/// zone edge with two different depths; a zone whose top lies below its base; a date whose age
/// lies outside its own range; model quantiles out of order (q025 <= q500 <= q975); model rows
/// out of depth order or more than two at one depth; an empty taxon id, zone name or date id; an
/// age track range that is not finite or not increasing, or that leaves out an age it must show.
void validateHoleColumnDataTracks(const HoleColumnInput &input);

} // namespace atollog::draw
