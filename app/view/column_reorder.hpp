#pragma once
// Where a column dragged sideways lands among the others: pure arithmetic on the column boxes
// the panel layout reports, so the canvas's drag and its test share one rule.
#include "draw/scene_rect.hpp"

#include <cstddef>
#include <vector>

namespace atollog::view {

/// The new left-to-right order (indices into `boxes`) after column `dragged` was moved
/// sideways by `shift_mm`: it passes every column whose centre its own moved centre has
/// crossed. Boxes are in drawing order, left to right. An index out of range gives the
/// unchanged order.
std::vector<std::size_t> reorderedColumns(const std::vector<draw::RectMm> &boxes,
                                          std::size_t dragged, double shift_mm);

} // namespace atollog::view
