#pragma once
// The deterministic generator of the invented Vessari archipelago demo: a core data folder and
// the truth behind it. Same seed, same demo, byte for byte.
#include "truth.hpp"

#include "atollog/engine/core_dataset.hpp"

#include <cstdint>
#include <filesystem>
#include <string>

namespace atollog::demo {

/// The seed of the committed cores-demo/archipelago and cores-demo/truth.
constexpr std::uint64_t kDemoSeed = 730117;

struct DemoArchipelago {
    CoreDataset data;
    DemoTruth truth;
};

DemoArchipelago generateArchipelago(std::uint64_t seed);

} // namespace atollog::demo
