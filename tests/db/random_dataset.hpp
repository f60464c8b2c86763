#pragma once
// Seeded generator of random core datasets that are valid for validateDataset (warnings are
// allowed, errors are not), for round-trip tests of the core data folder reader and writer.
// Text is deliberately awkward: commas, quotes, line breaks, non-ASCII UTF-8.
#include "atollog/engine/core_dataset.hpp"

#include <cstdint>

namespace atollog::testing {

/// Same seed, same dataset (std::mt19937_64, no other source of randomness).
CoreDataset randomValidDataset(std::uint64_t seed);

} // namespace atollog::testing
