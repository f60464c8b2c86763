#pragma once
// Where the next lithology interval of a hole goes when the logger adds one at the core table.
//
// It starts at the base of the hole's deepest interval, so logging runs down the core without
// gaps or overlaps. Recovered core is logged from the run top (the depth model's convention),
// so when that base already ends the recovered core of its run (or lies in a gap between
// runs) the new interval starts at the top of the next run instead. Its base is the top plus
// kDefaultIntervalThickness_m, cut at the end of the recovered core of the run it starts in;
// in the unrecovered rest of the last run (nothing recovered left anywhere below) it is cut at
// the run base and the engine's warning about unrecovered core says so. A hole whose intervals
// already reach its drilled depth, or which has no runs, gets no new interval.
#include "atollog/engine/core_dataset.hpp"

#include <optional>
#include <string>

namespace atollog::view {

/// Our choice of a first guess, typed over at once: short enough to stay within most runs'
/// recovered core, long enough to be one lithology in a reef limestone.
inline constexpr double kDefaultIntervalThickness_m = 0.5;

struct NextInterval {
    std::optional<LithInterval> interval; ///< hole, top_m, base_m set; limestone; the rest empty
    std::string refusal;                  ///< why there is none, and what to do
};

NextInterval nextInterval(const CoreDataset &data, const std::string &hole);

} // namespace atollog::view
