#pragma once
// Seeds and uniforms for the age model's Monte Carlo. Every block of draws gets its own
// std::mt19937_64 seeded from (run seed, stream, block), so a run gives the same numbers whatever
// the thread count. Standard distributions are avoided: they differ between libraries.
#include <cstdint>
#include <random>

namespace atollog::detail {

/// Streams of one run: each pass of the sampler draws from its own.
enum class DrawStream : std::uint64_t { Pilot = 1, Main = 2, Outliers = 3 };

/// splitmix64 finaliser (Steele, Lea & Flood 2014): spreads nearby inputs over all 64 bits.
std::uint64_t mixSeed(std::uint64_t x);

/// The seed of one block of one stream of a run.
std::uint64_t blockSeed(std::uint64_t run_seed, DrawStream stream, std::uint64_t block);

/// u in the open interval (0, 1): the raw 53 high bits plus one half step, so that a quantile
/// function is never asked for p = 0 (u = (x >> 11) * 2^-53 alone can give 0).
inline double openUniform(std::mt19937_64& rng) {
    return (static_cast<double>(rng() >> 11) + 0.5) * 0x1.0p-53;
}

} // namespace atollog::detail
