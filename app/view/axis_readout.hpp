#pragma once
// The words for a position on the panel: the axis value under the cursor and, inside a column,
// the hole and its own depth. Shown in the tooltip and the status bar.
#include "view/panel_scene.hpp"

#include <QString>

#include <optional>

namespace atollog::view {

/// The column whose box holds `at`, if any.
std::optional<std::size_t> columnAt(const PanelScene &scene, const draw::PointMm &at);

/// The y (scene mm) where column `column`'s log begins: its collar, or the top of the axis when
/// the collar is above the window. Above it lies the column's header.
double columnBodyTop_mm(const draw::PanelGeometry &geometry, std::size_t column);

/// "depth 23.40 m", "elevation -3.10 m" or "1.20 m below <flattening item>", then, inside a
/// column, "hole TOR1: 24.10 m below collar" on a second line. Empty without panel geometry
/// (mm_per_axis_unit not positive).
QString axisReadout(const PanelScene &scene, const draw::PointMm &at);

} // namespace atollog::view
