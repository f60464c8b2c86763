#pragma once
// The shared vertical axis on the left of a correlation panel. Axis values grow downward on
// paper in every mode; only the labels change: depth below the collar, elevation (labelled as
// height above sea level, so the numbers read up-positive the way surveyors write them), or
// depth below the flattening level.
#include "draw/display_list.hpp"
#include "draw/panel_frame.hpp"
#include "draw/panel_input.hpp"

#include <string>

namespace atollog::draw {

/// The axis title for this view, e.g. "depth below collar (m)".
std::string panelAxisTitle(const PanelView &view);

/// Appends the axis line, ticks (1-2-5 steps, in the view's unit), labels and title; in elevation
/// mode without flattening also the sea-level line (axis value 0) across the panel, from the
/// axis to `right_mm`, when it lies in the window.
void appendPanelVerticalAxis(DisplayList &list, const PanelFrame &frame, const PanelView &view,
                             double right_mm);

} // namespace atollog::draw
