#pragma once
// sealevel.csv of the demo: a synthetic relative sea-level curve, invented for illustration.
#include "atollog/engine/core_records.hpp"

#include <vector>

namespace atollog::demo {

/// Sawtooth glacial cycles 120 kyr long over the last 600 kyr: a short highstand, a fast rise
/// at each termination and a slow fall to a lowstand of about -120 m.
std::vector<SeaLevelPoint> syntheticSeaLevel();

} // namespace atollog::demo
