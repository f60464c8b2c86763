#pragma once
// How a long engine computation (an age model's draws) tells its caller how far it is, and
// learns that it should stop. The reporter never changes a result: the same seed gives the
// same numbers with or without one, stopped runs return nothing.
#include <cstddef>
#include <functional>
#include <stdexcept>

namespace atollog {

/// Called with `done` of `total` blocks of work after each block (and once with 0 before the
/// first), from the computation's worker threads but never two calls at once; `done` grows by
/// one block per call up to `total`. Blocks are units of work of roughly equal cost within one
/// stage, not of equal time across stages. Returning false stops the computation at its next
/// block boundary: it then throws WorkStopped.
using WorkProgress = std::function<bool(std::size_t done, std::size_t total)>;

/// A computation was stopped by its WorkProgress; it returned nothing.
struct WorkStopped : std::runtime_error {
    WorkStopped() : std::runtime_error("stopped by its caller before it was done") {}
};

} // namespace atollog
