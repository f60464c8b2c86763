#include "draw_seeds.hpp"

namespace atollog::detail {

std::uint64_t mixSeed(std::uint64_t x) {
    x += 0x9e3779b97f4a7c15ULL;
    x = (x ^ (x >> 30)) * 0xbf58476d1ce4e5b9ULL;
    x = (x ^ (x >> 27)) * 0x94d049bb133111ebULL;
    return x ^ (x >> 31);
}

std::uint64_t blockSeed(std::uint64_t run_seed, DrawStream stream, std::uint64_t block) {
    return mixSeed(mixSeed(mixSeed(run_seed) ^ static_cast<std::uint64_t>(stream)) ^ block);
}

} // namespace atollog::detail
