#pragma once
// Deliberate errors in the demo data, of the kinds real core data carry, each recorded in the
// truth so tests can check that they are caught (or at least do not go unnoticed in a model).
#include "archipelago_generator.hpp"
#include "rng.hpp"

namespace atollog::demo {

/// Plants: an old taxon logged in place far above its range (OSS1), a sample whose recorded depth
/// is 6-8 m too deep (TOR1), an altered coral whose U-Th ratios give too old an age and a high
/// initial d234U (KAL1); and records the one over-100 % run, a deliberate warning.
void plantFaults(DemoArchipelago& demo, DemoRng& rng);

} // namespace atollog::demo
