#pragma once
// Which drawn item is under a scene point: what the canvas's tooltip and click selection name.
#include "draw/display_list.hpp"

#include <cstddef>
#include <optional>

namespace atollog::view {

/// The index of the topmost tagged item (last drawn first) at `at`. Strokes and markers count
/// within `tolerance_mm` of their line work (the caller passes a few screen pixels, so thin tie
/// lines can be hit at any zoom); filled areas and texts count inside their shape or box.
/// Untagged items (role None) and the frame are background and never hit.
std::optional<std::size_t> hitTest(const draw::DisplayList &list, const draw::PointMm &at,
                                   double tolerance_mm);

} // namespace atollog::view
