#pragma once
// The side pane's text for a selected item: what the panel's input says about its datum (a tie's
// brackets per hole, an isochron's depth range per hole, a hole's collar and extent).
#include "draw/display_list.hpp"
#include "draw/panel_input.hpp"

#include <QString>

namespace atollog::view {

/// Plain text, one fact a line; items that are not a tie, isochron or hole get describeItem's
/// line alone. An empty key with role None (a click on nothing) gives an empty string.
QString selectionDetails(const draw::PanelInput &shown, draw::ItemRole role, const QString &key);

} // namespace atollog::view
