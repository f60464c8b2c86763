#pragma once

#include "draw/panel_input.hpp"

namespace atollog::draw {

/// Checks a panel before anything is laid out and throws std::invalid_argument naming the item,
/// the bad value and the fix: no columns; a tie or isochron that names a column out of range or
/// the same column twice; non-finite levels; a tie level outside its bracket (shallow <= level <=
/// deep) or an isochron whose quantiles are out of order (q025 <= q500 <= q975); levels outside
/// their hole (0 to the drilled base); flatten_on naming no tie and no isochron; a bad scale,
/// gap or window. The columns themselves are checked by validateHoleColumnInput.
void validatePanelInput(const PanelInput &input, const PanelView &view);

/// The same without the full check of each column's runs, intervals and samples (only its hole
/// id, collar elevation and drilled base, which place it). layoutPanel uses it because
/// appendHoleColumn checks every column it draws: checking twice cost a third of a layout of
/// 20 holes x 5,000 intervals. Columns it does not draw it checks itself.
void validatePanelLinks(const PanelInput &input, const PanelView &view);

} // namespace atollog::draw
