#pragma once
// The demo archipelago of seed kDemoSeed, generated once per test program: the model-versus-truth
// tests compare against its DemoTruth.
#include "archipelago_generator.hpp"

namespace atollog::demo {

inline const DemoArchipelago& demoData() {
    static const DemoArchipelago d = generateArchipelago(kDemoSeed);
    return d;
}

} // namespace atollog::demo
