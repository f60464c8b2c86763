#pragma once

#include "draw/hole_column_input.hpp"

namespace atollog::draw {

/// The share (0..1] of the lithology track an interval's box spans, measured from the track's
/// left edge: a graphic log's texture profile, where coarser or more rigid rock stands out
/// further (common practice). Carbonates go by texture class, other rocks by grain size; the
/// rule is one table in lithology_width.cpp (and in DEVELOPERS.md):
///
/// | width | carbonate texture                          | other rock                 |
/// |-------|--------------------------------------------|----------------------------|
/// | 0.40  | mudstone                                   | clay, soil                 |
/// | 0.50  | wackestone                                 |                            |
/// | 0.60  | packstone; texture not logged              |                            |
/// | 0.65  | crystalline                                |                            |
/// | 0.70  | grainstone                                 | sand                       |
/// | 0.80  | floatstone, rudstone                       | gravel, volcaniclastic     |
/// | 0.90  | boundstone, framestone, bindstone, baffle. |                            |
/// | 1.00  |                                            | basalt, cavity             |
///
/// The order mudstone < wackestone < packstone < grainstone < floatstone/rudstone < boundstone
/// is the trade's; the numbers are ours. Crystalline (texture destroyed) sits between packstone
/// and grainstone so that it reads as "not a depositional texture" rather than as either; a
/// cavity spans the track so the void is plain to see.
double lithologyWidthFraction(RockKind rock, TextureClass texture);

} // namespace atollog::draw
