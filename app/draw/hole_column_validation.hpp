#pragma once

#include "draw/hole_column_input.hpp"
#include "draw/hole_column_view.hpp"

namespace atollog::draw {

/// Checks a hole column's input and view before layout. Throws std::invalid_argument with a
/// message naming the hole, the item (run id, interval top-base and rock, sample id), the bad
/// value and the fix, for: a value that is not finite; a drilled base not below the collar;
/// a run or interval whose base is not below its top, or that reaches below the drilled base or
/// above the collar; a negative recovery, or one longer than the run (over-full runs from core
/// expansion are valid data, but the caller must clamp them before drawing); overlapping
/// intervals; a sample outside the hole; a depth window that is empty; a scale ratio that is
/// not positive.
void validateHoleColumnInput(const HoleColumnInput &input, const HoleColumnView &view);

} // namespace atollog::draw
